// The desktop app `clevis`; everything but main lives in ui/.
#include "app_launch.h"

int main(int argc, char** argv)
{
    return clevis::ui::runDesktopApp(argc, argv);
}
