// The document and its edits: each kind of edit, undone and redone, gives
// back exactly the saved JSON it started from and the one it produced.
#include "core/file/mechanism_file.h"
#include "core/solver/compiled_mechanism.h"
#include "tests/drawn_four_bar.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"

#include <gtest/gtest.h>

#include <functional>

using namespace clevis;
using namespace clevis::ui;

namespace {

std::string saved(const MechanismDocument& doc) { return mechanismToJson(doc.mechanism()).dump(); }

struct NamedEdit {
    const char* name;
    std::function<void(Mechanism&)> edit;
};

class EditRoundTrip : public ::testing::TestWithParam<NamedEdit> {};

TEST_P(EditRoundTrip, UndoAndRedoRestoreTheSavedJsonExactly)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    const std::string before = saved(doc);
    doc.apply(QString::fromUtf8(GetParam().name), GetParam().edit);
    const std::string after = saved(doc);
    ASSERT_NE(before, after) << "the edit must change the document for this test to mean anything";
    ASSERT_EQ(doc.undoStack()->count(), 1);
    EXPECT_EQ(doc.undoStack()->undoText().toStdString(), GetParam().name);
    doc.undoStack()->undo();
    EXPECT_EQ(saved(doc), before);
    doc.undoStack()->redo();
    EXPECT_EQ(saved(doc), after);
    doc.undoStack()->undo();
    EXPECT_EQ(saved(doc), before);
}

const Selection bodySel{Selection::Kind::Body, "link 2", -1};

INSTANTIATE_TEST_SUITE_P(
    EveryKindOfEdit, EditRoundTrip,
    ::testing::Values(NamedEdit{"Add ground pin",
                                [](Mechanism& m) {
                                    edits::addGroundPin(m, {0.3, 0.0});
                                }},
                      NamedEdit{"Add pin",
                                [](Mechanism& m) {
                                    edits::addPin(m, {0.1, 0.2});
                                }},
                      NamedEdit{"Add link",
                                [](Mechanism& m) {
                                    edits::addBody(m, {"pin 3", "pin 2"});
                                }},
                      NamedEdit{"Add plate",
                                [](Mechanism& m) {
                                    edits::addBody(m, {"pin 3", "pin 4", edits::addPin(m, {0.1, 0.2})});
                                }},
                      NamedEdit{"Add slider",
                                [](Mechanism& m) {
                                    edits::addSlider(m, kGroundName, {0.3, 0.1}, 15.0);
                                }},
                      NamedEdit{"Add pin in slot",
                                [](Mechanism& m) {
                                    edits::addPinInSlot(m, "link 2", {0.1, 0.08}, 30.0);
                                }},
                      NamedEdit{"Add motor", [](Mechanism& m) { edits::addRotaryMotor(m, "pin 2"); }},
                      NamedEdit{"Add slider drive",
                                [](Mechanism& m) {
                                    edits::addSliderDrive(m, edits::addSlider(m, kGroundName, {0.3, 0.1}, 0.0));
                                }},
                      NamedEdit{"Add cylinder",
                                [](Mechanism& m) {
                                    edits::addCylinder(m, {kGroundName, {0.1, -0.05}}, {"link 3", {0.18, 0.06}});
                                }},
                      NamedEdit{"Add force",
                                [](Mechanism& m) {
                                    edits::addForce(m, {"link 2", {0.1, 0.08}}, {0.0, -150.0});
                                }},
                      NamedEdit{"Add torque", [](Mechanism& m) { edits::addTorque(m, "link 3", -4.0); }},
                      NamedEdit{"Add spring",
                                [](Mechanism& m) {
                                    edits::addSpring(m, {kGroundName, {0.1, 0.2}}, {"link 2", {0.1, 0.08}});
                                }},
                      NamedEdit{"Add damper",
                                [](Mechanism& m) {
                                    edits::addDamper(m, {kGroundName, {0.1, 0.2}}, {"link 2", {0.1, 0.08}});
                                }},
                      NamedEdit{"Add point mass",
                                [](Mechanism& m) {
                                    edits::addPointMass(m, "link 1", {0.015, 0.02}, 0.3);
                                }},
                      NamedEdit{"Move pin",
                                [](Mechanism& m) {
                                    edits::moveJoint(m, jointIndex(m, "pin 4"), {0.18, 0.13});
                                }},
                      NamedEdit{"Delete link", [](Mechanism& m) { edits::remove(m, bodySel); }},
                      NamedEdit{"Delete pin",
                                [](Mechanism& m) {
                                    edits::remove(m, {Selection::Kind::Joint, "pin 1", -1});
                                }},
                      NamedEdit{"Delete motor",
                                [](Mechanism& m) {
                                    edits::remove(m, {Selection::Kind::Driver, "motor 1", -1});
                                }},
                      NamedEdit{"Rename body", [](Mechanism& m) { edits::renameBody(m, "link 1", "crank"); }},
                      NamedEdit{"Rename joint", [](Mechanism& m) { edits::renameJoint(m, "pin 1", "A0"); }},
                      NamedEdit{"Rename driver", [](Mechanism& m) { edits::renameDriver(m, "motor 1", "gearmotor"); }},
                      NamedEdit{"Set mass",
                                [](Mechanism& m) {
                                    m.bodies[0].mass = 1.5;
                                    m.bodies[0].cg = Vec2(0.015, 0.02);
                                }},
                      NamedEdit{"Set section",
                                [](Mechanism& m) {
                                    m.bodies[1].section = BarSection{0.02, 0.008, 2700.0, std::nullopt};
                                }},
                      NamedEdit{"Set motion",
                                [](Mechanism& m) {
                                    m.drivers[0].motion = Rise{CamLaw::Cycloidal, 0.0, 1.0, 0.0, 1.5};
                                }}),
    [](const auto& info) {
        std::string n = info.param.name;
        for (auto& c : n)
            if (!std::isalnum(static_cast<unsigned char>(c))) c = '_';
        return n;
    });

