#include "render/mechanism_sketch.h"

#include "core/results/body_points_at_step.h"
#include "core/solver/body_state.h"
#include "render/body_outline.h"
#include "render/drawing_symbols.h"
#include "render/label_placer.h"
#include "render/palette.h"
#include "render/world_frame.h"

#include <QPainter>

#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kHalfWidth = 7, kPin = 3.5;

QFont sketchFont(int pixels)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
    return f;
}

QPointF unitOf(QPointF v)
{
    const double n = std::hypot(v.x(), v.y());
    return n > 0 ? v / n : QPointF(1, 0);
}

}  // namespace

MechanismSketch::MechanismSketch(const CompiledMechanism& m, const StepResult& step, QString caption, QSizeF size)
    : mechanism_(m), step_(step), caption_(std::move(caption)), size_(size)
{}

void MechanismSketch::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    p.fillRect(QRectF(QPointF(0, 0), size_), palette::paper());
    const auto& q = step_.q;
    std::vector<Vec2> all;
    for (const auto& j : mechanism_.joints) all.push_back(pointPosition(q, j.point[1]));
    for (std::size_t b = 0; b < mechanism_.bodies.size(); ++b) all.push_back(bodyOrigin(q, int(b)));
    for (const auto& d : mechanism_.drivers)
        if (d.joint < 0)
            for (const auto& end : d.ends) all.push_back(pointPosition(q, end));
    for (const auto& sp : mechanism_.springs)
        for (const BodyPoint& end : {sp.a, sp.b}) all.push_back(pointPosition(q, end));
    p.setClipRect(QRectF(QPointF(0, 0), size_));
    const WorldFrame frame = WorldFrame::fit(all, QRectF(0, 0, size_.width(), size_.height() - 20), 40);

    // Guides first, under the bodies.
    p.setPen(QPen(palette::groundHatch(), 0.9, Qt::DashDotLine));
    for (const auto& j : mechanism_.joints) {
        if (j.type == JointType::Pin) continue;
        const QPointF c = frame.map(pointPosition(q, j.point[1]));
        const QPointF u = unitOf(frame.mapDirection(rotation(bodyAngle(q, j.body[0])) * j.axisLocal, 1));
        p.drawLine(c - u * 60, c + u * 60);
    }
    LabelPlacer labels(QRectF(0, 0, size_.width(), size_.height() - 20), sketchFont(10));
    std::vector<std::pair<QString, QPointF>> bodyNames;
    for (std::size_t b = 0; b < mechanism_.bodies.size(); ++b) {
        std::vector<QPointF> pts;
        std::vector<SlideBlock> blocks;
        for (const auto& point : bodyPointsAt(mechanism_, step_, int(b))) {
            if (point.kind == BodyPointKind::LoadPoint) continue;  // the sketch shows no loads
            pts.push_back(frame.map(point.at));
            if (point.kind == BodyPointKind::SlideBlock)
                blocks.push_back({pts.back(), unitOf(frame.mapDirection(point.axis, 1))});
        }
        p.setPen(QPen(palette::link(), 1.3));
        p.setBrush(palette::linkFill());
        const QPainterPath outline = bodyOutlinePath(pts, kHalfWidth, blocks);
        p.drawPath(outline);
        labels.addObstacle(outline);
        bodyNames.emplace_back(QString::fromStdString(mechanism_.bodies[b].name), outline.boundingRect().center());
    }
    // Cylinders between two points: a straight rod over a wider barrel.
    for (const auto& d : mechanism_.drivers) {
        if (d.joint >= 0) continue;
        const QPointF a = frame.map(pointPosition(q, d.ends[0])), b = frame.map(pointPosition(q, d.ends[1]));
        p.setPen(QPen(palette::driver(), 5, Qt::SolidLine, Qt::FlatCap));
        p.drawLine(a, a + (b - a) * 0.55);
        p.setPen(QPen(palette::driver(), 2));
        p.drawLine(a, b);
    }
    const QPointF middle = frame.map(frame.centre);
    for (const auto& j : mechanism_.joints) {
        const QPointF at = frame.map(pointPosition(q, j.point[1]));
        const bool grounded = j.body[0] == kGround || j.body[1] == kGround;
        if (j.type != JointType::Slider) {
            if (grounded) drawGroundMark(p, at, 9, palette::groundHatch());
            drawPin(p, at, kPin, palette::ink(), palette::paper());
            labels.addObstacle(QRectF(at.x() - 9, at.y() - 5, 18, 22));
        }
        QPointF away = at - middle;
        const double n = std::hypot(away.x(), away.y());
        labels.add(QString::fromStdString(j.name), at, n > 1 ? away / n : QPointF(0.7, 0.7));
    }
    for (const auto& [name, centre] : bodyNames) labels.add(name, centre, QPointF(0, -1));
    for (std::size_t i = 0; i < mechanism_.drivers.size(); ++i) {
        const auto& d = mechanism_.drivers[i];
        if (d.type != DriverType::Rotary) continue;
        const QPointF at = frame.map(pointPosition(q, mechanism_.joints[d.joint].point[1]));
        // Turning the way the driven body turns at the drawn step: the
        // driver's rate is the second body's against the first, the other way
        // round when the second is the frame.
        const bool onFirst = mechanism_.joints[d.joint].body[1] == kGround;
        const bool counterClockwise = i >= step_.driveRate.size() || (step_.driveRate[i] >= 0) != onFirst;
        drawCoupleArrow(p, at, 14, counterClockwise, figureArrow(palette::driver(), 1.4));
    }
    labels.paint(p, palette::ink(), palette::paper());
    p.setPen(palette::ink());
    p.setFont(sketchFont(10));
    p.drawText(QPointF(6, size_.height() - 6), caption_);
    p.restore();
}

}  // namespace clevis::ui
