// The paper and its grid of dots, thinned out when zoomed far out.
#include "SchematicScene.h"

#include "CanvasStyle.h"

#include <QPainter>
#include <cmath>

namespace tauline::ui {

void SchematicScene::drawBackground(QPainter* p, const QRectF& rect)
{
    p->fillRect(rect, style::paper());
    const double scale = std::abs(p->worldTransform().m11());
    // Dots no closer than 8 pixels: every grid point, or every 5th, 25th...
    int step = style::kGrid;
    while (step * scale < 8.0 && step < 100000)
        step *= 5;
    const int major = 5 * step;
    const int left = int(std::floor(rect.left() / step)) * step;
    const int top = int(std::floor(rect.top() / step)) * step;
    QVector<QPointF> minors;
    QVector<QPointF> majors;
    for (int x = left; x <= rect.right(); x += step) {
        for (int y = top; y <= rect.bottom(); y += step) {
            if (x % major == 0 && y % major == 0)
                majors.push_back(QPointF(x, y));
            else
                minors.push_back(QPointF(x, y));
        }
    }
    p->save();
    p->setRenderHint(QPainter::Antialiasing, false);
    QPen pen(style::gridDot());
    pen.setWidthF(1.0 / std::max(scale, 0.01));
    p->setPen(pen);
    p->drawPoints(minors.constData(), int(minors.size()));
    pen.setColor(style::gridMajor());
    pen.setWidthF(std::max(1.0, 1.6 / std::max(scale, 0.01)));
    p->setPen(pen);
    p->drawPoints(majors.constData(), int(majors.size()));
    p->restore();
}

}  // namespace tauline::ui
