// Plots a designer can read, in the report's charts and in the window: the
// curve styles differ in colour and dash and stay apart in grey-scale print;
// the x axis is numbered and named by the driver and its unit; legends show
// each curve's line; no two texts of a chart overlap, its peaks included; the
// window lists every peak and hovering moves no widget.
#include "core/file/mechanism_file.h"
#include "core/solver/cycle_sweep.h"
#include "render/cycle_axis.h"
#include "render/cycle_chart.h"
#include "render/palette.h"
#include "render/plot_panes.h"
#include "tests/qstring_printer.h"
#include "tests/recording_device.h"
#include "tests/sample_file.h"
#include "tests/solved_mechanism.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/display_units.h"

#include <qcustomplot.h>
#include <QCheckBox>
#include <QFile>
#include <QPainter>
#include <QTest>
#include <QVBoxLayout>

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <map>
#include <memory>

using namespace clevis;
using namespace clevis::ui;

namespace {

const char* const kSamples[] = {"dwell_six_bar", "punch_press", "flap_folder", "tipping_bed", "tote_arm"};

using test::samplePath;

// The step of a curve's largest |value|.
int peakOf(const std::vector<double>& v)
{
    return int(std::max_element(v.begin(), v.end(), [](double a, double b) { return std::abs(a) < std::abs(b); }) -
               v.begin());
}

// Where on the axis, as a reader needs it: degrees to a tenth, metres and seconds to four places.
QString position(const CycleAxis& axis, int step)
{
    return QString::number(axis.values[step], 'f', axis.unit == "°" ? 1 : 4) + " " + axis.unit;
}

// CIE 1976 L* of an sRGB colour (sRGB transfer curve of IEC 61966-2-1, D65
// white; L* = 116 f(Y) - 16): what a grey-scale print keeps of a colour.
double lightness(const QColor& c)
{
    const auto linear = [](double v) { return v <= 0.04045 ? v / 12.92 : std::pow((v + 0.055) / 1.055, 2.4); };
    const double y = 0.2126 * linear(c.redF()) + 0.7152 * linear(c.greenF()) + 0.0722 * linear(c.blueF());
    const double f = y > 216.0 / 24389 ? std::cbrt(y) : (24389.0 / 27 * y + 16) / 116;
    return 116 * f - 16;
}

// A curve's peak is taken over the reliable steps, as in the summary; a
// larger value at an unreliable step (near a toggle) is shown apart, marked.
TEST(PlotReadability, APeakFromAnUnreliableStepIsShownApartAndMarked)
{
    const std::vector<double> values{1.0, -5.0, 3.0, 100.0, 2.0};
    const CurvePeak peak = curvePeak(values, {false, false, false, true, false});
    EXPECT_EQ(peak.step, 1);
    EXPECT_EQ(peak.flaggedStep, 3);
    CycleAxis axis;
    axis.unit = "°";
    axis.values = {0.0, 90.0, 180.0, 270.0, 360.0};
    CycleSeries s;
    s.unit = "N";
    s.values = values;
    EXPECT_EQ(peakText(s, axis, peak), "-5.000 N at 90.0 °  (⚠ 100.0 N at 270.0 °, unreliable)");
    EXPECT_EQ(curvePeak(values, {}).step, 3);                                      // nothing unreliable
    EXPECT_EQ(curvePeak(values, {true, true, true, true, true}).flaggedStep, -1);  // all unreliable: one peak
    EXPECT_EQ((unreliableRuns({false, true, true, false, true})), (std::vector<std::pair<int, int>>{{1, 2}, {4, 4}}));
}

TEST(PlotReadability, LightnessMatchesTheReferenceValues)
{
    // sRGB #777777 has L* = 50.0 and pure white 100 (values of the CIELAB definition, from memory).
    EXPECT_NEAR(lightness(QColor(0x77, 0x77, 0x77)), 50.0, 0.1);
    EXPECT_NEAR(lightness(Qt::white), 100.0, 1e-9);
    EXPECT_NEAR(lightness(Qt::black), 0.0, 1e-9);
}

// A dozen curves: any two differ in colour or in dash; consecutive ones in
// both; two with one dash pattern differ by 20 or more in L*, so a grey-scale
// print still tells them apart; none is paler than L* 75 against white paper.
TEST(PlotReadability, TwelveCurvePensDifferInColourAndDashAndInGreyScale)
{
    for (int i = 0; i < 12; ++i) {
        const QPen a = curvePen(i);
        EXPECT_LE(lightness(a.color()), 75.0) << "pen " << i << " too pale on white";
        for (int j = i + 1; j < 12; ++j) {
            const QPen b = curvePen(j);
            const bool sameColour = a.color() == b.color(), sameDash = a.dashPattern() == b.dashPattern();
            EXPECT_FALSE(sameColour && sameDash) << "pens " << i << " and " << j;
            if (j == i + 1) EXPECT_TRUE(!sameColour && !sameDash) << "consecutive pens " << i << " and " << j;
            if (sameDash)
                EXPECT_GE(std::abs(lightness(a.color()) - lightness(b.color())), 20.0)
                    << "pens " << i << " and " << j << " share a dash and look alike in grey";
        }
    }
}

using test::Solved;

Solved solve(const std::string& sample) { return test::solve(loadMechanismFile(samplePath(sample)).mechanism); }

// Every pane of a sample's report charts, drawn at its natural size.
struct DrawnChart {
    PlotPane pane;
    QSizeF size;
    std::vector<test::RecordedText> texts;
    std::vector<test::RecordedLine> lines;
};

std::vector<DrawnChart> drawCharts(const Solved& s, const PaneChoice& choice)
{
    std::vector<DrawnChart> out;
    const CycleAxis axis = cycleAxis(s.m, s.r);
    for (const PlotPane& pane : plotPanes(s.m, s.r, RenderUnits{}, choice)) {
        const CycleChart chart(pane, axis, s.r);
        test::RecordingDevice device(chart.size().toSize() + QSize(1, 1));
        {
            QPainter p(&device);
            chart.paint(p, QRectF(QPointF(0, 0), chart.size()));
        }
        out.push_back({pane, chart.size(), device.engine.texts, device.engine.lines});
    }
    return out;
}

bool overlap(const QRectF& a, const QRectF& b)
{
    const QRectF i = a.intersected(b);
    return i.width() > 0.25 && i.height() > 0.25;
}

// No two texts of a report chart overlap (titles, tick numbers, axis titles,
// peaks and legend) and none leaves the chart, with every joint plotted, and
// with their components too (21 curves on the six-bar).
TEST(PlotReadability, ReportChartTextsNeverOverlap)
{
    for (const char* sample : kSamples)
        for (const bool components : {false, true}) {
            const Solved s = solve(sample);
            for (const DrawnChart& chart : drawCharts(s, {{}, components})) {
                const auto& t = chart.texts;
                ASSERT_FALSE(t.empty());
                const QRectF figure(QPointF(0, 0), chart.size);
                for (std::size_t i = 0; i < t.size(); ++i) {
                    EXPECT_TRUE(figure.adjusted(-0.5, -0.5, 0.5, 0.5).contains(t[i].box))
                        << sample << ", " << chart.pane.title.toStdString() << ": '" << t[i].text.toStdString()
                        << "' leaves the chart";
                    for (std::size_t j = i + 1; j < t.size(); ++j)
                        EXPECT_FALSE(overlap(t[i].box, t[j].box))
                            << sample << ", " << chart.pane.title.toStdString() << ": '" << t[i].text.toStdString()
                            << "' overlaps '" << t[j].text.toStdString() << "' at (" << t[i].box.x() << ", "
                            << t[i].box.y() << ") and (" << t[j].box.x() << ", " << t[j].box.y() << ")";
                }
            }
        }
}

// Under the plot, a row of at least four tick numbers, and below it the
// axis title naming the driver and its unit.
TEST(PlotReadability, ReportChartsNumberAndNameTheXAxis)
{
    const Solved s = solve("dwell_six_bar");
    for (const DrawnChart& chart : drawCharts(s, {})) {
        const test::RecordedText* title = nullptr;
        std::map<int, int> numbersByRow;  // rounded box top -> count
        for (const auto& t : chart.texts) {
            if (t.text == "index_motor angle (°)") title = &t;
            bool number = false;
            t.text.toDouble(&number);
            if (number) ++numbersByRow[int(std::lround(t.box.top()))];
        }
        ASSERT_NE(title, nullptr) << chart.pane.title.toStdString();
        int ticks = 0;
        for (const auto& [top, count] : numbersByRow)
            if (top < title->box.top() && top > title->box.top() - 30) ticks = std::max(ticks, count);
        EXPECT_GE(ticks, 4) << chart.pane.title.toStdString();
    }
}

// Each curve has its legend entry: the name, its peak and where, and just
// left of it a stretch of line in the curve's own colour and dash.
TEST(PlotReadability, ReportLegendsShowEachLineAndItsPeak)
{
    for (const char* sample : {"dwell_six_bar", "tipping_bed"}) {
        const Solved s = solve(sample);
        const CycleAxis axis = cycleAxis(s.m, s.r);
        for (const DrawnChart& chart : drawCharts(s, {})) {
            for (const PlotCurve& c : chart.pane.curves) {
                const int k = peakOf(c.series.values);
                const QString expected =
                    QString("%1  peak %2 at %3")
                        .arg(c.series.name, formatQuantity(c.series.values[k], c.series.unit), position(axis, k));
                const auto entry = std::find_if(chart.texts.begin(), chart.texts.end(),
                                                [&](const auto& t) { return t.text == expected; });
                ASSERT_NE(entry, chart.texts.end()) << sample << ": no legend entry '" << expected.toStdString() << "'";
                const QPen pen = curvePen(c.pen);
                const bool hasSample = std::any_of(chart.lines.begin(), chart.lines.end(), [&](const auto& l) {
                    const double y = l.line.y1(), right = std::max(l.line.x1(), l.line.x2());
                    return l.line.dy() == 0 && l.line.length() >= 15 && y > entry->box.top() &&
                           y < entry->box.bottom() && right <= entry->box.left() && right > entry->box.left() - 12 &&
                           l.pen.color() == pen.color() && l.pen.dashPattern() == pen.dashPattern();
                });
                EXPECT_TRUE(hasSample) << "no line sample before '" << expected.toStdString() << "'";
            }
        }
    }
}

struct Session {
    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;

