#include "ui/files/recovery_prompt.h"

#include "ui/files/autosave_timer.h"
#include "ui/files/file_actions.h"
#include "ui/files/recovery_restore.h"
#include "ui/shell/main_window.h"

#include <QFileInfo>
#include <QMessageBox>
#include <QPushButton>

namespace clevis::ui {
namespace {

QString whenText(const QDateTime& at)
{
    return at.toString(at.date() == QDate::currentDate() ? QStringLiteral("HH:mm")
                                                         : QStringLiteral("yyyy-MM-dd HH:mm"));
}

RecoveryChoice askInDialog(QWidget* parent, const RecoveryClaim& claim)
{
    QMessageBox box(QMessageBox::Question, QObject::tr("Recovered changes"), recoveryMessage(claim),
                    QMessageBox::NoButton, parent);
    box.setInformativeText(
        QObject::tr("Clevis ended before they were saved. Restore them as an unsaved document, "
                    "discard them for good, or decide at the next start?"));
    box.setDetailedText(QObject::tr("Recovered copy: %1").arg(claim.file.path));
    QPushButton* restore = box.addButton(QObject::tr("Restore"), QMessageBox::AcceptRole);
    QPushButton* discard = box.addButton(QObject::tr("Discard"), QMessageBox::DestructiveRole);
    QPushButton* later = box.addButton(QObject::tr("Decide later"), QMessageBox::RejectRole);
    box.setDefaultButton(restore);
    box.setEscapeButton(later);  // closing the dialog must not delete anything
    box.exec();
    if (box.clickedButton() == restore) return RecoveryChoice::Restore;
    return box.clickedButton() == discard ? RecoveryChoice::Discard : RecoveryChoice::Later;
}

}  // namespace

QString recoveryMessage(const RecoveryClaim& claim)
{
    const QString what =
        claim.originalPath.isEmpty() ? QObject::tr("an untitled mechanism") : QFileInfo(claim.originalPath).fileName();
    return QObject::tr("Unsaved changes to %1 from %2 were recovered.").arg(what, whenText(claim.savedAt));
}

QStringList offerRecovery(MechanismDocument& doc, AutosaveTimer& autosave, const RecoveryChooser& choose)
{
    QStringList problems;
    for (RecoveryClaim& claim : autosave.store().claimLeftovers()) {
        const RecoveryChoice choice = choose(claim);
        if (choice == RecoveryChoice::Discard) RecoveryStore::discard(claim.file);
        if (choice != RecoveryChoice::Restore) continue;
        const QString problem = restoreRecovered(doc, autosave, std::move(claim));
        if (problem.isEmpty()) break;  // the window holds one document
        problems << problem;
    }
    return problems;
}

void offerRecoveryInDialogs(MainWindow& window)
{
    if (!window.files()->maybeSave()) return;
    const QStringList problems =
        offerRecovery(*window.document(), *window.autosave(),
                      [&window](const RecoveryClaim& claim) { return askInDialog(&window, claim); });
    if (!problems.isEmpty())
        QMessageBox::warning(&window, QObject::tr("Cannot restore"), problems.join(QLatin1Char('\n')));
}

}  // namespace clevis::ui
