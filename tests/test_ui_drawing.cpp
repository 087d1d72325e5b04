// Drawing on the canvas as a designer expects: a link drawn to a pin that
// already joins two parts is joined to it by a two-body pin the status line
// names, and the pin is shown and listed as one compound pin; lengths and
// angles typed while drawing place the end exactly; parts get names in one
// scheme; the canvas takes the keyboard back from a property field on a click.
#include "core/file/mechanism_file.h"
#include "tests/canvas_fixture.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/body_mass_preview.h"
#include "ui/shell/display_units.h"

#include <QLabel>
#include <QLineEdit>
#include <QSignalSpy>

#include <cmath>
#include <set>

using namespace clevis;
using namespace clevis::ui;
using clevis::ui::test::CanvasTest;

namespace {

class DrawingTest : public CanvasTest {
protected:
    void SetUp() override
    {
        CanvasTest::SetUp();
        DisplayUnits::instance().setLength(DisplayUnits::Length::Millimetre);
    }

    // The four-bar, then a dyad from its coupler-rocker pin B (0.17, 0.12) to
    // a third ground pin: a Watt six-bar (5 moving bodies, 7 pins: 3·5 − 2·7 = 1
    // degree of freedom by Gruebler's count). The dyad's reach, 0.093 to
    // 0.319 m, spans the 0.175 to 0.216 m B stays from O3 over the cycle, so
    // it assembles at every crank angle.
    void drawSixBar()
    {
        drawFourBar();
        useTool("Ground pin");
        click(0.3, 0.0);
        useTool("Link");
        click(0.17, 0.12), click(0.25, 0.2);
        click(0.25, 0.2), click(0.3, 0.0);
    }

