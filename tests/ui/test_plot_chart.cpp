// The Bode chart against the engine it draws: every point of the exact
// curve, the sketch's vertices, the corner markers, the decade labels and
// the clipping of every series to the axes.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "NetworkFile.h"
#include "PolylineClip.h"
#include "QuantityText.h"

#include <QGraphicsScene>
#include <QTest>
#include <QtCharts/QChartView>
#include <QGraphicsSimpleTextItem>
#include <QtCharts/QCategoryAxis>
#include <QtCharts/QLineSeries>
#include <QtCharts/QScatterSeries>
#include <QtCharts/QValueAxis>

#include <catch2/catch.hpp>

#include <cmath>

using tauline::ui::BodeChart;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

tauline::Analysis analysisOf(const char* text)
{
    return tauline::analyze(tauline::parseNetworkText(text, "test network").network);
}

tauline::Analysis sampleAnalysis()
{
    return tauline::analyze(tauline::readNetworkFile(kSample).network);
}

// A 10 kΩ resistor across 2.2 nF, seen from its terminals.
const char* const kParallelRc = R"({
  "format": "tauline-network", "version": 1, "title": "parallel RC",
  "parts": [
    {"name": "R1", "kind": "resistor",  "value": "10k",  "nodes": ["p", "gnd"]},
    {"name": "C1", "kind": "capacitor", "value": "2n2",  "nodes": ["p", "gnd"]}
  ],
  "response": {"kind": "impedance", "port": ["p", "gnd"]}
})";

// A chart in a scene at a fixed size, laid out, as on screen or in export.
struct LaidOutChart {
    QGraphicsScene scene;
    BodeChart* chart = new BodeChart;
    LaidOutChart()
    {
        scene.addItem(chart);
        chart->setGeometry(QRectF(0, 0, 900, 600));
    }
    void show(const tauline::Analysis& a)
    {
        chart->setAnalysis(a);
        chart->layOutNow();
    }
};

QValueAxis* magnitudeAxis(const BodeChart& chart)
{
    return qobject_cast<QValueAxis*>(chart.exactSeries()->attachedAxes().at(1));
}

QCategoryAxis* frequencyAxis(const BodeChart& chart)
{
    return qobject_cast<QCategoryAxis*>(chart.axes(Qt::Horizontal).front());
}

}  // namespace

TEST_CASE("The plot's exact curve is the engine's response at each of its points", "[plot]")
{
    const tauline::Analysis a = sampleAnalysis();
    BodeChart chart;
    chart.setAnalysis(a);
    const QList<QPointF> points = chart.exactSeries()->points();
    REQUIRE(points.size() >= 400);
    for (const QPointF& p : points) {
        const double hz = std::pow(10.0, p.x());
        const double db = 20.0 * std::log10(std::abs(a.atHz(hz)));
        REQUIRE(p.y() == Approx(db).margin(1e-9));
    }
    // The curve spans the whole axis, low to high.
    const auto [lo, hi] = chart.rangeHz();
    CHECK(points.front().x() == Approx(std::log10(lo)));
    CHECK(points.back().x() == Approx(std::log10(hi)));
    for (qsizetype i = 1; i < points.size(); ++i)
        REQUIRE(points[i].x() > points[i - 1].x());
}

TEST_CASE("The plot's range covers every corner with a decade to spare", "[plot]")
{
    const tauline::Analysis a = sampleAnalysis();
    REQUIRE(a.breakpoints.size() >= 3);
    BodeChart chart;
    chart.setAnalysis(a);
    const auto [lo, hi] = chart.rangeHz();
    for (const auto& corner : a.breakpoints) {
        CHECK(corner.hz / lo >= 10.0 * (1 - 1e-9));
        CHECK(hi / corner.hz >= 10.0 * (1 - 1e-9));
    }
}

