#include "ui/canvas/tools/tool.h"

namespace clevis::ui {

void Tool::tryEdit(const TrialEdit& edit)
{
    Mechanism trial = mechanism();
    QString problem;
    const QString undoText = edit(trial, problem);
    if (!problem.isEmpty()) {
        host_.tell(problem);
        return;
    }
    doc().apply(undoText, [&trial](Mechanism& m) { m = std::move(trial); });
}

}  // namespace clevis::ui
