// Degrees of freedom before solving: Gruebler's count 3·(moving bodies) −
// 2·(pins + sliders) − (pins in slots), and the rank of the constraint
// Jacobian at the drawn pose, which also sees special geometry (parallel
// links) and tells which joints are redundant or which bodies move freely.
#pragma once

#include "core/solver/compiled_mechanism.h"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace clevis {

struct MobilityReport {
    int gruebler = 0;  // degrees of freedom by counting
    int mobility = 0;  // degrees of freedom from the joints' Jacobian rank
    int drivers = 0;
    int redundantEquations = 0;
    std::vector<std::vector<std::string>> redundantGroups;  // joints whose reactions are indeterminate together
    std::vector<std::string> freeBodies;                    // bodies that move with every driver held
    std::vector<std::string> conflictingDrivers;            // drivers that fight each other or the joints
    // The counts agree but the drawn pose is a dead centre or toggle for the
    // drivers (their square Jacobian is singular there): `freeBodies` and
    // `conflictingDrivers` then name what it locks or leaves loose.
    bool singularPose = false;
    bool ok() const
    {
        return redundantGroups.empty() && freeBodies.empty() && conflictingDrivers.empty() && mobility == drivers;
    }
    std::string describe() const;  // plain-words statement, naming the items
};

MobilityReport checkMobility(const CompiledMechanism& m, const Eigen::VectorXd& q);

}  // namespace clevis
