// The free-body diagram of the selected body at the current step, redrawn
// when the selection, the step, the result or the display units change: a
// live drawing with zoom buttons over it. The zoom stays while the cycle is
// scrubbed and the whole body is shown again when another body is selected.
#pragma once

#include "core/results/free_body.h"

#include <QWidget>

#include <optional>

class QCheckBox;
class QToolButton;

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;
class FreeBodyCanvas;

class FreeBodyView : public QWidget {
    Q_OBJECT
public:
    FreeBodyView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);

    // The diagram on show; empty when no moving body is selected or nothing is solved.
    const std::optional<FreeBodyDiagram>& diagram() const { return diagram_; }
    bool dAlembert() const;
    // Why there is no diagram; empty while one is shown.
    QString message() const;
    FreeBodyCanvas* canvas() const { return canvas_; }

private:
    void refresh();

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    QCheckBox* dAlembert_;
    QToolButton* zoomOut_;
    QToolButton* zoomIn_;
    QToolButton* fit_;
    FreeBodyCanvas* canvas_;
    std::optional<FreeBodyDiagram> diagram_;
};

}  // namespace clevis::ui
