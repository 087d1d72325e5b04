// Tool bar icons drawn with the canvas's own symbols, so a tool looks like
// what it puts down. Drawn at twice the logical size for high-DPI screens.
#pragma once

#include <QIcon>
#include <QString>

namespace clevis::ui {

QIcon toolIcon(const QString& toolName);

}  // namespace clevis::ui
