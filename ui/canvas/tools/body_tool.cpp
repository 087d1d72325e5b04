#include "ui/canvas/tools/body_tool.h"

#include "ui/canvas/tools/rubber_band.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/form_builder.h"
#include "ui/shell/display_units.h"

#include <QObject>
#include <QStringList>

namespace clevis::ui {

QString BodyTool::hint() const
{
    if (shape_ == Shape::Bar)
        return points_.empty() ? QObject::tr("Link: click the first pin (or an empty spot for a new pin).")
                               : QObject::tr("Link: click the second pin. Esc cancels.");
    return points_.size() < 3 ? QObject::tr("Plate: click its pins one after another (%1 so far).").arg(points_.size())
                              : QObject::tr("Plate: click more pins, or press Enter to close it.");
}

std::optional<Vec2> BodyTool::strokeStart() const
{
    if (points_.empty()) return std::nullopt;
    return points_.back().point;
}

void BodyTool::press(const Pointer& p)
{
    typed_.reset();
    place(p.snap);
}

void BodyTool::place(const SnapResult& at)
{
    if (shape_ == Shape::Plate && points_.size() >= 3 && (at.point - points_.front().point).norm() < 1e-12) {
        commit();
        return;
    }
    for (const auto& q : points_)
        if ((q.point - at.point).norm() < 1e-12) return;  // the same pin twice makes no body
    points_.push_back(at);
    if (shape_ == Shape::Bar && points_.size() == 2) commit();
    host_.refresh();
}

void BodyTool::move(const Pointer& p)
{
    hover_ = p.snap;
    host_.refresh();
}

void BodyTool::finish()
{
    if (typed_) placeTyped();
    else if (shape_ == Shape::Plate && points_.size() >= 3) commit();
}

bool BodyTool::cancel()
{
    if (points_.empty()) return false;
    points_.clear();
    typed_.reset();
    host_.refresh();
    return true;
}

bool BodyTool::type(int key, const QString& text)
{
    if (points_.empty()) return false;
    const bool numeric = text.size() == 1 && (text[0].isDigit() || QStringLiteral(".,-").contains(text[0]));
    if (!typed_ && !numeric) return false;
    if (!typed_) typed_ = TypedEnd{};
    QString& field = typed_->onAngle ? typed_->angle : typed_->length;
    if (numeric) field += text;
    else if (key == Qt::Key_Backspace) field.chop(1);
    else if (key == Qt::Key_Tab || key == Qt::Key_Backtab) typed_->onAngle = !typed_->onAngle;
    else return false;
    host_.refresh();
    return true;
}

// The typed distance from the last pin along the typed angle, or along the
// pointer's direction when no angle is typed.
std::optional<Vec2> BodyTool::typedPoint() const
{
    const std::optional<double> length = parseNumber(typed_->length);
    if (!length || *length <= 0) return std::nullopt;
    const Vec2 from = points_.back().point;
    double deg = hover_ ? angleDeg(from, hover_->point) : 0.0;
    if (!typed_->angle.isEmpty()) {
        const std::optional<double> typedDeg = parseNumber(typed_->angle);
        if (!typedDeg) return std::nullopt;
        deg = *typedDeg;
    }
    return from + DisplayUnits::instance().lengthToSi(*length) * unitFromDeg(deg);
}

void BodyTool::placeTyped()
{
    const std::optional<Vec2> end = typedPoint();
    if (!end) {
        host_.tell(QObject::tr("Type a length greater than zero (%1), Tab, then an angle in degrees.")
                       .arg(DisplayUnits::instance().lengthSymbol()));
        return;
    }
    typed_.reset();
    // A typed end that lands on a pin is that pin.
    const std::vector<int> here = jointsAt(mechanism(), *end, 1e-9);
    place(here.empty() ? SnapResult{*end, SnapResult::Kind::Free, -1}
                       : SnapResult{mechanism().joints[here.front()].at, SnapResult::Kind::Pin, here.front()});
}

void BodyTool::commit()
{
    const std::vector<SnapResult> points = std::move(points_);
    points_.clear();
    typed_.reset();
    const std::size_t jointsBefore = mechanism().joints.size();
    std::string body;
    const bool added = tryEdit([&](Mechanism& m, QString&) {
        std::vector<std::string> joints;
        // Found again by position: an undo or a delete during the stroke may have renumbered the joints.
        for (const auto& p : points) {
            const std::vector<int> here = jointsAt(m, p.point, 1e-9);
            joints.push_back(here.empty() ? edits::addPin(m, p.point) : m.joints[here.front()].name);
        }
        body = edits::addBody(m, joints);
        return shape_ == Shape::Bar ? QObject::tr("Add link") : QObject::tr("Add plate");
    });
    if (added) tellJoins(body, jointsBefore);
    host_.refresh();
}

// Where the new body was drawn to a pin that already joined two parts, it got
// a pin of its own to one of them: say to which, so nothing is hidden.
void BodyTool::tellJoins(const std::string& body, std::size_t jointsBefore)
{
    const Mechanism& m = mechanism();
    QStringList joins;
    for (std::size_t i = jointsBefore; i < m.joints.size(); ++i) {
        const Joint& j = m.joints[i];
        if (j.bodies[1] != body || j.bodies[0].empty()) continue;
        const std::vector<int> here = pinsAt(m, j.at);
        const QString first = QString::fromStdString(m.joints[here.front()].name);
        joins << QObject::tr("pinned to %1 at %2 through %3, a new pin")
                     .arg(QString::fromStdString(j.bodies[0]), first, QString::fromStdString(j.name));
    }
    if (!joins.isEmpty())
        host_.tell(QObject::tr("%1 %2.").arg(QString::fromStdString(body), joins.join(QObject::tr("; "))));
}

void BodyTool::paintPreview(QPainter& p) const
{
    const ViewTransform& view = host_.view();
    // Placed sides are plain: only the side being drawn carries its dimension.
    for (std::size_t i = 1; i < points_.size(); ++i)
        paintRubberBand(p, view, points_[i - 1].point, points_[i].point, false);
    const std::optional<Vec2> typedEnd = typed_ ? typedPoint() : std::nullopt;
    const std::optional<Vec2> next = typedEnd ? typedEnd : hover_ ? std::optional<Vec2>(hover_->point) : std::nullopt;
    if (!points_.empty() && next && (*next - points_.back().point).norm() > 1e-12)
        paintRubberBand(p, view, points_.back().point, *next, true);
    if (hover_) paintSnapMark(p, view, hover_->point);
    if (typed_)
        paintTypedInput(p, view.toScreen(points_.back().point), typed_->length, typed_->angle,
                        DisplayUnits::instance().lengthSymbol(), typed_->onAngle);
}

}  // namespace clevis::ui
