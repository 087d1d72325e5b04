// The free-body diagram of the selected body at the current step, redrawn
// when the selection, the step, the result or the display units change.
#pragma once

#include "core/results/free_body.h"

#include <QWidget>

#include <optional>

class QCheckBox;
class QLabel;

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
    QString message() const;

private:
    void refresh();

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    QCheckBox* dAlembert_;
    QLabel* message_;
    FreeBodyCanvas* canvas_;
    std::optional<FreeBodyDiagram> diagram_;
};

}  // namespace clevis::ui
