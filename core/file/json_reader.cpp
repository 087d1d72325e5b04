#include "core/file/json_reader.h"

#include "core/file/file_units.h"

#include <algorithm>
#include <cmath>

namespace clevis {
namespace {

// The default DOM builder, except that errors keep their byte position:
// nlohmann's own number-overflow error (e.g. 1e999) carries none.
class LocatingParser : public nlohmann::detail::json_sax_dom_parser<nlohmann::json> {
public:
    using json_sax_dom_parser::json_sax_dom_parser;

    template <class Exception>
    bool parse_error(std::size_t position, const std::string&, const Exception& ex)
    {
        position_ = position;
        message_ = ex.what();
        return false;
    }

    std::size_t position_ = 0;
    std::string message_;
};

// `position` is nlohmann's 1-based index of the last byte read; columns count
// UTF-8 characters, not bytes.
std::string lineAndColumn(const std::string& text, std::size_t position)
{
    const std::size_t end = std::min(position > 0 ? position - 1 : 0, text.size());
    std::size_t line = 1, column = 1;
    for (std::size_t i = 0; i < end; ++i) {
        if (text[i] == '\n') {
            ++line;
            column = 1;
        } else if ((static_cast<unsigned char>(text[i]) & 0xC0) != 0x80) {
            ++column;
        }
    }
    return "line " + std::to_string(line) + ", column " + std::to_string(column);
}

// Drops nlohmann's "[json.exception.…] parse error at line …, column …: "
// prefix, since the location is reported separately.
std::string bareMessage(std::string message)
{
    if (const auto p = message.find("] "); p != std::string::npos) message.erase(0, p + 2);
    if (message.starts_with("parse error"))
        if (const auto p = message.find(": "); p != std::string::npos) message.erase(0, p + 2);
    return message;
}

std::string withArticle(const char* typeName)
{
    const std::string name = typeName;
    if (name == "null") return name;
    return (name == "object" || name == "array" ? "an " : "a ") + name;
}

// The parser itself refuses literals such as 1e999; the rule is checked here
// as well so that it does not rest on that.
bool within(double v, Bound bound)
{
    if (!std::isfinite(v)) return false;
    switch (bound) {
    case Bound::NonNegative: return v >= 0.0;
    case Bound::Positive: return v > 0.0;
    case Bound::Any: break;
    }
    return true;
}

const char* rule(Bound bound)
{
    switch (bound) {
    case Bound::NonNegative: return "a finite number >= 0";
    case Bound::Positive: return "a finite number > 0";
    case Bound::Any: break;
    }
    return "a finite number";
}

template <class Names>
std::string joined(const Names& names)
{
    std::string out;
    for (const char* n : names) out += (out.empty() ? "" : ", ") + std::string(n);
    return out;
}

// A mechanism file nests about five levels deep; far deeper text is refused
// before parsing so that no recursive step (building or reading the
// document) can exhaust the stack.
constexpr int kMaxNesting = 64;

// The 1-based position of the bracket that opens level kMaxNesting + 1, or
// 0. Brackets inside strings do not count; unbalanced text is left to the parser.
std::size_t tooDeepAt(const std::string& text)
{
    int depth = 0;
    bool inString = false;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (inString) {
            if (c == '\\') ++i;
            else if (c == '"') inString = false;
        } else if (c == '"') inString = true;
        else if (c == '[' || c == '{') {
            if (++depth > kMaxNesting) return i + 1;
        } else if ((c == ']' || c == '}') && --depth < 0) return 0;
    }
    return 0;
}

}  // namespace

nlohmann::json parseJsonText(const std::string& text)
{
    if (const std::size_t at = tooDeepAt(text))
        throw ModelError(lineAndColumn(text, at),
                         "arrays and objects nested more than " + std::to_string(kMaxNesting) + " levels deep");
    nlohmann::json result;
    LocatingParser parser(result);
    if (!nlohmann::json::sax_parse(text, &parser))
        throw ModelError(lineAndColumn(text, parser.position_), bareMessage(parser.message_));
    return result;
}

JsonNode::JsonNode(const nlohmann::json& value, std::string path, std::vector<std::string>& warnings)
    : value_(&value), path_(std::move(path)), warnings_(&warnings)
{}

void JsonNode::warn(const std::string& message) const { warnings_->push_back(path_ + ": " + message); }

