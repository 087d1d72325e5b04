// The energy balance over the solved cycle as a bar figure: the work the
// drivers put in against where it went (kinetic and potential energy,
// dampers, loads) and the residual that says how far the numbers can be
// trusted.
#pragma once

#include "core/results/cycle_summary.h"
#include "render/figure_export.h"

namespace clevis::ui {

class EnergyBalanceFigure final : public Figure {
public:
    explicit EnergyBalanceFigure(const EnergyBalance& e) : balance_(e) {}
    QSizeF size() const override { return {515, 190}; }
    void paint(QPainter& p, const QRectF& target) const override;

private:
    EnergyBalance balance_;
};

}  // namespace clevis::ui
