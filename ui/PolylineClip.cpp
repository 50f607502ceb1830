#include "PolylineClip.h"

#include <cmath>

namespace tauline::ui {

namespace {

bool inside(const QPointF& p, const QRectF& box)
{
    return p.x() >= box.left() && p.x() <= box.right() && p.y() >= box.top()
           && p.y() <= box.bottom();
}

// Liang-Barsky: the part of segment a-b inside the box, as parameters t0..t1.
bool clipSegment(const QPointF& a, const QPointF& b, const QRectF& box, double& t0, double& t1)
{
    t0 = 0.0;
    t1 = 1.0;
    const double dx = b.x() - a.x();
    const double dy = b.y() - a.y();
    const double p[4] = {-dx, dx, -dy, dy};
    const double q[4] = {a.x() - box.left(), box.right() - a.x(), a.y() - box.top(),
                         box.bottom() - a.y()};
    for (int i = 0; i < 4; ++i) {
        if (p[i] == 0.0) {
            if (q[i] < 0.0)
                return false;
            continue;
        }
        const double t = q[i] / p[i];
        if (p[i] < 0.0) {
            if (t > t1)
                return false;
            t0 = std::max(t0, t);
        } else {
            if (t < t0)
                return false;
            t1 = std::min(t1, t);
        }
    }
    return t0 <= t1;
}

bool finite(const QPointF& p)
{
    return std::isfinite(p.x()) && std::isfinite(p.y());
}

}  // namespace

QList<QList<QPointF>> clipPolyline(const QList<QPointF>& points, const QRectF& box)
{
    QList<QList<QPointF>> pieces;
    QList<QPointF> current;
    auto flush = [&] {
        if (current.size() >= 2)
            pieces.append(current);
        current.clear();
    };
    if (points.size() == 1 && finite(points.front()) && inside(points.front(), box))
        return {points};
    for (qsizetype i = 0; i + 1 < points.size(); ++i) {
        const QPointF a = points[i];
        const QPointF b = points[i + 1];
        if (!finite(a) || !finite(b)) {
            flush();
            continue;
        }
        double t0 = 0.0;
        double t1 = 1.0;
        if (!clipSegment(a, b, box, t0, t1)) {
            flush();
            continue;
        }
        const QPointF start = a + (b - a) * t0;
        const QPointF end = a + (b - a) * t1;
        if (t0 > 0.0)
            flush();
        if (current.isEmpty())
            current.append(start);
        current.append(end);
        if (t1 < 1.0)
            flush();
    }
    flush();
    return pieces;
}

QList<QPointF> pointsInside(const QList<QPointF>& points, const QRectF& box)
{
    QList<QPointF> out;
    for (const QPointF& p : points)
        if (finite(p) && inside(p, box))
            out.append(p);
    return out;
}

}  // namespace tauline::ui
