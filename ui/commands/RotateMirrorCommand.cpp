#include "RotateMirrorCommand.h"

namespace tauline::ui {

RotateMirrorCommand::RotateMirrorCommand(SchematicDocument* document, ItemStates before, ItemStates after,
                                         bool mirror)
    : DrawingEditCommand(document, mirror ? QObject::tr("Mirror") : QObject::tr("Rotate"), std::move(before),
                         std::move(after))
{
}

}  // namespace tauline::ui
