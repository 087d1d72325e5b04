#include "ui/analysis/solve_worker.h"

#include "core/file/part_description.h"
#include "core/model/model_error.h"
#include "core/solver/analysis_error.h"
#include "core/solver/cycle_sweep.h"
#include "core/solver/motor_drive.h"
#include "core/solver/step_solver.h"

namespace clevis::ui {
namespace {

QStringList toQStringList(const std::vector<std::string>& items)
{
    QStringList list;
    for (const auto& s : items) list << QString::fromStdString(s);
    return list;
}

// "joints[2].bodies[1]" names the joint at index 2: turn the path into its name.
QStringList itemsFromPath(const Mechanism& m, const std::string& path)
{
    const auto indexAfter = [&](const std::string& prefix) -> int {
        if (path.rfind(prefix + "[", 0) != 0) return -1;
        return std::atoi(path.c_str() + prefix.size() + 1);
    };
    const auto nameOf = [](const auto& list, int i) {
        return i >= 0 && i < int(list.size()) ? QStringList{QString::fromStdString(list[i].name)} : QStringList{};
    };
    if (int i = indexAfter("bodies"); i >= 0) return nameOf(m.bodies, i);
    if (int i = indexAfter("joints"); i >= 0) return nameOf(m.joints, i);
    if (int i = indexAfter("drivers"); i >= 0) return nameOf(m.drivers, i);
    return {};
}

}  // namespace

SolveOutcome solveMechanism(const Mechanism& m, const std::function<bool()>& stillWanted)
{
    SolveOutcome out;
    if (m.bodies.empty()) {
        out.nothingDrawn = true;
        out.error = QStringLiteral("Nothing to solve yet: draw a link between pins.");
        return out;
    }
    try {
        // Degrees of freedom are counted even before a driver sets the cycle's length.
        Mechanism probe = m;
        if (!probe.cycle.duration) probe.cycle.duration = 1.0;
        const CompiledMechanism counted = compile(probe);
        out.mobility = checkMobility(counted, StepSolver(counted).drawnPose());
        // When the count is wrong the sweep refuses at once, with the core's own words and culprits.
        if (!out.mobility->ok()) sweepCycle(counted);
        SweepOptions options;
        options.progress = [&](int, int) { return stillWanted(); };
        SolvedCycle solved = solveCycle(m, compile(m), options);
        out.compiled = std::move(solved.m);
        out.result = std::move(solved.r);
        out.found = std::move(solved.found);
        if (!out.result.steps.empty()) {
            out.summary = summarize(*out.compiled, out.result);
            out.sizing = sizeParts(m, *out.compiled, out.result);
        }
    } catch (const ModelError& e) {
        out.compiled.reset();
        out.error = QString::fromStdString(describeModelError(m, e));
        out.offendingItems = itemsFromPath(m, e.path());
    } catch (const AnalysisError& e) {
        out.compiled.reset();
        out.error = QString::fromStdString(e.what());
        out.offendingItems = toQStringList(e.items());
    } catch (const std::exception& e) {
        out.compiled.reset();
        out.error = QString::fromStdString(e.what());
    }
    return out;
}

void SolveWorker::solve(const Mechanism& m, quint64 generation)
{
    const auto wanted = [&] { return newest_->load() == generation; };
    if (!wanted()) return;
    auto outcome = std::make_shared<SolveOutcome>(solveMechanism(m, wanted));
    outcome->generation = generation;
    if (wanted()) emit solved(outcome);
}

}  // namespace clevis::ui
