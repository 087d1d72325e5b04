// The loads along the selected link in the window on a laptop (1366 × 768)
// and a desktop (1920 × 1080) screen, offscreen: the diagram is laid out to
// the pane's width and never scrolls sideways; the sizing table under it,
// whose columns cannot wrap, scrolls sideways on its own, and only when its
// lines are wider than the pane.
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/files/file_actions.h"
#include "ui/results/bar_load_view.h"
#include "ui/shell/main_window.h"

#include <QApplication>
#include <QDockWidget>
#include <QLabel>
#include <QScrollArea>
#include <QScrollBar>
#include <QTemporaryDir>
#include <QTest>
#include <QWheelEvent>

#include <gtest/gtest.h>

#include <string>

using namespace clevis::ui;

namespace {

class BarLoadWidth : public ::testing::TestWithParam<QSize> {
protected:
    void SetUp() override
    {
        window.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&window));
        window.placeOn(QRect(QPoint(0, 0), GetParam()));
        QString error;
        ASSERT_TRUE(window.files()->open(QStringLiteral(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json"), &error))
            << error.toStdString();
        window.analysis()->waitForIdle();
        window.findChild<QDockWidget*>(QStringLiteral("barLoadsDock"))->raise();
        QCoreApplication::processEvents();
    }

    void expectFitted(const char* body)
    {
        window.document()->setSelection({Selection::Kind::Body, QString::fromLatin1(body), -1});
        QCoreApplication::processEvents();
        const auto* view = window.findChild<BarLoadView*>();
        ASSERT_NE(view->figure(), nullptr) << body;
        const auto* page = view->findChild<QScrollArea*>(QStringLiteral("barLoadPage"));
        const auto* table = view->findChild<QScrollArea*>(QStringLiteral("sizingTable"));
        ASSERT_NE(page, nullptr);
        EXPECT_EQ(page->horizontalScrollBar()->maximum(), 0) << body << ": the page scrolls sideways";
        EXPECT_LE(view->figure()->size().width(), page->viewport()->width()) << body;
        ASSERT_NE(table, nullptr);
        const auto* text = qobject_cast<QLabel*>(table->widget());
        ASSERT_NE(text, nullptr);
        // The table: every line in view down, and sideways a scroll bar exactly when the lines are wider.
        const int overflow = text->sizeHint().width() - table->viewport()->width();
        EXPECT_EQ(table->horizontalScrollBar()->isVisible(), overflow > 0) << body << " overflow " << overflow;
        EXPECT_EQ(table->horizontalScrollBar()->maximum(), std::max(0, overflow)) << body;
        EXPECT_GE(table->viewport()->height(), text->sizeHint().height()) << body;
        // The wheel over the table scrolls the page down, as anywhere else on it.
        QScrollBar* down = page->verticalScrollBar();
        ASSERT_GT(down->maximum(), 0) << body;
        down->setValue(0);
        const QPointF at(table->viewport()->rect().center());
        QWheelEvent wheel(at, table->viewport()->mapToGlobal(at), QPoint(), QPoint(0, -120), Qt::NoButton,
                          Qt::NoModifier, Qt::NoScrollPhase, false);
        QApplication::sendEvent(table->viewport(), &wheel);
        EXPECT_GT(down->value(), 0) << body;
    }

    QTemporaryDir recovery;
    MainWindow window{recovery.path()};
};

TEST_P(BarLoadWidth, TheDiagramFitsThePaneAndOnlyTheTableScrollsSideways)
{
    expectFitted("crank");
    expectFitted("rocker");  // with a section: stresses and utilisation too
}

INSTANTIATE_TEST_SUITE_P(Screens, BarLoadWidth, ::testing::Values(QSize(1366, 768), QSize(1920, 1080)),
                         [](const auto& info) {
                             return std::to_string(info.param.width()) + "x" + std::to_string(info.param.height());
                         });

}  // namespace
