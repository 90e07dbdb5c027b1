// tenure_review(policy_json[, as_of[, scenario]]): the nightly review (`tenure review`) run on
// the calling connection, from SQL. It reads the fleet relations the policy names (asset,
// cost_event, asset_valuation by default), writes one run into the tenure_* tables, and returns
// the new run's id; the views tenure_latest, tenure_due, tenure_newly_due and
// tenure_class_latest then show it when it is the latest baseline run (by as_of, then run_id).
// policy_json NULL uses the latest policy stored in the database (tenure_policy, as `tenure
// policy set` stores it); as_of is 'YYYY-MM-DD', today (the local date) when left out or NULL.
// scenario, when given and not NULL, makes it a what-if run of that name (`tenure review
// --scenario`): the nightly views ignore it and tenure_scenario_diff compares it with the latest
// baseline run.
//
// Usage (on the invented demo fleet of `tenure demo --db demo.db`, which stores its policy):
//   SELECT tenure_review(NULL, '2026-11-30');                        -- 1, the new run's id
//   SELECT verdict, count(*) FROM tenure_latest GROUP BY verdict ORDER BY verdict;
//     keep|214
//     replace|63
//     review|36
//   SELECT asset_id, verdict FROM tenure_due ORDER BY asset_id LIMIT 2;
//     FLT-00049|replace
//     FLT-00051|replace
//   SELECT tenure_review(readfile('policy.json'), '2026-11-30');    -- 2: a policy from a file
//   SELECT tenure_review(readfile('price-up.json'), '2026-11-30', 'price-up');  -- 3: a what-if run
//   SELECT scenario, sum(verdict_differs) FROM tenure_scenario_diff GROUP BY scenario;
//     price-up|52           (price-up.json: the demo policy with every challenger price 20% up)
//
// Transactions (review_call.h): called in autocommit mode, the review commits its run itself;
// called inside BEGIN ... COMMIT it joins that transaction through a SAVEPOINT, so a ROLLBACK
// by the caller removes the run as if it never happened:
//   BEGIN; SELECT tenure_review(NULL, '2026-06-30'); ROLLBACK;   -- no new run
// It refuses to run inside a statement that writes (INSERT INTO log SELECT tenure_review(...)):
//   tenure_review: cannot run inside a statement that writes; call it from a SELECT
// Other errors name the argument or the JSON path in the policy:
//   tenure_review: 2nd argument (as_of) must be a date 'YYYY-MM-DD'
//   tenure_review: 3rd argument (scenario) may hold only letters, digits, '-', '_' and '.' (...)
//   tenure_review: $.marr: must be > 0
//   tenure_review: policy: no policy given and none stored in the database (...)
//
// SQLITE_DIRECTONLY: it reads and writes tables, so it may run only from top-level SQL, never
// from a view, a trigger or a schema that someone else could have written.
#include "plugin/functions.h"
#include "plugin/review_call.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {
namespace {

const Signature kReview{"tenure_review", {"policy_json", "as_of", "scenario"}};

}  // namespace

void review_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kReview, [&] {
    const Arguments args(kReview, argc, argv);
    std::optional<std::string> as_of;
    if (args.given("as_of")) {
      if (sqlite3_value_type(argv[1]) != SQLITE_TEXT) {
        throw InputError("as_of", "must be a date 'YYYY-MM-DD'");
      }
      as_of = args.text("as_of");
    }
    const std::int64_t run_id =
        review_on(sqlite3_context_db_handle(context), args.optional_text("policy_json"), as_of,
                  args.optional_text("scenario"));
    sqlite3_result_int64(context, run_id);
  });
}

}  // namespace tenure::plugin
