#include "app/analyze_command.h"

#include "app/solved_file.h"

#include "core/model/model_error.h"
#include "core/results/cycle_summary.h"
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
                  const CycleSummary& s, const SizingResult& sizing, std::ostream& err)
{
    bool ok = true;
    if (!options.jsonOut.empty())
        ok &= writeOutputFile(
            options.jsonOut,
            resultsJsonText(m, r, s,
                            {{"sizing", sizingToJson(m, r, sizing)}}),  // bars and pins (docs/results-format.md)
            err);
    if (!options.csvOut.empty()) ok &= writeOutputFile(options.csvOut, resultsCsvText(m, r), err);
    return ok;
}

// Incomplete cycles and near-singular positions make the figures unreliable;
// the part that locks is named.
bool trustworthy(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, const std::string& file,
                 std::ostream& err)
{
    const bool trusted = r.complete && s.nearSingularSteps == 0;
    if (!trusted)
        err << file << ": the results are not trustworthy: "
            << (r.complete ? "some positions are near singular" : "the cycle could not be completed") << '\n';
    for (const auto& t : s.toggles) err << file << ": warning: " << toggleText(m, t) << '\n';
    for (const auto& w : r.warnings) err << file << ": warning: " << w.message << '\n';
    return trusted;
}

}  // namespace

int runAnalyze(const AnalyzeOptions& options, std::ostream& out, std::ostream& err)
{
    try {
        const SolvedFile solved = solveFile(options.file, options.steps, err);
        const CompiledMechanism& m = solved.m;
        const CycleResult& r = solved.r;
        const CycleSummary s = summarize(m, r);
        out << summaryText(m, r, s) << std::flush;
        // Sizing of bars: stresses, utilisation and buckling (core/results/bar_sizing.h);
        // of pins: shear, bearing pressure and p·v (core/results/pin_sizing.h).
        const SizingResult sizing = sizeParts(solved.mechanism, m, r);
        out << '\n' << sizingText(m, r, sizing) << std::flush;
        const bool written = writeOutputs(options, m, r, s, sizing, err);
        const bool trusted = trustworthy(m, r, s, options.file, err);
        return written && trusted ? kExitOk : kExitFailed;
    } catch (const ModelError& e) {
        err << options.file << ": " << e.what() << '\n';
    } catch (const AnalysisError& e) {
        err << options.file << ": " << e.what() << '\n';
    }
    return kExitFailed;
}

}  // namespace clevis::cli
