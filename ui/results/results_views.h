// Adds the results views to the main window: the cycle scrubber and the
// stacked plots along the bottom, the free-body diagram on the right, the
// peak-load table, and an Export menu.
#pragma once

class QMainWindow;

namespace clevis::ui {

class AnalysisState;
class MechanismDocument;

void installResultsViews(QMainWindow* window, MechanismDocument* doc, AnalysisState* analysis);

}  // namespace clevis::ui
