// A pen's dashes along a polyline, as separate straight pieces: what Qt's
// dash stroker would draw, cut here so that the pieces can go to the raster
// engine's fast path for separate lines (each an antialiased quad) instead of
// the general stroker and path fill, several times slower for a curve of
// hundreds of points.
#pragma once

#include <QLineF>
#include <QPen>
#include <QVector>

namespace clevis::ui {

// The pattern is Qt's: lengths on and off in pen widths (1 px for a zero-width
// pen), starting on at the first point; a solid pen gives each segment whole.
// A point that is not finite breaks the line, and the pattern starts again
// after it, as a new polyline would.
QVector<QLineF> dashPieces(const QVector<QPointF>& line, const QPen& pen);

}  // namespace clevis::ui
