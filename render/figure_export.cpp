#include "render/figure_export.h"

#include <QFileInfo>
#include <QImage>
#include <QPageSize>
#include <QPainter>
#include <QPdfWriter>
#include <QSvgGenerator>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr double kPngPixelsPerUnit = 2.0;  // sharp enough to paste at print size
constexpr int kPdfDpi = 300;

bool paintTo(QPaintDevice& device, const Figure& figure, const QRectF& target)
{
    QPainter p;
    if (!p.begin(&device)) return false;
    p.setRenderHint(QPainter::Antialiasing);
    p.setRenderHint(QPainter::TextAntialiasing);
    figure.paint(p, target);
    return p.end();
}

}  // namespace

void fitFigure(QPainter& p, const QSizeF& logical, const QRectF& target)
{
    const double s = std::min(target.width() / logical.width(), target.height() / logical.height());
    p.translate(target.center());
    p.scale(s, s);
    p.translate(-logical.width() / 2, -logical.height() / 2);
}

bool exportFigure(const Figure& figure, const QString& path, const QString& title, QString* error)
{
    const QString suffix = QFileInfo(path).suffix().toLower();
    const QSizeF size = figure.size();
    bool ok = false;
    if (suffix == "svg") {
        QSvgGenerator svg;
        svg.setFileName(path);
        svg.setTitle(title);
        svg.setDescription("Clevis");
        svg.setSize(size.toSize());
        svg.setViewBox(QRectF(QPointF(0, 0), size));
        svg.setResolution(72);  // one logical unit per point
        ok = paintTo(svg, figure, QRectF(QPointF(0, 0), size));
    } else if (suffix == "pdf") {
        QPdfWriter pdf(path);
        pdf.setTitle(title);
        pdf.setCreator("Clevis");
        pdf.setResolution(kPdfDpi);
        pdf.setPageSize(QPageSize(size, QPageSize::Point, QString(), QPageSize::ExactMatch));
        pdf.setPageMargins(QMarginsF(0, 0, 0, 0));
        ok = paintTo(pdf, figure, QRectF(0, 0, pdf.width(), pdf.height()));
    } else if (suffix == "png") {
        QImage image((size * kPngPixelsPerUnit).toSize(), QImage::Format_ARGB32_Premultiplied);
        image.fill(Qt::white);
        ok = paintTo(image, figure, QRectF(QPointF(0, 0), QSizeF(image.size()))) && image.save(path, "PNG");
    } else {
        if (error) *error = QString("%1: unknown export format \"%2\" (use .svg, .pdf or .png)").arg(path, suffix);
        return false;
    }
    if (!ok && error) *error = QString("%1: could not be written").arg(path);
    return ok;
}

}  // namespace clevis::ui
