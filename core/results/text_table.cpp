#include "core/results/text_table.h"

#include <algorithm>

namespace clevis {

std::size_t displayWidth(const std::string& text)
{
    // Continuation bytes are 10xxxxxx; every other byte starts a character.
    return std::size_t(std::count_if(text.begin(), text.end(), [](char c) { return (c & 0xC0) != 0x80; }));
}

std::string TextTable::render(const std::string& indent) const
{
    std::vector<std::size_t> width(align_.size(), 0);
    for (const auto& row : rows_)
        for (std::size_t c = 0; c < row.size() && c < width.size(); ++c)
            width[c] = std::max(width[c], displayWidth(row[c]));
    std::string out;
    for (const auto& row : rows_) {
        std::string line = indent;
        for (std::size_t c = 0; c < width.size(); ++c) {
            const std::string cell = c < row.size() ? row[c] : std::string();
            const std::string pad(width[c] - displayWidth(cell), ' ');
            line += (c ? "  " : "") + (align_[c] == Align::Right ? pad + cell : cell + pad);
        }
        line.erase(line.find_last_not_of(' ') + 1);
        out += line + '\n';
    }
    return out;
}

}  // namespace clevis
