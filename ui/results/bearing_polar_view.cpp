#include "ui/results/bearing_polar_view.h"

#include "core/results/cylinder_ends.h"
#include "render/palette.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/in_sight.h"
#include "ui/shell/display_units.h"

#include <QComboBox>
#include <QEvent>
#include <QFontInfo>
#include <QLabel>
#include <QPainter>
#include <QScrollArea>
#include <QVBoxLayout>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr double kPlotSide = 312;  // the plot's own side, page units (bearing_polar_diagram.cpp)
constexpr double kPlotLabel = 9;   // its labels' size there
constexpr double kLabelShare = 0.85;
constexpr double kRoomyPlot = 300;  // pixels: a smaller plot gets the compact labelling  // the labels against the
                                    // window's font: a little smaller, as on a chart

}  // namespace

BearingPolarView::BearingPolarView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent)
    , doc_(doc)
    , analysis_(analysis)
    , frame_(new QComboBox(this))
    , drawing_(new QWidget(this))
    , notes_(new QLabel(this))
    , notesArea_(new QScrollArea(this))
    , split_(new QBoxLayout(QBoxLayout::LeftToRight))
{
    setObjectName("bearingPolarView");
    sight_ = new SightWatch(this, [this] {
        workOut();
        return true;
    });
    frame_->setToolTip(tr("Whose frame the load is seen in: either body of the joint"));
    frame_->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
    frame_->setMinimumContentsLength(12);
    drawing_->setMinimumSize(80, 80);
    drawing_->installEventFilter(this);
    notes_->setWordWrap(true);
    notes_->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    notes_->setTextInteractionFlags(Qt::TextSelectableByMouse);
    auto* scroll = notesArea_;
    scroll->setWidget(notes_);
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);
    scroll->setMinimumSize(100, 40);  // small: the panel must fit a laptop screen beside the others
    split_->setContentsMargins(0, 0, 0, 0);
    split_->addWidget(drawing_, 3);
    split_->addWidget(scroll, 2);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(2, 2, 2, 2);
    layout->setSpacing(2);
    layout->addWidget(frame_);
    layout->addLayout(split_, 1);
    connect(doc_, &MechanismDocument::selectionChanged, this, &BearingPolarView::refresh);
    connect(doc_, &MechanismDocument::documentReset, this, &BearingPolarView::refresh);
    connect(analysis_, &AnalysisState::resultChanged, this, &BearingPolarView::refresh);
    connect(analysis_, &AnalysisState::currentStepChanged, this, &BearingPolarView::refresh);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &BearingPolarView::refresh);
    connect(frame_, &QComboBox::currentIndexChanged, this, &BearingPolarView::refresh);
    refresh();
}

// The choices `items` for the part `name`; the choice is kept while the
// same part stays selected (scrubbing, units, a re-solve).
void BearingPolarView::fillFrameChoice(const QString& name, const QStringList& items)
{
    QStringList shown;
    for (int i = 0; i < frame_->count(); ++i) shown << frame_->itemText(i);
    if (name == frameJoint_ && shown == items) return;
    const QSignalBlocker quiet(frame_);
    frame_->clear();
    frame_->addItems(items);
    frame_->setCurrentIndex(0);
    frameJoint_ = name;
}

// The joint's load in the frame of its second body or its first, or, for a
// cylinder, the load at its cap or rod end in the frame of the body there.
std::optional<BearingPolar> BearingPolarView::chosenPolar(const Selection& s)
{
    const auto& m = analysis_->compiled();
    const auto name = [](const std::string& text) { return QString::fromStdString(text); };
    if (s.kind == Selection::Kind::Joint) {
        for (std::size_t j = 0; j < m.joints.size(); ++j) {
            const CompiledJoint& joint = m.joints[j];
            if (name(joint.name) != s.name) continue;
            fillFrameChoice(s.name, {tr("In the frame of %1").arg(name(m.bodyName(joint.body[1]))),
                                     tr("In the frame of %1").arg(name(m.bodyName(joint.body[0])))});
            const int body = joint.body[frame_->currentIndex() == 1 ? 0 : 1];
            return bearingPolar(m, analysis_->result(), analysis_->summary(), int(j), body);
        }
        message_ = tr("%1 is not in the solved mechanism yet.").arg(s.name);
        return std::nullopt;
    }
    const std::vector<CylinderEnd> ends = cylinderEnds(m);
    for (std::size_t e = 0; e + 1 < ends.size(); e += 2) {
        if (name(m.drivers[std::size_t(ends[e].driver)].name) != s.name) continue;
        fillFrameChoice(s.name, {tr("Rod end, in the frame of %1").arg(name(m.bodyName(ends[e + 1].body))),
                                 tr("Cap end, in the frame of %1").arg(name(m.bodyName(ends[e].body)))});
        const int end = int(e) + (frame_->currentIndex() == 1 ? 0 : 1);
        return endBearingPolar(m, analysis_->result(), analysis_->summary(), end);
    }
    message_ = tr("Select a joint or a cylinder to see its bearing load over the cycle.");
    return std::nullopt;
}

