#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"
#include "ui/shell/display_units.h"

namespace clevis::ui {
namespace {

QStringList movingBodies(const Mechanism& m)
{
    QStringList names;
    for (const auto& b : m.bodies) names << QString::fromStdString(b.name);
    return names;
}

QStringList allBodies(const Mechanism& m) { return QStringList{QString::fromUtf8(kGroundName)} + movingBodies(m); }

template <typename T>
std::function<T&(Mechanism&)> loadAt(int index)
{
    return [index](Mechanism& m) -> T& { return std::get<T>(m.loads[index]); };
}

void nameField(FormBuilder& f, const std::string& current, const std::function<std::string&(Mechanism&)>& name)
{
    const QString q = QString::fromStdString(current);
    f.text("name", QObject::tr("Name"), q, QObject::tr("Rename %1").arg(q), [name](Mechanism& m, const QString& v) {
        const QString problem = nameProblem(m, v);
        if (problem.isEmpty()) name(m) = v.toStdString();
        return problem;
    });
}

void endFields(FormBuilder& f, const Mechanism& m, const QString& key, const QString& label, const BodyPointRef& end,
               const QString& undo, std::function<BodyPointRef&(Mechanism&)> ref)
{
    const QStringList bodies = allBodies(m);
    f.choice(key + "Body", label + QObject::tr(" on"), bodies,
             std::max(0, int(bodies.indexOf(QString::fromStdString(end.body)))), undo,
             [ref, bodies](Mechanism& m, int i) { ref(m).body = bodies[i].toStdString(); });
    pointFields(f, key, label, end.at, undo, [ref](Mechanism& m) -> Vec2& { return ref(m).at; });
}

struct LoadFormVisitor {
    FormBuilder& f;
    const Mechanism& m;
    int index;

    void operator()(const ForceLoad& load) const
    {
        const auto self = loadAt<ForceLoad>(index);
        const QString undo = QObject::tr("Set force %1").arg(QString::fromStdString(load.name));
        f.partHeading(QObject::tr("Force"), QString::fromStdString(load.name));
        nameField(f, load.name, [self](Mechanism& m) -> std::string& { return self(m).name; });
        endFields(f, m, "point", QObject::tr("Acts"), load.point, undo,
                  [self](Mechanism& m) -> BodyPointRef& { return self(m).point; });
        f.number("forceX", QObject::tr("Force x"), load.force.x(), forceQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).force.x() = v; });
        f.number("forceY", QObject::tr("Force y"), load.force.y(), forceQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).force.y() = v; });
        f.info(QObject::tr("Magnitude"), QStringLiteral("%1 at %2°")
                                             .arg(DisplayUnits::instance().formatForce(load.force.norm()))
                                             .arg(angleDeg(Vec2::Zero(), load.force), 0, 'f', 1));
        f.check("turnsWithBody", QObject::tr("Turns with the body"), load.turnsWithBody, undo,
                [self](Mechanism& m, bool on) { self(m).turnsWithBody = on; });
        if (load.profile)
            f.info(QObject::tr("Profile"),
                   QObject::tr("scaled over the cycle (%1 points, edit in the file)").arg(load.profile->at.size()));
    }
    void operator()(const TorqueLoad& load) const
    {
        const auto self = loadAt<TorqueLoad>(index);
        const QString undo = QObject::tr("Set torque %1").arg(QString::fromStdString(load.name));
        f.partHeading(QObject::tr("Torque"), QString::fromStdString(load.name));
        nameField(f, load.name, [self](Mechanism& m) -> std::string& { return self(m).name; });
        const QStringList bodies = movingBodies(m);
        f.choice("body", QObject::tr("On"), bodies, std::max(0, int(bodies.indexOf(QString::fromStdString(load.body)))),
                 undo, [self, bodies](Mechanism& m, int i) { self(m).body = bodies[i].toStdString(); });
        f.number("torque", QObject::tr("Torque (counter-clockwise +)"), load.torque, torqueQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).torque = v; });
    }
    void operator()(const SpringLoad& load) const
    {
        const auto self = loadAt<SpringLoad>(index);
        const QString undo = QObject::tr("Set spring %1").arg(QString::fromStdString(load.name));
        f.partHeading(QObject::tr("Spring"), QString::fromStdString(load.name));
        nameField(f, load.name, [self](Mechanism& m) -> std::string& { return self(m).name; });
        f.number("stiffness", QObject::tr("Rate"), load.stiffness, stiffnessQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).stiffness = v; });
        f.number("freeLength", QObject::tr("Free length"), load.freeLength, lengthQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).freeLength = v; });
        f.info(QObject::tr("Length as drawn"), DisplayUnits::instance().formatLength((load.b.at - load.a.at).norm()));
        endFields(f, m, "endA", QObject::tr("End A"), load.a, undo,
                  [self](Mechanism& m) -> BodyPointRef& { return self(m).a; });
        endFields(f, m, "endB", QObject::tr("End B"), load.b, undo,
                  [self](Mechanism& m) -> BodyPointRef& { return self(m).b; });
    }
    void operator()(const DamperLoad& load) const
    {
        const auto self = loadAt<DamperLoad>(index);
        const QString undo = QObject::tr("Set damper %1").arg(QString::fromStdString(load.name));
        f.partHeading(QObject::tr("Damper"), QString::fromStdString(load.name));
        nameField(f, load.name, [self](Mechanism& m) -> std::string& { return self(m).name; });
        f.number("damping", QObject::tr("Damping"), load.damping, plainQuantity(QStringLiteral("N·s/m"), 3), undo,
                 [self](Mechanism& m, double v) { self(m).damping = v; });
        endFields(f, m, "endA", QObject::tr("End A"), load.a, undo,
                  [self](Mechanism& m) -> BodyPointRef& { return self(m).a; });
        endFields(f, m, "endB", QObject::tr("End B"), load.b, undo,
                  [self](Mechanism& m) -> BodyPointRef& { return self(m).b; });
    }
    void operator()(const TorsionSpringLoad& load) const
    {
        const auto self = loadAt<TorsionSpringLoad>(index);
        const QString undo = QObject::tr("Set torsion spring %1").arg(QString::fromStdString(load.name));
        f.partHeading(QObject::tr("Torsion spring"), QString::fromStdString(load.name));
        nameField(f, load.name, [self](Mechanism& m) -> std::string& { return self(m).name; });
        f.info(QObject::tr("At pin"), QString::fromStdString(load.joint));
        f.number("stiffness", QObject::tr("Rate"), load.stiffness, plainQuantity(QStringLiteral("N·m/rad"), 4), undo,
                 [self](Mechanism& m, double v) { self(m).stiffness = v; });
        f.number("freeAngle", QObject::tr("Relaxed at"), load.freeAngle, angleQuantity(), undo,
                 [self](Mechanism& m, double v) { self(m).freeAngle = v; });
    }
};

}  // namespace

void loadForm(FormBuilder& f, const Mechanism& m, int loadIndex)
{
    std::visit(LoadFormVisitor{f, m, loadIndex}, m.loads[loadIndex]);
}

}  // namespace clevis::ui
