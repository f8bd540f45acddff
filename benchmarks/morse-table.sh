#!/usr/bin/env bash
# Prints the measurement tables recorded in benchmarks/RESULTS.md. Each row runs in its own JVM so
# that its peak heap is its own; heaps are set tight (64 bytes per cell plus cover, or 256 MiB at
# least) so that the reported peak reflects live data rather than garbage awaiting collection.
# Usage: benchmarks/morse-table.sh [parse|morse|speedup|implicit|all]   (run from anywhere)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
root="$(dirname "$here")"
jar="$here/target/benchmarks.jar"
if [ ! -f "$jar" ] || [ -n "$(find "$root" -name '*.java' -newer "$jar" -print -quit)" ]; then
  (cd "$root" && mvn -q -B -DskipTests install)
fi
what="${1:-all}"
run() { java "$@"; }

if [ "$what" = parse ] || [ "$what" = all ]; then
  echo "| grid | elements | covers | file bytes | read + build ms | peak heap MiB | retained MiB |"
  echo "|---|---|---|---|---|---|---|"
  for side in 10 22 50; do run -Xmx2g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ParseTable "$side"; done
fi

if [ "$what" = morse ] || [ "$what" = all ]; then
  echo "| block | heuristic | cells | covers | read ms | CW check + complex ms | match / verify / sweep / reduce / homology ms | homology total ms | ratio | peak heap MiB | bytes per (cell + cover) | critical | excess |"
  echo "|---|---|---|---|---|---|---|---|---|---|---|---|---|"
  # heaps: tight enough to keep garbage out of the peak, roomy enough to finish
  run -Xmx256m -XX:+UseSerialGC -cp "$jar" dev.morse.bench.MorseTable 22 coreduction
  run -Xmx256m -XX:+UseSerialGC -cp "$jar" dev.morse.bench.MorseTable 22 collapse
  run -Xmx260m -XX:+UseSerialGC -cp "$jar" dev.morse.bench.MorseTable 50 coreduction
  run -Xmx260m -XX:+UseSerialGC -cp "$jar" dev.morse.bench.MorseTable 50 collapse
  run -Xmx2700m -XX:+UseSerialGC -cp "$jar" dev.morse.bench.MorseTable 108 coreduction
fi

if [ "$what" = speedup ] || [ "$what" = all ]; then
  echo "| block | cells | none ms | coreduction ms | speedup |"
  echo "|---|---|---|---|---|"
  run -Xmx8g -cp "$jar" dev.morse.bench.SpeedupTable coreduction 10 15 22
fi

if [ "$what" = implicit ] || [ "$what" = all ]; then
  echo "| poset | element order | elements | chains | maximal chains reached / subtrees skipped | critical | lower bound | excess | generate ms | chains / order / match / sweep / reduce / homology ms | engine ms | peak heap MiB |"
  echo "|---|---|---|---|---|---|---|---|---|---|---|---|"
  run -Xmx1g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ImplicitTable pi:8
  run -Xmx1g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ImplicitTable sub:2:5
  run -Xmx8g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ImplicitTable pi:9
  run -Xmx8g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ImplicitTable pi:9 ids
  run -Xmx1g -XX:+UseSerialGC -cp "$jar" dev.morse.bench.ImplicitTable bool:13
fi
