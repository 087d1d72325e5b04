#include "core/results/body_loads.h"

#include "core/results/free_body.h"
#include "core/solver/applied_loads.h"

namespace clevis {

BodyLoads::BodyLoads(const CompiledMechanism& m, const StepResult& first)
    : m_(m), actions_(m.bodies.size()), applied_(m.bodies.size()),
      anyApplied_(!m.forces.empty() || !m.torques.empty() || !m.springs.empty() || !m.dampers.empty() ||
                  !m.torsionSprings.empty())
{
    for (std::size_t k = 0; k < first.actions[0].size(); ++k)
        for (int side = 0; side < 2; ++side)
            if (const int body = first.actions[side][k].body; body != kGround)
                actions_[std::size_t(body)].push_back({int(k), side, contactOf(m, k)});
}

void BodyLoads::step(const StepResult& s, const Pose& q)
{
    s_ = &s;
    q_ = &q;
    if (!anyApplied_) return;
    for (auto& loads : applied_) loads.clear();
    for (const AppliedLoad& l : appliedLoads(m_, q, s.qd, s.t, s.drivePosition))
        if (l.body != kGround && loadKind(m_, l.source) != FreeBodyItemKind::Weight)
            applied_[std::size_t(l.body)].push_back({l.at, l.force, l.couple});
}

void BodyLoads::on(int body, std::vector<BodyLoad>& out) const
{
    out.clear();
    forEachOn(body, [&out](const Vec2& at, const Vec2& force, double couple) { out.push_back({at, force, couple}); });
}

void bodyLoads(const CompiledMechanism& m, const StepResult& s, const Pose& q, std::vector<std::vector<BodyLoad>>& out)
{
    BodyLoads loads(m, s);
    loads.step(s, q);
    out.resize(m.bodies.size());
    for (std::size_t b = 0; b < out.size(); ++b) loads.on(int(b), out[b]);
}

}  // namespace clevis
