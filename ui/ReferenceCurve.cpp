#include "ReferenceCurve.h"

#include "PolylineClip.h"

#include <QObject>
#include <QPen>
#include <QtCharts/QChart>
#include <QtCharts/QLegend>
#include <QtCharts/QLegendMarker>
#include <QtCharts/QLineSeries>
#include <QtCharts/QValueAxis>

#include <algorithm>
#include <cmath>

namespace tauline::ui {

namespace {

// Faint: a light grey, wider than the live curve, so it reads as the
// shadow of an earlier state rather than a second live curve.
QPen referencePen()
{
    QPen pen(ReferenceCurve::color(), 4.0);
    pen.setCapStyle(Qt::RoundCap);
    pen.setJoinStyle(Qt::RoundJoin);
    return pen;
}

}  // namespace

QColor ReferenceCurve::color()
{
    return QColor(0x8c, 0x94, 0x9e, 0x70);
}

ReferenceCurve::ReferenceCurve(QChart* chart, QAbstractAxis* frequencyAxis, QValueAxis* magnitudeAxis)
    : chart_(chart), frequencyAxis_(frequencyAxis), magnitudeAxis_(magnitudeAxis)
{
    main_ = new QLineSeries(chart);
    main_->setName(QObject::tr("Reference (kept)"));
    main_->setPen(referencePen());
    chart_->addSeries(main_);
    main_->attachAxis(frequencyAxis_);
    main_->attachAxis(magnitudeAxis_);
    showInLegend(false);
}

void ReferenceCurve::keep(const tauline::Analysis& analysis)
{
    analysis_ = analysis;
}

void ReferenceCurve::dismiss()
{
    analysis_.reset();
    clear();
}

std::pair<double, double> ReferenceCurve::coveringRange(std::pair<double, double> rangeHz) const
{
    if (!analysis_)
        return rangeHz;
    const auto own = tauline::suggestedRangeHz(*analysis_);
    return {std::min(rangeHz.first, own.first), std::max(rangeHz.second, own.second)};
}

QList<QPointF> ReferenceCurve::points(const QList<double>& hz) const
{
    QList<QPointF> out;
    if (!analysis_)
        return out;
    const auto swept = tauline::sweep(*analysis_, std::vector<double>(hz.begin(), hz.end()));
    out.reserve(static_cast<qsizetype>(swept.size()));
    for (const auto& p : swept)
        out.append({std::log10(p.hz), p.db});
    return out;
}

void ReferenceCurve::draw(const QList<QPointF>& points, const QRectF& box)
{
    if (!analysis_) {
        clear();
        return;
    }
    const QList<QList<QPointF>> pieces = clipPolyline(points, box);
    main_->replace(pieces.isEmpty() ? QList<QPointF>{} : pieces.front());
    showInLegend(true);
    while (extras_.size() > std::max<qsizetype>(0, pieces.size() - 1)) {
        QLineSeries* s = extras_.takeLast();
        chart_->removeSeries(s);
        delete s;
    }
    for (qsizetype i = 1; i < pieces.size(); ++i) {
        if (extras_.size() < i) {
            auto* s = new QLineSeries(chart_);
            s->setPen(main_->pen());
            chart_->addSeries(s);
            s->attachAxis(frequencyAxis_);
            s->attachAxis(magnitudeAxis_);
            for (QLegendMarker* marker : chart_->legend()->markers(s))
                marker->setVisible(false);
            extras_.append(s);
        }
        extras_[i - 1]->replace(pieces[i]);
    }
}

void ReferenceCurve::clear()
{
    main_->clear();
    showInLegend(false);
    for (QLineSeries* s : extras_) {
        chart_->removeSeries(s);
        delete s;
    }
    extras_.clear();
}

void ReferenceCurve::showInLegend(bool shown)
{
    main_->setVisible(shown);
    for (QLegendMarker* marker : chart_->legend()->markers(main_))
        marker->setVisible(shown);
}

QList<QLineSeries*> ReferenceCurve::series() const
{
    return QList<QLineSeries*>{main_} + extras_;
}

}  // namespace tauline::ui
