// The internal loads of one bar at one step by symbolic integration
// (tests/sympy_internal_loads.py, independent of the closed forms in
// core/results/internal_loads.cpp), for the tests that check against it.
#pragma once

#include "core/results/bar_model.h"
#include "core/results/free_body.h"
#include "core/solver/body_state.h"

#include "tests/python_check.h"

#include <nlohmann/json.hpp>

#ifndef CLEVIS_SYMPY_INTERNAL_LOADS
#error "CLEVIS_SYMPY_INTERNAL_LOADS must name tests/sympy_internal_loads.py"
#endif

namespace clevis::test {

inline nlohmann::json toJson(const Vec2& v) { return nlohmann::json::array({v.x(), v.y()}); }

inline nlohmann::json runSympy(const nlohmann::json& input)
{
    return runPythonCheck(CLEVIS_SYMPY_INTERNAL_LOADS, input);
}

// Rows [x, N, V, M] at `stations` of bar `b` at `step`; `items` is what acts
// on the bar's body there (freeBodyItems).
inline nlohmann::json sympyBarLoads(const CompiledMechanism& m, const BarModel& b, const StepResult& step,
                                    const std::vector<FreeBodyItem>& items, const std::vector<double>& stations)
{
    nlohmann::json in;
    const Vec2 a = pointPosition(step.q, b.ends[0].point);
    in["a"] = toJson(a);
    in["e"] = toJson((pointPosition(step.q, b.ends[1].point) - a) / b.length);
    in["length"] = b.length;
    in["g_centre"] = toJson(bodyOrigin(step.q, b.body));
    in["a_centre"] = toJson(step.qdd.segment<2>(3 * b.body));
    in["omega"] = step.qd[3 * b.body + 2];
    in["alpha"] = step.qdd[3 * b.body + 2];
    in["gravity"] = toJson(m.gravity);
    in["spread"] = {{"mass", b.spread.mass},
                    {"from", b.spread.from},
                    {"to", b.spread.to},
                    {"offset", b.spread.offset},
                    {"rotary", b.spread.rotary}};
    in["point_masses"] = nlohmann::json::array();
    for (const auto& [mass, point] : b.pointMasses)
        in["point_masses"].push_back({{"mass", mass}, {"at", toJson(pointPosition(step.q, point))}});
    in["items"] = nlohmann::json::array();
    for (const auto& item : items)
        if (item.kind != FreeBodyItemKind::Weight)
            in["items"].push_back({{"at", toJson(item.at)}, {"force", toJson(item.force)}, {"couple", item.couple}});
    in["stations"] = stations;
    const nlohmann::json out = runSympy(in);
    return out.contains("stations") ? out["stations"] : nlohmann::json::array();
}

}  // namespace clevis::test
