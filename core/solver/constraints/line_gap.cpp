#include "core/solver/constraints/line_gap.h"

namespace clevis {

double LineGap::value(const Pose& q) const
{
    const Vec2 e = q.direction(onI.body, directionLocal);
    return e.dot(q.point(onJ) - q.point(onI));
}

void LineGap::partials(const Pose& q, int row, const RowWriter& out) const
{
    const Vec2 e = q.direction(onI.body, directionLocal);
    const Vec2 d = q.point(onJ) - q.point(onI);
    const Vec2 armI = q.arm(onI), armJ = q.arm(onJ);
    out.partial(row, onI.body, -e);
    out.partial(row, onI.body, 2, perp(e).dot(d) - e.dot(perp(armI)));
    out.partial(row, onJ.body, e);
    out.partial(row, onJ.body, 2, e.dot(perp(armJ)));
}

double LineGap::quadratic(const Pose& q, const VectorXd& qd) const
{
    const Vec2 e = q.direction(onI.body, directionLocal);
    const Vec2 d = q.point(onJ) - q.point(onI);
    const Vec2 dd = q.velocity(qd, onJ) - q.velocity(qd, onI);
    const double wi = bodyRate(qd, onI.body), wj = bodyRate(qd, onJ.body);
    return -wi * wi * e.dot(d) + 2.0 * wi * perp(e).dot(dd) + e.dot(q.arm(onI) * wi * wi - q.arm(onJ) * wj * wj);
}

}  // namespace clevis
