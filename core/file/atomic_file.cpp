#include "core/file/atomic_file.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <atomic>
#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <optional>
#include <sstream>

namespace clevis {
namespace {

namespace fs = std::filesystem;

[[noreturn]] void fail(const std::string& path, const std::string& what, int error)
{
    throw FileWriteError(path, "cannot save \"" + path + "\": " + what + ": " + std::strerror(error));
}

// The file a save replaces: the target of a symbolic link, so that the link
// itself survives.
std::string resolvedTarget(const std::string& path)
{
    std::error_code ec;
    if (!fs::is_symlink(path, ec)) return path;
    const fs::path target = fs::weakly_canonical(path, ec);
    return ec ? path : target.string();
}

std::optional<struct stat> existing(const std::string& path)
{
    struct stat st {};
    if (::stat(path.c_str(), &st) != 0) return std::nullopt;
    return st;
}

// A hidden name beside `target` for a file on its way to replacing it: the
// process id and a counter keep names apart; the caller skips one in use (a
// leftover from a crash) by asking again.
std::string temporaryNameFor(const std::string& target)
{
    static std::atomic<unsigned> counter{0};
    const fs::path p(target);
    // Appended piece by piece: `"." + name + …` makes GCC 12 warn falsely (-Wrestrict) at -O2.
    std::string name = ".";
    name += p.filename().string();
    name += ".saving-";
    name += std::to_string(::getpid());
    name += '-';
    name += std::to_string(counter++);
    return (p.parent_path() / name).string();
}

// Removes the temporary file unless the save got as far as renaming it.
class TemporaryFile {
public:
    TemporaryFile(const std::string& target, const std::string& reportedPath) : reported_(reportedPath)
    {
        // Created like any new file (mode 0666 less the umask).
        const fs::path p(target);
        do {
            name_ = temporaryNameFor(target);
            fd_ = ::open(name_.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
        } while (fd_ < 0 && errno == EEXIST);
        if (fd_ < 0) {
            const int error = errno;
            const std::string dir = p.parent_path().empty() ? "." : p.parent_path().string();
            fail(reported_, "cannot create a temporary file in \"" + dir + "\"", error);
        }
    }
    ~TemporaryFile()
    {
        if (fd_ >= 0) ::close(fd_);
        if (!renamed_) ::unlink(name_.c_str());
    }
    TemporaryFile(const TemporaryFile&) = delete;
    TemporaryFile& operator=(const TemporaryFile&) = delete;

    const std::string& name() const { return name_; }

    // The content as `produce` hands it over, in one piece or many, then
    // flushed to the disk.
    void write(const TextProducer& produce, std::optional<mode_t> keepMode)
    {
        if (keepMode && ::fchmod(fd_, *keepMode) != 0) fail(reported_, "cannot set the file's permissions", errno);
        produce([this](std::string_view piece) { append(piece); });
        if (::fsync(fd_) != 0) fail(reported_, "cannot flush the file to the disk", errno);
        const int fd = fd_;
        fd_ = -1;
        if (::close(fd) != 0) fail(reported_, "cannot finish writing the file", errno);
    }

    void renameOver(const std::string& target)
    {
        if (::rename(name_.c_str(), target.c_str()) != 0) fail(reported_, "cannot replace the file", errno);
        renamed_ = true;
    }

private:
    void append(std::string_view piece)
    {
        std::size_t done = 0;
        while (done < piece.size()) {
            const ssize_t n = ::write(fd_, piece.data() + done, piece.size() - done);
            if (n < 0 && errno == EINTR) continue;
            if (n < 0) fail(reported_, "cannot write the file", errno);
            done += std::size_t(n);
        }
    }

    std::string reported_, name_;
    int fd_ = -1;
    bool renamed_ = false;
};

std::string fileText(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    if (!in && !in.eof()) fail(path, "cannot read the previous file for its backup", errno);
    return text.str();
}

// The previous file becomes the backup by a second name (a hard link), so
// the target never disappears. The link is made under a temporary name and
// renamed over the old backup, so that there is a backup, old or new, at every
// moment (removing the old one first left none until the link was made).
// Where links are not possible the previous file is copied, as atomically.
void keepBackupOf(const std::string& target, const std::string& reportedPath)
{
    const std::string backup = target + ".bak";
    std::string link;
    int linked = -1;
    do {
        link = temporaryNameFor(backup);
        linked = ::link(target.c_str(), link.c_str());
    } while (linked != 0 && errno == EEXIST);
    if (linked != 0) {
        writeFileAtomically(backup, fileText(target), false);
        return;
    }
    const int renamed = ::rename(link.c_str(), backup.c_str());
    const int error = errno;
    // Where the old backup already was the target (a save stopped just
    // before its rename), rename() leaves both names as they are: the spare
    // name goes here, as it does after a failure.
    ::unlink(link.c_str());
    if (renamed != 0) fail(reportedPath, "cannot replace the old backup \"" + backup + "\"", error);
}

// Makes the rename itself durable. Best effort: the new file is already in
// place, and a directory that cannot be synced is no reason to report the
// save as failed.
void syncDirectoryOf(const std::string& target)
{
    const fs::path dir = fs::path(target).parent_path();
    const int fd = ::open(dir.empty() ? "." : dir.c_str(), O_RDONLY | O_DIRECTORY);
    if (fd < 0) return;
    ::fsync(fd);
    ::close(fd);
}

}  // namespace

void writeFileAtomically(const std::string& path, const TextProducer& produce, bool keepBackup,
                         const std::function<void(const std::string&)>& beforeRename)
{
    const std::string target = resolvedTarget(path);
    const std::optional<struct stat> old = existing(target);
    if (old && S_ISDIR(old->st_mode)) fail(path, "a folder has that name", EISDIR);
    TemporaryFile temp(target, path);
    temp.write(produce, old ? std::optional<mode_t>(old->st_mode & 07777) : std::nullopt);
    if (keepBackup && old) keepBackupOf(target, path);
    if (beforeRename) beforeRename(temp.name());
    temp.renameOver(target);
    syncDirectoryOf(target);
}

void writeFileAtomically(const std::string& path, const std::string& content, bool keepBackup,
                         const std::function<void(const std::string&)>& beforeRename)
{
    writeFileAtomically(
        path, [&](const std::function<void(std::string_view)>& write) { write(content); }, keepBackup, beforeRename);
}

void writeFileAtomically(const std::string& path, const std::string& content, bool keepBackup)
{
    writeFileAtomically(path, content, keepBackup, {});
}

void writeFileAtomically(const std::string& path, const TextProducer& produce, bool keepBackup)
{
    writeFileAtomically(path, produce, keepBackup, {});
}

}  // namespace clevis
