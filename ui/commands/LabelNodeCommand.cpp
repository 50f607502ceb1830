#include "LabelNodeCommand.h"

namespace tauline::ui {

LabelNodeCommand::LabelNodeCommand(SchematicDocument* document, ItemStates before, ItemStates after)
    : DrawingEditCommand(document, QObject::tr("Name node"), std::move(before), std::move(after))
{
}

}  // namespace tauline::ui
