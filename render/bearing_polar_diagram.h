// The polar diagram of a bearing load, for the screen and for SVG, PDF and
// PNG exports alike: the curve the tip of the force a joint puts on one of
// its bodies traces over the cycle in that body's own frame, about an origin
// cross, one scale on both axes with scale rings and their values; the
// body-frame axes drawn and named; the drive position marked at regular
// intervals and the peak labelled with its value and position; under it how
// wide a sector the load sweeps and whether it reverses.
#pragma once

#include "core/results/bearing_polar.h"
#include "render/cycle_axis.h"
#include "render/figure_export.h"
#include "render/label_placer.h"
#include "render/render_units.h"

#include <QFont>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace clevis::ui {

struct BearingPolarOptions {
    RenderUnits units;
    int currentStep = -1;  // a step to point out on the curve (the desktop's scrubbed position); −1: none
    // The plot alone, its title and paragraphs shown apart (a window sets them
    // in its own font beside it); its labels `textScale` times their size
    // against the plot, so they stay legible when the plot is drawn small.
    bool plotOnly = false;
    double textScale = 1.0;
    // Fewer labels for a plot drawn small: every third mark and the outer ring only.
    bool compact = false;
};

class BearingPolarDiagram final : public Figure {
public:
    // `m` and `r` must outlive the diagram; `polar` is bearingPolar(m, r, …).
    BearingPolarDiagram(const CompiledMechanism& m, const CycleResult& r, BearingPolar polar,
                        BearingPolarOptions options);

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

    const BearingPolar& polar() const { return polar_; }
    const BearingPolarOptions& options() const { return options_; }
    const QString& title() const { return title_; }
    // The caption, then the notes under the plot (peak, sector, marks and rings).
    QStringList paragraphs() const;
    // The marked drive positions (the axis's unit) and their points on the curve.
    const std::vector<PolarMark>& marks() const { return marks_; }
    // The axis value between marks: 30° for a crank, a round step otherwise.
    double markInterval() const { return interval_; }
    // The force each scale ring stands for, N, innermost first.
    const std::vector<double>& rings() const { return rings_; }

private:
    QPointF tip(const Vec2& force) const;  // where a force's tip is drawn, page units
    double axisReach() const;              // from the pin to the tip of each body-frame axis
    // The labels are placed once, in the order they claim their places; the
    // plot is painted under them.
    void placeLabels();
    void paintPlot(QPainter& p) const;

    const CompiledMechanism& mechanism_;
    const CycleResult& result_;
    BearingPolar polar_;
    BearingPolarOptions options_;
    CycleAxis axis_;
    std::vector<bool> unreliable_;
    double interval_ = 0;
    std::vector<PolarMark> marks_;
    std::vector<double> rings_;
    double pagePerNewton_ = 0;
    struct Paragraph {
        QString text;
        bool problem = false;  // about unreliable values: in the problem colour
    };
    QString title_;
    std::vector<Paragraph> caption_, notes_;  // above and under the plot
    QSizeF size_;
    QRectF plot_;
    double captionTop_ = 0, notesTop_ = 0;
    std::optional<LabelPlacer> labels_;
};

}  // namespace clevis::ui
