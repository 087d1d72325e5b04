#include "ui/results/plot_stack.h"

#include "core/results/cycle_summary.h"
#include "core/results/cylinder_ends.h"
#include "render/palette.h"
#include "render/polyline_decimation.h"
#include "ui/analysis/analysis_state.h"
#include "ui/results/in_sight.h"
#include "ui/results/segment_graph.h"
#include "ui/shell/display_units.h"

#include <qcustomplot.h>
#include <QCheckBox>
#include <QCoreApplication>
#include <QEvent>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QMetaObject>
#include <QPlainTextEdit>
#include <QResizeEvent>
#include <QScrollArea>
#include <QScrollBar>
#include <QSplitter>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

constexpr int kEdge = 10;  // px: the plot's margin either side of a pane's header
// A value axis is kept while the curves fill at least this share of it and
// keep half their usual margin from its ends: a drag then redraws the curves
// over still axes, rather than the axes, ticks and labels at every step.
constexpr double kFilledShare = 0.8, kMargin = 0.08;

// The range of a value axis for curves spanning [lo, hi] (lo ≤ 0 ≤ hi: the
// axis takes in zero): a margin above, and below where they go negative.
QCPRange wantedRange(double lo, double hi)
{
    const double pad = std::max(1e-9, kMargin * (hi - lo));
    return {lo - (lo < 0 ? pad : 0), hi + pad};
}

// Whether a value axis can stay as it is for curves spanning [lo, hi].
bool stillFits(const QCPRange& axis, double lo, double hi)
{
    const QCPRange wanted = wantedRange(lo, hi);
    const double half = (wanted.size() - (hi - lo)) / (lo < 0 ? 4 : 2);  // half of each margin
    return (axis.lower < 0) == (lo < 0) && axis.lower <= wanted.lower + (lo < 0 ? half : 0) &&
           axis.upper >= hi + half && wanted.size() >= kFilledShare * axis.size();
}

// A curve drawn through only the points that change its picture: points
// within a quarter of a pixel of the line through their neighbours are
// dropped before it is cut into pieces and stroked (most of a replot).
class DecimatedGraph : public SegmentGraph {
public:
    using SegmentGraph::SegmentGraph;

protected:
    void drawLinePlot(QCPPainter* painter, const QVector<QPointF>& lines) const override
    {
        SegmentGraph::drawLinePlot(painter, decimatedPolyline(lines, invisibleOnDevice(*painter)));
    }
};

// Legend entries of equal width, as many across as fit in `width` px.
void wrapLegend(QCPLegend* legend, int width)
{
    int widest = 1;
    for (int i = 0; i < legend->itemCount(); ++i)  // cells past the last entry of a wrapped legend are empty
        if (const QCPAbstractLegendItem* item = legend->item(i))
            widest = std::max(widest, item->minimumOuterSizeHint().width());
    // n entries take n widths, n − 1 spacings and the legend's margins.
    const int spacing = legend->columnSpacing();
    const int room = width - legend->margins().left() - legend->margins().right();
    legend->setWrap(std::max(1, (room + spacing) / (widest + spacing)));
    legend->setFillOrder(QCPLegend::foColumnsFirst, true);  // a new wrap only applies once rearranged
}

// The same curves under the same titles, units and pens: the panes can be kept.
bool sameCurves(const std::vector<PlotPane>& a, const std::vector<PlotPane>& b)
{
    const auto same = [](const PlotPane& p, const PlotPane& q) {
        return p.title == q.title && p.unit == q.unit && p.curves.size() == q.curves.size() &&
               std::equal(p.curves.begin(), p.curves.end(), q.curves.begin(), [](const auto& c, const auto& d) {
                   return c.series.name == d.series.name && c.pen == d.pen;
               });
    };
    return a.size() == b.size() && std::equal(a.begin(), a.end(), b.begin(), same);
}

}  // namespace

