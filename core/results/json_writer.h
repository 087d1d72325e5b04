// A JSON text written as it goes, for results too large to build as a
// document tree first (a 200-body cycle is tens of megabytes). Numbers are
// written in the shortest form that reads back to the same double
// (std::to_chars), non-finite ones as null; two-space indentation, one item
// per line, as nlohmann::json::dump(2) lays it out, except inside a
// container opened compact: that one is written on one line without spaces,
// as dump() does, whatever it holds.
#pragma once

#include <nlohmann/json.hpp>

#include <cstdint>
#include <string>
#include <string_view>
#include <vector>

namespace clevis {

// A key escaped and quoted once, for keys written at every step (the names
// of bodies and joints, "x", "fx"…): writing it is then one copy.
class JsonKey {
public:
    explicit JsonKey(std::string_view name);
    // `,"name":`: the separator before it and the colon after it included.
    std::string_view text() const { return text_; }

private:
    std::string text_;
};

class JsonWriter {
public:
    explicit JsonWriter(std::string& out) : out_(out) {}

    void beginObject(bool compact = false);
    void endObject();
    void beginArray(bool compact = false);
    void endArray();
    // The key of the next value, inside an object.
    JsonWriter& key(std::string_view name);
    JsonWriter& key(const JsonKey& name);

    void value(double v);
    void value(std::int64_t v);
    void value(int v) { value(std::int64_t(v)); }
    void value(bool v);
    void value(std::string_view text);
    void value(const char* text) { value(std::string_view(text)); }
    void value(const std::string& text) { value(std::string_view(text)); }
    void null();
    // A small subtree (a summary, say) written in place.
    void value(const nlohmann::json& tree);

    // Shorthands for a key and its value.
    template <class T>
    void field(std::string_view name, const T& v)
    {
        key(name).value(v);
    }
    template <class T>
    void field(const JsonKey& name, const T& v)
    {
        key(name).value(v);
    }
    // The same for a number, in one append: the form every step is made of.
    void field(const JsonKey& name, double v);

private:
    bool compact() const { return compactDepth_ <= empty_.size(); }
    void beforeValue();
    void open(char bracket, bool compact);
    void close(char bracket);
    void newline();

    std::string& out_;
    std::vector<char> empty_;  // per open container: nothing written in it yet
    bool afterKey_ = false;
    // The depth of the outermost compact container open (1: the top level).
    static constexpr std::size_t kNotCompact = std::size_t(-1);
    std::size_t compactDepth_ = kNotCompact;
};

}  // namespace clevis
