// What lies under a point of the chart: the readout of both curves at a
// frequency, the frequency under the mouse, the corner marker near it.
#include "BodeChart.h"

#include "StraightLineSketch.h"

#include <QLineF>
#include <QtCharts/QLineSeries>

#include <cmath>
#include <numbers>

namespace tauline::ui {

std::optional<BodeChart::Reading> BodeChart::readingAt(double hz) const
{
    if (!analysis_ || !(hz > 0.0))
        return std::nullopt;
    const std::complex<double> h = analysis_->atHz(hz);
    Reading r;
    r.hz = hz;
    r.exactDb = 20.0 * std::log10(std::abs(h));
    r.sketchDb = tauline::sketchDb(
        *analysis_, pairsAsOneCorner_ ? tauline::lowQPairs(*analysis_) : std::vector<tauline::LowQPair>{}, hz);
    r.phaseDeg = std::arg(h) * 180.0 / std::numbers::pi;
    return r;
}

std::optional<double> BodeChart::frequencyAt(const QPointF& scenePos) const
{
    if (!analysis_)
        return std::nullopt;
    const QPointF local = mapFromScene(scenePos);
    if (!plotArea().contains(local))
        return std::nullopt;
    const QPointF value = const_cast<BodeChart*>(this)->mapToValue(local, sketch_);
    return std::pow(10.0, value.x());
}

std::optional<int> BodeChart::cornerAt(const QPointF& scenePos, qreal radius) const
{
    if (!analysis_)
        return std::nullopt;
    const QPointF local = mapFromScene(scenePos);
    std::optional<int> best;
    qreal bestDistance = radius;
    for (const auto& [index, point] : markerPoints_) {
        const QPointF at = const_cast<BodeChart*>(this)->mapToPosition(point, sketch_);
        const qreal d = QLineF(at, local).length();
        if (d <= bestDistance) {
            bestDistance = d;
            best = index;
        }
    }
    return best;
}

}  // namespace tauline::ui
