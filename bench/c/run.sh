#!/usr/bin/env bash
# The plain-C comparison for scan throughput: builds dop853.c (a copy of
# shared/anchors/dop853_c extended with "orbits FILE": the scan's full-orbit reference runs with
# the Java reference's step control, dense output, sampling and per-sample work), lists the runs
# of each scan with the Java tool, checks the physics once, then times whole processes
# alternately (C, Java with plain `java -jar`, Java through bin/twinorbit, C, ...) REPS times and
# prints the medians; one thread everywhere.
#   bench/c/run.sh                 # REPS=5, the three scans of results/benchmarks.md
#   REPS=3 bench/c/run.sh dipole   # one scan
# Needs harness/target/twinorbit.jar (mvn -B -ntp -q -DskipTests package).
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
JAR=${JAR:-$root/harness/target/twinorbit.jar}
REPS=${REPS:-5}
build=$here/build
mkdir -p "$build"
gcc -O3 -march=native -ffp-contract=off -std=c99 -o "$build/dop853-ieee" "$here/dop853.c" -lm
gcc -O3 -march=native -std=c99 -o "$build/dop853-plain" "$here/dop853.c" -lm
"$build/dop853-ieee" check | grep -E "PASS|FAIL"

declare -A SCANS=(
  [dipole]="--field dipole --pitch 30,60 --phases 8 --eps-min 0.005 --eps-max 0.3 --points 10 --duration 5 --duration-unit bounces"
  [mirror]="--field mirror --pitch 45,70"
  [gradient]="--field gradient --pitch 45,90 --duration 500 --duration-unit gyroperiods"
)
names=("$@")
[ ${#names[@]} -gt 0 ] || names=(dipole mirror gradient)
median() { sort -g | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }
now() { date +%s.%N; }
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg)"
echo
echo "| scan | orbits | C field evaluations | C wall s | C cpu s | Java wall s (java -jar) | Java wall s (bin/twinorbit) | Java/C (java -jar) | Java/C (bin/twinorbit) |"
echo "|---|---|---|---|---|---|---|---|---|"
for n in "${names[@]}"; do
    args=${SCANS[$n]}
    # shellcheck disable=SC2086
    java -cp "$JAR" org.twinorbit.harness.bench.ScanOrbits $args --threads 1 > "$build/orbits-$n.txt"
    : > "$build/c-$n.txt"; : > "$build/java-$n.txt"; : > "$build/launcher-$n.txt"
    for ((r = 0; r < REPS; r++)); do
        t0=$(now); "$build/dop853-ieee" orbits "$build/orbits-$n.txt" >> "$build/c-$n.txt"; t1=$(now)
        echo "process_wall_s=$(echo "$t1 - $t0" | bc -l)" >> "$build/c-$n.txt"
        t0=$(now)
        # shellcheck disable=SC2086
        java -jar "$JAR" scan $args --threads 1 --quiet --out "$build/scan-$n" > "$build/java-$n.log"
        t1=$(now)
        echo "process_wall_s=$(echo "$t1 - $t0" | bc -l)" >> "$build/java-$n.txt"
        t0=$(now)
        # shellcheck disable=SC2086
        TWINORBIT_JAR=$JAR "$root/bin/twinorbit" scan $args --threads 1 --quiet --out "$build/scan-$n" > "$build/java-$n.log"
        t1=$(now)
        echo "process_wall_s=$(echo "$t1 - $t0" | bc -l)" >> "$build/launcher-$n.txt"
    done
    cw=$(grep -o 'process_wall_s=[0-9.]*' "$build/c-$n.txt" | cut -d= -f2 | median)
    cc=$(grep -o 'cpu_s=[0-9.]*' "$build/c-$n.txt" | cut -d= -f2 | median)
    jw=$(grep -o 'process_wall_s=[0-9.]*' "$build/java-$n.txt" | cut -d= -f2 | median)
    lw=$(grep -o 'process_wall_s=[0-9.]*' "$build/launcher-$n.txt" | cut -d= -f2 | median)
    cf=$(grep -o 'fevals=[0-9]*' "$build/c-$n.txt" | head -1 | cut -d= -f2)
    no=$(wc -l < "$build/orbits-$n.txt")
    printf '| %s | %s | %s | %.2f | %.2f | %.2f | %.2f | %.1f | %.1f |\n' "$n" "$no" "$cf" "$cw" "$cc" "$jw" "$lw" \
        "$(echo "$jw / $cw" | bc -l)" "$(echo "$lw / $cw" | bc -l)"
done
echo
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
