#include "WireItem.h"

#include "CanvasStyle.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPathStroker>

namespace tauline::ui {

WireItem::WireItem(ItemId id) : SchematicItem(id)
{
    setZValue(1);
}

void WireItem::setPoints(const QVector<QPoint>& points)
{
    prepareGeometryChange();
    points_ = points;
    rebuild();
}

void WireItem::setLabel(const QString& label)
{
    prepareGeometryChange();
    label_ = label;
    rebuild();
}

void WireItem::rebuild()
{
    path_ = QPainterPath();
    if (!points_.isEmpty()) {
        path_.moveTo(points_.front());
        for (qsizetype i = 1; i < points_.size(); ++i)
            path_.lineTo(points_[i]);
    }
    QPainterPathStroker stroker;
    stroker.setWidth(8);
    stroker.setCapStyle(Qt::RoundCap);
    shape_ = stroker.createStroke(path_);
    labelRect_ = QRectF();
    if (!label_.isEmpty() && points_.size() >= 2) {
        // On the longest segment, above it or to its right.
        qsizetype best = 1;
        for (qsizetype i = 1; i < points_.size(); ++i) {
            const QPoint d = points_[i] - points_[i - 1];
            const QPoint b = points_[best] - points_[best - 1];
            if (d.manhattanLength() > b.manhattanLength())
                best = i;
        }
        // Near the start of the longest segment, above it or to its right,
        // clear of the wires that join at its ends.
        const QPointF a = points_[best - 1];
        const QPointF b = points_[best];
        const QFontMetricsF metrics(style::labelFont());
        const double w = metrics.horizontalAdvance(label_) + 6;
        const double h = metrics.height();
        const bool horizontal = points_[best].y() == points_[best - 1].y();
        if (horizontal) {
            const double x = std::min(a.x(), b.x()) + 6;
            labelRect_ = QRectF(x, a.y() - h - 1, w, h);
        } else {
            const double y = std::min(a.y(), b.y()) + 4;
            labelRect_ = QRectF(a.x() + 3, y, w, h);
        }
    }
}

QRectF WireItem::labelRect() const
{
    return labelRect_;
}

QRectF WireItem::boundingRect() const
{
    return shape_.boundingRect().united(labelRect_).adjusted(-2, -2, 2, 2);
}

QPainterPath WireItem::shape() const
{
    QPainterPath s = shape_;
    if (!labelRect_.isNull())
        s.addRect(labelRect_);
    return s;
}

void WireItem::paint(QPainter* p, const QStyleOptionGraphicsItem*, QWidget*)
{
    p->setRenderHint(QPainter::Antialiasing);
    if (isSelected()) {
        QColor glow = style::selection();
        glow.setAlpha(60);
        QPen halo(glow, 6);
        halo.setCapStyle(Qt::RoundCap);
        halo.setJoinStyle(Qt::RoundJoin);
        p->setPen(halo);
        p->drawPath(path_);
    }
    QPen pen(isSelected() ? style::selection() : style::wire(), style::kWireWidth);
    pen.setCapStyle(Qt::RoundCap);
    pen.setJoinStyle(Qt::RoundJoin);
    p->setPen(pen);
    p->setBrush(Qt::NoBrush);
    p->drawPath(path_);
    if (!labelRect_.isNull()) {
        p->setFont(style::labelFont());
        p->setPen(style::nodeLabel());
        p->drawText(labelRect_, Qt::AlignCenter, label_);
    }
}

nlohmann::json WireItem::state() const
{
    nlohmann::json s;
    s["type"] = "wire";
    s["id"] = itemId();
    nlohmann::json pts = nlohmann::json::array();
    for (const QPoint& pt : points_)
        pts.push_back({pt.x(), pt.y()});
    s["points"] = pts;
    s["label"] = label_.toStdString();
    return s;
}

void WireItem::applyState(const nlohmann::json& s)
{
    QVector<QPoint> pts;
    if (s.contains("points") && s["points"].is_array()) {
        for (const auto& pt : s["points"]) {
            if (pt.is_array() && pt.size() == 2 && pt[0].is_number() && pt[1].is_number())
                pts.push_back(QPoint(pt[0].get<int>(), pt[1].get<int>()));
        }
    }
    prepareGeometryChange();
    points_ = pts;
    label_ = QString::fromStdString(s.value("label", std::string()));
    rebuild();
    update();
}

QVector<QPoint> WireItem::terminalPoints() const
{
    if (points_.isEmpty())
        return {};
    return {points_.front(), points_.back()};
}

}  // namespace tauline::ui
