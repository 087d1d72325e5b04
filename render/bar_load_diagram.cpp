#include "render/bar_load_diagram.h"

#include "core/results/drive_units.h"
#include "core/results/summary_text.h"
#include "render/cycle_chart.h"
#include "render/free_body_painter.h"
#include "render/palette.h"
#include "render/polyline_decimation.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>
#include <iterator>

namespace clevis::ui {
namespace {

// Layout in logical units (pt on paper).
constexpr double kMargin = 4, kPlotLeft = 58, kPlotRight = 16, kPlotHeight = 100;
constexpr double kPaneTitle = 20;  // the title row above a plot, clear of its top tick number
constexpr double kTickRow = 16;    // the s numbers under a plot
constexpr double kRow = 14;        // a row of a peak table, or of the axis title and end names
constexpr double kPaneGap = 10;    // between one pane's table and the next title
constexpr double kNarrow = 480;    // below this width a table's columns stack
constexpr double kMark = 3.2;      // peak marks' half size
constexpr double kCurveWidth = 1.6;

QFont font(int pixels, bool bold = false)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
    f.setBold(bold);
    return f;
}

QString qs(const std::string& s) { return QString::fromStdString(s); }

QString endName(const BarEnd& e) { return e.name.empty() ? QString("free end") : qs(e.name); }

// The drive positions of a step ("crank = 95.00°"), or its time without drivers.
QString drivePositions(const CompiledMechanism& m, const StepResult& s)
{
    QStringList parts;
    for (std::size_t d = 0; d < m.drivers.size() && d < s.drivePosition.size(); ++d)
        parts << qs(formatDrivePosition(m.drivers[d], s.drivePosition[d]));
    if (parts.isEmpty()) parts << QString("t = %1 s").arg(s.t, 0, 'f', 4);
    return parts.join(", ");
}

// The height `text` takes wrapped to `width`.
double wrappedHeight(const QString& text, const QFont& f, double width)
{
    return QFontMetricsF(f).boundingRect(QRectF(0, 0, width, 1e6), Qt::TextWordWrap, text).height();
}

// `text` over as many lines of `width` as it needs, broken after its commas
// (a peak's drive positions); a clause longer than a line is elided when drawn.
QStringList clauseLines(const QString& text, const QFontMetricsF& metrics, double width)
{
    QStringList lines;
    for (const QString& clause : text.split(", ")) {
        const QString joined = lines.isEmpty() ? clause : lines.back() + ", " + clause;
        if (!lines.isEmpty() && metrics.horizontalAdvance(joined + ",") <= width) lines.back() = joined;
        else {
            if (!lines.isEmpty()) lines.back() += ",";
            lines.push_back(clause);
        }
    }
    return lines;
}

void paintMark(QPainter& p, QPointF at, bool cycle)
{
    if (cycle) {
        p.setPen(QPen(palette::ink(), 0.8));
        p.setBrush(palette::link());
        p.drawRect(QRectF(at.x() - kMark, at.y() - kMark, 2 * kMark, 2 * kMark));
    } else {
        p.setPen(QPen(palette::ink(), 1.2));
        p.setBrush(Qt::white);
        p.drawEllipse(at, kMark, kMark);
    }
    p.setBrush(Qt::NoBrush);
}

}  // namespace

BarCycleLoads barCycleLoads(const CompiledMechanism& m, const CycleResult& r, const BarModel& bar, int stations)
{
    return {bar, barEnvelopeBand(m, r, bar, stations), barEnvelopes(m, r, {bar}).front()};
}

BarLoadDiagram::BarLoadDiagram(const CompiledMechanism& m, const CycleResult& r, const BarCycleLoads& cycle, int step,
                               RenderUnits units, double width)
    : mechanism_(m)
    , result_(r)
    , cycle_(cycle)
    , step_(step)
    , units_(std::move(units))
    , atStep_(barAtStep(m, cycle.bar, r.steps.at(std::size_t(step)), cycle.band))
    , size_(width, 0)
{
    layOut();
}

double BarLoadDiagram::value(const BarStation& s, int which) const
{
    if (which == 0) return s.axial * units_.forcePerNewton;
    if (which == 1) return s.shear * units_.forcePerNewton;
    return s.moment * units_.torquePerNewtonMetre;
}

