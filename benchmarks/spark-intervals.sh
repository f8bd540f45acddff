#!/usr/bin/env bash
# Intervals per second of 'morse intervals' (1 and 2 threads) and 'morse-spark intervals' (local[1],
# local[2]) on the same input, and the fixed cost of each launcher on a two-element poset. Wall clock,
# the JVM's start included, best of REPEATS runs; the rate counts the sweep alone: intervals divided by
# (wall time on the input - wall time on the two-element poset).
# Usage: benchmarks/spark-intervals.sh [N for the Bruhat order of S_N, default 5] [REPEATS, default 2]
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
n="${1:-5}"
repeats="${2:-2}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
input="$work/bruhat-$n.poset"
tiny="$root/corpus/loop.poset"
"$root/morse-cli/morse" generate bruhat "$n" --proper -o "$input" >/dev/null
# build both launchers before timing anything
"$root/morse-cli/morse" intervals "$tiny" --json -q >/dev/null
"$root/morse-spark/morse-spark" intervals "$tiny" --json -q --master 'local[1]' >/dev/null 2>&1
intervals="$("$root/morse-cli/morse" intervals "$input" --json -q | sed -n 's/^  "intervals": \([0-9]*\),$/\1/p')"

best() {   # best wall seconds of "$@" over the repeats
    local b=""
    for ((r = 0; r < repeats; r++)); do
        local s e t
        s="$(date +%s.%N)"
        "$@" > "$work/out.json" 2>/dev/null
        e="$(date +%s.%N)"
        t="$(echo "$e - $s" | bc -l)"
        if [[ -z "$b" ]] || (( $(echo "$t < $b" | bc -l) )); then b="$t"; fi
    done
    echo "$b"
}

echo "uptime at start: $(uptime)"
echo "input: Bruhat order of S_$n, proper part; $intervals intervals; $repeats run(s) per cell"
echo
echo "| command | wall s, two-element poset | wall s, input | intervals per second (sweep alone) |"
echo "|---|---|---|---|"
row() {
    local name="$1"; shift
    local fixed total
    fixed="$(best "$@" "$tiny")"
    total="$(best "$@" "$input")"
    printf '| %s | %.1f | %.1f | %.0f |\n' "$name" "$fixed" "$total" "$(echo "$intervals / ($total - $fixed)" | bc -l)"
}
cli() { "$root/morse-cli/morse" intervals "$2" --json -q --threads "$1"; }
spark() { "$root/morse-spark/morse-spark" intervals "$2" --json -q --master "$1"; }
row "morse intervals --threads 1" cli 1
row "morse intervals --threads 2" cli 2
row "morse-spark intervals --master local[1]" spark 'local[1]'
row "morse-spark intervals --master local[2]" spark 'local[2]' 
echo
echo "uptime at end: $(uptime)"
