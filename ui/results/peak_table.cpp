#include "ui/results/peak_table.h"

#include "core/results/summary_text.h"
#include "core/results/utilisation_ranking.h"
#include "render/cycle_axis.h"
#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/results/in_sight.h"
#include "ui/shell/display_units.h"

#include <QHeaderView>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr int kStepRole = Qt::UserRole + 1;

// A value from a step near a singular position, marked so that it is never
// read as a design load.
QString marked(const QString& value, const PeakAt& p)
{
    return p.nearSingular ? QString("%1 %2 near toggle").arg(value, kNearToggleMark) : value;
}

// Shaded by how near the limit (render/palette.h); bold at or over it.
void shadeByUtilisation(QTableWidgetItem& item, double utilisation)
{
    item.setBackground(palette::utilisationShade(utilisation));
    item.setForeground(Qt::black);
    if (utilisation >= 1.0) {
        QFont bold = item.font();
        bold.setBold(true);
        item.setFont(bold);
    }
}

}  // namespace

PeakTable::PeakTable(AnalysisState* analysis, QWidget* parent) : QTableWidget(parent), analysis_(analysis)
{
    setObjectName("peakTable");
    sight_ = new SightWatch(this, [this] {
        fitColumns(true);
        return true;
    });
    connect(this, &QTableWidget::cellClicked, this, [this](int row, int) {
        if (const int step = stepOfRow(row); step >= 0) analysis_->setCurrentStep(step);
    });
    setColumnCount(kLargerColumn + 1);
    setHorizontalHeaderLabels({tr("Part"), tr("Utilisation"), tr("Peak"), tr("Where"), tr("RMS"), tr("Mean"),
                               tr("Peak power"), tr("Work per cycle"), tr("Larger, near a toggle")});
    horizontalHeaderItem(kUtilisationColumn)
        ->setToolTip(tr("Peak over the cycle as a fraction of your allowable (or, in compression, of the Euler load); "
                        "not a verdict of safety: dynamic and service factors, fatigue and stress concentrations "
                        "are not included"));
    setEditTriggers(NoEditTriggers);
    setSelectionBehavior(SelectRows);
    setSelectionMode(SingleSelection);
    verticalHeader()->hide();
    connect(analysis_, &AnalysisState::resultChanged, this, &PeakTable::rebuild);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &PeakTable::rebuild);
    rebuild();
}

void PeakTable::fitColumns(bool fit)
{
    horizontalHeader()->setSectionResizeMode(fit ? QHeaderView::ResizeToContents : QHeaderView::Fixed);
}

int PeakTable::stepOfRow(int row) const
{
    const QTableWidgetItem* i = item(row, kPartColumn);
    return i ? i->data(kStepRole).toInt() : -1;
}

void PeakTable::rebuild()
{
    // The columns fit their contents only while the table is in sight: fitting
    // measures every cell's text again after each result, a twentieth of an
    // edit at a 20-body chain while the table waits behind the plots' tab. The
    // rows stay current either way.
    fitColumns(false);
    sight_->request();
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
    std::vector<Row> rows;
    bool anyLarger = false;
    const auto addRow = [&](const QString& part, const Peak& peak, const QString& value, const QStringList& cells,
                            const QString& flaggedValue) {
        Row row{part, peak.step, {}, "", "", marked(value, peak), note(peak), where(peak.step), cells, "", ""};
        if (peak.flagged.step >= 0) {
            anyLarger = true;
            row.larger = QString("%1 %2 near toggle, %3").arg(flaggedValue, kNearToggleMark, where(peak.flagged.step));
            row.largerTip = note(peak.flagged);
        }
        rows.push_back(std::move(row));
    };
    // A joint's row, or a cylinder end's (sized as a joint's pin is,
    // core/results/cylinder_ends.h), with its pin's figures where it has any.
    const SizingResult& sizing = analysis_->sizing();
    const auto pinRows = [&](const QString& kind, const std::vector<JointSummary>& pins, int PinSizing::*index) {
        for (std::size_t k = 0; k < pins.size(); ++k) {
            const JointSummary& pin = pins[k];
            addRow(kind.arg(QString::fromStdString(pin.name)), pin.peak, u.force(pin.peak.value),
                   {overCycle(u.force(pin.rms)), "", "", ""}, u.force(pin.peak.flagged.value));
            for (int p = 0; p < int(sizing.pins.size()); ++p)
                if (sizing.pins[std::size_t(p)].*index == int(k)) pinFigures(rows.back(), p);
        }
    };
    pinRows(tr("joint %1"), s.joints, &PinSizing::joint);
    pinRows(tr("cylinder end %1"), s.cylinderEnds, &PinSizing::cylinderEnd);
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
    for (int b = 0; b < int(analysis_->sizing().bars.size()); ++b) rows.push_back(barRow(b, where));

    // The part closest to a limit first; parts without a figure keep their order below.
    std::stable_sort(rows.begin(), rows.end(), [](const Row& a, const Row& b) {
        return a.utilisation.value_or(-1.0) > b.utilisation.value_or(-1.0);
    });
    for (const Row& r : rows) addRowItems(r);

    // The footnotes: each run of flagged steps and the part that locks there.
    for (const auto& t : s.toggles) {
        const int row = rowCount();
        insertRow(row);
        auto* item = new QTableWidgetItem(QString("%1 %2: values there are unreliable; RMS, mean and work include them")
                                              .arg(kNearToggleMark, QString::fromStdString(toggleText(m, t))));
        item->setData(kStepRole, t.worst);
        item->setToolTip(tr("Click to go to the worst step of this toggle"));
        setItem(row, kPartColumn, item);
        setSpan(row, 0, 1, columnCount());
    }
    setColumnHidden(kLargerColumn, !anyLarger);
}

