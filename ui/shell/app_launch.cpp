#include "ui/shell/app_launch.h"

#include "ui/files/file_actions.h"
#include "ui/files/recovery_prompt.h"
#include "ui/files/recovery_store.h"
#include "ui/shell/main_window.h"
#include "ui/shell/screenshot.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QIcon>
#include <QScreen>
#include <QTextStream>

namespace clevis::ui {

namespace {

// Help and version are text only: they must work where there is no display.
bool asksOnlyForText(int argc, char** argv)
{
    for (int i = 1; i < argc; ++i) {
        const QString arg = QString::fromLocal8Bit(argv[i]);
        if (arg == "-h" || arg == "--help" || arg == "--help-all" || arg == "-v" || arg == "--version") return true;
    }
    return false;
}

void nameApplication()
{
    QCoreApplication::setOrganizationName(QStringLiteral("Clevis"));
    QCoreApplication::setApplicationName(QStringLiteral("clevis"));
    QCoreApplication::setApplicationVersion(QStringLiteral(CLEVIS_VERSION));
}

QCommandLineOption screenshotOption()
{
    return QCommandLineOption(QStringLiteral("screenshot"),
                              QObject::tr("Render the main window with FILE open to a PNG of %1 × %2 px and exit.")
                                  .arg(kScreenshotSize.width())
                                  .arg(kScreenshotSize.height()),
                              QObject::tr("OUT.png"));
}

void describeOptions(QCommandLineParser& parser)
{
    parser.setApplicationDescription(
        QObject::tr("Clevis: sketch a planar linkage, edit it, and see the loads in every pin over the cycle.\n"
                    "Without a display, use --screenshot (e.g. with QT_QPA_PLATFORM=offscreen) or clevis-cli.\n"
                    "Unsaved changes are autosaved every minute to %1 and offered back at the next start if Clevis "
                    "ends without closing; set CLEVIS_RECOVERY_DIR to use another folder.")
            .arg(RecoveryStore::defaultFolder()));
    parser.addHelpOption();
    parser.addVersionOption();
    parser.addOption(screenshotOption());
    parser.addPositionalArgument(QStringLiteral("FILE"), QObject::tr("A mechanism file (.json) to open."),
                                 QStringLiteral("[FILE]"));
}

}  // namespace

int runDesktopApp(int argc, char** argv)
{
    if (asksOnlyForText(argc, argv)) {
        QCoreApplication app(argc, argv);
        nameApplication();
        QCommandLineParser parser;
        describeOptions(parser);
        parser.process(app);  // prints the text and exits
        return 0;
    }
    QApplication app(argc, argv);
    nameApplication();
    QApplication::setWindowIcon(QIcon(QStringLiteral(":/clevis/clevis.svg")));  // resources/clevis.qrc
    QCommandLineParser parser;
    describeOptions(parser);
    parser.process(app);
    const QCommandLineOption screenshot = screenshotOption();

    MainWindow window;
    const QStringList files = parser.positionalArguments();
    QTextStream err(stderr);
    if (parser.isSet(screenshot)) {
        QString error;
        if (!files.isEmpty() && !window.files()->open(files.front(), &error)) {
            err << "clevis: " << error << "\n";
            return 1;
        }
        const QString problem = saveScreenshot(window, parser.value(screenshot));
        if (!problem.isEmpty()) err << "clevis: " << problem << "\n";
        return problem.isEmpty() ? 0 : 1;
    }
    window.showOn(window.screen()->availableGeometry());
    if (!files.isEmpty()) window.files()->open(files.front());  // tells the user in a dialog if it cannot
    offerRecoveryInDialogs(window);  // never reached by --screenshot, so headless runs do not wait on it
    return app.exec();
}

}  // namespace clevis::ui
