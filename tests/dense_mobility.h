// The degrees-of-freedom diagnosis by dense factorisations of the whole
// Jacobian, as core/solver/mobility_check.cpp once made it (column-pivoted
// QR of Jᵀ for the rank and the dependent rows, full-pivot LU for the null
// space): kept only to check the sparse diagnosis against, mechanism by
// mechanism. Its cost grows with the cube of the size.
#pragma once

#include "core/solver/mobility_check.h"

namespace clevis::test {

// Every field but `gruebler` (a count, not a rank), which is left at 0.
MobilityReport denseMobility(const CompiledMechanism& m, const Eigen::VectorXd& q);

}  // namespace clevis::test
