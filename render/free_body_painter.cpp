#include "render/free_body_painter.h"

#include "core/results/drive_units.h"
#include "render/body_outline.h"
#include "render/drawing_symbols.h"
#include "render/label_placer.h"
#include "render/palette.h"
#include "render/world_frame.h"

#include <QFontMetricsF>
#include <QPainter>

#include <algorithm>
#include <cmath>
#include <limits>

namespace clevis::ui {
namespace {

// The page's layout in page units (points). Lengths drawn to scale are
// multiplied by the zoom (`g`), text, symbols and the gaps between lines of
// text by the text scale (`t`); both are 1 on the page.
// Drawn to scale:
constexpr double kContentWidth = 960;  // both panels side by side; the equations and the table
constexpr double kBodyPanelWidth = 600, kKineticWidth = 320;
constexpr double kDrawingHeight = 374;  // a panel's drawing, between its heading and its scale bars
constexpr double kMaxArrow = 115;       // the largest force's arrow length
constexpr double kArrowRoom = 130;      // kept free around the body for arrows
// Text and symbols:
constexpr double kMargin = 20, kTitleHeight = 58;
constexpr double kHeadingBand = 16, kScaleBand = 30;
constexpr double kEquationHeight = 96, kRowHeight = 17;
constexpr double kLabelPixels = 11;
constexpr double kMinArrow = 12;   // shorter forces are still drawn this long
constexpr double kHalfWidth = 11;  // a link's drawn half width
constexpr double kPinRadius = 5;
constexpr double kCoupleRadius = 21;
constexpr double kEqualsGap = 40;       // between the panels, with the "=" in it
constexpr double kSecondScaleRow = 16;  // the scale bars' second row, in a narrow panel
constexpr double kLabelClearance = 16;  // a panel is at least its widest label and this wide

QFont font(double pixels, bool bold = false)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(std::max(1, int(std::lround(pixels))));
    f.setBold(bold);
    return f;
}

// One thing drawn on a body: a force arrow or a couple, with its label.
struct Mark {
    Vec2 at = Vec2::Zero();
    Vec2 force = Vec2::Zero();
    double couple = 0.0;
    bool isCouple = false;
    ArrowStyle style;
    QString label;
};

// `s`: the symbols' scale (line widths, arrow heads).
ArrowStyle styleFor(FreeBodyItemKind kind, double s)
{
    switch (kind) {
    case FreeBodyItemKind::JointReaction: return figureArrow(palette::ink(), 1.7 * s);
    case FreeBodyItemKind::DriverAction: return figureArrow(palette::driver(), 2.0 * s);
    case FreeBodyItemKind::Weight: return figureArrow(palette::weight(), 1.8 * s);
    case FreeBodyItemKind::Force:
    case FreeBodyItemKind::Torque: return figureArrow(palette::load(), 1.8 * s);
    case FreeBodyItemKind::Spring:
    case FreeBodyItemKind::Damper:
    case FreeBodyItemKind::TorsionSpring: return figureArrow(palette::spring(), 1.6 * s);
    }
    return figureArrow(palette::ink(), 1.6 * s);
}

ArrowStyle inertiaStyle(double s) { return figureArrow(palette::inertia(), 1.8 * s, true); }

double directionDeg(const Vec2& f) { return radToDeg(std::atan2(f.y(), f.x())); }

// "(x, y) mm" with the tiny negatives of rounding shown as zero.
QString pointText(const RenderUnits& u, const Vec2& p)
{
    const auto coord = [&](double v) {
        const double shown = v * u.lengthPerMetre;
        return QString::number(std::abs(shown) < 0.005 ? 0.0 : shown, 'f', 2);
    };
    return QString("(%1, %2) %3").arg(coord(p.x()), coord(p.y()), u.lengthSymbol);
}

QString forceText(const RenderUnits& u, const QString& name, const Vec2& f)
{
    return QString("%1: %2 ∠ %3").arg(name, u.force(f.norm()), formatDirection(directionDeg(f)));
}

QString coupleText(const RenderUnits& u, const QString& name, double c)
{
    return QString("%1: %2 %3").arg(name, u.torque(std::abs(c)), c >= 0 ? "ccw" : "cw");
}

// A couple smaller than this fraction of (largest force × body size) is the
// solver's rounding, not a load worth an arrow.
constexpr double kNegligibleCouple = 1e-9;

std::vector<Mark> marksFor(const FreeBodyItem& item, const RenderUnits& u, double coupleFloor, double s)
{
    std::vector<Mark> out;
    const ArrowStyle style = styleFor(item.kind, s);
    const QString name = QString::fromStdString(item.name);
    if (item.force.norm() > 1e-9)
        out.push_back({item.at, item.force, 0.0, false, style, forceText(u, name, item.force)});
    if (std::abs(item.couple) > coupleFloor) {
        const QString coupleName = item.kind == FreeBodyItemKind::JointReaction ? name + " moment" : name;
        out.push_back({item.at, Vec2::Zero(), item.couple, true, style, coupleText(u, coupleName, item.couple)});
    }
    return out;
}

// Every mark on the free body: the loads and, with d'Alembert, the inertia loads.
std::vector<Mark> bodyMarks(const FreeBodyDiagram& d, const RenderUnits& u, double coupleFloor, bool dAlembert,
                            double s)
{
    std::vector<Mark> marks;
    for (const auto& item : d.items)
        for (Mark& mark : marksFor(item, u, coupleFloor, s)) marks.push_back(std::move(mark));
    if (dAlembert) {
        if (d.inertiaForce().norm() > 1e-9)
            marks.push_back(
                {d.cg, -d.inertiaForce(), 0, false, inertiaStyle(s), forceText(u, "−m·a_G", -d.inertiaForce())});
        if (std::abs(d.inertiaCouple()) > coupleFloor)
            marks.push_back({d.cg, Vec2::Zero(), -d.inertiaCouple(), true, inertiaStyle(s),
                             coupleText(u, "−I_G·α", -d.inertiaCouple())});
    }
    return marks;
}

// m·a_G and I_G·α, for the kinetic diagram.
std::vector<Mark> kineticMarks(const FreeBodyDiagram& d, const RenderUnits& u, double coupleFloor, double s)
{
    std::vector<Mark> marks;
    if (d.inertiaForce().norm() > 1e-9)
        marks.push_back({d.cg, d.inertiaForce(), 0, false, inertiaStyle(s), forceText(u, "m·a_G", d.inertiaForce())});
    if (std::abs(d.inertiaCouple()) > coupleFloor)
        marks.push_back(
            {d.cg, Vec2::Zero(), d.inertiaCouple(), true, inertiaStyle(s), coupleText(u, "I_G·α", d.inertiaCouple())});
    return marks;
}

// As wide as the label placer makes the widest of these marks' labels (its padding included).
double widestLabel(const std::vector<Mark>& marks, const QFont& f)
{
    const QFontMetricsF metrics(f);
    double widest = 0;
    for (const Mark& mark : marks) widest = std::max(widest, metrics.boundingRect(mark.label).width() + 4);
    return widest;
}

std::vector<Vec2> loadPoints(const FreeBodyDiagram& d)
{
    std::vector<Vec2> at;
    for (const auto& item : d.items) at.push_back(item.at);
    return at;
}

QPointF unit(QPointF v)
{
    const double n = std::hypot(v.x(), v.y());
    return n > 0 ? v / n : QPointF(1, 0);
}

double dot(QPointF a, QPointF b) { return a.x() * b.x() + a.y() * b.y(); }

// A "nice" round number (1, 2 or 5 × 10ⁿ) not above `v`.
double niceBelow(double v)
{
    if (v <= 0) return 1;
    const double decade = std::pow(10.0, std::floor(std::log10(v)));
    for (const double f : {5.0, 2.0, 1.0})
        if (f * decade <= v) return f * decade;
    return decade;
}

// Draws the body (outline, pins, centre of mass) and its marks inside `drawing`.
class BodyPanel {
public:
    // `points`: the body's (bodyPointsAt); `extra`: further points that must show, such as where loads act;
    // `arrowRoom`: kept free round the body; `s`: the symbols' scale.
    BodyPanel(const std::vector<BodyPointOf>& points, const Vec2& cg, const std::vector<Vec2>& extra,
              const QRectF& drawing, double arrowRoom, double pagePerNewton, double s)
        : points_(points)
        , cg_(cg)
        , pagePerNewton_(pagePerNewton)
        , s_(s)
        , frame_(frameFor(points, cg, extra, drawing, arrowRoom))
    {
        std::vector<QPointF> page;
        std::vector<SlideBlock> blocks;
        for (const auto& p : points) {
            page.push_back(frame_.map(p.at));
            if (p.kind == BodyPointKind::SlideBlock)
                blocks.push_back({page.back(), unit(frame_.mapDirection(p.axis, 1))});
        }
        outline_ = bodyOutlinePath(page, kHalfWidth * s, blocks);
        centroid_ = outline_.boundingRect().center();
    }

