#include "app/cli_render_commands.h"

#include "app/bar_choice.h"
#include "app/cli_options.h"
#include "app/solved_file.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/bearing_polar.h"
#include "core/results/cycle_summary.h"
#include "core/results/cylinder_ends.h"
#include "core/results/free_body.h"
#include "core/results/pin_peak.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/exact_position.h"
#include "render/bar_load_diagram.h"
#include "render/bearing_polar_diagram.h"
#include "render/free_body_painter.h"
#include "render/review_report.h"

#include <QGuiApplication>

#include <unistd.h>

#include <algorithm>
#include <chrono>
#include <iostream>
#include <memory>
#include <variant>

namespace clevis::cli {
namespace {

// QtGui needs an application object; the command line has none of its own.
void ensureGuiApplication()
{
    if (QCoreApplication::instance()) return;
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    static int argc = 1;
    static char name[] = "clevis-cli";
    static char* argv[] = {name, nullptr};
    static QGuiApplication app(argc, argv);
}

struct Solved {
    Mechanism doc;
    CompiledMechanism m;
    CycleResult r;
    CycleSummary s;
    std::optional<FoundMotion> found;
};

std::unique_ptr<Solved> solve(const DrawOptions& o)
{
    SolvedFile solved = solveFile(o.file, o.steps, std::cerr);
    auto out = std::make_unique<Solved>();
    out->doc = std::move(solved.mechanism);
    out->m = std::move(solved.m);
    out->r = std::move(solved.r);
    out->found = std::move(solved.found);
    if (out->r.steps.empty()) throw AnalysisError("no position of the cycle could be solved", {});
    out->s = summarize(out->m, out->r);
    return out;
}

// The step at exactly an angle of the first rotary driver (modulo 360°, the
// first time the cycle reaches it), solved there and added to the cycle.
int stepAtDegrees(Solved& s, double degrees)
{
    int driver = -1;
    for (std::size_t d = 0; d < s.m.drivers.size() && driver < 0; ++d)
        if (s.m.drivers[d].type == DriverType::Rotary) driver = int(d);
    if (driver < 0) throw UsageError("--at-deg: the mechanism has no rotary driver; use --at-t");
    const auto t = timeAtDrivePosition(s.m, s.r, driver, degToRad(degrees));
    if (!t)
        throw UsageError("--at-deg " + std::to_string(degrees) + ": \"" + s.m.drivers[driver].name +
                         "\" does not reach that angle in the solved cycle");
    return insertStep(s.r, solveAtTime(s.m, s.r, *t));
}

// The step at exactly time t, solved there and added to the cycle.
int stepAtTime(Solved& s, double t)
{
    const auto& steps = s.r.steps;
    if (t < steps.front().t - 1e-12 || t > steps.back().t + 1e-12)
        throw UsageError("--at-t " + std::to_string(t) + " s is outside the solved cycle (0 to " +
                         std::to_string(steps.back().t) + " s)");
    return insertStep(s.r, solveAtTime(s.m, s.r, std::clamp(t, steps.front().t, steps.back().t)));
}

int stepAtPeak(const Solved& s, const std::string& pin)
{
    if (const auto step = pinPeakStep(s.s, pin)) return *step;
    throw UsageError("--at-peak: no pin \"" + pin + "\" (pins: " + listOf(pinNames(s.s)) + ")");
}

// The parser has checked that exactly one position is given.
int chooseStep(const PositionChoice& at, Solved& s)
{
    if (at.degrees) return stepAtDegrees(s, *at.degrees);
    if (at.time) return stepAtTime(s, *at.time);
    return stepAtPeak(s, at.peakOfPin);
}

int chooseBody(const std::string& name, const Solved& s)
{
    const int body = findBody(s.m, name);
    if (body >= 0) return body;
    std::string names;
    for (const auto& b : s.m.bodies) names += (names.empty() ? "" : ", ") + b.name;
    if (body == kGround)
        throw UsageError("--body ground: the frame has no free-body diagram here; choose one of " + names);
    throw UsageError("--body: no body \"" + name + "\" (bodies: " + names + ")");
}

// The joint named by --joint and the side named by --body (default: the
// joint's second body, the one its reaction acts on).
std::pair<int, int> chooseJointSide(const DrawOptions& o, const Solved& s)
{
    const std::string& name = o.joint;
    const auto& joints = s.m.joints;
    const auto found = std::find_if(joints.begin(), joints.end(), [&](const auto& j) { return j.name == name; });
    if (found == joints.end()) {
        std::string names;
        for (const auto& j : joints) names += (names.empty() ? "" : ", ") + j.name;
        for (const auto& end : cylinderEnds(s.m)) names += ", " + end.name;
        throw UsageError("--joint: no joint \"" + name + "\" (joints: " + names + ")");
    }
    if (o.body.empty()) return {int(found - joints.begin()), found->body[1]};
    const std::string& body = o.body;
    const int index = findBody(s.m, body);
    if (index == -2 || (index != found->body[0] && index != found->body[1]))
        throw UsageError("--body " + body + ": not a body of joint \"" + name +
                         "\" (its bodies: " + s.m.bodyName(found->body[0]) + ", " + s.m.bodyName(found->body[1]) + ")");
    return {int(found - joints.begin()), index};
}

bool trustworthy(const Solved& s, const std::string& file)
{
    for (const auto& w : s.r.warnings) std::cerr << file << ": warning: " << w.message << '\n';
    if (s.r.complete && s.s.nearSingularSteps == 0) return true;
    std::cerr << file << ": the results are not trustworthy: "
              << (s.r.complete ? "some positions are near singular" : "the cycle could not be completed") << '\n';
    return false;
}

// Writes the figure; the exit code says whether it was written and the results can be trusted.
int exported(const ui::Figure& figure, const std::string& out, const QString& title, const Solved& s,
             const std::string& file)
{
    QString error;
    if (!ui::exportFigure(figure, QString::fromStdString(out), title, &error)) {
        std::cerr << error.toStdString() << '\n';
        return kExitFailed;
    }
    return trustworthy(s, file) ? kExitOk : kExitFailed;
}

int drawFreeBody(const DrawOptions& o)
{
    const auto solved = solve(o);
    const int body = chooseBody(o.body, *solved);
    const int step = chooseStep(o.at, *solved);
    ensureGuiApplication();
    const ui::FreeBodyPainter figure(solved->m, solved->r, freeBodyDiagram(solved->m, solved->r, body, step),
                                     {ui::RenderUnits{}, o.dalembert});
    const QString title = QString("Free-body diagram: %1").arg(QString::fromStdString(solved->m.bodies[body].name));
    return exported(figure, o.out, title, *solved, o.file);
}

// The cylinder end named by --joint (core/results/cylinder_ends.h), or -1
// when it names none (a joint of the same name comes first). Its load is
// drawn on the body there only.
int chooseCylinderEnd(const DrawOptions& o, const Solved& s)
{
    for (const auto& j : s.m.joints)
        if (j.name == o.joint) return -1;
    const std::vector<CylinderEnd> ends = cylinderEnds(s.m);
    for (std::size_t e = 0; e < ends.size(); ++e) {
        if (ends[e].name != o.joint) continue;
        if (!o.body.empty() && findBody(s.m, o.body) != ends[e].body)
            throw UsageError("--body " + o.body + ": the load at the cylinder end \"" + o.joint +
                             "\" is drawn on the body there only, " + s.m.bodyName(ends[e].body));
        return int(e);
    }
    return -1;
}

int drawBearingPolar(const DrawOptions& o)
{
    const auto solved = solve(o);
    const int end = chooseCylinderEnd(o, *solved);
    BearingPolar polar;
    if (end >= 0) {
        polar = endBearingPolar(solved->m, solved->r, solved->s, end);
    } else {
        const auto [joint, body] = chooseJointSide(o, *solved);
        polar = bearingPolar(solved->m, solved->r, solved->s, joint, body);
    }
    ensureGuiApplication();
    const QString title =
        QString("Bearing load at %1 on %2")
            .arg(QString::fromStdString(polar.pin), QString::fromStdString(solved->m.bodyName(polar.body)));
    const ui::BearingPolarDiagram figure(solved->m, solved->r, std::move(polar), {ui::RenderUnits{}});
    return exported(figure, o.out, title, *solved, o.file);
}

int drawBarDiagram(const DrawOptions& o)
{
    const auto solved = solve(o);
    const BarModel bar = chooseBar(findBars(solved->doc, solved->m), o.body);
    const int step = chooseStep(o.at, *solved);
    ensureGuiApplication();
    const ui::BarCycleLoads cycle = ui::barCycleLoads(solved->m, solved->r, bar);
    const ui::BarLoadDiagram figure(solved->m, solved->r, cycle, step, ui::RenderUnits{});
    const QString title = QString("Internal loads: %1").arg(QString::fromStdString(bar.bodyName));
    return exported(figure, o.out, title, *solved, o.file);
}

// How far the report has got, on one line of stderr rewritten in place:
// only when stderr is a terminal (a script's log gets no carriage returns)
// and only once half a second has passed (a small report shows nothing).
class TerminalProgress {
public:
    explicit TerminalProgress(std::string what) : what_(std::move(what)), shown_(isatty(STDERR_FILENO) != 0) {}
    // Rubs the line out, before anything else is written.
    void clear()
    {
        if (percent_ >= 0) std::cerr << '\r' << std::string(what_.size() + 8, ' ') << '\r' << std::flush;
        percent_ = -1;
    }
    bool operator()(int done, int total)
    {
        using namespace std::chrono;
        const int percent = total > 0 ? 100 * done / total : 0;
        if (!shown_ || percent == percent_ || steady_clock::now() - start_ < milliseconds(500)) return true;
        percent_ = percent;
        std::cerr << '\r' << what_ << ' ' << percent << " %" << std::flush;
        return true;
    }

private:
    std::string what_;
    bool shown_;
    int percent_ = -1;  // the last shown; −1: nothing shown yet
    std::chrono::steady_clock::time_point start_ = std::chrono::steady_clock::now();
};

int writeReport(const DrawOptions& o)
{
    TerminalProgress progress("writing " + o.out + ":");  // timed from the start, the solve included
    const auto solved = solve(o);
    ensureGuiApplication();
    QString error;
    const ui::ReviewReportInput in{solved->m,
                                   solved->r,
                                   solved->s,
                                   QString::fromStdString(o.file),
                                   ui::RenderUnits{},
                                   &solved->doc,
                                   solved->found ? &*solved->found : nullptr};
    const bool written = ui::writeReviewReport(in, QString::fromStdString(o.out), &error, std::ref(progress));
    progress.clear();
    if (!written) {
        std::cerr << error.toStdString() << '\n';
        return kExitFailed;
    }
    return trustworthy(*solved, o.file) ? kExitOk : kExitFailed;
}

int draw(const DrawOptions& o)
{
    switch (o.drawing) {
    case Drawing::FreeBody: return drawFreeBody(o);
    case Drawing::BarDiagram: return drawBarDiagram(o);
    case Drawing::BearingPolar: return drawBearingPolar(o);
    case Drawing::Report: return writeReport(o);
    }
    return kExitFailed;
}

}  // namespace

int runDrawCommand(const std::vector<std::string>& args)
{
    std::string file = "clevis-cli";
    try {
        const Command command = parseCommandLine(args);
        if (const auto* help = std::get_if<HelpRequest>(&command)) {
            std::cout << helpText(help->topic);
            return kExitOk;
        }
        const auto* drawing = std::get_if<DrawOptions>(&command);
        if (!drawing) throw UsageError("clevis-draw only draws (fbd, bar-diagram, bearing-polar, report)");
        file = drawing->file;
        return draw(*drawing);
    } catch (const UsageError& e) {
        std::cerr << usageErrorText(args, e);
        return kExitUsage;
    } catch (const Refused& e) {
        std::cerr << file << ": " << e.what() << '\n';
    } catch (const ModelError& e) {
        std::cerr << file << ": " << e.what() << '\n';
    } catch (const AnalysisError& e) {
        std::cerr << file << ": " << e.what() << '\n';
    }
    return kExitFailed;
}

}  // namespace clevis::cli
