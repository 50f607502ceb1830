// The exported plot: well-formed SVG holding both curves in their colours,
// and `tauline plot` writing it, or nothing at all when it fails.
#include "BodeChart.h"
#include "NetworkFile.h"
#include "PlotCommand.h"
#include "PlotExport.h"
#include "QuantityText.h"

#include <QFile>
#include <QRegularExpression>
#include <QTemporaryDir>
#include <QXmlStreamReader>

#include <catch2/catch.hpp>

#include <map>

using namespace tauline::ui;

namespace {

const char* const kSample = TAULINE_SAMPLES_DIR "/strain-gauge-input-filter.tauline";

// What the SVG draws, by stroke colour: the number of points of every
// polyline or path stroked in it, and the text it shows.
struct SvgContent {
    bool wellFormed = false;
    QString error;
    std::map<QString, QList<int>> strokes;  // colour -> point count per element
    QStringList texts;
    QString root;
};

int pointCount(const QString& coordinates)
{
    static const QRegularExpression number(QStringLiteral("-?[0-9.]+(e-?[0-9]+)?"));
    int numbers = 0;
    auto it = number.globalMatch(coordinates);
    while (it.hasNext()) {
        it.next();
        ++numbers;
    }
    return numbers / 2;
}

SvgContent readSvg(const QByteArray& bytes)
{
    SvgContent content;
    QXmlStreamReader xml(bytes);
    QList<QString> strokeStack;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isStartElement()) {
            const auto attributes = xml.attributes();
            if (content.root.isEmpty())
                content.root = xml.name().toString();
            QString stroke = strokeStack.isEmpty() ? QString() : strokeStack.back();
            if (attributes.hasAttribute(QStringLiteral("stroke")))
                stroke = attributes.value(QStringLiteral("stroke")).toString().toLower();
            strokeStack.append(stroke);
            const auto name = xml.name();
            if (name == QStringLiteral("polyline") && stroke != QStringLiteral("none"))
                content.strokes[stroke].append(pointCount(attributes.value(QStringLiteral("points")).toString()));
            else if (name == QStringLiteral("path") && stroke != QStringLiteral("none"))
                content.strokes[stroke].append(pointCount(attributes.value(QStringLiteral("d")).toString()));
            else if (name == QStringLiteral("text"))
                content.texts.append(xml.readElementText(QXmlStreamReader::IncludeChildElements).trimmed()),
                    strokeStack.removeLast();
        } else if (xml.isEndElement()) {
            if (!strokeStack.isEmpty())
                strokeStack.removeLast();
        }
    }
    content.wellFormed = !xml.hasError();
    content.error = xml.errorString();
    return content;
}

int longest(const SvgContent& svg, const QColor& colour)
{
    const auto it = svg.strokes.find(colour.name());
    if (it == svg.strokes.end() || it->second.isEmpty())
        return 0;
    return *std::max_element(it->second.begin(), it->second.end());
}

PlotSnapshot sampleSnapshot()
{
    const auto loaded = tauline::readNetworkFile(kSample);
    PlotSnapshot snapshot;
    snapshot.analysis = tauline::analyze(loaded.network);
    snapshot.title = QString::fromStdString(loaded.network.title);
    return snapshot;
}

QByteArray readAll(const QString& path)
{
    QFile file(path);
    return file.open(QIODevice::ReadOnly) ? file.readAll() : QByteArray();
}

}  // namespace

TEST_CASE("The exported SVG is well-formed and holds the exact curve and the sketch", "[plot][export]")
{
    const PlotSnapshot snapshot = sampleSnapshot();
    const SvgContent svg = readSvg(plotSvg(snapshot));
    INFO(svg.error.toStdString());
    REQUIRE(svg.wellFormed);
    CHECK(svg.root == QStringLiteral("svg"));
    // The exact curve: one long polyline in its colour; the sketch: a
    // polyline through the range ends and every corner, in its own colour.
    CHECK(longest(svg, BodeChart::exactColor()) >= 400);
    CHECK(longest(svg, BodeChart::sketchColor())
          >= static_cast<int>(snapshot.analysis.breakpoints.size()) + 2);
    // Axes in Hz and dB, the decades labelled, each corner labelled.
    const QString text = svg.texts.join(QLatin1Char('|'));
    CHECK(text.contains(QStringLiteral("Frequency (Hz)")));
    CHECK(text.contains(QStringLiteral("Magnitude (dB)")));
    CHECK(svg.texts.contains(QStringLiteral("1 k")));
    CHECK(svg.texts.contains(QStringLiteral("10 k")));
    for (const auto& corner : snapshot.analysis.breakpoints) {
        const QString label = frequencyText(corner.hz);
        CHECK(std::any_of(svg.texts.begin(), svg.texts.end(),
                          [&](const QString& t) { return t.startsWith(label); }));
    }
    CHECK(!svg.strokes.count(BodeChart::phaseColor().name()));
}

