#include "core/file/json_layout.h"

#include <algorithm>

namespace clevis {
namespace {

using Json = nlohmann::ordered_json;

std::string scalarText(const Json& value)
{
    // Replacing bad UTF-8 keeps a save from failing over one odd name.
    return value.dump(-1, ' ', false, Json::error_handler_t::replace);
}

bool isStructured(const Json& value) { return value.is_object() || value.is_array(); }

bool spansLines(const Json& value)
{
    if (value.is_object()) return !value.empty();
    return value.is_array() && std::any_of(value.begin(), value.end(), isStructured);
}

void writeInline(std::string& out, const Json& value)
{
    if (!value.is_array()) {
        out += scalarText(value);
        return;
    }
    out += '[';
    for (std::size_t i = 0; i < value.size(); ++i) out += (i ? ", " : "") + scalarText(value[i]);
    out += ']';
}

void write(std::string& out, const Json& value, int depth)
{
    if (!spansLines(value)) {
        writeInline(out, value);
        return;
    }
    const bool object = value.is_object();
    out += object ? '{' : '[';
    const char* separator = "\n";
    for (const auto& item : value.items()) {
        out += separator + std::string(2 * (depth + 1), ' ');
        if (object) out += scalarText(Json(item.key())) + ": ";
        write(out, item.value(), depth + 1);
        separator = ",\n";
    }
    out += '\n' + std::string(2 * depth, ' ') + (object ? '}' : ']');
}

}  // namespace

std::string layoutJson(const nlohmann::ordered_json& value)
{
    std::string out;
    write(out, value, 0);
    return out + '\n';
}

}  // namespace clevis
