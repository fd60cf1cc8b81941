#!/usr/bin/env bash
# Times the browser board on loopback with curl: the page and its modules, then move round trips
# (the person's move checked, the computer's reply, the updated analysis) on small positions.
# Usage: bench/web/measure.sh [base-url]   (start `bramble serve` first; default http://127.0.0.1:8421)
set -euo pipefail
base="${1:-http://127.0.0.1:8421}"
runs=20
median() { sort -n | awk '{a[NR]=$1} END {print a[int((NR+1)/2)]}'; }
ms() { awk '{printf "%.1f\n", $1 * 1000}'; }

echo "page load (index.html, 6 modules, stylesheet, /api/setup), ${runs} runs:"
# One curl process per run fetches every file over one connection, as a browser would; the sum
# of the per-file times is the load time without the cost of starting curl itself.
urls=()
for f in "" app.css main.js api.js board.js analysis.js play.js edit.js replay.js api/setup; do urls+=("$base/$f"); done
for _ in $(seq $runs); do
  curl -s $(printf -- '-o /dev/null %.0s' "${urls[@]}") -w '%{time_total}\n' "${urls[@]}" | awk '{s += $1} END {print s}'
done | ms | median | sed 's/^/  median ms: /'

roundtrip() {
  local ruleset="$1" start="$2" move="$3"
  for _ in $(seq $runs); do
    t1=$(curl -s -o /dev/null -w '%{time_total}' -H 'Content-Type: application/json' -X POST "$base/api/play" \
      -d "{\"ruleset\":\"$ruleset\",\"start\":\"$start\",\"first\":\"left\",\"moves\":[],\"move\":\"$move\",\"opponent\":\"perfect\",\"computer\":\"right\",\"level\":\"quick\"}")
    t2=$(curl -s -o /dev/null -w '%{time_total}' -H 'Content-Type: application/json' -X POST "$base/api/analyse" \
      -d "{\"ruleset\":\"$ruleset\",\"start\":\"$start\",\"first\":\"left\",\"moves\":[\"$move\"]}")
    echo "$t1 + $t2" | bc
  done | ms | median
}
echo "move round trip (play + perfect's reply + analysis), median of ${runs}, ms:"
echo "  hackenbush BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3], e1: $(roundtrip hackenbush 'BRB + G(B,R) + [B0-1,R1-2,G2-0,B1-3]' e1)"
echo "  hackenbush GGG + BR + G(G,G) + RRB, e1:             $(roundtrip hackenbush 'GGG + BR + G(G,G) + RRB' e1)"
echo "  domineering 4x4, b1:                                $(roundtrip domineering 4x4 b1)"
echo "  domineering 5x5, c2:                                $(roundtrip domineering 5x5 c2)"
echo "  forms {3|-1} + {5|2||0} + * + 1/2, 1.1:             $(roundtrip forms '{3|-1} + {5|2||0} + * + 1/2' 1.1)"
