// The desktop app `clevis`; everything but main lives in ui/.
#include "app/heap_reuse.h"
#include "ui/shell/app_launch.h"

int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    return clevis::ui::runDesktopApp(argc, argv);
}
