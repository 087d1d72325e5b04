#include "core/results/json_writer.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstring>

namespace clevis {
namespace {

// RFC 8259 string escapes; other bytes (UTF-8 included) pass through.
void appendQuoted(std::string& out, std::string_view text)
{
    out += '"';
    const auto plain = [](char c) { return c != '"' && c != '\\' && static_cast<unsigned char>(c) >= 0x20; };
    if (std::all_of(text.begin(), text.end(), plain)) {  // names and keys, nearly always
        out += text;
        out += '"';
        return;
    }
    for (const char c : text) {
        switch (c) {
        case '"': out += "\\\""; break;
        case '\\': out += "\\\\"; break;
        case '\n': out += "\\n"; break;
        case '\r': out += "\\r"; break;
        case '\t': out += "\\t"; break;
        case '\b': out += "\\b"; break;
        case '\f': out += "\\f"; break;
        default:
            if (static_cast<unsigned char>(c) < 0x20) {
                static const char hex[] = "0123456789abcdef";
                out += "\\u00";
                out += hex[(c >> 4) & 0xf];
                out += hex[c & 0xf];
            } else {
                out += c;
            }
        }
    }
    out += '"';
}

}  // namespace

JsonKey::JsonKey(std::string_view name) : text_(",")
{
    appendQuoted(text_, name);
    text_ += ':';
}

void JsonWriter::newline()
{
    if (compact()) return;
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
    appendQuoted(out_, name);
    out_ += compact() ? ":" : ": ";
    afterKey_ = true;
    return *this;
}

// A compact container's key is copied whole, its comma left out if it comes first.
JsonWriter& JsonWriter::key(const JsonKey& name)
{
    const std::string_view text = name.text();
    if (compact()) {
        out_ += empty_.back() ? text.substr(1) : text;
        empty_.back() = false;
    } else {
        beforeValue();
        out_ += text.substr(1, text.size() - 2);
        out_ += ": ";
    }
    afterKey_ = true;
    return *this;
}

void JsonWriter::field(const JsonKey& name, double v)
{
    constexpr std::size_t kNumber = 32;  // the longest shortest form of a double is 24 characters
    char piece[128];
    const std::string_view text = name.text();
    if (!compact() || !std::isfinite(v) || text.size() + kNumber > sizeof piece) return key(name).value(v);
    const std::string_view k = empty_.back() ? text.substr(1) : text;
    empty_.back() = false;
    std::memcpy(piece, k.data(), k.size());
    const auto end = std::to_chars(piece + k.size(), piece + sizeof piece, v).ptr;
    out_.append(piece, end);
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
    const bool wasEmpty = empty_.back(), wasCompact = compact();
    empty_.pop_back();
    if (compactDepth_ > empty_.size()) compactDepth_ = kNotCompact;
    if (!wasEmpty && !wasCompact) newline();
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
    appendQuoted(out_, text);
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
