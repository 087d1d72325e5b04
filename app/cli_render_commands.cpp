#include "app/cli_render_commands.h"

#include "app/bar_choice.h"
#include "app/solved_file.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/bearing_polar.h"
#include "core/results/cycle_summary.h"
#include "core/results/free_body.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/exact_position.h"
#include "render/bar_load_diagram.h"
#include "render/bearing_polar_diagram.h"
#include "render/free_body_painter.h"
#include "render/review_report.h"

#include <QGuiApplication>

#include <algorithm>
#include <cmath>
#include <iostream>
#include <map>
#include <memory>
#include <optional>
#include <stdexcept>

namespace clevis::cli {

const char* const kFbdUsage =
    "usage: clevis-cli fbd FILE --body NAME (--at-deg A | --at-t T | --at-peak JOINT) --out F.svg|F.pdf|F.png\n"
    "                  [--steps N] [--dalembert]\n";
const char* const kBarDiagramUsage =
    "usage: clevis-cli bar-diagram FILE --body NAME (--at-deg A | --at-t T | --at-peak JOINT)\n"
    "                  --out F.svg|F.pdf|F.png [--steps N]\n";
const char* const kReportUsage = "usage: clevis-cli report FILE --out review.pdf [--steps N]\n";
const char* const kBearingPolarUsage =
    "usage: clevis-cli bearing-polar FILE --joint NAME [--body NAME] --out F.svg|F.pdf|F.png [--steps N]\n";

namespace {

constexpr int kOk = 0, kFailed = 1, kUsage = 2;

struct Usage : std::runtime_error {
    using std::runtime_error::runtime_error;
};

// FILE followed by --options with values; `flags` take none.
struct Parsed {
    std::string file;
    std::map<std::string, std::string> options;
};

Parsed parse(const std::vector<std::string>& args, const std::vector<std::string>& valued,
             const std::vector<std::string>& flags)
{
    Parsed p;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& a = args[i];
        const auto known = [&](const std::vector<std::string>& list) {
            return std::find(list.begin(), list.end(), a) != list.end();
        };
        if (known(flags)) p.options[a] = "";
        else if (known(valued)) {
            if (i + 1 >= args.size()) throw Usage(a + " needs a value");
            p.options[a] = args[++i];
        } else if (a.rfind("--", 0) == 0) throw Usage("unknown option " + a);
        else if (p.file.empty()) p.file = a;
        else throw Usage("unexpected argument " + a + " (one FILE only)");
    }
    if (p.file.empty()) throw Usage("FILE is missing");
    if (!p.options.count("--out")) throw Usage("--out is missing");
    return p;
}

double number(const Parsed& p, const std::string& option)
{
    const std::string& text = p.options.at(option);
    try {
        std::size_t used = 0;
        const double v = std::stod(text, &used);
        if (used == text.size() && std::isfinite(v)) return v;
    } catch (const std::exception&) {}
    throw Usage(option + ": \"" + text + "\" is not a number");
}

// --out, a figure file.
const std::string& figureOut(const Parsed& p)
{
    const std::string& out = p.options.at("--out");
    const QString suffix = QString::fromStdString(out).section('.', -1).toLower();
    if (suffix != "svg" && suffix != "pdf" && suffix != "png")
        throw Usage("--out " + out + ": use a .svg, .pdf or .png file");
    return out;
}

// What the drawings of one body at one position (fbd, bar-diagram) take:
// FILE, --body, one of --at-deg, --at-t, --at-peak, --out (.svg, .pdf or
// .png) and --steps, and any `flags` of their own.
Parsed parseFigureAtPosition(const std::vector<std::string>& args, const std::vector<std::string>& flags)
{
    Parsed p = parse(args, {"--body", "--at-deg", "--at-t", "--at-peak", "--out", "--steps"}, flags);
    figureOut(p);
    if (!p.options.count("--body")) throw Usage("--body is missing");
    return p;
}

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
};

