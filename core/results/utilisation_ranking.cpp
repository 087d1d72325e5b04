#include "core/results/utilisation_ranking.h"

#include <algorithm>

namespace clevis {
namespace {

// Keeps the larger of the figures offered, with where it peaks.
struct Largest {
    std::optional<PartUtilisation> best;

    void offer(const PartUtilisation& part, const std::optional<double>& value, const char* governs,
               const EnvelopePeak& at, const CycleResult& r)
    {
        if (!value || (best && *value <= best->value)) return;
        best = part;
        best->value = *value;
        best->governs = governs;
        best->step = at.step;
        best->nearSingular = nearSingular(r, at);
    }
};

}  // namespace

std::optional<PartUtilisation> barUtilisation(const CycleResult& r, const SizingResult& s, int b)
{
    const BarSizing& bar = s.bars[std::size_t(b)];
    if (!bar.section) return std::nullopt;
    PartUtilisation part;
    part.kind = PartUtilisation::Kind::Bar;
    part.index = b;
    part.name = bar.name;
    Largest largest;
    largest.offer(part, bar.section->utilisation, "stress", bar.section->governing, r);
    // A bar never in compression has a buckling ratio of 0: not a figure to rank by.
    if (bar.section->bucklingRatio && *bar.section->bucklingRatio > 0.0)
        largest.offer(part, bar.section->bucklingRatio, "buckling", bar.envelope.compression, r);
    return largest.best;
}

std::optional<PartUtilisation> pinUtilisation(const CycleResult& r, const SizingResult& s, int p)
{
    const PinSizing& pin = s.pins[std::size_t(p)];
    PartUtilisation part;
    part.kind = PartUtilisation::Kind::Pin;
    part.index = p;
    part.name = pin.name;
    Largest largest;
    largest.offer(part, pin.shearUtilisation, "pin shear", pin.shearStress, r);
    largest.offer(part, pin.pressureUtilisation, "bearing pressure", pin.pressure, r);
    largest.offer(part, pin.pvUtilisation, "p·v", pin.pv, r);
    return largest.best;
}

std::vector<PartUtilisation> rankByUtilisation(const CycleResult& r, const SizingResult& s)
{
    std::vector<PartUtilisation> out;
    for (int b = 0; b < int(s.bars.size()); ++b)
        if (auto u = barUtilisation(r, s, b)) out.push_back(std::move(*u));
    for (int p = 0; p < int(s.pins.size()); ++p)
        if (auto u = pinUtilisation(r, s, p)) out.push_back(std::move(*u));
    std::stable_sort(out.begin(), out.end(),
                     [](const PartUtilisation& a, const PartUtilisation& b) { return a.value > b.value; });
    return out;
}

}  // namespace clevis
