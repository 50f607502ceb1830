// The editor window as a whole: a network opened from a file, edited through
// the document, the inspector and the corner table, and what the plot and
// tables show after each step compared with the engine run on its own.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "Inspector.h"
#include "MainWindow.h"
#include "NetworkFile.h"
#include "PartItem.h"
#include "QuantityText.h"
#include "SchematicDocument.h"
#include "SchematicScene.h"
#include "TimeConstantTable.h"

#include <QImage>
#include <QLabel>
#include <QPixmap>
#include <QScreen>
#include <QLineEdit>
#include <QStandardPaths>
#include <QTest>
#include <QUndoStack>
#include <QtCharts/QLineSeries>

#include <catch2/catch.hpp>

#include <cmath>

using namespace tauline::ui;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

// Waits until the window shows the analysis of the drawing as it is now.
bool settle(MainWindow& window, bool withSensitivities = false)
{
    return QTest::qWaitFor(
        [&] {
            return !window.isAnalysisPending()
                   && (!withSensitivities
                       || window.shownSensitivityGeneration() == window.shownGeneration());
        },
        20000);
}

// The corner table against an analysis: same count, types and frequencies.
void requireTableShows(const CornerTable& table, const tauline::Analysis& a)
{
    REQUIRE(table.rowCount() == static_cast<int>(a.breakpoints.size()));
    for (int row = 0; row < table.rowCount(); ++row) {
        const double shown = table.item(row, CornerTable::FrequencyColumn)->data(CornerTable::HzRole).toDouble();
        CHECK(shown == Approx(a.breakpoints[row].hz).epsilon(1e-9));
        CHECK(table.item(row, CornerTable::TypeColumn)->text().startsWith(
            a.breakpoints[row].type == tauline::RootType::Pole ? QStringLiteral("pole")
                                                               : QStringLiteral("zero")));
    }
}

tauline::Network withValue(tauline::Network network, const std::string& part, double value)
{
    for (auto& p : network.parts)
        if (p.name == part)
            p.value = value;
    return network;
}

struct TestSettings {
    TestSettings() { QStandardPaths::setTestModeEnabled(true); }
};

}  // namespace

TEST_CASE("The window shows the engine's corners for a network opened from a file", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window, true));

    const tauline::Analysis expected = tauline::analyze(tauline::readNetworkFile(kSample).network);
    requireTableShows(*window.cornerTable(), expected);
    CHECK(window.timeConstantTable()->topLevelItemCount() == static_cast<int>(expected.timeConstants.size()));
    // The plot draws the same response.
    const auto points = window.plot()->chart()->exactSeries()->points();
    REQUIRE(!points.isEmpty());
    for (const QPointF& p : points)
        REQUIRE(p.y() == Approx(20.0 * std::log10(std::abs(expected.atHz(std::pow(10.0, p.x()))))).margin(1e-6));
    // Every corner has the parts that set it.
    for (int row = 0; row < window.cornerTable()->rowCount(); ++row)
        CHECK(!window.cornerTable()->partsForCorner(row).isEmpty());
    CHECK(window.windowTitle().contains(QStringLiteral("strain-gauge-input-filter.tauline")));
}

TEST_CASE("A result overtaken by a newer edit is never shown", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    window.runner()->setInlineLimit(0);  // every analysis on the worker

    std::vector<quint64> delivered;
    QObject::connect(window.runner(), &AnalysisRunner::analysisReady,
                     [&](std::shared_ptr<const AnalysisOutcome> o) { delivered.push_back(o->generation); });
    window.document()->setPartValue(QStringLiteral("R2"), 22e3, QStringLiteral("22k"));
    window.analyseNow();
    const quint64 first = window.runner()->generation();
    window.document()->setPartValue(QStringLiteral("R2"), 100e3, QStringLiteral("100k"));
    window.analyseNow();
    const quint64 last = window.runner()->generation();
    REQUIRE(last > first);
    REQUIRE(settle(window));

    CHECK(delivered == std::vector<quint64>{last});
    CHECK(window.shownGeneration() == last);
    const auto network = tauline::readNetworkFile(kSample).network;
    requireTableShows(*window.cornerTable(), tauline::analyze(withValue(network, "R2", 100e3)));
}

TEST_CASE("Dragging a value moves the corners to where the engine puts them", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    const int undoSteps = window.document()->undoStack()->count();
    const auto network = tauline::readNetworkFile(kSample).network;

    window.document()->beginValueDrag(QStringLiteral("C1"));
    for (double value : {270e-9, 330e-9, 390e-9}) {
        window.document()->dragValue(QStringLiteral("C1"), value);
        REQUIRE(settle(window));
        // Live while dragging: the table follows every step.
        requireTableShows(*window.cornerTable(), tauline::analyze(withValue(network, "C1", value)));
    }
    window.document()->endValueDrag();
    CHECK(window.document()->undoStack()->count() == undoSteps + 1);

    window.document()->undoStack()->undo();
    REQUIRE(settle(window));
    requireTableShows(*window.cornerTable(), tauline::analyze(network));
}

