// Whether a results view can be seen, and work kept until it comes into sight.
// A panel behind another panel's tab stays visible to Qt (isVisible() is
// true, no hide or show event comes): it is only moved off the window's
// edge, and its dock reports the tab being chosen. Views that cost an edit
// only for what is seen ask this instead of isVisible().
#pragma once

#include <QObject>

#include <functional>

class QWidget;

namespace clevis::ui {

// Shown, and with some of it on the window (not off its edge behind a tab).
bool inSight(const QWidget* view);

// A view's work for what is seen: done when asked if the view is in sight,
// else kept until it comes into sight (is shown, or the tab of the dock it
// sits in is chosen). `work` returns false when it cannot be done yet; it is
// then still to do. The view (or a widget holding it) may be put in its dock
// after this is set up: the dock is looked for again at each seen().
class SightWatch : public QObject {
    Q_OBJECT
public:
    SightWatch(QWidget* view, std::function<bool()> work);

    bool seen();           // inSight(view), its dock's tab followed from now on
    void request();        // the work now if in sight, else when it comes into sight
    bool pending() const;  // asked for and not yet done

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void followDock();
    void cameIntoSight();
    void doWork();

    QWidget* view_;
    std::function<bool()> work_;
    bool pending_ = false;
    QObject* dock_ = nullptr;  // whose tab changes are followed
};

}  // namespace clevis::ui
