#include "ui/files/file_actions.h"

#include "core/file/atomic_file.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "ui/document/mechanism_document.h"
#include "ui/shell/menu_action.h"

#include <QAction>
#include <QFileDialog>
#include <QFileInfo>
#include <QMainWindow>
#include <QMenu>
#include <QMessageBox>
#include <QSettings>

namespace clevis::ui {
namespace {

const char* kRecentKey = "files/recent";
constexpr int kRecentCount = 8;
const char* kFilter = QT_TRANSLATE_NOOP("FileActions", "Clevis mechanisms (*.json);;All files (*)");

}  // namespace

FileActions::FileActions(QMainWindow* window, MechanismDocument* doc) : QObject(window), window_(window), doc_(doc)
{
    connect(doc_, &MechanismDocument::modifiedChanged, this, &FileActions::updateTitle);
    connect(doc_, &MechanismDocument::filePathChanged, this, &FileActions::updateTitle);
    updateTitle();
}

void FileActions::fill(QMenu* menu)
{
    addMenuAction(menu, tr("&New"), QKeySequence::New, this, [this] { newFile(); });
    addMenuAction(menu, tr("&Open…"), QKeySequence::Open, this, [this] { openDialog(); });
    recent_ = menu->addMenu(tr("Open &recent"));
    connect(recent_, &QMenu::aboutToShow, this, &FileActions::fillRecent);
    menu->addSeparator();
    addMenuAction(menu, tr("&Save"), QKeySequence::Save, this, [this] { save(); });
    addMenuAction(menu, tr("Save &as…"), QKeySequence::SaveAs, this, [this] { saveAs(); });
    menu->addSeparator();
    addMenuAction(menu, tr("&Quit"), QKeySequence::Quit, window_, [this] { window_->close(); });
}

void FileActions::updateTitle()
{
    const QString path = doc_->filePath();
    const QString name = path.isEmpty() ? tr("untitled") : QFileInfo(path).fileName();
    window_->setWindowTitle(tr("%1[*] — Clevis").arg(name));
    window_->setWindowModified(doc_->isModified());
}

bool FileActions::maybeSave()
{
    if (!doc_->isModified()) return true;
    const auto answer = QMessageBox::question(
        window_, tr("Unsaved changes"), tr("The mechanism has changes that are not saved. Save them first?"),
        QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel, QMessageBox::Save);
    if (answer == QMessageBox::Save) return save();
    return answer == QMessageBox::Discard;
}

void FileActions::newFile()
{
    if (maybeSave()) doc_->reset(Mechanism{}, {});
}

void FileActions::openDialog()
{
    if (!maybeSave()) return;
    const QString path = QFileDialog::getOpenFileName(window_, tr("Open mechanism"), {}, tr(kFilter));
    if (!path.isEmpty()) open(path);
}

bool FileActions::openWithPrompt(const QString& path) { return maybeSave() && open(path); }

bool FileActions::open(const QString& path, QString* error)
{
    try {
        const LoadedMechanism loaded = loadMechanismFile(path.toStdString());
        doc_->reset(loaded.mechanism, QFileInfo(path).absoluteFilePath());
        remember(doc_->filePath());
        if (!loaded.warnings.empty())
            emit note(tr("Opened %1 with %2 note(s); first: %3")
                          .arg(QFileInfo(path).fileName())
                          .arg(loaded.warnings.size())
                          .arg(QString::fromStdString(loaded.warnings.front())));
        return true;
    } catch (const ModelError& e) {
        const QString why = tr("Cannot open %1: %2").arg(QFileInfo(path).fileName(), QString::fromStdString(e.what()));
        if (error) *error = why;
        else QMessageBox::warning(window_, tr("Cannot open"), why);
        return false;
    }
}

bool FileActions::save() { return doc_->filePath().isEmpty() ? saveAs() : saveTo(doc_->filePath()); }

bool FileActions::saveAs()
{
    QString path = QFileDialog::getSaveFileName(window_, tr("Save mechanism"), doc_->filePath(), tr(kFilter));
    if (path.isEmpty()) return false;
    if (QFileInfo(path).suffix().isEmpty()) path += QStringLiteral(".json");
    return saveTo(path);
}

bool FileActions::saveTo(const QString& path, QString* error)
{
    try {
        // Atomic, keeping the previous file as NAME.bak; on failure the old
        // file is intact and the document stays unsaved.
        writeFileAtomically(path.toStdString(), saveMechanismText(doc_->mechanism()), true);
    } catch (const FileWriteError& e) {
        const QString why = QString::fromStdString(e.what());
        if (error) *error = why;
        else QMessageBox::warning(window_, tr("Cannot save"), why);
        return false;
    }
    doc_->markSaved(QFileInfo(path).absoluteFilePath());
    remember(doc_->filePath());
    return true;
}

QStringList FileActions::recentFiles() { return QSettings().value(kRecentKey).toStringList(); }

void FileActions::remember(const QString& path)
{
    QStringList list = recentFiles();
    list.removeAll(path);
    list.prepend(path);
    while (list.size() > kRecentCount) list.removeLast();
    QSettings().setValue(kRecentKey, list);
}

void FileActions::fillRecent()
{
    recent_->clear();
    const QStringList list = recentFiles();
    if (list.isEmpty()) recent_->addAction(tr("(none yet)"))->setEnabled(false);
    for (const QString& path : list)
        addMenuAction(recent_, QFileInfo(path).fileName(), {}, this, [this, path] {
            openWithPrompt(path);
        })->setToolTip(path);
}

}  // namespace clevis::ui
