"""Tables of fuzz/RESULTS.md from the run log fuzz/target/logs/runs.tsv (written by fuzz/run.sh):
per target the runs, seconds, executions, the highest coverage seen (cov: code edges, ft:
features, as libFuzzer prints them) and the runs that stopped at a finding; then every run.

    python3 fuzz/summarize.py [fuzz/target/logs/runs.tsv]
"""
import collections
import sys

path = sys.argv[1] if len(sys.argv) > 1 else "fuzz/target/logs/runs.tsv"
rows = [line.rstrip("\n").split("\t") for line in open(path, encoding="utf-8")][1:]


def num(v):
    return int(v) if v.isdigit() else None


per = collections.OrderedDict()
for date, target, secs, execs, cov, ft, corp, result, note in rows:
    t = per.setdefault(target, dict(runs=0, secs=0, execs=0, cov=0, ft=0, stops=0))
    t["runs"] += 1
    t["secs"] += num(secs) or 0
    t["execs"] += num(execs) or 0
    t["cov"] = max(t["cov"], num(cov) or 0)
    t["ft"] = max(t["ft"], num(ft) or 0)
    t["stops"] += result != "ok"

print("| target | runs | seconds | executions | cov (max) | ft (max) | runs stopped at a finding |")
print("|---|---:|---:|---:|---:|---:|---:|")
for name, t in per.items():
    print(f"| `{name}` | {t['runs']} | {t['secs']} | {t['execs']:,} | {t['cov']} | {t['ft']} | {t['stops']} |"
          .replace(",", " "))
total = sum(t["execs"] for t in per.values())
print(f"| all | {sum(t['runs'] for t in per.values())} | {sum(t['secs'] for t in per.values())} | "
      f"{total:,} | | | {sum(t['stops'] for t in per.values())} |".replace(",", " "))
print()
print("| end (UTC) | target | seconds | executions | cov | ft | corpus | result | note |")
print("|---|---|---:|---:|---:|---:|---:|---|---|")
for date, target, secs, execs, cov, ft, corp, result, note in rows:
    print(f"| {date} | `{target}` | {secs} | {execs} | {cov} | {ft} | {corp} | {result} | {note} |")