TEST_CASE("Selecting a corner marks it on the plot and its parts on the canvas", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window, true));
    CornerTable* table = window.cornerTable();
    REQUIRE(table->rowCount() > 1);

    table->selectCorner(1);
    CHECK(window.plot()->chart()->highlightedCorner() == 1);
    const QStringList parts = table->partsForCorner(1);
    REQUIRE(!parts.isEmpty());
    for (PartItem* item : window.document()->scene()->parts())
        CHECK(item->isHighlighted() == parts.contains(item->name()));

    table->selectCorner(-1);
    CHECK(window.plot()->chart()->highlightedCorner() == -1);
    for (PartItem* item : window.document()->scene()->parts())
        CHECK(!item->isHighlighted());
}

TEST_CASE("A value typed in the inspector is applied, a bad one is shown in place", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    Inspector* inspector = window.inspector();
    inspector->showPart(QStringLiteral("R2"));
    QLineEdit* edit = inspector->valueEdit();

    edit->selectAll();
    QTest::keyClicks(edit, QStringLiteral("4k7x"));
    QTest::keyClick(edit, Qt::Key_Return);
    CHECK(!inspector->valueError().isEmpty());
    CHECK(inspector->valueError().contains(QStringLiteral("4k7x")));
    CHECK(window.document()->part(QStringLiteral("R2"))->value == 47e3);

    edit->selectAll();
    QTest::keyClicks(edit, QStringLiteral("22k"));
    QTest::keyClick(edit, Qt::Key_Return);
    CHECK(inspector->valueError().isEmpty());
    CHECK(window.document()->part(QStringLiteral("R2"))->value == 22e3);
    REQUIRE(settle(window));
    const auto network = tauline::readNetworkFile(kSample).network;
    requireTableShows(*window.cornerTable(), tauline::analyze(withValue(network, "R2", 22e3)));
}

TEST_CASE("A drawing without a response says so instead of plotting", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    tauline::Network network = tauline::readNetworkFile(kSample).network;
    network.response = {};
    window.document()->loadNetwork(network, nullptr);
    REQUIRE(settle(window));
    CHECK(!window.plot()->chart()->analysis());
    CHECK(!window.plot()->chart()->message().isEmpty());
    CHECK(window.cornerTable()->rowCount() == 0);
    CHECK(window.timeConstantTable()->topLevelItemCount() == 0);
    CHECK(!window.statusText().isEmpty());
}

TEST_CASE("The caution banner shows for mains and snubber networks", "[main-window]")
{
    TestSettings settings;
    MainWindow window;
    tauline::Network network = tauline::readNetworkFile(kSample).network;
    window.document()->loadNetwork(network, nullptr);
    CHECK(!window.cautionBanner()->isVisibleTo(&window));

    network.title = "RC snubber across a mains relay contact";
    window.document()->loadNetwork(network, nullptr);
    CHECK(window.cautionBanner()->isVisibleTo(&window));
    CHECK(window.cautionBanner()->text().contains(QStringLiteral("no voltage or power rating")));
}

TEST_CASE("After a value edit the screen matches the window painted afresh", "[main-window][repaint]")
{
    // The views repaint only what an edit changed (the canvas around the
    // edited part, the plot, the number cells): nothing left stale may show.
    TestSettings settings;
    MainWindow window;
    window.resize(1280, 800);
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    window.show();
    REQUIRE(QTest::qWaitForWindowExposed(&window));
    REQUIRE(settle(window, true));
    // One part's second-order constants open, so they are on screen too.
    TimeConstantTable* constants = window.timeConstantTable();
    REQUIRE(constants->topLevelItemCount() > 0);
    constants->topLevelItem(0)->setExpanded(true);

    auto screenMatches = [&window] {
        QTest::qWait(50);
        const QImage onScreen = window.screen()->grabWindow(window.winId()).toImage().convertToFormat(QImage::Format_RGB32);
        const QImage fresh = window.grab().toImage().convertToFormat(QImage::Format_RGB32);
        return !onScreen.isNull() && onScreen == fresh;
    };
    CHECK(screenMatches());
    const QString factoredBefore = constants->factoredLabel()->text();
    for (double value : {22e3, 100e3}) {
        window.document()->setPartValue(QStringLiteral("R2"), value, QString());
        REQUIRE(settle(window));
        CHECK(screenMatches());
        REQUIRE(settle(window, true));
        CHECK(screenMatches());
    }
    // The open part's second-order constants follow the edit.
    const auto network = withValue(tauline::readNetworkFile(kSample).network, "R2", 100e3);
    const tauline::Analysis a = tauline::analyze(network);
    const QTreeWidgetItem* row = constants->topLevelItem(0);
    std::vector<const tauline::PairTimeConstant*> pairs;
    for (const auto& pair : a.pairTimeConstants)
        if (pair.element == a.timeConstants[0].element)
            pairs.push_back(&pair);
    REQUIRE(row->childCount() == static_cast<int>(pairs.size()));
    for (int k = 0; k < row->childCount(); ++k) {
        CHECK(row->child(k)->text(TimeConstantTable::PartColumn).contains(QString::fromStdString(pairs[k]->shorted)));
        CHECK(row->child(k)->text(TimeConstantTable::TauColumn) == secondsText(pairs[k]->tau));
        CHECK(row->child(k)->text(TimeConstantTable::ResistanceColumn) == ohmsText(pairs[k]->r));
    }
    // The factored form follows too, all of it within its scrolling pane.
    FactoredFormText* factored = constants->factoredLabel();
    CHECK(factored->text() != factoredBefore);
    CHECK(factored->text().startsWith(QStringLiteral("H(s) = ")));
    CHECK(factored->height() >= factored->heightForWidth(factored->width()));
}
