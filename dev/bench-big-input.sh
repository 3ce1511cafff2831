#!/usr/bin/env bash
# Times `check` on big generated CSV files and prints wall time and peak RSS (GNU time -v), with the
# JVM's default settings. Not a test: run it by hand after changing the reader.
#
#   dev/bench-big-input.sh [JAR] [SIZES]
#
# JAR defaults to target/annalist.jar; SIZES is any of "2m 260mb" (default both).
#   2m    : 2 million daily rows, one value column (about 30 MB)      target: <= 10 s, <= 512 MB peak RSS
#   260mb : a long file (period, series, value) of 12,500 monthly series over 64 years,
#           9.6 million rows (about 260 MB)                          target: <= 60 s
# The files are written to /tmp/annalist-bench/ once and reused.
set -euo pipefail
jar=${1:-target/annalist.jar}
sizes=${2:-"2m 260mb"}
dir=/tmp/annalist-bench
mkdir -p "$dir"

generate() {   # generate FILE ROWS COLUMNS
    local file=$1 rows=$2 columns=$3
    [ -s "$file" ] && return
    awk -v rows="$rows" -v columns="$columns" 'BEGIN {
        srand(7);
        printf "date";
        for (c = 1; c <= columns; c++) printf ",series %d", c;
        printf "\n";
        split("31 28 31 30 31 30 31 31 30 31 30 31", dim, " ");
        y = 1900; m = 1; d = 1;
        for (i = 0; i < rows; i++) {
            printf "%04d-%02d-%02d", y, m, d;
            for (c = 1; c <= columns; c++) printf ",%d", 1000 + int(rand() * 9000);
            printf "\n";
            leap = (y % 4 == 0 && (y % 100 != 0 || y % 400 == 0));
            last = dim[m] + (m == 2 && leap ? 1 : 0);
            if (++d > last) { d = 1; if (++m > 12) { m = 1; y++ } }
        }
    }' > "$file.part" && mv "$file.part" "$file"
}

generate_long() {   # generate_long FILE SERIES
    local file=$1 series=$2
    [ -s "$file" ] && return
    awk -v series="$series" 'BEGIN {
        srand(11);
        print "month,series,value";
        for (s = 1; s <= series; s++)
            for (y = 1960; y <= 2023; y++)
                for (m = 1; m <= 12; m++)
                    printf "%04d-%02d,series %05d,%d\n", y, m, s, 1000 + int(rand() * 9000);
    }' > "$file.part" && mv "$file.part" "$file"
}

run() {   # run FILE
    local file=$1
    printf '%s (%s bytes): ' "$(basename "$file")" "$(stat -c %s "$file")"
    local log; log=$(mktemp)
    set +e
    /usr/bin/time -v java -jar "$jar" check "$file" > /dev/null 2> "$log"
    local rc=$?
    set -e
    local wall rss
    wall=$(sed -n 's/.*Elapsed (wall clock) time (h:mm:ss or m:ss): //p' "$log")
    rss=$(sed -n 's/.*Maximum resident set size (kbytes): //p' "$log")
    local cpu
    cpu=$(awk -F': ' '/User time|System time/ {s += $2} END {printf "%.1f", s}' "$log")
    printf 'exit %s, wall %s, cpu %s s, peak RSS %s MB\n' "$rc" "$wall" "$cpu" "$((rss / 1024))"
    [ "$rc" -eq 0 ] || grep -v -e '^\s' -e '^Command' "$log" | head -5
    rm -f "$log"
}

for size in $sizes; do
    case $size in
        2m) generate "$dir/rows-2m.csv" 2000000 1; run "$dir/rows-2m.csv" ;;
        260mb) generate_long "$dir/long-260mb.csv" 12500; run "$dir/long-260mb.csv" ;;
        *) echo "unknown size $size (expected 2m or 260mb)" >&2; exit 2 ;;
    esac
done
