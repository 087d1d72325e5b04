// Draws a moving body from pin to pin: a bar after two clicks, or a plate
// through three or more pins, closed with Enter, a double click or a click on
// its first pin. Clicking where there is no pin puts a new one there.
// After a click, digits typed open a small input for the next pin: its
// distance in display units, Tab, its angle in degrees counter-clockwise from
// +x (the pointer's direction if left empty); Return places it exactly there.
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
    bool type(int key, const QString& text) override;
    bool typing() const override { return typed_.has_value(); }
    void paintPreview(QPainter& p) const override;

private:
    struct TypedEnd {
        QString length, angle;
        bool onAngle = false;  // Tab switches between the two fields
    };
    void place(const SnapResult& at);
    void placeTyped();
    std::optional<Vec2> typedPoint() const;
    void commit();
    void tellJoins(const std::string& body, std::size_t jointsBefore);

    Shape shape_;
    std::vector<SnapResult> points_;
    std::optional<SnapResult> hover_;
    std::optional<TypedEnd> typed_;
};

}  // namespace clevis::ui
