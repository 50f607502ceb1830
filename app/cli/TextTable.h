#pragma once

#include <ostream>
#include <string>
#include <string_view>
#include <vector>

namespace tauline::cli {

// Columns for a terminal: widths count characters, not bytes, so "µs" and
// "kΩ" line up with plain ASCII.
class TextTable {
public:
    explicit TextTable(std::vector<std::string> header);
    void addRow(std::vector<std::string> cells);
    void print(std::ostream& out, const std::string& indent = "  ") const;

private:
    std::vector<std::vector<std::string>> rows_;  // the header first
};

// Characters (UTF-8 code points) in a string.
size_t displayWidth(std::string_view text);

}  // namespace tauline::cli
