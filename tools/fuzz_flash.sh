#!/bin/sh
# Longer run of the random PT-flash test (RandomFlashTest): N flashes with a seed of your choice.
#   tools/fuzz_flash.sh 100000 7
# Prints the failures (state, model, composition, message); development tool, not part of CI.
set -e
cd "$(dirname "$0")/.."
N=${1:-100000}
SEED=${2:-20261203}
mvn -q -o -B test -Dtest=RandomFlashTest -Dsurefire.failIfNoSpecifiedTests=false \
    -Dventcase.fuzz.flashes="$N" -Dventcase.fuzz.seed="$SEED"
