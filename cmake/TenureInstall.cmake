# Install rules and the package files another project uses to build against libtenure:
#   cmake --install build --prefix /opt/tenure
#   lib/libtenure.so{,.1}         the C ABI and the SQLite extension
#                                 (sqlite> .load /opt/tenure/lib/libtenure)
#   include/tenure.h              the C ABI
#   bin/tenure                    the command
#   lib/cmake/tenure/             tenureConfig.cmake, its version file, tenureTargets.cmake:
#                                 find_package(tenure 0.1 REQUIRED) gives the target tenure::tenure
#   lib/pkgconfig/tenure.pc       pkg-config --cflags --libs tenure
# Both package files are relocatable: they find the prefix from where they were installed.
# (The lib directory is the one GNUInstallDirs picks, e.g. lib/x86_64-linux-gnu under /usr.)
include(GNUInstallDirs)
include(CMakePackageConfigHelpers)

option(TENURE_INSTALL "Generate the install rules" ${TENURE_IS_TOP_LEVEL})
if(NOT TENURE_INSTALL)
  return()
endif()

set(TENURE_CMAKE_DIR ${CMAKE_INSTALL_LIBDIR}/cmake/tenure)

install(TARGETS tenure_extension EXPORT tenureTargets
  LIBRARY DESTINATION ${CMAKE_INSTALL_LIBDIR}
  PUBLIC_HEADER DESTINATION ${CMAKE_INSTALL_INCLUDEDIR}
  INCLUDES DESTINATION ${CMAKE_INSTALL_INCLUDEDIR})
if(TARGET tenure)
  install(TARGETS tenure RUNTIME DESTINATION ${CMAKE_INSTALL_BINDIR})
  install(FILES ${TENURE_REFERENCE_DIR}/tenure.1 DESTINATION ${CMAKE_INSTALL_MANDIR}/man1)
  install(FILES ${TENURE_REFERENCE_DIR}/tenure
          DESTINATION ${CMAKE_INSTALL_DATADIR}/bash-completion/completions)
endif()

install(EXPORT tenureTargets NAMESPACE tenure:: DESTINATION ${TENURE_CMAKE_DIR})
configure_package_config_file(${CMAKE_CURRENT_LIST_DIR}/tenureConfig.cmake.in
  ${PROJECT_BINARY_DIR}/package/tenureConfig.cmake
  INSTALL_DESTINATION ${TENURE_CMAKE_DIR})
# 0.x releases may change the ABI between minor versions; the soname (TENURE_ABI_VERSION)
# guards the binary side.
write_basic_package_version_file(${PROJECT_BINARY_DIR}/package/tenureConfigVersion.cmake
  COMPATIBILITY SameMinorVersion)
install(FILES ${PROJECT_BINARY_DIR}/package/tenureConfig.cmake
              ${PROJECT_BINARY_DIR}/package/tenureConfigVersion.cmake
        DESTINATION ${TENURE_CMAKE_DIR})

# tenure.pc finds the prefix from its own directory (${pcfiledir}).
file(RELATIVE_PATH TENURE_PC_TO_PREFIX /prefix/${CMAKE_INSTALL_LIBDIR}/pkgconfig /prefix)
string(REGEX REPLACE "/$" "" TENURE_PC_TO_PREFIX "${TENURE_PC_TO_PREFIX}")
configure_file(${CMAKE_CURRENT_LIST_DIR}/tenure.pc.in ${PROJECT_BINARY_DIR}/package/tenure.pc
  @ONLY)
install(FILES ${PROJECT_BINARY_DIR}/package/tenure.pc
        DESTINATION ${CMAKE_INSTALL_LIBDIR}/pkgconfig)
