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

bool finite(QPointF p) { return std::isfinite(p.x()) && std::isfinite(p.y()); }

// Device units per painter unit: the scale of the painter's transform
// (figures are drawn without shear, at one scale both ways).
double deviceScale(const QPainter& p) { return std::sqrt(std::abs(p.combinedTransform().determinant())); }

}  // namespace

QPolygonF decimatedPolyline(const QPolygonF& points, double tolerance)
{
    const qsizetype n = points.size();
    if (n < 3) return points;
    std::vector<bool> keep(std::size_t(n), false);
    // Spans still to split, worked off a stack (a long curve would recurse
    // deep): one per run of finite points, whose ends and breaks are kept.
    std::vector<std::pair<qsizetype, qsizetype>> spans;
    for (qsizetype first = 0; first < n;) {
        qsizetype last = first;
        while (finite(points[first]) && last + 1 < n && finite(points[last + 1])) ++last;
        keep[std::size_t(first)] = keep[std::size_t(last)] = true;
        if (last - first >= 2) spans.emplace_back(first, last);
        first = last + 1;
    }
    while (!spans.empty()) {
        const auto [first, last] = spans.back();
        spans.pop_back();
        // Distances compared squared (no root per point), the segment's terms hoisted out of the loop.
        const QPointF a = points[first], ab = points[last] - a;
        const double length2 = QPointF::dotProduct(ab, ab);
        const QPointF along = length2 > 0 ? ab / length2 : QPointF();
        double farthest = -1;
        qsizetype at = -1;
        for (qsizetype i = first + 1; i < last; ++i) {
            const QPointF ap = points[i] - a;
            const QPointF d = ap - std::clamp(QPointF::dotProduct(ap, along), 0.0, 1.0) * ab;
            if (const double d2 = QPointF::dotProduct(d, d); d2 > farthest) {
                farthest = d2;
                at = i;
            }
        }
        if (at < 0 || farthest <= tolerance * tolerance) continue;
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
    const double scale = deviceScale(p);
    const QPaintDevice* device = p.device();
    const double dpi = device ? std::max(device->logicalDpiX(), device->logicalDpiY()) : kPrinterDpi;
    return scale > 0 ? kDotFraction * dpi / kPrinterDpi / scale : 0.0;
}

double invisibleOnDevice(const QPainter& p)
{
    const int type = p.device() ? p.device()->devType() : QInternal::UnknownDevice;
    const bool raster = type == QInternal::Widget || type == QInternal::Pixmap || type == QInternal::Image;
    const double scale = deviceScale(p);
    return raster && scale > 0 ? kDotFraction / scale : invisibleDeviation(p);
}

}  // namespace clevis::ui
