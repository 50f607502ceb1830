// Saving and opening drawings, and drawing netlist-only files automatically.
// The netlists are scenarios of our own (demo data, not check values); the
// checks compare the editor against the project's own file reader and writer
// (/work/shared/spec/network-file.md).
#include "CanvasDriver.h"

#include "DrawingJson.h"
#include "MarkerItem.h"
#include "NetworkComparison.h"
#include "NetworkFile.h"
#include "PartItem.h"
#include "SchematicItem.h"

#include <QDir>
#include <QFile>
#include <QTemporaryDir>
#include <QUndoStack>

using namespace canvas_test;
using tauline::ui::sameAnalysis;

namespace {

nlohmann::json drawingOf(const tauline::ui::SchematicDocument& doc)
{
    std::vector<nlohmann::json> states;
    for (tauline::ui::SchematicItem* item : doc.scene()->schematicItems())
        states.push_back(item->state());
    return tauline::ui::drawingFromItems(states, doc.hasResponse(), std::nullopt);
}

QByteArray readAll(const QString& path)
{
    QFile f(path);
    REQUIRE(f.open(QIODevice::ReadOnly));
    return f.readAll();
}

// A speaker's Zobel network with a series feed resistor and a tweeter-side
// shunt, as a netlist only (our own demo values).
const char* const kZobelNetlist = R"({
  "format": "tauline-network", "version": 1,
  "title": "Tweeter Zobel and feed",
  "parts": [
    {"name": "Rfeed", "kind": "resistor", "value": "2R2", "nodes": ["amp", "spk"]},
    {"name": "Rz", "kind": "resistor", "value": "6R8", "nodes": ["spk", "z"]},
    {"name": "Cz", "kind": "capacitor", "value": "4u7", "nodes": ["z", "gnd"]},
    {"name": "Rvc", "kind": "resistor", "value": "5R6", "nodes": ["spk", "vc"]},
    {"name": "Cpar", "kind": "capacitor", "value": "100n", "nodes": ["vc", "gnd"]},
    {"name": "Cbyp", "kind": "capacitor", "value": "1u", "nodes": ["amp", "spk"]}
  ],
  "response": {"kind": "voltage-gain", "input": ["amp", "gnd"], "output": ["spk", "gnd"]}
})";

// A sensor front end with a differential output pair and a node that only
// one part touches (an open end), as a driving-point impedance.
const char* const kFrontEndNetlist = R"({
  "format": "tauline-network", "version": 1,
  "title": "Sensor front end, port impedance",
  "parts": [
    {"name": "R1", "kind": "resistor", "value": "10k", "nodes": ["sense", "a"]},
    {"name": "C1", "kind": "capacitor", "value": "1n", "nodes": ["a", "gnd"]},
    {"name": "R2", "kind": "resistor", "value": "100k", "nodes": ["a", "b"]},
    {"name": "C2", "kind": "capacitor", "value": "220p", "nodes": ["b", "gnd"]},
    {"name": "R3", "kind": "resistor", "value": "1M", "nodes": ["sense", "gnd"]},
    {"name": "C3", "kind": "capacitor", "value": "47p", "nodes": ["sense", "b"]},
    {"name": "R4", "kind": "resistor", "value": "4k7", "nodes": ["b", "tap"]}
  ],
  "response": {"kind": "impedance", "port": ["sense", "gnd"]}
})";

void requireNoOverlap(tauline::ui::SchematicDocument& doc)
{
    QList<QRectF> bodies;
    for (tauline::ui::SchematicItem* item : doc.scene()->schematicItems()) {
        if (item->type() == tauline::ui::PartItemType || item->type() == tauline::ui::MarkerItemType)
            bodies.push_back(item->mapRectToScene(item->shape().boundingRect()));
    }
    for (qsizetype i = 0; i < bodies.size(); ++i)
        for (qsizetype j = i + 1; j < bodies.size(); ++j) {
            INFO("bodies " << i << " and " << j);
            CHECK_FALSE(bodies[i].intersects(bodies[j]));
        }
}

void requireOnlyMinorProblems(const tauline::ui::SchematicDocument& doc)
{
    for (const auto& problem : doc.problems())
        if (!problem.minor)
            FAIL_CHECK("problem: " << problem.message.toStdString());
}

}  // namespace

