#include "PartLabelItem.h"

#include "CanvasStyle.h"
#include "PartItem.h"
#include "ValueParser.h"

#include <QCursor>
#include <QFontMetricsF>
#include <QGraphicsSceneHoverEvent>
#include <QPainter>

namespace tauline::ui {

PartLabelItem::PartLabelItem(PartItem* part) : QGraphicsItem(part)
{
    setAcceptHoverEvents(true);
    setZValue(1);
}

PartItem* PartLabelItem::part() const
{
    return static_cast<PartItem*>(parentItem());
}

QString PartLabelItem::valueString() const
{
    return valueString_;
}

void PartLabelItem::refresh()
{
    prepareGeometryChange();
    const PartItem* p = part();
    valueString_ = p->value() > 0.0 ? QString::fromStdString(tauline::formatValue(p->value(), p->kind()))
                                    : QStringLiteral("?");
    const QFontMetricsF metrics(style::labelFont());
    const double nameWidth = metrics.horizontalAdvance(p->name()) + 4;
    const double valueWidth = metrics.horizontalAdvance(valueString_) + 4;
    const double h = metrics.height();
    // The label's own frame is the scene's, shifted: undo the part's turn.
    setTransform(p->transform().inverted());
    const bool horizontal = p->quarterTurns() % 2 == 0;
    QPointF anchor;
    if (horizontal) {
        const double w = nameWidth + valueWidth;
        nameRect_ = QRectF(-w / 2, -h, nameWidth, h);
        anchor = QPointF(0, -9);
    } else {
        nameRect_ = QRectF(0, -h / 2, nameWidth, h);
        anchor = QPointF(10, 0);
    }
    valueRect_ = QRectF(nameRect_.right(), nameRect_.top(), valueWidth, h);
    setPos(p->transform().inverted().map(anchor));
    update();
}

QRectF PartLabelItem::boundingRect() const
{
    return nameRect_.united(valueRect_).adjusted(-1, -1, 1, 1);
}

void PartLabelItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    const PartItem* owner = part();
    QFont font = style::labelFont();
    p->setFont(font);
    p->setPen(owner->isSelected() ? style::selection() : style::nameText());
    p->drawText(nameRect_, Qt::AlignCenter, owner->name());
    if (owner->isHighlighted()) {
        QColor glow = style::highlight();
        glow.setAlpha(90);
        p->fillRect(valueRect_, glow);
    }
    p->setPen(style::valueText());
    p->drawText(valueRect_, Qt::AlignCenter, valueString_);
}

void PartLabelItem::hoverMoveEvent(QGraphicsSceneHoverEvent* event)
{
    // Up/down arrows over the value say "drag me".
    setCursor(valueRect_.contains(event->pos()) ? Qt::SizeVerCursor : Qt::ArrowCursor);
}

}  // namespace tauline::ui
