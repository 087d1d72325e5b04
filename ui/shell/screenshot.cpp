#include "ui/shell/screenshot.h"

#include "ui/analysis/analysis_state.h"
#include "ui/canvas/canvas_view.h"
#include "ui/shell/main_window.h"

#include <QCoreApplication>
#include <QPixmap>

namespace clevis::ui {

QString saveScreenshot(MainWindow& window, const QString& outPath)
{
    window.resize(kScreenshotSize);
    window.resetLayout();
    window.show();
    QCoreApplication::processEvents();
    window.analysis()->waitForIdle();
    window.canvas()->fitToView();
    QCoreApplication::processEvents();
    if (window.size() != kScreenshotSize)
        return QStringLiteral("the window's panels need %1 × %2 px, more than the screenshot's %3 × %4")
            .arg(window.width())
            .arg(window.height())
            .arg(kScreenshotSize.width())
            .arg(kScreenshotSize.height());
    const QPixmap shot = window.grab();
    if (!shot.save(outPath, "PNG")) return QStringLiteral("cannot write %1").arg(outPath);
    return {};
}

}  // namespace clevis::ui
