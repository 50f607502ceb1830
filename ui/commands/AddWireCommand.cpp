#include "AddWireCommand.h"

namespace tauline::ui {

AddWireCommand::AddWireCommand(SchematicDocument* document, nlohmann::json wire)
    : DrawingEditCommand(document, QObject::tr("Draw wire"), {}, ItemStates{{wire.value("id", ItemId(0)), wire}})
{
}

}  // namespace tauline::ui
