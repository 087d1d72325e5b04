#include "core/results/posed_mechanism.h"

#include "core/solver/body_state.h"

#include <map>

namespace clevis {
namespace {

class Mover {
public:
    Mover(const CompiledMechanism& m, const StepResult& step) : mechanism_(m), step_(step)
    {
        for (std::size_t b = 0; b < m.bodies.size(); ++b) index_[m.bodies[b].name] = int(b);
    }

    // P' = r_b + A(φ_b)(P − cg_b), with cg_b and P at the drawn pose.
    Vec2 point(const std::string& body, const Vec2& drawn) const
    {
        const int b = find(body);
        if (b < 0) return drawn;
        return bodyOrigin(step_.q, b) + rotation(angle(b)) * (drawn - mechanism_.bodies[b].mass.cg);
    }
    double turnDeg(const std::string& body) const { return radToDeg(angle(find(body))); }
    bool moves(const std::string& body) const { return find(body) >= 0; }

private:
    int find(const std::string& body) const
    {
        const auto it = index_.find(body);
        return it == index_.end() || 3 * it->second + 2 >= step_.q.size() ? -1 : it->second;
    }
    double angle(int b) const { return b < 0 ? 0.0 : bodyAngle(step_.q, b); }

    const CompiledMechanism& mechanism_;
    const StepResult& step_;
    std::map<std::string, int> index_;
};

void moveBody(Body& b, const Mover& move)
{
    if (b.cg) b.cg = move.point(b.name, *b.cg);
    if (b.section && b.section->ends)
        b.section->ends = {move.point(b.name, b.section->ends->first), move.point(b.name, b.section->ends->second)};
    for (auto& pm : b.pointMasses) pm.at = move.point(b.name, pm.at);
}

// A joint point is carried by its second body where that one moves (for a
// slider, the point on the sliding body); the axis turns with the first.
void moveJoint(Joint& j, const Mover& move)
{
    j.at = move.point(move.moves(j.bodies[1]) ? j.bodies[1] : j.bodies[0], j.at);
    j.axisDeg += move.turnDeg(j.bodies[0]);
}

void moveRef(BodyPointRef& p, const Mover& move) { p.at = move.point(p.body, p.at); }

void moveLoad(Load& load, const Mover& move)
{
    std::visit(
        [&](auto& l) {
            using T = std::decay_t<decltype(l)>;
            if constexpr (std::is_same_v<T, ForceLoad>) {
                if (l.turnsWithBody) l.force = rotation(degToRad(move.turnDeg(l.point.body))) * l.force;
                moveRef(l.point, move);
            } else if constexpr (std::is_same_v<T, SpringLoad> || std::is_same_v<T, DamperLoad>) {
                moveRef(l.a, move);
                moveRef(l.b, move);
            }
        },
        load);
}

}  // namespace

Mechanism posedMechanism(const Mechanism& drawn, const CompiledMechanism& m, const StepResult& step)
{
    const Mover move(m, step);
    Mechanism posed = drawn;
    for (auto& b : posed.bodies) moveBody(b, move);
    for (auto& j : posed.joints) moveJoint(j, move);
    for (auto& d : posed.drivers)
        for (auto& end : d.ends)
            if (end) moveRef(*end, move);
    for (auto& l : posed.loads) moveLoad(l, move);
    return posed;
}

}  // namespace clevis
