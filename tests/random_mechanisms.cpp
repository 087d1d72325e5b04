#include "tests/random_mechanisms.h"

#include "core/model/grashof.h"
#include "tests/mechanism_builders.h"

#include <Eigen/Geometry>

#include <algorithm>
#include <array>
#include <cmath>
#include <map>
#include <optional>
#include <random>

namespace clevis::test {
namespace {

// Uniform draws from std::mt19937_64, whose sequence the standard fixes, so
// a seed gives the same mechanisms with any compiler and library (the
// standard's distributions are not fixed across libraries).
class Rng {
public:
    explicit Rng(std::uint64_t seed) : engine_(seed) {}
    double unit() { return double(engine_() >> 11) * 0x1.0p-53; }  // [0, 1)
    double uniform(double a, double b) { return a + (b - a) * unit(); }
    int integer(int a, int b) { return a + int(engine_() % std::uint64_t(b - a + 1)); }  // [a, b]
    bool chance(double p) { return unit() < p; }
    double sign() { return chance(0.5) ? 1.0 : -1.0; }
    Vec2 direction() { return unitFromDeg(uniform(0.0, 360.0)); }
    template <class T>
    const T& pick(const std::vector<T>& v)
    {
        return v[std::size_t(integer(0, int(v.size()) - 1))];
    }

private:
    std::mt19937_64 engine_;
};

// SplitMix64's finaliser: mechanism `index` of `seed` gets a seed of its own.
std::uint64_t mechanismSeed(std::uint64_t seed, int index)
{
    std::uint64_t z = seed + 0x9E3779B97F4A7C15ull * (std::uint64_t(index) + 1);
    z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9ull;
    z = (z ^ (z >> 27)) * 0x94D049BB133111EBull;
    return z ^ (z >> 31);
}

std::string numbered(const char* prefix, int k)
{
    std::string name = prefix;
    name += std::to_string(k);
    return name;
}

// The pin of a dyad: the point at distance lp from p and lq from q, on the
// left of p → q for side +1 and on the right for −1; none where the two
// circles do not meet.
std::optional<Vec2> dyadPoint(Vec2 p, double lp, Vec2 q, double lq, double side)
{
    const Vec2 pq = q - p;
    const double d = pq.norm();
    if (d <= 0.0 || d >= lp + lq || d <= std::abs(lp - lq)) return std::nullopt;
    const double along = (lp * lp - lq * lq + d * d) / (2.0 * d);
    const double across = std::sqrt(std::max(0.0, lp * lp - along * along));
    const Vec2 u = pq / d;
    return p + along * u + side * across * perp(u);
}

// A mechanism being drawn, with every point each body is joined at (for its
// mass and for where loads attach) and its pins (for torsion springs).
class Drawing {
public:
    Drawing(Rng& rng, const std::string& name) : rng_(rng) { m.name = name; }

    Mechanism m;

    void body(const std::string& name)
    {
        Body b;
        b.name = name;
        m.bodies.push_back(b);
        points_[name];
    }
    void pin(const std::string& name, const std::string& a, const std::string& b, Vec2 at)
    {
        m.joints.push_back(test::pin(name, a, b, at));
        note(a, at), note(b, at);
        pins_.push_back(name);
    }
    void slider(const std::string& name, const std::string& a, const std::string& b, Vec2 at, double axisDeg)
    {
        m.joints.push_back(test::slider(name, a, b, at, axisDeg));
        note(a, at), note(b, at);
    }
    const std::vector<Vec2>& points(const std::string& body) { return points_[body]; }

    // Every body's mass: a steel, aluminium or acetal bar section, a plate
    // through its joints, typed-in values, or none; sometimes a point mass.
    void giveMasses();
    // Up to `most` loads: springs, dampers, torsion springs, forces, torques.
    void addLoads(int most);
    // Gravity down, absent or along a random direction.
    void chooseGravity();
    // The cycle's length and steps for a driver's motion: one turn of a
    // constant speed, or a rise inside a cycle of its own.
    Motion rotaryMotion(double offset, bool turnsFully, std::string& label);
    Motion linearMotion(double offset, double reach, std::string& label);
    void chooseSteps(int largest = 360);

private:
    void note(const std::string& body, Vec2 at)
    {
        if (body == kGroundName) return;
        auto& p = points_[body];
        if (std::none_of(p.begin(), p.end(), [&](Vec2 x) { return (x - at).norm() < 1e-12; })) p.push_back(at);
    }
    Vec2 pointOn(const std::string& body);
    Vec2 spread() const;

