// Reading input files (see input_file.h).
#include "cli/input_file.h"

#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <sstream>

#include "core/errors.h"

namespace tenure::cli {

std::string read_input_file(const std::string& file, std::istream& standard_input) {
  std::ostringstream text;
  if (file == "-") {
    text << standard_input.rdbuf();
    if (standard_input.bad()) throw InputError("-", "cannot read standard input");
    return text.str();
  }
  // A directory opens like a file on Linux and only fails on reading; say what it is.
  std::error_code ignored;
  if (std::filesystem::is_directory(file, ignored)) {
    throw InputError(file, "is a directory, not a file");
  }
  std::ifstream in(file, std::ios::binary);
  if (!in) throw InputError(file, std::string("cannot read the file: ") + std::strerror(errno));
  text << in.rdbuf();
  if (in.bad()) throw InputError(file, "cannot read the file");
  return text.str();
}

}  // namespace tenure::cli
