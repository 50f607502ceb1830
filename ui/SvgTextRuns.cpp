#include "SvgTextRuns.h"

#include <QFont>
#include <QFontMetricsF>
#include <QList>
#include <QRegularExpression>
#include <QString>

#include <algorithm>
#include <cmath>
#include <optional>

namespace tauline::ui {

namespace {

// What QSvgGenerator writes for a text item: <text ATTRIBUTES>ESCAPED</text>,
// the attributes one line, each "name="value"".
struct TextElement {
    qsizetype begin = 0;
    qsizetype end = 0;
    QString attributes;   // as written, for the joined element
    QString sameLine;     // every attribute but x: equal on runs of one line
    double x = 0.0;
    QString family;
    double size = 0.0;
    int weight = 400;
    QString style;
    QString content;      // as written (escaped)
};

QString unescaped(QString s)
{
    s.replace(QLatin1String("&lt;"), QLatin1String("<"));
    s.replace(QLatin1String("&gt;"), QLatin1String(">"));
    s.replace(QLatin1String("&quot;"), QLatin1String("\""));
    s.replace(QLatin1String("&amp;"), QLatin1String("&"));
    return s;
}

std::optional<TextElement> parse(const QRegularExpressionMatch& m)
{
    static const QRegularExpression attribute(QStringLiteral(R"re(([\w:-]+)="([^"]*)")re"));
    TextElement e;
    e.begin = m.capturedStart();
    e.end = m.capturedEnd();
    e.attributes = m.captured(1);
    e.content = m.captured(2);
    bool hasX = false;
    for (auto it = attribute.globalMatch(e.attributes); it.hasNext();) {
        const auto a = it.next();
        const QString name = a.captured(1);
        const QString value = a.captured(2);
        if (name == QLatin1String("x")) {
            e.x = value.toDouble(&hasX);
            continue;
        }
        e.sameLine += name + QLatin1Char('=') + value + QLatin1Char('\n');
        if (name == QLatin1String("font-family"))
            e.family = value;
        else if (name == QLatin1String("font-size"))
            e.size = value.toDouble();
        else if (name == QLatin1String("font-weight"))
            e.weight = value.toInt();
        else if (name == QLatin1String("font-style"))
            e.style = value;
    }
    if (!hasX || e.size <= 0.0 || e.family.isEmpty())
        return std::nullopt;
    return e;
}

// The advance of `e`'s text in its font, at the size the SVG declares (its
// user units are the layout's pixels).
double advance(const TextElement& e)
{
    QFont font(e.family);
    font.setPixelSize(std::max(1, static_cast<int>(std::lround(e.size))));
    font.setWeight(static_cast<QFont::Weight>(std::clamp(e.weight, 1, 1000)));
    font.setStyle(e.style == QLatin1String("italic")    ? QFont::StyleItalic
                  : e.style == QLatin1String("oblique") ? QFont::StyleOblique
                                                        : QFont::StyleNormal);
    const double scale = e.size / font.pixelSize();
    return QFontMetricsF(font).horizontalAdvance(unescaped(e.content)) * scale;
}

bool continues(const TextElement& previous, double previousEnd, const TextElement& next)
{
    // Positions are written to six significant digits; separate labels on a
    // line are set apart by far more than this.
    constexpr double kTolerance = 0.25;
    return next.sameLine == previous.sameLine && std::abs(next.x - previousEnd) <= kTolerance;
}

}  // namespace

QByteArray joinScriptRuns(const QByteArray& svg)
{
    static const QRegularExpression element(QStringLiteral(R"re(<text ([^>]*)>([^<]*)</text>)re"));
    const QString in = QString::fromUtf8(svg);
    QString out;
    out.reserve(in.size());
    qsizetype copied = 0;
    std::optional<TextElement> open;  // the element being extended
    double openEnd = 0.0;             // where its text ends on the line
    qsizetype openEndInInput = 0;
    auto close = [&] {
        if (!open)
            return;
        out += QLatin1String("<text ") + open->attributes + QLatin1Char('>') + open->content
               + QLatin1String("</text>");
        copied = openEndInInput;
        open.reset();
    };
    for (auto it = element.globalMatch(in); it.hasNext();) {
        const auto m = it.next();
        const auto e = parse(m);
        const bool adjacent = open && in.mid(openEndInInput, m.capturedStart() - openEndInInput).trimmed().isEmpty();
        if (e && adjacent && continues(*open, openEnd, *e)) {
            open->content += e->content;
            openEnd = e->x + advance(*e);
            openEndInInput = e->end;
            continue;
        }
        close();
        out += in.mid(copied, m.capturedStart() - copied);
        copied = m.capturedStart();
        if (e) {
            open = e;
            openEnd = e->x + advance(*e);
            openEndInInput = e->end;
        } else {
            out += m.captured(0);
            copied = m.capturedEnd();
        }
    }
    close();
    out += in.mid(copied);
    return out.toUtf8();
}

}  // namespace tauline::ui
