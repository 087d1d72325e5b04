// Writes the open document to its recovery file every minute while it has
// unsaved changes, and deletes that file once the document needs no
// recovery (saved, undone back to the saved state, replaced by New or Open,
// or the window closed cleanly). A failed write never interrupts the user:
// it is noted once, quietly, and tried again at the next tick.
#pragma once

#include "core/model/mechanism.h"
#include "ui/files/recovery_store.h"

#include <QObject>
#include <QTimer>

#include <chrono>
#include <optional>

namespace clevis::ui {

class MechanismDocument;

// Destroy it before its document: a document being destroyed clears its undo
// stack, which reads as "saved" and would delete the recovery file.
class AutosaveTimer : public QObject {
    Q_OBJECT
public:
    static constexpr std::chrono::milliseconds kDefaultInterval{60'000};

    AutosaveTimer(MechanismDocument* doc, RecoveryStore store, QObject* parent,
                  std::chrono::milliseconds interval = kDefaultInterval);

    // One tick: writes when there are unsaved changes not yet written.
    // False when the write failed.
    bool writeNow();
    void discard();
    // Carries on in a file left by a crash, once the document holds what
    // that file holds (see restoreRecovered).
    void adopt(RecoveryClaim&& claim);

    const RecoveryStore& store() const { return store_; }
    QString recoveryPath() const { return file_.path; }  // empty while there is none

signals:
    void note(const QString& message);

private:
    void reportFailure(const QString& reason);

    MechanismDocument* doc_;
    RecoveryStore store_;
    HeldRecoveryFile file_;
    std::optional<Mechanism> written_;  // what file_ holds, so an idle minute writes nothing
    QTimer timer_;
    bool failing_ = false;
};

}  // namespace clevis::ui
