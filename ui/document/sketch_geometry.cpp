#include "ui/document/sketch_geometry.h"

#include "core/model/convex_hull.h"

#include <algorithm>
#include <set>

namespace clevis::ui {
namespace {

template <typename List>
int indexByName(const List& list, const std::string& name)
{
    for (std::size_t i = 0; i < list.size(); ++i)
        if (list[i].name == name) return int(i);
    return -1;
}

}  // namespace

std::vector<Vec2> bodyOutline(const Mechanism& m, const std::string& body)
{
    // Everything fixed to the body spans it: a bed held by one hinge and a
    // cylinder is drawn between the two, round its load points and masses.
    const std::vector<BodyPointOf> all = bodyPoints(m, body);
    std::vector<Vec2> points;
    for (const auto& p : all)
        if (p.kind != BodyPointKind::Centre) points.push_back(p.at);
    for (const auto& p : all)
        if (p.kind == BodyPointKind::Centre && points.size() < 2) points.push_back(p.at);
    return convexHull(points);
}

std::vector<int> jointsAt(const Mechanism& m, const Vec2& p, double tolerance)
{
    std::vector<int> found;
    for (std::size_t i = 0; i < m.joints.size(); ++i)
        if ((m.joints[i].at - p).norm() <= tolerance) found.push_back(int(i));
    return found;
}

std::vector<int> pinsAt(const Mechanism& m, const Vec2& p)
{
    std::vector<int> pins = jointsAt(m, p, 1e-9);
    std::erase_if(pins, [&](int i) { return m.joints[i].type != JointType::Pin; });
    return pins;
}

std::vector<std::string> bodiesOf(const Mechanism& m, const std::vector<int>& joints)
{
    std::vector<std::string> bodies;
    for (int i : joints)
        for (const auto& b : m.joints[i].bodies)
            if (!b.empty() && std::find(bodies.begin(), bodies.end(), b) == bodies.end()) bodies.push_back(b);
    return bodies;
}

int bodyIndex(const Mechanism& m, const std::string& name) { return indexByName(m.bodies, name); }
int jointIndex(const Mechanism& m, const std::string& name) { return indexByName(m.joints, name); }
int driverIndex(const Mechanism& m, const std::string& name) { return indexByName(m.drivers, name); }

std::string freshName(const Mechanism& m, NewPart kind)
{
    static const char* const words[] = {"pin",   "slider",   "slot",  "link",   "plate",  "block",  "motor",
                                        "drive", "cylinder", "force", "torque", "spring", "damper", "mass"};
    const std::string stem = std::string(words[int(kind)]) + " ";
    std::set<std::string> used{kGroundName};
    for (const auto& b : m.bodies) used.insert(b.name);
    for (const auto& j : m.joints) used.insert(j.name);
    for (const auto& d : m.drivers) used.insert(d.name);
    for (const auto& b : m.bodies)
        for (const auto& p : b.pointMasses) used.insert(p.name);
    for (std::size_t i = 0; i < m.loads.size(); ++i) used.insert(loadName(m.loads[i], int(i)));
    for (int n = 1;; ++n) {
        std::string name = stem + std::to_string(n);
        if (!used.count(name)) return name;
    }
}

std::string loadName(const Load& load, int index)
{
    const std::string own = std::visit([](const auto& l) { return l.name; }, load);
    if (!own.empty()) return own;
    static const char* kinds[] = {"force", "torque", "spring", "damper", "torsion spring"};
    return std::string(kinds[load.index()]) + " " + std::to_string(index + 1);
}

Vec2 loadAnchor(const Mechanism& m, const Load& load)
{
    struct Visitor {
        const Mechanism& m;
        Vec2 operator()(const ForceLoad& f) const { return f.point.at; }
        Vec2 operator()(const TorqueLoad& t) const
        {
            const auto outline = bodyOutline(m, t.body);
            Vec2 c = Vec2::Zero();
            for (const auto& p : outline) c += p / double(outline.size());
            return c;
        }
        Vec2 operator()(const SpringLoad& s) const { return (s.a.at + s.b.at) / 2; }
        Vec2 operator()(const DamperLoad& d) const { return (d.a.at + d.b.at) / 2; }
        Vec2 operator()(const TorsionSpringLoad& t) const
        {
            const int j = jointIndex(m, t.joint);
            return j >= 0 ? m.joints[j].at : Vec2::Zero();
        }
    };
    return std::visit(Visitor{m}, load);
}

double angleDeg(const Vec2& a, const Vec2& b) { return radToDeg(std::atan2(b.y() - a.y(), b.x() - a.x())); }

}  // namespace clevis::ui
