// Small mechanisms built in code for the tests, so each test states its
// geometry next to the closed form it is checked against.
#pragma once

#include "mechanism.h"

namespace clevis::test {

inline Body pointBody(const std::string& name, double mass, Vec2 cg, double inertia)
{
    Body b;
    b.name = name;
    b.mass = mass;
    b.cg = cg;
    b.inertia = inertia;
    return b;
}

inline Joint pin(const std::string& name, const std::string& a, const std::string& b, Vec2 at)
{
    return Joint{name, JointType::Pin, {a, b}, at, 0.0};
}

inline Driver rotary(const std::string& name, const std::string& joint, Motion motion, double offsetRad = 0.0)
{
    Driver d;
    d.name = name;
    d.type = DriverType::Rotary;
    d.joint = joint;
    d.offset = offsetRad;
    d.motion = motion;
    return d;
}

// In-line slider-crank: crank O→A of length r on a ground pin at the origin,
// rod A→B of length l, piston at B sliding along +x. Drawn with the crank at
// `theta0`; masses may be zero.
struct SliderCrankSpec {
    double r = 0.1, l = 0.35, theta0 = 0.5;
    double crankMass = 0, rodMass = 0, pistonMass = 0;
    double crankInertia = 0, rodInertia = 0;
    double omega = 2 * kPi;  // rad/s
};

inline Mechanism sliderCrank(const SliderCrankSpec& s)
{
    const Vec2 a = s.r * Vec2(std::cos(s.theta0), std::sin(s.theta0));
    const Vec2 b(a.x() + std::sqrt(s.l * s.l - a.y() * a.y()), 0.0);
    Mechanism m;
    m.name = "slider-crank";
    m.gravity = Vec2::Zero();
    m.bodies = {pointBody("crank", s.crankMass, 0.5 * a, s.crankInertia),
                pointBody("rod", s.rodMass, 0.5 * (a + b), s.rodInertia),
                pointBody("piston", s.pistonMass, b, 0.0)};
    m.joints = {pin("O", kGroundName, "crank", Vec2::Zero()), pin("A", "crank", "rod", a), pin("B", "rod", "piston", b),
                Joint{"S", JointType::Slider, {kGroundName, "piston"}, b, 0.0}};
    m.drivers = {rotary("motor", "O", ConstantSpeed{s.omega, 0.0}, s.theta0)};
    return m;
}

}  // namespace clevis::test
