#include "ui/files/recovery_restore.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "ui/document/mechanism_document.h"
#include "ui/files/autosave_timer.h"

#include <QObject>

namespace clevis::ui {
namespace {

// An original that has since been moved or damaged only loses the undo step
// back to it, not the recovered changes.
Mechanism lastSaved(const QString& originalPath)
{
    if (originalPath.isEmpty()) return {};
    try {
        return loadMechanismFile(originalPath.toStdString()).mechanism;
    } catch (const ModelError&) {
        return {};
    }
}

}  // namespace

QString restoreRecovered(MechanismDocument& doc, AutosaveTimer& autosave, RecoveryClaim&& claim)
{
    Mechanism recovered;
    try {
        recovered = RecoveryStore::read(claim);
    } catch (const ModelError& e) {
        return QObject::tr("Cannot read the recovered copy %1: %2")
            .arg(claim.file.path, QString::fromStdString(e.what()));
    }
    doc.reset(lastSaved(claim.originalPath), claim.originalPath);
    doc.apply(QObject::tr("Recovered changes"), [&recovered](Mechanism& m) { m = recovered; });
    // Identical to the saved file: nothing was unsaved after all.
    if (doc.isModified()) autosave.adopt(std::move(claim));
    else RecoveryStore::discard(claim.file);
    return {};
}

}  // namespace clevis::ui
