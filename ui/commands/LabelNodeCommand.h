// A node name given on a wire (every wire with that name is that node).
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class LabelNodeCommand : public DrawingEditCommand {
public:
    LabelNodeCommand(SchematicDocument* document, ItemStates before, ItemStates after);
};

}  // namespace tauline::ui
