// Where the pointer is on the canvas, in the display length unit, as the point
// a click would place (after snapping), with what it snapped to. Its width is
// fixed for the longest reading it can show, so moving the pointer never
// resizes the status bar.
#pragma once

#include "ui/canvas/snapping.h"

#include <QLabel>

namespace clevis::ui {

class CursorReadout : public QLabel {
    Q_OBJECT
public:
    explicit CursorReadout(QWidget* parent = nullptr);

    void show(const SnapResult& at);
    void clear();  // the pointer left the canvas

private:
    void fitWidth();
};

}  // namespace clevis::ui