TEST(MechanismDocument, ConsecutiveEditsWithOneMergeIdAreOneUndoStep)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    const std::string before = saved(doc);
    const int p = jointIndex(doc.mechanism(), "pin 3");
    for (double x : {0.031, 0.032, 0.035})
        doc.apply(
            "Move pin P1",
            [=](Mechanism& m) {
                edits::moveJoint(m, p, {x, 0.04});
            },
            1);
    EXPECT_EQ(doc.undoStack()->count(), 1);
    EXPECT_DOUBLE_EQ(doc.mechanism().joints[p].at.x(), 0.035);
    doc.undoStack()->undo();
    EXPECT_EQ(saved(doc), before);
}

TEST(MechanismDocument, TwoSeparateDragsAreTwoUndoSteps)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    const int p = jointIndex(doc.mechanism(), "pin 3");
    doc.apply(
        "Move pin P1",
        [=](Mechanism& m) {
            edits::moveJoint(m, p, {0.04, 0.04});
        },
        1);
    doc.closeMergeRun();
    doc.apply(
        "Move pin P1",
        [=](Mechanism& m) {
            edits::moveJoint(m, p, {0.05, 0.04});
        },
        1);
    EXPECT_EQ(doc.undoStack()->count(), 2);
}

TEST(MechanismDocument, AnEditThatChangesNothingIsNotRecorded)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    doc.apply("Nothing", [](Mechanism& m) { m.bodies[0].name = m.bodies[0].name; });
    EXPECT_EQ(doc.undoStack()->count(), 0);
    EXPECT_FALSE(doc.isModified());
}

TEST(MechanismDocument, AMergedRunThatEndsWhereItBeganLeavesNoStep)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    const int p = jointIndex(doc.mechanism(), "pin 3");
    for (double x : {0.04, 0.03})
        doc.apply(
            "Move pin P1",
            [=](Mechanism& m) {
                edits::moveJoint(m, p, {x, 0.04});
            },
            1);
    EXPECT_EQ(doc.undoStack()->count(), 0);
    EXPECT_FALSE(doc.isModified());
}

TEST(MechanismDocument, ModifiedFollowsTheCleanState)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), "/tmp/x.json");
    EXPECT_FALSE(doc.isModified());
    doc.apply("Add pin", [](Mechanism& m) { edits::addPin(m, {0.3, 0.3}); });
    EXPECT_TRUE(doc.isModified());
    doc.markSaved("/tmp/y.json");
    EXPECT_FALSE(doc.isModified());
    EXPECT_EQ(doc.filePath().toStdString(), "/tmp/y.json");
    doc.undoStack()->undo();
    EXPECT_TRUE(doc.isModified());
}

TEST(MechanismDocument, UndoingAnAddClearsASelectionOfTheRemovedPart)
{
    MechanismDocument doc;
    doc.reset(drawnFourBar(), {});
    doc.apply("Add torque", [](Mechanism& m) { edits::addTorque(m, "link 3", 2.0); });
    doc.setSelection({Selection::Kind::Load, {}, 0});
    doc.undoStack()->undo();
    EXPECT_EQ(doc.selection().kind, Selection::Kind::None);
}

