// Solves a mechanism's cycle away from the GUI thread. Each request carries
// a generation number; a request that is no longer the newest is skipped, and
// a sweep in progress stops as soon as a newer request arrives.
#pragma once

#include "core/model/mechanism.h"
#include "core/results/bar_sizing.h"
#include "core/results/cycle_summary.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/mobility_check.h"
#include "core/solver/motor_drive.h"

#include <QObject>
#include <QStringList>

#include <atomic>
#include <functional>
#include <memory>
#include <optional>

namespace clevis::ui {

struct SolveOutcome {
    quint64 generation = 0;
    std::optional<CompiledMechanism> compiled;  // empty when the model does not compile
    std::optional<MobilityReport> mobility;     // degrees of freedom at the drawn pose
    CycleResult result;
    std::optional<FoundMotion> found;  // the motion found for a driver with a motor characteristic
    CycleSummary summary;
    SizingResult sizing;        // stresses and utilisations of every bar and pin
    bool nothingDrawn = false;  // a blank drawing: not a fault, only nothing to solve
    QString error;              // empty when the cycle solved (possibly only in part)
    QStringList offendingItems;
};

// Runs the whole analysis of one mechanism: compile, mobility, the cycle (at
// the prescribed motion, or the one a motor characteristic gives), summary, sizing.
SolveOutcome solveMechanism(const Mechanism& m, const std::function<bool()>& stillWanted);

class SolveWorker : public QObject {
    Q_OBJECT
public:
    explicit SolveWorker(std::shared_ptr<std::atomic<quint64>> newest) : newest_(std::move(newest)) {}

    // Called through a queued connection on the worker's thread.
    void solve(const Mechanism& m, quint64 generation);

signals:
    void solved(std::shared_ptr<const SolveOutcome> outcome);

private:
    std::shared_ptr<std::atomic<quint64>> newest_;
};

}  // namespace clevis::ui
