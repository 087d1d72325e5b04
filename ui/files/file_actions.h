// New, Open, Save, Save As and recent files for the main window, the prompt
// before unsaved changes are lost, and the window title (file name plus the
// unsaved mark). Files are the core's JSON format.
#pragma once

#include <QObject>
#include <QStringList>

class QAction;
class QMainWindow;
class QMenu;

namespace clevis::ui {

class MechanismDocument;

class FileActions : public QObject {
    Q_OBJECT
public:
    FileActions(QMainWindow* window, MechanismDocument* doc);

    void fill(QMenu* fileMenu);
    // Asks first when there are unsaved changes; false if the user cancels
    // or the file cannot be read (the reason is shown).
    bool openWithPrompt(const QString& path);
    bool open(const QString& path, QString* error = nullptr);  // no prompt, no dialogs when `error` is given
    bool saveTo(const QString& path, QString* error = nullptr);
    bool maybeSave();  // true: go ahead (saved, discarded, or nothing to save)

    static QStringList recentFiles();

signals:
    void note(const QString& message);  // e.g. warnings from reading a file

private:
    void newFile();
    void openDialog();
    bool save();
    bool saveAs();
    void remember(const QString& path);
    void fillRecent();
    void updateTitle();

    QMainWindow* window_;
    MechanismDocument* doc_;
    QMenu* recent_ = nullptr;
};

}  // namespace clevis::ui