PlotStack::PlotStack(AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , analysis_(analysis)
    , joints_(new QListWidget(this))
    , components_(new QCheckBox(tr("Components Fx, Fy"), this))
    , plot_(new QCustomPlot(this))
    , scroll_(nullptr)
    , readout_(new QLabel(this))
    , peaks_(new QPlainTextEdit(this))
{
    setObjectName("plotStack");
    // Drawn once the events queued with it are done: a result and the cursor it moves are one replot.
    sight_ = new SightWatch(plot_, [this] {
        if (!redrawQueued_) QMetaObject::invokeMethod(this, &PlotStack::redraw, Qt::QueuedConnection);
        redrawQueued_ = true;
        return true;
    });
    plot_->setObjectName("cyclePlots");
    plot_->setMouseTracking(true);
    joints_->setToolTip(tr("Tick the joints whose reaction is plotted"));
    // Read-only text rather than a word-wrapped label: it lays out only the
    // lines in view when a result brings new peaks (a label measured its whole
    // text again, a tenth of an edit), and scrolls when the lines do not fit.
    peaks_->setReadOnly(true);
    peaks_->setFrameShape(QFrame::NoFrame);
    peaks_->viewport()->setAutoFillBackground(false);
    peaks_->setObjectName("peakList");
    readout_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    // The readout is one line elided to the room there is: a long one must not widen the window.
    readout_->setSizePolicy(QSizePolicy::Ignored, QSizePolicy::Preferred);
    readout_->installEventFilter(this);
    plot_->installEventFilter(this);
    plot_->setAutoAddPlottableToLegend(false);  // each pane has a legend of its own
    // Nothing is drawn on the overlay; as a buffer of its own, as tall as all
    // the panes, it was cleared at every replot and laid over the rest at
    // every paint for nothing.
    plot_->layer("overlay")->setMode(QCPLayer::lmLogical);
    // The curves, peak marks and cursors (the "main" layer) have a buffer of
    // their own: a new result or step draws them again over the axes,
    // titles and legends left as they were.
    plot_->layer("main")->setMode(QCPLayer::lmBuffered);

    auto* side = new QWidget(this);
    auto* sideLayout = new QVBoxLayout(side);
    sideLayout->setContentsMargins(0, 0, 0, 0);
    sideLayout->addWidget(new QLabel(tr("Reactions at"), side));
    sideLayout->addWidget(joints_, 1);
    sideLayout->addWidget(components_);
    sideLayout->addWidget(new QLabel(tr("Peaks"), side));
    // One line per curve: however many there are, the list scrolls rather than being cut off.
    sideLayout->addWidget(peaks_, 2);
    auto* centre = new QWidget(this);
    auto* centreLayout = new QVBoxLayout(centre);
    centreLayout->setContentsMargins(0, 0, 0, 0);
    // Each pane keeps a readable height; the stack scrolls when they do not fit.
    scroll_ = new QScrollArea(centre);
    scroll_->setWidgetResizable(true);
    scroll_->setFrameShape(QFrame::NoFrame);
    scroll_->setWidget(plot_);
    scroll_->viewport()->installEventFilter(this);
    centreLayout->addWidget(scroll_, 1);
    centreLayout->addWidget(readout_);
    auto* split = new QSplitter(this);
    split->addWidget(side);
    split->addWidget(centre);
    split->setStretchFactor(1, 1);
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->addWidget(split);

    connect(analysis_, &AnalysisState::resultChanged, this, &PlotStack::rebuild);
    connect(analysis_, &AnalysisState::currentStepChanged, this, &PlotStack::moveCursor);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &PlotStack::rebuild);
    connect(joints_, &QListWidget::itemChanged, this, &PlotStack::jointTicked);
    connect(components_, &QCheckBox::toggled, this, [this](bool on) {
        choice_.components = on;
        rebuild();
    });
    connect(plot_, &QCustomPlot::mousePress, this, &PlotStack::pointerPressed);
    connect(plot_, &QCustomPlot::mouseMove, this, &PlotStack::pointerMoved);
    connect(scroll_->verticalScrollBar(), &QScrollBar::valueChanged, this, &PlotStack::scrolled);
    // Panes out of view are left out of the widget's replots only; every
    // layerable is visible again after it, for exports and hit tests.
    connect(plot_, &QCustomPlot::beforeReplot, this, [this] {
        replotting_ = true;
        ++replots_;
    });
    connect(plot_, &QCustomPlot::afterLayout, this, &PlotStack::leaveOutPanesOutOfView);
    connect(plot_, &QCustomPlot::afterReplot, this, [this] {
        replotting_ = false;
        redraw_ = Redraw::None;
        for (const PaneParts& parts : parts_)
            for (QCPLayerable* l : layerables(parts)) l->setVisible(true);
    });
    rebuild();
}

void PlotStack::setChoice(PaneChoice choice)
{
    choice_ = std::move(choice);
    picked_ = true;
    rebuild();
}

