// The free-body diagram in the window, offscreen, on the six-bar sample: its
// text is drawn no smaller than the interface's font; the wheel zooms about
// the pointer, a drag moves the drawing, scrubbing keeps the zoom and another
// body is shown whole; with no body selected a message sits in the middle.
#include "core/file/mechanism_file.h"
#include "render/free_body_painter.h"
#include "tests/recording_device.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/free_body_canvas.h"
#include "ui/results/free_body_view.h"

#include <QApplication>
#include <QCheckBox>
#include <QFontInfo>
#include <QPainter>
#include <QTest>

#include <gtest/gtest.h>

#include <cmath>
#include <memory>
#include <vector>

using namespace clevis;
using namespace clevis::ui;

namespace {

using DrawnText = test::RecordedText;

std::vector<DrawnText> textDrawnBy(QWidget& w)
{
    test::RecordingDevice device(w.size(), 96);
    QPainter p(&device);
    w.render(&p);
    p.end();
    return device.engine.texts;
}

class FreeBodyViewTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        doc.reset(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json").mechanism,
                  "dwell_six_bar.json");
        analysis = std::make_unique<AnalysisState>(&doc);
        analysis->waitForIdle();
        QCoreApplication::processEvents();
        ASSERT_TRUE(analysis->hasResult()) << analysis->errorText().toStdString();
        view = std::make_unique<FreeBodyView>(&doc, analysis.get());
        view->resize(420, 380);
        view->show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(view.get()));
        analysis->setCurrentStep(90);
    }

    void select(const char* body) { doc.setSelection({Selection::Kind::Body, body, -1}); }
    FreeBodyCanvas* canvas() const { return view->canvas(); }
    // Where the point `pixel` of the canvas falls in the free body's drawing,
    // in page units from the drawing's corner: the same point of the body at
    // any zoom and position.
    QPointF drawingPointAt(QPointF pixel) const
    {
        return (pixel - canvas()->origin() - canvas()->figure()->bodyDrawing().topLeft()) / canvas()->zoom();
    }
    void wheel(QPointF at, int notches)
    {
        QWheelEvent event(at, canvas()->mapToGlobal(at), QPoint(), QPoint(0, 120 * notches), Qt::NoButton,
                          Qt::NoModifier, Qt::NoScrollPhase, false);
        QApplication::sendEvent(canvas(), &event);
    }

    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;
    std::unique_ptr<FreeBodyView> view;
};

TEST_F(FreeBodyViewTest, TextIsNoSmallerThanTheInterfaceFont)
{
    select("coupler_plate");
    ASSERT_TRUE(view->diagram().has_value());
    const int interfacePixels = QFontInfo(view->font()).pixelSize();
    const std::vector<DrawnText> texts = textDrawnBy(*view);
    int diagramTexts = 0;
    for (const DrawnText& t : texts) {
        EXPECT_GE(t.pixels, interfacePixels - 0.5) << t.text.toStdString();
        diagramTexts += t.text.contains("ΣFx") || t.text.contains("coupler_plate") || t.text.contains("scale");
    }
    EXPECT_GE(diagramTexts, 3);  // the title, the equations and the scale bars were drawn
}

// As the view first shows each body, no two load labels cover each other:
// in the dock as a laptop screen lays it out, at the start of the cycle and
// scrubbed.
TEST_F(FreeBodyViewTest, LoadLabelsDoNotOverlapWhenFitted)
{
    view->resize(460, 290);
    for (const int step : {0, 90})
        for (const Body& body : doc.mechanism().bodies) {
            analysis->setCurrentStep(step);
            doc.setSelection({});
            select(body.name.c_str());
            std::vector<DrawnText> labels;
            for (const DrawnText& t : textDrawnBy(*view))
                if (t.text.contains(QStringLiteral("∠")) || t.text.endsWith(QStringLiteral(" cw")) ||
                    t.text.endsWith(QStringLiteral(" ccw")))
                    labels.push_back(t);
            ASSERT_GE(labels.size(), 2u) << body.name;
            for (std::size_t i = 0; i < labels.size(); ++i)
                for (std::size_t k = i + 1; k < labels.size(); ++k)
                    EXPECT_FALSE(labels[i].box.intersects(labels[k].box))
                        << body.name << " at step " << step << ": '" << labels[i].text.toStdString() << "' and '"
                        << labels[k].text.toStdString() << "'";
        }
}

