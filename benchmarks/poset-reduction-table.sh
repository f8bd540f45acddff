#!/usr/bin/env bash
# Prints the table of poset reductions recorded under "Poset reductions" in benchmarks/RESULTS.md,
# one JVM per row. Usage: benchmarks/poset-reduction-table.sh   (run from anywhere)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
jar="$here/target/benchmarks.jar"
if [ ! -f "$jar" ] || [ -n "$(find "$root" -name '*.java' -newer "$jar" -print -quit)" ]; then
  (cd "$root" && mvn -q -B -DskipTests package -pl benchmarks -am)
fi
row() { java -Xmx4g -cp "$jar" dev.morse.bench.PosetReductionTable "$@"; }
echo "| input | elements | left | beat points | acyclic links | links skipped | reduction ms | order complex cells | cells left | homology ms | without reduction ms | Betti numbers |"
echo "|---|---|---|---|---|---|---|---|---|---|---|---|"
row partition 6
row partition 7
row partition 8
row subspace 4 2
row subspace 5 2
row subspace 3 3
row noncrossing 8
row partition-proper 6
row partition-proper 7
row subspace-proper 4 2
row subspace-proper 3 3
row noncrossing-proper 7
row divisor-proper 1081080
row random 60 2
row random 80 3
