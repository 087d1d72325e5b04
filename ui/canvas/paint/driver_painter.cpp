#include "render/drawing_symbols.h"
#include "render/palette.h"
#include "ui/canvas/driver_symbol.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"
#include "ui/shell/display_units.h"

#include <QtMath>

namespace clevis::ui {
namespace {

// What a driver does, in the words and units a designer reads at a glance.
QString motionLabel(const Driver& d)
{
    if (const auto* c = std::get_if<ConstantSpeed>(&d.motion)) {
        // With a motor characteristic the speed is found, not set: the
        // file's speed is only what is expected of it.
        if (d.type == DriverType::Rotary)
            return (d.motor ? QStringLiteral("motor, about %1 rpm") : QStringLiteral("%1 rpm"))
                .arg(c->speed * 60 / (2 * kPi), 0, 'g', 4);
        return DisplayUnits::instance().formatLength(c->speed) + QStringLiteral("/s");
    }
    if (std::holds_alternative<Rise>(d.motion)) return QStringLiteral("cam law");
    return QStringLiteral("table");
}

// A cylinder: a barrel from the first end over half the length, a rod to the second.
void drawCylinder(QPainter& p, const QPointF& a, const QPointF& b)
{
    const QLineF line(a, b);
    if (line.length() < 1) return;
    p.save();
    p.translate(a);
    p.rotate(-line.angle());
    const double len = line.length();
    p.setPen(QPen(palette::driver(), 2.4, Qt::SolidLine, Qt::RoundCap));
    p.drawLine(QPointF(len * 0.45, 0), QPointF(len, 0));
    p.setPen(QPen(palette::driver(), 1.6));
    p.setBrush(palette::paper());
    p.drawRoundedRect(QRectF(0, -6, len * 0.55, 12), 3, 3);
    p.restore();
}

}  // namespace

void paintDrivers(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    for (const auto& d : c.mechanism.drivers) {
        if (d.ends[0] && d.ends[1]) {
            const QPointF a = c.view.toScreen(d.ends[0]->at), b = c.view.toScreen(d.ends[1]->at);
            p.setPen(c.haloPen(Selection::Kind::Driver, d.name, 12));
            p.drawLine(a, b);
            drawCylinder(p, a, b);
            c.label(QString::fromStdString(d.name) + "  " + motionLabel(d), (a + b) / 2, QPointF(0.5, 0.9),
                    palette::driver());
            continue;
        }
        const int j = jointIndex(c.mechanism, d.joint);
        if (j < 0) continue;
        const QPointF at = c.view.toScreen(c.mechanism.joints[j].at);
        p.setBrush(Qt::NoBrush);
        if (const auto arc = motorArc(c.mechanism, c.view, d)) {
            const QPen halo = c.haloPen(Selection::Kind::Driver, d.name, 2.2);
            if (halo.style() != Qt::NoPen) {
                p.setPen(halo);
                p.drawEllipse(at, style::kMotorRadius, style::kMotorRadius);
            }
            const ArrowStyle arrow = sketchArrow(QPen(palette::driver(), 2.2, Qt::SolidLine, Qt::FlatCap));
            drawArcArrow(p, arc->centre, style::kMotorRadius, arc->startDeg, arc->spanDeg, arrow);
        } else if (const auto slide = slideArrow(c.mechanism, c.view, d)) {
            p.setPen(c.haloPen(Selection::Kind::Driver, d.name, 2.2));
            p.drawLine(*slide);
            const ArrowStyle arrow = sketchArrow(QPen(palette::driver(), 2.2));
            drawArrow(p, slide->center(), slide->p2(), arrow);
            drawArrow(p, slide->center(), slide->p1(), arrow);
        }
        c.label(QString::fromStdString(d.name) + "  " + motionLabel(d), at, QPointF(-0.7, -0.7), palette::driver());
    }
    p.restore();
}

}  // namespace clevis::ui
