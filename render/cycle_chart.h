// A chart of curves over the cycle for print (report pages, headless
// exports): axes with round ticks, each curve's peak marked with its value,
// near-singular steps and the unreachable end of the cycle shaded.
#pragma once

#include "render/cycle_axis.h"
#include "render/cycle_series.h"
#include "render/figure_export.h"

#include <QColor>

namespace clevis::ui {

struct ChartLine {
    CycleSeries series;
    QColor colour;
    Qt::PenStyle style = Qt::SolidLine;
};

// The pen for the n-th curve of a chart: palette colours, then dash styles,
// so curves differ by more than colour.
ChartLine chartLine(CycleSeries series, int index);

class CycleChart final : public Figure {
public:
    CycleChart(QString title, CycleAxis axis, std::vector<ChartLine> lines, const CycleResult& r,
               QSizeF size = {515, 230});

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

private:
    QString title_;
    CycleAxis axis_;
    std::vector<ChartLine> lines_;
    std::vector<std::pair<int, int>> singular_;
    double reachEnd_ = 0, plannedEnd_ = 0;  // x where the solved part ends and the cycle would
    QSizeF size_;
};

// Round tick positions covering [lo, hi], about `count` of them.
std::vector<double> niceTicks(double lo, double hi, int count);

}  // namespace clevis::ui
