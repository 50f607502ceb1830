// The review features in the editor window: keeping the curve as a
// reference across an edit, copying the corner table as CSV and Markdown,
// and the review page of what the window shows.
#include "BodeChart.h"
#include "BodePlotView.h"
#include "CornerTable.h"
#include "MainWindow.h"
#include "NetworkFile.h"
#include "ReferenceCurve.h"
#include "ReferenceCurvePoints.h"
#include "ReviewPage.h"
#include "ReviewPageExport.h"
#include "SchematicDocument.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QStandardPaths>
#include <QTest>
#include <QUndoStack>
#include <QXmlStreamReader>
#include <QtCharts/QLineSeries>

#include <catch2/catch.hpp>

#include <cmath>
#include <cstdlib>

using namespace tauline::ui;
using tauline::testing::referencePoints;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

bool settle(MainWindow& window)
{
    return QTest::qWaitFor(
        [&] {
            return !window.isAnalysisPending()
                   && window.shownSensitivityGeneration() == window.shownGeneration();
        },
        20000);
}

QAction* action(const MainWindow& window, const char* name)
{
    auto* found = window.findChild<QAction*>(QString::fromLatin1(name));
    REQUIRE(found);
    return found;
}

double exactDb(const tauline::Analysis& a, double x)
{
    return 20.0 * std::log10(std::abs(a.atHz(std::pow(10.0, x))));
}

struct TestSettings {
    TestSettings() { QStandardPaths::setTestModeEnabled(true); }
};

}  // namespace

TEST_CASE("Keep as reference: the old curve stays through an edit until dismissed", "[main-window][reference]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    BodeChart& chart = *window.plot()->chart();
    const tauline::Network network = tauline::readNetworkFile(kSample).network;
    const tauline::Analysis before = tauline::analyze(network);

    QAction* keep = action(window, "keepReferenceAction");
    QAction* dismiss = action(window, "dismissReferenceAction");
    CHECK(!dismiss->isEnabled());
    keep->trigger();
    REQUIRE(chart.hasReference());
    CHECK(dismiss->isEnabled());

    // An edit, one undo step, analysed by the window as usual.
    const QString part = QString::fromStdString(network.parts.front().name);
    const double old = network.parts.front().value;
    window.document()->setPartValue(part, old * 3.3, QString());
    REQUIRE(settle(window));
    tauline::Network edited = network;
    edited.parts.front().value = old * 3.3;
    const tauline::Analysis after = tauline::analyze(edited);

    // The faint series still holds the old network's curve; the live one
    // is the edited network's, and the two differ somewhere.
    const QList<QPointF> kept = referencePoints(chart);
    REQUIRE(kept.size() > 100);
    double largestChange = 0.0;
    for (const QPointF& p : kept) {
        REQUIRE(p.y() == Approx(exactDb(before, p.x())).margin(1e-6));
        largestChange = std::max(largestChange, std::abs(exactDb(after, p.x()) - p.y()));
    }
    CHECK(largestChange > 0.5);
    for (const QPointF& p : chart.exactSeries()->points())
        REQUIRE(p.y() == Approx(exactDb(after, p.x())).margin(1e-6));

    // Undo is an edit too: the reference stays.
    window.document()->undoStack()->undo();
    REQUIRE(settle(window));
    CHECK(chart.hasReference());
    CHECK(!referencePoints(chart).isEmpty());

    dismiss->trigger();
    CHECK(!chart.hasReference());
    CHECK(referencePoints(chart).isEmpty());
    CHECK(!dismiss->isEnabled());
}

