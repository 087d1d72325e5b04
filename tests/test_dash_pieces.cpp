// The plot curves' dashes cut by hand (render/dash_pieces.h) against Qt's own
// dash stroker, the outside reference: the same pieces on a straight line,
// and the same picture on a curve for every curve pen.
#include "render/dash_pieces.h"
#include "render/palette.h"
#include "render/plot_panes.h"

#include <QImage>
#include <QPainter>

#include <gtest/gtest.h>

#include <cmath>

using namespace clevis::ui;

namespace {

// A curve of many short segments, as a plot of a cycle has, with a sharp peak.
QVector<QPointF> wave()
{
    QVector<QPointF> points;
    for (int i = 0; i <= 360; ++i) {
        const double x = 10 + i * 1.7;
        points.append({x, 60 + 40 * std::sin(i * M_PI / 90) + (i == 200 ? -30 : 0)});
    }
    return points;
}

QImage drawn(const std::function<void(QPainter&)>& draw)
{
    QImage image(640, 120, QImage::Format_ARGB32_Premultiplied);
    image.fill(Qt::white);
    QPainter p(&image);
    p.setRenderHint(QPainter::Antialiasing);
    draw(p);
    return image;
}

}  // namespace

// Qt's pattern is in pen widths: {5, 3} at 2 px is 10 on, 6 off.
TEST(DashPieces, StraightLineFollowsQtsPattern)
{
    QPen pen(Qt::black, 2, Qt::SolidLine, Qt::FlatCap);
    pen.setDashPattern({5, 3});
    const QVector<QLineF> pieces = dashPieces({{0, 0}, {5, 0}, {40, 0}}, pen);
    // The first dash is cut at the vertex at 5 and goes on past it.
    const QVector<QLineF> expected{{0, 0, 5, 0}, {5, 0, 10, 0}, {16, 0, 26, 0}, {32, 0, 40, 0}};
    EXPECT_EQ(pieces, expected);
    EXPECT_EQ(dashPieces({{0, 0}, {5, 0}, {5, 5}}, QPen(Qt::black, 2)).size(), 2);  // solid: each segment whole
}

TEST(DashPieces, BreakRestartsThePattern)
{
    QPen pen(Qt::black, 1, Qt::SolidLine, Qt::FlatCap);
    pen.setDashPattern({4, 4});
    const QVector<QLineF> pieces = dashPieces({{0, 0}, {6, 0}, {NAN, NAN}, {0, 1}, {6, 1}}, pen);
    ASSERT_EQ(pieces.size(), 2);
    EXPECT_EQ(pieces[0], QLineF(0, 0, 4, 0));
    EXPECT_EQ(pieces[1], QLineF(0, 1, 4, 1));
}

// Every curve pen of the plots, drawn by Qt as one dashed polyline and here as
// solid pieces: the pictures may differ only by antialiasing at the joints.
TEST(DashPieces, SamePictureAsQtsStroker)
{
    const QVector<QPointF> line = wave();
    for (int i = 0; i < clevis::ui::palette::kCurveStyles; ++i) {
        const QPen pen = curvePen(i);
        const QImage qt = drawn([&](QPainter& p) {
            p.setPen(pen);
            p.drawPolyline(line.data(), int(line.size()));
        });
        const QImage cut = drawn([&](QPainter& p) {
            QPen solid = pen;
            solid.setStyle(Qt::SolidLine);
            p.setPen(solid);
            p.drawLines(dashPieces(line, pen));
        });
        int inked = 0, differing = 0;
        for (int y = 0; y < qt.height(); ++y)
            for (int x = 0; x < qt.width(); ++x) {
                const int a = qGray(qt.pixel(x, y)), b = qGray(cut.pixel(x, y));
                inked += a < 200 || b < 200;
                differing += std::abs(a - b) > 64;
            }
        ASSERT_GT(inked, 200) << "pen " << i;
        EXPECT_LT(differing, inked / 50) << "pen " << i << ": " << differing << " of " << inked << " pixels differ";
    }
}
