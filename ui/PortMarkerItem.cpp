#include "PortMarkerItem.h"

#include "CanvasStyle.h"
#include "SymbolPainter.h"

namespace tauline::ui {

PortMarkerItem::PortMarkerItem(ItemId id) : MarkerItem(id, MarkerRole::Port) {}

void PortMarkerItem::paintSymbol(QPainter* painter, const QColor& ink) const
{
    paintPortMarker(painter, ink);
}

QColor PortMarkerItem::roleColour() const
{
    return style::portMarker();
}

}  // namespace tauline::ui
