#include "ui/results/plot_stack.h"

#include "ui/analysis/analysis_state.h"
#include "render/cycle_series.h"
#include "ui/shell/display_units.h"
#include "render/palette.h"

#include <QCheckBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QListWidget>
#include <QScrollArea>
#include <QSplitter>
#include <QVBoxLayout>
#include <qcustomplot.h>

#include <cmath>

namespace clevis::ui {
namespace {

constexpr int kPaneHeight = 130;  // px: room for three ticks and a legend line

struct Pane {
    QString title;
    std::vector<CycleSeries> series;
};

QPen curvePen(int index)
{
    const QColor colours[] = {palette::ink(), palette::link(), palette::driver(), palette::load(), palette::spring(),
                              palette::weight()};
    const Qt::PenStyle styles[] = {Qt::SolidLine, Qt::DashLine, Qt::DotLine, Qt::DashDotLine};
    return QPen(colours[index % 6], 1.6, styles[index % 4]);
}

}  // namespace

PlotStack::PlotStack(AnalysisState* analysis, QWidget* parent)
    : QWidget(parent),
      analysis_(analysis),
      joints_(new QListWidget(this)),
      components_(new QCheckBox(tr("Components Fx, Fy"), this)),
      plot_(new QCustomPlot(this)),
      readout_(new QLabel(this)),
      peaks_(new QLabel(this))
{
    setObjectName("plotStack");
    plot_->setObjectName("cyclePlots");
    plot_->setMouseTracking(true);
    joints_->setToolTip(tr("Tick the joints whose reaction is plotted"));
    peaks_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    peaks_->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    peaks_->setWordWrap(true);
    readout_->setTextInteractionFlags(Qt::TextSelectableByMouse);

    auto* side = new QWidget(this);
    auto* sideLayout = new QVBoxLayout(side);
    sideLayout->setContentsMargins(0, 0, 0, 0);
    sideLayout->addWidget(new QLabel(tr("Reactions at"), side));
    sideLayout->addWidget(joints_, 1);
    sideLayout->addWidget(components_);
    sideLayout->addWidget(new QLabel(tr("Peaks"), side));
    sideLayout->addWidget(peaks_, 2);
    auto* centre = new QWidget(this);
    auto* centreLayout = new QVBoxLayout(centre);
    centreLayout->setContentsMargins(0, 0, 0, 0);
    // Each pane keeps a readable height; the stack scrolls when they do not fit.
    auto* scroll = new QScrollArea(centre);
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);
    scroll->setWidget(plot_);
    centreLayout->addWidget(scroll, 1);
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
    connect(joints_, &QListWidget::itemChanged, this, &PlotStack::rebuild);
    connect(components_, &QCheckBox::toggled, this, &PlotStack::rebuild);
    connect(plot_, &QCustomPlot::mousePress, this, &PlotStack::pointerPressed);
    connect(plot_, &QCustomPlot::mouseMove, this, &PlotStack::pointerMoved);
    rebuild();
}

QCPAxisRect* PlotStack::addPane(const QString& unit, bool lastPane)
{
    auto* rect = new QCPAxisRect(plot_);
    rect->axis(QCPAxis::atLeft)->setLabel(unit);
    rect->axis(QCPAxis::atLeft)->ticker()->setTickCount(3);
    rect->axis(QCPAxis::atBottom)->ticker()->setTickCount(8);
    rect->axis(QCPAxis::atBottom)->setTickLabels(lastPane);
    if (lastPane) rect->axis(QCPAxis::atBottom)->setLabel(axis_.label);
    rect->setRangeDrag(Qt::Orientations());
    rect->setRangeZoom(Qt::Orientations());
    plot_->plotLayout()->addElement(plot_->plotLayout()->rowCount(), 0, rect);
    return rect;
}

