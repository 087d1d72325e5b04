#include "ui/results/peak_table.h"

#include "render/cycle_axis.h"
#include "ui/analysis/analysis_state.h"
#include "ui/shell/display_units.h"

#include <QHeaderView>

namespace clevis::ui {
namespace {

constexpr int kStepRole = Qt::UserRole + 1;

}  // namespace

PeakTable::PeakTable(AnalysisState* analysis, QWidget* parent) : QTableWidget(parent), analysis_(analysis)
{
    setObjectName("peakTable");
    setColumnCount(7);
    setHorizontalHeaderLabels(
        {tr("Part"), tr("Peak"), tr("Where"), tr("RMS"), tr("Mean"), tr("Peak power"), tr("Work per cycle")});
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
    const auto addRow = [&](const QString& part, int step, const QStringList& cells) {
        const int row = rowCount();
        insertRow(row);
        auto* first = new QTableWidgetItem(part);
        first->setData(kStepRole, step);
        first->setToolTip(tr("Click to go to this peak"));
        setItem(row, 0, first);
        for (int c = 0; c < cells.size(); ++c) setItem(row, c + 1, new QTableWidgetItem(cells[c]));
    };
    for (const auto& j : s.joints)
        addRow(tr("joint %1").arg(QString::fromStdString(j.name)), j.peak.step,
               {u.force(j.peak.value), where(j.peak.step), u.force(j.rms), "", "", ""});
    for (const auto& d : s.drivers) {
        const auto effort = [&](double v) { return d.type == DriverType::Rotary ? u.torque(v) : u.force(v); };
        addRow(tr("driver %1").arg(QString::fromStdString(d.name)), d.peak.step,
               {effort(d.peak.value), where(d.peak.step), effort(d.rms), effort(d.mean),
                d.peakPower.step >= 0 ? formatQuantity(d.peakPower.value, "W") : QString("–"),
                formatQuantity(d.work, "J")});
    }
    addRow(tr("shaking force"), s.groundForce.step,
           {u.force(s.groundForce.value), where(s.groundForce.step), "", "", "", ""});
    addRow(tr("shaking moment"), s.groundMoment.step,
           {u.torque(s.groundMoment.value), where(s.groundMoment.step), "", "", "", ""});
}

}  // namespace clevis::ui
