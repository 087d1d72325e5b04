// No edit may leave the document in a state its file cannot be reopened in:
// the property editor refuses a value the file reader would refuse, naming
// the part; random runs of edits, undos and redos always save to a file that
// loads back as the same mechanism; a half-drawn sketch saves and reopens.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "tests/drawn_four_bar.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/files/file_actions.h"
#include "ui/panels/property_editor.h"
#include "ui/shell/main_window.h"

#include <QLabel>
#include <QLineEdit>
#include <QTemporaryDir>
#include <QTest>

#include <gtest/gtest.h>

#include <memory>
#include <random>
#include <sstream>

using namespace clevis;
using namespace clevis::ui;

namespace {

// A crank–rocker four-bar as the tools draw it, with typed masses.
Mechanism fourBar()
{
    Mechanism m = drawnFourBar();
    edits::renameBody(m, "link 3", "rocker");
    m.bodies[2].mass = 1.5;
    m.bodies[2].cg = Vec2(0.18, 0.06);
    m.bodies[2].inertia = 0.002;
    return m;
}

// The four-bar open with its rocker selected in the property editor.
struct RockerInEditor {
    MechanismDocument doc;
    std::unique_ptr<PropertyEditor> editor;

    RockerInEditor()
    {
        doc.reset(fourBar(), {});
        doc.setSelection({Selection::Kind::Body, "rocker", -1});
        editor = std::make_unique<PropertyEditor>(&doc);
        editor->rebuildNow();
    }
    QLineEdit* massField() const { return editor->findChild<QLineEdit*>(QStringLiteral("mass")); }
};

TEST(PropertyEditorChecks, ANegativeMassIsRefusedNamingTheBodyAndNothingChanges)
{
    RockerInEditor s;
    MechanismDocument& doc = s.doc;
    PropertyEditor& editor = *s.editor;
    auto* mass = s.massField();
    ASSERT_NE(mass, nullptr);
    const QString shown = mass->text();

    mass->setText(QStringLiteral("-2"));
    emit mass->editingFinished();

    EXPECT_EQ(doc.mechanism().bodies[2].mass, 1.5);
    EXPECT_EQ(doc.undoStack()->count(), 0);
    EXPECT_FALSE(doc.isModified());
    ASSERT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) != nullptr; }, 2000));
    const QString why = editor.findChild<QLabel*>(QStringLiteral("editRefusal"))->text();
    EXPECT_TRUE(why.startsWith(QStringLiteral("Body “rocker”, mass: must be a finite number >= 0")))
        << why.toStdString();
    EXPECT_EQ(editor.findChild<QLineEdit*>(QStringLiteral("mass"))->text(), shown) << "the field shows the value kept";
}

TEST(PropertyEditorChecks, TheRefusalGoesWithTheNextAcceptedEdit)
{
    RockerInEditor s;
    MechanismDocument& doc = s.doc;
    PropertyEditor& editor = *s.editor;
    auto* mass = s.massField();
    mass->setText(QStringLiteral("-2"));
    emit mass->editingFinished();
    ASSERT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) != nullptr; }, 2000));

    mass = editor.findChild<QLineEdit*>(QStringLiteral("mass"));
    mass->setText(QStringLiteral("2"));
    emit mass->editingFinished();
    EXPECT_EQ(doc.mechanism().bodies[2].mass, 2.0);
    EXPECT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) == nullptr; }, 2000));
}

// ---- random runs of edits ----

class RandomEdits {
public:
    RandomEdits(MechanismDocument& doc, unsigned seed) : doc_(doc), rng_(seed) {}

