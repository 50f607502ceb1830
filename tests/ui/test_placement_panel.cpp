// Placing a corner from the editor (the panel, a drag of a marker) and the
// sensitivity heat map, against closed forms of a small network.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "MainWindow.h"
#include "NetworkFile.h"
#include "NetworkTexts.h"
#include "PlacementPanel.h"
#include "SchematicDocument.h"
#include "SensitivityView.h"

#include <QComboBox>
#include <QLineEdit>
#include <QSignalSpy>
#include <QStandardPaths>
#include <QTableWidget>
#include <QTest>
#include <QUndoStack>
#include <QtCharts/QChartView>
#include <QtCharts/QLineSeries>

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace tauline::ui;

namespace {

// R1 = 4.7 kΩ in series with R2 = 10 kΩ ∥ C1 = 2.2 nF, the impedance at in.
// Common practice (no source): a pole at 1 / (2 pi R2 C1) (corner 1) and a
// zero at (R1 + R2) / (2 pi R1 R2 C1) (corner 2).
constexpr const char* kDivider = tauline::testing::kDividerImpedance;
constexpr double C1 = 2.2e-9;

double partValue(const SchematicDocument& document, const char* name)
{
    const auto part = document.part(QString::fromLatin1(name));
    return part ? part->value : 0.0;
}

struct TestSettings {
    TestSettings() { QStandardPaths::setTestModeEnabled(true); }
};

}  // namespace

TEST_CASE("Applying a placed value is one undo step, and undo restores the corner", "[ui][placement]")
{
    TestSettings settings;
    SchematicDocument document;
    document.loadNetwork(tauline::parseNetworkText(kDivider, "divider").network, nullptr);
    REQUIRE(document.hasResponse());
    PlacementPanel panel(&document);
    REQUIRE(panel.cornerBox()->count() == 2);

    panel.cornerBox()->setCurrentIndex(0);
    panel.partBox()->setCurrentIndex(panel.partBox()->findData(QStringLiteral("R2")));
    panel.targetEdit()->setText(QStringLiteral("5k"));
    REQUIRE(panel.solve());
    REQUIRE(panel.placement());
    const double exact = 1.0 / (2.0 * std::numbers::pi * 5000.0 * C1);
    CHECK(panel.placement()->value == Approx(exact).epsilon(1e-10));
    // Exact, then the E-series neighbours 13 k and 15 k (IEC 60063:2015, E24).
    REQUIRE(panel.results()->rowCount() >= 3);

    const int before = document.undoStack()->count();
    panel.applyRow(0);
    CHECK(document.undoStack()->count() == before + 1);
    // Applied with six significant digits: 14.4686 kΩ.
    CHECK(partValue(document, "R2") == Approx(exact).epsilon(5e-6));
    CHECK(document.part(QStringLiteral("R2"))->valueText == "14.4686 k\u03A9");
    const auto placed = tauline::analyze(document.network());
    CHECK(std::abs(placed.breakpoints[0].hz / 5000.0 - 1.0) < 5e-6);

    document.undoStack()->undo();
    CHECK(partValue(document, "R2") == 10e3);
    const auto restored = tauline::analyze(document.network());
    CHECK(restored.breakpoints[0].hz == Approx(1.0 / (2.0 * std::numbers::pi * 10e3 * C1)).epsilon(1e-9));

    // A series value: the same, one step.
    REQUIRE(panel.solve());
    panel.applyRow(2);
    CHECK(partValue(document, "R2") == 15e3);
    CHECK(document.undoStack()->count() == before + 1);  // the undone step was replaced
    document.undoStack()->undo();
    CHECK(partValue(document, "R2") == 10e3);
}

TEST_CASE("An unreachable target is refused with the reason", "[ui][placement]")
{
    TestSettings settings;
    SchematicDocument document;
    document.loadNetwork(tauline::parseNetworkText(kDivider, "divider").network, nullptr);
    PlacementPanel panel(&document);
    // The zero falls towards the pole, 7.234 kHz, as R1 grows, never below.
    panel.cornerBox()->setCurrentIndex(1);
    panel.partBox()->setCurrentIndex(panel.partBox()->findData(QStringLiteral("R1")));
    panel.targetEdit()->setText(QStringLiteral("5k"));
    CHECK_FALSE(panel.solve());
    CHECK(panel.message().contains(QStringLiteral("7.234 kHz")));
    CHECK(panel.results()->rowCount() == 0);
    const int before = document.undoStack()->count();
    panel.applyRow(0);
    CHECK(document.undoStack()->count() == before);
}

