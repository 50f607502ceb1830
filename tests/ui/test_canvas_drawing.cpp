// Building networks on the canvas by simulated user actions, and checking the
// network the drawing derives. Expected connectivity comes from the circuit
// drawn (common practice (no source): an RC low-pass is R from input to
// output and C from output to ground).
#include "CanvasDriver.h"

#include "JunctionItem.h"
#include "SchematicItem.h"
#include "NetworkComparison.h"
#include "NetworkFile.h"
#include "PartItem.h"
#include "WireItem.h"

#include <QLineEdit>
#include <QSignalSpy>
#include <QUndoStack>

using namespace canvas_test;
using tauline::ui::sameAnalysis;

namespace {

bool junctionAt(tauline::ui::SchematicScene* scene, QPointF p)
{
    for (QGraphicsItem* item : scene->items(p))
        if (item->type() == tauline::ui::JunctionItemType)
            return true;
    return false;
}

void requireLowPass(const tauline::ui::SchematicDocument& doc)
{
    const tauline::Network n = doc.network();
    REQUIRE(doc.hasResponse());
    REQUIRE(n.parts.size() == 2);
    const tauline::Part* r1 = findPart(n, "R1");
    const tauline::Part* c1 = findPart(n, "C1");
    REQUIRE(r1);
    REQUIRE(c1);
    CHECK(r1->kind == tauline::PartKind::Resistor);
    CHECK(c1->kind == tauline::PartKind::Capacitor);
    // Unnamed nodes are numbered in the order parts were placed; ground is gnd.
    CHECK(r1->nodes == std::array<std::string, 2>{"n1", "n2"});
    CHECK(c1->nodes == std::array<std::string, 2>{"n2", "gnd"});
    CHECK(n.response.kind == tauline::ResponseKind::VoltageGain);
    CHECK(n.response.input == std::array<std::string, 2>{"n1", "gnd"});
    CHECK(n.response.output == std::array<std::string, 2>{"n2", "gnd"});
}

}  // namespace

TEST_CASE("An RC low-pass drawn with the mouse derives R from input to output and C to ground", "[canvas]")
{
    Canvas c;
    const std::vector<tauline::Network> steps = drawLowPass(c);
    REQUIRE(steps.size() == 9);
    requireLowPass(c.doc);
    CHECK(c.doc.undoStack()->count() == 9);

    // Automatic names and engineering-notation values.
    CHECK(c.scene()->partNamed("R1"));
    CHECK(c.scene()->partNamed("C1"));
    CHECK(c.scene()->partNamed("R1")->value() == 10e3);
    CHECK(c.scene()->partNamed("C1")->value() == Approx(10e-9).epsilon(1e-15));

    // The output wire ends on the first wire's corner: a junction dot there.
    CHECK(junctionAt(c.scene(), QPointF(60, 0)));
    // Nothing left open but the markers' − terminals (which mean ground).
    for (const auto& problem : c.doc.problems())
        FAIL_CHECK("unexpected problem: " << problem.message.toStdString());

    // The same network written as a file and read back by the core reader.
    const tauline::Network n = c.doc.network();
    const tauline::LoadedNetwork reread = tauline::parseNetworkText(tauline::writeNetworkText(n), "canvas");
    CHECK(sameAnalysis(reread.network, n));
}

TEST_CASE("Undo and redo restore each previous network exactly", "[canvas][undo]")
{
    Canvas c;
    const std::vector<tauline::Network> steps = drawLowPass(c);
    QUndoStack* stack = c.doc.undoStack();
    for (int i = int(steps.size()) - 1; i >= 1; --i) {
        stack->undo();
        INFO("after undoing step " << i);
        CHECK(sameAnalysis(c.doc.network(), steps[size_t(i - 1)]));
    }
    stack->undo();
    CHECK(c.doc.network().parts.empty());
    CHECK_FALSE(c.doc.hasResponse());
    for (size_t i = 0; i < steps.size(); ++i) {
        stack->redo();
        INFO("after redoing step " << i);
        CHECK(sameAnalysis(c.doc.network(), steps[i]));
    }
    requireLowPass(c.doc);
}

