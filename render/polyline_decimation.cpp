#include "render/polyline_decimation.h"

#include <QPaintDevice>
#include <QPainter>

#include <algorithm>
#include <cmath>
#include <utility>
#include <vector>

namespace clevis::ui {
namespace {

constexpr double kPrinterDpi = 600.0, kDotFraction = 0.25;

// The distance from `p` to the segment ab (to a itself when the segment is a point).
double segmentDistance(QPointF p, QPointF a, QPointF b)
{
    const QPointF ab = b - a, ap = p - a;
    const double length2 = QPointF::dotProduct(ab, ab);
    const double t = length2 > 0 ? std::clamp(QPointF::dotProduct(ap, ab) / length2, 0.0, 1.0) : 0.0;
    const QPointF d = ap - t * ab;
    return std::hypot(d.x(), d.y());
}

}  // namespace

QPolygonF decimatedPolyline(const QPolygonF& points, double tolerance)
{
    const qsizetype n = points.size();
    if (n < 3) return points;
    std::vector<bool> keep(std::size_t(n), false);
    keep.front() = keep.back() = true;
    // Spans still to split, worked off a stack (a long curve would recurse deep).
    std::vector<std::pair<qsizetype, qsizetype>> spans{{0, n - 1}};
    while (!spans.empty()) {
        const auto [first, last] = spans.back();
        spans.pop_back();
        double farthest = -1;
        qsizetype at = -1;
        for (qsizetype i = first + 1; i < last; ++i)
            if (const double d = segmentDistance(points[i], points[first], points[last]); d > farthest) {
                farthest = d;
                at = i;
            }
        if (at < 0 || farthest <= tolerance) continue;
        keep[std::size_t(at)] = true;
        spans.emplace_back(first, at);
        spans.emplace_back(at, last);
    }
    QPolygonF kept;
    for (qsizetype i = 0; i < n; ++i)
        if (keep[std::size_t(i)]) kept << points[i];
    return kept;
}

double invisibleDeviation(const QPainter& p)
{
    // Device units per painter unit: the scale of the painter's transform (figures are
    // drawn without shear, at one scale both ways).
    const QTransform t = p.combinedTransform();
    const double scale = std::sqrt(std::abs(t.determinant()));
    const QPaintDevice* device = p.device();
    const double dpi = device ? std::max(device->logicalDpiX(), device->logicalDpiY()) : kPrinterDpi;
    return scale > 0 ? kDotFraction * dpi / kPrinterDpi / scale : 0.0;
}

}  // namespace clevis::ui
