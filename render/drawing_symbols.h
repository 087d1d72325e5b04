// The drawing vocabulary shared by free-body diagrams and mechanism sketches:
// force arrows, couple arrows, pin holes, the centre-of-mass mark, ground
// hatching. Page units; callers choose colours from palette.h.
#pragma once

#include <QColor>
#include <QPointF>

class QPainter;

namespace clevis::ui {

struct StrokeStyle {
    QColor colour;
    double width = 1.6;
    bool dashed = false;
};

// A straight arrow with a filled, slightly swept head at `head`.
void drawArrow(QPainter& p, QPointF tail, QPointF head, const StrokeStyle& style);

// A couple: three quarters of a circle around `centre`, head at the end,
// turning counter-clockwise on the page when `counterClockwise`.
void drawCoupleArrow(QPainter& p, QPointF centre, double radius, bool counterClockwise, const StrokeStyle& style);

// A pin: hole with a thin centre cross.
void drawPin(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper);

// Centre of mass: a circle in quarters, two of them filled.
void drawCentreOfMass(QPainter& p, QPointF at, double radius, const QColor& ink, const QColor& paper);

// A fixed support under a ground pin: short base line with hatching.
void drawGroundMark(QPainter& p, QPointF at, double size, const QColor& ink);

}  // namespace clevis::ui
