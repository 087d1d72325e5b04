// Places text labels next to their anchors so that they overlap neither each
// other nor the drawing: each label tries positions around its anchor,
// preferring the direction it is pushed in, and takes the least crowded one.
#pragma once

#include <QColor>
#include <QFont>
#include <QLineF>
#include <QPainterPath>
#include <QRectF>
#include <QString>

#include <vector>

class QPainter;

namespace clevis::ui {

class LabelPlacer {
public:
    LabelPlacer(const QRectF& area, const QFont& font);

    void addObstacle(const QPainterPath& shape);
    void addObstacle(const QRectF& box);
    void addObstacle(const QLineF& line);

    // Places at once (earlier labels win the best spots); `push` is a
    // direction away from the drawing. A label with an `ink` of its own is
    // painted in it, the others in paint()'s.
    void add(const QString& text, QPointF anchor, QPointF push, const QColor& ink = {});

    // Text in `ink` on a `paper` patch, with a leader line when moved away.
    void paint(QPainter& p, const QColor& ink, const QColor& paper) const;

    // Where each label went, in the order added.
    std::vector<QRectF> placedBoxes() const;

private:
    struct Placed {
        QString text;
        QRectF box;
        QPointF anchor;
        QColor ink;
    };
    // The obstacles and labels that may touch `region`, in the order added.
    struct Nearby {
        std::vector<const QRectF*> placed, boxes;
        std::vector<const QLineF*> lines;
        std::vector<const QPainterPath*> shapes;
    };
    Nearby nearby(const QRectF& region) const;
    double cost(const QRectF& box, const Nearby& near, double bound) const;  // infinite once past `bound`

    QRectF area_;
    QFont font_;
    std::vector<QPainterPath> shapes_;
    std::vector<QRectF> boxes_;
    std::vector<QLineF> lines_;
    std::vector<Placed> placed_;
};

}  // namespace clevis::ui
