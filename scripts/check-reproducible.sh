#!/usr/bin/env bash
# Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
#
# Reproducible-build check: builds the release artifacts twice from clean (the release
# profile, tests skipped, without benchmarks) and compares the SHA-256 of every jar and of
# the unsigned Central bundle. Any difference is printed and the script exits 1.
#
#   scripts/check-reproducible.sh          # from anywhere in the repository
#   scripts/check-reproducible.sh -o       # extra Maven options, e.g. offline
#
# About 3 to 4 minutes on 2 cores; not part of ./mvnw -B verify nor of .ci/run (there,
# distribution/.../ReproducibleBuildIT rebuilds shield-core only and compares its jar).
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT

build() {
    ./mvnw -B -q -Prelease -DskipTests -pl '!benchmarks' "$@" clean verify
    # Every archive the build makes, by path, with its SHA-256.
    find . -path ./benchmarks -prune -o -path '*/target/*' \( -name '*.jar' -o -name '*.zip' \) -print \
        | grep -v '/target/central-bundle/' | LC_ALL=C sort | xargs sha256sum
}

build "$@" > "$work/first"
build "$@" > "$work/second"
if diff "$work/first" "$work/second"; then
    echo "reproducible: $(wc -l < "$work/first") archives identical in two builds"
    cat "$work/first"
else
    echo "NOT reproducible: the archives above differ between two builds" >&2
    exit 1
fi
