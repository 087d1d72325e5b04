// The drive fields of a driver's properties: a rotary driver's gearbox,
// motor characteristic, flywheel and speed fluctuation wanted, a linear
// one's cylinder. Each edit is one undo command, shown in display units;
// what the file reader refuses the form refuses, naming the driver, and
// nothing changes.
#include "core/file/file_units.h"
#include "core/file/mechanism_file.h"
#include "tests/sample_file.h"
#include "ui/document/mechanism_document.h"
#include "ui/panels/property_editor.h"
#include "ui/shell/display_units.h"

#include <QCheckBox>
#include <QComboBox>
#include <QLabel>
#include <QLineEdit>
#include <QTest>

#include <gtest/gtest.h>

#include <memory>

using namespace clevis;
using namespace clevis::ui;

namespace {

using test::samplePath;

// A sample open with one of its drivers selected in the property editor.
struct DriverInEditor {
    MechanismDocument doc;
    std::unique_ptr<PropertyEditor> editor;

    DriverInEditor(const std::string& sample, const QString& driver)
    {
        doc.reset(loadMechanismFile(samplePath(sample)).mechanism, {});
        doc.setSelection({Selection::Kind::Driver, driver, -1});
        editor = std::make_unique<PropertyEditor>(&doc);
        editor->rebuildNow();
    }
    const Driver& driver() const { return doc.mechanism().drivers.front(); }
    // The form as a person sees it next: the rebuild an edit asked for done
    // (so it cannot come later and take a refusal's line with it), then afresh.
    template <typename W>
    W* field(const char* key)
    {
        QCoreApplication::processEvents();
        editor->rebuildNow();
        return editor->findChild<W*>(QString::fromLatin1(key));
    }
    void type(const char* key, const QString& text)
    {
        auto* edit = field<QLineEdit>(key);
        ASSERT_NE(edit, nullptr) << key;
        edit->setText(text);
        emit edit->editingFinished();
    }
    void tick(const char* key, bool on)
    {
        auto* box = field<QCheckBox>(key);
        ASSERT_NE(box, nullptr) << key;
        box->setChecked(on);
    }
    QString refusal()
    {
        if (!QTest::qWaitFor([&] { return editor->findChild<QLabel*>(QStringLiteral("editRefusal")) != nullptr; },
                             2000))
            return {};
        return editor->findChild<QLabel*>(QStringLiteral("editRefusal"))->text();
    }
};

// Units as a fresh user has them, whatever an earlier test chose.
void defaultUnits()
{
    DisplayUnits::instance().setTorque(DisplayUnits::Torque::NewtonMetre);
    DisplayUnits::instance().setPressure(DisplayUnits::Pressure::Bar);
}

TEST(DriveProperties, AMotorLineFlywheelAndTargetAreSetThroughUndo)
{
    defaultUnits();
    DriverInEditor s("punch_press", "main_motor");
    const Mechanism before = s.doc.mechanism();
    ASSERT_FALSE(s.driver().motor);
    ASSERT_EQ(s.field<QLineEdit>("stallTorque"), nullptr) << "no characteristic fields before one is ticked";

    s.tick("motorCharacteristic", true);
    ASSERT_TRUE(s.driver().motor);
    s.type("stallTorque", "35");
    s.type("noLoadSpeed", "1500");
    const auto* line = std::get_if<MotorLine>(&*s.driver().motor);
    ASSERT_NE(line, nullptr);
    EXPECT_DOUBLE_EQ(line->stallTorque, 35.0);
    // 1500 rpm = 1500 · 2π / 60 rad/s (the file's own conversion, file_units.h).
    EXPECT_DOUBLE_EQ(line->noLoadSpeed, toSi(FileUnit::Rpm, 1500.0));
    EXPECT_EQ(s.field<QLineEdit>("noLoadSpeed")->text(), "1500.000");

    s.tick("flywheel", true);
    s.type("flywheelInertia", "2.5");
    auto* shaft = s.field<QComboBox>("flywheelShaft");
    ASSERT_NE(shaft, nullptr);
    emit shaft->activated(1);
    ASSERT_TRUE(s.driver().flywheel);
    EXPECT_DOUBLE_EQ(s.driver().flywheel->inertia, 2.5);
    EXPECT_EQ(s.driver().flywheel->on, FlywheelShaft::Motor);

    s.type("fluctuationTarget", "5");  // per cent
    ASSERT_TRUE(s.driver().fluctuationTarget);
    EXPECT_DOUBLE_EQ(*s.driver().fluctuationTarget, 0.05);

    // Seven edits, seven commands; undoing them all gives back the file as it was.
    EXPECT_EQ(s.doc.undoStack()->count(), 7);
    while (s.doc.undoStack()->canUndo()) s.doc.undoStack()->undo();
    EXPECT_EQ(s.doc.mechanism(), before);
    s.doc.undoStack()->redo();
    EXPECT_TRUE(s.driver().motor);

    // What the editor holds saves and reads back as itself.
    EXPECT_EQ(validateMechanism(s.doc.mechanism()), s.doc.mechanism());
}

TEST(DriveProperties, TheFileReadersRefusalsNameTheDriverAndKeepTheValue)
{
    defaultUnits();
    DriverInEditor s("punch_press", "main_motor");
    s.tick("motorCharacteristic", true);
    const Mechanism kept = s.doc.mechanism();
    const int commands = s.doc.undoStack()->count();

    s.type("noLoadSpeed", "-100");
    QString why = s.refusal();

    EXPECT_TRUE(why.contains("main_motor")) << why.toStdString();
    EXPECT_TRUE(why.contains("no load")) << why.toStdString();
    EXPECT_EQ(s.doc.mechanism(), kept);
    EXPECT_EQ(s.doc.undoStack()->count(), commands);

    s.type("fluctuationTarget", "250");  // C_s = 2.5: the driver would stop
    why = s.refusal();
    EXPECT_TRUE(why.contains("below 2")) << why.toStdString();
    EXPECT_FALSE(s.driver().fluctuationTarget);

    s.type("gearEfficiency", "120");
    why = s.refusal();
    EXPECT_TRUE(why.contains("(0, 1]")) << why.toStdString();
    EXPECT_DOUBLE_EQ(s.driver().gearbox->efficiency, 0.94);
}

TEST(DriveProperties, AMotorTableIsShownAndLeftToTheFile)
{
    defaultUnits();
    MechanismDocument doc;
    Mechanism m = loadMechanismFile(samplePath("punch_press")).mechanism;
    m.drivers[0].motor = MotorTable{{0.0, 100.0, 160.0}, {40.0, 30.0, 0.0}};
    doc.reset(m, {});
    doc.setSelection({Selection::Kind::Driver, "main_motor", -1});
    PropertyEditor editor(&doc);
    editor.rebuildNow();
    EXPECT_EQ(editor.findChild<QLineEdit*>("stallTorque"), nullptr);
    auto* table = editor.findChild<QLabel*>("motorTable");
    ASSERT_NE(table, nullptr);
    EXPECT_TRUE(table->text().contains("3 speeds")) << table->text().toStdString();
}

TEST(DriveProperties, TheSupplyPressureFollowsTheDisplayUnit)
{
    DriverInEditor s("tipping_bed", "lift_cylinder");
    DisplayUnits::instance().setPressure(DisplayUnits::Pressure::PoundForcePerSquareInch);
    s.type("supplyPressure", "1000");
    // 1 psi = 6.894 757 kPa (NIST SP 811, appendix B).
    EXPECT_NEAR(*s.driver().cylinder->supplyPressure, 1000 * 6894.757, 1e-3 * 1000);
    EXPECT_EQ(s.field<QLineEdit>("supplyPressure")->text(), "1000.000");
    DisplayUnits::instance().setPressure(DisplayUnits::Pressure::Bar);
    EXPECT_EQ(s.field<QLineEdit>("supplyPressure")->text(), "68.9");
    s.doc.undoStack()->undo();
    EXPECT_DOUBLE_EQ(*s.driver().cylinder->supplyPressure, 18e6);
}

// Each end of a cylinder has a pin of its own, sized as a joint's pin is
// (results <driver>.cap and <driver>.rod): set through the form, one undo
// command per edit, refused as the file reader refuses it.
TEST(DriveProperties, ACylindersEndPinsAreSetThroughUndoAndRefusedLikeTheFile)
{
    defaultUnits();
    DisplayUnits::instance().setLength(DisplayUnits::Length::Millimetre);
    DriverInEditor s("tipping_bed", "lift_cylinder");
    const Mechanism before = s.doc.mechanism();
    ASSERT_NE(s.field<QCheckBox>("capPinData"), nullptr);
    ASSERT_EQ(s.field<QLineEdit>("rodPinDiameter"), nullptr) << "no pin fields before the pin is ticked";

    s.tick("rodPinData", true);
    s.type("rodPinDiameter", "25");
    s.type("rodAllowableShear", "120");
    ASSERT_TRUE(s.driver().endPins[1]);
    EXPECT_FALSE(s.driver().endPins[0]) << "the barrel end is untouched";
    EXPECT_DOUBLE_EQ(s.driver().endPins[1]->diameter, 0.025);
    EXPECT_DOUBLE_EQ(*s.driver().endPins[1]->allowableShear, 120e6);
    // The bed has neither section nor plate: no bearing length to fall back on.
    auto* fallback = s.field<QLabel>("rodBearingDefault");
    ASSERT_NE(fallback, nullptr);
    EXPECT_TRUE(fallback->text().contains("body at this end")) << fallback->text().toStdString();

    const Mechanism kept = s.doc.mechanism();
    s.type("rodPinDiameter", "-4");
    const QString why = s.refusal();
    EXPECT_TRUE(why.contains("lift_cylinder")) << why.toStdString();
    EXPECT_EQ(s.doc.mechanism(), kept);

    EXPECT_EQ(s.doc.undoStack()->count(), 3);
    EXPECT_EQ(validateMechanism(s.doc.mechanism()), s.doc.mechanism());
    while (s.doc.undoStack()->canUndo()) s.doc.undoStack()->undo();
    EXPECT_EQ(s.doc.mechanism(), before);
}

}  // namespace
