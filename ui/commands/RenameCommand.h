// A part's new name.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class RenameCommand : public DrawingEditCommand {
public:
    RenameCommand(SchematicDocument* document, ItemStates before, ItemStates after, const QString& text);
};

}  // namespace tauline::ui
