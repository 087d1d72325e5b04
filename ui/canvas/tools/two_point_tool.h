// A tool drawn with two clicks (its edits are in two_point_edits.h): the first
// click is remembered, the second hands both points to the edit.
#pragma once

#include "ui/canvas/tools/tool.h"

#include <functional>

namespace clevis::ui {

struct ClickedPoint {
    SnapResult snap;
    std::string body;  // the body drawn under the click, or "ground"
};

using TwoPointEdit =
    std::function<QString(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)>;

class TwoPointTool : public Tool {
public:
    TwoPointTool(ToolHost& host, QString firstHint, QString secondHint, TwoPointEdit edit)
        : Tool(host), hints_{std::move(firstHint), std::move(secondHint)}, edit_(std::move(edit))
    {}
    QString hint() const override { return first_ ? hints_[1] : hints_[0]; }
    std::optional<Vec2> strokeStart() const override;
    void press(const Pointer& p) override;
    void move(const Pointer& p) override;
    bool cancel() override;
    void paintPreview(QPainter& p) const override;

private:
    QString hints_[2];
    TwoPointEdit edit_;
    std::optional<ClickedPoint> first_;
    std::optional<Vec2> hover_;
};

}  // namespace clevis::ui