void PlotStack::jointTicked(QListWidgetItem* item)
{
    picked_ = true;
    choice_.mostLoaded = false;
    const std::string name = item->text().toStdString();
    if (item->checkState() == Qt::Checked) choice_.hiddenJoints.erase(name);
    else choice_.hiddenJoints.insert(name);
    rebuild();
}

// The list shows the mechanism's joints, then its cylinders' end pins; the
// choice keeps their names, so one stays hidden across edits that keep it.
void PlotStack::listJoints(const CompiledMechanism& m)
{
    std::vector<std::string> names;
    for (const auto& j : m.joints) names.push_back(j.name);
    for (const auto& end : cylinderEnds(m)) names.push_back(end.name);
    // Another mechanism altogether: the joints picked for the last one mean nothing here.
    if (!listed_.empty() &&
        std::none_of(names.begin(), names.end(), [this](const std::string& n) { return listed_.count(n) > 0; }))
        picked_ = false;
    listed_ = {names.begin(), names.end()};
    bool same = joints_->count() == int(names.size());
    for (int j = 0; same && j < joints_->count(); ++j) same = joints_->item(j)->text().toStdString() == names[j];
    if (same) return;
    const QSignalBlocker block(joints_);
    joints_->clear();
    for (const auto& name : names) {
        auto* item = new QListWidgetItem(QString::fromStdString(name), joints_);
        item->setFlags(item->flags() | Qt::ItemIsUserCheckable);
    }
}

void PlotStack::showChoice()
{
    const QSignalBlocker blockJoints(joints_), blockComponents(components_);
    for (int j = 0; j < joints_->count(); ++j) {
        const bool hidden = choice_.hiddenJoints.count(joints_->item(j)->text().toStdString()) > 0;
        joints_->item(j)->setCheckState(hidden ? Qt::Unchecked : Qt::Checked);
    }
    components_->setChecked(choice_.components);
}

// A pane: a header row with its title and a legend of line samples, then
// the axes with a graph and a peak mark per curve and the cursor; every pane
// numbers the x axis and names it, so any one scrolled into view reads alone.
PlotStack::PaneParts PlotStack::addPane(const PlotPane& pane, QCPMarginGroup* margins)
{
    PaneParts parts;
    parts.header = new QCPLayoutGrid;
    const int row = plot_->plotLayout()->rowCount();
    plot_->plotLayout()->addElement(row, 0, parts.header);
    plot_->plotLayout()->setRowStretchFactor(row, 0.001);  // as tall as its text, the axes take the rest
    auto* title = new QCPTextElement(plot_, pane.title, QFont(font().family(), font().pointSize(), QFont::Bold));
    title->setTextFlags(Qt::AlignLeft | Qt::AlignVCenter);
    title->setLayer("legend");  // not with the curves, which are drawn again alone
    // A text element is at most as tall as its text unless given a maximum
    // of its own (well below Qt's "unbounded", its margins are added): it
    // held the header's row to one line, and a legend wrapped to several
    // rows was cut to a strip.
    title->setMaximumSize(QWIDGETSIZE_MAX, QWIDGETSIZE_MAX / 2);
    parts.header->addElement(0, 0, title);
    auto* legend = new QCPLegend;
    parts.header->addElement(0, 1, legend);
    parts.header->setColumnStretchFactors({0.001, 1});
    legend->setFillOrder(QCPLegend::foColumnsFirst);
    legend->setBorderPen(Qt::NoPen);
    legend->setBrush(Qt::NoBrush);
    legend->setIconSize(26, 18);  // rows tall enough for the underscores in names
    legend->setFont(font());
    legend->setLayer("legend");
    parts.legend = legend;

    auto* rect = new QCPAxisRect(plot_);
    rect->axis(QCPAxis::atLeft)->setLabel(pane.unit);
    rect->axis(QCPAxis::atLeft)->ticker()->setTickCount(3);
    rect->axis(QCPAxis::atBottom)->ticker()->setTickCount(8);
    rect->axis(QCPAxis::atBottom)->setLabel(axis_.label);
    rect->axis(QCPAxis::atBottom)->setLabelPadding(1);
    rect->setRangeDrag(Qt::Orientations());
    rect->setRangeZoom(Qt::Orientations());
    rect->setMarginGroup(QCP::msLeft | QCP::msRight, margins);
    plot_->plotLayout()->addElement(plot_->plotLayout()->rowCount(), 0, rect);
    parts.rect = rect;
    QCPAxis* xa = rect->axis(QCPAxis::atBottom);
    QCPAxis* ya = rect->axis(QCPAxis::atLeft);
    for (const PlotCurve& c : pane.curves) {
        QCPGraph* g = new DecimatedGraph(xa, ya);
        g->setName(c.series.name);
        g->setPen(curvePen(c.pen));
        g->addToLegend(legend);
        parts.graphs.push_back(g);
        auto* mark = new QCPItemTracer(plot_);
        mark->setClipAxisRect(rect);  // an item is clipped to the first pane unless told
        mark->setGraph(g);
        mark->setStyle(QCPItemTracer::tsCircle);
        mark->setSize(7);
        mark->setPen(QPen(g->pen().color(), 1.2));
        mark->setBrush(Qt::white);
        parts.marks.push_back(mark);
    }
    parts.cursor = new QCPItemStraightLine(plot_);
    parts.cursor->setClipAxisRect(rect);
    parts.cursor->point1->setAxes(xa, ya);
    parts.cursor->point2->setAxes(xa, ya);
    parts.cursor->setPen(QPen(palette::driver(), 1.2));
    return parts;
}

