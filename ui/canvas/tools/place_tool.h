// Tools that act on one click: ground pin, pin, motor, torque, point mass.
// Each is a function that edits a trial copy of the mechanism and returns the
// undo text, or sets `problem` to say why the click does not fit.
#pragma once

#include "ui/canvas/tools/tool.h"

#include <functional>

namespace clevis::ui {

using PlaceEdit = std::function<QString(Mechanism& m, const SnapResult& at, const std::string& bodyUnder, QString& problem)>;

class PlaceTool : public Tool {
public:
    PlaceTool(ToolHost& host, QString hint, PlaceEdit edit) : Tool(host), hint_(std::move(hint)), edit_(std::move(edit)) {}
    QString hint() const override { return hint_; }
    void press(const Pointer& p) override;
    void move(const Pointer& p) override;
    void paintPreview(QPainter& p) const override;

private:
    QString hint_;
    PlaceEdit edit_;
    std::optional<Vec2> hover_;
};

// The one-click tools' edits.
QString placeGroundPin(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placePin(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placeMotor(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placeTorque(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);
QString placePointMass(Mechanism& m, const SnapResult& at, const std::string& body, QString& problem);

}  // namespace clevis::ui
