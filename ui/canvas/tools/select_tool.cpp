#include "ui/canvas/tools/select_tool.h"

#include "ui/canvas/hit_test.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

namespace clevis::ui {
namespace {
constexpr int kDragMergeId = 1;
}

QString SelectTool::hint() const
{
    return dragging_ >= 0 ? QStringLiteral("Drag to move the pin; Alt turns snapping off; Esc puts it back.")
                          : QStringLiteral("Click a part to select it; drag a pin to move it.");
}

void SelectTool::press(const Pointer& p)
{
    const Selection hit = partAt(mechanism(), host_.view(), p.screen);
    doc().setSelection(hit);
    dragging_ = hit.kind == Selection::Kind::Joint ? jointIndex(mechanism(), hit.name.toStdString()) : -1;
    moved_ = false;
}

void SelectTool::move(const Pointer& p)
{
    if (dragging_ < 0) return;
    const Vec2 raw = host_.view().toWorld(p.screen);
    const Vec2 to = (p.modifiers & Qt::AltModifier) ? raw : snapToGrid(host_.view(), raw);
    const QString name = QString::fromStdString(mechanism().joints[dragging_].name);
    const int joint = dragging_;
    doc().apply(QStringLiteral("Move pin %1").arg(name), [joint, to](Mechanism& m) { edits::moveJoint(m, joint, to); },
                kDragMergeId);
    moved_ = true;
}

void SelectTool::release(const Pointer&)
{
    if (dragging_ >= 0 && moved_) doc().closeMergeRun();
    dragging_ = -1;
}

bool SelectTool::cancel()
{
    if (dragging_ < 0) return false;
    if (moved_) doc().undoStack()->undo();
    doc().closeMergeRun();
    dragging_ = -1;
    return true;
}

}  // namespace clevis::ui
