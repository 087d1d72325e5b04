#include "ui/canvas/canvas_view.h"

#include "core/results/posed_mechanism.h"
#include "ui/analysis/analysis_state.h"
#include "ui/canvas/hit_test.h"
#include "ui/canvas/sketch_painter.h"
#include "ui/canvas/sketch_style.h"
#include "ui/canvas/tools/select_tool.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/sketch_geometry.h"
#include "ui/shell/display_units.h"

#include <QKeyEvent>
#include <QMouseEvent>
#include <QPainter>
#include <QWheelEvent>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

// A selected part's halo beyond its outline: half its pen (8 px wider than the
// part's stroke, PaintContext::haloPen) and antialiasing, with room to spare.
constexpr double kHaloReach = 12.0;

// Every point the drawing uses, for fitting the view around it.
std::vector<Vec2> drawnPoints(const Mechanism& m)
{
    std::vector<Vec2> pts;
    for (const auto& j : m.joints) pts.push_back(j.at);
    for (const auto& d : m.drivers)
        for (const auto& e : d.ends)
            if (e) pts.push_back(e->at);
    for (const auto& l : m.loads) pts.push_back(loadAnchor(m, l));
    for (const auto& b : m.bodies)
        for (const auto& pm : b.pointMasses) pts.push_back(pm.at);
    return pts;
}

// Every point the mechanism reaches over the solved cycle.
std::vector<Vec2> pointsOverCycle(const Mechanism& m, const AnalysisState& analysis)
{
    std::vector<Vec2> pts = drawnPoints(m);
    if (!analysis.hasResult()) return pts;
    for (const StepResult& step : analysis.result().steps) {
        const std::vector<Vec2> posed = drawnPoints(posedMechanism(m, analysis.compiled(), step));
        pts.insert(pts.end(), posed.begin(), posed.end());
    }
    return pts;
}

}  // namespace

CanvasView::CanvasView(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QWidget(parent), doc_(doc), analysis_(analysis), tool_(std::make_unique<SelectTool>(*this))
{
    setObjectName(QStringLiteral("canvas"));
    setMouseTracking(true);
    setFocusPolicy(Qt::StrongFocus);
    setAcceptDrops(false);  // files dropped here go to the main window
    connect(doc_, &MechanismDocument::mechanismChanged, this, qOverload<>(&QWidget::update));
    connect(doc_, &MechanismDocument::selectionChanged, this, [this] {
        // Only the halos of the part that was selected and of the one that is
        // change: a click on a large machine need not draw all of it again.
        update(haloArea(haloed_).united(haloArea(doc_->selection())));
        haloed_ = doc_->selection();
    });
    connect(doc_, &MechanismDocument::documentReset, this, [this] {
        fitOnResult_ = true;
        fitAround(drawnPoints(doc_->mechanism()));  // the result on hand is the previous file's
    });
    connect(analysis_, &AnalysisState::resultChanged, this, [this] {
        if (fitOnResult_ && analysis_->hasResult()) {
            fitOnResult_ = false;
            fitToView();
        }
        if (drawsFromResult()) update();
    });
    connect(analysis_, &AnalysisState::currentStepChanged, this, qOverload<>(&QWidget::update));
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, [this] {
        labels_.reset();  // their words carry units
        update();
    });
}

CanvasView::~CanvasView() = default;

void CanvasView::setTool(std::unique_ptr<Tool> tool)
{
    tool_ = std::move(tool);
    setCursor(dynamic_cast<SelectTool*>(tool_.get()) ? Qt::ArrowCursor : Qt::CrossCursor);
    announce();
    update();
}

// Away from the start of the cycle the mechanism is shown where the scrubber
// has it; nothing when it is at the drawn pose or there is no result.
std::optional<Mechanism> CanvasView::scrubbedPose() const
{
    if (!analysis_->hasResult() || analysis_->currentStep() == 0) return std::nullopt;
    return posedMechanism(doc_->mechanism(), analysis_->compiled(),
                          analysis_->result().steps[analysis_->currentStep()]);
}

// At the drawn pose the canvas takes from a result only the parts it
// blames; a drag brings a result at every move, most often blaming the same
// parts, and repainting then would draw the same picture a second time.
bool CanvasView::drawsFromResult() const
{
    return analysis_->currentStep() != 0 || analysis_->offendingItems() != paintedProblems_;
}

