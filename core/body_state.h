// Reading body coordinates q = [x, y, φ] per moving body (ground has none).
#pragma once

#include "compiled_mechanism.h"

#include <Eigen/Core>

namespace clevis {

using Eigen::VectorXd;

inline int coordinateIndex(int body, int component) { return 3 * body + component; }

inline double bodyAngle(const VectorXd& q, int body) { return body == kGround ? 0.0 : q[3 * body + 2]; }
inline double bodyRate(const VectorXd& qd, int body) { return body == kGround ? 0.0 : qd[3 * body + 2]; }
inline Vec2 bodyOrigin(const VectorXd& q, int body)
{
    return body == kGround ? Vec2::Zero() : Vec2(q[3 * body], q[3 * body + 1]);
}
inline Vec2 bodyVelocity(const VectorXd& qd, int body)
{
    return body == kGround ? Vec2::Zero() : Vec2(qd[3 * body], qd[3 * body + 1]);
}

// Global position r + A(φ)s' of a body point.
inline Vec2 pointPosition(const VectorXd& q, const BodyPoint& p)
{
    return bodyOrigin(q, p.body) + rotation(bodyAngle(q, p.body)) * p.local;
}

// The point's offset from the centre of mass in global axes, A(φ)s'.
inline Vec2 pointArm(const VectorXd& q, const BodyPoint& p)
{
    return p.body == kGround ? Vec2::Zero() : Vec2(rotation(bodyAngle(q, p.body)) * p.local);
}

// Velocity ṙ + B(φ)s'φ̇ = ṙ + φ̇ × (A s').
inline Vec2 pointVelocity(const VectorXd& q, const VectorXd& qd, const BodyPoint& p)
{
    return bodyVelocity(qd, p.body) + bodyRate(qd, p.body) * perp(pointArm(q, p));
}

}  // namespace clevis
