#!/usr/bin/env bash
# The CPU time of one command's critical path, by phase (CriticalPath.java says what it measures),
# run with the launcher's JVM settings and class-data archive on the distribution's jar. From the
# top folder, after 'mvn -q -B -DskipTests package':
#
#   dev/critical-path/run.sh [JAVA-OPTION...] -- COMMAND-LINE...
#   e.g. dev/critical-path/run.sh -Dannalist.warmup=false -- brief demo-data/quennelmark-guest-nights.csv \
#            --series Total -o /tmp/total.pdf --generated-at 2026-11-20T08:00:00Z
#
# DIST (default target/annalist) chooses the distribution; the report goes to standard error.
set -euo pipefail
cd "$(dirname "$0")/../.."
dist=${DIST:-target/annalist}
classes=${TMPDIR:-/tmp}/annalist-critical-path
mkdir -p "$classes"
javac -d "$classes" -cp "$dist/lib/annalist.jar" dev/critical-path/CriticalPath.java
options=()
while [ $# -gt 0 ] && [ "$1" != "--" ]; do options+=("$1"); shift; done
[ $# -gt 0 ] && shift
# the launcher's settings (src/dist/bin/annalist) for a command other than batch, huge pages where
# the kernel gives them on request as it asks for them; the tool's class is added after the jar,
# which the archive allows
thp=()
if grep -qF '[madvise]' /sys/kernel/mm/transparent_hugepage/enabled 2>/dev/null; then
    thp=(-XX:+UseTransparentHugePages)
fi
exec java -Xmx640m -Xms64m -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -XX:-UsePerfData -Xshare:auto -Xlog:cds*=off \
    "${thp[@]}" -XX:SharedArchiveFile="$dist/lib/annalist.jsa" -Dannalist.home="$dist" "${options[@]}" \
    -cp "$dist/lib/annalist.jar:$classes" CriticalPath "$@"
