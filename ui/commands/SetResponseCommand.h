// A change of the response's kind: the input's drive (voltage or current), or port markers traded for input and output markers and back.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class SetResponseCommand : public DrawingEditCommand {
public:
    SetResponseCommand(SchematicDocument* document, ItemStates before, ItemStates after);
};

}  // namespace tauline::ui
