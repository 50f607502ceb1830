// Deleting, copying and pasting the selection.
#include "SchematicScene.h"

#include "ItemClipboard.h"
#include "PartItem.h"
#include "SchematicDocument.h"
#include "SchematicSceneKinds.h"
#include "commands/PasteCommand.h"
#include "commands/RemoveItemsCommand.h"

#include <QUndoStack>

namespace tauline::ui {

void SchematicScene::deleteSelection()
{
    ItemStates removed;
    for (SchematicItem* item : selectedSchematicItems())
        removed[item->itemId()] = item->state();
    if (!removed.empty())
        document_->undoStack()->push(new RemoveItemsCommand(document_, removed));
}

QByteArray SchematicScene::copySelection() const
{
    std::vector<nlohmann::json> states;
    for (SchematicItem* item : selectedSchematicItems())
        states.push_back(item->state());
    return itemsToClipboard(states);
}

bool SchematicScene::paste(const QByteArray& bytes)
{
    const std::vector<nlohmann::json> incoming = itemsFromClipboard(bytes);
    if (incoming.empty())
        return false;
    PasteContext context;
    for (const auto& [id, item] : items_)
        context.existing.push_back(item->state());
    for (PartItem* part : parts())
        context.takenNames.insert(part->name());
    context.newId = [this] { return newId(); };
    context.nextName = [this](const std::string& kind, const QSet<QString>& taken) {
        return nextPartName(partKindFromName(kind).value_or(tauline::PartKind::Resistor), taken);
    };
    document_->undoStack()->push(new PasteCommand(document_, placePastedItems(incoming, context)));
    return true;
}

}  // namespace tauline::ui
