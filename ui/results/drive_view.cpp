#include "ui/results/drive_view.h"

#include "core/file/mechanism_file_format.h"
#include "render/chart_style.h"
#include "render/cycle_axis.h"
#include "render/cycle_chart.h"
#include "render/drive_figures.h"
#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/in_sight.h"
#include "ui/shell/display_units.h"

#include <QComboBox>
#include <QEvent>
#include <QFontInfo>
#include <QHBoxLayout>
#include <QLabel>
#include <QPainter>
#include <QScrollArea>
#include <QVBoxLayout>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr int kLeastFigureWidth = 340;   // pixels: narrower, the tick numbers crowd
constexpr int kNarrowFigureWidth = 250;  // pixels: the least, where height is short (drive figures are tested at 240)
constexpr int kGap = 8;                  // pixels between figures
constexpr double kChartText = 10;        // the charts' own text size, logical units (chart_style.cpp)
constexpr double kTextShare = 0.85;      // chart text against the window's font, as on the other charts

QString qs(const std::string& s) { return QString::fromStdString(s); }

}  // namespace

DriveView::DriveView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , doc_(doc)
    , analysis_(analysis)
    , choice_(new QComboBox(this))
    , warnings_(new QLabel(this))
    , motion_(new QLabel(this))
    , scroll_(new QScrollArea(this))
    , canvas_(new QWidget)
{
    setObjectName("driveView");
    sight_ = new SightWatch(this, [this] {
        if (analysis_->busy() && analysis_->hasResult()) return false;  // the result coming will do it
        workOut();
        return true;
    });
    choice_->setObjectName("driveChoice");
    choice_->setToolTip(tr("Whose drive: every driver with a gearbox, a motor characteristic or a cylinder"));
    choice_->setSizeAdjustPolicy(QComboBox::AdjustToContents);  // the driver's whole name and kind
    motion_->setObjectName("driveMotion");
    motion_->setWordWrap(true);
    motion_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    warnings_->setObjectName("driveWarnings");
    warnings_->setWordWrap(true);
    warnings_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    QPalette warningColours = warnings_->palette();
    warningColours.setColor(QPalette::WindowText, palette::problem());
    warnings_->setPalette(warningColours);
    scroll_->setWidget(canvas_);
    scroll_->setFrameShape(QFrame::NoFrame);
    scroll_->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    canvas_->installEventFilter(this);
    scroll_->viewport()->installEventFilter(this);
    auto* top = new QHBoxLayout;
    top->setContentsMargins(0, 0, 0, 0);
    top->addWidget(choice_);
    top->addStretch(1);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->setSpacing(2);
    layout->addLayout(top);
    layout->addWidget(motion_);
    layout->addWidget(warnings_);
    layout->addWidget(scroll_, 1);
    connect(analysis_, &AnalysisState::resultChanged, this, &DriveView::solved);
    connect(doc_, &MechanismDocument::documentReset, this, &DriveView::solved);
    connect(doc_, &MechanismDocument::selectionChanged, this, &DriveView::selectionMoved);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &DriveView::showDriver);
    connect(choice_, &QComboBox::currentIndexChanged, this, &DriveView::showDriver);
    solved();
}

std::vector<const Figure*> DriveView::figures() const
{
    std::vector<const Figure*> out;
    for (const auto& f : figures_) out.push_back(f.get());
    return out;
}

QString DriveView::warningText() const { return warnings_->text(); }

QString DriveView::motionText() const { return motion_->text(); }

// The drive is worked out from the mechanism the result was solved for: while
// an edit is being solved the document is newer, and its result follows.
void DriveView::solved()
{
    if (analysis_->busy() && analysis_->hasResult()) return;
    sight_->request();  // the drive studies cost an edit for nothing while unseen
}