TEST_CASE("The heat map shows every corner against every part", "[ui][sensitivity]")
{
    TestSettings settings;
    SchematicDocument document;
    document.loadNetwork(tauline::parseNetworkText(kDivider, "divider").network, nullptr);
    SensitivityView view(&document);
    view.refresh();
    QTableWidget* table = view.table();
    REQUIRE(table->rowCount() == 2);
    REQUIRE(table->columnCount() == 3);
    auto valueAt = [&](int row, const QString& part) {
        for (int c = 0; c < table->columnCount(); ++c)
            if (table->horizontalHeaderItem(c)->text() == part)
                return table->item(row, c)->data(SensitivityView::ValueRole).toDouble();
        return 99.0;
    };
    // Pole 1 / (2 pi R2 C1): -1 for R2 and C1, 0 for R1. Zero
    // (R1 + R2) / (2 pi R1 R2 C1): -R2/(R1+R2) for R1, -R1/(R1+R2) for R2.
    CHECK(valueAt(0, QStringLiteral("R2")) == Approx(-1.0).margin(1e-12));
    CHECK(valueAt(0, QStringLiteral("C1")) == Approx(-1.0).margin(1e-12));
    CHECK(valueAt(0, QStringLiteral("R1")) == 0.0);
    CHECK(valueAt(1, QStringLiteral("R1")) == Approx(-10.0 / 14.7).margin(1e-12));
    CHECK(valueAt(1, QStringLiteral("R2")) == Approx(-4.7 / 14.7).margin(1e-12));
    // Signed colours: blue for negative, red for positive, white at 0.
    CHECK(sensitivityColor(-1.0).blue() > sensitivityColor(-1.0).red());
    CHECK(sensitivityColor(1.0).red() > sensitivityColor(1.0).blue());
    CHECK(sensitivityColor(0.0) == QColor(Qt::white));

    QSignalSpy spy(&view, &SensitivityView::placeRequested);
    emit table->cellDoubleClicked(1, 0);
    REQUIRE(spy.count() == 1);
    CHECK(spy.at(0).at(0).toInt() == 1);
}

TEST_CASE("Dragging a corner's marker asks to place it there", "[ui][placement]")
{
    TestSettings settings;
    MainWindow window;
    window.document()->loadNetwork(tauline::parseNetworkText(kDivider, "divider").network, nullptr);
    window.resize(1200, 800);
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    window.analyseNow();
    REQUIRE(QTest::qWaitFor([&] { return !window.isAnalysisPending(); }, 20000));
    BodeChart* chart = window.plot()->chart();
    chart->layOutNow();
    REQUIRE(chart->analysis());
    const auto& a = *chart->analysis();
    const double hz = a.breakpoints[0].hz;
    const QPointF marker =
        chart->mapToPosition(QPointF(std::log10(hz), tauline::sketchDb(a, hz)), chart->sketchSeries());
    QChartView* view = window.plot()->chartView();
    const QPoint at = view->mapFromScene(chart->mapToScene(marker));
    REQUIRE(chart->cornerAt(chart->mapToScene(marker)) == 0);

    QSignalSpy spy(chart, &BodeChart::cornerDragged);
    QTest::mousePress(view->viewport(), Qt::LeftButton, {}, at);
    QTest::mouseMove(view->viewport(), at + QPoint(20, 0));
    QTest::mouseMove(view->viewport(), at + QPoint(60, 0));
    QTest::mouseRelease(view->viewport(), Qt::LeftButton, {}, at + QPoint(60, 0));
    REQUIRE(spy.count() == 1);
    CHECK(spy.at(0).at(0).toInt() == 0);
    const double target = spy.at(0).at(1).toDouble();
    CHECK(target > hz);

    // The window's panel took the request and solved it with the part the
    // corner is most sensitive to.
    auto* panel = window.findChild<PlacementPanel*>();
    REQUIRE(panel);
    REQUIRE(panel->placement());
    CHECK(panel->placement()->targetHz == Approx(target).epsilon(1e-3));
    CHECK(std::abs(panel->placement()->hz / panel->placement()->targetHz - 1.0) < 1e-9);
    REQUIRE(panel->results()->rowCount() >= 2);

    // The corner table's menu asks for the same panel.
    emit window.cornerTable()->placementRequested(1);
    CHECK(panel->cornerBox()->currentIndex() == 1);
}
