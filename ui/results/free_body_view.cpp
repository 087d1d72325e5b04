#include "ui/results/free_body_view.h"

#include "render/free_body_painter.h"
#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/shell/display_units.h"

#include <QCheckBox>
#include <QLabel>
#include <QPainter>
#include <QVBoxLayout>

namespace clevis::ui {

// Paints the current diagram scaled into the widget.
class FreeBodyCanvas : public QWidget {
public:
    explicit FreeBodyCanvas(QWidget* parent) : QWidget(parent) { setMinimumSize(200, 140); }
    std::unique_ptr<FreeBodyPainter> figure;

protected:
    void paintEvent(QPaintEvent*) override
    {
        QPainter p(this);
        p.fillRect(rect(), palette::paper());
        if (!figure) return;
        p.setRenderHint(QPainter::Antialiasing);
        p.setRenderHint(QPainter::TextAntialiasing);
        figure->paint(p, QRectF(rect()).adjusted(4, 4, -4, -4));
    }
};

FreeBodyView::FreeBodyView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , doc_(doc)
    , analysis_(analysis)
    , dAlembert_(new QCheckBox(tr("Inertia loads on the body"), this))
    , message_(new QLabel(this))
    , canvas_(new FreeBodyCanvas(this))
{
    setObjectName("freeBodyView");
    dAlembert_->setToolTip(tr("d'Alembert: draw −m·a_G and −I_G·α on the body instead of a separate kinetic diagram"));
    message_->setWordWrap(true);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->addWidget(dAlembert_);
    layout->addWidget(message_);
    layout->addWidget(canvas_, 1);
    connect(doc_, &MechanismDocument::selectionChanged, this, &FreeBodyView::refresh);
    connect(analysis_, &AnalysisState::resultChanged, this, &FreeBodyView::refresh);
    connect(analysis_, &AnalysisState::currentStepChanged, this, &FreeBodyView::refresh);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &FreeBodyView::refresh);
    connect(dAlembert_, &QCheckBox::toggled, this, &FreeBodyView::refresh);
    refresh();
}

bool FreeBodyView::dAlembert() const { return dAlembert_->isChecked(); }
QString FreeBodyView::message() const { return message_->text(); }

void FreeBodyView::refresh()
{
    diagram_.reset();
    canvas_->figure.reset();
    const Selection s = doc_->selection();
    QString note;
    if (!analysis_->hasResult()) note = tr("No solved cycle: %1").arg(analysis_->errorText());
    else if (s.kind != Selection::Kind::Body) note = tr("Select a body to see its free-body diagram.");
    else {
        const auto& m = analysis_->compiled();
        const int body = findBody(m, s.name.toStdString());
        if (body < 0) note = tr("%1 is the frame: its loads are the shaking force and moment.").arg(s.name);
        else {
            diagram_ = freeBodyDiagram(m, analysis_->result(), body, analysis_->currentStep());
            canvas_->figure = std::make_unique<FreeBodyPainter>(
                m, analysis_->result(), *diagram_,
                FreeBodyPaintOptions{renderUnits(DisplayUnits::instance()), dAlembert(), false});
        }
    }
    message_->setText(note);
    message_->setVisible(!note.isEmpty());
    canvas_->update();
}

}  // namespace clevis::ui
