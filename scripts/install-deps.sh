#!/bin/sh
# Installs what tenure needs to build and test on Debian 12, as root:
#   sh scripts/install-deps.sh
# Debian packages for the build (clang, its sanitizer and libFuzzer runtimes and llvm's
# symbolizer for scripts/hardening.sh), Node.js only if the machine has none (the
# reference-library test runs a spreadsheet-formula library from the npm registry), then that
# library.
set -eu
cd "$(dirname "$0")/.."
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq --no-install-recommends \
  cmake make g++ pkg-config sqlite3 libsqlite3-dev libboost-date-time-dev nlohmann-json3-dev \
  libgtest-dev libgmock-dev libcli11-dev libfmt-dev libbenchmark-dev libssl-dev valgrind \
  time bc chromium clang libclang-rt-14-dev llvm >/dev/null
if ! command -v node >/dev/null 2>&1 || ! command -v npm >/dev/null 2>&1; then
  apt-get install -y -qq --no-install-recommends nodejs npm >/dev/null
fi
npm ci --prefix tests/reference --no-audit --no-fund --loglevel=error
npm ci --prefix tests/browser --no-audit --no-fund --loglevel=error
