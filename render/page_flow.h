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
    // Columns as fractions of the content width; the first row is the heading.
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

}  // namespace clevis::ui
