#include "TransferMarkerItem.h"

#include "CanvasStyle.h"
#include "SymbolPainter.h"

namespace tauline::ui {

TransferMarkerItem::TransferMarkerItem(ItemId id, MarkerRole role) : MarkerItem(id, role) {}

void TransferMarkerItem::paintSymbol(QPainter* painter, const QColor& ink) const
{
    if (role() == MarkerRole::Input)
        paintInputMarker(painter, ink, drive());
    else
        paintOutputMarker(painter, ink);
}

QColor TransferMarkerItem::roleColour() const
{
    return role() == MarkerRole::Input ? style::inputMarker() : style::outputMarker();
}

}  // namespace tauline::ui
