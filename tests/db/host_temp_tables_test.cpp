// A host's TEMP tables named like tenure's own never receive a run's rows nor hide its results:
// every statement tenure runs names main.tenure_... (issue: a TEMP tenure_rejected of the host
// received the run's rejected rows). The fleet is the invented fixture fleet, with a bad row.
#include <gtest/gtest.h>

#include "app/review_run.h"
#include "db/run_reader.h"
#include "db_test_support.h"
#include "fixtures/fleets/fixture_fleets.h"

namespace tenure::db {
namespace {

using testing_support::scalar;
using testing_support::TempDatabase;

TEST(HostTempTables, AreNeverWrittenOrRead) {
  TempDatabase file;
  Connection db = file.open();
  fixtures::create_input_tables(db.handle());
  fixtures::add_noiseless_fleet(db.handle());
  db.exec("INSERT INTO cost_event VALUES ('PF-404', '2025-01-01', 10, 'repair');");  // no asset
  // A first run makes the schema; then the host's own TEMP tables of the same names.
  app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  db.exec("CREATE TEMP TABLE tenure_rejected(run_id, source, row_ref, reason);"
          "CREATE TEMP TABLE tenure_asset_result(run_id, asset_id, verdict);"
          "CREATE TEMP TABLE tenure_run(run_id, status);"
          "INSERT INTO temp.tenure_run VALUES (99, 'ok');");
  const app::RunSummary second =
      app::run_review(db, {fixtures::noiseless_policy(), parse_iso_date(fixtures::kAsOf), {}, {}});
  EXPECT_EQ(second.run_id, 2);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM temp.tenure_rejected"), 0);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM temp.tenure_asset_result"), 0);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM main.tenure_rejected WHERE run_id = 2"), 1);
  EXPECT_EQ(scalar(db, "SELECT count(*) FROM main.tenure_asset_result WHERE run_id = 2"), 30);
  // Reading back finds the stored run, not the host's temp row.
  EXPECT_EQ(read_run(db, std::nullopt).run_id, 2);
  EXPECT_EQ(read_asset_results(db, 2).size(), 30u);
  EXPECT_EQ(read_rejected(db, 2, 10).size(), 1u);
}

}  // namespace
}  // namespace tenure::db
