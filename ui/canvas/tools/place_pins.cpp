// The ground pin and pin tools.
#include "ui/document/mechanism_edits.h"
#include "ui/canvas/tools/place_tool.h"

namespace clevis::ui {

QString placeGroundPin(Mechanism& m, const SnapResult& at, const std::string&, QString&)
{
    // Clicking an unconnected pin fixes it to the frame instead of stacking a second pin on it.
    if (at.kind == SnapResult::Kind::Pin) {
        Joint& j = m.joints[at.joint];
        if (j.type == JointType::Pin && j.bodies[0].empty()) {
            j.bodies[0] = kGroundName;
            return QStringLiteral("Fix pin %1 to ground").arg(QString::fromStdString(j.name));
        }
    }
    return QStringLiteral("Add ground pin %1").arg(QString::fromStdString(edits::addGroundPin(m, at.point)));
}

QString placePin(Mechanism& m, const SnapResult& at, const std::string&, QString& problem)
{
    if (at.kind == SnapResult::Kind::Pin) {
        problem = QStringLiteral("There is a pin here already: draw a link to it to connect more parts.");
        return {};
    }
    return QStringLiteral("Add pin %1").arg(QString::fromStdString(edits::addPin(m, at.point)));
}

}  // namespace clevis::ui
