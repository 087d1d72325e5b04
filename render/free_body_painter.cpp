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

// Page layout in logical units (points).
constexpr double kWidth = 1000, kMargin = 20;
constexpr double kPanelTop = 78, kPanelHeight = 420;
constexpr double kBodyPanelRight = 620, kKineticLeft = 660;
constexpr double kEquationHeight = 96, kRowHeight = 17;
constexpr double kMaxArrow = 115;  // the largest force's arrow length
constexpr double kMinArrow = 12;   // shorter forces are still drawn this long
constexpr double kHalfWidth = 11;  // a link's drawn half width
constexpr double kPinRadius = 5;
constexpr double kCoupleRadius = 21;
constexpr double kArrowRoom = 130;  // kept free around the body for arrows

QFont font(int pixels, bool bold = false)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
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

ArrowStyle styleFor(FreeBodyItemKind kind)
{
    switch (kind) {
    case FreeBodyItemKind::JointReaction: return figureArrow(palette::ink(), 1.7);
    case FreeBodyItemKind::DriverAction: return figureArrow(palette::driver(), 2.0);
    case FreeBodyItemKind::Weight: return figureArrow(palette::weight(), 1.8);
    case FreeBodyItemKind::Force:
    case FreeBodyItemKind::Torque: return figureArrow(palette::load(), 1.8);
    case FreeBodyItemKind::Spring:
    case FreeBodyItemKind::Damper:
    case FreeBodyItemKind::TorsionSpring: return figureArrow(palette::spring(), 1.6);
    }
    return figureArrow(palette::ink(), 1.6);
}

ArrowStyle inertiaStyle() { return figureArrow(palette::inertia(), 1.8, true); }

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

