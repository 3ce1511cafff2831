#!/usr/bin/env bash
# Start-up and batch figures of the distribution's launcher beside the old `java -jar` (default
# JVM settings), each the min / median / max of RUNS runs of a fresh process, with peak resident
# memory (GNU time's %M) and CPU time (user + system: on a busy machine, wall time mostly
# measures the others' work). Not a test: run it by hand from the top folder after
#   mvn -q -B -DskipTests package
# (which builds target/annalist/, target/annalist.jar and the test classes).
#
#   dev/bench-launcher.sh [RUNS] [BATCH_RUNS] [FIGURES]
#
# RUNS (default 5) for the start-up figures, BATCH_RUNS (default RUNS) for the batch and bulk
# figures; FIGURES is any of "startup warm batch bulk" (default all). Targets (issue 17, 2 cores):
#   --help, check               <= 0.5 s
#   brief, cold                 <= 1.5 s
#   brief, warm in a JVM        <= 250 ms
#   batch of 200 briefs         <= 45 s, <= 1 GiB peak RSS; a batch of 1,000 no higher peak
#   analyze 10,000 series       <= 20 s, <= 1 GiB peak RSS (--horizon 0: no outlook, no PDF)
# The generated inputs go to /tmp/annalist-bench-launcher/ (BENCH_DIR) and are reused.
# JAVA25_HOME (a Java 25 or later) adds the launcher's figures on that Java, with its ahead-of-time
# cache (made by an untimed first run). The cold brief is also measured without the brief's
# warm-up (-Dannalist.warmup=false), and the batch with full tiered compilation (C2) beside C1 only.
set -euo pipefail
cd "$(dirname "$0")/.."
runs=${1:-5}
batch_runs=${2:-$runs}
figures=${3:-"startup warm batch bulk"}
dist=target/annalist
jar=target/annalist.jar
work=${BENCH_DIR:-/tmp/annalist-bench-launcher}
new="$dist/bin/annalist"
old="java -jar $jar"
for needed in "$new" "$jar" target/test-classes/org/annalist/cli/Benchmark.class; do
    [ -e "$needed" ] || { echo "missing $needed: run 'mvn -q -B -DskipTests package' first" >&2; exit 2; }
done
[ -x /usr/bin/time ] || { echo "needs GNU time (/usr/bin/time; Debian: apt-get install time)" >&2; exit 2; }
mkdir -p "$work"
data=demo-data/quennelmark-guest-nights.csv

stats() {   # stats VALUES... : min / median / max
    printf '%s\n' "$@" | sort -g | awk '{v[NR] = $1} END {printf "%s / %s / %s", v[1], v[int((NR + 1) / 2)], v[NR]}'
}

measure() {   # measure LABEL N COMMAND... : wall seconds, CPU seconds (user + system) and peak RSS (MB) of N runs
    local label=$1 n=$2 walls=() cpus=() rss=() i
    shift 2
    for ((i = 0; i < n; i++)); do
        if ! /usr/bin/time -f '%e %U %S %M' -o "$work/time" "$@" > "$work/stdout" 2> "$work/stderr"; then
            echo "$label: the command failed: $*" >&2
            tail -5 "$work/stderr" >&2
            return 1
        fi
        read -r wall user system kb < <(tail -1 "$work/time")
        walls+=("$wall")
        cpus+=("$(awk -v u="$user" -v s="$system" 'BEGIN {printf "%.2f", u + s}')")
        rss+=("$((kb / 1024))")
    done
    printf '%-40s %-21s %-21s %s\n' "$label" "$(stats "${walls[@]}")" "$(stats "${cpus[@]}")" "$(stats "${rss[@]}")"
}

header() {
    printf '\n%-40s %-21s %-21s %s\n' "$1 ($2 runs)" "wall s min/med/max" "CPU s min/med/max" "peak RSS MB min/med/max"
}

printf 'machine: %s cores, load average %s at the start; %s\n' "$(nproc)" "$(cut -d' ' -f1-3 /proc/loadavg)" \
    "$(java -version 2>&1 | sed -n 1p)"

