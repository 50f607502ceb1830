// One wire drawn with the mouse.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class AddWireCommand : public DrawingEditCommand {
public:
    AddWireCommand(SchematicDocument* document, nlohmann::json wire);
};

}  // namespace tauline::ui
