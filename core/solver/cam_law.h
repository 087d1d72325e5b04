// Normalised rise laws: position s(u), velocity s'(u) and acceleration s''(u)
// for u in [0, 1], rising from s(0) = 0 to s(1) = 1 with zero velocity and
// zero acceleration at both ends.
#pragma once

#include "core/model/mechanism.h"

namespace clevis {

struct CamValue {
    double s, ds, dds;
};

CamValue evaluateCamLaw(CamLaw law, double u);

}  // namespace clevis