    // Where the body is drawn in `drawing`: all its points and `extra` in view, `arrowRoom` round them.
    static WorldFrame frameFor(const std::vector<BodyPointOf>& points, const Vec2& cg, const std::vector<Vec2>& extra,
                               const QRectF& drawing, double arrowRoom)
    {
        std::vector<Vec2> fitPoints;
        for (const auto& p : points) fitPoints.push_back(p.at);
        fitPoints.push_back(cg);
        fitPoints.insert(fitPoints.end(), extra.begin(), extra.end());
        return WorldFrame::fit(fitPoints, drawing, arrowRoom);
    }

    const WorldFrame& frame() const { return frame_; }

    void paintBody(QPainter& p) const
    {
        p.save();
        p.setPen(QPen(palette::link(), 1.6 * s_));
        p.setBrush(palette::linkFill());
        p.drawPath(outline_);
        QPen centre(palette::groundHatch(), 0.8 * s_, Qt::DashDotLine);
        p.setPen(centre);
        for (const auto& guide : points_) {
            if (guide.kind != BodyPointKind::SlideGuide) continue;
            const QPointF c = frame_.map(guide.sliding), u = unit(frame_.mapDirection(guide.axis, 1));
            p.drawLine(c - u * 4 * kHalfWidth * s_, c + u * 4 * kHalfWidth * s_);
        }
        p.restore();
        for (const auto& pin : points_)
            if (pin.kind == BodyPointKind::Pin || pin.kind == BodyPointKind::CylinderEnd)
                drawPin(p, frame_.map(pin.at), kPinRadius * s_, palette::ink(), palette::paper());
        drawCentreOfMass(p, frame_.map(cg_), 5.5 * s_, palette::ink(), palette::paper(), s_);
    }

