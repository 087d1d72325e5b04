// No edit may leave the document in a state its file cannot be reopened in:
// the property editor refuses a value the file reader would refuse, naming
// the part; a half-drawn sketch saves and reopens. (Random runs of edits,
// undos and redos: test_edit_sequences.cpp.)
#include "core/file/mechanism_file.h"
#include "tests/drawn_four_bar.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/files/file_actions.h"
#include "ui/panels/property_editor.h"
#include "ui/shell/main_window.h"

#include <QLabel>
#include <QLineEdit>
#include <QTemporaryDir>
#include <QTest>

#include <gtest/gtest.h>

#include <memory>

using namespace clevis;
using namespace clevis::ui;

namespace {

// A crank–rocker four-bar as the tools draw it, with typed masses.
Mechanism fourBar()
{
    Mechanism m = drawnFourBar();
    edits::renameBody(m, "link 3", "rocker");
    m.bodies[2].mass = 1.5;
    m.bodies[2].cg = Vec2(0.18, 0.06);
    m.bodies[2].inertia = 0.002;
    return m;
}

// The four-bar open with its rocker selected in the property editor.
struct RockerInEditor {
    MechanismDocument doc;
    std::unique_ptr<PropertyEditor> editor;

    RockerInEditor()
    {
        doc.reset(fourBar(), {});
        doc.setSelection({Selection::Kind::Body, "rocker", -1});
        editor = std::make_unique<PropertyEditor>(&doc);
        editor->rebuildNow();
    }
    QLineEdit* massField() const { return editor->findChild<QLineEdit*>(QStringLiteral("mass")); }
};

TEST(PropertyEditorChecks, ANegativeMassIsRefusedNamingTheBodyAndNothingChanges)
{
    RockerInEditor s;
    MechanismDocument& doc = s.doc;
    PropertyEditor& editor = *s.editor;
    auto* mass = s.massField();
    ASSERT_NE(mass, nullptr);
    const QString shown = mass->text();

    mass->setText(QStringLiteral("-2"));
    emit mass->editingFinished();

    EXPECT_EQ(doc.mechanism().bodies[2].mass, 1.5);
    EXPECT_EQ(doc.undoStack()->count(), 0);
    EXPECT_FALSE(doc.isModified());
    ASSERT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) != nullptr; }, 2000));
    const QString why = editor.findChild<QLabel*>(QStringLiteral("editRefusal"))->text();
    EXPECT_TRUE(why.startsWith(QStringLiteral("Body “rocker”, mass: must be a finite number >= 0")))
        << why.toStdString();
    EXPECT_EQ(editor.findChild<QLineEdit*>(QStringLiteral("mass"))->text(), shown) << "the field shows the value kept";
}

TEST(PropertyEditorChecks, TheRefusalGoesWithTheNextAcceptedEdit)
{
    RockerInEditor s;
    MechanismDocument& doc = s.doc;
    PropertyEditor& editor = *s.editor;
    auto* mass = s.massField();
    mass->setText(QStringLiteral("-2"));
    emit mass->editingFinished();
    ASSERT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) != nullptr; }, 2000));

    mass = editor.findChild<QLineEdit*>(QStringLiteral("mass"));
    mass->setText(QStringLiteral("2"));
    emit mass->editingFinished();
    EXPECT_EQ(doc.mechanism().bodies[2].mass, 2.0);
    EXPECT_TRUE(
        QTest::qWaitFor([&] { return editor.findChild<QLabel*>(QStringLiteral("editRefusal")) == nullptr; }, 2000));
}

// ---- a drawing in progress ----

TEST(HalfDrawnSketch, SavesReopensAndTheAnalysisSaysWhatIsMissing)
{
    QTemporaryDir dir;
    MainWindow window(dir.filePath(QStringLiteral("recovery")));
    MechanismDocument* doc = window.document();
    std::string pin;
    doc->apply(QStringLiteral("Draw"), [&pin](Mechanism& m) {
        const std::string o = edits::addGroundPin(m, {0.0, 0.0});
        pin = edits::addPin(m, {0.05, 0.0});
        edits::addBody(m, {o, pin});
    });
    ASSERT_EQ(doc->mechanism().joints.size(), 2u);
    const Mechanism drawn = doc->mechanism();

    const QString path = dir.filePath(QStringLiteral("sketch.json"));
    QString error;
    ASSERT_TRUE(window.files()->saveTo(path, &error)) << error.toStdString();
    doc->reset({}, {});
    ASSERT_TRUE(window.files()->open(path, &error)) << error.toStdString();
    EXPECT_EQ(doc->mechanism(), drawn);

    window.analysis()->waitForIdle();
    const std::string expected = "Pin “" + pin + "” joins only “link 1”: connect it to a second part or to ground";
    EXPECT_EQ(window.analysis()->errorText().toStdString(), expected);
    EXPECT_EQ(window.analysis()->offendingItems().join(QStringLiteral(", ")).toStdString(), pin);
}

}  // namespace
