// The "Properties" panel: exact values of the selected part (or of the whole
// mechanism when nothing is selected) in display units. Every change is an
// undo command; the form is rebuilt from the document after each one.
#pragma once

#include <QScrollArea>

namespace clevis::ui {

class MechanismDocument;

class PropertyEditor : public QScrollArea {
    Q_OBJECT
public:
    explicit PropertyEditor(MechanismDocument* doc, QWidget* parent = nullptr);

    // Rebuilds now instead of at the next turn of the event loop (for tests).
    void rebuildNow();

private:
    void scheduleRebuild();

    MechanismDocument* doc_;
    bool pending_ = false;
};

}  // namespace clevis::ui