TEST(MechanismEdits, LinksDrawnPinToPinJoinTheBodies)
{
    const Mechanism m = drawnFourBar();
    ASSERT_EQ(m.joints.size(), 4u);
    EXPECT_EQ(m.joints[0].bodies[0], kGroundName);
    EXPECT_EQ(m.joints[0].bodies[1], "link 1");
    EXPECT_EQ(m.joints[2].bodies[0], "link 1");  // pin 3: crank to coupler
    EXPECT_EQ(m.joints[2].bodies[1], "link 2");
    EXPECT_EQ(m.joints[3].bodies[0], "link 2");  // pin 4: coupler to rocker
    EXPECT_EQ(m.joints[3].bodies[1], "link 3");
    EXPECT_EQ(m.joints[1].bodies[1], "link 3");  // pin 2: ground to rocker
}

TEST(MechanismEdits, AThirdLinkOnAFullPinAddsAPinBesideIt)
{
    Mechanism m = drawnFourBar();
    const std::string c = edits::addPin(m, {0.1, 0.25});
    edits::addBody(m, {"pin 3", c});
    const auto here = jointsAt(m, {0.03, 0.04}, 1e-9);
    ASSERT_EQ(here.size(), 2u);
    EXPECT_EQ(m.joints[here[1]].bodies[0], "link 1");
    EXPECT_EQ(m.joints[here[1]].bodies[1], "link 4");
}

TEST(MechanismEdits, MovingAPinMovesWhatIsFixedAtTheSamePoint)
{
    Mechanism m = drawnFourBar();
    edits::addSpring(m, {kGroundName, {0.1, 0.2}}, {"link 2", {0.17, 0.12}});
    edits::moveJoint(m, jointIndex(m, "pin 4"), {0.16, 0.13});
    EXPECT_EQ(m.joints[jointIndex(m, "pin 4")].at, Vec2(0.16, 0.13));
    EXPECT_EQ(std::get<SpringLoad>(m.loads[0]).b.at, Vec2(0.16, 0.13));
    EXPECT_EQ(std::get<SpringLoad>(m.loads[0]).a.at, Vec2(0.1, 0.2));
}

TEST(MechanismEdits, RenamingABodyUpdatesEveryReference)
{
    Mechanism m = drawnFourBar();
    edits::addTorque(m, "link 1", 1.0);
    edits::renameBody(m, "link 1", "crank");
    EXPECT_EQ(m.bodies[0].name, "crank");
    EXPECT_EQ(m.joints[0].bodies[1], "crank");
    EXPECT_EQ(std::get<TorqueLoad>(m.loads[0]).body, "crank");
    EXPECT_EQ(compile(m).bodies.size(), 3u);  // still consistent for the solver
}

// The four-bar with one load of every kind on the coupler (link 2) and at pin 3,
// the force and torque scaled by profiles that follow the motor, and a
// cylinder from the frame to P2.
Mechanism withEveryLoadKind()
{
    Mechanism m = drawnFourBar();
    const Vec2 p2{0.17, 0.12};
    edits::addForce(m, {"link 2", p2}, {0.0, -10.0});
    edits::addTorque(m, "link 2", 1.0);
    edits::addSpring(m, {kGroundName, {0.1, 0.2}}, {"link 2", p2});
    edits::addDamper(m, {"link 2", p2}, {kGroundName, {0.3, 0.2}});
    m.loads.push_back(TorsionSpringLoad{"torsion1", "pin 3", 2.0, 0.0});
    const LoadProfile byMotor{"motor 1", {0.0, 1.0}, {1.0, 2.0}};
    std::get<ForceLoad>(m.loads[0]).profile = byMotor;
    std::get<TorqueLoad>(m.loads[1]).profile = byMotor;
    edits::addCylinder(m, {kGroundName, {0.3, 0.0}}, {"link 2", p2});
    return m;
}

TEST(MechanismEdits, EveryLoadKindFollowsTheRenamedParts)
{
    Mechanism m = withEveryLoadKind();
    edits::renameBody(m, "link 2", "coupler");
    edits::renameJoint(m, "pin 3", "B");
    edits::renameDriver(m, "motor 1", "gearmotor");
    const auto& force = std::get<ForceLoad>(m.loads[0]);
    const auto& torque = std::get<TorqueLoad>(m.loads[1]);
    EXPECT_EQ(force.point.body, "coupler");
    EXPECT_EQ(force.profile->driver, "gearmotor");
    EXPECT_EQ(torque.body, "coupler");
    EXPECT_EQ(torque.profile->driver, "gearmotor");
    EXPECT_EQ(std::get<SpringLoad>(m.loads[2]).b.body, "coupler");
    EXPECT_EQ(std::get<DamperLoad>(m.loads[3]).a.body, "coupler");
    EXPECT_EQ(std::get<TorsionSpringLoad>(m.loads[4]).joint, "B");
    EXPECT_EQ(m.drivers[0].joint, "pin 1");
    EXPECT_EQ(m.drivers[1].ends[1]->body, "coupler");
    EXPECT_EQ(compile(m).bodies.size(), 3u);  // still consistent for the solver
}

