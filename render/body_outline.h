// A body's outline drawn from the points it is joined at, the way one
// sketches a link by hand: a bar with rounded ends between two pins, a
// rounded plate around three or more, a disc around a single one; a slider
// block where the body runs on a guide.
#pragma once

#include <QPainterPath>
#include <QPointF>

#include <vector>

namespace clevis::ui {

struct SlideBlock {
    QPointF at;
    QPointF axis;  // unit, page coordinates
};

// `points` in page (or screen) units; `halfWidth` is the bar's half width.
// The canvas, the free-body diagrams and the mechanism sketch all draw bodies so.
QPainterPath bodyOutlinePath(const std::vector<QPointF>& points, double halfWidth,
                             const std::vector<SlideBlock>& blocks = {});

}  // namespace clevis::ui
