// One column of a stored table (results/column.h): each kind of field is written as SQLite's
// storage class for it and read back to the same value; a stored value of the wrong class, or a
// word the enum does not have, does not read; and the tables list every field of their row once.
#include <gtest/gtest.h>

#include <set>
#include <string>

#include "results/stored_words.h"
#include "results/tables.h"

namespace tenure::results {
namespace {

struct Sample {
  std::int64_t count = 0;
  int years = 0;
  double amount = 0;
  std::string text;
  std::optional<double> maybe;
  std::optional<std::string> note;
  review::Verdict verdict = review::Verdict::keep;
  std::optional<fleet::CostModel> model;
  bool flag = false;
};

constexpr Column<Sample> kCount = column<&Sample::count>("count", "INTEGER NOT NULL");
constexpr Column<Sample> kYears = column<&Sample::years>("years", "INTEGER NOT NULL");
constexpr Column<Sample> kAmount = column<&Sample::amount>("amount", "REAL NOT NULL");
constexpr Column<Sample> kText = column<&Sample::text>("text", "TEXT NOT NULL");
constexpr Column<Sample> kMaybe = column<&Sample::maybe>("maybe", "REAL");
constexpr Column<Sample> kNote = column<&Sample::note>("note", "TEXT");
constexpr Column<Sample> kVerdict = column<&Sample::verdict>("verdict", "TEXT NOT NULL");
constexpr Column<Sample> kModel = column<&Sample::model>("model", "TEXT");
constexpr Column<Sample> kFlag = column<&Sample::flag>("flag", "INTEGER NOT NULL");

TEST(Column, WritesEachFieldAsItsStorageClass) {
  Sample s{42,
           7,
           12.5,
           "PU-0001",
           std::nullopt,
           "a note",
           review::Verdict::replace,
           fleet::CostModel::geometric,
           true};
  EXPECT_EQ(kCount.get(s), Value(std::int64_t{42}));
  EXPECT_EQ(kYears.get(s), Value(std::int64_t{7}));
  EXPECT_EQ(kAmount.get(s), Value(12.5));
  EXPECT_EQ(kText.get(s), Value(std::string_view("PU-0001")));
  EXPECT_EQ(kMaybe.get(s), Value());
  EXPECT_EQ(kNote.get(s), Value(std::string_view("a note")));
  EXPECT_EQ(kVerdict.get(s), Value(std::string_view("replace")));  // SPEC 7's word
  EXPECT_EQ(kModel.get(s), Value(std::string_view("geometric")));
  EXPECT_EQ(kFlag.get(s), Value(std::int64_t{1}));
}

TEST(Column, ReadsBackWhatItWrote) {
  const Sample s{-3,           12,   -0.125, "x", 1e15, std::nullopt, review::Verdict::review,
                 std::nullopt, false};
  Sample back{1,   1, 1, "y", std::nullopt, "old", review::Verdict::keep, fleet::CostModel::linear,
              true};
  for (const Column<Sample>* c :
       {&kCount, &kYears, &kAmount, &kText, &kMaybe, &kNote, &kVerdict, &kModel, &kFlag}) {
    SCOPED_TRACE(std::string(c->name));
    EXPECT_TRUE(c->set(back, c->get(s)));
  }
  EXPECT_EQ(back.count, s.count);
  EXPECT_EQ(back.years, s.years);
  EXPECT_EQ(back.amount, s.amount);
  EXPECT_EQ(back.text, s.text);
  EXPECT_EQ(back.maybe, s.maybe);
  EXPECT_EQ(back.note, s.note);
  EXPECT_EQ(back.verdict, s.verdict);
  EXPECT_EQ(back.model, s.model);
  EXPECT_EQ(back.flag, s.flag);
}

TEST(Column, RefusesWhatDoesNotFit) {
  Sample s;
  EXPECT_FALSE(kVerdict.set(s, std::string_view("maybe")));  // not one of the words
  EXPECT_FALSE(kVerdict.set(s, Value()));                    // NULL in a required field
  EXPECT_FALSE(kCount.set(s, 1.5));                          // a REAL in an INTEGER field
  EXPECT_FALSE(kText.set(s, std::int64_t{3}));
  EXPECT_FALSE(kModel.set(s, std::string_view("cubic")));
  EXPECT_TRUE(kAmount.set(s, std::int64_t{3}));  // an integral REAL reads as one
  EXPECT_EQ(s.amount, 3.0);
  EXPECT_TRUE(kModel.set(s, Value()));  // NULL in an optional field
  EXPECT_FALSE(s.model);
}

template <class Row>
void expect_distinct_names(const Table<Row>& table) {
  SCOPED_TRACE(std::string(table.name));
  std::set<std::string_view> names;
  if (table.of_run) names.insert("run_id");
  for (const Column<Row>& c : table.columns) {
    EXPECT_TRUE(names.insert(c.name).second) << c.name << " is listed twice";
    EXPECT_FALSE(c.sql_type.empty());
    EXPECT_GE(c.options.since, 1);
  }
}

TEST(Tables, NameEachColumnOnce) {
  expect_distinct_names(run_table());
  expect_distinct_names(class_table());
  expect_distinct_names(asset_table());
  expect_distinct_names(curve_table());
  expect_distinct_names(cash_flow_table());
  expect_distinct_names(rejected_table());
  EXPECT_GE(newest_column_version(), 1);
}

TEST(Tables, StoreTheWordsOfSpec7) {
  // SPEC 7: verdict keep | review | replace, basis after_tax | before_tax.
  EXPECT_EQ(StoredWords<review::Verdict>::word(review::Verdict::keep), "keep");
  EXPECT_EQ(StoredWords<review::Verdict>::word(review::Verdict::review), "review");
  EXPECT_EQ(StoredWords<review::Verdict>::word(review::Verdict::replace), "replace");
  EXPECT_EQ(StoredWords<replacement::Basis>::word(replacement::Basis::after_tax), "after_tax");
  EXPECT_EQ(StoredWords<replacement::Basis>::word(replacement::Basis::before_tax), "before_tax");
  EXPECT_EQ(StoredWords<MoneyTerms>::word(MoneyTerms::real), "real");
  EXPECT_EQ(StoredWords<Role>::word(Role::challenger), "challenger");
}

}  // namespace
}  // namespace tenure::results
