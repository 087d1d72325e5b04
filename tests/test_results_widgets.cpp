// The results views offscreen: the scrubber, the plot cursor and the current
// step move together; a click on a plot moves the scrubber; selecting a body
// shows its diagram; the peak table jumps to a peak; the plots draw the
// report's panes and keep the joint choice in the view; the hover readout
// leaves the window its size.
#include "core/file/mechanism_file.h"
#include "render/cycle_axis.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/drive_scrubber.h"
#include "ui/results/free_body_view.h"
#include "ui/results/in_sight.h"
#include "ui/results/peak_table.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/display_units.h"

#include <qcustomplot.h>
#include <QApplication>
#include <QCheckBox>
#include <QDockWidget>
#include <QDoubleSpinBox>
#include <QHeaderView>
#include <QLabel>
#include <QListWidget>
#include <QMainWindow>
#include <QPointer>
#include <QScrollArea>
#include <QScrollBar>
#include <QSlider>
#include <QTabWidget>
#include <QTest>
#include <QVBoxLayout>
#include <QWheelEvent>

#include <gtest/gtest.h>

#include <map>
#include <memory>
#include <set>

using namespace clevis;
using namespace clevis::ui;

namespace {

struct Session {
    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;

    Session()
    {
        doc.reset(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json").mechanism,
                  "punch_press.json");
        analysis = std::make_unique<AnalysisState>(&doc);
        analysis->waitForIdle();
        QCoreApplication::processEvents();
    }
};

// A plot stack alone in `window`, shown at `size`.
PlotStack* showPlots(QWidget& window, Session& s, QSize size)
{
    auto* plots = new PlotStack(s.analysis.get());
    (new QVBoxLayout(&window))->addWidget(plots);
    window.resize(size);
    window.show();
    QCoreApplication::processEvents();
    return plots;
}

// The scroll area the stack's panes scroll in.
QScrollArea* paneScroll(PlotStack* plots)
{
    for (auto* area : plots->findChildren<QScrollArea*>())
        if (area->widget() == plots->plot()) return area;
    return nullptr;
}

TEST(ResultsWidgets, ScrubberMovesThePlotCursorAndTheStep)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult()) << s.analysis->errorText().toStdString();
    DriveScrubber scrubber(s.analysis.get());
    PlotStack plots(s.analysis.get());
    const CycleAxis axis = cycleAxis(s.analysis->compiled(), s.analysis->result());
    scrubber.slider()->setValue(90);
    EXPECT_EQ(s.analysis->currentStep(), 90);
    EXPECT_DOUBLE_EQ(plots.cursorX(), axis.values[90]);
    // The box takes the driver's unit and solves exactly there: 200.2° is a
    // step of its own between steps 200 and 201, shown everywhere.
    const std::size_t before = s.analysis->result().steps.size();
    scrubber.positionBox()->setValue(200.2);
    ASSERT_EQ(s.analysis->result().steps.size(), before + 1);
    EXPECT_EQ(s.analysis->currentStep(), 201);
    const StepResult& exact = s.analysis->result().steps[201];
    EXPECT_NEAR(radToDeg(exact.drivePosition[0]), 200.2, 1e-9);
    EXPECT_GT(exact.t, s.analysis->result().steps[200].t);
    EXPECT_LT(exact.t, s.analysis->result().steps[202].t);
    EXPECT_EQ(scrubber.slider()->value(), 201);
    EXPECT_NEAR(plots.cursorX(), 200.2, 1e-9);
    EXPECT_NEAR(scrubber.positionBox()->value(), 200.2, 1e-9);
    QTest::keyClick(scrubber.slider(), Qt::Key_Right);
    EXPECT_EQ(s.analysis->currentStep(), 202);
    // A position on a step adds none.
    scrubber.positionBox()->setValue(axis.values[90]);
    EXPECT_EQ(s.analysis->result().steps.size(), before + 1);
    EXPECT_EQ(s.analysis->currentStep(), 90);
}

