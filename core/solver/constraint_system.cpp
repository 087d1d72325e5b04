#include "core/solver/constraint_system.h"

#include <algorithm>

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
            motions_.emplace_back(m.drivers[i], m.duration);
            constraints_.push_back(makeDriverConstraint(m, int(i), motions_.back()));
        }
    }
    for (const auto& c : constraints_) {
        firstRow_.push_back(rows_);
        rows_ += c->rows();
    }
    balanceUnits(m);
}

// Each body's own size: the farthest of its joint points and cylinder ends
// from its centre of mass. A body whose only attachment sits at its centre
// (a slider block) takes a tenth of the bodies' mean size instead.
std::vector<double> bodySizes(const CompiledMechanism& m)
{
    std::vector<double> size(m.bodies.size(), 0.0);
    const auto extend = [&](const BodyPoint& p) {
        if (p.body != kGround) size[p.body] = std::max(size[p.body], p.local.norm());
    };
    for (const auto& j : m.joints) {
        extend(j.point[0]);
        extend(j.point[1]);
    }
    for (const auto& d : m.drivers) {
        extend(d.ends[0]);
        extend(d.ends[1]);
    }
    double mean = 0.0;
    for (const double s : size) mean += s / double(size.size());
    const double floor = std::max(0.1 * mean, 1e-6 * m.lengthScale);
    for (double& s : size) s = std::max(s, floor);
    return size;
}

// Rotations count as arc lengths on the body's own size, and an angular row
// is multiplied by the largest size among the bodies it turns: the balance
// stays local, so a long chain of sound links is not mistaken for a singular
// one merely because the whole mechanism is large.
void ConstraintSystem::balanceUnits(const CompiledMechanism& m)
{
    const std::vector<double> size = bodySizes(m);
    columnScale_ = VectorXd::Ones(coordinates_);
    for (std::size_t b = 0; b < size.size(); ++b) columnScale_[3 * b + 2] = 1.0 / size[b];
    rowScale_ = VectorXd::Ones(rows_);
    VectorXd drawn = VectorXd::Zero(coordinates_), phi(rows_);
    for (std::size_t b = 0; b < m.bodies.size(); ++b) drawn.segment<2>(3 * b) = m.bodies[b].mass.cg;
    const Pose pose(drawn);
    std::vector<Eigen::Triplet<double>> entries;
    for (std::size_t k = 0; k < constraints_.size(); ++k) {
        entries.clear();
        constraints_[k]->position(pose, 0.0, RowWriter(0, &phi, &entries));
        std::vector<double> turned(constraints_[k]->rows(), 0.0);
        for (const auto& e : entries)
            if (e.col() % 3 == 2) turned[e.row()] = std::max(turned[e.row()], size[e.col() / 3]);
        for (int r = 0; r < constraints_[k]->rows(); ++r)
            if (constraints_[k]->angularRow(r) && turned[r] > 0.0) rowScale_[firstRow_[k] + r] = turned[r];
    }
}

void ConstraintSystem::position(const Pose& q, double t, VectorXd& phi,
                                std::vector<Eigen::Triplet<double>>* jacobian) const
{
    phi.resize(rows_);
    if (jacobian) jacobian->clear();
    for (std::size_t k = 0; k < constraints_.size(); ++k)
        constraints_[k]->position(q, t, RowWriter(firstRow_[k], &phi, jacobian));
    if (!jacobian) return;
    for (auto& e : *jacobian)
        e = Eigen::Triplet<double>(e.row(), e.col(), e.value() * rowScale_[e.row()] * columnScale_[e.col()]);
}

void ConstraintSystem::rates(const Pose& q, const VectorXd& qd, double t, VectorXd& nu, VectorXd& gamma) const
{
    nu.resize(rows_);
    gamma.resize(rows_);
    for (std::size_t k = 0; k < constraints_.size(); ++k)
        constraints_[k]->rates(q, qd, t, RowWriter(firstRow_[k], &nu, nullptr),
                               RowWriter(firstRow_[k], &gamma, nullptr));
}

}  // namespace clevis