void BarLoadDiagram::layOut()
{
    const BarModel& bar = cycle_.bar;
    caption_ = QString("At %1").arg(stepCaption(mechanism_, result_, step_));
    ends_ = QString(
                "From %1 (s = 0) to %2 (s = %3). Line (○ its peaks): this position; shaded band (■ its "
                "peaks): the range over the cycle, %4 positions.")
                .arg(endName(bar.ends[0]), endName(bar.ends[1]), units_.length(bar.length))
                .arg(result_.steps.size());
    note_ = QString(
                "Signs: N > 0 is tension. Looking along the bar from %1 to %2 with its left side up, V and M have "
                "the beam-table signs: V > 0 at a left-hand support, M > 0 sagging. Values at a load's station "
                "jump: both sides are drawn.")
                .arg(endName(bar.ends[0]), endName(bar.ends[1]));

    const auto force = [&](double v) { return units_.force(v); };
    const auto torque = [&](double v) { return units_.torque(v); };
    const auto here = [&](const PeakAlong& p, bool present, const std::function<QString(double)>& f) {
        return present ? QString("%1 at s = %2").arg(f(p.value), units_.length(p.s)) : QString("none");
    };
    const auto cycle = [&](const EnvelopePeak& p, const std::function<QString(double)>& f) {
        if (p.step < 0) return QString("none");
        const StepResult& s = result_.steps[std::size_t(p.step)];
        return QString("%1 at s = %2, %3%4")
            .arg(f(p.value), units_.length(p.s), drivePositions(mechanism_, s),
                 s.nearSingular ? QString(" %1").arg(kNearToggleMark) : QString());
    };
    const BarPeaks& pk = atStep_.peaks;
    const BarEnvelope& env = cycle_.envelope;
    panes_[0].title = QString("Axial force N (%1)").arg(units_.forceSymbol);
    panes_[0].rows = {
        {"tension", here(pk.tension, pk.tension.value > 0, force), cycle(env.tension, force)},
        {"compression", here(pk.compression, pk.compression.value < 0, force), cycle(env.compression, force)}};
    panes_[1].title = QString("Shear force V (%1)").arg(units_.forceSymbol);
    panes_[1].rows = {{"largest |V|", here(pk.shear, true, force), cycle(env.shear, force)}};
    panes_[2].title = QString("Bending moment M (%1)").arg(units_.torqueSymbol);
    panes_[2].rows = {{"largest |M|", here(pk.moment, true, torque), cycle(env.moment, torque)}};

    const TableColumns columns = tableColumns();
    const QFontMetricsF metrics(font(10));
    stacked_ = size_.width() < kNarrow;
    for (const Pane& pane : panes_)
        for (const PeakRow& r : pane.rows)
            stacked_ = stacked_ || metrics.horizontalAdvance(r.here) > columns.hereWidth ||
                       metrics.horizontalAdvance(r.cycle) > columns.cycleWidth;

    const double textWidth = size_.width() - 2 * kMargin, stackedWidth = textWidth - columns.label;
    double y = 22 + wrappedHeight(caption_, font(10), textWidth) + wrappedHeight(ends_, font(10), textWidth) + 8;
    for (Pane& pane : panes_) {
        pane.top = y;
        pane.plot = QRectF(kPlotLeft, y + kPaneTitle, size_.width() - kPlotLeft - kPlotRight, kPlotHeight);
        int rows = 1 + (stacked_ ? 0 : 1 + int(pane.rows.size()));
        if (stacked_)
            for (const PeakRow& r : pane.rows)
                rows += int(clauseLines("here " + r.here, metrics, stackedWidth).size() +
                            clauseLines("cycle " + r.cycle, metrics, stackedWidth).size());
        y = pane.plot.bottom() + kTickRow + rows * kRow + kPaneGap;
    }
    noteBox_ = QRectF(kMargin, y, textWidth, wrappedHeight(note_, font(9), textWidth));
    size_.setHeight(noteBox_.bottom() + 6);
}

BarLoadDiagram::TableColumns BarLoadDiagram::tableColumns() const
{
    constexpr double kLabel = 84;
    const double width = size_.width() - 2 * kMargin;
    const double hereWidth = std::min(180.0, (width - kLabel) / 2);
    const double cycleLeft = kMargin + kLabel + hereWidth + 6;
    return {kLabel, kMargin + kLabel, hereWidth, cycleLeft, size_.width() - kMargin - cycleLeft};
}

