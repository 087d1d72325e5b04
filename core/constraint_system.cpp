#include "constraint_system.h"

namespace clevis {
namespace {

std::unique_ptr<Constraint> makeJointConstraint(const CompiledJoint& joint, int index)
{
    switch (joint.type) {
    case JointType::Pin: return makePinJoint(joint, index);
    case JointType::Slider: return makeSliderJoint(joint, index);
    case JointType::PinInSlot: return makePinInSlotJoint(joint, index);
    }
    return nullptr;
}

std::unique_ptr<Constraint> makeDriverConstraint(const CompiledMechanism& m, int index, const DriverMotion& motion)
{
    const CompiledDriver& d = m.drivers[index];
    if (d.type == DriverType::Rotary) return makeRotaryDriver(d, m.joints[d.joint], index, motion);
    if (d.joint >= 0) return makeSliderDriver(d, m.joints[d.joint], index, motion);
    return makeCylinderDriver(d, index, motion);
}

}  // namespace

ConstraintSystem::ConstraintSystem(const CompiledMechanism& m, bool includeDrivers)
    : coordinates_(3 * static_cast<int>(m.bodies.size()))
{
    for (std::size_t i = 0; i < m.joints.size(); ++i) constraints_.push_back(makeJointConstraint(m.joints[i], int(i)));
    if (includeDrivers) {
        motions_.reserve(m.drivers.size());
        for (std::size_t i = 0; i < m.drivers.size(); ++i) {
            motions_.emplace_back(m.drivers[i].motion, m.drivers[i].offset, m.duration);
            constraints_.push_back(makeDriverConstraint(m, int(i), motions_.back()));
        }
    }
    for (const auto& c : constraints_) {
        firstRow_.push_back(rows_);
        rows_ += c->rows();
    }
    const double length = m.lengthScale;
    rowScale_ = VectorXd::Ones(rows_);
    for (std::size_t k = 0; k < constraints_.size(); ++k)
        for (int r = 0; r < constraints_[k]->rows(); ++r)
            if (constraints_[k]->angularRow(r)) rowScale_[firstRow_[k] + r] = length;
    columnScale_ = VectorXd::Ones(coordinates_);
    for (int b = 0; b < coordinates_ / 3; ++b) columnScale_[3 * b + 2] = 1.0 / length;
}

void ConstraintSystem::position(const VectorXd& q, double t, VectorXd& phi,
                                std::vector<Eigen::Triplet<double>>* jacobian) const
{
    phi.resize(rows_);
    if (jacobian) jacobian->clear();
    const Pose pose(q);
    for (std::size_t k = 0; k < constraints_.size(); ++k)
        constraints_[k]->position(pose, t, RowWriter(firstRow_[k], &phi, jacobian));
    if (!jacobian) return;
    for (auto& e : *jacobian)
        e = Eigen::Triplet<double>(e.row(), e.col(), e.value() * rowScale_[e.row()] * columnScale_[e.col()]);
}

void ConstraintSystem::rates(const VectorXd& q, const VectorXd& qd, double t, VectorXd& nu, VectorXd& gamma) const
{
    nu.resize(rows_);
    gamma.resize(rows_);
    const Pose pose(q);
    for (std::size_t k = 0; k < constraints_.size(); ++k)
        constraints_[k]->rates(pose, qd, t, RowWriter(firstRow_[k], &nu, nullptr), RowWriter(firstRow_[k], &gamma, nullptr));
}

}  // namespace clevis
