// Puts a recovered document in place of the open one. It opens as the
// original file as last saved (when that can still be read) with the
// recovered changes on top as one undo step: the document is unsaved, Save
// writes to the original path (the file there is kept as NAME.bak), and Undo
// shows what was last saved. The recovery file stays until the document is
// saved or closed cleanly, so a second crash loses nothing either.
#pragma once

#include "ui/files/recovery_store.h"

#include <QString>

namespace clevis::ui {

class AutosaveTimer;
class MechanismDocument;

// Empty on success; otherwise why the recovery file (named) cannot be read,
// and both the open document and that file are left as they were.
QString restoreRecovered(MechanismDocument& doc, AutosaveTimer& autosave, RecoveryClaim&& claim);

}  // namespace clevis::ui
