// Panes of curves over the cycle stacked on one shared horizontal axis:
// reactions at the ticked joints (magnitude, and components on request),
// driver effort and power, shaking force and moment on the frame, and the
// transmission angle. A vertical cursor follows AnalysisState::currentStep
// and a click or drag on any pane moves it; hovering reads the values out
// with units; each curve's peak is marked and listed; flagged steps and the
// unreachable end of the cycle are shaded.
#pragma once

#include "render/cycle_axis.h"

#include <QWidget>

class QCheckBox;
class QCustomPlot;
class QCPAxisRect;
class QCPItemStraightLine;
class QLabel;
class QListWidget;
class QMouseEvent;

namespace clevis::ui {

class AnalysisState;

class PlotStack : public QWidget {
    Q_OBJECT
public:
    explicit PlotStack(AnalysisState* analysis, QWidget* parent = nullptr);

    QCustomPlot* plot() const { return plot_; }
    double cursorX() const;                 // in the axis unit; NaN when nothing is shown
    QPoint pixelForStep(int step) const;    // a point inside the first pane at that step (for tests)
    QString peakListText() const;
    QString readoutText() const;

private:
    void rebuild();
    void moveCursor(int step);
    void pointerPressed(QMouseEvent* e);
    void pointerMoved(QMouseEvent* e);
    int stepAtPixel(double x) const;
    QCPAxisRect* addPane(const QString& unit, bool lastPane);

    AnalysisState* analysis_;
    CycleAxis axis_;
    QListWidget* joints_;
    QCheckBox* components_;
    QCustomPlot* plot_;
    QLabel* readout_;
    QLabel* peaks_;
    std::vector<QCPItemStraightLine*> cursors_;
};

}  // namespace clevis::ui
