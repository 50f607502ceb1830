// Deleting the selection (wires attached to a deleted part stay, now open).
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class RemoveItemsCommand : public DrawingEditCommand {
public:
    RemoveItemsCommand(SchematicDocument* document, ItemStates removed);
};

}  // namespace tauline::ui
