// Writing a file the command line produces (`tenure report --out PATH`) so that nothing is lost
// or replaced by mistake: the text goes to PATH.partial next to it and is renamed over PATH only
// once it is whole, so a reader never sees half a page; something at PATH that is not a regular
// file (a device such as /dev/null, a directory, a symbolic link, /proc/self/fd/1) is refused,
// never replaced; a failure removes PATH.partial.
//
//   write_whole_file(options.out, html, "--out");
//   // InputError("--out", "'/dev/null' is not a regular file (a device): not replaced; ...")
#pragma once

#include <string>
#include <string_view>

namespace tenure::cli {

// Throws InputError naming `option` for a path that is not a regular file or cannot be created
// (no such folder, no permission), RuntimeFailure when writing fails (a full disk).
void write_whole_file(const std::string& path, std::string_view text, const std::string& option);

}  // namespace tenure::cli
