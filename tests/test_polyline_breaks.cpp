// A polyline with a break (a point that is not finite, as a plotted curve
// has where a value is missing) keeps the break, and each run either side of
// it is decimated alone: the line is not joined across the gap.
#include "render/polyline_decimation.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>

using namespace clevis::ui;

namespace {

TEST(PolylineBreaks, ABreakIsKeptAndEachRunDecimatedAlone)
{
    const double gap = std::numeric_limits<double>::quiet_NaN();
    const QPolygonF line{{0, 0}, {1, 0}, {2, 0}, {gap, gap}, {3, 0}, {4, 0.5}, {5, 0}};
    const QPolygonF kept = decimatedPolyline(line, 0.1);
    ASSERT_EQ(kept.size(), 6);
    EXPECT_EQ(kept[0], QPointF(0, 0));
    EXPECT_EQ(kept[1], QPointF(2, 0));  // (1, 0) lies on the run's line
    EXPECT_TRUE(std::isnan(kept[2].x()) && std::isnan(kept[2].y()));
    EXPECT_EQ(kept[3], QPointF(3, 0));
    EXPECT_EQ(kept[4], QPointF(4, 0.5));  // 0.5 off the run's line, beyond the tolerance
    EXPECT_EQ(kept[5], QPointF(5, 0));
}

TEST(PolylineBreaks, BreaksAtTheEndsAndSideBySideAreKept)
{
    const double gap = std::numeric_limits<double>::quiet_NaN();
    const QPolygonF line{{gap, 0}, {0, 0}, {1, 0}, {2, 0}, {gap, 0}, {gap, 0}, {3, 0}};
    const QPolygonF kept = decimatedPolyline(line, 0.1);
    ASSERT_EQ(kept.size(), 6);
    EXPECT_TRUE(std::isnan(kept[0].x()));
    EXPECT_EQ(kept[1], QPointF(0, 0));
    EXPECT_EQ(kept[2], QPointF(2, 0));
    EXPECT_TRUE(std::isnan(kept[3].x()) && std::isnan(kept[4].x()));
    EXPECT_EQ(kept[5], QPointF(3, 0));
}

}  // namespace
