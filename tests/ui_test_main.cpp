// GoogleTest main for the desktop-app tests: they need a QApplication (run
// under QT_QPA_PLATFORM=offscreen, set by the ctest properties).
#include <QApplication>
#include <QStandardPaths>

#include <gtest/gtest.h>

int main(int argc, char** argv)
{
    // Keep the tests' remembered settings (units, recent files) away from the user's.
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("ClevisTests"));
    ::testing::InitGoogleTest(&argc, argv);
    return RUN_ALL_TESTS();
}
