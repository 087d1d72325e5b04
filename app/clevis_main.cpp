// The desktop app `clevis`; everything but main lives in ui/.
#include "app_launch.h"
#include "heap_reuse.h"

int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    return clevis::ui::runDesktopApp(argc, argv);
}
