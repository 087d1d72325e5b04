// Tools drawn with two clicks: sliders and slots (a point, then the axis),
// springs, dampers and cylinders (end to end), forces (the point, then the
// direction it pushes). Each is a function editing a trial copy of the
// mechanism, returning the undo text or setting `problem`.
#pragma once

#include "ui/canvas/tools/tool.h"

#include <functional>

namespace clevis::ui {

struct ClickedPoint {
    SnapResult snap;
    std::string body;  // the body drawn under the click, or "ground"
};

using TwoPointEdit = std::function<QString(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem)>;

class TwoPointTool : public Tool {
public:
    TwoPointTool(ToolHost& host, QString firstHint, QString secondHint, TwoPointEdit edit)
        : Tool(host), hints_{std::move(firstHint), std::move(secondHint)}, edit_(std::move(edit))
    {
    }
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

QString drawSlider(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawSlot(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawSpring(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawDamper(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawCylinder(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);
QString drawForce(Mechanism& m, const ClickedPoint& a, const ClickedPoint& b, QString& problem);

}  // namespace clevis::ui
