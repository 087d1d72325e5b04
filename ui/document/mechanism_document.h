// The open mechanism and what is selected in it: the one place the sketch
// lives. Views read it and change it only through apply(), which records an
// undo command holding the mechanism before and after the edit.
#pragma once

#include "core/model/mechanism.h"

#include <QObject>
#include <QString>
#include <QUndoStack>

#include <functional>

namespace clevis::ui {

struct Selection {
    enum class Kind { None, Body, Joint, Driver, Load };
    Kind kind = Kind::None;
    QString name;
    int loadIndex = -1;  // loads by index

    bool operator==(const Selection&) const = default;
};

class MechanismDocument : public QObject {
    Q_OBJECT
public:
    explicit MechanismDocument(QObject* parent = nullptr);

    const clevis::Mechanism& mechanism() const;
    QUndoStack* undoStack();

    // Every edit goes through here: pushes an undo command named `text` that
    // applies `edit` to a copy of the mechanism (undo restores the previous
    // copy). Commands with the same mergeId >= 0 pushed consecutively merge
    // (a drag is one undo step). An edit that changes nothing is not recorded,
    // nor is a merged run that ends where it began.
    // The edited copy must pass the file reader's checks, so that the
    // document can always be saved and opened again; if it does not, nothing
    // changes and the reason, naming the part, is returned (and signalled).
    // Returns an empty string otherwise.
    QString apply(const QString& text, std::function<void(clevis::Mechanism&)> edit, int mergeId = -1);
    void reset(const clevis::Mechanism& m, const QString& filePath);  // new/open: clears the undo stack
    QString filePath() const;
    bool isModified() const;  // from the undo stack's clean state
    void markSaved(const QString& filePath);

    Selection selection() const;
    void setSelection(const Selection& s);

    // Ends the current merge run, so the next edit with the same mergeId
    // starts a new undo step (called when a drag ends).
    void closeMergeRun();

signals:
    void mechanismChanged();
    void selectionChanged();
    void modifiedChanged(bool);
    void filePathChanged(const QString&);
    void documentReset();  // after reset(): a different mechanism is open
    void editRefused(const QString& why);

private:
    friend class SnapshotCommand;
    void setMechanism(const clevis::Mechanism& m);
    bool selectionExists(const Selection& s) const;

    clevis::Mechanism mechanism_;
    QUndoStack undoStack_;
    QString filePath_;
    Selection selection_;
    int mergeRun_ = 0;
};

}  // namespace clevis::ui
