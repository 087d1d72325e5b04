// Saving through writeFileAtomically: the new text replaces the old in one
// step, the old file is kept as a backup, and a save that fails or is killed
// half-way leaves the old file as it was. The tests run as root, for whom
// permissions do not stop a write, so failures are made by other means: a
// path through a regular file, a folder in place of the file, a file-size
// limit (setrlimit) that stops the write half-way, and — where the test may
// mount file systems — a read-only and a full tmpfs.
#include "core/file/atomic_file.h"
#include "tests/file_text.h"

#include <gtest/gtest.h>

#include <sys/mount.h>
#include <sys/resource.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

#include <algorithm>
#include <csignal>
#include <cstdlib>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <vector>

namespace clevis {
namespace {

namespace fs = std::filesystem;

using test::readFile;

void writePlainly(const fs::path& path, const std::string& text) { std::ofstream(path, std::ios::binary) << text; }

std::vector<std::string> entries(const fs::path& dir)
{
    std::vector<std::string> names;
    for (const auto& e : fs::directory_iterator(dir)) names.push_back(e.path().filename().string());
    std::sort(names.begin(), names.end());
    return names;
}

// Runs `body` in a child process; returns its wait status.
template <class Body>
int inChild(Body body)
{
    const pid_t pid = ::fork();
    if (pid == 0) {
        body();
        std::_Exit(0);
    }
    int status = 0;
    ::waitpid(pid, &status, 0);
    return status;
}

class AtomicFileTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        std::string pattern = (fs::temp_directory_path() / "clevis-atomic-test-XXXXXX").string();
        ASSERT_NE(::mkdtemp(pattern.data()), nullptr);
        dir_ = pattern;
        file_ = dir_ / "press.json";
    }
    void TearDown() override
    {
        if (!mounted_.empty()) ::umount2(mounted_.c_str(), MNT_DETACH);
        fs::remove_all(dir_);
    }

    // A tmpfs at dir_/mnt with the given options, or false where mounting is not allowed.
    bool mountTmpfs(const char* options, unsigned long flags = 0)
    {
        const fs::path at = dir_ / "mnt";
        fs::create_directory(at);
        if (::mount("tmpfs", at.c_str(), "tmpfs", flags, options) != 0) return false;
        mounted_ = at.string();
        return true;
    }

    fs::path dir_, file_;
    std::string mounted_;
};

TEST_F(AtomicFileTest, WritesANewFileWithTheUsualPermissions)
{
    writeFileAtomically(file_.string(), "first\n", true);
    EXPECT_EQ(readFile(file_), "first\n");
    EXPECT_EQ(entries(dir_), std::vector<std::string>{"press.json"});  // no backup of nothing, no temporary left
    const mode_t mask = ::umask(0);
    ::umask(mask);
    EXPECT_EQ(fs::status(file_).permissions(), fs::perms(0666 & ~mask));
}

TEST_F(AtomicFileTest, ReplacesTheFileAndKeepsThePreviousAsBackup)
{
    writeFileAtomically(file_.string(), "first\n", true);
    writeFileAtomically(file_.string(), "second\n", true);
    EXPECT_EQ(readFile(file_), "second\n");
    EXPECT_EQ(readFile(file_.string() + ".bak"), "first\n");
    writeFileAtomically(file_.string(), "third\n", true);
    EXPECT_EQ(readFile(file_.string() + ".bak"), "second\n");
    EXPECT_EQ(entries(dir_), (std::vector<std::string>{"press.json", "press.json.bak"}));
}

// A save stopped between making the new backup and replacing the file leaves
// the backup as a second name of the file itself; the next save must still
// leave just the file and its backup.
TEST_F(AtomicFileTest, ABackupThatIsTheFileItselfIsReplacedCleanly)
{
    writePlainly(file_, "old\n");
    fs::create_hard_link(file_, file_.string() + ".bak");
    writeFileAtomically(file_.string(), "new\n", true);
    EXPECT_EQ(readFile(file_), "new\n");
    EXPECT_EQ(readFile(file_.string() + ".bak"), "old\n");
    EXPECT_EQ(entries(dir_), (std::vector<std::string>{"press.json", "press.json.bak"}));
}

// Content made in pieces lands in the file in the order it was handed over.
TEST_F(AtomicFileTest, WritesContentMadeInPieces)
{
    writePlainly(file_, "old");
    const std::string big(1 << 20, 'y');
    writeFileAtomically(
        file_.string(),
        [&](const std::function<void(std::string_view)>& write) {
            write("first ");
            write("");
            write(big);
            write(" last");
        },
        true);
    EXPECT_EQ(readFile(file_), "first " + big + " last");
    EXPECT_EQ(readFile(file_.string() + ".bak"), "old");
}

// A producer that fails half-way (after pieces were written) leaves the old
// file as it was, and no temporary file behind.
TEST_F(AtomicFileTest, ContentThatFailsHalfWayLeavesTheOldFile)
{
    writePlainly(file_, "old");
    const auto failing = [](const std::function<void(std::string_view)>& write) {
        write("half a file");
        throw std::runtime_error("the results could not be made");
    };
    EXPECT_THROW(writeFileAtomically(file_.string(), failing, true), std::runtime_error);
    EXPECT_EQ(readFile(file_), "old");
    EXPECT_EQ(entries(dir_), std::vector<std::string>{"press.json"});
}

TEST_F(AtomicFileTest, WithoutBackupLeavesNone)
{
    writePlainly(file_, "old");
    writeFileAtomically(file_.string(), "new", false);
    EXPECT_EQ(readFile(file_), "new");
    EXPECT_FALSE(fs::exists(file_.string() + ".bak"));
}

