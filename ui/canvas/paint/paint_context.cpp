#include "render/palette.h"
#include "ui/canvas/sketch_painter.h"

#include <QFontMetricsF>
#include <QPainterPath>

#include <algorithm>
#include <cmath>

namespace clevis::ui {

bool PaintContext::halo(Selection::Kind kind, const std::string& name, int loadIndex) const
{
    return haloPen(kind, name, 1.0, loadIndex).style() != Qt::NoPen;
}

QPen PaintContext::haloPen(Selection::Kind kind, const std::string& name, double width, int loadIndex) const
{
    const QString qname = QString::fromStdString(name);
    const bool isSelected = selected.kind == kind &&
                            (kind == Selection::Kind::Load ? selected.loadIndex == loadIndex : selected.name == qname);
    if (problems.contains(qname))
        return QPen(palette::problem(), width + 4, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    if (isSelected) return QPen(palette::selection(), width + 8, Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin);
    return QPen(Qt::NoPen);
}

void paintSketch(PaintContext& c)
{
    paintBodies(c);
    paintLoads(c);
    paintJoints(c);
    paintDrivers(c);
    paintMasses(c);
}

void drawZigZag(QPainter& p, const QPointF& a, const QPointF& b)
{
    const QLineF line(a, b);
    const double len = line.length();
    if (len < 1) return;
    const QPointF u = (b - a) / len, n(-u.y(), u.x());
    const double lead = std::min(10.0, len * 0.2);
    const int teeth = std::max(4, int((len - 2 * lead) / 7));
    QPolygonF path;
    path << a << a + u * lead;
    for (int i = 0; i < teeth; ++i) {
        const double t = lead + (len - 2 * lead) * (i + 0.5) / teeth;
        path << a + u * t + n * ((i % 2) ? -6.0 : 6.0);
    }
    path << b - u * lead << b;
    p.drawPolyline(path);
}

void drawLabel(QPainter& p, const QPointF& at, const QString& text, const QColor& colour)
{
    p.save();
    QFont f = p.font();
    f.setPointSizeF(8.5);
    p.setFont(f);
    const QRectF box = QFontMetricsF(f).boundingRect(text).adjusted(-3, -1, 3, 1).translated(at);
    QColor paper = palette::paper();
    paper.setAlpha(220);
    p.setPen(Qt::NoPen);
    p.setBrush(paper);
    p.drawRoundedRect(box, 3, 3);
    p.setPen(colour);
    p.drawText(at, text);
    p.restore();
}

}  // namespace clevis::ui
