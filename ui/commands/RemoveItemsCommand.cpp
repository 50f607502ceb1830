#include "RemoveItemsCommand.h"

namespace tauline::ui {

RemoveItemsCommand::RemoveItemsCommand(SchematicDocument* document, ItemStates removed)
    : DrawingEditCommand(document, QObject::tr("Delete"), std::move(removed), {})
{
}

}  // namespace tauline::ui
