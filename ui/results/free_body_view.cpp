#include "ui/results/free_body_view.h"

#include "render/free_body_painter.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/free_body_canvas.h"
#include "ui/shell/display_units.h"

#include <QCheckBox>
#include <QHBoxLayout>
#include <QToolButton>
#include <QVBoxLayout>

namespace clevis::ui {
namespace {

QToolButton* toolButton(const QString& text, const QString& tip, QWidget* parent)
{
    auto* b = new QToolButton(parent);
    b->setText(text);
    b->setToolTip(tip);
    b->setAutoRaise(true);
    return b;
}

}  // namespace

FreeBodyView::FreeBodyView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , doc_(doc)
    , analysis_(analysis)
    , dAlembert_(new QCheckBox(tr("Inertia loads on the body"), this))
    , zoomOut_(toolButton(QStringLiteral("−"), tr("Smaller (−)"), this))
    , zoomIn_(toolButton(QStringLiteral("+"), tr("Larger (+)"), this))
    , fit_(toolButton(tr("Fit"), tr("The whole body in view (0)"), this))
    , canvas_(new FreeBodyCanvas(this))
{
    setObjectName("freeBodyView");
    dAlembert_->setToolTip(tr("d'Alembert: draw −m·a_G and −I_G·α on the body instead of a separate kinetic diagram"));
    auto* controls = new QHBoxLayout;
    controls->setContentsMargins(0, 0, 0, 0);
    controls->addWidget(dAlembert_);
    controls->addStretch(1);
    controls->addWidget(zoomOut_);
    controls->addWidget(zoomIn_);
    controls->addWidget(fit_);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->setSpacing(2);
    layout->addLayout(controls);
    layout->addWidget(canvas_, 1);
    connect(zoomOut_, &QToolButton::clicked, canvas_, &FreeBodyCanvas::zoomOut);
    connect(zoomIn_, &QToolButton::clicked, canvas_, &FreeBodyCanvas::zoomIn);
    connect(fit_, &QToolButton::clicked, canvas_, &FreeBodyCanvas::fit);
    connect(doc_, &MechanismDocument::selectionChanged, this, &FreeBodyView::refresh);
    connect(analysis_, &AnalysisState::resultChanged, this, &FreeBodyView::refresh);
    connect(analysis_, &AnalysisState::currentStepChanged, this, &FreeBodyView::refresh);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &FreeBodyView::refresh);
    connect(dAlembert_, &QCheckBox::toggled, this, &FreeBodyView::refresh);
    refresh();
}

bool FreeBodyView::dAlembert() const { return dAlembert_->isChecked(); }
QString FreeBodyView::message() const { return canvas_->message(); }

void FreeBodyView::refresh()
{
    const int shownBody = diagram_ ? diagram_->body : -1;
    diagram_.reset();
    const Selection s = doc_->selection();
    QString note;
    if (analysis_->nothingDrawn()) note = tr("Draw a mechanism: each body's free-body diagram shows here.");
    else if (!analysis_->hasResult()) note = tr("No solved cycle: %1").arg(analysis_->errorText());
    else if (s.kind != Selection::Kind::Body) note = tr("Select a body to see its free-body diagram.");
    else {
        const auto& m = analysis_->compiled();
        const int body = findBody(m, s.name.toStdString());
        if (body < 0) note = tr("%1 is the frame: its loads are the shaking force and moment.").arg(s.name);
        else {
            diagram_ = freeBodyDiagram(m, analysis_->result(), body, analysis_->currentStep());
            canvas_->showFigure(m, analysis_->result(), *diagram_,
                                {renderUnits(DisplayUnits::instance()), dAlembert(), true}, body != shownBody);
        }
    }
    if (!diagram_) canvas_->showMessage(note);
    for (QToolButton* b : {zoomOut_, zoomIn_, fit_}) b->setEnabled(diagram_.has_value());
}

}  // namespace clevis::ui
