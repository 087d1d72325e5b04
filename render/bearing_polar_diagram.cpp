#include "render/bearing_polar_diagram.h"

#include "core/results/summary_text.h"
#include "render/cycle_chart.h"
#include "render/drawing_symbols.h"
#include "render/label_placer.h"
#include "render/palette.h"
#include "render/polyline_decimation.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>
#include <limits>

namespace clevis::ui {
namespace {

// Layout in page units (pt on paper).
constexpr double kWidth = 340, kMargin = 14;
constexpr double kTitlePixels = 13, kTextPixels = 10, kLabelPixels = 9;
constexpr double kRingRoom = 24;               // between the outer ring and the plot's edge, for the axes' names
constexpr std::size_t kCompactMarkLabels = 3;  // a compact plot names every third mark (every 90° of a crank)
constexpr double kMarkRadius = 2.4, kPeakMark = 4.2, kPinRadius = 4, kNowRing = 5.5;
// Marks whose tips lie within this many label sizes of the pin are named together.
constexpr double kBunchedMarks = 2.5;

QFont font(double pixels, bool bold = false)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(int(std::lround(pixels)));
    f.setBold(bold);
    return f;
}

double paragraphHeight(const QString& text, double width, double pixels = kTextPixels, bool bold = false)
{
    return QFontMetricsF(font(pixels, bold)).boundingRect(QRectF(0, 0, width, 1e5), Qt::TextWordWrap, text).height();
}

QString qs(const std::string& s) { return QString::fromStdString(s); }

double directionDeg(const Vec2& f) { return radToDeg(std::atan2(f.y(), f.x())); }

// "12.34 kN ∠ 95.0°".
QString forceText(const RenderUnits& u, const Vec2& f)
{
    return f.norm() > 0 ? QString("%1 ∠ %2").arg(u.force(f.norm()), formatDirection(directionDeg(f))) : u.force(0);
}

// A ring's value, as short as it reads exactly: "5 kN", "12.5 kN".
QString ringText(const RenderUnits& u, double newtons)
{
    return QString("%1 %2").arg(QString::number(newtons * u.forcePerNewton, 'g', 6), u.forceSymbol);
}

// A mark's label: a crank angle within one turn ("120°"), else the axis's value.
QString markText(const CycleAxis& axis, double position)
{
    if (axis.unit == "°") {
        const double turn = std::fmod(std::fmod(position, 360.0) + 360.0, 360.0);
        return QString::number(turn < 359.95 ? turn : 0.0, 'f', 0) + "°";
    }
    return QString("%1 %2").arg(QString::number(position, 'g', 4), axis.unit);
}

// 30° for a crank that turns far enough, else a round step giving about ten marks.
double intervalFor(const CycleAxis& axis)
{
    if (axis.values.size() < 2) return 0;
    const double lo = std::min(axis.values.front(), axis.values.back());
    const double hi = std::max(axis.values.front(), axis.values.back());
    if (axis.unit == "°" && hi - lo >= 180) return 30;
    const auto ticks = niceTicks(lo, hi, 10);
    return ticks.size() > 1 ? ticks[1] - ticks[0] : 0;
}

// Round forces for the rings (1, 2, 2.5 or 5 × 10ⁿ apart), out to the first
// at or past `largest`: the spacing whose outer ring comes closest to it, with
// about four rings.
std::vector<double> ringValues(double largest)
{
    if (!(largest > 0)) return {1.0};
    const double decade = std::pow(10.0, std::floor(std::log10(largest)));
    double spacing = decade, best = std::numeric_limits<double>::infinity();
    for (const double d : {decade / 10, decade})
        for (const double f : {1.0, 2.0, 2.5, 5.0}) {
            const double rings = std::ceil(largest / (f * d) * (1 - 1e-9));
            if (rings < 2 || rings > 6) continue;
            if (const double score = rings * f * d / largest + 0.02 * std::abs(rings - 4); score < best) {
                best = score;
                spacing = f * d;
            }
        }
    std::vector<double> rings;
    for (int k = 1; rings.empty() || rings.back() < largest * (1 - 1e-9); ++k) rings.push_back(k * spacing);
    return rings;
}

QPointF unit(QPointF v)
{
    const double n = std::hypot(v.x(), v.y());
    return n > 0 ? v / n : QPointF(1, -1) / std::sqrt(2.0);
}

// On the page y runs down: a body-frame angle drawn counter-clockwise.
QPointF pageDirection(double deg) { return {std::cos(degToRad(deg)), -std::sin(degToRad(deg))}; }

// The peak's mark, a diamond round its tip.
QPainterPath peakDiamond(QPointF at)
{
    QPainterPath diamond;
    diamond.moveTo(at + QPointF(0, -kPeakMark));
    diamond.lineTo(at + QPointF(kPeakMark, 0));
    diamond.lineTo(at + QPointF(0, kPeakMark));
    diamond.lineTo(at + QPointF(-kPeakMark, 0));
    diamond.closeSubpath();
    return diamond;
}

}  // namespace

