#!/usr/bin/env python3
"""Compares what the four demo programs printed and says how far they agree.

Usage: compare_outputs.py rust=FILE c=FILE fortran=FILE python=FILE

Each file holds one program's output: comment lines starting with '#' and result lines
``key = value`` (17 significant digits, so the decimal text identifies the double exactly).
Prints one table row per quantity with its value and how far the languages differ (in units in
the last place of the first language's value), then the largest difference. Exits 1 when a
program printed a different set of keys or a value that is not a number; a numerical
difference is reported, not treated as a failure.
"""

from __future__ import annotations

import math
import re
import struct
import sys
from pathlib import Path

RESULT = re.compile(r"^([a-z][a-z0-9_]*) = (\S+)$")


def read_results(path: Path) -> dict[str, float]:
    """The key = value lines of one output, in order."""
    results: dict[str, float] = {}
    for line in path.read_text().splitlines():
        if not line.strip() or line.startswith("#"):
            continue
        m = RESULT.match(line.strip())
        if m is None:
            raise SystemExit(f"compare_outputs: {path}: unexpected line {line!r}")
        key, text = m.groups()
        if key in results:
            raise SystemExit(f"compare_outputs: {path}: key {key} printed twice")
        results[key] = float(text.replace("D", "e").replace("d", "e"))
    return results


def ordered_bits(x: float) -> int:
    """The double's bit pattern as an integer that increases with x (so that the difference of
    two is their distance in ulp, across zero too)."""
    (i,) = struct.unpack("<q", struct.pack("<d", x))
    return i if i >= 0 else -(i & 0x7FFF_FFFF_FFFF_FFFF)


def ulp_distance(a: float, b: float) -> int | None:
    if math.isnan(a) or math.isnan(b):
        return None
    return abs(ordered_bits(a) - ordered_bits(b))


def main(argv: list[str]) -> int:
    sources: list[tuple[str, Path]] = []
    for arg in argv[1:]:
        name, _, file = arg.partition("=")
        if not file:
            raise SystemExit(__doc__)
        sources.append((name, Path(file)))
    if len(sources) < 2:
        raise SystemExit(__doc__)
    outputs = {name: read_results(path) for name, path in sources}
    names = [name for name, _ in sources]
    reference = outputs[names[0]]
    keys = list(reference)
    status = 0
    for name in names[1:]:
        if list(outputs[name]) != keys:
            missing = sorted(set(keys) - set(outputs[name]))
            extra = sorted(set(outputs[name]) - set(keys))
            if missing or extra:
                print(f"KEYS DIFFER: {name} vs {names[0]}: missing {missing}, extra {extra}")
            else:
                print(f"KEYS DIFFER: {name} printed the keys of {names[0]} in a different order")
            status = 1
    keys = [k for k in keys if all(k in outputs[n] for n in names)]

    width = max(len(k) for k in keys)
    value_title = f"value ({names[0]}, 17 significant digits)"
    vwidth = max(len(value_title), 23)
    header = f"{'quantity':<{width}}  {value_title:<{vwidth}}  agreement of {', '.join(names)}"
    print(header)
    print("-" * len(header))
    worst_ulp = 0
    worst_rel = 0.0
    worst_key = None
    bad_numbers = False
    for key in keys:
        ref = reference[key]
        dists = {n: ulp_distance(ref, outputs[n][key]) for n in names[1:]}
        if any(d is None for d in dists.values()) or math.isnan(ref):
            agreement = "NaN printed: " + ", ".join(n for n in names if math.isnan(outputs[n][key]))
            bad_numbers = True
        elif all(d == 0 for d in dists.values()):
            agreement = "identical bits"
        else:
            agreement = "differ: " + ", ".join(
                f"{n} {outputs[n][key]:.16e} ({d} ulp)" for n, d in dists.items() if d
            )
        for n in names[1:]:
            d = dists[n]
            if d is not None and d > worst_ulp:
                worst_ulp, worst_key = d, key
            if d:
                rel = abs(outputs[n][key] - ref) / abs(ref) if ref else math.inf
                worst_rel = max(worst_rel, rel)
        print(f"{key:<{width}}  {ref:<{vwidth}.16e}  {agreement}")
    print("-" * len(header))
    langs = ", ".join(names)
    if bad_numbers:
        print("some programs printed NaN: see the table")
        status = 1
    if worst_ulp == 0:
        print(f"max difference between languages: 0 ulp -- all {len(keys)} quantities agree bit for bit in {langs}")
    else:
        print(
            f"max difference between languages: {worst_ulp} ulp (relative {worst_rel:.3e}), at {worst_key}; "
            f"the languages do NOT agree bit for bit on every quantity"
        )
    return status


if __name__ == "__main__":
    sys.exit(main(sys.argv))
