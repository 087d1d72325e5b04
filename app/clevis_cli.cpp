// clevis-cli: the analysis without the GUI, for scripts and batch runs.
#include "app/analyze_command.h"
#include "app/cli_options.h"
#include "app/heap_reuse.h"
#include "app/internal_loads_command.h"
#ifdef CLEVIS_HAS_RENDER
#include "app/cli_render_commands.h"
#endif

#include <algorithm>
#include <iostream>

namespace {

int run(const clevis::cli::Command& command)
{
    using namespace clevis::cli;
    if (const auto* help = std::get_if<HelpRequest>(&command)) std::cout << helpText(help->topic);
    else if (std::holds_alternative<VersionRequest>(command)) std::cout << "clevis-cli " CLEVIS_VERSION "\n";
    else if (const auto* loads = std::get_if<InternalLoadsOptions>(&command))
        return runInternalLoads(*loads, std::cout, std::cerr);
    else return runAnalyze(std::get<AnalyzeOptions>(command), std::cout, std::cerr);
    return kExitOk;
}

}  // namespace

int main(int argc, char** argv)
{
    using namespace clevis::cli;
    clevis::app::keepFreedHeapForReuse();
#ifdef CLEVIS_HAS_RENDER
    // The drawing commands parse their own options (they need Qt's renderer).
    const std::string first = argc > 1 ? argv[1] : "";
    if (first == "fbd") return runFbdCommand({argv + 2, argv + argc});
    if (first == "bar-diagram") {
        const std::vector<std::string> rest(argv + 2, argv + argc);
        const auto help = [](const std::string& a) { return a == "--help" || a == "-h"; };
        if (std::any_of(rest.begin(), rest.end(), help)) {
            std::cout << helpText("bar-diagram");
            return kExitOk;
        }
        return runBarDiagramCommand(rest);
    }
    if (first == "report") return runReportCommand({argv + 2, argv + argc});
    if (first == "bearing-polar") return runBearingPolarCommand({argv + 2, argv + argc});
#endif
    try {
        return run(parseCommandLine({argv + 1, argv + argc}));
    } catch (const UsageError& e) {
        std::cerr << "clevis-cli: " << e.what() << "\nTry \"clevis-cli --help\".\n";
        return kExitUsage;
    }
}
