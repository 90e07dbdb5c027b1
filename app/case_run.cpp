// One case file analysed (see case_run.h).
#include "app/case_run.h"

#include "formats/case_json.h"
#include "formats/case_table.h"
#include "replacement/case_analysis.h"

namespace tenure::app {

nlohmann::json case_result_json(std::string_view case_json) {
  const replacement::Case input = formats::read_case(case_json);
  return formats::case_result_to_json(input, replacement::analyse(input));
}

std::string case_result_tables(std::string_view case_json) {
  const replacement::Case input = formats::read_case(case_json);
  return formats::case_result_to_table(input, replacement::analyse(input));
}

}  // namespace tenure::app
