// The newest solved cycle of the open mechanism. A worker thread re-solves
// after each edit; the newest edit wins and stale results are dropped, so
// views always show the mechanism as it is now.
#pragma once

#include "core/results/bar_sizing.h"
#include "core/results/cycle_summary.h"
#include "core/results/results.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/mobility_check.h"
#include "core/solver/motor_drive.h"

#include <QObject>
#include <QStringList>

#include <atomic>
#include <memory>
#include <optional>

class QThread;

namespace clevis::ui {

class MechanismDocument;
class SolveWorker;
struct SolveOutcome;

class AnalysisState : public QObject {
    Q_OBJECT
public:
    explicit AnalysisState(MechanismDocument* doc,
                           QObject* parent = nullptr);  // watches doc->mechanismChanged and re-solves
    ~AnalysisState() override;

    bool hasResult() const;                             // a CycleResult with at least one step
    const clevis::CompiledMechanism& compiled() const;  // valid when hasResult()
    const clevis::CycleResult& result() const;
    const clevis::CycleSummary& summary() const;
    // The motion the result was solved at when a motor characteristic sets it; none when prescribed.
    const std::optional<clevis::FoundMotion>& found() const;
    const clevis::SizingResult& sizing() const;  // every bar's and pin's stresses and utilisations
    QString errorText() const;  // empty when the last solve succeeded (ModelError/AnalysisError text otherwise)
    QStringList offendingItems() const;
    bool nothingDrawn() const;  // the drawing has no moving part yet
    bool busy() const;
    int currentStep() const;        // the scrubbed position, index into result().steps
    void setCurrentStep(int step);  // clamps; emits currentStepChanged when it changes
    // The mechanism solved at exactly time `t` (a typed position: who asks for
    // 90° must see 90°, not the nearest step), added to the cycle as a step of
    // its own, with the summary and sizing redone, and made current. False
    // when it cannot be: no result, an edit being solved, `t` outside the
    // solved steps, or no assembly there.
    bool goToTime(double t);
    void waitForIdle();  // for tests: block until the newest solve has been published

    // Degrees of freedom at the drawn pose; empty when the model does not compile.
    const std::optional<clevis::MobilityReport>& mobility() const;

signals:
    void resultChanged();
    void currentStepChanged(int step);
    void busyChanged(bool);

private:
    void requestSolve();
    void publish(std::shared_ptr<const SolveOutcome> outcome);
    void forgetResult();

    MechanismDocument* doc_;
    QThread* thread_;
    SolveWorker* worker_;
    std::shared_ptr<std::atomic<quint64>> newest_;
    quint64 requested_ = 0;
    std::shared_ptr<const SolveOutcome> outcome_;
    int currentStep_ = 0;
};

}  // namespace clevis::ui
