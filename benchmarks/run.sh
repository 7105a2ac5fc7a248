#!/usr/bin/env bash
# Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
#
# Short run of every JMH benchmark in the benchmarks module (all classes present are
# picked up), then the ratio table against the baselines of the same run, then the NumPy
# comparison if python3 with NumPy is there. A few minutes on 2 cores.
#
#   benchmarks/run.sh                  # from the repository root or from benchmarks/
#   benchmarks/run.sh Planar           # only benchmarks matching a JMH regex
#   JMH_ARGS='-f 2 -wi 5 -w 1s -i 5 -r 1s' benchmarks/run.sh   # longer settings instead of the short ones
#
# Never part of ./mvnw verify. Output: benchmarks/target/jmh/result.json and the table.
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root"
out=benchmarks/target/jmh
./mvnw -q -B -DskipTests package -pl benchmarks -am
mkdir -p "$out"
# Short settings: 1 fork, 3 warm-up and 3 measured iterations of 1 s each. The GC profiler
# gives the bytes allocated per operation.
settings="${JMH_ARGS:--f 1 -wi 3 -w 1s -i 3 -r 1s}"
# shellcheck disable=SC2086
java -jar benchmarks/target/benchmarks.jar $settings -prof gc \
    -rf json -rff "$out/result.json" "$@" > "$out/jmh.log"
numpy=""
if command -v python3 > /dev/null; then
    python3 benchmarks/numpy_sweep.py | tee "$out/numpy.log"
    numpy="$(sed -n 's/^points_per_second=//p' "$out/numpy.log")"
else
    echo "run.sh: python3 not found; the NumPy comparison is skipped."
fi
echo
java -cp benchmarks/target/benchmarks.jar io.shieldmath.shield.benchmarks.RatioTable "$out/result.json" $numpy
