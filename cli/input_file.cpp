// Reading input files (see input_file.h).
#include "cli/input_file.h"

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <string>

#include "core/errors.h"
#include "formats/json_text.h"

namespace tenure::cli {

namespace {

// At most one byte more than a case or policy text may have, so that a larger one is refused
// without reading all of it.
std::string read_bounded(std::istream& in, const std::string& name) {
  std::string text;
  char chunk[1 << 16];
  while (text.size() <= formats::kMaxJsonTextBytes && in.read(chunk, sizeof chunk).gcount() > 0) {
    text.append(chunk, static_cast<std::size_t>(in.gcount()));
  }
  if (in.bad()) {
    throw InputError(name, name == "-" ? "cannot read standard input" : "cannot read the file");
  }
  if (text.size() > formats::kMaxJsonTextBytes) {
    throw InputError(name, "is larger than " + std::to_string(formats::kMaxJsonTextBytes) +
                               " bytes (16 MiB), the most a case or policy file may be");
  }
  return text;
}

}  // namespace

std::string read_input_file(const std::string& file, std::istream& standard_input) {
  if (file == "-") return read_bounded(standard_input, "-");
  // A directory opens like a file on Linux and only fails on reading; say what it is.
  std::error_code ignored;
  if (std::filesystem::is_directory(file, ignored)) {
    throw InputError(file, "is a directory, not a file");
  }
  std::ifstream in(file, std::ios::binary);
  if (!in) throw InputError(file, std::string("cannot read the file: ") + std::strerror(errno));
  return read_bounded(in, file);
}

}  // namespace tenure::cli
