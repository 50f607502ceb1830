#include "AddItemsCommand.h"

namespace tauline::ui {

AddItemsCommand::AddItemsCommand(SchematicDocument* document, ItemStates added, const QString& text)
    : DrawingEditCommand(document, text, {}, std::move(added))
{
    setSelectsResult(true);
}

}  // namespace tauline::ui