std::unique_ptr<Solved> solve(const Parsed& p)
{
    int steps = 0;
    if (p.options.count("--steps")) {
        const double typed = number(p, "--steps");
        if (typed < 1 || typed != std::floor(typed)) throw Usage("--steps must be a whole number of at least 1");
        steps = int(typed);
    }
    SolvedFile solved = solveFile(p.file, steps, std::cerr);
    auto out = std::make_unique<Solved>();
    out->doc = std::move(solved.mechanism);
    out->m = std::move(solved.m);
    out->r = std::move(solved.r);
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
    if (driver < 0) throw Usage("--at-deg: the mechanism has no rotary driver; use --at-t");
    const auto t = timeAtDrivePosition(s.m, s.r, driver, degToRad(degrees));
    if (!t)
        throw Usage("--at-deg " + std::to_string(degrees) + ": \"" + s.m.drivers[driver].name +
                    "\" does not reach that angle in the solved cycle");
    return insertStep(s.r, solveAtTime(s.m, s.r, *t));
}

// The step at exactly time t, solved there and added to the cycle.
int stepAtTime(Solved& s, double t)
{
    const auto& steps = s.r.steps;
    if (t < steps.front().t - 1e-12 || t > steps.back().t + 1e-12)
        throw Usage("--at-t " + std::to_string(t) + " s is outside the solved cycle (0 to " +
                    std::to_string(steps.back().t) + " s)");
    return insertStep(s.r, solveAtTime(s.m, s.r, std::clamp(t, steps.front().t, steps.back().t)));
}

int stepAtPeak(const Solved& s, const std::string& joint)
{
    std::string names;
    for (const auto& j : s.s.joints) {
        if (j.name == joint) return j.peak.step;
        names += (names.empty() ? "" : ", ") + j.name;
    }
    throw Usage("--at-peak: no joint \"" + joint + "\" (joints: " + names + ")");
}

int chooseStep(const Parsed& p, Solved& s)
{
    const int given = int(p.options.count("--at-deg") + p.options.count("--at-t") + p.options.count("--at-peak"));
    if (given != 1) throw Usage("give exactly one of --at-deg, --at-t, --at-peak");
    if (p.options.count("--at-deg")) return stepAtDegrees(s, number(p, "--at-deg"));
    if (p.options.count("--at-t")) return stepAtTime(s, number(p, "--at-t"));
    return stepAtPeak(s, p.options.at("--at-peak"));
}

int chooseBody(const Parsed& p, const Solved& s)
{
    const std::string& name = p.options.at("--body");
    const int body = findBody(s.m, name);
    if (body >= 0) return body;
    std::string names;
    for (const auto& b : s.m.bodies) names += (names.empty() ? "" : ", ") + b.name;
    if (body == kGround) throw Usage("--body ground: the frame has no free-body diagram here; choose one of " + names);
    throw Usage("--body: no body \"" + name + "\" (bodies: " + names + ")");
}

// The joint named by --joint and the side named by --body (default: the
// joint's second body, the one its reaction acts on).
std::pair<int, int> chooseJointSide(const Parsed& p, const Solved& s)
{
    if (!p.options.count("--joint")) throw Usage("--joint is missing");
    const std::string& name = p.options.at("--joint");
    const auto& joints = s.m.joints;
    const auto found = std::find_if(joints.begin(), joints.end(), [&](const auto& j) { return j.name == name; });
    if (found == joints.end()) {
        std::string names;
        for (const auto& j : joints) names += (names.empty() ? "" : ", ") + j.name;
        throw Usage("--joint: no joint \"" + name + "\" (joints: " + names + ")");
    }
    if (!p.options.count("--body")) return {int(found - joints.begin()), found->body[1]};
    const std::string& body = p.options.at("--body");
    const int index = findBody(s.m, body);
    if (index == -2 || (index != found->body[0] && index != found->body[1]))
        throw Usage("--body " + body + ": not a body of joint \"" + name +
                    "\" (its bodies: " + s.m.bodyName(found->body[0]) + ", " + s.m.bodyName(found->body[1]) + ")");
    return {int(found - joints.begin()), index};
}