std::vector<Mark> marksFor(const FreeBodyItem& item, const RenderUnits& u, double coupleFloor)
{
    std::vector<Mark> out;
    const ArrowStyle style = styleFor(item.kind);
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

// Draws the body (outline, pins, centre of mass) and its marks inside `area`.
class BodyPanel {
public:
    // `points`: the body's (bodyPointsAt); `extra`: further points that must show, such as where loads act.
    BodyPanel(const std::vector<BodyPointOf>& points, const Vec2& cg, const std::vector<Vec2>& extra,
              const QRectF& area, double pagePerNewton)
        : points_(points), cg_(cg), area_(area), pagePerNewton_(pagePerNewton)
    {
        std::vector<Vec2> fitPoints;
        for (const auto& p : points) fitPoints.push_back(p.at);
        fitPoints.push_back(cg);
        fitPoints.insert(fitPoints.end(), extra.begin(), extra.end());
        // Room at the top for the heading and at the bottom for the scale bars.
        frame_ = WorldFrame::fit(fitPoints, area.adjusted(0, 16, 0, -30), kArrowRoom);
        std::vector<QPointF> page;
        std::vector<SlideBlock> blocks;
        for (const auto& p : points) {
            page.push_back(frame_.map(p.at));
            if (p.kind == BodyPointKind::SlideBlock)
                blocks.push_back({page.back(), unit(frame_.mapDirection(p.axis, 1))});
        }
        outline_ = bodyOutlinePath(page, kHalfWidth, blocks);
        centroid_ = outline_.boundingRect().center();
    }

    const WorldFrame& frame() const { return frame_; }

    void paintBody(QPainter& p) const
    {
        p.save();
        p.setPen(QPen(palette::link(), 1.6));
        p.setBrush(palette::linkFill());
        p.drawPath(outline_);
        QPen centre(palette::groundHatch(), 0.8, Qt::DashDotLine);
        p.setPen(centre);
        for (const auto& guide : points_) {
            if (guide.kind != BodyPointKind::SlideGuide) continue;
            const QPointF c = frame_.map(guide.sliding), u = unit(frame_.mapDirection(guide.axis, 1));
            p.drawLine(c - u * 4 * kHalfWidth, c + u * 4 * kHalfWidth);
        }
        p.restore();
        for (const auto& pin : points_)
            if (pin.kind == BodyPointKind::Pin || pin.kind == BodyPointKind::CylinderEnd)
                drawPin(p, frame_.map(pin.at), kPinRadius, palette::ink(), palette::paper());
        drawCentreOfMass(p, frame_.map(cg_), 5.5, palette::ink(), palette::paper());
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
                const double radius = kCoupleRadius + 9 * stacked;
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
        if (length < kMinArrow) v = unit(v) * kMinArrow;
        const QPointF u = unit(v), gap = u * (kPinRadius + 2);
        const QPointF outward = at - centroid_;
        const bool away = dot(u, outward) >= 0 || std::hypot(outward.x(), outward.y()) < 1;
        if (away) return {at + gap, at + gap + v};
        return {at - gap - v, at - gap};
    }

private:
    const std::vector<BodyPointOf>& points_;
    Vec2 cg_;
    QRectF area_;
    double pagePerNewton_;
    WorldFrame frame_;
    QPainterPath outline_;
    QPointF centroid_;
};

void panelHeading(QPainter& p, const QRectF& area, const QString& text)
{
    p.setFont(font(12, true));
    p.setPen(palette::ink());
    p.drawText(QPointF(area.left(), area.top() + 12), text);
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

QSizeF FreeBodyPainter::size() const
{
    const int rows = options_.table ? int(diagram_.items.size()) + (options_.dAlembert ? 2 : 0) + 1 : 0;
    return {kWidth, kPanelTop + kPanelHeight + kEquationHeight + rows * kRowHeight + 2 * kMargin};
}

void FreeBodyPainter::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size(), target);
    p.fillRect(QRectF(QPointF(0, 0), size()), palette::paper());
    paintTitle(p);

    const StepResult& s = result_.steps[diagram_.step];
    const std::vector<BodyPointOf> points = bodyPointsAt(mechanism_, s, diagram_.body);
    double largest = diagram_.inertiaForce().norm();
    for (const auto& item : diagram_.items) largest = std::max(largest, item.force.norm());
    const double pagePerNewton = largest > 0 ? kMaxArrow / largest : 0.0;
    double bodySize = 0;
    for (const auto& a : points) bodySize = std::max(bodySize, (a.at - diagram_.cg).norm());
    const double coupleFloor = kNegligibleCouple * std::max(1.0, largest * std::max(bodySize, 0.01));

    std::vector<Mark> marks;
    for (const auto& item : diagram_.items)
        for (Mark& mark : marksFor(item, options_.units, coupleFloor)) marks.push_back(std::move(mark));
    if (options_.dAlembert) {
        if (diagram_.inertiaForce().norm() > 1e-9)
            marks.push_back({diagram_.cg, -diagram_.inertiaForce(), 0, false, inertiaStyle(),
                             forceText(options_.units, "−m·a_G", -diagram_.inertiaForce())});
        if (std::abs(diagram_.inertiaCouple()) > coupleFloor)
            marks.push_back({diagram_.cg, Vec2::Zero(), -diagram_.inertiaCouple(), true, inertiaStyle(),
                             coupleText(options_.units, "−I_G·α", -diagram_.inertiaCouple())});
    }

    const double right = options_.dAlembert ? kWidth - kMargin : kBodyPanelRight;
    const QRectF bodyArea(kMargin, kPanelTop, right - kMargin, kPanelHeight);
    panelHeading(p, bodyArea,
                 options_.dAlembert ? "Free body with inertia loads (d'Alembert): every sum is zero" : "Free body");
    std::vector<Vec2> loadPoints;
    for (const auto& item : diagram_.items) loadPoints.push_back(item.at);
    BodyPanel panel(points, diagram_.cg, loadPoints, bodyArea, pagePerNewton);
    LabelPlacer labels(bodyArea.adjusted(0, 16, 0, -34), font(11));
    panel.paintBody(p);
    panel.paintMarks(p, marks, labels);
    labels.paint(p, palette::ink(), palette::paper());

    if (!options_.dAlembert) {
        const QRectF kineticArea(kKineticLeft, kPanelTop, kWidth - kMargin - kKineticLeft, kPanelHeight);
        p.setFont(font(28));
        p.setPen(palette::ink());
        p.drawText(QRectF(kBodyPanelRight, kPanelTop, kKineticLeft - kBodyPanelRight, kPanelHeight), Qt::AlignCenter,
                   "=");
        panelHeading(p, kineticArea, "Kinetic diagram");
        BodyPanel kinetic(points, diagram_.cg, {}, kineticArea, pagePerNewton);
        std::vector<Mark> km;
        if (diagram_.inertiaForce().norm() > 1e-9)
            km.push_back({diagram_.cg, diagram_.inertiaForce(), 0, false, inertiaStyle(),
                          forceText(options_.units, "m·a_G", diagram_.inertiaForce())});
        if (std::abs(diagram_.inertiaCouple()) > coupleFloor)
            km.push_back({diagram_.cg, Vec2::Zero(), diagram_.inertiaCouple(), true, inertiaStyle(),
                          coupleText(options_.units, "I_G·α", diagram_.inertiaCouple())});
        LabelPlacer kineticLabels(kineticArea.adjusted(0, 16, 0, -34), font(11));
        p.save();
        p.setOpacity(0.55);  // the kinetic body is a reference shape, not a load carrier
        kinetic.paintBody(p);
        p.restore();
        kinetic.paintMarks(p, km, kineticLabels);
        kineticLabels.paint(p, palette::ink(), palette::paper());
        if (km.empty()) {
            p.setFont(font(11));
            p.drawText(QPointF(kineticArea.left(), kineticArea.bottom() - 40),
                       "m·a_G = 0 and I_G·α = 0 (at rest or massless)");
        }
    }

    // Scale bars: force arrows to scale, the body drawn to scale.
    const double y = kPanelTop + kPanelHeight - 14;
    p.setFont(font(10));
    p.setPen(QPen(palette::ink(), 1.2));
    if (pagePerNewton > 0) {
        const double value = niceBelow(largest * 0.6);
        const double len = value * pagePerNewton;
        p.drawLine(QPointF(kMargin, y), QPointF(kMargin + len, y));
        p.drawLine(QPointF(kMargin, y - 4), QPointF(kMargin, y + 4));
        p.drawLine(QPointF(kMargin + len, y - 4), QPointF(kMargin + len, y + 4));
        p.drawText(QPointF(kMargin + len + 6, y + 4), "force scale " + options_.units.force(value));
    }
    const double metres = niceBelow(90 / panel.frame().scale);
    const double x0 = kMargin + 260, len = metres * panel.frame().scale;
    p.drawLine(QPointF(x0, y), QPointF(x0 + len, y));
    p.drawLine(QPointF(x0, y - 4), QPointF(x0, y + 4));
    p.drawLine(QPointF(x0 + len, y - 4), QPointF(x0 + len, y + 4));
    p.drawText(QPointF(x0 + len + 6, y + 4), "drawing scale " + options_.units.length(metres));

    paintEquations(p, kPanelTop + kPanelHeight + 6);
    if (options_.table) paintTable(p, kPanelTop + kPanelHeight + kEquationHeight);
    p.restore();
}

