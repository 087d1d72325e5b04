#include "ui/panels/status_line.h"

#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/panels/elided_label.h"

#include <QHBoxLayout>
#include <QLabel>

namespace clevis::ui {
namespace {

QString plural(int n, const QString& one, const QString& many)
{
    return QStringLiteral("%1 %2").arg(n).arg(n == 1 ? one : many);
}

}  // namespace

QString describeAnalysis(const AnalysisState& a)
{
    QString counts;
    if (const auto& mob = a.mobility())
        counts = QObject::tr("%1, %2. ")
                     .arg(plural(mob->mobility, QObject::tr("degree of freedom"), QObject::tr("degrees of freedom")),
                          plural(mob->drivers, QObject::tr("driver"), QObject::tr("drivers")));
    if (a.nothingDrawn())
        return QObject::tr("Nothing drawn yet: place ground pins and pins, then draw links between them.");
    if (!a.errorText().isEmpty()) return counts + QObject::tr("Does not solve: %1").arg(a.errorText());
    if (!a.hasResult()) return counts + QObject::tr("Not solved yet.");
    const CycleResult& r = a.result();
    // What the analysis warns of follows, so that a designer sees it without
    // opening a report (the line is elided; its tooltip holds the whole text).
    QString warned;
    for (const Warning& w : r.warnings) warned += QStringLiteral("  ⚠ ") + QString::fromStdString(w.message);
    if (!r.complete)
        return counts +
               QObject::tr("Solves for part of the cycle only (%1 of %2 steps).")
                   .arg(r.steps.size() - 1)
                   .arg(r.plannedSteps) +
               warned;
    return counts +
           QObject::tr("Solves over the whole cycle (%1 steps, %2 s).").arg(r.plannedSteps).arg(r.duration, 0, 'g', 4) +
           warned;
}

StatusLine::StatusLine(AnalysisState* analysis, QWidget* parent)
    : QWidget(parent), analysis_(analysis), mark_(new QLabel), state_(new ElidedLabel), hint_(new ElidedLabel)
{
    setObjectName(QStringLiteral("statusLine"));
    auto* layout = new QHBoxLayout(this);
    layout->setContentsMargins(6, 2, 6, 2);
    mark_->setFixedWidth(14);
    state_->setObjectName(QStringLiteral("analysisStatus"));
    state_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    hint_->setObjectName(QStringLiteral("toolHint"));
    hint_->setAlignment(Qt::AlignRight | Qt::AlignVCenter);
    layout->addWidget(mark_);
    layout->addWidget(state_, 3);
    layout->addWidget(hint_, 2);
    connect(analysis_, &AnalysisState::resultChanged, this, &StatusLine::refresh);
    connect(analysis_, &AnalysisState::busyChanged, this, &StatusLine::refresh);
    refresh();
}

QString StatusLine::analysisText() const { return state_->text(); }

void StatusLine::showHint(const QString& hint) { hint_->setFullText(hint); }

void StatusLine::refresh()
{
    const bool solves = analysis_->errorText().isEmpty() && analysis_->hasResult() && analysis_->result().complete;
    const QString text = describeAnalysis(*analysis_);
    state_->setFullText(analysis_->busy() ? text + tr("  (solving…)") : text);
    // The mark differs in shape as well as colour: a filled disc when it
    // solves, a ring with a bar when not, an open ring for a blank drawing.
    // A warning sign when it solves but the analysis warns of something.
    const bool blank = analysis_->nothingDrawn();
    const bool warned = solves && !analysis_->result().warnings.empty();
    const QColor c = solves && !warned ? palette::load() : blank ? palette::groundHatch() : palette::problem();
    mark_->setText(warned   ? QStringLiteral("⚠")
                   : solves ? QStringLiteral("●")
                   : blank  ? QStringLiteral("○")
                            : QStringLiteral("⊘"));
    mark_->setStyleSheet(QStringLiteral("color: %1; font-weight: bold;").arg(c.name()));
    state_->setStyleSheet(solves || blank ? QString() : QStringLiteral("color: %1;").arg(palette::problem().name()));
}

}  // namespace clevis::ui
