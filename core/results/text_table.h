// Plain-text tables aligned in columns. Widths are counted in characters
// (UTF-8 code points), so "°" and "·" do not push a column out of line.
#pragma once

#include <string>
#include <vector>

namespace clevis {

class TextTable {
public:
    enum class Align { Left, Right };

    // One alignment per column; rows may be shorter (missing cells are blank).
    explicit TextTable(std::vector<Align> columns) : align_(std::move(columns)) {}

    void addRow(std::vector<std::string> cells) { rows_.push_back(std::move(cells)); }
    bool empty() const { return rows_.empty(); }

    // Each row on its own line after `indent`, columns two spaces apart.
    std::string render(const std::string& indent = "  ") const;

private:
    std::vector<Align> align_;
    std::vector<std::vector<std::string>> rows_;
};

// Characters in a UTF-8 string.
std::size_t displayWidth(const std::string& text);

}  // namespace clevis
