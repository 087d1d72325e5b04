#include "render/chart_style.h"

#include "render/palette.h"
#include "render/plot_panes.h"

#include <QFontMetricsF>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kLegendRow = 15, kSampleWidth = 26, kEntryGap = 14;
constexpr double kLineWidth = 1.4;

// A short stretch of the curve's line with its peak mark in the middle, or a
// few of its dots.
void paintSample(QPainter& p, const LegendEntry& e)
{
    const QRectF& box = e.sample;
    const double y = box.center().y();
    if (e.dots) {
        p.setPen(Qt::NoPen);
        p.setBrush(curvePen(e.pen).color());
        for (const double f : {0.2, 0.5, 0.8}) p.drawEllipse(QPointF(box.left() + f * box.width(), y), 1.6, 1.6);
        p.setBrush(Qt::NoBrush);
        return;
    }
    if (e.line) {
        p.setPen(chartLinePen(e.pen));
        p.drawLine(QPointF(box.left(), y), QPointF(box.right(), y));
    }
    if (e.mark) paintPeakMark(p, box.center(), e.pen);
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

QFont chartFont(int pixels, bool bold)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
    f.setBold(bold);
    return f;
}

int yTickCount(double plotHeight) { return std::clamp(int(plotHeight / 30), 3, 5); }

QString tickText(double v, double spacing)
{
    const int decimals = std::clamp(int(-std::floor(std::log10(spacing))), 0, 6);
    return QString::number(std::abs(v) < 1e-12 * spacing ? 0.0 : v, 'f', decimals);
}

QPen chartLinePen(int index)
{
    QPen pen = curvePen(index);
    pen.setWidthF(kLineWidth);
    return pen;
}

void paintPeakMark(QPainter& p, QPointF at, int pen)
{
    p.setPen(QPen(curvePen(pen).color(), 1.2));
    p.setBrush(Qt::white);
    p.drawEllipse(at, kChartPeakMark, kChartPeakMark);
    p.setBrush(Qt::NoBrush);
}

double layOutLegend(std::vector<LegendEntry>& entries, const QStringList& labels, double width, double top)
{
    const QFontMetricsF metrics(chartFont(10));
    double widest = 0;
    for (const QString& label : labels) widest = std::max(widest, metrics.horizontalAdvance(label));
    const double room = width - 8;
    const double column = std::min(room, kSampleWidth + 4 + widest + kEntryGap);
    const int across = std::max(1, int(room / column));
    for (int i = 0; i < labels.size() && i < int(entries.size()); ++i) {
        const QPointF corner(4 + (i % across) * column, top + (i / across) * kLegendRow);
        const QRectF sample(corner, QSizeF(kSampleWidth, kLegendRow));
        const QRectF text(sample.right() + 4, corner.y(), column - kSampleWidth - 4 - kEntryGap, kLegendRow);
        entries[std::size_t(i)].sample = sample;
        entries[std::size_t(i)].text = text;
        entries[std::size_t(i)].label = metrics.elidedText(labels[i], Qt::ElideRight, text.width());
    }
    const int rows = (int(labels.size()) + across - 1) / across;
    return rows * kLegendRow;
}

void paintLegend(QPainter& p, const std::vector<LegendEntry>& entries)
{
    p.setFont(chartFont(10));
    for (const LegendEntry& e : entries) {
        paintSample(p, e);
        p.setPen(palette::ink());
        p.drawText(e.text, Qt::AlignLeft | Qt::AlignVCenter, e.label);
    }
}

}  // namespace clevis::ui