    // Draws each mark and registers its label with the placer.
    void paintMarks(QPainter& p, const std::vector<Mark>& marks, LabelPlacer& labels) const
    {
        labels.addObstacle(outline_);
        std::vector<int> couplesAt(marks.size(), 0);
        for (std::size_t i = 0; i < marks.size(); ++i) {
            const Mark& mark = marks[i];
            const QPointF at = frame_.map(mark.at);
            if (mark.isCouple) {
                int stacked = 0;  // couples at one point get growing radii
                for (std::size_t k = 0; k < i; ++k)
                    stacked += marks[k].isCouple && (marks[k].at - mark.at).norm() < 1e-9;
                const double radius = (kCoupleRadius + 9 * stacked) * s_;
                drawCoupleArrow(p, at, radius, mark.couple > 0, mark.style);
                labels.addObstacle(QRectF(at.x() - radius, at.y() - radius, 2 * radius, 2 * radius));
                labels.add(mark.label, at + QPointF(radius * 0.75, -radius * 0.75), QPointF(0.7, -0.7));
                continue;
            }
            const auto [tail, head] = arrowEnds(at, mark.force);
            drawArrow(p, tail, head, mark.style);
            labels.addObstacle(QLineF(tail, head));
            const bool pointsAway = dot(head - tail, at - tail) < dot(head - tail, head - at);
            const QPointF free = pointsAway ? head : tail;
            labels.add(mark.label, free, unit(pointsAway ? head - tail : tail - head));
        }
    }

