// Reading body coordinates q = [x, y, φ] per moving body (ground has none).
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <Eigen/Core>
#include <vector>

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

// Body coordinates with each body's rotation matrix computed once, for the
// hot paths that place many points on the same bodies.
class Pose {
public:
    Pose(const VectorXd& q)  // implicit: any q can be read as a pose
        : q_(q), rotations_(fillRotations(q, own_))
    {}
    // The same with the rotations kept in `storage`, which a solver keeps
    // between poses so that evaluating one allocates nothing.
    Pose(const VectorXd& q, std::vector<Eigen::Matrix2d>& storage) : q_(q), rotations_(fillRotations(q, storage)) {}
    Pose(const Pose&) = delete;
    Pose& operator=(const Pose&) = delete;

    const VectorXd& q() const { return q_; }
    double angle(int body) const { return bodyAngle(q_, body); }
    Vec2 origin(int body) const { return bodyOrigin(q_, body); }
    // A(φ)s' of a body point (zero for ground, whose points are global).
    Vec2 arm(const BodyPoint& p) const { return p.body == kGround ? Vec2::Zero() : Vec2(rotations_[p.body] * p.local); }
    Vec2 point(const BodyPoint& p) const { return p.body == kGround ? p.local : Vec2(origin(p.body) + arm(p)); }
    Vec2 velocity(const VectorXd& qd, const BodyPoint& p) const
    {
        return bodyVelocity(qd, p.body) + bodyRate(qd, p.body) * perp(arm(p));
    }
    // A body-fixed direction in global axes.
    Vec2 direction(int body, const Vec2& local) const
    {
        return body == kGround ? local : Vec2(rotations_[body] * local);
    }

private:
    static const Eigen::Matrix2d* fillRotations(const VectorXd& q, std::vector<Eigen::Matrix2d>& r)
    {
        r.resize(std::size_t(q.size() / 3));
        for (std::size_t b = 0; b < r.size(); ++b) r[b] = rotation(q[Eigen::Index(3 * b + 2)]);
        return r.data();
    }

    const VectorXd& q_;
    std::vector<Eigen::Matrix2d> own_;  // unless the caller keeps them
    const Eigen::Matrix2d* rotations_;
};

}  // namespace clevis