void BarLoadDiagram::paintPane(QPainter& p, int which) const
{
    const Pane& pane = panes_[which];
    const QRectF& plot = pane.plot;
    const auto& band = cycle_.band;
    const auto& values = atStep_.values;
    double lo = 0, hi = 0;
    for (std::size_t i = 0; i < band.size(); ++i)
        for (const double v : {value(band[i].most, which), value(band[i].least, which), value(values[i], which)}) {
            lo = std::min(lo, v);
            hi = std::max(hi, v);
        }
    if (hi - lo < 1e-12) hi = lo + 1;
    const double pad = 0.08 * (hi - lo);
    lo -= lo < 0 ? pad : 0;
    hi += hi > 0 ? pad : 0;
    const double length = cycle_.bar.length * units_.lengthPerMetre;
    const auto X = [&](double s) { return plot.left() + s * units_.lengthPerMetre / length * plot.width(); };
    const auto Y = [&](double v) { return plot.bottom() - (v - lo) / (hi - lo) * plot.height(); };

    p.setPen(palette::ink());
    p.setFont(font(11, true));
    p.drawText(QPointF(kMargin, pane.top + 12), pane.title);

    // Grid, tick numbers and the zero line.
    p.setFont(font(10));
    const auto xt = niceTicks(0, length, 8), yt = niceTicks(lo, hi, 4);
    const double xs = xt.size() > 1 ? xt[1] - xt[0] : 1, ys = yt.size() > 1 ? yt[1] - yt[0] : 1;
    for (const double t : xt) {
        const double x = plot.left() + t / length * plot.width();
        p.setPen(QPen(palette::gridMinor(), 0.6));
        p.drawLine(QPointF(x, plot.top()), QPointF(x, plot.bottom()));
        p.setPen(palette::ink());
        p.drawText(QRectF(x - 30, plot.bottom() + 2, 60, 14), Qt::AlignCenter, tickText(t, xs));
    }
    for (const double t : yt) {
        p.setPen(QPen(palette::gridMinor(), 0.6));
        p.drawLine(QPointF(plot.left(), Y(t)), QPointF(plot.right(), Y(t)));
        p.setPen(palette::ink());
        p.drawText(QRectF(0, Y(t) - 7, plot.left() - 4, 14), Qt::AlignRight | Qt::AlignVCenter, tickText(t, ys));
    }

    // The band behind, then the zero line, then the step's curve; each edge
    // with only the points a printer can show.
    const double deviation = invisibleDeviation(p);
    QPolygonF most, least, curve;
    for (std::size_t i = 0; i < band.size(); ++i) {
        most << QPointF(X(band[i].s), Y(value(band[i].most, which)));
        least << QPointF(X(band[i].s), Y(value(band[i].least, which)));
        curve << QPointF(X(band[i].s), Y(value(values[i], which)));
    }
    QPolygonF outline = decimatedPolyline(most, deviation);
    const QPolygonF lower = decimatedPolyline(least, deviation);
    std::copy(lower.rbegin(), lower.rend(), std::back_inserter(outline));
    QPainterPath area;
    area.addPolygon(outline);
    area.closeSubpath();
    p.setPen(QPen(palette::link(), 0.8));
    p.setBrush(palette::linkFill());
    p.drawPath(area);
    p.setBrush(Qt::NoBrush);
    p.setPen(QPen(palette::groundHatch(), 0.8));
    p.drawLine(QPointF(plot.left(), Y(0)), QPointF(plot.right(), Y(0)));
    p.setPen(QPen(palette::ink(), kCurveWidth, Qt::SolidLine, Qt::FlatCap, Qt::MiterJoin));
    p.drawPolyline(decimatedPolyline(curve, deviation));
    p.setPen(QPen(palette::ink(), 0.8));
    p.drawRect(plot);

    // The peaks: the cycle's on the band, the step's on its curve.
    const BarPeaks& pk = atStep_.peaks;
    const BarEnvelope& env = cycle_.envelope;
    const auto mark = [&](double s, double v, bool cycle) {
        paintMark(p, QPointF(X(s), Y(which == 2 ? v * units_.torquePerNewtonMetre : v * units_.forcePerNewton)), cycle);
    };
    const auto markCycle = [&](const EnvelopePeak& e) {
        if (e.step >= 0) mark(e.s, e.value, true);
    };
    if (which == 0) {
        markCycle(env.tension);
        markCycle(env.compression);
        if (pk.tension.value > 0) mark(pk.tension.s, pk.tension.value, false);
        if (pk.compression.value < 0) mark(pk.compression.s, pk.compression.value, false);
    } else {
        const EnvelopePeak& e = which == 1 ? env.shear : env.moment;
        const PeakAlong& h = which == 1 ? pk.shear : pk.moment;
        markCycle(e);
        mark(h.s, h.value, false);
    }

    // The axis title between the end names, then the peak table.
    p.setPen(palette::ink());
    double y = plot.bottom() + kTickRow;
    const double width = size_.width() - 2 * kMargin;
    const TableColumns columns = tableColumns();
    const double label = columns.label;
    const auto cell = [&](double x, double w, const QString& text, bool bold = false) {
        p.setFont(font(10, bold));
        p.drawText(QRectF(x, y, w, kRow), Qt::AlignLeft | Qt::AlignVCenter,
                   QFontMetricsF(p.font()).elidedText(text, Qt::ElideRight, w));
    };
    const double third = plot.width() / 3;
    const auto axisCell = [&](double x, const QString& text, Qt::Alignment align) {
        p.setFont(font(10));
        p.drawText(QRectF(x, y, third, kRow), align | Qt::AlignVCenter,
                   QFontMetricsF(p.font()).elidedText(text, Qt::ElideMiddle, third - 4));
    };
    axisCell(plot.left(), QString("◂ %1").arg(endName(cycle_.bar.ends[0])), Qt::AlignLeft);
    axisCell(plot.left() + third, QString("s (%1)").arg(units_.lengthSymbol), Qt::AlignHCenter);
    axisCell(plot.right() - third, QString("%1 ▸").arg(endName(cycle_.bar.ends[1])), Qt::AlignRight);
    y += kRow;
    if (stacked_) {
        const QFontMetricsF metrics(font(10));
        for (const PeakRow& r : pane.rows) {
            cell(kMargin, label, r.what, true);
            for (const QString& text : {"here " + r.here, "cycle " + r.cycle})
                for (const QString& line : clauseLines(text, metrics, width - label)) {
                    cell(kMargin + label, width - label, line);
                    y += kRow;
                }
        }
        return;
    }
    cell(columns.hereLeft, columns.hereWidth, "at this position", true);
    cell(columns.cycleLeft, columns.cycleWidth, "over the cycle", true);
    y += kRow;
    for (const PeakRow& r : pane.rows) {
        cell(kMargin, label, r.what);
        cell(columns.hereLeft, columns.hereWidth, r.here);
        cell(columns.cycleLeft, columns.cycleWidth, r.cycle);
        y += kRow;
    }
}

void BarLoadDiagram::paint(QPainter& p, const QRectF& target) const
{
    p.save();
    fitFigure(p, size_, target);
    p.fillRect(QRectF(QPointF(0, 0), size_), Qt::white);
    const double textWidth = size_.width() - 2 * kMargin;
    p.setPen(palette::ink());
    p.setFont(font(12, true));
    p.drawText(QPointF(kMargin, 14),
               QFontMetricsF(p.font()).elidedText(QString("Internal loads along %1").arg(qs(cycle_.bar.bodyName)),
                                                  Qt::ElideRight, textWidth));
    p.setFont(font(10));
    const double captionHeight = wrappedHeight(caption_, p.font(), textWidth);
    p.drawText(QRectF(kMargin, 20, textWidth, captionHeight), Qt::TextWordWrap, caption_);
    p.drawText(QRectF(kMargin, 20 + captionHeight, textWidth, wrappedHeight(ends_, p.font(), textWidth)),
               Qt::TextWordWrap, ends_);
    for (int i = 0; i < 3; ++i) paintPane(p, i);
    p.setFont(font(9));
    p.setPen(palette::groundHatch());
    p.drawText(noteBox_, Qt::TextWordWrap, note_);
    p.restore();
}

}  // namespace clevis::ui
