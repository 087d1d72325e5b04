// clevis-cli: the analysis without the GUI, for scripts and batch runs. It
// links the core only; the drawing commands are handed to clevis-draw
// (app/drawing_program.h) once their command line has been checked here.
#include "app/analyze_command.h"
#include "app/cli_options.h"
#include "app/drawing_program.h"
#include "app/heap_reuse.h"
#include "app/internal_loads_command.h"

#include <iostream>

namespace {

int run(const clevis::cli::Command& command, char** argv)
{
    using namespace clevis::cli;
    if (const auto* help = std::get_if<HelpRequest>(&command)) std::cout << helpText(help->topic);
    else if (std::holds_alternative<VersionRequest>(command)) std::cout << "clevis-cli " CLEVIS_VERSION "\n";
    else if (std::holds_alternative<DrawOptions>(command)) return handOverToDrawingProgram(argv, std::cerr);
    else {
        // Only the commands that solve set the allocator up: the help has no
        // use for a heap of huge pages.
        clevis::app::keepFreedHeapForReuse();
        if (const auto* loads = std::get_if<InternalLoadsOptions>(&command))
            return runInternalLoads(*loads, std::cout, std::cerr);
        return runAnalyze(std::get<AnalyzeOptions>(command), std::cout, std::cerr);
    }
    return kExitOk;
}

}  // namespace

int main(int argc, char** argv)
{
    using namespace clevis::cli;
    const std::vector<std::string> args(argv + 1, argv + argc);
    try {
        return run(parseCommandLine(args), argv);
    } catch (const UsageError& e) {
        std::cerr << usageErrorText(args, e);
        return kExitUsage;
    }
}
