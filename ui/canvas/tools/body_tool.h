// Draws a moving body from pin to pin: a bar after two clicks, or a plate
// through three or more pins, closed with Enter, a double click or a click on
// its first pin. Clicking where there is no pin puts a new one there.
#pragma once

#include "ui/canvas/tools/tool.h"

#include <vector>

namespace clevis::ui {

class BodyTool : public Tool {
public:
    enum class Shape { Bar, Plate };
    BodyTool(ToolHost& host, Shape shape) : Tool(host), shape_(shape) {}

    QString hint() const override;
    std::optional<Vec2> strokeStart() const override;
    void press(const Pointer& p) override;
    void move(const Pointer& p) override;
    void finish() override;
    bool cancel() override;
    void paintPreview(QPainter& p) const override;

private:
    void commit();

    Shape shape_;
    std::vector<SnapResult> points_;
    std::optional<SnapResult> hover_;
};

}  // namespace clevis::ui