TEST_CASE("The sketch is drawn through the engine's vertices and every corner is marked", "[plot]")
{
    const tauline::Analysis a = sampleAnalysis();
    LaidOutChart laidOut;
    laidOut.show(a);
    const BodeChart& chart = *laidOut.chart;
    const auto [lo, hi] = chart.rangeHz();

    const QList<QPointF> sketch = chart.sketchSeries()->points();
    const auto vertices = tauline::sketchPolyline(a, lo, hi);
    REQUIRE(sketch.size() == static_cast<qsizetype>(vertices.size()));
    for (std::size_t i = 0; i < vertices.size(); ++i) {
        CHECK(sketch[i].x() == Approx(std::log10(vertices[i].hz)));
        CHECK(sketch[i].y() == Approx(vertices[i].db).margin(1e-9));
    }

    int poles = 0;
    int zeros = 0;
    QStringList labels;
    for (auto* label : chart.cornerLabels()) {
        labels << label->text();
        // Labels stay inside the plot, clear of the axes.
        CHECK(chart.plotArea().contains(label->mapRectToParent(label->boundingRect())));
    }
    CHECK(labels.size() == static_cast<qsizetype>(a.breakpoints.size()));
    for (const auto& corner : a.breakpoints) {
        (corner.type == tauline::RootType::Pole ? poles : zeros)++;
        const QPointF expected(std::log10(corner.hz), tauline::sketchDb(a, corner.hz));
        const QList<QPointF> markers = corner.type == tauline::RootType::Pole
                                           ? chart.poleSeries()->points()
                                           : chart.zeroSeries()->points();
        const bool found = std::any_of(markers.begin(), markers.end(), [&](const QPointF& m) {
            return std::abs(m.x() - expected.x()) < 1e-12 && std::abs(m.y() - expected.y()) < 1e-9;
        });
        CHECK(found);
        CHECK(std::any_of(labels.begin(), labels.end(), [&](const QString& text) {
            return text.startsWith(tauline::ui::frequencyText(corner.hz));
        }));
    }
    CHECK(chart.poleSeries()->count() == poles);
    CHECK(chart.zeroSeries()->count() == zeros);
}

TEST_CASE("A single real pole lies 3.01 dB below its asymptotes at the corner", "[plot]")
{
    // from memory: |1/(1 + j)| = 1/sqrt(2), i.e. -20 log10(sqrt 2) = -3.0103 dB
    // below the straight-line sketch at the corner of a first-order pole.
    const tauline::Analysis a = analysisOf(kParallelRc);
    REQUIRE(a.breakpoints.size() == 1);
    BodeChart chart;
    chart.setAnalysis(a);
    const double corner = 1.0 / (2.0 * M_PI * 10e3 * 2.2e-9);  // 1/(2 pi R C), 7.234 kHz
    CHECK(a.breakpoints.front().hz == Approx(corner).epsilon(1e-9));
    const auto reading = chart.readingAt(corner);
    REQUIRE(reading);
    CHECK(reading->sketchDb == Approx(80.0).margin(1e-9));  // 20 log10(10 kΩ)
    CHECK(reading->exactDb - reading->sketchDb == Approx(-3.0103).margin(1e-4));
    CHECK(reading->phaseDeg == Approx(-45.0).margin(1e-9));
    // An impedance is plotted in dB relative to 1 Ω.
    CHECK(magnitudeAxis(chart)->titleText().contains(QStringLiteral("dBΩ")));
}

TEST_CASE("The frequency axis is labelled on the decades with SI prefixes", "[plot]")
{
    BodeChart chart;
    chart.setUserRange(std::make_pair(10.0, 1e6));
    chart.setAnalysis(analysisOf(kParallelRc));
    const QStringList labels = frequencyAxis(chart)->categoriesLabels();
    CHECK(labels == QStringList({"10", "100", "1 k", "10 k", "100 k", "1 M"}));
    const QCategoryAxis* axis = frequencyAxis(chart);
    CHECK(axis->endValue(QStringLiteral("1 k")) == Approx(3.0));
    CHECK(axis->endValue(QStringLiteral("1 M")) == Approx(6.0));
}

