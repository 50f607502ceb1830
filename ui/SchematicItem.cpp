#include "SchematicItem.h"

namespace tauline::ui {

SchematicItem::SchematicItem(ItemId id) : id_(id)
{
    setFlag(ItemIsSelectable, true);
}

SchematicItem* asSchematicItem(QGraphicsItem* item)
{
    if (!item)
        return nullptr;
    switch (item->type()) {
    case PartItemType:
    case GroundItemType:
    case MarkerItemType:
    case WireItemType: return static_cast<SchematicItem*>(item);
    default: return nullptr;
    }
}

}  // namespace tauline::ui
