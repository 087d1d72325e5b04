// The panes of curves over the cycle, as a plain description computed once
// from the results: which curves each pane holds, its title and unit, and the
// pen of each curve. The desktop plots and the review report both draw this
// list, so they show the same panes under the same titles.
#pragma once

#include "render/cycle_series.h"

#include <QPen>

#include <set>
#include <string>

namespace clevis::ui {

struct PlotCurve {
    CycleSeries series;
    int pen = 0;  // index for curvePen()
};

// A constant drawn across a pane, e.g. a cylinder's supply pressure.
struct PlotLevel {
    QString name;  // e.g. "supply"
    double value = 0;
    int pen = 0;
};

struct PlotPane {
    QString title;  // e.g. "Drive torque"
    QString unit;   // of every curve in the pane
    std::vector<PlotCurve> curves;
    std::vector<PlotLevel> levels;  // drawn by the report's charts (CycleChart)
    // False: the value axis spans only the values (a speed varying by a few
    // per cent about its mean), not down to zero.
    bool fromZero = true;
};

// What the user chose to see of the joint reactions. The default shows every
// joint, magnitudes only.
struct PaneChoice {
    std::set<std::string> hiddenJoints;  // joint names whose reaction is not plotted
    bool components = false;             // Fx and Fy beside |F|
    bool mostLoaded = false;             // hiddenJoints are mostLoadedChoice()'s: the title says which are shown
};

// As many joints as there are distinct curve pens (curvePen()): a pane of
// more curves cannot be told apart.
constexpr int kMostLoadedShown = 12;

// The choice to start from, before the user picks joints: every joint of a
// machine with at most kMostLoadedShown joints (cylinder ends counted), else
// only the kMostLoadedShown with the highest peak |F| over the reliable steps
// (as the peaks are reported: curvePeak; the earlier joint first of equals).
PaneChoice mostLoadedChoice(const CompiledMechanism& m, const CycleResult& r, bool components = false);

// Joint reactions, drive torque and force, driver power, shaking force and
// moment on the frame, transmission angle; a pane with no curve is left out.
std::vector<PlotPane> plotPanes(const CompiledMechanism& m, const CycleResult& r, const RenderUnits& u,
                                const PaneChoice& choice = {});

// The pen of the n-th curve: palette::curveStyle(), colour and dash, so
// curves differ by more than colour.
QPen curvePen(int index);

}  // namespace clevis::ui
