#include "ui/analysis/analysis_state.h"

#include "core/solver/exact_position.h"
#include "ui/analysis/solve_worker.h"
#include "ui/document/mechanism_document.h"

#include <QCoreApplication>
#include <QThread>

#include <algorithm>
#include <utility>

namespace clevis::ui {
namespace {

// A chain's result is thousands of vectors: freed on the GUI thread as the
// next one came, it took about 0.6 ms of every edit before any view was
// drawn. The worker's thread lets it go instead (the queued call's event,
// and the copy it holds, are deleted there), the views already on the new one.
void releaseOn(QObject* worker, std::shared_ptr<const SolveOutcome> outcome)
{
    QMetaObject::invokeMethod(
        worker, [outcome = std::move(outcome)] {}, Qt::QueuedConnection);
}

}  // namespace

AnalysisState::AnalysisState(MechanismDocument* doc, QObject* parent)
    : QObject(parent)
    , doc_(doc)
    , thread_(new QThread(this))
    , newest_(std::make_shared<std::atomic<quint64>>(0))
    , outcome_(std::make_shared<SolveOutcome>())
{
    qRegisterMetaType<std::shared_ptr<const SolveOutcome>>();
    worker_ = new SolveWorker(newest_);
    worker_->moveToThread(thread_);
    connect(thread_, &QThread::finished, worker_, &QObject::deleteLater);
    connect(worker_, &SolveWorker::solved, this, &AnalysisState::publish, Qt::QueuedConnection);
    connect(doc_, &MechanismDocument::mechanismChanged, this, &AnalysisState::requestSolve);
    connect(doc_, &MechanismDocument::documentReset, this, &AnalysisState::forgetResult);
    thread_->start();
    requestSolve();
}

AnalysisState::~AnalysisState()
{
    newest_->store(0);  // makes a sweep in progress stop at its next step
    thread_->quit();
    thread_->wait();
}

void AnalysisState::requestSolve()
{
    const bool wasBusy = busy();
    const quint64 generation = ++requested_;
    newest_->store(generation);
    QMetaObject::invokeMethod(
        worker_, [worker = worker_, m = doc_->mechanism(), generation] { worker->solve(m, generation); },
        Qt::QueuedConnection);
    if (!wasBusy) emit busyChanged(true);
}

void AnalysisState::publish(std::shared_ptr<const SolveOutcome> outcome)
{
    if (outcome->generation != requested_) return releaseOn(worker_, std::move(outcome));  // an edit came after it
    releaseOn(worker_, std::exchange(outcome_, std::move(outcome)));
    const int last = hasResult() ? int(outcome_->result.steps.size()) - 1 : 0;
    const int step = std::clamp(currentStep_, 0, last);
    emit resultChanged();
    emit busyChanged(false);
    if (step != currentStep_) {
        currentStep_ = step;
        emit currentStepChanged(step);
    }
}

// After New or Open the last result is another document's: no view may show
// it while the new one is being solved.
void AnalysisState::forgetResult()
{
    auto none = std::make_shared<SolveOutcome>();
    none->generation = outcome_->generation;  // still busy with the request for the new document
    outcome_ = std::move(none);
    emit resultChanged();
    if (currentStep_ != 0) {
        currentStep_ = 0;
        emit currentStepChanged(0);
    }
}

bool AnalysisState::hasResult() const { return outcome_->compiled && !outcome_->result.steps.empty(); }

const CompiledMechanism& AnalysisState::compiled() const { return *outcome_->compiled; }

const CycleResult& AnalysisState::result() const { return outcome_->result; }

const CycleSummary& AnalysisState::summary() const { return outcome_->summary; }

const std::optional<FoundMotion>& AnalysisState::found() const { return outcome_->found; }

const SizingResult& AnalysisState::sizing() const { return outcome_->sizing; }

QString AnalysisState::errorText() const { return outcome_->error; }

QStringList AnalysisState::offendingItems() const { return outcome_->offendingItems; }

bool AnalysisState::nothingDrawn() const { return outcome_->nothingDrawn; }

const std::optional<MobilityReport>& AnalysisState::mobility() const { return outcome_->mobility; }

bool AnalysisState::busy() const { return outcome_->generation != requested_; }

int AnalysisState::currentStep() const { return currentStep_; }

void AnalysisState::setCurrentStep(int step)
{
    const int last = hasResult() ? int(outcome_->result.steps.size()) - 1 : 0;
    step = std::clamp(step, 0, last);
    if (step == currentStep_) return;
    currentStep_ = step;
    emit currentStepChanged(step);
}

bool AnalysisState::goToTime(double t)
{
    if (!hasResult() || busy()) return false;  // when busy, the document is not the result's mechanism
    auto next = std::make_shared<SolveOutcome>(*outcome_);
    int step = 0;
    try {
        step = insertStep(next->result, solveAtTime(*next->compiled, next->result, t));
    } catch (const std::exception&) {  // out of range, or no assembly there
        return false;
    }
    next->summary = summarize(*next->compiled, next->result);
    next->sizing = sizeParts(doc_->mechanism(), *next->compiled, next->result);
    outcome_ = std::move(next);
    currentStep_ = step;  // before the views read it, since indices after it moved on by one
    emit resultChanged();
    emit currentStepChanged(step);
    return true;
}

void AnalysisState::waitForIdle()
{
    // Woken by the worker's result as the event loop is (a sleep between
    // polls, as before, added up to 2 ms to the wait and 2 ms after the result).
    while (busy()) QCoreApplication::processEvents(QEventLoop::AllEvents | QEventLoop::WaitForMoreEvents);
}

}  // namespace clevis::ui
