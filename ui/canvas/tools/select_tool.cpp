#include "ui/canvas/tools/select_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

#include <QObject>
#include <QStringList>

namespace clevis::ui {
namespace {
constexpr int kDragMergeId = 1;
}

QString SelectTool::hint() const
{
    return drag_ ? QObject::tr("Drag to move the pin; Alt turns snapping off; Esc puts it back.")
                 : QObject::tr("Click a part to select it; drag a pin to move it.");
}

void SelectTool::press(const Pointer& p)
{
    const Selection hit = partAt(mechanism(), host_.view(), p.screen);
    doc().setSelection(hit);
    drag_.reset();
    const int joint = hit.kind == Selection::Kind::Joint ? jointIndex(mechanism(), hit.name.toStdString()) : -1;
    if (joint >= 0) drag_ = Drag{joint, mechanism()};
}

void SelectTool::move(const Pointer& p)
{
    if (!drag_) {
        showCompoundPin(p.screen);
        return;
    }
    const Vec2 raw = host_.view().toWorld(p.screen);
    const Vec2 to = (p.modifiers & Qt::AltModifier) ? raw : snapToGrid(host_.view(), raw);
    applyToDrag([joint = drag_->joint, to](Mechanism& m) { edits::moveJoint(m, joint, to); });
}

void SelectTool::release(const Pointer&)
{
    if (drag_) doc().closeMergeRun();
    drag_.reset();
}

bool SelectTool::cancel()
{
    if (!drag_) return false;
    // Merged into the drag's step, the start makes it a step that changes
    // nothing, which the document drops: nothing is left to undo or redo.
    applyToDrag([&start = drag_->start](Mechanism& m) { m = start; });
    doc().closeMergeRun();
    drag_.reset();
    return true;
}

// Over a pin where three or more bodies meet, the status line lists them and
// the two-body joints that hold them; moving off it brings the hint back.
void SelectTool::showCompoundPin(const QPointF& screen)
{
    const Mechanism& m = mechanism();
    const Selection hit = partAt(m, host_.view(), screen);
    const int joint = hit.kind == Selection::Kind::Joint ? jointIndex(m, hit.name.toStdString()) : -1;
    const std::vector<int> here = joint >= 0 ? pinsAt(m, m.joints[joint].at) : std::vector<int>{};
    if (here.size() < 2) {
        if (overCompound_) host_.tell(hint());
        overCompound_ = false;
        return;
    }
    overCompound_ = true;
    QStringList bodies, joints;
    for (const auto& b : bodiesOf(m, here)) bodies << QString::fromStdString(b);
    for (int i : here) joints << QString::fromStdString(m.joints[i].name);
    host_.tell(QObject::tr("Compound pin: %1 meet here, held by %2.").arg(bodies.join(", "), joints.join(", ")));
}

// Every edit of one drag merges into the same undo step.
void SelectTool::applyToDrag(const std::function<void(Mechanism&)>& edit)
{
    const QString name = QString::fromStdString(mechanism().joints[drag_->joint].name);
    doc().apply(QObject::tr("Move pin %1").arg(name), edit, kDragMergeId);
}

}  // namespace clevis::ui