TEST_CASE("The corner table copies as CSV and as Markdown", "[main-window][copy]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    const tauline::Analysis a = tauline::analyze(tauline::readNetworkFile(kSample).network);
    REQUIRE(!a.breakpoints.empty());
    // The same actions sit in the table's context menu.
    CHECK(window.cornerTable()->actions().contains(action(window, "copyCornersCsvAction")));
    CHECK(window.cornerTable()->actions().contains(action(window, "copyCornersMarkdownAction")));

    action(window, "copyCornersCsvAction")->trigger();
    const QString csv = QApplication::clipboard()->text();
    // RFC 4180 (2005), section 2: CRLF after every record, header first.
    const QStringList records = csv.split(QStringLiteral("\r\n"));
    REQUIRE(records.size() == static_cast<int>(a.breakpoints.size()) + 2);
    CHECK(records.back().isEmpty());
    CHECK(records.front().startsWith(QStringLiteral("Frequency (Hz),Type,Estimate (Hz),")));
    for (std::size_t i = 0; i < a.breakpoints.size(); ++i) {
        const double hz = records[static_cast<int>(i) + 1].section(QLatin1Char(','), 0, 0).toDouble();
        CHECK(hz == Approx(a.breakpoints[i].hz).epsilon(1e-9));
    }

    action(window, "copyCornersMarkdownAction")->trigger();
    const QStringList lines = QApplication::clipboard()->text().split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    REQUIRE(lines.size() == static_cast<int>(a.breakpoints.size()) + 2);
    CHECK(lines[0].startsWith(QStringLiteral("| Frequency | Type |")));
    CHECK(lines[1].startsWith(QStringLiteral("| ---")));
    CHECK(lines[2].contains(window.cornerTable()->item(0, CornerTable::FrequencyColumn)->text()));
}

TEST_CASE("The review page of the editor shows the network being edited", "[main-window][review]")
{
    TestSettings settings;
    MainWindow window;
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    REQUIRE(settle(window));
    window.document()->setPartValue(QStringLiteral("R2"), 22e3, QStringLiteral("22k"));
    REQUIRE(settle(window));

    QString why;
    const auto content = reviewContentOfEditor(*window.document(), *window.plot()->chart(), &why);
    INFO(why.toStdString());
    REQUIRE(content);
    CHECK(content->fileName == QStringLiteral("strain-gauge-input-filter.tauline"));
    const tauline::Analysis shown = *window.plot()->chart()->analysis();
    REQUIRE(content->analysis.breakpoints.size() == shown.breakpoints.size());
    for (std::size_t i = 0; i < shown.breakpoints.size(); ++i)
        CHECK(content->analysis.breakpoints[i].hz == Approx(shown.breakpoints[i].hz).epsilon(1e-12));

    QXmlStreamReader xml(reviewPageSvg(*content));
    QStringList texts;
    while (!xml.atEnd())
        if (xml.readNext() == QXmlStreamReader::StartElement && xml.name() == QStringLiteral("text"))
            texts << xml.readElementText(QXmlStreamReader::IncludeChildElements).trimmed();
    REQUIRE(!xml.hasError());
    // The edited value, as the schematic labels it. Qt writes a run of
    // another script (the Greek Ω after the Latin k) as a text element of
    // its own, next to the first.
    INFO(texts.join(QStringLiteral(" | ")).toStdString());
    CHECK(texts.join(QString()).contains(QStringLiteral("R222 kΩ")));
}

// Not a check: the plot with a kept reference after an edit, for a person to
// look at. Run `tauline_ui_tests "[.screenshot-reference]"`; the PNG goes to
// $TAULINE_SCREENSHOT (default: tauline-reference.png).
TEST_CASE("Screenshot of a kept reference after an edit", "[.screenshot-reference]")
{
    TestSettings settings;
    MainWindow window;
    window.resize(1280, 800);
    REQUIRE(window.openFile(QString::fromLatin1(kSample)));
    window.show();
    REQUIRE(settle(window));
    action(window, "keepReferenceAction")->trigger();
    window.document()->setPartValue(QStringLiteral("R2"), 10e3, QString());
    REQUIRE(settle(window));
    const char* out = std::getenv("TAULINE_SCREENSHOT");
    REQUIRE(window.grab().save(QString::fromLocal8Bit(out ? out : "tauline-reference.png")));
}