TEST(ResultsWidgets, ClickOnAPlotMovesTheScrubber)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    DriveScrubber scrubber(s.analysis.get());
    PlotStack plots(s.analysis.get());
    plots.resize(900, 700);
    plots.show();
    QCoreApplication::processEvents();
    plots.plot()->replot();
    const QPoint at = plots.pixelForStep(250);
    ASSERT_FALSE(at.isNull());
    QTest::mouseClick(plots.plot(), Qt::LeftButton, Qt::NoModifier, at);
    EXPECT_NEAR(s.analysis->currentStep(), 250, 1);
    EXPECT_EQ(scrubber.slider()->value(), s.analysis->currentStep());
    EXPECT_TRUE(plots.peakListText().contains("main_motor torque")) << plots.peakListText().toStdString();
    QTest::mouseMove(plots.plot(), plots.pixelForStep(100));
    EXPECT_TRUE(plots.readoutText().contains(" N")) << plots.readoutText().toStdString();
    // The position reads once, with its unit once: "main_motor angle = 100.0 °".
    const CycleAxis axis = cycleAxis(s.analysis->compiled(), s.analysis->result());
    EXPECT_TRUE(plots.readoutText().startsWith(axis.name + " = " + axis.format(axis.values[100]) + "   "))
        << plots.readoutText().toStdString();
}

TEST(ResultsWidgets, SelectingABodyShowsItsDiagramAtTheCurrentStep)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    FreeBodyView view(&s.doc, s.analysis.get());
    EXPECT_FALSE(view.diagram().has_value());
    s.analysis->setCurrentStep(150);
    s.doc.setSelection({Selection::Kind::Body, "connecting_rod", -1});
    ASSERT_TRUE(view.diagram().has_value());
    EXPECT_EQ(view.diagram()->bodyName, "connecting_rod");
    EXPECT_EQ(view.diagram()->step, 150);
    s.analysis->setCurrentStep(151);
    EXPECT_EQ(view.diagram()->step, 151);
    s.doc.setSelection({});
    EXPECT_FALSE(view.diagram().has_value());
}

TEST(ResultsWidgets, ArrowsOnBodiesSharingAPinAreEqualAndOpposite)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    FreeBodyView crank(&s.doc, s.analysis.get()), rod(&s.doc, s.analysis.get());
    s.analysis->setCurrentStep(152);
    s.doc.setSelection({Selection::Kind::Body, "crankshaft", -1});
    const FreeBodyDiagram onCrank = *crank.diagram();
    s.doc.setSelection({Selection::Kind::Body, "connecting_rod", -1});
    const FreeBodyDiagram onRod = *rod.diagram();
    const auto pinForce = [](const FreeBodyDiagram& d) {
        for (const auto& i : d.items)
            if (i.name == "crank_pin") return i.force;
        ADD_FAILURE() << "no crank_pin on " << d.bodyName;
        return Vec2(Vec2::Zero());
    };
    EXPECT_GT(pinForce(onRod).norm(), 1000.0);
    EXPECT_NEAR((pinForce(onCrank) + pinForce(onRod)).norm(), 0.0, 1e-9 * pinForce(onRod).norm());
}

TEST(ResultsWidgets, PeakTableRowJumpsToThePeak)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PeakTable table(s.analysis.get());
    table.resize(700, 300);
    table.show();
    QCoreApplication::processEvents();
    int row = 0;  // crank_pin, the second joint
    while (row < table.rowCount() && table.item(row, PeakTable::kPartColumn)->text() != "joint crank_pin") ++row;
    ASSERT_LT(row, table.rowCount());
    const int expected = s.analysis->summary().joints[1].peak.step;
    ASSERT_GT(expected, 0);
    QTest::mouseClick(table.viewport(), Qt::LeftButton, Qt::NoModifier,
                      table.visualRect(table.model()->index(row, 0)).center());
    EXPECT_EQ(s.analysis->currentStep(), expected);
}

// Hidden, the table keeps its rows current but does not measure them; shown,
// every column is as wide as its widest cell.
TEST(ResultsWidgets, PeakTableFitsItsColumnsWhileShown)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PeakTable table(s.analysis.get());
    table.resize(700, 300);
    EXPECT_GT(table.rowCount(), 0);
    EXPECT_EQ(table.horizontalHeader()->sectionResizeMode(PeakTable::kPartColumn), QHeaderView::Fixed);
    table.show();
    QCoreApplication::processEvents();
    for (int c = 0; c < table.columnCount(); ++c) {
        if (table.isColumnHidden(c)) continue;
        EXPECT_EQ(table.horizontalHeader()->sectionResizeMode(c), QHeaderView::ResizeToContents);
        for (int r = 0; r < table.rowCount(); ++r)
            if (const QTableWidgetItem* cell = table.item(r, c); cell && table.columnSpan(r, c) == 1)
                EXPECT_GE(table.columnWidth(c), QFontMetrics(cell->font()).horizontalAdvance(cell->text()))
                    << "row " << r << ", column " << c;
    }
}