void FreeBodyPainter::paintTitle(QPainter& p) const
{
    p.setPen(palette::ink());
    p.setFont(font(17, true));
    p.drawText(QPointF(kMargin, kMargin + 14), "Free-body diagram: " + QString::fromStdString(diagram_.bodyName));
    p.setFont(font(11));
    p.drawText(QPointF(kMargin, kMargin + 34), stepCaption(mechanism_, result_, diagram_.step));
    const QString mass = QString("m = %1, I_G = %2, G at %3")
                             .arg(formatQuantity(diagram_.mass, "kg"), formatQuantity(diagram_.inertia, "kg·m²"),
                                  pointText(options_.units, diagram_.cg));
    p.drawText(QPointF(kMargin, kMargin + 50), mass);
    if (result_.steps[diagram_.step].nearSingular) {
        p.setPen(palette::problem());
        p.drawText(QPointF(kWidth / 2, kMargin + 50), "Near a singular position: these loads are unreliable.");
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
    p.setPen(QPen(palette::gridMajor(), 1));
    p.drawLine(QPointF(kMargin, top), QPointF(kWidth - kMargin, top));
    p.setPen(palette::ink());
    p.setFont(font(12, true));
    p.drawText(QPointF(kMargin, top + 18), "Equations of plane motion (moments about G, counter-clockwise positive)");
    p.setFont(font(12));
    double y = top + 40;
    for (const Row& row : rows) {
        const auto value = [&](double v) { return row.moment ? u.torque(v) : u.force(v); };
        const double residual = row.e.residual * (row.moment ? u.torquePerNewtonMetre : u.forcePerNewton);
        const QString residualText =
            QString("residual = %1 %2")
                .arg(QString::number(residual, 'g', 2), row.moment ? u.torqueSymbol : u.forceSymbol);
        p.drawText(QPointF(kMargin + 10, y), QString("%1 = %2").arg(row.sum, value(row.e.sum)));
        p.drawText(QPointF(kMargin + 300, y), QString("%1 = %2").arg(row.kinetic, value(row.e.kinetic)));
        p.drawText(QPointF(kMargin + 600, y), residualText);
        y += 18;
    }
}

void FreeBodyPainter::paintTable(QPainter& p, double top) const
{
    const RenderUnits& u = options_.units;
    const double columns[] = {kMargin, 130, 225, 320, 420, 520, 620, 700, 800};
    const QString headings[] = {"Load", "Kind", "From", "Fx", "Fy", "|F|", "Direction", "Couple", "Acts at (x, y)"};
    p.setFont(font(11, true));
    p.setPen(palette::ink());
    for (int c = 0; c < 9; ++c) p.drawText(QPointF(columns[c], top + 12), headings[c]);
    p.setPen(QPen(palette::gridMajor(), 1));
    p.drawLine(QPointF(kMargin, top + 16), QPointF(kWidth - kMargin, top + 16));
    p.setFont(font(11));
    p.setPen(palette::ink());
    double y = top + 12 + kRowHeight;
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
        for (int c = 0; c < 9; ++c) p.drawText(QPointF(columns[c], y), cells[c]);
        y += kRowHeight;
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
