#include "ui/canvas/hit_test.h"

#include "ui/canvas/driver_symbol.h"
#include "ui/canvas/sketch_style.h"
#include "ui/document/sketch_geometry.h"

#include <QLineF>
#include <QPolygonF>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

QPolygonF screenPolygon(const std::vector<Vec2>& pts, const ViewTransform& view)
{
    QPolygonF poly;
    for (const auto& p : pts) poly << view.toScreen(p);
    return poly;
}

bool nearBody(const Mechanism& m, const ViewTransform& view, const std::string& body, const QPointF& s)
{
    const QPolygonF outline = screenPolygon(bodyOutline(m, body), view);
    if (outline.isEmpty()) return false;
    if (outline.size() >= 3 && outline.containsPoint(s, Qt::OddEvenFill)) return true;
    const double reach = style::kBarWidth / 2 + 1;
    for (int i = 0; i < outline.size(); ++i)
        if (distanceToSegment(s, outline[i], outline[(i + 1) % outline.size()]) <= reach) return true;
    return false;
}

// The stroke a load is drawn with, for picking.
bool nearLoad(const Mechanism& m, const ViewTransform& view, const Load& load, const QPointF& s)
{
    const double reach = style::kHitPixels;
    if (const auto* f = std::get_if<ForceLoad>(&load)) {
        const QPointF tip = view.toScreen(f->point.at);
        const Vec2 dir = f->force.norm() > 0 ? Vec2(f->force.normalized()) : Vec2(1, 0);
        const QPointF tail = tip - QPointF(dir.x(), -dir.y()) * style::kArrowLength;
        return distanceToSegment(s, tail, tip) <= reach;
    }
    if (const auto* sp = std::get_if<SpringLoad>(&load))
        return distanceToSegment(s, view.toScreen(sp->a.at), view.toScreen(sp->b.at)) <= reach;
    if (const auto* d = std::get_if<DamperLoad>(&load))
        return distanceToSegment(s, view.toScreen(d->a.at), view.toScreen(d->b.at)) <= reach;
    // Torques and torsion springs: an arc around their anchor.
    const double r = QLineF(s, view.toScreen(loadAnchor(m, load))).length();
    return std::abs(r - style::kMotorRadius * 1.5) <= reach;
}

bool nearDriver(const Mechanism& m, const ViewTransform& view, const Driver& d, const QPointF& s)
{
    if (d.ends[0] && d.ends[1])
        return distanceToSegment(s, view.toScreen(d.ends[0]->at), view.toScreen(d.ends[1]->at)) <= style::kHitPixels;
    if (const auto arc = motorArc(m, view, d)) return nearMotorArc(*arc, s, style::kHitPixels * 0.8);
    if (const auto slide = slideArrow(m, view, d))
        return distanceToSegment(s, slide->p1(), slide->p2()) <= style::kHitPixels;
    return false;
}

}  // namespace

double distanceToSegment(const QPointF& p, const QPointF& a, const QPointF& b)
{
    const QPointF ab = b - a;
    const double len2 = QPointF::dotProduct(ab, ab);
    const double t = len2 > 0 ? std::clamp(QPointF::dotProduct(p - a, ab) / len2, 0.0, 1.0) : 0.0;
    return QLineF(p, a + t * ab).length();
}

Selection partAt(const Mechanism& m, const ViewTransform& view, const QPointF& s)
{
    for (int i = int(m.joints.size()) - 1; i >= 0; --i)
        if (QLineF(s, view.toScreen(m.joints[i].at)).length() <= style::kPinRadius + style::kHitPixels * 0.6)
            return {Selection::Kind::Joint, QString::fromStdString(m.joints[i].name), -1};
    for (const auto& d : m.drivers)
        if (nearDriver(m, view, d, s)) return {Selection::Kind::Driver, QString::fromStdString(d.name), -1};
    for (int i = int(m.loads.size()) - 1; i >= 0; --i)
        if (nearLoad(m, view, m.loads[i], s)) return {Selection::Kind::Load, {}, i};
    for (int i = int(m.bodies.size()) - 1; i >= 0; --i)
        if (nearBody(m, view, m.bodies[i].name, s))
            return {Selection::Kind::Body, QString::fromStdString(m.bodies[i].name), -1};
    return {};
}

std::string bodyAt(const Mechanism& m, const ViewTransform& view, const QPointF& s)
{
    for (int i = int(m.bodies.size()) - 1; i >= 0; --i)
        if (nearBody(m, view, m.bodies[i].name, s)) return m.bodies[i].name;
    return kGroundName;
}

}  // namespace clevis::ui
