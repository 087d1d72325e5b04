// Random sequences of document commands (add, move, delete, rename, change a
// property, undo, redo: tests/random_edits.h) from fixed seeds, each from an
// empty sketch, a drawn four-bar or a bundled sample. After every command the
// document must save to a file that the reader accepts (what the editor's
// validateMechanism asks) and reopens as the same mechanism, and must be the
// state the undo stack's position names, and must name no part that is not
// there (which the reader leaves to the analysis); undoing everything must give back
// the original file byte for byte, and redoing everything the final one.
//
// CLEVIS_EDIT_SEQUENCES sets how many sequences run (300 by default; the full
// run in the README takes 10 000). A failure names the seed and lists the
// sequence's commands, so that it can be replayed.
#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "tests/drawn_four_bar.h"
#include "tests/random_edits.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/part_references.h"

#include <gtest/gtest.h>

#include <unistd.h>

#include <algorithm>
#include <cstdlib>
#include <filesystem>
#include <sstream>
#include <string>
#include <vector>

namespace clevis {
namespace {

namespace fs = std::filesystem;

struct Start {
    std::string what;
    Mechanism mechanism;
};

std::vector<Start> starts()
{
    std::vector<Start> list{{"an empty sketch", {}}, {"a drawn four-bar", drawnFourBar()}};
    for (const char* sample : {"punch_press", "dwell_six_bar", "tipping_bed"})
        list.push_back({sample, loadMechanismFile(std::string(CLEVIS_SAMPLES_DIR "/") + sample + ".json").mechanism});
    return list;
}

// References to parts that are not there (a joint's open side, a driver
// between two points without a joint, a load over time are not such).
std::vector<std::string> danglingReferences(const Mechanism& m)
{
    const auto exists = [&](ui::PartKind kind, const std::string& name) {
        const auto named = [&](const auto& list) {
            return std::any_of(list.begin(), list.end(), [&](const auto& part) { return part.name == name; });
        };
        switch (kind) {
        case ui::PartKind::Body: return name == kGroundName || named(m.bodies);
        case ui::PartKind::Joint: return named(m.joints);
        case ui::PartKind::Driver: return named(m.drivers);
        }
        return false;
    };
    std::vector<std::string> dangling;
    const auto check = [&](const std::string& holder) {
        return [&, holder](ui::PartKind kind, const std::string& name, const Vec2*) {
            if (name.empty() && kind != ui::PartKind::Body) return;
            if (!exists(kind, name)) dangling.push_back(holder + " refers to \"" + name + "\", which is not there");
        };
    };
    for (const Joint& j : m.joints)
        for (const std::string& b : j.bodies)
            if (!b.empty() && !exists(ui::PartKind::Body, b))
                dangling.push_back("joint \"" + j.name + "\" joins \"" + b + "\", which is not there");
    for (const Driver& d : m.drivers) ui::visitReferences(d, check("driver \"" + d.name + "\""));
    for (const Load& load : m.loads)
        ui::visitReferences(load, check("load \"" + std::visit([](const auto& l) { return l.name; }, load) + "\""));
    return dangling;
}

// The document's file, after checking that it opens with no complaint as the
// same mechanism and saves again to the same text, and that every part it
// names is there. Empty on a failure.
std::string checkedFile(const ui::MechanismDocument& doc)
{
    const std::string text = saveMechanismText(doc.mechanism());
    for (const std::string& d : danglingReferences(doc.mechanism())) ADD_FAILURE() << d;
    try {
        const LoadedMechanism reopened = parseMechanism(text);  // validateMechanism is this, from the text
        EXPECT_TRUE(reopened.warnings.empty()) << reopened.warnings.front();
        EXPECT_EQ(reopened.mechanism, doc.mechanism()) << "the file reopens as another mechanism:\n" << text;
        EXPECT_EQ(saveMechanismText(reopened.mechanism), text) << "the reopened file saves otherwise";
    } catch (const ModelError& e) {
        ADD_FAILURE() << "the saved file does not open: " << e.what() << '\n' << text;
        return {};
    }
    return text;
}

struct Tally {
    long commands = 0, refused = 0, undos = 0, redos = 0, stateChecks = 0;
};

// One sequence; `states[i]` is the file at undo-stack position i, kept
// through every command.
void runSequence(unsigned seed, const Start& start, int steps, const fs::path& dir, Tally& tally)
{
    ui::MechanismDocument doc;
    doc.reset(start.mechanism, {});
    QUndoStack& stack = *doc.undoStack();
    const std::string original = checkedFile(doc);
    std::vector<std::string> states{original};
    test::RandomEdits edits(doc, seed);
    std::ostringstream log;
    log << "seed " << seed << ", from " << start.what << ":\n";
    const auto where = [&] { return log.str(); };

    for (int i = 0; i < steps; ++i) {
        const int before = stack.index();
        const std::string did = edits.step();
        log << "  " << i << ": " << did << '\n';
        const std::string text = checkedFile(doc);
        ASSERT_FALSE(::testing::Test::HasFailure()) << where();
        const int at = stack.index();
        ++tally.commands;
        ++tally.stateChecks;
        if (did == "undo" || did == "redo") {
            ++(did == "undo" ? tally.undos : tally.redos);
            ASSERT_EQ(text, states[std::size_t(at)]) << did << " gave another state\n" << where();
            continue;
        }
        if (did.find("(refused") != std::string::npos) ++tally.refused;
        // A new step (at = before + 1), a step merged into the last (a drag
        // going on: same position), a drag that ended where it began and was
        // dropped (one back, to the state before it), or nothing at all
        // (refused, or no change). A push drops the steps that could be redone.
        ASSERT_TRUE(at >= before - 1 && at <= before + 1) << where();
        states.resize(std::size_t(stack.count()) + 1);
        if (at == before - 1) ASSERT_EQ(text, states[std::size_t(at)]) << "a dropped drag left a change\n" << where();
        if (at == before && did != "Move pin")
            ASSERT_EQ(text, states[std::size_t(at)]) << "an edit changed the document but made no undo step\n"
                                                     << where();
        states[std::size_t(at)] = text;
    }

    while (stack.canUndo()) {
        stack.undo();
        ASSERT_EQ(checkedFile(doc), states[std::size_t(stack.index())]) << "undoing all\n" << where();
    }
    ASSERT_EQ(checkedFile(doc), original) << "undoing everything did not give back the original file\n" << where();
    while (stack.canRedo()) {
        stack.redo();
        ASSERT_EQ(checkedFile(doc), states[std::size_t(stack.index())]) << "redoing all\n" << where();
    }
    ASSERT_EQ(checkedFile(doc), states.back()) << "redoing everything did not give the final state\n" << where();
    tally.stateChecks += 2 * (long(states.size()) - 1);

    // The last state once more as the desktop saves and opens it, through the disk.
    const fs::path file = dir / "sequence.json";
    writeFileAtomically(file.string(), states.back(), true);
    ASSERT_EQ(loadMechanismFile(file.string()).mechanism, doc.mechanism()) << where();
}

TEST(EditSequences, EveryStateSavesReopensAndUndoesToTheOriginalFile)
{
    constexpr unsigned kFirstSeed = 20240611;
    constexpr int kSteps = 50;
    const char* asked = std::getenv("CLEVIS_EDIT_SEQUENCES");
    const int sequences = asked ? std::atoi(asked) : 300;
    const std::vector<Start> from = starts();
    const fs::path dir = fs::temp_directory_path() / ("clevis-edit-sequences-" + std::to_string(::getpid()));
    fs::create_directories(dir);
    Tally tally;
    for (int s = 0; s < sequences && !HasFailure(); ++s) {
        const unsigned seed = kFirstSeed + unsigned(s);
        runSequence(seed, from[seed % from.size()], kSteps, dir, tally);
    }
    fs::remove_all(dir);
    std::printf(
        "%d sequences of %d commands: %ld commands (%ld refused by the document, %ld undos, %ld redos), "
        "%ld states saved, reopened and compared\n",
        sequences, kSteps, tally.commands, tally.refused, tally.undos, tally.redos, tally.stateChecks);
}

}  // namespace
}  // namespace clevis
