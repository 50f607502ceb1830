#include "ReviewPage.h"

#include "BodeChart.h"
#include "CornerTableText.h"
#include "DrawingJson.h"
#include "FactoredForm.h"
#include "HazardCaution.h"
#include "QuantityText.h"
#include "ResistanceExpressions.h"
#include "SchematicDocument.h"
#include "SchematicItem.h"
#include "SchematicPicture.h"
#include "SchematicScene.h"
#include "SvgTextRuns.h"
#include "PlotExport.h"

#include <QBuffer>
#include <QFileInfo>
#include <QGraphicsLayout>
#include <QFontMetricsF>
#include <QGraphicsScene>
#include <QPainter>
#include <QSvgGenerator>

#include <algorithm>
#include <cmath>

namespace tauline::ui {

namespace {

constexpr double kMargin = 40.0;
constexpr double kContentWidth = kReviewPageWidth - 2 * kMargin;
constexpr double kPlotHeight = 330.0;
constexpr double kSchematicMaxHeight = 360.0;
constexpr double kCellPadding = 5.0;
constexpr double kSectionGap = 18.0;

QColor inkColour() { return QColor(0x2b, 0x35, 0x38); }
QColor mutedColour() { return QColor(0x6a, 0x70, 0x78); }
QColor ruleColour() { return QColor(0xc4, 0xca, 0xd3); }
QColor headerFill() { return QColor(0xea, 0xee, 0xf2); }
QColor stripeFill() { return QColor(0xf6, 0xf7, 0xf9); }
QColor poleColour() { return QColor(0x8a, 0x2c, 0x22); }
QColor zeroColour() { return QColor(0x1f, 0x6a, 0x40); }
QColor warnColour() { return QColor(0x9a, 0x5b, 0x00); }
QColor cautionFill() { return QColor(0xfd, 0xf3, 0xdc); }
QColor cautionBorder() { return QColor(0xe0, 0xb4, 0x5a); }

QFont pageFont(int pixels, bool bold = false)
{
    QFont font(QStringLiteral("DejaVu Sans"));
    font.setPixelSize(pixels);
    font.setBold(bold);
    return font;
}

QString text(const std::string& s)
{
    return QString::fromStdString(s);
}

QString responseText(const tauline::Network& network, const tauline::Analysis& a)
{
    const auto& r = network.response;
    const auto node = [](const std::string& n) { return QString::fromStdString(n); };
    switch (a.kind) {
    case tauline::ResponseKind::Impedance:
        return QObject::tr("Impedance between %1 and %2").arg(node(r.input[0]), node(r.input[1]));
    case tauline::ResponseKind::VoltageGain:
        return QObject::tr("Voltage gain from %1/%2 to %3/%4")
            .arg(node(r.input[0]), node(r.input[1]), node(r.output[0]), node(r.output[1]));
    case tauline::ResponseKind::Transimpedance:
        return QObject::tr("Transimpedance from the current into %1 to %2/%3")
            .arg(node(r.input[0]), node(r.output[0]), node(r.output[1]));
    }
    return {};
}

QString limitText(const tauline::ResponseLimit& limit, tauline::ResponseKind kind)
{
    switch (limit.kind) {
    case tauline::LimitKind::Zero: return QStringLiteral("0");
    case tauline::LimitKind::Infinite: return kInfiniteText;
    case tauline::LimitKind::Finite: break;
    }
    if (kind == tauline::ResponseKind::VoltageGain)
        return QString::number(limit.value, 'g', 4) + QStringLiteral(" V/V");
    return ohmsText(limit.value);
}

// The time-constant table as the editor shows it: "∞" for infinite, "—"
// where the null double injection does not exist.
tauline::TableText timeConstantTableText(const ReviewContent& c)
{
    const tauline::Analysis& a = c.analysis;
    const bool nullUndefined = a.kind != tauline::ResponseKind::Impedance
                               && a.dc.kind != tauline::LimitKind::Finite;
    auto nullText = [nullUndefined](const std::optional<double>& v, bool seconds) {
        if (!v && nullUndefined)
            return kUndefinedText;
        return seconds ? secondsText(v) : ohmsText(v);
    };
    const bool withExpressions = !c.tauExpressions.empty();
    tauline::TableText table;
    table.header = {"Part", "\u03C4", "R seen", "\u03C4 nulled", "R nulled"};
    if (withExpressions) {
        table.header.push_back("\u03C4 in part names");
        table.header.push_back("\u03C4 nulled in part names");
    }
    for (std::size_t i = 0; i < a.timeConstants.size(); ++i) {
        const auto& tc = a.timeConstants[i];
        std::vector<std::string> row{tc.element,
                                     secondsText(tc.tau).toStdString(),
                                     ohmsText(tc.r).toStdString(),
                                     nullText(tc.tauNull, true).toStdString(),
                                     nullText(tc.rNull, false).toStdString()};
        if (withExpressions) {
            row.push_back(i < c.tauExpressions.size() ? c.tauExpressions[i] : std::string());
            row.push_back(i < c.nullTauExpressions.size() ? c.nullTauExpressions[i] : std::string());
        }
        table.rows.push_back(std::move(row));
    }
    return table;
}

// Lays the page out from top to bottom; with a painter it also draws, so
// one pass measures the height and a second, identical one paints.
class PageLayout {
public:
    PageLayout(const ReviewContent& content, SchematicScene& scene, QPaintDevice& device, QPainter* painter)
        : c_(content), scene_(scene), device_(device), p_(painter)
    {
    }

