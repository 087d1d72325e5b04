#include "app/internal_loads_command.h"

#include "app/bar_choice.h"
#include "app/solved_file.h"

#include "core/model/model_error.h"
#include "core/results/bar_envelope.h"
#include "core/results/cycle_summary.h"
#include "core/results/drive_units.h"
#include "core/results/pin_peak.h"
#include "core/results/sizing_json.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/exact_position.h"

#include <nlohmann/json.hpp>

#include <cmath>
#include <iomanip>
#include <sstream>

namespace clevis::cli {
namespace {

std::string timeText(double t)
{
    std::ostringstream s;
    s << std::setprecision(6) << t;
    return s.str();
}

// The step shown: solved exactly at the asked angle or time, or the stored
// step of a joint's peak.
StepResult chooseStep(const PositionChoice& at, const CompiledMechanism& m, const CycleResult& r)
{
    if (at.degrees) {
        int driver = -1;
        for (std::size_t d = 0; d < m.drivers.size() && driver < 0; ++d)
            if (m.drivers[d].type == DriverType::Rotary) driver = int(d);
        if (driver < 0) throw Refused("--at-deg: the mechanism has no rotary driver; use --at-t");
        const auto t = timeAtDrivePosition(m, r, driver, degToRad(*at.degrees));
        if (!t)
            throw Refused("--at-deg " + timeText(*at.degrees) + ": \"" + m.drivers[driver].name +
                          "\" does not reach that angle in the solved cycle (" +
                          formatDrivePosition(m.drivers[driver], r.steps.front().drivePosition[driver]) + " to " +
                          formatDrivePosition(m.drivers[driver], r.steps.back().drivePosition[driver]) + ")");
        return solveAtTime(m, r, *t);
    }
    if (at.time) {
        if (*at.time < r.steps.front().t || *at.time > r.steps.back().t)
            throw Refused("--at-t " + timeText(*at.time) + " s is outside the solved cycle (" +
                          timeText(r.steps.front().t) + " to " + timeText(r.steps.back().t) + " s)");
        return solveAtTime(m, r, *at.time);
    }
    const CycleSummary summary = summarize(m, r);
    if (const auto step = pinPeakStep(summary, at.peakOfPin)) return r.steps[std::size_t(*step)];
    throw Refused("--at-peak: no pin \"" + at.peakOfPin + "\" (pins: " + listOf(pinNames(summary)) + ")");
}

std::string positionText(const CompiledMechanism& m, const StepResult& s)
{
    std::string text = "t = " + timeText(s.t) + " s";
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        text += ", " + formatDrivePosition(m.drivers[d], s.drivePosition[d]);
    return text;
}

std::string endName(const BarEnd& end) { return end.name.empty() ? "free end" : end.name; }

std::string massModelText(const BarModel& b)
{
    std::ostringstream s;
    s << std::setprecision(4);
    const MassSpread& sp = b.spread;
    if (!b.idealised) s << "section bar, " << sp.mass << " kg uniform over its length";
    else if (sp.to > sp.from)
        s << "typed-in mass as a uniform bar of " << sp.mass << " kg from s = " << sp.from << " to " << sp.to << " m, "
          << sp.offset << " m off the line";
    else s << "typed-in mass as " << sp.mass << " kg at s = " << sp.from << " m, " << sp.offset << " m off the line";
    s << ", with " << sp.rotary << " kg·m² of rotary inertia spread with it";
    if (!b.pointMasses.empty()) s << "; " << b.pointMasses.size() << " point mass(es) where they are";
    return s.str();
}

nlohmann::json toJson(const CompiledMechanism& m, const CycleResult& r, const BarModel& b, const StepResult& s,
                      const std::vector<BarStation>& stations, const BarEnvelope& env)
{
    const auto endJson = [](const BarEnd& e) {
        return e.name.empty() ? nlohmann::json(nullptr) : nlohmann::json(e.name);
    };
    nlohmann::json out = {{"body", b.bodyName},
                          {"from_joint", endJson(b.ends[0])},
                          {"to_joint", endJson(b.ends[1])},
                          {"length_m", b.length},
                          {"drive", drivePositionsJson(m, s)},
                          {"t", s.t},
                          {"mass_along_bar",
                           {{"idealised", b.idealised},
                            {"mass_kg", b.spread.mass},
                            {"from_m", b.spread.from},
                            {"to_m", b.spread.to},
                            {"offset_m", b.spread.offset},
                            {"rotary_kg_m2", b.spread.rotary},
                            {"description", massModelText(b)}}}};
    out["stations"] = nlohmann::json::array();
    for (const auto& st : stations)
        out["stations"].push_back(
            {{"s_m", st.s}, {"axial_N", st.axial}, {"shear_N", st.shear}, {"moment_Nm", st.moment}});
    out["envelope"] = {{"tension", peakJson(m, r, env.tension, "axial_N")},
                       {"compression", peakJson(m, r, env.compression, "axial_N")},
                       {"shear", peakJson(m, r, env.shear, "shear_N")},
                       {"moment", peakJson(m, r, env.moment, "moment_Nm")}};
    return out;
}

void writeCsv(std::ostream& f, const std::vector<BarStation>& stations)
{
    f << std::setprecision(12) << "s_m,axial_N,shear_N,moment_Nm\n";
    for (const auto& st : stations) f << st.s << ',' << st.axial << ',' << st.shear << ',' << st.moment << '\n';
}

void printPeak(std::ostream& out, const CompiledMechanism& m, const CycleResult& r, const char* what,
               const EnvelopePeak& p, const char* unit)
{
    out << "  " << std::left << std::setw(22) << what << std::right;
    if (p.step < 0) {
        out << "none\n";
        return;
    }
    out << std::setw(12) << p.value << ' ' << unit << "  at s = " << p.s << " m, "
        << positionText(m, r.steps[std::size_t(p.step)]) << '\n';
}

void printText(std::ostream& out, const CompiledMechanism& m, const CycleResult& r, const BarModel& b,
               const StepResult& s, const std::vector<BarStation>& stations, const BarEnvelope& env)
{
    out << std::setprecision(6);
    out << "Internal loads of \"" << b.bodyName << "\" from " << endName(b.ends[0]) << " (s = 0) to "
        << endName(b.ends[1]) << " (s = " << b.length << " m)\n";
    out << "Position: " << positionText(m, s) << '\n';
    out << "Mass along the bar: " << massModelText(b) << "\n";
    out << "Signs: N > 0 tension; V, M beam-table signs looking from s = 0 with the bar's left side up "
           "(docs/method.md)\n\n";
    out << std::setw(12) << "s (m)" << std::setw(16) << "N (N)" << std::setw(16) << "V (N)" << std::setw(16)
        << "M (N·m)" << '\n';
    for (const auto& st : stations)
        out << std::setw(12) << st.s << std::setw(16) << st.axial << std::setw(16) << st.shear << std::setw(16)
            << st.moment << '\n';
    out << "\nEnvelope over the cycle (" << r.steps.size() << " positions, exact peaks along the bar):\n";
    printPeak(out, m, r, "largest tension", env.tension, "N");
    printPeak(out, m, r, "largest compression", env.compression, "N");
    printPeak(out, m, r, "largest |V|", env.shear, "N");
    printPeak(out, m, r, "largest |M|", env.moment, "N·m");
}

}  // namespace

int runInternalLoads(const InternalLoadsOptions& options, std::ostream& out, std::ostream& err)
{
    try {
        const SolvedFile solved = solveFile(options.file, options.steps, err);
        const CompiledMechanism& m = solved.m;
        const CycleResult& r = solved.r;
        const BarList bars = findBars(solved.mechanism, m);
        const BarModel& bar = chooseBar(bars, options.body);
        if (r.steps.empty()) throw AnalysisError("no position of the cycle could be solved", {});
        const StepResult step = chooseStep(options.at, m, r);
        const auto stations =
            internalLoads(m, bar, step, freeBodyItems(m, step)[std::size_t(bar.body)], options.stations);
        const BarEnvelope env = barEnvelopes(m, r, {bar}).front();
        printText(out, m, r, bar, step, stations, env);
        out << std::flush;
        bool ok = true;
        if (!options.jsonOut.empty())
            ok &= writeOutputFile(options.jsonOut, toJson(m, r, bar, step, stations, env).dump(2) + "\n", err);
        if (!options.csvOut.empty()) {
            std::ostringstream csv;
            writeCsv(csv, stations);
            ok &= writeOutputFile(options.csvOut, csv.str(), err);
        }
        for (const auto& w : r.warnings) err << options.file << ": warning: " << w.message << '\n';
        if (!r.complete || step.nearSingular) {
            err << options.file << ": the results are not trustworthy: "
                << (step.nearSingular ? "this position is near singular" : "the cycle could not be completed") << '\n';
            ok = false;
        }
        return ok ? kExitOk : kExitFailed;
    } catch (const Refused& e) {
        err << options.file << ": " << e.what() << '\n';
    } catch (const ModelError& e) {
        err << options.file << ": " << e.what() << '\n';
    } catch (const AnalysisError& e) {
        err << options.file << ": " << e.what() << '\n';
    }
    return kExitFailed;
}

}  // namespace clevis::cli
