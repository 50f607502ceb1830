// Not a check: renders the editor with the start-up sample so a person can
// look at it. Run `tauline_ui_tests "[.screenshot]"`; the PNG goes to
// $TAULINE_SCREENSHOT (default: tauline-editor.png in the working directory).
// $TAULINE_OPEN opens a file instead of the start-up sample,
// $TAULINE_PHASE shows the phase, $TAULINE_SELECT_CORNER=N selects a corner,
// $TAULINE_SELECT_PART=NAME selects a part.
#include "BodePlotView.h"
#include "CornerTable.h"
#include "MainWindow.h"
#include "PartItem.h"
#include "SchematicDocument.h"
#include "SchematicScene.h"

#include <QPixmap>
#include <QStandardPaths>
#include <QTest>

#include <catch2/catch.hpp>

#include <cstdlib>

TEST_CASE("Screenshot of the editor with a sample loaded", "[.screenshot]")
{
    QStandardPaths::setTestModeEnabled(true);
    tauline::ui::MainWindow window;
    window.resize(1280, 800);
    const char* file = std::getenv("TAULINE_OPEN");
    if (file)
        REQUIRE(window.openFile(QString::fromLocal8Bit(file)));
    else
        window.openStartupSample();
    window.show();
    REQUIRE(QTest::qWaitFor([&] {
        return !window.isAnalysisPending()
               && window.shownSensitivityGeneration() == window.shownGeneration();
    }, 20000));
    if (const char* part = std::getenv("TAULINE_SELECT_PART"))
        if (auto* item = window.document()->scene()->partNamed(QString::fromLocal8Bit(part)))
            item->setSelected(true);
    if (std::getenv("TAULINE_PHASE"))
        window.plot()->setPhaseVisible(true);
    if (std::getenv("TAULINE_SELECT_CORNER"))
        window.cornerTable()->selectCorner(std::atoi(std::getenv("TAULINE_SELECT_CORNER")));
    QTest::qWait(300);
    const char* out = std::getenv("TAULINE_SCREENSHOT");
    REQUIRE(window.grab().save(QString::fromLocal8Bit(out ? out : "tauline-editor.png")));
}
