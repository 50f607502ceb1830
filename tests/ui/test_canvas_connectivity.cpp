// The connectivity rules on plain drawing snapshots (no scene): what joins,
// what merely crosses, where junction dots go, how nodes are named. The rules
// are the editor's own (documented in ui/DrawingJson.h); the convention that
// crossing wires without a dot are not joined is common practice (no source).
#include "Connectivity.h"
#include "DerivedNetwork.h"
#include "DrawingProblems.h"
#include "ItemStates.h"
#include "WireGeometry.h"

#include <catch2/catch.hpp>

using namespace tauline::ui;

namespace {

DrawnPart resistor(ItemId id, const char* name, QPoint a, QPoint b)
{
    DrawnPart p;
    p.id = id;
    p.name = name;
    p.kind = tauline::PartKind::Resistor;
    p.value = 1e3;
    p.valueText = "1k";
    p.terminals = {a, b};
    p.centre = (QPointF(a) + QPointF(b)) / 2;
    return p;
}

DrawnWire wire(ItemId id, QVector<QPoint> points, QString label = {})
{
    return DrawnWire{id, std::move(points), std::move(label)};
}

}  // namespace

TEST_CASE("Crossing wires are not joined, a wire ending on another is, with a dot", "[canvas][connectivity]")
{
    DrawingSnapshot d;
    d.parts = {resistor(1, "R1", {-60, 0}, {-40, 0}), resistor(2, "R2", {40, 0}, {60, 0}),
               resistor(3, "R3", {0, -60}, {0, -40}), resistor(4, "R4", {0, 40}, {0, 60})};
    // A horizontal wire R1-R2 and a vertical wire R3-R4 crossing at (0,0).
    d.wires = {wire(10, {{-40, 0}, {40, 0}}), wire(11, {{0, -40}, {0, 40}})};
    Connectivity c = deriveConnectivity(d);
    CHECK(c.partNodes[1][1] == c.partNodes[2][0]);
    CHECK(c.partNodes[3][1] == c.partNodes[4][0]);
    CHECK(c.partNodes[1][1] != c.partNodes[3][1]);
    CHECK(c.junctions.isEmpty());

    // Split the vertical wire at the crossing: now two ends meet the
    // horizontal wire's middle, and all four parts share one node.
    d.wires = {wire(10, {{-40, 0}, {40, 0}}), wire(11, {{0, -40}, {0, 0}}), wire(12, {{0, 0}, {0, 40}})};
    c = deriveConnectivity(d);
    CHECK(c.partNodes[1][1] == c.partNodes[3][1]);
    CHECK(c.partNodes[2][0] == c.partNodes[4][0]);
    REQUIRE(c.junctions.size() == 1);
    CHECK(c.junctions.front() == QPoint(0, 0));
    CHECK(c.danglingWireEnds.isEmpty());
}

TEST_CASE("Ground is gnd, labels name nodes and join them, the rest are n1, n2 in order", "[canvas][connectivity]")
{
    DrawingSnapshot d;
    d.parts = {resistor(1, "R1", {0, 0}, {40, 0}), resistor(2, "R2", {100, 0}, {140, 0}),
               resistor(3, "R3", {200, 0}, {240, 0})};
    d.grounds = {DrawnGround{5, {240, 0}}};
    // Two separate wires both labelled "mid" make one node.
    d.wires = {wire(10, {{40, 0}, {40, 20}}, "mid"), wire(11, {{100, 0}, {100, 20}}, "mid")};
    const Connectivity c = deriveConnectivity(d);
    CHECK(c.nodeName(c.partNodes[1][1]) == "mid");
    CHECK(c.nodeName(c.partNodes[2][0]) == "mid");
    CHECK(c.nodeName(c.partNodes[3][1]) == "gnd");
    CHECK(c.nodeName(c.partNodes[1][0]) == "n1");
    CHECK(c.nodeName(c.partNodes[2][1]) == "n2");
    CHECK(c.nodeName(c.partNodes[3][0]) == "n3");
    CHECK(c.danglingWireEnds.size() == 2);

    const DerivedNetwork derived = deriveNetwork(d, c);
    CHECK_FALSE(derived.hasResponse);
    REQUIRE(derived.network.parts.size() == 3);
    CHECK(derived.network.parts[1].nodes == std::array<std::string, 2>{"mid", "n2"});
}

