// Each body's drawn shape on the canvas, kept between paints: its rounded
// outline and the stroke of its edge. Working them out (the hull, the round
// ends, the union and its simplification, the stroke of the curved edge) was
// most of what a body cost to paint. A shape is kept beside the screen points
// it was made from and made again whenever they differ, so it cannot outlive
// them: while one pin is dragged the bodies not on it keep theirs, and a new
// view, step or edit that moves a body on screen gives it a new one.
#pragma once

#include <QPainterPath>
#include <QPen>
#include <QPointF>

#include <vector>

namespace clevis::ui {

class BodyShapes {
public:
    struct Shape {
        QPainterPath outline;  // filled with the body's colour
        QPainterPath edge;     // the outline stroked with the edge's pen, filled with the pen's colour
    };

    // The shape of the `index`th body (in the order of the mechanism's
    // bodies) drawn round `screen`, its outline's points in logical pixels.
    const Shape& shape(std::size_t index, const std::vector<QPointF>& screen);
    // Drops the shapes of bodies past the first `count` (bodies removed).
    void keepFirst(std::size_t count);

    static QPen edgePen();

private:
    struct Kept {
        std::vector<QPointF> points;
        Shape shape;
    };
    std::vector<Kept> kept_;
};

}  // namespace clevis::ui
