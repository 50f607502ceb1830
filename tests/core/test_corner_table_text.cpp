// The corner table as CSV and as a Markdown pipe table: quoting and escaping
// by the published rules, read back cell for cell, and the table's content
// against the engine and the closed form of a single RC corner.
#include "CornerTableText.h"
#include "NetworkFile.h"
#include "ValueParser.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <random>

using namespace tauline;

namespace {

// A reader written from RFC 4180 section 2's grammar (fields optionally
// enclosed in double quotes; "" inside a quoted field is one quote; CRLF
// ends a record), so the writer is checked against the rule, not itself.
std::vector<std::vector<std::string>> readCsv(const std::string& text)
{
    std::vector<std::vector<std::string>> records;
    std::vector<std::string> record;
    std::string field;
    std::size_t i = 0;
    bool fieldStarted = false;
    while (i < text.size()) {
        if (!fieldStarted && text[i] == '"') {
            ++i;
            while (i < text.size()) {
                if (text[i] == '"' && i + 1 < text.size() && text[i + 1] == '"') {
                    field += '"';
                    i += 2;
                } else if (text[i] == '"') {
                    ++i;
                    break;
                } else {
                    field += text[i++];
                }
            }
            fieldStarted = true;
        } else if (text[i] == ',') {
            record.push_back(field);
            field.clear();
            fieldStarted = false;
            ++i;
        } else if (text.compare(i, 2, "\r\n") == 0) {
            record.push_back(field);
            records.push_back(record);
            record.clear();
            field.clear();
            fieldStarted = false;
            i += 2;
        } else {
            // A bare quote, CR or LF inside an unquoted field breaks the rule.
            REQUIRE(text[i] != '"');
            REQUIRE(text[i] != '\r');
            REQUIRE(text[i] != '\n');
            field += text[i++];
            fieldStarted = true;
        }
    }
    REQUIRE(record.empty());  // the last record ends with CRLF
    return records;
}

// Splits one Markdown table row into cells the way GFM does: unescaped
// pipes delimit, "\|" is a literal pipe (and "\\" a literal backslash, as
// in any Markdown text).
std::vector<std::string> markdownRowCells(const std::string& line)
{
    REQUIRE(line.size() >= 2);
    REQUIRE(line.front() == '|');
    REQUIRE(line.back() == '|');
    std::vector<std::string> cells;
    std::string cell;
    for (std::size_t i = 1; i < line.size(); ++i) {
        if (line[i] == '\\' && i + 1 < line.size()) {
            cell += line[++i];
        } else if (line[i] == '|') {
            const auto a = cell.find_first_not_of(' ');
            cells.push_back(a == std::string::npos ? std::string() : cell.substr(a, cell.find_last_not_of(' ') - a + 1));
            cell.clear();
        } else {
            cell += line[i];
        }
    }
    return cells;
}

std::vector<std::string> lines(const std::string& text)
{
    std::vector<std::string> out;
    std::size_t start = 0;
    while (start < text.size()) {
        const auto end = text.find('\n', start);
        REQUIRE(end != std::string::npos);  // every line ends with a newline
        out.push_back(text.substr(start, end - start));
        start = end + 1;
    }
    return out;
}

}  // namespace

TEST_CASE("CSV fields are quoted only when they must be", "[table-text]")
{
    // Shafranovich, RFC 4180 "Common Format and MIME Type for CSV Files",
    // 2005, section 2 rules 5-7: fields holding commas, double quotes or line
    // breaks are enclosed in double quotes; a quote inside is doubled.
    CHECK(csvField("aaa") == "aaa");
    CHECK(csvField("b\"bb") == "\"b\"\"bb\"");
    CHECK(csvField("a,b") == "\"a,b\"");
    CHECK(csvField("line\r\nbreak") == "\"line\r\nbreak\"");
    CHECK(csvField("lf\nonly") == "\"lf\nonly\"");
    CHECK(csvField("") == "");
    // Rule 4: spaces are part of a field and need no quotes.
    CHECK(csvField(" 7.2 kHz ") == " 7.2 kHz ");
    // UTF-8 passes through untouched.
    CHECK(csvField("R1 \u22121.00") == "R1 \u22121.00");
}

TEST_CASE("CSV records end with CRLF and read back cell for cell", "[table-text]")
{
    // RFC 4180 (2005), section 2 rules 1-3: CRLF after every record, the
    // last one included; an optional header line of the same format.
    TableText table{{"a", "b", "c"}, {{"1", "x,y", "q\"uote"}, {"2"}}};
    const std::string csv = csvText(table);
    CHECK(csv == "a,b,c\r\n1,\"x,y\",\"q\"\"uote\"\r\n2,,\r\n");

    // Property: any cells, commas, quotes and line breaks included, survive.
    std::mt19937 random(20261202);
    const std::string alphabet = "ab ,\"\r\n|\\x";
    for (int trial = 0; trial < 200; ++trial) {
        TableText t;
        const int columns = 1 + static_cast<int>(random() % 4);
        for (int r = 0; r < 1 + static_cast<int>(random() % 4); ++r) {
            std::vector<std::string> row;
            for (int c = 0; c < columns; ++c) {
                std::string cell;
                for (unsigned k = 0; k < random() % 6; ++k)
                    cell += alphabet[random() % alphabet.size()];
                row.push_back(cell);
            }
            if (r == 0)
                t.header = row;
            else
                t.rows.push_back(row);
        }
        const auto read = readCsv(csvText(t));
        REQUIRE(read.size() == t.rows.size() + 1);
        CHECK(read[0] == t.header);
        for (std::size_t r = 0; r < t.rows.size(); ++r)
            CHECK(read[r + 1] == t.rows[r]);
    }
}

