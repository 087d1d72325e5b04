#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"
#include "ui/panels/properties/pin_fields.h"
#include "ui/shell/display_units.h"

#include <QStringList>

#include <algorithm>

namespace clevis::ui {
namespace {

// "(open)" first, then the frame and every moving body.
QStringList bodyChoices(const Mechanism& m)
{
    QStringList names{QObject::tr("(open)"), QString::fromUtf8(kGroundName)};
    for (const auto& b : m.bodies) names << QString::fromStdString(b.name);
    return names;
}

int choiceIndex(const QStringList& choices, const std::string& body)
{
    return body.empty() ? 0 : std::max(0, int(choices.indexOf(QString::fromStdString(body))));
}

// Every joint at a compound pin (three or more bodies on one pin, a two-body
// joint per extra body): the bodies it joins and, once solved, the force
// between them at the position shown (the reaction of results.h).
void compoundPinRows(FormBuilder& f, const Mechanism& m, const Joint& joint, const AnalysisState* analysis)
{
    if (!jointFormShowsResults(m, joint)) return;
    const std::vector<int> stack = pinsAt(m, joint.at);
    QStringList bodies;
    for (const auto& b : bodiesOf(m, stack)) bodies << QString::fromStdString(b);
    f.heading(QObject::tr("Compound pin"));
    f.info(QObject::tr("Bodies on it"), bodies.join(QStringLiteral(", ")));
    const bool solved = analysis && analysis->hasResult();
    for (int i : stack) {
        const Joint& j = m.joints[i];
        const QString name = QString::fromStdString(j.name);
        const QString between = QObject::tr("force between %1 and %2")
                                    .arg(QString::fromStdString(j.bodies[0]), QString::fromStdString(j.bodies[1]));
        QString value = QObject::tr("%1 (not solved)").arg(between);
        if (solved) {
            const auto& joints = analysis->compiled().joints;
            const auto k = std::find_if(joints.begin(), joints.end(), [&](const auto& c) { return c.name == j.name; });
            if (k != joints.end()) {
                const Vec2 force = analysis->result().steps[analysis->currentStep()].joints[k - joints.begin()].force;
                value = QObject::tr("%1: %2").arg(
                    between, DisplayUnits::instance()
                                 .formatForce(force.norm())
                                 .replace(QLatin1Char(' '), QChar(0x00A0)));  // number and unit on one line
            }
        }
        f.info(name, value, QStringLiteral("force:") + name);
    }
}

}  // namespace

bool jointFormShowsResults(const Mechanism& m, const Joint& joint)
{
    return joint.type == JointType::Pin && pinsAt(m, joint.at).size() >= 2;
}

void jointForm(FormBuilder& f, const Mechanism& m, const Joint& joint, const AnalysisState* analysis)
{
    const std::string name = joint.name;
    const QString qname = QString::fromStdString(name);
    const std::function<Joint&(Mechanism&)> self = [name](Mechanism& m) -> Joint& {
        return m.joints[jointIndex(m, name)];
    };
    const char* kinds[] = {"Pin", "Slider", "Pin in slot"};
    f.partHeading(QObject::tr(kinds[int(joint.type)]), qname);
    f.text("name", QObject::tr("Name"), qname, QObject::tr("Rename %1").arg(qname),
           [name](Mechanism& m, const QString& v) {
               const QString problem = nameProblem(m, v);
               if (problem.isEmpty()) edits::renameJoint(m, name, v.toStdString());
               return problem;
           });
    const QStringList choices = bodyChoices(m);
    const QString roles[2][3] = {{QObject::tr("First body"), QObject::tr("Guide"), QObject::tr("Slotted body")},
                                 {QObject::tr("Second body"), QObject::tr("Block"), QObject::tr("Pin's body")}};
    for (int side = 0; side < 2; ++side)
        f.choice(side ? "secondBody" : "firstBody", roles[side][int(joint.type)], choices,
                 choiceIndex(choices, joint.bodies[side]), QObject::tr("Connect %1").arg(qname),
                 [self, side, choices](Mechanism& m, int i) {
                     self(m).bodies[side] = i == 0 ? std::string() : choices[i].toStdString();
                 });
    // Moved like a drag, so a stack of joints at one point stays together.
    const auto moveTo = [name](Mechanism& m, int axis, double v) {
        const int j = jointIndex(m, name);
        Vec2 to = m.joints[j].at;
        to[axis] = v;
        edits::moveJoint(m, j, to);
    };
    f.number("atX", QObject::tr("Position x"), joint.at.x(), lengthQuantity(), QObject::tr("Move %1").arg(qname),
             [moveTo](Mechanism& m, double v) { moveTo(m, 0, v); });
    f.number("atY", QObject::tr("Position y"), joint.at.y(), lengthQuantity(), QObject::tr("Move %1").arg(qname),
             [moveTo](Mechanism& m, double v) { moveTo(m, 1, v); });
    if (joint.type != JointType::Pin)
        f.number("axis",
                 joint.type == JointType::Slider ? QObject::tr("Slide direction") : QObject::tr("Slot direction"),
                 joint.axisDeg, plainQuantity(QStringLiteral("°"), 3), QObject::tr("Turn %1").arg(qname),
                 [self](Mechanism& m, double deg) { self(m).axisDeg = deg; });
    if (joint.bodies[0].empty() || joint.bodies[1].empty())
        f.info({}, QObject::tr("This pin is open: draw a link to it, or pick its bodies above."));
    if (joint.type == JointType::Pin) compoundPinRows(f, m, joint, analysis);
    if (joint.type != JointType::Slider)
        pinFields(f, m,
                  {QObject::tr("Pin and bearing"),
                   QObject::tr("Size this pin"),
                   QObject::tr("Set %1 pin").arg(qname),
                   {},
                   {joint.bodies[0], joint.bodies[1]}},
                  joint.pin, [self](Mechanism& m) -> std::optional<PinData>& { return self(m).pin; });
}

}  // namespace clevis::ui
