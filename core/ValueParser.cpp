#include "ValueParser.h"

#include "Errors.h"

#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <optional>
#include <string>
#include <vector>

namespace tauline {

namespace {

struct Prefix {
    std::string_view symbol;
    int exponent;
};

// Case-sensitive, as in SI: m is milli, M is mega. Both micro signs are
// accepted because keyboards and fonts produce either.
constexpr std::array<Prefix, 12> kPrefixes{{
    {"f", -15}, {"p", -12}, {"n", -9}, {"u", -6}, {"\u00B5", -6}, {"\u03BC", -6},
    {"m", -3}, {"k", 3}, {"K", 3}, {"M", 6}, {"G", 9}, {"T", 12},
}};

struct Unit {
    std::string_view symbol;
    bool caseInsensitive;
    // The kind it belongs to; frequency units have no part kind.
    std::optional<PartKind> kind;
};

// Longest first, so "ohms" is tried before "ohm" and "V/V" before nothing.
constexpr std::array<Unit, 10> kUnits{{
    {"ohms", true, PartKind::Resistor},
    {"ohm", true, PartKind::Resistor},
    {"\u03A9", false, PartKind::Resistor},  // Greek capital omega
    {"\u2126", false, PartKind::Resistor},  // ohm sign
    {"V/V", false, PartKind::VoltageAmplifier},
    {"A/V", false, PartKind::Transconductance},
    {"Hz", true, std::nullopt},
    {"F", false, PartKind::Capacitor},
    {"H", false, PartKind::Inductor},
    {"S", false, PartKind::Transconductance},
}};

bool isControlledSource(PartKind kind)
{
    return kind == PartKind::Transconductance || kind == PartKind::VoltageAmplifier;
}

std::string withArticle(PartKind kind)
{
    std::string name = kindName(kind);
    return (name.front() == 'i' ? "an " : "a ") + name;
}

const char* kindUnitHint(PartKind kind)
{
    switch (kind) {
    case PartKind::Resistor: return "Ω or ohm";
    case PartKind::Capacitor: return "F";
    case PartKind::Inductor: return "H";
    case PartKind::Transconductance: return "S or A/V";
    case PartKind::VoltageAmplifier: return "V/V or no unit";
    }
    return "";
}

bool isSpace(char c)
{
    return c == ' ' || c == '\t' || c == '\n' || c == '\r';
}

std::string_view trim(std::string_view s)
{
    while (!s.empty() && isSpace(s.front()))
        s.remove_prefix(1);
    while (!s.empty() && isSpace(s.back()))
        s.remove_suffix(1);
    return s;
}

bool isDigit(char c)
{
    return c >= '0' && c <= '9';
}

bool endsWith(std::string_view s, std::string_view suffix, bool caseInsensitive)
{
    if (s.size() < suffix.size())
        return false;
    std::string_view tail = s.substr(s.size() - suffix.size());
    for (size_t i = 0; i < suffix.size(); ++i) {
        char a = tail[i];
        char b = suffix[i];
        if (caseInsensitive) {
            if (a >= 'A' && a <= 'Z')
                a = char(a - 'A' + 'a');
            if (b >= 'A' && b <= 'Z')
                b = char(b - 'A' + 'a');
        }
        if (a != b)
            return false;
    }
    return true;
}

std::optional<int> prefixExponent(std::string_view symbol)
{
    for (const auto& p : kPrefixes)
        if (p.symbol == symbol)
            return p.exponent;
    return std::nullopt;
}

// A decimal number split into its digits so that the prefix can be folded
// into the exponent and the whole value rounded once (from_chars is correctly
// rounded); multiplying by a power of ten afterwards would round twice.
struct Decimal {
    bool negative = false;
    std::string intDigits;
    std::string fracDigits;
    long exponent = 0;
};

std::optional<double> toDouble(const Decimal& d)
{
    std::string text = d.negative ? "-" : "";
    text += d.intDigits.empty() ? "0" : d.intDigits;
    if (!d.fracDigits.empty()) {
        text += '.';
        text += d.fracDigits;
    }
    text += 'e';
    text += std::to_string(d.exponent);
    double value = 0.0;
    auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (ec == std::errc::result_out_of_range) {
        // Overflow becomes inf (caught as "too large"), underflow becomes 0.
        bool big = d.exponent > 0;
        return big ? HUGE_VAL * (d.negative ? -1 : 1) : 0.0;
    }
    if (ec != std::errc() || end != text.data() + text.size())
        return std::nullopt;
    return value;
}

// "4.7", "4.7e3", ".5", then optional spaces and an optional prefix.
std::optional<Decimal> parseSi(std::string_view s, bool negative)
{
    Decimal d;
    d.negative = negative;
    size_t i = 0;
    while (i < s.size() && isDigit(s[i]))
        d.intDigits += s[i++];
    if (i < s.size() && s[i] == '.') {
        ++i;
        while (i < s.size() && isDigit(s[i]))
            d.fracDigits += s[i++];
    }
    if (d.intDigits.empty() && d.fracDigits.empty())
        return std::nullopt;
    if (i < s.size() && (s[i] == 'e' || s[i] == 'E')) {
        size_t j = i + 1;
        bool expNegative = false;
        if (j < s.size() && (s[j] == '+' || s[j] == '-'))
            expNegative = s[j++] == '-';
        size_t digitsStart = j;
        long exponent = 0;
        while (j < s.size() && isDigit(s[j])) {
            if (exponent < 100000)
                exponent = exponent * 10 + (s[j] - '0');
            ++j;
        }
        if (j == digitsStart)
            return std::nullopt;  // "1e" or "1e+": not a number
        d.exponent = expNegative ? -exponent : exponent;
        i = j;
    }
    std::string_view rest = trim(s.substr(i));
    if (rest.empty())
        return d;
    if (auto e = prefixExponent(rest)) {
        d.exponent += *e;
        return d;
    }
    return std::nullopt;
}

// IEC 60062 RKM: digits, a letter marking the decimal point and the
// multiplier (R for none, or an SI prefix), digits. "4k7", "R47", "47R".
std::optional<Decimal> parseRkm(std::string_view s, bool negative)
{
    Decimal d;
    d.negative = negative;
    size_t i = 0;
    while (i < s.size() && isDigit(s[i]))
        d.intDigits += s[i++];
    size_t letterEnd = i;
    while (letterEnd < s.size() && !isDigit(s[letterEnd]))
        ++letterEnd;
    std::string_view letter = s.substr(i, letterEnd - i);
    std::optional<int> exponent = letter == "R" ? std::optional<int>(0) : prefixExponent(letter);
    if (!exponent)
        return std::nullopt;
    i = letterEnd;
    while (i < s.size() && isDigit(s[i]))
        d.fracDigits += s[i++];
    if (i != s.size() || (d.intDigits.empty() && d.fracDigits.empty()))
        return std::nullopt;
    d.exponent = *exponent;
    return d;
}

std::string inQuotes(std::string_view text)
{
    std::string out;
    out.reserve(text.size() + 2);
    out += '"';
    out += text;
    out += '"';
    return out;
}

bool looksNonFinite(std::string_view s)
{
    if (!s.empty() && (s.front() == '+' || s.front() == '-'))
        s.remove_prefix(1);
    std::string lower;
    for (char c : s)
        lower += (c >= 'A' && c <= 'Z') ? char(c - 'A' + 'a') : c;
    return lower == "nan" || lower == "inf" || lower == "infinity";
}

// What is being parsed: a part of some kind, or a frequency (no kind).
double parseQuantity(std::string_view original, std::optional<PartKind> kind)
{
    const std::string q = inQuotes(original);
    std::string_view s = trim(original);
    if (s.empty())
        throw InputError("value " + q + " is empty");

    for (const auto& unit : kUnits) {
        if (!endsWith(s, unit.symbol, unit.caseInsensitive))
            continue;
        if (unit.kind != kind) {
            std::string where = kind ? withArticle(*kind) : std::string("a frequency");
            std::string expected = kind ? kindUnitHint(*kind) : "Hz";
            throw InputError("value " + q + ": unit " + inQuotes(unit.symbol) + " does not fit " + where +
                             " (use " + expected + ")");
        }
        s = trim(s.substr(0, s.size() - unit.symbol.size()));
        break;
    }
    if (s.empty())
        throw InputError("value " + q + " has a unit but no number");

    if (looksNonFinite(s))
        throw InputError("value " + q + " is not a finite number");

    bool negative = false;
    if (s.front() == '+' || s.front() == '-') {
        negative = s.front() == '-';
        s.remove_prefix(1);
    }

    std::optional<Decimal> decimal = parseSi(s, negative);
    if (!decimal)
        decimal = parseRkm(s, negative);
    if (!decimal) {
        if (s.find(',') != std::string_view::npos)
            throw InputError("value " + q + " is not a number: use a decimal point, not a comma");
        throw InputError("value " + q +
                         " is not a number: expected e.g. 4700, 4.7k, 10 nF, 1e-9 or an RKM code such as 4k7 or R47");
    }
    std::optional<double> value = toDouble(*decimal);
    if (!value)
        throw InputError("value " + q + " is not a number");
    if (!std::isfinite(*value))
        throw InputError("value " + q + " is too large");
    if (*value == 0.0)
        throw InputError("value " + q + " is zero" +
                         (decimal->intDigits.find_first_not_of('0') != std::string::npos ||
                                  decimal->fracDigits.find_first_not_of('0') != std::string::npos
                              ? std::string(" (too small to represent)")
                              : std::string()) +
                         (kind && isControlledSource(*kind) ? "; a controlled source needs a non-zero value"
                                                             : "; it must be positive"));
    if (*value < 0.0 && !(kind && isControlledSource(*kind)))
        throw InputError("value " + q + " is negative; " +
                         (kind ? withArticle(*kind) : std::string("a frequency")) +
                         " needs a positive value");
    return *value;
}

// value's decimal digits rounded to `digits` significant ones, and the
// power of ten of the first digit.
std::pair<std::string, int> roundedDigits(double magnitude, int digits)
{
    char buffer[64];
    std::snprintf(buffer, sizeof buffer, "%.*e", digits - 1, magnitude);
    std::string text = buffer;
    size_t ePos = text.find('e');
    std::string mantissa = text.substr(0, ePos);
    int exponent = std::stoi(text.substr(ePos + 1));
    std::string out;
    for (char c : mantissa)
        if (isDigit(c))
            out += c;
    return {out, exponent};
}

struct Engineering {
    std::string number;  // "-4.7"
    std::string prefix;  // "k", "µ", ""
};

Engineering engineering(double value, int digits)
{
    if (value == 0.0)
        return {"0", ""};
    auto [mantissaDigits, exponent10] = roundedDigits(std::fabs(value), digits);
    if (exponent10 < -15 || exponent10 >= 15) {
        // Past the prefixes a row of zeros hides the size: "1.37e-55", not
        // "0.000…0137 f".
        std::string rest = mantissaDigits.substr(1);
        while (!rest.empty() && rest.back() == '0')
            rest.pop_back();
        char buffer[48];
        std::snprintf(buffer, sizeof buffer, "%s%c%s%se%d", value < 0 ? "-" : "", mantissaDigits[0],
                      rest.empty() ? "" : ".", rest.c_str(), exponent10);
        return {buffer, ""};
    }
    int exponent3 = exponent10 >= 0 ? (exponent10 / 3) * 3 : -((-exponent10 + 2) / 3) * 3;
    exponent3 = std::clamp(exponent3, -15, 12);
    int intDigits = exponent10 - exponent3 + 1;

    std::string number;
    if (intDigits >= int(mantissaDigits.size())) {
        number = mantissaDigits + std::string(size_t(intDigits) - mantissaDigits.size(), '0');
    } else if (intDigits <= 0) {
        number = "0." + std::string(size_t(-intDigits), '0') + mantissaDigits;
    } else {
        number = mantissaDigits.substr(0, size_t(intDigits)) + "." + mantissaDigits.substr(size_t(intDigits));
    }
    if (number.find('.') != std::string::npos) {
        while (number.back() == '0')
            number.pop_back();
        if (number.back() == '.')
            number.pop_back();
    }
    if (value < 0)
        number = "-" + number;

    static constexpr std::array<const char*, 10> kOutputPrefixes{"f", "p", "n", "\u00B5", "m",
                                                                 "",  "k", "M", "G",      "T"};
    return {number, kOutputPrefixes[size_t((exponent3 + 15) / 3)]};
}

std::string joinNumberAndUnit(const Engineering& e, std::string_view unit)
{
    std::string suffix = e.prefix + std::string(unit);
    return suffix.empty() ? e.number : e.number + " " + suffix;
}

// The shortest %g text that reads back as the same double: "-1e-09", not
// "-1.0000000000000001e-09".
std::string shortestText(double value)
{
    char buffer[40];
    for (int digits = 1; digits <= 17; ++digits) {
        std::snprintf(buffer, sizeof buffer, "%.*g", digits, value);
        if (std::strtod(buffer, nullptr) == value)
            break;
    }
    return buffer;
}

std::string nonFiniteText(double value)
{
    if (std::isnan(value))
        return "nan";
    return value > 0 ? "inf" : "-inf";
}

}  // namespace

double parseValue(std::string_view text, PartKind kind)
{
    return parseQuantity(text, kind);
}

double checkValue(double value, PartKind kind)
{
    if (!std::isfinite(value))
        throw InputError("value " + nonFiniteText(value) + " is not a finite number");
    if (value == 0.0)
        throw InputError(std::string("value 0 is zero; ") +
                         (isControlledSource(kind) ? "a controlled source needs a non-zero value"
                                                   : "it must be positive"));
    if (value < 0.0 && !isControlledSource(kind))
        throw InputError("value " + shortestText(value) + " is negative; " + withArticle(kind) +
                         " needs a positive value");
    return value;
}

double parseFrequency(std::string_view text)
{
    return parseQuantity(text, std::nullopt);
}

const char* valueUnit(PartKind kind)
{
    switch (kind) {
    case PartKind::Resistor: return "\u03A9";
    case PartKind::Capacitor: return "F";
    case PartKind::Inductor: return "H";
    case PartKind::Transconductance: return "S";
    case PartKind::VoltageAmplifier: return "";
    }
    return "";
}

std::string formatValue(double value, PartKind kind)
{
    if (!std::isfinite(value))
        return nonFiniteText(value);
    const char* unit = valueUnit(kind);
    std::string text;
    for (int digits = 3; digits <= 17; ++digits) {
        text = joinNumberAndUnit(engineering(value, digits), unit);
        try {
            if (parseValue(text, kind) == value)
                return text;
        } catch (const InputError&) {
            return text;  // e.g. zero or negative for a passive part: show it anyway
        }
    }
    return text;
}

std::string formatEngineering(double value, int significantDigits)
{
    if (!std::isfinite(value))
        return nonFiniteText(value);
    return joinNumberAndUnit(engineering(value, std::clamp(significantDigits, 1, 17)), "");
}

std::string formatQuantity(double value, std::string_view unit, int significantDigits)
{
    if (!std::isfinite(value))
    {
        std::string text = nonFiniteText(value);
        if (!unit.empty()) {
            text += ' ';
            text += unit;
        }
        return text;
    }
    return joinNumberAndUnit(engineering(value, std::clamp(significantDigits, 1, 17)), unit);
}

}  // namespace tauline
