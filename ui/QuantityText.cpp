#include "QuantityText.h"

#include "Errors.h"
#include "ValueParser.h"

#include <cmath>

namespace tauline::ui {

namespace {

// "22.6 k" + "Hz" -> "22.6 kHz"; "499" + "Hz" -> "499 Hz".
QString withUnit(const std::string& engineering, const QString& unit)
{
    QString text = QString::fromStdString(engineering).trimmed();
    if (!text.isEmpty() && text.back().isLetter())
        return text + unit;
    return text + QLatin1Char(' ') + unit;
}

}  // namespace

QString frequencyText(double hz)
{
    return withUnit(formatEngineering(hz, 4), QStringLiteral("Hz"));
}

// Below these a time constant or resistance is rounding left over from a
// zero (a capacitor shorted by the nulled output, say), not a value.
constexpr double kZeroSeconds = 1e-18;
constexpr double kZeroOhms = 1e-9;

QString secondsText(std::optional<double> seconds)
{
    if (!seconds || !std::isfinite(*seconds))
        return kInfiniteText;
    if (std::abs(*seconds) < kZeroSeconds)
        return QStringLiteral("0 s");
    return withUnit(formatEngineering(*seconds, 4), QStringLiteral("s"));
}

QString ohmsText(std::optional<double> ohms)
{
    if (!ohms || !std::isfinite(*ohms))
        return kInfiniteText;
    if (std::abs(*ohms) < kZeroOhms)
        return QStringLiteral("0 Ω");
    return withUnit(formatEngineering(*ohms, 4), QStringLiteral("Ω"));
}

QString decibelUnit(ResponseKind kind)
{
    return kind == ResponseKind::VoltageGain ? QStringLiteral("dB") : QStringLiteral("dBΩ");
}

QString decibelText(double db, ResponseKind kind)
{
    if (!std::isfinite(db))
        return db < 0 ? QStringLiteral("−∞ ") + decibelUnit(kind) : kInfiniteText;
    QString number = QString::number(db, 'f', std::abs(db) < 10 ? 2 : 1);
    number.replace(QLatin1Char('-'), QChar(0x2212));
    return number + QLatin1Char(' ') + decibelUnit(kind);
}

QString percentText(double fraction)
{
    const double percent = fraction * 100.0;
    QString number = QString::number(percent, 'f', std::abs(percent) < 10 ? 2 : 1);
    if (percent > 0)
        number.prepend(QLatin1Char('+'));
    number.replace(QLatin1Char('-'), QChar(0x2212));
    return number + QStringLiteral(" %");
}

QString axisFrequencyLabel(double hz)
{
    return QString::fromStdString(formatEngineering(hz, 3)).trimmed();
}

std::optional<double> parseFrequencyText(const QString& text)
{
    // The command line's rules, so a range reads the same everywhere.
    try {
        return tauline::parseFrequency(text.trimmed().toStdString());
    } catch (const tauline::InputError&) {
        return std::nullopt;
    }
}

}  // namespace tauline::ui
