#include "WireGeometry.h"

#include "CanvasStyle.h"

#include <algorithm>
#include <cmath>

namespace tauline::ui {

QPoint snapToGrid(QPointF p)
{
    const double g = style::kGrid;
    return QPoint(static_cast<int>(std::lround(p.x() / g) * style::kGrid),
                  static_cast<int>(std::lround(p.y() / g) * style::kGrid));
}

bool pointOnSegment(QPoint p, QPoint a, QPoint b)
{
    const qint64 cross = qint64(b.x() - a.x()) * (p.y() - a.y()) - qint64(b.y() - a.y()) * (p.x() - a.x());
    if (cross != 0)
        return false;
    return p.x() >= std::min(a.x(), b.x()) && p.x() <= std::max(a.x(), b.x())
           && p.y() >= std::min(a.y(), b.y()) && p.y() <= std::max(a.y(), b.y());
}

bool pointOnPolyline(QPoint p, const QVector<QPoint>& points)
{
    if (points.size() == 1)
        return points.front() == p;
    for (qsizetype i = 1; i < points.size(); ++i) {
        if (pointOnSegment(p, points[i - 1], points[i]))
            return true;
    }
    return false;
}

bool pointInsidePolyline(QPoint p, const QVector<QPoint>& points)
{
    if (points.isEmpty() || p == points.front() || p == points.back())
        return false;
    return pointOnPolyline(p, points);
}

QVector<QPoint> simplifyPolyline(const QVector<QPoint>& points)
{
    QVector<QPoint> out;
    for (const QPoint& p : points) {
        if (!out.isEmpty() && out.back() == p)
            continue;
        if (out.size() >= 2) {
            const QPoint a = out[out.size() - 2];
            const QPoint b = out.back();
            const QPoint d1 = b - a;
            const QPoint d2 = p - b;
            const qint64 cross = qint64(d1.x()) * d2.y() - qint64(d1.y()) * d2.x();
            const qint64 dot = qint64(d1.x()) * d2.x() + qint64(d1.y()) * d2.y();
            if (cross == 0 && dot > 0) {  // b is the middle of a straight run
                out.back() = p;
                continue;
            }
        }
        out.push_back(p);
    }
    return out;
}

QVector<QPoint> orthogonalRoute(QPoint from, QPoint to, bool horizontalFirst)
{
    if (from.x() == to.x() || from.y() == to.y())
        return {to};
    const QPoint elbow = horizontalFirst ? QPoint(to.x(), from.y()) : QPoint(from.x(), to.y());
    return {elbow, to};
}

namespace {

QVector<QPoint> stretchLastPoint(QVector<QPoint> pts, QPoint newEnd, const QSet<QPoint>& pinned)
{
    const qsizetype n = pts.size();
    const QPoint end = pts[n - 1];
    const QPoint prev = pts[n - 2];
    const bool lastHorizontal = prev.y() == end.y() && prev.x() != end.x();
    const bool lastVertical = prev.x() == end.x() && prev.y() != end.y();
    if (n >= 3 && !pinned.contains(prev)) {
        const QPoint before = pts[n - 3];
        const bool prevVertical = before.x() == prev.x();
        const bool prevHorizontal = before.y() == prev.y();
        if (lastHorizontal && prevVertical) {
            pts[n - 2].setY(newEnd.y());
            pts[n - 1] = newEnd;
            return pts;
        }
        if (lastVertical && prevHorizontal) {
            pts[n - 2].setX(newEnd.x());
            pts[n - 1] = newEnd;
            return pts;
        }
    }
    pts.removeLast();
    // Leave the fixed point the way the wire used to leave it.
    const QVector<QPoint> route = orthogonalRoute(prev, newEnd, !lastVertical);
    pts += route;
    return pts;
}

}  // namespace

QVector<QPoint> stretchPolylineEnd(const QVector<QPoint>& points, bool firstEnd, QPoint newEnd,
                                   const QSet<QPoint>& pinned)
{
    if (points.size() < 2)
        return points;
    QVector<QPoint> pts = points;
    if (firstEnd)
        std::reverse(pts.begin(), pts.end());
    pts = stretchLastPoint(pts, newEnd, pinned);
    if (firstEnd)
        std::reverse(pts.begin(), pts.end());
    pts = simplifyPolyline(pts);
    if (pts.size() == 1)
        pts.push_back(pts.front());
    return pts;
}

}  // namespace tauline::ui

namespace tauline::ui {

QVector<QPoint> followMovedEnds(const QVector<QPoint>& points, const QHash<QPoint, QPoint>& moved,
                                const QSet<QPoint>& pinned)
{
    if (points.size() < 2)
        return points;
    const auto first = moved.find(points.front());
    const auto last = moved.find(points.back());
    const bool moveFirst = first != moved.end();
    const bool moveLast = last != moved.end();
    if (moveFirst && moveLast && *first - points.front() == *last - points.back()) {
        QVector<QPoint> out = points;
        const QPoint delta = *first - points.front();
        for (QPoint& p : out)
            p += delta;
        return out;
    }
    QVector<QPoint> out = points;
    if (moveFirst)
        out = stretchPolylineEnd(out, true, *first, pinned);
    if (moveLast)
        out = stretchPolylineEnd(out, false, *last, pinned);
    return out;
}

}  // namespace tauline::ui
