#include "JunctionItem.h"

#include "CanvasStyle.h"

#include <QPainter>

namespace tauline::ui {

JunctionItem::JunctionItem(QPointF at)
{
    setPos(at);
    setZValue(4);
    setAcceptedMouseButtons(Qt::NoButton);
}

QRectF JunctionItem::boundingRect() const
{
    return QRectF(-4, -4, 8, 8);
}

void JunctionItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    p->setPen(Qt::NoPen);
    p->setBrush(style::wire());
    p->drawEllipse(QPointF(0, 0), 3.2, 3.2);
}

}  // namespace tauline::ui
