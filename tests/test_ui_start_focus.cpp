// The window as the desktop app shows it at start, on an X display with no
// window manager (run under xvfb-run): it becomes the active window with the
// keyboard on the canvas, so the first key typed reaches it (a tool's key
// picks the tool) without a click first. With no window manager, nothing but
// the window itself asks for the activation.
#include "ui/canvas/canvas_view.h"
#include "ui/canvas/tool_palette.h"
#include "ui/shell/main_window.h"

#include <QAction>
#include <QApplication>
#include <QScreen>
#include <QTest>

#include <gtest/gtest.h>

using namespace clevis::ui;

namespace {

TEST(StartFocus, TheWindowIsActiveWithTheKeyboardOnTheCanvas)
{
    ASSERT_EQ(QGuiApplication::platformName(), QStringLiteral("xcb")) << "run on an X display";
    MainWindow window;
    window.showOn(window.screen()->availableGeometry());
    ASSERT_TRUE(QTest::qWaitForWindowActive(&window, 3000));
    EXPECT_EQ(QApplication::focusWidget(), window.canvas());
    QAction* spring = window.tools()->action(QStringLiteral("Spring"));
    ASSERT_NE(spring, nullptr);
    ASSERT_FALSE(spring->isChecked());
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_K);
    EXPECT_TRUE(spring->isChecked());
}

}  // namespace
