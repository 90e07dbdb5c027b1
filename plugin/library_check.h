// Whether a host's SQLite is the library libtenure itself calls. tenure's code (db/, plugin/)
// calls the SQLite C API directly, resolved by the dynamic linker to the libsqlite3 that
// libtenure.so is linked against; a host that loads the extension passes its own API table. Both
// are the same library when the host uses the system's shared libsqlite3 (the stock sqlite3
// shell, Python's sqlite3 module, most programs). A host with its own copy of SQLite compiled in
// would hand tenure connections of a different library, so the entry point refuses to load there.
//
//   if (!is_linked_library(api->libversion_number)) return SQLITE_ERROR;
#pragma once

namespace tenure::plugin {

using LibraryFunction = int (*)();

// True when `host_libversion_number` (the host API table's libversion_number) is the function
// libtenure calls as sqlite3_libversion_number.
bool is_linked_library(LibraryFunction host_libversion_number);

}  // namespace tenure::plugin
