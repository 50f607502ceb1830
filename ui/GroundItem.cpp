#include "GroundItem.h"

#include "CanvasStyle.h"
#include "SymbolPainter.h"

#include <QPainter>

namespace tauline::ui {

GroundItem::GroundItem(ItemId id) : SymbolItem(id)
{
    setZValue(2);
}

QRectF GroundItem::boundingRect() const
{
    return QRectF(-14, -3, 28, 23);
}

QPainterPath GroundItem::shape() const
{
    QPainterPath path;
    path.addRect(QRectF(-11, 2, 22, 16));
    return path;
}

void GroundItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    if (isSelected()) {
        QColor glow = style::selection();
        glow.setAlpha(40);
        p->setPen(Qt::NoPen);
        p->setBrush(glow);
        p->drawRoundedRect(QRectF(-13, -1, 26, 20), 4, 4);
    }
    paintGround(p, isSelected() ? style::selection() : style::ink());
}

nlohmann::json GroundItem::state() const
{
    nlohmann::json s;
    s["type"] = "ground";
    writeBaseState(s);
    return s;
}

void GroundItem::applyState(const nlohmann::json& s)
{
    readBaseState(s);
}

}  // namespace tauline::ui
