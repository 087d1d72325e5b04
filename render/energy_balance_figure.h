// The energy over the solved cycle as a bar figure a designer can use: the
// energy each driver puts in and takes back out, the net work of the applied
// loads, the energy stored in the mechanism, the energy lost in dampers and
// the residual that says how far the numbers can be trusted. Every bar is
// drawn against the energy passing through the mechanism, and a term under
// kNegligibleEnergyShare of it is written "≈ 0" with no bar, so rounding
// noise is never magnified.
#pragma once

#include "core/results/cycle_summary.h"
#include "render/figure_export.h"

#include <QColor>
#include <QString>

#include <vector>

namespace clevis::ui {

class EnergyBalanceFigure final : public Figure {
public:
    explicit EnergyBalanceFigure(const CycleSummary& s);
    QSizeF size() const override;
    void paint(QPainter& p, const QRectF& target) const override;

    struct Bar {
        QString name;
        double value;  // J, positive into the mechanism, negative out of it
        QColor colour;
    };
    const std::vector<Bar>& bars() const { return bars_; }

private:
    EnergyBalance balance_;
    std::vector<Bar> bars_;
};

}  // namespace clevis::ui