void PlotStack::clearPlot()
{
    plot_->clearItems();
    plot_->clearPlottables();
    plot_->plotLayout()->clear();
    parts_.clear();
}

void PlotStack::rebuild()
{
    peaks_->clear();
    if (!analysis_->hasResult()) {
        // Nothing of an earlier result may stay on screen beside the reason.
        clearPlot();
        panes_.clear();
        const QSignalBlocker blockJoints(joints_);
        joints_->clear();
        plot_->setMinimumHeight(0);  // no room kept for the panes that were
        showReadout(analysis_->errorText());
        replotWhenSeen(Redraw::All);
        return;
    }
    showReadout({});  // an earlier error, or values read off the old curves
    const auto& m = analysis_->compiled();
    const QString oldLabel = axis_.label;
    axis_ = cycleAxis(m, analysis_->result());
    listJoints(m);
    if (!picked_) choice_ = mostLoadedChoice(m, analysis_->result(), choice_.components);
    showChoice();
    std::vector<PlotPane> panes = plotPanes(m, analysis_->result(), renderUnits(DisplayUnits::instance()), choice_);
    const bool keep = !parts_.empty() && axis_.label == oldLabel && sameCurves(panes, panes_);
    panes_ = std::move(panes);
    if (!keep) {
        clearPlot();
        auto* margins = new QCPMarginGroup(plot_);
        for (const PlotPane& pane : panes_) parts_.push_back(addPane(pane, margins));
    }
    QStringList peakLines;
    bool framed = !keep;  // the axes, titles, legends or shading change
    for (std::size_t i = 0; i < panes_.size(); ++i) peakLines << fillPane(panes_[i], parts_[i], !keep, framed);
    if (!keep) fitLegends();
    peaks_->setPlainText(peakLines.join("\n"));
    moveCursor(analysis_->currentStep());
    replotWhenSeen(framed ? Redraw::All : Redraw::Curves);
}

// Legends wrap to the room their title leaves (at most three quarters of the
// plot's width), so that a long title never widens the plot; the plot is as
// tall as its panes need.
void PlotStack::fitLegends()
{
    int extra = 0;  // px: the legends' rows past their first
    for (const PaneParts& parts : parts_) {
        const int title = parts.header->element(0, 0)->minimumOuterSizeHint().width();
        wrapLegend(parts.legend, std::min(plot_->width() * 3 / 4, plot_->width() - title - 2 * kEdge));
        const int rows = std::max(1, parts.legend->rowCount());
        extra += parts.legend->minimumOuterSizeHint().height() * (rows - 1) / rows;
    }
    plot_->setMinimumHeight(PlotStack::kPaneHeight * int(panes_.size()) + extra + 20);
}

