#include "core/results/bar_envelope.h"

#include <cmath>

namespace clevis {
namespace {

// Keeps `value` if it beats the peak by `larger` (ties keep the first found).
template <class Larger>
void keep(EnvelopePeak& peak, double value, double s, int step, Larger larger)
{
    if (larger(value, peak.value)) peak = {value, s, step};
}

void update(BarEnvelope& envelope, const std::vector<BarStation>& stations, int step)
{
    const auto above = [](double v, double best) { return v > best; };
    const auto below = [](double v, double best) { return v < best; };
    const auto bigger = [](double v, double best) { return std::abs(v) > std::abs(best); };
    for (const auto& st : stations) {
        keep(envelope.tension, st.axial, st.s, step, above);
        keep(envelope.compression, st.axial, st.s, step, below);
        keep(envelope.shear, st.shear, st.s, step, bigger);
        keep(envelope.moment, st.moment, st.s, step, bigger);
    }
}

}  // namespace

std::vector<BarEnvelope> barEnvelopes(const CompiledMechanism& m, const CycleResult& r,
                                      const std::vector<BarModel>& bars, int stations)
{
    std::vector<BarEnvelope> out(bars.size());
    for (std::size_t b = 0; b < bars.size(); ++b) out[b].body = bars[b].body;
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        const auto items = freeBodyItems(m, r.steps[i]);
        for (std::size_t b = 0; b < bars.size(); ++b)
            update(out[b], internalLoads(m, bars[b], r.steps[i], items[std::size_t(bars[b].body)], stations), int(i));
    }
    return out;
}

}  // namespace clevis
