// A chart of curves over the cycle for print (report pages, headless
// exports): axes with round ticks, each curve's peak marked with its value,
// near-singular steps and the unreachable end of the cycle shaded.
#pragma once

#include "render/cycle_axis.h"
#include "render/figure_export.h"
#include "render/plot_panes.h"

namespace clevis::ui {

class CycleChart final : public Figure {
public:
    CycleChart(PlotPane pane, CycleAxis axis, const CycleResult& r, QSizeF size = {515, 230});

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

private:
    PlotPane pane_;
    CycleAxis axis_;
    std::vector<std::pair<int, int>> singular_;
    double reachEnd_ = 0, plannedEnd_ = 0;  // x where the solved part ends and the cycle would
    QSizeF size_;
};

// Round tick positions covering [lo, hi], about `count` of them.
std::vector<double> niceTicks(double lo, double hi, int count);

}  // namespace clevis::ui
