// The polar diagram of the selected joint's bearing load over the cycle, in
// the frame of one of its two bodies (a choice above the drawing; the
// joint's second body first, the one its reaction acts on) — or, for a
// selected cylinder, at its rod or cap end on the body there — with the
// scrubbed position pointed out on the curve, and the diagram's notes in the
// window's font beside it. Redrawn when the selection, the
// result, the step or the display units change (out of sight: when it comes
// into sight); a message in its place when no joint is selected or
// nothing is solved.
#pragma once

#include "render/bearing_polar_diagram.h"

#include <QWidget>

#include <memory>
#include <optional>

class QBoxLayout;
class QComboBox;
class QLabel;
class QScrollArea;

namespace clevis::ui {

class SightWatch;

class AnalysisState;
class MechanismDocument;
struct Selection;

class BearingPolarView : public QWidget {
    Q_OBJECT
public:
    BearingPolarView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);

    // The diagram on show; null when there is none (see message()).
    const BearingPolarDiagram* figure() const { return figure_.get(); }
    // Why there is no diagram; empty while one is shown.
    const QString& message() const { return message_; }
    // Whose frame: the joint's second body (index 0) or its first (index 1);
    // for a cylinder, its rod end (0) or its cap end (1).
    QComboBox* frameChoice() const { return frame_; }
    // The diagram's title and notes, beside or under the plot.
    QString notesText() const;

protected:
    // Paints the drawing area: the plot fitted to it, or the message; a new
    // size lays the plot out again (its labels keep the window's font size).
    bool eventFilter(QObject* watched, QEvent* event) override;
    // The notes beside the plot in a wide panel, under it in a tall one.
    void resizeEvent(QResizeEvent* event) override;

private:
    void refresh();  // now when in sight, else when it comes into sight
    void workOut();
    void fillFrameChoice(const QString& name, const QStringList& items);
    std::optional<BearingPolar> chosenPolar(const Selection& s);

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    QComboBox* frame_;
    QWidget* drawing_;
    QLabel* notes_;
    QScrollArea* notesArea_;  // the notes' scroll area, hidden with no diagram
    QBoxLayout* split_;
    QString frameJoint_;  // the joint or cylinder the choice was filled for
    std::unique_ptr<BearingPolarDiagram> figure_;
    QString message_;
    SightWatch* sight_ = nullptr;  // works the diagram out when it is seen
};

}  // namespace clevis::ui
