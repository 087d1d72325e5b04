#include "core/model/materials.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/body_mass_preview.h"
#include "ui/panels/properties/forms.h"
#include "ui/shell/display_units.h"

namespace clevis::ui {
namespace {

enum MassSource { Massless, Typed, Section, Plate };

MassSource sourceOf(const Body& b)
{
    if (b.section) return Section;
    if (b.plate) return Plate;
    return b.mass ? Typed : Massless;
}

QString materialLabel(const char* fileName)
{
    QString s = QString::fromUtf8(fileName).replace('_', ' ');
    s[0] = s[0].toUpper();
    return s;
}

// The pins' centroid: where a typed centre of mass starts out.
Vec2 pinCentroid(const Mechanism& m, const std::string& body)
{
    const auto pins = bodyPins(m, body);
    Vec2 c = Vec2::Zero();
    for (const auto& p : pins) c += p / double(pins.size());
    return c;
}

void switchSource(Mechanism& m, const std::string& name, int source)
{
    Body& b = m.bodies[bodyIndex(m, name)];
    b.mass.reset(), b.cg.reset(), b.inertia.reset(), b.section.reset(), b.plate.reset();
    if (source == Typed) {
        b.mass = 1.0;
        b.cg = pinCentroid(m, name);
        b.inertia = 0.0;
    }
    if (source == Section)
        b.section =
            BarSection{0.02, 0.008, *materialDensity("steel"), std::nullopt, "steel"};  // a 20 × 8 mm steel flat
    if (source == Plate)
        b.plate = PlateSection{0.008, *materialDensity("steel"), std::nullopt, "steel"};  // 8 mm steel plate
}

// The material a bar or plate is cut from: the built-in ones and those the
// file defines. Choosing one sets its name and density; typing a density
// leaves the list ("Other"), so no material's strength stays with it.
template <class Section>
void materialFields(FormBuilder& f, const Mechanism& m, const Section& current,
                    const std::function<Section&(Mechanism&)>& target, const QString& undo)
{
    std::vector<MaterialProperties> choices;
    for (const Material& mat : materials()) choices.push_back(*findMaterial({}, mat.name));
    for (const MaterialProperties& mat : m.materials) choices.push_back(mat);  // never named like a built-in one
    const std::optional<MaterialProperties> named = namedMaterial(m.materials, current.material, current.density);
    QStringList names;
    int selected = -1;
    for (const MaterialProperties& mat : choices) {
        if (named && named->name == mat.name) selected = names.size();
        names << QStringLiteral("%1 (%2 kg/m³)").arg(materialLabel(mat.name.c_str())).arg(mat.density, 0, 'f', 0);
    }
    names << QObject::tr("Other (density below)");
    f.choice("material", QObject::tr("Material"), names, selected < 0 ? names.size() - 1 : selected, undo,
             [target, choices](Mechanism& doc, int i) {
                 if (i >= int(choices.size())) return;
                 target(doc).material = choices[std::size_t(i)].name;
                 target(doc).density = choices[std::size_t(i)].density;
             });
    f.number("density", QObject::tr("Density"), current.density, plainQuantity(QStringLiteral("kg/m³"), 1), undo,
             [target](Mechanism& doc, double v) {
                 if (v == target(doc).density) return;
                 target(doc).density = v;
                 target(doc).material.clear();
             });
}

void sectionFields(FormBuilder& f, const Mechanism& m, const Body& body, const std::function<Body&(Mechanism&)>& self,
                   const QString& undo)
{
    const BarSection& s = *body.section;
    const auto section = [self](Mechanism& m) -> BarSection& { return *self(m).section; };
    f.number("width", QObject::tr("Width"), s.width, lengthQuantity(), undo,
             [section](Mechanism& m, double v) { section(m).width = v; });
    f.number("thickness", QObject::tr("Thickness"), s.thickness, lengthQuantity(), undo,
             [section](Mechanism& m, double v) { section(m).thickness = v; });
    materialFields<BarSection>(f, m, s, section, undo);
    // At most one of the two (the file's rule): giving one clears the other.
    f.optionalNumber(
        "allowableStress", QObject::tr("Allowable stress"), s.allowableStress, megaQuantity(QStringLiteral("MPa"), 1),
        undo,
        [section](Mechanism& m, std::optional<double> v) {
            section(m).allowableStress = v;
            if (v) section(m).safetyFactor.reset();
        },
        QObject::tr("none"));
    f.optionalNumber(
        "safetyFactor", QObject::tr("Safety factor"), s.safetyFactor, plainQuantity({}, 2), undo,
        [section](Mechanism& m, std::optional<double> v) {
            section(m).safetyFactor = v;
            if (v) section(m).allowableStress.reset();
        },
        QObject::tr("none"));
    f.info({},
           QObject::tr(
               "A solid bar between the body's two farthest pins. Give an allowable stress or a safety factor on the "
               "material's yield (one or the other). Its utilisation is its peak fibre "
               "stress over the allowable (or yield / factor): a fraction of your allowable, not a "
               "verdict of safety."));
}

void plateFields(FormBuilder& f, const Mechanism& m, const Body& body, const std::function<Body&(Mechanism&)>& self,
                 const QString& undo)
{
    const auto plate = [self](Mechanism& m) -> PlateSection& { return *self(m).plate; };
    f.number("thickness", QObject::tr("Thickness"), body.plate->thickness, lengthQuantity(), undo,
             [plate](Mechanism& m, double v) { plate(m).thickness = v; });
    materialFields<PlateSection>(f, m, *body.plate, plate, undo);
    f.info({}, body.plate->outline ? QObject::tr("A flat plate with the outline given in the file.")
                                   : QObject::tr("A flat plate through the body's pins (the metal round the pins "
                                                 "is not counted: add point masses for it)."));
}

void typedFields(FormBuilder& f, const Body& body, const std::function<Body&(Mechanism&)>& self, const QString& undo)
{
    f.number("mass", QObject::tr("Mass"), body.mass.value_or(0.0), plainQuantity("kg"), undo,
             [self](Mechanism& m, double v) { self(m).mass = v; });
    for (int axis = 0; axis < 2; ++axis) {
        const std::optional<double> value = body.cg ? std::optional<double>((*body.cg)[axis]) : std::nullopt;
        f.optionalNumber(axis ? "cgY" : "cgX", axis ? QObject::tr("Centre y") : QObject::tr("Centre x"), value,
                         lengthQuantity(), undo, [self, axis](Mechanism& m, std::optional<double> v) {
                             Body& b = self(m);
                             if (!v) return b.cg.reset();
                             if (!b.cg) b.cg = Vec2::Zero();
                             (*b.cg)[axis] = *v;
                         });
    }
    f.optionalNumber("inertia", QObject::tr("Inertia about centre"), body.inertia,
                     plainQuantity(QStringLiteral("kg·m²"), 6), undo,
                     [self](Mechanism& m, std::optional<double> v) { self(m).inertia = v; });
    f.info({}, QObject::tr("A typed centre stays where it is typed: it does not move with the pins."));
}

void pointMassFields(FormBuilder& f, const Body& body, const std::function<Body&(Mechanism&)>& self,
                     const QString& undo)
{
    for (std::size_t i = 0; i < body.pointMasses.size(); ++i) {
        const PointMass& pm = body.pointMasses[i];
        const QString key = QStringLiteral("pointMass%1").arg(i);
        f.partHeading(QObject::tr("Point mass"), QString::fromStdString(pm.name));
        f.number(key, QObject::tr("Mass"), pm.mass, plainQuantity("kg"), undo, [self, i](Mechanism& m, double v) {
            auto& list = self(m).pointMasses;
            if (v <= 0) list.erase(list.begin() + i);  // a zero mass takes the point mass away
            else list[i].mass = v;
        });
        pointFields(f, key, QObject::tr("At"), pm.at, undo,
                    [self, i](Mechanism& m) -> Vec2& { return self(m).pointMasses[i].at; });
    }
    if (!body.pointMasses.empty()) f.info({}, QObject::tr("A mass of 0 kg removes the point mass."));
}

void computedFields(FormBuilder& f, const Mechanism& m, const Body& body)
{
    f.heading(QObject::tr("As the solver sees it"));
    QString problem;
    const auto mp = previewMass(m, body.name, problem);
    if (!mp) return f.info({}, problem);
    const DisplayUnits& u = DisplayUnits::instance();
    f.info(QObject::tr("Mass"), formatWithUnit(mp->mass, "kg"));
    f.info(QObject::tr("Centre"), QStringLiteral("%1, %2").arg(u.formatLength(mp->cg.x()), u.formatLength(mp->cg.y())));
    f.info(QObject::tr("Inertia"), formatWithUnit(mp->inertia, QStringLiteral("kg·m²")));
}

}  // namespace

void bodyForm(FormBuilder& f, const Mechanism& m, const Body& body)
{
    const std::string name = body.name;
    const QString qname = QString::fromStdString(name);
    const std::function<Body&(Mechanism&)> self = [name](Mechanism& m) -> Body& {
        return m.bodies[bodyIndex(m, name)];
    };
    const QString undo = QObject::tr("Set %1 mass").arg(qname);
    f.partHeading(bodyPins(m, name).size() > 2 ? QObject::tr("Plate") : QObject::tr("Link"), qname);
    f.text("name", QObject::tr("Name"), qname, QObject::tr("Rename %1").arg(qname),
           [name](Mechanism& m, const QString& v) {
               const QString problem = nameProblem(m, v);
               if (problem.isEmpty()) edits::renameBody(m, name, v.toStdString());
               return problem;
           });
    const auto pins = bodyPins(m, name);
    if (pins.size() == 2)
        f.info(QObject::tr("Length"), DisplayUnits::instance().formatLength((pins[1] - pins[0]).norm()));
    f.choice("massSource", QObject::tr("Mass from"),
             {QObject::tr("nothing (massless)"), QObject::tr("typed values"), QObject::tr("bar section"),
              QObject::tr("plate")},
             sourceOf(body), undo, [name](Mechanism& m, int i) { switchSource(m, name, i); });
    if (sourceOf(body) == Section) sectionFields(f, m, body, self, undo);
    if (sourceOf(body) == Plate) plateFields(f, m, body, self, undo);
    if (sourceOf(body) == Typed) typedFields(f, body, self, undo);
    pointMassFields(f, body, self, undo);
    computedFields(f, m, body);
}

}  // namespace clevis::ui