    // Tail at the point when the force points away from the body, head at it
    // otherwise, so arrows stay outside the outline; clear of the pin hole.
    std::pair<QPointF, QPointF> arrowEnds(QPointF at, const Vec2& force) const
    {
        QPointF v = frame_.mapDirection(force, pagePerNewton_);
        const double length = std::hypot(v.x(), v.y());
        if (length < kMinArrow * s_) v = unit(v) * kMinArrow * s_;
        const QPointF u = unit(v), gap = u * (kPinRadius + 2) * s_;
        const QPointF outward = at - centroid_;
        const bool away = dot(u, outward) >= 0 || std::hypot(outward.x(), outward.y()) < 1;
        if (away) return {at + gap, at + gap + v};
        return {at - gap - v, at - gap};
    }

private:
    const std::vector<BodyPointOf>& points_;
    Vec2 cg_;
    double pagePerNewton_;
    double s_;
    WorldFrame frame_;
    QPainterPath outline_;
    QPointF centroid_;
};

QFont headingFont(double s) { return font(12 * s, true); }

void panelHeading(QPainter& p, const QRectF& area, const QString& text, double s)
{
    p.setFont(headingFont(s));
    p.setPen(palette::ink());
    p.drawText(QPointF(area.left(), area.top() + 12 * s), text);
}

QString bodyHeading(bool dAlembert)
{
    return dAlembert ? "Free body with inertia loads (d'Alembert): every sum is zero" : "Free body";
}

const char* const kKineticHeading = "Kinetic diagram";
const char* const kNoInertia = "m·a_G = 0 and I_G·α = 0 (at rest or massless)";

// A bar `length` long from `from` with end ticks, and its caption after it.
void scaleBar(QPainter& p, QPointF from, double length, const QString& caption, double s)
{
    const QPointF to = from + QPointF(length, 0), tick(0, 4 * s);
    p.drawLine(from, to);
    p.drawLine(from - tick, from + tick);
    p.drawLine(to - tick, to + tick);
    p.drawText(to + QPointF(6 * s, 4 * s), caption);
}

}  // namespace

QString stepCaption(const CompiledMechanism& m, const CycleResult& r, int step)
{
    const StepResult& s = r.steps[step];
    QStringList parts;
    for (std::size_t d = 0; d < m.drivers.size() && d < s.drivePosition.size(); ++d)
        parts << QString::fromStdString(formatDrivePosition(m.drivers[d], s.drivePosition[d]));
    parts << QString("t = %1 s").arg(s.t, 0, 'f', 4);
    return parts.join(", ") + QString(" (step %1 of %2)").arg(step).arg(int(r.steps.size()) - 1);
}

FreeBodyPainter::FreeBodyPainter(const CompiledMechanism& m, const CycleResult& r, FreeBodyDiagram d,
                                 FreeBodyPaintOptions options)
    : mechanism_(m), result_(r), diagram_(std::move(d)), options_(std::move(options))
{
    points_ = bodyPointsAt(mechanism_, result_.steps[diagram_.step], diagram_.body);
    largest_ = diagram_.inertiaForce().norm();
    for (const auto& item : diagram_.items) largest_ = std::max(largest_, item.force.norm());
    double bodySize = 0;
    for (const auto& a : points_) bodySize = std::max(bodySize, (a.at - diagram_.cg).norm());
    coupleFloor_ = kNegligibleCouple * std::max(1.0, largest_ * std::max(bodySize, 0.01));
    measureText();
    layOut();
}

// The widths of the text that sets the panels' least widths: they follow the
// text's scale and not the zoom, so a fit measures them once.
void FreeBodyPainter::measureText()
{
    const double s = options_.textScale;
    const QFont labels = font(t(kLabelPixels));
    const QFontMetricsF heading(headingFont(s));
    text_.body =
        std::max(widestLabel(bodyMarks(diagram_, options_.units, coupleFloor_, options_.dAlembert, s), labels) +
                     t(kLabelClearance),
                 heading.horizontalAdvance(bodyHeading(options_.dAlembert)));
    const std::vector<Mark> kinetic = kineticMarks(diagram_, options_.units, coupleFloor_, s);
    text_.kinetic =
        std::max({widestLabel(kinetic, labels) + t(kLabelClearance), heading.horizontalAdvance(kKineticHeading),
                  kinetic.empty() ? QFontMetricsF(labels).horizontalAdvance(kNoInertia) : 0.0});
    text_.scaleFont = font(t(kSmallestText));
    text_.forceValue = niceBelow(largest_ * 0.6);
    text_.forceCaption = "force scale " + options_.units.force(text_.forceValue);
    text_.forceCaptionWidth = QFontMetricsF(text_.scaleFont).horizontalAdvance(text_.forceCaption);
}

