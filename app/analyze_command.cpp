#include "app/analyze_command.h"

#include "app/solved_file.h"

#include "core/model/model_error.h"
#include "core/results/cycle_summary.h"
#include "core/results/drive_text.h"
#include "core/results/drive_train.h"
#include "core/results/ratio_study.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/results/sizing_json.h"
#include "core/results/sizing_text.h"
#include "core/results/summary_text.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"

namespace clevis::cli {
namespace {

bool writeOutputs(const AnalyzeOptions& options, const CompiledMechanism& m, const CycleResult& r,
                  const CycleSummary& s, const DriveResults& drive, const SizingResult& sizing, std::ostream& err)
{
    bool ok = true;
    // Each file written as it is made, piece by piece (a large machine's
    // results run to tens of megabytes).
    if (!options.jsonOut.empty())
        ok &= writeOutputFile(
            options.jsonOut,
            [&](const TextPieces& write) {
                writeResultsJson(write, m, r, s, {{"sizing", sizingToJson(m, r, sizing)}},  // bars and pins
                                 &drive);                                                   // (docs/results-format.md)
            },
            err);
    if (!options.csvOut.empty())
        ok &= writeOutputFile(
            options.csvOut, [&](const TextPieces& write) { writeResultsCsv(write, m, r, &drive); }, err);
    return ok;
}

// Incomplete cycles and near-singular positions make the figures unreliable;
// the part that locks is named.
// Drive data that cannot be used yet leaves the results at a speed other
// than the one the file describes: not trustworthy either.
bool trustworthy(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, const DriveResults& drive,
                 const std::string& file, std::ostream& err)
{
    bool unused = false;
    for (const auto& w : drive.warnings) unused |= w.code == kDriveNotIntegrated;
    const bool trusted = r.complete && s.nearSingularSteps == 0 && !unused;
    if (!trusted)
        err << file << ": the results are not trustworthy: "
            << (!r.complete               ? "the cycle could not be completed"
                : s.nearSingularSteps > 0 ? "some positions are near singular"
                                          : "they are not at the speed the drive would give")
            << '\n';
    for (const auto& t : s.toggles) err << file << ": warning: " << toggleText(m, t) << '\n';
    for (const auto& w : r.warnings) err << file << ": warning: " << w.message << '\n';
    for (const auto& w : drive.warnings) err << file << ": warning: " << w.message << '\n';
    return trusted;
}

// The asked-for ratio study of every rotary driver with a gearbox; false
// (with the reason) when there is none.
bool studyRatios(const AnalyzeOptions& options, const SolvedFile& solved, const CycleSummary& s, DriveResults& drive,
                 std::ostream& err)
{
    if (!options.ratioStudy) return true;
    const RatioRange range{options.ratioStudy->from, options.ratioStudy->to, options.ratioStudy->count};
    for (const MotorDuty& motor : drive.motors)
        drive.studies.push_back(ratioStudy(solved.m, solved.r, s.unreliable, motor.driver, motor.gearbox, range));
    if (!drive.studies.empty()) return true;
    err << options.file
        << ": --ratio-study needs a rotary driver with a \"gearbox\" (its efficiency and inertias); there is none\n";
    return false;
}

}  // namespace

int runAnalyze(const AnalyzeOptions& options, std::ostream& out, std::ostream& err)
{
    try {
        const SolvedFile solved = solveFile(options.file, options.steps, err);
        const CompiledMechanism& m = solved.m;
        const CycleResult& r = solved.r;
        const CycleSummary s = summarize(m, r);
        DriveResults drive = driveResults(solved.mechanism, m, r, s.unreliable, solved.found);
        if (!studyRatios(options, solved, s, drive, err)) return kExitFailed;
        out << summaryText(m, r, s) << driveText(m, r, drive) << std::flush;
        // Sizing of bars: stresses, utilisation and buckling (core/results/bar_sizing.h);
        // of pins: shear, bearing pressure and p·v (core/results/pin_sizing.h).
        const SizingResult sizing = sizeParts(solved.mechanism, m, r);
        out << '\n' << sizingText(m, r, sizing) << std::flush;
        const bool written = writeOutputs(options, m, r, s, drive, sizing, err);
        const bool trusted = trustworthy(m, r, s, drive, options.file, err);
        return written && trusted ? kExitOk : kExitFailed;
    } catch (const ModelError& e) {
        err << options.file << ": " << e.what() << '\n';
    } catch (const AnalysisError& e) {
        err << options.file << ": " << e.what() << '\n';
    }
    return kExitFailed;
}

}  // namespace clevis::cli
