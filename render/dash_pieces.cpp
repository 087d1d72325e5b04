#include "render/dash_pieces.h"

#include <cmath>

namespace clevis::ui {
namespace {

bool finite(QPointF p) { return std::isfinite(p.x()) && std::isfinite(p.y()); }

}  // namespace

QVector<QLineF> dashPieces(const QVector<QPointF>& line, const QPen& pen)
{
    QVector<qreal> pattern;
    if (pen.style() != Qt::SolidLine) pattern = pen.dashPattern();
    double total = 0;
    for (const qreal length : pattern) total += length;
    const double unit = pen.widthF() > 0 ? pen.widthF() : 1.0;
    QVector<QLineF> pieces;
    pieces.reserve(line.size());
    int k = 0;                                        // the pattern entry we are in
    double left = total > 0 ? pattern[0] * unit : 0;  // of that entry, px
    for (int i = 1; i < line.size(); ++i) {
        const QPointF a = line[i - 1], b = line[i];
        if (!finite(a) || !finite(b)) {
            k = 0;
            left = total > 0 ? pattern[0] * unit : 0;
            continue;
        }
        if (!(total > 0)) {
            pieces.append(QLineF(a, b));
            continue;
        }
        const double length = QLineF(a, b).length();
        const auto at = [&](double s) { return length > 0 ? a + (b - a) * (s / length) : a; };
        double s = 0;                // along this segment, px
        while (length - s > left) {  // the entry ends inside the segment
            if (k % 2 == 0 && left > 0) pieces.append(QLineF(at(s), at(s + left)));
            s += left;
            k = (k + 1) % int(pattern.size());
            left = pattern[k] * unit;
        }
        if (k % 2 == 0 && length > s) pieces.append(QLineF(at(s), b));
        left -= length - s;
    }
    return pieces;
}

}  // namespace clevis::ui