void BearingPolarView::refresh()
{
    figure_.reset();
    // Behind another tab (where the default layout puts it) the diagram and
    // its notes, laid out again with the dock they sit in, would cost every
    // edit for nothing; they are worked out when the view comes into sight.
    sight_->request();
}

void BearingPolarView::workOut()
{
    figure_.reset();
    message_.clear();
    const Selection s = doc_->selection();
    std::optional<BearingPolar> polar;
    if (analysis_->nothingDrawn()) message_ = tr("Draw a mechanism: the load on each joint's bearing shows here.");
    else if (!analysis_->hasResult()) message_ = tr("No solved cycle: %1").arg(analysis_->errorText());
    else if (s.kind != Selection::Kind::Joint && s.kind != Selection::Kind::Driver)
        message_ = tr("Select a joint to see its bearing load over the cycle, in the frame of either body.");
    else polar = chosenPolar(s);
    if (polar) {
        // The plot fits the drawing area; its labels are set at the window's font size.
        const double side = std::max(1, std::min(drawing_->width(), drawing_->height()));
        const double textScale =
            std::max(1.0, kLabelShare * QFontInfo(font()).pixelSize() / (kPlotLabel * side / kPlotSide));
        figure_ = std::make_unique<BearingPolarDiagram>(
            analysis_->compiled(), analysis_->result(), std::move(*polar),
            BearingPolarOptions{renderUnits(DisplayUnits::instance()), analysis_->currentStep(), true, textScale,
                                side < kRoomyPlot});
    } else {
        const QSignalBlocker quiet(frame_);
        frame_->clear();
        frameJoint_.clear();
    }
    frame_->setEnabled(figure_ != nullptr);
    notes_->setText(notesText());
    notesArea_->setVisible(figure_ != nullptr);
    drawing_->update();
}

QString BearingPolarView::notesText() const
{
    if (!figure_) return {};
    QString html = QString("<b>%1</b>").arg(figure_->title().toHtmlEscaped());
    for (const QString& p : figure_->paragraphs()) html += QString("<p>%1</p>").arg(p.toHtmlEscaped());
    return html;
}

void BearingPolarView::resizeEvent(QResizeEvent* event)
{
    QWidget::resizeEvent(event);
    const bool wide = width() > 1.2 * height();
    split_->setDirection(wide ? QBoxLayout::LeftToRight : QBoxLayout::TopToBottom);
    // Beside the notes the square plot needs no more width than it has height; the notes take the rest.
    drawing_->setMaximumWidth(wide ? std::max(drawing_->minimumWidth(), height() - frame_->height()) : QWIDGETSIZE_MAX);
}

bool BearingPolarView::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == drawing_ && event->type() == QEvent::Resize) refresh();
    if (watched != drawing_ || event->type() != QEvent::Paint) return QWidget::eventFilter(watched, event);
    QPainter p(drawing_);
    p.fillRect(drawing_->rect(), palette::paper());
    if (!figure_) {
        p.setPen(palette().color(QPalette::WindowText));
        p.drawText(QRectF(drawing_->rect()).adjusted(8, 8, -8, -8), Qt::AlignCenter | Qt::TextWordWrap, message_);
        return true;
    }
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);
    const double side = std::min(drawing_->width(), drawing_->height());
    figure_->paint(p, QRectF(drawing_->rect().center() - QPointF(side, side) / 2, QSizeF(side, side)));
    return true;
}

}  // namespace clevis::ui
