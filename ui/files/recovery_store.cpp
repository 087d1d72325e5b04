#include "ui/files/recovery_store.h"

#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QJsonDocument>
#include <QJsonObject>
#include <QRandomGenerator>
#include <QStandardPaths>

#include <algorithm>

namespace clevis::ui {
namespace {

const char* kOriginalKey = "original_path";
const char* kSavedAtKey = "saved_at";

QString infoPath(const QString& recoveryPath) { return recoveryPath + QStringLiteral(".info"); }

// Stale only by its process having ended, never by age: an instance left
// open over the weekend still owns its file on Monday.
std::unique_ptr<QLockFile> lockFor(const QString& recoveryPath)
{
    auto lock = std::make_unique<QLockFile>(recoveryPath + QStringLiteral(".lock"));
    lock->setStaleLockTime(0);
    return lock;
}

QString randomName(const QString& originalPath)
{
    const QString stem =
        originalPath.isEmpty() ? QStringLiteral("untitled") : QFileInfo(originalPath).completeBaseName();
    return QStringLiteral("%1-%2.json").arg(stem).arg(QRandomGenerator::global()->generate(), 8, 16, QLatin1Char('0'));
}

std::string infoText(const QString& originalPath)
{
    QJsonObject o;
    o.insert(QLatin1String(kOriginalKey), originalPath);
    o.insert(QLatin1String(kSavedAtKey), QDateTime::currentDateTime().toString(Qt::ISODateWithMs));
    return QJsonDocument(o).toJson().toStdString();
}

// Without a readable side file the mechanism is still offered, as untitled
// and dated by the file itself.
RecoveryClaim claimOf(const QFileInfo& file, std::unique_ptr<QLockFile> lock)
{
    RecoveryClaim claim{{file.absoluteFilePath(), std::move(lock)}, {}, file.lastModified()};
    QFile info(infoPath(claim.file.path));
    if (!info.open(QIODevice::ReadOnly)) return claim;
    const QJsonObject o = QJsonDocument::fromJson(info.readAll()).object();
    claim.originalPath = o.value(QLatin1String(kOriginalKey)).toString();
    const QDateTime at = QDateTime::fromString(o.value(QLatin1String(kSavedAtKey)).toString(), Qt::ISODateWithMs);
    if (at.isValid()) claim.savedAt = at;
    return claim;
}

}  // namespace

RecoveryStore::RecoveryStore(QString folder) : folder_(std::move(folder)) {}

QString RecoveryStore::defaultFolder()
{
    const QString chosen = qEnvironmentVariable("CLEVIS_RECOVERY_DIR");
    if (!chosen.isEmpty()) return chosen;
    return QStandardPaths::writableLocation(QStandardPaths::AppDataLocation) + QStringLiteral("/recovery");
}

HeldRecoveryFile RecoveryStore::reserve(const QString& originalPath) const
{
    const std::string where = "the recovery folder \"" + folder_.toStdString() + "\"";
    if (!QDir().mkpath(folder_)) throw FileWriteError(folder_.toStdString(), "cannot create " + where);
    // A random name cannot take over a crashed instance's file, even one
    // whose process id has since been reused.
    for (int attempt = 0; attempt < 8; ++attempt) {
        const QString path = QDir(folder_).filePath(randomName(originalPath));
        if (QFileInfo::exists(path)) continue;
        auto lock = lockFor(path);
        if (lock->tryLock(0)) return {path, std::move(lock)};
        if (lock->error() != QLockFile::LockFailedError) break;
    }
    throw FileWriteError(folder_.toStdString(), "cannot write to " + where);
}

void RecoveryStore::write(const HeldRecoveryFile& file, const Mechanism& m, const QString& originalPath) const
{
    // The mechanism first: a crash between the two leaves it, undated, rather than a date without it.
    writeFileAtomically(file.path.toStdString(), saveMechanismText(m), false);
    writeFileAtomically(infoPath(file.path).toStdString(), infoText(originalPath), false);
}

std::vector<RecoveryClaim> RecoveryStore::claimLeftovers() const
{
    std::vector<RecoveryClaim> claims;
    for (const QFileInfo& file : QDir(folder_).entryInfoList({QStringLiteral("*.json")}, QDir::Files)) {
        auto lock = lockFor(file.absoluteFilePath());
        // Its owner may have removed it on a clean exit since the listing.
        if (lock->tryLock(0) && QFileInfo::exists(file.absoluteFilePath()))
            claims.push_back(claimOf(file, std::move(lock)));
    }
    std::sort(claims.begin(), claims.end(),
              [](const RecoveryClaim& a, const RecoveryClaim& b) { return a.savedAt > b.savedAt; });
    return claims;
}

Mechanism RecoveryStore::read(const RecoveryClaim& claim)
{
    // A drawing in progress reads like any saved file: the format keeps open pins.
    return loadMechanismFile(claim.file.path.toStdString()).mechanism;
}

void RecoveryStore::discard(HeldRecoveryFile& file)
{
    if (file.path.isEmpty()) return;
    QFile::remove(file.path);
    QFile::remove(infoPath(file.path));
    file.lock.reset();  // unlocking deletes the lock file
    file.path.clear();
}

}  // namespace clevis::ui
