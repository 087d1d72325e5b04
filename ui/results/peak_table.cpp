#include "ui/results/peak_table.h"

#include "core/results/summary_text.h"
#include "render/cycle_axis.h"
#include "ui/analysis/analysis_state.h"
#include "ui/shell/display_units.h"

#include <QHeaderView>

namespace clevis::ui {
namespace {

constexpr int kStepRole = Qt::UserRole + 1;

// A value from a step near a singular position, marked so that it is never
// read as a design load.
QString marked(const QString& value, const PeakAt& p)
{
    return p.nearSingular ? QString("%1 %2 near toggle").arg(value, kNearToggleMark) : value;
}

}  // namespace

PeakTable::PeakTable(AnalysisState* analysis, QWidget* parent) : QTableWidget(parent), analysis_(analysis)
{
    setObjectName("peakTable");
    setColumnCount(8);
    setHorizontalHeaderLabels({tr("Part"), tr("Peak"), tr("Where"), tr("RMS"), tr("Mean"), tr("Peak power"),
                               tr("Work per cycle"), tr("Larger, near a toggle")});
    setEditTriggers(NoEditTriggers);
    setSelectionBehavior(SelectRows);
    setSelectionMode(SingleSelection);
    verticalHeader()->hide();
    horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    connect(this, &QTableWidget::cellClicked, this, [this](int row, int) {
        if (const int step = stepOfRow(row); step >= 0) analysis_->setCurrentStep(step);
    });
    connect(analysis_, &AnalysisState::resultChanged, this, &PeakTable::rebuild);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &PeakTable::rebuild);
    rebuild();
}

int PeakTable::stepOfRow(int row) const
{
    const QTableWidgetItem* i = item(row, 0);
    return i ? i->data(kStepRole).toInt() : -1;
}

void PeakTable::rebuild()
{
    setRowCount(0);
    if (!analysis_->hasResult()) return;
    const auto& m = analysis_->compiled();
    const auto& s = analysis_->summary();
    const RenderUnits u = renderUnits(DisplayUnits::instance());
    const CycleAxis axis = cycleAxis(m, analysis_->result());
    const auto where = [&](int step) {
        return step < 0 ? QString("–")
                        : QString("%1 %2").arg(axis.values[step], 0, 'f', axis.byTime ? 4 : 1).arg(axis.unit);
    };
    // The note for a flagged step: which part locks there.
    const auto note = [&](const PeakAt& p) {
        const NearToggle* t = p.nearSingular ? toggleAt(s, p.step) : nullptr;
        return t ? QString("%1 %2; the value is unreliable")
                       .arg(kNearToggleMark, QString::fromStdString(toggleText(m, *t)))
                 : QString();
    };
    // RMS, mean and work integrate over the unreliable steps too.
    const auto overCycle = [&](const QString& value) {
        return s.nearSingularSteps > 0 ? QString("%1 %2").arg(value, kNearToggleMark) : value;
    };
    bool anyLarger = false;
    const auto addRow = [&](const QString& part, const Peak& peak, const QString& value, const QStringList& cells,
                            const QString& flaggedValue) {
        const int row = rowCount();
        insertRow(row);
        auto* first = new QTableWidgetItem(part);
        first->setData(kStepRole, peak.step);
        first->setToolTip(tr("Click to go to this peak"));
        setItem(row, 0, first);
        auto* peakItem = new QTableWidgetItem(marked(value, peak));
        peakItem->setToolTip(note(peak));
        setItem(row, 1, peakItem);
        setItem(row, 2, new QTableWidgetItem(where(peak.step)));
        for (int c = 0; c < cells.size(); ++c) setItem(row, c + 3, new QTableWidgetItem(cells[c]));
        if (peak.flagged.step >= 0) {
            anyLarger = true;
            auto* larger = new QTableWidgetItem(
                QString("%1 %2 near toggle, %3").arg(flaggedValue, kNearToggleMark, where(peak.flagged.step)));
            larger->setToolTip(note(peak.flagged));
            setItem(row, 7, larger);
        }
    };
    for (const auto& j : s.joints)
        addRow(tr("joint %1").arg(QString::fromStdString(j.name)), j.peak, u.force(j.peak.value),
               {overCycle(u.force(j.rms)), "", "", ""}, u.force(j.peak.flagged.value));
    for (const auto& d : s.drivers) {
        const auto effort = [&](double v) { return d.type == DriverType::Rotary ? u.torque(v) : u.force(v); };
        addRow(tr("driver %1").arg(QString::fromStdString(d.name)), d.peak, effort(d.peak.value),
               {overCycle(effort(d.rms)), overCycle(effort(d.mean)),
                d.peakPower.step >= 0 ? marked(formatQuantity(d.peakPower.value, "W"), d.peakPower) : QString("–"),
                overCycle(formatQuantity(d.work, "J"))},
               effort(d.peak.flagged.value));
    }
    addRow(tr("shaking force"), s.groundForce, u.force(s.groundForce.value), {"", "", "", ""},
           u.force(s.groundForce.flagged.value));
    addRow(tr("shaking moment"), s.groundMoment, u.torque(s.groundMoment.value), {"", "", "", ""},
           u.torque(s.groundMoment.flagged.value));
    // The footnotes: each run of flagged steps and the part that locks there.
    for (const auto& t : s.toggles) {
        const int row = rowCount();
        insertRow(row);
        auto* item = new QTableWidgetItem(QString("%1 %2: values there are unreliable; RMS, mean and work include them")
                                              .arg(kNearToggleMark, QString::fromStdString(toggleText(m, t))));
        item->setData(kStepRole, t.worst);
        item->setToolTip(tr("Click to go to the worst step of this toggle"));
        setItem(row, 0, item);
        setSpan(row, 0, 1, columnCount());
    }
    setColumnHidden(7, !anyLarger);
}

}  // namespace clevis::ui
