#include "core/solver/cam_law.h"

#include <algorithm>
#include <array>
#include <cmath>

namespace clevis {
namespace {

// Cycloidal: s = u − sin(2πu)/2π, s' = 1 − cos(2πu), s'' = 2π sin(2πu).
CamValue cycloidal(double u)
{
    const double w = 2.0 * kPi;
    return {u - std::sin(w * u) / w, 1.0 - std::cos(w * u), w * std::sin(w * u)};
}

// 3-4-5 polynomial: s = 10u³ − 15u⁴ + 6u⁵.
CamValue polynomial345(double u)
{
    const double u2 = u * u, u3 = u2 * u;
    return {10 * u3 - 15 * u3 * u + 6 * u3 * u2, 30 * u2 - 60 * u3 + 30 * u3 * u, 60 * u - 180 * u2 + 120 * u3};
}

// Modified trapezoid: acceleration A·sin(4πu) up to u = 1/8, constant A to
// 3/8, A·cos(4π(u − 3/8)) to 5/8, −A to 7/8, −A·cos(4π(u − 7/8)) to 1.
// Each piece is a(τ) = p + q·sin(wτ) + r·cos(wτ) with τ measured from the
// piece's start; A follows from s(1) = 1.
struct Piece {
    double u0, p, q, r;
};
constexpr double kW = 4.0 * kPi;
constexpr std::array<Piece, 5> kPieces{
    {{0.0, 0, 1, 0}, {0.125, 1, 0, 0}, {0.375, 0, 0, 1}, {0.625, -1, 0, 0}, {0.875, 0, 0, -1}}};

CamValue integratePiece(const Piece& k, double v0, double s0, double tau)
{
    const double st = std::sin(kW * tau), ct = std::cos(kW * tau);
    const double a = k.p + k.q * st + k.r * ct;
    const double v = v0 + k.p * tau + k.q * (1 - ct) / kW + k.r * st / kW;
    const double s =
        s0 + v0 * tau + k.p * tau * tau / 2 + k.q * (tau / kW - st / (kW * kW)) + k.r * (1 - ct) / (kW * kW);
    return {s, v, a};
}

// Values with A = 1.
CamValue modifiedTrapezoidUnscaled(double u)
{
    double v0 = 0, s0 = 0;
    for (std::size_t i = 0; i < kPieces.size(); ++i) {
        const double u1 = i + 1 < kPieces.size() ? kPieces[i + 1].u0 : 1.0;
        if (u <= u1 || i + 1 == kPieces.size()) return integratePiece(kPieces[i], v0, s0, u - kPieces[i].u0);
        const CamValue end = integratePiece(kPieces[i], v0, s0, u1 - kPieces[i].u0);
        v0 = end.ds;
        s0 = end.s;
    }
    return {};
}

CamValue modifiedTrapezoid(double u)
{
    static const double scale = 1.0 / modifiedTrapezoidUnscaled(1.0).s;
    const CamValue raw = modifiedTrapezoidUnscaled(u);
    return {raw.s * scale, raw.ds * scale, raw.dds * scale};
}

}  // namespace

CamValue evaluateCamLaw(CamLaw law, double u)
{
    if (u <= 0.0) return {0, 0, 0};
    if (u >= 1.0) return {1, 0, 0};
    switch (law) {
    case CamLaw::Cycloidal: return cycloidal(u);
    case CamLaw::Polynomial345: return polynomial345(u);
    case CamLaw::ModifiedTrapezoid: return modifiedTrapezoid(u);
    }
    return {};
}

}  // namespace clevis