JsonNode JsonNode::child(const nlohmann::json& value, std::string path) const
{
    return JsonNode(value, std::move(path), *warnings_);
}

std::string JsonNode::keyPath(const std::string& key) const { return path_.empty() ? key : path_ + "." + key; }

void JsonNode::expect(bool matches, const char* expected) const
{
    if (!matches) throw error(std::string("expected ") + expected + ", got " + withArticle(value_->type_name()));
}

ModelError JsonNode::notAChoice(const std::string& s, const std::vector<const char*>& allowed) const
{
    return error("\"" + s + "\" is not one of: " + joined(allowed));
}

void JsonNode::object(std::initializer_list<const char*> known) const
{
    expect(value_->is_object(), "an object");
    // Not a structured binding: clang before 16 cannot capture one in a lambda.
    for (const auto& item : value_->items()) {
        const std::string& key = item.key();
        if (std::none_of(known.begin(), known.end(), [&](const char* k) { return key == k; }))
            child(item.value(), keyPath(key)).warn("unknown key (ignored)");
    }
}

bool JsonNode::has(const char* key) const
{
    expect(value_->is_object(), "an object");
    return value_->contains(key);
}

JsonNode JsonNode::at(const char* key) const
{
    if (!has(key)) throw ModelError(keyPath(key), "required key missing");
    return child(value_->at(key), keyPath(key));
}

std::optional<JsonNode> JsonNode::find(const char* key) const
{
    if (!has(key)) return std::nullopt;
    return at(key);
}

const char* JsonNode::oneOf(std::initializer_list<const char*> keys) const
{
    const char* found = nullptr;
    for (const char* key : keys) {
        if (!has(key)) continue;
        if (found) throw ModelError(keyPath(key), std::string("cannot be given together with ") + found);
        found = key;
    }
    if (!found) throw error("needs one of: " + joined(keys));
    return found;
}

std::vector<JsonNode> JsonNode::elements() const
{
    expect(value_->is_array(), "an array");
    std::vector<JsonNode> out;
    for (std::size_t i = 0; i < value_->size(); ++i)
        out.push_back(child(value_->at(i), path_ + "[" + std::to_string(i) + "]"));
    return out;
}

std::vector<JsonNode> JsonNode::elements(std::size_t count) const
{
    std::vector<JsonNode> out = elements();
    if (out.size() != count)
        throw error("expected " + std::to_string(count) + " values, got " + std::to_string(out.size()));
    return out;
}

std::string JsonNode::string() const
{
    expect(value_->is_string(), "a string");
    return value_->get<std::string>();
}

std::string JsonNode::name() const
{
    std::string s = string();
    if (s.empty()) throw error("must not be empty");
    return s;
}

bool JsonNode::isBoolean() const { return value_->is_boolean(); }

bool JsonNode::boolean() const
{
    expect(value_->is_boolean(), "a boolean (true or false)");
    return value_->get<bool>();
}

double JsonNode::number(Bound bound) const
{
    expect(value_->is_number(), "a number");
    const double v = value_->get<double>();
    if (!within(v, bound)) throw error(std::string("must be ") + rule(bound) + " (got " + shortestDecimal(v) + ")");
    return v;
}

int JsonNode::integer(int min, int max) const
{
    const double v = number();
    if (v != std::floor(v) || v < min || v > max)
        throw error("must be a whole number from " + std::to_string(min) + " to " + std::to_string(max) + " (got " +
                    shortestDecimal(v) + ")");
    return static_cast<int>(v);
}

Vec2 JsonNode::point() const
{
    const std::vector<JsonNode> xy = elements(2);
    return {xy[0].number(), xy[1].number()};
}

std::vector<double> JsonNode::numbers() const
{
    std::vector<double> out;
    for (const JsonNode& e : elements()) out.push_back(e.number());
    return out;
}

std::vector<double> JsonNode::increasing() const
{
    const std::vector<JsonNode> items = elements();
    if (items.size() < 2) throw error("needs at least 2 values, got " + std::to_string(items.size()));
    std::vector<double> out;
    for (const JsonNode& e : items) {
        const double v = e.number();
        if (!out.empty() && !(v > out.back()))
            throw e.error("must be greater than the value before it (" + shortestDecimal(out.back()) + ")");
        out.push_back(v);
    }
    return out;
}

}  // namespace clevis
