// The free-body figure as a live drawing in a window: painted by the same
// painter as the exports, its text and symbols at the interface's font size,
// the drawing zoomed with the wheel, + and − (about the pointer or the view's
// centre) and moved by dragging. "Fit" shows the free body and the kinetic
// diagram whole, side by side or one under the other as the view's shape
// suits; the title is above them, the equations and the table under them, a
// drag away. With no figure it shows a short message in its middle.
#pragma once

#include "render/free_body_painter.h"

#include <QWidget>

#include <memory>
#include <optional>

namespace clevis::ui {

class FreeBodyCanvas : public QWidget {
    Q_OBJECT
public:
    explicit FreeBodyCanvas(QWidget* parent = nullptr);

    // `refit`: a new body, shown whole; otherwise the zoom and the position stay
    // (the same body at another step, in other units or with inertia loads).
    void showFigure(const CompiledMechanism& m, const CycleResult& r, FreeBodyDiagram d, FreeBodyPaintOptions options,
                    bool refit);
    void showMessage(const QString& text);

    const FreeBodyPainter* figure() const { return figure_.get(); }
    const QString& message() const { return message_; }

    // Output pixels per page unit of what is drawn to scale; 1 is the page's size.
    double zoom() const { return zoom_; }
    // Where the figure's top-left corner is, in the widget's pixels.
    QPointF origin() const { return origin_; }
    // The size of text and symbols against the page's: the interface's font size.
    double textScale() const;

    void zoomBy(double factor, QPointF about);
    void zoomIn();
    void zoomOut();
    void fit();

protected:
    void paintEvent(QPaintEvent*) override;
    void wheelEvent(QWheelEvent* event) override;
    void mousePressEvent(QMouseEvent* event) override;
    void mouseMoveEvent(QMouseEvent* event) override;
    void mouseReleaseEvent(QMouseEvent* event) override;
    void keyPressEvent(QKeyEvent* event) override;
    void resizeEvent(QResizeEvent* event) override;

private:
    // The figure again at the current zoom (the layout depends on it).
    void relayout();
    void keepInView();

    // What the figure was made from, kept to lay it out again at another zoom.
    const CompiledMechanism* mechanism_ = nullptr;
    const CycleResult* result_ = nullptr;
    std::unique_ptr<FreeBodyPainter> figure_;
    QString message_;
    double zoom_ = 1.0;
    KineticPlacement kinetic_ = KineticPlacement::Beside;  // as the last fit found, kept while zooming
    QPointF origin_;
    bool fitted_ = true;  // shown whole and kept so when the widget is resized
    std::optional<QPointF> dragFrom_;
};

}  // namespace clevis::ui