    double run()
    {
        y_ = kMargin;
        header();
        schematic();
        plot();
        corners();
        timeConstants();
        caution();
        footer();
        return y_ + kMargin;
    }

private:
    QFontMetricsF metrics(const QFont& font) const { return QFontMetricsF(font, &device_); }

    // Wrapped text across the content width (or `width`); advances y.
    void paragraph(const QString& s, const QFont& font, const QColor& colour, double x = kMargin,
                   double width = kContentWidth)
    {
        const QRectF box = metrics(font).boundingRect(QRectF(0, 0, width, 1e6),
                                                      Qt::TextWordWrap | Qt::AlignLeft, s);
        if (p_) {
            p_->setFont(font);
            p_->setPen(colour);
            p_->drawText(QRectF(x, y_, width, box.height() + 1), Qt::TextWordWrap | Qt::AlignLeft, s);
        }
        y_ += box.height();
    }

    void heading(const QString& s)
    {
        y_ += kSectionGap;
        paragraph(s, pageFont(15, true), inkColour());
        y_ += 6;
    }

    void rule()
    {
        if (p_) {
            p_->setPen(QPen(ruleColour(), 1));
            p_->drawLine(QPointF(kMargin, y_), QPointF(kMargin + kContentWidth, y_));
        }
    }

    void header()
    {
        const QString when = c_.date.isValid() ? c_.date.toString(Qt::ISODate) : QString();
        paragraph(c_.title.isEmpty() ? QObject::tr("Untitled network") : c_.title, pageFont(22, true),
                  inkColour());
        y_ += 4;
        QStringList line{QObject::tr("Design review")};
        if (!when.isEmpty())
            line << when;
        if (!c_.fileName.isEmpty())
            line << c_.fileName;
        paragraph(line.join(QStringLiteral("  \u00B7  ")), pageFont(11), mutedColour());
        y_ += 2;
        const tauline::Analysis& a = c_.analysis;
        QString summary = QObject::tr("%1  \u00B7  order %2  \u00B7  at dc %3, at high frequency %4")
                              .arg(responseText(c_.network, a))
                              .arg(a.order)
                              .arg(limitText(a.dc, a.kind), limitText(a.hf, a.kind));
        paragraph(summary, pageFont(11), inkColour());
        y_ += 8;
        rule();
        // A network that can hurt someone gets the caution up front as well.
        if (tauline::suggestsHazardousUse(c_.network.title) || tauline::suggestsHazardousUse(c_.title.toStdString())) {
            y_ += 10;
            cautionBox();
        }
    }

