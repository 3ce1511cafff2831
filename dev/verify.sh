#!/usr/bin/env bash
# Snapshot of the working tree into a scratch folder, then the full test suite and the
# same-outputs comparison there, so that editing can go on meanwhile.
#   dev/verify.sh BASE_REV [LOG]
set -uo pipefail
cd "$(dirname "$0")/.."
BASE=${1:?base revision}
LOG=${2:-/tmp/verify.log}
SNAP=$(mktemp -d /tmp/annalist-verify.XXXXXX)
tar --exclude=./target -cf - . | tar -xf - -C "$SNAP"
{
  echo "snapshot $SNAP of $(git rev-parse --short HEAD) + working tree, $(date)"
  (cd "$SNAP" && mvn -q -B -DskipTests package >/dev/null 2>&1 && SKIP_BUILD=1 dev/same-outputs.sh "$BASE" 2>&1 | tail -4)
  (cd "$SNAP" && mvn -B test 2>&1 | grep -E "Tests run:|FAIL|ERROR\]" | tail -15)
  echo "done $(date)"
} >"$LOG" 2>&1
