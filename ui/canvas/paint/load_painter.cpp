#include "render/drawing_symbols.h"
#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"
#include "ui/shell/display_units.h"

#include <QtMath>

namespace clevis::ui {
namespace {

QPointF screenDir(const Vec2& v)
{
    const double n = v.norm();
    return n > 0 ? QPointF(v.x() / n, -v.y() / n) : QPointF(1, 0);
}

// A dashpot: a cup on the first end, a piston plate on a rod from the second.
void drawDashpot(QPainter& p, const QPointF& a, const QPointF& b)
{
    const QLineF line(a, b);
    const double len = line.length();
    if (len < 1) return;
    p.save();
    p.translate(a);
    p.rotate(-line.angle());
    const double mid = len / 2;
    p.drawLine(QPointF(0, 0), QPointF(mid - 8, 0));
    p.drawPolyline(QPolygonF() << QPointF(mid + 8, -7) << QPointF(mid - 8, -7) << QPointF(mid - 8, 7)
                               << QPointF(mid + 8, 7));
    p.drawLine(QPointF(mid, -5), QPointF(mid, 5));
    p.drawLine(QPointF(mid, 0), QPointF(len, 0));
    p.restore();
}

class LoadPainter {
public:
    LoadPainter(PaintContext& c, int index) : context_(c), painter_(c.painter), index_(index) {}

    void operator()(const ForceLoad& f)
    {
        const QPointF tip = context_.view.toScreen(f.point.at);
        const QPointF tail = tip - screenDir(f.force) * style::kArrowLength;
        halo(f.name, [&] { painter_.drawLine(tail, tip); });
        drawArrow(painter_, tail, tip, sketchArrow(QPen(palette::load(), 2.2)));
        label(tail, tail - tip,
              QString::fromStdString(f.name) + "  " + DisplayUnits::instance().formatForce(f.force.norm()));
    }
    void operator()(const TorqueLoad& t)
    {
        const QPointF at = context_.view.toScreen(loadAnchor(context_.mechanism, t));
        const double r = style::kMotorRadius * 1.5;
        halo(t.name, [&] { painter_.drawEllipse(at, r, r); });
        const ArrowStyle arrow = sketchArrow(QPen(palette::load(), 2.2));
        drawArcArrow(painter_, at, r, t.torque >= 0 ? -60 : 240, t.torque >= 0 ? 200 : -200, arrow);
        label(at + QPointF(r, -r) * 0.7, QPointF(1, -1),
              QString::fromStdString(t.name) + "  " + DisplayUnits::instance().formatTorque(t.torque));
    }
    void operator()(const SpringLoad& s)
    {
        const QPointF a = context_.view.toScreen(s.a.at), b = context_.view.toScreen(s.b.at);
        halo(s.name, [&] { painter_.drawLine(a, b); });
        painter_.setPen(QPen(palette::spring(), 1.8, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin));
        drawZigZag(painter_, a, b);
        endDots(a, b);
        label((a + b) / 2, QPointF(0.7, -0.7),
              QString::fromStdString(s.name) + "  " + DisplayUnits::instance().formatStiffness(s.stiffness));
    }
    void operator()(const DamperLoad& d)
    {
        const QPointF a = context_.view.toScreen(d.a.at), b = context_.view.toScreen(d.b.at);
        halo(d.name, [&] { painter_.drawLine(a, b); });
        painter_.setPen(QPen(palette::spring(), 1.8));
        painter_.setBrush(Qt::NoBrush);
        drawDashpot(painter_, a, b);
        endDots(a, b);
        label((a + b) / 2, QPointF(-0.7, 0.7),
              QString::fromStdString(d.name) + QStringLiteral("  %1 N·s/m").arg(d.damping, 0, 'g', 4));
    }
    void operator()(const TorsionSpringLoad& t)
    {
        const QPointF at = context_.view.toScreen(loadAnchor(context_.mechanism, t));
        halo(t.name, [&] { painter_.drawEllipse(at, style::kMotorRadius * 1.5, style::kMotorRadius * 1.5); });
        painter_.setPen(QPen(palette::spring(), 1.8));
        painter_.setBrush(Qt::NoBrush);
        // A coil: three turns of growing radius.
        QPolygonF coil;
        for (int i = 0; i <= 90; ++i) {
            const double a = qDegreesToRadians(i * 12.0), r = 8 + style::kMotorRadius * 0.6 * i / 90.0;
            coil << at + QPointF(std::cos(a) * r, -std::sin(a) * r);
        }
        painter_.drawPolyline(coil);
        label(at + QPointF(12, 12), QPointF(0.7, 0.7),
              QString::fromStdString(t.name) + QStringLiteral("  %1 N·m/rad").arg(t.stiffness, 0, 'g', 4));
    }

private:
    template <typename Stroke>
    void halo(const std::string& name, Stroke stroke)
    {
        const QPen pen = context_.haloPen(Selection::Kind::Load, name, 2.2, index_);
        if (pen.style() == Qt::NoPen) return;
        painter_.setPen(pen);
        painter_.setBrush(Qt::NoBrush);
        stroke();
    }
    void endDots(const QPointF& a, const QPointF& b)
    {
        painter_.setBrush(palette::spring());
        painter_.drawEllipse(a, 2.5, 2.5);
        painter_.drawEllipse(b, 2.5, 2.5);
    }
    void label(const QPointF& at, const QPointF& push, const QString& text)
    {
        context_.label(text, at, push, palette::ink());
    }

    PaintContext& context_;
    QPainter& painter_;
    int index_;
};

}  // namespace

void paintLoads(PaintContext& c)
{
    c.painter.save();
    for (std::size_t i = 0; i < c.mechanism.loads.size(); ++i) std::visit(LoadPainter(c, int(i)), c.mechanism.loads[i]);
    c.painter.restore();
}

}  // namespace clevis::ui
