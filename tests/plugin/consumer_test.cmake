# Installs the build to a temporary prefix and builds the example host (examples/) against it as
# another project would, once with CMake's find_package(tenure) and once with pkg-config, then
# runs each on an invented demo database (made by the installed `tenure demo`); checks that the
# manual page and the bash completion are installed.
#   cmake -DBUILD_DIR=build -DEXAMPLES=examples -DCASE=case.json -DWORK=dir -DPKG_CONFIG=path
#         -DC_COMPILER=cc -DGENERATOR="Unix Makefiles" -P this file
# Runs a command; its standard output is left in `output`.
function(run)
  execute_process(COMMAND ${ARGN} RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE err)
  if(NOT rc EQUAL 0)
    string(REPLACE ";" " " command "${ARGN}")
    message(FATAL_ERROR "failed (${rc}): ${command}\n${out}${err}")
  endif()
  set(output "${out}" PARENT_SCOPE)
endfunction()

function(check_host host)
  file(REMOVE ${WORK}/fleet.db)
  run(${prefix}/bin/tenure demo --db ${WORK}/fleet.db --assets 20)
  run(${host} ${WORK}/fleet.db 2026-06-30 ${CASE})
  if(NOT output MATCHES "^run 1\ndue [0-9]+\ncase result: {")
    message(FATAL_ERROR "unexpected output of ${host}:\n${output}")
  endif()
endfunction()

file(REMOVE_RECURSE ${WORK})
set(prefix ${WORK}/prefix)
run(${CMAKE_COMMAND} --install ${BUILD_DIR} --prefix ${prefix})

# 0. The manual page and the bash completion, where man and bash look for them.
file(READ ${prefix}/share/man/man1/tenure.1 page)
if(NOT page MATCHES "^\\.TH TENURE 1 ")
  message(FATAL_ERROR "share/man/man1/tenure.1 is not the manual page")
endif()
file(READ ${prefix}/share/bash-completion/completions/tenure script)
if(NOT script MATCHES "complete -F _tenure tenure")
  message(FATAL_ERROR "share/bash-completion/completions/tenure is not the completion")
endif()
message("installed: the manual page and the bash completion")

# 1. CMake: find_package(tenure) and the target tenure::tenure.
run(${CMAKE_COMMAND} -S ${EXAMPLES} -B ${WORK}/cmake-build -G ${GENERATOR}
    -DCMAKE_PREFIX_PATH=${prefix} -DCMAKE_C_COMPILER=${C_COMPILER})
run(${CMAKE_COMMAND} --build ${WORK}/cmake-build)
check_host(${WORK}/cmake-build/review_host)
message("find_package(tenure): built and ran the example host")

# 2. pkg-config: the relocatable tenure.pc of the prefix.
if(PKG_CONFIG STREQUAL "")
  message("SKIPPED: pkg-config not found; only find_package was tested")
  return()
endif()
file(GLOB_RECURSE pc_files ${prefix}/*/tenure.pc)
list(GET pc_files 0 pc_file)
get_filename_component(pc_dir ${pc_file} DIRECTORY)
set(ENV{PKG_CONFIG_PATH} ${pc_dir})
run(${PKG_CONFIG} --cflags --libs tenure)
separate_arguments(flags UNIX_COMMAND "${output}")
run(${PKG_CONFIG} --variable=libdir tenure)
string(STRIP "${output}" libdir)
run(${C_COMPILER} ${EXAMPLES}/review_host.c ${flags} -Wl,-rpath,${libdir}
    -o ${WORK}/review_host_pkg_config)
check_host(${WORK}/review_host_pkg_config)
message("pkg-config tenure: built and ran the example host")
