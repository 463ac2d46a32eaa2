#!/bin/sh
# Command-line start-up over repeated cold JVMs (hyperfine; Debian: apt-get install hyperfine):
# --version and an end-to-end shortlist on the example catalog, each plain (java -jar), with the
# AppCDS launcher bin/gatefit, and with AppCDS plus C1 only. Results: target/bench-logs/startup.*
# Usage: mvn -q -B -DskipTests package && bench/startup.sh [runs]
set -e
cd "$(dirname "$0")/.."
runs=${1:-20}
out=target/bench-logs
mkdir -p "$out"
jar=target/gatefit.jar
cat=$(mktemp -d)/catalog
java -jar "$jar" --catalog "$cat" import examples/switches.csv examples/drivers.csv >/dev/null
export XDG_CACHE_HOME="$out/cds-cache"
rm -rf "$XDG_CACHE_HOME/gatefit" # one archive: the current jar's
bin/gatefit --version >/dev/null # creates the archive (training run: gatefit demo)
jsa=$(ls "$XDG_CACHE_HOME"/gatefit/*.jsa)
sl="--catalog $cat shortlist --switch QND-65G150D --freq 200 --bus 375 --edge 10 --drive 6 --rg 4.7 --rg-off 1 --loop 3 --v-oh 4.6 --v-ol 0.2 --top 5"
echo "load before: $(uptime)" | tee "$out/startup.load"
hyperfine -N --warmup 2 --runs "$runs" --export-markdown "$out/startup.md" --export-json "$out/startup.json" \
  -n "version plain" "java -jar $jar --version" \
  -n "version appcds" "java -XX:SharedArchiveFile=$jsa -Xlog:cds=off -jar $jar --version" \
  -n "version appcds+c1" "java -XX:SharedArchiveFile=$jsa -Xlog:cds=off -XX:TieredStopAtLevel=1 -jar $jar --version" \
  -n "shortlist plain" "java -jar $jar $sl" \
  -n "shortlist appcds" "java -XX:SharedArchiveFile=$jsa -Xlog:cds=off -jar $jar $sl" \
  -n "shortlist appcds+c1" "java -XX:SharedArchiveFile=$jsa -Xlog:cds=off -XX:TieredStopAtLevel=1 -jar $jar $sl" \
  -n "shortlist bin/gatefit" "bin/gatefit $sl" \
  -n "shortlist bin/gatefit full jit" "env GATEFIT_JIT=full bin/gatefit $sl"
echo "load after: $(uptime)" | tee -a "$out/startup.load"
