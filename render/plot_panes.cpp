#include "render/plot_panes.h"

#include "core/results/cycle_summary.h"
#include "core/results/cylinder_ends.h"
#include "render/palette.h"

#include <algorithm>

namespace clevis::ui {
namespace {

// Drivers keep one pen in every pane, the first in the vermillion the sketch draws motors in.
constexpr int kFirstDriverPen = 1;

void addPane(std::vector<PlotPane>& panes, const QString& title, std::vector<PlotCurve> curves)
{
    if (curves.empty()) return;
    const QString unit = curves.front().series.unit;
    panes.push_back({title, unit, std::move(curves), {}});
}

// Each joint's name, then each cylinder end's, with its reaction's series.
template <class Visit>
void forEachReaction(const CompiledMechanism& m, const CycleResult& r, const Visit& visit)
{
    for (std::size_t j = 0; j < m.joints.size(); ++j)
        visit(m.joints[j].name,
              [&](ReactionPart part, const RenderUnits& u) { return jointReactionSeries(m, r, int(j), part, u); });
    for (const CylinderEnd& end : cylinderEnds(m))
        visit(end.name, [&](ReactionPart part, const RenderUnits& u) { return endReactionSeries(m, r, end, part, u); });
}

QString reactionTitle(const CompiledMechanism& m, const PaneChoice& choice)
{
    QString title = choice.components ? "Joint reactions |F|, Fx, Fy" : "Joint reactions |F|";
    if (!choice.mostLoaded || choice.hiddenJoints.empty()) return title;
    const int joints = int(m.joints.size() + cylinderEnds(m).size());
    return title + QString(": the %1 of %2 joints with the highest peak |F|")
                       .arg(joints - int(choice.hiddenJoints.size()))
                       .arg(joints);
}

std::vector<PlotCurve> reactionCurves(const CompiledMechanism& m, const CycleResult& r, const RenderUnits& u,
                                      const PaneChoice& choice)
{
    std::vector<PlotCurve> curves;
    forEachReaction(m, r, [&](const std::string& name, const auto& series) {
        if (choice.hiddenJoints.count(name)) return;
        for (const ReactionPart part : {ReactionPart::Magnitude, ReactionPart::X, ReactionPart::Y})
            if (part == ReactionPart::Magnitude || choice.components)
                curves.push_back({series(part, u), int(curves.size())});
    });
    return curves;
}

}  // namespace

std::vector<PlotPane> plotPanes(const CompiledMechanism& m, const CycleResult& r, const RenderUnits& u,
                                const PaneChoice& choice)
{
    std::vector<PlotPane> panes;
    addPane(panes, reactionTitle(m, choice), reactionCurves(m, r, u, choice));
    // Rotary and linear efforts have different units: one pane per kind.
    for (const DriverType type : {DriverType::Rotary, DriverType::Linear}) {
        std::vector<PlotCurve> efforts;
        for (std::size_t d = 0; d < m.drivers.size(); ++d)
            if (m.drivers[d].type == type)
                efforts.push_back({driverEffortSeries(m, r, int(d), u), int(d) + kFirstDriverPen});
        addPane(panes, type == DriverType::Rotary ? "Drive torque" : "Drive force", std::move(efforts));
    }
    std::vector<PlotCurve> powers;
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        powers.push_back({driverPowerSeries(m, r, int(d)), int(d) + kFirstDriverPen});
    addPane(panes, "Driver power (positive: into the mechanism)", std::move(powers));
    addPane(panes, "Shaking force on the frame", {{shakingForceSeries(r, u), 0}});
    addPane(panes, "Shaking moment on the frame", {{shakingMomentSeries(r, u), 1}});
    std::vector<PlotCurve> transmission;
    for (std::size_t k = 0; k < r.transmissionPins.size(); ++k)
        transmission.push_back({transmissionSeries(m, r, int(k)), int(k)});
    addPane(panes, "Transmission angle", std::move(transmission));
    return panes;
}

PaneChoice mostLoadedChoice(const CompiledMechanism& m, const CycleResult& r, bool components)
{
    struct Loaded {
        std::string name;
        double peak;
    };
    std::vector<Loaded> joints;
    const std::vector<bool> unreliable = unreliableSteps(r);
    forEachReaction(m, r, [&](const std::string& name, const auto& series) {
        const CycleSeries s = series(ReactionPart::Magnitude, RenderUnits{});
        const CurvePeak peak = curvePeak(s.values, unreliable);
        const int at = peak.step >= 0 ? peak.step : peak.flaggedStep;  // every step unreliable: the largest of them
        joints.push_back({name, at >= 0 ? s.values[at] : 0.0});
    });
    PaneChoice choice{{}, components, true};
    if (int(joints.size()) <= kMostLoadedShown) return choice;
    std::stable_sort(joints.begin(), joints.end(), [](const Loaded& a, const Loaded& b) { return a.peak > b.peak; });
    for (std::size_t i = kMostLoadedShown; i < joints.size(); ++i) choice.hiddenJoints.insert(joints[i].name);
    return choice;
}

QPen curvePen(int index)
{
    const palette::CurveStyle style = palette::curveStyle(index);
    QPen pen(style.colour, 1.6, Qt::SolidLine, Qt::FlatCap);
    if (!style.dashes.isEmpty()) pen.setDashPattern(style.dashes);
    return pen;
}

}  // namespace clevis::ui