// A panel behind another's tab is visible to Qt but out of sight; work asked
// of it waits, and choosing its tab brings it into sight and does the work.
TEST(ResultsWidgets, APanelBehindATabIsOutOfSightUntilItsTabIsChosen)
{
    QMainWindow window;
    window.resize(600, 400);
    auto* front = new QDockWidget("front", &window);
    auto* back = new QDockWidget("back", &window);
    auto* frontView = new QLabel("front view");
    auto* backView = new QLabel("back view");
    int called = 0;
    auto* watch = new SightWatch(backView, [&called] {  // before the view is put in its dock
        ++called;
        return true;
    });
    front->setWidget(frontView);
    back->setWidget(backView);
    window.addDockWidget(Qt::BottomDockWidgetArea, front);
    window.tabifyDockWidget(front, back);
    front->raise();
    window.show();
    QCoreApplication::processEvents();
    EXPECT_TRUE(inSight(frontView));
    EXPECT_TRUE(backView->isVisible());  // what isVisible() alone would take as seen
    EXPECT_FALSE(inSight(backView));
    called = 0;
    watch->request();
    EXPECT_EQ(called, 0);
    EXPECT_TRUE(watch->pending());
    back->raise();
    QCoreApplication::processEvents();
    EXPECT_EQ(called, 1);
    EXPECT_FALSE(watch->pending());
    EXPECT_TRUE(inSight(backView));
    EXPECT_FALSE(inSight(frontView));
}

// Plots in a panel behind another's tab are not replotted for a new step;
// they are when their tab is chosen.
TEST(ResultsWidgets, PlotsBehindATabAreDrawnWhenTheirTabIsChosen)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    QMainWindow window;
    window.resize(900, 600);
    auto* front = new QDockWidget("front", &window);
    auto* back = new QDockWidget("plots", &window);
    front->setWidget(new QLabel("front view"));
    auto* plots = new PlotStack(s.analysis.get());
    back->setWidget(plots);
    // As the window arranges its panels: shown first, then tabbed.
    window.addDockWidget(Qt::BottomDockWidgetArea, front);
    window.addDockWidget(Qt::BottomDockWidgetArea, back);
    window.show();
    QCoreApplication::processEvents();
    window.tabifyDockWidget(front, back);
    front->raise();
    QCoreApplication::processEvents();
    ASSERT_TRUE(plots->plot()->isVisible());  // to Qt, behind the tab as in front of it
    int replots = 0;
    QObject::connect(plots->plot(), &QCustomPlot::afterReplot, [&replots] { ++replots; });
    s.analysis->setCurrentStep(5);
    QCoreApplication::processEvents();
    EXPECT_EQ(replots, 0);
    back->raise();
    QCoreApplication::processEvents();
    EXPECT_GE(replots, 1);
    const int before = replots;
    s.analysis->setCurrentStep(6);
    QCoreApplication::processEvents();
    EXPECT_GT(replots, before);  // in sight: each step drawn
}

