// The design-review page: a well-formed SVG whose text holds every
// section's content (title, schematic, corners, time constants, caution),
// and `tauline report` with the plot command's exit statuses, writing
// nothing when it fails.
#include "HazardCaution.h"
#include "NetworkFile.h"
#include "QuantityText.h"
#include "ReportCommand.h"
#include "ReviewPage.h"
#include "SchematicDocument.h"

#include <QFile>
#include <QRegularExpression>
#include <QTemporaryDir>
#include <QXmlStreamReader>

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace tauline::ui;

namespace {

const char* const kZobel = TAULINE_SAMPLES_DIR "/woofer-zobel.tauline";
const char* const kSnubber = TAULINE_SAMPLES_DIR "/mains-dimmer-snubber.tauline";

struct PageText {
    bool wellFormed = false;
    QString error;
    QString root;
    QString viewBox;
    QStringList texts;   // each <text> element's content
    int paths = 0;       // filled or stroked shapes, for a sanity count
    // Every piece of text run together without white space: a wrapped
    // sentence (broken at a space or a hyphen) and a value whose unit Qt
    // writes as a run of its own ("22 k" "Ω") read whole again.
    QString compact() const
    {
        QString all = texts.join(QString());
        all.remove(QRegularExpression(QStringLiteral("\\s")));
        return all;
    }
};

PageText readPage(const QByteArray& bytes)
{
    PageText page;
    QXmlStreamReader xml(bytes);
    while (!xml.atEnd()) {
        xml.readNext();
        if (!xml.isStartElement())
            continue;
        if (page.root.isEmpty()) {
            page.root = xml.name().toString();
            page.viewBox = xml.attributes().value(QStringLiteral("viewBox")).toString();
        }
        if (xml.name() == QStringLiteral("text"))
            page.texts << xml.readElementText(QXmlStreamReader::IncludeChildElements).trimmed();
        else if (xml.name() == QStringLiteral("path") || xml.name() == QStringLiteral("polyline"))
            ++page.paths;
    }
    page.wellFormed = !xml.hasError();
    page.error = xml.errorString();
    return page;
}

ReviewContent contentOf(const char* path)
{
    const auto loaded = tauline::readNetworkFile(path);
    return reviewContentOf(loaded.network, loaded.drawing, QStringLiteral("sample.tauline"));
}

QByteArray readAll(const QString& path)
{
    QFile file(path);
    return file.open(QIODevice::ReadOnly) ? file.readAll() : QByteArray();
}

}  // namespace

TEST_CASE("The review page is well-formed SVG holding every section", "[review]")
{
    ReviewContent content = contentOf(kZobel);
    content.date = QDate(2026, 12, 2);
    // Without sensitivities the corner table names no parts, so a part
    // name found on the page can only come from the schematic.
    content.sensitivities.clear();
    const PageText page = readPage(reviewPageSvg(content));
    INFO(page.error.toStdString());
    REQUIRE(page.wellFormed);
    CHECK(page.root == QStringLiteral("svg"));
    CHECK(page.viewBox.startsWith(QStringLiteral("0 0 794 ")));
    const QString all = page.compact();
    auto compacted = [](QString s) { return s.remove(QRegularExpression(QStringLiteral("\\s"))); };
    INFO(all.toStdString());

    // Title (the file's title field) and date.
    CHECK(all.contains(compacted(QStringLiteral("Zobel network across a woofer (voice-coil resistance only; no inductors yet)"))));
    CHECK(page.texts.contains(QStringLiteral("Design review  ·  2026-12-02  ·  sample.tauline")));

    // The schematic, placed automatically (the sample has no drawing): each
    // part's name and its value as text.
    for (const char* name : {"Rcoil", "Rzobel", "Czobel"})
        CHECK(page.texts.contains(QString::fromLatin1(name)));
    CHECK(page.texts.contains(QStringLiteral("22 µF")));

    // The corners. common practice (no source): Rcoil ∥ (Rzobel + 1/sC)
    // = Rcoil (1 + s Rzobel C) / (1 + s (Rcoil + Rzobel) C): a zero at
    // 1/(2π Rzobel C), a pole at 1/(2π (Rcoil + Rzobel) C).
    const double c = 22e-6;
    const double zero = 1.0 / (2.0 * std::numbers::pi * 6.8 * c);
    const double pole = 1.0 / (2.0 * std::numbers::pi * (6.2 + 6.8) * c);
    REQUIRE(content.analysis.breakpoints.size() == 2);
    CHECK(content.analysis.breakpoints[0].hz == Approx(pole).epsilon(1e-9));
    CHECK(content.analysis.breakpoints[1].hz == Approx(zero).epsilon(1e-9));
    for (const auto& corner : content.analysis.breakpoints)
        CHECK(page.texts.contains(frequencyText(corner.hz)));
    CHECK(page.texts.contains(QStringLiteral("pole")));
    CHECK(page.texts.contains(QStringLiteral("zero")));

    // The time constant of Czobel with the port open: (Rcoil + Rzobel) C
    // = 286 µs (same source), and the resistance it sees, 13 Ω.
    REQUIRE(content.analysis.timeConstants.size() == 1);
    CHECK(*content.analysis.timeConstants[0].tau == Approx((6.2 + 6.8) * c).epsilon(1e-9));
    CHECK(page.texts.contains(secondsText(content.analysis.timeConstants[0].tau)));
    CHECK(page.texts.contains(QStringLiteral("286 µs")));
    CHECK(page.texts.contains(QStringLiteral("13 Ω")));

    // The plot's axes, and the caution in core's words.
    CHECK(all.contains(QStringLiteral("Frequency(Hz)")));
    CHECK(all.contains(compacted(QString::fromUtf8(tauline::hazardCautionText()))));
    // A harmless network gets the caution once, at the end.
    CHECK(page.texts.count(QStringLiteral("Caution")) == 1);
}

