#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"

#include <QPainterPath>
#include <QStringList>
#include <QtMath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

bool open(const Joint& j) { return j.bodies[0].empty() || j.bodies[1].empty(); }

// Ground under a pin: a clevis bracket (two cheeks around the pin) standing
// on a hatched base.
void drawGroundBracket(QPainter& p, const QPointF& at)
{
    const double half = style::kGroundWidth / 2, drop = 15.0;
    QPainterPath bracket;
    bracket.moveTo(at + QPointF(-8, drop));
    bracket.lineTo(at + QPointF(-8, 0));
    bracket.arcTo(QRectF(at.x() - 8, at.y() - 8, 16, 16), 180, -180);
    bracket.lineTo(at + QPointF(8, drop));
    p.setPen(QPen(palette::groundHatch(), 1.6));
    p.setBrush(palette::paper());
    p.drawPath(bracket);
    p.setPen(QPen(palette::groundHatch(), 2.2, Qt::SolidLine, Qt::FlatCap));
    p.drawLine(at + QPointF(-half, drop), at + QPointF(half, drop));
    p.setPen(QPen(palette::groundHatch(), 1.0));
    for (double x = -half + 3; x <= half; x += 6) p.drawLine(at + QPointF(x, drop), at + QPointF(x - 6, drop + 6));
}

// A rail along the axis, hatched on one side when it is the frame's.
void drawRail(QPainter& p, const QPointF& at, double axisDeg, bool ground, double length)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);  // screen y points down
    const double gap = style::kBlockSize / 2 + 1.5;
    p.setPen(QPen(ground ? palette::groundHatch() : palette::link(), 1.6));
    p.drawLine(QPointF(-length, gap), QPointF(length, gap));
    p.drawLine(QPointF(-length, -gap), QPointF(length, -gap));
    if (ground) {
        p.setPen(QPen(palette::groundHatch(), 1.0));
        for (double x = -length + 3; x <= length; x += 6) p.drawLine(QPointF(x, gap), QPointF(x - 6, gap + 6));
    }
    p.restore();
}

void drawBlock(QPainter& p, const QPointF& at, double axisDeg)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);
    const double s = style::kBlockSize;
    p.setBrush(palette::linkFill());
    p.setPen(QPen(palette::link(), 1.6));
    p.drawRoundedRect(QRectF(-s * 0.75, -s / 2, s * 1.5, s), 3, 3);
    p.restore();
}

void drawSlot(QPainter& p, const QPointF& at, double axisDeg, bool ground)
{
    p.save();
    p.translate(at);
    p.rotate(-axisDeg);
    p.setBrush(palette::paper());
    p.setPen(QPen(ground ? palette::groundHatch() : palette::link(), 1.6));
    p.drawRoundedRect(QRectF(-30, -6, 60, 12), 6, 6);
    p.restore();
}

void drawPinRing(QPainter& p, const QPointF& at, bool isOpen)
{
    p.setBrush(palette::paper());
    // A pin still missing a body is dashed: it is drawn but not yet a joint.
    p.setPen(QPen(palette::ink(), 1.6, isOpen ? Qt::DotLine : Qt::SolidLine));
    p.drawEllipse(at, style::kPinRadius, style::kPinRadius);
}

// A compound pin, where three or more bodies meet: one ring as for any pin,
// and a small bead on its rim for each body beyond the second, so the
// designer sees how many parts share the pin.
void drawExtraBodies(QPainter& p, const QPointF& at, int extra)
{
    p.setPen(QPen(palette::ink(), 1.2));
    p.setBrush(palette::ink());
    const double r = style::kPinRadius + 6.5;
    for (int k = 0; k < extra; ++k) {
        const double a = qDegreesToRadians(90.0 + 35.0 * k);  // above, then on round to the left: clear of the label
        p.drawEllipse(at + QPointF(r * std::cos(a), -r * std::sin(a)), 2.0, 2.0);
    }
}

}  // namespace

void paintJoints(PaintContext& c)
{
    QPainter& p = c.painter;
    p.save();
    const Mechanism& m = c.mechanism;
    for (const auto& j : m.joints) {
        const QPointF at = c.view.toScreen(j.at);
        const bool ground = j.bodies[0] == kGroundName;
        // The joints of a compound pin are drawn once, by the first of them,
        // with the halo of whichever is selected.
        const std::vector<int> stack = j.type == JointType::Pin ? pinsAt(m, j.at) : std::vector<int>{};
        if (stack.size() > 1 && &m.joints[stack.front()] != &j) continue;
        p.setBrush(Qt::NoBrush);
        std::vector<const Joint*> members{&j};
        if (stack.size() > 1) {
            members.clear();
            for (int i : stack) members.push_back(&m.joints[i]);
        }
        for (const Joint* member : members) {
            p.setPen(c.haloPen(Selection::Kind::Joint, member->name, 2 * style::kPinRadius));
            p.drawPoint(at);
        }
        switch (j.type) {
        case JointType::Pin: {
            // Any of the pins there on the frame puts the bracket under them all.
            if (std::any_of(stack.begin(), stack.end(), [&](int i) {
                    return m.joints[i].bodies[0] == kGroundName || m.joints[i].bodies[1] == kGroundName;
                }))
                drawGroundBracket(p, at);
            drawPinRing(p, at, std::any_of(stack.begin(), stack.end(), [&](int i) { return open(m.joints[i]); }));
            drawExtraBodies(p, at, int(bodiesOf(m, stack).size()) - 2);
            break;
        }
        case JointType::Slider:
            drawRail(p, at, j.axisDeg, ground, 70.0);
            drawBlock(p, at, j.axisDeg);
            break;
        case JointType::PinInSlot:
            drawSlot(p, at, j.axisDeg, ground);
            drawPinRing(p, at, open(j));
            break;
        }
        QStringList names;
        for (int i : stack) names << QString::fromStdString(m.joints[i].name);
        if (j.type != JointType::Slider)
            c.label(stack.size() > 1 ? names.join(QStringLiteral(" + ")) : QString::fromStdString(j.name), at,
                    QPointF(0.7, -0.7), palette::ink());
    }
    p.restore();
}

}  // namespace clevis::ui
