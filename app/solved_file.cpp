#include "app/solved_file.h"

#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "core/solver/motor_drive.h"

namespace clevis::cli {

SolvedFile solveFile(const std::string& file, int steps, std::ostream& err)
{
    LoadedMechanism loaded = loadMechanismFile(file);
    for (const auto& w : loaded.warnings) err << file << ": warning: " << w << '\n';
    SolvedFile out{std::move(loaded.mechanism), {}, {}, std::nullopt};
    SweepOptions sweep;
    sweep.steps = steps;
    SolvedCycle solved = solveCycle(out.mechanism, compile(out.mechanism), sweep);
    out.m = std::move(solved.m);
    out.r = std::move(solved.r);
    out.found = std::move(solved.found);
    return out;
}

bool writeOutputFile(const std::string& path, const std::string& text, std::ostream& err)
{
    return writeOutputFile(
        path, [&](const std::function<void(std::string_view)>& write) { write(text); }, err);
}

bool writeOutputFile(const std::string& path, const TextProducer& produce, std::ostream& err)
{
    try {
        writeFileAtomically(path, produce, false);
        return true;
    } catch (const FileWriteError& e) {
        err << e.what() << '\n';
        return false;
    }
}

}  // namespace clevis::cli
