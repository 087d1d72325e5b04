// What the report's charts share, so that a curve over the cycle and a curve
// of one quantity against another look alike: the font, the line and peak
// mark of a curve, tick numbers, and the legend under the plot (entries in
// equal columns, row by row, so no two can overlap).
#pragma once

#include <QFont>
#include <QPainter>
#include <QRectF>
#include <QStringList>

#include <vector>

namespace clevis::ui {

// Layout in logical units (pt on paper).
inline constexpr double kChartPlotLeft = 58, kChartPlotRight = 16, kChartPlotTop = 26, kChartPlotHeight = 152;
inline constexpr double kChartBelowPlot = 38;  // tick numbers clear of the lowest y number, then the axis title
inline constexpr double kChartBottomPad = 6;
inline constexpr double kChartPeakMark = 3.2;        // the radius of a peak's circle
inline constexpr double kChartLeastPlotHeight = 70;  // a plot squeezed into a short window: three y ticks still apart

QFont chartFont(int pixels, bool bold = false);

// Round tick positions covering [lo, hi], about `count` of them.
std::vector<double> niceTicks(double lo, double hi, int count);

// About as many y ticks as a plot of that height holds with room between
// their numbers: five at the full height, down to three.
int yTickCount(double plotHeight);

// A tick's number to the decimals its spacing needs ("0" rather than "-0").
QString tickText(double v, double spacing);

// The pen of the n-th curve (curvePen) at the charts' line width.
QPen chartLinePen(int index);

// An open circle in the curve's colour: a peak, or a point of note.
void paintPeakMark(QPainter& p, QPointF at, int pen);

struct LegendEntry {
    QRectF sample;  // the line sample
    QRectF text;
    QString label;  // shortened with an ellipsis when too long for its column
    int pen = 0;
    bool mark = true;   // the peak mark on the sample
    bool dots = false;  // a dot for a curve of points, not a line
    bool line = true;   // false: the mark alone (a point of note, not a curve)
};

// Entries for `labels` in equal columns across `width`, as many across as
// fit, from `top` down; returns the height they take.
double layOutLegend(std::vector<LegendEntry>& entries, const QStringList& labels, double width, double top);

void paintLegend(QPainter& p, const std::vector<LegendEntry>& entries);

}  // namespace clevis::ui
