#include "core/solver/motor_characteristic.h"

#include <algorithm>

namespace clevis {
namespace {

// The straight line through table points k and k + 1, at `speed`.
double onSegment(const MotorTable& t, std::size_t k, double speed)
{
    const double w = (speed - t.speed[k]) / (t.speed[k + 1] - t.speed[k]);
    return t.torque[k] + w * (t.torque[k + 1] - t.torque[k]);
}

}  // namespace

double characteristicTorque(const MotorCharacteristic& c, double speed)
{
    if (const auto* line = std::get_if<MotorLine>(&c)) return line->stallTorque * (1.0 - speed / line->noLoadSpeed);
    const auto& t = std::get<MotorTable>(c);
    if (t.speed.size() == 1) return t.torque.front();
    const auto after = std::upper_bound(t.speed.begin() + 1, t.speed.end() - 1, speed);
    return onSegment(t, std::size_t(after - t.speed.begin()) - 1, speed);
}

double noLoadSpeed(const MotorCharacteristic& c)
{
    if (const auto* line = std::get_if<MotorLine>(&c)) return line->noLoadSpeed;
    const auto& t = std::get<MotorTable>(c);
    for (std::size_t k = 0; k + 1 < t.speed.size(); ++k)
        if (t.torque[k] > 0.0 && t.torque[k + 1] <= 0.0)
            return t.speed[k] + t.torque[k] / (t.torque[k] - t.torque[k + 1]) * (t.speed[k + 1] - t.speed[k]);
    return t.speed.back();
}

}  // namespace clevis