TEST_CASE("Phase, when shown, is exported as a third curve", "[plot][export]")
{
    PlotSnapshot snapshot = sampleSnapshot();
    snapshot.phaseVisible = true;
    const SvgContent svg = readSvg(plotSvg(snapshot));
    REQUIRE(svg.wellFormed);
    CHECK(longest(svg, BodeChart::phaseColor()) >= 400);
    CHECK(longest(svg, BodeChart::exactColor()) >= 400);
}

TEST_CASE("The plot command writes a valid SVG", "[plot][export][cli]")
{
    QTemporaryDir dir;
    const QString out = dir.filePath(QStringLiteral("plot.svg"));
    const int status = plotCommand({QStringLiteral("tauline"), QString::fromLatin1(kSample),
                                    QStringLiteral("--svg"), out, QStringLiteral("--from"),
                                    QStringLiteral("1"), QStringLiteral("--to"), QStringLiteral("1M")});
    REQUIRE(status == 0);
    const SvgContent svg = readSvg(readAll(out));
    REQUIRE(svg.wellFormed);
    CHECK(longest(svg, BodeChart::exactColor()) >= 400);
    CHECK(longest(svg, BodeChart::sketchColor()) >= 3);
    // The range asked for: 1 Hz to 1 MHz, labelled on every decade.
    for (const char* label : {"1", "10", "100", "1 k", "10 k", "100 k", "1 M"})
        CHECK(svg.texts.contains(QString::fromLatin1(label)));
}

TEST_CASE("The plot command writes nothing when it fails", "[plot][export][cli]")
{
    QTemporaryDir dir;
    const QString out = dir.filePath(QStringLiteral("plot.svg"));
    const QString broken = dir.filePath(QStringLiteral("broken.tauline"));
    {
        QFile file(broken);
        REQUIRE(file.open(QIODevice::WriteOnly));
        file.write(R"({"format": "tauline-network", "version": 1, "parts": [
            {"name": "R1", "kind": "resistor", "value": "4k7x", "nodes": ["a", "gnd"]}],
            "response": {"kind": "impedance", "port": ["a", "gnd"]}})");
    }
    const QString program = QStringLiteral("tauline");
    const QString svg = QStringLiteral("--svg");

    SECTION("a file that does not parse: status 1, no output")
    {
        CHECK(plotCommand({program, broken, svg, out}) == 1);
        CHECK(!QFile::exists(out));
    }
    SECTION("a file that does not exist: status 1, no output")
    {
        CHECK(plotCommand({program, dir.filePath(QStringLiteral("missing.tauline")), svg, out}) == 1);
        CHECK(!QFile::exists(out));
    }
    SECTION("a failure leaves an existing output untouched")
    {
        QFile file(out);
        REQUIRE(file.open(QIODevice::WriteOnly));
        file.write("keep me");
        file.close();
        CHECK(plotCommand({program, broken, svg, out}) == 1);
        CHECK(readAll(out) == QByteArray("keep me"));
    }
    SECTION("an output that cannot be written: status 1")
    {
        CHECK(plotCommand({program, QString::fromLatin1(kSample), svg,
                           dir.filePath(QStringLiteral("no/such/dir/plot.svg"))})
              == 1);
    }
    SECTION("bad usage: status 2, no output")
    {
        const QString sample = QString::fromLatin1(kSample);
        CHECK(plotCommand({program, sample}) == 2);
        CHECK(plotCommand({program, svg, out}) == 2);
        CHECK(plotCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("10")}) == 2);
        CHECK(plotCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("1k"),
                           QStringLiteral("--to"), QStringLiteral("10")})
              == 2);
        CHECK(plotCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("-5"),
                           QStringLiteral("--to"), QStringLiteral("10")})
              == 2);
        CHECK(plotCommand({program, sample, svg, out, QStringLiteral("--width"), QStringLiteral("3")}) == 2);
        CHECK(!QFile::exists(out));
    }
}

TEST_CASE("The PNG export is an image of the plot", "[plot][export]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("plot.png"));
    QString error;
    REQUIRE(writePlotPng(sampleSnapshot(), path, &error));
    QImage image(path);
    REQUIRE(!image.isNull());
    CHECK(image.width() == 2 * kExportSize.width());
    CHECK(image.height() == 2 * kExportSize.height());
    // Both curves are drawn: pixels in each colour.
    int exact = 0;
    int sketch = 0;
    for (int y = 0; y < image.height(); y += 2)
        for (int x = 0; x < image.width(); x += 2) {
            const QRgb pixel = image.pixel(x, y) & 0xffffff;
            exact += pixel == (BodeChart::exactColor().rgb() & 0xffffff);
            sketch += pixel == (BodeChart::sketchColor().rgb() & 0xffffff);
        }
    CHECK(exact > 200);
    CHECK(sketch > 50);
}