BearingPolarDiagram::BearingPolarDiagram(const CompiledMechanism& m, const CycleResult& r, BearingPolar polar,
                                         BearingPolarOptions options)
    : mechanism_(m)
    , result_(r)
    , polar_(std::move(polar))
    , options_(std::move(options))
    , axis_(cycleAxis(m, r))
    , unreliable_(unreliableSteps(r))
{
    const RenderUnits& u = options_.units;
    interval_ = intervalFor(axis_);
    marks_ = polarMarks(polar_.force, axis_.values, interval_);
    // A crank's last mark a whole turn after its first, with the same load, is the first one again.
    if (marks_.size() > 1 && axis_.unit == "°") {
        const double turns = (marks_.back().position - marks_.front().position) / 360.0;
        if (std::abs(turns) >= 1 - 1e-9 && std::abs(turns - std::round(turns)) < 1e-9 &&
            (marks_.back().force - marks_.front().force).norm() <= 1e-6 * std::max(1.0, polar_.peak.value))
            marks_.pop_back();
    }
    rings_ = ringValues(polar_.peak.value);

    const QString joint = qs(polar_.pin), body = qs(m.bodyName(polar_.body)), other = qs(polar_.otherName);
    title_ = QString("Bearing load at %1 on %2").arg(joint, body);
    caption_.push_back(
        {polar_.body == kGround
             ? QString("The force the frame (%1) receives from %2 at %3, in global axes.").arg(body, other, joint)
             : QString("The force %1 receives from %2 at %3, in %1's own frame: its x and y are the global "
                       "x and y at the drawn pose, turning with %1.")
                   .arg(body, other, joint)});

    const auto where = [&](int step) { return QString("%1 %2").arg(axis_.name, axis_.format(axis_.values[step])); };
    const Peak& peak = polar_.peak;
    if (peak.step >= 0)
        notes_.push_back(
            {QString("◆ Peak %1 (in this frame) at %2%3.")
                 .arg(forceText(u, polar_.force[peak.step]), where(peak.step),
                      peak.nearSingular ? QString(" %1 near a singular position: unreliable").arg(kNearToggleMark)
                                        : QString()),
             peak.nearSingular});
    if (peak.flagged.step >= 0)
        notes_.push_back({QString("%1 Larger near a singular position (unreliable, may run off the plot): %2 at %3.")
                              .arg(kNearToggleMark, u.force(peak.flagged.value), where(peak.flagged.step)),
                          true});
    const LoadSector& sector = polar_.sector;
    QString sectorText;
    if (!sector.defined) sectorText = "No load above 1 % of the peak: the load has no direction here.";
    else if (!sector.reverses)
        sectorText = QString(
                         "The load stays within a %1 sector: it does not reverse. The unloaded side is centred on "
                         "%2 in this frame.")
                         .arg(formatDirection(sector.spanDeg), formatDirection(sector.quietDeg));
    else if (sector.spanDeg >= 350)
        sectorText = QString("The load turns all round the bearing (a %1 sector): it reverses.")
                         .arg(formatDirection(sector.spanDeg));
    else
        sectorText = QString(
                         "The load sweeps a %1 sector: it reverses (no line through the pin keeps it on one side). "
                         "The least loaded side is centred on %2 in this frame.")
                         .arg(formatDirection(sector.spanDeg), formatDirection(sector.quietDeg));
    // The steps the sector leaves out for carrying almost nothing (the reliable ones, as it counts).
    const int reliable = int(std::count(unreliable_.begin(), unreliable_.end(), false));
    if (const int left = (reliable > 0 ? reliable : int(unreliable_.size())) - sector.counted;
        sector.defined && left > 0)
        sectorText += QString(" %1 of the %2 positions carry under 1 % of the peak (%3) and are not counted.")
                          .arg(left)
                          .arg(sector.counted + left)
                          .arg(u.force(kDirectionFloor * peak.value));
    notes_.push_back({sectorText});
    if (options_.currentStep >= 0 && options_.currentStep < int(polar_.force.size()))
        notes_.push_back({QString("Now (blue arrow): %1 at %2.")
                              .arg(forceText(u, polar_.force[options_.currentStep]), where(options_.currentStep))});
    QString key = QString("● %1 every %2; □ the start, the arrow the way the cycle runs.")
                      .arg(axis_.name, axis_.unit == "°" ? QString("%1°").arg(interval_)
                                                         : QString("%1 %2").arg(interval_).arg(axis_.unit));
    if (std::find(unreliable_.begin(), unreliable_.end(), true) != unreliable_.end())
        key += " Dashed: near a singular position (unreliable).";
    notes_.push_back({key + QString(" Rings every %1, one scale both ways.").arg(ringText(u, rings_.front()))});

    const double textWidth = kWidth - 2 * kMargin;
    captionTop_ = kMargin + paragraphHeight(title_, textWidth, kTitlePixels, true) + 4;
    double y = captionTop_;
    for (const auto& c : caption_) y += paragraphHeight(c.text, textWidth) + 2;
    plot_ = QRectF(kMargin, y + 4, textWidth, textWidth);
    notesTop_ = plot_.bottom() + 6;
    y = notesTop_;
    for (const auto& n : notes_) y += paragraphHeight(n.text, textWidth) + 3;
    size_ = QSizeF(kWidth, y + kMargin);
    if (options_.plotOnly) {
        plot_.moveTopLeft(QPointF(0, 0));
        size_ = plot_.size();
    }
    const double radius = std::max(plot_.width() / 4, plot_.width() / 2 - kRingRoom * options_.textScale);
    pagePerNewton_ = radius / rings_.back();
    placeLabels();
}

