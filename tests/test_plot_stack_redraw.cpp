// The plots after an edit: the panes in view show the new result, drawn as a
// whole replot draws it, and a small change redraws only the curves over the
// axes left as they were; panes out of view show the new result once they
// are scrolled into view.
#include "core/file/mechanism_file.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/plot_stack.h"

#include <qcustomplot.h>
#include <QAbstractEventDispatcher>
#include <QApplication>
#include <QScrollArea>
#include <QScrollBar>
#include <QVBoxLayout>

#include <gtest/gtest.h>

#include <memory>

using namespace clevis;
using namespace clevis::ui;

namespace {

// Until nothing is left for the event loop: the result, the replot it
// queues and the paints that follow.
void settle(AnalysisState& analysis)
{
    analysis.waitForIdle();
    while (QAbstractEventDispatcher::instance()->processEvents(QEventLoop::AllEvents)) {}
}

struct ShownPlots {
    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;
    QWidget window;
    PlotStack* plots = nullptr;
    QScrollArea* scroll = nullptr;

    ShownPlots()
    {
        doc.reset(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism,
                  "punch_press.json");
        analysis = std::make_unique<AnalysisState>(&doc);
        plots = new PlotStack(analysis.get());
        (new QVBoxLayout(&window))->addWidget(plots);
        window.resize(900, 360);  // the first pane in view, the rest below
        window.show();
        settle(*analysis);
        for (auto* area : plots->findChildren<QScrollArea*>())
            if (area->widget() == plots->plot()) scroll = area;
    }

    // What is on screen of the plots: the part of them in the scroll area's view.
    QImage onScreen() const
    {
        const QRect view(plots->plot()->mapFrom(scroll->viewport(), QPoint(0, 0)), scroll->viewport()->size());
        return plots->plot()->grab(view).toImage();
    }

    // The same drawn whole from the present result, as a first replot draws it.
    QImage drawnWhole() const
    {
        plots->plot()->replot();
        return onScreen();
    }

    void edit(double gravityFactor)
    {
        doc.apply("gravity", [gravityFactor](Mechanism& m) { m.gravity *= gravityFactor; });
        settle(*analysis);
    }
};

TEST(PlotStackRedraw, ASmallChangeRedrawsOnlyTheCurvesAsAWholeReplotWould)
{
    ShownPlots s;
    ASSERT_TRUE(s.analysis->hasResult());
    ASSERT_NE(s.scroll, nullptr);
    const QImage before = s.onScreen();
    int wholeReplots = 0;
    QObject::connect(s.plots->plot(), &QCustomPlot::beforeReplot, [&wholeReplots] { ++wholeReplots; });
    s.edit(1.05);  // the loads change by a few per cent: the axes still fit them
    const QImage shown = s.onScreen();
    EXPECT_EQ(wholeReplots, 0);
    EXPECT_NE(shown, before);  // the new curves are on screen
    EXPECT_EQ(shown, s.drawnWhole());
}

TEST(PlotStackRedraw, ALargeChangeRedrawsTheAxesToo)
{
    ShownPlots s;
    ASSERT_TRUE(s.analysis->hasResult());
    const QCPRange old = s.plots->plot()->axisRect(0)->axis(QCPAxis::atLeft)->range();
    s.edit(50.0);  // the weights as large as the punch's load
    EXPECT_NE(s.plots->plot()->axisRect(0)->axis(QCPAxis::atLeft)->range(), old);
    EXPECT_EQ(s.onScreen(), s.drawnWhole());
}

TEST(PlotStackRedraw, PanesOutOfViewShowTheNewResultWhenScrolledIntoView)
{
    // A change small enough to keep every pane's axes (only the curves in
    // view are drawn again), and one that changes them (all drawn again).
    for (const double factor : {1.01, 50.0}) {
        ShownPlots s;
        ASSERT_TRUE(s.analysis->hasResult());
        QScrollBar* bar = s.scroll->verticalScrollBar();
        ASSERT_GT(bar->maximum(), 0);
        bar->setValue(bar->maximum());  // the last panes drawn once, then scrolled away again
        settle(*s.analysis);
        bar->setValue(0);
        settle(*s.analysis);
        int wholeReplots = 0;
        QObject::connect(s.plots->plot(), &QCustomPlot::beforeReplot, [&wholeReplots] { ++wholeReplots; });
        s.edit(factor);
        EXPECT_EQ(wholeReplots > 0, factor > 2) << "gravity × " << factor;
        bar->setValue(bar->maximum());
        settle(*s.analysis);
        const QImage shown = s.onScreen();
        EXPECT_EQ(shown, s.drawnWhole()) << "gravity × " << factor;
    }
}

}  // namespace