TEST_CASE("Every series is clipped to the axes before it is drawn", "[plot]")
{
    const tauline::Analysis a = sampleAnalysis();
    BodeChart chart;
    chart.setPhaseVisible(true);
    // A range that cuts through the corners: the sketch and markers outside
    // it must not reach the chart at all.
    const double mid = a.breakpoints[a.breakpoints.size() / 2].hz;
    chart.setUserRange(std::make_pair(mid / 3.0, mid * 3.0));
    chart.setAnalysis(a);
    const double lo = std::log10(mid / 3.0);
    const double hi = std::log10(mid * 3.0);
    for (QAbstractSeries* series : chart.series()) {
        auto* xy = qobject_cast<QXYSeries*>(series);
        REQUIRE(xy);
        const auto* y = qobject_cast<QValueAxis*>(xy->attachedAxes().at(1));
        for (const QPointF& p : xy->points()) {
            CHECK(p.x() >= lo - 1e-12);
            CHECK(p.x() <= hi + 1e-12);
            CHECK(p.y() >= y->min() - 1e-9);
            CHECK(p.y() <= y->max() + 1e-9);
        }
    }
    CHECK(chart.sketchSeries()->points().front().x() == Approx(lo));
    CHECK(chart.sketchSeries()->points().back().x() == Approx(hi));
}

TEST_CASE("A polyline that leaves the box comes back as separate pieces", "[plot]")
{
    const QRectF box(QPointF(0, 0), QPointF(10, 10));
    const QList<QPointF> line = {{-5, 5}, {5, 5}, {5, 15}, {8, 5}, {12, 5}};
    const auto pieces = tauline::ui::clipPolyline(line, box);
    REQUIRE(pieces.size() == 2);
    CHECK(pieces[0].front() == QPointF(0, 5));
    CHECK(pieces[0].back() == QPointF(5, 10));
    CHECK(pieces[1].front().y() == Approx(10.0));
    CHECK(pieces[1].back() == QPointF(10, 5));
    CHECK(tauline::ui::clipPolyline({{20, 20}, {30, 30}}, box).isEmpty());
}

TEST_CASE("The readout reads the curves at a frequency and phase is shown on request", "[plot]")
{
    const tauline::Analysis a = analysisOf(kParallelRc);
    BodeChart chart;
    chart.setAnalysis(a);
    CHECK(chart.phaseSeries()->points().isEmpty());
    chart.setPhaseVisible(true);
    const QList<QPointF> phase = chart.phaseSeries()->points();
    REQUIRE(!phase.isEmpty());
    for (const QPointF& p : phase) {
        const double deg = std::arg(a.atHz(std::pow(10.0, p.x()))) * 180.0 / M_PI;
        REQUIRE(p.y() == Approx(deg).margin(1e-9));
    }
}

TEST_CASE("Without an analysis the chart says why and draws no curve", "[plot]")
{
    BodeChart chart;
    chart.setAnalysis(analysisOf(kParallelRc));
    chart.showMessage(QStringLiteral("No response marker yet"));
    CHECK(chart.message() == QStringLiteral("No response marker yet"));
    CHECK(chart.exactSeries()->points().isEmpty());
    CHECK(chart.poleSeries()->points().isEmpty());
    CHECK(!chart.analysis());
}

TEST_CASE("The readout under the mouse shows the frequency and both curves", "[plot]")
{
    tauline::ui::BodePlotView view;
    view.resize(800, 500);
    view.setAnalysis(analysisOf(kParallelRc));
    view.show();
    QTest::qWait(50);
    view.chart()->layOutNow();
    // The middle of the plot area, in view coordinates.
    const QRectF area = view.chart()->plotArea();
    const QPoint at = view.chartView()->mapFromScene(view.chart()->mapToScene(area.center()));
    QTest::mouseMove(view.chartView()->viewport(), at);
    const QString text = view.readoutText();
    CHECK(text.startsWith(QStringLiteral("f = ")));
    CHECK(text.count(QStringLiteral("dBΩ")) == 2);
    // The frequency read is the one under the mouse (at its whole pixel).
    const QPointF local = view.chart()->mapFromScene(view.chartView()->mapToScene(at));
    const double hz = std::pow(10.0, view.chart()->mapToValue(local, view.chart()->exactSeries()).x());
    CHECK(text.contains(tauline::ui::frequencyText(hz)));
}
