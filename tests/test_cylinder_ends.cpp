// The pins at a cylinder's two ends, reported as joints are
// (core/results/cylinder_ends.h): each body balances by Newton–Euler with
// them in place of the driver's effort; they are equal and opposite, along
// the line between the ends and as large as the effort (a massless cylinder
// is a two-force member); a bar raised by a cylinder at rest gives the force
// of its moment balance about the pivot; their summary, pin sizing, files and
// text carry them; the end pins' file keys read, save and refuse bad values.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/bar_sizing.h"
#include "core/results/bearing_polar.h"
#include "core/results/cylinder_ends.h"
#include "core/results/pin_sizing.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/results/sizing_json.h"
#include "core/results/summary_text.h"
#include "core/solver/applied_loads.h"
#include "core/solver/body_state.h"
#include "tests/file_text.h"
#include "tests/mechanism_builders.h"
#include "tests/sample_file.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <string>

using namespace clevis;

namespace {

using test::solve;
using test::Solved;

std::string tippingBedText() { return test::readFile(test::samplePath("tipping_bed")); }

Mechanism tippingBed() { return parseMechanism(tippingBedText()).mechanism; }

// A boom on a ground pin, turned by a rotary driver, and a stick pinned to
// its tip, swung by a cylinder from the boom to the stick: both ends of the
// cylinder on moving bodies, with weight and inertia (invented numbers).
Mechanism boomAndStick()
{
    Mechanism m;
    m.name = "boom and stick";
    m.bodies = {test::pointBody("boom", 50.0, Vec2(0.6, 0.1), 8.0),
                test::pointBody("stick", 20.0, Vec2(1.6, -0.2), 2.0)};
    m.joints = {test::pin("O", kGroundName, "boom", Vec2(0, 0)), test::pin("A", "boom", "stick", Vec2(1.2, 0.2))};
    const Vec2 cap(0.5, 0.35), rod(1.25, 0.55);
    const double length = (rod - cap).norm();
    m.drivers = {test::rotary("slew", "O", Rise{CamLaw::Cycloidal, 0.0, 0.4, 0.0, 2.0}),
                 test::cylinder("stick_cylinder", {"boom", cap}, {"stick", rod},
                                Rise{CamLaw::Cycloidal, length, length + 0.08, 0.5, 2.0})};
    m.cycle.duration = 2.0;
    m.cycle.steps = 80;
    return m;
}

// Newton–Euler for each moving body (any dynamics text: ΣF = m·a_G,
// ΣM_G = I_G·α), the forces on it being the joints' reactions (+R on the
// second body, −R on the first, results.h), the cylinder ends' reactions (on
// the body at each end) and the applied loads with the weight — the drivers'
// efforts left out, the cylinders' coming in through their ends. Residuals
// relative to the sum of the magnitudes of the terms.
void expectBodiesBalance(const Solved& x)
{
    const std::vector<CylinderEnd> ends = cylinderEnds(x.m);
    ASSERT_FALSE(ends.empty());
    for (const CompiledDriver& d : x.m.drivers)
        ASSERT_FALSE(d.type == DriverType::Linear && d.joint >= 0) << "a slider's driver has no ends to balance with";
    double worst = 0.0;
    for (const StepResult& s : x.r.steps) {
        std::vector<Vec2> force(x.m.bodies.size(), Vec2::Zero());
        std::vector<double> moment(x.m.bodies.size(), 0.0), scale(x.m.bodies.size(), 0.0);
        const auto add = [&](int body, const Vec2& at, const Vec2& f, double couple) {
            if (body == kGround) return;
            const Vec2 arm = at - bodyOrigin(s.q, body);
            force[body] += f;
            moment[body] += couple + cross(arm, f);
            scale[body] += f.norm() + std::abs(couple) + arm.norm() * f.norm();
        };
        for (std::size_t j = 0; j < x.m.joints.size(); ++j) {
            const CompiledJoint& joint = x.m.joints[j];
            const Vec2 at = pointPosition(s.q, joint.point[1]);
            add(joint.body[1], at, s.joints[j].force, s.joints[j].moment);
            add(joint.body[0], at, -s.joints[j].force, -s.joints[j].moment);
        }
        for (std::size_t d = 0; d < x.m.drivers.size(); ++d)
            if (x.m.drivers[d].type == DriverType::Rotary) {
                const CompiledJoint& joint = x.m.joints[x.m.drivers[d].joint];
                add(joint.body[1], Vec2::Zero(), Vec2::Zero(), s.effort[d]);
                add(joint.body[0], Vec2::Zero(), Vec2::Zero(), -s.effort[d]);
            }
        for (const CylinderEnd& end : ends) {
            const BodyPoint& p = x.m.drivers[end.driver].ends[int(end.side)];
            add(end.body, pointPosition(s.q, p), endReaction(x.m, s, end).force, endReaction(x.m, s, end).moment);
        }
        for (const AppliedLoad& l : appliedLoads(x.m, s.q, s.qd, s.t, s.drivePosition))
            add(l.body, l.at, l.force, l.couple);
        for (std::size_t b = 0; b < x.m.bodies.size(); ++b) {
            const MassProperties& mp = x.m.bodies[b].mass;
            const Vec2 ma = mp.mass * Vec2(s.qdd[3 * b], s.qdd[3 * b + 1]);
            const double ia = mp.inertia * s.qdd[3 * b + 2];
            const double total = scale[b] + ma.norm() + std::abs(ia);
            const double residual = ((force[b] - ma).norm() + std::abs(moment[b] - ia)) / total;
            worst = std::max(worst, residual);
            EXPECT_LT(residual, 1e-9) << x.m.bodies[b].name << " at t = " << s.t << " s";
        }
    }
    testing::Test::RecordProperty("worst_relative_residual", std::to_string(worst));
}

TEST(CylinderEnds, EveryBodyOfTheTippingBedBalancesWithTheEndForces) { expectBodiesBalance(solve(tippingBed())); }

TEST(CylinderEnds, BothBodiesBalanceWithACylinderBetweenThem) { expectBodiesBalance(solve(boomAndStick())); }

// A massless cylinder is a two-force member (statics: a body loaded at two
// points only is in equilibrium when the two forces are equal, opposite and
// collinear): F_cap = −F_rod, both along the line between the ends, and
// F_rod = E·u with E the driver's effort.
void expectTwoForceMember(const Solved& x)
{
    const std::vector<CylinderEnd> ends = cylinderEnds(x.m);
    ASSERT_EQ(ends.size(), 2u);
    EXPECT_EQ(ends[0].side, CylinderSide::Cap);
    EXPECT_EQ(ends[1].side, CylinderSide::Rod);
    const CompiledDriver& driver = x.m.drivers[ends[0].driver];
    EXPECT_EQ(ends[0].name, driver.name + ".cap");
    EXPECT_EQ(ends[1].name, driver.name + ".rod");
    for (const StepResult& s : x.r.steps) {
        const Vec2 cap = endReaction(x.m, s, ends[0]).force, rod = endReaction(x.m, s, ends[1]).force;
        const double effort = s.effort[std::size_t(ends[0].driver)];
        const Vec2 u = (pointPosition(s.q, driver.ends[1]) - pointPosition(s.q, driver.ends[0])).normalized();
        const double tolerance = 1e-9 * std::abs(effort);
        EXPECT_LT((cap + rod).norm(), tolerance) << "t = " << s.t;
        EXPECT_LT(std::abs(cross(u, rod)), tolerance) << "t = " << s.t;
        EXPECT_NEAR(rod.dot(u), effort, tolerance) << "t = " << s.t;
        EXPECT_NEAR(rod.norm(), std::abs(effort), tolerance) << "t = " << s.t;
        EXPECT_EQ(endReaction(x.m, s, ends[0]).moment, 0.0);
    }
}

TEST(CylinderEnds, TheTippingBedsCylinderIsATwoForceMember) { expectTwoForceMember(solve(tippingBed())); }

TEST(CylinderEnds, ACylinderBetweenTwoMovingBodiesIsATwoForceMember) { expectTwoForceMember(solve(boomAndStick())); }

// A bar of mass m pinned to ground at O, its centre of mass G on it, raised
// by a cylinder from the ground point A to the bar's point B. At rest
// (before and after the rise) the moment balance about O (statics of a rigid
// body, ΣM_O = 0) gives the cylinder's force along u = (B − A)/|B − A|:
//   (B − O) × (E·u) + (G − O) × (0, −m·g) = 0   ⇒   E = m·g·(G − O)ₓ / ((B − O) × u)
// and the force at O from ΣF = 0: R = (0, m·g) − E·u.
TEST(CylinderEnds, ABarRaisedByACylinderAtRestMatchesItsMomentBalance)
{
    const double mass = 120.0, g = 9.80665;
    const Vec2 a(0.8, -0.3), b(0.6, 0.0), gBar(1.1, 0.0);
    Mechanism doc;
    doc.gravity = Vec2(0, -g);
    doc.bodies = {test::pointBody("bar", mass, gBar, 15.0)};
    doc.joints = {test::pin("O", kGroundName, "bar", Vec2::Zero())};
    const double length = (b - a).norm();
    doc.drivers = {test::cylinder("lift", {kGroundName, a}, {"bar", b},
                                  Rise{CamLaw::Polynomial345, length, length + 0.12, 1.0, 2.0})};
    doc.cycle.duration = 3.0;
    doc.cycle.steps = 30;
    const Solved x = solve(doc);
    ASSERT_TRUE(x.r.complete);
    const std::vector<CylinderEnd> ends = cylinderEnds(x.m);
    int checked = 0;
    for (const StepResult& s : x.r.steps) {
        if (s.t > 0.95 && s.t < 2.05) continue;  // rising: not at rest
        ASSERT_LT(s.qd.norm() + s.qdd.norm(), 1e-9);
        const double phi = s.q[2];
        const Vec2 bNow = rotation(phi) * b, gNow = rotation(phi) * gBar;
        const Vec2 u = (bNow - a).normalized();
        const double effort = mass * g * gNow.x() / cross(bNow, u);
        const Vec2 rod = endReaction(x.m, s, ends[1]).force, cap = endReaction(x.m, s, ends[0]).force;
        EXPECT_LT((rod - effort * u).norm(), 1e-9 * std::abs(effort)) << "t = " << s.t;
        EXPECT_LT((cap + effort * u).norm(), 1e-9 * std::abs(effort)) << "t = " << s.t;
        EXPECT_LT((s.joints[0].force - (Vec2(0, mass * g) - effort * u)).norm(), 1e-9 * std::abs(effort));
        ++checked;
    }
    EXPECT_GT(checked, 10);
    // The drawn pose, by hand: B × u = (0.6, 0) × (−0.2, 0.3)/√0.13 = 0.18/√0.13,
    // E = 120·g·1.1·√0.13/0.18 = 2 610.5… N (a push: the bar is held up).
    EXPECT_NEAR(endReaction(x.m, x.r.steps.front(), ends[1]).force.norm(), mass * g * 1.1 * std::sqrt(0.13) / 0.18,
                1e-6);
    // The summary's peak and RMS of an end are its |F| over the cycle, as a joint's.
    double peak = 0.0;
    for (const StepResult& s : x.r.steps) peak = std::max(peak, endReaction(x.m, s, ends[1]).force.norm());
    ASSERT_EQ(x.s.cylinderEnds.size(), 2u);
    EXPECT_EQ(x.s.cylinderEnds[1].name, "lift.rod");
    EXPECT_DOUBLE_EQ(x.s.cylinderEnds[1].peak.value, peak);
    EXPECT_DOUBLE_EQ(x.s.cylinderEnds[0].peak.value, x.s.cylinderEnds[1].peak.value);
    EXPECT_GT(x.s.cylinderEnds[1].rms, 0.0);
    EXPECT_LE(x.s.cylinderEnds[1].rms, peak);
}

// A slider's driver has no ends: a cylinder at a slider adds no pins.
TEST(CylinderEnds, OnlyADriverBetweenTwoPointsHasEnds)
{
    const Solved x = solve(test::sliderCrank({}));
    EXPECT_TRUE(cylinderEnds(x.m).empty());
    EXPECT_TRUE(x.s.cylinderEnds.empty());
}

// The cylinder's angle and rate against the line between its ends: the
// angle's change since the drawn pose, and a central difference of it.
TEST(CylinderEnds, TheCylindersTurningFollowsTheLineBetweenItsEnds)
{
    const Solved x = solve(boomAndStick());
    const CompiledDriver& driver = x.m.drivers[1];
    const auto lineAngle = [&](const StepResult& s) {
        const Vec2 d = pointPosition(s.q, driver.ends[1]) - pointPosition(s.q, driver.ends[0]);
        return std::atan2(d.y(), d.x());
    };
    const double drawn = std::atan2(0.55 - 0.35, 1.25 - 0.5);
    double largest = 0.0;
    for (const StepResult& s : x.r.steps) largest = std::max(largest, std::abs(cylinderRate(x.m, s, 1)));
    ASSERT_GT(largest, 0.05);
    for (std::size_t i = 1; i + 1 < x.r.steps.size(); ++i) {
        const StepResult &before = x.r.steps[i - 1], &s = x.r.steps[i], &after = x.r.steps[i + 1];
        EXPECT_NEAR(cylinderAngle(x.m, s, 1), lineAngle(s) - drawn, 1e-12);
        const double difference = (lineAngle(after) - lineAngle(before)) / (after.t - before.t);
        EXPECT_NEAR(cylinderRate(x.m, s, 1), difference, 2e-3 * largest) << "t = " << s.t;
    }
}

// An end pin sized as a joint's pin (pin_sizing.h): τ = |F|/(n·π·d²/4),
// p = |F|/(d·l), v = |ω_body − ω_c|·d/2.
TEST(CylinderEnds, AnEndPinIsSizedAsAJointsPin)
{
    Mechanism doc = tippingBed();
    PinData pin;
    pin.diameter = 0.03;
    pin.shearPlanes = 2;
    pin.bearingLength = 0.04;
    pin.allowableShear = 1.2e8;
    doc.drivers[0].endPins[1] = pin;
    const Solved x = solve(doc);
    const std::vector<PinSizing> pins = sizePins(x.doc, x.m, x.r);
    ASSERT_EQ(pins.size(), 3u);  // the hinge, then the cap and rod ends
    const PinSizing &cap = pins[1], &rod = pins[2];
    EXPECT_EQ(cap.name, "lift_cylinder.cap");
    EXPECT_FALSE(cap.pin.has_value());
    EXPECT_EQ(rod.name, "lift_cylinder.rod");
    EXPECT_EQ(rod.joint, -1);
    EXPECT_EQ(rod.cylinderEnd, 1);
    const double peak = x.s.cylinderEnds[1].peak.value;
    EXPECT_DOUBLE_EQ(rod.force.value, peak);
    EXPECT_NEAR(rod.shearStress.value, peak / (2 * kPi * 0.03 * 0.03 / 4), 1e-9 * rod.shearStress.value);
    EXPECT_NEAR(rod.pressure.value, peak / (0.03 * 0.04), 1e-9 * rod.pressure.value);
    EXPECT_NEAR(*rod.shearUtilisation, rod.shearStress.value / 1.2e8, 1e-12);
    double v = 0.0;
    for (const StepResult& s : x.r.steps) v = std::max(v, std::abs(s.qd[2] - cylinderRate(x.m, s, 0)) * 0.03 / 2);
    EXPECT_GT(v, 0.0);
    EXPECT_DOUBLE_EQ(rod.slidingSpeed.value, v);
}

// The end's load on the body there in that body's frame (bearing_polar.h):
// F' = Rot(−φ)·F, its peak the summary's; the bed turns up by over 60°, so a
// load fixed in direction globally sweeps round in the bed's frame.
TEST(CylinderEnds, TheBearingDiagramOfAnEndIsOnTheBodyThere)
{
    const Solved x = solve(tippingBed());
    const std::vector<CylinderEnd> ends = cylinderEnds(x.m);
    const BearingPolar rod = endBearingPolar(x.m, x.r, x.s, 1);
    EXPECT_EQ(rod.pin, "lift_cylinder.rod");
    EXPECT_EQ(rod.joint, -1);
    EXPECT_EQ(rod.cylinderEnd, 1);
    EXPECT_EQ(rod.body, 0);
    EXPECT_EQ(rod.otherName, "lift_cylinder");
    ASSERT_EQ(rod.force.size(), x.r.steps.size());
    for (std::size_t i = 0; i < x.r.steps.size(); i += 20) {
        const double phi = x.r.steps[i].q[2];
        const Vec2 global = endReaction(x.m, x.r.steps[i], ends[1]).force;
        const Vec2 expected(global.x() * std::cos(phi) + global.y() * std::sin(phi),
                            -global.x() * std::sin(phi) + global.y() * std::cos(phi));
        EXPECT_LT((rod.force[i] - expected).norm(), 1e-9 * global.norm());
    }
    EXPECT_EQ(rod.peak.value, x.s.cylinderEnds[1].peak.value);
    EXPECT_TRUE(rod.sector.defined);
    const BearingPolar cap = endBearingPolar(x.m, x.r, x.s, 0);
    EXPECT_EQ(cap.body, kGround);
    EXPECT_LT((cap.force.back() + endReaction(x.m, x.r.steps.back(), ends[1]).force).norm(), 1e-9 * cap.peak.value)
        << "the frame's axes are the global ones";
    EXPECT_THROW(endBearingPolar(x.m, x.r, x.s, 2), std::invalid_argument);
}

TEST(CylinderEnds, EndPinsReadSaveAndRefuseBadValues)
{
    nlohmann::json file = nlohmann::json::parse(tippingBedText());
    file["drivers"][0]["between"][1]["pin"] = {{"diameter", 0.03}, {"shear_planes", 2}, {"allowable_pressure", 4e7}};
    const Mechanism read = parseMechanism(file.dump()).mechanism;
    ASSERT_TRUE(read.drivers[0].endPins[1].has_value());
    EXPECT_FALSE(read.drivers[0].endPins[0].has_value());
    EXPECT_EQ(read.drivers[0].endPins[1]->diameter, 0.03);
    EXPECT_EQ(read.drivers[0].endPins[1]->shearPlanes, 2);
    EXPECT_EQ(parseMechanism(saveMechanismText(read)).mechanism, read);
    EXPECT_TRUE(parseMechanism(tippingBedText()).warnings.empty());

    file["drivers"][0]["between"][1]["pin"]["diameter"] = -0.03;
    try {
        parseMechanism(file.dump());
        ADD_FAILURE() << "a negative diameter was read";
    } catch (const ModelError& e) {
        EXPECT_NE(std::string(e.what()).find("drivers[0].between[1].pin.diameter"), std::string::npos) << e.what();
    }
}

TEST(CylinderEnds, FilesAndTextCarryTheEndsAsJoints)
{
    const Solved x = solve(tippingBed());
    const std::vector<CylinderEnd> ends = cylinderEnds(x.m);
    const nlohmann::json json = nlohmann::json::parse(resultsJsonText(x.m, x.r, x.s));
    const std::size_t k = 100;
    const StepResult& s = x.r.steps[k];
    const nlohmann::json& rod = json["steps"][k]["cylinder_ends"]["lift_cylinder.rod"];
    const Vec2 force = endReaction(x.m, s, ends[1]).force;
    EXPECT_EQ(rod["fx"].get<double>(), force.x());
    EXPECT_EQ(rod["fy"].get<double>(), force.y());
    EXPECT_EQ(rod["moment"].get<double>(), 0.0);
    // On the bed in its own frame, and on the cylinder in the cylinder's: along its axis only.
    const Vec2 onBed = rotation(-s.q[2]) * force;
    EXPECT_NEAR(rod["local"]["second"]["fx"].get<double>(), onBed.x(), 1e-9 * force.norm());
    EXPECT_NEAR(rod["local"]["second"]["fy"].get<double>(), onBed.y(), 1e-9 * force.norm());
    const double along = rod["local"]["first"]["fx"].get<double>(), across = rod["local"]["first"]["fy"].get<double>();
    // The cylinder's frame turns with its line, so in it the line lies where it
    // was drawn: the rod's end feels −E along the drawn line, at every step.
    const Vec2 drawn = Vec2(1.92 - 1.6, -0.12 + 0.36).normalized();
    EXPECT_NEAR(along, -s.effort[0] * drawn.x(), 1e-9 * force.norm());
    EXPECT_NEAR(across, -s.effort[0] * drawn.y(), 1e-9 * force.norm());
    const nlohmann::json& summary = json["summary"]["cylinder_ends"]["lift_cylinder.cap"];
    EXPECT_EQ(summary["peak_n"].get<double>(), x.s.cylinderEnds[0].peak.value);
    EXPECT_EQ(summary["peak_step"].get<int>(), x.s.cylinderEnds[0].peak.step);
    EXPECT_EQ(summary["rms_n"].get<double>(), x.s.cylinderEnds[0].rms);
    EXPECT_FALSE(json["summary"]["joints"].contains("lift_cylinder.cap")) << "the file's joints stay the file's";
    Mechanism sized = x.doc;
    sized.drivers[0].endPins[0] = PinData{0.025};
    const Solved y = solve(sized);
    const nlohmann::json sizing = sizingToJson(y.m, y.r, sizeParts(y.doc, y.m, y.r));
    ASSERT_EQ(sizing["pins"].size(), 1u);
    EXPECT_EQ(sizing["pins"][0]["joint"], "hinge");
    ASSERT_EQ(sizing["cylinder_ends"].size(), 2u);
    EXPECT_EQ(sizing["cylinder_ends"][0]["end"], "lift_cylinder.cap");
    EXPECT_EQ(sizing["cylinder_ends"][0]["pin"]["diameter_m"], 0.025);
    EXPECT_EQ(sizing["cylinder_ends"][1]["end"], "lift_cylinder.rod");
    EXPECT_TRUE(sizing["cylinder_ends"][1]["pin"].is_null());

    const std::string csv = resultsCsvText(x.m, x.r);
    const std::string header = csv.substr(0, csv.find('\n'));
    EXPECT_NE(header.find(",lift_cylinder.cap.fx [N],lift_cylinder.cap.fy [N],lift_cylinder.cap.moment [N·m],"
                          "lift_cylinder.rod.fx [N],lift_cylinder.rod.fy [N],lift_cylinder.rod.moment [N·m]"),
              std::string::npos)
        << header;
    EXPECT_EQ(header.substr(header.size() - std::string("lift_cylinder.rod.moment [N·m]").size()),
              "lift_cylinder.rod.moment [N·m]")
        << "appended last, after every former column";

    const std::string text = summaryText(x.m, x.r, x.s);
    EXPECT_NE(text.find("lift_cylinder.rod"), std::string::npos) << text;
    EXPECT_NE(text.find(kCylinderEndType), std::string::npos);

    const Solved none = solve(test::sliderCrank({}));
    const nlohmann::json plain = nlohmann::json::parse(resultsJsonText(none.m, none.r, none.s));
    EXPECT_FALSE(plain["summary"].contains("cylinder_ends"));
    EXPECT_FALSE(plain["steps"][0].contains("cylinder_ends"));
}

}  // namespace