    void schematic()
    {
        heading(QObject::tr("Schematic"));
        const QRectF bounds = schematicBounds(scene_);
        if (bounds.isEmpty()) {
            paragraph(QObject::tr("No drawing."), pageFont(11), mutedColour());
            return;
        }
        const double scale = std::min({1.2, kContentWidth / bounds.width(), kSchematicMaxHeight / bounds.height()});
        const double height = bounds.height() * scale;
        if (p_)
            paintSchematic(*p_, scene_, QRectF(kMargin, y_, kContentWidth, height), scale);
        y_ += height;
    }

    void plot()
    {
        heading(QObject::tr("Magnitude"));
        if (p_) {
            // A chart of its own at the page's size, as the plot export does,
            // so the text sits where the chart laid it out.
            QGraphicsScene scene;
            auto* chart = new BodeChart;
            scene.addItem(chart);
            chart->setExportStyle(true);
            chart->setUserRange(c_.rangeHz);
            chart->setAnalysis(c_.analysis);
            // The page's heading names the plot: no room kept above the legend.
            chart->layout()->setContentsMargins(0, 0, 0, 0);
            const QRectF rect(0, 0, kContentWidth, kPlotHeight);
            chart->setGeometry(rect);
            scene.setSceneRect(rect);
            chart->layOutNow();
            scene.render(p_, QRectF(kMargin, y_, kContentWidth, kPlotHeight), rect);
        }
        y_ += kPlotHeight;
    }

    void corners()
    {
        heading(QObject::tr("Corners"));
        if (c_.analysis.breakpoints.empty()) {
            paragraph(QObject::tr("No corners: the response is flat."), pageFont(11), mutedColour());
            return;
        }
        paragraph(QObject::tr("Exact frequencies from the network's matrices; estimates from the "
                              "time-constant sums. \u201CSet by\u201D names the parts with the largest "
                              "normalised sensitivity d ln f / d ln x."),
                  pageFont(10), mutedColour());
        y_ += 6;
        table(tauline::cornerTableText(c_.analysis, c_.sensitivities, c_.cornerExpressions));
        if (!c_.factoredForm.empty()) {
            y_ += 10;
            paragraph(QObject::tr("Factored form"), pageFont(11, true), inkColour());
            y_ += 2;
            for (const QString& line : text(c_.factoredForm).split(QLatin1Char('\n'), Qt::SkipEmptyParts))
                paragraph(line, pageFont(11), inkColour(), kMargin + 12, kContentWidth - 12);
        }
    }

    void timeConstants()
    {
        heading(QObject::tr("Time constants"));
        if (c_.analysis.timeConstants.empty()) {
            paragraph(QObject::tr("None: the network has no reactive parts."), pageFont(11), mutedColour());
            return;
        }
        paragraph(QObject::tr("Each reactive part with the others at their zero-value state and the "
                              "input zeroed (\u03C4, R seen), and with the response nulled instead "
                              "(\u03C4 nulled, R nulled). \u201C\u221E\u201D: infinite; "
                              "\u201C\u2014\u201D: does not exist."),
                  pageFont(10), mutedColour());
        y_ += 6;
        table(timeConstantTableText(c_));
    }

    void cautionBox()
    {
        const QFont bold = pageFont(11, true);
        const QFont body = pageFont(11);
        const QString heading = QObject::tr("Caution");
        const QString words = QString::fromUtf8(tauline::hazardCautionText());
        const double inner = kContentWidth - 24;
        const double headingHeight = metrics(bold).height();
        const double bodyHeight =
            metrics(body).boundingRect(QRectF(0, 0, inner, 1e6), Qt::TextWordWrap, words).height();
        const double height = 12 + headingHeight + 4 + bodyHeight + 12;
        if (p_) {
            p_->setPen(QPen(cautionBorder(), 1.2));
            p_->setBrush(cautionFill());
            p_->drawRect(QRectF(kMargin, y_, kContentWidth, height));
            p_->setBrush(Qt::NoBrush);
        }
        const double top = y_;
        y_ += 12;
        paragraph(heading, bold, warnColour(), kMargin + 12, inner);
        y_ += 4;
        paragraph(words, body, inkColour(), kMargin + 12, inner);
        y_ = top + height;
    }