double FreeBodyPainter::margin() const { return t(kMargin); }

// The halves or the text, whichever is wider.
double FreeBodyPainter::contentWidth() const
{
    return std::max(t(kContentWidth), std::max(bodyHalf().right(), kineticHalf().right()) - margin());
}

double FreeBodyPainter::scaleBand() const { return t(kScaleBand + (scaleBars_.twoRows ? kSecondScaleRow : 0)); }

QRectF FreeBodyPainter::drawingOf(const QRectF& panel) const
{
    return panel.adjusted(0, t(kHeadingBand), 0, -scaleBand());
}

// Force arrows to scale, the body drawn to scale: a bar for each under the
// free body, in one row where the panel is wide enough for it.
FreeBodyPainter::ScaleBars FreeBodyPainter::scaleBars(double panelWidth) const
{
    const auto barWidth = [&](double length, double captionWidth) { return length + t(6) + captionWidth; };
    ScaleBars b;
    double next = t(260);  // where the drawing's bar starts, clear of the force bar
    if (pagePerNewton_ > 0) {
        b.forceLength = text_.forceValue * pagePerNewton_;
        b.forceCaption = text_.forceCaption;
        next = std::max(next, barWidth(b.forceLength, text_.forceCaptionWidth) + t(20));
    }
    const QRectF drawing(0, 0, panelWidth, g(kDrawingHeight));
    const double worldScale =
        BodyPanel::frameFor(points_, diagram_.cg, loadPoints(diagram_), drawing, g(kArrowRoom)).scale;
    const double metres = niceBelow(t(90) / worldScale);
    b.drawingLength = metres * worldScale;
    b.drawingCaption = "drawing scale " + options_.units.length(metres);
    const double drawingCaptionWidth = QFontMetricsF(text_.scaleFont).horizontalAdvance(b.drawingCaption);
    b.forceFrom = {0, -t(14)};
    b.drawingFrom = {next, -t(14)};
    b.width = next + barWidth(b.drawingLength, drawingCaptionWidth);
    if (b.width > panelWidth) {
        b.twoRows = true;
        b.forceFrom = {0, -t(14 + kSecondScaleRow)};
        b.drawingFrom = {0, -t(14)};
        b.width = std::max(b.forceLength > 0 ? barWidth(b.forceLength, text_.forceCaptionWidth) : 0.0,
                           barWidth(b.drawingLength, drawingCaptionWidth));
    }
    return b;
}

// The panels: drawn to scale, and at least as wide as their headings and
// their widest labels at the text's size.
void FreeBodyPainter::layOut()
{
    pagePerNewton_ = largest_ > 0 ? g(kMaxArrow) / largest_ : 0.0;
    const double top = margin() + t(kTitleHeight);
    const double bodyWidth = std::max(g(options_.dAlembert ? kContentWidth : kBodyPanelWidth), text_.body);
    scaleBars_ = scaleBars(bodyWidth);
    bodyPanel_ = QRectF(margin(), top, bodyWidth, t(kHeadingBand) + g(kDrawingHeight) + scaleBand());
    kineticPanel_ = QRectF();
    if (options_.dAlembert) return;
    const double kineticWidth = text_.kinetic;
    if (options_.kinetic == KineticPlacement::Beside)
        kineticPanel_ = QRectF(bodyPanel_.right() + t(kEqualsGap), top, std::max(g(kKineticWidth), kineticWidth),
                               bodyPanel_.height());
    else
        kineticPanel_ = QRectF(margin(), bodyPanel_.bottom() + t(kEqualsGap), std::max(bodyWidth, kineticWidth),
                               bodyPanel_.height());
}

QRectF FreeBodyPainter::bodyPanel() const { return bodyPanel_; }

