// clevis-bench: the time to solve a full 360-step cycle of the bundled flap
// folder (a four-bar) and of generated four-bar chains of 10, 50 and 200
// bodies, with the CPU time per step as the counter `time_per_step` (shown
// with its unit, e.g. 3.4us; in seconds in JSON output). Fans of four-bars
// round one driven hub, whose Jacobian has no narrow band, time the sparse
// LU path against the band path (jacobian_factor.h). The mobility check
// that starts every cycle is also timed on its own, on sound chains (the
// drivers' square Jacobian is regular) and on the same chains without their
// driver (the dependent rows and the null space are sought), beside the
// cycle of the same chain at up to 500 bodies. The 200-body chain is timed again
// with the internal loads and envelopes of every bar added, and its results
// written as the --json and --csv files are. The gear ratio study of the
// punch press at 200 ratios is timed beside that mechanism's cycle, and the
// flywheel press's real motion (with and without sizing its flywheel) beside
// its cycle at the prescribed speed. clevis-cli's analysis of a 100-loop fan
// is timed as the command runs it.
#include "app/analyze_command.h"
#include "app/heap_reuse.h"
#include "core/file/mechanism_file.h"
#include "core/results/bar_envelope.h"
#include "core/results/ratio_study.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/mobility_check.h"
#include "core/solver/motor_drive.h"
#include "core/solver/step_solver.h"
#include "tests/chain_generator.h"

#include <benchmark/benchmark.h>

#include <filesystem>
#include <fstream>
#include <sstream>

namespace {

constexpr int kSteps = 360;

// `withBars`: also the internal loads of every bar at every step and their
// exact envelopes, the pass that sizing adds to a cycle.
void timeCycle(benchmark::State& state, const clevis::CompiledMechanism& m, const clevis::BarList* withBars = nullptr)
{
    clevis::SweepOptions options;
    options.steps = kSteps;
    for (auto _ : state) {
        clevis::CycleResult result = clevis::sweepCycle(m, options);
        if (!result.complete) {
            state.SkipWithError(("\"" + m.name + "\" did not complete its cycle").c_str());
            break;
        }
        benchmark::DoNotOptimize(result);
        if (withBars) benchmark::DoNotOptimize(clevis::barEnvelopes(m, result, withBars->bars));
    }
    // A rate counter is divided by the CPU time; inverted, it is time per step.
    state.counters["time_per_step"] = benchmark::Counter(double(state.iterations()) * kSteps,
                                                         benchmark::Counter::kIsRate | benchmark::Counter::kInvert);
}

// A bundled sample's cycle.
void sampleCycle(benchmark::State& state, const char* file)
{
    const clevis::CompiledMechanism m =
        clevis::compile(clevis::loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR "/") + file).mechanism);
    timeCycle(state, m);
}

void FlapFolderCycle(benchmark::State& state) { sampleCycle(state, "flap_folder.json"); }
BENCHMARK(FlapFolderCycle)->Unit(benchmark::kMicrosecond);

void FourBarChainCycle(benchmark::State& state)
{
    const clevis::CompiledMechanism m = clevis::compile(clevis::test::fourBarChain(int(state.range(0))));
    timeCycle(state, m);
}
BENCHMARK(FourBarChainCycle)->ArgName("bodies")->Arg(10)->Arg(50)->Arg(200)->Arg(500)->Unit(benchmark::kMillisecond);

// The same cycle with the internal loads of every bar: compare its median
// with FourBarChainCycle's (the pass should add at most a quarter).
void FourBarChainCycleWithBarLoads(benchmark::State& state)
{
    const clevis::Mechanism doc = clevis::test::fourBarChain(int(state.range(0)));
    const clevis::CompiledMechanism m = clevis::compile(doc);
    const clevis::BarList bars = clevis::findBars(doc, m);
    timeCycle(state, m, &bars);
    state.counters["bars"] = double(bars.bars.size());
}
BENCHMARK(FourBarChainCycleWithBarLoads)->ArgName("bodies")->Arg(200)->Unit(benchmark::kMillisecond);

