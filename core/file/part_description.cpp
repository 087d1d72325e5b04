#include "core/file/part_description.h"

#include "core/model/type_names.h"

#include <cctype>
#include <cstdlib>
#include <optional>
#include <utility>
#include <vector>

namespace clevis {
namespace {

// One step of a path: `point_masses[2]` is the key and its indices.
struct Segment {
    std::string key;
    std::vector<int> indices;
};

std::vector<Segment> segmentsOf(const std::string& path)
{
    std::vector<Segment> out;
    for (std::size_t start = 0; start <= path.size();) {
        const std::size_t end = std::min(path.find('.', start), path.size());
        const std::string text = path.substr(start, end - start);
        const std::size_t bracket = text.find('[');
        Segment s{text.substr(0, bracket), {}};
        for (std::size_t p = bracket; p != std::string::npos; p = text.find('[', p + 1))
            s.indices.push_back(std::atoi(text.c_str() + p + 1));
        out.push_back(std::move(s));
        start = end + 1;
    }
    return out;
}

std::string quoted(const std::string& name) { return "“" + name + "”"; }

std::string capitalised(std::string s)
{
    if (!s.empty() && s[0] >= 'a' && s[0] <= 'z') s[0] = char(s[0] - 'a' + 'A');
    return s;
}

// A part as "Kind “name”"; one without a name by its place in its list.
std::string named(const std::string& kind, const std::string& name, int index)
{
    if (name.empty()) return "unnamed " + kind + " (no. " + std::to_string(index + 1) + ")";
    return kind + " " + quoted(name);
}

const char* driverKindWord(DriverType type) { return type == DriverType::Rotary ? "motor" : "linear drive"; }

const char* loadKindWord(const Load& load)
{
    static const char* const kinds[] = {"force", "torque", "spring", "damper", "torsion spring"};
    return kinds[load.index()];
}

// The part the first step of a path names, if it names one of `m`.
std::optional<std::string> partOf(const Mechanism& m, const Segment& s)
{
    if (s.indices.size() != 1) return std::nullopt;
    const int i = s.indices[0];
    const auto within = [i](const auto& list) { return i >= 0 && i < int(list.size()); };
    if (s.key == "bodies" && within(m.bodies)) return named("body", m.bodies[i].name, i);
    if (s.key == "joints" && within(m.joints)) return named(jointKindWord(m.joints[i].type), m.joints[i].name, i);
    if (s.key == "drivers" && within(m.drivers)) return named(driverKindWord(m.drivers[i].type), m.drivers[i].name, i);
    if (s.key == "loads" && within(m.loads)) {
        const std::string name = std::visit([](const auto& l) { return l.name; }, m.loads[i]);
        return named(loadKindWord(m.loads[i]), name, i);
    }
    return std::nullopt;
}

bool endsWith(const std::string& s, const std::string& tail)
{
    return s.size() > tail.size() && s.compare(s.size() - tail.size(), tail.size(), tail) == 0;
}

// A file key as words: without its unit (the form shows that), spelt out.
std::string keyWords(std::string key)
{
    for (const char* unit : {"_deg_s2", "_deg", "_rpm", "_s"})
        if (endsWith(key, unit)) {
            key.erase(key.size() - std::string(unit).size());
            break;
        }
    static const std::pair<const char*, const char*> kWords[] = {
        {"cg", "centre of mass"}, {"at", "position"}, {"accel", "acceleration"}, {"point_masses", "point mass"},
        {"bodies", "body"},       {"between", "end"}, {"ends", "end"},           {"a", "end a"},
        {"b", "end b"},
    };
    for (const auto& [file, words] : kWords)
        if (key == file) return words;
    for (char& c : key)
        if (c == '_') c = ' ';
    return key;
}

// The mechanism's own keys, outside any part.
std::string topLevelWords(const std::string& key)
{
    if (key == "name") return "mechanism name";
    if (key == "clevis") return "file version";
    return key;
}

// Keys holding two things told apart by order, and keys holding a point.
bool isPair(const std::string& key) { return key == "bodies" || key == "between" || key == "ends"; }
bool isPoint(const std::string& key) { return key == "at" || key == "cg" || key == "force" || key == "gravity"; }

// `point_masses[0]` of a body reads as the point mass's name when it has one.
std::string pointMassWords(const Mechanism& m, const Segment& part, const Segment& s)
{
    const Body& body = m.bodies[part.indices[0]];
    const int i = s.indices.empty() ? -1 : s.indices[0];
    if (i < 0 || i >= int(body.pointMasses.size())) return keyWords(s.key);
    return named("point mass", body.pointMasses[i].name, i);
}

// A step after the part: `bodies[1]` of a joint is its second body, `at[0]`
// the x of a point, `time_s[3]` the fourth value of a list.
std::string fieldWords(const Mechanism& m, const std::vector<Segment>& path, std::size_t at, bool inBody)
{
    const Segment& s = path[at];
    if (inBody && s.key == "point_masses") return pointMassWords(m, path[0], s);
    const bool listOfPositions = at > 0 && path[at - 1].key == "profile";
    std::string words = keyWords(s.key);
    for (std::size_t k = 0; k < s.indices.size(); ++k) {
        const int i = s.indices[k];
        const bool firstOrSecond = i == 0 || i == 1;
        if (k == 0 && isPair(s.key) && firstOrSecond) words = (i == 0 ? "first " : "second ") + words;
        else if ((k > 0 || (isPoint(s.key) && !listOfPositions)) && firstOrSecond) words += i == 0 ? ", x" : ", y";
        else words += ", value " + std::to_string(i + 1);
    }
    return words;
}

// ASCII quotes in pairs become typographic ones, matching the part names.
std::string typographicQuotes(const std::string& s)
{
    std::size_t count = 0;
    for (char c : s) count += c == '"';
    if (count % 2 != 0) return s;
    std::string out;
    bool open = true;
    for (char c : s) {
        if (c != '"') out += c;
        else out += open ? "“" : "”";
        if (c == '"') open = !open;
    }
    return out;
}

}  // namespace

std::string describePath(const Mechanism& m, const std::string& path)
{
    if (path.empty() || path.starts_with("line ")) return path;
    const std::vector<Segment> segments = segmentsOf(path);
    const std::optional<std::string> part = partOf(m, segments[0]);
    std::string out = part ? *part : topLevelWords(segments[0].key);
    for (std::size_t k = 1; k < segments.size(); ++k)
        out += ", " + fieldWords(m, segments, k, part && segments[0].key == "bodies");
    return capitalised(out);
}

std::string describeModelError(const Mechanism& m, const ModelError& e)
{
    const std::string what = e.what();
    const std::string message = typographicQuotes(e.path().empty() ? what : what.substr(e.path().size() + 2));
    const std::string place = describePath(m, e.path());
    if (place.empty()) return capitalised(message);
    // A message that begins by naming its part ("pin “P3” joins only …") is not prefixed with it again.
    std::string lowerPlace = place;
    lowerPlace[0] = char(std::tolower(static_cast<unsigned char>(lowerPlace[0])));
    if (message.starts_with(lowerPlace + " ")) return capitalised(message);
    return place + ": " + message;
}

}  // namespace clevis
