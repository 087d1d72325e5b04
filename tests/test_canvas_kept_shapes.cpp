// The canvas keeps each body's drawn shape between paints and makes it again
// only when the body moves on screen. Whatever moves it — an edit, the shown
// step of the cycle, a zoom — the canvas must then look exactly as one that
// never painted before.
#include "tests/canvas_fixture.h"
#include "ui/analysis/analysis_state.h"
#include "ui/canvas/tools/select_tool.h"

#include <memory>
#include <vector>

using namespace clevis;
using namespace clevis::ui;
using clevis::ui::test::CanvasTest;

namespace {

TEST_F(CanvasTest, KeptBodyShapesFollowAnEditTheShownStepAndTheView)
{
    drawFourBar();
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(window.analysis()->hasResult());
    CanvasView* canvas = window.canvas();
    canvas->setTool(std::make_unique<SelectTool>(*canvas));  // no tool's preview in either picture
    canvas->fitToView();
    // Canvases that have drawn nothing yet, each fitted now to the same view
    // and shown (so painted) only when compared: they keep no shape.
    std::vector<std::unique_ptr<CanvasView>> fresh;
    for (int i = 0; i < 4; ++i) {
        fresh.push_back(std::make_unique<CanvasView>(window.document(), window.analysis()));
        fresh.back()->resize(canvas->size());
        fresh.back()->fitToView();
    }
    double zoom = 1.0;
    std::size_t used = 0;
    const auto expectAsDrawnAfresh = [&](const char* after) {
        const QImage kept = canvas->grab().toImage().convertToFormat(QImage::Format_RGB32);
        CanvasView& other = *fresh[used++];
        other.zoomBy(zoom);
        other.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&other));
        ASSERT_EQ(other.view().toScreen({0.1, 0.1}), canvas->view().toScreen({0.1, 0.1})) << after;
        EXPECT_EQ(kept, other.grab().toImage().convertToFormat(QImage::Format_RGB32)) << "after " << after;
    };
    canvas->grab();  // the shapes made once, at the drawn pose

    window.document()->apply("Move pin 4", [](Mechanism& m) { m.joints[3].at = {0.15, 0.10}; });
    window.analysis()->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(window.analysis()->errorText().isEmpty()) << window.analysis()->errorText().toStdString();
    expectAsDrawnAfresh("an edit");

    window.analysis()->setCurrentStep(window.analysis()->currentStep() + 30);
    expectAsDrawnAfresh("a new shown step");

    zoom = 1.25;
    canvas->zoomBy(zoom);
    expectAsDrawnAfresh("a zoom");

    window.analysis()->setCurrentStep(0);
    expectAsDrawnAfresh("the start of the cycle again");
}

}  // namespace
