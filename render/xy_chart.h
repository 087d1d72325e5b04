// A chart of one quantity against another for print and the window (the
// drive's torque against speed, a ratio study): axes with round ticks
// (optionally a logarithmic x axis), curves joined or as dots, points of
// note circled, and a legend under the plot naming every curve and point, so
// no label sits on the plot where it could cover another. Looks like the
// charts over the cycle (chart_style.h).
#pragma once

#include "render/chart_style.h"
#include "render/figure_export.h"

#include <QPointF>
#include <QString>

#include <vector>

namespace clevis::ui {

struct XyCurve {
    QString name;                 // the legend's text
    std::vector<QPointF> points;  // in the axes' units
    int pen = 0;                  // curvePen index
    bool dots = false;            // the points apart, not joined
};

// A point circled on the plot and named in the legend, e.g. the least RMS torque.
struct XyMark {
    QPointF at;
    QString label;
    int pen = 0;
};

struct XyChartContent {
    QString title;
    QString xTitle, yTitle;  // each with its unit: "motor speed (rpm)"
    bool logX = false;       // x > 0 throughout
    std::vector<XyCurve> curves;
    std::vector<XyMark> marks;
};

class XyChart final : public Figure {
public:
    // The height follows from the plot's and the legend's rows.
    explicit XyChart(XyChartContent content, double width = 515, double plotHeight = kChartPlotHeight);

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;
    const XyChartContent& content() const { return content_; }

private:
    void paintAxes(QPainter& p) const;
    double toX(double x) const;
    double toY(double y) const;

    XyChartContent content_;
    QSizeF size_;
    QRectF plot_;
    double xlo_ = 0, xhi_ = 1, ylo_ = 0, yhi_ = 1;  // the axes' ranges (x in log10 when logX)
    std::vector<double> xTicks_, yTicks_;
    std::vector<LegendEntry> legend_;
};

// Tick positions for a logarithmic axis over [lo, hi] (lo > 0): the
// 1-2-5 values of each decade, or, over a short range, 1 to 9 of each.
std::vector<double> logTicks(double lo, double hi);

}  // namespace clevis::ui