QRectF FreeBodyPainter::bodyDrawing() const { return drawingOf(bodyPanel_); }

QRectF FreeBodyPainter::bodyHalf() const
{
    return {bodyPanel_.topLeft(), QSizeF(std::max(bodyPanel_.width(), scaleBars_.width), bodyPanel_.height())};
}

QRectF FreeBodyPainter::kineticHalf() const { return kineticPanel_; }

QSizeF FreeBodyPainter::size() const
{
    const int rows = options_.table ? int(diagram_.items.size()) + (options_.dAlembert ? 2 : 0) + 1 : 0;
    const double below = std::max(bodyPanel_.bottom(), kineticPanel_.bottom());
    return {contentWidth() + 2 * margin(), below + t(kEquationHeight + rows * kRowHeight) + 2 * margin()};
}

FreeBodyPaintOptions FreeBodyPainter::fitted(const CompiledMechanism& m, const CycleResult& r, const FreeBodyDiagram& d,
                                             FreeBodyPaintOptions options, QSizeF room, double minZoom, double maxZoom)
{
    // How far the halves at `zoom`, with the gap round them, overfill the room
    // across and down: one painter, its text measured once, laid out again at
    // each zoom tried.
    const double gap = fittedGap(options.textScale);
    FreeBodyPainter f(m, r, d, options);
    const auto overfill = [&](double zoom) {
        options.zoom = zoom;
        f.options_ = options;
        f.layOut();
        const QSizeF halves = f.bodyHalf().united(f.kineticHalf()).size() + 2 * QSizeF(gap, gap);
        return QSizeF(halves.width() / room.width(), halves.height() / room.height());
    };
    const auto fits = [](QSizeF over) { return over.width() <= 1 && over.height() <= 1; };
    const double readable = std::clamp(FreeBodyPainter::kReadableZoom * options.textScale, minZoom, maxZoom);
    FreeBodyPaintOptions best = options;
    best.zoom = readable;
    double bestZoom = 0;
    // Where nothing fits at the readable zoom: the placement that fits across, else the one overfilling least.
    std::pair<bool, double> leastOverfill{true, std::numeric_limits<double>::infinity()};
    for (const KineticPlacement placement : {KineticPlacement::Beside, KineticPlacement::Below}) {
        if (options.dAlembert && placement == KineticPlacement::Below) continue;  // no kinetic diagram
        options.kinetic = placement;
        const QSizeF smallest = overfill(readable);
        if (!fits(smallest)) {
            const std::pair<bool, double> over{smallest.width() > 1, std::max(smallest.width(), smallest.height())};
            if (bestZoom == 0 && over < leastOverfill) {
                best = options;
                best.zoom = readable;
                leastOverfill = over;
            }
            continue;
        }
        // The halves grow with the zoom: the largest that fits, by bisection on its logarithm.
        double low = std::log(readable), high = std::log(maxZoom);
        if (fits(overfill(maxZoom))) low = high;
        while (high - low > 1e-4) {
            const double mid = 0.5 * (low + high);
            (fits(overfill(std::exp(mid))) ? low : high) = mid;
        }
        const double zoom = std::exp(low);
        if (zoom > bestZoom * (1 + 1e-3)) {  // under the free body only where that shows the drawing larger
            best = options;
            best.zoom = zoom;
            bestZoom = zoom;
        }
    }
    return best;
}

void FreeBodyPainter::paint(QPainter& p, const QRectF& target) const
{
    const double s = options_.textScale;
    p.save();
    fitFigure(p, size(), target);
    p.fillRect(QRectF(QPointF(0, 0), size()), palette::paper());
    paintTitle(p);

    panelHeading(p, bodyPanel_, bodyHeading(options_.dAlembert), s);
    const QRectF drawing = bodyDrawing();
    BodyPanel body(points_, diagram_.cg, loadPoints(diagram_), drawing, g(kArrowRoom), pagePerNewton_, s);
    LabelPlacer labels(drawing.adjusted(0, 0, 0, -t(4)), font(t(kLabelPixels)));
    body.paintBody(p);
    body.paintMarks(p, bodyMarks(diagram_, options_.units, coupleFloor_, options_.dAlembert, s), labels);
    labels.paint(p, palette::ink(), palette::paper());
    if (!options_.dAlembert) {
        paintEquals(p);
        paintKinetic(p);
    }
    paintScaleBars(p);
    const double below = std::max(bodyPanel_.bottom(), kineticPanel_.bottom());
    paintEquations(p, below + t(6));
    if (options_.table) paintTable(p, below + t(kEquationHeight));
    p.restore();
}

