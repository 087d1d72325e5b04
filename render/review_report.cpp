#include "render/review_report.h"

#include "core/file/file_units.h"
#include "core/file/mechanism_file_format.h"
#include "core/model/materials.h"
#include "core/model/type_names.h"
#include "core/results/bar_sizing.h"
#include "core/results/cylinder_ends.h"
#include "core/results/drive_units.h"
#include "core/results/summary_text.h"
#include "core/results/utilisation_ranking.h"
#include "core/solver/body_state.h"
#include "render/bar_load_diagram.h"
#include "render/bearing_polar_report.h"
#include "render/cycle_axis.h"
#include "render/cycle_chart.h"
#include "render/drive_figures.h"
#include "render/drive_report.h"
#include "render/energy_balance_figure.h"
#include "render/free_body_painter.h"
#include "render/mechanism_sketch.h"
#include "render/page_flow.h"
#include "render/palette.h"
#include "render/plot_panes.h"

#include <QDateTime>
#include <QFileInfo>
#include <QPdfWriter>

#include <algorithm>
#include <future>
#include <set>
#include <thread>

namespace clevis::ui {

QString stepPlace(const CycleAxis& axis, int step)
{
    if (step < 0 || step >= int(axis.values.size())) return "–";
    return QString("%1 %2 (step %3)").arg(axis.values[step], 0, 'f', axis.byTime ? 4 : 1).arg(axis.unit).arg(step);
}

// A value from a step near a singular position carries the mark the notes
// under the table explain.
QString markedValue(const QString& value, const PeakAt& p)
{
    return p.nearSingular ? QString("%1 %2").arg(value, kNearToggleMark) : value;
}

namespace {

constexpr int kMaxDiagrams = 8;  // keeps the report a size people read

QString qs(const std::string& s) { return QString::fromStdString(s); }

QString point(const RenderUnits& u, const Vec2& p)
{
    return QString("(%1, %2) %3")
        .arg(p.x() * u.lengthPerMetre, 0, 'f', 2)
        .arg(p.y() * u.lengthPerMetre, 0, 'f', 2)
        .arg(u.lengthSymbol);
}

QString effort(const RenderUnits& u, DriverType type, double v)
{
    return type == DriverType::Rotary ? u.torque(v) : u.force(v);
}

// A larger value at a flagged step, with where it occurs, or a dash.
QString larger(const CycleAxis& axis, const Peak& p, const std::function<QString(double)>& format)
{
    return p.flagged.step < 0
               ? QString("–")
               : QString("%1 %2 at %3").arg(format(p.flagged.value), kNearToggleMark, stepPlace(axis, p.flagged.step));
}

// The handbook material with this density, or "ρ = … kg/m³".
QString materialOf(double density)
{
    const auto all = materials();
    const auto material = std::find_if(all.begin(), all.end(), [&](const Material& m) { return m.density == density; });
    return material != all.end() ? QString(material->name).replace('_', ' ')
                                 : QString("ρ = %1").arg(formatQuantity(density, "kg/m³"));
}

// "steel bar 20 × 8 mm", "aluminium alloy plate 6 mm thick" or "typed in",
// with any point masses added.
QString massSource(const CompiledBody& b)
{
    QString text = "typed in";
    if (const auto& s = b.section)
        text = QString("%1 bar %2 × %3 mm")
                   .arg(materialOf(s->density))
                   .arg(s->width * 1e3, 0, 'g', 4)
                   .arg(s->thickness * 1e3, 0, 'g', 4);
    else if (const auto& p = b.plate)
        text = QString("%1 plate %2 mm thick").arg(materialOf(p->density)).arg(p->thickness * 1e3, 0, 'g', 4);
    if (b.pointMasses > 0) text += QString(" + %1 point mass%2").arg(b.pointMasses).arg(b.pointMasses > 1 ? "es" : "");
    return text;
}

// The driver, if any, whose motion a motor characteristic gave, as described in the file.
const Driver* motorDriven(const CompiledDriver& d, const ReviewReportInput& in)
{
    if (!in.found || !in.document || d.found.empty()) return nullptr;
    const Driver* described = findDriver(in.document->drivers, d.name);
    return described && described->motor ? described : nullptr;
}

// A driver whose motion was found is described by the motor that turns it.
QString foundMotionText(const Driver& described, const FoundMotion& found, const RenderUnits& u)
{
    QString s = QString("%1 is driven by a motor characteristic: ").arg(qs(described.name));
    if (const auto* line = std::get_if<MotorLine>(&*described.motor))
        s += QString("stall torque %1, no-load speed %2 at the motor shaft")
                 .arg(u.torque(line->stallTorque), formatQuantity(fromSi(FileUnit::Rpm, line->noLoadSpeed), "rpm"));
    else s += QString("a table of %1 torques against speed").arg(std::get<MotorTable>(*described.motor).speed.size());
    const bool onMotor = described.flywheel ? described.flywheel->on == FlywheelShaft::Motor
                         : found.sizing     ? found.sizing->on == FlywheelShaft::Motor
                                            : false;
    s += QString(
             "; flywheel %1 on the %2 shaft%3. Its speed is found by integrating the equation of motion to the "
             "steady cycle (Drive chapter), not prescribed.")
             .arg(formatQuantity(found.flywheelInertia, "kg·m²"), onMotor ? "motor" : "output",
                  found.sizing ? " (sized)" : "");
    return s;
}

QString motionText(const CompiledDriver& d, const ReviewReportInput& in)
{
    if (motorDriven(d, in)) return "driven by a motor characteristic (below)";
    const bool rotary = d.type == DriverType::Rotary;
    const auto pos = [&](double v) {
        return QString("%1 %2").arg(driveDisplayValue(d.type, v), 0, 'f', rotary ? 2 : 4).arg(driveDisplayUnit(d.type));
    };
    if (const auto* c = std::get_if<ConstantSpeed>(&d.motion)) {
        QString s = rotary ? QString("constant speed %1 rpm").arg(c->speed * 60 / (2 * kPi), 0, 'f', 2)
                           : QString("constant speed %1 m/s").arg(c->speed, 0, 'f', 4);
        if (c->accel != 0)
            s += QString(", acceleration %1 %2/s²")
                     .arg(driveDisplayValue(d.type, c->accel), 0, 'g', 4)
                     .arg(driveDisplayUnit(d.type));
        return s;
    }
    if (const auto* r = std::get_if<Rise>(&d.motion))
        return QString("%1 from %2 to %3, starting %4 s")
            .arg(camLawName(r->law), pos(r->from), pos(r->to))
            .arg(r->start, 0, 'f', 3);
    const auto& t = std::get<MotionTable>(d.motion);
    return QString("table of %1 positions over %2 s")
        .arg(t.time.size())
        .arg(t.time.empty() ? 0.0 : t.time.back(), 0, 'f', 3);
}

void inputsSection(PageFlow& f, const ReviewReportInput& in)
{
    const auto& m = in.mechanism;
    const auto& u = in.units;
    f.subheading("Bodies");
    std::vector<QStringList> bodies{{"Body", "Mass", "From", "Centre of mass (drawn)", "I_G"}};
    for (const auto& b : m.bodies)
        bodies.push_back({qs(b.name), formatQuantity(b.mass.mass, "kg"), massSource(b), point(u, b.mass.cg),
                          formatQuantity(b.mass.inertia, "kg·m²")});
    f.table(bodies, {0.17, 0.12, 0.31, 0.24, 0.16});
    f.subheading("Joints");
    std::vector<QStringList> joints{{"Joint", "Type", "First body", "Second body", "At (drawn)", "Axis"}};
    for (const auto& j : m.joints) {
        const Vec2 drawn =
            j.point[1].body == kGround ? j.point[1].local : Vec2(m.bodies[j.point[1].body].mass.cg + j.point[1].local);
        joints.push_back(
            {qs(j.name), jointTypeName(j.type), qs(m.bodyName(j.body[0])), qs(m.bodyName(j.body[1])), point(u, drawn),
             j.type == JointType::Pin ? QString("–")
                                      : formatDirection(radToDeg(std::atan2(j.axisLocal.y(), j.axisLocal.x())))});
    }
    f.table(joints, {0.12, 0.14, 0.16, 0.16, 0.28, 0.14});
    f.subheading("Drivers");
    std::vector<QStringList> drivers{{"Driver", "Type", "Acts at", "Motion"}};
    for (const auto& d : m.drivers)
        drivers.push_back({qs(d.name), d.type == DriverType::Rotary ? "rotary" : "linear",
                           d.joint >= 0
                               ? qs(m.joints[d.joint].name)
                               : QString("%1 – %2").arg(qs(m.bodyName(d.ends[0].body)), qs(m.bodyName(d.ends[1].body))),
                           motionText(d, in)});
    f.table(drivers, {0.16, 0.1, 0.2, 0.54});
    for (const auto& d : m.drivers)
        if (const Driver* described = motorDriven(d, in)) f.paragraph(foundMotionText(*described, *in.found, u));
    f.subheading("Loads");
    std::vector<QStringList> loads{{"Load", "Kind", "On", "Value"}};
    for (const auto& l : m.forces)
        loads.push_back(
            {qs(l.name), "force", qs(m.bodyName(l.point.body)),
             QString("%1 ∠ %2%3%4")
                 .arg(u.force(l.force.norm()), formatDirection(radToDeg(std::atan2(l.force.y(), l.force.x()))),
                      l.turnsWithBody ? ", turns with the body" : "", l.profile ? ", scaled by a profile" : "")});
    for (const auto& l : m.torques)
        loads.push_back({qs(l.name), "torque", qs(m.bodyName(l.body)),
                         u.torque(l.torque) + (l.profile ? ", scaled by a profile" : "")});
    for (const auto& l : m.springs)
        loads.push_back(
            {qs(l.name), "spring", QString("%1 – %2").arg(qs(m.bodyName(l.a.body)), qs(m.bodyName(l.b.body))),
             QString("k = %1, free length %2").arg(formatQuantity(l.stiffness, "N/m"), u.length(l.freeLength))});
    for (const auto& l : m.dampers)
        loads.push_back({qs(l.name), "damper",
                         QString("%1 – %2").arg(qs(m.bodyName(l.a.body)), qs(m.bodyName(l.b.body))),
                         QString("c = %1").arg(formatQuantity(l.damping, "N·s/m"))});
    for (const auto& l : m.torsionSprings)
        loads.push_back({qs(l.name), "torsion spring", qs(m.joints[l.joint].name),
                         QString("k = %1, free angle %2")
                             .arg(formatQuantity(l.stiffness, "N·m/rad"), formatDirection(radToDeg(l.freeAngle)))});
    const bool gravity = m.gravity.norm() > 0;
    loads.push_back({"weight", "gravity", "every body",
                     gravity ? QString("g = %1 ∠ %2")
                                   .arg(formatQuantity(m.gravity.norm(), "m/s²"),
                                        formatDirection(radToDeg(std::atan2(m.gravity.y(), m.gravity.x()))))
                             : QString("off")});
    f.table(loads, {0.16, 0.14, 0.2, 0.5});
    f.paragraph(QString("Cycle: %1 s in %2 steps.").arg(m.duration, 0, 'g', 6).arg(m.steps));
}

void plotsSection(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis)
{
    // A large machine's reactions: those of its most loaded joints, as the window starts with.
    for (PlotPane& pane : plotPanes(in.mechanism, in.result, in.units, mostLoadedChoice(in.mechanism, in.result)))
        f.figure(CycleChart(std::move(pane), axis, in.result), f.width());
}

void peakSection(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis)
{
    const auto& s = in.summary;
    const auto& u = in.units;
    const auto force = [&](double v) { return u.force(v); };
    const auto torque = [&](double v) { return u.torque(v); };
    const auto watts = [](double v) { return formatQuantity(v, "W"); };
    // RMS, mean and work integrate over the unreliable steps too.
    const PeakAt overCycle{0.0, -1, s.nearSingularSteps > 0};
    bool flagged = false;
    for (const auto& j : s.joints) flagged |= j.peak.flagged.step >= 0 || j.peakMoment.flagged.step >= 0;
    for (const auto& j : s.cylinderEnds) flagged |= j.peak.flagged.step >= 0;
    f.subheading("Joints");
    std::vector<QStringList> joints{{"Joint", "Peak |F|", "Where", "RMS |F|", "Peak slider moment"}};
    if (flagged) joints.front() << "Larger, near a toggle";
    // A cylinder's ends are pins (core/results/cylinder_ends.h), after the joints.
    std::vector<const JointSummary*> rows;
    for (const auto& j : s.joints) rows.push_back(&j);
    for (const auto& j : s.cylinderEnds) rows.push_back(&j);
    for (const JointSummary* row : rows) {
        const JointSummary& j = *row;
        joints.push_back(
            {qs(j.name), markedValue(u.force(j.peak.value), j.peak), stepPlace(axis, j.peak.step),
             markedValue(u.force(j.rms), overCycle),
             j.peakMoment.step >= 0 ? markedValue(u.torque(j.peakMoment.value), j.peakMoment) : QString("–")});
        if (flagged)
            joints.back() << (j.peak.flagged.step >= 0 ? larger(axis, j.peak, force)
                                                       : larger(axis, j.peakMoment, torque));
    }
    f.table(joints, flagged ? std::vector<double>{0.08, 0.12, 0.2, 0.12, 0.18, 0.3}
                            : std::vector<double>{0.14, 0.18, 0.3, 0.18, 0.2});
    if (!s.cylinderEnds.empty())
        f.paragraph(
            "A cylinder's two ends are pins, listed after the joints: \".cap\" at its first point, \".rod\" "
            "at its second; both carry the cylinder's force, along its line.");
    f.subheading("Drivers");
    std::vector<QStringList> drivers{{"Driver", "Peak", "Where", "RMS", "Mean", "Peak power", "Regenerative", "Work"}};
    std::vector<QStringList> driverFlags{{"Driver", "Larger effort, near a toggle", "Larger power, near a toggle"}};
    for (const auto& d : s.drivers) {
        const auto effortOf = [&](double v) { return effort(u, d.type, v); };
        drivers.push_back({qs(d.name), markedValue(effortOf(d.peak.value), d.peak), stepPlace(axis, d.peak.step),
                           markedValue(effortOf(d.rms), overCycle), markedValue(effortOf(d.mean), overCycle),
                           d.peakPower.step >= 0 ? markedValue(watts(d.peakPower.value), d.peakPower) : QString("–"),
                           d.peakRegenerative.step >= 0
                               ? markedValue(watts(d.peakRegenerative.value), d.peakRegenerative)
                               : QString("–"),
                           markedValue(formatQuantity(d.work, "J"), overCycle)});
        if (d.peak.flagged.step >= 0 || d.peakPower.flagged.step >= 0)
            driverFlags.push_back({qs(d.name), larger(axis, d.peak, effortOf), larger(axis, d.peakPower, watts)});
    }
    f.table(drivers, {0.11, 0.12, 0.2, 0.11, 0.11, 0.12, 0.12, 0.11});
    if (driverFlags.size() > 1) f.table(driverFlags, {0.2, 0.4, 0.4});
    f.subheading("Frame and transmission");
    std::vector<QStringList> frame{
        {"Quantity", "Peak", "Where"},
        {"shaking force", markedValue(u.force(s.groundForce.value), s.groundForce),
         stepPlace(axis, s.groundForce.step)},
        {"shaking moment about the origin", markedValue(u.torque(s.groundMoment.value), s.groundMoment),
         stepPlace(axis, s.groundMoment.step)}};
    if (s.groundForce.flagged.step >= 0)
        frame.push_back({"shaking force, larger near a toggle",
                         markedValue(force(s.groundForce.flagged.value), s.groundForce.flagged),
                         stepPlace(axis, s.groundForce.flagged.step)});
    if (s.groundMoment.flagged.step >= 0)
        frame.push_back({"shaking moment, larger near a toggle",
                         markedValue(torque(s.groundMoment.flagged.value), s.groundMoment.flagged),
                         stepPlace(axis, s.groundMoment.flagged.step)});
    for (const auto& t : s.transmission) {
        frame.push_back({QString("transmission angle at %1, least").arg(qs(t.joint)), formatDirection(t.minimum.value),
                         stepPlace(axis, t.minimum.step)});
        frame.push_back({QString("transmission angle at %1, greatest").arg(qs(t.joint)),
                         formatDirection(t.maximum.value), stepPlace(axis, t.maximum.step)});
    }
    f.table(frame, {0.45, 0.2, 0.35});
    if (s.nearSingularSteps > 0)
        f.paragraph(QString("%1 steps are near a singular position (shaded in the plots); the loads there are "
                            "unreliable. The peaks above are taken over the other steps; values from those steps "
                            "are marked %2 and any larger one is listed apart.")
                        .arg(s.nearSingularSteps)
                        .arg(kNearToggleMark),
                    palette::problem(), true);
    for (const auto& t : s.toggles)
        f.paragraph(QString("%1 %2.").arg(kNearToggleMark, qs(toggleText(in.mechanism, t))), palette::problem());
    for (const auto& w : in.result.warnings)
        f.paragraph(QString("Warning (%1): %2").arg(qs(w.code), qs(w.message)), palette::problem());
}

// The step at which a bar is drawn: where its utilisation peaks, or, without
// a section and allowable to give one, where its |M| peaks.
int criticalStep(const BarSizing& b)
{
    if (b.section && b.section->utilisation && b.section->governing.step >= 0) return b.section->governing.step;
    return b.envelope.moment.step;
}

// Every sized link and pin, the one nearest a limit first, shaded as the
// window's peak table is (utilisation_ranking.h, palette.h).
void utilisationTable(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const SizingResult& sizing)
{
    f.subheading("Utilisation, the most loaded part first");
    const std::vector<PartUtilisation> ranked = rankByUtilisation(in.result, sizing);
    if (ranked.empty()) {
        f.paragraph(
            "No part has a utilisation: give the bars a section with an allowable stress or a safety factor, and "
            "the pins a diameter and allowables, to rank them here.");
        return;
    }
    f.paragraph(
        "Each part's largest figure: a bar's peak fibre stress over its allowable, or its peak compression over "
        "its Euler load (pinned ends), whichever is nearer; a pin's shear stress, bearing pressure or p·v over the "
        "allowables given. These are fractions of your allowables, not a verdict that a part is safe: dynamic and "
        "service factors, fatigue, stress concentrations and wear are not included.");
    std::vector<QStringList> rows{{"Part", "Utilisation", "Governed by", "Where"}};
    std::vector<QColor> shades{QColor()};
    for (const PartUtilisation& p : ranked) {
        const QString kind = p.kind == PartUtilisation::Kind::Bar ? "link" : "pin";
        rows.push_back({partLabel(kind, qs(p.name)),
                        formatUtilisation(p.value) + (p.nearSingular ? QString(" ") + kNearToggleMark : QString()),
                        qs(p.governs), stepPlace(axis, p.step)});
        shades.push_back(palette::utilisationShade(p.value));
    }
    f.table(rows, {0.3, 0.2, 0.22, 0.28},
            [&](int row, int column) { return column == 1 ? shades[std::size_t(row)] : QColor(); });
}

// What the sizing chapter shows that takes no drawing: the sizing, the bars
// and the band each sweeps, found in one pass over the cycle for all bars.
struct SizingFigures {
    SizingResult sizing;
    BarList bars;
    std::vector<std::vector<BandStation>> bands;  // per bar, as barCycleLoads finds it
};

SizingFigures sizingFigures(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r)
{
    SizingFigures out{sizeParts(doc, m, r), findBars(doc, m), {}};
    out.bands = barEnvelopeBands(m, r, out.bars.bars, kBandStations);
    return out;
}

// The N/V/M diagram of every bar at its critical position, one to a page
// where they fit; `advance` reports each and may cancel.
bool barDiagramsSection(PageFlow& f, const ReviewReportInput& in, const CycleAxis& axis, const SizingFigures& found,
                        const std::function<bool()>& advance)
{
    const auto& m = in.mechanism;
    const auto& r = in.result;
    const SizingResult& sizing = found.sizing;
    f.subheading("Internal loads of the bars");
    f.paragraph(
        "Each bar below is drawn at its critical position: where its utilisation peaks, or, for a bar "
        "without a section and an allowable, where its bending moment |M| peaks. Utilisations are "
        "fractions of the allowables given, not a verdict that a part is safe.");
    for (std::size_t b = 0; b < sizing.bars.size(); ++b) {
        if (!advance()) return false;
        const BarSizing& sized = sizing.bars[b];
        const int step = criticalStep(sized);
        if (step < 0) continue;
        // As barCycleLoads would find it; the sizing has the envelope already.
        const BarCycleLoads cycle{found.bars.bars[b], found.bands[b], sized.envelope};
        const BarLoadDiagram figure(m, r, cycle, step, in.units);
        const QString why = sized.section && sized.section->utilisation
                                ? QString("utilisation %1 peaks").arg(*sized.section->utilisation, 0, 'f', 3)
                                : QString("|M| peaks");
        f.keep(figure.size().height() * f.width() / figure.size().width() + 26);
        f.subheading(QString("%1: %2 at %3").arg(qs(sized.name), why, stepPlace(axis, step)));
        f.figure(figure, std::min(f.width(), figure.size().width() * (f.pageHeight() - 40) / figure.size().height()));
    }
    for (const NotABar& o : sizing.others)
        f.paragraph(QString("%1 is not a bar: %2.").arg(qs(o.bodyName), qs(o.reason)));
    return true;
}

}  // namespace

const std::vector<QString>& reviewReportSections(bool drive)
{
    static const std::vector<QString> sections{"1 Mechanism",
                                               "2 Inputs",
                                               "3 Loads over the cycle",
                                               "4 Peak loads",
                                               "5 Free-body diagrams at the critical positions",
                                               "6 Sizing",
                                               "7 Energy balance",
                                               "8 Cautions and assumptions"};
    static const std::vector<QString> withDrive{"1 Mechanism",
                                                "2 Inputs",
                                                "3 Loads over the cycle",
                                                "4 Peak loads",
                                                "5 Free-body diagrams at the critical positions",
                                                "6 Sizing",
                                                "7 Drive",
                                                "8 Energy balance",
                                                "9 Cautions and assumptions"};
    return drive ? withDrive : sections;
}

std::vector<CriticalPosition> criticalPositions(const CompiledMechanism& m, const CycleSummary& s)
{
    // Every pin, a cylinder's end pins with the joints, with the body it is
    // cut from; the most heavily loaded first, so that a large machine's
    // diagrams are those of its worst pins.
    struct Candidate {
        double load;
        CriticalPosition at;
    };
    std::vector<Candidate> pins;
    for (std::size_t j = 0; j < s.joints.size(); ++j) {
        const auto& joint = m.joints[j];
        const int body = joint.body[1] != kGround ? joint.body[1] : joint.body[0];
        pins.push_back(
            {s.joints[j].peak.value, {QString("peak at joint %1").arg(qs(joint.name)), body, s.joints[j].peak.step}});
    }
    const std::vector<CylinderEnd> ends = cylinderEnds(m);
    for (std::size_t e = 0; e < ends.size() && e < s.cylinderEnds.size(); ++e)
        pins.push_back(
            {s.cylinderEnds[e].peak.value,
             {QString("peak at cylinder end %1").arg(qs(ends[e].name)), ends[e].body, s.cylinderEnds[e].peak.step}});
    std::stable_sort(pins.begin(), pins.end(), [](const Candidate& a, const Candidate& b) { return a.load > b.load; });

    std::vector<CriticalPosition> out;
    std::set<std::pair<int, int>> seen;
    for (const auto& [load, at] : pins) {
        if (int(out.size()) == kMaxDiagrams) break;
        if (at.step < 0 || at.body == kGround || !seen.insert({at.body, at.step}).second) continue;
        out.push_back(at);
    }
    return out;
}

bool writeReviewReport(const ReviewReportInput& in, const QString& path, QString* error,
                       const std::function<bool(int, int)>& progress)
{
    const auto& m = in.mechanism;
    const auto& r = in.result;
    if (r.steps.empty()) {
        if (error) *error = "report: the cycle has no solved steps";
        return false;
    }
    QPdfWriter writer(path);
    writer.setPageSize(QPageSize(QPageSize::A4));
    writer.setPageMargins(QMarginsF(0, 0, 0, 0));
    writer.setResolution(300);
    writer.setTitle(QString("Design review: %1").arg(qs(m.name)));
    writer.setCreator("Clevis");
    QPainter painter;
    if (!painter.begin(&writer)) {
        if (error) *error = QString("%1: could not be written").arg(path);
        return false;
    }
    painter.setRenderHint(QPainter::Antialiasing);
    // What the sizing chapter shows takes no painter: it is worked out on a
    // second thread, in the order it is wanted, while this one writes the
    // chapters before it. Only core code and Qt's fonts (thread-safe) run there.
    std::packaged_task<SizingFigures()> sizingTask(
        [&] { return in.document ? sizingFigures(*in.document, m, r) : SizingFigures{}; });
    std::packaged_task<BearingPolarDiagrams()> polarTask([&] { return bearingPolarDiagrams(in); });
    std::future<SizingFigures> sizingFound = sizingTask.get_future();
    std::future<BearingPolarDiagrams> polarsFound = polarTask.get_future();
    const std::jthread worker([&] {
        sizingTask();
        polarTask();
    });
    // The drive is known from the mechanism as described, like the sizing.
    const std::optional<DriveResults> drive =
        in.document ? std::optional(driveResultsWithStudies(*in.document, m, r, in.summary.unreliable,
                                                            in.found ? std::optional(*in.found) : std::nullopt))
                    : std::nullopt;
    const bool drives = drive && hasDriveFigures(*drive);
    const auto& sections = reviewReportSections(drives);
    const std::vector<CriticalPosition> critical = criticalPositions(m, in.summary);
    const int bars = in.document ? int(findBars(*in.document, m).bars.size()) : 0;
    const int pins = int(std::count_if(m.joints.begin(), m.joints.end(),
                                       [](const CompiledJoint& j) { return j.type == JointType::Pin; })) +
                     int(in.summary.cylinderEnds.size());  // each end has its bearing diagram too
    const int total = 7 + int(drives) + int(critical.size()) + bars + (pins + 1) / 2;
    int done = 0;
    const auto advance = [&] { return !progress || progress(++done, total); };
    const CycleAxis axis = cycleAxis(m, r);
    PageFlow f(writer, painter,
               QString("Clevis design review: %1 (%2), %3")
                   .arg(qs(m.name), in.sourceName, QDateTime::currentDateTime().toString("yyyy-MM-dd")));

    painter.setFont(reportFont(22, true));
    painter.setPen(palette::ink());
    painter.drawText(QPointF(40, 62), QString("Design review: %1").arg(qs(m.name.empty() ? "mechanism" : m.name)));
    f.space(36);
    f.paragraph(
        QString("Source: %1. Units: lengths in %2, forces in %3, torques in %4; angles counter-clockwise from +x. "
                "Reactions are the forces the first-listed body of a joint exerts on the second.")
            .arg(in.sourceName, in.units.lengthSymbol, in.units.forceSymbol, in.units.torqueSymbol));
    if (!r.complete)
        f.paragraph("The cycle could not be completed: results cover the reachable part only (shaded in the plots).",
                    palette::problem(), true);
    f.heading(sections[0]);
    f.figure(MechanismSketch(m, r.steps.front(), "At the start of the cycle: " + stepCaption(m, r, 0)), f.width());
    bool ok = advance();
    if (ok) {
        f.heading(sections[1]);
        inputsSection(f, in);
        ok = advance();
    }
    if (ok) {
        f.heading(sections[2]);
        plotsSection(f, in, axis);
        ok = advance();
    }
    if (ok) {
        f.heading(sections[3]);
        peakSection(f, in, axis);
        ok = advance();
    }
    if (ok) {
        f.heading(sections[4]);
        f.paragraph(
            "Each body below is cut free at the position where one of its pins (a joint or a cylinder's end) "
            "carries its peak load, the most heavily loaded pins first; "
            "the kinetic diagram beside it holds m·a_G and I_G·α, and the equations under it close to the residual "
            "shown.");
        for (const auto& c : critical) {
            if (!(ok = advance())) break;
            const FreeBodyPainter figure(m, r, freeBodyDiagram(m, r, c.body, c.step), {in.units, false});
            // Two diagrams to a page where they fit at a readable width.
            const double width = std::clamp(figure.size().width() * (f.pageHeight() / 2 - 34) / figure.size().height(),
                                            0.8 * f.width(), f.width());
            f.keep(figure.size().height() * width / figure.size().width() + 26);
            f.subheading(QString("%1: %2 at %3").arg(c.reason, qs(m.bodies[c.body].name), stepPlace(axis, c.step)));
            f.figure(figure, width);
        }
    }
    if (ok) {
        f.heading(sections[5]);
        if (in.document) {
            const SizingFigures found = sizingFound.get();
            utilisationTable(f, in, axis, found.sizing);
            ok = barDiagramsSection(f, in, axis, found, advance);
        } else {
            f.paragraph(
                "The parts are not known for this result (the mechanism changed while it was being solved): "
                "write the report again once it is solved.",
                palette::problem());
        }
        ok = ok && bearingPolarPages(f, polarsFound.get(), advance);
        ok = ok && advance();
    }
    int next = 6;  // the chapters after Sizing, numbered with or without Drive
    if (ok && drives) {
        f.heading(sections[next++]);
        driveChapter(f, in, axis, *drive);
        ok = advance();
    }
    if (ok) {
        f.heading(sections[next++]);
        f.paragraph(
            "Energy put into the mechanism (right) and taken out of it (left) over the solved span: by each driver "
            "(positive and negative power apart), the net work of the applied loads, the kinetic and potential "
            "energy stored, and the energy lost in dampers. Bars are to scale against the energy passing through "
            "(what the drivers and loads put in); a term under 0.1 % of it is written ≈ 0. The residual closes "
            "W_drivers = ΔT + ΔV_gravity + ΔV_springs + W_dampers − W_loads + residual: one that is not small means "
            "the step count is too coarse or the cycle passes a singular position.");
        f.figure(EnergyBalanceFigure(in.summary), f.width());
        ok = advance();
    }
    if (ok) {
        f.heading(sections[next]);
        for (const QString& c :
             {QString("Rigid bodies and ideal joints: no clearance, no elasticity, no friction unless it is modelled "
                      "as a load; "
                      "the drivers follow their prescribed motion exactly, or the motion found from a motor's "
                      "characteristic."),
              QString("The sizing figures are utilisations against the allowables you gave, not a verdict that a "
                      "part is safe. Fatigue, stress concentrations at holes, the bending of pins and the wear life "
                      "of bearings are not covered."),
              QString("Apply the service and dynamic factors of the application (shock, start-up, misalignment) "
                      "before sizing a pin, bearing, link or motor."),
              QString("Check the parts under the local codes and standards that apply."),
              QString("Have the results reviewed by a licensed engineer before anything is built.")})
            f.paragraph("• " + c);
        ok = advance();
    }
    f.finish();
    painter.end();
    if (!ok && error) *error = "report: cancelled";
    return ok;
}

}  // namespace clevis::ui