// Sets one pane's curves, their peaks, the ranges and the shading; returns
// the peak lines for the list beside the plots. A fresh pane takes the range
// its curves want; a kept one keeps its range while the curves still fit it.
// `framed` is set when a range or the shading changed.
QStringList PlotStack::fillPane(const PlotPane& pane, PaneParts& parts, bool fresh, bool& framed)
{
    const CycleResult& r = analysis_->result();
    const QVector<double> x(axis_.values.begin(), axis_.values.end());
    const double end = plannedEnd(axis_, r);
    QCPAxis* xa = parts.rect->axis(QCPAxis::atBottom);
    QCPAxis* ya = parts.rect->axis(QCPAxis::atLeft);
    const QCPRange span(std::min({x.front(), x.back(), end}), std::max({x.front(), x.back(), end}));
    if (fresh || xa->range() != span) {
        xa->setRange(span);
        framed = true;
    }
    const std::vector<bool> unreliable = unreliableSteps(r);
    QStringList peakLines;
    double lo = 0, hi = 0;
    for (std::size_t i = 0; i < pane.curves.size(); ++i) {
        const CycleSeries& s = pane.curves[i].series;
        parts.graphs[i]->setData(x, QVector<double>(s.values.begin(), s.values.end()), true);
        const CurvePeak peak = curvePeak(s.values, unreliable);
        parts.marks[i]->setGraphKey(x[peak.step]);
        peakLines << tr("%1: %2").arg(s.name, peakText(s, axis_, peak));
        for (const double v : s.values) {
            lo = std::min(lo, v);
            hi = std::max(hi, v);
        }
    }
    if (fresh || !stillFits(ya->range(), lo, hi)) {
        ya->setRange(wantedRange(lo, hi));
        framed = true;
    }
    std::vector<Shade> shades;
    QColor flagged = palette::problem();
    flagged.setAlphaF(0.15);
    for (const auto& [a, b] : unreliableRuns(unreliable))
        shades.push_back({x[std::max(a - 1, 0)], x[std::min<int>(b + 1, x.size() - 1)], flagged});
    if (end != x.back()) {
        QColor unreached = palette::groundHatch();
        unreached.setAlphaF(0.2);
        shades.push_back({x.back(), end, unreached});
    }
    framed |= setShades(parts, std::move(shades));
    return peakLines;
}

// Bands over the pane's full height between two axis values; false when
// they are those already shown.
bool PlotStack::setShades(PaneParts& parts, std::vector<Shade> shades)
{
    if (shades == parts.shaded && parts.shades.size() == shades.size()) return false;
    for (QCPAbstractItem* old : parts.shades) plot_->removeItem(old);
    parts.shades.clear();
    QCPAxisRect* rect = parts.rect;
    for (const Shade& s : shades) {
        auto* box = new QCPItemRect(plot_);
        box->setClipAxisRect(rect);
        for (QCPItemPosition* corner : {box->topLeft, box->bottomRight}) {
            corner->setAxes(rect->axis(QCPAxis::atBottom), rect->axis(QCPAxis::atLeft));
            corner->setTypeY(QCPItemPosition::ptAxisRectRatio);
            corner->setAxisRect(rect);
        }
        box->topLeft->setCoords(s.from, 0);
        box->bottomRight->setCoords(s.to, 1);
        box->setPen(Qt::NoPen);
        box->setBrush(s.colour);
        box->setLayer("background");
        parts.shades.push_back(box);
    }
    parts.shaded = std::move(shades);
    return true;
}

// Everything drawn for a pane: its layout elements (their axes, grids and
// graphs go with them) and its items.
std::vector<QCPLayerable*> PlotStack::layerables(const PaneParts& parts) const
{
    std::vector<QCPLayerable*> out{parts.header, parts.rect, parts.cursor};
    out.insert(out.end(), parts.graphs.begin(), parts.graphs.end());
    out.insert(out.end(), parts.marks.begin(), parts.marks.end());
    out.insert(out.end(), parts.shades.begin(), parts.shades.end());
    return out;
}

bool PlotStack::inView(const PaneParts& parts) const
{
    const QRect view(plot_->mapFrom(scroll_->viewport(), QPoint(0, 0)), scroll_->viewport()->size());
    const QRect pane = parts.header->outerRect().united(parts.rect->outerRect());
    return pane.intersects(view);
}

// A replot of the widget, its layout done: the panes scrolled out of view are
// left out (most of a replot is the curves); scrolled() draws them when they
// come into view.
void PlotStack::leaveOutPanesOutOfView()
{
    if (!replotting_) return;  // an export's drawing: every pane
    const bool shown = plot_->isVisible();
    for (PaneParts& parts : parts_) {
        parts.drawn = !shown || inView(parts);
        if (!parts.drawn)
            for (QCPLayerable* l : layerables(parts)) l->setVisible(false);
    }
}

void PlotStack::scrolled()
{
    for (const PaneParts& parts : parts_)
        if (!parts.drawn && inView(parts)) return plot_->replot();
}

void PlotStack::moveCursor(int step)
{
    if (!analysis_->hasResult() || step < 0 || step >= int(axis_.values.size())) return;
    const double x = axis_.values[step];
    for (const PaneParts& parts : parts_) {
        parts.cursor->point1->setCoords(x, 0);
        parts.cursor->point2->setCoords(x, 1);
    }
    replotWhenSeen(Redraw::Curves);
}

