#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"

#include <QFontMetricsF>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {

bool PaintContext::halo(Selection::Kind kind, const std::string& name, int loadIndex) const
{
    return haloPen(kind, name, 1.0, loadIndex).style() != Qt::NoPen;
}

QPen PaintContext::haloPen(Selection::Kind kind, const std::string& name, double width, int loadIndex) const
{
    const QString qname = QString::fromStdString(name);
    const bool isSelected = selected.kind == kind &&
                            (kind == Selection::Kind::Load ? selected.loadIndex == loadIndex : selected.name == qname);
    if (problems.contains(qname))
        return QPen(palette::problem(), width + 4, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    if (isSelected) return QPen(palette::selection(), width + 8, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    return QPen(Qt::NoPen);
}

void PaintContext::label(const QString& text, QPointF anchor, QPointF push, const QColor& colour)
{
    if (!labelsPlaced) labels.add(text, anchor, push, colour);
}

QFont labelFont(const QFont& base)
{
    QFont f = base;
    f.setPointSizeF(8.5);
    return f;
}

namespace {

// What a label must not cover: the pins (with a ground bracket's base or a
// motor's arc round them) and the centre lines of the bodies.
void addObstacles(PaintContext& c)
{
    for (const Joint& j : c.mechanism.joints) {
        const QPointF at = c.view.toScreen(j.at);
        const double r = style::kPinRadius + 3;
        c.labels.addObstacle(QRectF(at - QPointF(r, r), at + QPointF(r, r)));
        if (j.bodies[0] == kGroundName || j.bodies[1] == kGroundName)
            c.labels.addObstacle(QRectF(at.x() - style::kGroundWidth / 2, at.y(), style::kGroundWidth, 14));
    }
    for (const Driver& d : c.mechanism.drivers) {
        const int j = jointIndex(c.mechanism, d.joint);
        if (d.type != DriverType::Rotary || j < 0) continue;
        const QPointF at = c.view.toScreen(c.mechanism.joints[std::size_t(j)].at);
        const double r = style::kMotorRadius;
        c.labels.addObstacle(QRectF(at - QPointF(r, r), at + QPointF(r, r)));
    }
    for (const std::vector<Vec2>& outline : c.outlines) {
        if (outline.size() < 2) continue;
        const std::size_t edges = outline.size() == 2 ? 1 : outline.size();
        for (std::size_t i = 0; i < edges; ++i)
            c.labels.addObstacle(
                QLineF(c.view.toScreen(outline[i]), c.view.toScreen(outline[(i + 1) % outline.size()])));
    }
}

}  // namespace

void paintSketch(PaintContext& c)
{
    c.outlines.clear();
    for (const Body& b : c.mechanism.bodies) c.outlines.push_back(bodyOutline(c.mechanism, b.name));
    BodyShapes ownShapes;  // for this paint alone when none are kept
    BodyShapes* const kept = c.shapes;
    if (!kept) c.shapes = &ownShapes;
    c.shapes->keepFirst(c.mechanism.bodies.size());
    if (!c.labelsPlaced) addObstacles(c);
    paintBodies(c);
    paintLoads(c);
    paintJoints(c);
    paintDrivers(c);
    paintMasses(c);
    c.labels.paint(c.painter, palette::ink(), palette::paper());
    c.shapes = kept;
}

void drawZigZag(QPainter& p, const QPointF& a, const QPointF& b)
{
    const QLineF line(a, b);
    const double len = line.length();
    if (len < 1) return;
    const QPointF u = (b - a) / len, n(-u.y(), u.x());
    const double lead = std::min(10.0, len * 0.2);
    const int teeth = std::max(4, int((len - 2 * lead) / 7));
    QPolygonF path;
    path << a << a + u * lead;
    for (int i = 0; i < teeth; ++i) {
        const double t = lead + (len - 2 * lead) * (i + 0.5) / teeth;
        path << a + u * t + n * ((i % 2) ? -6.0 : 6.0);
    }
    path << b - u * lead << b;
    p.drawPolyline(path);
}

void drawLabel(QPainter& p, const QPointF& at, const QString& text, const QColor& colour)
{
    p.save();
    const QFont f = labelFont(p.font());
    p.setFont(f);
    const QRectF box = QFontMetricsF(f).boundingRect(text).adjusted(-3, -1, 3, 1).translated(at);
    QColor paper = palette::paper();
    paper.setAlpha(220);
    p.setPen(Qt::NoPen);
    p.setBrush(paper);
    p.drawRoundedRect(box, 3, 3);
    p.setPen(colour);
    p.drawText(at, text);
    p.restore();
}

}  // namespace clevis::ui