// A bar's row: its peak fibre stress, and its utilisation, the larger of the
// stress against the user's allowable and the compression against the Euler
// load, so that a slender link in compression is not hidden by a low stress.
PeakTable::Row PeakTable::barRow(int index, const std::function<QString(int)>& where) const
{
    const CycleResult& r = analysis_->result();
    const BarSizing& bar = analysis_->sizing().bars[std::size_t(index)];
    Row row;
    row.part = partLabel(tr("link"), QString::fromStdString(bar.name));
    QStringList why;
    for (const auto& n : bar.notes) why << QString::fromStdString(n);
    if (!bar.section) {
        row.step = -1;
        row.peak = "–";
        row.utilisationText = "–";
        row.utilisationTip = why.join('\n');
        row.where = where(-1);
        return row;
    }
    const SectionSizing& sec = *bar.section;
    row.step = sec.governing.step;
    const bool flagged = nearSingular(r, sec.governing);
    row.peak = formatQuantity(sec.governing.value / 1e6, "MPa") +
               (flagged ? QString(" %1 near toggle").arg(kNearToggleMark) : "");
    row.where = where(sec.governing.step);
    QStringList figures;
    if (sec.utilisation)
        figures << tr("fibre stress %1 of the allowable %2")
                       .arg(formatUtilisation(*sec.utilisation), formatQuantity(*sec.allowable / 1e6, "MPa"));
    if (sec.bucklingRatio)
        figures << tr("compression %1 of the Euler load %2")
                       .arg(formatUtilisation(*sec.bucklingRatio),
                            formatQuantity(std::min(sec.eulerInPlane.value_or(0.0), sec.eulerOutOfPlane.value_or(0.0)),
                                           "N"));
    setUtilisation(row, barUtilisation(r, analysis_->sizing(), index));
    row.utilisationTip = (figures + why).join('\n');
    return row;
}

// The part's one figure (utilisation_ranking.h) and what it is.
void PeakTable::setUtilisation(Row& row, const std::optional<PartUtilisation>& u) const
{
    if (!u) {
        row.utilisationText = "–";
        return;
    }
    row.utilisation = u->value;
    row.utilisationText = QString("%1 %2").arg(formatUtilisation(u->value), QString::fromStdString(u->governs));
    if (u->nearSingular) row.utilisationText += QString(" %1").arg(kNearToggleMark);
}

// A sized pin's utilisations, in the row of its joint.
void PeakTable::pinFigures(Row& row, int index) const
{
    const PinSizing& pin = analysis_->sizing().pins[std::size_t(index)];
    if (!pin.pin) return;  // no pin data: the joint's load only
    QStringList figures;
    const auto figure = [&](const QString& what, const std::optional<double>& u, const QString& value) {
        figures << (u ? tr("%1 %2 of the allowable (%3)").arg(what, formatUtilisation(*u), value)
                      : tr("%1 %2").arg(what, value));
    };
    figure(tr("pin shear"), pin.shearUtilisation, formatQuantity(pin.shearStress.value / 1e6, "MPa"));
    if (pin.bearing) {
        figure(tr("bearing pressure"), pin.pressureUtilisation, formatQuantity(pin.pressure.value / 1e6, "MPa"));
        figure(tr("p·v"), pin.pvUtilisation, formatQuantity(pin.pv.value / 1e6, "MPa·m/s"));
    }
    for (const auto& n : pin.notes) figures << QString::fromStdString(n);
    setUtilisation(row, pinUtilisation(analysis_->result(), analysis_->sizing(), index));
    row.utilisationTip = figures.join('\n');
}

void PeakTable::addRowItems(const Row& r)
{
    const int row = rowCount();
    insertRow(row);
    auto* first = new QTableWidgetItem(r.part);
    first->setData(kStepRole, r.step);
    first->setToolTip(r.step >= 0 ? tr("Click to go to this peak") : QString());
    setItem(row, kPartColumn, first);
    auto* use = new QTableWidgetItem(r.utilisationText);
    use->setToolTip(r.utilisationTip);
    if (r.utilisation) shadeByUtilisation(*use, *r.utilisation);
    setItem(row, kUtilisationColumn, use);
    auto* peakItem = new QTableWidgetItem(r.peak);
    peakItem->setToolTip(r.peakTip);
    setItem(row, kPeakColumn, peakItem);
    setItem(row, kWhereColumn, new QTableWidgetItem(r.where));
    for (int c = 0; c < r.cells.size(); ++c) setItem(row, kWhereColumn + 1 + c, new QTableWidgetItem(r.cells[c]));
    if (!r.larger.isEmpty()) {
        auto* larger = new QTableWidgetItem(r.larger);
        larger->setToolTip(r.largerTip);
        setItem(row, kLargerColumn, larger);
    }
}

}  // namespace clevis::ui
