#include "render/plot_panes.h"

#include "core/results/cylinder_ends.h"
#include "render/palette.h"

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

std::vector<PlotCurve> reactionCurves(const CompiledMechanism& m, const CycleResult& r, const RenderUnits& u,
                                      const PaneChoice& choice)
{
    std::vector<PlotCurve> curves;
    // Each joint, then each cylinder end, reported as a joint is.
    const auto add = [&](const std::string& name, const auto& series) {
        if (choice.hiddenJoints.count(name)) return;
        for (const ReactionPart part : {ReactionPart::Magnitude, ReactionPart::X, ReactionPart::Y})
            if (part == ReactionPart::Magnitude || choice.components)
                curves.push_back({series(part), int(curves.size())});
    };
    for (std::size_t j = 0; j < m.joints.size(); ++j)
        add(m.joints[j].name, [&](ReactionPart part) { return jointReactionSeries(m, r, int(j), part, u); });
    for (const CylinderEnd& end : cylinderEnds(m))
        add(end.name, [&](ReactionPart part) { return endReactionSeries(m, r, end, part, u); });
    return curves;
}

}  // namespace

std::vector<PlotPane> plotPanes(const CompiledMechanism& m, const CycleResult& r, const RenderUnits& u,
                                const PaneChoice& choice)
{
    std::vector<PlotPane> panes;
    addPane(panes, choice.components ? "Joint reactions |F|, Fx, Fy" : "Joint reactions |F|",
            reactionCurves(m, r, u, choice));
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

QPen curvePen(int index)
{
    const palette::CurveStyle style = palette::curveStyle(index);
    QPen pen(style.colour, 1.6, Qt::SolidLine, Qt::FlatCap);
    if (!style.dashes.isEmpty()) pen.setDashPattern(style.dashes);
    return pen;
}

}  // namespace clevis::ui
