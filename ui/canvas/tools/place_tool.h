// A tool that acts on one click: ground pin, pin, motor, torque, point mass
// (their edits are in place_edits.h). It hands its edit the snapped point and
// the body under the pointer.
#pragma once

#include "ui/canvas/tools/tool.h"

#include <functional>

namespace clevis::ui {

using PlaceEdit =
    std::function<QString(Mechanism& m, const SnapResult& at, const std::string& bodyUnder, QString& problem)>;

class PlaceTool : public Tool {
public:
    PlaceTool(ToolHost& host, QString hint, PlaceEdit edit) : Tool(host), hint_(std::move(hint)), edit_(std::move(edit))
    {}
    QString hint() const override { return hint_; }
    void press(const Pointer& p) override;
    void move(const Pointer& p) override;
    void paintPreview(QPainter& p) const override;

private:
    QString hint_;
    PlaceEdit edit_;
    std::optional<Vec2> hover_;
};

}  // namespace clevis::ui
