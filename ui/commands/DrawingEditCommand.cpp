#include "DrawingEditCommand.h"

#include "SchematicDocument.h"
#include "SchematicItem.h"
#include "SchematicScene.h"

#include <set>

namespace tauline::ui {

DrawingEditCommand::DrawingEditCommand(SchematicDocument* document, const QString& text, ItemStates before,
                                       ItemStates after)
    : QUndoCommand(text), document_(document), before_(std::move(before)), after_(std::move(after))
{
}

void DrawingEditCommand::redo()
{
    apply(after_, selectsResult_);
}

void DrawingEditCommand::undo()
{
    apply(before_, false);
}

void DrawingEditCommand::apply(const ItemStates& target, bool select)
{
    std::set<ItemId> ids;
    for (const auto& [id, state] : before_)
        ids.insert(id);
    for (const auto& [id, state] : after_)
        ids.insert(id);
    SchematicScene* scene = document_->scene();
    scene->applyItemStates(target, ids);
    if (select) {
        scene->clearSelection();
        for (const auto& [id, state] : target) {
            if (SchematicItem* item = scene->item(id))
                item->setSelected(true);
        }
    }
    document_->refresh();
}

}  // namespace tauline::ui
