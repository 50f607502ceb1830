// The canvas's keys as a user presses them: single letters pick tools while
// the canvas has focus, but are plain text inside an in-place editor;
// Escape backs out of a wire, then a tool; the standard Delete key deletes.
#include "CanvasDriver.h"

#include "PartItem.h"

#include <QLineEdit>

using namespace canvas_test;

TEST_CASE("Tool keys, Escape and Delete on the focused canvas", "[canvas][keys]")
{
    Canvas c;
    c.view.activateWindow();
    c.view.setFocus();
    REQUIRE(QTest::qWaitForWindowActive(&c.view));

    QTest::keyClick(&c.view, Qt::Key_R);
    CHECK(c.scene()->tool() == Tool::Resistor);
    c.click({0, 0});
    REQUIRE(c.scene()->partNamed("R1"));
    QTest::keyClick(&c.view, Qt::Key_R, Qt::ControlModifier);  // turn the next one
    c.click({100, 0});
    REQUIRE(c.scene()->partNamed("R2"));
    CHECK(c.scene()->partNamed("R2")->quarterTurns() == 1);
    QTest::keyClick(&c.view, Qt::Key_Escape);
    CHECK(c.scene()->tool() == Tool::Select);

    QTest::keyClick(&c.view, Qt::Key_W);
    CHECK(c.scene()->tool() == Tool::Wire);
    c.click({20, 0});
    CHECK(c.scene()->isDrawingWire());
    QTest::keyClick(&c.view, Qt::Key_Escape);
    CHECK_FALSE(c.scene()->isDrawingWire());
    CHECK(c.scene()->tool() == Tool::Wire);
    QTest::keyClick(&c.view, Qt::Key_Escape);
    CHECK(c.scene()->tool() == Tool::Select);

    // Letters typed into the value editor are text, not tool keys.
    c.scene()->editPartValue(c.scene()->partNamed("R1"));
    QLineEdit* editor = c.scene()->activeEditor();
    REQUIRE(editor);
    editor->clear();
    QTest::keyClicks(&c.view, "2R2");
    CHECK(c.scene()->tool() == Tool::Select);
    CHECK(editor->text() == "2R2");
    QTest::keyClick(&c.view, Qt::Key_Return);
    CHECK(c.scene()->partNamed("R1")->value() == Approx(2.2));

    c.click({0, 0});
    REQUIRE(c.scene()->partNamed("R1")->isSelected());
    QTest::keySequence(&c.view, QKeySequence(QKeySequence::Delete));
    CHECK_FALSE(c.scene()->partNamed("R1"));
}
