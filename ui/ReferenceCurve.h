#pragma once

#include "Analysis.h"

#include <QColor>
#include <QList>
#include <QPointF>
#include <QRectF>

#include <optional>
#include <utility>

class QAbstractAxis;
class QChart;
class QLineSeries;
class QValueAxis;

namespace tauline::ui {

// An earlier analysis kept on the Bode chart so an edit can be judged
// against it: its exact magnitude is drawn faintly under the current curve
// until the user dismisses it. Edits and redraws of the chart resample it
// on the chart's range but never drop it. The chart owns the series.
class ReferenceCurve {
public:
    ReferenceCurve(QChart* chart, QAbstractAxis* frequencyAxis, QValueAxis* magnitudeAxis);

    void keep(const tauline::Analysis& analysis);
    void dismiss();
    bool isKept() const { return analysis_.has_value(); }
    const std::optional<tauline::Analysis>& analysis() const { return analysis_; }

    // The chart's frequency range widened to cover the reference's corners
    // too, so both curves show whole.
    std::pair<double, double> coveringRange(std::pair<double, double> rangeHz) const;
    // The kept magnitude as chart data (log10 f, dB) at the chart's samples;
    // empty when nothing is kept.
    QList<QPointF> points(const QList<double>& hz) const;
    // Draws `points` cut to the axis box (data coordinates).
    void draw(const QList<QPointF>& points, const QRectF& box);
    // Nothing drawn, the analysis still kept (the chart shows a message).
    void clear();

    // The first piece carries the legend entry; a curve cut by the axes
    // has more.
    QList<QLineSeries*> series() const;
    static QColor color();

private:
    void showInLegend(bool shown);

    QChart* chart_;
    QAbstractAxis* frequencyAxis_;
    QValueAxis* magnitudeAxis_;
    QLineSeries* main_;
    QList<QLineSeries*> extras_;
    std::optional<tauline::Analysis> analysis_;
};

}  // namespace tauline::ui
