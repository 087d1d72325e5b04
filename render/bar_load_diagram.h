// The internal loads of one bar at one step, drawn for the screen and for
// SVG, PDF and PNG exports alike: three diagrams stacked along the bar, the
// axial force N, the shear force V and the bending moment M against s from
// its first end to its second, each over the band the cycle sweeps
// (bar_envelope_band.h); the step's peaks marked on its curve and the
// cycle's on the band, both listed under each diagram with units and where
// they occur; the position in the caption and the sign convention in a note.
#pragma once

#include "core/results/bar_envelope.h"
#include "core/results/bar_envelope_band.h"
#include "render/figure_export.h"
#include "render/render_units.h"

#include <QString>

#include <vector>

namespace clevis::ui {

// What the diagram of a bar draws whatever the step: found once per bar and
// solved cycle (a view reuses it while the cycle is scrubbed).
struct BarCycleLoads {
    BarModel bar;
    std::vector<BandStation> band;
    BarEnvelope envelope;  // the exact peaks over the cycle
};

// `stations` equally spaced stations for the band, besides the piece ends.
constexpr int kBandStations = 101;
BarCycleLoads barCycleLoads(const CompiledMechanism& m, const CycleResult& r, const BarModel& bar,
                            int stations = kBandStations);

class BarLoadDiagram final : public Figure {
public:
    // `m`, `r` and `cycle` must outlive the painter; `step` indexes r.steps.
    // The height follows from the width.
    BarLoadDiagram(const CompiledMechanism& m, const CycleResult& r, const BarCycleLoads& cycle, int step,
                   RenderUnits units, double width = 560);

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

    const BarAtStep& atStep() const { return atStep_; }

private:
    // One row of a diagram's peak table: the step's value and the cycle's.
    struct PeakRow {
        QString what, here, cycle;
    };
    struct Pane {
        QString title;
        std::vector<PeakRow> rows;
        QRectF plot;
        double top = 0;  // of its title row
    };
    // Left edge and width of the side-by-side table's columns, in figure units.
    struct TableColumns {
        double label, hereLeft, hereWidth, cycleLeft, cycleWidth;
    };
    TableColumns tableColumns() const;
    void layOut();
    void paintPane(QPainter& p, int which) const;
    double value(const BarStation& s, int which) const;  // in display units

    const CompiledMechanism& mechanism_;
    const CycleResult& result_;
    const BarCycleLoads& cycle_;
    int step_;
    RenderUnits units_;
    BarAtStep atStep_;
    QSizeF size_;
    QString caption_, ends_, note_;
    QRectF noteBox_;
    Pane panes_[3];
    // The table's two columns one under the other: in a narrow figure, or
    // where a peak's text (a two-motor arm's positions) is longer than its
    // column beside the other.
    bool stacked_ = false;
};

}  // namespace clevis::ui