    Rng& rng_;
    std::map<std::string, std::vector<Vec2>> points_;
    std::vector<std::string> pins_;
};

// A size for the whole drawing (m): the largest distance between joints.
Vec2 Drawing::spread() const
{
    Eigen::AlignedBox2d box;
    for (const auto& j : m.joints) box.extend(j.at);
    return box.isEmpty() ? Vec2(1.0, 1.0) : Vec2(box.diagonal());
}

Vec2 Drawing::pointOn(const std::string& body)
{
    const auto& p = points_[body];
    if (p.size() >= 2 && rng_.chance(0.4)) {
        const double w = rng_.unit();
        return (1 - w) * p[0] + w * p[1];
    }
    return rng_.pick(p);
}

void Drawing::giveMasses()
{
    static const std::vector<double> densities = {7850.0, 2700.0, 1410.0};  // kg/m³: steel, aluminium, acetal
    for (Body& b : m.bodies) {
        const auto& p = points_[b.name];
        double size = 0.0;
        for (const Vec2& x : p)
            for (const Vec2& y : p) size = std::max(size, (x - y).norm());
        const double kind = rng_.unit();
        const bool plateable = p.size() >= 3 && std::abs(cross(p[1] - p[0], p[2] - p[0])) > 0.05 * size * size;
        if (size > 0.0 && kind < 0.45) {
            b.section = BarSection{rng_.uniform(0.005, 0.05), rng_.uniform(0.003, 0.02), rng_.pick(densities)};
        } else if (plateable && kind < 0.65) {
            b.plate = PlateSection{rng_.uniform(0.002, 0.015), rng_.pick(densities)};
        } else if (kind < 0.95) {
            Vec2 centre = Vec2::Zero();
            for (const Vec2& x : p) centre += x / double(p.size());
            const double mass = std::exp(rng_.uniform(std::log(0.01), std::log(20.0)));
            const double length = std::max(size, 0.02);
            b.mass = mass;
            b.cg = centre + rng_.uniform(0.0, 0.2) * length * rng_.direction();
            b.inertia = mass * length * length / 12.0 * rng_.uniform(0.3, 2.0);
        } else {
            b.mass = 0.0, b.cg = p.empty() ? Vec2::Zero() : p[0], b.inertia = 0.0;
        }
        if (rng_.chance(0.15)) b.pointMasses.push_back({b.name + " weight", rng_.uniform(0.01, 5.0), pointOn(b.name)});
    }
}

void Drawing::addLoads(int most)
{
    const int count = rng_.integer(0, most);
    const double reach = std::max(spread().norm(), 0.01);
    for (int k = 0; k < count; ++k) {
        const std::string& body = rng_.pick(m.bodies).name;
        const Vec2 at = pointOn(body);
        // The other end: a point of another body, or a ground point clear of `at`.
        BodyPointRef other{kGroundName, at + reach * rng_.uniform(0.2, 1.0) * rng_.direction()};
        if (rng_.chance(0.3)) {
            const std::string& b2 = rng_.pick(m.bodies).name;
            const Vec2 p2 = pointOn(b2);
            if (b2 != body && (p2 - at).norm() > 0.05 * reach) other = {b2, p2};
        }
        const double length = (other.at - at).norm();
        const std::string name = numbered("load", k);
        switch (rng_.integer(0, 4)) {
        case 0:
            m.loads.push_back(SpringLoad{name,
                                         {body, at},
                                         other,
                                         std::exp(rng_.uniform(std::log(10.0), std::log(1e5))),
                                         rng_.chance(0.2) ? 0.0 : length * rng_.uniform(0.5, 1.5)});
            break;
        case 1:
            m.loads.push_back(
                DamperLoad{name, {body, at}, other, std::exp(rng_.uniform(std::log(1.0), std::log(1000.0)))});
            break;
        case 2:
            if (!pins_.empty()) {
                m.loads.push_back(
                    TorsionSpringLoad{name, rng_.pick(pins_), rng_.uniform(0.1, 500.0), rng_.uniform(-0.5, 0.5)});
                break;
            }
            [[fallthrough]];
        case 3: {
            ForceLoad f{name, {body, at}, rng_.uniform(1.0, 5000.0) * rng_.direction(), rng_.chance(0.3), {}};
            if (rng_.chance(0.4)) f.profile = LoadProfile{"", {0.0, 0.3, 0.7}, {0.0, 1.0, rng_.uniform(-1.0, 1.0)}};
            m.loads.push_back(f);
            break;
        }
        default: m.loads.push_back(TorqueLoad{name, body, rng_.sign() * rng_.uniform(0.1, 500.0), {}});
        }
    }
}

void Drawing::chooseGravity()
{
    const double g = 9.80665;
    const double kind = rng_.unit();
    m.gravity = kind < 0.7 ? Vec2(0.0, -g) : kind < 0.85 ? Vec2::Zero() : Vec2(g * rng_.direction());
}

void Drawing::chooseSteps(int largest)
{
    static const std::vector<int> counts = {36, 72, 90, 180, 360};
    std::vector<int> allowed;
    for (int c : counts)
        if (c <= largest) allowed.push_back(c);
    m.cycle.steps = allowed.empty() ? std::max(largest, 12) : rng_.pick(allowed);
}

// A constant speed (one turn a cycle, when the link turns fully) or a rise
// by one of the cam laws from the drawn position, within a cycle of 0.2–3 s.
Motion Drawing::rotaryMotion(double offset, bool turnsFully, std::string& label)
{
    static const std::vector<CamLaw> laws = {CamLaw::Cycloidal, CamLaw::Polynomial345, CamLaw::ModifiedTrapezoid};
    if (rng_.chance(turnsFully ? 0.65 : 0.3)) {
        label = "constant speed";
        const double rpm = std::exp(rng_.uniform(std::log(5.0), std::log(400.0)));
        return ConstantSpeed{rng_.sign() * rpm * 2.0 * kPi / 60.0, 0.0};
    }
    label = "cam rise";
    const double duration = rng_.uniform(0.2, 3.0);
    m.cycle.duration = duration;
    const double amplitude = turnsFully ? rng_.uniform(0.2, 2.0 * kPi) : rng_.uniform(0.1, 1.5);
    Rise r{rng_.pick(laws), offset, offset + rng_.sign() * amplitude, rng_.uniform(0.0, 0.3) * duration, {}};
    if (rng_.chance(0.5)) r.end = rng_.uniform(0.6, 1.0) * duration;
    return r;
}

Motion Drawing::linearMotion(double offset, double reach, std::string& label)
{
    static const std::vector<CamLaw> laws = {CamLaw::Cycloidal, CamLaw::Polynomial345, CamLaw::ModifiedTrapezoid};
    label = "cam rise";
    const double duration = rng_.uniform(0.2, 3.0);
    m.cycle.duration = duration;
    Rise r{rng_.pick(laws),
           offset,
           offset + rng_.sign() * rng_.uniform(0.05, 1.0) * reach,
           rng_.uniform(0.0, 0.3) * duration,
           {}};
    if (rng_.chance(0.5)) r.end = rng_.uniform(0.6, 1.0) * duration;
    return r;
}

// Four link lengths of a Grashof class, indexed by FourBarLink, in units of
// the shortest: s = 1, p and q in [1.3, 4], and the longest l set by the
// class against Grashof's condition s + l ≤ p + q.
std::array<double, 4> lengthsOfClass(Rng& rng, GrashofClass cls)
{
    const double s = 1.0, p = rng.uniform(1.3, 4.0), q = rng.uniform(1.3, 4.0);
    double l = 0.0;
    switch (cls) {
    case GrashofClass::ChangePoint: l = p + q - s; break;
    case GrashofClass::TripleRocker: l = rng.uniform(p + q - s + 0.15, p + q + s - 0.1); break;
    default: l = rng.uniform(std::max(p, q) + 0.05, p + q - s - 0.15);
    }
    // Where the shortest link sits decides the class of a Grashof chain.
    FourBarLink shortest = FourBarLink(rng.integer(0, 3));
    if (cls == GrashofClass::CrankRocker) shortest = rng.chance(0.8) ? FourBarLink::Input : FourBarLink::Output;
    if (cls == GrashofClass::DoubleCrank) shortest = FourBarLink::Ground;
    if (cls == GrashofClass::DoubleRocker) shortest = FourBarLink::Coupler;
    std::array<double, 3> others = {p, q, l};
    for (int i = 2; i > 0; --i) std::swap(others[std::size_t(i)], others[std::size_t(rng.integer(0, i))]);
    std::array<double, 4> out{};
    std::size_t next = 0;
    for (int k = 0; k < 4; ++k) out[std::size_t(k)] = FourBarLink(k) == shortest ? s : others[next++];
    return out;
}

struct FourBarPose {
    Vec2 o2, a, b, o4;
    double theta = 0.0;  // crank angle from the line O2 → O4's direction of +x, rad
};

// The four-bar drawn at a random crank angle where it assembles (none may
// exist for a non-Grashof one at the first tries: up to 200 are made).
std::optional<FourBarPose> drawFourBar(Rng& rng, const std::array<double, 4>& len, double scale)
{
    const Vec2 o2(rng.uniform(-0.2, 0.2), rng.uniform(-0.2, 0.2));
    const Vec2 o4 = o2 + scale * len[0] * unitFromDeg(rng.uniform(-30.0, 30.0));
    const double side = rng.sign();
    for (int attempt = 0; attempt < 200; ++attempt) {
        const double theta = rng.uniform(0.0, 2.0 * kPi);
        const Vec2 a = o2 + scale * len[1] * Vec2(std::cos(theta), std::sin(theta));
        if (const auto b = dyadPoint(a, scale * len[2], o4, scale * len[3], side))
            return FourBarPose{o2, a, *b, o4, theta};
    }
    return std::nullopt;
}

GrashofClass randomClass(Rng& rng) { return GrashofClass(rng.integer(0, 4)); }

// A point near `from` on a link of about `size`, for a six-bar's third joint.
Vec2 near(Rng& rng, Vec2 from, double size) { return from + size * rng.uniform(0.4, 1.2) * rng.direction(); }

// Crank, coupler and rocker on ground pins O2 and O4, the crank driven.
// Returns the class it was drawn to, or nothing if it did not assemble.
std::optional<FourBarPose> addFourBar(Drawing& d, Rng& rng, GrashofClass cls, double& scale)
{
    const auto len = lengthsOfClass(rng, cls);
    scale = rng.uniform(0.02, 0.5);
    const auto pose = drawFourBar(rng, len, scale);
    if (!pose) return std::nullopt;
    d.body("crank"), d.body("coupler"), d.body("rocker");
    d.pin("O2", kGroundName, "crank", pose->o2);
    d.pin("A", "crank", "coupler", pose->a);
    d.pin("B", "coupler", "rocker", pose->b);
    d.pin("O4", kGroundName, "rocker", pose->o4);
    return pose;
}

double angleOf(Vec2 v) { return std::atan2(v.y(), v.x()); }

// The two binary links of a dyad from `p` on body `from` to `q` on body
// `to`, pinned together at a point beside the middle of p–q: 0.6–2 times
// half the gap out, so the links together reach 1.2–2.2 times the gap and
// the dyad follows its ends over a good part of their travel.
void addDyad(Drawing& d, Rng& rng, const std::string& from, Vec2 p, const std::string& to, Vec2 q, int k)
{
    const Vec2 pq = q - p;
    const Vec2 mid = 0.5 * (p + q) + rng.uniform(0.6, 2.0) * rng.sign() * 0.5 * pq.norm() * perp(pq.normalized());
    const std::string l1 = numbered("link", k), l2 = numbered("link", k + 1);
    d.body(l1), d.body(l2);
    d.pin(numbered("C", k), from, l1, p);
    d.pin(numbered("D", k), l1, l2, mid);
    d.pin(numbered("E", k), l2, to, q);
}

void finish(Drawing& d, Rng& rng, int loads)
{
    d.giveMasses();
    d.addLoads(loads);
    d.chooseGravity();
}

// Whether the driven crank of a drawn four-bar turns fully, by the core's
// classification of its lengths as drawn (a change point is left out: its
// links fall into line twice a turn).
bool crankTurns(const FourBarPose& p)
{
    const GrashofResult g =
        classifyFourBar({(p.o4 - p.o2).norm(), (p.a - p.o2).norm(), (p.b - p.a).norm(), (p.b - p.o4).norm()}, 1e-6);
    return g.kind != GrashofClass::ChangePoint && turnsFullyAgainstGround(g, FourBarLink::Input);
}

std::string className(GrashofClass cls, bool turns)
{
    // A crank-rocker whose shortest link is the output is driven at its rocker.
    return cls == GrashofClass::CrankRocker && !turns ? "rocker-crank driven at its rocker" : grashofClassName(cls);
}

RandomMechanism fourBar(Rng& rng)
{
    for (;;) {
        const GrashofClass cls = randomClass(rng);
        Drawing d(rng, "random four-bar");
        double scale = 0.0;
        const auto pose = addFourBar(d, rng, cls, scale);
        if (!pose) continue;
        const bool turns = crankTurns(*pose);
        std::string label;
        d.m.drivers.push_back(rotary("motor", "O2", d.rotaryMotion(pose->theta, turns, label), pose->theta));
        d.chooseSteps();
        finish(d, rng, 4);
        return {d.m, "four-bar", "four-bar, " + className(cls, turns) + ", " + label, Fault::None, turns};
    }
}

// Crank O→A, rod A→B, piston at B on a slide at an angle, offset e from the
// crank's pivot; driven by the crank or, by a cam rise, at the piston.
RandomMechanism sliderCrank(Rng& rng)
{
    for (;;) {
        Drawing d(rng, "random slider-crank");
        const double r = rng.uniform(0.02, 0.3), e = rng.uniform(-1.2, 1.2) * r, l = r * rng.uniform(1.1, 5.0);
        const double axisDeg = rng.uniform(0.0, 360.0), theta = rng.uniform(0.0, 2.0 * kPi);
        const Vec2 u = unitFromDeg(axisDeg), n = perp(u);
        const Vec2 o(rng.uniform(-0.1, 0.1), rng.uniform(-0.1, 0.1));
        const Vec2 a = o + r * Vec2(std::cos(theta), std::sin(theta));
        const double across = e - n.dot(a - o);  // from A to the slide line, along n
        if (std::abs(across) >= 0.98 * l) continue;
        const double along = u.dot(a - o) + rng.sign() * std::sqrt(l * l - across * across);
        const Vec2 b = o + along * u + e * n;
        d.body("crank"), d.body("rod"), d.body("piston");
        d.pin("O", kGroundName, "crank", o);
        d.pin("A", "crank", "rod", a);
        d.pin("B", "rod", "piston", b);
        d.slider("S", kGroundName, "piston", b, axisDeg);
        std::string label;
        const bool turns = l >= r + std::abs(e);
        const bool crankDriven = rng.chance(0.7);
        if (crankDriven) {
            d.m.drivers.push_back(rotary("motor", "O", d.rotaryMotion(theta, turns, label), theta));
            label = "crank-driven, " + label;
        } else {
            d.m.drivers.push_back(linearAtSlider("ram", "S", d.linearMotion(along, 2.0 * r, label), along));
            label = "piston-driven, " + label;
        }
        d.chooseSteps();
        finish(d, rng, 4);
        // Clear of the limit l = r + |e|, a driven crank turns fully.
        const bool completes = crankDriven && l >= 1.02 * (r + std::abs(e));
        return {d.m, "slider-crank",
                std::string("slider-crank, ") + (turns ? "crank turns, " : "crank rocks, ") + label, Fault::None,
                completes};
    }
}

// A six-bar: a four-bar (usually a crank-rocker) and a dyad whose ends are
// chosen by the type: Watt I from the coupler to the rocker (the two
// ternary links joined), Watt II from the rocker to ground (two four-bars in
// series), Stephenson I from the crank to the rocker, Stephenson III from
// the coupler to ground.
RandomMechanism sixBar(Rng& rng, bool watt)
{
    for (;;) {
        const GrashofClass cls = rng.chance(0.7) ? GrashofClass::CrankRocker : randomClass(rng);
        Drawing d(rng, watt ? "random Watt six-bar" : "random Stephenson six-bar");
        double scale = 0.0;
        const auto pose = addFourBar(d, rng, cls, scale);
        if (!pose) continue;
        const double link = (pose->b - pose->o4).norm();
        const bool first = rng.chance(0.5);
        std::string type;
        if (watt && first) {
            type = "Watt I";
            addDyad(d, rng, "coupler", near(rng, pose->a, link), "rocker", near(rng, pose->o4, link), 5);
        } else if (watt) {
            type = "Watt II";
            const Vec2 c = near(rng, pose->o4, link);
            addDyad(d, rng, "rocker", c, kGroundName, near(rng, c, 2.0 * link), 5);
        } else if (first) {
            type = "Stephenson I";
            addDyad(d, rng, "crank", near(rng, pose->o2, (pose->a - pose->o2).norm()), "rocker",
                    near(rng, pose->o4, link), 5);
        } else {
            type = "Stephenson III";
            const Vec2 c = near(rng, pose->a, link);
            addDyad(d, rng, "coupler", c, kGroundName, near(rng, c, 2.0 * link), 5);
        }
        const bool turns = crankTurns(*pose);
        std::string label;
        d.m.drivers.push_back(rotary("motor", "O2", d.rotaryMotion(pose->theta, turns, label), pose->theta));
        d.chooseSteps();
        finish(d, rng, 5);
        return {d.m, watt ? "Watt six-bar" : "Stephenson six-bar",
                type + " six-bar on a " + className(cls, turns) + ", " + label};
    }
}

// Two cranks on ground pins, each driven, joined through two couplers: 2 DOF.
RandomMechanism fiveBar(Rng& rng)
{
    for (;;) {
        Drawing d(rng, "random five-bar");
        const double scale = rng.uniform(0.05, 0.5);
        const Vec2 o1(0.0, 0.0), o2 = scale * rng.uniform(0.5, 1.5) * unitFromDeg(rng.uniform(-20.0, 20.0));
        const double t1 = rng.uniform(0.0, 2.0 * kPi), t2 = rng.uniform(0.0, 2.0 * kPi);
        const Vec2 a = o1 + scale * rng.uniform(0.2, 0.5) * Vec2(std::cos(t1), std::sin(t1));
        const Vec2 b = o2 + scale * rng.uniform(0.2, 0.5) * Vec2(std::cos(t2), std::sin(t2));
        const auto c = dyadPoint(a, scale * rng.uniform(0.8, 2.0), b, scale * rng.uniform(0.8, 2.0), rng.sign());
        if (!c) continue;
        d.body("crank1"), d.body("crank2"), d.body("coupler1"), d.body("coupler2");
        d.pin("O1", kGroundName, "crank1", o1);
        d.pin("O2", kGroundName, "crank2", o2);
        d.pin("A", "crank1", "coupler1", a);
        d.pin("B", "crank2", "coupler2", b);
        d.pin("C", "coupler1", "coupler2", *c);
        std::string label1, label2;
        const Motion m1 = d.rotaryMotion(t1, true, label1);
        // The second crank at the first's speed (or a rise in the same cycle).
        Motion m2 = m1;
        if (auto* rise = std::get_if<Rise>(&m2)) {
            const double amplitude = rise->to - rise->from;
            rise->from = t2, rise->to = t2 + rng.uniform(-1.0, 1.0) * amplitude;
        } else {
            std::get<ConstantSpeed>(m2).speed *= rng.chance(0.5) ? 1.0 : -1.0;
        }
        d.m.drivers.push_back(rotary("motor1", "O1", m1, t1));
        d.m.drivers.push_back(rotary("motor2", "O2", m2, t2));
        d.chooseSteps();
        finish(d, rng, 4);
        return {d.m, "five-bar", "five-bar, two drivers, " + label1};
    }
}

// A chain of loops: a crank drives the first rocker through a coupler, each
// rocker the next through another; rockers pinned to ground along a line.
// Gentle chains keep the proportions of tests/chain_generator.h within a few
// per cent (they stay clear of toggle however long); wild ones do not.
RandomMechanism loopChain(Rng& rng, int loops, bool gentle)
{
    Drawing d(rng, gentle ? "random long chain" : "random chain");
    const double pitch = gentle ? 0.3 * rng.uniform(0.97, 1.03) : rng.uniform(0.15, 0.5);
    d.body("crank");
    d.pin("G0", kGroundName, "crank", Vec2::Zero());
    std::string previous = "crank";
    Vec2 drive = (gentle ? 0.04 * rng.uniform(0.95, 1.05) : rng.uniform(0.02, 0.08)) * rng.direction();
    if (gentle) drive = Vec2(drive.norm(), 0.0);
    Vec2 pivot = Vec2::Zero();
    for (int k = 1; k <= loops; ++k) {
        pivot += Vec2(pitch * (gentle ? 1.0 : rng.uniform(0.8, 1.2)), gentle ? 0.0 : rng.uniform(-0.05, 0.05));
        const double arm = gentle ? 0.1 * rng.uniform(0.98, 1.02) : rng.uniform(0.06, 0.2);
        const double inDeg = gentle ? 90.0 + rng.uniform(-1.0, 1.0) : rng.uniform(45.0, 135.0);
        const double outDeg = inDeg + (gentle ? 5.0 + rng.uniform(-0.5, 0.5) : rng.uniform(-20.0, 20.0));
        const std::string coupler = numbered("coupler", k), rocker = numbered("rocker", k);
        d.body(coupler), d.body(rocker);
        d.pin(numbered("C", k), previous, coupler, drive);
        d.pin(numbered("D", k), coupler, rocker, pivot + arm * unitFromDeg(inDeg));
        d.pin(numbered("G", k), kGroundName, rocker, pivot);
        previous = rocker;
        drive = pivot + arm * (gentle ? 1.0 : rng.uniform(0.7, 1.3)) * unitFromDeg(outDeg);
    }
    std::string label;
    const double offset = angleOf(d.m.joints[1].at);
    d.m.drivers.push_back(rotary(
        "motor", "G0", gentle ? Motion(ConstantSpeed{2.0 * kPi, 0.0}) : d.rotaryMotion(offset, true, label), offset));
    if (gentle) label = "constant speed";
    const int bodies = int(d.m.bodies.size());
    d.chooseSteps(std::clamp(36000 / bodies, 36, 360));
    finish(d, rng, gentle ? 3 : 5);
    return {d.m, gentle ? "long chain" : "chain",
            numbered(gentle ? "long chain, " : "chain, ", loops) + " loops, " + label, Fault::None, gentle};
}

// `loops` crank-rocker four-bars round one driven hub, each of random
// proportions with a Grashof margin of at least 15 % (well clear of a change
// point), so every loop turns with the hub.
RandomMechanism fan(Rng& rng, int loops)
{
    Drawing d(rng, "random fan");
    const double hub = rng.uniform(0.02, 0.08);
    d.body("hub");
    d.pin("O", kGroundName, "hub", Vec2::Zero());
    for (int i = 0; i < loops; ++i) {
        const double theta = 2.0 * kPi * i / loops + rng.uniform(-0.2, 0.2) * 2.0 * kPi / loops;
        const Vec2 radial(std::cos(theta), std::sin(theta));
        const Vec2 h = hub * radial;
        Vec2 p, r;
        for (;;) {
            p = hub * rng.uniform(5.0, 9.0) * radial;
            r = p + hub * rng.uniform(2.0, 4.0) * unitFromDeg(radToDeg(theta) + rng.uniform(60.0, 120.0));
            std::array<double, 4> len = {p.norm(), hub, (r - h).norm(), (r - p).norm()};
            std::sort(len.begin(), len.end());
            if (len[0] == hub && len[0] + len[3] <= 0.85 * (len[1] + len[2])) break;
        }
        const std::string coupler = numbered("coupler", i), rocker = numbered("rocker", i);
        d.body(coupler), d.body(rocker);
        d.pin(numbered("H", i), "hub", coupler, h);
        d.pin(numbered("R", i), coupler, rocker, r);
        d.pin(numbered("P", i), kGroundName, rocker, p);
    }
    std::string label;
    d.m.drivers.push_back(rotary("motor", "O", d.rotaryMotion(0.0, true, label), 0.0));
    d.chooseSteps(std::clamp(36000 / int(d.m.bodies.size()), 36, 360));
    finish(d, rng, 4);
    return {d.m, "fan", numbered("fan, ", loops) + " loops, " + label, Fault::None, true};
}

// A fault put in on purpose: each must be refused with the part named.
RandomMechanism faulty(Rng& rng)
{
    const Fault fault = Fault(rng.integer(1, 4));
    if (fault == Fault::StartedOutOfReach) {
        RandomMechanism s;
        do s = sliderCrank(rng);
        while (s.mechanism.drivers[0].type != DriverType::Linear);
        Rise& rise = std::get<Rise>(s.mechanism.drivers[0].motion);
        const double reach = (s.mechanism.joints[1].at - s.mechanism.joints[0].at).norm() +
                             (s.mechanism.joints[2].at - s.mechanism.joints[1].at).norm();
        const double shift = rng.sign() * reach * rng.uniform(2.5, 4.0);
        rise.from += shift, rise.to += shift;
        s.kind = "slider-crank, piston driven from out of reach";
        s.family = "faulty", s.fault = fault, s.completes = false;
        return s;
    }
    if (fault == Fault::RedundantLink) {
        // Three equal, parallel side links under one coupler plate: Gruebler's
        // count is 0, yet the parallelogram moves; one side link is redundant.
        Drawing d(rng, "parallelogram with a third link");
        const double r = rng.uniform(0.05, 0.3), pitch = rng.uniform(1.5, 4.0) * r;
        const double theta = rng.uniform(0.0, 2.0 * kPi);
        const Vec2 arm = r * Vec2(std::cos(theta), std::sin(theta));
        d.body("coupler");
        for (int k = 0; k < 3; ++k) {
            const Vec2 pivot(k * pitch, 0.0);
            const std::string side = numbered("side", k);
            d.body(side);
            d.pin(numbered("O", k), kGroundName, side, pivot);
            d.pin(numbered("A", k), side, "coupler", pivot + arm);
        }
        std::string label;
        d.m.drivers.push_back(rotary("motor", "O0", d.rotaryMotion(theta, true, label), theta));
        d.chooseSteps();
        finish(d, rng, 2);
        return {d.m, "faulty", "parallelogram with a redundant third link", fault, false};
    }
    RandomMechanism f;
    do f = fourBar(rng);
    while (f.kind.find("crank-rocker") == std::string::npos);
    if (fault == Fault::DriverMissing) {
        f.mechanism.drivers.clear();
        f.mechanism.cycle.duration = 1.0;
        f.kind = "four-bar without a driver";
    } else {
        Driver second = f.mechanism.drivers[0];
        second.name = "second motor";
        second.joint = "O4";
        second.offset = 0.0;
        second.motion = ConstantSpeed{1.0, 0.0};
        f.mechanism.drivers.push_back(second);
        f.mechanism.cycle.duration = 1.0;
        f.kind = "four-bar with a second driver on its rocker";
    }
    f.family = "faulty", f.fault = fault, f.completes = false;
    return f;
}

}  // namespace

std::array<double, 4> randomFourBarLengths(std::uint64_t seed, GrashofClass cls)
{
    Rng rng(seed);
    return lengthsOfClass(rng, cls);
}

const char* faultName(Fault fault)
{
    switch (fault) {
    case Fault::None: return "none";
    case Fault::DriverMissing: return "driver missing";
    case Fault::DriverAdded: return "driver added";
    case Fault::RedundantLink: return "redundant link";
    case Fault::StartedOutOfReach: return "started out of reach";
    }
    return "?";
}

// Shares: four-bars 24 %, slider-cranks 15 %, Watt and Stephenson six-bars
// 11 % each, five-bars 6 %, chains 11 %, long chains 3 %, fans 11 % (a fifth
// of them large), faults 8 %.
RandomMechanism randomMechanism(std::uint64_t seed, int index)
{
    Rng rng(mechanismSeed(seed, index));
    const double draw = rng.unit();
    RandomMechanism r;
    if (draw < 0.24) r = fourBar(rng);
    else if (draw < 0.39) r = sliderCrank(rng);
    else if (draw < 0.50) r = sixBar(rng, true);
    else if (draw < 0.61) r = sixBar(rng, false);
    else if (draw < 0.67) r = fiveBar(rng);
    else if (draw < 0.78) r = loopChain(rng, rng.integer(2, 8), false);
    else if (draw < 0.81) r = loopChain(rng, rng.integer(9, 249), true);
    else if (draw < 0.92) r = fan(rng, rng.chance(0.8) ? rng.integer(2, 12) : rng.integer(13, 249));
    else r = faulty(rng);
    r.seed = seed, r.index = index;
    r.mechanism.name += numbered(" #", index);
    return r;
}

}  // namespace clevis::test
