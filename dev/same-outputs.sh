#!/usr/bin/env bash
# Proves that a change altered no output: builds the jar of a base revision and the jar of the
# working tree, runs both over the same inputs (every CSV of demo-data/ and
# src/test/resources/reference/, each command and the main analysis options, the demo, a brief
# spec with side outputs and a derived ratio series) and compares every file byte for byte.
#
#   dev/same-outputs.sh [BASE_REV]      default BASE_REV: origin/main if it exists, else HEAD
#
# Exit 0 when every output is identical, 1 when any differs (the differing files are listed;
# the new tree stays in $WORK, the base one beside the base jar). Needs git, Maven and Java 17.
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$(pwd)
BASE_REV=${1:-$(git rev-parse --verify -q origin/main || git rev-parse HEAD)}
BASE_REV=$(git rev-parse "$BASE_REV")
WORK=${WORK:-$(mktemp -d /tmp/annalist-same-outputs.XXXXXX)}
STAMP=2026-11-20T08:00:00Z

build_base() {
  local jar="${TMPDIR:-/tmp}/annalist-$BASE_REV.jar"   # kept for the next comparison
  if [ ! -f "$jar" ]; then
    local tree="$WORK/base-tree"
    rm -rf "$tree"
    git worktree add -q --detach "$tree" "$BASE_REV"
    (cd "$tree" && mvn -q -B -DskipTests package >/dev/null)
    cp "$tree/target/annalist.jar" "$jar"
    git worktree remove --force "$tree"
  fi
  echo "$jar"
}

# Runs one command line with the jar; stdout, stderr and the exit code go into $out/$name.*
run() {
  local jar=$1 out=$2 name=$3
  shift 3
  local rc=0
  (cd "$out/work" && java -jar "$jar" "$@" >"$out/$name.stdout" 2>"$out/$name.stderr") || rc=$?
  echo "$rc" >"$out/$name.rc"
  # absolute paths differ between the two runs by their folder only
  sed -i "s#$out/work#WORK#g" "$out/$name.stdout" "$out/$name.stderr"
}

