// A chart of curves over the cycle for print (report pages, headless
// exports): axes with round ticks and titles, near-singular steps and the
// unreachable end of the cycle shaded, each curve's peak marked on it and
// listed in a legend under the chart beside a sample of the curve's line, so
// that no two labels can overlap however the peaks fall; a pane's levels
// (a supply pressure) drawn across it and listed with their values.
#pragma once

#include "render/chart_style.h"
#include "render/cycle_axis.h"
#include "render/figure_export.h"
#include "render/plot_panes.h"

namespace clevis::ui {

class CycleChart final : public Figure {
public:
    // The height follows from the plot's and the legend's: as many rows as the curves need.
    CycleChart(PlotPane pane, CycleAxis axis, const CycleResult& r, double width = 515,
               double plotHeight = kChartPlotHeight);

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

private:
    void layOutLegend();
    void paintAxes(QPainter& p, double xlo, double xhi, double ylo, double yhi) const;

    PlotPane pane_;
    CycleAxis axis_;
    std::vector<bool> unreliable_;  // per step
    std::vector<std::pair<int, int>> singular_;
    double reachEnd_ = 0, plannedEnd_ = 0;  // x where the solved part ends and the cycle would
    QSizeF size_;
    QRectF plot_;
    std::vector<LegendEntry> legend_;  // "A |F|  peak 1.20 kN at 95.0 °" per curve, then each level
};

}  // namespace clevis::ui
