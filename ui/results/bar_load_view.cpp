#include "ui/results/bar_load_view.h"

#include "core/results/sizing_text.h"
#include "render/render_units.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/shell/display_units.h"

#include <QEvent>
#include <QFontDatabase>
#include <QLabel>
#include <QPainter>
#include <QScrollArea>
#include <QScrollBar>
#include <QVBoxLayout>
#include <QWheelEvent>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr double kNarrowest = 300;  // the diagram's least width; only a narrower view scrolls sideways

// Paints the view's diagram at one page unit a pixel.
class DiagramCanvas final : public QWidget {
public:
    DiagramCanvas(const std::unique_ptr<BarLoadDiagram>& figure, QWidget* parent) : QWidget(parent), figure_(figure) {}

protected:
    void paintEvent(QPaintEvent*) override
    {
        if (!figure_) return;
        QPainter p(this);
        p.setRenderHint(QPainter::Antialiasing);
        p.setRenderHint(QPainter::TextAntialiasing);
        figure_->paint(p, QRectF(QPointF(0, 0), figure_->size()));
    }

private:
    const std::unique_ptr<BarLoadDiagram>& figure_;
};

}  // namespace

BarLoadView::BarLoadView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , doc_(doc)
    , analysis_(analysis)
    , scroll_(new QScrollArea(this))
    , message_(new QLabel(this))
    , stresses_(new QLabel)
    , table_(new QScrollArea)
    , sizing_(new QLabel)
{
    setObjectName("barLoadView");
    auto* page = new QWidget;
    canvas_ = new DiagramCanvas(figure_, page);
    stresses_->setWordWrap(true);
    stresses_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    stresses_->setContentsMargins(4, 4, 4, 0);
    sizing_->setWordWrap(false);  // a table in columns: it scrolls sideways rather than break its lines
    sizing_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    sizing_->setFont(QFontDatabase::systemFont(QFontDatabase::FixedFont));
    sizing_->setContentsMargins(4, 4, 4, 4);
    // Sideways on its own, so the diagram and the text above stay in view
    // while its columns are read; down, the page scrolls.
    table_->setObjectName("sizingTable");
    table_->setWidget(sizing_);
    table_->setWidgetResizable(true);
    table_->setFrameShape(QFrame::NoFrame);
    table_->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    table_->viewport()->installEventFilter(this);
    auto* pageLayout = new QVBoxLayout(page);
    pageLayout->setContentsMargins(0, 0, 0, 0);
    pageLayout->addWidget(canvas_);
    pageLayout->addWidget(stresses_);
    pageLayout->addWidget(table_);
    pageLayout->addStretch(1);
    scroll_->setObjectName("barLoadPage");
    scroll_->setWidget(page);
    scroll_->setWidgetResizable(true);
    scroll_->setFrameShape(QFrame::NoFrame);
    scroll_->viewport()->installEventFilter(this);
    message_->setAlignment(Qt::AlignCenter);
    message_->setWordWrap(true);
    message_->setMargin(12);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->addWidget(message_);
    layout->addWidget(scroll_, 1);
    connect(doc_, &MechanismDocument::selectionChanged, this, &BarLoadView::refresh);
    connect(analysis_, &AnalysisState::resultChanged, this, [this] {
        forgetCycle();
        refresh();
    });
    connect(analysis_, &AnalysisState::currentStepChanged, this, &BarLoadView::refresh);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &BarLoadView::refresh);
    forgetCycle();
    refresh();
}

BarLoadView::~BarLoadView() = default;

QString BarLoadView::message() const { return figure_ ? QString() : message_->text(); }
QString BarLoadView::sizingText() const
{
    if (!figure_) return {};
    return stresses_->text().isEmpty() ? sizing_->text() : stresses_->text() + "\n\n" + sizing_->text();
}

// A result is published only when no edit came after its request, so the
// document is the mechanism it solved: bars and sizing are found from both.
void BarLoadView::forgetCycle()
{
    cycle_.reset();
    bars_.reset();
    if (!analysis_->hasResult()) return;
    bars_ = findBars(doc_->mechanism(), analysis_->compiled());
}

