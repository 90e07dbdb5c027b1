// tenure_case(case_json): one whole replacement analysis, as `tenure case FILE` does it: the case
// file's JSON text in (SPEC 5; // and /* */ comments allowed), the result document out as JSON
// text. The document is the one `tenure case` prints, as compact JSON instead of indented: the
// same keys and values (economic service life and EUAC curves before and after tax, the
// defender's marginal costs, the keep/replace decision with its reason, the study period).
//
// Usage (the shell's readfile() reads a file; fixtures/cases/ holds invented examples):
//   SELECT json_extract(tenure_case(readfile('fixtures/cases/delivery_van.json')),
//                       '$.decision.verdict', '$.decision.replace_after_years');
//     -- ["keep",2]
//   SELECT json_extract(tenure_case('{"marr": 0.10, "income_tax_rate": 0,
//       "challenger": {"first_cost": 20000, "operating_costs": [2000, 3000, 4500, 6500],
//       "market_values": [15000, 11000, 8000, 6000], "depreciation": {"method": "none"}}}'),
//     '$.challenger.before_tax.esl_years');   -- 3
//   -- The challenger's EUAC curve as rows (least at 4 years: its economic service life):
//   SELECT json_extract(value, '$.years'), round(json_extract(value, '$.euac'), 2)
//     FROM json_each(tenure_case(readfile('fixtures/cases/delivery_van.json')),
//                    '$.challenger.before_tax.curve');
//     1|25000.0
//     2|22380.95
//     3|21389.73
//     4|21176.47
//     5|21360.5
//     6|21806.29
//
// Errors carry the JSON path and the rule, as the command's do:
//   tenure_case: $.challenger.first_cost: must be > 0
//   tenure_case: $.foo: unknown key (expected one of marr, income_tax_rate, ...)
//   tenure_case: 1st argument (case_json) must be text
// To nest the result inside json_object(), wrap it in json(): it is returned as plain text.
//
// Deterministic and innocuous: the result depends on the argument only.
#include "app/case_run.h"
#include "formats/json_text.h"
#include "plugin/functions.h"
#include "plugin/sql_arguments.h"

namespace tenure::plugin {
namespace {

const Signature kCase{"tenure_case", {"case_json"}};

}  // namespace

void case_function(sqlite3_context* context, int argc, sqlite3_value** argv) {
  guarded(context, kCase, [&] {
    const Arguments args(kCase, argc, argv);
    const std::string json =
        formats::json_output(app::case_result_json(args.text("case_json")), -1);
    sqlite3_result_text(context, json.data(), static_cast<int>(json.size()), SQLITE_TRANSIENT);
  });
}

}  // namespace tenure::plugin
