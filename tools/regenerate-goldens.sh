#!/bin/sh
# Rewrites demo-cases/golden/*.results.json from the current code. Read the diff before committing:
# a golden file is a regression check, and each change to it needs a reason.
set -e
cd "$(dirname "$0")/.."
mvn -q -o -B test -Dtest=DemoCasesGoldenTest -Dventcase.updateGoldens=true
git --no-pager diff --stat -- demo-cases/golden