// The sizing pass alone, on a cycle solved once: its cost without the
// solver's noise around it.
void FourBarChainBarLoadsOnly(benchmark::State& state)
{
    const clevis::Mechanism doc = clevis::test::fourBarChain(int(state.range(0)));
    const clevis::CompiledMechanism m = clevis::compile(doc);
    const clevis::BarList bars = clevis::findBars(doc, m);
    clevis::SweepOptions options;
    options.steps = kSteps;
    const clevis::CycleResult result = clevis::sweepCycle(m, options);
    for (auto _ : state) benchmark::DoNotOptimize(clevis::barEnvelopes(m, result, bars.bars));
    state.counters["time_per_step"] = benchmark::Counter(double(state.iterations()) * kSteps,
                                                         benchmark::Counter::kIsRate | benchmark::Counter::kInvert);
}
BENCHMARK(FourBarChainBarLoadsOnly)->ArgName("bodies")->Arg(200)->Unit(benchmark::kMillisecond);

void FourBarFanCycle(benchmark::State& state)
{
    const clevis::CompiledMechanism m = clevis::compile(clevis::test::fourBarFan(int(state.range(0))));
    timeCycle(state, m);
}
BENCHMARK(FourBarFanCycle)->ArgName("loops")->Arg(5)->Arg(14)->Arg(40)->Unit(benchmark::kMillisecond);

// `driven`: the chain as generated, which passes; else without its motor,
// so that every body is named free.
void timeMobilityCheck(benchmark::State& state, bool driven)
{
    clevis::Mechanism doc = clevis::test::fourBarChain(int(state.range(0)));
    if (!driven) {
        doc.drivers.clear();
        doc.cycle.duration = 1.0;
    }
    const clevis::CompiledMechanism m = clevis::compile(doc);
    const Eigen::VectorXd drawn = clevis::StepSolver(m).drawnPose();
    for (auto _ : state) {
        const clevis::MobilityReport report = clevis::checkMobility(m, drawn);
        if (report.ok() != driven || report.freeBodies.size() != (driven ? 0 : m.bodies.size())) {
            state.SkipWithError(("unexpected: " + report.describe()).c_str());
            break;
        }
        benchmark::DoNotOptimize(report);
    }
}

void FourBarChainMobilityCheck(benchmark::State& state) { timeMobilityCheck(state, true); }
BENCHMARK(FourBarChainMobilityCheck)
    ->ArgName("bodies")
    ->Arg(10)
    ->Arg(50)
    ->Arg(200)
    ->Arg(500)
    ->Unit(benchmark::kMillisecond);

void UndrivenChainMobilityCheck(benchmark::State& state) { timeMobilityCheck(state, false); }
BENCHMARK(UndrivenChainMobilityCheck)
    ->ArgName("bodies")
    ->Arg(10)
    ->Arg(50)
    ->Arg(200)
    ->Arg(500)
    ->Unit(benchmark::kMillisecond);

// Writing the results of the 200-body chain's cycle (about 40 MB of JSON):
// bytes_per_second is the writing speed. `pieces`: as clevis-cli writes its
// --json and --csv files, handed on a megabyte at a time (here to nothing,
// so the disk is left out); else the whole text in one string, as the
// desktop's export and the tests take it.
void ResultsFileText(benchmark::State& state, bool json, bool pieces)
{
    const clevis::CompiledMechanism m = clevis::compile(clevis::test::fourBarChain(200));
    clevis::SweepOptions options;
    options.steps = kSteps;
    const clevis::CycleResult result = clevis::sweepCycle(m, options);
    const clevis::CycleSummary summary = clevis::summarize(m, result);
    std::size_t bytes = 0;
    const clevis::TextPieces count = [&](std::string_view piece) {
        bytes += piece.size();
        benchmark::DoNotOptimize(piece.data());
    };
    for (auto _ : state) {
        if (pieces && json) clevis::writeResultsJson(count, m, result, summary);
        if (pieces && !json) clevis::writeResultsCsv(count, m, result);
        if (pieces) continue;
        const std::string text = json ? clevis::resultsJsonText(m, result, summary) : clevis::resultsCsvText(m, result);
        count(text);
    }
    state.SetBytesProcessed(std::int64_t(bytes));
}
BENCHMARK_CAPTURE(ResultsFileText, json, true, true)->Unit(benchmark::kMillisecond);
BENCHMARK_CAPTURE(ResultsFileText, csv, false, true)->Unit(benchmark::kMillisecond);
BENCHMARK_CAPTURE(ResultsFileText, json_whole, true, false)->Unit(benchmark::kMillisecond);
BENCHMARK_CAPTURE(ResultsFileText, csv_whole, false, false)->Unit(benchmark::kMillisecond);

