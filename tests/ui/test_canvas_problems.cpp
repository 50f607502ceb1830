// Drawings with problems: each problem is shown where it is, the part it
// concerns is left out where the file format demands it, and nothing crashes
// or blocks editing. What counts as a problem is the network file contract
// (/work/shared/spec/network-file.md: both ends on one node is an error) and
// common practice (no source) for open ends and floating parts.
#include "CanvasDriver.h"

#include "ProblemMarkerItem.h"

#include <QImage>
#include <QUndoStack>

using namespace canvas_test;

namespace {

bool markShownAt(tauline::ui::SchematicScene* scene, const QString& fragment, QPointF where)
{
    for (QGraphicsItem* item : scene->items()) {
        if (item->type() != tauline::ui::ProblemMarkerItemType)
            continue;
        const auto* mark = static_cast<tauline::ui::ProblemMarkerItem*>(item);
        if (mark->problem().message.contains(fragment) && QLineF(mark->problem().where, where).length() < 1e-9)
            return true;
    }
    return false;
}

// The view paints without trouble (what a user would see).
void renders(Canvas& c)
{
    const QImage image = c.view.grab().toImage();
    CHECK(image.width() > 0);
}

}  // namespace

TEST_CASE("An empty drawing asks for a response marker", "[canvas][problems]")
{
    Canvas c;
    CHECK_FALSE(c.doc.hasResponse());
    CHECK(hasProblem(c.doc, "No response yet"));
    c.place(Tool::Resistor, {0, 0});
    CHECK(hasProblem(c.doc, "No response yet"));
    CHECK(hasProblem(c.doc, "R1 is not connected to anything"));
    CHECK(markShownAt(c.scene(), "R1 is not connected to anything", {0, 0}));
    renders(c);
}

TEST_CASE("A part shorted by a wire is shown and left out of the network", "[canvas][problems]")
{
    Canvas c;
    drawLowPass(c);
    // A wire from R1's left end over the top to its right end.
    c.wire({{-20, 0}, {-20, -30}, {20, -30}, {20, 0}});
    CHECK(hasProblem(c.doc, "R1 is shorted by a wire"));
    CHECK(markShownAt(c.scene(), "R1 is shorted by a wire", {0, 0}));
    CHECK_FALSE(findPart(c.doc.network(), "R1"));
    // The rest still analyses: C1 from the (now joined) input node to ground.
    CHECK(c.doc.hasResponse());
    CHECK(c.doc.network().parts.size() == 1);
    renders(c);

    // Editing goes on: delete the short and all is well again.
    c.doc.undoStack()->undo();
    CHECK_FALSE(hasProblem(c.doc, "shorted"));
    CHECK(findPart(c.doc.network(), "R1"));
}

TEST_CASE("Both ends of a part on one node, without a single shorting wire", "[canvas][problems]")
{
    Canvas c;
    c.place(Tool::Resistor, {0, 0});
    c.place(Tool::Ground, {-20, 0});
    c.place(Tool::Ground, {20, 0});
    CHECK(hasProblem(c.doc, "Both ends of R1 are on one node"));
    CHECK(c.doc.network().parts.empty());
    renders(c);
}

TEST_CASE("Floating parts, open ends and dangling wires are marked where they are", "[canvas][problems]")
{
    Canvas c;
    drawLowPass(c);
    c.place(Tool::Capacitor, {200, 200});
    CHECK(hasProblem(c.doc, "C2 is not connected to anything"));
    CHECK(markShownAt(c.scene(), "C2 is not connected to anything", {200, 200}));
    // A dangling wire from C2's right end: a double-click ends a wire anywhere.
    c.useTool(Tool::Wire);
    c.click({220, 200});
    c.doubleClick({260, 200});
    c.useTool(Tool::Select);
    CHECK(markShownAt(c.scene(), "This wire end is not connected", {260, 200}));
    CHECK(markShownAt(c.scene(), "This end of C2 is not connected", {180, 200}));
    // C2 carries no signal but stays in the network for the engine to judge...
    CHECK(findPart(c.doc.network(), "C2"));
    // ...and it is reported as cut off from the response's nodes.
    CHECK(hasProblem(c.doc, "C2 is not connected to the response's nodes"));
    CHECK(c.doc.hasResponse());
    renders(c);
}

TEST_CASE("Marker problems: a lone input, two ports, an unconnected port", "[canvas][problems]")
{
    Canvas c;
    c.place(Tool::Resistor, {0, 0});
    c.place(Tool::Input, {-80, 40});
    CHECK(hasProblem(c.doc, "An input needs an output marker"));
    c.doc.undoStack()->undo();
    c.place(Tool::Port, {-80, 40});
    CHECK(hasProblem(c.doc, "The port's + terminal is not connected"));
    c.place(Tool::Port, {-160, 40});
    CHECK(hasProblem(c.doc, "More than one port marker"));
    CHECK_FALSE(c.doc.hasResponse());
    renders(c);
}
