// The version, keys and units shared by the mechanism file reader and writer;
// the words for joint and driver types and motion laws are the model's
// (core/model/type_names.h).
#pragma once

#include "core/file/file_units.h"
#include "core/model/type_names.h"

namespace clevis {

inline constexpr int kFileVersion = 1;

// A file key and the unit its value is written in. Rotary drivers write
// their coordinate in degrees and rpm, linear ones in metres; the keys carry
// the unit.
struct KeyWithUnit {
    const char* name;
    FileUnit unit;
};
struct DriverKeys {
    KeyWithUnit offset;        // position at the drawn pose
    KeyWithUnit speed, accel;  // constant speed
    KeyWithUnit from, to;      // rise
    KeyWithUnit position;      // table
    KeyWithUnit profileAt;     // load profile over this driver's position
};
inline constexpr DriverKeys kRotaryKeys{{"angle_deg", FileUnit::Degree},    {"speed_rpm", FileUnit::Rpm},
                                        {"accel_deg_s2", FileUnit::Degree}, {"from_deg", FileUnit::Degree},
                                        {"to_deg", FileUnit::Degree},       {"position_deg", FileUnit::Degree},
                                        {"at_deg", FileUnit::Degree}};
inline constexpr DriverKeys kLinearKeys{{"position", FileUnit::Si}, {"speed", FileUnit::Si}, {"accel", FileUnit::Si},
                                        {"from", FileUnit::Si},     {"to", FileUnit::Si},    {"position", FileUnit::Si},
                                        {"at", FileUnit::Si}};

inline constexpr KeyWithUnit kTorsionFreeAngle{"free_angle_deg", FileUnit::Degree};

// A motor's speeds, at the motor shaft: "no_load_rpm" and a table's "rpm".
inline constexpr KeyWithUnit kMotorSpeed{"rpm", FileUnit::Rpm};
inline constexpr KeyWithUnit kMotorNoLoadSpeed{"no_load_rpm", FileUnit::Rpm};

inline constexpr Named<FlywheelShaft> kFlywheelShafts[] = {{"output", FlywheelShaft::Output},
                                                           {"motor", FlywheelShaft::Motor}};

inline const DriverKeys& driverKeysOf(DriverType type)
{
    return type == DriverType::Rotary ? kRotaryKeys : kLinearKeys;
}

inline const Driver* findDriver(const std::vector<Driver>& drivers, const std::string& name)
{
    for (const Driver& d : drivers)
        if (d.name == name) return &d;
    return nullptr;
}

}  // namespace clevis
