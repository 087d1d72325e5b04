#include "ui/files/recovery_reader.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"

#include <nlohmann/json.hpp>

#include <fstream>
#include <optional>
#include <sstream>

namespace clevis::ui {
namespace {

// One stand-in per side, so a pin joined to nothing does not read as joining
// a part to itself; the control character keeps them apart from real names.
std::string standIn(int side)
{
    return "\x01open side " + std::to_string(side);
}

void addStandIns(nlohmann::json& j)
{
    for (auto& joint : j.at("joints"))
        for (int side = 0; side < 2; ++side)
            if (joint.at("bodies").at(side) == "") joint["bodies"][side] = standIn(side);
}

void removeStandIns(Mechanism& m)
{
    for (Joint& joint : m.joints)
        for (int side = 0; side < 2; ++side)
            if (joint.bodies[side] == standIn(side)) joint.bodies[side].clear();
}

// Nothing when the file fails for another reason than open pins.
std::optional<Mechanism> readWithOpenPins(const std::string& path)
{
    try {
        std::ifstream in(path, std::ios::binary);
        std::stringstream text;
        text << in.rdbuf();
        nlohmann::json j = nlohmann::json::parse(text.str());
        addStandIns(j);
        Mechanism m = parseMechanism(j.dump()).mechanism;
        removeStandIns(m);
        return m;
    } catch (const std::exception&) {
        return std::nullopt;
    }
}

}  // namespace

Mechanism readRecoveryFile(const std::string& path)
{
    try {
        return loadMechanismFile(path).mechanism;
    } catch (const ModelError&) {
        if (std::optional<Mechanism> m = readWithOpenPins(path)) return *m;
        throw;
    }
}

}  // namespace clevis::ui
