#!/usr/bin/env bash
# Times a command on big generated CSV files with the JVM's default settings (no -Xmx: what a user
# gets from `java -jar`) and prints wall time and peak RSS, min / median / max over RUNS runs, against
# the targets. Not a test: run it by hand, on a quiet machine, after changing the reader.
#
#   dev/bench-big-input.sh [JAR] [SIZES] [RUNS] [COMMAND]
#
# JAR defaults to target/annalist.jar; SIZES is any of "2m 260mb" (default both); RUNS defaults to 3;
# COMMAND is check (default) or analyze (analyze --horizon 0 leaves the outlook out).
#   2m    : 2 million daily rows, one value column (about 30 MB)      target: <= 10 s, <= 512 MB peak RSS
#   260mb : a long file (period, series, value) of 12,500 monthly series over 64 years,
#           9.6 million rows (about 250 MB)                          target: <= 60 s, <= 512 MB peak RSS
# The files are written to /tmp/annalist-bench/ once and reused. Peak RSS is GNU time's %M.
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

runs=${3:-3}
command=${4:-check}

stats() {   # stats VALUES... : min / median / max
    printf '%s\n' "$@" | sort -g | awk '{v[NR] = $1} END {printf "%s / %s / %s", v[1], v[int((NR + 1) / 2)], v[NR]}'
}

run() {   # run FILE TARGET_SECONDS
    local file=$1 target_s=$2 target_mb=512
    printf '%s (%s bytes), %s, %s runs\n' "$(basename "$file")" "$(stat -c %s "$file")" "$command" "$runs"
    local walls=() rsss=() log rc
    log=$(mktemp)
    for ((i = 1; i <= runs; i++)); do
        set +e
        # shellcheck disable=SC2086
        /usr/bin/time -f '%e %M' -o "$log" java -jar "$jar" $command "$file" > /dev/null 2> "$log.err"
        rc=$?
        set -e
        if [ "$rc" -ne 0 ]; then
            echo "  run $i: exit $rc"; head -5 "$log.err"
        fi
        read -r wall rss < <(tail -1 "$log")
        walls+=("$wall"); rsss+=("$((rss / 1024))")
        printf '  run %d: %s s, peak RSS %s MB (load %s)\n' "$i" "$wall" "$((rss / 1024))" "$(cut -d' ' -f1 /proc/loadavg)"
    done
    rm -f "$log" "$log.err"
    local worst_wall worst_rss
    worst_wall=$(printf '%s\n' "${walls[@]}" | sort -g | tail -1)
    worst_rss=$(printf '%s\n' "${rsss[@]}" | sort -g | tail -1)
    printf '  wall s  min/median/max: %s   target <= %s s: %s\n' "$(stats "${walls[@]}")" "$target_s" \
        "$(awk -v w="$worst_wall" -v t="$target_s" 'BEGIN {print (w <= t ? "met" : "NOT met")}')"
    printf '  RSS MB  min/median/max: %s   target <= %s MB: %s\n' "$(stats "${rsss[@]}")" "$target_mb" \
        "$([ "$worst_rss" -le "$target_mb" ] && echo met || echo "NOT met")"
}

for size in $sizes; do
    case $size in
        2m) generate "$dir/rows-2m.csv" 2000000 1; run "$dir/rows-2m.csv" 10 ;;
        260mb) generate_long "$dir/long-260mb.csv" 12500; run "$dir/long-260mb.csv" 60 ;;
        *) echo "unknown size $size (expected 2m or 260mb)" >&2; exit 2 ;;
    esac
done
