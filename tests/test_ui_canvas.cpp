// The canvas driven with mouse events: a four-bar drawn from nothing with the
// tools, a motor added, a mass typed in, saved, reopened and compared with the
// expected file; the status line must report one degree of freedom and a
// mechanism that solves.
#include "core/file/mechanism_file.h"
#include "core/results/posed_mechanism.h"
#include "tests/canvas_fixture.h"
#include "ui/analysis/analysis_state.h"
#include "ui/canvas/canvas_view.h"
#include "ui/canvas/driver_symbol.h"
#include "ui/canvas/hit_test.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/snapping.h"
#include "ui/canvas/tool_palette.h"
#include "ui/canvas/tools/select_tool.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/sketch_geometry.h"
#include "ui/files/file_actions.h"
#include "ui/panels/property_editor.h"
#include "ui/panels/status_line.h"
#include "ui/shell/display_units.h"
#include "ui/shell/main_window.h"

#include <QAction>
#include <QComboBox>
#include <QDir>
#include <QFileInfo>
#include <QLabel>
#include <QLineEdit>
#include <QPainter>
#include <QScreen>
#include <QTemporaryDir>
#include <QTest>
#include <QWindow>

#include <gtest/gtest.h>

using namespace clevis;
using namespace clevis::ui;
using clevis::ui::test::CanvasTest;

