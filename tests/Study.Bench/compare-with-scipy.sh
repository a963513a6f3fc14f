#!/usr/bin/env bash
# Study against an independent Newton-Raphson in numpy/scipy (reference/newton_scipy.py), side by side in
# one run on the same generated networks: one-shot solve end to end and its solve stage, the cost of one
# outage solve, full N-1 wall time, and read + validate + build of a large file. Prints one line per
# figure with both times and their ratio. Needs python3 with numpy and scipy (Debian: python3-scipy).
#   tests/Study.Bench/compare-with-scipy.sh [WORKDIR]
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
work=${1:-$(mktemp -d)}
mkdir -p "$work"
py=${PYTHON:-python3}
"$py" -c "import scipy" 2>/dev/null || py=/usr/bin/python3
dotnet build -c Release "$root/src/Study.App" >/dev/null
study() { dotnet "$root/src/Study.App/bin/Release/net10.0/study.dll" "$@"; }
now() { date +%s.%N; }
ratio() { awk -v a="$1" -v b="$2" 'BEGIN { printf "%.3f", a / b }'; }
field() { "$py" -c "import json,sys; d=json.load(open('$1')); st={x['stage']: x['ms'] / 1000 for x in d.get('timings', {}).get('stages', [])}; print($2)"; }

for n in 2000 10000 100000; do
  [ -f "$work/g$n.study.json" ] || study generate --buses $n -o "$work/g$n.study.json" >/dev/null
done

echo "machine: $(nproc) cores, $(awk '/MemTotal/ {printf "%.0f GiB", $2/1048576}' /proc/meminfo), load $(cut -d' ' -f1-3 /proc/loadavg)"
for n in 2000 10000; do
  f="$work/g$n.study.json"
  "$py" "$here/reference/newton_scipy.py" "$f" --outages $((400000 / n)) > "$work/scipy$n.json"
  t0=$(now); study solve "$f" --json > "$work/solve$n.json"; t1=$(now)
  study solve "$f" --timings --json > "$work/timed$n.json"
  t2=$(now); "$py" "$here/reference/newton_scipy.py" "$f" > /dev/null; t3=$(now)
  oneshot=$(awk -v a="$t0" -v b="$t1" 'BEGIN { print b - a }'); scipyshot=$(awk -v a="$t2" -v b="$t3" 'BEGIN { print b - a }')
  solve=$(field "$work/timed$n.json" "st['solve']")
  ssolve=$(field "$work/scipy$n.json" "d['solveS']")
  echo "$n buses: one-shot solve end to end ${oneshot}s, scipy ${scipyshot}s, ratio $(ratio "$oneshot" "$scipyshot")"
  echo "$n buses: solve stage of a one-shot process ${solve}s, scipy solve ${ssolve}s, ratio $(ratio "$solve" "$ssolve")"
  t4=$(now); study outages "$f" --json > "$work/outages$n.json" 2>/dev/null; t5=$(now)
  wall=$(awk -v a="$t4" -v b="$t5" 'BEGIN { print b - a }')
  count=$(field "$work/outages$n.json" "len(d['outages']) if 'outages' in d else sum(len(s['outages']) for s in d['scenarios'])")
  per=$(awk -v w="$wall" -v c="$count" -v k="$(nproc)" 'BEGIN { print w * k / c }')
  sper=$(field "$work/scipy$n.json" "d['perOutageS']")
  echo "$n buses: full N-1 of $count outages ${wall}s wall; per outage ${per} core-s against scipy's warm solve ${sper}s, ratio $(ratio "$per" "$sper")"
done
study solve "$work/g100000.study.json" --timings --json > "$work/timed100000.json"
echo "100000 buses: read $(field "$work/timed100000.json" "round(st['read'], 3)")s, validate $(field "$work/timed100000.json" "round(st['validate'], 3)")s, build $(field "$work/timed100000.json" "round(st['build'], 3)")s; together $(field "$work/timed100000.json" "round(st['read'] + st['validate'] + st['build'], 3)")s"
