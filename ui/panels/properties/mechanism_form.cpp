#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"

#include <algorithm>
#include <cmath>

namespace clevis::ui {

QString nameProblem(const Mechanism& m, const QString& name)
{
    if (name.isEmpty()) return QObject::tr("A part needs a name.");
    const std::string n = name.toStdString();
    if (n == kGroundName) return QObject::tr("\"ground\" is the frame's name.");
    if (bodyIndex(m, n) >= 0 || jointIndex(m, n) >= 0 || driverIndex(m, n) >= 0)
        return QObject::tr("Another part is already called \"%1\".").arg(name);
    for (std::size_t i = 0; i < m.loads.size(); ++i)
        if (loadName(m.loads[i], int(i)) == n) return QObject::tr("Another part is already called \"%1\".").arg(name);
    return {};
}

void pointFields(FormBuilder& f, const QString& key, const QString& label, const Vec2& at, const QString& undo,
                 std::function<Vec2&(Mechanism&)> point)
{
    f.number(key + "X", label + " x", at.x(), lengthQuantity(), undo,
             [point](Mechanism& m, double v) { point(m).x() = v; });
    f.number(key + "Y", label + " y", at.y(), lengthQuantity(), undo,
             [point](Mechanism& m, double v) { point(m).y() = v; });
}

void mechanismForm(FormBuilder& f, const Mechanism& m)
{
    f.heading(QObject::tr("Mechanism"));
    f.text("mechanismName", QObject::tr("Name"), QString::fromStdString(m.name), QObject::tr("Rename mechanism"),
           [](Mechanism& m, const QString& v) {
               m.name = v.toStdString();
               return QString();
           });
    f.check("gravity", QObject::tr("Gravity"), m.gravity.norm() > 0, QObject::tr("Switch gravity"),
            [](Mechanism& m, bool on) {
                m.gravity = on ? Vec2(0.0, -9.80665) : Vec2::Zero();  // standard gravity, by definition
            });
    f.number("cycleSteps", QObject::tr("Steps per cycle"), m.cycle.steps, plainQuantity(QObject::tr("steps"), 0),
             QObject::tr("Set steps per cycle"),
             [](Mechanism& m, double v) { m.cycle.steps = std::max(1, int(std::lround(v))); });
    f.optionalNumber("cycleDuration", QObject::tr("Cycle duration"), m.cycle.duration, plainQuantity("s", 3),
                     QObject::tr("Set cycle duration"),
                     [](Mechanism& m, std::optional<double> v) { m.cycle.duration = v; });
    f.info({}, QObject::tr("Select a part on the canvas or in the Parts list to edit it."));
}

}  // namespace clevis::ui
