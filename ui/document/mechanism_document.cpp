#include "ui/document/mechanism_document.h"

#include "core/file/mechanism_file.h"
#include "core/file/part_description.h"

#include <QUndoCommand>

#include <algorithm>
#include <vector>

namespace clevis::ui {
namespace {

// Every coordinate of the mechanism, in a fixed order (`M` is const or not).
template <class M, class Visit>
void forEachPoint(M& m, Visit visit)
{
    for (auto& b : m.bodies) {
        if (b.cg) visit(*b.cg);
        if (b.section && b.section->ends) visit(b.section->ends->first), visit(b.section->ends->second);
        for (auto& p : b.pointMasses) visit(p.at);
    }
    for (auto& j : m.joints) visit(j.at);
    for (auto& d : m.drivers)
        for (auto& end : d.ends)
            if (end) visit(end->at);
    for (auto& load : m.loads) {
        if (auto* f = std::get_if<ForceLoad>(&load)) visit(f->point.at);
        if (auto* s = std::get_if<SpringLoad>(&load)) visit(s->a.at), visit(s->b.at);
        if (auto* d = std::get_if<DamperLoad>(&load)) visit(d->a.at), visit(d->b.at);
    }
}

// Whether `after` differs from `before` only in coordinates, all finite, as a
// drag of a pin makes it. The file reader asks nothing of a coordinate but
// that it be finite, so such an edit cannot make the file unreadable and is
// not written and read back: that takes milliseconds on the 200-body test
// chain, too slow for every mouse move, while this costs a copy.
bool onlyMoved(const Mechanism& before, const Mechanism& after)
{
    std::vector<Vec2> original;
    forEachPoint(before, [&](const Vec2& p) { original.push_back(p); });
    bool finite = true;
    std::size_t count = 0;
    forEachPoint(after, [&](const Vec2& p) {
        finite = finite && p.allFinite();
        ++count;
    });
    if (!finite || count != original.size()) return false;
    Mechanism unmoved = after;
    std::size_t i = 0;
    forEachPoint(unmoved, [&](Vec2& p) { p = original[i++]; });
    return unmoved == before;
}

}  // namespace

// Holds whole copies of the mechanism: documents are small (tens of parts),
// and a snapshot cannot get out of step with the edit the way an inverse
// operation can.
class SnapshotCommand : public QUndoCommand {
public:
    SnapshotCommand(MechanismDocument* doc, const QString& text, Mechanism before, Mechanism after, int mergeId)
        : QUndoCommand(text), doc_(doc), before_(std::move(before)), after_(std::move(after)), mergeId_(mergeId)
    {}
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

const Mechanism& MechanismDocument::mechanism() const { return mechanism_; }

QUndoStack* MechanismDocument::undoStack() { return &undoStack_; }

QString MechanismDocument::apply(const QString& text, std::function<void(Mechanism&)> edit, int mergeId)
{
    Mechanism after = mechanism_;
    edit(after);
    if (after == mechanism_) return {};
    if (!onlyMoved(mechanism_, after)) {
        try {
            // The document holds what its file reopens as, so saving never changes it.
            after = validateMechanism(after);
        } catch (const ModelError& e) {
            const QString why = QString::fromStdString(describeModelError(after, e));
            emit editRefused(why);
            return why;
        }
        if (after == mechanism_) return {};
    }
    // Merge ids are offset by the run number so that two separate drags of
    // the same part stay two undo steps.
    const int id = mergeId < 0 ? -1 : mergeId + mergeRun_ * 4096;
    undoStack_.push(new SnapshotCommand(this, text, mechanism_, std::move(after), id));
    return {};
}

void MechanismDocument::closeMergeRun() { ++mergeRun_; }

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

QString MechanismDocument::filePath() const { return filePath_; }

bool MechanismDocument::isModified() const { return !undoStack_.isClean(); }

void MechanismDocument::markSaved(const QString& filePath)
{
    const bool renamed = filePath != filePath_;
    filePath_ = filePath;
    undoStack_.setClean();
    if (renamed) emit filePathChanged(filePath_);
    emit modifiedChanged(false);
}

Selection MechanismDocument::selection() const { return selection_; }

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