// "=" between the free body and the kinetic diagram; turned a quarter when the kinetic diagram is under it.
void FreeBodyPainter::paintEquals(QPainter& p) const
{
    p.setFont(font(t(28)));
    p.setPen(palette::ink());
    if (options_.kinetic == KineticPlacement::Beside) {
        p.drawText(QRectF(bodyPanel_.right(), kineticPanel_.top(), kineticPanel_.left() - bodyPanel_.right(),
                          kineticPanel_.height()),
                   Qt::AlignCenter, "=");
        return;
    }
    const QRectF gap(bodyPanel_.left(), bodyPanel_.bottom(), bodyPanel_.width(),
                     kineticPanel_.top() - bodyPanel_.bottom());
    p.save();
    p.translate(gap.center());
    p.rotate(90);
    p.drawText(QRectF(-gap.height() / 2, -gap.width() / 2, gap.height(), gap.width()), Qt::AlignCenter, "=");
    p.restore();
}

void FreeBodyPainter::paintKinetic(QPainter& p) const
{
    const double s = options_.textScale;
    const QRectF drawing = drawingOf(kineticPanel_);
    panelHeading(p, kineticPanel_, kKineticHeading, s);
    // Under the free body it is fitted as the free body is (the same points in
    // a drawing of the same size), so the two bodies line up at one scale.
    const bool under = options_.kinetic == KineticPlacement::Below;
    const BodyPanel kinetic(points_, diagram_.cg, under ? loadPoints(diagram_) : std::vector<Vec2>{},
                            under ? QRectF(drawing.topLeft(), bodyDrawing().size()) : drawing, g(kArrowRoom),
                            pagePerNewton_, s);
    const std::vector<Mark> marks = kineticMarks(diagram_, options_.units, coupleFloor_, s);
    LabelPlacer labels(drawing.adjusted(0, 0, 0, -t(4)), font(t(kLabelPixels)));
    p.save();
    p.setOpacity(0.55);  // the kinetic body is a reference shape, not a load carrier
    kinetic.paintBody(p);
    p.restore();
    kinetic.paintMarks(p, marks, labels);
    labels.paint(p, palette::ink(), palette::paper());
    if (marks.empty()) {
        p.setFont(font(t(kLabelPixels)));
        p.drawText(QPointF(kineticPanel_.left(), drawing.bottom() - t(10)), kNoInertia);
    }
}

void FreeBodyPainter::paintScaleBars(QPainter& p) const
{
    const double s = options_.textScale;
    const QPointF corner = bodyPanel_.bottomLeft();
    p.setFont(font(t(kSmallestText)));
    p.setPen(QPen(palette::ink(), 1.2 * s));
    if (scaleBars_.forceLength > 0)
        scaleBar(p, corner + scaleBars_.forceFrom, scaleBars_.forceLength, scaleBars_.forceCaption, s);
    scaleBar(p, corner + scaleBars_.drawingFrom, scaleBars_.drawingLength, scaleBars_.drawingCaption, s);
}

void FreeBodyPainter::paintTitle(QPainter& p) const
{
    const double m = margin();
    p.setPen(palette::ink());
    p.setFont(font(t(17), true));
    p.drawText(QPointF(m, m + t(14)), "Free-body diagram: " + QString::fromStdString(diagram_.bodyName));
    p.setFont(font(t(11)));
    p.drawText(QPointF(m, m + t(34)), stepCaption(mechanism_, result_, diagram_.step));
    const QString mass = QString("m = %1, I_G = %2, G at %3")
                             .arg(formatQuantity(diagram_.mass, "kg"), formatQuantity(diagram_.inertia, "kg·m²"),
                                  pointText(options_.units, diagram_.cg));
    p.drawText(QPointF(m, m + t(50)), mass);
    if (result_.steps[diagram_.step].nearSingular) {
        p.setPen(palette::problem());
        const double after = m + QFontMetricsF(p.font()).horizontalAdvance(mass) + t(20);
        p.drawText(QPointF(std::max(m + t(480), after), m + t(50)),
                   "Near a singular position: these loads are unreliable.");
    }
}

