// Autosave and crash recovery: an edited document written to the recovery
// folder comes back, equal and unsaved, in a fresh window after the first
// one ended without a clean exit; a clean close, a save or another document
// leaves no recovery file; a folder that cannot be written gives one quiet
// note; and two instances never take each other's files.
#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/files/autosave_timer.h"
#include "ui/files/file_actions.h"
#include "ui/files/recovery_prompt.h"
#include "ui/files/recovery_store.h"
#include "ui/shell/main_window.h"

#include <QApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QLabel>
#include <QMessageBox>
#include <QPushButton>
#include <QSignalSpy>
#include <QTemporaryDir>
#include <QTest>
#include <QTimer>

#include <gtest/gtest.h>

#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <memory>

using namespace clevis;
using namespace clevis::ui;

namespace {

Mechanism sampleFourBar() { return loadMechanismFile(CLEVIS_TEST_DATA "/drawn_four_bar.json").mechanism; }

// Two kinds of change at once: a moved pin and a new part.
void editTheDrawing(MechanismDocument& doc, double pinX)
{
    doc.apply(QStringLiteral("Move pin"), [pinX](Mechanism& m) { edits::moveJoint(m, 2, {pinX, 0.05}); });
    doc.apply(QStringLiteral("Add torque"), [](Mechanism& m) { edits::addTorque(m, m.bodies.back().name, -3.5); });
}

QStringList filesIn(const QString& folder) { return QDir(folder).entryList(QDir::Files | QDir::Hidden); }

// Clicks `button` in the next message box that opens (e.g. the prompt about unsaved changes).
void answerNextMessageBox(QMessageBox::StandardButton button)
{
    auto* poll = new QTimer(qApp);
    QObject::connect(poll, &QTimer::timeout, poll, [poll, button] {
        auto* box = qobject_cast<QMessageBox*>(QApplication::activeModalWidget());
        if (!box) return;
        box->button(button)->click();
        poll->deleteLater();
    });
    poll->start(10);
}

class Autosave : public ::testing::Test {
protected:
    void SetUp() override
    {
        ASSERT_TRUE(dir.isValid());
        original = dir.filePath(QStringLiteral("punch_press.json"));
        writeFileAtomically(original.toStdString(), saveMechanismText(sampleFourBar()), false);
    }

    // A window on the saved sample, edited and autosaved once.
    std::unique_ptr<MainWindow> editedWindow(double pinX = 0.04)
    {
        auto w = std::make_unique<MainWindow>(recovery);
        EXPECT_TRUE(w->files()->open(original, &error)) << error.toStdString();
        editTheDrawing(*w->document(), pinX);
        EXPECT_TRUE(w->autosave()->writeNow());
        return w;
    }