void PlotStack::rebuild()
{
    plot_->clearItems();
    plot_->clearPlottables();
    plot_->plotLayout()->clear();
    cursors_.clear();
    peaks_->clear();
    if (!analysis_->hasResult()) {
        readout_->setText(analysis_->errorText());
        plot_->replot();
        return;
    }
    const auto& m = analysis_->compiled();
    const auto& r = analysis_->result();
    const RenderUnits u = renderUnits(DisplayUnits::instance());
    axis_ = cycleAxis(m, r);

    // Keep the ticks when the joints are the same, else tick them all.
    if (joints_->count() != int(m.joints.size()) ||
        (joints_->count() > 0 && joints_->item(0)->text() != QString::fromStdString(m.joints[0].name))) {
        const QSignalBlocker block(joints_);
        joints_->clear();
        for (const auto& j : m.joints) {
            auto* item = new QListWidgetItem(QString::fromStdString(j.name), joints_);
            item->setFlags(item->flags() | Qt::ItemIsUserCheckable);
            item->setCheckState(Qt::Checked);
        }
    }

    std::vector<Pane> panes;
    Pane reactions{tr("Joint reactions"), {}};
    for (int j = 0; j < joints_->count(); ++j) {
        if (joints_->item(j)->checkState() != Qt::Checked) continue;
        reactions.series.push_back(jointReactionSeries(m, r, j, ReactionPart::Magnitude, u));
        if (components_->isChecked()) {
            reactions.series.push_back(jointReactionSeries(m, r, j, ReactionPart::X, u));
            reactions.series.push_back(jointReactionSeries(m, r, j, ReactionPart::Y, u));
        }
    }
    if (!reactions.series.empty()) panes.push_back(reactions);
    for (const DriverType type : {DriverType::Rotary, DriverType::Linear}) {
        Pane effort{type == DriverType::Rotary ? tr("Drive torque") : tr("Drive force"), {}};
        for (std::size_t d = 0; d < m.drivers.size(); ++d)
            if (m.drivers[d].type == type) effort.series.push_back(driverEffortSeries(m, r, int(d), u));
        if (!effort.series.empty()) panes.push_back(effort);
    }
    Pane power{tr("Driver power"), {}};
    for (std::size_t d = 0; d < m.drivers.size(); ++d) power.series.push_back(driverPowerSeries(m, r, int(d)));
    if (!power.series.empty()) panes.push_back(power);
    panes.push_back({tr("Shaking force"), {shakingForceSeries(r, u)}});
    panes.push_back({tr("Shaking moment"), {shakingMomentSeries(r, u)}});
    Pane transmission{tr("Transmission angle"), {}};
    for (std::size_t k = 0; k < r.transmissionPins.size(); ++k) transmission.series.push_back(transmissionSeries(m, r, int(k)));
    if (!transmission.series.empty()) panes.push_back(transmission);

    const QVector<double> x(axis_.values.begin(), axis_.values.end());
    double xlo = x.front(), xhi = x.back();
    if (xlo > xhi) std::swap(xlo, xhi);
    // The part of the cycle not reached, extrapolated at the solved spacing.
    double unreachedEnd = xhi;
    if (!r.complete && x.size() > 1) unreachedEnd = x.front() + (x.back() - x.front()) * r.plannedSteps / (x.size() - 1);
    auto* margins = new QCPMarginGroup(plot_);
    QStringList peakLines;
    int curve = 0;
    for (std::size_t i = 0; i < panes.size(); ++i) {
        const Pane& pane = panes[i];
        QCPAxisRect* rect = addPane(pane.series.front().unit, i + 1 == panes.size());
        rect->setMarginGroup(QCP::msLeft | QCP::msRight, margins);
        QCPAxis* xa = rect->axis(QCPAxis::atBottom);
        QCPAxis* ya = rect->axis(QCPAxis::atLeft);
        xa->setRange(std::min(xlo, unreachedEnd), std::max(xhi, unreachedEnd));
        auto* legend = new QCPItemText(plot_);
        legend->setClipAxisRect(rect);
        legend->position->setAxisRect(rect);
        legend->position->setType(QCPItemPosition::ptAxisRectRatio);
        legend->position->setCoords(0.005, 0.02);
        legend->setPositionAlignment(Qt::AlignLeft | Qt::AlignTop);
        QStringList names;
        double lo = 0, hi = 0;
        for (const CycleSeries& s : pane.series) {
            QCPGraph* g = plot_->addGraph(xa, ya);
            g->setName(s.name);
            g->setPen(curvePen(curve++));
            g->setData(x, QVector<double>(s.values.begin(), s.values.end()), true);
            names << s.name;
            const auto peak = std::max_element(s.values.begin(), s.values.end(), [](double a, double b) { return std::abs(a) < std::abs(b); });
            const int k = int(peak - s.values.begin());
            auto* mark = new QCPItemTracer(plot_);
            mark->setGraph(g);
            mark->setGraphKey(x[k]);
            mark->setStyle(QCPItemTracer::tsCircle);
            mark->setSize(7);
            mark->setPen(g->pen());
            peakLines << tr("%1: %2 at %3 %4").arg(s.name, formatQuantity(*peak, s.unit)).arg(x[k], 0, 'f', axis_.byTime ? 4 : 1).arg(axis_.unit);
            for (const double v : s.values) {
                lo = std::min(lo, v);
                hi = std::max(hi, v);
            }
        }
        legend->setText(pane.title + ": " + names.join(", "));
        const double pad = std::max(1e-9, 0.08 * (hi - lo));
        ya->setRange(lo - (lo < 0 ? pad : 0), hi + pad + 0.12 * (hi - lo));
        const auto shade = [&](double a, double b, QColor c) {
            auto* box = new QCPItemRect(plot_);
            box->setClipAxisRect(rect);
            box->topLeft->setAxes(xa, ya);
            box->bottomRight->setAxes(xa, ya);
            box->topLeft->setTypeY(QCPItemPosition::ptAxisRectRatio);
            box->bottomRight->setTypeY(QCPItemPosition::ptAxisRectRatio);
            box->topLeft->setAxisRect(rect);
            box->bottomRight->setAxisRect(rect);
            box->topLeft->setCoords(a, 0);
            box->bottomRight->setCoords(b, 1);
            box->setPen(Qt::NoPen);
            box->setBrush(c);
            box->setLayer("background");
        };
        QColor flagged = palette::problem();
        flagged.setAlphaF(0.15);
        for (const auto& [a, b] : nearSingularRuns(r)) shade(x[std::max(a - 1, 0)], x[std::min<int>(b + 1, x.size() - 1)], flagged);
        if (unreachedEnd != x.back()) {
            QColor unreached = palette::groundHatch();
            unreached.setAlphaF(0.2);
            shade(x.back(), unreachedEnd, unreached);
        }
        auto* cursor = new QCPItemStraightLine(plot_);
        cursor->setClipAxisRect(rect);
        cursor->point1->setAxes(xa, ya);
        cursor->point2->setAxes(xa, ya);
        cursor->setPen(QPen(palette::driver(), 1.2));
        cursors_.push_back(cursor);
    }
    plot_->setMinimumHeight(kPaneHeight * int(panes.size()) + 40);
    peaks_->setText(peakLines.join("\n"));
    moveCursor(analysis_->currentStep());
}

