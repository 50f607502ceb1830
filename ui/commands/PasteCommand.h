// Items from the clipboard, with new ids and parts renamed where names clash; they end up selected.
#pragma once

#include "DrawingEditCommand.h"

namespace tauline::ui {

class PasteCommand : public DrawingEditCommand {
public:
    PasteCommand(SchematicDocument* document, ItemStates pasted);
};

}  // namespace tauline::ui
