#!/usr/bin/env bash
# The command line as a batch tool, side by side in one run (issue 19):
#  1. 100,000 invented members of mixed methods (bench/cli/make_members.py):
#     `strutline check FILE --json` against bench/cli/plain_check.py (plain
#     Python reading the same file, evaluating the flexural-buckling formulas,
#     writing JSON id/resistance/utilisation); wall time, CPU time and peak
#     memory (max RSS) of each by /usr/bin/time -v.
#  2. 1,000,000 members: JSON -> CSV by `strutline convert`, then
#     `strutline check` of that CSV (and CSV -> JSON back), time and memory.
# Writes bench/cli.md. Usage: bash bench/cli/run.sh [N_LONG]   (default 1000000)
set -euo pipefail
cd "$(dirname "$0")/../.."
long=${1:-1000000}
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
cargo build --release -q -p strutline-cli
bin=target/release/strutline

# measure NAME CMD...: runs CMD with stdout to $work/NAME.out; prints
# "wall_s cpu_s maxrss_kb exit".
measure() {
  local name=$1; shift
  local status=0
  /usr/bin/time -v -o "$work/$name.time" "$@" > "$work/$name.out" 2> "$work/$name.err" || status=$?
  python3 - "$work/$name.time" "$status" <<'PY'
import sys, re
t = open(sys.argv[1]).read()
def f(key):
    m = re.search(re.escape(key) + r":\s*(.+)", t)
    return m.group(1).strip() if m else "?"
wall = f("Elapsed (wall clock) time (h:mm:ss or m:ss)")
parts = [float(p) for p in wall.split(":")]
secs = sum(p * 60 ** i for i, p in enumerate(reversed(parts)))
cpu = float(f("User time (seconds)")) + float(f("System time (seconds)"))
print(f"{secs:.2f} {cpu:.2f} {f('Maximum resident set size (kbytes)')} {sys.argv[2]}")
PY
}

python3 bench/cli/make_members.py 100000 "$work/m100k.json"
read -r cw cc cm cs < <(measure cli "$bin" check "$work/m100k.json" --json)
read -r pw pc pm ps < <(measure py python3 bench/cli/plain_check.py "$work/m100k.json")
# Both wrote one result per member.
python3 - "$work/cli.out" "$work/py.out" <<'PY'
import json, sys
a = json.load(open(sys.argv[1]))["results"]; b = json.load(open(sys.argv[2]))["results"]
assert len(a) == len(b) == 100000 and [r["id"] for r in a] == [r["id"] for r in b]
PY
read -r lw lc lm ls < <(measure lines "$bin" check "$work/m100k.json" --jsonl)

python3 bench/cli/make_members.py "$long" "$work/long.json"
read -r vw vc vm vs < <(measure tocsv "$bin" convert "$work/long.json" "$work/long.csv")
read -r kw kc km ks < <(measure csvcheck "$bin" check "$work/long.csv" --jsonl)
read -r jw jc jm js < <(measure jsoncheck "$bin" check "$work/long.json" --jsonl)
read -r bw bc bm bs < <(measure tojson "$bin" convert "$work/long.csv" "$work/back.json")
rows=$(($(wc -l < "$work/csvcheck.out") - 1))
cmp -s <(head -c 100000000 "$work/csvcheck.out") <(head -c 100000000 "$work/jsoncheck.out") && same=yes || same=no

ratio=$(python3 -c "print(f'{$pw / $cw:.1f}')")
cpuratio=$(python3 -c "print(f'{$pc / $cc:.1f}')")
cat > bench/cli.md <<MD
# The command line as a batch tool

Measured by \`bash bench/cli/run.sh\` on $(date -u +%Y-%m-%dT%H:%MZ) at $(git rev-parse --short HEAD)
($(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | xargs), $(nproc) cores shared with other work;
load average at the end $(cut -d' ' -f1-3 /proc/loadavg)). Wall and CPU time and peak memory
(maximum resident set size) by \`/usr/bin/time -v\`. The files are invented
(\`bench/cli/make_members.py\`: rolled and welded I, hollow sections, glulam, rounds and typed
properties under all eight methods); \`bench/cli/plain_check.py\` is the plain-Python yardstick
(it reads the same file, evaluates the flexural-buckling formulas of each member's method about
both axes and writes JSON id/resistance/utilisation).

## 100,000 members, end to end

| run | wall s | CPU s | peak memory | exit |
| --- | ---: | ---: | ---: | ---: |
| \`strutline check FILE --json\` | $cw | $cc | $((cm / 1024)) MB | $cs |
| \`strutline check FILE --jsonl\` | $lw | $lc | $((lm / 1024)) MB | $ls |
| \`python3 plain_check.py FILE\` | $pw | $pc | $((pm / 1024)) MB | $ps |

strutline is **${ratio}x** as fast as the Python script by wall time and ${cpuratio}x by CPU time
(target: 10x by wall time, peak memory under 64 MB).

## $long members

| run | wall s | CPU s | peak memory | exit |
| --- | ---: | ---: | ---: | ---: |
| \`strutline convert long.json long.csv\` | $vw | $vc | $((vm / 1024)) MB | $vs |
| \`strutline check long.csv --jsonl\` | $kw | $kc | $((km / 1024)) MB | $ks |
| \`strutline check long.json --jsonl\` | $jw | $jc | $((jm / 1024)) MB | $js |
| \`strutline convert long.csv back.json\` | $bw | $bc | $((bm / 1024)) MB | $bs |

The CSV check wrote $rows results; its first 100 MB are byte for byte those of the JSON check: $same.
\`check\` and \`convert\` read a block of 4,096 members at a time (\`convert\` reads its input twice:
first for its problems, title and the CSV columns its members use, then to write); what grows
with the list is the set of ids kept to refuse a repeated one (\`core::ids::SeenIds\`: 40 bits
of a hash in 256 tables that grow one at a time, and the id's bytes: some 20 MB at a million ids).
MD
cat bench/cli.md
