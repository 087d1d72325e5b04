#include "render/cycle_chart.h"

#include "core/results/cycle_summary.h"
#include "render/palette.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

// Layout in logical units (pt on paper).
constexpr double kPlotLeft = 58, kPlotRight = 16, kPlotTop = 26, kPlotHeight = 152;
constexpr double kBelowPlot = 38;  // tick numbers clear of the lowest y number, then the axis title
constexpr double kLegendRow = 15, kSampleWidth = 26, kEntryGap = 14, kBottomPad = 6;
constexpr double kLineWidth = 1.4, kPeakMark = 3.2;

QFont chartFont(int pixels, bool bold = false)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
    f.setBold(bold);
    return f;
}

QString tickText(double v, double spacing)
{
    const int decimals = std::clamp(int(-std::floor(std::log10(spacing))), 0, 6);
    return QString::number(std::abs(v) < 1e-12 * spacing ? 0.0 : v, 'f', decimals);
}

QPen linePen(int index)
{
    QPen pen = curvePen(index);
    pen.setWidthF(kLineWidth);
    return pen;
}

// An open circle in the curve's colour.
void paintPeakMark(QPainter& p, QPointF at, int pen)
{
    p.setPen(QPen(curvePen(pen).color(), 1.2));
    p.setBrush(Qt::white);
    p.drawEllipse(at, kPeakMark, kPeakMark);
    p.setBrush(Qt::NoBrush);
}

// A short stretch of the curve's line with its peak mark in the middle.
void paintSample(QPainter& p, const QRectF& box, int pen)
{
    const double y = box.center().y();
    p.setPen(linePen(pen));
    p.drawLine(QPointF(box.left(), y), QPointF(box.right(), y));
    paintPeakMark(p, box.center(), pen);
}

}  // namespace

std::vector<double> niceTicks(double lo, double hi, int count)
{
    if (!(hi > lo)) hi = lo + 1;
    const double raw = (hi - lo) / std::max(count, 1);
    const double decade = std::pow(10.0, std::floor(std::log10(raw)));
    double spacing = decade;
    for (const double f : {1.0, 2.0, 2.5, 5.0, 10.0})
        if (f * decade >= raw) {
            spacing = f * decade;
            break;
        }
    std::vector<double> ticks;
    for (double t = std::ceil(lo / spacing - 1e-9) * spacing; t <= hi + 1e-9 * spacing; t += spacing)
        ticks.push_back(t);
    return ticks;
}

CycleChart::CycleChart(PlotPane pane, CycleAxis axis, const CycleResult& r, double width)
    : pane_(std::move(pane))
    , axis_(std::move(axis))
    , unreliable_(unreliableSteps(r))
    , singular_(unreliableRuns(unreliable_))
    , size_(width, kPlotTop + kPlotHeight + kBelowPlot + kBottomPad)
    , plot_(kPlotLeft, kPlotTop, width - kPlotLeft - kPlotRight, kPlotHeight)
{
    if (!axis_.values.empty()) {
        reachEnd_ = axis_.values.back();
        plannedEnd_ = plannedEnd(axis_, r);
    }
    layOutLegend();
}

// Entries in equal columns, as many across as fit, row by row; a label too
// long for the width is shortened with an ellipsis (it names its curve first).
void CycleChart::layOutLegend()
{
    if (axis_.values.empty()) return;
    const QFontMetricsF metrics(chartFont(10));
    QStringList labels;
    double widest = 0;
    for (const PlotCurve& c : pane_.curves) {
        const QString peak = peakText(c.series, axis_, curvePeak(c.series.values, unreliable_));
        const QString label = peak.isEmpty() ? c.series.name : QString("%1  peak %2").arg(c.series.name, peak);
        labels << label;
        widest = std::max(widest, metrics.horizontalAdvance(label));
    }
    const double room = size_.width() - 8;
    const double column = std::min(room, kSampleWidth + 4 + widest + kEntryGap);
    const int across = std::max(1, int(room / column));
    const double top = plot_.bottom() + kBelowPlot;
    for (int i = 0; i < labels.size(); ++i) {
        const QPointF corner(4 + (i % across) * column, top + (i / across) * kLegendRow);
        const QRectF sample(corner, QSizeF(kSampleWidth, kLegendRow));
        const QRectF text(sample.right() + 4, corner.y(), column - kSampleWidth - 4 - kEntryGap, kLegendRow);
        legend_.push_back({sample, text, metrics.elidedText(labels[i], Qt::ElideRight, text.width())});
    }
    const int rows = (int(labels.size()) + across - 1) / across;
    size_.setHeight(top + rows * kLegendRow + kBottomPad);
}

void CycleChart::paintAxes(QPainter& p, double xlo, double xhi, double ylo, double yhi) const
{
    const auto X = [&](double x) { return plot_.left() + (x - xlo) / (xhi - xlo) * plot_.width(); };
    const auto Y = [&](double y) { return plot_.bottom() - (y - ylo) / (yhi - ylo) * plot_.height(); };
    p.setFont(chartFont(10));
    const auto xt = niceTicks(xlo, xhi, 8), yt = niceTicks(ylo, yhi, 5);
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
    p.drawText(QPointF(4, 14), pane_.title);
    if (axis_.values.empty() || pane_.curves.empty()) {
        p.restore();
        return;
    }

    double xlo = std::min(axis_.values.front(), plannedEnd_), xhi = std::max(axis_.values.back(), plannedEnd_);
    double ylo = 0, yhi = 0;
    for (const auto& c : pane_.curves)
        for (const double v : c.series.values) {
            ylo = std::min(ylo, v);
            yhi = std::max(yhi, v);
        }
    if (yhi - ylo < 1e-12) yhi = ylo + 1;
    const double pad = 0.06 * (yhi - ylo);
    ylo -= ylo < 0 ? pad : 0;
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
    p.setClipRect(plot_.adjusted(-kPeakMark - 1, -kPeakMark - 1, kPeakMark + 1, kPeakMark + 1));
    for (const auto& c : pane_.curves) {
        const auto& v = c.series.values;
        QPainterPath path;
        for (std::size_t i = 0; i < v.size() && i < axis_.values.size(); ++i) {
            const QPointF pt(X(axis_.values[i]), Y(v[i]));
            if (i == 0) path.moveTo(pt);
            else path.lineTo(pt);
        }
        p.setPen(linePen(c.pen));
        p.drawPath(path);
    }
    // Peak marks over every line, so none hides under a later curve.
    for (const auto& c : pane_.curves)
        if (const int k = curvePeak(c.series.values, unreliable_).step; k >= 0 && k < int(axis_.values.size()))
            paintPeakMark(p, QPointF(X(axis_.values[k]), Y(c.series.values[k])), c.pen);
    p.restore();

    p.setFont(chartFont(10));
    for (std::size_t i = 0; i < legend_.size(); ++i) {
        paintSample(p, legend_[i].sample, pane_.curves[i].pen);
        p.setPen(palette::ink());
        p.drawText(legend_[i].text, Qt::AlignLeft | Qt::AlignVCenter, legend_[i].label);
    }
    p.restore();
}

}  // namespace clevis::ui