TEST(MechanismEdits, EveryPointFixedAtAMovedPinFollowsIt)
{
    Mechanism m = withEveryLoadKind();
    const Vec2 to{0.16, 0.13};
    edits::moveJoint(m, jointIndex(m, "pin 4"), to);
    EXPECT_EQ(std::get<ForceLoad>(m.loads[0]).point.at, to);
    EXPECT_EQ(std::get<SpringLoad>(m.loads[2]).b.at, to);
    EXPECT_EQ(std::get<DamperLoad>(m.loads[3]).a.at, to);
    EXPECT_EQ(std::get<DamperLoad>(m.loads[3]).b.at, Vec2(0.3, 0.2));
    EXPECT_EQ(m.drivers[1].ends[1]->at, to);
    EXPECT_EQ(m.drivers[1].ends[0]->at, Vec2(0.3, 0.0));
}

TEST(MechanismEdits, DeletingAPartDropsTheLoadsAndDriversOnIt)
{
    Mechanism m = withEveryLoadKind();
    edits::remove(m, {Selection::Kind::Body, "link 2", -1});
    ASSERT_EQ(m.loads.size(), 1u);  // the torsion spring is at a pin, not on the body
    EXPECT_TRUE(std::holds_alternative<TorsionSpringLoad>(m.loads[0]));
    ASSERT_EQ(m.drivers.size(), 1u);
    EXPECT_EQ(m.drivers[0].name, "motor 1");
    edits::remove(m, {Selection::Kind::Joint, "pin 3", -1});
    EXPECT_TRUE(m.loads.empty());
    edits::remove(m, {Selection::Kind::Joint, "pin 1", -1});
    EXPECT_TRUE(m.drivers.empty());
}

TEST(MechanismEdits, DeletingTheDriverAProfileFollowsKeepsTheLoadAtItsNominalValue)
{
    for (const Selection& gone :
         {Selection{Selection::Kind::Driver, "motor 1", -1}, Selection{Selection::Kind::Joint, "pin 1", -1}}) {
        Mechanism m = withEveryLoadKind();
        const std::vector<std::string> following{std::get<ForceLoad>(m.loads[0]).name,
                                                 std::get<TorqueLoad>(m.loads[1]).name};
        EXPECT_EQ(edits::remove(m, gone), following) << gone.name.toStdString();
        EXPECT_FALSE(std::get<ForceLoad>(m.loads[0]).profile);
        EXPECT_FALSE(std::get<TorqueLoad>(m.loads[1]).profile);
        EXPECT_NO_THROW(validateMechanism(m));  // the document stays one the file reader takes
    }
}

TEST(MechanismEdits, DeletingABodyOpensItsPinsAndDropsItsLoads)
{
    Mechanism m = drawnFourBar();
    edits::addTorque(m, "link 2", 1.0);
    edits::remove(m, {Selection::Kind::Body, "link 2", -1});
    EXPECT_EQ(m.bodies.size(), 2u);
    EXPECT_TRUE(m.loads.empty());
    EXPECT_EQ(m.joints[jointIndex(m, "pin 3")].bodies[1], "");
}

// A body whose last pin is deleted goes, and with it what acts on it: a load
// or a cylinder left on it would name a part no longer there.
TEST(MechanismEdits, ABodyLeftWithoutPinsGoesWithTheLoadsAndCylindersOnIt)
{
    Mechanism m = drawnFourBar();  // link 1, the crank, on pin 1 (to ground) and pin 3 (to link 2)
    edits::addForce(m, {"link 1", {0.02, 0.02}}, {0.0, -10.0});
    edits::addCylinder(m, {kGroundName, {0.1, -0.1}}, {"link 1", {0.02, 0.03}});
    edits::remove(m, {Selection::Kind::Joint, "pin 1", -1});
    edits::remove(m, {Selection::Kind::Joint, "pin 3", -1});
    EXPECT_EQ(bodyIndex(m, "link 1"), -1);
    EXPECT_TRUE(m.loads.empty());
    EXPECT_TRUE(m.drivers.empty());  // the motor went with pin 1, the cylinder with link 1
}

}  // namespace