    void caution()
    {
        y_ += kSectionGap + 6;
        cautionBox();
    }

    void footer()
    {
        y_ += 12;
        QString line = QObject::tr("Drawn by Tauline from %1.")
                           .arg(c_.fileName.isEmpty() ? QObject::tr("an unsaved drawing") : c_.fileName);
        paragraph(line, pageFont(9), mutedColour());
    }

    // A plain table: header on a tinted band, striped rows, numeric columns
    // right-aligned, the widest column wrapped when the page is too narrow.
    void table(const tauline::TableText& t)
    {
        const QFont font = pageFont(11);
        const QFont bold = pageFont(11, true);
        const auto fm = metrics(font);
        const auto fmBold = metrics(bold);
        const std::size_t columns = t.header.size();
        std::vector<double> widths(columns, 0.0);
        std::vector<bool> numeric(columns, true);
        std::vector<bool> anyCell(columns, false);
        for (std::size_t col = 0; col < columns; ++col) {
            widths[col] = fmBold.horizontalAdvance(text(t.header[col]));
            for (const auto& row : t.rows) {
                if (col >= row.size() || row[col].empty())
                    continue;
                const QString cell = text(row[col]);
                widths[col] = std::max(widths[col], fm.horizontalAdvance(cell));
                // "∞" and "—" sit in numeric columns without deciding them.
                if (cell == kInfiniteText || cell == kUndefinedText)
                    continue;
                numeric[col] = numeric[col] && tauline::isQuantity(row[col]);
                anyCell[col] = true;
            }
            widths[col] += 2 * kCellPadding + 2;
        }
        double total = 0.0;
        for (double w : widths)
            total += w;
        if (total > kContentWidth) {
            // Cap every column at one width, the largest that fits; the
            // capped ones wrap their text.
            std::vector<double> sorted = widths;
            std::sort(sorted.begin(), sorted.end());
            double below = 0.0;
            double cap = sorted.back();
            for (std::size_t i = 0; i < sorted.size(); ++i) {
                const double capHere = (kContentWidth - below) / static_cast<double>(sorted.size() - i);
                if (capHere <= sorted[i]) {
                    cap = std::max(capHere, 60.0);
                    break;
                }
                below += sorted[i];
            }
            for (double& w : widths)
                w = std::min(w, cap);
        } else if (!widths.empty()) {
            widths.back() += kContentWidth - total;  // rules span the page
        }

        auto rowHeight = [&](const std::vector<std::string>& row, const QFontMetricsF& m) {
            double h = m.height();
            for (std::size_t col = 0; col < columns && col < row.size(); ++col) {
                const QRectF r = m.boundingRect(QRectF(0, 0, widths[col] - 2 * kCellPadding, 1e6),
                                                Qt::TextWordWrap, text(row[col]));
                h = std::max(h, r.height());
            }
            return h + 6;
        };
        auto drawRow = [&](const std::vector<std::string>& row, const QFont& f, bool header,
                           const QColor& fill) {
            const double h = rowHeight(row, header ? fmBold : fm);
            if (p_) {
                if (fill.isValid())
                    p_->fillRect(QRectF(kMargin, y_, kContentWidth, h), fill);
                p_->setFont(f);
                double x = kMargin;
                for (std::size_t col = 0; col < columns; ++col) {
                    const QString cell = col < row.size() ? text(row[col]) : QString();
                    QColor colour = inkColour();
                    if (!header && cell.startsWith(QStringLiteral("pole")))
                        colour = poleColour();
                    else if (!header && cell.startsWith(QStringLiteral("zero")))
                        colour = zeroColour();
                    else if (!header && cell == QStringLiteral("too close"))
                        colour = warnColour();
                    p_->setPen(colour);
                    const Qt::Alignment align =
                        (numeric[col] && anyCell[col] ? Qt::AlignRight : Qt::AlignLeft) | Qt::AlignVCenter;
                    p_->drawText(QRectF(x + kCellPadding, y_, widths[col] - 2 * kCellPadding, h),
                                 align | Qt::TextWordWrap, cell);
                    x += widths[col];
                }
            }
            y_ += h;
        };
        drawRow(t.header, bold, true, headerFill());
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            drawRow(t.rows[r], font, false, r % 2 ? stripeFill() : QColor());
        rule();
    }