// The texts of the two halves as drawn in the view: the free body's heading,
// load labels and scale bars, and the kinetic diagram's heading and labels.
struct Halves {
    std::vector<DrawnText> body, kinetic;
    QRectF bodyBox, kineticBox;  // round each half's texts
};

Halves halvesDrawnBy(QWidget& w)
{
    Halves h;
    for (const DrawnText& t : test::joinedRuns(textDrawnBy(w))) {
        const bool kinetic = t.text == "Kinetic diagram" || t.text.startsWith(QStringLiteral("m·a_G")) ||
                             t.text.startsWith(QStringLiteral("I_G·α:"));
        const bool label = t.text.contains(QStringLiteral("∠")) || t.text.endsWith(QStringLiteral(" cw")) ||
                           t.text.endsWith(QStringLiteral(" ccw"));
        const bool body = t.text == "Free body" || t.text.startsWith("force scale") ||
                          t.text.startsWith("drawing scale") || (label && !kinetic);
        if (kinetic) {
            h.kinetic.push_back(t);
            h.kineticBox |= t.box;
        } else if (body) {
            h.body.push_back(t);
            h.bodyBox |= t.box;
        }
    }
    return h;
}

// Fitted in a view taller than wide (a dock down the side of a laptop's
// screen), both halves are whole in the canvas and apart: the kinetic
// diagram is under the free body, not cut off at the right.
TEST_F(FreeBodyViewTest, BothHalvesAreWholeAndApartInANarrowTallView)
{
    view->resize(360, 740);
    for (const char* name : {"crank", "coupler_plate", "rocker", "finger_lever"}) {
        doc.setSelection({});
        select(name);
        const Halves h = halvesDrawnBy(*view);
        ASSERT_GE(h.kinetic.size(), 2u) << name;  // the heading and a label at least
        ASSERT_GE(h.body.size(), 4u) << name;
        const QRectF canvasArea = QRectF(canvas()->geometry()).adjusted(-0.5, -0.5, 0.5, 0.5);
        for (const auto* half : {&h.body, &h.kinetic})
            for (const DrawnText& t : *half)
                EXPECT_TRUE(canvasArea.contains(t.box)) << name << ": '" << t.text.toStdString() << "' cut off";
        EXPECT_FALSE(h.bodyBox.intersects(h.kineticBox)) << name;
        EXPECT_GT(h.kineticBox.top(), h.bodyBox.bottom()) << name << ": the kinetic diagram is under the free body";
    }
}

// In a wide view the kinetic diagram stays beside the free body, both whole.
TEST_F(FreeBodyViewTest, AWideViewKeepsTheHalvesSideBySide)
{
    view->resize(1400, 520);
    for (const char* name : {"crank", "coupler_plate", "rocker"}) {
        doc.setSelection({});
        select(name);
        const Halves h = halvesDrawnBy(*view);
        ASSERT_GE(h.kinetic.size(), 2u) << name;
        const QRectF canvasArea = QRectF(canvas()->geometry()).adjusted(-0.5, -0.5, 0.5, 0.5);
        EXPECT_TRUE(canvasArea.contains(h.bodyBox | h.kineticBox)) << name;
        EXPECT_GT(h.kineticBox.left(), h.bodyBox.left() + 0.5 * h.bodyBox.width()) << name;
        EXPECT_LT(h.kineticBox.top(), h.bodyBox.center().y()) << name << ": beside, not under";
    }
}

TEST_F(FreeBodyViewTest, NothingSelectedShowsAMessageInTheMiddle)
{
    doc.setSelection({});
    EXPECT_FALSE(view->diagram().has_value());
    ASSERT_TRUE(view->message().contains("Select a body")) << view->message().toStdString();
    bool drawn = false;
    for (const DrawnText& t : textDrawnBy(*view)) {
        if (!t.text.contains("Select a body")) continue;
        drawn = true;
        EXPECT_GT(t.at.y(), view->height() / 3.0);
        EXPECT_LT(t.at.y(), view->height() * 2 / 3.0);
    }
    EXPECT_TRUE(drawn);
}

