#include "render/label_placer.h"

#include <QFontMetricsF>
#include <QPainter>

#include <algorithm>
#include <cmath>
#include <limits>

namespace clevis::ui {
namespace {

constexpr double kPi = 3.14159265358979323846;
constexpr double kPadding = 2.0;

double overlapArea(const QRectF& a, const QRectF& b)
{
    const QRectF i = a.intersected(b);
    return i.isValid() ? i.width() * i.height() : 0.0;
}

bool crosses(const QLineF& line, const QRectF& box)
{
    // A segment whose bounding box misses the box cannot touch it: most
    // obstacles are far from any one candidate, and this test is cheap.
    if (std::max(line.x1(), line.x2()) < box.left() || std::min(line.x1(), line.x2()) > box.right() ||
        std::max(line.y1(), line.y2()) < box.top() || std::min(line.y1(), line.y2()) > box.bottom())
        return false;
    if (box.contains(line.p1()) || box.contains(line.p2())) return true;
    const QLineF edges[] = {{box.topLeft(), box.topRight()},
                            {box.topRight(), box.bottomRight()},
                            {box.bottomRight(), box.bottomLeft()},
                            {box.bottomLeft(), box.topLeft()}};
    for (const QLineF& e : edges)
        if (line.intersects(e, nullptr) == QLineF::BoundedIntersection) return true;
    return false;
}

// Edges included: a line along a box's edge, or a box touching another, may still count.
bool touches(const QRectF& a, const QRectF& b)
{
    return a.left() <= b.right() && b.left() <= a.right() && a.top() <= b.bottom() && b.top() <= a.bottom();
}

}  // namespace

LabelPlacer::LabelPlacer(const QRectF& area, const QFont& font) : area_(area), font_(font) {}

void LabelPlacer::addObstacle(const QPainterPath& shape) { shapes_.push_back(shape); }
void LabelPlacer::addObstacle(const QRectF& box) { boxes_.push_back(box); }
void LabelPlacer::addObstacle(const QLineF& line) { lines_.push_back(line); }

// Whatever lies clear of every candidate place adds nothing to any cost, so
// each label looks only at what is near it (a large drawing has hundreds of
// labels and obstacles: testing all against all 64 places was most of its paint).
LabelPlacer::Nearby LabelPlacer::nearby(const QRectF& region) const
{
    Nearby near;
    for (const Placed& p : placed_)
        if (touches(p.box, region)) near.placed.push_back(&p.box);
    for (const QRectF& b : boxes_)
        if (touches(b, region)) near.boxes.push_back(&b);
    for (const QLineF& l : lines_)
        if (touches(QRectF(l.p1(), l.p2()).normalized(), region)) near.lines.push_back(&l);
    for (const QPainterPath& s : shapes_)
        if (touches(s.controlPointRect(), region)) near.shapes.push_back(&s);
    return near;
}

// Every term is at least zero: once the sum is past `bound` the place has
// lost, and the rest (the shapes are the dear part) is not worked out. Below
// it the sum is the whole cost, added in the same order as always.
double LabelPlacer::cost(const QRectF& box, const Nearby& near, double bound) const
{
    constexpr double kLost = std::numeric_limits<double>::infinity();
    double c = 0.0;
    for (const QRectF* p : near.placed) c += 50.0 * overlapArea(box, *p);
    if (c > bound) return kLost;
    for (const QRectF* b : near.boxes) c += 4.0 * overlapArea(box, *b);
    if (c > bound) return kLost;
    for (const QLineF* l : near.lines)
        if (crosses(*l, box) && (c += 400.0) > bound) return kLost;
    for (const QPainterPath* s : near.shapes)
        if (s->intersects(box) && (c += 300.0) > bound) return kLost;
    if (!area_.contains(box)) c += 5000.0 + 20.0 * (box.width() * box.height() - overlapArea(box, area_));
    return c;
}

void LabelPlacer::add(const QString& text, QPointF anchor, QPointF push, const QColor& ink)
{
    const QFontMetricsF metrics(font_);
    const QSizeF size = metrics.boundingRect(text).size() + QSizeF(2 * kPadding, 2 * kPadding);
    const double pushAngle = std::atan2(push.y(), push.x());
    // Rings of candidate places at distances in proportion to the text's
    // height, so a label set large (a zoomed screen view) can clear as much
    // of the drawing as a small one on paper.
    const double h = metrics.height();
    const double distances[] = {0.5 * h, 1.6 * h, 3.0 * h, 4.5 * h};
    // Every candidate lies within the farthest ring and the label's diagonal of the anchor (1 px to spare).
    const double reach = distances[3] + std::hypot(size.width(), size.height()) + 1.0;
    const Nearby near = nearby(QRectF(anchor - QPointF(reach, reach), anchor + QPointF(reach, reach)));
    QRectF best;
    double bestCost = std::numeric_limits<double>::infinity();
    for (const double distance : distances)
        for (int k = 0; k < 16; ++k) {
            // Alternate either side of the push direction, nearest first.
            const int step = (k + 1) / 2 * (k % 2 ? 1 : -1);
            const double a = pushAngle + step * kPi / 8;
            const QPointF dir(std::cos(a), std::sin(a));
            // The box edge nearest the anchor sits `distance` away along dir.
            const QPointF centre =
                anchor + dir * distance + QPointF(dir.x() * size.width() / 2, dir.y() * size.height() / 2);
            // The distance and turn alone bound a place's cost from below: one
            // that cannot cost less than the best so far is not looked at, nor
            // is the rest of a cost once past it (the margin keeps rounding out).
            const double penalty = 0.8 * distance + 2.0 * std::abs(step);
            if (penalty >= bestCost) continue;
            const QRectF box(centre - QPointF(size.width() / 2, size.height() / 2), size);
            const double bound = bestCost - penalty + 1e-9 * (1.0 + bestCost);
            const double c = cost(box, near, bound) + 0.8 * distance + 2.0 * std::abs(step);
            if (c < bestCost) {
                bestCost = c;
                best = box;
            }
        }
    placed_.push_back({text, best, anchor, ink});
}

std::vector<QRectF> LabelPlacer::placedBoxes() const
{
    std::vector<QRectF> boxes;
    for (const Placed& l : placed_) boxes.push_back(l.box);
    return boxes;
}

void LabelPlacer::paint(QPainter& p, const QColor& ink, const QColor& paper) const
{
    p.save();
    p.setFont(font_);
    for (const Placed& l : placed_) {
        const QColor& text = l.ink.isValid() ? l.ink : ink;
        const QPointF nearest(std::clamp(l.anchor.x(), l.box.left(), l.box.right()),
                              std::clamp(l.anchor.y(), l.box.top(), l.box.bottom()));
        if (std::hypot(nearest.x() - l.anchor.x(), nearest.y() - l.anchor.y()) > 14) {
            p.setPen(QPen(text, 0.5));
            p.drawLine(l.anchor, nearest);
        }
        QColor patch = paper;
        patch.setAlphaF(0.85);
        p.fillRect(l.box, patch);
        p.setPen(text);
        p.drawText(l.box, Qt::AlignCenter, l.text);
    }
    p.restore();
}

}  // namespace clevis::ui
