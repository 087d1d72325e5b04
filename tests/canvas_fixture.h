// The desktop window driven with mouse events in world coordinates, for the
// canvas and drawing suites: tools chosen by name, clicks and drags at points
// of the drawing, property fields found by key, and a four-bar drawn from
// nothing (pins on the 10 mm grid).
#pragma once

#include "ui/canvas/canvas_view.h"
#include "ui/canvas/tool_palette.h"
#include "ui/document/mechanism_document.h"
#include "ui/panels/property_editor.h"
#include "ui/shell/main_window.h"

#include <QAction>
#include <QApplication>
#include <QMouseEvent>
#include <QTest>

#include <gtest/gtest.h>

namespace clevis::ui::test {

class CanvasTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        window.resize(1400, 900);
        window.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&window));
        window.canvas()->fitToView();
    }

    QPoint at(double x, double y) const { return window.canvas()->view().toScreen({x, y}).toPoint(); }
    void useTool(const char* name) { window.tools()->action(QString::fromUtf8(name))->trigger(); }
    void click(double x, double y) { QTest::mouseClick(window.canvas(), Qt::LeftButton, {}, at(x, y)); }
    const Mechanism& mechanism() const { return window.document()->mechanism(); }
    // A pointer move with the left button held down.
    void dragTo(double x, double y)
    {
        QMouseEvent move(QEvent::MouseMove, at(x, y), window.canvas()->mapToGlobal(at(x, y)), Qt::NoButton,
                         Qt::LeftButton, {});
        QApplication::sendEvent(window.canvas(), &move);
    }

    template <typename W>
    W* field(const char* name)
    {
        auto* editor = window.findChild<PropertyEditor*>();
        editor->rebuildNow();
        return editor->findChild<W*>(QString::fromUtf8(name));
    }

    // Four-bar with its pins on the 10 mm grid: crank 50 mm, coupler 161 mm,
    // rocker 124 mm, frame 200 mm (a crank-rocker: 50 + 200 < 161 + 124).
    void drawFourBar()
    {
        useTool("Ground pin");
        click(0.0, 0.0);
        click(0.2, 0.0);
        useTool("Pin");
        click(0.03, 0.04);
        click(0.17, 0.12);
        useTool("Link");
        click(0.0, 0.0), click(0.03, 0.04);
        click(0.03, 0.04), click(0.17, 0.12);
        click(0.17, 0.12), click(0.2, 0.0);
        useTool("Motor");
        click(0.0, 0.0);
    }

    MainWindow window;
};

}  // namespace clevis::ui::test