namespace {

TEST_F(CanvasTest, DrawAFourBarSetAMassSaveAndReopen)
{
    drawFourBar();
    ASSERT_EQ(mechanism().bodies.size(), 3u);
    ASSERT_EQ(mechanism().joints.size(), 4u);
    ASSERT_EQ(mechanism().drivers.size(), 1u);

    useTool("Select");
    click(0.015, 0.02);  // the middle of the crank
    ASSERT_EQ(window.document()->selection().kind, Selection::Kind::Body);
    ASSERT_EQ(window.document()->selection().name.toStdString(), "link 1");
    auto* source = field<QComboBox>("massSource");
    ASSERT_NE(source, nullptr);
    emit source->activated(1);  // typed values
    auto* mass = field<QLineEdit>("mass");
    ASSERT_NE(mass, nullptr);
    mass->setFocus();
    mass->selectAll();
    QTest::keyClicks(mass, "2.5");
    QTest::keyClick(mass, Qt::Key_Return);
    ASSERT_EQ(mechanism().bodies[0].mass, 2.5);

    QTemporaryDir dir;
    const QString path = dir.filePath("drawn.json");
    QString error;
    ASSERT_TRUE(window.files()->saveTo(path, &error)) << error.toStdString();
    EXPECT_FALSE(window.document()->isModified());
    window.document()->reset({}, {});
    ASSERT_TRUE(window.files()->open(path, &error)) << error.toStdString();

    const Mechanism expected = loadMechanismFile(CLEVIS_TEST_DATA "/drawn_four_bar.json").mechanism;
    EXPECT_EQ(mechanismToJson(mechanism()).dump(2), mechanismToJson(expected).dump(2));

    AnalysisState* analysis = window.analysis();
    analysis->waitForIdle();
    EXPECT_TRUE(analysis->errorText().isEmpty()) << analysis->errorText().toStdString();
    ASSERT_TRUE(analysis->mobility().has_value());
    EXPECT_EQ(analysis->mobility()->mobility, 1);
    EXPECT_EQ(analysis->mobility()->drivers, 1);
    ASSERT_TRUE(analysis->hasResult());
    EXPECT_TRUE(analysis->result().complete);
    const QString status = window.statusLine()->analysisText();
    EXPECT_TRUE(status.contains("1 degree of freedom")) << status.toStdString();
    EXPECT_TRUE(status.contains("1 driver")) << status.toStdString();
    EXPECT_TRUE(status.contains("Solves over the whole cycle")) << status.toStdString();
    // Its links were drawn without mass: the analysis's warning is on the line too.
    EXPECT_TRUE(status.contains("No mass is given for")) << status.toStdString();
}

TEST_F(CanvasTest, WithoutAMotorTheStatusSaysItDoesNotSolve)
{
    drawFourBar();
    window.document()->undoStack()->undo();  // the motor
    window.analysis()->waitForIdle();
    const QString status = window.statusLine()->analysisText();
    EXPECT_TRUE(status.contains("1 degree of freedom, 0 drivers")) << status.toStdString();
    EXPECT_TRUE(status.contains("Does not solve")) << status.toStdString();
}

TEST_F(CanvasTest, DraggingAPinIsOneUndoStepAndTheLinksFollow)
{
    drawFourBar();
    useTool("Select");
    const int steps = window.document()->undoStack()->count();
    QTest::mousePress(window.canvas(), Qt::LeftButton, {}, at(0.17, 0.12));
    for (double x : {0.172, 0.175, 0.18}) dragTo(x, 0.13);
    QTest::mouseRelease(window.canvas(), Qt::LeftButton, {}, at(0.18, 0.13));
    EXPECT_EQ(window.document()->undoStack()->count(), steps + 1);
    const Joint& moved = mechanism().joints[jointIndex(mechanism(), "pin 4")];
    EXPECT_NEAR(moved.at.x(), 0.18, 1e-12);  // snapped to the grid
    EXPECT_NEAR(moved.at.y(), 0.13, 1e-12);
    const auto coupler = bodyPins(mechanism(), "link 2");
    EXPECT_NEAR(coupler[1].x(), 0.18, 1e-12);
    window.document()->undoStack()->undo();
    EXPECT_NEAR(mechanism().joints[jointIndex(mechanism(), "pin 4")].at.x(), 0.17, 1e-12);
}

// Esc puts the pin back and leaves no step behind: neither to undo nor to redo.
TEST_F(CanvasTest, EscapeDuringADragLeavesNoUndoStep)
{
    drawFourBar();
    useTool("Select");
    const Mechanism before = mechanism();
    QUndoStack* stack = window.document()->undoStack();
    const int steps = stack->count();
    QTest::mousePress(window.canvas(), Qt::LeftButton, {}, at(0.17, 0.12));
    for (double x : {0.175, 0.18}) dragTo(x, 0.13);
    ASSERT_NE(mechanism(), before);
    QTest::keyClick(window.canvas(), Qt::Key_Escape);
    QTest::mouseRelease(window.canvas(), Qt::LeftButton, {}, at(0.18, 0.13));
    EXPECT_EQ(mechanism(), before);
    EXPECT_FALSE(stack->canRedo()) << stack->redoText().toStdString();
    EXPECT_EQ(stack->count(), steps);
    EXPECT_EQ(stack->undoText().toStdString(), "Add motor motor 1");
}

TEST_F(CanvasTest, EscapeCancelsALinkHalfDrawn)
{
    useTool("Ground pin");
    click(0.0, 0.0);
    useTool("Link");
    click(0.0, 0.0);
    QTest::keyClick(window.canvas(), Qt::Key_Escape);
    click(0.05, 0.05);  // starts a new link instead of finishing the cancelled one
    EXPECT_TRUE(mechanism().bodies.empty());
}

// A click just outside a pin's reach whose grid point is that pin draws to the
// pin; it must not stack a second, unconnected pin on it.
TEST_F(CanvasTest, AGridPointOnAPinIsThatPin)
{
    useTool("Ground pin");
    click(0.0, 0.0);
    const int offset = int(kSnapPixels) + 2;
    // Zoom until half a grid step is wider than the offset, so the grid point is the pin's.
    const auto halfStep = [&] { return window.canvas()->view().pixels(gridSpacing(window.canvas()->view())) / 2.0; };
    for (int i = 0; i < 30 && halfStep() <= offset; ++i) window.canvas()->zoomBy(1.1);
    ASSERT_GT(halfStep(), offset);
    useTool("Link");
    QTest::mouseClick(window.canvas(), Qt::LeftButton, {}, at(0.0, 0.0) + QPoint(offset, 0));
    click(0.06, 0.04);
    ASSERT_EQ(mechanism().bodies.size(), 1u);
    EXPECT_EQ(jointsAt(mechanism(), Vec2(0.0, 0.0), 1e-9).size(), 1u);
    EXPECT_EQ(mechanism().joints[0].bodies[1], mechanism().bodies[0].name);
}

// With the cycle scrubbed, a click picks the part where it is drawn now and
// keeps the position; a drawing tool goes back to the drawn pose and says so.
TEST_F(CanvasTest, ClickingInTheScrubbedPosePicksWhatIsDrawnAndKeepsThePosition)
{
    drawFourBar();
    AnalysisState* analysis = window.analysis();
    analysis->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(analysis->hasResult()) << analysis->errorText().toStdString();
    useTool("Select");
    analysis->setCurrentStep(120);
    // The rocker (third link, between the second pin and the second ground
    // pin) at step 120, half-way along: far from where it was drawn.
    const Mechanism posed = posedMechanism(mechanism(), analysis->compiled(), analysis->result().steps[120]);
    const Vec2 mid = 0.5 * (posed.joints[3].at + posed.joints[1].at);
    const Vec2 drawnMid = 0.5 * (mechanism().joints[3].at + mechanism().joints[1].at);
    ASSERT_GT((mid - drawnMid).norm(), 0.01);
    click(mid.x(), mid.y());
    EXPECT_EQ(analysis->currentStep(), 120);
    EXPECT_EQ(window.document()->selection().kind, Selection::Kind::Body);
    EXPECT_EQ(window.document()->selection().name.toStdString(), mechanism().bodies[2].name);

    useTool("Pin");
    click(0.1, -0.1);
    EXPECT_EQ(analysis->currentStep(), 0);
}

// An opened file is fitted, once solved, around every position it moves
// through, not only the pose it was drawn in.
TEST_F(CanvasTest, AnOpenedFileIsFittedToItsWholeRangeOfMotion)
{
    for (const char* sample : {"punch_press", "tipping_bed", "tote_arm", "flap_folder", "dwell_six_bar"}) {
        QString error;
        ASSERT_TRUE(window.files()->open(QStringLiteral(CLEVIS_SAMPLES_DIR "/%1.json").arg(sample), &error))
            << error.toStdString();
        AnalysisState* analysis = window.analysis();
        analysis->waitForIdle();
        QCoreApplication::processEvents();
        ASSERT_TRUE(analysis->hasResult()) << sample << ": " << analysis->errorText().toStdString();
        const QRectF visible = window.canvas()->rect();
        for (const StepResult& step : analysis->result().steps)
            for (const Joint& j : posedMechanism(mechanism(), analysis->compiled(), step).joints)
                EXPECT_TRUE(visible.contains(window.canvas()->view().toScreen(j.at)))
                    << sample << ": " << j.name << " at t = " << step.t;
    }
}

// On a laptop-sized canvas the six-bar's labels (bodies, pins, the motor,
// the spring, the point mass) neither cover each other nor leave the canvas.
TEST_F(CanvasTest, LabelsNeitherOverlapNorLeaveTheCanvas)
{
    window.resize(1366, 768);
    QString error;
    ASSERT_TRUE(window.files()->open(QStringLiteral(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json"), &error))
        << error.toStdString();
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    window.canvas()->fitToView();
    const QRect area = window.canvas()->rect();
    QImage image(area.size(), QImage::Format_ARGB32);
    QPainter p(&image);
    LabelPlacer labels(area, labelFont(window.canvas()->font()));
    PaintContext c{p, window.canvas()->view(), mechanism(), {}, {}, labels};
    paintSketch(c);
    const std::vector<QRectF> boxes = labels.placedBoxes();
    ASSERT_GE(boxes.size(), mechanism().bodies.size() + mechanism().drivers.size());
    for (std::size_t i = 0; i < boxes.size(); ++i) {
        EXPECT_TRUE(QRectF(area).contains(boxes[i])) << "label " << i;
        for (std::size_t k = i + 1; k < boxes.size(); ++k)
            EXPECT_FALSE(boxes[i].intersects(boxes[k])) << "labels " << i << " and " << k;
    }
}

TEST_F(CanvasTest, TheCursorReadoutShowsTheSnappedPointInDisplayUnits)
{
    auto* readout = window.findChild<QLabel*>(QStringLiteral("cursorReadout"));
    ASSERT_TRUE(readout);
    const int width = readout->width();
    QTest::mouseMove(window.canvas(), at(0.12, -0.03));
    EXPECT_EQ(readout->text().toStdString(), "x 120.00  y -30.00 mm (on grid)");
    QTest::mouseMove(window.canvas(), at(-0.0321, 0.0456));
    EXPECT_EQ(readout->width(), width);  // moving never resizes the status bar
}

TEST_F(CanvasTest, APointNearlyLevelWithTheStartSnapsLevel)
{
    useTool("Link");
    click(0.0, 0.0);
    // 2 px above the start's level, off the grid in x: lands level, on the grid in x.
    const QPoint p = at(0.1234, 0.0) - QPoint(0, 2);
    QTest::mouseClick(window.canvas(), Qt::LeftButton, {}, p);
    ASSERT_EQ(mechanism().joints.size(), 2u);
    EXPECT_DOUBLE_EQ(mechanism().joints[1].at.y(), 0.0);
}

TEST_F(CanvasTest, EditNamesAreReadableInTheUndoStack)
{
    drawFourBar();
    EXPECT_EQ(window.document()->undoStack()->undoText().toStdString(), "Add motor motor 1");
    window.document()->undoStack()->undo();
    EXPECT_EQ(window.document()->undoStack()->undoText().toStdString(), "Add link");
}

// A save that cannot be written (here: a folder stands where the file
// should go) says so, keeps the document unsaved and leaves what was there;
// a good save keeps the previous file as NAME.bak.
TEST_F(CanvasTest, AFailedSaveKeepsTheDocumentUnsavedAndAGoodOneKeepsABackup)
{
    window.document()->reset(loadMechanismFile(CLEVIS_TEST_DATA "/drawn_four_bar.json").mechanism, {});
    window.document()->apply("Rename", [](Mechanism& m) { m.name = "edited"; });
    ASSERT_TRUE(window.document()->isModified());
    QTemporaryDir dir;
    const QString blocked = dir.filePath("blocked.json");
    ASSERT_TRUE(QDir().mkdir(blocked));
    QString error;
    EXPECT_FALSE(window.files()->saveTo(blocked, &error));
    EXPECT_TRUE(error.contains("blocked.json")) << error.toStdString();
    EXPECT_TRUE(window.document()->isModified());
    EXPECT_TRUE(QFileInfo(blocked).isDir());

    const QString path = dir.filePath("press.json");
    ASSERT_TRUE(window.files()->saveTo(path, &error)) << error.toStdString();
    window.document()->apply("Rename", [](Mechanism& m) { m.name = "edited again"; });
    ASSERT_TRUE(window.files()->saveTo(path, &error)) << error.toStdString();
    EXPECT_FALSE(window.document()->isModified());
    EXPECT_EQ(loadMechanismFile((path + ".bak").toStdString()).mechanism.name, "edited");
    EXPECT_EQ(loadMechanismFile(path.toStdString()).mechanism.name, "edited again");
}

// The grid is kept as a picture between paints: after a zoom and a pan the
// canvas must look exactly as one drawn afresh at that view.
TEST_F(CanvasTest, TheGridFollowsZoomAndPan)
{
    drawFourBar();
    window.analysis()->waitForIdle();  // both fits round the same solved cycle
    CanvasView* canvas = window.canvas();
    canvas->setTool(std::make_unique<SelectTool>(*canvas));  // no tool's preview in either picture
    canvas->fitToView();
    canvas->grab();  // the grid drawn once at the fitted view
    canvas->zoomBy(1.25);
    QMouseEvent press(QEvent::MouseButtonPress, QPointF(300, 300), canvas->mapToGlobal(QPointF(300, 300)),
                      Qt::MiddleButton, Qt::MiddleButton, {});
    QApplication::sendEvent(canvas, &press);
    QMouseEvent move(QEvent::MouseMove, QPointF(337, 311), canvas->mapToGlobal(QPointF(337, 311)), Qt::NoButton,
                     Qt::MiddleButton, {});
    QApplication::sendEvent(canvas, &move);
    QMouseEvent release(QEvent::MouseButtonRelease, QPointF(337, 311), canvas->mapToGlobal(QPointF(337, 311)),
                        Qt::MiddleButton, Qt::NoButton, {});
    QApplication::sendEvent(canvas, &release);
    const QImage kept = canvas->grab().toImage();

    CanvasView fresh(window.document(), window.analysis());
    fresh.resize(canvas->size());
    fresh.show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(&fresh));
    // The same view, reached without a picture of the grid on hand (the same fit, zoom and pan).
    fresh.fitToView();
    fresh.zoomBy(1.25);
    QMouseEvent press2(QEvent::MouseButtonPress, QPointF(300, 300), fresh.mapToGlobal(QPointF(300, 300)),
                       Qt::MiddleButton, Qt::MiddleButton, {});
    QApplication::sendEvent(&fresh, &press2);
    QMouseEvent move2(QEvent::MouseMove, QPointF(337, 311), fresh.mapToGlobal(QPointF(337, 311)), Qt::NoButton,
                      Qt::MiddleButton, {});
    QApplication::sendEvent(&fresh, &move2);
    ASSERT_EQ(fresh.size(), canvas->size());
    ASSERT_EQ(fresh.view().toScreen({0.1, 0.1}), canvas->view().toScreen({0.1, 0.1}));
    // As pixels (a widget in a window and one on its own may grab to different formats).
    EXPECT_EQ(kept.convertToFormat(QImage::Format_RGB32), fresh.grab().toImage().convertToFormat(QImage::Format_RGB32));
}

// Counts the events of one type that reach a widget.
class EventCount : public QObject {
public:
    EventCount(QObject* watched, QEvent::Type type) : type_(type) { watched->installEventFilter(this); }
    int count = 0;

protected:
    bool eventFilter(QObject*, QEvent* e) override
    {
        if (e->type() == type_) ++count;
        return false;
    }

private:
    QEvent::Type type_;
};

// A drag edits at every move of the mouse, and a result follows each edit.
// The canvas draws the pin where it now is once: the result blames nothing
// and the cycle is at its start, so it adds nothing to the picture. The
// selected pin's form shows the result's forces, so it is built once, when
// the result comes, and then shows the pin where it now is.
TEST_F(CanvasTest, EachMoveOfADragPaintsTheCanvasAndBuildsThePinsFormOnce)
{
    drawFourBar();
    useTool("Select");
    window.analysis()->waitForIdle();
    QTest::mousePress(window.canvas(), Qt::LeftButton, {}, at(0.17, 0.12));
    ASSERT_EQ(window.document()->selection().name.toStdString(), "pin 4");
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    auto* editor = window.findChild<PropertyEditor*>();
    EventCount paints(window.canvas(), QEvent::Paint);
    EventCount forms(editor->viewport(), QEvent::ChildAdded);  // each form built is a new page in the editor
    for (const double x : {0.18, 0.19}) {
        const int paintsBefore = paints.count, formsBefore = forms.count;
        dragTo(x, 0.12);
        window.analysis()->waitForIdle();
        QCoreApplication::sendPostedEvents();
        QCoreApplication::processEvents();
        ASSERT_TRUE(window.analysis()->errorText().isEmpty()) << window.analysis()->errorText().toStdString();
        EXPECT_EQ(paints.count - paintsBefore, 1) << "at x = " << x;
        EXPECT_EQ(forms.count - formsBefore, 1) << "at x = " << x;
        const auto* shownX = editor->findChild<QLineEdit*>(QStringLiteral("atX"));
        ASSERT_NE(shownX, nullptr);
        EXPECT_NEAR(DisplayUnits::instance().lengthToSi(shownX->text().toDouble()), x, 1e-9)
            << shownX->text().toStdString();
    }
    QTest::mouseRelease(window.canvas(), Qt::LeftButton, {}, at(0.19, 0.12));
}

// A plain pin's form shows nothing solved, so neither a new shown step nor a
// new result builds it again; it is built for the edit itself.
TEST_F(CanvasTest, APlainPinsFormIsNotBuiltAgainForTheShownStep)
{
    drawFourBar();
    useTool("Select");
    window.analysis()->waitForIdle();
    click(0.17, 0.12);
    ASSERT_EQ(window.document()->selection().name.toStdString(), "pin 4");
    window.analysis()->waitForIdle();
    QTest::qWait(50);  // the form for the selection is built
    auto* editor = window.findChild<PropertyEditor*>();
    EventCount forms(editor->viewport(), QEvent::ChildAdded);  // each form built is a new page in the editor
    window.analysis()->setCurrentStep(window.analysis()->currentStep() + 10);
    QTest::qWait(50);
    EXPECT_EQ(forms.count, 0);
}

// The labels are kept between paints while the drawing and the view stay as
// they are (a paint for a selection places none). After a pin is moved the
// canvas must look exactly as one that never placed a label before the edit.
TEST_F(CanvasTest, LabelsKeptBetweenPaintsFollowAnEdit)
{
    drawFourBar();
    useTool("Select");
    window.analysis()->waitForIdle();
    CanvasView* canvas = window.canvas();
    canvas->fitToView();
    CanvasView fresh(window.document(), window.analysis());
    fresh.resize(canvas->size());
    fresh.fitToView();  // the same view, while hidden: nothing painted, no label placed
    canvas->grab();
    window.document()->setSelection({Selection::Kind::Body, QStringLiteral("link 2"), -1});
    canvas->grab();
    window.document()->apply("Move pin 4", [](Mechanism& m) { m.joints[3].at = {0.15, 0.10}; });
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(window.analysis()->errorText().isEmpty()) << window.analysis()->errorText().toStdString();
    const QImage kept = canvas->grab().toImage();
    fresh.show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(&fresh));
    ASSERT_EQ(fresh.view().toScreen({0.1, 0.1}), canvas->view().toScreen({0.1, 0.1}));
    EXPECT_EQ(kept.convertToFormat(QImage::Format_RGB32), fresh.grab().toImage().convertToFormat(QImage::Format_RGB32));
}

// A new selection repaints only round the halos of the part selected before
// and the one selected now. What the screen then shows must be the canvas
// drawn afresh: no halo left behind, none cut short.
TEST_F(CanvasTest, ASelectionRepaintsWhatItsHalosCover)
{
    drawFourBar();
    useTool("Select");
    window.analysis()->waitForIdle();
    CanvasView* canvas = window.canvas();
    canvas->fitToView();
    window.document()->setSelection({});
    const auto onScreen = [&] {
        QCoreApplication::processEvents();
        const QPoint corner = canvas->mapTo(&window, QPoint(0, 0));
        return window.windowHandle()
            ->screen()
            ->grabWindow(window.winId(), corner.x(), corner.y(), canvas->width(), canvas->height())
            .toImage()
            .convertToFormat(QImage::Format_RGB32);
    };
    const auto drawnAfresh = [&] { return canvas->grab().toImage().convertToFormat(QImage::Format_RGB32); };
    const QImage none = onScreen();
    ASSERT_EQ(none, drawnAfresh()) << "the screen must show the canvas for this test to compare anything";
    for (const Selection& s : {Selection{Selection::Kind::Body, QStringLiteral("link 2"), -1},
                               Selection{Selection::Kind::Joint, QStringLiteral("pin 4"), -1},
                               Selection{Selection::Kind::Body, QStringLiteral("link 3"), -1}, Selection{}}) {
        window.document()->setSelection(s);
        const QImage shown = onScreen();
        EXPECT_EQ(shown, drawnAfresh()) << s.name.toStdString();
        EXPECT_EQ(shown == none, s.kind == Selection::Kind::None) << s.name.toStdString();
    }
}

}  // namespace

// A motor's arc leaves a gap where its crank is, so a short crank can be
// picked along its whole length; the rest of the arc picks the motor, and the
// arc turns the way the motor does.
TEST(MotorSymbol, LeavesItsCrankFreeToPickAndTurnsWithTheMotor)
{
    Mechanism m = loadMechanismFile(CLEVIS_TEST_DATA "/drawn_four_bar.json").mechanism;
    m.joints[2].at = {-0.04, 0.03};  // the crank points up and to the left, 50 mm long
    ViewTransform view;
    view.zoomAt(view.toScreen({0, 0}), 0.43);  // 43 px: a short crank on screen
    const QPointF pin = view.toScreen({0, 0});
    const QPointF alongCrank = (view.toScreen({-0.04, 0.03}) - pin) / 50.0;  // 1 mm along it, in px

    // The crank's middle lies on the motor's circle of kMotorRadius.
    const QPointF middle = pin + alongCrank * 25;
    ASSERT_NEAR(QLineF(pin, middle).length(), 21.5, 0.1);
    EXPECT_EQ(partAt(m, view, middle), (Selection{Selection::Kind::Body, "link 1", -1}));
    EXPECT_EQ(partAt(m, view, pin - alongCrank * 17 / 21.5 * 25),  // opposite the crank, on the arc
              (Selection{Selection::Kind::Driver, "motor 1", -1}));

    const auto forwards = motorArc(m, view, m.drivers[0]);
    ASSERT_TRUE(forwards);
    EXPECT_GT(forwards->spanDeg, 0);  // 60 rpm: counter-clockwise
    std::get<ConstantSpeed>(m.drivers[0].motion).speed *= -1;
    const auto backwards = motorArc(m, view, m.drivers[0]);
    ASSERT_TRUE(backwards);
    EXPECT_LT(backwards->spanDeg, 0);
    EXPECT_EQ(partAt(m, view, middle), (Selection{Selection::Kind::Body, "link 1", -1}));

    // The driver turns the joint's second body against its first: with the
    // crank first and the frame second, the crank turns the other way.
    std::swap(m.joints[0].bodies[0], m.joints[0].bodies[1]);
    ASSERT_EQ(m.joints[0].bodies[1], kGroundName);
    const auto crankFirst = motorArc(m, view, m.drivers[0]);
    ASSERT_TRUE(crankFirst);
    EXPECT_GT(crankFirst->spanDeg, 0);
}
