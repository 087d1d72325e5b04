#include "ui/panels/property_editor.h"

#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"
#include "ui/shell/display_units.h"

#include "render/palette.h"

#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QScrollBar>
#include <QTimer>

namespace clevis::ui {

PropertyEditor::PropertyEditor(MechanismDocument* doc, AnalysisState* analysis, QWidget* parent)
    : QScrollArea(parent), doc_(doc), analysis_(analysis)
{
    setObjectName(QStringLiteral("propertyEditor"));
    setWidgetResizable(true);
    setFrameShape(QFrame::NoFrame);
    // The form of a joint at a compound pin shows the forces at the shown
    // position, so it is built again when a result comes. After an edit a
    // solve is always under way (the analysis hears of the edit first) and its
    // result follows: that form is built then, once, not also for the edit (a
    // drag edits at every move). Every other form is built for the edit, while
    // the solve runs, and shows the new values at once.
    const auto showsResults = [this] {
        const Selection s = doc_->selection();
        const Mechanism& m = doc_->mechanism();
        const int j = s.kind == Selection::Kind::Joint ? jointIndex(m, s.name.toStdString()) : -1;
        return j >= 0 && jointFormShowsResults(m, m.joints[std::size_t(j)]);
    };
    const auto resultShown = [this, showsResults] {
        if (showsResults()) scheduleRebuild();
    };
    connect(doc_, &MechanismDocument::mechanismChanged, this, [this, showsResults] {
        if (!analysis_ || !analysis_->busy() || !showsResults()) scheduleRebuild();
    });
    connect(doc_, &MechanismDocument::selectionChanged, this, &PropertyEditor::scheduleRebuild);
    connect(&DisplayUnits::instance(), &DisplayUnits::changed, this, &PropertyEditor::scheduleRebuild);
    if (analysis_) {
        connect(analysis_, &AnalysisState::resultChanged, this, resultShown);
        connect(analysis_, &AnalysisState::currentStepChanged, this, resultShown);
    }
    rebuildNow();
}

// Deferred: the edit that triggered the rebuild may still be inside the
// signal of a field that the rebuild deletes.
void PropertyEditor::scheduleRebuild()
{
    if (pending_) return;
    pending_ = true;
    QTimer::singleShot(0, this, &PropertyEditor::rebuildNow);
}

void PropertyEditor::rebuildNow()
{
    pending_ = false;
    // Keep the keyboard in the field that had it, so Tab through a form still works.
    // Only when it has it still: a click on the canvas takes the keyboard there.
    const QWidget* focused = widget() ? widget()->focusWidget() : nullptr;
    if (focused && !focused->hasFocus()) focused = nullptr;
    const QString focusKey = focused ? focused->objectName() : QString();
    // ... and the form where it was scrolled to, so that editing a field far down does not jump back to the top.
    const int scrolled = verticalScrollBar()->value();

    auto* page = new QWidget;
    auto* form = new QFormLayout(page);
    form->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    form->setRowWrapPolicy(QFormLayout::WrapLongRows);  // a narrow panel puts the field under its label
    FormBuilder f(form, doc_, [this](const QString& why) {
        refusal_ = why;
        scheduleRebuild();
    });
    const Mechanism& m = doc_->mechanism();
    const Selection s = doc_->selection();
    const std::string name = s.name.toStdString();
    const int body = bodyIndex(m, name), joint = jointIndex(m, name), driver = driverIndex(m, name);
    if (s.kind == Selection::Kind::Body && body >= 0) bodyForm(f, m, m.bodies[body]);
    else if (s.kind == Selection::Kind::Joint && joint >= 0) jointForm(f, m, m.joints[joint], analysis_);
    else if (s.kind == Selection::Kind::Driver && driver >= 0) driverForm(f, m, m.drivers[driver]);
    else if (s.kind == Selection::Kind::Load && s.loadIndex >= 0 && s.loadIndex < int(m.loads.size()))
        loadForm(f, m, s.loadIndex);
    else mechanismForm(f, m);
    showRefusal(form);
    setWidget(page);  // deletes the previous page
    verticalScrollBar()->setValue(scrolled);
    if (!focusKey.isEmpty())
        if (auto* w = page->findChild<QWidget*>(focusKey)) w->setFocus();
}

// Under the form, until the next rebuild: the form shows the value the
// document kept, this line why the typed one was not taken.
void PropertyEditor::showRefusal(QFormLayout* form)
{
    if (refusal_.isEmpty()) return;
    auto* line = new QLabel(refusal_);
    line->setObjectName(QStringLiteral("editRefusal"));
    line->setWordWrap(true);
    line->setTextInteractionFlags(Qt::TextSelectableByMouse);
    line->setStyleSheet(QStringLiteral("color: %1;").arg(palette::problem().name()));
    form->addRow(line);
    refusal_.clear();
}

}  // namespace clevis::ui