void DriveView::workOut()
{
    drive_.reset();
    if (analysis_->hasResult()) {
        const auto& m = analysis_->compiled();
        drive_ = driveResultsWithStudies(doc_->mechanism(), m, analysis_->result(), analysis_->summary().unreliable,
                                         analysis_->found());
    }
    const QString kept = choice_->currentText();
    choices_.clear();
    {
        const QSignalBlocker quiet(choice_);
        choice_->clear();
        if (drive_) {
            const auto& m = analysis_->compiled();
            for (const MotorDuty& d : drive_->motors) choices_.push_back(d.driver);
            for (const CylinderDuty& c : drive_->cylinders) choices_.push_back(c.driver);
            std::sort(choices_.begin(), choices_.end());
            for (const int d : choices_)
                choice_->addItem(m.drivers[d].type == DriverType::Linear ? tr("%1: cylinder").arg(qs(m.drivers[d].name))
                                 : findDriver(doc_->mechanism().drivers, m.drivers[d].name)->gearbox
                                     ? tr("%1: motor through a gearbox").arg(qs(m.drivers[d].name))
                                     : tr("%1: motor").arg(qs(m.drivers[d].name)));
        }
        choice_->setCurrentIndex(std::max(0, choice_->findText(kept)));
    }
    choice_->setEnabled(choices_.size() > 1);
    choice_->setVisible(!choices_.empty());  // an empty choice above the message says nothing
    selectionMoved();
    showDriver();
}

void DriveView::selectionMoved()
{
    const Selection s = doc_->selection();
    if (sight_->pending() || s.kind != Selection::Kind::Driver || !analysis_->hasResult()) return;
    for (std::size_t i = 0; i < choices_.size(); ++i)
        if (qs(analysis_->compiled().drivers[choices_[i]].name) == s.name) choice_->setCurrentIndex(int(i));
}

void DriveView::showDriver()
{
    if (sight_->pending()) return;  // drive_ is not this result's: all is redone when shown
    driver_ = -1;
    message_.clear();
    if (analysis_->nothingDrawn()) message_ = tr("Draw a mechanism: what its motor or cylinder must give shows here.");
    else if (!drive_) message_ = tr("No solved cycle: %1").arg(analysis_->errorText());
    else if (choices_.empty())
        message_ =
            tr("No driver has a gearbox, a motor characteristic or a cylinder: give a motor one in its "
               "properties (Gearbox and motor), or a linear drive a cylinder, to see what it must give.");
    else driver_ = choices_[std::size_t(std::clamp(choice_->currentIndex(), 0, int(choices_.size()) - 1))];
    QStringList said;
    if (drive_)
        for (const Warning& w : drive_->warnings) said << qs(w.message);
    warnings_->setText(said.join('\n'));
    warnings_->setVisible(!said.isEmpty() && driver_ >= 0);
    const auto& found = analysis_->found();
    const bool moving = drive_ && found && found->driver == driver_;
    motion_->setText(moving ? flywheelText(analysis_->compiled(), *found) : QString());
    motion_->setVisible(moving);
    layOutFigures();
}

// As many figures across as the width takes at kLeastFigureWidth each, built
// at a logical width that sets their text at about the window's size. Where
// the rows would not fit the pane's height (a laptop screen), the figures go
// narrower, down to kNarrowFigureWidth, and their plots shorter, down to
// kChartLeastPlotHeight, until they do; shorter still, the pane scrolls.
void DriveView::layOutFigures()
{
    figures_.clear();
    places_.clear();
    const int width = scroll_->viewport()->width();
    const std::vector<FigureMaker> makers = figureMakers();
    if (makers.empty()) {
        canvas_->resize(width, scroll_->viewport()->height());
        canvas_->update();
        return;
    }
    const double scale = std::max(1.0, kTextShare * QFontInfo(font()).pixelSize() / kChartText);
    const int height = scroll_->viewport()->height();
    const auto across = [&](int least) { return std::clamp((width + kGap) / (least + kGap), 1, int(makers.size())); };
    const auto build = [&](int columns, double plotHeight) {
        figures_.clear();
        const double logical = (double(width - (columns - 1) * kGap) / columns) / scale;
        for (const FigureMaker& make : makers) figures_.push_back(make(logical, plotHeight));
        return placeFigures(columns, width, scale);
    };
    if (build(across(kLeastFigureWidth), kChartPlotHeight) > height) {
        const int narrow = across(kNarrowFigureWidth);
        const int rows = (int(makers.size()) + narrow - 1) / narrow;
        double besidePlot = 0;  // the tallest figure's height beyond its plot, logical units
        for (const auto& f : figures_) besidePlot = std::max(besidePlot, f->size().height() - kChartPlotHeight);
        const double plot = std::clamp((double(height + kGap) / rows - kGap) / scale - besidePlot - 1,
                                       kChartLeastPlotHeight, kChartPlotHeight);
        build(narrow, plot);
    }
    canvas_->update();
}

