// The motor tool: a rotary motor on a pin, or a linear drive on a slider.
#include "ui/document/mechanism_edits.h"
#include "ui/canvas/tools/place_tool.h"
#include "ui/document/sketch_geometry.h"

namespace clevis::ui {

QString placeMotor(Mechanism& m, const SnapResult& at, const std::string&, QString& problem)
{
    if (at.kind != SnapResult::Kind::Pin) {
        problem = QStringLiteral("Click a pin (for a rotary motor) or a slider (for a linear drive).");
        return {};
    }
    // Among joints stacked at the point, prefer a slider, then a complete pin.
    const std::vector<int> here = jointsAt(m, m.joints[at.joint].at, 1e-9);
    for (int i : here)
        if (m.joints[i].type == JointType::Slider)
            return QStringLiteral("Add drive %1").arg(QString::fromStdString(edits::addSliderDrive(m, m.joints[i].name)));
    for (int i : here) {
        const Joint& j = m.joints[i];
        if (j.type == JointType::Pin && !j.bodies[0].empty() && !j.bodies[1].empty())
            return QStringLiteral("Add motor %1").arg(QString::fromStdString(edits::addRotaryMotor(m, j.name)));
    }
    problem = QStringLiteral("Pin %1 joins fewer than two parts: draw its links before adding a motor.")
                  .arg(QString::fromStdString(m.joints[at.joint].name));
    return {};
}

}  // namespace clevis::ui
