// Placing new symbols (parts, ground, markers); the new items end up selected.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class AddItemsCommand : public DrawingEditCommand {
public:
    AddItemsCommand(SchematicDocument* document, ItemStates added, const QString& text);
};

}  // namespace tauline::ui
