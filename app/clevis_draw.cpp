// clevis-draw: the drawing commands of clevis-cli (fbd, bar-diagram,
// bearing-polar, report), in a program of their own because they need Qt.
// clevis-cli runs it with its own arguments; see app/drawing_program.h.
#include "app/cli_render_commands.h"
#include "app/heap_reuse.h"

int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    return clevis::cli::runDrawCommand({argv + 1, argv + argc});
}