TEST_CASE("Save then open gives the identical network and drawing", "[canvas][files]")
{
    Canvas c;
    drawLowPass(c);
    c.doc.setTitle("Low-pass for a sensor output");
    c.doc.setPartValueText("R1", "4k7");
    c.doc.setPartValueText("C1", "2.2 nF");
    c.click({0, 0});
    c.drag({0, 0}, {0, -30});
    c.doc.actions()->rotate()->trigger();
    REQUIRE(c.doc.isModified());

    QTemporaryDir dir;
    const QString path = dir.filePath("low-pass.tauline");
    QString error;
    REQUIRE(c.doc.saveFile(path, &error));
    CHECK(error.isEmpty());
    CHECK_FALSE(c.doc.isModified());
    CHECK(c.doc.filePath() == path);

    tauline::ui::SchematicDocument reopened;
    REQUIRE(reopened.openFile(path, &error));
    CHECK(reopened.loadWarnings().isEmpty());
    CHECK(sameAnalysis(reopened.network(), c.doc.network()));
    CHECK(reopened.network().title == "Low-pass for a sensor output");
    CHECK(reopened.title() == "Low-pass for a sensor output");
    CHECK(reopened.hasResponse());
    CHECK(drawingOf(reopened) == drawingOf(c.doc));
    CHECK_FALSE(reopened.isModified());

    // Saved again, the file is byte for byte the same.
    const QString again = dir.filePath("again.tauline");
    REQUIRE(reopened.saveFile(again, &error));
    CHECK(readAll(again) == readAll(path));

    // The core reader sees the same network the editor derived.
    const tauline::LoadedNetwork core = tauline::readNetworkFile(path.toStdString());
    CHECK(sameAnalysis(core.network, c.doc.network()));
}

TEST_CASE("A drawing saved before it has a response reopens as it was", "[canvas][files]")
{
    Canvas c;
    c.place(Tool::Resistor, {0, 0});
    c.place(Tool::Capacitor, {60, 40}, 1);
    c.wire({{20, 0}, {60, 20}});
    c.place(Tool::Resistor, {0, 100});
    c.wire({{-20, 100}, {20, 100}});  // shorted: kept in the drawing only
    REQUIRE_FALSE(c.doc.hasResponse());

    QTemporaryDir dir;
    const QString path = dir.filePath("unfinished.tauline");
    QString error;
    REQUIRE(c.doc.saveFile(path, &error));
    tauline::ui::SchematicDocument reopened;
    REQUIRE(reopened.openFile(path, &error));
    CHECK(drawingOf(reopened) == drawingOf(c.doc));
    CHECK(sameAnalysis(reopened.network(), c.doc.network()));
    CHECK(reopened.scene()->partNamed("R2"));
    CHECK(hasProblem(reopened, "R2 is shorted by a wire"));
}

TEST_CASE("A failed save reports the path and leaves what was there", "[canvas][files]")
{
    Canvas c;
    drawLowPass(c);
    QTemporaryDir dir;
    // The target is a directory holding a file: it cannot be replaced.
    const QString target = dir.filePath("occupied.tauline");
    REQUIRE(QDir().mkpath(target));
    QFile inside(QDir(target).filePath("keep.txt"));
    REQUIRE(inside.open(QIODevice::WriteOnly));
    inside.write("kept");
    inside.close();
    QString error;
    CHECK_FALSE(c.doc.saveFile(target, &error));
    CHECK(error.contains(target));
    CHECK(readAll(QDir(target).filePath("keep.txt")) == "kept");
    CHECK(c.doc.isModified());
    CHECK(c.doc.filePath().isEmpty());
}

TEST_CASE("A netlist-only file is drawn without overlaps and derives the same network", "[canvas][files][placement]")
{
    for (const char* text : {kZobelNetlist, kFrontEndNetlist}) {
        const tauline::LoadedNetwork loaded = tauline::parseNetworkText(text, "netlist");
        REQUIRE(loaded.drawing.is_null());
        Canvas c;
        c.doc.loadNetwork(loaded.network, loaded.drawing);
        INFO(loaded.network.title);
        CHECK(c.scene()->parts().size() == int(loaded.network.parts.size()));
        requireNoOverlap(c.doc);
        CHECK(c.doc.hasResponse());
        // Exactly the same parts, values, node names and response.
        CHECK(sameAnalysis(c.doc.network(), loaded.network));
        CHECK(c.doc.loadWarnings().isEmpty());
        requireOnlyMinorProblems(c.doc);
        CHECK_FALSE(c.doc.isModified());
        CHECK(c.doc.undoStack()->count() == 0);
    }
}