TEST_CASE("Moving a part drags its wires along and keeps the network", "[canvas][move]")
{
    Canvas c;
    drawLowPass(c);
    const tauline::Network before = c.doc.network();
    QSignalSpy changed(&c.doc, &tauline::ui::SchematicDocument::networkChanged);

    c.click({0, 0});
    REQUIRE(c.doc.selectedPart() == "R1");
    c.drag({0, 0}, {0, -40});
    CHECK(c.scene()->partNamed("R1")->pos() == QPointF(0, -40));
    CHECK(c.doc.undoStack()->undoText() == "Move");
    CHECK(sameAnalysis(c.doc.network(), before));
    CHECK(changed.count() == 0);
    CHECK(c.doc.problems().isEmpty());

    // Rotating keeps the wires on the turned terminals too.
    c.doc.actions()->rotate()->trigger();
    CHECK(c.scene()->partNamed("R1")->quarterTurns() == 1);
    CHECK(sameAnalysis(c.doc.network(), before));
    CHECK(changed.count() == 0);
    c.doc.actions()->mirror()->trigger();
    CHECK(c.scene()->partNamed("R1")->isMirrored());
    CHECK(sameAnalysis(c.doc.network(), before));
    CHECK(c.doc.problems().isEmpty());
    CHECK(changed.count() == 0);
}

TEST_CASE("Moving a wire off its terminals changes the network, and undo brings it back", "[canvas][move]")
{
    Canvas c;
    drawLowPass(c);
    const tauline::Network before = c.doc.network();
    QSignalSpy changed(&c.doc, &tauline::ui::SchematicDocument::networkChanged);

    // The wire from C1 down to ground, grabbed in its middle and moved right.
    c.click({60, 80});
    REQUIRE(c.scene()->selectedSchematicItems().size() == 1);
    c.drag({60, 80}, {90, 80});
    CHECK(changed.count() >= 1);
    CHECK_FALSE(c.doc.hasResponse());
    CHECK(hasProblem(c.doc, "Nothing is grounded"));
    CHECK(hasProblem(c.doc, "wire end is not connected"));
    const tauline::Part* c1 = findPart(c.doc.network(), "C1");
    REQUIRE(c1);
    CHECK(c1->nodes[1] != "gnd");

    c.doc.undoStack()->undo();
    CHECK(sameAnalysis(c.doc.network(), before));
    CHECK(c.doc.hasResponse());
}

TEST_CASE("Delete, copy and paste: pasted parts get new names", "[canvas][clipboard]")
{
    Canvas c;
    drawLowPass(c);
    const tauline::Network before = c.doc.network();

    c.click({60, 40});  // C1's body
    REQUIRE(c.doc.selectedPart() == "C1");
    c.doc.actions()->copy()->trigger();
    c.doc.actions()->paste()->trigger();
    auto* pasted = c.scene()->partNamed("C2");
    REQUIRE(pasted);
    CHECK(pasted->pos() == QPointF(80, 60));  // two grid steps off, not on top
    CHECK(pasted->value() == c.scene()->partNamed("C1")->value());
    CHECK(pasted->isSelected());
    CHECK(c.doc.network().parts.size() == 3);
    CHECK(hasProblem(c.doc, "C2 is not connected to anything"));

    c.doc.undoStack()->undo();
    CHECK_FALSE(c.scene()->partNamed("C2"));
    CHECK(sameAnalysis(c.doc.network(), before));

    c.click({0, 0});
    c.doc.actions()->remove()->trigger();
    CHECK_FALSE(c.scene()->partNamed("R1"));
    CHECK(c.doc.network().parts.size() == 1);
    CHECK(hasProblem(c.doc, "wire end is not connected"));
    c.doc.undoStack()->undo();
    CHECK(sameAnalysis(c.doc.network(), before));

    // Cut and paste puts the part back where it was; its name is free again.
    c.click({0, 0});
    c.doc.actions()->cut()->trigger();
    CHECK_FALSE(c.scene()->partNamed("R1"));
    c.doc.actions()->paste()->trigger();
    auto* back = c.scene()->partNamed("R1");
    REQUIRE(back);
    CHECK(back->pos() == QPointF(0, 0));
    CHECK(c.doc.hasResponse());
    CHECK(tauline::ui::sameConnectivity(before, c.doc.network(), false));
}

