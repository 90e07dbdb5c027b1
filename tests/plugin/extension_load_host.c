/* A C host that loads libtenure as an extension with sqlite3_load_extension and prints the
 * outcome. Linked with the shared libsqlite3 (the library libtenure uses) it loads:
 *   extension_load_host /path/to/libtenure      ->  loaded
 * Linked with its own copy of SQLite (the static libsqlite3.a) it must be refused cleanly, so
 * that tenure's code never runs on a connection of another SQLite (plugin/library_check.h):
 *   load refused: error during initialization: tenure: this program's SQLite is not ...
 */
#include <stdio.h>

#include <sqlite3.h>

int main(int argc, char** argv) {
  sqlite3* db = NULL;
  char* error = NULL;
  int rc;
  if (argc != 2 || sqlite3_open(":memory:", &db) != SQLITE_OK) return 2;
  sqlite3_enable_load_extension(db, 1);
  rc = sqlite3_load_extension(db, argv[1], NULL, &error);
  if (rc == SQLITE_OK) {
    printf("loaded\n");
  } else {
    printf("load refused: %s\n", error != NULL ? error : "(no message)");
  }
  sqlite3_free(error);
  sqlite3_close(db);
  return 0;
}