// `clevis-cli analyze` of a fan of 100 four-bars on one crank (201 bodies,
// 360 steps) as the command runs it, from reading the file to the summary and
// sizing text, without the process's start. The file is written once to the
// temporary folder and left there (clevis-bench-fan-100.json) so that the
// whole process can be timed on it too: /usr/bin/time clevis-cli analyze FILE.
void FanAnalysis(benchmark::State& state)
{
    const int loops = int(state.range(0));
    const std::filesystem::path file =
        std::filesystem::temp_directory_path() / ("clevis-bench-fan-" + std::to_string(loops) + ".json");
    std::ofstream(file) << clevis::saveMechanismText(clevis::test::fourBarFan(loops));
    clevis::cli::AnalyzeOptions options;
    options.file = file.string();
    options.steps = kSteps;
    for (auto _ : state) {
        std::ostringstream out, err;
        if (clevis::cli::runAnalyze(options, out, err) != clevis::cli::kExitOk) {
            state.SkipWithError(("the fan's analysis failed: " + err.str()).c_str());
            break;
        }
        benchmark::DoNotOptimize(out.str().data());
    }
}
BENCHMARK(FanAnalysis)->ArgName("loops")->Arg(100)->Unit(benchmark::kMillisecond);

// The gear ratio study of the punch press (its gearbox from the sample) at
// 200 ratios, on one solved cycle, against solving that cycle: the study
// must cost less than the cycle.
void PunchPressCycle(benchmark::State& state) { sampleCycle(state, "punch_press.json"); }
BENCHMARK(PunchPressCycle)->Unit(benchmark::kMicrosecond);

void PunchPressRatioStudy(benchmark::State& state)
{
    const clevis::Mechanism doc = clevis::loadMechanismFile(CLEVIS_SAMPLES_DIR "/punch_press.json").mechanism;
    const clevis::CompiledMechanism m = clevis::compile(doc);
    clevis::SweepOptions options;
    options.steps = kSteps;
    const clevis::CycleResult result = clevis::sweepCycle(m, options);
    const std::vector<bool> unreliable = clevis::unreliableSteps(result);
    const clevis::RatioRange range{2.0, 200.0, int(state.range(0))};
    for (auto _ : state)
        benchmark::DoNotOptimize(clevis::ratioStudy(m, result, unreliable, 0, doc.drivers[0].gearbox.value(), range));
}
BENCHMARK(PunchPressRatioStudy)->ArgName("ratios")->Arg(200)->Unit(benchmark::kMicrosecond);

// The flywheel press: one cycle at its prescribed speed, against its real
// motion (the cycle checked at the prescribed speed, the equation of motion
// integrated to the steady cycle, that motion solved step by step), and
// against that with the flywheel sized first (its fluctuation target).
void FlywheelPressPrescribedCycle(benchmark::State& state) { sampleCycle(state, "flywheel_press.json"); }
BENCHMARK(FlywheelPressPrescribedCycle)->Unit(benchmark::kMicrosecond);

void FlywheelPressSteadyCycle(benchmark::State& state, bool sizing)
{
    clevis::Mechanism doc = clevis::loadMechanismFile(CLEVIS_SAMPLES_DIR "/flywheel_press.json").mechanism;
    if (!sizing) doc.drivers[0].fluctuationTarget.reset();
    const clevis::CompiledMechanism m = clevis::compile(doc);
    clevis::SweepOptions options;
    options.steps = kSteps;
    for (auto _ : state) {
        clevis::SolvedCycle solved = clevis::solveCycle(doc, m, options);
        if (!solved.found || !solved.r.complete) {
            state.SkipWithError("the flywheel press's motion was not found");
            break;
        }
        benchmark::DoNotOptimize(solved);
    }
}
BENCHMARK_CAPTURE(FlywheelPressSteadyCycle, given_flywheel, false)->Unit(benchmark::kMicrosecond);
BENCHMARK_CAPTURE(FlywheelPressSteadyCycle, sized_flywheel, true)->Unit(benchmark::kMicrosecond);

}  // namespace

// BENCHMARK_MAIN(), with the allocator set as in clevis and clevis-cli.
int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    benchmark::Initialize(&argc, argv);
    if (benchmark::ReportUnrecognizedArguments(argc, argv)) return 1;
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}
