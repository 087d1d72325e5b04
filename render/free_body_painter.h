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
    bool table = true;  // the table of loads under the equations (exports; a small screen pane leaves it out)
};

class FreeBodyPainter final : public Figure {
public:
    // `m` and `r` must outlive the painter; `d` is copied.
    FreeBodyPainter(const CompiledMechanism& m, const CycleResult& r, FreeBodyDiagram d, FreeBodyPaintOptions options);

    QSizeF size() const override;
    void paint(QPainter& p, const QRectF& target) const override;

    const FreeBodyDiagram& diagram() const { return diagram_; }

private:
    void paintTitle(QPainter& p) const;
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
