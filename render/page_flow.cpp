#include "render/page_flow.h"

#include "render/palette.h"

#include <QFontMetricsF>
#include <QPdfWriter>

#include <algorithm>

namespace clevis::ui {
namespace {

constexpr double kPageWidth = 595.0, kPageHeight = 842.0;  // A4 in points
constexpr double kMargin = 40.0, kFooter = 24.0;

double bottom() { return kPageHeight - kMargin - kFooter; }

}  // namespace

std::vector<double> tableColumnWidths(const std::vector<QStringList>& rows, const std::vector<double>& shares,
                                      double width)
{
    const QFontMetricsF headFont(reportFont(kTableFont, true)), bodyFont(reportFont(kTableFont));
    std::vector<double> given(shares.size()), need(shares.size(), 0.0);
    for (std::size_t c = 0; c < shares.size(); ++c) given[c] = shares[c] * width;
    for (std::size_t r = 0; r < rows.size(); ++r)
        for (std::size_t c = 0; c < shares.size() && c < std::size_t(rows[r].size()); ++c)
            need[c] = std::max(need[c], (r == 0 ? headFont : bodyFont).horizontalAdvance(rows[r][int(c)]) + kCellGap);
    double deficit = 0, spare = 0;
    for (std::size_t c = 0; c < given.size(); ++c) {
        deficit += std::max(0.0, need[c] - given[c]);
        spare += std::max(0.0, given[c] - need[c]);
    }
    if (deficit == 0) return given;
    const double taken = std::min(deficit, spare);
    std::vector<double> out(given.size());
    for (std::size_t c = 0; c < given.size(); ++c)
        out[c] = need[c] > given[c] ? given[c] + (need[c] - given[c]) * taken / deficit
                 : spare > 0        ? given[c] - (given[c] - need[c]) * taken / spare
                                    : given[c];
    return out;
}

QFont reportFont(int pixels, bool bold)
{
    QFont f("DejaVu Sans");
    f.setPixelSize(pixels);
    f.setBold(bold);
    return f;
}

PageFlow::PageFlow(QPdfWriter& writer, QPainter& painter, QString footer)
    : writer_(writer), painter_(painter), footer_(std::move(footer)), y_(kMargin)
{
    painter_.scale(writer_.resolution() / 72.0, writer_.resolution() / 72.0);
}

double PageFlow::width() const { return kPageWidth - 2 * kMargin; }

double PageFlow::pageHeight() const { return bottom() - kMargin; }

void PageFlow::footer()
{
    painter_.save();
    painter_.setFont(reportFont(8));
    painter_.setPen(palette::groundHatch());
    painter_.drawText(QRectF(kMargin, kPageHeight - kMargin - 10, width(), 12), Qt::AlignLeft, footer_);
    painter_.drawText(QRectF(kMargin, kPageHeight - kMargin - 10, width(), 12), Qt::AlignRight,
                      QString("page %1").arg(page_));
    painter_.restore();
}

void PageFlow::newPage()
{
    footer();
    writer_.newPage();
    ++page_;
    y_ = kMargin;
}

void PageFlow::ensure(double height)
{
    if (y_ + height > bottom() && y_ > kMargin + 1) newPage();
}

void PageFlow::heading(const QString& text)
{
    ensure(160);
    if (y_ > kMargin + 1) y_ += 10;
    painter_.setFont(reportFont(16, true));
    painter_.setPen(palette::ink());
    painter_.drawText(QPointF(kMargin, y_ + 16), text);
    painter_.setPen(QPen(palette::link(), 1.2));
    painter_.drawLine(QPointF(kMargin, y_ + 22), QPointF(kMargin + width(), y_ + 22));
    y_ += 34;
}

void PageFlow::subheading(const QString& text)
{
    ensure(60);
    painter_.setFont(reportFont(11, true));
    painter_.setPen(palette::ink());
    painter_.drawText(QPointF(kMargin, y_ + 11), text);
    y_ += 18;
}

void PageFlow::paragraph(const QString& text, const QColor& colour, bool bold)
{
    const QFont f = reportFont(9, bold);
    const QRectF box = QFontMetricsF(f).boundingRect(QRectF(0, 0, width(), 10000), Qt::TextWordWrap, text);
    ensure(box.height() + 6);
    painter_.setFont(f);
    painter_.setPen(colour.isValid() ? colour : palette::ink());
    painter_.drawText(QRectF(kMargin, y_, width(), box.height() + 2), Qt::TextWordWrap, text);
    y_ += box.height() + 6;
}

void PageFlow::table(const std::vector<QStringList>& rows, const std::vector<double>& columns,
                     const std::function<QColor(int, int)>& shade)
{
    constexpr double kRow = 13.0;
    const std::vector<double> widths = tableColumnWidths(rows, columns, width());
    const auto drawRow = [&](const QStringList& row, int index) {
        const bool head = index == 0;
        const QFont font = reportFont(kTableFont, head);
        const QFontMetricsF metrics(font);
        painter_.setFont(font);
        painter_.setPen(palette::ink());
        double x = kMargin;
        for (int c = 0; c < row.size() && c < int(widths.size()); ++c) {
            if (const QColor fill = shade ? shade(index, c) : QColor(); fill.isValid())
                painter_.fillRect(QRectF(x - 2, y_ + 0.5, widths[c], kRow - 1), fill);
            const double room = widths[c] - kCellGap;
            painter_.drawText(QRectF(x, y_, room, kRow), Qt::AlignLeft | Qt::AlignVCenter,
                              metrics.elidedText(row[c], Qt::ElideRight, room));
            x += widths[c];
        }
        y_ += kRow;
        painter_.setPen(QPen(head ? palette::groundHatch() : palette::gridMinor(), head ? 0.8 : 0.5));
        painter_.drawLine(QPointF(kMargin, y_), QPointF(kMargin + width(), y_));
    };
    if (rows.empty()) return;
    ensure(3 * kRow);
    drawRow(rows.front(), 0);
    for (std::size_t i = 1; i < rows.size(); ++i) {
        if (y_ + kRow > bottom()) {
            newPage();
            drawRow(rows.front(), 0);  // repeat the heading on the new page
        }
        drawRow(rows[i], int(i));
    }
    y_ += 8;
}

void PageFlow::figure(const Figure& f, double w)
{
    const QSizeF s = f.size();
    const double h = s.height() * w / s.width();
    ensure(h + 6);
    f.paint(painter_, QRectF(kMargin + (width() - w) / 2, y_, w, h));
    y_ += h + 8;
}

}  // namespace clevis::ui