// The chosen driver's figures, each to be built at a logical width and plot height.
std::vector<DriveView::FigureMaker> DriveView::figureMakers() const
{
    std::vector<FigureMaker> out;
    if (driver_ < 0 || !drive_) return out;
    const auto& m = analysis_->compiled();
    const auto& r = analysis_->result();
    const RenderUnits u = renderUnits(DisplayUnits::instance());
    const CycleAxis axis = cycleAxis(m, r);
    const auto cycleChart = [&](PlotPane pane) {
        out.push_back([pane = std::move(pane), axis, &r](double width, double plot) {
            return std::unique_ptr<Figure>(new CycleChart(pane, axis, r, width, plot));
        });
    };
    const auto xyChart = [&](XyChartContent content) {
        out.push_back([content = std::move(content)](double width, double plot) {
            return std::unique_ptr<Figure>(new XyChart(content, width, plot));
        });
    };
    if (m.drivers[driver_].type == DriverType::Rotary) {
        const auto motor = std::find_if(drive_->motors.begin(), drive_->motors.end(),
                                        [&](const MotorDuty& d) { return d.driver == driver_; });
        const Driver* described = findDriver(doc_->mechanism().drivers, m.drivers[driver_].name);
        xyChart(torqueSpeedContent(m, *motor, described ? described->motor : std::nullopt, u));
        const auto& found = analysis_->found();
        if (found && found->driver == driver_) cycleChart(speedPane(m, r, *found));
        for (PlotPane& pane : motorPanes(m, *motor, u)) cycleChart(std::move(pane));
        for (const RatioStudy& s : drive_->studies)
            if (s.driver == driver_) xyChart(ratioStudyContent(m, s, motor->gearbox.ratio, u));
    } else {
        const auto cylinder = std::find_if(drive_->cylinders.begin(), drive_->cylinders.end(),
                                           [&](const CylinderDuty& c) { return c.driver == driver_; });
        for (PlotPane& pane : cylinderPanes(m, *cylinder, u)) cycleChart(std::move(pane));
    }
    return out;
}

int DriveView::placeFigures(int across, int width, double scale)
{
    places_.clear();
    const double column = double(width - (across - 1) * kGap) / across;
    double top = 0, rowHeight = 0;
    for (std::size_t i = 0; i < figures_.size(); ++i) {
        const int col = int(i) % across;
        if (col == 0 && i > 0) {
            top += rowHeight + kGap;
            rowHeight = 0;
        }
        const QSizeF size = figures_[i]->size() * scale;
        places_.push_back(QRectF(QPointF(col * (column + kGap), top), size));
        rowHeight = std::max(rowHeight, size.height());
    }
    const int height = int(std::ceil(top + rowHeight));
    canvas_->resize(width, height);
    return height;
}

bool DriveView::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == scroll_->viewport() && event->type() == QEvent::Resize && !sight_->pending()) layOutFigures();
    if (watched != canvas_ || event->type() != QEvent::Paint) return QWidget::eventFilter(watched, event);
    QPainter p(canvas_);
    p.fillRect(canvas_->rect(), palette::paper());
    if (figures_.empty()) {
        p.setPen(palette().color(QPalette::WindowText));
        p.drawText(QRectF(canvas_->rect()).adjusted(8, 8, -8, -8), Qt::AlignCenter | Qt::TextWordWrap, message_);
        return true;
    }
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);
    for (std::size_t i = 0; i < figures_.size(); ++i) figures_[i]->paint(p, places_[i]);
    return true;
}

}  // namespace clevis::ui
