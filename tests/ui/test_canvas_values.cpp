// Values on the canvas: typed in place (SI or RKM), stepped with the wheel or
// a drag through an IEC 60063 series, one undo step per burst.
#include "CanvasDriver.h"

#include "PartItem.h"
#include "PartLabelItem.h"
#include "ValueSeriesSetting.h"

#include <QLineEdit>
#include <QSignalSpy>
#include <QUndoStack>

using namespace canvas_test;

namespace {

tauline::ui::PartItem* placeResistor(Canvas& c)
{
    c.place(Tool::Resistor, {0, 0});
    auto* r1 = c.scene()->partNamed("R1");
    REQUIRE(r1);
    return r1;
}

QPointF valueLabelCentre(tauline::ui::PartItem* part)
{
    return part->label()->valueSceneRect().center();
}

}  // namespace

TEST_CASE("A value typed in place is parsed, bad text shows the error and keeps the value", "[canvas][values]")
{
    Canvas c;
    auto* r1 = placeResistor(c);
    c.doubleClick(valueLabelCentre(r1));
    QLineEdit* editor = c.scene()->activeEditor();
    REQUIRE(editor);
    editor->setText("4k7");
    QTest::keyClick(editor, Qt::Key_Return);
    // IEC 60062 RKM code: 4k7 is 4.7 kΩ.
    CHECK(r1->value() == 4700.0);
    CHECK(r1->label()->valueString() == QString::fromUtf8("4.7 kΩ"));
    CHECK_FALSE(c.scene()->activeEditor());

    c.scene()->editPartValue(r1);
    editor = c.scene()->activeEditor();
    REQUIRE(editor);
    editor->setText("4k7x");
    QTest::keyClick(editor, Qt::Key_Return);
    CHECK(r1->value() == 4700.0);
    REQUIRE(c.scene()->inlineEditor());
    CHECK(c.scene()->inlineEditor()->errorText().startsWith("R1: "));
    CHECK(c.scene()->inlineEditor()->errorText().contains("4k7x"));
    QTest::keyClick(editor, Qt::Key_Escape);
    QCoreApplication::processEvents();
    CHECK(r1->value() == 4700.0);

    // The name, in place too; a taken name is refused.
    c.place(Tool::Resistor, {0, 60});
    auto* r2 = c.scene()->partNamed("R2");
    REQUIRE(r2);
    CHECK_FALSE(c.doc.renamePart("R2", "R1").isEmpty());
    c.scene()->editPartName(r2);
    editor = c.scene()->activeEditor();
    REQUIRE(editor);
    editor->setText("Rload");
    QTest::keyClick(editor, Qt::Key_Return);
    CHECK(r2->name() == "Rload");
    CHECK(c.doc.undoStack()->undoText() == "Rename R2 to Rload");
}

TEST_CASE("The wheel over a selected part steps through E24, a burst is one undo step", "[canvas][values]")
{
    Canvas c;
    tauline::ui::setValueSeriesSetting(tauline::ValueSeries::E24);
    auto* r1 = placeResistor(c);
    c.doc.setPartValueText("R1", "4k7");
    REQUIRE(r1->value() == 4700.0);
    const int stepsBefore = c.doc.undoStack()->count();

    // Not selected: the wheel scrolls the view, the value stays.
    c.scene()->clearSelection();
    c.wheel({0, 0}, 1);
    CHECK(r1->value() == 4700.0);

    c.click({0, 0});
    REQUIRE(r1->isSelected());
    QSignalSpy changed(&c.doc, &tauline::ui::SchematicDocument::networkChanged);
    // IEC 60063:2015, E24 series: ... 4.3, 4.7, 5.1, 5.6, 6.2, 6.8 ...
    const double expected[] = {5100.0, 5600.0, 6200.0, 6800.0};
    for (double value : expected) {
        c.wheel({0, 0}, 1);
        CHECK(r1->value() == value);
    }
    CHECK(changed.count() == 4);  // the corners follow every notch
    c.wheel({0, 0}, -2);
    CHECK(r1->value() == 5600.0);
    CHECK(c.doc.undoStack()->count() == stepsBefore + 1);
    c.doc.undoStack()->undo();
    CHECK(r1->value() == 4700.0);
    c.doc.undoStack()->redo();
    CHECK(r1->value() == 5600.0);

    // After the burst ends, the next notch is a new undo step.
    c.scene()->endValueBurst();
    c.wheel({0, 0}, -1);
    CHECK(r1->value() == 5100.0);
    CHECK(c.doc.undoStack()->count() == stepsBefore + 2);

    // Shift: continuous, 1 % per notch, three significant digits.
    c.scene()->endValueBurst();
    c.wheel({0, 0}, 1, Qt::ShiftModifier);
    CHECK(r1->value() == 5150.0);
}

TEST_CASE("Dragging the value label steps the series, the whole drag is one undo step", "[canvas][values]")
{
    Canvas c;
    tauline::ui::setValueSeriesSetting(tauline::ValueSeries::E12);
    c.place(Tool::Capacitor, {0, 0});
    auto* c1 = c.scene()->partNamed("C1");
    REQUIRE(c1);
    c.doc.setPartValueText("C1", "2n2");
    const int stepsBefore = c.doc.undoStack()->count();
    const QPointF grab = valueLabelCentre(c1);
    // Up 18 px: three steps of 6 px. IEC 60063:2015, E12: 2.2, 2.7, 3.3, 3.9.
    c.drag(grab, grab - QPointF(0, 18));
    CHECK(c1->value() == Approx(3.9e-9).epsilon(1e-12));
    CHECK(c1->valueText() == QString::fromUtf8("3.9 nF"));
    CHECK(c.doc.undoStack()->count() == stepsBefore + 1);
    c.doc.undoStack()->undo();
    CHECK(c1->value() == Approx(2.2e-9).epsilon(1e-12));
    tauline::ui::setValueSeriesSetting(tauline::ValueSeries::E24);
}

TEST_CASE("A burst that ends where it began leaves no undo step", "[canvas][values]")
{
    Canvas c;
    auto* r1 = placeResistor(c);
    c.click({0, 0});
    const int stepsBefore = c.doc.undoStack()->count();
    c.wheel({0, 0}, 2);
    c.wheel({0, 0}, -2);
    CHECK(r1->value() == 10e3);
    c.scene()->endValueBurst();
    CHECK(c.doc.undoStack()->count() == stepsBefore);
}
