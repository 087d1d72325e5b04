// The Export menu: the free-body diagram on show, every body's diagram at
// the current position or at each joint's peak (SVG, PDF or PNG), the plots
// (PNG or PDF), the step data (CSV) and the design-review report (PDF), with
// a progress dialog for the long ones.
#pragma once

#include "core/results/cycle_summary.h"
#include "render/render_units.h"

#include <QObject>
#include <QStringList>

#include <functional>

class QMainWindow;
class QMenu;

namespace clevis::ui {

class AnalysisState;
class FreeBodyView;
class MechanismDocument;
class PlotStack;

// Writes one diagram per moving body into `directory` as BODY_STEP.SUFFIX, at
// `step` or, when `atPeaks`, at each joint's peak (for the bodies it joins).
// Returns the files written; stops with `error` set at the first failure or
// when `progress(done, total)` returns false.
QStringList exportBodyDiagrams(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, bool atPeaks,
                               int step, const QString& directory, const QString& suffix, const RenderUnits& units,
                               const std::function<bool(int, int)>& progress, QString* error);

class ExportActions : public QObject {
    Q_OBJECT
public:
    ExportActions(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis, FreeBodyView* diagram,
                  PlotStack* plots);

    void fill(QMenu* menu);

private:
    bool ready();
    void exportDiagram();
    void exportAllDiagrams();
    void exportPlots();
    void exportCsv();
    void exportReport();
    void failed(const QString& message);

    QMainWindow* window_;
    MechanismDocument* doc_;
    AnalysisState* analysis_;
    FreeBodyView* diagram_;
    PlotStack* plots_;
};

}  // namespace clevis::ui
