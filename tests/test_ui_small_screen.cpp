// The default layout on a laptop screen (1366 × 768) and a desktop one
// (1920 × 1080), offscreen, with a body of a sample selected: the free-body
// view shows the free body and its kinetic diagram both whole at a readable
// zoom, while the canvas keeps a usable size and the plots one whole pane;
// on the larger screen nothing is smaller than the layout gave before.
#include "render/free_body_painter.h"
#include "ui/analysis/analysis_state.h"
#include "ui/canvas/canvas_view.h"
#include "ui/document/mechanism_document.h"
#include "ui/files/file_actions.h"
#include "ui/results/free_body_canvas.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/main_window.h"

#include <QDockWidget>
#include <QScrollArea>
#include <QTest>

#include <gtest/gtest.h>

#include <string>

using namespace clevis::ui;

namespace {

struct Case {
    const char* sample;
    const char* body;
    int step;
};

const Case kCases[] = {
    {"dwell_six_bar", "coupler_plate", 120}, {"punch_press", "crankshaft", 0}, {"tote_arm", "forearm", 90}};

std::string text(const QRectF& r)
{
    return std::to_string(int(r.x())) + "," + std::to_string(int(r.y())) + " " + std::to_string(int(r.width())) + "×" +
           std::to_string(int(r.height()));
}

class SmallScreen : public ::testing::TestWithParam<QSize> {
protected:
    void show(const Case& c)
    {
        window.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&window));
        window.placeOn(QRect(QPoint(0, 0), GetParam()));
        QString error;
        ASSERT_TRUE(window.files()->open(QStringLiteral(CLEVIS_SAMPLES_DIR "/%1.json").arg(c.sample), &error))
            << error.toStdString();
        window.analysis()->waitForIdle();
        window.analysis()->setCurrentStep(c.step);
        window.document()->setSelection({Selection::Kind::Body, QString::fromLatin1(c.body), -1});
        QCoreApplication::processEvents();
    }

    QWidget* plotsView() const
    {
        auto* plots = window.findChild<QDockWidget*>(QStringLiteral("plotsDock"));
        return plots ? plots->findChild<QScrollArea*>()->viewport() : nullptr;
    }

    MainWindow window;
};

TEST_P(SmallScreen, TheFreeBodyAndItsKineticDiagramShowWholeAndReadable)
{
    for (const Case& c : kCases) {
        show(c);
        const std::string what = std::string(c.sample) + " " + c.body;
        const FreeBodyCanvas* view = window.findChild<FreeBodyCanvas*>();
        ASSERT_NE(view, nullptr);
        ASSERT_NE(view->figure(), nullptr) << what;
        const FreeBodyPainter& f = *view->figure();
        ASSERT_FALSE(f.kineticHalf().isEmpty()) << what;
        const QRectF halves = f.bodyHalf().united(f.kineticHalf()).translated(view->origin());
        EXPECT_TRUE(QRectF(view->rect()).contains(halves))
            << what << ": halves " << text(halves) << " in a view of " << view->width() << "×" << view->height();
        EXPECT_GE(view->zoom(), FreeBodyPainter::kReadableZoom * view->textScale() - 1e-9) << what;
    }
}

TEST_P(SmallScreen, TheCanvasAndThePlotsKeepTheirRoom)
{
    show(kCases[0]);
    const QSize canvas = window.canvas()->size();
    EXPECT_GE(canvas.width(), 480);
    EXPECT_GE(canvas.height(), 300);
    ASSERT_NE(plotsView(), nullptr);
    EXPECT_GE(plotsView()->height(), PlotStack::kPaneHeight);
    if (GetParam().height() < 1000) return;
    // As large as the layout made them before the laptop's rule (measured offscreen), or larger.
    EXPECT_GE(canvas.width(), 784);
    EXPECT_GE(canvas.height(), 471);
    EXPECT_GE(plotsView()->height(), 251);
    const FreeBodyCanvas* view = window.findChild<FreeBodyCanvas*>();
    EXPECT_GE(view->width(), 583);
    EXPECT_GE(view->height(), 399);
}

INSTANTIATE_TEST_SUITE_P(Screens, SmallScreen, ::testing::Values(QSize(1366, 768), QSize(1920, 1080)),
                         [](const auto& info) {
                             return std::to_string(info.param.width()) + "x" + std::to_string(info.param.height());
                         });

}  // namespace