    // One edit as a tool, a form or the Edit menu makes it; returns what it did.
    std::string step()
    {
        switch (pick(16)) {
        case 0: return apply("Add ground pin", [&](Mechanism& m) { edits::addGroundPin(m, point()); });
        case 1: return apply("Add pin", [&](Mechanism& m) { edits::addPin(m, point()); });
        case 2: return addBody();
        case 3:
            return apply("Add slider", [&](Mechanism& m) { edits::addSlider(m, bodyOrGround(m), point(), angle()); });
        case 4:
            return apply("Add pin in slot",
                         [&](Mechanism& m) { edits::addPinInSlot(m, bodyOrGround(m), point(), angle()); });
        case 5: return addDriver();
        case 6: return addLoad();
        case 7: return moveJoint();
        case 8: return removePart();
        case 9: return rename();
        case 10:
        case 11: return setValue();
        case 12:
            return apply("Add point mass",
                         [&](Mechanism& m) { edits::addPointMass(m, bodyOrGround(m), point(), number()); });
        case 13:
        case 14: doc_.undoStack()->undo(); return "undo";
        default: doc_.undoStack()->redo(); return "redo";
        }
    }

private:
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(rng_); }
    double number() { return std::uniform_real_distribution<double>(-0.5, 2.0)(rng_); }  // now and then out of range
    Vec2 point() { return {0.01 * pick(30), 0.01 * pick(30)}; }                          // on a grid, so that pins meet
    double angle() { return 15.0 * pick(24); }

    template <class List>
    std::string nameIn(const List& list)
    {
        return list.empty() ? std::string() : list[pick(int(list.size()))].name;
    }
    std::string bodyOrGround(const Mechanism& m)
    {
        return m.bodies.empty() || pick(4) == 0 ? std::string(kGroundName) : nameIn(m.bodies);
    }
    std::string someName()
    {
        static const char* const names[] = {"crank", "rocker", "pin 3", "link 1", "motor 1", "", "ground", "pin 1"};
        return names[pick(8)];
    }

    // Through the document, as every view edits; a refusal must leave it as it was.
    std::string apply(const std::string& what, const std::function<void(Mechanism&)>& edit)
    {
        const Mechanism before = doc_.mechanism();
        const QString why = doc_.apply(QString::fromStdString(what), edit, what == "Move pin" ? 1 : -1);
        if (!why.isEmpty()) EXPECT_EQ(doc_.mechanism(), before) << "refused, yet changed: " << what;
        return what + (why.isEmpty() ? "" : " (refused: " + why.toStdString() + ")");
    }

    std::string addBody()
    {
        const Mechanism& m = doc_.mechanism();
        if (m.joints.size() < 2) return "add link (too few pins)";
        std::vector<std::string> joints{nameIn(m.joints), nameIn(m.joints)};
        if (pick(3) == 0) joints.push_back(nameIn(m.joints));
        if (joints[0] == joints[1]) return "add link (one pin)";
        return apply("Add link", [joints](Mechanism& m) { edits::addBody(m, joints); });
    }

    std::string addDriver()
    {
        const std::string joint = nameIn(doc_.mechanism().joints);
        if (joint.empty()) return "add motor (no pin)";
        if (pick(2)) return apply("Add motor", [joint](Mechanism& m) { edits::addRotaryMotor(m, joint); });
        return apply("Add drive", [joint](Mechanism& m) { edits::addSliderDrive(m, joint); });
    }

    std::string addLoad()
    {
        const Mechanism& m = doc_.mechanism();
        const BodyPointRef a{bodyOrGround(m), point()}, b{bodyOrGround(m), point()};
        switch (pick(5)) {
        case 0: return apply("Add force", [=](Mechanism& m) { edits::addForce(m, a, {0.0, -100.0}); });
        case 1: return apply("Add torque", [=](Mechanism& m) { edits::addTorque(m, a.body, 2.0); });
        case 2: return apply("Add spring", [=](Mechanism& m) { edits::addSpring(m, a, b); });
        case 3: return apply("Add damper", [=](Mechanism& m) { edits::addDamper(m, a, b); });
        default: return apply("Add cylinder", [=](Mechanism& m) { edits::addCylinder(m, a, b); });
        }
    }

    std::string moveJoint()
    {
        if (doc_.mechanism().joints.empty()) return "move (no pin)";
        const int j = pick(int(doc_.mechanism().joints.size()));
        const Vec2 to = point();
        if (pick(3) == 0) doc_.closeMergeRun();
        return apply("Move pin", [=](Mechanism& m) { edits::moveJoint(m, j, to); });
    }

    std::string removePart()
    {
        const Mechanism& m = doc_.mechanism();
        Selection s;
        switch (pick(4)) {
        case 0: s = {Selection::Kind::Body, QString::fromStdString(nameIn(m.bodies)), -1}; break;
        case 1: s = {Selection::Kind::Joint, QString::fromStdString(nameIn(m.joints)), -1}; break;
        case 2: s = {Selection::Kind::Driver, QString::fromStdString(nameIn(m.drivers)), -1}; break;
        default: s = {Selection::Kind::Load, {}, m.loads.empty() ? -1 : pick(int(m.loads.size()))}; break;
        }
        return apply("Delete", [s](Mechanism& m) { edits::remove(m, s); });
    }

    std::string rename()
    {
        const Mechanism& m = doc_.mechanism();
        const std::string to = someName();
        const int list = pick(3);
        const std::string from = list == 0 ? nameIn(m.bodies) : list == 1 ? nameIn(m.joints) : nameIn(m.drivers);
        if (from.empty()) return "rename (nothing to rename)";
        if (list == 0) return apply("Rename body", [=](Mechanism& m) { edits::renameBody(m, from, to); });
        if (list == 1) return apply("Rename joint", [=](Mechanism& m) { edits::renameJoint(m, from, to); });
        return apply("Rename driver", [=](Mechanism& m) { edits::renameDriver(m, from, to); });
    }

    // A field of the property editor, set as its setter does (any number the form parses).
    std::string setValue()
    {
        const Mechanism& m = doc_.mechanism();
        const double v = number();
        const int body = m.bodies.empty() ? -1 : pick(int(m.bodies.size()));
        switch (pick(6)) {
        case 0:
            if (body < 0) return "set mass (no body)";
            return apply("Set mass", [=](Mechanism& m) { m.bodies[body].section.reset(), m.bodies[body].mass = v; });
        case 1:
            if (body < 0) return "set width (no body)";
            return apply("Set width", [=](Mechanism& m) {
                m.bodies[body].mass.reset(), m.bodies[body].cg.reset(), m.bodies[body].inertia.reset();
                m.bodies[body].section = BarSection{v / 10.0, 0.008, 7850.0, std::nullopt};
            });
        case 2:
            return apply("Set steps",
                         [steps = pick(3) == 0 ? 0 : 1 + pick(720)](Mechanism& m) { m.cycle.steps = steps; });
        case 3: return apply("Set duration", [=](Mechanism& m) { m.cycle.duration = v; });
        case 4:
            if (m.loads.empty()) return "set stiffness (no load)";
            return apply("Set stiffness", [=, k = pick(int(m.loads.size()))](Mechanism& m) {
                if (auto* s = std::get_if<SpringLoad>(&m.loads[k])) s->stiffness = 1000.0 * v;
            });
        default: return apply("Set gravity", [=](Mechanism& m) { m.gravity = Vec2(0.0, -9.8 * v); });
        }
    }

    MechanismDocument& doc_;
    std::mt19937 rng_;
};

