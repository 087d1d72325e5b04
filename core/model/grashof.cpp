#include "core/model/grashof.h"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <stdexcept>

namespace clevis {

const char* grashofClassName(GrashofClass kind)
{
    switch (kind) {
    case GrashofClass::CrankRocker: return "crank-rocker";
    case GrashofClass::DoubleCrank: return "double-crank (drag link)";
    case GrashofClass::DoubleRocker: return "double-rocker";
    case GrashofClass::ChangePoint: return "change point";
    case GrashofClass::TripleRocker: return "non-Grashof triple rocker";
    }
    return "?";
}

bool turnsFullyAgainstGround(const GrashofResult& g, FourBarLink sideLink)
{
    return g.kind != GrashofClass::TripleRocker && (g.shortest == FourBarLink::Ground || g.shortest == sideLink);
}

const char* fourBarLinkName(FourBarLink link)
{
    switch (link) {
    case FourBarLink::Ground: return "ground";
    case FourBarLink::Input: return "input";
    case FourBarLink::Coupler: return "coupler";
    case FourBarLink::Output: return "output";
    }
    return "?";
}

GrashofResult classifyFourBar(const std::array<double, 4>& lengths, double relativeTolerance)
{
    for (int i = 0; i < 4; ++i)
        if (!(lengths[i] > 0.0) || !std::isfinite(lengths[i])) {
            std::ostringstream s;
            s << "the " << fourBarLinkName(FourBarLink(i)) << " link's length (" << lengths[i]
              << " m) must be positive";
            throw std::invalid_argument(s.str());
        }
    const int shortest = int(std::min_element(lengths.begin(), lengths.end()) - lengths.begin());
    const int longest = int(std::max_element(lengths.begin(), lengths.end()) - lengths.begin());
    const double total = lengths[0] + lengths[1] + lengths[2] + lengths[3];
    const double l = lengths[longest], s = lengths[shortest];
    if (l >= total - l) {
        std::ostringstream m;
        m << "the " << fourBarLinkName(FourBarLink(longest)) << " link (" << l
          << " m) is at least as long as the other three together (" << total - l << " m): the loop cannot close";
        throw std::invalid_argument(m.str());
    }
    GrashofResult r{GrashofClass::TripleRocker, FourBarLink(shortest), FourBarLink(longest), (total - s - l) - (s + l)};
    if (std::abs(r.margin) <= relativeTolerance * l) r.kind = GrashofClass::ChangePoint;
    else if (r.margin < 0.0) r.kind = GrashofClass::TripleRocker;
    else if (r.shortest == FourBarLink::Ground) r.kind = GrashofClass::DoubleCrank;
    else if (r.shortest == FourBarLink::Coupler) r.kind = GrashofClass::DoubleRocker;
    else r.kind = GrashofClass::CrankRocker;
    return r;
}

}  // namespace clevis
