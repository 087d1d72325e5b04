// The words for the model's joint types, driver types and motion laws: the
// keywords of the mechanism file and the names people read in the summary,
// the report and the parts list. Kept in the model, so that everything
// downstream uses one vocabulary without depending on the file format.
#pragma once

#include "core/model/mechanism.h"

#include <cstddef>

namespace clevis {

template <class E>
struct Named {
    const char* name;
    E value;
};

template <class E, std::size_t N>
const char* nameOf(const Named<E> (&names)[N], E value)
{
    for (const auto& n : names)
        if (n.value == value) return n.name;
    return "";
}

inline constexpr Named<JointType> kJointTypes[] = {
    {"pin", JointType::Pin}, {"slider", JointType::Slider}, {"pin_in_slot", JointType::PinInSlot}};

inline constexpr Named<DriverType> kDriverTypes[] = {{"rotary", DriverType::Rotary}, {"linear", DriverType::Linear}};

// A motion's "law" selects the Motion alternative and, for a rise, the CamLaw.
enum class LawKind { ConstantSpeed, Rise, Table };
struct MotionLaw {
    const char* name;
    LawKind kind;
    CamLaw cam;  // for rises only
};
inline constexpr MotionLaw kMotionLaws[] = {
    {"constant_speed", LawKind::ConstantSpeed, CamLaw::Cycloidal},
    {"cycloidal", LawKind::Rise, CamLaw::Cycloidal},
    {"polynomial_345", LawKind::Rise, CamLaw::Polynomial345},
    {"modified_trapezoid", LawKind::Rise, CamLaw::ModifiedTrapezoid},
    {"table", LawKind::Table, CamLaw::Cycloidal},
};

const char* jointTypeName(JointType type);
const char* camLawName(CamLaw law);
// "pin", "slider", "pin in slot": the word a message uses for a joint.
const char* jointKindWord(JointType type);

}  // namespace clevis
