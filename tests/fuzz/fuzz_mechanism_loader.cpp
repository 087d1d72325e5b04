// libFuzzer target for the mechanism loader: any bytes go to parseMechanism;
// what parses goes on to compile() and a short sweepCycle. The only
// acceptable failures are the core's own ModelError and AnalysisError; any
// other exception, a crash, a hang or a sanitizer report is a bug.
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/solver/analysis_error.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <string>

namespace {

// Keep each input fast: a few steps of a small mechanism reach every code
// path of the sweep without spending the run on large systems.
constexpr int kMaxFuzzSteps = 8;
constexpr std::size_t kMaxFuzzBodies = 12;

void analyse(const std::string& text)
{
    const clevis::LoadedMechanism loaded = clevis::parseMechanism(text);
    const clevis::CompiledMechanism compiled = clevis::compile(loaded.mechanism);
    if (compiled.bodies.size() > kMaxFuzzBodies) return;
    clevis::SweepOptions options;
    options.steps = std::min(compiled.steps, kMaxFuzzSteps);
    (void)clevis::sweepCycle(compiled, options);
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    try {
        analyse(std::string(reinterpret_cast<const char*>(data), size));
    } catch (const clevis::ModelError&) {
    } catch (const clevis::AnalysisError&) {}
    return 0;
}
