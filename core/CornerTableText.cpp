#include "CornerTableText.h"

#include "BreakpointTable.h"
#include "ValueParser.h"

#include <cmath>
#include <cstdio>

namespace tauline {

namespace {

constexpr int kDigits = 4;
const char* const kMinus = "\u2212";

// A signed number with a typographic minus, as the editor's tables show it.
std::string signedFixed(double value, int decimals, bool plusSign)
{
    char buffer[64];
    std::snprintf(buffer, sizeof buffer, "%.*f", decimals, std::fabs(value));
    // Rounds to zero: no sign at all rather than "-0.00".
    bool zero = true;
    for (const char* c = buffer; *c; ++c)
        if (*c >= '1' && *c <= '9')
            zero = false;
    if (zero)
        return buffer;
    if (value < 0)
        return kMinus + std::string(buffer);
    return (plusSign ? "+" : "") + std::string(buffer);
}

std::string percentText(double fraction)
{
    const double percent = fraction * 100.0;
    return signedFixed(percent, std::fabs(percent) < 10 ? 2 : 1, true) + " %";
}

std::string typeText(const Breakpoint& corner)
{
    const bool pole = corner.type == RootType::Pole;
    if (!corner.q)
        return pole ? "pole" : "zero";
    return std::string(pole ? "pole pair, Q " : "zero pair, Q ") + qualityFactorText(*corner.q);
}

std::string setByText(const CornerSensitivity& corner)
{
    std::string text;
    for (const auto& part : dominantParts(corner)) {
        if (!text.empty())
            text += ", ";
        text += part.part + " " + signedFixed(part.value, 2, true);
    }
    if (text.empty())
        return "\u2014";
    // A corner on a double root has no derivative: say the values are the
    // finite-difference ones.
    return corner.method == SensitivityMethod::FiniteDifference ? "\u2248 " + text : text;
}

const std::string& cellAt(const std::vector<std::string>& row, std::size_t column)
{
    static const std::string empty;
    return column < row.size() ? row[column] : empty;
}

}  // namespace

// A quantity: an optional sign (ASCII or U+2212), a number, and at most one
// unit word after a space ("7.234 kHz", "−1.2 %", "0.4013"); not a formula
// that happens to start with a digit ("1/(C1 · R2)").
bool isQuantity(const std::string& cell)
{
    std::string_view rest(cell);
    if (!rest.empty() && (rest.front() == '+' || rest.front() == '-'))
        rest.remove_prefix(1);
    else if (rest.substr(0, 3) == kMinus)
        rest.remove_prefix(3);
    std::size_t digits = 0;
    auto exponentMark = [&rest](std::size_t i) { return i > 0 && (rest[i] == 'e' || rest[i] == 'E'); };
    while (digits < rest.size()
           && ((rest[digits] >= '0' && rest[digits] <= '9') || rest[digits] == '.' || exponentMark(digits)
               || ((rest[digits] == '+' || rest[digits] == '-') && digits > 0 && exponentMark(digits - 1))))
        ++digits;
    if (digits == 0 || rest.front() == '.' || rest.front() == 'e')
        return false;
    rest.remove_prefix(digits);
    if (rest.empty())
        return true;
    if (rest.front() != ' ')
        return false;
    rest.remove_prefix(1);
    return !rest.empty() && rest.find_first_of(" ()/|") == std::string_view::npos;
}

std::string csvField(std::string_view cell)
{
    if (cell.find_first_of(",\"\r\n") == std::string_view::npos)
        return std::string(cell);
    std::string out = "\"";
    for (char c : cell) {
        if (c == '"')
            out += '"';
        out += c;
    }
    return out + '"';
}

std::string csvText(const TableText& table)
{
    std::string out;
    auto record = [&out, &table](const std::vector<std::string>& row) {
        const std::size_t columns = std::max(table.header.size(), row.size());
        for (std::size_t c = 0; c < columns; ++c) {
            if (c > 0)
                out += ',';
            out += csvField(cellAt(row, c));
        }
        out += "\r\n";
    };
    record(table.header);
    for (const auto& row : table.rows)
        record(row);
    return out;
}

std::string markdownCell(std::string_view cell)
{
    const auto first = cell.find_first_not_of(" \t\r\n");
    if (first == std::string_view::npos)
        return {};
    cell = cell.substr(first, cell.find_last_not_of(" \t\r\n") - first + 1);
    std::string out;
    for (std::size_t i = 0; i < cell.size(); ++i) {
        const char c = cell[i];
        if (c == '|' || c == '\\') {
            out += '\\';
            out += c;
        } else if (c == '\r' || c == '\n') {
            // CRLF is one break.
            if (c == '\r' && i + 1 < cell.size() && cell[i + 1] == '\n')
                ++i;
            out += "<br>";
        } else {
            out += c;
        }
    }
    return out;
}

std::string markdownText(const TableText& table)
{
    std::size_t columns = table.header.size();
    for (const auto& row : table.rows)
        columns = std::max(columns, row.size());
    if (columns == 0)
        return {};
    auto line = [&](const std::vector<std::string>& row) {
        std::string out = "|";
        for (std::size_t c = 0; c < columns; ++c) {
            const std::string text = markdownCell(cellAt(row, c));
            out += text.empty() ? std::string(" |") : " " + text + " |";
        }
        return out + "\n";
    };
    std::string out = line(table.header);
    out += "|";
    for (std::size_t c = 0; c < columns; ++c) {
        bool numeric = false;
        bool other = false;
        for (const auto& row : table.rows) {
            const std::string& cell = cellAt(row, c);
            // "∞" and "—" sit in numeric columns without deciding them.
            if (cell.empty() || cell == "\u221E" || cell == "\u2014")
                continue;
            (isQuantity(cell) ? numeric : other) = true;
        }
        out += numeric && !other ? " ---: |" : " --- |";
    }
    out += "\n";
    for (const auto& row : table.rows)
        out += line(row);
    return out;
}

std::vector<std::string> cornerTableHeader(bool withExpressions)
{
    std::vector<std::string> header{"Frequency", "Type", "Estimate", "Error", "Separation", "Set by"};
    if (withExpressions)
        header.push_back("Expression");
    return header;
}

TableText cornerTableText(const Analysis& analysis, const std::vector<CornerSensitivity>& sensitivities,
                          const std::vector<std::string>& expressions)
{
    const bool withExpressions = !expressions.empty();
    TableText table{cornerTableHeader(withExpressions), {}};
    for (std::size_t i = 0; i < analysis.breakpoints.size(); ++i) {
        const Breakpoint& corner = analysis.breakpoints[i];
        std::vector<std::string> row{
            formatQuantity(corner.hz, "Hz", kDigits),
            typeText(corner),
            formatQuantity(corner.estimateHz, "Hz", kDigits),
            percentText(corner.estimateError),
            corner.poorlySeparated ? "too close" : "ok",
            i < sensitivities.size() ? setByText(sensitivities[i]) : "\u2014",
        };
        if (withExpressions)
            row.push_back(i < expressions.size() ? expressions[i] : std::string());
        table.rows.push_back(std::move(row));
    }
    return table;
}

}  // namespace tauline
