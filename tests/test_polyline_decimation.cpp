// Curves drawn with only the points a printer can show: what is dropped lies
// within the tolerance of what is kept, and on a circle the count kept is the
// one the sagitta of a chord predicts.
#include "render/polyline_decimation.h"

#include <QImage>
#include <QPainter>
#include <QPdfWriter>
#include <QTemporaryDir>

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <random>

using namespace clevis::ui;

namespace {

constexpr double kPi = 3.14159265358979323846;

double distanceToSegment(QPointF p, QPointF a, QPointF b)
{
    const QPointF ab = b - a;
    const double l2 = QPointF::dotProduct(ab, ab);
    const double t = l2 > 0 ? std::clamp(QPointF::dotProduct(p - a, ab) / l2, 0.0, 1.0) : 0.0;
    const QPointF d = p - a - t * ab;
    return std::hypot(d.x(), d.y());
}

// Every original point lies within `tolerance` of the kept polyline between the
// kept points on either side of it, and the kept points are a subsequence with both ends.
void expectFaithful(const QPolygonF& original, const QPolygonF& kept, double tolerance)
{
    ASSERT_GE(kept.size(), std::min<qsizetype>(2, original.size()));
    EXPECT_EQ(kept.front(), original.front());
    EXPECT_EQ(kept.back(), original.back());
    qsizetype k = 0;  // the kept segment kept[k] → kept[k + 1] spans the current point
    for (qsizetype i = 0; i < original.size(); ++i) {
        if (k + 1 < kept.size() && original[i] == kept[k + 1] && i > 0) ++k;
        if (k + 1 < kept.size())
            EXPECT_LE(distanceToSegment(original[i], kept[k], kept[k + 1]), tolerance * (1 + 1e-12)) << "point " << i;
    }
    EXPECT_EQ(k + 1, kept.size()) << "the kept points are not a subsequence of the original";
}

}  // namespace

// A closed circle of N = 4096 points (a power of two, so every split falls on
// a sample): each split halves the arcs, and a chord over an arc of 2θ on a
// circle of radius R stands R(1 − cos θ) from the arc's middle (the sagitta,
// circle geometry). So the loop keeps 2^k segments, k the least with
// R(1 − cos(π / 2^k)) ≤ tolerance.
TEST(PolylineDecimation, CircleKeepsTheSegmentsTheSagittaAllows)
{
    constexpr int kPoints = 4096;
    constexpr double kRadius = 100.0;
    for (const double tolerance : {0.025, 0.3, 2.0}) {
        QPolygonF circle;
        for (int i = 0; i <= kPoints; ++i)
            circle << QPointF(kRadius * std::cos(2 * kPi * i / kPoints), kRadius * std::sin(2 * kPi * i / kPoints));
        int k = 1;
        while (kRadius * (1 - std::cos(kPi / (1 << k))) > tolerance) ++k;
        const QPolygonF kept = decimatedPolyline(circle, tolerance);
        EXPECT_EQ(kept.size(), (1 << k) + 1) << "tolerance " << tolerance;
        expectFaithful(circle, kept, tolerance);
    }
}

TEST(PolylineDecimation, RandomWalksStayWithinTheTolerance)
{
    std::mt19937 random(14);
    std::normal_distribution<double> step(0.0, 1.0);
    for (const double tolerance : {0.0, 0.01, 0.5, 3.0}) {
        QPolygonF walk{QPointF(0, 0)};
        for (int i = 0; i < 2000; ++i) walk << walk.back() + QPointF(1.0 + 0.2 * step(random), step(random));
        const QPolygonF kept = decimatedPolyline(walk, tolerance);
        expectFaithful(walk, kept, tolerance);
        if (tolerance >= 3.0) EXPECT_LT(kept.size(), walk.size() / 2) << "tolerance " << tolerance;
    }
}

TEST(PolylineDecimation, StraightRunsAndRepeatsCollapse)
{
    QPolygonF line;
    for (int i = 0; i <= 100; ++i) line << QPointF(i * 0.5, 2.0 * i * 0.5 + 1.0);
    line << line.back() << line.back();                    // repeated points, as a curve that stops
    const QPolygonF kept = decimatedPolyline(line, 1e-9);  // rounding puts points a hair off the line
    ASSERT_EQ(kept.size(), 2);
    EXPECT_EQ(kept.front(), line.front());
    EXPECT_EQ(kept.back(), line.back());
    // A corner is kept however small the tolerance's neighbours make it look.
    const QPolygonF corner{{0, 0}, {1, 0}, {2, 0}, {2, 1}, {2, 2}};
    EXPECT_EQ(decimatedPolyline(corner, 0.01), (QPolygonF{{0, 0}, {2, 0}, {2, 2}}));
}

// A quarter of a 600 dpi dot: 1/2400 in, that is 72/2400 = 0.03 pt (1 pt = 1/72 in)
// on a PDF page drawn in points, and 600 / 2400 / 2 px on a 600 dpi image drawn at twice scale.
TEST(PolylineDecimation, ToleranceIsAQuarterOfAPrintersDot)
{
    QTemporaryDir dir;
    QPdfWriter pdf(dir.filePath("t.pdf"));
    pdf.setResolution(300);
    QPainter onPdf(&pdf);
    onPdf.scale(300.0 / 72, 300.0 / 72);
    EXPECT_NEAR(invisibleDeviation(onPdf), 72.0 / 2400, 1e-12);
    onPdf.end();

    QImage image(10, 10, QImage::Format_ARGB32);
    image.setDotsPerMeterX(int(std::lround(600 / 0.0254)));
    image.setDotsPerMeterY(int(std::lround(600 / 0.0254)));
    QPainter onImage(&image);
    onImage.scale(2, 2);
    EXPECT_NEAR(invisibleDeviation(onImage), 600.0 / 2400 / 2, 1e-3);
}
