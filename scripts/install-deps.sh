#!/bin/sh
# Install the Debian 12 packages nondim needs, only those that are missing.
# Usage: scripts/install-deps.sh [extra-package ...]
set -eu
packages="cmake ninja-build g++ clang libclang-rt-14-dev libeigen3-dev libboost-dev doctest-dev
libcli11-dev libtomlplusplus-dev libcsv-dev gnuplot-nox python3-statsmodels nlohmann-json3-dev python3 python3-sympy python3-uncertainties libbenchmark-dev valgrind
pkgconf make libopenmpi-dev openmpi-bin libomp-14-dev $*"
missing=""
for p in $packages; do
  if ! dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed"; then
    missing="$missing $p"
  fi
done
[ -z "$missing" ] && exit 0
echo "nondim: installing Debian packages:$missing" >&2
if [ "$(id -u)" -eq 0 ]; then sudo=""; else sudo="sudo"; fi
$sudo apt-get update -qq
# shellcheck disable=SC2086
DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends $missing >/dev/null
