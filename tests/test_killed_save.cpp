// A real process saving a large mechanism (tests/save_loop.cpp: the desktop's
// save, alternating two versions of a 499-body chain of several MB) is killed
// with SIGKILL, which nothing can catch, and what it leaves on the disk is
// read back: the file must be the complete old or the complete new version,
// and NAME.bak, once there, a complete version too, never missing.
//
// Two ways to kill it: at random moments over a few saves (many kills; how
// many is CLEVIS_SAVE_KILLS, 200 by default), and on entering each of the
// file-system calls of a save in turn (CLEVIS_SAVE_LOOP_KILL_AT), which
// reaches the short gaps between two calls that random kills would rarely hit.
#include "core/file/atomic_file.h"
#include "core/file/mechanism_file.h"
#include "tests/chain_generator.h"
#include "tests/file_text.h"

#include <gtest/gtest.h>

#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <string>
#include <thread>

namespace clevis {
namespace {

namespace fs = std::filesystem;

using test::readFile;

// The chain at the largest size the limits allow, every rocker carrying a
// force whose factor follows a table over the cycle: the tables make the file
// several MB, so that a save takes long enough to be killed half-way. The two
// versions differ in every table, as after an edit of all the loads.
Mechanism largeChain(int version)
{
    constexpr int kBodies = 499, kTablePoints = 400;
    Mechanism m = test::fourBarChain(kBodies);
    m.name += version == 0 ? ", first version" : ", second version";
    for (const Body& b : m.bodies) {
        if (b.name.rfind("rocker", 0) != 0) continue;
        ForceLoad f;
        f.name = "press on " + b.name;
        f.point = {b.name, Vec2::Zero()};
        f.force = Vec2(0.0, -100.0);
        LoadProfile p;
        for (int i = 0; i < kTablePoints; ++i) {
            p.at.push_back(i / double(kTablePoints));
            p.factor.push_back(1.0 + 0.5 * std::sin(0.1 * i + version) / (1 + version));
        }
        f.profile = p;
        m.loads.push_back(f);
    }
    return m;
}

class KilledSave : public ::testing::Test {
protected:
    void SetUp() override
    {
        std::string pattern = (fs::temp_directory_path() / "clevis-killed-save-XXXXXX").string();
        ASSERT_NE(::mkdtemp(pattern.data()), nullptr);
        dir_ = pattern;
        target_ = dir_ / "press.json";
        for (int v = 0; v < 2; ++v) {
            text_[v] = saveMechanismText(largeChain(v));
            mechanism_[v] = parseMechanism(text_[v]).mechanism;
            inputs_[v] = dir_ / (v == 0 ? "first.json" : "second.json");
            std::ofstream(inputs_[v], std::ios::binary) << text_[v];
        }
        // A saved file with its backup, as after two saves.
        writeFileAtomically(target_.string(), text_[0], true);
        writeFileAtomically(target_.string(), text_[1], true);
    }
    void TearDown() override { fs::remove_all(dir_); }

    // Starts the save loop, waits until it saves, lets it run for `delay`
    // (not at all where it kills itself) and kills it.
    void runAndKill(std::chrono::microseconds delay, long killAt = 0)
    {
        int out[2];
        ASSERT_EQ(::pipe(out), 0);
        const pid_t pid = ::fork();
        ASSERT_GE(pid, 0);
        if (pid == 0) {
            ::dup2(out[1], STDOUT_FILENO);
            ::close(out[0]);
            ::close(out[1]);
            if (killAt > 0) ::setenv("CLEVIS_SAVE_LOOP_KILL_AT", std::to_string(killAt).c_str(), 1);
            ::execl(CLEVIS_SAVE_LOOP_PATH, CLEVIS_SAVE_LOOP_PATH, target_.c_str(), inputs_[0].c_str(),
                    inputs_[1].c_str(), static_cast<char*>(nullptr));
            std::_Exit(127);
        }
        ::close(out[1]);
        char said[8] = {};
        const ssize_t n = ::read(out[0], said, 7);
        ::close(out[0]);
        if (killAt == 0) {
            std::this_thread::sleep_for(delay);
            ::kill(pid, SIGKILL);
        }
        int status = 0;
        ::waitpid(pid, &status, 0);
        ASSERT_EQ(std::string(said, std::max<ssize_t>(n, 0)), "saving\n") << "the save loop did not start";
        ASSERT_TRUE(WIFSIGNALED(status) && WTERMSIG(status) == SIGKILL)
            << "the save loop ended otherwise than killed, status " << status;
    }

