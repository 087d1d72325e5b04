#include "ui/canvas/tool_palette.h"

#include "ui/canvas/canvas_view.h"
#include "ui/canvas/tool_icons.h"
#include "ui/canvas/tools/body_tool.h"
#include "ui/canvas/tools/place_edits.h"
#include "ui/canvas/tools/place_tool.h"
#include "ui/canvas/tools/select_tool.h"
#include "ui/canvas/tools/two_point_edits.h"
#include "ui/canvas/tools/two_point_tool.h"

#include <QAction>
#include <QActionGroup>
#include <QMenu>
#include <QToolBar>

namespace clevis::ui {
namespace {

template <typename T, typename... Args>
auto make(Args... args)
{
    return [=](ToolHost& host) -> std::unique_ptr<Tool> { return std::make_unique<T>(host, args...); };
}

}  // namespace

ToolPalette::ToolPalette(CanvasView* canvas, QObject* parent)
    : QObject(parent), canvas_(canvas), group_(new QActionGroup(this))
{
    select_ = add(tr("Select"), QStringLiteral("Q"), make<SelectTool>());
    add(tr("Ground pin"), QStringLiteral("G"),
        make<PlaceTool>(tr("Ground pin: click where the frame holds a pivot."), PlaceEdit(placeGroundPin)));
    add(tr("Pin"), QStringLiteral("P"),
        make<PlaceTool>(tr("Pin: click where two moving parts will be pinned together."), PlaceEdit(placePin)));
    add(tr("Link"), QStringLiteral("L"), make<BodyTool>(BodyTool::Shape::Bar));
    add(tr("Plate"), QStringLiteral("A"), make<BodyTool>(BodyTool::Shape::Plate));
    add(tr("Slider"), QStringLiteral("S"),
        make<TwoPointTool>(tr("Slider: click the block's position."),
                           tr("Slider: click along the direction it slides."), TwoPointEdit(drawSlider)));
    add(tr("Pin in slot"), QStringLiteral("O"),
        make<TwoPointTool>(tr("Pin in slot: click the pin's position on the slotted part."),
                           tr("Pin in slot: click along the slot."), TwoPointEdit(drawSlot)));
    add(tr("Motor"), QStringLiteral("M"),
        make<PlaceTool>(tr("Motor: click a pin for a rotary motor, or a slider for a linear drive."),
                        PlaceEdit(placeMotor)));
    add(tr("Cylinder"), QStringLiteral("C"),
        make<TwoPointTool>(tr("Cylinder: click the barrel's mounting point."), tr("Cylinder: click the rod's end."),
                           TwoPointEdit(drawCylinder)));
    add(tr("Force"), QStringLiteral("F"),
        make<TwoPointTool>(tr("Force: click where it acts on a part."), tr("Force: click the direction it pushes."),
                           TwoPointEdit(drawForce)));
    add(tr("Torque"), QStringLiteral("T"),
        make<PlaceTool>(tr("Torque: click the part it turns."), PlaceEdit(placeTorque)));
    add(tr("Spring"), QStringLiteral("K"),
        make<TwoPointTool>(tr("Spring: click its first end."),
                           tr("Spring: click its second end (it is relaxed as drawn)."), TwoPointEdit(drawSpring)));
    add(tr("Damper"), QStringLiteral("D"),
        make<TwoPointTool>(tr("Damper: click its first end."), tr("Damper: click its second end."),
                           TwoPointEdit(drawDamper)));
    add(tr("Point mass"), QStringLiteral("W"),
        make<PlaceTool>(tr("Point mass: click where it sits on a part."), PlaceEdit(placePointMass)));
    select_->trigger();
    connect(canvas_, &CanvasView::toolDismissed, select_, &QAction::trigger);
}

QAction* ToolPalette::add(const QString& name, const QString& key, Factory factory)
{
    auto* a = new QAction(toolIcon(name), name, this);
    a->setCheckable(true);
    a->setShortcut(QKeySequence(key));
    a->setToolTip(QStringLiteral("%1 (%2)").arg(name, key));
    a->setObjectName(name);
    group_->addAction(a);
    connect(a, &QAction::triggered, this, [this, factory] { canvas_->setTool(factory(*canvas_)); });
    return a;
}

QAction* ToolPalette::action(const QString& name) const
{
    for (QAction* a : group_->actions())
        if (a->text() == name) return a;
    return nullptr;
}

void ToolPalette::fill(QMenu* menu, QToolBar* bar) const
{
    for (QAction* a : group_->actions()) {
        menu->addAction(a);
        bar->addAction(a);
    }
}

}  // namespace clevis::ui
