#include "BodeChart.h"

#include "BreakpointTable.h"
#include "PolylineClip.h"
#include "QuantityText.h"
#include "ReferenceCurve.h"
#include "StraightLineSketch.h"

#include <QCoreApplication>
#include <QFont>
#include <QGraphicsLayout>
#include <QGraphicsSimpleTextItem>
#include <QLineF>
#include <QPen>
#include <QtCharts/QCategoryAxis>
#include <QtCharts/QLegendMarker>
#include <QtCharts/QLineSeries>
#include <QtCharts/QScatterSeries>
#include <QtCharts/QValueAxis>

#include <algorithm>
#include <cmath>
#include <numbers>

namespace tauline::ui {

namespace {

constexpr int kCurvePoints = 480;
// Taller spans say nothing more and squash the interesting part.
constexpr double kMaxMagnitudeSpanDb = 200.0;

struct Ticks {
    double lo = 0.0;
    double hi = 1.0;
    double step = 1.0;
};

// Steps of 1, 2 or 5 times a power of ten (or 15/45/90 degrees for phase)
// so the tick labels read as round numbers.
Ticks niceTicks(double lo, double hi, int maxTicks, const std::vector<double>& steps)
{
    if (!(hi > lo)) {
        lo -= 5.0;
        hi += 5.0;
    }
    Ticks t;
    for (double step : steps) {
        const double a = std::floor(lo / step) * step;
        const double b = std::ceil(hi / step) * step;
        if ((b - a) / step + 1 <= maxTicks) {
            t = {a, b, step};
            return t;
        }
    }
    const double step = steps.back();
    return {std::floor(lo / step) * step, std::ceil(hi / step) * step, step};
}

std::vector<double> decibelSteps()
{
    std::vector<double> steps;
    for (double decade = 0.1; decade < 1e4; decade *= 10)
        for (double m : {1.0, 2.0, 5.0})
            steps.push_back(m * decade);
    return steps;
}

// Qt Charts lays the whole chart out again and rebuilds every axis label on
// any axis setter, even one that changes nothing (setLabelFormat always
// does): while a value is dragged the ticks rarely change, so only a real
// change is passed on.
void setTicks(QValueAxis* axis, const Ticks& t, const QString& format)
{
    if (axis->min() != t.lo || axis->max() != t.hi)
        axis->setRange(t.lo, t.hi);
    const int count = static_cast<int>(std::lround((t.hi - t.lo) / t.step)) + 1;
    if (axis->tickCount() != count)
        axis->setTickCount(count);
    if (axis->labelFormat() != format)
        axis->setLabelFormat(format);
}

void hideLegendMarker(QChart* chart, QAbstractSeries* series)
{
    for (QLegendMarker* marker : chart->legend()->markers(series))
        marker->setVisible(false);
}

// Qt Charts draws a solid line as one short line per segment, which an SVG
// export turns into hundreds of two-point polylines; any other pen style is
// drawn as one path. A dash pattern without gaps looks solid and keeps each
// curve a single element in the export. On screen the solid pen is much
// cheaper to draw.
QPen curvePen(const QColor& colour, qreal width, bool forExport)
{
    QPen pen(colour, width);
    if (forExport)
        pen.setDashPattern({1.0, 0.0});
    pen.setCapStyle(Qt::RoundCap);
    pen.setJoinStyle(Qt::RoundJoin);
    return pen;
}

QList<QPointF> unwrappedPhase(const std::vector<SweepPoint>& points)
{
    QList<QPointF> out;
    out.reserve(points.size());
    double offset = 0.0;
    double previous = 0.0;
    for (std::size_t i = 0; i < points.size(); ++i) {
        double deg = points[i].deg;
        if (i > 0) {
            const double jump = (deg + offset) - previous;
            if (jump > 180.0)
                offset -= 360.0;
            else if (jump < -180.0)
                offset += 360.0;
        }
        previous = deg + offset;
        out.append({std::log10(points[i].hz), previous});
    }
    return out;
}

}  // namespace

QColor BodeChart::exactColor() { return QColor(0x1f, 0x5f, 0x8b); }
QColor BodeChart::sketchColor() { return QColor(0xd9, 0x82, 0x2b); }
QColor BodeChart::phaseColor() { return QColor(0x7a, 0x4e, 0x9c); }

BodeChart::BodeChart(QGraphicsItem* parent) : QChart(parent)
{
    setAnimationOptions(QChart::NoAnimation);
    setBackgroundRoundness(0);
    // Room on the right for the last decade's label, centred on the edge.
    setMargins(QMargins(6, 6, 18, 6));
    setPlotAreaBackgroundVisible(true);
    setPlotAreaBackgroundBrush(Qt::white);
    setPlotAreaBackgroundPen(QPen(QColor(0xa9, 0xb0, 0xbb), 1));
    legend()->setAlignment(Qt::AlignTop);
    legend()->setMarkerShape(QLegend::MarkerShapeFromSeries);
    legend()->setFont(QFont(legend()->font().family(), 8));

    frequencyAxis_ = new QCategoryAxis(this);
    frequencyAxis_->setLabelsPosition(QCategoryAxis::AxisLabelsPositionOnValue);
    frequencyAxis_->setTitleText(tr("Frequency (Hz)"));
    frequencyAxis_->setGridLinePen(QPen(QColor(0xc4, 0xca, 0xd3), 1));
    frequencyAxis_->setMinorGridLineVisible(false);
    magnitudeAxis_ = new QValueAxis(this);
    magnitudeAxis_->setGridLinePen(QPen(QColor(0xdd, 0xe1, 0xe6), 1));
    magnitudeAxis_->setMinorGridLineVisible(false);
    phaseAxis_ = new QValueAxis(this);
    phaseAxis_->setTitleText(tr("Phase (°)"));
    phaseAxis_->setLabelFormat(QStringLiteral("%.0f"));
    phaseAxis_->setGridLineVisible(false);
    phaseAxis_->setLinePenColor(phaseColor());
    phaseAxis_->setLabelsColor(phaseColor());
    addAxis(frequencyAxis_, Qt::AlignBottom);
    addAxis(magnitudeAxis_, Qt::AlignLeft);
    addAxis(phaseAxis_, Qt::AlignRight);

    auto line = [this](const QString& name, const QPen& pen, QValueAxis* y) {
        auto* s = new QLineSeries(this);
        s->setName(name);
        s->setPen(pen);
        addSeries(s);
        s->attachAxis(frequencyAxis_);
        s->attachAxis(y);
        return s;
    };
    minorGrid_ = line(QString(), QPen(QColor(0xec, 0xee, 0xf2), 1), magnitudeAxis_);
    // Added before the curves so it draws under them.
    reference_ = new ReferenceCurve(this, frequencyAxis_, magnitudeAxis_);
    phase_ = line(tr("Phase"), curvePen(phaseColor(), 1.4, false), phaseAxis_);
    QPen sketchPen(sketchColor(), 1.8, Qt::DashLine);
    sketch_ = line(tr("Straight-line sketch"), sketchPen, magnitudeAxis_);
    exact_ = line(tr("Exact magnitude"), curvePen(exactColor(), 2.2, false), magnitudeAxis_);

    auto markers = [this](const QString& name, QScatterSeries::MarkerShape shape, qreal size,
                          const QBrush& brush, const QPen& pen) {
        auto* s = new QScatterSeries(this);
        s->setName(name);
        s->setMarkerShape(shape);
        s->setMarkerSize(size);
        s->setBrush(brush);
        s->setPen(pen);
        addSeries(s);
        s->attachAxis(frequencyAxis_);
        s->attachAxis(magnitudeAxis_);
        return s;
    };
    poleMarkers_ = markers(tr("Pole"), QScatterSeries::MarkerShapeRotatedRectangle, 11,
                           QBrush(QColor(0xb0, 0x3a, 0x2e)), QPen(QColor(0x6e, 0x1f, 0x17), 1));
    zeroMarkers_ = markers(tr("Zero"), QScatterSeries::MarkerShapeCircle, 11, QBrush(Qt::white),
                           QPen(QColor(0x2e, 0x7d, 0x4f), 2));
    highlightMarker_ = markers(QString(), QScatterSeries::MarkerShapeCircle, 24,
                               QBrush(Qt::transparent), QPen(QColor(0x20, 0x20, 0x20), 2));
    hideLegendMarker(this, minorGrid_);
    hideLegendMarker(this, highlightMarker_);

    messageItem_ = new QGraphicsSimpleTextItem(this);
    messageItem_->setBrush(QColor(0x55, 0x5b, 0x66));
    messageItem_->setZValue(20);

    connect(this, &QChart::plotAreaChanged, this, [this] { placeCornerLabels(); });
    showMessage(tr("No response to plot yet."));
}

void BodeChart::setExportStyle(bool forExport)
{
    exact_->setPen(curvePen(exactColor(), 2.2, forExport));
    phase_->setPen(curvePen(phaseColor(), 1.4, forExport));
    for (QLineSeries* s : exactExtras_)
        s->setPen(exact_->pen());
    for (QLineSeries* s : phaseExtras_)
        s->setPen(phase_->pen());
}

QString BodeChart::message() const
{
    return messageItem_->isVisible() ? messageItem_->text() : QString();
}

void BodeChart::setAnalysis(const tauline::Analysis& analysis)
{
    analysis_ = analysis;
    if (highlighted_ >= static_cast<int>(analysis.breakpoints.size()))
        highlighted_ = -1;
    messageItem_->setVisible(false);
    rebuild();
}

void BodeChart::showMessage(const QString& message)
{
    analysis_.reset();
    highlighted_ = -1;
    clearCurves();
    messageItem_->setText(message);
    messageItem_->setVisible(true);
    placeCornerLabels();
}

void BodeChart::setUserRange(std::optional<std::pair<double, double>> rangeHz)
{
    userRange_ = rangeHz;
    if (analysis_)
        rebuild();
}

void BodeChart::setPairsAsOneCorner(bool on)
{
    pairsAsOneCorner_ = on;
    if (analysis_)
        rebuild();
}

void BodeChart::setPhaseVisible(bool visible)
{
    phaseVisible_ = visible;
    if (analysis_)
        rebuild();
    else
        phaseAxis_->setVisible(visible);
}

void BodeChart::setHighlightedCorner(int index)
{
    highlighted_ = index;
    QList<QPointF> point;
    for (const auto& [corner, position] : markerPoints_)
        if (corner == index)
            point.append(position);
    highlightMarker_->replace(point);
    placeCornerLabels();
}

QList<double> BodeChart::sampleHz(double fromHz, double toHz) const
{
    std::vector<double> hz = tauline::logSpacedHz(fromHz, toHz, kCurvePoints);
    // A sharp resonance (a complex pair with a high Q) falls between evenly
    // spaced samples: add a dense run around it so the peak (or dip) is drawn
    // where it is. Real corners are smooth at this sampling.
    for (const auto& corner : analysis_->breakpoints) {
        if (!corner.q || *corner.q <= 0.7)
            continue;
        const double width = 0.25 / *corner.q;
        for (int k = -12; k <= 12; ++k) {
            const double f = corner.hz * std::pow(10.0, k * width / 12.0);
            if (f > fromHz && f < toHz)
                hz.push_back(f);
        }
    }
    std::sort(hz.begin(), hz.end());
    hz.erase(std::unique(hz.begin(), hz.end()), hz.end());
    return QList<double>(hz.begin(), hz.end());
}

void BodeChart::rebuild()
{
    if (!analysis_)
        return;
    const tauline::Analysis& a = *analysis_;
    rangeHz_ = userRange_ ? *userRange_ : reference_->coveringRange(tauline::suggestedRangeHz(a));
    const double lo = std::log10(rangeHz_.first);
    const double hi = std::log10(rangeHz_.second);

    const QList<double> hzList = sampleHz(rangeHz_.first, rangeHz_.second);
    const std::vector<SweepPoint> points =
        tauline::sweep(a, std::vector<double>(hzList.begin(), hzList.end()));
    QList<QPointF> exact;
    exact.reserve(points.size());
    for (const auto& p : points)
        exact.append({std::log10(p.hz), p.db});
    QList<QPointF> sketch;
    const std::vector<tauline::LowQPair> pairs = pairsAsOneCorner_ ? tauline::lowQPairs(a)
                                                                   : std::vector<tauline::LowQPair>{};
    for (const auto& v : tauline::sketchPolyline(a, pairs, rangeHz_.first, rangeHz_.second))
        sketch.append({std::log10(v.hz), v.db});

    QList<QPointF> reference = reference_->points(hzList);

    double yMin = std::numeric_limits<double>::infinity();
    double yMax = -yMin;
    for (const auto* list : {&exact, &sketch, &reference})
        for (const QPointF& p : *list)
            if (std::isfinite(p.y())) {
                yMin = std::min(yMin, p.y());
                yMax = std::max(yMax, p.y());
            }
    if (!std::isfinite(yMin)) {
        yMin = -20.0;
        yMax = 20.0;
    }
    yMin = std::max(yMin, yMax - kMaxMagnitudeSpanDb);
    const double pad = std::max(2.0, 0.06 * (yMax - yMin));
    const Ticks y = niceTicks(yMin - pad, yMax + pad, 9, decibelSteps());
    setTicks(magnitudeAxis_, y, y.step < 1.0 ? QStringLiteral("%.1f") : QStringLiteral("%.0f"));
    magnitudeAxis_->setTitleText(tr("Magnitude (%1)").arg(decibelUnit(a.kind)));

    rebuildFrequencyAxis(lo, hi);
    const QRectF box(QPointF(lo, y.lo), QPointF(hi, y.hi));
    setPieces(exact_, exactExtras_, clipPolyline(exact, box), magnitudeAxis_);
    setPieces(sketch_, sketchExtras_, clipPolyline(sketch, box), magnitudeAxis_);
    reference_->draw(reference, box);

    phase_->setVisible(phaseVisible_);
    phaseAxis_->setVisible(phaseVisible_);
    if (phaseVisible_) {
        const QList<QPointF> phase = unwrappedPhase(points);
        double pMin = 0.0;
        double pMax = 0.0;
        for (const QPointF& p : phase) {
            pMin = std::min(pMin, p.y());
            pMax = std::max(pMax, p.y());
        }
        const Ticks t = niceTicks(pMin, pMax, 9, {15.0, 30.0, 45.0, 90.0, 180.0, 360.0});
        setTicks(phaseAxis_, t, phaseAxis_->labelFormat());
        setPieces(phase_, phaseExtras_, clipPolyline(phase, QRectF(QPointF(lo, t.lo), QPointF(hi, t.hi))),
                  phaseAxis_);
    } else {
        setPieces(phase_, phaseExtras_, {}, phaseAxis_);
    }

    // Markers sit on the sketch, where its slope changes.
    markerPoints_.clear();
    QList<QPointF> poles;
    QList<QPointF> zeros;
    for (std::size_t i = 0; i < a.breakpoints.size(); ++i) {
        const auto& corner = a.breakpoints[i];
        const QPointF p(std::log10(corner.hz), tauline::sketchDb(a, pairs, corner.hz));
        if (pointsInside({p}, box).isEmpty())
            continue;
        markerPoints_.emplace_back(static_cast<int>(i), p);
        (corner.type == RootType::Pole ? poles : zeros).append(p);
    }
    poleMarkers_->replace(poles);
    zeroMarkers_->replace(zeros);

    // Minor grid at 2..9 times each decade: one series that runs up and down
    // the lines and along the plot frame between them.
    QList<QPointF> grid;
    bool up = true;
    for (int decade = static_cast<int>(std::floor(lo)); decade <= static_cast<int>(std::ceil(hi));
         ++decade)
        for (int m = 2; m <= 9; ++m) {
            const double x = decade + std::log10(static_cast<double>(m));
            if (x <= lo || x >= hi)
                continue;
            grid.append({x, up ? y.lo : y.hi});
            grid.append({x, up ? y.hi : y.lo});
            up = !up;
        }
    minorGrid_->replace(grid);

    setHighlightedCorner(highlighted_);
}

void BodeChart::keepReference()
{
    if (!analysis_)
        return;
    reference_->keep(*analysis_);
    rebuild();
}

void BodeChart::dismissReference()
{
    if (!reference_->isKept())
        return;
    reference_->dismiss();
    if (analysis_)
        rebuild();
}

bool BodeChart::hasReference() const
{
    return reference_->isKept();
}

void BodeChart::rebuildFrequencyAxis(double lo, double hi)
{
    // Relabelling makes Qt Charts lay the axis out again: only on a new range.
    if (lo == frequencyAxis_->min() && hi == frequencyAxis_->max()
        && !frequencyAxis_->categoriesLabels().isEmpty())
        return;
    for (const QString& label : frequencyAxis_->categoriesLabels())
        frequencyAxis_->remove(label);
    frequencyAxis_->setRange(lo, hi);
    frequencyAxis_->setStartValue(lo);
    // Decades always; 2 and 5 as well when fewer than two decades show.
    const bool dense = hi - lo < 2.0;
    QList<int> multiples = dense ? QList<int>{1, 2, 5} : QList<int>{1};
    for (int decade = static_cast<int>(std::floor(lo)); decade <= static_cast<int>(std::ceil(hi));
         ++decade)
        for (int m : multiples) {
            const double x = decade + std::log10(static_cast<double>(m));
            if (x < lo - 1e-9 || x > hi + 1e-9)
                continue;
            frequencyAxis_->append(axisFrequencyLabel(m * std::pow(10.0, decade)), x);
        }
}

void BodeChart::clearCurves()
{
    for (QLineSeries* s : {exact_, sketch_, phase_, minorGrid_})
        s->clear();
    for (auto* extras : {&exactExtras_, &sketchExtras_, &phaseExtras_}) {
        for (QLineSeries* s : *extras) {
            removeSeries(s);
            delete s;
        }
        extras->clear();
    }
    poleMarkers_->clear();
    zeroMarkers_->clear();
    highlightMarker_->clear();
    reference_->clear();
    markerPoints_.clear();
    phaseAxis_->setVisible(phaseVisible_);
}

void BodeChart::setPieces(QLineSeries* main, QList<QLineSeries*>& extras,
                          const QList<QList<QPointF>>& pieces, QValueAxis* yAxis)
{
    main->replace(pieces.isEmpty() ? QList<QPointF>{} : pieces.front());
    // A curve cut into several pieces by the axes needs one series per piece.
    while (extras.size() > std::max<qsizetype>(0, pieces.size() - 1)) {
        QLineSeries* s = extras.takeLast();
        removeSeries(s);
        delete s;
    }
    for (qsizetype i = 1; i < pieces.size(); ++i) {
        if (extras.size() < i) {
            auto* s = new QLineSeries(this);
            s->setPen(main->pen());
            addSeries(s);
            s->attachAxis(frequencyAxis_);
            s->attachAxis(yAxis);
            hideLegendMarker(this, s);
            extras.append(s);
        }
        extras[i - 1]->replace(pieces[i]);
        extras[i - 1]->setVisible(main->isVisible());
    }
}

void BodeChart::layOutNow()
{
    for (int pass = 0; pass < 3; ++pass) {
        if (layout())
            layout()->activate();
        QCoreApplication::sendPostedEvents(nullptr, QEvent::LayoutRequest);
        QCoreApplication::sendPostedEvents(this);
    }
    placeCornerLabels();
}

void BodeChart::placeCornerLabels()
{
    const QRectF area = plotArea();
    if (messageItem_->isVisible()) {
        const QRectF r = messageItem_->boundingRect();
        messageItem_->setPos(area.center() - QPointF(r.width() / 2, r.height() / 2));
    }
    // Label items are kept and reused: a value drag re-places them often.
    const qsizetype wanted = analysis_ && !area.isEmpty() ? static_cast<qsizetype>(markerPoints_.size()) : 0;
    while (labels_.size() > wanted)
        delete labels_.takeLast();
    while (labels_.size() < wanted) {
        auto* item = new QGraphicsSimpleTextItem(this);
        item->setZValue(15);
        labels_.append(item);
    }
    if (wanted == 0)
        return;

    // Markers are taken space too: a label must not cover another corner.
    QList<QRectF> taken;
    for (const auto& [index, point] : markerPoints_) {
        const QPointF at = mapToPosition(point, sketch_);
        const double half = index == highlighted_ ? 14 : 7;  // the ring is larger
        taken.append(QRectF(at - QPointF(half, half), QSizeF(2 * half, 2 * half)));
    }
    QFont font = legend()->font();
    font.setPointSizeF(8);
    for (std::size_t m = 0; m < markerPoints_.size(); ++m) {
        const auto& [index, point] = markerPoints_[m];
        const auto& corner = analysis_->breakpoints[index];
        QString text = frequencyText(corner.hz);
        if (corner.q)
            text += QStringLiteral("  Q %1").arg(QString::fromStdString(qualityFactorText(*corner.q)));
        QGraphicsSimpleTextItem* item = labels_[static_cast<qsizetype>(m)];
        item->setText(text);
        QFont itemFont = font;
        itemFont.setBold(index == highlighted_);
        item->setFont(itemFont);
        item->setBrush(corner.type == RootType::Pole ? QColor(0x6e, 0x1f, 0x17)
                                                     : QColor(0x1f, 0x5a, 0x38));
        const QRectF size = item->boundingRect();
        const QPointF at = mapToPosition(point, sketch_);
        // Pole labels above the sketch, zero labels below; step further away
        // while a label would cover one already placed.
        const double direction = corner.type == RootType::Pole ? -1.0 : 1.0;
        double x = std::clamp(at.x() - size.width() / 2, area.left() + 2,
                              area.right() - size.width() - 2);
        // Clear of the marker and of the ring that highlights it.
        const double gap = index == highlighted_ ? 14 : 8;
        double y = direction < 0 ? at.y() - size.height() - gap : at.y() + gap;
        QRectF rect(QPointF(x, y), size.size());
        for (int attempt = 0; attempt < 8; ++attempt) {
            const bool clash = std::any_of(taken.begin(), taken.end(),
                                           [&](const QRectF& r) { return r.intersects(rect); });
            if (!clash)
                break;
            rect.translate(0, direction * (size.height() + 1));
        }
        if (rect.top() < area.top())
            rect.moveTop(area.top() + 2);
        if (rect.bottom() > area.bottom())
            rect.moveBottom(area.bottom() - 2);
        item->setPos(rect.topLeft());
        taken.append(rect);
    }
}

}  // namespace tauline::ui
