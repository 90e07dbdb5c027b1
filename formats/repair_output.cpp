// The repair check written out (see repair_output.h).
#include "formats/repair_output.h"

#include <fmt/format.h>

#include <cctype>

#include "formats/analysis_tables.h"
#include "formats/caution.h"
#include "formats/text_table.h"

namespace tenure::formats {
namespace {

using nlohmann::json;

const char* verdict_word(const review::RepairCheck& c) {
  if (!c.weighing) return "not_weighed";
  return review::to_string(c.weighing->verdict);
}

std::string headline(const review::RepairCheck& c) {
  std::string word = verdict_word(c);
  for (char& ch : word) ch = ch == '_' ? ' ' : static_cast<char>(std::toupper(ch));
  const std::string asset_class = c.asset_class ? " (class " + *c.asset_class + ")" : "";
  const std::string basis = c.weighing ? ", " + basis_words(c.basis) + " basis" : "";
  return fmt::format("{}  asset {}{}, run {} as of {}{}\n", word, c.asset_id, asset_class, c.run_id,
                     c.as_of, basis);
}

std::string figures(const review::RepairCheck& c) {
  const review::RepairWeighing& w = *c.weighing;
  const std::string net =
      c.basis == replacement::Basis::after_tax
          ? fmt::format(" ({} net of its tax deduction, in present worth)", money(w.net_cost))
          : "";
  const std::string after =
      w.keep_years_if_repaired > 0
          ? fmt::format("keep it {} more, then replace (k* = {})", years(w.keep_years_if_repaired),
                        w.keep_years_if_repaired)
          : "replacing it now costs less (k* = 0)";
  return fmt::format("  {:<17} {}\n  {:<17} {}{}\n  {:<17} {}\n", "repair limit",
                     money(w.repair_limit), "estimate", money(c.estimate), net, "after repairing",
                     after);
}

template <class T>
json or_null(const std::optional<T>& value) {
  return value ? json(*value) : json(nullptr);
}

}  // namespace

std::string repair_check_text(const review::RepairCheck& c) {
  std::string out = headline(c);
  if (c.weighing) out += figures(c);
  out += c.reason + "\n\n";
  out += kCaution;
  return out + "\n";
}

json repair_check_to_json(const review::RepairCheck& c) {
  const review::RepairWeighing* w = c.weighing ? &*c.weighing : nullptr;
  const auto figure = [w](auto member) { return w ? json(w->*member) : json(nullptr); };
  return {
      {"asset_id", c.asset_id},
      {"asset_class", or_null(c.asset_class)},
      {"run_id", c.run_id},
      {"as_of", c.as_of},
      {"basis", replacement::to_string(c.basis)},
      {"estimate", c.estimate},
      {"verdict", verdict_word(c)},
      {"not_weighed", c.not_weighed ? json(review::to_string(*c.not_weighed)) : json(nullptr)},
      {"repair_limit", figure(&review::RepairWeighing::repair_limit)},
      {"repair_deduction_factor", figure(&review::RepairWeighing::deduction_factor)},
      {"estimate_net_cost", figure(&review::RepairWeighing::net_cost)},
      {"replace_after_years", figure(&review::RepairWeighing::keep_years)},
      {"replace_after_years_if_repaired", figure(&review::RepairWeighing::keep_years_if_repaired)},
      {"reason", c.reason},
      {"caution", kCaution}};
}

}  // namespace tenure::formats
