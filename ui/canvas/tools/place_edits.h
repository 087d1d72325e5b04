// The edits of the tools that act on one click: ground pin, pin, motor,
// torque, point mass. Each edits a trial copy of the mechanism and returns the
// undo text, or sets `problem` to say why the click does not fit.
#pragma once

#include "core/model/mechanism.h"
#include "ui/canvas/snapping.h"

#include <QString>

#include <string>

namespace clevis::ui {

QString placeGroundPin(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placePin(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placeMotor(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placeTorque(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placePointMass(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);

}  // namespace clevis::ui