    QTemporaryDir dir;
    QString recovery = dir.filePath(QStringLiteral("recovery"));
    QString original;
    QString error;
};

TEST_F(Autosave, TheRecoveryFileHoldsTheEditsInTheNormalFormat)
{
    auto w = editedWindow();
    const QString path = w->autosave()->recoveryPath();
    ASSERT_TRUE(QFileInfo::exists(path)) << path.toStdString();
    EXPECT_TRUE(QFileInfo(path).fileName().startsWith(QStringLiteral("punch_press-")));
    EXPECT_EQ(loadMechanismFile(path.toStdString()).mechanism, w->document()->mechanism());
    EXPECT_NE(w->document()->mechanism(), sampleFourBar());
}

TEST_F(Autosave, AfterACrashAFreshStartRestoresTheEditedDocumentUnsaved)
{
    auto crashed = editedWindow();
    const Mechanism edited = crashed->document()->mechanism();
    crashed.reset();  // gone without the clean-exit path: the recovery file stays

    MainWindow fresh(recovery);
    QStringList asked;
    const QStringList problems = offerRecovery(*fresh.document(), *fresh.autosave(), [&asked](const RecoveryClaim& c) {
        asked << recoveryMessage(c);
        return RecoveryChoice::Restore;
    });
    EXPECT_TRUE(problems.isEmpty()) << problems.join('\n').toStdString();
    ASSERT_EQ(asked.size(), 1);
    EXPECT_TRUE(asked.front().startsWith(QStringLiteral("Unsaved changes to punch_press.json from ")))
        << asked.front().toStdString();
    EXPECT_EQ(fresh.document()->mechanism(), edited);
    EXPECT_TRUE(fresh.document()->isModified());
    EXPECT_EQ(fresh.document()->filePath(), QFileInfo(original).absoluteFilePath());
    EXPECT_EQ(loadMechanismFile(original.toStdString()).mechanism, sampleFourBar())
        << "restoring must not write the original";

    // Until it is saved, the restored document keeps its recovery file.
    const QString kept = fresh.autosave()->recoveryPath();
    EXPECT_TRUE(QFileInfo::exists(kept));
    ASSERT_TRUE(fresh.files()->saveTo(fresh.document()->filePath(), &error)) << error.toStdString();
    EXPECT_EQ(loadMechanismFile(original.toStdString()).mechanism, edited);
    EXPECT_FALSE(QFileInfo::exists(kept));
    fresh.document()->undoStack()->undo();
    EXPECT_EQ(fresh.document()->mechanism(), sampleFourBar()) << "undo shows the file as it was before the crash";
}

// The lock is left behind by a process that really ended: the child writes
// a recovery file and exits at once, as a crash would, without unlocking.
TEST_F(Autosave, AFileWhoseWriterDiedIsOfferedAndAnUntitledOneSaysSo)
{
    Mechanism edited = sampleFourBar();
    edits::addPin(edited, {0.3, 0.3});  // an open pin: a drawing in progress is recovered as it is
    const pid_t child = fork();
    ASSERT_GE(child, 0);
    if (child == 0) {
        try {
            RecoveryStore store(recovery);
            const HeldRecoveryFile file = store.reserve({});
            store.write(file, edited, {});
            _exit(0);
        } catch (...) {
            _exit(1);
        }
    }
    int status = 0;
    ASSERT_EQ(waitpid(child, &status, 0), child);
    ASSERT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0);
    ASSERT_EQ(QDir(recovery).entryList({QStringLiteral("*.lock")}).size(), 1)
        << "the dead writer's lock is still there";

    std::vector<RecoveryClaim> claims = RecoveryStore(recovery).claimLeftovers();
    ASSERT_EQ(claims.size(), 1u);
    EXPECT_EQ(RecoveryStore::read(claims.front()), edited);
    EXPECT_TRUE(claims.front().originalPath.isEmpty());
    EXPECT_TRUE(
        recoveryMessage(claims.front()).startsWith(QStringLiteral("Unsaved changes to an untitled mechanism from ")));
}

TEST_F(Autosave, TheMessageNamesTheFileAndTheTime)
{
    RecoveryClaim claim{
        {}, QStringLiteral("/work/shop/punch_press.json"), QDateTime(QDate::currentDate(), QTime(21, 43))};
    EXPECT_EQ(recoveryMessage(claim), QStringLiteral("Unsaved changes to punch_press.json from 21:43 were recovered."));
    claim.savedAt = QDateTime(QDate(2023, 11, 5), QTime(8, 5));
    EXPECT_EQ(recoveryMessage(claim),
              QStringLiteral("Unsaved changes to punch_press.json from 2023-11-05 08:05 were recovered."));
}

TEST_F(Autosave, ACleanCloseRemovesTheRecoveryFile)
{
    auto w = editedWindow();
    w->show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(w.get()));
    ASSERT_TRUE(QFileInfo::exists(w->autosave()->recoveryPath()));
    answerNextMessageBox(QMessageBox::Discard);
    EXPECT_TRUE(w->close());
    EXPECT_TRUE(filesIn(recovery).isEmpty()) << filesIn(recovery).join(' ').toStdString();
}

