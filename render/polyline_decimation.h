// A polyline drawn with only the points a printer can show: on a page of
// hundreds of curves of hundreds of steps each, most points lie so close to
// the line through their neighbours that dropping them changes no dot, yet
// each costs the PDF writer text to write and compress.
#pragma once

#include <QPolygonF>

class QPainter;

namespace clevis::ui {

// The points kept by the Ramer–Douglas–Peucker rule: the ends, and
// recursively the point farthest from the segment between two kept points
// while it lies more than `tolerance` from it. Every point dropped lies within
// `tolerance` of the polyline kept; the kept points are a subsequence of
// `points`. A tolerance of 0 drops only points exactly on a segment. A point
// that is not finite (a break in the line) is kept, and each run between
// breaks decimated on its own.
QPolygonF decimatedPolyline(const QPolygonF& points, double tolerance);

// A quarter of a 600 dpi printer's dot in `p`'s current units: a polyline
// decimated to it is the same picture on paper (and on any coarser device).
double invisibleDeviation(const QPainter& p);

// A quarter of one of `p`'s device pixels in its current units on a raster
// device (a screen, an image): a polyline decimated to it is the same picture
// there. On paper or PDF, invisibleDeviation(p).
double invisibleOnDevice(const QPainter& p);

}  // namespace clevis::ui
