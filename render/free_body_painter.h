// The free-body diagram of one body at one step, drawn with QPainter for the
// screen and for SVG, PDF and PNG exports alike: the body cut free with every
// force and couple on it, labelled with its value and direction; beside it
// the kinetic diagram (m·a_G, I_G·α) or, as an option, the inertia loads drawn
// on the body (d'Alembert); under it the three equations with their numbers
// and residuals, and a table of the loads.
#pragma once

#include "core/results/free_body.h"
#include "render/figure_export.h"
#include "render/render_units.h"

namespace clevis::ui {

struct FreeBodyPaintOptions {
    RenderUnits units;
    bool dAlembert = false;
    bool table = true;  // the table of loads under the equations
    // Output units per page unit for what is drawn to scale (the panels, the
    // body, the arrows' lengths), and the size of the text and symbols (pins,
    // arrow heads, line widths) against the page's. A screen view zooms with
    // the first and keeps the second at the interface's font size, so its
    // text stays legible at any zoom; exports keep both at 1 (the page).
    double zoom = 1.0;
    double textScale = 1.0;
};

class FreeBodyPainter final : public Figure {
public:
    // `m` and `r` must outlive the painter; `d` is copied.
    FreeBodyPainter(const CompiledMechanism& m, const CycleResult& r, FreeBodyDiagram d, FreeBodyPaintOptions options);

    QSizeF size() const override;
    void paint(QPainter& p, const QRectF& target) const override;

    const FreeBodyDiagram& diagram() const { return diagram_; }
    const FreeBodyPaintOptions& options() const { return options_; }

    // Where the free body is drawn to scale, in output units. Its top-left
    // corner does not move with the zoom (the text above it keeps its size)
    // and its size grows in proportion, so a view can zoom about a point of it.
    QRectF bodyDrawing() const;
    // The free-body panel: its heading, the drawing and the scale bars under it.
    QRectF bodyPanel() const;
    // The smallest text's size on the page (the scale bars'), in page units: a
    // view whose text must be at least its font's size scales text by their ratio.
    static constexpr double kSmallestText = 10;

private:
    double t(double pageUnits) const { return pageUnits * options_.textScale; }
    double g(double pageUnits) const { return pageUnits * options_.zoom; }
    double margin() const;
    double contentWidth() const;
    QRectF panel(double left, double width) const;
    void paintTitle(QPainter& p) const;
    void paintScaleBars(QPainter& p, double largest, double pagePerNewton, double worldScale) const;
    void paintEquations(QPainter& p, double top) const;
    void paintTable(QPainter& p, double top) const;

    const CompiledMechanism& mechanism_;
    const CycleResult& result_;
    FreeBodyDiagram diagram_;
    FreeBodyPaintOptions options_;
};

// "motor = 123.4°, t = 0.1234 s (step 34 of 360)": where in the cycle a step is.
QString stepCaption(const CompiledMechanism& m, const CycleResult& r, int step);

}  // namespace clevis::ui