// Where a selected part's halo can reach on screen: round its outline or
// pin, by the bar's half width, the halo's and a pixel of antialiasing. The
// whole canvas for the parts drawn without one outline (drivers, loads).
QRect CanvasView::haloArea(const Selection& s) const
{
    if (s.kind == Selection::Kind::None) return {};
    const std::optional<Mechanism> posed = scrubbedPose();
    const Mechanism& m = posed ? *posed : doc_->mechanism();
    const std::string name = s.name.toStdString();
    std::vector<Vec2> pts;
    if (s.kind == Selection::Kind::Body) pts = bodyOutline(m, name);
    const int joint = s.kind == Selection::Kind::Joint ? jointIndex(m, name) : -1;
    if (joint >= 0) pts.push_back(m.joints[std::size_t(joint)].at);
    if (pts.empty()) return rect();
    QPointF lo = view_.toScreen(pts[0]), hi = lo;
    for (const Vec2& p : pts) {
        const QPointF at = view_.toScreen(p);
        lo = QPointF(std::min(lo.x(), at.x()), std::min(lo.y(), at.y()));
        hi = QPointF(std::max(hi.x(), at.x()), std::max(hi.y(), at.y()));
    }
    const double reach = style::kBarWidth / 2 + kHaloReach;
    return QRectF(lo, hi).adjusted(-reach, -reach, reach, reach).toAlignedRect();
}

void CanvasView::announce() { emit hintChanged(tool_->hint()); }

void CanvasView::tell(const QString& message)
{
    told_ = true;
    emit hintChanged(message);
}

void CanvasView::fitToView() { fitAround(pointsOverCycle(doc_->mechanism(), *analysis_)); }

void CanvasView::fitAround(const std::vector<Vec2>& pts)
{
    if (pts.empty()) {
        view_.fit({-0.05, -0.05}, {0.25, 0.15}, rect());
    } else {
        Vec2 lo = pts[0], hi = pts[0];
        for (const auto& p : pts) lo = lo.cwiseMin(p), hi = hi.cwiseMax(p);
        view_.fit(lo, hi, rect());
    }
    fitPending_ = width() < 50;
    update();
}

void CanvasView::zoomBy(double factor)
{
    view_.zoomAt(rect().center(), factor);
    update();
}

Pointer CanvasView::pointer(const QPointF& pos, Qt::KeyboardModifiers mods) const
{
    const bool free = mods & Qt::AltModifier;  // Alt: place exactly under the pointer
    return {pos, snap(doc_->mechanism(), view_, pos, free ? std::nullopt : tool_->strokeStart(), !free), mods};
}

void CanvasView::paintEvent(QPaintEvent*)
{
    QPainter p(this);
    p.drawPixmap(0, 0, grid());
    p.setRenderHint(QPainter::Antialiasing);
    paintGridScale(p, view_, rect());
    const std::optional<Mechanism> posed = scrubbedPose();
    const Mechanism& shown = posed ? *posed : doc_->mechanism();
    bool placed = false;
    LabelPlacer& labels = labelsFor(shown, placed);
    paintedProblems_ = analysis_->offendingItems();
    PaintContext c{p, view_, shown, doc_->selection(), paintedProblems_, labels};
    c.labelsPlaced = placed;
    c.shapes = &bodyShapes_;
    paintSketch(c);
    tool_->paintPreview(p);
}

// The grid's lines change only with the view (pan, zoom, size), not with an
// edit or a new result; drawn antialiased, they were half the canvas's
// paint, so they are kept as a picture until the view changes.
const QPixmap& CanvasView::grid()
{
    const qreal ratio = devicePixelRatioF();
    if (grid_.isNull() || gridView_ != view_ || grid_.deviceIndependentSize() != QSizeF(size()) ||
        grid_.devicePixelRatio() != ratio) {
        grid_ = QPixmap(size() * ratio);
        grid_.setDevicePixelRatio(ratio);
        QPainter p(&grid_);
        p.setRenderHint(QPainter::Antialiasing);
        paintGrid(p, view_, rect());
        gridView_ = view_;
    }
    return grid_;
}

