// The "Properties" panel: exact values of the selected part (or of the whole
// mechanism when nothing is selected) in display units. Every change is an
// undo command; the form is rebuilt from the document after each one. A
// value the document refuses is shown with the reason under the form.
#pragma once

#include <QScrollArea>
#include <QString>

class QFormLayout;

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

class PropertyEditor : public QScrollArea {
    Q_OBJECT
public:
    // `analysis`, when given, supplies the joint forces a compound pin lists.
    explicit PropertyEditor(MechanismDocument* doc, AnalysisState* analysis = nullptr, QWidget* parent = nullptr);

    // Rebuilds now instead of at the next turn of the event loop (for tests).
    void rebuildNow();

private:
    void scheduleRebuild();
    void showRefusal(QFormLayout* form);

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    bool pending_ = false;
    QString refusal_;  // why the last typed value was not taken, shown by the next rebuild
};

}  // namespace clevis::ui
