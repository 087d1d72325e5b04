// A curve of the plot stack whose line is drawn as separate straight pieces,
// its dashes cut along the line (render/dash_pieces.h): the same picture as
// QCustomPlot's polyline, through Qt's fast path for separate lines rather
// than its general stroker, which took most of an edit's repaint.
#pragma once

#include <qcustomplot.h>

namespace clevis::ui {

class SegmentGraph : public QCPGraph {
public:
    using QCPGraph::QCPGraph;

protected:
    void drawLinePlot(QCPPainter* painter, const QVector<QPointF>& lines) const override;
};

}  // namespace clevis::ui
