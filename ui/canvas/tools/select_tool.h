// Picks parts and drags pins; the links on a pin follow because they are
// drawn between their pins. A whole drag is one undo step, and a drag
// cancelled with Esc leaves none. Hovering over a compound pin lists what
// meets there.
#pragma once

#include "ui/canvas/tools/tool.h"

namespace clevis::ui {

class SelectTool : public Tool {
public:
    using Tool::Tool;
    QString hint() const override;
    void press(const Pointer& p) override;
    void move(const Pointer& p) override;
    void release(const Pointer& p) override;
    bool cancel() override;

private:
    struct Drag {
        int joint;        // index of the pin being dragged
        Mechanism start;  // as it was when the drag began, for Esc
    };
    void applyToDrag(const std::function<void(Mechanism&)>& edit);
    void showCompoundPin(const QPointF& screen);

    std::optional<Drag> drag_;
    bool overCompound_ = false;  // the status line lists a compound pin's bodies
};

}  // namespace clevis::ui
