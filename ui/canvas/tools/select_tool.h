// Picks parts and drags pins; the links on a pin follow because they are
// drawn between their pins. A whole drag is one undo step.
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
    int dragging_ = -1;  // joint index while a pin is being dragged
    bool moved_ = false;
};

}  // namespace clevis::ui
