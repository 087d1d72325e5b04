#include "core/results/number_text.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>

namespace clevis {
namespace {

// Plain decimals read well from 0.001 up to this; beyond, scientific.
constexpr double kSmallestPlain = 1e-3, kLargestPlain = 1e9;
// Percentages smaller than this are not worth their digits.
constexpr double kSmallestPercent = 1e-6;

std::string printf1(const char* format, int precision, double value)
{
    char text[64];
    std::snprintf(text, sizeof text, format, precision, value);
    return text;
}

// Rounding through the scientific form settles the exponent (9999.7 → 1.000e+04).
double roundSignificant(double value, int digits)
{
    return std::strtod(printf1("%.*e", digits - 1, value).c_str(), nullptr);
}

// A rounded value in plain decimals, showing exactly `digits` significant figures.
std::string plain(double rounded, int digits)
{
    const int exponent = int(std::floor(std::log10(std::abs(rounded))));
    return printf1("%.*f", std::max(0, digits - 1 - exponent), rounded);
}

}  // namespace

std::string significant(double value, int digits)
{
    if (!std::isfinite(value)) return std::isnan(value) ? "n/a" : (value > 0 ? "inf" : "-inf");
    const double rounded = roundSignificant(value, digits);
    if (rounded == 0.0) return "0";
    const double magnitude = std::abs(rounded);
    if (magnitude < kSmallestPlain || magnitude >= kLargestPlain) return printf1("%.*e", digits - 1, rounded);
    return plain(rounded, digits);
}

std::string percent(double fraction)
{
    const double rounded = roundSignificant(fraction * 100.0, 2);
    if (rounded == 0.0) return "0 %";
    if (std::abs(rounded) < kSmallestPercent) return "less than 0.000001 %";
    return plain(rounded, 2) + " %";
}

}  // namespace clevis
