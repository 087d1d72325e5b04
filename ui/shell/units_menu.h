// The "Units" menu: length, force and torque units for display and typing.
#pragma once

class QMenu;
class QWidget;

namespace clevis::ui {

QMenu* createUnitsMenu(QWidget* parent);

}  // namespace clevis::ui
