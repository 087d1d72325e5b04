// Adds the results views to the main window as panels (the cycle scrubber,
// the stacked plots, the peak-load table, the free-body diagram, the bearing
// load of the selected joint, the drive of a motor or cylinder; where they
// go is arrangePanels()'s) and an Export menu.
#pragma once

class QMainWindow;

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

void installResultsViews(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis);

}  // namespace clevis::ui
