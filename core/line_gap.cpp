#include "line_gap.h"

namespace clevis {

double LineGap::value(const VectorXd& q) const
{
    const Vec2 e = rotation(bodyAngle(q, onI.body)) * directionLocal;
    return e.dot(pointPosition(q, onJ) - pointPosition(q, onI));
}

void LineGap::partials(const VectorXd& q, int row, const RowWriter& out) const
{
    const Vec2 e = rotation(bodyAngle(q, onI.body)) * directionLocal;
    const Vec2 d = pointPosition(q, onJ) - pointPosition(q, onI);
    const Vec2 armI = pointArm(q, onI), armJ = pointArm(q, onJ);
    out.partial(row, onI.body, -e);
    out.partial(row, onI.body, 2, perp(e).dot(d) - e.dot(perp(armI)));
    out.partial(row, onJ.body, e);
    out.partial(row, onJ.body, 2, e.dot(perp(armJ)));
}

double LineGap::quadratic(const VectorXd& q, const VectorXd& qd) const
{
    const Vec2 e = rotation(bodyAngle(q, onI.body)) * directionLocal;
    const Vec2 d = pointPosition(q, onJ) - pointPosition(q, onI);
    const Vec2 dd = pointVelocity(q, qd, onJ) - pointVelocity(q, qd, onI);
    const double wi = bodyRate(qd, onI.body), wj = bodyRate(qd, onJ.body);
    return -wi * wi * e.dot(d) + 2.0 * wi * perp(e).dot(dd) +
           e.dot(pointArm(q, onI) * wi * wi - pointArm(q, onJ) * wj * wj);
}

}  // namespace clevis
