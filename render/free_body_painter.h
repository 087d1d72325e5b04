// The free-body diagram of one body at one step, drawn with QPainter for the
// screen and for SVG, PDF and PNG exports alike: the body cut free with every
// force and couple on it, labelled with its value and direction; beside it
// the kinetic diagram (m·a_G, I_G·α), or under it where the room is narrow,
// or, as an option, the inertia loads drawn on the body (d'Alembert); under
// them the three equations with their numbers and residuals, and a table of
// the loads.
#pragma once

#include "core/results/body_points_at_step.h"
#include "core/results/free_body.h"
#include "render/figure_export.h"
#include "render/render_units.h"

#include <QFont>

namespace clevis::ui {

// Where the kinetic diagram goes: beside the free body (the page's own layout)
// or under it, for a room taller than wide.
enum class KineticPlacement { Beside, Below };

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
    KineticPlacement kinetic = KineticPlacement::Beside;
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
    // The two halves with all that is drawn in them: the free-body panel (its
    // scale bars may reach past it), and the kinetic diagram's panel (empty
    // with d'Alembert's inertia loads).
    QRectF bodyHalf() const;
    QRectF kineticHalf() const;

    // The zoom (from `minZoom` to `maxZoom`) and placement that show both
    // halves whole and largest in `room` (output units, `fittedGap` left
    // round them), the text at `options.textScale`: the kinetic diagram
    // goes under the free body when that shows the drawing larger. The zoom
    // stays where the labels have room (two fifths of the text's scale); where the
    // halves do not fit there, the placement that fits across (else the one
    // nearest to fitting) at that zoom.
    static FreeBodyPaintOptions fitted(const CompiledMechanism& m, const CycleResult& r, const FreeBodyDiagram& d,
                                       FreeBodyPaintOptions options, QSizeF room, double minZoom, double maxZoom);
    // A view draws to scale no smaller than this share of its text's scale: the
    // page's drawing is laid out for its text at one to one, and below about two
    // fifths of that the labels crowd the body and each other (found by looking
    // at the samples' bodies).
    static constexpr double kReadableZoom = 0.4;
    // The smallest text's size on the page (the scale bars'), in page units: a
    // view whose text must be at least its font's size scales text by their ratio.
    static constexpr double kSmallestText = 10;
    // What a view keeps round the fitted halves, in output units: its own
    // edges set them apart, so a few pixels rather than the page's margin
    // (which cost a laptop's short pane the kinetic diagram).
    static double fittedGap(double textScale) { return 5 * textScale; }

private:
    // A force bar and a drawing-scale bar, in one row or, where the panel is
    // too narrow for that, the second under the first.
    struct ScaleBars {
        double forceLength = 0, drawingLength = 0;  // 0: no forces to scale
        QString forceCaption, drawingCaption;
        QPointF forceFrom, drawingFrom;  // from the panel's bottom-left corner
        double width = 0;                // to the end of the last caption
        bool twoRows = false;
    };

    // The text's widths and captions that do not change with the zoom.
    struct MeasuredText {
        double body = 0, kinetic = 0;  // the least widths of the panels for their labels and headings
        QFont scaleFont;
        double forceValue = 0;  // the force bar's length in newtons
        QString forceCaption;
        double forceCaptionWidth = 0;
    };

    double t(double pageUnits) const { return pageUnits * options_.textScale; }
    double g(double pageUnits) const { return pageUnits * options_.zoom; }
    double margin() const;
    double contentWidth() const;
    double scaleBand() const;
    ScaleBars scaleBars(double panelWidth) const;
    QRectF kineticPanel() const;
    QRectF drawingOf(const QRectF& panel) const;
    void measureText();
    void layOut();  // at options_.zoom and options_.kinetic, from the measured text
    void paintTitle(QPainter& p) const;
    void paintScaleBars(QPainter& p) const;
    void paintEquals(QPainter& p) const;
    void paintKinetic(QPainter& p) const;
    void paintEquations(QPainter& p, double top) const;
    void paintTable(QPainter& p, double top) const;

    const CompiledMechanism& mechanism_;
    const CycleResult& result_;
    FreeBodyDiagram diagram_;
    FreeBodyPaintOptions options_;
    // Worked out once from the diagram and the options.
    std::vector<BodyPointOf> points_;
    double largest_ = 0, pagePerNewton_ = 0, coupleFloor_ = 0;
    MeasuredText text_;
    QRectF bodyPanel_, kineticPanel_;
    ScaleBars scaleBars_;
};

// "motor = 123.4°, t = 0.1234 s (step 34 of 360)": where in the cycle a step is.
QString stepCaption(const CompiledMechanism& m, const CycleResult& r, int step);

}  // namespace clevis::ui
