// The sketching canvas: draws the document at its drawn pose, passes pointer
// strokes (snapped) to the active tool, zooms with the wheel, pans with the
// middle or right button. It keeps no part of the mechanism itself.
#pragma once

#include "render/label_placer.h"
#include "ui/canvas/paint/body_shapes.h"
#include "ui/canvas/tools/tool.h"
#include "ui/canvas/view_transform.h"

#include <QPixmap>
#include <QStringList>
#include <QWidget>

#include <memory>
#include <optional>
#include <vector>

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

class CanvasView : public QWidget, public ToolHost {
    Q_OBJECT
public:
    CanvasView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);
    ~CanvasView() override;

    void setTool(std::unique_ptr<Tool> tool);
    const Tool* tool() const { return tool_.get(); }
    // Fits the view around the mechanism in every position of the solved
    // cycle (the drawn pose alone when nothing is solved).
    void fitToView();
    void zoomBy(double factor);

    // ToolHost
    MechanismDocument* document() override { return doc_; }
    const ViewTransform& view() const override { return view_; }
    void refresh() override { update(); }
    void tell(const QString& message) override;

    QSize sizeHint() const override { return {900, 620}; }

signals:
    void hintChanged(const QString& hint);    // what the active tool expects next, or a note about the last click
    void toolDismissed();                     // Esc with nothing to cancel: back to selecting
    void pointerMoved(const SnapResult& at);  // the point a click would place
    void pointerLeft();

protected:
    void paintEvent(QPaintEvent*) override;
    void mousePressEvent(QMouseEvent*) override;
    void mouseMoveEvent(QMouseEvent*) override;
    void mouseReleaseEvent(QMouseEvent*) override;
    void mouseDoubleClickEvent(QMouseEvent*) override;
    void wheelEvent(QWheelEvent*) override;
    void keyPressEvent(QKeyEvent*) override;
    void resizeEvent(QResizeEvent*) override;
    void leaveEvent(QEvent*) override;
    bool focusNextPrevChild(bool next) override;
    bool event(QEvent* e) override;

private:
    Pointer pointer(const QPointF& pos, Qt::KeyboardModifiers mods) const;
    void announce();
    std::optional<Mechanism> scrubbedPose() const;
    void fitAround(const std::vector<Vec2>& pts);
    const QPixmap& grid();
    bool drawsFromResult() const;  // whether the newest result changes what was last painted
    LabelPlacer& labelsFor(const Mechanism& shown, bool& placed);
    QRect haloArea(const Selection& s) const;

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    ViewTransform view_;
    std::unique_ptr<Tool> tool_;
    std::optional<QPointF> panFrom_;
    bool fitPending_ = true;    // fit once the widget has its real size
    bool fitOnResult_ = false;  // an opened file: fit again to its range of motion once solved
    bool told_ = false;         // the tool left a note during this click: keep it instead of the hint
    // The grid as last drawn, and the view it was drawn for (empty: draw again).
    QPixmap grid_;
    ViewTransform gridView_;
    BodyShapes bodyShapes_;        // each body's shape as last drawn, with the screen points it was drawn round
    QStringList paintedProblems_;  // the parts the last paint drew as blamed
    Selection haloed_;             // the part drawn with the selection's halo
    // The labels as last placed, and the drawing, view, size and font they were placed for (none: place again).
    std::optional<LabelPlacer> labels_;
    Mechanism labelled_;
    ViewTransform labelledView_;
    QSize labelledSize_;
    QFont labelledFont_;
};

}  // namespace clevis::ui