void PlotStack::moveCursor(int step)
{
    if (!analysis_->hasResult() || step < 0 || step >= int(axis_.values.size())) return;
    const double x = axis_.values[step];
    for (QCPItemStraightLine* c : cursors_) {
        c->point1->setCoords(x, 0);
        c->point2->setCoords(x, 1);
    }
    plot_->replot(QCustomPlot::rpQueuedReplot);
}

double PlotStack::cursorX() const { return cursors_.empty() ? std::nan("") : cursors_.front()->point1->coords().x(); }

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
    if (e->button() == Qt::LeftButton && !cursors_.empty()) analysis_->setCurrentStep(stepAtPixel(e->position().x()));
}

void PlotStack::pointerMoved(QMouseEvent* e)
{
    if (cursors_.empty()) return;
    const int step = stepAtPixel(e->position().x());
    if (e->buttons() & Qt::LeftButton) analysis_->setCurrentStep(step);
    QStringList parts{tr("%1 = %2").arg(axis_.label).arg(axis_.values[step], 0, 'f', axis_.byTime ? 4 : 1)};
    for (int g = 0; g < plot_->graphCount(); ++g) {
        const QCPGraph* graph = plot_->graph(g);
        const double v = (graph->data()->constBegin() + step)->value;
        parts << tr("%1 %2").arg(graph->name(), formatQuantity(v, graph->valueAxis()->label()));
    }
    readout_->setText(parts.join("   "));
}

QString PlotStack::peakListText() const { return peaks_->text(); }
QString PlotStack::readoutText() const { return readout_->text(); }

}  // namespace clevis::ui