    // Which version `path` holds, complete (0 or 1), or -1 naming what is
    // wrong. The file itself is also opened as the desktop opens it; a backup
    // the same to the byte as a version reads back as that version (each was
    // read back in SetUp), so reading it again each time would only cost.
    int versionIn(const fs::path& path, bool open)
    {
        if (!fs::exists(path)) {
            ADD_FAILURE() << path.filename() << " is missing";
            return -1;
        }
        const std::string text = readFile(path);
        const auto v = std::find(std::begin(text_), std::end(text_), text) - std::begin(text_);
        if (v == 2) {
            ADD_FAILURE() << path.filename() << " is neither version: " << text.size() << " bytes against "
                          << text_[0].size() << " and " << text_[1].size();
            return -1;
        }
        if (open) EXPECT_EQ(loadMechanismFile(path.string()).mechanism, mechanism_[v]) << "it reads back otherwise";
        return int(v);
    }

    // What the kill left: the file and its backup, each a complete version,
    // and perhaps a temporary file of the save it stopped (removed here, or
    // the kills would fill the disk). Returns whether there was one.
    bool checkWhatIsLeft(const std::string& which)
    {
        SCOPED_TRACE(which);
        const int file = versionIn(target_, true), backup = versionIn(target_.string() + ".bak", false);
        ++seen_[file + 1][0];
        ++seen_[backup + 1][1];
        bool leftover = false;
        for (const auto& e : fs::directory_iterator(dir_)) {
            const std::string name = e.path().filename().string();
            if (name == "press.json" || name == "press.json.bak" || name == "first.json" || name == "second.json")
                continue;
            EXPECT_EQ(name.rfind(".press.json", 0), 0u) << "an unexpected file: " << name;
            fs::remove(e.path());
            leftover = true;
        }
        return leftover;
    }

    fs::path dir_, target_, inputs_[2];
    std::string text_[2];
    Mechanism mechanism_[2];
    int seen_[3][2] = {};  // [version + 1][file, backup]
};

// Each file-system call of a save in turn (each run starts afresh and first
// saves the version not on the disk), and the first of the next save: the
// gaps a random kill would rarely hit, such as the moment between dropping
// the old backup and making the new one.
// fsync of the new text, link and rename making the new backup, unlink of
// the spare name, rename over the file, fsync of the folder.
constexpr long kCallsOfASave = 6;

TEST_F(KilledSave, AtEveryCallOfTheSaveLeavesACompleteFileAndBackup)
{
    for (long call = 1; call <= kCallsOfASave + 1; ++call) {
        runAndKill({}, call);
        checkWhatIsLeft("killed on entering file-system call " + std::to_string(call));
        if (HasFailure()) return;
    }
}

TEST_F(KilledSave, AtRandomMomentsLeavesACompleteFileAndBackup)
{
    const char* asked = std::getenv("CLEVIS_SAVE_KILLS");
    const int kills = asked ? std::atoi(asked) : 200;
    // How long one save takes here, so that the kills spread over a few of them.
    const auto start = std::chrono::steady_clock::now();
    writeFileAtomically((dir_ / "timing.json").string(), text_[0], true);
    writeFileAtomically((dir_ / "timing.json").string(), text_[1], true);
    const auto oneSave = (std::chrono::steady_clock::now() - start) / 2;
    fs::remove(dir_ / "timing.json");
    fs::remove(dir_ / "timing.json.bak");

    constexpr unsigned kSeed = 15;
    std::mt19937 rng(kSeed);
    std::uniform_int_distribution<long> delay(
        0, std::chrono::duration_cast<std::chrono::microseconds>(3 * oneSave).count());
    int midSave = 0;
    for (int k = 0; k < kills; ++k) {
        const std::chrono::microseconds after(delay(rng));
        runAndKill(after);
        midSave += checkWhatIsLeft("kill " + std::to_string(k) + " (seed " + std::to_string(kSeed) + "), after " +
                                   std::to_string(after.count()) + " µs");
        if (HasFailure()) return;
    }
    std::printf(
        "%d kills, %zu and %zu bytes a version, one save %.1f ms: %d left a temporary file; "
        "file first/second version %d/%d, backup %d/%d\n",
        kills, text_[0].size(), text_[1].size(), std::chrono::duration<double, std::milli>(oneSave).count(), midSave,
        seen_[1][0], seen_[2][0], seen_[1][1], seen_[2][1]);
    // Otherwise the kills all fell outside the saves and showed nothing.
    EXPECT_GT(midSave, 0) << "no kill stopped a save half-way";
    EXPECT_GT(seen_[1][0], 0) << "no kill left the first version";
    EXPECT_GT(seen_[2][0], 0) << "no kill left the second version";
}

}  // namespace
}  // namespace clevis
