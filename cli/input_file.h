// Reading the text of an input file named on the command line; "-" reads standard input.
// A file that is missing or cannot be read is bad input: an InputError naming the file, and so
// is one larger than formats::kMaxJsonTextBytes (16 MiB), refused after reading that much.
//
//   std::string text = read_input_file("case.json", std::cin);
//   // throws InputError("case.json", "cannot read the file: No such file or directory")
#pragma once

#include <istream>
#include <string>

namespace tenure::cli {

std::string read_input_file(const std::string& file, std::istream& standard_input);

}  // namespace tenure::cli