QStringList BearingPolarDiagram::paragraphs() const
{
    QStringList all;
    for (const auto* list : {&caption_, &notes_})
        for (const Paragraph& p : *list) all << p.text;
    return all;
}

QPointF BearingPolarDiagram::tip(const Vec2& force) const
{
    return plot_.center() + QPointF(force.x(), -force.y()) * pagePerNewton_;
}

double BearingPolarDiagram::axisReach() const { return rings_.back() * pagePerNewton_ + 12 * options_.textScale; }

void BearingPolarDiagram::placeLabels()
{
    const RenderUnits& u = options_.units;
    const QPointF centre = plot_.center();
    LabelPlacer& labels = labels_.emplace(plot_, font(kLabelPixels * options_.textScale));

    const QString frame = polar_.body == kGround ? QString("global") : qs(mechanism_.bodyName(polar_.body));
    const double reach = axisReach();
    const QPointF xEnd = centre + QPointF(reach, 0), yEnd = centre + QPointF(0, -reach);
    labels.addObstacle(QLineF(centre - QPointF(reach, 0), xEnd));
    labels.addObstacle(QLineF(centre + QPointF(0, reach), yEnd));
    labels.add(QString("x (%1)").arg(frame), xEnd, QPointF(-0.3, 1));
    labels.add(QString("y (%1)").arg(frame), yEnd, QPointF(1, 0.3));
    labels.addObstacle(QRectF(centre - QPointF(kPinRadius, kPinRadius), QSizeF(2, 2) * kPinRadius));

    const auto& f = polar_.force;
    for (std::size_t i = 1; i < f.size(); ++i) labels.addObstacle(QLineF(tip(f[i - 1]), tip(f[i])));
    if (!f.empty()) labels.addObstacle(QRectF(tip(f.front()) - QPointF(3.5, 3.5), QSizeF(7, 7)));

    if (polar_.peak.step >= 0 && polar_.peak.value > 0) {
        const QPointF at = tip(f[polar_.peak.step]);
        labels.addObstacle(QLineF(centre, at));
        labels.addObstacle(peakDiamond(at).boundingRect());
        labels.add("peak " + u.force(polar_.peak.value), at, unit(at - centre));
    }

    // Marks bunched at the pin (a load near zero for part of the cycle) share
    // one label, their positions as runs: a dozen names round a few points
    // cannot be told apart. The others are named one by one.
    const std::size_t every = options_.compact ? kCompactMarkLabels : 1;
    const double bunch = kBunchedMarks * kLabelPixels * options_.textScale;
    std::vector<std::size_t> bunched;
    for (std::size_t k = 0; k < marks_.size(); k += every) {
        const QPointF d = tip(marks_[k].force) - centre;
        if (std::hypot(d.x(), d.y()) < bunch) bunched.push_back(k);
    }
    if (bunched.size() < 2) bunched.clear();
    // The marks are obstacles to every label placed after them; a shared
    // label must clear them, so then they come first.
    const auto markObstacles = [&] {
        for (const PolarMark& mark : marks_)
            labels.addObstacle(QRectF(tip(mark.force) - QPointF(kMarkRadius, kMarkRadius), QSizeF(2, 2) * kMarkRadius));
    };
    if (!bunched.empty()) {
        markObstacles();
        QStringList runs;
        for (std::size_t i = 0; i < bunched.size();) {
            std::size_t last = i;
            while (last + 1 < bunched.size() && bunched[last + 1] == bunched[last] + every) ++last;
            const QString first = markText(axis_, marks_[bunched[i]].position);
            runs << (last == i ? first : first + "–" + markText(axis_, marks_[bunched[last]].position));
            i = last + 1;
        }
        // Away from the peak, where the curve leaves room.
        const QPointF away = polar_.peak.step >= 0 ? centre - tip(f[polar_.peak.step]) : QPointF(1, -1);
        labels.add(runs.join(", "), centre, unit(away));
    }
    // Each ring's value, along the side the load leaves most free.
    const double ringDeg = polar_.sector.defined && !polar_.sector.reverses ? polar_.sector.quietDeg : -45.0;
    for (std::size_t k = options_.compact ? rings_.size() - 1 : 0; k < rings_.size(); ++k)
        labels.add(ringText(u, rings_[k]), centre + pageDirection(ringDeg) * rings_[k] * pagePerNewton_,
                   pageDirection(ringDeg), palette::groundHatch());

    if (bunched.empty()) markObstacles();
    for (std::size_t k = 0; k < marks_.size(); k += every) {
        if (std::find(bunched.begin(), bunched.end(), k) != bunched.end()) continue;
        const QPointF at = tip(marks_[k].force);
        labels.add(markText(axis_, marks_[k].position), at, unit(at - centre));
    }

    if (options_.currentStep >= 0 && options_.currentStep < int(f.size())) {
        const QPointF at = tip(f[options_.currentStep]);
        labels.addObstacle(QLineF(centre, at));
        labels.addObstacle(QRectF(at - QPointF(kNowRing, kNowRing), QSizeF(2, 2) * kNowRing));
        labels.add("now", at, unit(at - centre), palette::link());
    }
}

