#include "ui/files/autosave_timer.h"

#include "core/file/atomic_file.h"
#include "ui/document/mechanism_document.h"

namespace clevis::ui {

AutosaveTimer::AutosaveTimer(MechanismDocument* doc, RecoveryStore store, QObject* parent,
                             std::chrono::milliseconds interval)
    : QObject(parent), doc_(doc), store_(std::move(store))
{
    // Saving, New, Open and undoing back to the saved state all end in a clean document.
    connect(doc_, &MechanismDocument::modifiedChanged, this, [this](bool modified) {
        if (!modified) discard();
    });
    connect(&timer_, &QTimer::timeout, this, &AutosaveTimer::writeNow);
    timer_.start(interval);
}

bool AutosaveTimer::writeNow()
{
    if (!doc_->isModified()) return true;
    if (!file_.path.isEmpty() && written_ == doc_->mechanism()) return true;
    try {
        if (file_.path.isEmpty()) file_ = store_.reserve(doc_->filePath());
        store_.write(file_, doc_->mechanism(), doc_->filePath());
    } catch (const FileWriteError& e) {
        reportFailure(QString::fromStdString(e.what()));
        return false;
    }
    written_ = doc_->mechanism();
    failing_ = false;
    return true;
}

void AutosaveTimer::reportFailure(const QString& reason)
{
    // Once per run of failures: a note every minute would only be noise.
    if (!failing_)
        emit note(tr("Autosave could not write a recovery copy (%1). Your drawing is unchanged; save it to keep it.")
                      .arg(reason));
    failing_ = true;
}

void AutosaveTimer::discard()
{
    RecoveryStore::discard(file_);
    written_.reset();
}

void AutosaveTimer::adopt(RecoveryClaim&& claim)
{
    discard();
    file_ = std::move(claim.file);
    written_ = doc_->mechanism();
}

}  // namespace clevis::ui