TEST_F(Autosave, ACancelledCloseKeepsTheRecoveryFile)
{
    auto w = editedWindow();
    w->show();
    ASSERT_TRUE(QTest::qWaitForWindowExposed(w.get()));
    answerNextMessageBox(QMessageBox::Cancel);
    EXPECT_FALSE(w->close());
    EXPECT_TRUE(QFileInfo::exists(w->autosave()->recoveryPath()));
}

TEST_F(Autosave, ASavedDocumentLeavesNoRecoveryFile)
{
    auto w = editedWindow();
    const QString path = w->autosave()->recoveryPath();
    ASSERT_TRUE(QFileInfo::exists(path));
    ASSERT_TRUE(w->files()->saveTo(original, &error)) << error.toStdString();
    EXPECT_FALSE(QFileInfo::exists(path));
    EXPECT_TRUE(w->autosave()->writeNow());
    EXPECT_TRUE(filesIn(recovery).isEmpty()) << "nothing unsaved, nothing written";
}

TEST_F(Autosave, OpeningAnotherDocumentOrUndoingAllEditsLeavesNoRecoveryFile)
{
    auto w = editedWindow();
    ASSERT_TRUE(w->files()->open(original, &error)) << error.toStdString();
    EXPECT_TRUE(filesIn(recovery).isEmpty());

    editTheDrawing(*w->document(), 0.05);
    ASSERT_TRUE(w->autosave()->writeNow());
    ASSERT_FALSE(filesIn(recovery).isEmpty());
    w->document()->undoStack()->setIndex(0);
    EXPECT_TRUE(filesIn(recovery).isEmpty());
}

// Root may write anywhere, so the folder is made unwritable by a file
// standing where its parent folder should be.
TEST_F(Autosave, AnUnwritableFolderGivesOneQuietNoteAndKeepsTheDrawing)
{
    QFile blocker(dir.filePath(QStringLiteral("blocker")));
    ASSERT_TRUE(blocker.open(QIODevice::WriteOnly));
    blocker.close();
    const QString unwritable = dir.filePath(QStringLiteral("blocker/recovery"));
    MainWindow w(unwritable);
    w.document()->reset(sampleFourBar(), {});
    editTheDrawing(*w.document(), 0.04);
    const Mechanism edited = w.document()->mechanism();
    QSignalSpy notes(w.autosave(), &AutosaveTimer::note);

    EXPECT_FALSE(w.autosave()->writeNow());
    EXPECT_FALSE(w.autosave()->writeNow());
    ASSERT_EQ(notes.size(), 1);
    const QString note = notes.front().front().toString();
    EXPECT_TRUE(note.contains(unwritable)) << note.toStdString();
    EXPECT_EQ(w.findChild<QLabel*>(QStringLiteral("toolHint"))->text(), note);
    const QWidgetList shown = QApplication::topLevelWidgets();
    EXPECT_TRUE(std::none_of(shown.begin(), shown.end(), [](QWidget* t) { return qobject_cast<QMessageBox*>(t); }));
    EXPECT_EQ(w.document()->mechanism(), edited);
    EXPECT_TRUE(w.document()->isModified());
}

TEST_F(Autosave, TheTimerWritesByItselfAndNotesAFailureOnlyOnce)
{
    MechanismDocument doc;
    doc.reset(sampleFourBar(), {});
    AutosaveTimer good(&doc, RecoveryStore(recovery), nullptr, std::chrono::milliseconds(20));
    AutosaveTimer bad(&doc, RecoveryStore(original + QStringLiteral("/recovery")), nullptr,
                      std::chrono::milliseconds(20));
    QSignalSpy notes(&bad, &AutosaveTimer::note);
    editTheDrawing(doc, 0.06);
    EXPECT_TRUE(QTest::qWaitFor([&] { return !good.recoveryPath().isEmpty(); }, 2000));
    QTest::qWait(150);  // several more ticks
    EXPECT_EQ(loadMechanismFile(good.recoveryPath().toStdString()).mechanism, doc.mechanism());
    EXPECT_EQ(notes.size(), 1);
}

