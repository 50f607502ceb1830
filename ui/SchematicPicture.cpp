#include "SchematicPicture.h"

#include <QGraphicsItem>
#include <QGraphicsScene>
#include <QPainter>
#include <QStyleOptionGraphicsItem>

#include <algorithm>

namespace tauline::ui {

namespace {

bool drawn(const QGraphicsItem* item)
{
    return item->isVisible() && item->effectiveOpacity() > 0.0;
}

}  // namespace

QRectF schematicBounds(const QGraphicsScene& scene)
{
    QRectF bounds;
    for (const QGraphicsItem* item : scene.items())
        if (drawn(item))
            bounds = bounds.united(item->sceneBoundingRect());
    return bounds;
}

void paintSchematic(QPainter& painter, const QGraphicsScene& scene, const QRectF& target, double maxScale)
{
    const QRectF bounds = schematicBounds(scene);
    if (bounds.isEmpty() || target.isEmpty())
        return;
    const double scale =
        std::min({maxScale, target.width() / bounds.width(), target.height() / bounds.height()});
    QTransform base = painter.worldTransform();
    base.translate(target.center().x(), target.center().y());
    base.scale(scale, scale);
    base.translate(-bounds.center().x(), -bounds.center().y());

    // QGraphicsScene::render would paint the scene's background too (the
    // canvas grid); painting the items one by one leaves it out.
    const QList<QGraphicsItem*> items = scene.items(Qt::AscendingOrder);
    for (QGraphicsItem* item : items) {
        if (!drawn(item))
            continue;
        painter.save();
        painter.setWorldTransform(item->sceneTransform() * base);
        painter.setOpacity(item->effectiveOpacity());
        QStyleOptionGraphicsItem option;
        option.rect = item->boundingRect().toAlignedRect();
        option.exposedRect = item->boundingRect();
        option.state = QStyle::State_Enabled;
        item->paint(&painter, &option, nullptr);
        painter.restore();
    }
}

}  // namespace tauline::ui
