// `clevis --screenshot OUT.png [FILE]`: the main window with FILE open,
// solved, rendered to a PNG without needing a display.
#pragma once

#include <QSize>
#include <QString>

namespace clevis::ui {

class MainWindow;

// The window size screenshots are taken at, in logical pixels.
inline constexpr QSize kScreenshotSize{1600, 1000};

// Lays the window out at kScreenshotSize, waits for the newest solve and
// writes the PNG; returns an error message, or empty on success.
QString saveScreenshot(MainWindow& window, const QString& outPath);

}  // namespace clevis::ui
