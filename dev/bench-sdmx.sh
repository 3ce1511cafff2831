#!/usr/bin/env bash
# Times `check` on a generated 100,000-row SDMX-CSV 1.0 file (200 monthly series of 500 months,
# a status column, about 6 MB) with the JVM's default settings and prints wall time and peak RSS
# (GNU time's %M), min / median / max over RUNS runs. Not a test: run it by hand on a quiet machine.
#
#   dev/bench-sdmx.sh [JAR] [RUNS]
#
# The file is written to /tmp/annalist-bench/sdmx-100k.csv once and reused.
set -euo pipefail
jar=${1:-target/annalist.jar}
runs=${2:-3}
dir=/tmp/annalist-bench
file=$dir/sdmx-100k.csv
mkdir -p "$dir"
if [ ! -s "$file" ]; then
    awk 'BEGIN {
        srand(17);
        print "DATAFLOW,FREQ,UNIT,REGION,MARKET,TIME_PERIOD,OBS_VALUE,OBS_STATUS";
        for (s = 0; s < 200; s++)
            for (i = 0; i < 500; i++) {
                y = 1980 + int(i / 12); m = i % 12 + 1;
                printf "QM:NIGHTS(1.0),M,NR,R%02d,K%d,%04d-%02d,%d,%s\n", s % 50, int(s / 50), y, m,
                       1000 + int(rand() * 9000), (i == 499 ? "P" : "A");
            }
    }' > "$file.part" && mv "$file.part" "$file"
fi
walls=(); peaks=()
for ((r = 0; r < runs; r++)); do
    out=$( { /usr/bin/time -f '%e %M' java -jar "$jar" check "$file" > /dev/null; } 2>&1 | tail -1)
    walls+=("${out% *}"); peaks+=("$(( ${out#* } / 1024 ))")
done
stats() { printf '%s\n' "$@" | sort -g | awk '{v[NR] = $1} END {printf "%s / %s / %s", v[1], v[int((NR + 1) / 2)], v[NR]}'; }
echo "check $(basename "$file") ($(wc -l < "$file") lines): wall s $(stats "${walls[@]}"), peak RSS MB $(stats "${peaks[@]}")"
