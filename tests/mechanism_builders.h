// Small mechanisms built in code for the tests, so each test states its
// geometry next to the closed form it is checked against.
#pragma once

#include "core/model/mechanism.h"

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

// A parallelogram held still (crank speed 0): massless upright crank and
// rocker of height h carry a horizontal coupler A → B of the given section
// and length between their top pins, a simply supported span (the rocker is
// a two-force member, upright).
inline Mechanism heldSpan(double h, double length, const BarSection& section)
{
    Mechanism m;
    Body coupler;
    coupler.name = "coupler";
    coupler.section = section;
    m.bodies = {pointBody("crank", 0.0, Vec2(0, h / 2), 0.0), coupler,
                pointBody("rocker", 0.0, Vec2(length, h / 2), 0.0)};
    m.joints = {pin("O", kGroundName, "crank", Vec2(0, 0)), pin("A", "crank", "coupler", Vec2(0, h)),
                pin("B", "coupler", "rocker", Vec2(length, h)), pin("C", kGroundName, "rocker", Vec2(length, 0))};
    m.drivers = {rotary("motor", "O", ConstantSpeed{0.0, 0.0}, kPi / 2)};
    m.cycle.duration = 1.0;
    m.cycle.steps = 2;
    return m;
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
                pointBody("rod", s.rodMass, 0.5 * (a + b), s.rodInertia), pointBody("piston", s.pistonMass, b, 0.0)};
    m.joints = {pin("O", kGroundName, "crank", Vec2::Zero()), pin("A", "crank", "rod", a), pin("B", "rod", "piston", b),
                Joint{"S", JointType::Slider, {kGroundName, "piston"}, b, 0.0}};
    m.drivers = {rotary("motor", "O", ConstantSpeed{s.omega, 0.0}, s.theta0)};
    return m;
}

inline Joint slider(const std::string& name, const std::string& a, const std::string& b, Vec2 at, double axisDeg)
{
    return Joint{name, JointType::Slider, {a, b}, at, axisDeg};
}

inline Joint pinInSlot(const std::string& name, const std::string& a, const std::string& b, Vec2 at, double axisDeg)
{
    return Joint{name, JointType::PinInSlot, {a, b}, at, axisDeg};
}

// Linear driver at a slider joint; `offset` is its position at the drawn pose (m).
inline Driver linearAtSlider(const std::string& name, const std::string& joint, Motion motion, double offset = 0.0)
{
    Driver d;
    d.name = name;
    d.type = DriverType::Linear;
    d.joint = joint;
    d.offset = offset;
    d.motion = motion;
    return d;
}

// Cylinder between a point on body `a` and a point on body `b` (global, drawn pose).
inline Driver cylinder(const std::string& name, BodyPointRef a, BodyPointRef b, Motion motion)
{
    Driver d;
    d.name = name;
    d.type = DriverType::Linear;
    d.ends[0] = std::move(a);
    d.ends[1] = std::move(b);
    d.motion = motion;
    return d;
}

// Four-bar on ground pins O2 = (0, 0) and O4 = (d, 0): crank O2→A of length
// a, coupler A→B of length b, rocker O4→B of length c, drawn with the crank
// at `theta2` and B above the line A–O4 (the open branch for a crank-rocker).
// Centres of mass at mid-link unless a mass is given with an offset.
struct FourBarSpec {
    double a = 0.1, b = 0.35, c = 0.3, d = 0.4, theta2 = 0.3;
    double mass[3] = {0, 0, 0};                                     // crank, coupler, rocker, kg
    double inertia[3] = {0, 0, 0};                                  // about each centre of mass, kg·m²
    Vec2 cgOffset[3] = {Vec2::Zero(), Vec2::Zero(), Vec2::Zero()};  // from mid-link, m
    Motion motion = ConstantSpeed{2 * kPi, 0.0};
};

// Pin positions of the drawn pose: the coupler–rocker pin B from the circles
// about A (radius b) and O4 (radius c), taking the intersection to the left
// of the direction A→O4.
struct FourBarPoints {
    Vec2 o2, a, b, o4;
};
inline FourBarPoints fourBarPoints(const FourBarSpec& s)
{
    const Vec2 o2 = Vec2::Zero(), o4(s.d, 0.0);
    const Vec2 a = s.a * Vec2(std::cos(s.theta2), std::sin(s.theta2));
    const Vec2 diagonal = o4 - a;
    const double z = diagonal.norm();
    const double along = (s.b * s.b - s.c * s.c + z * z) / (2 * z);
    const double across = std::sqrt(s.b * s.b - along * along);
    const Vec2 u = diagonal / z;
    return {o2, a, a + along * u + across * perp(u), o4};
}

inline Mechanism fourBar(const FourBarSpec& s)
{
    const FourBarPoints p = fourBarPoints(s);
    Mechanism m;
    m.name = "four-bar";
    m.gravity = Vec2::Zero();
    m.bodies = {pointBody("crank", s.mass[0], 0.5 * (p.o2 + p.a) + s.cgOffset[0], s.inertia[0]),
                pointBody("coupler", s.mass[1], 0.5 * (p.a + p.b) + s.cgOffset[1], s.inertia[1]),
                pointBody("rocker", s.mass[2], 0.5 * (p.o4 + p.b) + s.cgOffset[2], s.inertia[2])};
    m.joints = {pin("O2", kGroundName, "crank", p.o2), pin("A", "crank", "coupler", p.a),
                pin("B", "coupler", "rocker", p.b), pin("O4", kGroundName, "rocker", p.o4)};
    m.drivers = {rotary("motor", "O2", s.motion, s.theta2)};
    return m;
}

}  // namespace clevis::test