    std::vector<int> jointsAtB() const { return jointsAt(mechanism(), Vec2(0.17, 0.12), 1e-9); }
};

TEST_F(DrawingTest, ALinkDrawnToAnOccupiedPinJoinsItByATwoBodyPinAndSaysWhich)
{
    drawFourBar();
    const std::string coupler = mechanism().joints[jointsAtB()[0]].bodies[0];
    useTool("Link");
    QSignalSpy hints(window.canvas(), &CanvasView::hintChanged);
    click(0.17, 0.12), click(0.25, 0.2);
    ASSERT_EQ(mechanism().bodies.size(), 4u);
    const std::string added = mechanism().bodies.back().name;

    const std::vector<int> here = jointsAtB();
    ASSERT_EQ(here.size(), 2u);
    const Joint& extra = mechanism().joints[here[1]];
    EXPECT_EQ(extra.bodies[0], coupler);  // to the pin's first body, as the note says
    EXPECT_EQ(extra.bodies[1], added);
    for (int i : here) EXPECT_FALSE(mechanism().joints[i].bodies[0].empty() || mechanism().joints[i].bodies[1].empty());

    // The note after the click names the new pin and the two parts it joins.
    ASSERT_FALSE(hints.isEmpty());
    const QString note = hints.last().at(0).toString();
    for (const std::string& word : {extra.name, coupler, added})
        EXPECT_TRUE(note.contains(QString::fromStdString(word))) << note.toStdString() << " lacks " << word;
}

TEST_F(DrawingTest, ASixBarDrawnThroughAnOccupiedPinHasOneFreedomAndSolvesAndUndoes)
{
    drawSixBar();
    ASSERT_EQ(mechanism().bodies.size(), 5u);
    ASSERT_EQ(mechanism().joints.size(), 7u);
    for (const Joint& j : mechanism().joints)
        EXPECT_FALSE(j.bodies[0].empty() || j.bodies[1].empty()) << j.name << " is open";

    AnalysisState* analysis = window.analysis();
    analysis->waitForIdle();
    ASSERT_TRUE(analysis->mobility().has_value()) << analysis->errorText().toStdString();
    EXPECT_EQ(analysis->mobility()->gruebler, 1);
    EXPECT_EQ(analysis->mobility()->mobility, 1);
    EXPECT_EQ(analysis->mobility()->redundantEquations, 0);
    EXPECT_TRUE(analysis->errorText().isEmpty()) << analysis->errorText().toStdString();
    ASSERT_TRUE(analysis->hasResult());
    EXPECT_TRUE(analysis->result().complete);

    // Undo takes the dyad off again, the extra pin at B with it; redo puts it back.
    const Mechanism six = mechanism();
    QUndoStack* stack = window.document()->undoStack();
    stack->undo(), stack->undo(), stack->undo();
    EXPECT_EQ(mechanism().bodies.size(), 3u);
    EXPECT_EQ(jointsAtB().size(), 1u);
    stack->redo(), stack->redo(), stack->redo();
    EXPECT_EQ(mechanism(), six);
}

// Three bodies at B are one pin on the canvas: picking it lists every body
// and, once solved, the force each of its two-body joints carries.
TEST_F(DrawingTest, ACompoundPinListsItsBodiesAndTheForceOfEachJoint)
{
    drawSixBar();
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(window.analysis()->hasResult());
    useTool("Select");
    QSignalSpy hints(window.canvas(), &CanvasView::hintChanged);
    QTest::mouseMove(window.canvas(), at(0.17, 0.12));
    ASSERT_FALSE(hints.isEmpty());
    const QString hover = hints.last().at(0).toString();
    std::set<std::string> bodies;
    for (int i : jointsAtB())
        for (const auto& b : mechanism().joints[i].bodies) bodies.insert(b);
    ASSERT_EQ(bodies.size(), 3u);
    for (const auto& b : bodies) EXPECT_TRUE(hover.contains(QString::fromStdString(b))) << hover.toStdString();

    click(0.17, 0.12);
    auto* editor = window.findChild<PropertyEditor*>();
    editor->rebuildNow();
    for (int i : jointsAtB()) {
        const Joint& j = mechanism().joints[i];
        auto* row = editor->findChild<QLabel*>(QStringLiteral("force:") + QString::fromStdString(j.name));
        ASSERT_NE(row, nullptr) << "no force listed for " << j.name;
        EXPECT_TRUE(row->text().endsWith(DisplayUnits::instance().forceSymbol())) << row->text().toStdString();
    }

    // Another shown step: the forces listed are that step's.
    const int step = window.analysis()->currentStep() + 90;
    window.analysis()->setCurrentStep(step);
    QCoreApplication::processEvents();
    const auto& compiled = window.analysis()->compiled().joints;
    for (int i : jointsAtB()) {
        const Joint& j = mechanism().joints[i];
        const auto k = std::find_if(compiled.begin(), compiled.end(), [&](const auto& c) { return c.name == j.name; });
        ASSERT_NE(k, compiled.end());
        const double force =
            window.analysis()->result().steps[std::size_t(step)].joints[k - compiled.begin()].force.norm();
        auto* row = editor->findChild<QLabel*>(QStringLiteral("force:") + QString::fromStdString(j.name));
        ASSERT_NE(row, nullptr);
        EXPECT_TRUE(
            row->text().endsWith(DisplayUnits::instance().formatForce(force).replace(QLatin1Char(' '), QChar(0x00A0))))
            << row->text().toStdString();
    }
}

// The dyad's link joins the six-bar at B by a second joint on one of the
// bodies already there (a compound pin): that body keeps two pins, so it is
// still a link with a length, and its mass is worked out as for any link.
TEST_F(DrawingTest, ABodyAtACompoundPinStaysALinkAndItsMassIsWorkedOut)
{
    drawSixBar();
    std::string twice;  // the body two joints at B name
    for (const auto& b : mechanism().bodies) {
        int atB = 0;
        for (int i : jointsAtB())
            for (const auto& n : mechanism().joints[i].bodies) atB += n == b.name;
        if (atB == 2) twice = b.name;
    }
    ASSERT_FALSE(twice.empty());
    EXPECT_EQ(bodyPins(mechanism(), twice).size(), 2u);
    QString problem;
    const auto mass = previewMass(mechanism(), twice, problem);
    EXPECT_TRUE(mass.has_value()) << problem.toStdString();
}

// The end typed after the first click lands exactly there: 100 mm at 30°
// ends at (100 cos 30°, 100 sin 30°) = (50√3, 50) mm.
TEST_F(DrawingTest, ALengthAndAngleTypedWhileDrawingPlaceTheEndExactly)
{
    useTool("Ground pin");
    click(0.0, 0.0);
    useTool("Select");
    click(0.0, 0.0);  // selected: Backspace is also the key that deletes a part
    ASSERT_EQ(window.document()->selection().kind, Selection::Kind::Joint);
    useTool("Link");
    click(0.0, 0.0);
    QTest::keyClicks(window.canvas(), "1005");
    QTest::keyClick(window.canvas(), Qt::Key_Backspace);  // corrects the typing, deletes no part
    QTest::keyClick(window.canvas(), Qt::Key_Tab);
    QTest::keyClicks(window.canvas(), "30");
    QTest::keyClick(window.canvas(), Qt::Key_Return);
    ASSERT_EQ(mechanism().bodies.size(), 1u);
    EXPECT_EQ(mechanism().joints.size(), 2u);
    const std::vector<Vec2> ends = bodyPins(mechanism(), mechanism().bodies[0].name);
    ASSERT_EQ(ends.size(), 2u);
    EXPECT_NEAR(ends[1].x(), 0.05 * std::sqrt(3.0), 1e-12);
    EXPECT_NEAR(ends[1].y(), 0.05, 1e-12);
    EXPECT_EQ(window.canvas()->tool()->strokeStart(), std::nullopt);
}

// An undo during a stroke renumbers the joints; the link still ends where
// it was clicked, at a pin found there again.
TEST_F(DrawingTest, AnUndoDuringAStrokeLeavesTheLinkWhereItWasClicked)
{
    useTool("Ground pin");
    click(0.0, 0.0);
    click(0.1, 0.0);
    useTool("Link");
    click(0.1, 0.0);
    window.document()->undoStack()->undo();  // the second ground pin goes
    click(0.05, 0.05);
    ASSERT_EQ(mechanism().bodies.size(), 1u);
    const std::vector<Vec2> ends = bodyPins(mechanism(), mechanism().bodies[0].name);
    ASSERT_EQ(ends.size(), 2u);
    EXPECT_EQ(ends[0], Vec2(0.1, 0.0));
    EXPECT_EQ(ends[1], Vec2(0.05, 0.05));
}

// Once a point is placed, its dimension goes: only the side being drawn
// carries one. A plate with two pins placed and the pointer back on the
// second inks less than a link started at the first pin with the pointer at
// the same place (the same dashed side, but measured).
TEST_F(DrawingTest, NoDimensionIsLeftOnTheCanvasAfterPlacing)
{
    const auto previewInk = [&] {
        QImage image(window.canvas()->size(), QImage::Format_ARGB32);
        image.fill(Qt::transparent);
        QPainter p(&image);
        window.canvas()->tool()->paintPreview(p);
        p.end();
        int inked = 0;
        for (int y = 0; y < image.height(); ++y)
            for (int x = 0; x < image.width(); ++x) inked += qAlpha(image.pixel(x, y)) > 0;
        return inked;
    };
    useTool("Link");
    click(0.0, 0.0);
    QTest::mouseMove(window.canvas(), at(0.1, 0.0));
    const int measuredSide = previewInk();
    QTest::keyClick(window.canvas(), Qt::Key_Escape);
    useTool("Plate");
    click(0.0, 0.0), click(0.1, 0.0);
    QTest::mouseMove(window.canvas(), at(0.1, 0.0));
    EXPECT_LT(previewInk(), measuredSide);
}

// Every part the tools make is named "<kind> <n>", the scheme the file reader
// uses for unnamed loads, with the smallest number not yet taken.
TEST_F(DrawingTest, PartsAreNamedInOneScheme)
{
    drawFourBar();
    useTool("Force");
    click(0.015, 0.02), click(0.015, 0.1);
    useTool("Plate");
    click(0.0, -0.1), click(0.1, -0.1), click(0.05, -0.15);
    QTest::keyClick(window.canvas(), Qt::Key_Return);
    std::set<std::string> names;
    for (const auto& j : mechanism().joints) names.insert(j.name);
    for (const auto& b : mechanism().bodies) names.insert(b.name);
    for (const auto& d : mechanism().drivers) names.insert(d.name);
    for (std::size_t i = 0; i < mechanism().loads.size(); ++i) names.insert(loadName(mechanism().loads[i], int(i)));
    const std::set<std::string> expected{"pin 1",  "pin 2",  "pin 3",  "pin 4",   "pin 5",   "pin 6",  "pin 7",
                                         "link 1", "link 2", "link 3", "plate 1", "motor 1", "force 1"};
    EXPECT_EQ(names, expected);

    // The form's heading says the kind once: "Link 1", not "Link link 1".
    useTool("Select");
    click(0.015, 0.02);
    auto* editor = window.findChild<PropertyEditor*>();
    editor->rebuildNow();
    QStringList headings;
    for (const QLabel* label : editor->findChildren<QLabel*>())
        if (label->text().startsWith(QStringLiteral("<b>"))) headings << label->text();
    EXPECT_TRUE(headings.contains(QStringLiteral("<b>Link 1</b>"))) << headings.join(", ").toStdString();

    // A force read from a file without a name gets the name the tool gave.
    const Mechanism read = parseMechanism(R"({"clevis": 1, "bodies": [{"name": "b"}],
        "joints": [{"name": "j", "type": "pin", "bodies": ["ground", "b"], "at": [0, 0]}],
        "loads": [{"type": "force", "body": "b", "at": [0, 0], "force": [1, 0]}]})")
                               .mechanism;
    Mechanism drawn = read;
    drawn.loads.clear();
    edits::addForce(drawn, {"b", {0, 0}}, {1, 0});
    EXPECT_EQ(loadName(drawn.loads[0], 0), loadName(read.loads[0], 0));
}

