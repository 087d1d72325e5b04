#include "ui/canvas/tools/tool.h"

namespace clevis::ui {
namespace {

// The part an edit added, to be selected so its properties are at hand (a new
// link's mass, a new force's value): a body before the joints that came with
// it, then a driver, a load or a joint; none if nothing was added.
Selection addedPart(const Mechanism& before, const Mechanism& after)
{
    using Kind = Selection::Kind;
    const auto named = [](Kind kind, const std::string& name) { return Selection{kind, QString::fromStdString(name)}; };
    if (after.bodies.size() > before.bodies.size()) return named(Kind::Body, after.bodies.back().name);
    if (after.drivers.size() > before.drivers.size()) return named(Kind::Driver, after.drivers.back().name);
    if (after.loads.size() > before.loads.size()) return Selection{Kind::Load, {}, int(after.loads.size()) - 1};
    if (after.joints.size() > before.joints.size()) return named(Kind::Joint, after.joints.back().name);
    return {};
}

}  // namespace

bool Tool::tryEdit(const TrialEdit& edit)
{
    Mechanism trial = mechanism();
    QString problem;
    const QString undoText = edit(trial, problem);
    if (!problem.isEmpty()) {
        host_.tell(problem);
        return false;
    }
    const Selection added = addedPart(mechanism(), trial);
    if (!doc().apply(undoText, [&trial](Mechanism& m) { m = std::move(trial); }).isEmpty()) return false;
    if (added.kind != Selection::Kind::None) doc().setSelection(added);
    return true;
}

}  // namespace clevis::ui
