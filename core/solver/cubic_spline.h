// Natural cubic spline through (x, y) points: continuous position, slope and
// curvature; held at the end values (zero slope) outside the table.
#pragma once

#include <vector>

namespace clevis {

class CubicSpline {
public:
    struct Value {
        double y, dy, ddy;
    };
    CubicSpline() = default;
    CubicSpline(std::vector<double> x, std::vector<double> y);  // x strictly increasing, 2+ points
    Value operator()(double x) const;

private:
    std::vector<double> x_, y_, ddy_;  // ddy_: second derivatives at the knots
};

}  // namespace clevis
