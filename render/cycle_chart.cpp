#include "render/cycle_chart.h"

#include "core/results/cycle_summary.h"
#include "render/palette.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {

CycleChart::CycleChart(PlotPane pane, CycleAxis axis, const CycleResult& r, double width, double plotHeight)
    : pane_(std::move(pane))
    , axis_(std::move(axis))
    , unreliable_(unreliableSteps(r))
    , singular_(unreliableRuns(unreliable_))
    , size_(width, kChartPlotTop + plotHeight + kChartBelowPlot + kChartBottomPad)
    , plot_(kChartPlotLeft, kChartPlotTop, width - kChartPlotLeft - kChartPlotRight, plotHeight)
{
    if (!axis_.values.empty()) {
        reachEnd_ = axis_.values.back();
        plannedEnd_ = plannedEnd(axis_, r);
    }
    layOutLegend();
}

// One entry per curve with its peak, then one per level with its value; a
// label too long for its column is shortened (it names its curve first).
void CycleChart::layOutLegend()
{
    if (axis_.values.empty()) return;
    QStringList labels;
    for (const PlotCurve& c : pane_.curves) {
        const QString peak = peakText(c.series, axis_, curvePeak(c.series.values, unreliable_));
        labels << (peak.isEmpty() ? c.series.name : QString("%1  peak %2").arg(c.series.name, peak));
        legend_.push_back({{}, {}, {}, c.pen, true, false, true});
    }
    for (const PlotLevel& l : pane_.levels) {
        labels << QString("%1  %2").arg(l.name, formatQuantity(l.value, pane_.unit));
        legend_.push_back({{}, {}, {}, l.pen, false, false, true});
    }
    const double top = plot_.bottom() + kChartBelowPlot;
    size_.setHeight(top + clevis::ui::layOutLegend(legend_, labels, size_.width(), top) + kChartBottomPad);
}

void CycleChart::paintAxes(QPainter& p, double xlo, double xhi, double ylo, double yhi) const
{
    const auto X = [&](double x) { return plot_.left() + (x - xlo) / (xhi - xlo) * plot_.width(); };
    const auto Y = [&](double y) { return plot_.bottom() - (y - ylo) / (yhi - ylo) * plot_.height(); };
    p.setFont(chartFont(10));
    // About one x tick per 55 units of width, so the numbers stay apart in a narrow chart.
    const auto xt = niceTicks(xlo, xhi, std::clamp(int(plot_.width() / 55), 3, 8)),
               yt = niceTicks(ylo, yhi, yTickCount(plot_.height()));
    const double xs = xt.size() > 1 ? xt[1] - xt[0] : 1, ys = yt.size() > 1 ? yt[1] - yt[0] : 1;
    for (const double t : xt) {
        p.setPen(QPen(palette::gridMinor(), 0.6));
        p.drawLine(QPointF(X(t), plot_.top()), QPointF(X(t), plot_.bottom()));
        p.setPen(palette::ink());
        p.drawText(QRectF(X(t) - 30, plot_.bottom() + 5, 60, 14), Qt::AlignCenter, tickText(t, xs));
    }
    for (const double t : yt) {
        p.setPen(QPen(std::abs(t) < 1e-12 * ys ? palette::groundHatch() : palette::gridMinor(), 0.6));
        p.drawLine(QPointF(plot_.left(), Y(t)), QPointF(plot_.right(), Y(t)));
        p.setPen(palette::ink());
        p.drawText(QRectF(0, Y(t) - 7, plot_.left() - 4, 14), Qt::AlignRight | Qt::AlignVCenter, tickText(t, ys));
    }
    p.setPen(QPen(palette::ink(), 0.8));
    p.setBrush(Qt::NoBrush);
    p.drawRect(plot_);
    p.drawText(QRectF(plot_.left(), plot_.bottom() + 20, plot_.width(), 14), Qt::AlignCenter, axis_.label);
    p.save();
    p.translate(10, plot_.center().y());
    p.rotate(-90);
    p.drawText(QRectF(-plot_.height() / 2, -8, plot_.height(), 14), Qt::AlignCenter, pane_.unit);
    p.restore();
}

