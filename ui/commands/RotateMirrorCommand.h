// A quarter turn or a mirror of the selection about its centre (the ghost of a
// symbol being placed turns without a command).
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class RotateMirrorCommand : public DrawingEditCommand {
public:
    RotateMirrorCommand(SchematicDocument* document, ItemStates before, ItemStates after, bool mirror);
};

}  // namespace tauline::ui
