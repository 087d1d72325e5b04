// A drawing or editing tool on the canvas. The canvas snaps the pointer and
// hands the tool finished positions; the tool turns strokes into edits on the
// document (one undo step each) and draws its own preview meanwhile.
#pragma once

#include "ui/canvas/snapping.h"
#include "ui/canvas/view_transform.h"
#include "ui/document/mechanism_document.h"

#include <QPainter>
#include <QString>

#include <functional>
#include <optional>

namespace clevis::ui {

// What a tool may use of the canvas it runs on.
class ToolHost {
public:
    virtual ~ToolHost() = default;
    virtual MechanismDocument* document() = 0;
    virtual const ViewTransform& view() const = 0;
    virtual void refresh() = 0;                     // repaint the preview
    virtual void tell(const QString& message) = 0;  // a short note in the status bar
};

// An edit a tool tries on a trial copy of the mechanism: returns the undo
// text, or sets `problem` to say why the click does not fit.
using TrialEdit = std::function<QString(Mechanism& m, QString& problem)>;

struct Pointer {
    QPointF screen;
    SnapResult snap;
    Qt::KeyboardModifiers modifiers;
};

class Tool {
public:
    explicit Tool(ToolHost& host) : host_(host) {}
    virtual ~Tool() = default;

    virtual QString hint() const = 0;  // what to do next, for the status bar
    // The point horizontal/vertical snapping is measured from, while a stroke is open.
    virtual std::optional<Vec2> strokeStart() const { return std::nullopt; }

    virtual void press(const Pointer&) {}
    virtual void move(const Pointer&) {}
    virtual void release(const Pointer&) {}
    virtual void finish() {}  // Enter or a double click
    // Esc: drops the stroke in progress; returns false when there was none.
    virtual bool cancel() { return false; }
    // A key the canvas does not use itself (digits, Backspace, Tab); true
    // when the tool took it.
    virtual bool type(int /*key*/, const QString& /*text*/) { return false; }
    // Whether a number is being typed: its keys (Backspace) are then the tool's, not shortcuts.
    virtual bool typing() const { return false; }
    virtual void paintPreview(QPainter&) const {}

protected:
    ToolHost& host_;
    MechanismDocument& doc() { return *host_.document(); }
    const Mechanism& mechanism() { return host_.document()->mechanism(); }
    // Applies the edit as one undo step, or tells the user its problem and
    // changes nothing; true when the edit was applied.
    bool tryEdit(const TrialEdit& edit);
};

}  // namespace clevis::ui
