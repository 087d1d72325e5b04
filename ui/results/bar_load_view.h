// The internal loads of the selected link at the scrubbed position: the N/V/M
// diagram along it over its band over the cycle (the exports' painter, laid
// out at the view's width, so it never scrolls sideways), and under it the
// bar's stresses at this position (wrapped to the width) and its sizing over
// the cycle (utilisation, buckling), a table whose columns scroll sideways on
// their own where they are wider than the view, or why there is none.
// The band and the sizing are found once per solved cycle and bar, so
// scrubbing redraws only the step.
#pragma once

#include "core/results/bar_sizing.h"
#include "render/bar_load_diagram.h"

#include <QWidget>

#include <memory>
#include <optional>

class QLabel;
class QScrollArea;

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

class BarLoadView : public QWidget {
    Q_OBJECT
public:
    BarLoadView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);
    ~BarLoadView() override;

    // The diagram on show; null when no bar is selected or nothing is solved.
    const BarLoadDiagram* figure() const { return figure_.get(); }
    // Why there is no diagram; empty while one is shown.
    QString message() const;
    // The stresses and sizing under the diagram; empty without one.
    QString sizingText() const;

protected:
    // The viewport's resizes (the dock's, a scroll bar coming or going) lay the diagram out again.
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void forgetCycle();  // a new result (or none): the cached band and sizing go
    void refresh();
    void layOutFigure();
    void fitTable();  // the table's height: its lines, and its scroll bar where it needs one
    QString stepStresses(const BarModel& bar) const;

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    QScrollArea* scroll_;
    QWidget* canvas_;
    QLabel* message_;
    QLabel* stresses_;
    QScrollArea* table_;
    QLabel* sizing_;
    // Found from the solved mechanism when its result arrives.
    std::optional<BarList> bars_;
    std::optional<BarCycleLoads> cycle_;  // the selected bar's
    std::unique_ptr<BarLoadDiagram> figure_;
};

}  // namespace clevis::ui
