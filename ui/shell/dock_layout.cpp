#include "ui/shell/dock_layout.h"

#include "ui/results/plot_stack.h"

#include <QDockWidget>
#include <QFontInfo>
#include <QMainWindow>
#include <QMenuBar>
#include <QStatusBar>
#include <QToolBar>

#include <algorithm>

namespace clevis::ui {
namespace {

int share(int total, double fraction, int least, int most) { return std::clamp(int(total * fraction), least, most); }

// The toolbars' rows above the docks.
int toolBarsHeight(const QMainWindow* window)
{
    int height = 0;
    for (const QToolBar* bar : window->findChildren<QToolBar*>())
        if (!bar->isHidden() && window->toolBarArea(bar) == Qt::TopToolBarArea)
            height = std::max(height, bar->sizeHint().height());
    return height;
}

}  // namespace

QDockWidget* addPanel(QMainWindow* window, const QString& title, const QString& name, QWidget* content, QSize minimum)
{
    auto* dock = new QDockWidget(title, window);
    dock->setObjectName(name);
    content->setMinimumSize(minimum);
    dock->setWidget(content);
    window->addDockWidget(Qt::LeftDockWidgetArea, dock);
    return dock;
}

void arrangePanels(QMainWindow* window)
{
    const auto panel = [window](const char* name) {
        return window->findChild<QDockWidget*>(QString::fromLatin1(name));
    };
    QDockWidget* parts = panel("partsDock");
    QDockWidget* properties = panel("propertiesDock");
    QDockWidget* diagram = panel("freeBodyDock");
    QDockWidget* cycle = panel("cycleDock");
    QDockWidget* plots = panel("plotsDock");
    QDockWidget* peaks = panel("peaksDock");
    QDockWidget* barLoads = panel("barLoadsDock");
    if (!parts || !properties || !diagram || !cycle || !plots || !peaks || !barLoads) return;  // not all installed yet

    // The editing column runs the full height; the bottom results span the canvas and the diagram.
    window->setCorner(Qt::TopLeftCorner, Qt::LeftDockWidgetArea);
    window->setCorner(Qt::BottomLeftCorner, Qt::LeftDockWidgetArea);
    window->setCorner(Qt::TopRightCorner, Qt::RightDockWidgetArea);
    window->setCorner(Qt::BottomRightCorner, Qt::BottomDockWidgetArea);
    for (QDockWidget* d : {parts, properties, diagram, cycle, plots, peaks, barLoads}) {
        d->setFloating(false);
        window->removeDockWidget(d);
    }
    window->addDockWidget(Qt::LeftDockWidgetArea, parts);
    window->splitDockWidget(parts, properties, Qt::Vertical);
    window->addDockWidget(Qt::RightDockWidgetArea, diagram);
    window->addDockWidget(Qt::BottomDockWidgetArea, cycle);
    window->splitDockWidget(cycle, plots, Qt::Vertical);
    window->tabifyDockWidget(plots, peaks);
    window->tabifyDockWidget(diagram, barLoads);  // the loads along the selected link beside its free body
    for (QDockWidget* d : {parts, properties, diagram, cycle, plots, peaks, barLoads}) d->show();
    plots->raise();
    diagram->raise();
    // The bearing load is a tab beside the plots and the peak table (a tab bar
    // of its own over the diagram would cost a laptop screen the height it has not got).
    if (QDockWidget* polar = panel("bearingPolarDock")) {
        polar->setFloating(false);
        window->tabifyDockWidget(peaks, polar);
        polar->show();
        plots->raise();
    }
    // The drive's figures stand side by side: the wide bottom suits them.
    if (QDockWidget* drive = panel("driveDock")) {
        drive->setFloating(false);
        window->tabifyDockWidget(peaks, drive);
        drive->show();
        plots->raise();
    }

    // A free-body diagram is read with its kinetic diagram beside it, both
    // whole. At their least readable zoom the two need a view of about 46 ×
    // 22 em side by side (the samples' bodies: 515–545 × 264 px at a 12 px
    // font; longer labels up to 54 em across), or 25 × 46 em one under the
    // other, more height than a 768 px screen has. So across, the diagram gets
    // 47 em (a third of a wide window) and the canvas keeps at least 40 em;
    // down, the top row (canvas and diagram) gets those 22 em with the dock's
    // title, controls and tabs and a little to spare (30 em), and the plots
    // what is left of their third of the window, never less than one whole
    // pane. A laptop's plots thus show one pane at a time, a larger screen's
    // keep their third.
    const QSize size = window->size();
    const int em = QFontInfo(window->font()).pixelSize();
    const int column = share(size.width(), 0.2, 240, 360);
    const int diagramWidth = std::clamp(std::max(int(size.width() * 0.34), 47 * em), 300,
                                        std::max(300, std::min(640, size.width() - column - 40 * em)));
    window->resizeDocks({parts, diagram}, {column, diagramWidth}, Qt::Horizontal);
    window->resizeDocks({parts, properties}, {size.height() * 3 / 10, size.height()}, Qt::Vertical);
    const int bars = window->menuBar()->sizeHint().height() + window->statusBar()->sizeHint().height() +
                     toolBarsHeight(window) + cycle->minimumSizeHint().height() + 4 * em;  // 4 em: tabs, splitters
    const int onePane = PlotStack::kPaneHeight + 3 * em;  // with its dock's title, the readout line and the tabs
    const int plotsHeight =
        std::clamp(std::min(int(size.height() * 0.33), size.height() - bars - 30 * em), onePane, 420);
    window->resizeDocks({cycle, plots}, {cycle->minimumSizeHint().height(), plotsHeight}, Qt::Vertical);
}

}  // namespace clevis::ui
