#include "RenameCommand.h"

namespace tauline::ui {

RenameCommand::RenameCommand(SchematicDocument* document, ItemStates before, ItemStates after, const QString& text)
    : DrawingEditCommand(document, text, std::move(before), std::move(after))
{
}

}  // namespace tauline::ui
