// The whole mechanism at one step, drawn as a clean line sketch for the
// report: each body's outline round its joints, pins, ground supports and
// slide guides, names beside bodies and joints.
#pragma once

#include "core/results/results.h"
#include "render/figure_export.h"

#include <QString>

namespace clevis::ui {

class MechanismSketch final : public Figure {
public:
    MechanismSketch(const CompiledMechanism& m, const StepResult& step, QString caption, QSizeF size = {515, 330});

    QSizeF size() const override { return size_; }
    void paint(QPainter& p, const QRectF& target) const override;

private:
    const CompiledMechanism& mechanism_;
    const StepResult& step_;
    QString caption_;
    QSizeF size_;
};

}  // namespace clevis::ui
