#include "ui/canvas/tools/place_edits.h"

#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

#include <QObject>

namespace clevis::ui {
namespace {

// Torques and masses act on the body under the pointer.
bool onMovingBody(const std::string& body, const QString& what, QString& problem)
{
    if (body != kGroundName) return true;
    problem = QObject::tr("Click on a moving part: %1 on the frame does nothing to the mechanism.").arg(what);
    return false;
}

}  // namespace

QString placeGroundPin(Mechanism& m, const SnapResult& at, const std::string&, QString&)
{
    // Clicking an unconnected pin fixes it to the frame instead of stacking a second pin on it.
    if (at.kind == SnapResult::Kind::Pin) {
        Joint& j = m.joints[at.joint];
        if (j.type == JointType::Pin && j.bodies[0].empty()) {
            j.bodies[0] = kGroundName;
            return QObject::tr("Fix pin %1 to ground").arg(QString::fromStdString(j.name));
        }
    }
    return QObject::tr("Add ground pin %1").arg(QString::fromStdString(edits::addGroundPin(m, at.point)));
}

QString placePin(Mechanism& m, const SnapResult& at, const std::string&, QString& problem)
{
    if (at.kind == SnapResult::Kind::Pin) {
        problem = QObject::tr("There is a pin here already: draw a link to it to connect more parts.");
        return {};
    }
    return QObject::tr("Add pin %1").arg(QString::fromStdString(edits::addPin(m, at.point)));
}

// A rotary motor on a pin, or a linear drive on a slider.
QString placeMotor(Mechanism& m, const SnapResult& at, const std::string&, QString& problem)
{
    if (at.kind != SnapResult::Kind::Pin) {
        problem = QObject::tr("Click a pin (for a rotary motor) or a slider (for a linear drive).");
        return {};
    }
    // Among joints stacked at the point, prefer a slider, then a complete pin.
    const std::vector<int> here = jointsAt(m, m.joints[at.joint].at, 1e-9);
    for (int i : here)
        if (m.joints[i].type == JointType::Slider)
            return QObject::tr("Add drive %1").arg(QString::fromStdString(edits::addSliderDrive(m, m.joints[i].name)));
    for (int i : here) {
        const Joint& j = m.joints[i];
        if (j.type == JointType::Pin && !j.bodies[0].empty() && !j.bodies[1].empty())
            return QObject::tr("Add motor %1").arg(QString::fromStdString(edits::addRotaryMotor(m, j.name)));
    }
    problem = QObject::tr("Pin %1 joins fewer than two parts: draw its links before adding a motor.")
                  .arg(QString::fromStdString(m.joints[at.joint].name));
    return {};
}

QString placeTorque(Mechanism& m, const SnapResult&, const std::string& body, QString& problem)
{
    if (!onMovingBody(body, QObject::tr("a torque"), problem)) return {};
    edits::addTorque(m, body, 10.0);
    return QObject::tr("Add torque on %1").arg(QString::fromStdString(body));
}

QString placePointMass(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem)
{
    if (!onMovingBody(body, QObject::tr("a mass"), problem)) return {};
    edits::addPointMass(m, body, at.point, 0.5);
    return QObject::tr("Add point mass on %1").arg(QString::fromStdString(body));
}

}  // namespace clevis::ui
