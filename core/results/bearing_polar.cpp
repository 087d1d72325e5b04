#include "core/results/bearing_polar.h"

#include "core/results/cylinder_ends.h"

#include <algorithm>
#include <cmath>
#include <stdexcept>

namespace clevis {
namespace {

// Rot(−φ)·f: a global vector in the axes of a body turned by φ.
Vec2 intoBodyFrame(const Vec2& f, double phi)
{
    const double c = std::cos(phi), s = std::sin(phi);
    return {c * f.x() + s * f.y(), -s * f.x() + c * f.y()};
}

double angleOf(const CycleResult& r, std::size_t step, int body)
{
    return body == kGround ? 0.0 : r.steps[step].q(3 * body + 2);
}

// An angle in degrees brought into (−180, 180].
double wrapDeg(double deg)
{
    deg = std::fmod(deg, 360.0);
    if (deg <= -180.0) deg += 360.0;
    if (deg > 180.0) deg -= 360.0;
    return deg;
}

}  // namespace

LoadSector loadSector(const std::vector<Vec2>& forces, double floor)
{
    std::vector<double> directions;
    for (const Vec2& f : forces)
        if (f.norm() >= floor && f.norm() > 0.0) directions.push_back(radToDeg(std::atan2(f.y(), f.x())));
    LoadSector out;
    out.counted = int(directions.size());
    if (directions.empty()) return out;
    std::sort(directions.begin(), directions.end());
    // The gap from the last direction round to the first, then those between neighbours.
    double gap = directions.front() + 360.0 - directions.back(), gapStart = directions.back();
    for (std::size_t i = 1; i < directions.size(); ++i)
        if (const double g = directions[i] - directions[i - 1]; g > gap) {
            gap = g;
            gapStart = directions[i - 1];
        }
    out.defined = true;
    out.spanDeg = std::max(0.0, 360.0 - gap);
    out.quietDeg = wrapDeg(gapStart + gap / 2);
    out.reverses = out.spanDeg >= 180.0;
    return out;
}

namespace {

// The load's peak and the sector of its directions, from out.force: the
// reliable steps are counted, as for the peak, unless every step is flagged.
void describeLoad(BearingPolar& out, const CycleSummary& s, const Peak& peak)
{
    out.peak = peak;
    const bool anyReliable = std::find(s.unreliable.begin(), s.unreliable.end(), false) != s.unreliable.end();
    std::vector<Vec2> counted;
    for (std::size_t i = 0; i < out.force.size(); ++i)
        if (!anyReliable || !s.unreliable[i]) counted.push_back(out.force[i]);
    out.sector = loadSector(counted, kDirectionFloor * out.peak.value);
}

}  // namespace

BearingPolar bearingPolar(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, int joint, int body)
{
    if (joint < 0 || joint >= int(m.joints.size())) throw std::invalid_argument("bearingPolar: no such joint");
    const CompiledJoint& j = m.joints[joint];
    if (body != j.body[0] && body != j.body[1])
        throw std::invalid_argument("bearingPolar: " + m.bodyName(body) + " is not a body of joint " + j.name);
    BearingPolar out;
    out.joint = joint;
    out.pin = j.name;
    out.body = body;
    out.other = body == j.body[1] ? j.body[0] : j.body[1];
    out.otherName = m.bodyName(out.other);
    const double sign = body == j.body[1] ? 1.0 : -1.0;  // the second body receives +R, the first −R
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        out.force.push_back(intoBodyFrame(sign * r.steps[i].joints[joint].force, angleOf(r, i, body)));
    describeLoad(out, s, s.joints[joint].peak);
    return out;
}

BearingPolar endBearingPolar(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, int end)
{
    const std::vector<CylinderEnd> ends = cylinderEnds(m);
    if (end < 0 || end >= int(ends.size())) throw std::invalid_argument("endBearingPolar: no such cylinder end");
    const CylinderEnd& e = ends[std::size_t(end)];
    BearingPolar out;
    out.cylinderEnd = end;
    out.pin = e.name;
    out.body = e.body;
    out.otherName = m.drivers[std::size_t(e.driver)].name;
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        out.force.push_back(intoBodyFrame(endReaction(m, r.steps[i], e).force, angleOf(r, i, e.body)));
    describeLoad(out, s, s.cylinderEnds[std::size_t(end)].peak);
    return out;
}

std::vector<PolarMark> polarMarks(const std::vector<Vec2>& force, const std::vector<double>& axis, double interval)
{
    std::vector<PolarMark> marks;
    const std::size_t n = std::min(force.size(), axis.size());
    if (n == 0 || !(interval > 0)) return marks;
    const double lo = std::min(axis.front(), axis[n - 1]), hi = std::max(axis.front(), axis[n - 1]);
    const double tolerance = 1e-9 * std::max({1.0, std::abs(lo), std::abs(hi)});
    for (double k = std::ceil((lo - tolerance) / interval); k * interval <= hi + tolerance; ++k) {
        const double at = k * interval;
        for (std::size_t i = 0; i < n; ++i) {
            // A step on the mark (1° steps, 30° marks) gives its own force.
            if (std::abs(axis[i] - at) <= tolerance) {
                marks.push_back({at, force[i]});
                break;
            }
            if (i + 1 < n && (axis[i] - at) * (axis[i + 1] - at) < 0) {
                const double u = (at - axis[i]) / (axis[i + 1] - axis[i]);
                marks.push_back({at, (1 - u) * force[i] + u * force[i + 1]});
                break;
            }
        }
    }
    if (axis.front() > axis[n - 1]) std::reverse(marks.begin(), marks.end());  // in the order the cycle runs
    return marks;
}

}  // namespace clevis
