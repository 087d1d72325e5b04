#include "ui/results/results_views.h"

#include "ui/files/export_actions.h"
#include "ui/results/bar_load_view.h"
#include "ui/results/bearing_polar_view.h"
#include "ui/results/drive_scrubber.h"
#include "ui/results/drive_view.h"
#include "ui/results/free_body_view.h"
#include "ui/results/peak_table.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/dock_layout.h"

#include <QMainWindow>
#include <QMenuBar>

namespace clevis::ui {

void installResultsViews(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis)
{
    auto* scrubber = new DriveScrubber(analysis);
    auto* plots = new PlotStack(analysis);
    auto* diagram = new FreeBodyView(doc, analysis);
    auto* peaks = new PeakTable(analysis);
    auto* barLoads = new BarLoadView(doc, analysis);
    // The strip keeps the height of its one row of controls and one line of positions.
    addPanel(window, QObject::tr("Cycle position"), "cycleDock", scrubber, {360, scrubber->minimumSizeHint().height()});
    addPanel(window, QObject::tr("Loads over the cycle"), "plotsDock", plots, {360, 150});
    addPanel(window, QObject::tr("Peak loads"), "peaksDock", peaks, {240, 100});
    addPanel(window, QObject::tr("Free-body diagram"), "freeBodyDock", diagram, {260, 200});
    addPanel(window, QObject::tr("Loads along the link"), "barLoadsDock", barLoads, {260, 200});
    addPanel(window, QObject::tr("Bearing load"), "bearingPolarDock", new BearingPolarView(doc, analysis), {260, 200});
    addPanel(window, QObject::tr("Drive"), "driveDock", new DriveView(doc, analysis), {260, 120});
    auto* exports = new ExportActions(window, doc, analysis, diagram, plots);
    exports->fill(window->menuBar()->addMenu(QObject::tr("E&xport")));
}

}  // namespace clevis::ui