TEST_CASE("The review page names the parts that set each corner", "[review]")
{
    const ReviewContent content = contentOf(kZobel);
    REQUIRE(content.sensitivities.size() == content.analysis.breakpoints.size());
    const QString all = readPage(reviewPageSvg(content)).compact();
    // from memory: the zero 1/(2π Rzobel C) depends on Rzobel and C alone,
    // each with sensitivity −1.
    CHECK(all.contains(QStringLiteral("Rzobel−1.00")));
    CHECK(all.contains(QStringLiteral("Czobel−1.00")));
}

TEST_CASE("A mains network's review page puts the caution first as well", "[review]")
{
    const ReviewContent content = contentOf(kSnubber);
    const PageText page = readPage(reviewPageSvg(content));
    REQUIRE(page.wellFormed);
    CHECK(page.texts.count(QStringLiteral("Caution")) == 2);
    QString caution = QString::fromUtf8(tauline::hazardCautionText());
    caution.remove(QRegularExpression(QStringLiteral("\\s")));
    CHECK(page.compact().count(caution) == 2);
}

TEST_CASE("The review page draws a file's own drawing", "[review]")
{
    // A drawing as the editor saves it: the sample placed once, written to
    // a file with its drawing and read back.
    const auto sample = tauline::readNetworkFile(kZobel);
    SchematicDocument placed;
    placed.loadNetwork(sample.network, nullptr);
    const std::string text = tauline::writeNetworkText(sample.network, drawingOf(placed));
    const auto loaded = tauline::parseNetworkText(text, "drawn.tauline");
    REQUIRE(loaded.drawing.is_object());
    // The drawing matches its netlist, so it is used as it is, not placed afresh.
    SchematicDocument reopened;
    reopened.loadNetwork(loaded.network, loaded.drawing);
    CHECK(reopened.loadWarnings().isEmpty());

    const ReviewContent content = reviewContentOf(loaded.network, loaded.drawing, QStringLiteral("drawn.tauline"));
    const PageText page = readPage(reviewPageSvg(content));
    REQUIRE(page.wellFormed);
    for (const auto& part : loaded.network.parts)
        CHECK(page.texts.contains(QString::fromStdString(part.name)));
}

TEST_CASE("The report command writes the page, or nothing", "[review][cli]")
{
    QTemporaryDir dir;
    const QString out = dir.filePath(QStringLiteral("review.svg"));
    const QString program = QStringLiteral("tauline");
    const QString svg = QStringLiteral("--svg");
    const QString sample = QString::fromLatin1(kZobel);
    const QString broken = dir.filePath(QStringLiteral("broken.tauline"));
    {
        QFile file(broken);
        REQUIRE(file.open(QIODevice::WriteOnly));
        file.write(R"({"format": "tauline-network", "version": 1, "parts": [
            {"name": "R1", "kind": "resistor", "value": "4k7x", "nodes": ["a", "gnd"]}],
            "response": {"kind": "impedance", "port": ["a", "gnd"]}})");
    }

    SECTION("success: status 0 and a well-formed page")
    {
        REQUIRE(reportCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("10"),
                               QStringLiteral("--to"), QStringLiteral("100k")})
                == 0);
        const PageText page = readPage(readAll(out));
        REQUIRE(page.wellFormed);
        CHECK(page.compact().contains(QStringLiteral("Zobelnetworkacrossawoofer")));
        // The range asked for, labelled on its decades.
        CHECK(page.texts.contains(QStringLiteral("100 k")));
    }
    SECTION("a file that does not parse or exist: status 1, no output")
    {
        CHECK(reportCommand({program, broken, svg, out}) == 1);
        CHECK(reportCommand({program, dir.filePath(QStringLiteral("missing.tauline")), svg, out}) == 1);
        CHECK(!QFile::exists(out));
    }
    SECTION("a failure leaves an existing output untouched")
    {
        QFile file(out);
        REQUIRE(file.open(QIODevice::WriteOnly));
        file.write("keep me");
        file.close();
        CHECK(reportCommand({program, broken, svg, out}) == 1);
        CHECK(readAll(out) == QByteArray("keep me"));
    }
    SECTION("an output that cannot be written: status 1")
    {
        CHECK(reportCommand({program, sample, svg, dir.filePath(QStringLiteral("no/such/dir/r.svg"))}) == 1);
    }
    SECTION("bad usage: status 2, no output")
    {
        CHECK(reportCommand({program, sample}) == 2);
        CHECK(reportCommand({program, svg, out}) == 2);
        CHECK(reportCommand({program, sample, sample, svg, out}) == 2);
        CHECK(reportCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("10")}) == 2);
        CHECK(reportCommand({program, sample, svg, out, QStringLiteral("--from"), QStringLiteral("1k"),
                             QStringLiteral("--to"), QStringLiteral("10")})
              == 2);
        CHECK(reportCommand({program, sample, svg, out, QStringLiteral("--colour")}) == 2);
        CHECK(!QFile::exists(out));
    }
}