TEST_F(FreeBodyViewTest, TheWheelZoomsAboutThePointer)
{
    select("coupler_plate");
    ASSERT_NE(canvas()->figure(), nullptr);
    const double before = canvas()->zoom();
    const QPointF pointer = canvas()->origin() + canvas()->figure()->bodyDrawing().center() + QPointF(30, -20);
    const QPointF underPointer = drawingPointAt(pointer);
    wheel(pointer, 2);
    EXPECT_NEAR(canvas()->zoom(), before * 1.25 * 1.25, 1e-9 * before);
    EXPECT_NEAR(drawingPointAt(pointer).x(), underPointer.x(), 1e-6);
    EXPECT_NEAR(drawingPointAt(pointer).y(), underPointer.y(), 1e-6);
    EXPECT_NEAR(canvas()->figure()->options().zoom, canvas()->zoom(), 1e-12);  // the drawing follows
    wheel(pointer, -1);
    EXPECT_NEAR(canvas()->zoom(), before * 1.25, 1e-9 * before);
    EXPECT_NEAR(drawingPointAt(pointer).x(), underPointer.x(), 1e-6);
}

// What the view's zoom rests on: the drawing's corner stays where it is at
// any zoom and its size grows in proportion, while the text keeps its size.
TEST_F(FreeBodyViewTest, ThePaintersDrawingGrowsFromAFixedCorner)
{
    select("coupler_plate");
    const FreeBodyPainter& shown = *canvas()->figure();
    FreeBodyPaintOptions options = shown.options();
    options.zoom = 1;
    const FreeBodyPainter one(analysis->compiled(), analysis->result(), shown.diagram(), options);
    options.zoom = 3;
    const FreeBodyPainter three(analysis->compiled(), analysis->result(), shown.diagram(), options);
    EXPECT_EQ(one.bodyDrawing().topLeft(), three.bodyDrawing().topLeft());
    EXPECT_NEAR(three.bodyDrawing().width(), 3 * one.bodyDrawing().width(), 1e-9);
    EXPECT_NEAR(three.bodyDrawing().height(), 3 * one.bodyDrawing().height(), 1e-9);
}

TEST_F(FreeBodyViewTest, ADragMovesTheDrawing)
{
    select("coupler_plate");
    const QPointF before = canvas()->origin();
    const double zoom = canvas()->zoom();
    QTest::mousePress(canvas(), Qt::LeftButton, {}, QPoint(100, 100));
    QMouseEvent move(QEvent::MouseMove, QPointF(160, 70), canvas()->mapToGlobal(QPointF(160, 70)), Qt::NoButton,
                     Qt::LeftButton, {});
    QApplication::sendEvent(canvas(), &move);
    QTest::mouseRelease(canvas(), Qt::LeftButton, {}, QPoint(160, 70));
    EXPECT_EQ(canvas()->origin(), before + QPointF(60, -30));
    EXPECT_EQ(canvas()->zoom(), zoom);
}

TEST_F(FreeBodyViewTest, ScrubbingKeepsTheZoomAndAnotherBodyIsShownWhole)
{
    select("coupler_plate");
    const double fitted = canvas()->zoom();
    canvas()->zoomIn();
    canvas()->zoomIn();
    const double zoomed = canvas()->zoom();
    const QPointF origin = canvas()->origin();
    ASSERT_GT(zoomed, fitted * 1.5);
    analysis->setCurrentStep(200);
    ASSERT_EQ(view->diagram()->step, 200);
    EXPECT_EQ(canvas()->figure()->diagram().step, 200);
    EXPECT_EQ(canvas()->zoom(), zoomed);
    EXPECT_EQ(canvas()->origin(), origin);

    select("rocker");
    ASSERT_EQ(view->diagram()->bodyName, "rocker");
    const double refitted = canvas()->zoom();
    EXPECT_LT(refitted, zoomed / 1.5);
    // Shown whole: the free-body panel inside the canvas.
    const QRectF panel = canvas()->figure()->bodyPanel().translated(canvas()->origin());
    EXPECT_TRUE(QRectF(canvas()->rect()).adjusted(-0.5, -0.5, 0.5, 0.5).contains(panel));
    canvas()->fit();
    EXPECT_NEAR(canvas()->zoom(), refitted, 1e-12);
}

TEST_F(FreeBodyViewTest, InertiaLoadsOnTheBodyStillDrawn)
{
    select("coupler_plate");
    view->findChild<QCheckBox*>()->setChecked(true);
    ASSERT_TRUE(canvas()->figure()->options().dAlembert);
    bool inertia = false;
    for (const DrawnText& t : textDrawnBy(*view)) inertia = inertia || t.text.startsWith("−m·a_G");
    EXPECT_TRUE(inertia);
}

}  // namespace