    const ReviewContent& c_;
    SchematicScene& scene_;
    QPaintDevice& device_;
    QPainter* p_;
    double y_ = 0.0;
};

}  // namespace

ReviewContent reviewContentOf(const tauline::Network& network, const nlohmann::json& drawing,
                              const QString& fileName)
{
    ReviewContent c;
    c.network = network;
    c.drawing = drawing;
    c.fileName = fileName;
    c.title = QString::fromStdString(network.title);
    if (c.title.isEmpty())
        c.title = QFileInfo(fileName).completeBaseName();
    c.date = QDate::currentDate();
    c.analysis = tauline::analyze(network);
    c.sensitivities = tauline::cornerSensitivities(network, c.analysis);
    const auto expressions = tauline::timeConstantExpressions(network, c.analysis);
    for (const auto& e : expressions) {
        c.tauExpressions.push_back(e.tauText());
        c.nullTauExpressions.push_back(e.nullTauText());
    }
    const tauline::FactoredForm form = tauline::factoredForm(c.analysis, expressions);
    c.cornerExpressions = tauline::cornerExpressions(form, c.analysis.breakpoints.size());
    // No column of blanks where no corner has a single-time-constant form.
    if (std::all_of(c.cornerExpressions.begin(), c.cornerExpressions.end(),
                    [](const std::string& e) { return e.empty(); }))
        c.cornerExpressions.clear();
    c.factoredForm = form.text();
    return c;
}

nlohmann::json drawingOf(const SchematicDocument& document)
{
    std::vector<nlohmann::json> states;
    for (SchematicItem* item : document.scene()->schematicItems())
        states.push_back(item->state());
    return drawingFromItems(states, document.hasResponse(), std::nullopt);
}

QByteArray reviewPageSvg(const ReviewContent& content)
{
    // The drawing as the editor would show it: the file's own, or placed
    // automatically for a netlist without one.
    SchematicDocument document;
    document.loadNetwork(content.network, content.drawing);
    SchematicScene& scene = *document.scene();
    scene.clearSelection();

    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    QSvgGenerator svg;
    svg.setOutputDevice(&buffer);
    // The resolution the chart lays its text out for, so nothing shrinks.
    svg.setResolution(96);
    svg.setTitle(content.title.isEmpty() ? QObject::tr("Design review") : content.title);
    svg.setDescription(QObject::tr("Tauline design review: schematic, magnitude plot, corners, "
                                   "time constants and caution"));

    const double height = std::ceil(PageLayout(content, scene, svg, nullptr).run());
    const QSize size(kReviewPageWidth, std::max(kReviewPageMinHeight, static_cast<int>(height)));
    svg.setSize(size);
    svg.setViewBox(QRect(QPoint(0, 0), size));

    QPainter painter;
    if (!painter.begin(&svg))
        return {};
    painter.setRenderHint(QPainter::Antialiasing);
    painter.fillRect(QRect(QPoint(0, 0), size), Qt::white);
    PageLayout(content, scene, svg, &painter).run();
    painter.end();
    return joinScriptRuns(bytes);
}

bool writeReviewPageSvg(const ReviewContent& content, const QString& path, QString* error)
{
    const QByteArray bytes = reviewPageSvg(content);
    if (bytes.isEmpty()) {
        if (error)
            *error = QObject::tr("%1: the review page could not be drawn").arg(path);
        return false;
    }
    return writeFileAtomically(path, bytes, error);
}

}  // namespace tauline::ui
