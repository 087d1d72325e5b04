// Scrubbing the cycle: a slider over the solved steps and an exact spin box
// in the driver's unit (or in seconds when several drivers move), keyboard
// steps, play/pause at a chosen speed with looping, and each driver's
// position at the current step. Reads and sets AnalysisState::currentStep.
#pragma once

#include "render/cycle_axis.h"

#include <QElapsedTimer>
#include <QWidget>

class QCheckBox;
class QComboBox;
class QDoubleSpinBox;
class QLabel;
class QSlider;
class QTimer;
class QToolButton;

namespace clevis::ui {

class AnalysisState;

class DriveScrubber : public QWidget {
    Q_OBJECT
public:
    explicit DriveScrubber(AnalysisState* analysis, QWidget* parent = nullptr);

    QSlider* slider() const { return slider_; }
    QDoubleSpinBox* positionBox() const { return position_; }
    bool playing() const;
    void setPlaying(bool play);

private:
    void rebuild();
    void showStep(int step);
    void advance();
    void stepFromSpinBox();

    AnalysisState* analysis_;
    CycleAxis axis_;
    QSlider* slider_;
    QDoubleSpinBox* position_;
    QToolButton* play_;
    QComboBox* speed_;
    QCheckBox* loop_;
    QLabel* drivers_;
    QTimer* timer_;
    QElapsedTimer clock_;
    double playTime_ = 0;  // s of cycle time
};

}  // namespace clevis::ui