// With allowables set, each bar's utilisation is the larger of its stress
// against the allowable and its compression against the Euler load, as the
// sizing computes them; the most loaded part is at the top, the shade deepens
// (darker in grey) towards the limit, and a bar with no allowable says why.
TEST(ResultsWidgets, PeakTableSortsPartsByUtilisation)
{
    MechanismDocument doc;
    Mechanism mech = loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json").mechanism;
    int withSection = 0;
    for (auto& b : mech.bodies)
        if (b.section && withSection++ > 0) b.section->safetyFactor = 2.0;  // the first keeps none
    ASSERT_GE(withSection, 3);
    doc.reset(mech, "six_bar.json");
    AnalysisState analysis(&doc);
    analysis.waitForIdle();
    ASSERT_TRUE(analysis.hasResult());
    PeakTable table(&analysis);

    std::map<QString, double> expected;  // part -> utilisation
    QString unrated;                     // the bar without an allowable: rated on buckling only
    for (const auto& bar : analysis.sizing().bars) {
        if (!bar.section) continue;
        const QString part = "link " + QString::fromStdString(bar.name);
        if (!bar.section->utilisation) unrated = part;
        expected[part] = std::max(bar.section->utilisation.value_or(0.0), bar.section->bucklingRatio.value_or(0.0));
    }
    ASSERT_EQ(expected.size(), std::size_t(withSection));
    ASSERT_FALSE(unrated.isEmpty());

    double previous = 2.0, previousLightness = 0.0;
    for (int row = 0; row < int(expected.size()); ++row) {
        const QString part = table.item(row, PeakTable::kPartColumn)->text();
        ASSERT_TRUE(expected.count(part)) << part.toStdString() << " is not among the rated bars at the top";
        const double u = expected[part];
        EXPECT_LE(u, previous);
        const QTableWidgetItem* cell = table.item(row, PeakTable::kUtilisationColumn);
        const QString shown = cell->text().section(' ', 0, 0);  // "87", "4.2" or "<1"
        if (shown == "<1") EXPECT_LT(u, 0.01);
        else EXPECT_NEAR(shown.toDouble(), 100.0 * u, u < 0.1 ? 0.05 : 0.5) << cell->text().toStdString();
        EXPECT_EQ(cell->text().endsWith("buckling"), part == unrated) << cell->text().toStdString();
        const double lightness = cell->background().color().lightnessF();
        if (row > 0) EXPECT_GE(lightness, previousLightness);  // less loaded: lighter
        previous = u;
        previousLightness = lightness;
        // Without an allowable, the tooltip says why there is no stress figure.
        if (part == unrated) EXPECT_TRUE(cell->toolTip().contains("allowable")) << cell->toolTip().toStdString();
    }
}

// A sized pin's joint row carries the pin's largest utilisation and names the
// figure; the tooltip lists each figure. The press sample sizes three pins.
TEST(ResultsWidgets, PeakTableShowsEachSizedPinsUtilisation)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PeakTable table(s.analysis.get());
    const SizingResult& sizing = s.analysis->sizing();
    int sized = 0;
    for (const PinSizing& pin : sizing.pins) {
        if (!pin.pin) continue;
        ++sized;
        double largest = 0.0;
        for (const auto& u : {pin.shearUtilisation, pin.pressureUtilisation, pin.pvUtilisation})
            largest = std::max(largest, u.value_or(0.0));
        int row = 0;
        while (row < table.rowCount() &&
               table.item(row, PeakTable::kPartColumn)->text() != "joint " + QString::fromStdString(pin.name))
            ++row;
        ASSERT_LT(row, table.rowCount()) << pin.name;
        const QTableWidgetItem* cell = table.item(row, PeakTable::kUtilisationColumn);
        EXPECT_NEAR(cell->text().section(' ', 0, 0).toDouble(), 100.0 * largest, 0.5) << cell->text().toStdString();
        EXPECT_TRUE(cell->toolTip().contains("pin shear")) << cell->toolTip().toStdString();
    }
    EXPECT_EQ(sized, 3);
}

// A default name already says its kind: "link 3", not "link link 3".
TEST(ResultsWidgets, APartsKindIsNotSaidTwice)
{
    EXPECT_EQ(partLabel("link", "link 3"), "link 3");
    EXPECT_EQ(partLabel("link", "crank"), "link crank");
    EXPECT_EQ(partLabel("Link", "link 2"), "Link 2");
    EXPECT_EQ(partLabel("pin", "pinion"), "pin pinion");
}

