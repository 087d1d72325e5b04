#include "core/model/convex_hull.h"

#include <algorithm>

namespace clevis {

// Andrew's monotone chain.
std::vector<Vec2> convexHull(std::vector<Vec2> p)
{
    std::sort(p.begin(), p.end(),
              [](const Vec2& a, const Vec2& b) { return a.x() < b.x() || (a.x() == b.x() && a.y() < b.y()); });
    p.erase(std::unique(p.begin(), p.end(), [](const Vec2& a, const Vec2& b) { return (a - b).norm() < 1e-12; }),
            p.end());
    if (p.size() < 3) return p;
    std::vector<Vec2> hull(2 * p.size());
    std::size_t k = 0;
    for (std::size_t i = 0; i < p.size(); ++i) {
        while (k >= 2 && cross(hull[k - 1] - hull[k - 2], p[i] - hull[k - 2]) <= 0) --k;
        hull[k++] = p[i];
    }
    for (std::size_t i = p.size() - 1, t = k + 1; i > 0; --i) {
        while (k >= t && cross(hull[k - 1] - hull[k - 2], p[i - 1] - hull[k - 2]) <= 0) --k;
        hull[k++] = p[i - 1];
    }
    hull.resize(k - 1);
    return hull;
}

}  // namespace clevis
