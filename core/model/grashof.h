// Grashof classification of a four-bar from its four link lengths: whether
// some link can turn a full revolution relative to the others (s + l ≤ p + q,
// s and l the shortest and longest, p and q the other two) and, if so, which
// links are cranks, decided by where the shortest link sits.
#pragma once

#include <array>

namespace clevis {

// The four links, in loop order.
enum class FourBarLink { Ground, Input, Coupler, Output };

enum class GrashofClass {
    CrankRocker,   // shortest link is the input or the output: it is the crank
    DoubleCrank,   // shortest link is ground: both side links turn fully (drag link)
    DoubleRocker,  // shortest link is the coupler: it turns fully, the side links rock
    ChangePoint,   // s + l = p + q: the links can fall into line and the motion may switch branch
    TripleRocker,  // s + l > p + q (non-Grashof): no link turns fully
};

struct GrashofResult {
    GrashofClass kind;
    FourBarLink shortest, longest;
    double margin;  // m, (p + q) − (s + l): > 0 Grashof, 0 change point, < 0 non-Grashof
};

// Lengths in m, indexed by FourBarLink. `s + l = p + q` counts as a change
// point within a relative tolerance of the longest link. Throws
// std::invalid_argument for a length that is not positive or a longest link
// at least as long as the other three together (the loop cannot close).
GrashofResult classifyFourBar(const std::array<double, 4>& lengths, double relativeTolerance = 1e-9);

// Whether the input or output link turns a full revolution against ground:
// only when the four-bar is Grashof (or a change point) and the shortest link
// is ground or that link itself.
bool turnsFullyAgainstGround(const GrashofResult& g, FourBarLink sideLink);

const char* grashofClassName(GrashofClass kind);
const char* fourBarLinkName(FourBarLink link);

}  // namespace clevis
