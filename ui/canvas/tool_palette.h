// The drawing tools as checkable actions (one active at a time), in a menu
// and a tool bar; choosing one hands a fresh tool to the canvas.
#pragma once

#include <QObject>

#include <functional>
#include <memory>

class QAction;
class QActionGroup;
class QMenu;
class QToolBar;

namespace clevis::ui {

class CanvasView;
class Tool;
class ToolHost;

class ToolPalette : public QObject {
    Q_OBJECT
public:
    ToolPalette(CanvasView* canvas, QObject* parent = nullptr);
    void fill(QMenu* menu, QToolBar* bar) const;
    QAction* selectAction() const { return select_; }
    QAction* action(const QString& name) const;  // by its text, for tests

private:
    using Factory = std::function<std::unique_ptr<Tool>(ToolHost&)>;
    QAction* add(const QString& name, const QString& key, Factory make);

    CanvasView* canvas_;
    QActionGroup* group_;
    QAction* select_ = nullptr;
};

}  // namespace clevis::ui
