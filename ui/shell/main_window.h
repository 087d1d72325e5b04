// The main window: canvas in the centre, the panels around it (see
// dock_layout.h), the status line below. It only creates and wires the pieces.
#pragma once

#include "ui/files/recovery_store.h"

#include <QMainWindow>

class QMenu;

namespace clevis::ui {

class AnalysisState;
class AutosaveTimer;
class CanvasView;
class FileActions;
class MechanismDocument;
class StatusLine;
class ToolPalette;

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    // Unsaved changes are autosaved to `recoveryFolder` (see RecoveryStore).
    explicit MainWindow(const QString& recoveryFolder = RecoveryStore::defaultFolder(), QWidget* parent = nullptr);
    ~MainWindow() override;

    MechanismDocument* document() const { return doc_; }
    AnalysisState* analysis() const { return analysis_; }
    CanvasView* canvas() const { return canvas_; }
    FileActions* files() const { return files_; }
    AutosaveTimer* autosave() const { return autosave_; }
    ToolPalette* tools() const { return tools_; }
    StatusLine* statusLine() const { return status_; }

    // Sizes the window for a screen's available area and arranges the panels
    // for that size: all of a small screen (returns true: show it maximised,
    // so its frame fits too), 90 % of a larger one, centred.
    bool placeOn(const QRect& available);
    // Placed on `available` and shown (maximised on a small screen), active,
    // with the keyboard on the canvas: the first key typed draws or picks a
    // tool. Without a window manager nothing else activates a new window.
    void showOn(const QRect& available);
    // Every panel back in its default place, shown (View > Reset layout).
    void resetLayout();

protected:
    void closeEvent(QCloseEvent*) override;
    void dragEnterEvent(QDragEnterEvent*) override;
    void dropEvent(QDropEvent*) override;

private:
    void buildDocks();
    QMenu* buildMenus();
    void listPanels(QMenu* view);
    void deleteSelection();

    MechanismDocument* doc_;
    AnalysisState* analysis_;
    CanvasView* canvas_;
    FileActions* files_;
    AutosaveTimer* autosave_;
    ToolPalette* tools_;
    StatusLine* status_;
};

}  // namespace clevis::ui