TEST(ResultsWidgets, PlotsShowThePanesOfTheReportAndKeepTheChoice)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PlotStack plots(s.analysis.get());
    const auto panes = plotPanes(s.analysis->compiled(), s.analysis->result(), renderUnits(DisplayUnits::instance()));
    ASSERT_EQ(plots.panes().size(), panes.size());
    ASSERT_EQ(plots.plot()->axisRectCount(), int(panes.size()));
    QStringList titles;
    for (QCPLayoutElement* e : plots.plot()->plotLayout()->elements(true))
        if (const auto* text = qobject_cast<QCPTextElement*>(e)) titles << text->text();
    ASSERT_EQ(titles.size(), int(panes.size()));
    for (std::size_t i = 0; i < panes.size(); ++i) {
        EXPECT_EQ(plots.panes()[i].title, panes[i].title);
        EXPECT_EQ(titles[int(i)], panes[i].title);
    }
    // The choice is held by the view, and the joint list and box show it.
    plots.setChoice({{"main_bearing"}, true});
    const auto* joints = plots.findChild<QListWidget*>();
    ASSERT_NE(joints, nullptr);
    EXPECT_EQ(joints->item(0)->checkState(), Qt::Unchecked);
    EXPECT_EQ(joints->item(1)->checkState(), Qt::Checked);
    EXPECT_TRUE(plots.findChild<QCheckBox*>()->isChecked());
    EXPECT_EQ(plots.panes().front().curves.size(), 9u);
    // Unticking a joint in the list changes the choice.
    plots.findChild<QListWidget*>()->item(1)->setCheckState(Qt::Unchecked);
    EXPECT_EQ(plots.choice().hiddenJoints, (std::set<std::string>{"main_bearing", "crank_pin"}));
    EXPECT_EQ(plots.panes().front().curves.size(), 6u);
}

// After a refused analysis and a good one, the plots show only the current
// state: no joint list beside the reason, no old reason beside the curves.
TEST(ResultsWidgets, PlotsShowNothingStaleAfterAFailedAnalysis)
{
    Session s;
    PlotStack plots(s.analysis.get());
    auto* joints = plots.findChild<QListWidget*>();
    ASSERT_NE(joints, nullptr);
    ASSERT_GT(joints->count(), 0);

    s.doc.apply(QStringLiteral("Remove drivers and loads"), [](Mechanism& m) {
        m.loads.clear();
        m.drivers.clear();
    });
    s.analysis->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_FALSE(s.analysis->hasResult());
    const QString reason = plots.readoutText();
    EXPECT_FALSE(reason.isEmpty());
    EXPECT_EQ(joints->count(), 0);

    s.doc.undoStack()->undo();
    s.analysis->waitForIdle();
    QCoreApplication::processEvents();
    ASSERT_TRUE(s.analysis->hasResult()) << s.analysis->errorText().toStdString();
    EXPECT_FALSE(plots.readoutText().contains(reason)) << plots.readoutText().toStdString();
    EXPECT_GT(joints->count(), 0);
}

TEST(ResultsWidgets, HoverReadoutNeverWidensTheWindow)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    QWidget window;
    PlotStack* plots = showPlots(window, s, {900, 700});
    plots->findChild<QCheckBox*>()->setChecked(true);  // Fx, Fy too: the longest readout
    plots->plot()->replot();
    QTest::mouseMove(plots->plot(), plots->pixelForStep(100));
    // Layout requests travel up one level per pass.
    for (int pass = 0; pass < 8; ++pass) QCoreApplication::sendPostedEvents(nullptr, QEvent::LayoutRequest);
    ASSERT_GT(plots->readoutText().size(), 300) << plots->readoutText().toStdString();
    EXPECT_LT(plots->minimumSizeHint().width(), 400);
    EXPECT_EQ(window.width(), 900);
}

// Behind another tab the plots are not drawn for each new result; shown
// again, they are drawn at once with the newest one (nothing stale).
TEST(ResultsWidgets, PlotsBehindATabAreDrawnWhenShownAgain)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    QTabWidget tabs;
    auto* plots = new PlotStack(s.analysis.get());
    tabs.addTab(plots, "plots");
    tabs.addTab(new QWidget, "other");
    tabs.resize(900, 700);
    tabs.show();
    QCoreApplication::processEvents();
    int drawn = 0;
    QObject::connect(plots->plot(), &QCustomPlot::afterReplot, [&drawn] { ++drawn; });
    tabs.setCurrentIndex(1);
    // An edit that changes the loads: gravity twice as strong.
    s.doc.apply("heavier", [](Mechanism& m) { m.gravity *= 2.0; });
    s.analysis->waitForIdle();
    QCoreApplication::processEvents();
    EXPECT_EQ(drawn, 0);
    const QCPGraph* first = plots->plot()->graph(0);
    ASSERT_NE(first, nullptr);
    EXPECT_EQ(first->data()->at(1)->value, plots->panes().front().curves.front().series.values[1]);
    tabs.setCurrentIndex(0);
    QCoreApplication::processEvents();
    EXPECT_EQ(drawn, 1);
}

}  // namespace

