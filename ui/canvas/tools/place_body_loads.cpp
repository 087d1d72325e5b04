// The torque and point-mass tools: both act on the body under the pointer.
#include "ui/document/mechanism_edits.h"
#include "ui/canvas/tools/place_tool.h"

namespace clevis::ui {
namespace {

bool onMovingBody(const std::string& body, const QString& what, QString& problem)
{
    if (body != kGroundName) return true;
    problem = QStringLiteral("Click on a moving part: %1 on the frame does nothing to the mechanism.").arg(what);
    return false;
}

}  // namespace

QString placeTorque(Mechanism& m, const SnapResult&, const std::string& body, QString& problem)
{
    if (!onMovingBody(body, QStringLiteral("a torque"), problem)) return {};
    edits::addTorque(m, body, 10.0);
    return QStringLiteral("Add torque on %1").arg(QString::fromStdString(body));
}

QString placePointMass(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem)
{
    if (!onMovingBody(body, QStringLiteral("a mass"), problem)) return {};
    edits::addPointMass(m, body, at.point, 0.5);
    return QStringLiteral("Add point mass on %1").arg(QString::fromStdString(body));
}

}  // namespace clevis::ui
