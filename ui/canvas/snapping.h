// Where a pointer position lands when drawing: on an existing pin, else
// level or plumb with the point the stroke started from, else on the grid.
#pragma once

#include "core/model/mechanism.h"
#include "ui/canvas/view_transform.h"

#include <QString>

#include <optional>

namespace clevis::ui {

struct SnapResult {
    Vec2 point;
    enum class Kind { Free, Grid, Pin, Horizontal, Vertical } kind = Kind::Free;
    int joint = -1;            // the pin snapped to
    QString describe() const;  // e.g. "on pin B", "horizontal"
};

// The grid spacing for the current zoom: a 1-2-5 step at least ~12 px apart.
double gridSpacing(const ViewTransform& view);

// Snap radius in pixels around pins and the horizontal/vertical lines.
inline constexpr double kSnapPixels = 9.0;

// The nearest grid point at this zoom.
Vec2 snapToGrid(const ViewTransform& view, const Vec2& p);

SnapResult snap(const Mechanism& m, const ViewTransform& view, const QPointF& screen,
                const std::optional<Vec2>& strokeStart, bool useGrid = true);

}  // namespace clevis::ui
