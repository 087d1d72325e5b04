#include "ui/canvas/snapping.h"

#include <cmath>

namespace clevis::ui {

QString SnapResult::describe() const
{
    switch (kind) {
    case Kind::Pin: return QStringLiteral("on pin");
    case Kind::Horizontal: return QStringLiteral("level");
    case Kind::Vertical: return QStringLiteral("plumb");
    case Kind::Grid: return QStringLiteral("on grid");
    case Kind::Free: return {};
    }
    return {};
}

namespace {

// A grid step of mantissa × 10^exponent, mantissa 1, 2 or 5.
struct GridStep {
    int mantissa;
    int exponent;
    double value() const { return mantissa * std::pow(10.0, exponent); }
    // n steps, computed as a quotient of integers so 3 × 10 mm is exactly the
    // double nearest 0.03 m (3 × 0.01 is not).
    double times(double n) const
    {
        return exponent < 0 ? n * mantissa / std::pow(10.0, -exponent) : n * mantissa * std::pow(10.0, exponent);
    }
};

GridStep gridStep(const ViewTransform& view)
{
    const double minimum = view.metres(12.0);
    int exponent = int(std::floor(std::log10(minimum)));
    for (int mantissa : {1, 2, 5})
        if (GridStep{mantissa, exponent}.value() >= minimum) return {mantissa, exponent};
    return {1, exponent + 1};
}

}  // namespace

double gridSpacing(const ViewTransform& view) { return gridStep(view).value(); }

Vec2 snapToGrid(const ViewTransform& view, const Vec2& p)
{
    const GridStep g = gridStep(view);
    const double step = g.value();
    return {g.times(std::round(p.x() / step)), g.times(std::round(p.y() / step))};
}

namespace {

// Two points closer than this are one place (a micrometre: far below drawing accuracy).
constexpr double kSamePlace = 1e-6;

// Where the pointer lands when no pin is within reach: the grid drawn at
// this zoom, then in line with the stroke's start.
SnapResult snapBesidePins(const ViewTransform& view, const Vec2& raw, const std::optional<Vec2>& strokeStart,
                          bool useGrid, double radius)
{
    SnapResult r{raw, SnapResult::Kind::Free, -1};
    if (useGrid) {
        // The grid drawn at this zoom, so pins land on round numbers.
        r.point = snapToGrid(view, raw);
        r.kind = SnapResult::Kind::Grid;
    }
    if (strokeStart) {
        if (std::abs(raw.y() - strokeStart->y()) <= radius) {
            r.point.y() = strokeStart->y();
            r.kind = SnapResult::Kind::Horizontal;
        } else if (std::abs(raw.x() - strokeStart->x()) <= radius) {
            r.point.x() = strokeStart->x();
            r.kind = SnapResult::Kind::Vertical;
        }
    }
    return r;
}

}  // namespace

SnapResult snap(const Mechanism& m, const ViewTransform& view, const QPointF& screen,
                const std::optional<Vec2>& strokeStart, bool useGrid)
{
    const Vec2 raw = view.toWorld(screen);
    const double radius = view.metres(kSnapPixels);
    int nearest = -1;
    double best = radius;
    for (std::size_t i = 0; i < m.joints.size(); ++i) {
        const double d = (m.joints[i].at - raw).norm();
        if (d <= best) best = d, nearest = int(i);
    }
    if (nearest >= 0) return {m.joints[nearest].at, SnapResult::Kind::Pin, nearest};

    SnapResult r = snapBesidePins(view, raw, strokeStart, useGrid, radius);
    // A grid or alignment point can land on a pin the pointer was just outside
    // of: that is the pin, not a place for a second one stacked on it.
    for (std::size_t i = 0; i < m.joints.size(); ++i)
        if ((m.joints[i].at - r.point).norm() <= kSamePlace) return {m.joints[i].at, SnapResult::Kind::Pin, int(i)};
    return r;
}

}  // namespace clevis::ui
