// Rule (2) for the rows of one scan of the cost events (see cost_rows.h).
#include "db/cost_rows.h"

#include <utility>

#include <fmt/format.h>

#include "core/errors.h"

namespace tenure::db {

std::optional<Date> CostRows::DateMemo::parse(std::string_view text) {
  if (text.size() > sizeof(text_)) return parse_iso_date(text);  // never valid; not kept
  if (text != std::string_view(text_, length_)) {
    length_ = text.copy(text_, sizeof(text_));
    date_ = parse_iso_date(text);
  }
  return date_;
}

CostRows::CostRows(std::string source, const AcceptedAssets& accepted,
                   const review::FleetData& data, fleet::CostHistory& totals)
    : source_(std::move(source)), accepted_(accepted), data_(data), totals_(totals) {}

void CostRows::read(const EventBatch& batch) {
  // Passes over the whole batch so the scattered memory reads of neighbouring rows overlap:
  // hash every id and prefetch its index slot; look every id up and prefetch its cost history;
  // parse every date and prefetch the year total it adds to; then read the rows in order.
  const fleet::AssetIndex& index = accepted_.index;
  const std::size_t n = batch.rows.size();
  hashes_.resize(n);
  assets_.resize(n);
  days_.resize(n);
  for (std::size_t i = 0; i < n; ++i) {
    hashes_[i] = fleet::AssetIndex::hash(batch.id(batch.rows[i]));
    index.prefetch(hashes_[i]);
  }
  for (std::size_t i = 0; i < n; ++i) {
    assets_[i] = index.find(batch.id(batch.rows[i]), hashes_[i]);
    totals_.prefetch(assets_[i]);
  }
  for (std::size_t i = 0; i < n; ++i) {
    const RawEvent& e = batch.rows[i];
    days_[i] = e.date_type == SQLITE_TEXT ? dates_.parse(batch.date(e)) : std::nullopt;
    if (days_[i]) totals_.prefetch(assets_[i], *days_[i]);
  }
  std::string reason;
  for (std::size_t i = 0; i < n; ++i) {
    const RawEvent& e = batch.rows[i];
    ++rows_;
    const auto reject = [&](std::string why) {
      rejected_.push_back({rows_,
                           fmt::format("(asset_id {}, occurred_on {})",
                                       shown_or_null(e.id_type == SQLITE_NULL, batch.id(e)),
                                       shown_or_null(e.date_type == SQLITE_NULL, batch.date(e))),
                           std::move(why)});
    };
    std::uint32_t asset = e.id_type != SQLITE_NULL && e.id_type != SQLITE_BLOB
                              ? assets_[i]
                              : fleet::AssetIndex::npos;
    if (asset == fleet::AssetIndex::npos) {
      asset = accepted_.find(batch.id(e), e.id_type, reason);
      if (asset == fleet::AssetIndex::npos) { reject(reason); continue; }
    }
    const std::optional<Date>& occurred = days_[i];
    if (!occurred) {
      reject(bad_date("occurred_on", e.date_type, batch.date(e)));
      continue;
    }
    if (auto problem = amount_problem(e.amount_type, e.amount, batch.amount_text(e), "amount")) {
      reject(*problem);
      continue;
    }
    if (*occurred > data_.as_of) {  // rule (4)
      ++rows_after_as_of_;
      continue;
    }
    switch (add_event(asset, *occurred, e, batch)) {
      case fleet::EventFate::counted:
      case fleet::EventFate::outside_complete_years:
        break;
      case fleet::EventFate::before_in_service:
        reject(before_in_service("occurred_on", data_.assets[asset]));
        break;
      case fleet::EventFate::after_retirement:
        reject(after_retirement("occurred_on", data_.assets[asset]));
        break;
      case fleet::EventFate::non_finite_amount:  // refused above already (amount_problem)
        reject(*amount_problem(e.amount_type, e.amount, batch.amount_text(e), "amount"));
        break;
    }
  }
}

fleet::EventFate CostRows::add_event(std::uint32_t asset, Date occurred, const RawEvent& e,
                                     const EventBatch& batch) {
  try {
    return totals_.add_event(asset, occurred, e.amount);
  } catch (const InputError& error) {
    // A restatement beyond what a double can add up: say which row, and what to change.
    throw InputError(error.where(),
                     fmt::format("{} (asset_id {}, occurred_on {}): {} in {} money; review as "
                                 "of a nearer date (--as-of) or with a smaller cost_escalation",
                                 source_, shown(batch.id(e)), shown(batch.date(e)), error.rule(),
                                 data_.as_of.to_iso()));
  }
}

void CostRows::finish(ReadReport& report, std::int64_t rows_before) && {
  report.rows_read += rows_;
  report.rows_after_as_of += rows_after_as_of_;
  for (Rejected& r : rejected_) {
    report.rejected.push_back(
        {source_, fmt::format("position {} {}", rows_before + r.row, r.keys), std::move(r.reason)});
  }
}

}  // namespace tenure::db
