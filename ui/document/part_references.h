// The other parts a driver or a load refers to, listed once per kind. The edits
// that follow a part (moving a pin, removing or renaming a part) go through
// these, so a new load kind is described here and every edit handles it.
#pragma once

#include "core/model/mechanism.h"

#include <string>
#include <type_traits>
#include <variant>

namespace clevis::ui {

// What a referenced name is the name of.
enum class PartKind { Body, Joint, Driver };

// Calls visit(kind, name, at) for every reference the load holds. `at` is the
// place on the body for a point reference (a force's point, a spring's ends)
// and null for a reference by name alone (a torque's body, a torsion spring's
// pin, the driver a profile follows). AnyLoad is Load or const Load.
template <class AnyLoad, class Visitor>
requires std::is_same_v<std::remove_const_t<AnyLoad>, Load>
void visitReferences(AnyLoad& load, Visitor&& visit)
{
    std::visit(
        [&](auto& l) {
            using Kind = std::remove_cvref_t<decltype(l)>;
            if constexpr (std::is_same_v<Kind, ForceLoad>) {
                visit(PartKind::Body, l.point.body, &l.point.at);
                if (l.profile) visit(PartKind::Driver, l.profile->driver, nullptr);
            } else if constexpr (std::is_same_v<Kind, TorqueLoad>) {
                visit(PartKind::Body, l.body, nullptr);
                if (l.profile) visit(PartKind::Driver, l.profile->driver, nullptr);
            } else if constexpr (std::is_same_v<Kind, SpringLoad> || std::is_same_v<Kind, DamperLoad>) {
                visit(PartKind::Body, l.a.body, &l.a.at);
                visit(PartKind::Body, l.b.body, &l.b.at);
            } else {
                static_assert(std::is_same_v<Kind, TorsionSpringLoad>, "list the references of the new load kind here");
                visit(PartKind::Joint, l.joint, nullptr);
            }
        },
        load);
}

// The same for a driver: the joint it acts at, or the two points a cylinder joins.
template <class AnyDriver, class Visitor>
requires std::is_same_v<std::remove_const_t<AnyDriver>, Driver>
void visitReferences(AnyDriver& driver, Visitor&& visit)
{
    visit(PartKind::Joint, driver.joint, nullptr);
    for (auto& end : driver.ends)
        if (end) visit(PartKind::Body, end->body, &end->at);
}

// Whether a driver or load refers to the part; a point on a body refers to the body.
template <class Item>
bool refersTo(const Item& item, PartKind kind, const std::string& name)
{
    bool found = false;
    visitReferences(item,
                    [&](PartKind k, const std::string& n, const Vec2*) { found = found || (k == kind && n == name); });
    return found;
}

template <class Item>
void renameReferences(Item& item, PartKind kind, const std::string& from, const std::string& to)
{
    visitReferences(item, [&](PartKind k, std::string& n, Vec2*) {
        if (k == kind && n == from) n = to;
    });
}

}  // namespace clevis::ui