// Runs `work`, turning the documented failures into exit codes and messages.
template <class Work>
int guarded(const char* usage, const std::string& file, Work&& work)
{
    try {
        return work();
    } catch (const Usage& e) {
        std::cerr << "clevis-cli: " << e.what() << '\n' << usage;
        return kUsage;
    } catch (const Refused& e) {
        std::cerr << file << ": " << e.what() << '\n';
    } catch (const ModelError& e) {
        std::cerr << file << ": " << e.what() << '\n';
    } catch (const AnalysisError& e) {
        std::cerr << file << ": " << e.what() << '\n';
    }
    return kFailed;
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
        return kFailed;
    }
    return trustworthy(s, file) ? kOk : kFailed;
}

std::string fileOf(const std::vector<std::string>& args)
{
    for (const auto& a : args)
        if (a.rfind("--", 0) != 0) return a;
    return "clevis-cli";
}

}  // namespace

int runFbdCommand(const std::vector<std::string>& args)
{
    return guarded(kFbdUsage, fileOf(args), [&] {
        const Parsed p = parseFigureAtPosition(args, {"--dalembert"});
        const std::string& out = figureOut(p);
        const auto solved = solve(p);
        const int body = chooseBody(p, *solved);
        const int step = chooseStep(p, *solved);
        ensureGuiApplication();
        const ui::FreeBodyPainter figure(solved->m, solved->r, freeBodyDiagram(solved->m, solved->r, body, step),
                                         {ui::RenderUnits{}, p.options.count("--dalembert") > 0});
        const QString title = QString("Free-body diagram: %1").arg(QString::fromStdString(solved->m.bodies[body].name));
        return exported(figure, out, title, *solved, p.file);
    });
}

int runBearingPolarCommand(const std::vector<std::string>& args)
{
    return guarded(kBearingPolarUsage, fileOf(args), [&] {
        const Parsed p = parse(args, {"--joint", "--body", "--out", "--steps"}, {});
        const std::string& out = figureOut(p);
        const auto solved = solve(p);
        const auto [joint, body] = chooseJointSide(p, *solved);
        ensureGuiApplication();
        const ui::BearingPolarDiagram figure(
            solved->m, solved->r, bearingPolar(solved->m, solved->r, solved->s, joint, body), {ui::RenderUnits{}});
        const QString title = QString("Bearing load at %1 on %2")
                                  .arg(QString::fromStdString(solved->m.joints[joint].name),
                                       QString::fromStdString(solved->m.bodyName(body)));
        return exported(figure, out, title, *solved, p.file);
    });
}

int runBarDiagramCommand(const std::vector<std::string>& args)
{
    return guarded(kBarDiagramUsage, fileOf(args), [&] {
        const Parsed p = parseFigureAtPosition(args, {});
        const std::string& out = figureOut(p);
        const auto solved = solve(p);
        const BarModel bar = chooseBar(findBars(solved->doc, solved->m), p.options.at("--body"));
        const int step = chooseStep(p, *solved);
        ensureGuiApplication();
        const ui::BarCycleLoads cycle = ui::barCycleLoads(solved->m, solved->r, bar);
        const ui::BarLoadDiagram figure(solved->m, solved->r, cycle, step, ui::RenderUnits{});
        const QString title = QString("Internal loads: %1").arg(QString::fromStdString(bar.bodyName));
        return exported(figure, out, title, *solved, p.file);
    });
}

int runReportCommand(const std::vector<std::string>& args)
{
    return guarded(kReportUsage, fileOf(args), [&] {
        const Parsed p = parse(args, {"--out", "--steps"}, {});
        const std::string& out = p.options.at("--out");
        if (QString::fromStdString(out).section('.', -1).toLower() != "pdf")
            throw Usage("--out " + out + ": the report is a .pdf file");
        const auto solved = solve(p);
        ensureGuiApplication();
        QString error;
        const ui::ReviewReportInput in{solved->m,         solved->r,   solved->s, QString::fromStdString(p.file),
                                       ui::RenderUnits{}, &solved->doc};
        if (!ui::writeReviewReport(in, QString::fromStdString(out), &error)) {
            std::cerr << error.toStdString() << '\n';
            return kFailed;
        }
        return trustworthy(*solved, p.file) ? kOk : kFailed;
    });
}

}  // namespace clevis::cli
