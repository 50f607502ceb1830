// A part's new value. The steps of one wheel burst or one value drag share a
// serial and merge into a single undo step; a burst that ends where it began
// leaves nothing to undo.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class SetValueCommand : public DrawingEditCommand {
public:
    // serial 0: a single edit that never merges.
    SetValueCommand(SchematicDocument* document, ItemStates before, ItemStates after, const QString& part,
                    quint64 serial);

    int id() const override;
    bool mergeWith(const QUndoCommand* other) override;

private:
    quint64 serial_;
};

}  // namespace tauline::ui