void CycleChart::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    p.fillRect(QRectF(QPointF(0, 0), size_), Qt::white);
    p.setPen(palette::ink());
    p.setFont(chartFont(12, true));
    p.drawText(QPointF(4, 14), QFontMetricsF(p.font()).elidedText(pane_.title, Qt::ElideRight, size_.width() - 8));
    if (axis_.values.empty() || pane_.curves.empty()) {
        p.restore();
        return;
    }

    double xlo = std::min(axis_.values.front(), plannedEnd_), xhi = std::max(axis_.values.back(), plannedEnd_);
    double ylo = pane_.fromZero ? 0.0 : HUGE_VAL, yhi = pane_.fromZero ? 0.0 : -HUGE_VAL;
    for (const auto& c : pane_.curves)
        for (const double v : c.series.values) {
            ylo = std::min(ylo, v);
            yhi = std::max(yhi, v);
        }
    for (const auto& l : pane_.levels) {
        ylo = std::min(ylo, l.value);
        yhi = std::max(yhi, l.value);
    }
    if (yhi - ylo < 1e-12) yhi = ylo + 1;
    const double pad = 0.06 * (yhi - ylo);
    ylo -= ylo < 0 || !pane_.fromZero ? pad : 0;
    yhi += pad;
    const auto X = [&](double x) { return plot_.left() + (x - xlo) / (xhi - xlo) * plot_.width(); };
    const auto Y = [&](double y) { return plot_.bottom() - (y - ylo) / (yhi - ylo) * plot_.height(); };

    // Shading first: flagged steps and the part of the cycle not reached.
    QColor shade = palette::problem();
    shade.setAlphaF(0.12);
    for (const auto& [a, b] : singular_) {
        const double x0 = X(axis_.values[std::max(a - 1, 0)]),
                     x1 = X(axis_.values[std::min<int>(b + 1, axis_.values.size() - 1)]);
        p.fillRect(QRectF(x0, plot_.top(), std::max(x1 - x0, 1.5), plot_.height()), shade);
    }
    if (plannedEnd_ != reachEnd_) {
        QColor unreached = palette::groundHatch();
        unreached.setAlphaF(0.18);
        p.fillRect(QRectF(QPointF(X(reachEnd_), plot_.top()), QPointF(X(plannedEnd_), plot_.bottom())), unreached);
    }
    paintAxes(p, xlo, xhi, ylo, yhi);

    p.save();
    p.setClipRect(plot_.adjusted(-kChartPeakMark - 1, -kChartPeakMark - 1, kChartPeakMark + 1, kChartPeakMark + 1));
    for (const auto& c : pane_.curves) {
        const auto& v = c.series.values;
        QPainterPath path;
        for (std::size_t i = 0; i < v.size() && i < axis_.values.size(); ++i) {
            const QPointF pt(X(axis_.values[i]), Y(v[i]));
            if (i == 0) path.moveTo(pt);
            else path.lineTo(pt);
        }
        p.setPen(chartLinePen(c.pen));
        p.drawPath(path);
    }
    for (const auto& l : pane_.levels) {
        p.setPen(chartLinePen(l.pen));
        p.drawLine(QPointF(plot_.left(), Y(l.value)), QPointF(plot_.right(), Y(l.value)));
    }
    // Peak marks over every line, so none hides under a later curve.
    for (const auto& c : pane_.curves)
        if (const int k = curvePeak(c.series.values, unreliable_).step; k >= 0 && k < int(axis_.values.size()))
            paintPeakMark(p, QPointF(X(axis_.values[k]), Y(c.series.values[k])), c.pen);
    p.restore();

    paintLegend(p, legend_);
    p.restore();
}

}  // namespace clevis::ui
