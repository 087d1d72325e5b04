// Text, tables and figures laid down the pages of a PDF one after another,
// breaking pages where the next item does not fit, with a running footer.
// Works in points on A4.
#pragma once

#include "render/figure_export.h"

#include <QColor>
#include <QPainter>
#include <QStringList>

#include <functional>
#include <vector>

class QPdfWriter;

namespace clevis::ui {

class PageFlow {
public:
    PageFlow(QPdfWriter& writer, QPainter& painter, QString footer);

    double width() const;               // content width, pt
    double pageHeight() const;          // content height of a page, pt
    void heading(const QString& text);  // a numbered section starts a new page when little room is left
    void subheading(const QString& text);
    void paragraph(const QString& text, const QColor& colour = QColor(), bool bold = false);
    // Columns as fractions of the content width, widened where a column's
    // text needs more and another can spare it; the first row is the heading.
    // `shade` (row, column), row 0 the heading, gives a cell's background;
    // an invalid colour leaves it plain.
    void table(const std::vector<QStringList>& rows, const std::vector<double>& columns,
               const std::function<QColor(int, int)>& shade = {});
    void figure(const Figure& f, double width);
    void space(double points) { y_ += points; }
    void newPage();
    // Starts a new page unless `height` points still fit (keeps a caption with its figure).
    void keep(double height) { ensure(height); }
    void finish() { footer(); }  // the last page's footer
    int page() const { return page_; }

private:
    void ensure(double height);
    void footer();

    QPdfWriter& writer_;
    QPainter& painter_;
    QString footer_;
    double y_ = 0;
    int page_ = 1;
};

QFont reportFont(int pixels, bool bold = false);

// A table's column widths in points: the shares of `width`, widened where a
// column's longest text (the first row in bold, as drawn) needs more, the room
// taken from the columns with some to spare, in proportion to what they
// spare. Where the width cannot hold every text, the short columns share what
// there is and their texts are shortened with "…" when drawn, never cut off
// unseen.
std::vector<double> tableColumnWidths(const std::vector<QStringList>& rows, const std::vector<double>& shares,
                                      double width);
inline constexpr int kTableFont = 8;     // px, a table's text
inline constexpr double kCellGap = 4.0;  // pt between a cell's text and the next column

}  // namespace clevis::ui
