// Planar geometry helpers shared by the model and the solver.
#pragma once

#include <Eigen/Core>
#include <cmath>

namespace clevis {

using Vec2 = Eigen::Vector2d;

constexpr double kPi = 3.14159265358979323846;

inline double degToRad(double deg) { return deg * kPi / 180.0; }
inline double radToDeg(double rad) { return rad * 180.0 / kPi; }

// Rotation matrix A(φ) maps a body-fixed vector to the global frame.
inline Eigen::Matrix2d rotation(double phi)
{
    const double c = std::cos(phi), s = std::sin(phi);
    Eigen::Matrix2d a;
    a << c, -s, s, c;
    return a;
}

// B(φ) = dA/dφ = A(φ)·R90; B s' is A s' turned a quarter turn counter-clockwise.
inline Eigen::Matrix2d rotationDerivative(double phi)
{
    const double c = std::cos(phi), s = std::sin(phi);
    Eigen::Matrix2d b;
    b << -s, -c, c, -s;
    return b;
}

// Vector turned a quarter turn counter-clockwise.
inline Vec2 perp(const Vec2& v) { return {-v.y(), v.x()}; }

// z-component of the planar cross product a × b.
inline double cross(const Vec2& a, const Vec2& b) { return a.x() * b.y() - a.y() * b.x(); }

inline Vec2 unitFromDeg(double deg) { return {std::cos(degToRad(deg)), std::sin(degToRad(deg))}; }

}  // namespace clevis
