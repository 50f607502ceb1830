// Moving symbols and wires by whole grid steps; wires attached to moved terminals stretch.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class MoveItemsCommand : public DrawingEditCommand {
public:
    MoveItemsCommand(SchematicDocument* document, ItemStates before, ItemStates after);
};

}  // namespace tauline::ui
