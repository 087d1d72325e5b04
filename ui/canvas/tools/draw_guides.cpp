// The slider and pin-in-slot tools: a point, then the direction of the guide.
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/canvas/tools/two_point_tool.h"

namespace clevis::ui {

QString drawSlider(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString&)
{
    const std::string joint = edits::addSlider(m, a.body, a.snap.point, angleDeg(a.snap.point, b.snap.point));
    return QStringLiteral("Add slider %1").arg(QString::fromStdString(joint));
}

QString drawSlot(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString&)
{
    const std::string joint = edits::addPinInSlot(m, a.body, a.snap.point, angleDeg(a.snap.point, b.snap.point));
    return QStringLiteral("Add pin in slot %1").arg(QString::fromStdString(joint));
}

}  // namespace clevis::ui
