// The property editor across edits: the form is rebuilt after each one, but
// it stays scrolled where the user was and a renamed part stays selected.
#include "core/file/mechanism_file.h"
#include "core/model/materials.h"
#include "ui/document/mechanism_document.h"
#include "ui/panels/property_editor.h"

#include <QComboBox>
#include <QLineEdit>
#include <QScrollBar>
#include <QTest>

#include <gtest/gtest.h>

#include <stdexcept>

using namespace clevis;
using namespace clevis::ui;

namespace {

class PropertyEditorTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        doc.reset(loadMechanismFile(CLEVIS_SAMPLES_DIR "/dwell_six_bar.json").mechanism, {});
        doc.setSelection({Selection::Kind::Body, QStringLiteral("coupler_plate"), -1});
        editor.resize(320, 160);
        editor.show();
        ASSERT_TRUE(QTest::qWaitForWindowExposed(&editor));
        editor.rebuildNow();
    }

    void type(const char* field, const QString& text)
    {
        auto* edit = editor.findChild<QLineEdit*>(QString::fromUtf8(field));
        ASSERT_NE(edit, nullptr) << field;
        edit->setText(text);
        emit edit->editingFinished();
        QCoreApplication::processEvents();
    }

    MechanismDocument doc;
    PropertyEditor editor{&doc};
};

TEST_F(PropertyEditorTest, AnEditKeepsTheScrollPosition)
{
    QScrollBar* bar = editor.verticalScrollBar();
    ASSERT_GT(bar->maximum(), 0) << "the form must be taller than the editor for this test";
    bar->setValue(bar->maximum());
    const int scrolled = bar->value();
    type("inertia", QStringLiteral("0.0003"));
    EXPECT_EQ(doc.mechanism().bodies[1].inertia, 0.0003);
    EXPECT_EQ(bar->value(), scrolled);
}

TEST_F(PropertyEditorTest, ARenamedPartStaysSelected)
{
    type("name", QStringLiteral("coupler"));
    EXPECT_EQ(doc.selection().kind, Selection::Kind::Body);
    EXPECT_EQ(doc.selection().name, QStringLiteral("coupler"));
    ASSERT_NE(editor.findChild<QLineEdit*>(QStringLiteral("name")), nullptr);
    EXPECT_EQ(editor.findChild<QLineEdit*>(QStringLiteral("name"))->text(), QStringLiteral("coupler"));
}

// Choosing a material keeps its name, so its strength reaches the sizing;
// typing a density of one's own leaves the material behind.
TEST_F(PropertyEditorTest, TheMaterialChosenIsKeptByName)
{
    doc.setSelection({Selection::Kind::Body, QStringLiteral("coupler_plate"), -1});
    editor.rebuildNow();
    auto* source = editor.findChild<QComboBox*>(QStringLiteral("massSource"));
    ASSERT_NE(source, nullptr);
    source->setCurrentIndex(2);  // bar section
    emit source->activated(2);
    QCoreApplication::processEvents();
    editor.rebuildNow();
    const auto section = [&] { return *doc.mechanism().bodies[1].section; };
    EXPECT_EQ(section().material, "steel");
    auto* material = editor.findChild<QComboBox*>(QStringLiteral("material"));
    ASSERT_NE(material, nullptr);
    const int aluminium = material->findText(QStringLiteral("Aluminium alloy"), Qt::MatchStartsWith);
    ASSERT_GE(aluminium, 0);
    material->setCurrentIndex(aluminium);
    emit material->activated(aluminium);
    QCoreApplication::processEvents();
    editor.rebuildNow();
    EXPECT_EQ(section().material, "aluminium_alloy");
    EXPECT_EQ(section().density, *materialDensity("aluminium_alloy"));
    type("density", QStringLiteral("2800"));
    EXPECT_EQ(section().density, 2800.0);
    EXPECT_EQ(section().material, "");
}

// A bar's allowable is typed in MPa and kept in Pa; a safety factor on yield
// takes its place (the file allows one of the two), and a value the reader
// refuses leaves the document as it was.
TEST_F(PropertyEditorTest, ABarsAllowableOrSafetyFactorIsTypedInItsUnits)
{
    doc.setSelection({Selection::Kind::Body, QStringLiteral("rocker"), -1});
    editor.rebuildNow();
    const auto section = [&] {
        for (const auto& b : doc.mechanism().bodies)
            if (b.name == "rocker") return *b.section;
        throw std::runtime_error("no rocker");
    };
    type("allowableStress", QStringLiteral("160"));
    EXPECT_DOUBLE_EQ(*section().allowableStress, 160e6);
    EXPECT_FALSE(section().safetyFactor.has_value());
    editor.rebuildNow();
    type("safetyFactor", QStringLiteral("1.5"));
    EXPECT_EQ(section().safetyFactor, 1.5);
    EXPECT_FALSE(section().allowableStress.has_value());
    editor.rebuildNow();
    type("safetyFactor", QStringLiteral("0.5"));  // below 1: the reader's rule refuses it
    EXPECT_EQ(section().safetyFactor, 1.5);
    editor.rebuildNow();
    type("safetyFactor", QString());  // empty: none
    EXPECT_FALSE(section().safetyFactor.has_value());
}

}  // namespace
