#include "ui/document/mechanism_document.h"

#include <QUndoCommand>

#include <algorithm>

namespace clevis::ui {

// Holds whole copies of the mechanism: documents are small (tens of parts),
// and a snapshot cannot get out of step with the edit the way an inverse
// operation can.
class SnapshotCommand : public QUndoCommand {
public:
    SnapshotCommand(MechanismDocument* doc, const QString& text, Mechanism before, Mechanism after, int mergeId)
        : QUndoCommand(text), doc_(doc), before_(std::move(before)), after_(std::move(after)), mergeId_(mergeId)
    {
    }
    void redo() override { doc_->setMechanism(after_); }
    void undo() override { doc_->setMechanism(before_); }
    int id() const override { return mergeId_; }
    bool mergeWith(const QUndoCommand* other) override
    {
        const auto* next = static_cast<const SnapshotCommand*>(other);
        if (next->mergeId_ != mergeId_) return false;
        after_ = next->after_;
        // A run that ends where it began (a drag put back) changes nothing:
        // marked so, the stack drops it instead of keeping a step to redo.
        setObsolete(after_ == before_);
        return true;
    }

private:
    MechanismDocument* doc_;
    Mechanism before_, after_;
    int mergeId_;
};

MechanismDocument::MechanismDocument(QObject* parent) : QObject(parent)
{
    connect(&undoStack_, &QUndoStack::cleanChanged, this, [this](bool clean) { emit modifiedChanged(!clean); });
}

const Mechanism& MechanismDocument::mechanism() const
{
    return mechanism_;
}

QUndoStack* MechanismDocument::undoStack()
{
    return &undoStack_;
}

void MechanismDocument::apply(const QString& text, std::function<void(Mechanism&)> edit, int mergeId)
{
    Mechanism after = mechanism_;
    edit(after);
    if (after == mechanism_) return;
    // Merge ids are offset by the run number so that two separate drags of
    // the same part stay two undo steps.
    const int id = mergeId < 0 ? -1 : mergeId + mergeRun_ * 4096;
    undoStack_.push(new SnapshotCommand(this, text, mechanism_, std::move(after), id));
}

void MechanismDocument::closeMergeRun()
{
    ++mergeRun_;
}

void MechanismDocument::reset(const Mechanism& m, const QString& filePath)
{
    undoStack_.clear();
    selection_ = {};
    filePath_ = filePath;
    setMechanism(m);
    undoStack_.setClean();
    emit selectionChanged();
    emit filePathChanged(filePath_);
    emit modifiedChanged(false);
    emit documentReset();
}

QString MechanismDocument::filePath() const
{
    return filePath_;
}

bool MechanismDocument::isModified() const
{
    return !undoStack_.isClean();
}

void MechanismDocument::markSaved(const QString& filePath)
{
    const bool renamed = filePath != filePath_;
    filePath_ = filePath;
    undoStack_.setClean();
    if (renamed) emit filePathChanged(filePath_);
    emit modifiedChanged(false);
}

Selection MechanismDocument::selection() const
{
    return selection_;
}

void MechanismDocument::setSelection(const Selection& s)
{
    if (s == selection_) return;
    selection_ = s;
    emit selectionChanged();
}

void MechanismDocument::setMechanism(const Mechanism& m)
{
    mechanism_ = m;
    // Undoing an "add" removes what may be selected: never point at nothing,
    // not even while views react to the change.
    const bool lostSelection = !selectionExists(selection_);
    if (lostSelection) selection_ = {};
    emit mechanismChanged();
    if (lostSelection) emit selectionChanged();
}

bool MechanismDocument::selectionExists(const Selection& s) const
{
    const std::string name = s.name.toStdString();
    const auto named = [&](const auto& list) {
        return std::any_of(list.begin(), list.end(), [&](const auto& item) { return item.name == name; });
    };
    switch (s.kind) {
    case Selection::Kind::None: return true;
    case Selection::Kind::Body: return named(mechanism_.bodies);
    case Selection::Kind::Joint: return named(mechanism_.joints);
    case Selection::Kind::Driver: return named(mechanism_.drivers);
    case Selection::Kind::Load: return s.loadIndex >= 0 && s.loadIndex < int(mechanism_.loads.size());
    }
    return false;
}

}  // namespace clevis::ui