TEST_CASE("A marker's open minus terminal is ground, a port needs a part on both its nodes", "[canvas][connectivity]")
{
    DrawingSnapshot d;
    d.parts = {resistor(1, "R1", {0, -20}, {0, 20})};
    d.grounds = {DrawnGround{2, {0, 20}}};
    DrawnMarker port;
    port.id = 3;
    port.role = MarkerRole::Port;
    port.terminals = {QPoint(-60, -20), QPoint(-60, 20)};
    d.markers = {port};
    d.wires = {wire(10, {{-60, -20}, {0, -20}})};
    Connectivity c = deriveConnectivity(d);
    DerivedNetwork n = deriveNetwork(d, c);
    REQUIRE(n.hasResponse);
    CHECK(n.network.response.kind == tauline::ResponseKind::Impedance);
    CHECK(n.network.response.input == std::array<std::string, 2>{"n1", "gnd"});

    // Without the ground symbol nothing is grounded: the port has no − node.
    d.grounds.clear();
    c = deriveConnectivity(d);
    n = deriveNetwork(d, c);
    CHECK_FALSE(n.hasResponse);
    const QList<DrawingProblem> problems = findDrawingProblems(d, c, n);
    bool said = false;
    for (const auto& p : problems)
        said = said || p.message.startsWith("Nothing is grounded");
    CHECK(said);
}

TEST_CASE("Wires follow moved terminals and stay orthogonal", "[canvas][connectivity]")
{
    // An L-shaped wire whose end moves down: its corner slides along.
    const QVector<QPoint> l = {{0, 0}, {40, 0}, {40, 40}};
    CHECK(stretchPolylineEnd(l, false, {40, 60}) == QVector<QPoint>({{0, 0}, {40, 0}, {40, 60}}));
    CHECK(stretchPolylineEnd(l, false, {60, 40}) == QVector<QPoint>({{0, 0}, {60, 0}, {60, 40}}));
    // A pinned corner stays; an elbow is added instead.
    CHECK(stretchPolylineEnd(l, false, {60, 40}, {QPoint(40, 0)})
          == QVector<QPoint>({{0, 0}, {40, 0}, {40, 40}, {60, 40}}));
    const QVector<QPoint> pinned = stretchPolylineEnd(l, false, {60, 40}, {QPoint(40, 0)});
    CHECK(pinned.front() == QPoint(0, 0));
    CHECK(pinned.back() == QPoint(60, 40));
    CHECK(pinned.contains(QPoint(40, 0)));
    for (qsizetype i = 1; i < pinned.size(); ++i)
        CHECK((pinned[i].x() == pinned[i - 1].x() || pinned[i].y() == pinned[i - 1].y()));
    // A straight wire whose end moves sideways gets an elbow.
    CHECK(stretchPolylineEnd({{0, 0}, {40, 0}}, false, {40, 20}) == QVector<QPoint>({{0, 0}, {40, 0}, {40, 20}}));
    // Both ends moving alike move the wire whole.
    QHash<QPoint, QPoint> moved{{QPoint(0, 0), QPoint(10, 10)}, {QPoint(40, 40), QPoint(50, 50)}};
    CHECK(followMovedEnds(l, moved) == QVector<QPoint>({{10, 10}, {50, 10}, {50, 50}}));
}

TEST_CASE("Quarter turns and mirrors map grid points to grid points", "[canvas][connectivity]")
{
    GridMotion turn;
    turn.centre = QPoint(10, 10);
    turn.quarterTurns = 1;
    CHECK(turn.map(QPoint(30, 10)) == QPoint(10, 30));  // east of centre goes south (clockwise, y down)
    GridMotion mirror;
    mirror.centre = QPoint(10, 10);
    mirror.mirror = true;
    CHECK(mirror.map(QPoint(30, 0)) == QPoint(-10, 0));
    // A symbol turned then mirrored: the mirror reverses the turn.
    nlohmann::json s = {{"type", "part"}, {"x", 30}, {"y", 10}, {"turns", 1}, {"mirror", false}};
    const nlohmann::json m = movedState(s, mirror);
    CHECK(m["x"] == -10);
    CHECK(m["turns"] == 3);
    CHECK(m["mirror"] == true);
}
