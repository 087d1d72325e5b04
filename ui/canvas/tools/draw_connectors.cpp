// The spring, damper and cylinder tools: drawn end to end between two parts.
#include "ui/document/mechanism_edits.h"
#include "ui/canvas/tools/two_point_tool.h"

namespace clevis::ui {
namespace {

bool betweenTwoParts(const ClickedPoint& a, const ClickedPoint& b, const QString& what, QString& problem)
{
    if (a.body != b.body) return true;
    problem = QStringLiteral("Both ends of the %1 are on %2: put the ends on two different parts.")
                  .arg(what, QString::fromStdString(a.body));
    return false;
}

BodyPointRef ref(const ClickedPoint& p)
{
    return {p.body, p.snap.point};
}

}  // namespace

QString drawSpring(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QStringLiteral("spring"), problem)) return {};
    edits::addSpring(m, ref(a), ref(b));
    return QStringLiteral("Add spring");
}

QString drawDamper(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QStringLiteral("damper"), problem)) return {};
    edits::addDamper(m, ref(a), ref(b));
    return QStringLiteral("Add damper");
}

QString drawCylinder(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (!betweenTwoParts(a, b, QStringLiteral("cylinder"), problem)) return {};
    return QStringLiteral("Add cylinder %1").arg(QString::fromStdString(edits::addCylinder(m, ref(a), ref(b))));
}

QString drawForce(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)
{
    if (a.body == kGroundName) {
        problem = QStringLiteral("Click on a moving part first: a force on the frame does nothing to the mechanism.");
        return {};
    }
    edits::addForce(m, ref(a), 100.0 * (b.snap.point - a.snap.point).normalized());
    return QStringLiteral("Add force on %1").arg(QString::fromStdString(a.body));
}

}  // namespace clevis::ui
