#include "SetResponseCommand.h"

namespace tauline::ui {

SetResponseCommand::SetResponseCommand(SchematicDocument* document, ItemStates before, ItemStates after)
    : DrawingEditCommand(document, QObject::tr("Change response"), std::move(before), std::move(after))
{
}

}  // namespace tauline::ui
