#include "ui/results/in_sight.h"

#include <QDockWidget>
#include <QEvent>

namespace clevis::ui {

bool inSight(const QWidget* view) { return view->isVisible() && !view->visibleRegion().isEmpty(); }

SightWatch::SightWatch(QWidget* view, std::function<bool()> work) : QObject(view), view_(view), work_(std::move(work))
{
    view_->installEventFilter(this);
    followDock();
}

bool SightWatch::seen()
{
    followDock();
    return inSight(view_);
}

void SightWatch::request()
{
    if (seen()) doWork();
    else pending_ = true;
}

bool SightWatch::pending() const { return pending_; }

void SightWatch::cameIntoSight()
{
    if (pending_) doWork();
}

// Not pending while it runs: the work may ask pending() of its own view.
void SightWatch::doWork()
{
    pending_ = false;
    pending_ = !work_();
}

// The dock is found again whenever the view is moved to another parent, or
// asked whether it is seen (a widget holding it may have been moved).
void SightWatch::followDock()
{
    QWidget* dock = view_->parentWidget();
    while (dock && !qobject_cast<QDockWidget*>(dock)) dock = dock->parentWidget();
    if (dock == dock_) return;
    if (dock_) disconnect(dock_, nullptr, this, nullptr);
    dock_ = dock;
    if (dock_)
        connect(static_cast<QDockWidget*>(dock), &QDockWidget::visibilityChanged, this, [this](bool seen) {
            if (seen) cameIntoSight();
        });
}

bool SightWatch::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == view_ && event->type() == QEvent::ParentChange) followDock();
    if (watched == view_ && event->type() == QEvent::Show) cameIntoSight();
    return QObject::eventFilter(watched, event);
}

}  // namespace clevis::ui