TEST_F(AtomicFileTest, KeepsTheOldFilesPermissions)
{
    writePlainly(file_, "old");
    fs::permissions(file_, fs::perms(0640));
    writeFileAtomically(file_.string(), "new", true);
    EXPECT_EQ(fs::status(file_).permissions(), fs::perms(0640));
}

TEST_F(AtomicFileTest, ReplacesTheFileALinkPointsTo)
{
    const fs::path real = dir_ / "real.json";
    writePlainly(real, "old");
    fs::create_symlink(real, file_);
    writeFileAtomically(file_.string(), "new", true);
    EXPECT_TRUE(fs::is_symlink(file_));
    EXPECT_EQ(readFile(real), "new");
    EXPECT_EQ(readFile(real.string() + ".bak"), "old");
}

// The error names the path and the system's reason; nothing is left behind.
void expectFailure(const fs::path& path, const std::string& reason)
{
    try {
        writeFileAtomically(path.string(), "new", true);
        ADD_FAILURE() << "saving " << path << " did not fail";
    } catch (const FileWriteError& e) {
        EXPECT_EQ(e.path(), path.string());
        EXPECT_NE(std::string(e.what()).find("\"" + path.string() + "\""), std::string::npos) << e.what();
        EXPECT_NE(std::string(e.what()).find(reason), std::string::npos) << e.what();
    }
}

TEST_F(AtomicFileTest, FolderThatIsAFileFails)
{
    const fs::path notAFolder = dir_ / "notes.txt";
    writePlainly(notAFolder, "keep");
    expectFailure(notAFolder / "press.json", std::strerror(ENOTDIR));
    EXPECT_EQ(readFile(notAFolder), "keep");
    EXPECT_EQ(entries(dir_), std::vector<std::string>{"notes.txt"});
}

TEST_F(AtomicFileTest, MissingFolderFails)
{
    expectFailure(dir_ / "no-such-folder" / "press.json", std::strerror(ENOENT));
}

TEST_F(AtomicFileTest, FolderInPlaceOfTheFileFails)
{
    fs::create_directory(file_);
    writePlainly(file_ / "inside", "keep");
    expectFailure(file_, std::strerror(EISDIR));
    EXPECT_EQ(readFile(file_ / "inside"), "keep");
    EXPECT_EQ(entries(dir_), std::vector<std::string>{"press.json"});
}

// A file-size limit makes write() fail part-way (EFBIG), as a full disk
// would (ENOSPC); in a child, so the limit does not outlive the test.
TEST_F(AtomicFileTest, WriteStoppedHalfWayLeavesTheOldFile)
{
    writePlainly(file_, "old");
    const std::string big(1 << 20, 'x');
    const int status = inChild([&] {
        std::signal(SIGXFSZ, SIG_IGN);
        const rlimit limit{4096, 4096};
        ::setrlimit(RLIMIT_FSIZE, &limit);
        try {
            writeFileAtomically(file_.string(), big, true);
        } catch (const FileWriteError& e) {
            const bool named = std::string(e.what()).find(std::strerror(EFBIG)) != std::string::npos;
            std::_Exit(named ? 3 : 4);
        }
        std::_Exit(5);
    });
    ASSERT_TRUE(WIFEXITED(status));
    EXPECT_EQ(WEXITSTATUS(status), 3);
    EXPECT_EQ(readFile(file_), "old");
    EXPECT_EQ(entries(dir_), std::vector<std::string>{"press.json"});
}

TEST_F(AtomicFileTest, ReadOnlyFileSystemFails)
{
    if (!mountTmpfs("size=64k", MS_RDONLY)) GTEST_SKIP() << "cannot mount a tmpfs here: " << std::strerror(errno);
    expectFailure(fs::path(mounted_) / "press.json", std::strerror(EROFS));
}

TEST_F(AtomicFileTest, FullDiskFailsAndKeepsTheOldFile)
{
    if (!mountTmpfs("size=64k")) GTEST_SKIP() << "cannot mount a tmpfs here: " << std::strerror(errno);
    const fs::path file = fs::path(mounted_) / "press.json";
    writePlainly(file, "old");
    try {
        writeFileAtomically(file.string(), std::string(1 << 20, 'x'), true);
        ADD_FAILURE() << "a 1 MiB save into a 64 KiB file system did not fail";
    } catch (const FileWriteError& e) {
        EXPECT_NE(std::string(e.what()).find(std::strerror(ENOSPC)), std::string::npos) << e.what();
    }
    EXPECT_EQ(readFile(file), "old");
    EXPECT_EQ(entries(mounted_), std::vector<std::string>{"press.json"});
}

// The save is killed (SIGKILL, which nothing can catch) with the new text
// complete in its temporary file but not yet renamed: the old file is intact,
// and the next save works and replaces the leftover cleanly.
TEST_F(AtomicFileTest, KilledDuringTheSaveLeavesTheOldFileIntact)
{
    writeFileAtomically(file_.string(), "old\n", true);
    std::string temporary;
    const int status = inChild(
        [&] { writeFileAtomically(file_.string(), "new\n", true, [](const std::string&) { ::raise(SIGKILL); }); });
    ASSERT_TRUE(WIFSIGNALED(status));
    EXPECT_EQ(WTERMSIG(status), SIGKILL);
    EXPECT_EQ(readFile(file_), "old\n");
    for (const auto& name : entries(dir_))
        if (name != "press.json" && name != "press.json.bak") temporary = name;
    ASSERT_FALSE(temporary.empty()) << "the killed save left no temporary file: was it stopped before writing?";
    EXPECT_EQ(readFile(dir_ / temporary), "new\n");

    writeFileAtomically(file_.string(), "newer\n", true);
    EXPECT_EQ(readFile(file_), "newer\n");
    EXPECT_EQ(readFile(file_.string() + ".bak"), "old\n");
}

}  // namespace
}  // namespace clevis
