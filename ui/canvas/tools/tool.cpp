#include "ui/canvas/tools/tool.h"

namespace clevis::ui {

bool Tool::tryEdit(const TrialEdit& edit)
{
    Mechanism trial = mechanism();
    QString problem;
    const QString undoText = edit(trial, problem);
    if (!problem.isEmpty()) {
        host_.tell(problem);
        return false;
    }
    return doc().apply(undoText, [&trial](Mechanism& m) { m = std::move(trial); }).isEmpty();
}

}  // namespace clevis::ui
