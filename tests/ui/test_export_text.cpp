// Exported SVG text reads as the label reads on screen: a label that mixes
// scripts ("dBΩ", "4.7 kΩ": the Greek Ω after Latin letters) is one <text>
// element, so a script searching the file or a screen reader gets it whole.
#include "NetworkBuilding.h"
#include "NetworkTexts.h"
#include "PlotExport.h"
#include "ReviewPage.h"
#include "SvgTextRuns.h"

#include <QBuffer>
#include <QPainter>
#include <QSvgGenerator>
#include <QXmlStreamReader>

#include <catch2/catch.hpp>

#include <algorithm>

using namespace tauline::ui;
using tauline::testing::networkOf;

namespace {

const QChar kOhm(0x03A9);

struct SvgTexts {
    bool wellFormed = false;
    QStringList texts;  // each <text> element's content, in document order
};

SvgTexts textsOf(const QByteArray& svg)
{
    SvgTexts out;
    QXmlStreamReader xml(svg);
    while (!xml.atEnd())
        if (xml.readNext() == QXmlStreamReader::StartElement && xml.name() == QStringLiteral("text"))
            out.texts << xml.readElementText(QXmlStreamReader::IncludeChildElements);
    out.wellFormed = !xml.hasError();
    return out;
}

// A run Qt split off at the script change starts with the Ω itself.
bool hasLoneOhmRun(const QStringList& texts)
{
    return std::any_of(texts.begin(), texts.end(),
                       [](const QString& t) { return t.trimmed().startsWith(kOhm); });
}

// Two labels drawn straight onto an SVG device at 96 dpi (the offscreen
// screen's), then joined as the exports join them.
QByteArray twoLabelsSvg(const QString& first, const QString& second, double gap)
{
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    QSvgGenerator svg;
    svg.setOutputDevice(&buffer);
    svg.setResolution(96);
    svg.setSize(QSize(400, 100));
    svg.setViewBox(QRect(0, 0, 400, 100));
    QPainter painter(&svg);
    QFont font(QStringLiteral("DejaVu Sans"));
    font.setPixelSize(12);
    painter.setFont(font);
    painter.drawText(QPointF(10, 40), first);
    painter.drawText(QPointF(10 + QFontMetricsF(font, &svg).horizontalAdvance(first) + gap, 40), second);
    painter.end();
    return joinScriptRuns(bytes);
}

}  // namespace

TEST_CASE("A label mixing scripts is one SVG text element, separate labels stay apart", "[export][svg-text]")
{
    // common practice (no source): one label, one text element.
    SECTION("one label with a Greek run")
    {
        const SvgTexts svg = textsOf(twoLabelsSvg(QStringLiteral("22 k\u03A9 load"), QStringLiteral("next"), 30.0));
        REQUIRE(svg.wellFormed);
        CHECK(svg.texts == QStringList{QStringLiteral("22 k\u03A9 load"), QStringLiteral("next")});
    }
    SECTION("two labels on one line, a few pixels apart")
    {
        const SvgTexts svg = textsOf(twoLabelsSvg(QStringLiteral("10 k"), QStringLiteral("\u03A9 side"), 3.0));
        REQUIRE(svg.wellFormed);
        CHECK(svg.texts == QStringList{QStringLiteral("10 k"), QStringLiteral("\u03A9 side")});
    }
}

TEST_CASE("An exported impedance plot writes its dBΩ axis title as one text element", "[export][svg-text]")
{
    // common practice (no source): one label, one text element.
    PlotSnapshot snapshot;
    snapshot.analysis = tauline::analyze(networkOf(tauline::testing::kDividerImpedance));
    snapshot.title = QStringLiteral("divider");
    const SvgTexts svg = textsOf(plotSvg(snapshot));
    REQUIRE(svg.wellFormed);
    INFO(svg.texts.join(QStringLiteral(" | ")).toStdString());
    CHECK(svg.texts.contains(QStringLiteral("Magnitude (dB\u03A9)")));
    CHECK_FALSE(hasLoneOhmRun(svg.texts));
    // The decade labels along the frequency axis stay one element each.
    CHECK(svg.texts.contains(QStringLiteral("1 k")));
    CHECK(svg.texts.contains(QStringLiteral("10 k")));
}

TEST_CASE("A review page writes each kΩ value and the dBΩ axis title as one text element", "[export][svg-text][review]")
{
    // common practice (no source): one label, one text element.
    const tauline::Network network = networkOf(tauline::testing::kDividerImpedance);
    ReviewContent content = reviewContentOf(network, nlohmann::json(), QStringLiteral("divider.tauline"));
    content.date = QDate(2026, 12, 2);
    const SvgTexts svg = textsOf(reviewPageSvg(content));
    REQUIRE(svg.wellFormed);
    INFO(svg.texts.join(QStringLiteral(" | ")).toStdString());
    // The schematic's value labels (R1 = 4k7, R2 = 10k in the file).
    CHECK(svg.texts.contains(QStringLiteral("4.7 k\u03A9")));
    CHECK(svg.texts.contains(QStringLiteral("10 k\u03A9")));
    CHECK(svg.texts.contains(QStringLiteral("Magnitude (dB\u03A9)")));
    CHECK_FALSE(hasLoneOhmRun(svg.texts));
    // Table cells on one row stay one element each.
    CHECK(svg.texts.contains(QStringLiteral("Frequency")));
    CHECK(svg.texts.contains(QStringLiteral("Type")));
}
