#include "ui/results/results_views.h"

#include "ui/results/drive_scrubber.h"
#include "ui/files/export_actions.h"
#include "ui/results/free_body_view.h"
#include "ui/results/peak_table.h"
#include "ui/results/plot_stack.h"

#include <QDockWidget>
#include <QMainWindow>
#include <QMenuBar>

namespace clevis::ui {
namespace {

QDockWidget* dock(QMainWindow* window, const QString& title, const QString& name, QWidget* content, Qt::DockWidgetArea area)
{
    auto* d = new QDockWidget(title, window);
    d->setObjectName(name);
    d->setWidget(content);
    window->addDockWidget(area, d);
    return d;
}

}  // namespace

void installResultsViews(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis)
{
    auto* scrubber = new DriveScrubber(analysis);
    auto* plots = new PlotStack(analysis);
    auto* diagram = new FreeBodyView(doc, analysis);
    auto* peaks = new PeakTable(analysis);
    QDockWidget* cycle = dock(window, QObject::tr("Cycle position"), "cycleDock", scrubber, Qt::BottomDockWidgetArea);
    QDockWidget* loads = dock(window, QObject::tr("Loads over the cycle"), "plotsDock", plots, Qt::BottomDockWidgetArea);
    QDockWidget* table = dock(window, QObject::tr("Peak loads"), "peaksDock", peaks, Qt::BottomDockWidgetArea);
    QDockWidget* fbd = dock(window, QObject::tr("Free-body diagram"), "freeBodyDock", diagram, Qt::RightDockWidgetArea);
    window->splitDockWidget(cycle, loads, Qt::Vertical);
    window->tabifyDockWidget(loads, table);
    loads->raise();
    // The diagram and the plots are what a designer reads: give them the room.
    window->resizeDocks({fbd}, {560}, Qt::Horizontal);
    window->resizeDocks({fbd}, {620}, Qt::Vertical);
    window->resizeDocks({loads}, {420}, Qt::Vertical);
    auto* exports = new ExportActions(window, doc, analysis, diagram, plots);
    exports->fill(window->menuBar()->addMenu(QObject::tr("E&xport")));
}

}  // namespace clevis::ui