if [[ " $figures " == *" startup "* ]]; then
    header "start-up" "$runs"
    measure "--help          old: java -jar" "$runs" $old --help
    measure "--help          new: bin/annalist" "$runs" "$new" --help
    measure "check           old: java -jar" "$runs" $old check "$data"
    measure "check           new: bin/annalist" "$runs" "$new" check "$data"
    measure "brief, cold     old: java -jar" "$runs" $old brief "$data" --series Total -o "$work/total.pdf" \
        --generated-at 2026-11-20T08:00:00Z
    measure "brief, cold     new: bin/annalist" "$runs" "$new" brief "$data" --series Total -o "$work/total.pdf" \
        --generated-at 2026-11-20T08:00:00Z
    measure "brief, cold     new, no PDF warm-up" "$runs" env ANNALIST_JAVA_OPTS=-Dannalist.warmup=false "$new" brief \
        "$data" --series Total -o "$work/total.pdf" --generated-at 2026-11-20T08:00:00Z
    if [ -n "${JAVA25_HOME:-}" ]; then
        # the first run on this Java makes lib/annalist.aot (untimed)
        JAVA_HOME=$JAVA25_HOME "$new" brief "$data" --series Total -o "$work/total.pdf" > /dev/null
        measure "--help          new: Java 25, AOT cache" "$runs" env JAVA_HOME="$JAVA25_HOME" "$new" --help
        measure "check           new: Java 25, AOT cache" "$runs" env JAVA_HOME="$JAVA25_HOME" "$new" check "$data"
        measure "brief, cold     new: Java 25, AOT cache" "$runs" env JAVA_HOME="$JAVA25_HOME" "$new" brief "$data" \
            --series Total -o "$work/total.pdf" --generated-at 2026-11-20T08:00:00Z
    fi
fi

if [[ " $figures " == *" warm "* ]]; then
    # a warm brief: the same brief again and again in one running JVM (test classes' Benchmark),
    # which prints the wall ms per brief of 5 rounds, then the process's CPU ms per brief
    printf '\n%-40s %-21s %s\n' "brief, warm in a running JVM (5 rounds)" "wall ms min/med/max" "CPU ms min/med/max"
    cp="$jar:target/test-classes"
    warm() {   # warm LABEL JAVA-FLAGS...
        local label=$1 out
        shift
        out=$(java "$@" -cp "$cp" org.annalist.cli.Benchmark --warm-brief)
        # shellcheck disable=SC2046
        printf '%-40s %-21s %s\n' "$label" "$(stats $(echo "$out" | sed -n 1p))" "$(stats $(echo "$out" | sed -n 2p))"
    }
    warm "                old: default JVM settings"
    warm "                new: the launcher's settings" -Xmx640m -Xms64m -XX:+UseSerialGC -XX:TieredStopAtLevel=1
fi

if [[ " $figures " == *" batch "* ]]; then
    # 200 and 1,000 single-series briefs of the demo's file in one batch, on every core
    for count in 200 1000; do
        folder=$work/batch-$count
        mkdir -p "$folder"
        cp "$data" "$folder/nights.csv"
        {
            echo "briefs:"
            for ((i = 0; i < count / 4; i++)); do
                printf '  - data: nights.csv\n    series: [Total, Domestic, Brevania, Long-haul]\n'
                printf '    output: out/%d-{series}.pdf\n    generated_at: 2026-11-20T08:00:00Z\n' "$i"
            done
        } > "$folder/briefs.yaml"
    done
    header "batch" "$batch_runs"
    measure "batch 200 briefs    old: java -jar" "$batch_runs" $old batch "$work/batch-200/briefs.yaml"
    measure "batch 200 briefs    new: bin/annalist" "$batch_runs" "$new" batch "$work/batch-200/briefs.yaml"
    measure "batch 200 briefs    new, full tiered" "$batch_runs" env ANNALIST_JAVA_OPTS=-XX:TieredStopAtLevel=4 "$new" \
        batch "$work/batch-200/briefs.yaml"
    measure "batch 1,000 briefs  new: bin/annalist" "$batch_runs" "$new" batch "$work/batch-1000/briefs.yaml"
fi

if [[ " $figures " == *" bulk "* ]]; then
    # 10,000 monthly series of 20 years in one long file (month,series,value), analysed without outlook
    many=$work/monthly-10000.csv
    if [ ! -s "$many" ]; then
        awk -v series=10000 'BEGIN {
            srand(4242); print "month,series,value";
            for (s = 1; s <= series; s++) {
                slope = (rand() - 0.5) * 0.008; phase = int(rand() * 12);
                for (t = 0; t < 240; t++) {
                    v = 1000 * exp(slope * t) * (1 + 0.3 * sin(2 * 3.14159265 * (t - phase) / 12)) \
                        * exp(0.05 * (rand() + rand() + rand() - 1.5));
                    printf "%04d-%02d,s%05d,%.1f\n", 2005 + int(t / 12), t % 12 + 1, s, v;
                }
            } }' > "$many.part" && mv "$many.part" "$many"
    fi
    header "analyze 10,000 series, --horizon 0" "$batch_runs"
    measure "analyze 10,000  old: java -jar" "$batch_runs" $old analyze "$many" --horizon 0
    measure "analyze 10,000  new: bin/annalist" "$batch_runs" "$new" analyze "$many" --horizon 0
fi
printf '\nload average at the end: %s\n' "$(cut -d' ' -f1-3 /proc/loadavg)"
