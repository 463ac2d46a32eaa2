#!/bin/sh
# Runs every JMH benchmark with its default parameters, one class at a time, recording the load
# average before and after each (the machine may be shared). Results: target/bench-logs/.
# Usage: mvn -q -B -P bench package && bench/run-all.sh [extra JMH options, e.g. -p rows=1000000]
set -e
cd "$(dirname "$0")/.."
out=target/bench-logs
mkdir -p "$out"
for b in ShortlistBench ImportBench CatalogOpenBench CheckBench ReplaceBench; do
  echo "== $b  start $(date -u +%FT%TZ)  $(uptime)" | tee -a "$out/load.txt"
  java -jar target/benchmarks.jar "$b" -rf json -rff "$out/$b.json" "$@" > "$out/$b.txt" 2>&1
  echo "== $b  end   $(date -u +%FT%TZ)  $(uptime)" | tee -a "$out/load.txt"
done
