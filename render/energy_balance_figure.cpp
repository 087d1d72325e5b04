#include "render/energy_balance_figure.h"

#include "render/palette.h"
#include "render/render_units.h"

#include <QPainter>

#include <algorithm>
#include <cmath>

namespace clevis::ui {

void EnergyBalanceFigure::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size(), target);
    p.fillRect(QRectF(QPointF(0, 0), size()), Qt::white);
    struct Bar {
        QString name;
        double value;
        QColor colour;
    };
    // Signs as in W_drivers = ΔT + ΔV_g + ΔV_s + W_dampers − W_loads + residual.
    const Bar bars[] = {{"driver work W_drivers", balance_.driverWork, palette::driver()},
                        {"kinetic energy change ΔT", balance_.kineticChange, palette::inertia()},
                        {"gravity potential change ΔV_g", balance_.gravityChange, palette::weight()},
                        {"spring energy change ΔV_s", balance_.springChange, palette::spring()},
                        {"damper work W_dampers", balance_.damperWork, palette::spring()},
                        {"work against loads −W_loads", -balance_.loadWork, palette::load()},
                        {"residual", balance_.residual, palette::problem()}};
    double largest = 1e-12;
    for (const Bar& b : bars) largest = std::max(largest, std::abs(b.value));
    const double labelWidth = 190, zero = labelWidth + 150, half = 140;
    QFont f("DejaVu Sans");
    f.setPixelSize(10);
    p.setFont(f);
    double y = 8;
    for (const Bar& b : bars) {
        p.setPen(palette::ink());
        p.drawText(QRectF(0, y, labelWidth, 16), Qt::AlignLeft | Qt::AlignVCenter, b.name);
        const double w = half * b.value / largest;
        p.fillRect(QRectF(std::min(zero, zero + w), y + 3, std::max(std::abs(w), 0.8), 10), b.colour);
        p.drawText(QRectF(zero + half + 8, y, 160, 16), Qt::AlignLeft | Qt::AlignVCenter, formatQuantity(b.value, "J"));
        y += 20;
    }
    p.setPen(QPen(palette::ink(), 0.8));
    p.drawLine(QPointF(zero, 4), QPointF(zero, y));
    p.drawText(QRectF(0, y + 2, size().width(), 16), Qt::AlignLeft,
               QString("Residual %1 of the %2 that passed through the mechanism (%3 %).")
                   .arg(formatQuantity(balance_.residual, "J"), formatQuantity(balance_.gross, "J"))
                   .arg(100.0 * balance_.relativeResidual, 0, 'g', 2));
    p.restore();
}

}  // namespace clevis::ui
