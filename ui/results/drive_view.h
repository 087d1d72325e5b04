// The drive of one driver over the cycle, drawn by the same figures as the
// report's Drive chapter (render/drive_figures.h): for a motor behind a
// gearbox its torque against speed at the motor shaft over the motor's
// characteristic, its torque over the cycle and the gear ratio study; for a
// cylinder its pressure with the supply and its flow. The driver is the
// selected one when it has drive data, else the one chosen above the
// figures (the first, or the only, by default). The figures stand side by
// side as many as the panel's width takes, at the window's text size, and
// scroll when they do not fit; the drive's warnings are said above them.
// Hidden (behind another tab), the view does nothing for a new result; it
// works out the newest one when it is shown.
#pragma once

#include "core/results/drive_train.h"
#include "render/figure_export.h"

#include <QWidget>

#include <functional>
#include <memory>
#include <optional>
#include <vector>

class QComboBox;
class QLabel;
class QScrollArea;

namespace clevis::ui {

class SightWatch;

class AnalysisState;
class MechanismDocument;

class DriveView : public QWidget {
    Q_OBJECT
public:
    DriveView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);

    // The driver shown (an index into the compiled drivers), or −1 with a message().
    int driver() const { return driver_; }
    const QString& message() const { return message_; }
    QComboBox* driverChoice() const { return choice_; }
    // The figures on show, in their order on screen.
    std::vector<const Figure*> figures() const;
    QString warningText() const;
    QString motionText() const;  // the found motion and flywheel in words; empty at a prescribed speed

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void solved();          // a new result: its drive figures, now when in sight
    void workOut();         // the drive figures of the result on hand
    void selectionMoved();  // the selected driver, when it has drive data
    void showDriver();
    void layOutFigures();
    using FigureMaker = std::function<std::unique_ptr<Figure>(double width, double plotHeight)>;
    std::vector<FigureMaker> figureMakers() const;
    int placeFigures(int across, int width, double scale);  // the figures' total height, pixels

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    QComboBox* choice_;
    QLabel* warnings_;
    QLabel* motion_;
    QScrollArea* scroll_;
    QWidget* canvas_;
    std::optional<DriveResults> drive_;
    std::vector<int> choices_;  // the compiled driver of each entry of choice_
    int driver_ = -1;
    QString message_;
    SightWatch* sight_ = nullptr;  // works a result out when it is seen; pending: drive_ is an older one's
    std::vector<std::unique_ptr<Figure>> figures_;
    std::vector<QRectF> places_;  // where each figure is drawn on canvas_
};

}  // namespace clevis::ui
