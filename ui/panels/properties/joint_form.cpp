#include "core/results/pin_sizing.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"
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
    const std::vector<int> stack = pinsAt(m, joint.at);
    if (stack.size() < 2) return;
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

// Where the bearing length comes from when none is typed (pin_sizing.h).
QString defaultBearingText(const Mechanism& m, Joint joint)
{
    joint.pin->bearingLength.reset();
    const auto fallback = bearingLengthOf(m, joint);
    if (!fallback)
        return QObject::tr(
            "No bearing length: neither body has a section or plate thickness. Type one to get the "
            "bearing pressure and p·v.");
    return QObject::tr("Bearing length by default: %1, the thickness of %2.")
        .arg(DisplayUnits::instance().formatLength(fallback->length), QString::fromStdString(fallback->fromBody));
}

// The pin and its bearing, sized by clevis-cli analyze; the document checks
// each value by the file reader's rules.
void pinFields(FormBuilder& f, const Mechanism& m, const Joint& joint, const std::function<Joint&(Mechanism&)>& self)
{
    const QString undo = QObject::tr("Set %1 pin").arg(QString::fromStdString(joint.name));
    f.heading(QObject::tr("Pin and bearing"));
    f.check("pinData", QObject::tr("Size this pin"), joint.pin.has_value(), undo, [self](Mechanism& m, bool on) {
        if (!on) self(m).pin.reset();
        else if (!self(m).pin) self(m).pin = PinData{0.01};  // a 10 mm pin to start from
    });
    if (!joint.pin) return;
    const PinData& p = *joint.pin;
    const auto pin = [self](Mechanism& m) -> PinData& { return *self(m).pin; };
    f.number("pinDiameter", QObject::tr("Pin diameter"), p.diameter, lengthQuantity(), undo,
             [pin](Mechanism& m, double v) { pin(m).diameter = v; });
    f.choice("shearPlanes", QObject::tr("Shear"),
             {QObject::tr("single (one plane)"), QObject::tr("double (two planes)")}, p.shearPlanes == 2 ? 1 : 0, undo,
             [pin](Mechanism& m, int i) { pin(m).shearPlanes = i + 1; });
    f.optionalNumber("bearingLength", QObject::tr("Bearing length"), p.bearingLength, lengthQuantity(), undo,
                     [pin](Mechanism& m, std::optional<double> v) { pin(m).bearingLength = v; });
    if (!p.bearingLength) f.info({}, defaultBearingText(m, joint), QStringLiteral("bearingDefault"));
    const QString none = QObject::tr("none");
    f.optionalNumber(
        "allowableShear", QObject::tr("Allowable shear"), p.allowableShear, megaQuantity(QStringLiteral("MPa"), 2),
        undo, [pin](Mechanism& m, std::optional<double> v) { pin(m).allowableShear = v; }, none);
    f.optionalNumber(
        "allowablePressure", QObject::tr("Allowable pressure"), p.allowablePressure,
        megaQuantity(QStringLiteral("MPa"), 2), undo,
        [pin](Mechanism& m, std::optional<double> v) { pin(m).allowablePressure = v; }, none);
    f.optionalNumber(
        "allowablePv", QObject::tr("Allowable p·v"), p.allowablePv, megaQuantity(QStringLiteral("MPa·m/s"), 3), undo,
        [pin](Mechanism& m, std::optional<double> v) { pin(m).allowablePv = v; }, none);
    f.info({}, QObject::tr("Utilisations are fractions of the allowables you give, not a verdict that the pin is "
                           "safe; leave one empty for none."));
}

}  // namespace

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
    if (joint.type != JointType::Slider) pinFields(f, m, joint, self);
}

}  // namespace clevis::ui
