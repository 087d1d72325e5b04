#include "ui/results/free_body_canvas.h"

#include "render/palette.h"

#include <QFontInfo>
#include <QKeyEvent>
#include <QMouseEvent>
#include <QPainter>
#include <QWheelEvent>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

constexpr double kMinZoom = 0.1, kMaxZoom = 10.0;
constexpr double kStep = 1.25;       // one press of + or −, one notch of the wheel
constexpr double kKeptInView = 0.5;  // the share of the view the page keeps covered, at least

}  // namespace

FreeBodyCanvas::FreeBodyCanvas(QWidget* parent) : QWidget(parent)
{
    setFocusPolicy(Qt::StrongFocus);
    setMinimumSize(120, 60);
    setCursor(Qt::OpenHandCursor);
    setToolTip(tr("Wheel or + and − to zoom, drag to move, 0 to fit"));
}

double FreeBodyCanvas::textScale() const { return QFontInfo(font()).pixelSize() / FreeBodyPainter::kSmallestText; }

void FreeBodyCanvas::showFigure(const CompiledMechanism& m, const CycleResult& r, FreeBodyDiagram d,
                                FreeBodyPaintOptions options, bool refit)
{
    mechanism_ = &m;
    result_ = &r;
    message_.clear();
    options.zoom = zoom_;
    options.textScale = textScale();
    options.kinetic = kinetic_;
    figure_ = std::make_unique<FreeBodyPainter>(m, r, std::move(d), std::move(options));
    if (refit || fitted_) fit();
    update();
}

void FreeBodyCanvas::showMessage(const QString& text)
{
    figure_.reset();
    mechanism_ = nullptr;
    result_ = nullptr;
    message_ = text;
    update();
}

void FreeBodyCanvas::relayout()
{
    if (!figure_) return;
    FreeBodyPaintOptions options = figure_->options();
    options.zoom = zoom_;
    options.textScale = textScale();
    options.kinetic = kinetic_;
    figure_ = std::make_unique<FreeBodyPainter>(*mechanism_, *result_, figure_->diagram(), std::move(options));
    keepInView();
    update();
}

// The page's edges are mostly blank: half the view stays on the page, so the
// drawing is never dragged out of sight.
void FreeBodyCanvas::keepInView()
{
    const auto keep = [](double at, double page, double view) {
        const double low = std::min(0.0, kKeptInView * view - page);
        return std::clamp(at, low, std::max(low, (1 - kKeptInView) * view));
    };
    const QSizeF page = figure_->size();
    origin_ = {keep(origin_.x(), page.width(), width()), keep(origin_.y(), page.height(), height())};
}

// The drawing's top-left corner stays put when the zoom changes (the text
// above it keeps its size) and the drawing grows about it, so the point under
// `about` is kept by scaling its distance from that corner.
void FreeBodyCanvas::zoomBy(double factor, QPointF about)
{
    if (!figure_) return;
    const double zoom = std::clamp(zoom_ * factor, kMinZoom, kMaxZoom);
    const QPointF corner = origin_ + figure_->bodyDrawing().topLeft();
    origin_ = about - figure_->bodyDrawing().topLeft() - (about - corner) * (zoom / zoom_);
    zoom_ = zoom;
    fitted_ = false;
    relayout();
}

void FreeBodyCanvas::zoomIn() { zoomBy(kStep, QRectF(rect()).center()); }
void FreeBodyCanvas::zoomOut() { zoomBy(1 / kStep, QRectF(rect()).center()); }

// Shows both halves (the free body with its heading and scale bars, and the
// kinetic diagram) whole and as large as the widget allows, the kinetic
// diagram beside or under the free body as the painter finds best for the
// widget's shape; the title is above them and the equations and the table
// under them, a drag away.
void FreeBodyCanvas::fit()
{
    if (!figure_) return;
    FreeBodyPaintOptions options = figure_->options();
    options.textScale = textScale();
    options =
        FreeBodyPainter::fitted(*mechanism_, *result_, figure_->diagram(), options, QSizeF(size()), kMinZoom, kMaxZoom);
    zoom_ = options.zoom;
    kinetic_ = options.kinetic;
    fitted_ = true;
    relayout();
    // Centred across and down where the halves fit; where they do not, their
    // start shows (the free body's heading and left edge), the rest a drag away.
    const QRectF halves = figure_->bodyHalf().united(figure_->kineticHalf());
    const double margin = FreeBodyPainter::fittedGap(textScale());
    const auto place = [&](double start, double extent, double view) {
        return extent + 2 * margin <= view ? (view - extent) / 2 - start : margin - start;
    };
    origin_ = {place(halves.left(), halves.width(), width()), place(halves.top(), halves.height(), height())};
    keepInView();
}

void FreeBodyCanvas::paintEvent(QPaintEvent*)
{
    QPainter p(this);
    if (!figure_) {
        p.fillRect(rect(), palette::paper());
        p.setPen(palette().color(QPalette::WindowText));
        p.drawText(QRectF(rect()).adjusted(8, 8, -8, -8), Qt::AlignCenter | Qt::TextWordWrap, message_);
        return;
    }
    p.fillRect(rect(), palette::gridMinor());  // round the page, so its edges show when it is moved
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);
    figure_->paint(p, QRectF(origin_, figure_->size()));
}

void FreeBodyCanvas::wheelEvent(QWheelEvent* event)
{
    const double notches = event->angleDelta().y() / 120.0;
    if (!figure_ || notches == 0) return event->ignore();
    zoomBy(std::pow(kStep, notches), event->position());
    event->accept();
}

void FreeBodyCanvas::mousePressEvent(QMouseEvent* event)
{
    if (event->button() != Qt::LeftButton || !figure_) return QWidget::mousePressEvent(event);
    dragFrom_ = event->position();
    setCursor(Qt::ClosedHandCursor);
}

void FreeBodyCanvas::mouseMoveEvent(QMouseEvent* event)
{
    if (!dragFrom_) return QWidget::mouseMoveEvent(event);
    origin_ += event->position() - *dragFrom_;
    dragFrom_ = event->position();
    fitted_ = false;
    keepInView();
    update();
}

void FreeBodyCanvas::mouseReleaseEvent(QMouseEvent* event)
{
    if (!dragFrom_) return QWidget::mouseReleaseEvent(event);
    dragFrom_.reset();
    setCursor(Qt::OpenHandCursor);
}

void FreeBodyCanvas::keyPressEvent(QKeyEvent* event)
{
    switch (event->key()) {
    case Qt::Key_Plus:
    case Qt::Key_Equal: return zoomIn();
    case Qt::Key_Minus: return zoomOut();
    case Qt::Key_0: return fit();
    default: QWidget::keyPressEvent(event);
    }
}

void FreeBodyCanvas::resizeEvent(QResizeEvent*)
{
    if (fitted_) fit();
}

}  // namespace clevis::ui
