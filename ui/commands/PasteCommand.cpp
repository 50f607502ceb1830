#include "PasteCommand.h"

namespace tauline::ui {

PasteCommand::PasteCommand(SchematicDocument* document, ItemStates pasted)
    : DrawingEditCommand(document, QObject::tr("Paste"), {}, std::move(pasted))
{
    setSelectsResult(true);
}

}  // namespace tauline::ui
