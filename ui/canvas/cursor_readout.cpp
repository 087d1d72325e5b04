#include "ui/canvas/cursor_readout.h"

#include "ui/shell/display_units.h"

namespace clevis::ui {

namespace {

QString reading(const SnapResult& at)
{
    const DisplayUnits& u = DisplayUnits::instance();
    const int decimals = u.lengthDecimals();
    // +0.0 turns a −0 from the view's arithmetic into 0.
    const QString xy = QObject::tr("x %1  y %2 %3")
                           .arg(u.lengthFromSi(at.point.x()) + 0.0, 0, 'f', decimals)
                           .arg(u.lengthFromSi(at.point.y()) + 0.0, 0, 'f', decimals)
                           .arg(u.lengthSymbol());
    const QString snapped = at.describe();
    return snapped.isEmpty() ? xy : QObject::tr("%1 (%2)").arg(xy, snapped);
}

}  // namespace

CursorReadout::CursorReadout(QWidget* parent) : QLabel(parent)
{
    setObjectName(QStringLiteral("cursorReadout"));
    setToolTip(tr("The point a click places, after snapping"));
    fitWidth();
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, [this] {
        fitWidth();
        clear();
    });
}

// Room for a reading 100 m from the origin, so moving never changes the width.
void CursorReadout::fitWidth()
{
    SnapResult widest;
    widest.point = {-88.8888, -88.8888};
    widest.kind = SnapResult::Kind::Horizontal;
    setFixedWidth(fontMetrics().horizontalAdvance(reading(widest) + QStringLiteral("  ")));
}

void CursorReadout::show(const SnapResult& at) { setText(reading(at)); }

void CursorReadout::clear() { setText({}); }

}  // namespace clevis::ui
