#include "ui/canvas/tools/select_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

#include <QObject>

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
    if (!drag_) return;
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

// Every edit of one drag merges into the same undo step.
void SelectTool::applyToDrag(const std::function<void(Mechanism&)>& edit)
{
    const QString name = QString::fromStdString(mechanism().joints[drag_->joint].name);
    doc().apply(QObject::tr("Move pin %1").arg(name), edit, kDragMergeId);
}

}  // namespace clevis::ui
