// tenure_reference_pages OUT_DIR: writes OUT_DIR/tenure.1 (the manual page) and OUT_DIR/tenure
// (the bash completion script) from the command line of `tenure` (reference_pages.h). The build
// runs it; `cmake --install` installs what it writes.
#include <fstream>
#include <iostream>
#include <sstream>
#include <string>

#include "cli/commands.h"
#include "cli/reference_pages.h"

namespace {

bool write(const std::string& path, const std::string& text) {
  std::ofstream out(path, std::ios::binary);
  out << text;
  out.close();
  if (!out) std::cerr << "tenure_reference_pages: cannot write " << path << '\n';
  return static_cast<bool>(out);
}

}  // namespace

int main(int argc, char** argv) {
  if (argc != 2) {
    std::cerr << "usage: tenure_reference_pages OUT_DIR\n";
    return 2;
  }
  std::istringstream no_input;
  std::ostringstream no_output;
  CLI::App app;
  tenure::cli::add_commands(app, {no_input, no_output, no_output});
  const std::string dir = argv[1];
  const bool ok = write(dir + "/tenure.1", tenure::cli::man_page(app)) &&
                  write(dir + "/tenure", tenure::cli::bash_completion(app));
  return ok ? 0 : 1;
}