TEST_CASE("A long ladder is drawn on a few rows, still exact and without overlaps", "[canvas][files][placement]")
{
    // 80 series resistors with a capacitor to ground after every fourth.
    tauline::Network ladder;
    ladder.title = "RC ladder";
    int node = 0;
    for (int i = 0; i < 100; ++i) {
        tauline::Part p;
        const bool capacitor = i % 5 == 4;
        p.name = (capacitor ? "C" : "R") + std::to_string(i + 1);
        p.kind = capacitor ? tauline::PartKind::Capacitor : tauline::PartKind::Resistor;
        p.value = capacitor ? 1e-9 : 1e3;
        p.valueText = capacitor ? "1n" : "1k";
        if (capacitor) {
            p.nodes = {"n" + std::to_string(node), "gnd"};
        } else {
            p.nodes = {"n" + std::to_string(node), "n" + std::to_string(node + 1)};
            ++node;
        }
        ladder.parts.push_back(p);
    }
    ladder.response.kind = tauline::ResponseKind::VoltageGain;
    ladder.response.input = {"n0", "gnd"};
    ladder.response.output = {"n" + std::to_string(node), "gnd"};

    Canvas c;
    c.doc.loadNetwork(ladder, nullptr);
    CHECK(sameAnalysis(c.doc.network(), ladder));
    requireNoOverlap(c.doc);
    requireOnlyMinorProblems(c.doc);
    QRectF used;
    for (auto* item : c.scene()->schematicItems())
        used |= item->sceneBoundingRect();
    // Two rows of nodes and the ground row, not one row per node.
    CHECK(used.height() < 4 * 80);
}

TEST_CASE("Opening a netlist-only file from disk places it, a stale drawing is replaced", "[canvas][files][placement]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath("zobel.tauline");
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly));
        f.write(kZobelNetlist);
    }
    tauline::ui::SchematicDocument doc;
    QString error;
    REQUIRE(doc.openFile(path, &error));
    const tauline::LoadedNetwork loaded = tauline::readNetworkFile(path.toStdString());
    CHECK(sameAnalysis(doc.network(), loaded.network));
    CHECK(doc.title() == "Tweeter Zobel and feed");

    // Save it, then edit the netlist by hand so the drawing no longer fits:
    // the netlist wins and the parts are placed afresh.
    REQUIRE(doc.saveFile(path, &error));
    nlohmann::json j = nlohmann::json::parse(readAll(path).toStdString());
    j["parts"][0]["nodes"] = {"amp", "z"};
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly | QIODevice::Truncate));
        f.write(QByteArray::fromStdString(j.dump(2)));
    }
    tauline::ui::SchematicDocument edited;
    REQUIRE(edited.openFile(path, &error));
    CHECK(edited.loadWarnings().size() == 1);
    const tauline::LoadedNetwork handEdited = tauline::readNetworkFile(path.toStdString());
    CHECK(tauline::ui::sameConnectivity(handEdited.network, edited.network(), false));
    requireNoOverlap(edited);
}

TEST_CASE("A file the reader rejects is reported, never half-loaded", "[canvas][files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath("broken.tauline");
    {
        QFile f(path);
        REQUIRE(f.open(QIODevice::WriteOnly));
        f.write(R"({"format": "tauline-network", "version": 1, "parts": [
            {"name": "R1", "kind": "resistor", "value": "4k7x", "nodes": ["a", "gnd"]}],
            "response": {"kind": "impedance", "port": ["a", "gnd"]}})");
    }
    Canvas c;
    drawLowPass(c);
    const tauline::Network before = c.doc.network();
    QString error;
    CHECK_FALSE(c.doc.openFile(path, &error));
    CHECK(error.contains("R1"));
    CHECK(sameAnalysis(c.doc.network(), before));
}

TEST_CASE("Every sample opens in the editor as the reader reads it", "[canvas][files][samples]")
{
    const QDir samples(QStringLiteral(TAULINE_SAMPLES_DIR));
    const QStringList files = samples.entryList({QStringLiteral("*.tauline")}, QDir::Files);
    REQUIRE_FALSE(files.isEmpty());
    for (const QString& name : files) {
        INFO(name.toStdString());
        const QString path = samples.filePath(name);
        tauline::ui::SchematicDocument doc;
        QString error;
        REQUIRE(doc.openFile(path, &error));
        const tauline::LoadedNetwork loaded = tauline::readNetworkFile(path.toStdString());
        CHECK(tauline::ui::sameConnectivity(loaded.network, doc.network(), false));
        if (loaded.drawing.is_null())
            CHECK(sameAnalysis(doc.network(), loaded.network));
        CHECK(doc.hasResponse());
        requireNoOverlap(doc);
        requireOnlyMinorProblems(doc);
    }
}
