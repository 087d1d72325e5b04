// A drawing with a natural size that can be painted into any rectangle, and
// its export to SVG, PDF or PNG chosen by the file's suffix.
#pragma once

#include <QRectF>
#include <QSizeF>
#include <QString>

class QPainter;

namespace clevis::ui {

class Figure {
public:
    virtual ~Figure() = default;
    virtual QSizeF size() const = 0;  // logical units (1 unit = 1 pt on paper)
    virtual void paint(QPainter& p, const QRectF& target) const = 0;
};

// Writes `figure` to `path` (.svg, .pdf or .png); false with a message naming
// the file when the suffix is unknown or the file cannot be written.
bool exportFigure(const Figure& figure, const QString& path, const QString& title, QString* error);

// Maps the figure's logical rectangle onto `target`, keeping its shape, centred.
void fitFigure(QPainter& p, const QSizeF& logical, const QRectF& target);

}  // namespace clevis::ui
