/* tenure.h: the C ABI of libtenure, for host programs that are not SQL-first. A host runs the
 * nightly review on its own SQLite connection and analyses replacement cases, without starting
 * the `tenure` command. (The same library is also the SQLite extension: see plugin/extension.cpp.)
 *
 *   #include <sqlite3.h>
 *   #include <tenure.h>
 *
 *   sqlite3* db;  sqlite3_open("fleet.db", &db);
 *   long long run_id = 0;
 *   char* error = NULL;
 *   if (tenure_review_db(db, NULL, "2026-06-30", &run_id, &error) != TENURE_OK) {
 *     fprintf(stderr, "%s\n", error);
 *     tenure_free(error);
 *   }
 *
 * Build against the installed library with CMake (find_package(tenure) and the target
 * tenure::tenure) or pkg-config (`pkg-config --cflags --libs tenure`). examples/review_host.c
 * is a whole host.
 *
 * Versioning: TENURE_ABI_VERSION is the version of this interface the host was compiled with,
 * tenure_abi_version() the version of the library it runs with; they differ only when a
 * function's meaning or signature changed (the shared library's soname carries it:
 * libtenure.so.1). Functions are only ever added within one ABI version.
 *
 * Return codes, the same as the `tenure` command's exit codes:
 *   TENURE_OK         0   done
 *   TENURE_FAILURE    1   something that is not the input's fault: the database could not be
 *                         read or written, out of memory, an unexpected failure
 *   TENURE_BAD_INPUT  2   a bad argument, policy, case or date, a missing input relation
 *
 * Ownership: every char* the library returns through an out-parameter was allocated by the
 * library and belongs to the caller, who frees it with tenure_free() (and only with it). On
 * success error_message is set to NULL; on failure it points to one line naming the field and
 * the rule (e.g. "$.challenger.first_cost: must be > 0") and the other outputs are NULL or 0.
 * Passing NULL for error_message means "I do not want the message". Input strings are UTF-8,
 * NUL-terminated, and only read during the call. No C++ exception ever leaves the library.
 *
 * Threads: the functions keep no global state; tenure_review_db uses the connection it is given
 * as SQLite's threading mode allows (one thread at a time per connection).
 */
#ifndef TENURE_H
#define TENURE_H

#include <sqlite3.h>

#define TENURE_ABI_VERSION 1

#if defined(__GNUC__)
#define TENURE_API __attribute__((visibility("default")))
#else
#define TENURE_API
#endif

#ifdef __cplusplus
extern "C" {
#endif

enum tenure_status { TENURE_OK = 0, TENURE_FAILURE = 1, TENURE_BAD_INPUT = 2 };

/* The ABI version of the library (TENURE_ABI_VERSION when it was built). */
TENURE_API int tenure_abi_version(void);

/* The library's release, such as "0.1.0" (static storage; do not free). */
TENURE_API const char* tenure_library_version(void);

/* Runs the nightly review on `db`, a connection the caller opened (read-write) and keeps owning,
 * and stores the new run's id in *run_id. Results go into the tenure_* tables and views of that
 * database, as with `tenure review`.
 *   policy_json  the policy's JSON text; NULL uses the latest policy stored in the database
 *   as_of        'YYYY-MM-DD'; NULL means today (the local date)
 * In autocommit mode the run commits itself; inside a transaction the caller holds, it joins
 * that transaction (a savepoint), so the caller's ROLLBACK removes the run. Must not be called
 * while a statement that writes is running on `db` (TENURE_BAD_INPUT). */
TENURE_API int tenure_review_db(sqlite3* db, const char* policy_json, const char* as_of,
                                long long* run_id, char** error_message);

/* Analyses one replacement case (the JSON text of a case file, as `tenure case FILE`) and sets
 * *result_json to the result document, the JSON that `tenure case` prints. */
TENURE_API int tenure_case_json(const char* case_json, char** result_json, char** error_message);

/* Frees a string the library returned. NULL is allowed. */
TENURE_API void tenure_free(char* text);

#ifdef __cplusplus
}
#endif

#endif /* TENURE_H */
