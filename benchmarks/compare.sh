#!/usr/bin/env bash
# Measures builds side by side in one session: runs the same JMH selection against each jar in
# turn, several rounds interleaved (A B C A B C ...), so that load from other users of the
# machine falls on all of them alike, then prints each jar's scores, their median and best, and
# both over those of the first jar. On a shared machine other load only ever slows a run down,
# so the best of several short runs is the steadier figure.
#   benchmarks/compare.sh ROUNDS JAR... -- JMH ARGS
# e.g. keep the jar of the commit before a change, then
#   benchmarks/compare.sh 3 /tmp/before.jar benchmarks/target/benchmarks.jar -- \
#     DecoderBenchmark -p order=2 -p confidence=false -f 1 -wi 2 -i 3 -w 1s -r 1s
# The score read is the tokens/s secondary result where there is one, else the primary score.
set -euo pipefail
rounds="$1"; shift
jars=()
while [[ $# -gt 0 && "$1" != "--" ]]; do jars+=("$1"); shift; done
shift
work="$(mktemp -d)"
for ((r = 1; r <= rounds; r++)); do
  for ((j = 0; j < ${#jars[@]}; j++)); do
    java -jar "${jars[j]}" "$@" -foe true -rf csv -rff "$work/$j-$r.csv" > "$work/$j-$r.log"
  done
done
python3 - "$work" "${#jars[@]}" "$rounds" "${jars[@]}" <<'PY'
import csv, statistics, sys
work, n, rounds, jars = sys.argv[1], int(sys.argv[2]), int(sys.argv[3]), sys.argv[4:]
def scores(j):
    by = {}
    for r in range(1, rounds + 1):
        rows = list(csv.DictReader(open(f"{work}/{j}-{r}.csv")))
        names = {row["Benchmark"] for row in rows}
        for row in rows:
            name = row["Benchmark"]
            if name + ":tokens" in names:
                continue
            params = " ".join(f"{k[7:]}={v}" for k, v in row.items() if k.startswith("Param: ") and v)
            by.setdefault(f"{name} {params}".strip(), []).append(float(row["Score"]))
    return by
base = scores(0)
for j in range(n):
    for name, values in scores(j).items():
        median, best = statistics.median(values), max(values)
        print(f"{jars[j]}  {name}  runs {', '.join(f'{v:,.0f}' for v in values)}"
              f"  median {median:,.0f} x{median / statistics.median(base[name]):.2f}"
              f"  best {best:,.0f} x{best / max(base[name]):.2f}")
PY
