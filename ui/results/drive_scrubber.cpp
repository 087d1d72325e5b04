#include "ui/results/drive_scrubber.h"

#include "core/results/drive_units.h"
#include "core/solver/exact_position.h"
#include "ui/analysis/analysis_state.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDoubleSpinBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QShortcut>
#include <QSignalBlocker>
#include <QSlider>
#include <QTimer>
#include <QToolButton>
#include <QVBoxLayout>

#include <cmath>

namespace clevis::ui {
namespace {

constexpr int kFrameMs = 30;

}  // namespace

DriveScrubber::DriveScrubber(AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , analysis_(analysis)
    , slider_(new QSlider(Qt::Horizontal, this))
    , position_(new QDoubleSpinBox(this))
    , play_(new QToolButton(this))
    , speed_(new QComboBox(this))
    , loop_(new QCheckBox(tr("Loop"), this))
    , drivers_(new QLabel(this))
    , timer_(new QTimer(this))
{
    setObjectName("driveScrubber");
    slider_->setObjectName("scrubSlider");
    slider_->setToolTip(tr("Position in the cycle: ←/→ one step, Page Up/Down a tenth of the cycle, Space plays"));
    position_->setObjectName("scrubPosition");
    position_->setKeyboardTracking(false);
    play_->setText(tr("Play"));
    play_->setCheckable(true);
    for (const double s : {0.1, 0.25, 0.5, 1.0, 2.0}) speed_->addItem(tr("%1× speed").arg(s), s);
    speed_->setCurrentIndex(3);
    speed_->setToolTip(tr("Playback speed relative to the machine's real cycle time"));
    loop_->setChecked(true);
    drivers_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    drivers_->setSizePolicy(QSizePolicy::Ignored, QSizePolicy::Preferred);  // clipped, never widening the window

    auto* row = new QHBoxLayout;
    row->addWidget(play_);
    row->addWidget(slider_, 1);
    row->addWidget(position_);
    row->addWidget(speed_);
    row->addWidget(loop_);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 4, 6, 4);
    layout->addLayout(row);
    layout->addWidget(drivers_);

    auto* space = new QShortcut(QKeySequence(Qt::Key_Space), this, [this] { setPlaying(!playing()); });
    space->setContext(Qt::WidgetWithChildrenShortcut);
    connect(slider_, &QSlider::valueChanged, analysis_, &AnalysisState::setCurrentStep);
    connect(position_, &QDoubleSpinBox::valueChanged, this, &DriveScrubber::stepFromSpinBox);
    connect(play_, &QToolButton::toggled, this, &DriveScrubber::setPlaying);
    connect(timer_, &QTimer::timeout, this, &DriveScrubber::advance);
    connect(analysis_, &AnalysisState::resultChanged, this, &DriveScrubber::rebuild);
    connect(analysis_, &AnalysisState::currentStepChanged, this, &DriveScrubber::showStep);
    timer_->setInterval(kFrameMs);
    rebuild();
}

bool DriveScrubber::playing() const { return timer_->isActive(); }

void DriveScrubber::setPlaying(bool play)
{
    if (play == playing()) return;
    if (play && analysis_->hasResult()) {
        playTime_ = analysis_->result().steps[analysis_->currentStep()].t;
        clock_.start();
        timer_->start();
    } else timer_->stop();
    const QSignalBlocker block(play_);
    play_->setChecked(playing());
    play_->setText(playing() ? tr("Pause") : tr("Play"));
}

void DriveScrubber::rebuild()
{
    const bool ok = analysis_->hasResult();
    setEnabled(ok);
    const QSignalBlocker b1(slider_), b2(position_);
    if (!ok) {
        // No position of an earlier result stays: the box reads "–", the slider rests at the start.
        setPlaying(false);
        drivers_->setText(analysis_->errorText().isEmpty() ? tr("No solved cycle yet") : analysis_->errorText());
        axis_ = {};
        slider_->setRange(0, 0);
        position_->setSpecialValueText(QStringLiteral("–"));
        position_->setSuffix({});
        position_->setRange(0, 0);
        position_->setToolTip({});
        return;
    }
    const auto& r = analysis_->result();
    axis_ = cycleAxis(analysis_->compiled(), r);
    position_->setSpecialValueText({});
    slider_->setRange(0, int(r.steps.size()) - 1);
    slider_->setPageStep(std::max(1, int(r.steps.size()) / 10));
    position_->setSuffix(" " + axis_.unit);
    position_->setDecimals(axis_.byTime ? 4 : (axis_.unit == "m" ? 5 : 2));
    position_->setRange(std::min(axis_.values.front(), axis_.values.back()),
                        std::max(axis_.values.front(), axis_.values.back()));
    position_->setSingleStep(std::abs(axis_.values.back() - axis_.values.front()) /
                             std::max<int>(1, int(r.steps.size()) - 1));
    position_->setToolTip(axis_.label);
    showStep(analysis_->currentStep());
}

void DriveScrubber::showStep(int step)
{
    if (!analysis_->hasResult() || step < 0 || step >= int(axis_.values.size())) return;
    const QSignalBlocker b1(slider_), b2(position_);
    slider_->setValue(step);
    position_->setValue(axis_.values[step]);
    const auto& m = analysis_->compiled();
    const auto& s = analysis_->result().steps[step];
    QStringList parts;
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        parts << QString::fromStdString(formatDrivePosition(m.drivers[d], s.drivePosition[d]));
    parts << tr("t = %1 s").arg(s.t, 0, 'f', 4) << tr("step %1 of %2").arg(step).arg(int(axis_.values.size()) - 1);
    if (s.nearSingular) parts << tr("near a singular position");
    drivers_->setText(parts.join("   "));
}

// A typed position is solved exactly (a step is added there); one on a step,
// or one the cycle does not reach, goes to the nearest step.
void DriveScrubber::stepFromSpinBox()
{
    const double x = position_->value();
    const int nearest = axis_.nearestStep(x);
    if (std::abs(axis_.values[std::size_t(nearest)] - x) <= 1e-9 * std::max(1.0, std::abs(x)))
        return analysis_->setCurrentStep(nearest);
    const auto& m = analysis_->compiled();
    const std::optional<double> t =
        axis_.byTime ? std::optional<double>(x)
                     : timeAtDrivePosition(m, analysis_->result(), 0, driveSiValue(m.drivers.front().type, x));
    if (!t || !analysis_->goToTime(*t)) analysis_->setCurrentStep(nearest);
}

void DriveScrubber::advance()
{
    if (!analysis_->hasResult()) return setPlaying(false);
    const auto& steps = analysis_->result().steps;
    playTime_ += speed_->currentData().toDouble() * clock_.restart() / 1000.0;
    const double t0 = steps.front().t, t1 = steps.back().t;
    if (playTime_ > t1) {
        if (!loop_->isChecked()) {
            analysis_->setCurrentStep(int(steps.size()) - 1);
            return setPlaying(false);
        }
        playTime_ = t1 > t0 ? t0 + std::fmod(playTime_ - t0, t1 - t0) : t0;
    }
    int step = analysis_->currentStep();
    while (step + 1 < int(steps.size()) && steps[step + 1].t <= playTime_) ++step;
    while (step > 0 && steps[step].t > playTime_) --step;
    analysis_->setCurrentStep(step);
}

}  // namespace clevis::ui