TEST_CASE("Markdown cells escape pipes and backslashes and keep to one line", "[table-text]")
{
    // GitHub Flavored Markdown Spec 0.29-gfm (2019), section 4.10 "Tables
    // (extension)": a pipe inside a cell is written "\|"; section 2.4: a
    // backslash before punctuation escapes it, so a literal one is "\\".
    CHECK(markdownCell("R1 | R2") == "R1 \\| R2");
    CHECK(markdownCell("a\\b") == "a\\\\b");
    // A table row cannot span lines: a break becomes an inline <br>.
    CHECK(markdownCell("two\nlines") == "two<br>lines");
    CHECK(markdownCell("two\r\nlines") == "two<br>lines");
    CHECK(markdownCell("  padded  ") == "padded");
    CHECK(markdownCell("   ") == "");
}

TEST_CASE("Quantities are told from formulas and words", "[table-text]")
{
    // common practice (no source): a number, then at most one unit word.
    for (const char* yes : {"7.234 kHz", "0.4013", "\u22127.80 %", "+1.82 %", "2.181 k\u03A9", "0 s", "1e-09"})
        CHECK(isQuantity(yes));
    for (const char* no : {"1/(C3 \u00B7 R3)", "too close", "pole", "R1 \u22121.00", "", ".5", "12 kHz (x)",
                           "3 dB down"})
        CHECK(!isQuantity(no));
}

TEST_CASE("A Markdown pipe table has a delimiter row and reads back", "[table-text]")
{
    // GFM Spec 0.29-gfm (2019), section 4.10: header row, delimiter row of
    // dashes (a colon on the right aligns right), then body rows; cells
    // split on unescaped pipes.
    TableText table{{"Frequency", "Set by"}, {{"7.234 kHz", "R1 | R2"}, {"\u221212 %", "C\\1"}}};
    const auto rows = lines(markdownText(table));
    REQUIRE(rows.size() == 4);
    CHECK(rows[1] == "| ---: | --- |");
    CHECK(markdownRowCells(rows[0]) == table.header);
    CHECK(markdownRowCells(rows[2]) == table.rows[0]);
    CHECK(markdownRowCells(rows[3]) == table.rows[1]);
    // A formula that starts with a digit is not a quantity: left-aligned;
    // "∞" leaves a numeric column numeric.
    TableText formulas{{"ω", "τ"}, {{"1/(C3 · R3)", "\u221E"}, {"2/(C1 · R1)", "22 µs"}}};
    CHECK(lines(markdownText(formulas))[1] == "| --- | ---: |");
    // Short rows are padded so every row has the header's cells.
    TableText ragged{{"a", "b", "c"}, {{"1"}}};
    const auto raggedRows = lines(markdownText(ragged));
    CHECK(markdownRowCells(raggedRows[2]) == std::vector<std::string>{"1", "", ""});
}

TEST_CASE("The corner table text shows the engine's corners", "[table-text]")
{
    // common practice (no source): R in parallel with C seen from a port has
    // one pole at f = 1 / (2 pi R C); with R = 10 kOhm, C = 2.2 nF that is
    // 7.234 kHz. Its sensitivities are -1 for R and for C (from memory).
    const Network network = parseNetworkText(R"({
      "format": "tauline-network", "version": 1,
      "parts": [
        {"name": "R1", "kind": "resistor",  "value": "10k", "nodes": ["p", "gnd"]},
        {"name": "C1", "kind": "capacitor", "value": "2n2", "nodes": ["p", "gnd"]}],
      "response": {"kind": "impedance", "port": ["p", "gnd"]}})",
                                             "test network")
                                 .network;
    const Analysis a = analyze(network);
    const auto sensitivities = cornerSensitivities(network, a);
    const TableText table = cornerTableText(a, sensitivities);
    REQUIRE(table.header == cornerTableHeader(false));
    REQUIRE(table.rows.size() == 1);
    const auto& row = table.rows[0];
    const double closedForm = 1.0 / (2.0 * std::numbers::pi * 10e3 * 2.2e-9);
    CHECK(parseFrequency(row[0]) == Approx(closedForm).epsilon(5e-4));
    CHECK(row[0] == "7.234 kHz");
    CHECK(row[1] == "pole");
    CHECK(row[3] == "0.00 %");  // one time constant: the estimate is exact
    CHECK(row[4] == "ok");
    CHECK(row[5].find("R1 \u22121.00") != std::string::npos);
    CHECK(row[5].find("C1 \u22121.00") != std::string::npos);

    // Without sensitivities the column says there are none; expressions add
    // a column.
    const TableText bare = cornerTableText(a, {}, {"1 / (2π · R1 · C1)"});
    CHECK(bare.header.back() == "Expression");
    CHECK(bare.rows[0][5] == "\u2014");
    CHECK(bare.rows[0][6] == "1 / (2π · R1 · C1)");
    // And the whole of it goes through both writers intact.
    const auto csv = readCsv(csvText(table));
    CHECK(csv[1] == row);
}
