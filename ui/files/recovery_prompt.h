// At start-up: offers the documents that an instance of the app left behind
// when it ended without a clean exit, one at a time, newest first.
#pragma once

#include "ui/files/recovery_store.h"

#include <QString>
#include <QStringList>

#include <functional>

namespace clevis::ui {

class AutosaveTimer;
class MainWindow;
class MechanismDocument;

enum class RecoveryChoice { Restore, Discard, Later };
using RecoveryChooser = std::function<RecoveryChoice(const RecoveryClaim&)>;

// "Unsaved changes to punch_press.json from 21:43 were recovered."
QString recoveryMessage(const RecoveryClaim& claim);

// Asks `choose` about each leftover until one is restored: Discard deletes
// it, Later keeps it for the next start (as do those not reached). Returns
// the reasons of restores that failed; those files are kept.
QStringList offerRecovery(MechanismDocument& doc, AutosaveTimer& autosave, const RecoveryChooser& choose);

// The same with a dialog for each choice, after the prompt to save the open
// document; failures are shown in a warning.
void offerRecoveryInDialogs(MainWindow& window);

}  // namespace clevis::ui
