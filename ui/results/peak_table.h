// The peak loads of the cycle, as summarize() reports them: per joint the
// peak reaction, where it occurs and the RMS; per driver the peak, RMS and
// mean effort and the peak power. A value from a step near a singular
// position is marked, a larger one there is shown apart, and a note under the
// table names the part that locks. Clicking a row moves the current step to
// where that peak occurs.
#pragma once

#include <QTableWidget>

namespace clevis::ui {

class AnalysisState;

class PeakTable : public QTableWidget {
    Q_OBJECT
public:
    explicit PeakTable(AnalysisState* analysis, QWidget* parent = nullptr);

    int stepOfRow(int row) const;

private:
    void rebuild();

    AnalysisState* analysis_;
};

}  // namespace clevis::ui