// Behind another tab the plots are not drawn for every result or step: a
// large mechanism's hundreds of curves would cost each edit for nothing.
void PlotStack::replotWhenSeen(Redraw what)
{
    redraw_ = std::max(redraw_, what);
    sight_->request();
}

void PlotStack::redraw()
{
    redrawQueued_ = false;
    if (redraw_ == Redraw::All) plot_->replot();
    else if (redraw_ == Redraw::Curves) redrawCurves();
    redraw_ = Redraw::None;
}

// The curves, marks and cursors of the panes in view drawn again on their
// own layer; those out of view are left out, and drawn whole when they come
// into view, as at a full replot (leaveOutPanesOutOfView).
void PlotStack::redrawCurves()
{
    for (const PaneParts& parts : parts_)
        if (!parts.drawn && inView(parts)) return plot_->replot();  // its axes were never drawn
    std::vector<QCPLayerable*> hidden;
    for (PaneParts& parts : parts_)
        if (!inView(parts)) {
            parts.drawn = false;
            for (QCPLayerable* l : layerables(parts))
                if (l->visible()) {
                    l->setVisible(false);
                    hidden.push_back(l);
                }
        }
    const int replots = replots_;
    plot_->layer("main")->replot();  // all of it when the buffers are new (after a resize)
    for (QCPLayerable* l : hidden) l->setVisible(true);
    // Told as a replot to what follows the plot's drawing, unless the layer's replot was a whole one.
    if (replots_ == replots) emit plot_->afterReplot();
}

double PlotStack::cursorX() const
{
    return parts_.empty() ? std::nan("") : parts_.front().cursor->point1->coords().x();
}

int PlotStack::stepAtPixel(double px) const
{
    auto* rect = plot_->axisRect(0);
    return rect ? axis_.nearestStep(rect->axis(QCPAxis::atBottom)->pixelToCoord(px)) : -1;
}

QPoint PlotStack::pixelForStep(int step) const
{
    auto* rect = plot_->axisRect(0);
    if (!rect || step < 0 || step >= int(axis_.values.size())) return {};
    return {int(std::lround(rect->axis(QCPAxis::atBottom)->coordToPixel(axis_.values[step]))), rect->center().y()};
}

void PlotStack::pointerPressed(QMouseEvent* e)
{
    if (e->button() == Qt::LeftButton && !parts_.empty()) analysis_->setCurrentStep(stepAtPixel(e->position().x()));
}

void PlotStack::pointerMoved(QMouseEvent* e)
{
    if (parts_.empty()) return;
    const int step = stepAtPixel(e->position().x());
    if (e->buttons() & Qt::LeftButton) analysis_->setCurrentStep(step);
    QStringList parts{tr("%1 = %2").arg(axis_.name, axis_.format(axis_.values[step]))};
    for (const PlotPane& pane : panes_)
        for (const PlotCurve& c : pane.curves)
            parts << tr("%1 %2").arg(c.series.name, formatQuantity(c.series.values[step], c.series.unit));
    showReadout(parts.join("   "));
}

void PlotStack::showReadout(const QString& text)
{
    fullReadout_ = text;
    readout_->setToolTip(text);
    readout_->setText(readout_->fontMetrics().elidedText(text, Qt::ElideRight, readout_->width()));
}

bool PlotStack::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == readout_ && event->type() == QEvent::Resize) showReadout(fullReadout_);
    // A new width may wrap the legends otherwise; the height they set must not start it again.
    if (watched == plot_ && event->type() == QEvent::Resize && !parts_.empty() &&
        static_cast<QResizeEvent*>(event)->oldSize().width() != plot_->width()) {
        fitLegends();
        replotWhenSeen(Redraw::All);
    }
    if (watched == scroll_->viewport() && event->type() == QEvent::Resize) scrolled();  // a taller view shows more
    // The plots take the wheel and do nothing with it (they neither zoom nor
    // pan): it scrolls the stack, as over any other list of panes.
    if (watched == plot_ && event->type() == QEvent::Wheel) {
        QCoreApplication::sendEvent(scroll_->verticalScrollBar(), event);
        return true;
    }
    return QWidget::eventFilter(watched, event);
}

QString PlotStack::peakListText() const { return peaks_->toPlainText(); }
QString PlotStack::readoutText() const { return fullReadout_; }

}  // namespace clevis::ui
