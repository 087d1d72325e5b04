#include "ui/shell/dock_layout.h"

#include <QDockWidget>
#include <QMainWindow>

#include <algorithm>

namespace clevis::ui {
namespace {

int share(int total, double fraction, int least, int most) { return std::clamp(int(total * fraction), least, most); }

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

    const QSize size = window->size();
    const int column = share(size.width(), 0.2, 240, 360), diagramWidth = share(size.width(), 0.34, 300, 640);
    window->resizeDocks({parts, diagram}, {column, diagramWidth}, Qt::Horizontal);
    window->resizeDocks({parts, properties}, {size.height() * 3 / 10, size.height()}, Qt::Vertical);
    const int plotsHeight = share(size.height(), 0.33, 180, 420);
    window->resizeDocks({cycle, plots}, {cycle->minimumSizeHint().height(), plotsHeight}, Qt::Vertical);
}

}  // namespace clevis::ui