TEST_CASE("A port marker gives an impedance, the input's drive chooses the transfer kind", "[canvas][response]")
{
    Canvas c;
    drawLowPass(c);
    c.doc.setResponseKind(tauline::ResponseKind::Transimpedance);
    CHECK(c.doc.network().response.kind == tauline::ResponseKind::Transimpedance);
    CHECK(c.doc.responseKind() == tauline::ResponseKind::Transimpedance);

    // Double-clicking the input switches its drive back.
    c.doubleClick({-80, 40});
    CHECK(c.doc.network().response.kind == tauline::ResponseKind::VoltageGain);

    c.doc.setResponseKind(tauline::ResponseKind::Impedance);
    const tauline::Network n = c.doc.network();
    REQUIRE(c.doc.hasResponse());
    CHECK(n.response.kind == tauline::ResponseKind::Impedance);
    CHECK(n.response.input == std::array<std::string, 2>{"n1", "gnd"});
    c.doc.undoStack()->undo();
    CHECK(c.doc.network().response.kind == tauline::ResponseKind::VoltageGain);
    CHECK(c.doc.network().response.output == std::array<std::string, 2>{"n2", "gnd"});
}

TEST_CASE("Naming a node on a wire names it in the network", "[canvas][labels]")
{
    Canvas c;
    drawLowPass(c);
    c.doubleClick({40, 0});  // the first wire, between R1 and the corner
    QLineEdit* editor = c.scene()->activeEditor();
    REQUIRE(editor);
    editor->setText("out");
    QTest::keyClick(editor, Qt::Key_Return);
    const tauline::Network n = c.doc.network();
    CHECK(findPart(n, "R1")->nodes[1] == "out");
    CHECK(findPart(n, "C1")->nodes[0] == "out");
    CHECK(n.response.output[0] == "out");
}

TEST_CASE("A rubber band on empty canvas selects what it touches, one delete removes it all", "[canvas][select]")
{
    Canvas c;
    drawLowPass(c);
    c.scene()->clearSelection();
    // From empty canvas above-left of the input to just right of R1.
    c.drag({-150, -60}, {30, 30});
    CHECK(c.scene()->partNamed("R1")->isSelected());
    CHECK_FALSE(c.scene()->partNamed("C1")->isSelected());
    int markers = 0;
    for (auto* item : c.scene()->selectedSchematicItems())
        markers += item->type() == tauline::ui::MarkerItemType;
    CHECK(markers == 1);  // the input, not the output
    const int before = c.doc.undoStack()->count();
    c.doc.actions()->remove()->trigger();
    CHECK(c.doc.undoStack()->count() == before + 1);
    CHECK_FALSE(c.scene()->partNamed("R1"));
    CHECK_FALSE(c.doc.hasResponse());
    c.doc.undoStack()->undo();
    requireLowPass(c.doc);
}

TEST_CASE("A double-click while placing places once and edits nothing", "[canvas][place]")
{
    Canvas c;
    c.useTool(Tool::Resistor);
    c.doubleClick({0, 0});
    CHECK(c.scene()->parts().size() == 1);
    CHECK_FALSE(c.scene()->activeEditor());
    c.useTool(Tool::Input);
    c.doubleClick({-80, 40});
    CHECK(c.scene()->tool() == Tool::Select);
    CHECK(c.doc.responseKind() == tauline::ResponseKind::VoltageGain);
    CHECK(c.doc.undoStack()->count() == 2);
}
