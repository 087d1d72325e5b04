#include "ui/shell/units_menu.h"

#include "ui/shell/display_units.h"

#include <QActionGroup>
#include <QMenu>

#include <vector>

namespace clevis::ui {
namespace {

template <typename E>
void addGroup(QMenu* menu, const QString& title, const std::vector<std::pair<QString, E>>& choices, E current,
              void (DisplayUnits::*set)(E))
{
    menu->addSection(title);
    auto* group = new QActionGroup(menu);
    for (const auto& [label, value] : choices) {
        QAction* a = menu->addAction(label);
        a->setCheckable(true);
        a->setChecked(value == current);
        group->addAction(a);
        QObject::connect(a, &QAction::triggered, menu,
                         [set, value = value] { (DisplayUnits::instance().*set)(value); });
    }
}

}  // namespace

QMenu* createUnitsMenu(QWidget* parent)
{
    auto* menu = new QMenu(QObject::tr("&Units"), parent);
    menu->setObjectName(QStringLiteral("unitsMenu"));
    DisplayUnits& u = DisplayUnits::instance();
    using L = DisplayUnits::Length;
    using F = DisplayUnits::Force;
    using T = DisplayUnits::Torque;
    addGroup<L>(menu, QObject::tr("Length"), {{"mm", L::Millimetre}, {"m", L::Metre}, {"in", L::Inch}}, u.length(),
                &DisplayUnits::setLength);
    addGroup<F>(menu, QObject::tr("Force"), {{"N", F::Newton}, {"kN", F::Kilonewton}, {"lbf", F::PoundForce}},
                u.force(), &DisplayUnits::setForce);
    addGroup<T>(menu, QObject::tr("Torque"),
                {{QStringLiteral("N·m"), T::NewtonMetre}, {QStringLiteral("lbf·in"), T::PoundForceInch}}, u.torque(),
                &DisplayUnits::setTorque);
    using P = DisplayUnits::Pressure;
    addGroup<P>(menu, QObject::tr("Pressure"),
                {{"bar", P::Bar}, {"MPa", P::Megapascal}, {"psi", P::PoundForcePerSquareInch}}, u.pressure(),
                &DisplayUnits::setPressure);
    return menu;
}

}  // namespace clevis::ui
