// Draws the mechanism as the document describes it, in Clevis's own symbols:
// a clevis bracket over a hatched base for ground pins, rounded slots for
// bars, filled outlines for plates, a block on a rail for sliders, vermillion
// arc arrows for motors, green arrows for loads, purple zig-zags for springs.
#pragma once

#include "core/model/mechanism.h"
#include "render/label_placer.h"
#include "ui/canvas/paint/body_shapes.h"
#include "ui/canvas/view_transform.h"
#include "ui/document/mechanism_document.h"

#include <QPainter>
#include <QStringList>

namespace clevis::ui {

struct PaintContext {
    QPainter& painter;
    const ViewTransform& view;
    const Mechanism& mechanism;
    Selection selected;
    QStringList problems;  // names the last analysis blamed
    // Labels are placed clear of each other, of the pins and of the bars, and
    // inside the canvas; paintSketch paints them last, over everything.
    LabelPlacer& labels;
    // Each body's outline (bodyOutline), in the order of mechanism.bodies;
    // paintSketch finds them once for all the painters.
    std::vector<std::vector<Vec2>> outlines{};
    // The bodies' shapes as kept by an earlier paint (the canvas's); none:
    // paintSketch makes them for this paint alone.
    BodyShapes* shapes = nullptr;
    // The labels were placed by an earlier paint of this same drawing at
    // this same view: they are painted as placed then, not placed again.
    bool labelsPlaced = false;

    // A part's label beside `anchor`, pushed away from it along `push`.
    void label(const QString& text, QPointF anchor, QPointF push, const QColor& colour);

    // The halo behind a part: yellow when selected, red when blamed; none otherwise.
    bool halo(Selection::Kind kind, const std::string& name, int loadIndex = -1) const;
    QPen haloPen(Selection::Kind kind, const std::string& name, double width, int loadIndex = -1) const;
};

void paintSketch(PaintContext& c);  // everything below, in drawing order, then the labels

// The font of the canvas's labels.
QFont labelFont(const QFont& base);

// The grid's lines and the origin, which change only with the view; its
// scale, written in the chosen length unit at the bottom left.
void paintGrid(QPainter& p, const ViewTransform& view, const QRectF& area);
void paintGridScale(QPainter& p, const ViewTransform& view, const QRectF& area);
void paintBodies(PaintContext& c);
void paintJoints(PaintContext& c);  // pins, ground brackets, slider blocks, slots
void paintDrivers(PaintContext& c);
void paintLoads(PaintContext& c);
void paintMasses(PaintContext& c);  // centres of mass and point masses

// Canvas strokes; arrows and the centre-of-mass mark are render/drawing_symbols.h's.
void drawZigZag(QPainter& p, const QPointF& a, const QPointF& b);
void drawLabel(QPainter& p, const QPointF& at, const QString& text, const QColor& colour);  // fixed place

}  // namespace clevis::ui
