#!/usr/bin/env bash
# Takes the screenshots of docs/guide.md: the real window under a virtual display, and the chart exports of
# the command line. Re-run it whenever the window or a demo scenario changes; it lists every file it writes.
#
#   dev/screenshots.sh                     # window tour + the scenarios below, into docs/guide/
#   dev/screenshots.sh OUT_DIR a.toml ...  # the tour + the scenarios given, into OUT_DIR
#
# Needs Java 17, Maven (offline is fine once ~/.m2 holds the dependencies) and, without a DISPLAY, Xvfb.
set -euo pipefail
cd "$(dirname "$0")/.."
OUT="${1:-docs/guide}"
shift || true
if [ "$#" -gt 0 ]; then
  SCENARIOS=("$@")
else
  SCENARIOS=(scenarios/copper-plating-rundown.toml scenarios/gap-vs-voltage.toml
             scenarios/tin-narrow-gap-dendrites.toml scenarios/tin-divided-cell.toml)
fi
mkdir -p "$OUT"

MVN="mvn -o -q -B"
$MVN -DskipTests package
$MVN test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt >/dev/null
CP="target/test-classes:target/classes:$(cat target/cp.txt)"

XVFB_PID=""
cleanup() { if [ -n "$XVFB_PID" ]; then kill "$XVFB_PID" 2>/dev/null || true; fi; }
trap cleanup EXIT
if [ -z "${DISPLAY:-}" ]; then
  command -v Xvfb >/dev/null || { echo "no DISPLAY and no Xvfb: install Xvfb or run under a desktop" >&2; exit 2; }
  for n in $(seq 90 99); do
    if [ ! -e "/tmp/.X11-unix/X$n" ] && [ ! -e "/tmp/.X$n-lock" ]; then DISPLAY_NUM=$n; break; fi
  done
  Xvfb ":$DISPLAY_NUM" -screen 0 1600x1000x24 -nolisten tcp >/dev/null 2>&1 &
  XVFB_PID=$!
  export DISPLAY=":$DISPLAY_NUM"
  sleep 2
fi

echo "window screenshots into $OUT:" >&2
java -Dsun.java2d.uiScale=1 -cp "$CP" org.cellwright.ui.GuideScreenshots "$OUT" "${SCENARIOS[@]}"

echo "chart exports into $OUT:" >&2
JAR="java -jar target/cellwright.jar"
$JAR run scenarios/copper-plating-rundown.toml --chart "$OUT/run-sheet.png" >/dev/null
echo "$OUT/run-sheet.png"
$JAR sweep scenarios/gap-vs-voltage.toml --vary cell.gap=10mm:100mm:10 --figure voltage-mean \
  --out target/guide-gap.csv --chart "$OUT/sweep-gap.png" >/dev/null 2>&1
echo "$OUT/sweep-gap.png"
$JAR sweep scenarios/copper-plating-rundown.toml --vary supply.current_density="1:4 A/dm2:7" \
  --vary cell.agitation=still,gentle,sparged,stirred --figure efficiency \
  --out target/guide-grid.csv --chart "$OUT/sweep-grid.png" >/dev/null 2>&1
echo "$OUT/sweep-grid.png"
$JAR run scenarios/tin-shuttle-efficiency.toml --spread 60 --seed 7 --chart "$OUT/spread-bands.png" >/dev/null 2>&1
echo "$OUT/spread-bands.png"
