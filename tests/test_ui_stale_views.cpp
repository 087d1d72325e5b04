// Every text of the results views shows the current document and its
// current result only: after Open, a rename, a breaking edit and its fix,
// New, and opening a file that does not solve then fixing it, the plots
// (joint list, legends, peak list, readout), the peak table, the cycle
// scrubber and the status line say exactly what the mechanism now is; and
// right after New or Open nothing of the previous document stays on screen
// while the new one is being solved.
#include "core/file/mechanism_file.h"
#include "tests/qstring_printer.h"
#include "ui/analysis/analysis_state.h"
#include "ui/analysis/solve_worker.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/files/file_actions.h"
#include "ui/panels/status_line.h"
#include "ui/results/drive_scrubber.h"
#include "ui/results/peak_table.h"
#include "ui/results/plot_stack.h"
#include "ui/shell/main_window.h"

#include <qcustomplot.h>
#include <QAction>
#include <QDoubleSpinBox>
#include <QFile>
#include <QLabel>
#include <QListWidget>
#include <QRegularExpression>
#include <QSlider>
#include <QTemporaryDir>

#include <gtest/gtest.h>

using namespace clevis;
using namespace clevis::ui;

namespace {

const QString kSixBar = QStringLiteral(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json");
const QString kPress = QStringLiteral(CLEVIS_SAMPLES_DIR "/punch_press.json");

// What the results views show, read off the widgets.
struct Shown {
    QString status;
    QStringList joints;      // the "Reactions at" list
    QStringList curves;      // the plotted curves' names
    QStringList peaks;       // the peak list beside the plots
    QString readout;         // the line under the plots
    QStringList tableParts;  // the peak table's first column
    QString positions;       // under the scrubber
    QString positionBox;     // the exact position box, as it reads
    bool scrubberEnabled = false;
};

class StaleViews : public ::testing::Test {
protected:
    QTemporaryDir recovery;
    MainWindow window{recovery.path()};

    void SetUp() override { ASSERT_TRUE(recovery.isValid()); }

    void settle()
    {
        window.analysis()->waitForIdle();
        QCoreApplication::processEvents();
    }

    void open(const QString& path)
    {
        QString error;
        ASSERT_TRUE(window.files()->open(path, &error)) << error.toStdString();
    }

    void edit(const QString& text, std::function<void(Mechanism&)> change)
    {
        ASSERT_EQ(window.document()->apply(text, std::move(change)), QString());
        settle();
    }

    Shown shown() const
    {
        Shown s;
        s.status = window.statusLine()->analysisText();
        const auto* plots = window.findChild<PlotStack*>();
        const auto* list = plots->findChild<QListWidget*>();
        for (int i = 0; i < list->count(); ++i) s.joints << list->item(i)->text();
        for (int i = 0; i < plots->plot()->graphCount(); ++i) s.curves << plots->plot()->graph(i)->name();
        s.peaks = plots->peakListText().isEmpty() ? QStringList{} : plots->peakListText().split('\n');
        s.readout = plots->readoutText();
        const auto* table = window.findChild<PeakTable*>();
        for (int r = 0; r < table->rowCount(); ++r) s.tableParts << table->item(r, 0)->text();
        const auto* scrubber = window.findChild<DriveScrubber*>();
        s.positions = scrubber->findChild<QLabel*>()->text();
        s.positionBox = scrubber->positionBox()->text();
        s.scrubberEnabled = scrubber->isEnabled();
        return s;
    }

    QAction* action(const QString& text) const
    {
        for (QAction* a : window.findChildren<QAction*>())
            if (a->text() == text) return a;
        ADD_FAILURE() << "no action " << text.toStdString();
        return nullptr;
    }
};

const QStringList kSixBarJoints{"O", "A", "B", "R", "P", "D", "F"};
const QString kSixBarSolved = "1 degree of freedom, 1 driver. Solves over the whole cycle (360 steps, 0.6667 s).";
const QString kSixBarAtStart = "index_motor = 0.00°   t = 0.0000 s   step 0 of 360";

QStringList jointCurves(const QStringList& joints)
{
    QStringList out;
    for (const QString& j : joints) out << j + " |F|";
    return out;
}

// Nothing of a result: no joints, curves, peaks or table rows; the reason on
// the readout and under the scrubber (while solving, no reason yet), no old
// position in its box.
void expectNoResult(const Shown& s, const QString& reason)
{
    const QString underScrubber = reason.isEmpty() ? QString("No solved cycle yet") : reason;
    EXPECT_EQ(s.joints, QStringList{});
    EXPECT_EQ(s.curves, QStringList{});
    EXPECT_EQ(s.peaks, QStringList{});
    EXPECT_EQ(s.tableParts, QStringList{});
    EXPECT_EQ(s.readout, reason);
    EXPECT_EQ(s.positions, underScrubber);
    EXPECT_EQ(s.positionBox, QString("–"));
    EXPECT_FALSE(s.scrubberEnabled);
}

void expectSixBarSolved(const Shown& s, const QStringList& joints)
{
    EXPECT_EQ(s.status, kSixBarSolved);
    EXPECT_EQ(s.joints, joints);
    EXPECT_EQ(s.curves.mid(0, joints.size()), jointCurves(joints));
    ASSERT_GE(s.peaks.size(), joints.size());
    for (int j = 0; j < joints.size(); ++j)
        EXPECT_TRUE(s.peaks[j].startsWith(joints[j] + " |F|: ")) << s.peaks[j].toStdString();
    EXPECT_EQ(s.readout, QString());
    QStringList table;
    for (const QString& j : joints) table << "joint " + j;
    table << "driver index_motor"
          << "shaking force"
          << "shaking moment";
    // Bars are ranked by utilisation among the other parts: checked apart.
    QStringList links = s.tableParts.filter(QRegularExpression("^link ")), others = s.tableParts;
    for (const QString& l : links) others.removeOne(l);
    EXPECT_EQ(others, table);
    links.sort();
    EXPECT_EQ(links, (QStringList{"link crank", "link dwell_link", "link finger_lever", "link rocker"}));
    EXPECT_EQ(s.positions, kSixBarAtStart);
    EXPECT_EQ(s.positionBox, QString("0.00 °"));
    EXPECT_TRUE(s.scrubberEnabled);
}

TEST_F(StaleViews, RenameBreakAndFixShowOnlyTheCurrentMechanism)
{
    open(kSixBar);
    settle();
    expectSixBarSolved(shown(), kSixBarJoints);

    edit("Rename P", [](Mechanism& m) { edits::renameJoint(m, "P", "P2"); });
    QStringList renamed = kSixBarJoints;
    renamed[4] = "P2";
    expectSixBarSolved(shown(), renamed);

    edit("Remove the motor", [](Mechanism& m) { m.drivers.clear(); });
    const QString reason = window.analysis()->errorText();
    ASSERT_TRUE(reason.contains("drivers: 0")) << reason.toStdString();
    const Shown broken = shown();
    EXPECT_EQ(broken.status, "1 degree of freedom, 0 drivers. Does not solve: " + reason);
    expectNoResult(broken, reason);

    window.document()->undoStack()->undo();
    settle();
    expectSixBarSolved(shown(), renamed);
}

// The result the views read is the document's as it now is: after edits that
// come faster than their solves (whose results arrive stale and are let go)
// and after one solved alone, it is the mechanism solved afresh.
TEST_F(StaleViews, TheResultIsTheNewestEditsOwn)
{
    open(kSixBar);
    settle();
    const auto expectResultOfDocument = [this] {
        const SolveOutcome fresh = solveMechanism(window.document()->mechanism(), [] { return true; });
        const CycleResult& shown = window.analysis()->result();
        ASSERT_EQ(shown.steps.size(), fresh.result.steps.size());
        for (std::size_t i = 0; i < fresh.result.steps.size(); i += 45) {
            EXPECT_EQ(shown.steps[i].q, fresh.result.steps[i].q) << "step " << i;
            EXPECT_EQ(shown.steps[i].lambda, fresh.result.steps[i].lambda) << "step " << i;
        }
    };
    const auto moveA = [this](double dx) {
        ASSERT_EQ(window.document()->apply("Move A", [dx](Mechanism& m) { m.joints[1].at.x() += dx; }), QString());
    };
    ASSERT_EQ(window.document()->mechanism().joints[1].name, "A");
    for (int i = 0; i < 4; ++i) moveA(0.002);  // one after another, unsolved between
    settle();
    expectResultOfDocument();
    moveA(-0.003);
    settle();
    expectResultOfDocument();
}

TEST_F(StaleViews, NewShowsNothingOfTheClosedDocument)
{
    open(kSixBar);
    settle();
    window.analysis()->setCurrentStep(90);
    QCoreApplication::processEvents();
    ASSERT_TRUE(shown().positionBox.startsWith("90.00")) << shown().positionBox.toStdString();

    action("&New")->trigger();
    // Before the empty drawing has been solved, nothing of the six-bar stays.
    const Shown meanwhile = shown();
    expectNoResult(meanwhile, QString());
    settle();
    const QString reason = "Nothing to solve yet: draw a link between pins.";
    const Shown empty = shown();
    EXPECT_EQ(empty.status, "Nothing drawn yet: place ground pins and pins, then draw links between them.");
    expectNoResult(empty, reason);
}

TEST_F(StaleViews, OpeningAnotherFileShowsOnlyIt)
{
    open(kSixBar);
    settle();
    open(kPress);
    // Until the press is solved, no view shows the six-bar.
    const Shown meanwhile = shown();
    expectNoResult(meanwhile, QString());
    EXPECT_EQ(meanwhile.status, "Not solved yet.  (solving…)");
    settle();
    const Shown press = shown();
    EXPECT_TRUE(press.status.startsWith("1 degree of freedom, 1 driver. Solves over the whole cycle"))
        << press.status.toStdString();
    EXPECT_EQ(press.joints, QStringList({"main_bearing", "crank_pin", "wrist_pin", "ram_guide"}));
    EXPECT_EQ(press.readout, QString());
    EXPECT_TRUE(press.positions.startsWith("main_motor = 0.00°")) << press.positions.toStdString();
    for (const QString& text : press.curves + press.peaks + press.tableParts)
        EXPECT_FALSE(text.contains("index_motor")) << text.toStdString();
}

TEST_F(StaleViews, FixingAFileThatDoesNotSolveShowsTheResult)
{
    open(kSixBar);
    settle();
    const Mechanism good = window.document()->mechanism();
    // The six-bar without its motor, saved and opened as a file of its own.
    Mechanism broken = good;
    broken.drivers.clear();
    const QString path = recovery.filePath("no_motor.json");
    QFile file(path);
    ASSERT_TRUE(file.open(QIODevice::WriteOnly));
    file.write(QByteArray::fromStdString(saveMechanismText(broken)));
    file.close();
    open(path);
    settle();
    const QString reason = window.analysis()->errorText();
    ASSERT_TRUE(reason.contains("drivers: 0")) << reason.toStdString();
    const Shown before = shown();
    EXPECT_EQ(before.status, "1 degree of freedom, 0 drivers. Does not solve: " + reason);
    expectNoResult(before, reason);

    edit("Add the motor", [&](Mechanism& m) { m.drivers = good.drivers; });
    expectSixBarSolved(shown(), kSixBarJoints);
}

}  // namespace
