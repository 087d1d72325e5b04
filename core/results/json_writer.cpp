#include "core/results/json_writer.h"

#include <algorithm>
#include <charconv>
#include <cmath>

namespace clevis {

void JsonWriter::newline()
{
    if (compactDepth_ <= empty_.size()) return;
    out_ += '\n';
    out_.append(2 * empty_.size(), ' ');
}

// A value starts on a line of its own unless it follows its key (or the
// container is compact).
void JsonWriter::beforeValue()
{
    if (afterKey_) {
        afterKey_ = false;
        return;
    }
    if (empty_.empty()) return;
    if (!empty_.back()) out_ += ',';
    empty_.back() = false;
    newline();
}

JsonWriter& JsonWriter::key(std::string_view name)
{
    beforeValue();
    writeString(name);
    out_ += compactDepth_ <= empty_.size() ? ":" : ": ";
    afterKey_ = true;
    return *this;
}

void JsonWriter::open(char bracket, bool compact)
{
    beforeValue();
    out_ += bracket;
    empty_.push_back(true);
    if (compact && compactDepth_ > empty_.size()) compactDepth_ = empty_.size();
}

void JsonWriter::close(char bracket)
{
    const bool wasEmpty = empty_.back(), compact = compactDepth_ <= empty_.size();
    empty_.pop_back();
    if (compactDepth_ > empty_.size()) compactDepth_ = kNotCompact;
    if (!wasEmpty && !compact) newline();
    out_ += bracket;
}

void JsonWriter::beginObject(bool compact) { open('{', compact); }
void JsonWriter::endObject() { close('}'); }
void JsonWriter::beginArray(bool compact) { open('[', compact); }
void JsonWriter::endArray() { close(']'); }

void JsonWriter::value(double v)
{
    if (!std::isfinite(v)) return null();
    beforeValue();
    char text[32];
    const auto end = std::to_chars(text, text + sizeof text, v).ptr;
    out_.append(text, end);
}

void JsonWriter::value(std::int64_t v)
{
    beforeValue();
    char text[24];
    const auto end = std::to_chars(text, text + sizeof text, v).ptr;
    out_.append(text, end);
}

void JsonWriter::value(bool v)
{
    beforeValue();
    out_ += v ? "true" : "false";
}

void JsonWriter::null()
{
    beforeValue();
    out_ += "null";
}

void JsonWriter::value(std::string_view text)
{
    beforeValue();
    writeString(text);
}

// RFC 8259 string escapes; other bytes (UTF-8 included) pass through.
void JsonWriter::writeString(std::string_view text)
{
    out_ += '"';
    const auto plain = [](char c) { return c != '"' && c != '\\' && static_cast<unsigned char>(c) >= 0x20; };
    if (std::all_of(text.begin(), text.end(), plain)) {  // names and keys, nearly always
        out_ += text;
        out_ += '"';
        return;
    }
    for (const char c : text) {
        switch (c) {
        case '"': out_ += "\\\""; break;
        case '\\': out_ += "\\\\"; break;
        case '\n': out_ += "\\n"; break;
        case '\r': out_ += "\\r"; break;
        case '\t': out_ += "\\t"; break;
        case '\b': out_ += "\\b"; break;
        case '\f': out_ += "\\f"; break;
        default:
            if (static_cast<unsigned char>(c) < 0x20) {
                static const char hex[] = "0123456789abcdef";
                out_ += "\\u00";
                out_ += hex[(c >> 4) & 0xf];
                out_ += hex[c & 0xf];
            } else {
                out_ += c;
            }
        }
    }
    out_ += '"';
}

void JsonWriter::value(const nlohmann::json& tree)
{
    using Type = nlohmann::json::value_t;
    switch (tree.type()) {
    case Type::object:
        beginObject();
        for (const auto& [name, item] : tree.items()) key(name).value(item);
        endObject();
        break;
    case Type::array:
        beginArray();
        for (const auto& item : tree) value(item);
        endArray();
        break;
    case Type::string: value(std::string_view(tree.get_ref<const std::string&>())); break;
    case Type::boolean: value(tree.get<bool>()); break;
    case Type::number_integer: value(tree.get<std::int64_t>()); break;
    case Type::number_unsigned: value(std::int64_t(tree.get<std::uint64_t>())); break;
    case Type::number_float: value(tree.get<double>()); break;
    default: null();
    }
}

}  // namespace clevis
