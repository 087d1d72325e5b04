#include "render/free_body_painter.h"

#include "core/results/body_points_at_step.h"
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

namespace clevis::ui {
namespace {

// The page's layout in page units (points). Lengths drawn to scale are
// multiplied by the zoom (`g`), text, symbols and the gaps between lines of
// text by the text scale (`t`); both are 1 on the page.
// Drawn to scale:
constexpr double kContentWidth = 960;  // both panels side by side
constexpr double kBodyPanelWidth = 600, kKineticOffset = 640;
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
        : points_(points), cg_(cg), pagePerNewton_(pagePerNewton), s_(s)
    {
        std::vector<Vec2> fitPoints;
        for (const auto& p : points) fitPoints.push_back(p.at);
        fitPoints.push_back(cg);
        fitPoints.insert(fitPoints.end(), extra.begin(), extra.end());
        frame_ = WorldFrame::fit(fitPoints, drawing, arrowRoom);
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

void panelHeading(QPainter& p, const QRectF& area, const QString& text, double s)
{
    p.setFont(font(12 * s, true));
    p.setPen(palette::ink());
    p.drawText(QPointF(area.left(), area.top() + 12 * s), text);
}

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
{}

double FreeBodyPainter::margin() const { return t(kMargin); }

// The drawing or the text, whichever is wider.
double FreeBodyPainter::contentWidth() const { return std::max(g(kContentWidth), t(kContentWidth)); }

QRectF FreeBodyPainter::panel(double left, double width) const
{
    return {left, margin() + t(kTitleHeight), width, t(kHeadingBand) + g(kDrawingHeight) + t(kScaleBand)};
}

QRectF FreeBodyPainter::bodyPanel() const
{
    return panel(margin(), g(options_.dAlembert ? kContentWidth : kBodyPanelWidth));
}

QRectF FreeBodyPainter::bodyDrawing() const { return bodyPanel().adjusted(0, t(kHeadingBand), 0, -t(kScaleBand)); }

QSizeF FreeBodyPainter::size() const
{
    const int rows = options_.table ? int(diagram_.items.size()) + (options_.dAlembert ? 2 : 0) + 1 : 0;
    return {contentWidth() + 2 * margin(),
            bodyPanel().bottom() + t(kEquationHeight + rows * kRowHeight) + 2 * margin()};
}

void FreeBodyPainter::paint(QPainter& p, const QRectF& target) const
{
    const double s = options_.textScale;
    p.save();
    fitFigure(p, size(), target);
    p.fillRect(QRectF(QPointF(0, 0), size()), palette::paper());
    paintTitle(p);

    const StepResult& step = result_.steps[diagram_.step];
    const std::vector<BodyPointOf> points = bodyPointsAt(mechanism_, step, diagram_.body);
    double largest = diagram_.inertiaForce().norm();
    for (const auto& item : diagram_.items) largest = std::max(largest, item.force.norm());
    const double pagePerNewton = largest > 0 ? g(kMaxArrow) / largest : 0.0;
    double bodySize = 0;
    for (const auto& a : points) bodySize = std::max(bodySize, (a.at - diagram_.cg).norm());
    const double coupleFloor = kNegligibleCouple * std::max(1.0, largest * std::max(bodySize, 0.01));

    std::vector<Mark> marks;
    for (const auto& item : diagram_.items)
        for (Mark& mark : marksFor(item, options_.units, coupleFloor, s)) marks.push_back(std::move(mark));
    if (options_.dAlembert) {
        if (diagram_.inertiaForce().norm() > 1e-9)
            marks.push_back({diagram_.cg, -diagram_.inertiaForce(), 0, false, inertiaStyle(s),
                             forceText(options_.units, "−m·a_G", -diagram_.inertiaForce())});
        if (std::abs(diagram_.inertiaCouple()) > coupleFloor)
            marks.push_back({diagram_.cg, Vec2::Zero(), -diagram_.inertiaCouple(), true, inertiaStyle(s),
                             coupleText(options_.units, "−I_G·α", -diagram_.inertiaCouple())});
    }

    const QRectF bodyArea = bodyPanel();
    panelHeading(p, bodyArea,
                 options_.dAlembert ? "Free body with inertia loads (d'Alembert): every sum is zero" : "Free body", s);
    std::vector<Vec2> loadPoints;
    for (const auto& item : diagram_.items) loadPoints.push_back(item.at);
    const QRectF drawing = bodyDrawing();
    const QRectF labelArea = drawing.adjusted(0, 0, 0, -t(4));
    BodyPanel body(points, diagram_.cg, loadPoints, drawing, g(kArrowRoom), pagePerNewton, s);
    LabelPlacer labels(labelArea, font(t(kLabelPixels)));
    body.paintBody(p);
    body.paintMarks(p, marks, labels);
    labels.paint(p, palette::ink(), palette::paper());

    if (!options_.dAlembert) {
        const QRectF kineticArea = panel(margin() + g(kKineticOffset), g(kContentWidth - kKineticOffset));
        const QRectF kineticDrawing = kineticArea.adjusted(0, t(kHeadingBand), 0, -t(kScaleBand));
        p.setFont(font(t(28)));
        p.setPen(palette::ink());
        p.drawText(
            QRectF(bodyArea.right(), kineticArea.top(), kineticArea.left() - bodyArea.right(), kineticArea.height()),
            Qt::AlignCenter, "=");
        panelHeading(p, kineticArea, "Kinetic diagram", s);
        BodyPanel kinetic(points, diagram_.cg, {}, kineticDrawing, g(kArrowRoom), pagePerNewton, s);
        std::vector<Mark> km;
        if (diagram_.inertiaForce().norm() > 1e-9)
            km.push_back({diagram_.cg, diagram_.inertiaForce(), 0, false, inertiaStyle(s),
                          forceText(options_.units, "m·a_G", diagram_.inertiaForce())});
        if (std::abs(diagram_.inertiaCouple()) > coupleFloor)
            km.push_back({diagram_.cg, Vec2::Zero(), diagram_.inertiaCouple(), true, inertiaStyle(s),
                          coupleText(options_.units, "I_G·α", diagram_.inertiaCouple())});
        LabelPlacer kineticLabels(kineticDrawing.adjusted(0, 0, 0, -t(4)), font(t(kLabelPixels)));
        p.save();
        p.setOpacity(0.55);  // the kinetic body is a reference shape, not a load carrier
        kinetic.paintBody(p);
        p.restore();
        kinetic.paintMarks(p, km, kineticLabels);
        kineticLabels.paint(p, palette::ink(), palette::paper());
        if (km.empty()) {
            p.setFont(font(t(kLabelPixels)));
            p.drawText(QPointF(kineticArea.left(), kineticDrawing.bottom() - t(10)),
                       "m·a_G = 0 and I_G·α = 0 (at rest or massless)");
        }
    }

    paintScaleBars(p, largest, pagePerNewton, body.frame().scale);
    paintEquations(p, bodyArea.bottom() + t(6));
    if (options_.table) paintTable(p, bodyArea.bottom() + t(kEquationHeight));
    p.restore();
}

// Force arrows to scale, the body drawn to scale: a bar for each under the free body.
void FreeBodyPainter::paintScaleBars(QPainter& p, double largest, double pagePerNewton, double worldScale) const
{
    const double s = options_.textScale;
    const double y = bodyPanel().bottom() - t(14);
    p.setFont(font(t(kSmallestText)));
    p.setPen(QPen(palette::ink(), 1.2 * s));
    double next = margin() + t(260);  // where the drawing's bar starts, clear of the force bar
    if (pagePerNewton > 0) {
        const double value = niceBelow(largest * 0.6);
        const QString caption = "force scale " + options_.units.force(value);
        scaleBar(p, QPointF(margin(), y), value * pagePerNewton, caption, s);
        next = std::max(next,
                        margin() + value * pagePerNewton + t(26) + QFontMetricsF(p.font()).horizontalAdvance(caption));
    }
    const double metres = niceBelow(t(90) / worldScale);
    scaleBar(p, QPointF(next, y), metres * worldScale, "drawing scale " + options_.units.length(metres), s);
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
