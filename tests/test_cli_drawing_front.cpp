// clevis-cli without Qt: the analysis links the core only, and the drawing
// commands are handed to clevis-draw beside it (app/drawing_program.h). The
// built binaries are checked as a user gets them.
#include "tests/cli_runner.h"

#include <gtest/gtest.h>

#include <unistd.h>

#include <filesystem>
#include <regex>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

using clevis::test::CliRun;
using clevis::test::contains;
using clevis::test::quoted;
using clevis::test::readFile;

class DrawingFront : public ::testing::Test {
protected:
    void SetUp() override
    {
        std::string pattern = (fs::temp_directory_path() / "clevis-front-test-XXXXXX").string();
        ASSERT_NE(mkdtemp(pattern.data()), nullptr);
        dir_ = pattern;
        press_ = fs::path(CLEVIS_SAMPLES_DIR) / "punch_press.json";
    }
    void TearDown() override { fs::remove_all(dir_); }

    fs::path dir_, press_;
};

// An ELF file's program headers and dynamic section, as binutils' objdump
// prints them.
std::string elfHeaders(const fs::path& elf, const fs::path& scratch)
{
    const fs::path listing = scratch / "objdump.txt";
    const std::string command = "objdump -p " + quoted(elf) + " >" + quoted(listing);
    EXPECT_EQ(std::system(command.c_str()), 0) << command;
    return readFile(listing);
}

// The shared libraries an ELF file asks the loader for (its NEEDED entries).
std::vector<std::string> neededLibraries(const std::string& headers)
{
    std::vector<std::string> needed;
    std::istringstream lines(headers);
    const std::regex entry(R"(^\s*NEEDED\s+(\S+))");
    std::smatch m;
    for (std::string line; std::getline(lines, line);)
        if (std::regex_search(line, m, entry)) needed.push_back(m[1]);
    return needed;
}

TEST_F(DrawingFront, TheAnalysisProgramNeedsNoQtOrGuiLibrary)
{
    const std::string headers = elfHeaders(CLEVIS_CLI_PATH, dir_);
    ASSERT_TRUE(contains(headers, "file format elf")) << "not read: is objdump there?\n" << headers;
    const std::regex gui(R"(Qt|qcustomplot|^libGL|^libEGL|^libX|^libxcb|^libxkb|fontconfig|freetype|^libpng|glib)",
                         std::regex::icase);
    for (const std::string& library : neededLibraries(headers))
        EXPECT_FALSE(std::regex_search(library, gui)) << library;
}

// Linked whole (app/CMakeLists.txt), clevis-cli starts without the loader: no
// shared library is looked up, mapped and bound at each start, most of what
// its start-up cost beyond the system's own (README, "Start-up").
TEST_F(DrawingFront, TheAnalysisProgramStartsWithoutTheLoader)
{
    const std::string headers = elfHeaders(CLEVIS_CLI_PATH, dir_);
    ASSERT_TRUE(contains(headers, "file format elf")) << "not read: is objdump there?\n" << headers;
    EXPECT_FALSE(contains(headers, "INTERP")) << headers;
    EXPECT_TRUE(neededLibraries(headers).empty()) << headers;
}

#ifdef CLEVIS_DRAW_BUILT
TEST_F(DrawingFront, ADrawingCommandThroughTheFrontWritesItsFile)
{
    const fs::path svg = dir_ / "ram.svg";
    const CliRun r =
        clevis::test::runCli(dir_, "fbd " + quoted(press_) + " --body ram --at-deg 30 --out " + quoted(svg));
    EXPECT_EQ(r.exitCode, 0) << r.err;
    ASSERT_TRUE(fs::exists(svg));
    const std::string text = readFile(svg);
    EXPECT_TRUE(contains(text, "<svg")) << text.substr(0, 200);
    EXPECT_TRUE(contains(text, "Free-body diagram: ram"));
}
#endif

// clevis-cli alone in a folder: a drawing command fails with a message naming
// the program it needs and where it looked; what clevis-cli can answer itself
// (help, a wrong command line) it still answers.
TEST_F(DrawingFront, AMissingDrawingProgramIsNamed)
{
    const fs::path alone = dir_ / "alone";
    fs::create_directory(alone);
    const fs::path cli = alone / "clevis-cli";
    fs::copy_file(CLEVIS_CLI_PATH, cli);
    fs::permissions(cli, fs::perms::owner_all);
    const fs::path svg = dir_ / "ram.svg";

    CliRun r =
        clevis::test::runProgram(cli, dir_, "fbd " + quoted(press_) + " --body ram --at-deg 30 --out " + quoted(svg));
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "fbd is drawn by clevis-draw, which cannot be run: " +
                                    (alone / "clevis-draw").string() + ": No such file or directory"))
        << r.err;
    EXPECT_FALSE(fs::exists(svg));

    r = clevis::test::runProgram(cli, dir_, "report " + quoted(press_) + " --out " + quoted(dir_ / "review.txt"));
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "the report is a .pdf file")) << r.err;
    EXPECT_TRUE(contains(r.err, "clevis-cli report --help")) << r.err;

    r = clevis::test::runProgram(cli, dir_, "bearing-polar --help");
    EXPECT_EQ(r.exitCode, 0);
    EXPECT_TRUE(contains(r.out, "Usage: clevis-cli bearing-polar FILE --joint NAME")) << r.out;
}

}  // namespace