// What a tool has just placed is selected, so its properties are at hand: a
// new link's mass, a new force's value, a new motor's speed.
TEST_F(DrawingTest, APartJustPlacedIsSelected)
{
    drawFourBar();
    EXPECT_EQ(window.document()->selection().kind, Selection::Kind::Driver);  // the motor, placed last
    useTool("Link");
    click(0.17, 0.12), click(0.25, 0.2);
    Selection s = window.document()->selection();
    EXPECT_EQ(s.kind, Selection::Kind::Body);
    EXPECT_EQ(s.name.toStdString(), mechanism().bodies.back().name);
    useTool("Force");
    click(0.21, 0.16), click(0.21, 0.25);
    s = window.document()->selection();
    EXPECT_EQ(s.kind, Selection::Kind::Load);
    EXPECT_EQ(s.loadIndex, int(mechanism().loads.size()) - 1);
    useTool("Ground pin");
    click(0.3, 0.0);
    s = window.document()->selection();
    EXPECT_EQ(s.kind, Selection::Kind::Joint);
    EXPECT_EQ(s.name.toStdString(), mechanism().joints.back().name);
}

// After typing in a property field, a click on the canvas gives the canvas
// the keyboard: the tool keys and Esc work there again.
TEST_F(DrawingTest, AClickOnTheCanvasTakesTheKeyboardFromAPropertyField)
{
    drawFourBar();
    useTool("Select");
    click(0.015, 0.02);  // the crank
    auto* name = field<QLineEdit>("name");
    ASSERT_NE(name, nullptr);
    QApplication::setActiveWindow(&window);
    name->setFocus();
    ASSERT_TRUE(name->hasFocus());
    QTest::keyClicks(name, "crank");
    click(0.1, 0.08);  // the coupler: a new selection, and the form is rebuilt
    QCoreApplication::processEvents();
    QCoreApplication::processEvents();
    EXPECT_TRUE(window.canvas()->hasFocus())
        << (QApplication::focusWidget() ? QApplication::focusWidget()->objectName().toStdString()
                                        : std::string("nothing"));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_L);
    EXPECT_TRUE(window.tools()->action(QStringLiteral("Link"))->isChecked());
    click(0.1, -0.1);
    ASSERT_NE(window.canvas()->tool()->strokeStart(), std::nullopt);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Escape);
    EXPECT_EQ(window.canvas()->tool()->strokeStart(), std::nullopt);
}

}  // namespace