// A label's place depends only on the drawing, the view, the canvas's size
// and font; placing them all was most of a paint at a large machine. A paint for
// a selection, a hover or a drawing tool's preview leaves them all alone and
// paints the labels where they already are; `placed` says so.
LabelPlacer& CanvasView::labelsFor(const Mechanism& shown, bool& placed)
{
    placed =
        labels_ && labelledView_ == view_ && labelledSize_ == size() && labelledFont_ == font() && labelled_ == shown;
    if (!placed) {
        labels_.emplace(rect(), labelFont(font()));
        labelled_ = shown;
        labelledView_ = view_;
        labelledSize_ = size();
        labelledFont_ = font();
    }
    return *labels_;
}

void CanvasView::mousePressEvent(QMouseEvent* e)
{
    setFocus();
    if (e->button() == Qt::MiddleButton || e->button() == Qt::RightButton) {
        panFrom_ = e->position();
        setCursor(Qt::ClosedHandCursor);
        return;
    }
    if (e->button() != Qt::LeftButton) return;
    told_ = false;
    if (const std::optional<Mechanism> posed = scrubbedPose()) {
        // Selecting picks what is drawn and keeps the position, so the free-body
        // diagram shows the part there; editing happens at the drawn pose.
        if (dynamic_cast<SelectTool*>(tool_.get())) {
            doc_->setSelection(partAt(*posed, view_, e->position()));
            tell(tr("Picked where it is now; pins are moved at the start of the cycle."));
            return;
        }
        analysis_->setCurrentStep(0);  // the document's coordinates are those of the drawn pose
        tell(tr("Back at the drawn pose (start of the cycle) to edit."));
    }
    tool_->press(pointer(e->position(), e->modifiers()));
    if (!told_) announce();  // a note about this click stays until the next one
}

void CanvasView::mouseMoveEvent(QMouseEvent* e)
{
    if (panFrom_) {
        view_.panBy(e->position() - *panFrom_);
        panFrom_ = e->position();
        update();
        return;
    }
    const Pointer at = pointer(e->position(), e->modifiers());
    emit pointerMoved(at.snap);
    tool_->move(at);
}

void CanvasView::mouseReleaseEvent(QMouseEvent* e)
{
    if (panFrom_) {
        panFrom_.reset();
        setCursor(dynamic_cast<SelectTool*>(tool_.get()) ? Qt::ArrowCursor : Qt::CrossCursor);
        return;
    }
    if (e->button() == Qt::LeftButton) tool_->release(pointer(e->position(), e->modifiers()));
}

void CanvasView::mouseDoubleClickEvent(QMouseEvent* e)
{
    if (e->button() != Qt::LeftButton) return;
    tool_->finish();
    announce();
}

void CanvasView::wheelEvent(QWheelEvent* e)
{
    // One notch (120 units) zooms by a fifth; touchpads send smaller steps.
    const double factor = std::pow(1.2, e->angleDelta().y() / 120.0);
    view_.zoomAt(e->position(), factor);
    update();
}

void CanvasView::keyPressEvent(QKeyEvent* e)
{
    if (e->key() == Qt::Key_Escape) {
        if (!tool_->cancel()) emit toolDismissed();
        announce();
        return;
    }
    if (e->key() == Qt::Key_Return || e->key() == Qt::Key_Enter) {
        told_ = false;
        tool_->finish();
        if (!told_) announce();
        return;
    }
    if (tool_->type(e->key(), e->text())) return;
    QWidget::keyPressEvent(e);
}

void CanvasView::leaveEvent(QEvent*) { emit pointerLeft(); }

// Backspace corrects a length being typed instead of deleting the selected part.
bool CanvasView::event(QEvent* e)
{
    if (e->type() == QEvent::ShortcutOverride && tool_->typing() &&
        static_cast<QKeyEvent*>(e)->key() == Qt::Key_Backspace) {
        e->accept();
        return true;
    }
    return QWidget::event(e);
}

// Tab moves between the fields of a length being typed, not to the next widget.
bool CanvasView::focusNextPrevChild(bool next)
{
    return tool_->type(next ? Qt::Key_Tab : Qt::Key_Backtab, {}) || QWidget::focusNextPrevChild(next);
}

void CanvasView::resizeEvent(QResizeEvent*)
{
    if (fitPending_) fitToView();
}

}  // namespace clevis::ui
