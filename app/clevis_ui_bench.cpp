// clevis-ui-bench: the desktop's latency as a user feels it, through the real
// code path. One edit is a pin dragged one pixel on the canvas (a mouse move
// with the button held): the document takes the edit, the worker thread
// solves the whole cycle, the results views and the canvas take the new
// result and repaint. Timed in wall-clock time from the mouse move until the
// solve is published and nothing is left for the event loop to do, repaints
// included (checked: no widget paints after it; the work spans two threads,
// so CPU time of one would miss part of it). Also timed: from an empty window
// to the first frame painted with the mechanism open and solved; and a click
// that selects a part.
//
// Cases: the six-bar sample and a generated 20-body four-bar chain; for the
// first frame and the click also a 201-body machine (a fan of 100 four-bars on
// one crank). Run under
// the offscreen platform (set QT_QPA_PLATFORM=offscreen, done by main when
// no platform is set).
#include "app/heap_reuse.h"
#include "core/file/mechanism_file.h"
#include "tests/chain_generator.h"
#include "ui/analysis/analysis_state.h"
#include "ui/canvas/canvas_view.h"
#include "ui/document/mechanism_document.h"
#include "ui/shell/main_window.h"

#include <QAbstractEventDispatcher>
#include <QApplication>
#include <QMouseEvent>
#include <QTemporaryDir>
#include <QThread>

#include <benchmark/benchmark.h>

#include <chrono>
#include <cstdlib>

