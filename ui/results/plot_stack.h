// Panes of curves over the cycle stacked on one shared horizontal axis, as
// plotPanes() describes them: reactions at the ticked joints (magnitude, and
// components on request), driver effort and power, shaking force and moment
// on the frame, and the transmission angle. A vertical cursor follows
// AnalysisState::currentStep and a click or drag on any pane moves it;
// hovering reads the values out with units on one elided line; each curve's
// peak is marked and listed; flagged steps and the unreachable end of the
// cycle are shaded. A new result with the same curves only sets their data
// (the panes, legends and layout stay); while the value axes still fit the
// new curves well they stay too, and only the layer of curves, marks and
// cursor is drawn again. Only the panes in view are drawn, and those
// scrolled into view are drawn then.
#pragma once

#include "render/cycle_axis.h"
#include "render/plot_panes.h"

#include <QColor>
#include <QWidget>

#include <set>
#include <string>

class QCheckBox;
class QCustomPlot;
class QCPAbstractItem;
class QCPAxisRect;
class QCPGraph;
class QCPItemStraightLine;
class QCPItemTracer;
class QCPLayerable;
class QCPLayoutGrid;
class QCPLegend;
class QCPMarginGroup;
class QLabel;
class QListWidget;
class QListWidgetItem;
class QPlainTextEdit;
class QMouseEvent;
class QScrollArea;

namespace clevis::ui {

class SightWatch;

class AnalysisState;

class PlotStack : public QWidget {
    Q_OBJECT
public:
    explicit PlotStack(AnalysisState* analysis, QWidget* parent = nullptr);

    // px: one pane, its title and legend, three ticks, the x numbers and title.
    static constexpr int kPaneHeight = 160;

    // What is plotted; the joint list and the components box show it. Until
    // joints are picked (ticked in the list, or set here), each result's
    // mostLoadedChoice(); once picked, the pick is kept across results, until
    // a mechanism comes none of whose joints were listed before.
    const PaneChoice& choice() const { return choice_; }
    void setChoice(PaneChoice choice);
    const std::vector<PlotPane>& panes() const { return panes_; }

    QCustomPlot* plot() const { return plot_; }
    double cursorX() const;               // in the axis unit; NaN when nothing is shown
    QPoint pixelForStep(int step) const;  // a point inside the first pane at that step (for tests)
    QString peakListText() const;
    QString readoutText() const;  // in full, however much the line shows

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    // A band over a pane's height between two axis values.
    struct Shade {
        double from = 0, to = 0;
        QColor colour;
        bool operator==(const Shade&) const = default;
    };
    // What one pane is drawn with, kept while its curves stay the same.
    struct PaneParts {
        QCPLayoutGrid* header = nullptr;  // the title and the legend
        QCPLegend* legend = nullptr;
        QCPAxisRect* rect = nullptr;
        std::vector<QCPGraph*> graphs;  // one per curve
        std::vector<QCPItemTracer*> marks;
        std::vector<QCPAbstractItem*> shades;
        std::vector<Shade> shaded;  // what `shades` show, to see whether it changed
        QCPItemStraightLine* cursor = nullptr;
        bool drawn = false;  // at the last replot
    };

    // What a replot must draw again: nothing, the layer of curves, marks and
    // cursor only (the axes, titles, legends and shading unchanged), or all.
    enum class Redraw { None, Curves, All };

    void rebuild();
    void listJoints(const CompiledMechanism& m);
    void showChoice();
    void jointTicked(QListWidgetItem* item);
    void clearPlot();
    PaneParts addPane(const PlotPane& pane, QCPMarginGroup* margins);
    QStringList fillPane(const PlotPane& pane, PaneParts& parts, bool fresh, bool& framed);
    void fitLegends();
    bool setShades(PaneParts& parts, std::vector<Shade> shades);
    std::vector<QCPLayerable*> layerables(const PaneParts& parts) const;
    bool inView(const PaneParts& parts) const;
    void leaveOutPanesOutOfView();
    void scrolled();
    void moveCursor(int step);
    void pointerPressed(QMouseEvent* e);
    void pointerMoved(QMouseEvent* e);
    void showReadout(const QString& text);
    void replotWhenSeen(Redraw what);
    void redraw();
    void redrawCurves();
    int stepAtPixel(double x) const;

    AnalysisState* analysis_;
    PaneChoice choice_;
    bool picked_ = false;           // the joints shown were picked by the user
    std::set<std::string> listed_;  // the joints listed for the last result
    std::vector<PlotPane> panes_;
    CycleAxis axis_;
    QString fullReadout_;
    QListWidget* joints_;
    QCheckBox* components_;
    QCustomPlot* plot_;
    QScrollArea* scroll_;
    QLabel* readout_;
    QPlainTextEdit* peaks_;
    std::vector<PaneParts> parts_;  // one per pane, in pane order
    SightWatch* sight_ = nullptr;   // replots when seen: changes while hidden are drawn when next shown
    bool replotting_ = false;       // inside a replot of the widget (not an export's drawing)
    Redraw redraw_ = Redraw::None;  // asked for and not yet drawn
    bool redrawQueued_ = false;
    int replots_ = 0;  // whole replots begun
};

}  // namespace clevis::ui
