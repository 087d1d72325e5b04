#include "app/solved_file.h"

#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "core/solver/cycle_sweep.h"

namespace clevis::cli {

SolvedFile solveFile(const std::string& file, int steps, std::ostream& err)
{
    LoadedMechanism loaded = loadMechanismFile(file);
    for (const auto& w : loaded.warnings) err << file << ": warning: " << w << '\n';
    SolvedFile out{std::move(loaded.mechanism), {}, {}};
    out.m = compile(out.mechanism);
    SweepOptions sweep;
    sweep.steps = steps;
    out.r = sweepCycle(out.m, sweep);
    return out;
}

bool writeOutputFile(const std::string& path, const std::string& text, std::ostream& err)
{
    try {
        writeFileAtomically(path, text, false);
        return true;
    } catch (const FileWriteError& e) {
        err << e.what() << '\n';
        return false;
    }
}

}  // namespace clevis::cli
