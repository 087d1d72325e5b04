// The peak loads of the cycle, as summarize() reports them: per joint the
// peak reaction, where it occurs and the RMS; per driver the peak, RMS and
// mean effort and the peak power; per bar the peak fibre stress. Parts with
// a utilisation come first, the most loaded at the top, shaded by how near
// their limit they are. A value from a step near a singular
// position is marked, a larger one there is shown apart, and a note under the
// table names the part that locks. Clicking a row moves the current step to
// where that peak occurs.
#pragma once

#include "core/results/utilisation_ranking.h"

#include <QTableWidget>

#include <functional>
#include <optional>

namespace clevis::ui {

class SightWatch;

class AnalysisState;

class PeakTable : public QTableWidget {
    Q_OBJECT
public:
    explicit PeakTable(AnalysisState* analysis, QWidget* parent = nullptr);

    int stepOfRow(int row) const;

    static constexpr int kPartColumn = 0, kUtilisationColumn = 1, kPeakColumn = 2, kWhereColumn = 3, kLargerColumn = 8;

private:
    struct Row {
        QString part;
        int step = -1;  // where the row's peak is, -1: none
        std::optional<double> utilisation;
        QString utilisationText, utilisationTip;
        QString peak, peakTip, where;
        QStringList cells;  // RMS, mean, peak power, work
        QString larger, largerTip;
    };

    void rebuild();
    void fitColumns(bool fit);  // to the contents, or left as they are
    Row barRow(int index, const std::function<QString(int)>& where) const;
    void pinFigures(Row& row, int index) const;
    void setUtilisation(Row& row, const std::optional<PartUtilisation>& u) const;
    void addRowItems(const Row& row);

    AnalysisState* analysis_;
    SightWatch* sight_ = nullptr;  // whether it is seen
};

}  // namespace clevis::ui
