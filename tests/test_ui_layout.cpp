// The main window on a laptop (1366 × 768) and a desktop (1920 × 1080) screen
// with the six-bar sample open, a body selected and the cycle scrubbed: the
// window and every dock stay on the screen, the status bar shows, and long
// texts never widen the window. Shortcuts are unique and the docks can be
// found again from the View menu.
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/files/file_actions.h"
#include "ui/panels/status_line.h"
#include "ui/results/drive_scrubber.h"
#include "ui/shell/main_window.h"

#include <QAction>
#include <QDockWidget>
#include <QLabel>
#include <QMenu>
#include <QMenuBar>
#include <QSlider>
#include <QStatusBar>
#include <QTest>
#include <QWindow>

#include <gtest/gtest.h>

#include <map>

using namespace clevis::ui;

namespace {

const QString kLongText = QString(QStringLiteral("a very long text without end ")).repeated(40);

QRect onScreen(const QWidget* w) { return QRect(w->mapToGlobal(QPoint(0, 0)), w->size()); }

std::string text(const QRect& r)
{
    return std::to_string(r.x()) + "," + std::to_string(r.y()) + " " + std::to_string(r.width()) + "×" +
           std::to_string(r.height());
}

class ScreenLayout : public ::testing::TestWithParam<QSize> {
protected:
    void SetUp() override
    {
        screen = QRect(QPoint(0, 0), GetParam());
        window.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&window));
        window.placeOn(screen);
        QString error;
        ASSERT_TRUE(window.files()->open(QStringLiteral(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json"), &error))
            << error.toStdString();
        window.analysis()->waitForIdle();
        window.document()->setSelection({Selection::Kind::Body, QStringLiteral("coupler_plate"), -1});
        auto* slider = window.findChild<DriveScrubber*>()->slider();
        slider->setValue(slider->maximum() / 3);
        QCoreApplication::processEvents();
    }

    // Everything a user needs is inside the screen.
    void expectInsideScreen()
    {
        EXPECT_TRUE(screen.contains(window.frameGeometry())) << "window " << text(window.frameGeometry());
        for (QDockWidget* dock : window.findChildren<QDockWidget*>()) {
            if (!dock->isVisible()) continue;
            dock->raise();  // a dock behind another's tab is parked off the window until it is raised
            QCoreApplication::processEvents();
            EXPECT_TRUE(screen.contains(onScreen(dock)))
                << dock->objectName().toStdString() << " " << text(onScreen(dock));
        }
        ASSERT_TRUE(window.statusBar()->isVisible());
        EXPECT_TRUE(screen.contains(onScreen(window.statusBar()))) << text(onScreen(window.statusBar()));
    }

    QRect screen;
    MainWindow window;
};

TEST_P(ScreenLayout, TheWindowAndEveryDockStayOnTheScreen) { expectInsideScreen(); }

TEST_P(ScreenLayout, AMaximisedWindowKeepsEveryDockOnTheScreen)
{
    // What a window manager does to a maximised window: all of the screen, frame included.
    const QRect inside = screen.marginsRemoved(window.windowHandle()->frameMargins());
    window.setGeometry(inside);
    QCoreApplication::processEvents();
    EXPECT_EQ(window.size(), inside.size());
    expectInsideScreen();
}

TEST_P(ScreenLayout, LongTextsNeverWidenTheWindow)
{
    const QSize before = window.size();
    window.statusLine()->showHint(kLongText);
    for (QLabel* label : window.findChildren<QLabel*>()) {
        if (label->isVisible()) label->setText(kLongText);
    }
    QCoreApplication::processEvents();
    EXPECT_EQ(window.size(), before);
    expectInsideScreen();
}

INSTANTIATE_TEST_SUITE_P(Screens, ScreenLayout, ::testing::Values(QSize(1366, 768), QSize(1920, 1080)),
                         [](const auto& info) {
                             return std::to_string(info.param.width()) + "x" + std::to_string(info.param.height());
                         });

TEST(MainWindowShortcuts, NoTwoActionsShareAShortcut)
{
    MainWindow window;
    std::map<QString, QString> owner;
    for (const QAction* action : window.findChildren<QAction*>()) {
        for (const QKeySequence& key : action->shortcuts()) {
            const QString k = key.toString();
            const auto [it, fresh] = owner.emplace(k, action->text());
            EXPECT_TRUE(fresh) << k.toStdString() << " is on both \"" << it->second.toStdString() << "\" and \""
                               << action->text().toStdString() << "\"";
        }
    }
}

QAction* redoAction(MainWindow& window)
{
    for (QAction* a : window.findChildren<QAction*>())
        if (a->text().startsWith(QStringLiteral("Redo"))) return a;
    return nullptr;
}

TEST(MainWindowShortcuts, RedoShortcutRedoes)
{
    MainWindow window;
    window.show();
    QApplication::setActiveWindow(&window);
    ASSERT_TRUE(QTest::qWaitForWindowActive(&window));
    window.document()->apply(QStringLiteral("Rename mechanism"), [](clevis::Mechanism& m) { m.name = "renamed"; });
    window.document()->undoStack()->undo();
    ASSERT_NE(window.document()->mechanism().name, "renamed");
    const QAction* redo = redoAction(window);
    ASSERT_NE(redo, nullptr);
    ASSERT_FALSE(redo->shortcuts().isEmpty());
    const QKeyCombination key = redo->shortcuts().front()[0];
    QTest::keyClick(window.centralWidget(), key.key(), key.keyboardModifiers());
    EXPECT_EQ(window.document()->mechanism().name, "renamed");
}

QMenu* viewMenu(MainWindow& window)
{
    for (QAction* a : window.menuBar()->actions())
        if (a->menu() && a->text().remove('&') == QStringLiteral("View")) return a->menu();
    return nullptr;
}

TEST(MainWindowDocks, EveryDockIsInTheViewMenu)
{
    MainWindow window;
    QMenu* view = viewMenu(window);
    ASSERT_NE(view, nullptr);
    const auto docks = window.findChildren<QDockWidget*>();
    ASSERT_GE(docks.size(), 6);
    for (QDockWidget* dock : docks)
        EXPECT_TRUE(view->actions().contains(dock->toggleViewAction())) << dock->objectName().toStdString();
}

TEST(MainWindowDocks, ResetLayoutBringsBackAClosedDockInItsPlace)
{
    MainWindow window;
    window.placeOn(QRect(0, 0, 1366, 768));
    window.show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(&window));
    auto* fbd = window.findChild<QDockWidget*>(QStringLiteral("freeBodyDock"));
    ASSERT_NE(fbd, nullptr);
    const Qt::DockWidgetArea home = window.dockWidgetArea(fbd);
    window.addDockWidget(Qt::LeftDockWidgetArea, fbd);
    fbd->close();
    QAction* reset = nullptr;
    for (QAction* a : viewMenu(window)->actions())
        if (a->text().remove('&') == QStringLiteral("Reset layout")) reset = a;
    ASSERT_NE(reset, nullptr);
    reset->trigger();
    QCoreApplication::processEvents();
    EXPECT_TRUE(fbd->isVisible());
    EXPECT_EQ(window.dockWidgetArea(fbd), home);
}

}  // namespace
