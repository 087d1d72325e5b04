// The desktop app `clevis`; everything but main lives in ui/.
#include "ui/shell/app_launch.h"
#include "app/heap_reuse.h"

int main(int argc, char** argv)
{
    clevis::app::keepFreedHeapForReuse();
    return clevis::ui::runDesktopApp(argc, argv);
}
