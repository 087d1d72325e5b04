#include "core/model/body_points.h"

#include <algorithm>

namespace clevis {

BodyPointKind jointPointKind(JointType type, int side)
{
    switch (type) {
    case JointType::Pin: return BodyPointKind::Pin;
    case JointType::Slider: return side == 1 ? BodyPointKind::SlideBlock : BodyPointKind::SlideGuide;
    case JointType::PinInSlot: return side == 1 ? BodyPointKind::Pin : BodyPointKind::SlideGuide;
    }
    return BodyPointKind::Pin;
}

std::vector<BodyPointOf> bodyPoints(const Mechanism& m, const std::string& body)
{
    std::vector<BodyPointOf> points;
    for (const auto& j : m.joints) {
        if (j.bodies[0] != body && j.bodies[1] != body) continue;
        points.push_back({jointPointKind(j.type, j.bodies[1] == body ? 1 : 0), j.at, unitFromDeg(j.axisDeg), j.at});
    }
    const auto add = [&](BodyPointKind kind, const BodyPointRef& p) {
        if (p.body == body) points.push_back({kind, p.at});
    };
    for (const auto& d : m.drivers)
        for (const auto& end : d.ends)
            if (end) add(BodyPointKind::CylinderEnd, *end);
    for (const auto& load : m.loads) {
        if (const auto* f = std::get_if<ForceLoad>(&load)) add(BodyPointKind::LoadPoint, f->point);
        if (const auto* s = std::get_if<SpringLoad>(&load)) {
            add(BodyPointKind::LoadPoint, s->a);
            add(BodyPointKind::LoadPoint, s->b);
        }
        if (const auto* d = std::get_if<DamperLoad>(&load)) {
            add(BodyPointKind::LoadPoint, d->a);
            add(BodyPointKind::LoadPoint, d->b);
        }
    }
    for (const auto& b : m.bodies) {
        if (b.name != body) continue;
        for (const auto& pm : b.pointMasses) points.push_back({BodyPointKind::PointMass, pm.at});
        if (b.cg) points.push_back({BodyPointKind::Centre, *b.cg});
    }
    return points;
}

std::vector<Vec2> bodyPins(const Mechanism& m, const std::string& body)
{
    std::vector<Vec2> pins;
    for (const auto& p : bodyPoints(m, body))
        if (p.isJoint() && std::find(pins.begin(), pins.end(), p.at) == pins.end()) pins.push_back(p.at);
    return pins;
}

std::vector<Vec2> bodyAttachments(const Mechanism& m, const std::string& body)
{
    std::vector<Vec2> points;
    for (const auto& j : m.joints)
        if (j.bodies[0] == body || j.bodies[1] == body) points.push_back(j.at);
    for (const auto& d : m.drivers)
        for (const auto& end : d.ends)
            if (end && end->body == body) points.push_back(end->at);
    return points;
}

std::optional<std::pair<Vec2, Vec2>> sectionEnds(const Mechanism& m, const Body& body)
{
    if (!body.section) return std::nullopt;
    if (body.section->ends) return body.section->ends;
    const std::vector<Vec2> attachments = bodyAttachments(m, body.name);
    std::optional<std::pair<Vec2, Vec2>> ends;
    double longest = -1.0;
    for (std::size_t i = 0; i < attachments.size(); ++i)
        for (std::size_t k = i + 1; k < attachments.size(); ++k)
            if ((attachments[k] - attachments[i]).norm() > longest) {
                longest = (attachments[k] - attachments[i]).norm();
                ends = {attachments[i], attachments[k]};
            }
    return ends;
}

}  // namespace clevis
