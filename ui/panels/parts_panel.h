// The "Parts" list: the mechanism's bodies, joints, drivers and loads by
// name. Picking a row selects the part; parts the analysis blames are shown
// in the problem colour.
#pragma once

#include <QTreeWidget>

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

class PartsPanel : public QTreeWidget {
    Q_OBJECT
public:
    PartsPanel(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent = nullptr);

private:
    void rebuild();
    void showSelection();
    void pickRow();

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    bool syncing_ = false;
};

}  // namespace clevis::ui
