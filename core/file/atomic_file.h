// Saving a file so that a failure or a crash at any moment leaves either the
// old content or the new, never a mixture: the text goes to a temporary file
// in the same directory, is flushed to the disk, and is then renamed over the
// target in one step.
#pragma once

#include <functional>
#include <stdexcept>
#include <string>
#include <string_view>

namespace clevis {

// A save that did not happen; the message names the file and the system's
// reason. The old file, if any, is untouched.
class FileWriteError : public std::runtime_error {
public:
    FileWriteError(std::string path, const std::string& message) : std::runtime_error(message), path_(std::move(path))
    {}
    const std::string& path() const { return path_; }

private:
    std::string path_;
};

// Replaces `path` with `content`. With `keepBackup`, the previous file is
// kept as `path + ".bak"` (replacing an older backup). A symbolic link is
// followed: the file it points to is replaced. Throws FileWriteError.
void writeFileAtomically(const std::string& path, const std::string& content, bool keepBackup);

// Content made in pieces: `produce(write)` calls `write` with each piece in
// turn, which goes to the file at once (a results file of tens of megabytes
// is never held whole).
using TextProducer = std::function<void(const std::function<void(std::string_view)>& write)>;
void writeFileAtomically(const std::string& path, const TextProducer& produce, bool keepBackup);

// The same, calling `beforeRename(temporaryPath)` once the temporary file is
// complete and synced, just before it replaces the target: lets a test stop
// the save at its most delicate point.
void writeFileAtomically(const std::string& path, const std::string& content, bool keepBackup,
                         const std::function<void(const std::string&)>& beforeRename);
void writeFileAtomically(const std::string& path, const TextProducer& produce, bool keepBackup,
                         const std::function<void(const std::string&)>& beforeRename);

}  // namespace clevis
