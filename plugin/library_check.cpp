// Comparing the host's SQLite with the linked one (see library_check.h). This file must not
// include sqlite3ext.h, whose macros would turn sqlite3_libversion_number into the host's.
#include "plugin/library_check.h"

#include <sqlite3.h>

namespace tenure::plugin {

bool is_linked_library(LibraryFunction host_libversion_number) {
  return host_libversion_number == &sqlite3_libversion_number;
}

}  // namespace tenure::plugin
