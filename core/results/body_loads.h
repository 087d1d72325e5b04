// What acts on each moving body at a step, without names or kinds and
// without the bodies' own weight (a bar's mass is laid along it instead),
// for passes over every step of a cycle that want one body at a time.
#pragma once

#include "core/results/results.h"
#include "core/solver/body_state.h"
#include "core/solver/compiled_mechanism.h"

#include <vector>

namespace clevis {

struct BodyLoad {
    Vec2 at = Vec2::Zero();     // m, global
    Vec2 force = Vec2::Zero();  // N, global
    double couple = 0.0;        // N·m, counter-clockwise
};

// A constraint acts on the same bodies at every step, so which of them act
// on a body is found once; only the applied loads (forces, torques, springs,
// dampers) are worked out afresh at each step, once for all bodies, and not
// at all for a mechanism without any.
class BodyLoads {
public:
    // `first` is any step of the cycle (its actions name the bodies).
    BodyLoads(const CompiledMechanism& m, const StepResult& first);

    // Readies step `s`, whose pose is `q` (both must outlive the calls to on()).
    void step(const StepResult& s, const Pose& q);

    // `out` (cleared first, its storage kept) gets what acts on moving body
    // `body` at the step, in the order of freeBodyItems: constraint actions
    // (joints, then drivers) placed where the constraint acts, then applied loads.
    void on(int body, std::vector<BodyLoad>& out) const;

    // The same, each load handed to visit(at, force, couple) as it is found.
    template <class Visit>
    void forEachOn(int body, Visit visit) const
    {
        for (const ActionOn& a : actions_[std::size_t(body)]) {
            const ConstraintAction& action = s_->actions[a.side][std::size_t(a.constraint)];
            if (!a.contact) {
                visit(action.at, action.force, action.couple);
                continue;
            }
            const Vec2 at = q_->point(*a.contact);
            visit(at, action.force, action.couple + cross(action.at - at, action.force));
        }
        for (const BodyLoad& l : applied_[std::size_t(body)]) visit(l.at, l.force, l.couple);
    }

private:
    struct ActionOn {
        int constraint, side;
        const BodyPoint* contact;  // where it acts (contactOf), nullptr: where it is attached
    };
    const CompiledMechanism& m_;
    std::vector<std::vector<ActionOn>> actions_;     // per body
    std::vector<std::vector<BodyLoad>> applied_;     // per body, this step
    bool anyApplied_ = false;
    const StepResult* s_ = nullptr;
    const Pose* q_ = nullptr;
};

// The same for every body at once: out[b] (the list resized to the bodies)
// as on(b) gives it.
void bodyLoads(const CompiledMechanism& m, const StepResult& s, const Pose& q, std::vector<std::vector<BodyLoad>>& out);

}  // namespace clevis
