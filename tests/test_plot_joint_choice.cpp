// Which joints' reactions the plots show: a large machine starts with its
// most loaded joints (the highest peak |F|, as the summary reports the
// peaks) and says so in the pane's title; a small one shows every joint; a
// user's pick in the "Reactions at" list is kept across new results.
#include "core/file/mechanism_file.h"
#include "tests/chain_generator.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/plot_stack.h"

#include <qcustomplot.h>
#include <QAbstractEventDispatcher>
#include <QApplication>
#include <QListWidget>

#include <gtest/gtest.h>

#include <algorithm>
#include <memory>
#include <set>

using namespace clevis;
using namespace clevis::ui;

namespace {

struct Plots {
    MechanismDocument doc;
    std::unique_ptr<AnalysisState> analysis;
    std::unique_ptr<PlotStack> plots;

    explicit Plots(Mechanism m)
    {
        doc.reset(std::move(m), "plotted");
        analysis = std::make_unique<AnalysisState>(&doc);
        plots = std::make_unique<PlotStack>(analysis.get());
        settle();
    }

    void settle()
    {
        analysis->waitForIdle();
        while (QAbstractEventDispatcher::instance()->processEvents(QEventLoop::AllEvents)) {}
    }

    // The joints ticked in the "Reactions at" list.
    std::set<std::string> ticked() const
    {
        std::set<std::string> out;
        const auto* list = plots->findChild<QListWidget*>();
        for (int i = 0; i < list->count(); ++i)
            if (list->item(i)->checkState() == Qt::Checked) out.insert(list->item(i)->text().toStdString());
        return out;
    }

    // The joints whose |F| curve the first pane draws.
    std::set<std::string> plotted() const
    {
        std::set<std::string> out;
        for (const PlotCurve& c : plots->panes().front().curves) {
            const QString name = c.series.name;
            EXPECT_TRUE(name.endsWith(" |F|")) << name.toStdString();
            out.insert(name.chopped(4).toStdString());
        }
        return out;
    }
};

// The `n` joints of the highest peak |F| in the summary of the present result.
std::set<std::string> mostLoaded(const AnalysisState& analysis, std::size_t n)
{
    std::vector<const JointSummary*> joints;
    for (const JointSummary& j : analysis.summary().joints) joints.push_back(&j);
    std::stable_sort(joints.begin(), joints.end(),
                     [](const JointSummary* a, const JointSummary* b) { return a->peak.value > b->peak.value; });
    std::set<std::string> out;
    for (std::size_t i = 0; i < std::min(n, joints.size()); ++i) out.insert(joints[i]->name);
    return out;
}

TEST(PlotJointChoice, ALargeMachineStartsWithItsMostLoadedJoints)
{
    Plots p(test::fourBarFan(100));
    ASSERT_TRUE(p.analysis->hasResult()) << p.analysis->errorText().toStdString();
    const std::size_t joints = p.analysis->compiled().joints.size();
    ASSERT_GT(joints, std::size_t(kMostLoadedShown));
    ASSERT_EQ(p.analysis->summary().joints.size(), joints);  // no cylinder ends to rank besides
    const std::set<std::string> expected = mostLoaded(*p.analysis, kMostLoadedShown);
    EXPECT_EQ(p.plotted(), expected);
    EXPECT_EQ(p.ticked(), expected);  // the rest one tick away
    const QString title = p.plots->panes().front().title;
    EXPECT_TRUE(title.contains(QString("%1 of %2 joints").arg(kMostLoadedShown).arg(joints)) &&
                title.contains("highest peak |F|"))
        << title.toStdString();
}

TEST(PlotJointChoice, ASmallMachineShowsEveryJoint)
{
    Plots p(loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json").mechanism);
    ASSERT_TRUE(p.analysis->hasResult());
    std::set<std::string> all;
    for (const auto& j : p.analysis->compiled().joints) all.insert(j.name);
    EXPECT_EQ(p.plotted(), all);
    EXPECT_EQ(p.ticked(), all);
    EXPECT_EQ(p.plots->panes().front().title, "Joint reactions |F|");
}

TEST(PlotJointChoice, AUsersPickIsKeptAcrossNewResults)
{
    Plots p(test::fourBarFan(100));
    ASSERT_TRUE(p.analysis->hasResult());
    std::set<std::string> shown = p.ticked();
    ASSERT_EQ(shown.size(), std::size_t(kMostLoadedShown));
    // The user ticks a joint left out, and unticks one shown.
    auto* list = p.plots->findChild<QListWidget*>();
    QListWidgetItem *added = nullptr, *removed = nullptr;
    for (int i = 0; i < list->count(); ++i) {
        QListWidgetItem* item = list->item(i);
        if (!added && item->checkState() == Qt::Unchecked) added = item;
        if (!removed && item->checkState() == Qt::Checked) removed = item;
    }
    ASSERT_TRUE(added && removed);
    added->setCheckState(Qt::Checked);
    removed->setCheckState(Qt::Unchecked);
    shown.insert(added->text().toStdString());
    shown.erase(removed->text().toStdString());
    ASSERT_EQ(p.ticked(), shown);
    // New results that load the joints otherwise: twice, so that a pick
    // lost at the first would show at the second.
    for (const double g : {3.0, 0.2}) {
        p.doc.apply("gravity", [g](Mechanism& m) { m.gravity *= g; });
        p.settle();
        ASSERT_TRUE(p.analysis->hasResult());
        EXPECT_EQ(p.ticked(), shown);
        EXPECT_EQ(p.plotted(), shown);
    }
}

}  // namespace
