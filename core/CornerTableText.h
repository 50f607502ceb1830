// The corner table as text someone can paste elsewhere: CSV for a
// spreadsheet, a Markdown pipe table for a review note or a wiki page. The
// editor copies the table it shows; the review page prints the one built
// here from the engine's results.
#pragma once

#include "Analysis.h"
#include "CornerSensitivity.h"

#include <string>
#include <string_view>
#include <vector>

namespace tauline {

// A header row and body rows of plain UTF-8 cells. Rows shorter than the
// header are padded with empty cells when written.
struct TableText {
    std::vector<std::string> header;
    std::vector<std::vector<std::string>> rows;
};

// One CSV field (RFC 4180, section 2): quoted when it holds a comma, a
// double quote, CR or LF, with each double quote doubled; as is otherwise.
std::string csvField(std::string_view cell);
// Records separated by CRLF, the last one ended too (RFC 4180, section 2).
std::string csvText(const TableText& table);

// One Markdown table cell: a pipe and a backslash escaped with a backslash
// so they cannot end the cell or escape the next character, line breaks as
// <br>, surrounding blanks dropped; an empty cell stays empty.
std::string markdownCell(std::string_view cell);
// A pipe table: header, a `---` delimiter row (right-aligned where every
// filled body cell of a column is a quantity, see isQuantity), body rows.
std::string markdownText(const TableText& table);

// A number with at most one unit word after a space ("7.234 kHz",
// "−1.20 %", "0.4013"), not a formula that starts with a digit.
bool isQuantity(const std::string& cell);

// The corner table from the engine's results, one row per breakpoint, low to
// high: exact frequency, type (with Q for a pair), the time-constant
// estimate, its error, whether the corners are too close for it, and the
// parts that set the corner most with their normalised sensitivities
// ("≈ " before them where only a finite difference exists, a double root).
// `sensitivities` may be empty (the column then says so) or hold one entry
// per breakpoint. `expressions`, when not empty, holds one text per
// breakpoint (the ω of the factored form in part names) and adds a column.
std::vector<std::string> cornerTableHeader(bool withExpressions);
TableText cornerTableText(const Analysis& analysis, const std::vector<CornerSensitivity>& sensitivities,
                          const std::vector<std::string>& expressions = {});

}  // namespace tauline