int main(int argc, char** argv)
{
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    testing::InitGoogleTest(&argc, argv);
    return RUN_ALL_TESTS();
}

// A result with the same curves keeps the panes and only sets their data; a
// different set of curves builds them again.
TEST(ResultsWidgets, PlotsKeepTheirPanesWhenTheCurvesStayTheSame)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PlotStack plots(s.analysis.get());
    const QPointer<QCPGraph> first = plots.plot()->graph(0);
    plots.setChoice(plots.choice());
    EXPECT_FALSE(first.isNull());
    EXPECT_EQ(plots.plot()->graph(0), first.data());
    plots.setChoice({{"main_bearing"}, false});
    EXPECT_TRUE(first.isNull());
}

// Each curve's peak mark is drawn within its own pane, not clipped away by the first.
TEST(ResultsWidgets, PeakMarksAreClippedToTheirOwnPane)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    PlotStack plots(s.analysis.get());
    ASSERT_GT(plots.plot()->axisRectCount(), 1);
    int marks = 0;
    for (int i = 0; i < plots.plot()->itemCount(); ++i)
        if (const auto* mark = qobject_cast<QCPItemTracer*>(plots.plot()->item(i))) {
            ++marks;
            EXPECT_EQ(mark->clipAxisRect(), mark->graph()->keyAxis()->axisRect());
        }
    EXPECT_EQ(marks, plots.plot()->graphCount());
}

// Only the panes in view are drawn at a replot; one scrolled into view is
// drawn then, with its curves.
TEST(ResultsWidgets, PanesScrolledIntoViewAreDrawn)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    QWidget window;
    PlotStack* plots = showPlots(window, s, {900, 360});
    plots->plot()->replot();
    const auto inked = [&] {  // pixels of a curve (coloured or dark) inside the last pane's axes
        const QImage image = plots->plot()->grab().toImage();
        const QRect last = plots->plot()->axisRect(plots->plot()->axisRectCount() - 1)->rect();
        int n = 0;
        for (int y = last.top() + 2; y < last.bottom() - 2; ++y)
            for (int x = last.left() + 2; x < last.right() - 2; ++x)
                n += QColor(image.pixel(x, y)).saturation() > 100 || qGray(image.pixel(x, y)) < 120;
        return n;
    };
    EXPECT_EQ(inked(), 0);  // out of view: left out
    QScrollArea* scroll = paneScroll(plots);
    ASSERT_NE(scroll, nullptr);
    ASSERT_GT(scroll->verticalScrollBar()->maximum(), 0);
    scroll->verticalScrollBar()->setValue(scroll->verticalScrollBar()->maximum());
    QCoreApplication::processEvents();
    EXPECT_GT(inked(), 50);
}

// The wheel over the plots scrolls the stack of panes, as over any list.
TEST(ResultsWidgets, TheWheelOverThePlotsScrollsTheStack)
{
    Session s;
    ASSERT_TRUE(s.analysis->hasResult());
    QWidget window;
    PlotStack* plots = showPlots(window, s, {900, 360});
    QScrollArea* scroll = paneScroll(plots);
    ASSERT_NE(scroll, nullptr);
    ASSERT_GT(scroll->verticalScrollBar()->maximum(), 0);
    ASSERT_EQ(scroll->verticalScrollBar()->value(), 0);

    const QPointF at = QRectF(plots->plot()->axisRect(0)->rect()).center();  // over the first pane's curves
    QWheelEvent down(at, plots->plot()->mapToGlobal(at), QPoint(), QPoint(0, -120), Qt::NoButton, Qt::NoModifier,
                     Qt::NoScrollPhase, false);
    QCoreApplication::sendEvent(plots->plot(), &down);
    EXPECT_GT(scroll->verticalScrollBar()->value(), 0);
}