    explicit Session(const std::string& sample) : Session(loadMechanismFile(samplePath(sample)).mechanism) {}
    explicit Session(const Mechanism& m)
    {
        doc.reset(m, {});
        analysis = std::make_unique<AnalysisState>(&doc);
        analysis->waitForIdle();
        QCoreApplication::processEvents();
    }
};

struct ShownPlots {
    QWidget window;
    PlotStack* plots;

    explicit ShownPlots(AnalysisState* analysis, QSize size) : plots(new PlotStack(analysis))
    {
        (new QVBoxLayout(&window))->addWidget(plots);
        window.resize(size);
        window.show();
        settle();
    }
    void settle()
    {
        // Layout requests travel up one level per pass.
        for (int pass = 0; pass < 8; ++pass) QCoreApplication::sendPostedEvents(nullptr, QEvent::LayoutRequest);
        QCoreApplication::processEvents();
        plots->plot()->replot();
    }
};

std::vector<QCPLegend*> legendsOf(QCustomPlot* plot)
{
    std::vector<QCPLegend*> out;
    for (QCPLayoutElement* e : plot->plotLayout()->elements(true))
        if (auto* legend = qobject_cast<QCPLegend*>(e)) out.push_back(legend);
    return out;
}

std::vector<QCPTextElement*> titlesOf(QCustomPlot* plot)
{
    std::vector<QCPTextElement*> out;
    for (QCPLayoutElement* e : plot->plotLayout()->elements(true))
        if (auto* text = qobject_cast<QCPTextElement*>(e)) out.push_back(text);
    return out;
}

// Each pane in the window numbers its x axis and names the driver and unit,
// so any pane scrolled into view reads alone.
TEST(PlotReadability, EveryWindowPaneNumbersAndNamesTheXAxis)
{
    Session s("dwell_six_bar");
    ASSERT_TRUE(s.analysis->hasResult());
    ShownPlots shown(s.analysis.get(), {1000, 700});
    QCustomPlot* plot = shown.plots->plot();
    ASSERT_EQ(plot->axisRectCount(), int(shown.plots->panes().size()));
    for (int i = 0; i < plot->axisRectCount(); ++i) {
        const QCPAxis* x = plot->axisRect(i)->axis(QCPAxis::atBottom);
        EXPECT_TRUE(x->tickLabels()) << "pane " << i;
        EXPECT_EQ(x->label(), QString("index_motor angle (°)")) << "pane " << i;
        EXPECT_GE(x->tickVector().size(), 4) << "pane " << i;
    }
}

// Each pane has its title and a legend with one entry per curve, drawn with
// the curve's own pen; the entries do not overlap each other.
TEST(PlotReadability, WindowLegendsShowTheLineOfEachCurve)
{
    Session s("dwell_six_bar");
    ASSERT_TRUE(s.analysis->hasResult());
    ShownPlots shown(s.analysis.get(), {1000, 700});
    shown.plots->findChild<QCheckBox*>()->setChecked(true);  // 21 reaction curves: the legend wraps
    shown.settle();
    const auto& panes = shown.plots->panes();
    const auto legends = legendsOf(shown.plots->plot());
    ASSERT_EQ(legends.size(), panes.size());
    const auto titles = titlesOf(shown.plots->plot());
    ASSERT_EQ(titles.size(), panes.size());
    for (std::size_t i = 0; i < panes.size(); ++i) {
        EXPECT_EQ(titles[i]->text(), panes[i].title);
        EXPECT_GE(titles[i]->outerRect().width(),
                  static_cast<QCPLayoutElement*>(titles[i])->minimumOuterSizeHint().width())
            << "title squeezed";
        // The entries in order, skipping the empty cells a wrapped legend ends with.
        std::vector<QCPPlottableLegendItem*> items;
        for (int j = 0; j < legends[i]->itemCount(); ++j)
            if (auto* item = qobject_cast<QCPPlottableLegendItem*>(legends[i]->item(j))) items.push_back(item);
        ASSERT_EQ(items.size(), panes[i].curves.size()) << panes[i].title.toStdString();
        for (std::size_t j = 0; j < items.size(); ++j) {
            const auto* graph = qobject_cast<const QCPGraph*>(items[j]->plottable());
            ASSERT_NE(graph, nullptr);
            EXPECT_EQ(graph->name(), panes[i].curves[j].series.name);
            EXPECT_EQ(graph->pen(), curvePen(panes[i].curves[j].pen));
            for (std::size_t k = j + 1; k < items.size(); ++k)
                EXPECT_FALSE(overlap(items[j]->outerRect(), items[k]->outerRect()))
                    << graph->name().toStdString() << " and entry " << k;
            EXPECT_TRUE(QRectF(shown.plots->plot()->rect()).contains(items[j]->outerRect()));
            // Not squeezed: the entry has the room its line sample and name need.
            EXPECT_GE(items[j]->outerRect().width(),
                      static_cast<QCPLayoutElement*>(items[j])->minimumOuterSizeHint().width())
                << graph->name().toStdString();
        }
    }
}

// The window lists each curve's peak on a line of its own (they never
// overlap in the plot), with the position in the driver's unit.
TEST(PlotReadability, WindowListsEveryPeakOnALineOfItsOwn)
{
    // The tipping bed's cylinder, extending over the whole cycle: positions in metres.
    QFile file(QString::fromStdString(samplePath("tipping_bed")));
    ASSERT_TRUE(file.open(QIODevice::ReadOnly));
    const std::string text = QString::fromUtf8(file.readAll())
                                 .replace(R"("start_s": 0.5, "end_s": 10.5)", R"("start_s": 0, "end_s": 12)")
                                 .toStdString();
    Session s(parseMechanism(text).mechanism);
    ASSERT_TRUE(s.analysis->hasResult()) << s.analysis->errorText().toStdString();
    PlotStack plots(s.analysis.get());
    const CycleAxis axis = cycleAxis(s.analysis->compiled(), s.analysis->result());
    ASSERT_EQ(axis.unit, "m");
    QStringList expected;
    for (const PlotPane& pane : plots.panes())
        for (const PlotCurve& c : pane.curves) {
            const int k = peakOf(c.series.values);
            expected << QString("%1: %2 at %3")
                            .arg(c.series.name, formatQuantity(c.series.values[k], c.series.unit), position(axis, k));
        }
    EXPECT_EQ(plots.peakListText().split('\n'), expected);
}

// Reading values off the curves changes no widget's place or size.
TEST(PlotReadability, HoveringMovesNoWidget)
{
    Session s("dwell_six_bar");
    ASSERT_TRUE(s.analysis->hasResult());
    ShownPlots shown(s.analysis.get(), {1000, 600});
    shown.plots->findChild<QCheckBox*>()->setChecked(true);  // the longest readout
    shown.settle();
    std::map<QWidget*, QRect> before;
    for (QWidget* w : shown.window.findChildren<QWidget*>()) before[w] = w->geometry();
    for (const int step : {10, 120, 300}) {
        QTest::mouseMove(shown.plots->plot(), shown.plots->pixelForStep(step));
        shown.settle();
        ASSERT_FALSE(shown.plots->readoutText().isEmpty());
        for (const auto& [w, geometry] : before)
            EXPECT_EQ(w->geometry(), geometry) << w->metaObject()->className() << " '" << w->objectName().toStdString()
                                               << "' after hovering at " << step;
    }
}

}  // namespace
