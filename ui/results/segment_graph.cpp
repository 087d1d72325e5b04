#include "ui/results/segment_graph.h"

#include "render/dash_pieces.h"

namespace clevis::ui {

void SegmentGraph::drawLinePlot(QCPPainter* painter, const QVector<QPointF>& lines) const
{
    const QPen pen = painter->pen();
    if (pen.style() == Qt::NoPen || pen.color().alpha() == 0) return;
    applyDefaultAntialiasingHint(painter);
    QPen solid = pen;  // the dashes are already cut
    solid.setStyle(Qt::SolidLine);
    painter->setPen(solid);
    painter->drawLines(dashPieces(lines, pen));
    painter->setPen(pen);
}

}  // namespace clevis::ui