TEST_F(Autosave, TwoInstancesNeverTakeEachOthersFiles)
{
    auto first = editedWindow(0.04);
    auto second = editedWindow(0.07);
    const Mechanism firstEdits = first->document()->mechanism();
    const Mechanism secondEdits = second->document()->mechanism();
    ASSERT_NE(firstEdits, secondEdits);
    ASSERT_NE(first->autosave()->recoveryPath(), second->autosave()->recoveryPath());
    EXPECT_TRUE(RecoveryStore(recovery).claimLeftovers().empty()) << "both writers are still running";

    const QString secondFile = second->autosave()->recoveryPath();
    first.reset();  // the first one ends without a clean exit
    std::vector<RecoveryClaim> claims = RecoveryStore(recovery).claimLeftovers();
    ASSERT_EQ(claims.size(), 1u);
    EXPECT_EQ(RecoveryStore::read(claims.front()), firstEdits);
    EXPECT_TRUE(RecoveryStore(recovery).claimLeftovers().empty()) << "a claimed file is not offered twice";

    // The running instance keeps writing its own file, untouched by the claim.
    second->document()->apply(QStringLiteral("Add torque"),
                              [](Mechanism& m) { edits::addTorque(m, m.bodies.front().name, 1.0); });
    ASSERT_TRUE(second->autosave()->writeNow());
    EXPECT_EQ(second->autosave()->recoveryPath(), secondFile);
    EXPECT_EQ(loadMechanismFile(secondFile.toStdString()).mechanism, second->document()->mechanism());
    EXPECT_EQ(RecoveryStore::read(claims.front()), firstEdits);
}

TEST_F(Autosave, DiscardDeletesALeftoverAndLaterKeepsIt)
{
    editedWindow(0.04).reset();
    editedWindow(0.07).reset();
    MainWindow fresh(recovery);
    int offered = 0;
    offerRecovery(*fresh.document(), *fresh.autosave(), [&offered](const RecoveryClaim&) {
        return ++offered == 1 ? RecoveryChoice::Discard : RecoveryChoice::Later;
    });
    EXPECT_EQ(offered, 2);
    EXPECT_FALSE(fresh.document()->isModified());
    EXPECT_EQ(RecoveryStore(recovery).claimLeftovers().size(), 1u) << "the one put off is offered at the next start";
}

TEST_F(Autosave, ADamagedRecoveryFileIsReportedAndKept)
{
    auto crashed = editedWindow();
    const QString path = crashed->autosave()->recoveryPath();
    crashed.reset();
    QFile damaged(path);
    ASSERT_TRUE(damaged.open(QIODevice::WriteOnly | QIODevice::Truncate));
    damaged.write("{ \"bodies\": [");
    damaged.close();

    MainWindow fresh(recovery);
    fresh.document()->reset(sampleFourBar(), {});
    const QStringList problems = offerRecovery(*fresh.document(), *fresh.autosave(),
                                               [](const RecoveryClaim&) { return RecoveryChoice::Restore; });
    ASSERT_EQ(problems.size(), 1);
    EXPECT_TRUE(problems.front().contains(QFileInfo(path).fileName())) << problems.front().toStdString();
    EXPECT_EQ(fresh.document()->mechanism(), sampleFourBar());
    EXPECT_TRUE(QFileInfo::exists(path));
}

TEST(RecoveryFolder, TheEnvironmentVariableChoosesTheFolder)
{
    qputenv("CLEVIS_RECOVERY_DIR", "/srv/clevis-recovery");
    EXPECT_EQ(RecoveryStore::defaultFolder(), QStringLiteral("/srv/clevis-recovery"));
    qunsetenv("CLEVIS_RECOVERY_DIR");
    EXPECT_TRUE(RecoveryStore::defaultFolder().endsWith(QStringLiteral("/recovery")));
    EXPECT_NE(RecoveryStore::defaultFolder(), QStringLiteral("/srv/clevis-recovery"));
}

}  // namespace
