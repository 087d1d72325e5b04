// Adds an action with a shortcut to a menu and connects it, spelled out so
// it reads the same on every Qt 6 minor version.
#pragma once

#include <QAction>
#include <QKeySequence>
#include <QMenu>

namespace clevis::ui {

template <typename Slot>
QAction* addMenuAction(QMenu* menu, const QString& text, const QKeySequence& key, const QObject* context, Slot slot)
{
    QAction* a = menu->addAction(text);
    a->setShortcut(key);
    QObject::connect(a, &QAction::triggered, context, slot);
    return a;
}

}  // namespace clevis::ui
