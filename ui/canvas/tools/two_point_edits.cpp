#include "ui/canvas/tools/two_point_edits.h"

#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

#include <QObject>

namespace clevis::ui {
namespace {

// Springs, dampers and cylinders join two different parts.
bool betweenTwoParts(const ClickedPoint& a, const ClickedPoint& b, const QString& what, QString& problem)
{
    if (a.body != b.body) return true;
    problem = QObject::tr("Both ends of the %1 are on %2: put the ends on two different parts.")
                  .arg(what, QString::fromStdString(a.body));
    return false;
}

BodyPointRef ref(const ClickedPoint& p) { return {p.body, p.snap.point}; }

}  // namespace

QString drawSlider(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString&)
{
    const std::string joint = edits::addSlider(m, a.body, a.snap.point, angleDeg(a.snap.point, b.snap.point));
    return QObject::tr("Add slider %1").arg(QString::fromStdString(joint));
}

QString drawSlot(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString&)
{
    const std::string joint = edits::addPinInSlot(m, a.body, a.snap.point, angleDeg(a.snap.point, b.snap.point));
    return QObject::tr("Add pin in slot %1").arg(QString::fromStdString(joint));
}

QString drawSpring(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QObject::tr("spring"), problem)) return {};
    edits::addSpring(m, ref(a), ref(b));
    return QObject::tr("Add spring");
}

QString drawDamper(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QObject::tr("damper"), problem)) return {};
    edits::addDamper(m, ref(a), ref(b));
    return QObject::tr("Add damper");
}

QString drawCylinder(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QObject::tr("cylinder"), problem)) return {};
    return QObject::tr("Add cylinder %1").arg(QString::fromStdString(edits::addCylinder(m, ref(a), ref(b))));
}

QString drawForce(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (a.body == kGroundName) {
        problem = QObject::tr("Click on a moving part first: a force on the frame does nothing to the mechanism.");
        return {};
    }
    edits::addForce(m, ref(a), 100.0 * (b.snap.point - a.snap.point).normalized());
    return QObject::tr("Add force on %1").arg(QString::fromStdString(a.body));
}

}  // namespace clevis::ui