outputs() {
  local jar=$1 out=$2
  rm -rf "$out"
  mkdir -p "$out/work"
  # inputs are copied so that every path a message prints is the same in both runs
  cp -r "$ROOT/demo-data" "$out/work/demo-data"
  mkdir -p "$out/work/reference"
  cp "$ROOT"/src/test/resources/reference/*.csv "$out/work/reference/"
  local f base
  for f in "$out"/work/demo-data/*.csv "$out"/work/reference/*.csv; do
    f=${f#"$out/work/"}
    base=$(basename "$f" .csv)
    run "$jar" "$out" "check-$base" check "$f"
    run "$jar" "$out" "check-json-$base" check "$f" --format json
    run "$jar" "$out" "analyze-$base" analyze "$f"
    run "$jar" "$out" "analyze-json-$base" analyze "$f" --format json
    run "$jar" "$out" "brief-$base" brief "$f" -o "briefs/$base.pdf" --generated-at "$STAMP"
  done
  local nights=demo-data/quennelmark-guest-nights.csv
  run "$jar" "$out" analyze-form-mult analyze reference/UKgas.csv --form multiplicative --format json
  run "$jar" "$out" analyze-form-add analyze reference/AirPassengers.csv --form additive --format json
  run "$jar" "$out" analyze-measure-level analyze reference/nottem.csv --measure level --format json
  run "$jar" "$out" analyze-horizon analyze reference/co2.csv --horizon 30 --format json
  run "$jar" "$out" analyze-no-outlook analyze reference/Nile.csv --horizon 0
  run "$jar" "$out" analyze-period analyze $nights --series Brevania --period 2025-04
  run "$jar" "$out" analyze-period-json analyze $nights --series Total --period 2021-03 --format json
  run "$jar" "$out" analyze-per-day analyze $nights --series Total --per-day --format json
  run "$jar" "$out" analyze-weekly analyze demo-data/glassworks-daily-visitors.csv --aggregate week --format json
  run "$jar" "$out" analyze-quarterly analyze $nights --aggregate quarter --aggregate-by sum
  run "$jar" "$out" analyze-bad-period analyze $nights --series Total --period 1999-01
  run "$jar" "$out" analyze-bad-series analyze $nights --series Nowhere
  run "$jar" "$out" brief-bad-horizon brief $nights --series Total --horizon -1
  printf 'date,name\n2024-05-09,Lake festival\n2025-05-29,Lake festival\n2026-05-14,Lake festival\n2023-05-18,Lake festival\n' \
    >"$out/work/holidays.csv"
  run "$jar" "$out" analyze-holidays analyze $nights --series Domestic --holidays holidays.csv --format json
  run "$jar" "$out" brief-options brief $nights --series Long-haul -o briefs/options.pdf --generated-at "$STAMP" \
    --title "Long-haul check" --organisation "Check board" --paper letter --period 2026-04 --horizon 6
  run "$jar" "$out" brief-per-day brief $nights --series Total --per-day -o briefs/per-day.pdf --generated-at "$STAMP"
  run "$jar" "$out" brief-daily brief demo-data/glassworks-daily-visitors.csv -o briefs/daily.pdf --generated-at "$STAMP"
  # nights and arrivals in one file: the average length of stay is derived from them
  {
    echo "period,Total nights,Total arrivals"
    join -t, <(tail -n +2 "$out/work/$nights" | cut -d, -f1,2 | sort) \
      <(grep ',Total,' "$out/work/demo-data/quennelmark-arrivals.csv" | cut -d, -f1,3 | sort)
  } >"$out/work/stays.csv"
  run "$jar" "$out" analyze-derived analyze stays.csv --format json
  run "$jar" "$out" analyze-derived-text analyze stays.csv --series "Total average length of stay"
  run "$jar" "$out" brief-derived brief stays.csv --series "Total average length of stay" -o briefs/stay.pdf \
    --generated-at "$STAMP"
  mkdir -p "$out/work/spec"
  cp "$out/work/stays.csv" "$out/work/$nights" "$out/work/spec/"
  cat >"$out/work/spec/briefs.yaml" <<YAML
briefs:
  - title: All markets
    data: quennelmark-guest-nights.csv
    series: [Total, Domestic, Brevania, Long-haul]
    combined: true
    total: Total
    sort_by: change
    output: sides/combined-{period}.pdf
    generated_at: $STAMP
    side_outputs: [findings, components, charts]
  - data: quennelmark-guest-nights.csv
    series: [Domestic, Long-haul]
    measure: {Domestic: level}
    unit: {Long-haul: stays}
    period: 2025-12
    horizon: 8
    paper: letter
    output: sides/{series}-{period}.pdf
    generated_at: $STAMP
    side_outputs: [findings, components, charts]
  - data: stays.csv
    series: Total average length of stay
    output: sides/stay-{period}.pdf
    generated_at: $STAMP
    side_outputs: [findings, components]
YAML
  run "$jar" "$out" batch batch spec/briefs.yaml --jobs 1
  run "$jar" "$out" demo demo --out demo-out --generated-at "$STAMP"
  rm -rf "$out/work/demo-data" "$out/work/reference"
  # JFreeSVG (up to 0.2.0) named its clip paths after the clock; Batik's are counted, and left as they are
  find "$out" -name '*.svg' -exec sed -i -E "s/_[0-9]+clip-/_clip-/g" {} +
}

if [ -z "${SKIP_BUILD:-}" ]; then
  mvn -q -B -DskipTests package >/dev/null
fi
cp target/annalist.jar "$WORK/new.jar"
BASE_JAR=$(build_base)
# the base revision's outputs are kept beside its jar: later comparisons only run the new jar
BASE_OUT="${TMPDIR:-/tmp}/annalist-outputs-$BASE_REV-$(sha1sum "$0" | cut -c1-12)"
if [ ! -f "$BASE_OUT.done" ]; then
  outputs "$BASE_JAR" "$BASE_OUT"
  touch "$BASE_OUT.done"
fi
outputs "$WORK/new.jar" "$WORK/new"
files=$(find "$BASE_OUT" -type f | wc -l)
if diff -rq "$BASE_OUT" "$WORK/new"; then
  echo "same outputs: $files files identical to those of $BASE_REV (in $WORK)"
else
  echo "outputs differ from those of $BASE_REV: see above (new outputs in $WORK/new, base outputs in $BASE_OUT)"
  exit 1
fi
