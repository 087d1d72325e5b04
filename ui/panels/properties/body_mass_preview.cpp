#include "ui/panels/properties/body_mass_preview.h"

#include "core/file/part_description.h"
#include "core/model/model_error.h"
#include "ui/document/sketch_geometry.h"

#include <algorithm>

namespace clevis::ui {

std::optional<MassProperties> previewMass(const Mechanism& m, const std::string& body, QString& problem)
{
    const int b = bodyIndex(m, body);
    if (b < 0) return std::nullopt;
    // A mechanism of this body alone, held by its own joints to the frame, so
    // unfinished parts elsewhere cannot stop compile() from working it out;
    // a compound pin's joints, at one point, hold it there once.
    Mechanism alone;
    alone.bodies.push_back(m.bodies[b]);
    alone.cycle.duration = 1.0;
    for (const auto& j : m.joints) {
        if (j.bodies[0] != body && j.bodies[1] != body) continue;
        if (std::any_of(alone.joints.begin(), alone.joints.end(), [&](const Joint& h) { return h.at == j.at; }))
            continue;
        Joint held = j;
        held.type = JointType::Pin;
        held.bodies[0] = kGroundName;
        held.bodies[1] = body;
        alone.joints.push_back(held);
    }
    try {
        return compile(alone).bodies[0].mass;
    } catch (const ModelError& e) {
        problem = QString::fromStdString(describeModelError(alone, e));
        return std::nullopt;
    }
}

}  // namespace clevis::ui