void BearingPolarDiagram::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    p.fillRect(QRectF(QPointF(0, 0), size_), palette::paper());
    if (options_.plotOnly) {
        paintPlot(p);
        p.restore();
        return;
    }
    const double textWidth = kWidth - 2 * kMargin;
    p.setPen(palette::ink());
    p.setFont(font(kTitlePixels, true));
    p.drawText(QRectF(kMargin, kMargin, textWidth, captionTop_ - kMargin), Qt::TextWordWrap, title_);
    p.setFont(font(kTextPixels));
    const auto paragraphs = [&](const std::vector<Paragraph>& list, double top, double gap) {
        for (const Paragraph& paragraph : list) {
            const double h = paragraphHeight(paragraph.text, textWidth);
            p.setPen(paragraph.problem ? palette::problem() : palette::ink());
            p.drawText(QRectF(kMargin, top, textWidth, h), Qt::TextWordWrap, paragraph.text);
            top += h + gap;
        }
    };
    paragraphs(caption_, captionTop_, 2);
    paintPlot(p);
    paragraphs(notes_, notesTop_, 3);
    p.restore();
}

void BearingPolarDiagram::paintPlot(QPainter& p) const
{
    const QPointF centre = plot_.center();

    // Rings, light, the outer one a shade darker.
    p.setBrush(Qt::NoBrush);
    for (std::size_t k = 0; k < rings_.size(); ++k) {
        p.setPen(QPen(k + 1 == rings_.size() ? palette::groundHatch() : palette::gridMajor(), 0.7));
        const double radius = rings_[k] * pagePerNewton_;
        p.drawEllipse(centre, radius, radius);
    }

    // The body-frame axes through the pin, named at their positive ends.
    const ArrowStyle axisArrow = figureArrow(palette::groundHatch(), 0.8);
    const double reach = axisReach();
    drawArrow(p, centre - QPointF(reach, 0), centre + QPointF(reach, 0), axisArrow);
    drawArrow(p, centre + QPointF(0, reach), centre + QPointF(0, -reach), axisArrow);
    drawPin(p, centre, kPinRadius, palette::ink(), palette::paper());

    // The curve, straight between steps; dashed where a step is near a singular position.
    const auto& f = polar_.force;
    // Each run of steps alike is one polyline (round joins draw what round-capped
    // segments would), with only the points a printer can show.
    p.save();
    p.setClipRect(plot_);
    const double deviation = invisibleDeviation(p);
    for (std::size_t first = 0; first + 1 < f.size();) {
        const auto flagged = [&](std::size_t i) { return unreliable_[i] || unreliable_[i + 1]; };  // segment i → i+1
        const bool dashed = flagged(first);
        std::size_t last = first + 1;
        while (last + 1 < f.size() && flagged(last) == dashed) ++last;
        QPolygonF run;
        for (std::size_t i = first; i <= last; ++i) run << tip(f[i]);
        p.setPen(QPen(dashed ? palette::problem() : palette::ink(), 1.5, dashed ? Qt::DashLine : Qt::SolidLine,
                      Qt::RoundCap, Qt::RoundJoin));
        p.drawPolyline(decimatedPolyline(run, deviation));
        first = last;
    }
    p.restore();

    // The start, and the way the cycle runs: a head on the curve a little past it.
    if (!f.empty()) {
        const QPointF start = tip(f.front());
        p.setPen(QPen(palette::ink(), 1.2));
        p.setBrush(palette::paper());
        p.drawRect(QRectF(start - QPointF(3.5, 3.5), QSizeF(7, 7)));
        for (std::size_t i = 1; i < f.size(); ++i)
            if (const QPointF d = tip(f[i]) - start; std::hypot(d.x(), d.y()) >= 14) {
                drawArrow(p, start, start + unit(d) * 14, figureArrow(palette::ink(), 1.2));
                break;
            }
    }

    // The peak: its force drawn from the pin, light, a diamond at its tip.
    if (polar_.peak.step >= 0 && polar_.peak.value > 0) {
        const QPointF at = tip(f[polar_.peak.step]);
        drawArrow(p, centre, at, figureArrow(palette::groundHatch(), 0.8, true));
        p.setPen(QPen(palette::ink(), 1));
        p.setBrush(palette::ink());
        p.drawPath(peakDiamond(at));
    }

    // The drive position at each mark.
    p.setPen(QPen(palette::paper(), 0.8));
    p.setBrush(palette::ink());
    for (const PolarMark& mark : marks_) p.drawEllipse(tip(mark.force), kMarkRadius, kMarkRadius);

    // The scrubbed position.
    if (options_.currentStep >= 0 && options_.currentStep < int(f.size())) {
        const QPointF at = tip(f[options_.currentStep]);
        drawArrow(p, centre, at, figureArrow(palette::link(), 2.0));
        // A ring round the tip, seen however short the arrow.
        p.setPen(QPen(palette::link(), 1.6));
        p.setBrush(Qt::NoBrush);
        p.drawEllipse(at, kNowRing, kNowRing);
    }
    labels_->paint(p, palette::ink(), palette::paper());
}

}  // namespace clevis::ui
