#include "MoveItemsCommand.h"

namespace tauline::ui {

MoveItemsCommand::MoveItemsCommand(SchematicDocument* document, ItemStates before, ItemStates after)
    : DrawingEditCommand(document, QObject::tr("Move"), std::move(before), std::move(after))
{
}

}  // namespace tauline::ui
