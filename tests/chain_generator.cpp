#include "tests/chain_generator.h"

#include "tests/mechanism_builders.h"

#include <cmath>
#include <stdexcept>
#include <string>

namespace clevis::test {
namespace {

constexpr double kPitch = 0.3;   // m between ground pivots
constexpr double kArm = 0.1;     // m, rocker arms
constexpr double kCrank = 0.04;  // m
// The outgoing arm leans 5° back from the incoming one, so no loop is a
// parallelogram and each rocker swings a little less than the one before it
// (by 2–5 % per loop): the chain stays clear of toggle over its whole length.
constexpr double kOutArmDeg = 95.0;

Body steelBar(const std::string& name)
{
    Body b;
    b.name = name;
    b.section = BarSection{0.02, 0.006, 7850.0, std::nullopt};
    return b;
}

// Appending rather than `"G" + std::to_string(k)`, which makes GCC 12 warn
// falsely (-Wrestrict) at -O2.
std::string numbered(const char* prefix, int k)
{
    std::string name = prefix;
    name += std::to_string(k);
    return name;
}

Vec2 pivot(int k) { return {k * kPitch, 0.0}; }
Vec2 inPoint(int k) { return pivot(k) + kArm * unitFromDeg(90.0); }
Vec2 outPoint(int k) { return pivot(k) + kArm * unitFromDeg(kOutArmDeg); }

}  // namespace

Mechanism fourBarChain(int bodies)
{
    if (bodies < 2) throw std::invalid_argument("a four-bar chain needs at least 2 bodies");
    const int loops = (bodies - 1) / 2;
    Mechanism m;
    m.name = numbered("four-bar chain of ", bodies) + " bodies";
    m.bodies.push_back(pointBody("crank", 0.3, Vec2(0.01, 0.0), 2e-4));
    m.joints.push_back(pin("G0", kGroundName, "crank", pivot(0)));
    m.drivers.push_back(rotary("motor", "G0", ConstantSpeed{2.0 * kPi, 0.0}));
    std::string previous = "crank";
    Vec2 drivePoint(kCrank, 0.0);  // where the previous body drives the next coupler
    for (int k = 1; k <= loops; ++k) {
        const std::string coupler = numbered("coupler", k), rocker = numbered("rocker", k);
        m.bodies.push_back(steelBar(coupler));
        m.bodies.push_back(steelBar(rocker));
        m.joints.push_back(pin(numbered("C", k), previous, coupler, drivePoint));
        m.joints.push_back(pin(numbered("D", k), coupler, rocker, inPoint(k)));
        m.joints.push_back(pin(numbered("G", k), kGroundName, rocker, pivot(k)));
        previous = rocker;
        drivePoint = outPoint(k);
    }
    if (bodies % 2 == 0) {
        const int k = loops + 1;
        m.bodies.push_back(steelBar("lever"));
        m.joints.push_back(pin(numbered("G", k), kGroundName, "lever", pivot(k)));
        const Vec2 slot = drivePoint - pivot(k);
        m.joints.push_back(pinInSlot("S", "lever", previous, drivePoint, radToDeg(std::atan2(slot.y(), slot.x()))));
    }
    return m;
}

// Loop i, at θ = 2πi/loops: hub point 0.04 m out along θ, rocker pivot 0.3 m
// out, rocker 0.1 m long pointing 90° round from θ; coupler ≈ 0.279 m.
// Grashof: 0.04 + 0.3 < 0.279 + 0.1, so the hub turns fully.
Mechanism fourBarFan(int loops)
{
    if (loops < 1) throw std::invalid_argument("a four-bar fan needs at least 1 loop");
    Mechanism m;
    m.name = numbered("four-bar fan of ", loops) + " loops";
    m.bodies.push_back(pointBody("hub", 0.5, Vec2::Zero(), 1e-3));
    m.joints.push_back(pin("O", kGroundName, "hub", Vec2::Zero()));
    m.drivers.push_back(rotary("motor", "O", ConstantSpeed{2.0 * kPi, 0.0}));
    for (int i = 0; i < loops; ++i) {
        const double theta = 2.0 * kPi * i / loops;
        const Vec2 radial(std::cos(theta), std::sin(theta)), round(-std::sin(theta), std::cos(theta));
        const std::string coupler = numbered("coupler", i), rocker = numbered("rocker", i);
        m.bodies.push_back(steelBar(coupler));
        m.bodies.push_back(steelBar(rocker));
        m.joints.push_back(pin(numbered("H", i), "hub", coupler, kCrank * radial));
        m.joints.push_back(pin(numbered("R", i), coupler, rocker, kPitch * radial + kArm * round));
        m.joints.push_back(pin(numbered("P", i), kGroundName, rocker, kPitch * radial));
    }
    return m;
}

}  // namespace clevis::test