namespace {

using clevis::ui::MainWindow;
using Clock = std::chrono::steady_clock;

clevis::Mechanism sample(int which)
{
    if (which == 0) return clevis::loadMechanismFile(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json").mechanism;
    if (which == 1) return clevis::test::fourBarChain(20);
    return clevis::test::fourBarFan(100);
}

const char* sampleName(int which)
{
    static const char* names[] = {"six_bar", "chain20", "fan100"};
    return names[which];
}

// Until the newest solve is published and nothing is left to do: every
// posted event, due timer and repaint handled, and those they set off in
// turn (a replot queued by a result posts the plot's repaint; a form rebuilt
// posts its layout, then its paint). One pass of the event loop left some
// of these to after the timed region.
void settle(MainWindow& w)
{
    w.analysis()->waitForIdle();
    QAbstractEventDispatcher* events = QAbstractEventDispatcher::instance();
    while (events->processEvents(QEventLoop::AllEvents)) {}
}

// Counts the paints of widgets: after the timed region there must be none,
// or the time missed part of an edit's drawing.
struct PaintCounter : QObject {
    int paints = 0;
    bool eventFilter(QObject*, QEvent* e) override
    {
        paints += e->type() == QEvent::Paint;
        return false;
    }
};

// The paints that come within `ms` after a settled edit.
int latePaints(int ms)
{
    PaintCounter counter;
    qApp->installEventFilter(&counter);
    const auto until = Clock::now() + std::chrono::milliseconds(ms);
    while (Clock::now() < until) {
        QCoreApplication::processEvents();
        QThread::msleep(1);
    }
    qApp->removeEventFilter(&counter);
    return counter.paints;
}

// With Alt held, as a user does for a fine move: no snapping to the grid.
void mouse(QWidget* target, QEvent::Type type, const QPointF& at, Qt::MouseButtons held)
{
    const Qt::MouseButton button = type == QEvent::MouseMove ? Qt::NoButton : Qt::LeftButton;
    QMouseEvent e(type, at, target->mapToGlobal(at), button, held, Qt::AltModifier);
    QApplication::sendEvent(target, &e);
}

// A moving pin of the mechanism, on screen: the first pin both of whose
// bodies move (dragging it changes the linkage's dimensions).
QPointF movingPin(MainWindow& w)
{
    const clevis::Mechanism& m = w.document()->mechanism();
    for (const auto& j : m.joints)
        if (j.type == clevis::JointType::Pin && j.bodies[0] != clevis::kGroundName &&
            j.bodies[1] != clevis::kGroundName)
            return w.canvas()->view().toScreen(j.at);
    return {};
}

// A window as the edit and click cases use it: the sample open, solved and
// fitted to the canvas.
struct OpenWindow {
    QTemporaryDir recovery;
    MainWindow w{recovery.path()};

    explicit OpenWindow(int which)
    {
        w.resize(1600, 1000);
        w.show();
        w.document()->reset(sample(which), sampleName(which));
        settle(w);
        w.canvas()->fitToView();
        settle(w);
    }
};

void EditLatency(benchmark::State& state)
{
    const int which = int(state.range(0));
    OpenWindow open(which);
    MainWindow& w = open.w;
    QWidget* canvas = w.canvas();
    const QPointF pin = movingPin(w);
    mouse(canvas, QEvent::MouseButtonPress, pin, Qt::LeftButton);
    settle(w);
    // Counted as they come: an even number of moves ends where the drag
    // began, and the undo stack then drops the drag as no change at all.
    int edits = 0;
    QObject::connect(w.document(), &clevis::ui::MechanismDocument::mechanismChanged, [&edits] { ++edits; });
    int step = 0;
    for (auto _ : state) {
        const QPointF to = pin + QPointF((++step % 2) ? 1.0 : 0.0, 0.0);  // one pixel there and back
        const auto start = Clock::now();
        mouse(canvas, QEvent::MouseMove, to, Qt::LeftButton);
        settle(w);
        state.SetIterationTime(std::chrono::duration<double>(Clock::now() - start).count());
    }
    const int late = latePaints(100);
    mouse(canvas, QEvent::MouseButtonRelease, pin, Qt::NoButton);
    if (edits < step) state.SkipWithError("the drag did not reach the document: nothing was timed");
    else if (late > 0) state.SkipWithError("a widget painted after the timed region: the time misses part of an edit");
    else if (w.analysis()->errorText().size())
        state.SkipWithError(("the edited mechanism did not solve: " + w.analysis()->errorText()).toStdString().c_str());
    state.SetLabel(sampleName(which));
}
BENCHMARK(EditLatency)->ArgName("mechanism")->Arg(0)->Arg(1)->UseManualTime()->Unit(benchmark::kMillisecond);

// A click that selects a part, alternately a moving pin and the first
// joint: the canvas draws the selection, the parts list marks its row, the
// property editor shows its form. Nothing is solved.
void SelectPart(benchmark::State& state)
{
    const int which = int(state.range(0));
    OpenWindow open(which);
    MainWindow& w = open.w;
    QWidget* canvas = w.canvas();
    const QPointF pins[] = {movingPin(w), w.canvas()->view().toScreen(w.document()->mechanism().joints[0].at)};
    int clicks = 0;
    for (auto _ : state) {
        const QPointF at = pins[++clicks % 2];
        const auto start = Clock::now();
        mouse(canvas, QEvent::MouseButtonPress, at, Qt::LeftButton);
        mouse(canvas, QEvent::MouseButtonRelease, at, Qt::NoButton);
        settle(w);
        state.SetIterationTime(std::chrono::duration<double>(Clock::now() - start).count());
    }
    if (w.document()->selection().kind != clevis::ui::Selection::Kind::Joint)
        state.SkipWithError("the click selected no pin: nothing was timed");
    state.SetLabel(sampleName(which));
}
BENCHMARK(SelectPart)->ArgName("mechanism")->Arg(0)->Arg(1)->Arg(2)->UseManualTime()->Unit(benchmark::kMillisecond);

void OpenToFirstFrame(benchmark::State& state)
{
    const int which = int(state.range(0));
    const clevis::Mechanism m = sample(which);
    for (auto _ : state) {
        QTemporaryDir recovery;
        const auto start = Clock::now();
        MainWindow w(recovery.path());
        w.resize(1600, 1000);
        w.show();
        w.document()->reset(m, sampleName(which));
        settle(w);
        state.SetIterationTime(std::chrono::duration<double>(Clock::now() - start).count());
    }
    state.SetLabel(sampleName(which));
}
BENCHMARK(OpenToFirstFrame)
    ->ArgName("mechanism")
    ->Arg(0)
    ->Arg(1)
    ->Arg(2)
    ->UseManualTime()
    ->Unit(benchmark::kMillisecond);

}  // namespace

int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    if (!std::getenv("QT_QPA_PLATFORM")) setenv("QT_QPA_PLATFORM", "offscreen", 1);
    QApplication app(argc, argv);
    benchmark::Initialize(&argc, argv);
    if (benchmark::ReportUnrecognizedArguments(argc, argv)) return 1;
    benchmark::RunSpecifiedBenchmarks();
    benchmark::Shutdown();
    return 0;
}
