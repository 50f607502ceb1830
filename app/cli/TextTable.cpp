#include "TextTable.h"

#include <algorithm>

namespace tauline::cli {

size_t displayWidth(std::string_view text)
{
    size_t width = 0;
    for (unsigned char c : text)
        if ((c & 0xC0) != 0x80)  // not a UTF-8 continuation byte
            ++width;
    return width;
}

TextTable::TextTable(std::vector<std::string> header)
{
    rows_.push_back(std::move(header));
}

void TextTable::addRow(std::vector<std::string> cells)
{
    rows_.push_back(std::move(cells));
}

void TextTable::print(std::ostream& out, const std::string& indent) const
{
    std::vector<size_t> widths;
    for (const auto& row : rows_) {
        if (widths.size() < row.size())
            widths.resize(row.size(), 0);
        for (size_t i = 0; i < row.size(); ++i)
            widths[i] = std::max(widths[i], displayWidth(row[i]));
    }
    for (const auto& row : rows_) {
        std::string line = indent;
        for (size_t i = 0; i < row.size(); ++i) {
            line += row[i];
            if (i + 1 < row.size())
                line += std::string(widths[i] - displayWidth(row[i]) + 2, ' ');
        }
        while (line.size() > indent.size() && line.back() == ' ')
            line.pop_back();
        out << line << '\n';
    }
}

}  // namespace tauline::cli