QString BarLoadView::stepStresses(const BarModel& bar) const
{
    if (bar.area <= 0 || !figure_) return {};
    const BarPeaks& p = figure_->atStep().peaks;
    const auto mpa = [](double pa) { return pa == 0.0 ? tr("none") : formatQuantity(pa * 1e-6, "MPa"); };
    return tr("At this position: fibre stress σ = N/A ± M/Z up to %1 in tension and %2 in compression; mean shear "
              "V/A up to %3.")
        .arg(mpa(p.fibreTension.value), mpa(p.fibreCompression.value), mpa(std::abs(p.shear.value) / bar.area));
}

void BarLoadView::refresh()
{
    const Selection s = doc_->selection();
    QString note;
    const BarModel* bar = nullptr;
    if (analysis_->nothingDrawn()) note = tr("Draw a mechanism: the loads along each link show here.");
    else if (!analysis_->hasResult() || !bars_)
        note = analysis_->busy() || analysis_->errorText().isEmpty()
                   ? tr("Solving…")
                   : tr("No solved cycle: %1").arg(analysis_->errorText());
    else if (s.kind != Selection::Kind::Body)
        note = tr("Select a link to see its axial force, shear force and bending moment along it.");
    else if (s.name == kGroundName) note = tr("%1 is the frame, not a link: it has no loads along it.").arg(s.name);
    else {
        const std::string name = s.name.toStdString();
        for (const auto& b : bars_->bars)
            if (b.bodyName == name) bar = &b;
        for (const auto& o : bars_->others)
            if (o.bodyName == name) note = tr("%1 is not a bar: %2.").arg(s.name, QString::fromStdString(o.reason));
        if (!bar && note.isEmpty()) note = tr("Solving…");  // renamed or added since the last result
    }
    if (!bar) {
        cycle_.reset();
        figure_.reset();
        message_->setText(note);
        message_->show();
        scroll_->hide();
        stresses_->clear();
        sizing_->clear();
        return;
    }
    if (!cycle_ || cycle_->bar.body != bar->body)
        cycle_ = barCycleLoads(analysis_->compiled(), analysis_->result(), *bar);
    layOutFigure();
    std::string cycleText;
    for (const auto& b : analysis_->sizing().bars)
        if (b.body == bar->body)
            cycleText = clevis::sizingText(analysis_->compiled(), analysis_->result(), {{b}, {}, {}});
    stresses_->setText(stepStresses(*bar));
    stresses_->setVisible(!stresses_->text().isEmpty());
    sizing_->setText(QString::fromStdString(cycleText));
    fitTable();
    message_->hide();
    scroll_->show();
}

// The figure again at the view's width and the current step and units.
void BarLoadView::layOutFigure()
{
    if (!cycle_) return;
    const double width = std::max(kNarrowest, double(scroll_->viewport()->width()));
    figure_ = std::make_unique<BarLoadDiagram>(analysis_->compiled(), analysis_->result(), *cycle_,
                                               analysis_->currentStep(), renderUnits(DisplayUnits::instance()), width);
    canvas_->setFixedSize(figure_->size().toSize());
    canvas_->update();
}

void BarLoadView::fitTable()
{
    const bool across = sizing_->sizeHint().width() > table_->viewport()->width();
    table_->setFixedHeight(sizing_->sizeHint().height() +
                           (across ? table_->horizontalScrollBar()->sizeHint().height() : 0));
}

bool BarLoadView::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == table_->viewport() && event->type() == QEvent::Resize) fitTable();
    // The table scrolls only sideways: the wheel turned down over it scrolls the page.
    if (watched == table_->viewport() && event->type() == QEvent::Wheel) {
        const QPoint turn = static_cast<QWheelEvent*>(event)->angleDelta();
        if (std::abs(turn.y()) > std::abs(turn.x()))
            return QCoreApplication::sendEvent(scroll_->verticalScrollBar(), event);
    }
    if (watched == scroll_->viewport() && event->type() == QEvent::Resize && figure_ &&
        std::abs(std::max(kNarrowest, double(scroll_->viewport()->width())) - figure_->size().width()) > 1)
        layOutFigure();
    return QWidget::eventFilter(watched, event);
}

}  // namespace clevis::ui
