// The drawing vocabulary of every picture of a mechanism: the canvas, the
// free-body diagrams and the mechanism sketch all draw force arrows, arc
// arrows (motors, couples) and the centre-of-mass mark with these, and the
// figures their pin holes and ground hatching. Page or screen units; callers
// choose colours from palette.h.
#pragma once

#include <QColor>
#include <QPen>
#include <QPointF>

class QPainter;

namespace clevis::ui {

// A filled dart with its tip on the arrow's end, in the shaft's colour.
struct ArrowHead {
    double length = 9.0;
    double halfWidth = 3.78;
    double backMiddle = 1.0;  // the back's middle, as a fraction of the length from the tip: 1 is a plain triangle
    double rim = 0.0;         // width of a rim round the head (0: none)
};

struct ArrowStyle {
    QPen shaft;
    ArrowHead head;
    double shaftInset = 9.0;  // the shaft stops this far short of the tip, under the head
};

// The figures' arrow: a round-capped shaft `width` wide (dashed for inertia
// loads) and a swept head that grows with it.
ArrowStyle figureArrow(const QColor& colour, double width, bool dashed = false);

// The canvas's arrow, the same size at any zoom: the shaft in `pen`, a plain
// rimmed head.
ArrowStyle sketchArrow(const QPen& pen);

// A straight arrow from `tail` to `tip`.
void drawArrow(QPainter& p, QPointF tail, QPointF tip, const ArrowStyle& style);

// An arc of `radius` round `centre` from `startDeg` over `spanDeg` (counter-
// clockwise on the page when positive, 0° pointing right), head at its end.
void drawArcArrow(QPainter& p, QPointF centre, double radius, double startDeg, double spanDeg, const ArrowStyle& style);

// A couple in the figures: three quarters of a circle and a bit, from 45°.
void drawCoupleArrow(QPainter& p, QPointF centre, double radius, bool counterClockwise, const ArrowStyle& style);

// A pin: hole with a thin centre cross.
void drawPin(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper);

// Centre of mass: a circle in quarters, two of them filled, with a rim `rim` wide.
void drawCentreOfMass(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper, double rim = 1.0);

// A fixed support under a ground pin: short base line with hatching.
void drawGroundMark(QPainter& p, QPointF at, double size, const QColor& ink);

}  // namespace clevis::ui
