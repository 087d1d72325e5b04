#include "render/xy_chart.h"

#include "render/palette.h"
#include "render/plot_panes.h"

#include <QFontMetricsF>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {

std::vector<double> logTicks(double lo, double hi)
{
    std::vector<double> ticks;
    if (!(lo > 0) || !(hi > lo)) return ticks;
    for (const std::vector<double>& steps : {std::vector<double>{1, 2, 5}, {1, 2, 3, 4, 5, 6, 7, 8, 9}}) {
        ticks.clear();
        for (double decade = std::pow(10.0, std::floor(std::log10(lo))); decade <= hi; decade *= 10)
            for (const double s : steps)
                if (const double t = s * decade; t >= lo * (1 - 1e-9) && t <= hi * (1 + 1e-9)) ticks.push_back(t);
        if (ticks.size() >= 3) break;
    }
    return ticks;
}

XyChart::XyChart(XyChartContent content, double width, double plotHeight)
    : content_(std::move(content))
    , size_(width, kChartPlotTop + plotHeight + kChartBelowPlot + kChartBottomPad)
    , plot_(kChartPlotLeft, kChartPlotTop, width - kChartPlotLeft - kChartPlotRight, plotHeight)
{
    // Linear axes take in zero, where torque and speed are read from; a
    // logarithmic one spans the points exactly.
    double xlo = content_.logX ? INFINITY : 0, xhi = content_.logX ? -INFINITY : 0, ylo = 0, yhi = 0;
    const auto take = [&](QPointF p) {
        if (content_.logX && !(p.x() > 0)) return;
        xlo = std::min(xlo, p.x());
        xhi = std::max(xhi, p.x());
        ylo = std::min(ylo, p.y());
        yhi = std::max(yhi, p.y());
    };
    for (const XyCurve& c : content_.curves)
        for (const QPointF& p : c.points) take(p);
    for (const XyMark& m : content_.marks) take(m.at);
    if (content_.logX) {
        if (!(xlo > 0)) xlo = 1, xhi = 10;
        if (!(xhi > xlo)) xhi = xlo * 10;
        xTicks_ = logTicks(xlo, xhi);
        xlo_ = std::log10(xlo);
        xhi_ = std::log10(xhi);
    } else {
        if (!(xhi - xlo > 1e-12)) xhi = xlo + 1;
        xlo_ = xlo - (xlo < 0 ? 0.03 * (xhi - xlo) : 0);
        xhi_ = xhi + 0.03 * (xhi - xlo);
        xTicks_ = niceTicks(xlo_, xhi_, std::clamp(int(plot_.width() / 55), 3, 8));
    }
    if (!(yhi - ylo > 1e-12)) yhi = ylo + 1;
    const double pad = 0.06 * (yhi - ylo);
    ylo_ = ylo - (ylo < 0 ? pad : 0);
    yhi_ = yhi + pad;
    yTicks_ = niceTicks(ylo_, yhi_, yTickCount(plot_.height()));

    QStringList labels;
    for (const XyCurve& c : content_.curves) {
        labels << c.name;
        legend_.push_back({{}, {}, {}, c.pen, false, c.dots, true});
    }
    for (const XyMark& m : content_.marks) {
        labels << m.label;
        legend_.push_back({{}, {}, {}, m.pen, true, false, false});
    }
    const double top = plot_.bottom() + kChartBelowPlot;
    size_.setHeight(top + layOutLegend(legend_, labels, width, top) + kChartBottomPad);
}

double XyChart::toX(double x) const
{
    const double v = content_.logX ? std::log10(std::max(x, 1e-300)) : x;
    return plot_.left() + (v - xlo_) / (xhi_ - xlo_) * plot_.width();
}

double XyChart::toY(double y) const { return plot_.bottom() - (y - ylo_) / (yhi_ - ylo_) * plot_.height(); }

void XyChart::paintAxes(QPainter& p) const
{
    p.setFont(chartFont(10));
    const QFontMetricsF metrics(p.font());
    const double xs = xTicks_.size() > 1 ? xTicks_[1] - xTicks_[0] : 1;
    const double ys = yTicks_.size() > 1 ? yTicks_[1] - yTicks_[0] : 1;
    double clearFrom = -INFINITY;  // a tick number is left out rather than written over the last one
    for (const double t : xTicks_) {
        const double x = toX(t);
        p.setPen(QPen(std::abs(t) < 1e-12 * xs && !content_.logX ? palette::groundHatch() : palette::gridMinor(), 0.6));
        p.drawLine(QPointF(x, plot_.top()), QPointF(x, plot_.bottom()));
        const QString text = content_.logX ? QString::number(t, 'g', 4) : tickText(t, xs);
        const double half = metrics.horizontalAdvance(text) / 2;
        if (x - half < clearFrom + 4) continue;
        clearFrom = x + half;
        p.setPen(palette::ink());
        p.drawText(QRectF(x - 30, plot_.bottom() + 5, 60, 14), Qt::AlignCenter, text);
    }
    for (const double t : yTicks_) {
        p.setPen(QPen(std::abs(t) < 1e-12 * ys ? palette::groundHatch() : palette::gridMinor(), 0.6));
        p.drawLine(QPointF(plot_.left(), toY(t)), QPointF(plot_.right(), toY(t)));
        p.setPen(palette::ink());
        p.drawText(QRectF(0, toY(t) - 7, plot_.left() - 4, 14), Qt::AlignRight | Qt::AlignVCenter, tickText(t, ys));
    }
    p.setPen(QPen(palette::ink(), 0.8));
    p.setBrush(Qt::NoBrush);
    p.drawRect(plot_);
    p.drawText(QRectF(plot_.left(), plot_.bottom() + 20, plot_.width(), 14), Qt::AlignCenter,
               metrics.elidedText(content_.xTitle, Qt::ElideRight, plot_.width()));
    p.save();
    p.translate(10, plot_.center().y());
    p.rotate(-90);
    p.drawText(QRectF(-plot_.height() / 2, -8, plot_.height(), 14), Qt::AlignCenter,
               metrics.elidedText(content_.yTitle, Qt::ElideRight, plot_.height()));
    p.restore();
}

void XyChart::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    p.fillRect(QRectF(QPointF(0, 0), size_), Qt::white);
    p.setPen(palette::ink());
    p.setFont(chartFont(12, true));
    p.drawText(QPointF(4, 14), QFontMetricsF(p.font()).elidedText(content_.title, Qt::ElideRight, size_.width() - 8));
    paintAxes(p);

    p.save();
    p.setClipRect(plot_.adjusted(-kChartPeakMark - 1, -kChartPeakMark - 1, kChartPeakMark + 1, kChartPeakMark + 1));
    for (const XyCurve& c : content_.curves) {
        if (c.dots) {
            p.setPen(Qt::NoPen);
            p.setBrush(curvePen(c.pen).color());
            for (const QPointF& pt : c.points) p.drawEllipse(QPointF(toX(pt.x()), toY(pt.y())), 1.4, 1.4);
            p.setBrush(Qt::NoBrush);
            continue;
        }
        QPainterPath path;
        for (std::size_t i = 0; i < c.points.size(); ++i) {
            const QPointF pt(toX(c.points[i].x()), toY(c.points[i].y()));
            if (i == 0) path.moveTo(pt);
            else path.lineTo(pt);
        }
        p.setPen(chartLinePen(c.pen));
        p.drawPath(path);
    }
    for (const XyMark& m : content_.marks) paintPeakMark(p, QPointF(toX(m.at.x()), toY(m.at.y())), m.pen);
    p.restore();

    paintLegend(p, legend_);
    p.restore();
}

}  // namespace clevis::ui
