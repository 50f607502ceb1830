// What is under a scene point: items, wire starts, connection points.
#include "SchematicScene.h"

#include "CanvasStyle.h"
#include "PartItem.h"
#include "PartLabelItem.h"
#include "SchematicItem.h"
#include "WireGeometry.h"
#include "WireItem.h"

#include <cmath>

namespace tauline::ui {

SchematicItem* SchematicScene::itemAt(QPointF pos) const
{
    for (QGraphicsItem* it : items(pos, Qt::IntersectsItemShape, Qt::DescendingOrder)) {
        if (auto* label = qgraphicsitem_cast<PartLabelItem*>(it))
            return label->part();
        if (SchematicItem* s = asSchematicItem(it); s && item(s->itemId()) == s)
            return s;
    }
    return nullptr;
}

std::optional<QPoint> SchematicScene::wireStartNear(QPointF pos, bool* horizontal) const
{
    std::optional<QPoint> best;
    double bestDistance = style::kTerminalHit;
    for (const auto& [id, item] : items_) {
        const auto* wire = qgraphicsitem_cast<WireItem*>(item);
        const QVector<QPoint> points = item->terminalPoints();
        for (const QPoint& t : points) {
            const double distance = std::hypot(t.x() - pos.x(), t.y() - pos.y());
            if (distance > bestDistance)
                continue;
            bestDistance = distance;
            best = t;
            if (wire) {
                // Carry on the way the wire ends.
                const QVector<QPoint>& p = wire->points();
                const QPoint neighbour = t == p.front() ? p.value(1) : p.value(p.size() - 2);
                *horizontal = neighbour.y() == t.y();
            } else {
                const QPointF out = QPointF(t) - item->mapToScene(QPointF(0, 0));
                *horizontal = std::abs(out.x()) > std::abs(out.y());
            }
        }
    }
    return best;
}

bool SchematicScene::isConnectionPoint(QPoint p) const
{
    for (const auto& [id, item] : items_) {
        if (auto* wire = qgraphicsitem_cast<WireItem*>(item)) {
            if (pointOnPolyline(p, wire->points()))
                return true;
        } else if (item->terminalPoints().contains(p)) {
            return true;
        }
    }
    return false;
}

QSet<QPoint> SchematicScene::attachmentPoints() const
{
    QSet<QPoint> points;
    for (const auto& [id, item] : items_) {
        for (const QPoint& p : item->terminalPoints())
            points.insert(p);
    }
    return points;
}

}  // namespace tauline::ui
