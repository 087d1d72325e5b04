// Reading a JSON document while keeping track of where each value sits, so
// that every complaint names its place: `joints[2].bodies[1]`, or a line and
// column when the text is not JSON at all.
#pragma once

#include "core/model/geometry.h"
#include "core/model/model_error.h"

#include <nlohmann/json.hpp>

#include <initializer_list>
#include <optional>
#include <string>
#include <vector>

namespace clevis {

// Parses JSON text; malformed text throws ModelError located by line and column.
nlohmann::json parseJsonText(const std::string& text);

// The range a number must lie in, besides being finite.
enum class Bound { Any, NonNegative, Positive };

// A value in a document and its path. Nodes share the list that collects
// warnings about keys the reader does not know.
class JsonNode {
public:
    JsonNode(const nlohmann::json& value, std::string path, std::vector<std::string>& warnings);

    const std::string& path() const { return path_; }
    ModelError error(const std::string& message) const { return ModelError(path_, message); }
    void warn(const std::string& message) const;

    // Checks that this is an object and warns about keys outside `known`.
    void object(std::initializer_list<const char*> known) const;
    // Key look-ups; each insists that this is an object.
    bool has(const char* key) const;
    JsonNode at(const char* key) const;  // a required key
    std::optional<JsonNode> find(const char* key) const;
    // The one key of `keys` present; none or several of them is an error.
    const char* oneOf(std::initializer_list<const char*> keys) const;
    std::string keyPath(const std::string& key) const;

    std::vector<JsonNode> elements() const;
    std::vector<JsonNode> elements(std::size_t count) const;  // exactly `count` of them

    std::string string() const;
    std::string name() const;  // a non-empty string
    bool isBoolean() const;
    bool boolean() const;
    double number(Bound bound = Bound::Any) const;
    int integer(int min, int max) const;
    Vec2 point() const;
    std::vector<double> numbers() const;
    // Strictly increasing, at least two values.
    std::vector<double> increasing() const;

    // The entry of `entries` whose `name` equals this string.
    template <class Entries>
    const auto& choice(const Entries& entries) const;

private:
    JsonNode child(const nlohmann::json& value, std::string path) const;
    void expect(bool matches, const char* expected) const;
    ModelError notAChoice(const std::string& s, const std::vector<const char*>& allowed) const;

    const nlohmann::json* value_;
    std::string path_;
    std::vector<std::string>* warnings_;
};

template <class Entries>
const auto& JsonNode::choice(const Entries& entries) const
{
    const std::string s = string();
    std::vector<const char*> allowed;
    for (const auto& e : entries) {
        if (s == e.name) return e;
        allowed.push_back(e.name);
    }
    throw notAChoice(s, allowed);
}

}  // namespace clevis
