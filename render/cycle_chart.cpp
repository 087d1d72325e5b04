#include "render/cycle_chart.h"

#include "render/palette.h"

#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

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

CycleChart::CycleChart(PlotPane pane, CycleAxis axis, const CycleResult& r, QSizeF size)
    : pane_(std::move(pane)), axis_(std::move(axis)), singular_(nearSingularRuns(r)), size_(size)
{
    if (!axis_.values.empty()) {
        reachEnd_ = axis_.values.back();
        plannedEnd_ = plannedEnd(axis_, r);
    }
}

void CycleChart::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    const QRectF plot(58, 26, size_.width() - 70, size_.height() - 26 - 52);
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
    const auto X = [&](double x) { return plot.left() + (x - xlo) / (xhi - xlo) * plot.width(); };
    const auto Y = [&](double y) { return plot.bottom() - (y - ylo) / (yhi - ylo) * plot.height(); };

    // Shading first: flagged steps and the part of the cycle not reached.
    QColor shade = palette::problem();
    shade.setAlphaF(0.12);
    for (const auto& [a, b] : singular_) {
        const double x0 = X(axis_.values[std::max(a - 1, 0)]),
                     x1 = X(axis_.values[std::min<int>(b + 1, axis_.values.size() - 1)]);
        p.fillRect(QRectF(x0, plot.top(), std::max(x1 - x0, 1.5), plot.height()), shade);
    }
    if (plannedEnd_ != reachEnd_) {
        QColor unreached = palette::groundHatch();
        unreached.setAlphaF(0.18);
        p.fillRect(QRectF(QPointF(X(reachEnd_), plot.top()), QPointF(X(plannedEnd_), plot.bottom())), unreached);
    }

    p.setFont(chartFont(10));
    const auto xt = niceTicks(xlo, xhi, 8), yt = niceTicks(ylo, yhi, 5);
    const double xs = xt.size() > 1 ? xt[1] - xt[0] : 1, ys = yt.size() > 1 ? yt[1] - yt[0] : 1;
    for (const double t : xt) {
        p.setPen(QPen(palette::gridMinor(), 0.6));
        p.drawLine(QPointF(X(t), plot.top()), QPointF(X(t), plot.bottom()));
        p.setPen(palette::ink());
        p.drawText(QRectF(X(t) - 30, plot.bottom() + 3, 60, 14), Qt::AlignCenter, tickText(t, xs));
    }
    for (const double t : yt) {
        p.setPen(QPen(std::abs(t) < 1e-12 * ys ? palette::groundHatch() : palette::gridMinor(), 0.6));
        p.drawLine(QPointF(plot.left(), Y(t)), QPointF(plot.right(), Y(t)));
        p.setPen(palette::ink());
        p.drawText(QRectF(0, Y(t) - 7, plot.left() - 4, 14), Qt::AlignRight | Qt::AlignVCenter, tickText(t, ys));
    }
    p.setPen(QPen(palette::ink(), 0.8));
    p.setBrush(Qt::NoBrush);
    p.drawRect(plot);
    p.drawText(QRectF(plot.left(), plot.bottom() + 16, plot.width(), 14), Qt::AlignCenter, axis_.label);
    p.save();
    p.translate(10, plot.center().y());
    p.rotate(-90);
    p.drawText(QRectF(-plot.height() / 2, -8, plot.height(), 14), Qt::AlignCenter, pane_.unit);
    p.restore();

    double legendX = plot.left();
    const double legendY = size_.height() - 10;
    for (const auto& c : pane_.curves) {
        const QPen pen = curvePen(c.pen);
        const auto& v = c.series.values;
        QPainterPath path;
        for (std::size_t i = 0; i < v.size() && i < axis_.values.size(); ++i) {
            const QPointF pt(X(axis_.values[i]), Y(v[i]));
            if (i == 0) path.moveTo(pt);
            else path.lineTo(pt);
        }
        QPen line = pen;
        line.setWidthF(1.4);
        p.setPen(line);
        p.drawPath(path);
        // Peak of |value|, marked and written beside the mark.
        const auto peak =
            std::max_element(v.begin(), v.end(), [](double a, double b) { return std::abs(a) < std::abs(b); });
        if (peak != v.end()) {
            const int i = int(peak - v.begin());
            const QPointF pt(X(axis_.values[i]), Y(*peak));
            p.setPen(QPen(pen.color(), 1.2));
            p.drawEllipse(pt, 3.2, 3.2);
            const QString text = QString("%1 at %2 %3")
                                     .arg(formatQuantity(*peak, c.series.unit))
                                     .arg(axis_.values[i], 0, 'f', 1)
                                     .arg(axis_.unit);
            const bool left = pt.x() > plot.center().x();
            const QRectF box =
                left ? QRectF(pt.x() - 176, pt.y() - 15, 170, 12) : QRectF(pt.x() + 6, pt.y() - 15, 170, 12);
            p.setPen(palette::ink());
            p.drawText(box.translated(0, box.top() < plot.top() ? 16 : 0), left ? Qt::AlignRight : Qt::AlignLeft, text);
        }
        p.setPen(pen);
        p.drawLine(QPointF(legendX, legendY - 4), QPointF(legendX + 18, legendY - 4));
        p.setPen(palette::ink());
        p.drawText(QPointF(legendX + 22, legendY), c.series.name);
        legendX += 30 + p.fontMetrics().horizontalAdvance(c.series.name);
    }
    p.restore();
}

}  // namespace clevis::ui
