// The panels around the canvas and their default arrangement.
//
// Editing column on the left, full height: "Parts" above "Properties" (which
// gets most of the height). Results to the right of and below the canvas:
// the free-body diagram on the right, the cycle position strip and the plots
// (with the peak table, the bearing load and the drive as tabs) along the bottom under
// the canvas and the diagram. Widths and heights are shares of the window,
// within limits, so the same arrangement serves a 1366 × 768 laptop and a
// 1920 × 1080 screen; on the laptop the diagram is given the room to show the
// free body and its kinetic diagram whole (see arrangePanels).
#pragma once

#include <QSize>
#include <QString>

class QDockWidget;
class QMainWindow;
class QWidget;

namespace clevis::ui {

// Adds `content` as a dock named `name`. Its minimum size is fixed to
// `minimum`, so nothing inside it (a long readout, message or list) can make
// the window grow after it is shown.
QDockWidget* addPanel(QMainWindow* window, const QString& title, const QString& name, QWidget* content, QSize minimum);

// Puts every panel back in its default place, shown, sized for the window's
// current size.
void arrangePanels(QMainWindow* window);

}  // namespace clevis::ui
