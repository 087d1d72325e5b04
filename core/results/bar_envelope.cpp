#include "core/results/bar_envelope.h"

#include <cmath>

namespace clevis {
namespace {

// Keeps a step's peak along the bar if it beats the envelope's so far by
// `larger` (ties keep the first found).
template <class Larger>
void keep(EnvelopePeak& peak, const PeakAlong& along, int step, Larger larger)
{
    if (larger(along.value, peak.value)) peak = {along.value, along.s, step};
}

void update(BarEnvelope& envelope, const BarPeaks& peaks, int step)
{
    const auto above = [](double v, double best) { return v > best; };
    const auto below = [](double v, double best) { return v < best; };
    const auto bigger = [](double v, double best) { return std::abs(v) > std::abs(best); };
    keep(envelope.tension, peaks.tension, step, above);
    keep(envelope.compression, peaks.compression, step, below);
    keep(envelope.shear, peaks.shear, step, bigger);
    keep(envelope.moment, peaks.moment, step, bigger);
    keep(envelope.fibreTension, peaks.fibreTension, step, above);
    keep(envelope.fibreCompression, peaks.fibreCompression, step, below);
}

}  // namespace

std::vector<BarEnvelope> barEnvelopes(const CompiledMechanism& m, const CycleResult& r,
                                      const std::vector<BarModel>& bars)
{
    std::vector<BarEnvelope> out(bars.size());
    for (std::size_t b = 0; b < bars.size(); ++b) out[b].body = bars[b].body;
    if (r.steps.empty()) return out;
    BodyLoads acting(m, r.steps.front());
    std::vector<BarLoads> along;
    along.reserve(bars.size());
    for (const BarModel& bar : bars) along.emplace_back(bar);
    std::vector<Eigen::Matrix2d> rotations;
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        const Pose q(r.steps[i].q, rotations);
        acting.step(r.steps[i], q);
        for (std::size_t b = 0; b < bars.size(); ++b) {
            along[b].set(m, r.steps[i], q, acting);
            // Only a fibre stress beyond the envelope so far can change it.
            update(out[b], along[b].peaks({out[b].fibreTension.value, out[b].fibreCompression.value}), int(i));
        }
    }
    return out;
}

}  // namespace clevis
