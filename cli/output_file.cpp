// Writing a whole file (see output_file.h), through POSIX calls so that errno tells a bad path
// (bad input) from a failing disk (a runtime failure).
#include "cli/output_file.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <cstdio>
#include <cstring>

#include <fmt/format.h>

#include "core/errors.h"

namespace tenure::cli {
namespace {

std::string kind_of(mode_t mode) {
  if (S_ISLNK(mode)) return "a symbolic link";
  if (S_ISDIR(mode)) return "a directory";
  if (S_ISCHR(mode) || S_ISBLK(mode)) return "a device";
  if (S_ISFIFO(mode)) return "a pipe";
  if (S_ISSOCK(mode)) return "a socket";
  return "not a plain file";
}

// A failure of the disk is not the input's fault; a path that cannot be made is.
[[noreturn]] void fail(int error, const std::string& what, const std::string& option) {
  const std::string message = fmt::format("{}: {}", what, std::strerror(error));
  if (error == ENOSPC || error == EIO || error == EDQUOT || error == EFBIG) {
    throw RuntimeFailure(fmt::format("{}: {}", option, message));
  }
  throw InputError(option, message);
}

}  // namespace

void write_whole_file(const std::string& path, std::string_view text, const std::string& option) {
  struct stat existing {};
  if (::lstat(path.c_str(), &existing) == 0 && !S_ISREG(existing.st_mode)) {
    throw InputError(option, fmt::format("'{}' is {}: it is not replaced; give the path of a "
                                         "regular file, or - for standard output",
                                         path, kind_of(existing.st_mode)));
  }
  const std::string partial = path + ".partial";
  const int fd = ::open(partial.c_str(), O_WRONLY | O_CREAT | O_TRUNC | O_NOFOLLOW, 0644);
  if (fd < 0) fail(errno, fmt::format("cannot create '{}'", partial), option);
  std::size_t written = 0;
  int error = 0;
  while (written < text.size()) {
    const ssize_t n = ::write(fd, text.data() + written, text.size() - written);
    if (n < 0) {
      if (errno == EINTR) continue;
      error = errno;
      break;
    }
    written += static_cast<std::size_t>(n);
  }
  if (error == 0 && ::fsync(fd) != 0) error = errno;
  if (::close(fd) != 0 && error == 0) error = errno;
  if (error == 0 && std::rename(partial.c_str(), path.c_str()) != 0) error = errno;
  if (error != 0) {
    std::remove(partial.c_str());
    fail(error, fmt::format("cannot write '{}'", path), option);
  }
}

}  // namespace tenure::cli
