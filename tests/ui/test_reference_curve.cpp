// The kept reference curve on the Bode chart: it keeps the old network's
// exact magnitude through new analyses, range changes and messages, and
// goes only when dismissed.
#include "BodeChart.h"
#include "Analysis.h"
#include "ReferenceCurve.h"
#include "ReferenceCurveActions.h"
#include "PlotExport.h"
#include "ReferenceCurvePoints.h"

#include <QAction>
#include <QGraphicsScene>
#include <QtCharts/QLineSeries>

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace tauline::ui;
using tauline::testing::referencePoints;

namespace {

tauline::Network rcPort(double r, double c)
{
    tauline::Network n;
    n.parts.push_back({"R1", tauline::PartKind::Resistor, r, "", {"p", "gnd"}, {}});
    n.parts.push_back({"C1", tauline::PartKind::Capacitor, c, "", {"p", "gnd"}, {}});
    n.response = {tauline::ResponseKind::Impedance, {"p", "gnd"}, {"p", "gnd"}};
    return n;
}

// |Z| of R ∥ C in dB-ohm at f: R / sqrt(1 + (2π f R C)²) (common practice,
// no source), the curve the reference must still draw.
double parallelRcDb(double r, double c, double hz)
{
    const double x = 2.0 * std::numbers::pi * hz * r * c;
    return 20.0 * std::log10(r / std::sqrt(1.0 + x * x));
}

}  // namespace

TEST_CASE("A kept reference curve survives edits, ranges and messages until dismissed", "[plot][reference]")
{
    QGraphicsScene scene;
    auto* chart = new BodeChart;
    scene.addItem(chart);
    chart->setGeometry(QRectF(0, 0, 800, 500));
    const tauline::Analysis before = tauline::analyze(rcPort(10e3, 2.2e-9));
    chart->setAnalysis(before);
    CHECK(!chart->hasReference());
    CHECK(referencePoints(*chart).isEmpty());

    ReferenceCurveActions actions(chart, nullptr);
    CHECK(!actions.dismissAction()->isEnabled());
    actions.keepAction()->trigger();
    REQUIRE(chart->hasReference());
    CHECK(actions.dismissAction()->isEnabled());
    // Kept: the same curve as the exact one, point for point.
    CHECK(referencePoints(*chart) == chart->exactSeries()->points());

    // An edit: R1 from 10 k to 47 k. The reference still draws the old network.
    const tauline::Analysis after = tauline::analyze(rcPort(47e3, 2.2e-9));
    chart->setAnalysis(after);
    auto requireOldCurve = [&] {
        const QList<QPointF> points = referencePoints(*chart);
        REQUIRE(points.size() > 100);
        for (const QPointF& p : points)
            REQUIRE(p.y() == Approx(parallelRcDb(10e3, 2.2e-9, std::pow(10.0, p.x()))).margin(1e-6));
        // ...and the current curve is the new one, not the kept one.
        const QPointF last = chart->exactSeries()->points().back();
        CHECK(last.y() == Approx(parallelRcDb(47e3, 2.2e-9, std::pow(10.0, last.x()))).margin(1e-6));
    };
    requireOldCurve();
    CHECK(chart->reference()->series().front()->isVisible());

    // The range follows both networks' corners: 1/(2π·10k·2.2n) = 7.2 kHz
    // and 1/(2π·47k·2.2n) = 1.5 kHz lie inside.
    CHECK(chart->rangeHz().first < 1.5e3);
    CHECK(chart->rangeHz().second > 7.2e3);

    // A chosen range, a message (the drawing cannot be analysed for a
    // moment), then a curve again: still kept and redrawn.
    chart->setUserRange(std::make_pair(10.0, 1e6));
    requireOldCurve();
    CHECK(std::pow(10.0, referencePoints(*chart).front().x()) == Approx(10.0));
    chart->showMessage(QStringLiteral("No response to plot yet."));
    CHECK(chart->hasReference());
    CHECK(referencePoints(*chart).isEmpty());
    chart->setAnalysis(after);
    requireOldCurve();

    actions.dismissAction()->trigger();
    CHECK(!chart->hasReference());
    CHECK(!actions.dismissAction()->isEnabled());
    CHECK(referencePoints(*chart).isEmpty());
    for (QLineSeries* s : chart->reference()->series())
        CHECK(s->points().isEmpty());
}

TEST_CASE("An exported plot carries the kept reference curve", "[plot][reference][export]")
{
    QGraphicsScene scene;
    auto* chart = new BodeChart;
    scene.addItem(chart);
    chart->setGeometry(QRectF(0, 0, 800, 500));
    chart->setAnalysis(tauline::analyze(rcPort(10e3, 2.2e-9)));
    const QByteArray colour = ReferenceCurve::color().name().toLatin1();  // "#8c949e"

    const QByteArray without = plotSvg(snapshotOf(*chart, QStringLiteral("RC")));
    CHECK(!without.contains(colour));

    chart->keepReference();
    chart->setAnalysis(tauline::analyze(rcPort(47e3, 2.2e-9)));
    const PlotSnapshot snapshot = snapshotOf(*chart, QStringLiteral("RC"));
    REQUIRE(snapshot.reference.has_value());
    CHECK(snapshot.reference->breakpoints.front().hz == Approx(1.0 / (2.0 * std::numbers::pi * 10e3 * 2.2e-9)));
    CHECK(plotSvg(snapshot).contains(colour));
}
