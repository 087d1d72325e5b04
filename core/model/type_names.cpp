#include "core/model/type_names.h"

namespace clevis {

const char* jointTypeName(JointType type) { return nameOf(kJointTypes, type); }

const char* camLawName(CamLaw law)
{
    for (const MotionLaw& l : kMotionLaws)
        if (l.kind == LawKind::Rise && l.cam == law) return l.name;
    return "";
}

const char* jointKindWord(JointType type)
{
    switch (type) {
    case JointType::Slider: return "slider";
    case JointType::PinInSlot: return "pin in slot";
    case JointType::Pin: break;
    }
    return "pin";
}

}  // namespace clevis
