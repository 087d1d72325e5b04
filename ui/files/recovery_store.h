// The recovery folder: where autosaved copies of unsaved documents live, how
// they are named, and how they are written, found again after a crash, read
// and deleted.
//
// For a document it holds NAME.json (the mechanism in the normal file format,
// so it opens by hand too), NAME.json.info (the original file's path and when
// it was written) and NAME.json.lock, a QLockFile held by the app instance
// that writes NAME.json. A lock whose process is gone is stale, so a file is
// offered for recovery only once the instance that wrote it has ended.
#pragma once

#include "core/model/mechanism.h"

#include <QDateTime>
#include <QLockFile>
#include <QString>

#include <memory>
#include <vector>

namespace clevis::ui {

// A recovery file whose lock this process holds: no other instance writes,
// offers or deletes it meanwhile. An empty path holds nothing.
struct HeldRecoveryFile {
    QString path;
    std::unique_ptr<QLockFile> lock;
};

// A file left by an instance that ended without a clean exit.
struct RecoveryClaim {
    HeldRecoveryFile file;
    QString originalPath;  // empty for a document that was never saved
    QDateTime savedAt;
};

class RecoveryStore {
public:
    explicit RecoveryStore(QString folder);

    // CLEVIS_RECOVERY_DIR if set, else the app's data folder + "/recovery".
    static QString defaultFolder();
    const QString& folder() const { return folder_; }

    // A fresh, locked name for a document of `originalPath`. Throws
    // FileWriteError if the folder cannot be made or written.
    HeldRecoveryFile reserve(const QString& originalPath) const;
    // Writes the mechanism and its side file atomically. Throws FileWriteError.
    void write(const HeldRecoveryFile& file, const Mechanism& m, const QString& originalPath) const;
    // Every file whose writer has ended, locked for this process, newest first.
    std::vector<RecoveryClaim> claimLeftovers() const;
    // Throws ModelError when the file is damaged.
    static Mechanism read(const RecoveryClaim& claim);
    // Deletes the files and then releases the lock; `file` holds nothing after.
    static void discard(HeldRecoveryFile& file);

private:
    QString folder_;
};

}  // namespace clevis::ui
