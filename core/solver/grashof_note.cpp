#include "core/solver/grashof_note.h"

#include "core/model/grashof.h"

#include <array>
#include <optional>
#include <sstream>
#include <stdexcept>

namespace clevis {
namespace {

// The loop from the driven ground pin: pins O2 (driven), A, B, O4 and the
// moving links between them.
struct FourBar {
    std::array<const CompiledJoint*, 4> pins;
    int input, coupler, output;
};

const CompiledJoint* pinBetween(const CompiledMechanism& m, int a, int b)
{
    for (const CompiledJoint& j : m.joints)
        if ((j.body[0] == a && j.body[1] == b) || (j.body[0] == b && j.body[1] == a)) return &j;
    return nullptr;
}

std::optional<FourBar> findFourBar(const CompiledMechanism& m)
{
    if (m.bodies.size() != 3 || m.joints.size() != 4 || m.drivers.size() != 1) return std::nullopt;
    for (const CompiledJoint& j : m.joints)
        if (j.type != JointType::Pin) return std::nullopt;
    const CompiledDriver& d = m.drivers.front();
    if (d.type != DriverType::Rotary || d.joint < 0) return std::nullopt;
    const CompiledJoint& driven = m.joints[d.joint];
    if (driven.body[0] != kGround && driven.body[1] != kGround) return std::nullopt;
    const int input = driven.body[0] == kGround ? driven.body[1] : driven.body[0];
    for (int output = 0; output < 3; ++output) {
        if (output == input) continue;
        const int coupler = 3 - input - output;  // the bodies are 0, 1 and 2
        const FourBar bar{
            {&driven, pinBetween(m, input, coupler), pinBetween(m, coupler, output), pinBetween(m, output, kGround)},
            input,
            coupler,
            output};
        if (bar.pins[1] && bar.pins[2] && bar.pins[3]) return bar;
    }
    return std::nullopt;
}

Vec2 drawnPosition(const CompiledMechanism& m, const CompiledJoint& j)
{
    const BodyPoint& p = j.point[0];
    return p.body == kGround ? p.local : Vec2(m.bodies[p.body].mass.cg + p.local);
}

// Indexed by FourBarLink: ground O2–O4, input O2–A, coupler A–B, output B–O4.
std::array<double, 4> linkLengths(const CompiledMechanism& m, const FourBar& bar)
{
    std::array<Vec2, 4> at;
    for (int k = 0; k < 4; ++k) at[k] = drawnPosition(m, *bar.pins[k]);
    return {(at[3] - at[0]).norm(), (at[1] - at[0]).norm(), (at[2] - at[1]).norm(), (at[3] - at[2]).norm()};
}

std::string quoted(const std::string& name) { return "\"" + name + "\""; }

}  // namespace

std::string grashofNote(const CompiledMechanism& m)
{
    const std::optional<FourBar> bar = findFourBar(m);
    if (!bar) return {};
    const std::array<double, 4> lengths = linkLengths(m, *bar);
    GrashofResult g;
    try {
        g = classifyFourBar(lengths);
    } catch (const std::invalid_argument&) {
        return {};  // drawn with a link of no length or all pins in line: no class to tell
    }
    if (g.kind != GrashofClass::ChangePoint && turnsFullyAgainstGround(g, FourBarLink::Input)) return {};
    const double sl = lengths[int(g.shortest)] + lengths[int(g.longest)], pq = sl + g.margin;
    const std::string driven = quoted(m.bodies[bar->input].name);
    std::ostringstream s;
    if (g.kind == GrashofClass::ChangePoint) {
        s << "It is a change-point four-bar (s + l = p + q = " << sl << " m): twice a turn all four pins fall into "
          << "line, where the motion is undetermined and may switch branch.";
        return s.str();
    }
    if (g.kind == GrashofClass::TripleRocker)
        s << "It is a non-Grashof four-bar (s + l = " << sl << " m > p + q = " << pq << " m): no link turns fully";
    else {
        const int fullyTurning = g.shortest == FourBarLink::Coupler ? bar->coupler : bar->output;
        s << "It is a Grashof " << grashofClassName(g.kind) << " (s + l = " << sl << " m < p + q = " << pq
          << " m) whose fully turning link is the " << fourBarLinkName(g.shortest) << " "
          << quoted(m.bodies[fullyTurning].name);
    }
    s << ", so the driven link " << driven << " only swings between two toggle positions";
    if (std::holds_alternative<ConstantSpeed>(m.drivers.front().motion))
        s << ": a crank driven at constant speed cannot complete the cycle.";
    else s << ": the driver's motion must stay between them.";
    return s.str();
}

}  // namespace clevis
