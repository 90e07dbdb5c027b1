# Runs the example C host (examples/review_host.c) on a fresh invented demo database and checks
# what it prints: a review through the C ABI (run id, count of tenure_due), a case analysis, and a
# bad date reported as bad input (exit 2) with tenure's message. With VALGRIND, every run is under
# Valgrind (--leak-check=full --error-exitcode=1): any leak or memory error fails the test.
#   cmake -DHOST=... -DTENURE=... -DCASE=case.json -DWORK=dir [-DVALGRIND=path] -P this file
if(DEFINED VALGRIND)
  if(VALGRIND STREQUAL "")
    message("SKIPPED: valgrind not found (apt-get install valgrind)")
    return()
  endif()
  set(under ${VALGRIND} --leak-check=full --error-exitcode=99 --quiet)
endif()

file(REMOVE_RECURSE ${WORK})
file(MAKE_DIRECTORY ${WORK})
set(db ${WORK}/fleet.db)
execute_process(COMMAND ${TENURE} demo --db ${db} --assets 40 OUTPUT_QUIET RESULT_VARIABLE rc)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "tenure demo failed (${rc})")
endif()

execute_process(COMMAND ${under} ${HOST} ${db} 2026-06-30 ${CASE}
  RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
message("${out}${err}")
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "review_host exited with ${rc}")
endif()
# The demo fleet has assets due at any date; the case fixture's van, 4 years old and at its
# economic life of 4 years, is under review.
if(NOT out MATCHES "^run 1\ndue [1-9][0-9]*\ncase result: {\n.*\"verdict\": \"review\"")
  message(FATAL_ERROR "unexpected output of review_host")
endif()

execute_process(COMMAND ${under} ${HOST} ${db} 2026-13-01 ${CASE}
  RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
message("${out}${err}")
if(NOT rc EQUAL 2 OR NOT err MATCHES "review_host: review: as_of: must be a date 'YYYY-MM-DD'")
  message(FATAL_ERROR "a bad date should be bad input (2), got ${rc}")
endif()
