#include "app/analyze_command.h"

#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/cycle_summary.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/results/sizing_json.h"
#include "core/results/sizing_text.h"
#include "core/results/summary_text.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"

#include <functional>
#include <sstream>

namespace clevis::cli {
namespace {

// Writes a result file atomically, so a failed run never leaves half a file
// in place of the last good one; false (with a message naming it and the
// reason) if it cannot be written.
bool writeOutput(const std::string& path, const std::function<void(std::ostream&)>& write, std::ostream& err)
{
    std::ostringstream text;
    write(text);
    try {
        writeFileAtomically(path, text.str(), false);
        return true;
    } catch (const FileWriteError& e) {
        err << e.what() << '\n';
        return false;
    }
}

bool writeOutputs(const AnalyzeOptions& options, const CompiledMechanism& m, const CycleResult& r,
                  const CycleSummary& s, const SizingResult& sizing, std::ostream& err)
{
    bool ok = true;
    if (!options.jsonOut.empty())
        ok &= writeOutput(
            options.jsonOut,
            [&](std::ostream& f) {
                nlohmann::json results = resultsToJson(m, r, s);
                results["sizing"] = sizingToJson(m, r, sizing);  // sizing of bars (docs/results-format.md)
                f << results.dump(2) << '\n';
            },
            err);
    if (!options.csvOut.empty())
        ok &= writeOutput(
            options.csvOut, [&](std::ostream& f) { writeResultsCsv(f, m, r); }, err);
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
        const LoadedMechanism loaded = loadMechanismFile(options.file);
        for (const auto& w : loaded.warnings) err << options.file << ": warning: " << w << '\n';
        const CompiledMechanism m = compile(loaded.mechanism);
        SweepOptions sweep;
        sweep.steps = options.steps;
        const CycleResult r = sweepCycle(m, sweep);
        const CycleSummary s = summarize(m, r);
        out << summaryText(m, r, s) << std::flush;
        // Sizing of bars: stresses, utilisation and buckling (core/results/bar_sizing.h).
        const SizingResult sizing = sizeBars(loaded.mechanism, m, r);
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