TEST(RandomEditRuns, EverySavedStateLoadsBackAsTheDocument)
{
    constexpr unsigned kFirstSeed = 20240611;
    constexpr int kRuns = 300, kSteps = 40;
    for (unsigned seed = kFirstSeed; seed < kFirstSeed + kRuns; ++seed) {
        MechanismDocument doc;
        doc.reset({}, {});
        RandomEdits edits(doc, seed);
        std::ostringstream log;
        for (int i = 0; i < kSteps; ++i) {
            log << "  " << i << ": " << edits.step() << '\n';
            const std::string text = saveMechanismText(doc.mechanism());
            Mechanism reopened;
            try {
                reopened = parseMechanism(text).mechanism;
            } catch (const ModelError& e) {
                FAIL() << "seed " << seed << ": the saved file does not open: " << e.what() << "\nedits:\n"
                       << log.str();
            }
            ASSERT_EQ(reopened, doc.mechanism()) << "seed " << seed << ": the file reopens as another mechanism\n"
                                                 << text << "\nedits:\n"
                                                 << log.str();
        }
    }
}

// ---- a drawing in progress ----

TEST(HalfDrawnSketch, SavesReopensAndTheAnalysisSaysWhatIsMissing)
{
    QTemporaryDir dir;
    MainWindow window(dir.filePath(QStringLiteral("recovery")));
    MechanismDocument* doc = window.document();
    std::string pin;
    doc->apply(QStringLiteral("Draw"), [&pin](Mechanism& m) {
        const std::string o = edits::addGroundPin(m, {0.0, 0.0});
        pin = edits::addPin(m, {0.05, 0.0});
        edits::addBody(m, {o, pin});
    });
    ASSERT_EQ(doc->mechanism().joints.size(), 2u);
    const Mechanism drawn = doc->mechanism();

    const QString path = dir.filePath(QStringLiteral("sketch.json"));
    QString error;
    ASSERT_TRUE(window.files()->saveTo(path, &error)) << error.toStdString();
    doc->reset({}, {});
    ASSERT_TRUE(window.files()->open(path, &error)) << error.toStdString();
    EXPECT_EQ(doc->mechanism(), drawn);

    window.analysis()->waitForIdle();
    const std::string expected = "Pin “" + pin + "” joins only “link 1”: connect it to a second part or to ground";
    EXPECT_EQ(window.analysis()->errorText().toStdString(), expected);
    EXPECT_EQ(window.analysis()->offendingItems().join(QStringLiteral(", ")).toStdString(), pin);
}

}  // namespace
