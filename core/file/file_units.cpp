#include "core/file/file_units.h"

#include "core/model/geometry.h"

#include <charconv>
#include <cmath>
#include <limits>

namespace clevis {
namespace {

// A few representable neighbours either side of the plain conversion cover
// the rounding of the conversion and of its inverse.
constexpr int kNeighbours = 4;

}  // namespace

std::string shortestDecimal(double v)
{
    char buffer[32];
    return std::string(buffer, std::to_chars(buffer, buffer + sizeof buffer, v).ptr);
}

double toSi(FileUnit unit, double fileValue)
{
    switch (unit) {
    case FileUnit::Degree: return degToRad(fileValue);
    case FileUnit::Rpm: return fileValue * kPi / 30.0;
    case FileUnit::Si: break;
    }
    return fileValue;
}

double fromSi(FileUnit unit, double si)
{
    if (unit == FileUnit::Si) return si;
    const double plain = si / toSi(unit, 1.0);
    if (!std::isfinite(plain)) return plain;
    const double inf = std::numeric_limits<double>::infinity();
    double candidate = plain;
    for (int i = 0; i < kNeighbours; ++i) candidate = std::nextafter(candidate, -inf);
    // The plain conversion wins ties, which also keeps 0 from becoming -0.
    double best = plain;
    std::size_t bestLength =
        toSi(unit, plain) == si ? shortestDecimal(plain).size() : std::numeric_limits<std::size_t>::max();
    for (int i = 0; i <= 2 * kNeighbours; ++i, candidate = std::nextafter(candidate, inf)) {
        const std::size_t length = shortestDecimal(candidate).size();
        if (toSi(unit, candidate) == si && length < bestLength) {
            best = candidate;
            bestLength = length;
        }
    }
    return best;
}

}  // namespace clevis
