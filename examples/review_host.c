/* review_host: a small host program in C that uses tenure through its C ABI (tenure.h), the way
 * a maintenance system would: it opens its own database, runs the nightly review on that
 * connection, reads the answer from the views, and analyses one replacement case.
 *
 *   review_host DATABASE AS_OF CASE_FILE
 *   review_host demo.db 2026-06-30 fixtures/cases/delivery_van.json
 *     run 1
 *     due 51
 *     case verdict: {"analysis": ..., the result JSON of `tenure case`}
 *
 * DATABASE holds the fleet relations and a stored policy (`tenure demo --db demo.db` builds
 * one). Exit status: 0 done, else the tenure return code (1 failure, 2 bad input).
 *
 * Build against an installed tenure (examples/CMakeLists.txt does the first):
 *   find_package(tenure) and target_link_libraries(review_host PRIVATE tenure::tenure)
 *   cc review_host.c $(pkg-config --cflags --libs tenure) -o review_host
 */
#include <stdio.h>
#include <stdlib.h>

#include <sqlite3.h>
#include <tenure.h>

/* The whole file as a NUL-terminated string (free it), or NULL. */
static char* read_file(const char* path) {
  FILE* file = fopen(path, "rb");
  char* text = NULL;
  long size;
  if (file == NULL) return NULL;
  if (fseek(file, 0, SEEK_END) == 0 && (size = ftell(file)) >= 0 && fseek(file, 0, SEEK_SET) == 0 &&
      (text = malloc((size_t)size + 1)) != NULL) {
    if (fread(text, 1, (size_t)size, file) == (size_t)size) {
      text[size] = '\0';
    } else {
      free(text);
      text = NULL;
    }
  }
  fclose(file);
  return text;
}

/* Prints tenure's error message, frees it, and passes the return code on. */
static int report(const char* what, int code, char* error) {
  fprintf(stderr, "review_host: %s: %s\n", what, error != NULL ? error : "(no message)");
  tenure_free(error);
  return code;
}

static int count_due(sqlite3* db, long long* due) {
  sqlite3_stmt* count = NULL;
  int rc = sqlite3_prepare_v2(db, "SELECT count(*) FROM tenure_due", -1, &count, NULL);
  if (rc == SQLITE_OK && (rc = sqlite3_step(count)) == SQLITE_ROW) {
    *due = sqlite3_column_int64(count, 0);
    rc = SQLITE_OK;
  }
  sqlite3_finalize(count);
  return rc;
}

static int review(sqlite3* db, const char* as_of) {
  long long run_id = 0, due = 0;
  char* error = NULL;
  /* NULL policy: the latest policy stored in the database. */
  const int code = tenure_review_db(db, NULL, as_of, &run_id, &error);
  if (code != TENURE_OK) return report("review", code, error);
  if (count_due(db, &due) != SQLITE_OK) {
    fprintf(stderr, "review_host: counting tenure_due: %s\n", sqlite3_errmsg(db));
    return TENURE_FAILURE;
  }
  printf("run %lld\ndue %lld\n", run_id, due);
  return TENURE_OK;
}

static int analyse_case(const char* path) {
  char* case_json = read_file(path);
  char* result = NULL;
  char* error = NULL;
  int code;
  if (case_json == NULL) {
    fprintf(stderr, "review_host: cannot read %s\n", path);
    return TENURE_BAD_INPUT;
  }
  code = tenure_case_json(case_json, &result, &error);
  free(case_json);
  if (code != TENURE_OK) return report("case", code, error);
  printf("case result: %s\n", result);
  tenure_free(result);
  return TENURE_OK;
}

int main(int argc, char** argv) {
  sqlite3* db = NULL;
  int code;
  if (argc != 4) {
    fprintf(stderr, "usage: review_host DATABASE AS_OF CASE_FILE (tenure ABI %d, library %s)\n",
            TENURE_ABI_VERSION, tenure_library_version());
    return TENURE_BAD_INPUT;
  }
  if (tenure_abi_version() != TENURE_ABI_VERSION) {
    fprintf(stderr, "review_host: built for tenure ABI %d, running with %d\n", TENURE_ABI_VERSION,
            tenure_abi_version());
    return TENURE_FAILURE;
  }
  if (sqlite3_open_v2(argv[1], &db, SQLITE_OPEN_READWRITE, NULL) != SQLITE_OK) {
    fprintf(stderr, "review_host: cannot open %s: %s\n", argv[1], sqlite3_errmsg(db));
    sqlite3_close(db);
    return TENURE_FAILURE;
  }
  sqlite3_busy_timeout(db, 10000);
  code = review(db, argv[2]);
  sqlite3_close(db);
  if (code != TENURE_OK) return code;
  return analyse_case(argv[3]);
}
