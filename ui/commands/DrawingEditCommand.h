// The shared mechanics of every drawing edit: item states before and after,
// applied by id (an id missing on one side is created or removed), then the
// document re-derives its network. Each kind of edit is its own subclass.
#pragma once

#include "ItemStates.h"

#include <QUndoCommand>

namespace tauline::ui {

class SchematicDocument;

class DrawingEditCommand : public QUndoCommand {
public:
    DrawingEditCommand(SchematicDocument* document, const QString& text, ItemStates before, ItemStates after);

    void redo() override;
    void undo() override;

    const ItemStates& before() const { return before_; }
    const ItemStates& after() const { return after_; }

protected:
    // Select the items that exist after redo (for additions and pastes).
    void setSelectsResult(bool on) { selectsResult_ = on; }
    void replaceAfter(const ItemStates& after) { after_ = after; }

private:
    void apply(const ItemStates& target, bool select);

    SchematicDocument* document_;
    ItemStates before_;
    ItemStates after_;
    bool selectsResult_ = false;
};

}  // namespace tauline::ui
