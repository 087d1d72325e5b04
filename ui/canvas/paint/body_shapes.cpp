#include "ui/canvas/paint/body_shapes.h"

#include "render/body_outline.h"
#include "render/palette.h"
#include "ui/canvas/sketch_style.h"

#include <QPainterPathStroker>

namespace clevis::ui {

QPen BodyShapes::edgePen() { return QPen(palette::link(), 1.6); }

const BodyShapes::Shape& BodyShapes::shape(std::size_t index, const std::vector<QPointF>& screen)
{
    if (index >= kept_.size()) kept_.resize(index + 1);
    Kept& k = kept_[index];
    if (k.points != screen) {
        k.points = screen;
        // A bar is the segment between its pins widened into a rounded slot; a plate
        // is its pins' hull with the same rounded margin, so pins never sit on an edge.
        k.shape.outline = bodyOutlinePath(screen, style::kBarWidth / 2);
        k.shape.edge = QPainterPathStroker(edgePen()).createStroke(k.shape.outline);
    }
    return k.shape;
}

void BodyShapes::keepFirst(std::size_t count)
{
    if (kept_.size() > count) kept_.resize(count);
}

}  // namespace clevis::ui
