#include "render/energy_balance_figure.h"

#include "render/palette.h"
#include "render/render_units.h"

#include <QPainter>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kRow = 20, kTop = 8, kCaption = 34;

}  // namespace

// Signs: into the mechanism (right) and out of it (left), so that the bars
// other than the residual add up to it:
//   residual = Σ W_in + Σ W_out + W_loads − W_dampers − (ΔT + ΔV_g + ΔV_s).
EnergyBalanceFigure::EnergyBalanceFigure(const CycleSummary& s) : balance_(s.energy)
{
    const EnergyBalance& e = s.energy;
    for (const auto& d : s.drivers) {
        const QString name = QString::fromStdString(d.name);
        bars_.push_back({QString("%1: put in").arg(name), d.workIn, palette::driver()});
        bars_.push_back({QString("%1: taken back").arg(name), d.workOut, palette::driver()});
    }
    bars_.push_back({"applied loads: net work", e.loadWork, palette::load()});
    bars_.push_back({"stored: ΔT + ΔV_gravity + ΔV_springs", -(e.kineticChange + e.gravityChange + e.springChange),
                     palette::inertia()});
    bars_.push_back({"lost in dampers", -e.damperWork, palette::spring()});
    bars_.push_back({"residual", e.residual, palette::problem()});
}

QSizeF EnergyBalanceFigure::size() const { return {515, kTop + kRow * double(bars_.size()) + kCaption}; }

void EnergyBalanceFigure::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size(), target);
    p.fillRect(QRectF(QPointF(0, 0), size()), Qt::white);
    const double labelWidth = 200, half = 120, zero = labelWidth + half;
    QFont f("DejaVu Sans");
    f.setPixelSize(10);
    p.setFont(f);
    double y = kTop;
    for (const Bar& b : bars_) {
        p.setPen(palette::ink());
        p.drawText(QRectF(0, y, labelWidth, 16), Qt::AlignLeft | Qt::AlignVCenter, b.name);
        QString value = formatQuantity(b.value, "J");
        if (negligibleEnergy(b.value, balance_)) value = "≈ 0";
        else {
            const double w = half * std::clamp(b.value / balance_.throughput, -1.0, 1.0);
            p.fillRect(QRectF(std::min(zero, zero + w), y + 3, std::abs(w), 10), b.colour);
        }
        p.drawText(QRectF(zero + half + 8, y, 515 - zero - half - 8, 16), Qt::AlignLeft | Qt::AlignVCenter, value);
        y += kRow;
    }
    p.setPen(QPen(palette::ink(), 0.8));
    p.drawLine(QPointF(zero, kTop - 4), QPointF(zero, y));
    p.setPen(palette::groundHatch());
    p.drawText(QRectF(zero - half, y, 2 * half, 12), Qt::AlignLeft | Qt::AlignVCenter, "← out of the mechanism");
    p.drawText(QRectF(zero - half, y, 2 * half, 12), Qt::AlignRight | Qt::AlignVCenter, "into it →");
    p.setPen(palette::ink());
    const QString caption =
        balance_.throughput > kNegligibleEnergy
            ? QString("Bars to scale against the %1 passing through (full half-width); residual %2 % of it.")
                  .arg(formatQuantity(balance_.throughput, "J"))
                  .arg(100.0 * balance_.relativeResidual, 0, 'g', 2)
            : QString("No energy passes through the mechanism over the cycle: nothing to draw.");
    p.drawText(QRectF(0, y + 14, size().width(), 16), Qt::AlignLeft, caption);
    p.restore();
}

}  // namespace clevis::ui