void FreeBodyPainter::paintEquations(QPainter& p, double top) const
{
    const RenderUnits& u = options_.units;
    struct Row {
        QString sum, kinetic;
        const FreeBodyEquation& e;
        bool moment;
    };
    const Row rows[] = {{"ΣFx", "m·aGx", diagram_.fx, false},
                        {"ΣFy", "m·aGy", diagram_.fy, false},
                        {"ΣM_G", "I_G·α", diagram_.moment, true}};
    const double m = margin();
    p.setPen(QPen(palette::gridMajor(), options_.textScale));
    p.drawLine(QPointF(m, top), QPointF(m + contentWidth(), top));
    p.setPen(palette::ink());
    p.setFont(font(t(12), true));
    p.drawText(QPointF(m, top + t(18)), "Equations of plane motion (moments about G, counter-clockwise positive)");
    p.setFont(font(t(12)));
    double y = top + t(40);
    for (const Row& row : rows) {
        const auto value = [&](double v) { return row.moment ? u.torque(v) : u.force(v); };
        const double residual = row.e.residual * (row.moment ? u.torquePerNewtonMetre : u.forcePerNewton);
        const QString residualText =
            QString("residual = %1 %2")
                .arg(QString::number(residual, 'g', 2), row.moment ? u.torqueSymbol : u.forceSymbol);
        p.drawText(QPointF(m + t(10), y), QString("%1 = %2").arg(row.sum, value(row.e.sum)));
        p.drawText(QPointF(m + t(300), y), QString("%1 = %2").arg(row.kinetic, value(row.e.kinetic)));
        p.drawText(QPointF(m + t(600), y), residualText);
        y += t(18);
    }
}

void FreeBodyPainter::paintTable(QPainter& p, double top) const
{
    const RenderUnits& u = options_.units;
    const double m = margin();
    const double columns[] = {0, 110, 205, 300, 400, 500, 600, 680, 780};  // from the margin
    const QString headings[] = {"Load", "Kind", "From", "Fx", "Fy", "|F|", "Direction", "Couple", "Acts at (x, y)"};
    p.setFont(font(t(11), true));
    p.setPen(palette::ink());
    for (int c = 0; c < 9; ++c) p.drawText(QPointF(m + t(columns[c]), top + t(12)), headings[c]);
    p.setPen(QPen(palette::gridMajor(), options_.textScale));
    p.drawLine(QPointF(m, top + t(16)), QPointF(m + contentWidth(), top + t(16)));
    p.setFont(font(t(11)));
    p.setPen(palette::ink());
    double y = top + t(12 + kRowHeight);
    const auto row = [&](const QString& name, const QString& kind, const QString& from, const Vec2& f, double couple,
                         const Vec2& at) {
        const QString cells[] = {name,
                                 kind,
                                 from,
                                 u.force(f.x()),
                                 u.force(f.y()),
                                 u.force(f.norm()),
                                 f.norm() > 1e-9 ? formatDirection(directionDeg(f)) : QString("–"),
                                 u.torque(couple),
                                 pointText(u, at)};
        for (int c = 0; c < 9; ++c) p.drawText(QPointF(m + t(columns[c]), y), cells[c]);
        y += t(kRowHeight);
    };
    for (const auto& item : diagram_.items)
        row(QString::fromStdString(item.name), freeBodyItemKindName(item.kind), QString::fromStdString(item.otherBody),
            item.force, item.couple, item.at);
    if (options_.dAlembert) {
        row("−m·a_G", "inertia", "", -diagram_.inertiaForce(), 0.0, diagram_.cg);
        row("−I_G·α", "inertia", "", Vec2::Zero(), -diagram_.inertiaCouple(), diagram_.cg);
    }
}

}  // namespace clevis::ui
