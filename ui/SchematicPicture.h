#pragma once

#include <QRectF>

class QGraphicsScene;
class QPainter;

namespace tauline::ui {

// The drawing alone, as a picture for a page: every item painted in stacking
// order, without the canvas's dot grid or paper, scaled to fit `target`
// (never above `maxScale`) and centred in it. Items paint their own text, so
// names and values stay text in an SVG.
void paintSchematic(QPainter& painter, const QGraphicsScene& scene, const QRectF& target,
                    double maxScale = 1.0);

// The scene area the items cover (empty when there are none).
QRectF schematicBounds(const QGraphicsScene& scene);

}  // namespace tauline::ui
