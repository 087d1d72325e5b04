#include "ui/results/in_sight.h"

#include <QDockWidget>
#include <QEvent>

namespace clevis::ui {

bool inSight(const QWidget* view) { return view->isVisible() && !view->visibleRegion().isEmpty(); }

SightWatch::SightWatch(QWidget* view, std::function<void()> cameIntoSight)
    : QObject(view), view_(view), cameIntoSight_(std::move(cameIntoSight))
{
    view_->installEventFilter(this);
    followDock();
}

bool SightWatch::seen()
{
    followDock();
    return inSight(view_);
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
            if (seen) cameIntoSight_();
        });
}

bool SightWatch::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == view_ && event->type() == QEvent::ParentChange) followDock();
    if (watched == view_ && event->type() == QEvent::Show) cameIntoSight_();
    return QObject::eventFilter(watched, event);
}

}  // namespace clevis::ui
