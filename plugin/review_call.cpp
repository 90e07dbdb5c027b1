// The review on a borrowed connection (see review_call.h).
#include "plugin/review_call.h"

#include "core/errors.h"
#include "db/connection.h"
#include "app/review_run.h"
#include "fleet/date.h"

namespace tenure::plugin {

std::int64_t review_on(sqlite3* db, const std::optional<std::string>& policy_json,
                       const std::optional<std::string>& as_of,
                       const std::optional<std::string>& scenario) {
  app::ReviewOptions options;
  options.policy_json = policy_json;
  options.scenario = scenario;
  if (as_of) {
    options.as_of = parse_iso_date(*as_of);
    if (!options.as_of) throw InputError("as_of", "must be a date 'YYYY-MM-DD'");
  }
  db::Connection connection = db::Connection::borrow(db);
  // A statement that writes holds the connection's write state open until it ends: SQLite
  // refuses both a COMMIT and a new SAVEPOINT while it runs, and a failure there could abort it.
  if (connection.writing_statement_running()) {
    throw InputError("", "cannot run inside a statement that writes; call it from a SELECT");
  }
  return app::run_review(connection, options).run_id;
}

}  // namespace tenure::plugin
