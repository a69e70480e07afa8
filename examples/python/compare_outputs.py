#!/usr/bin/env python3
"""Compares what the four demo programs printed and says how far they agree.

Usage: compare_outputs.py rust=FILE c=FILE fortran=FILE python=FILE
       compare_outputs.py --raw-f64 LABEL rust=FILE c=FILE fortran=FILE python=FILE
       compare_outputs.py --table LABEL rust=FILE c=FILE fortran=FILE python=FILE

Each file holds one program's output: comment lines starting with '#' and result lines
``key = value`` (17 significant digits, so the decimal text identifies the double exactly).
Prints one table row per quantity with its value and how far the languages differ (in units in
the last place of the first language's value), then the largest difference. Exits 1 when a
program printed a different set of keys or a value that is not a number; a numerical
difference is reported, not treated as a failure.

With --raw-f64 the files are images written as raw little-endian float64 (the thermal scene):
they are compared byte for byte, and where they differ value by value (how many values differ
and by how many ulp at most). Exits 1 when the files differ in size or hold NaN; a numerical
difference is reported, not treated as a failure.

With --table the files are text tables (the simulation's power-spectrum file): comment lines
starting with '#' (those of the form ``# name = value`` are compared as numbers, the others as
text) and rows of whitespace-separated numbers. The files are compared byte for byte, and where
they differ line by line: the numbers in ulp, the text exactly. Exits 1 when the files differ in
shape or comment text, or hold NaN; a numerical difference is reported, not treated as a failure.
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


def compare_raw_f64(label: str, sources: list[tuple[str, Path]]) -> int:
    """Compares images of raw little-endian float64 byte for byte (and value by value where they
    differ); prints one summary line per image."""
    import hashlib

    import numpy as np

    names = [name for name, _ in sources]
    data = {name: path.read_bytes() for name, path in sources}
    sizes = {name: len(b) for name, b in data.items()}
    if len(set(sizes.values())) != 1 or next(iter(sizes.values())) % 8:
        print(f"{label}: FILE SIZES DIFFER or are not whole float64 values: {sizes}")
        return 1
    ref_name = names[0]
    ref = np.frombuffer(data[ref_name], dtype="<f8")
    status = 0
    nans = {name: int(np.isnan(np.frombuffer(b, dtype="<f8")).sum()) for name, b in data.items()}
    if any(nans.values()):
        print(f"{label}: NaN values in the image: {nans}")
        status = 1
    langs = ", ".join(names)
    if all(data[name] == data[ref_name] for name in names[1:]):
        digest = hashlib.sha256(data[ref_name]).hexdigest()[:16]
        print(f"{label}: {ref.size} values ({sizes[ref_name]} bytes), byte-identical in {langs} "
              f"(sha256 {digest}...)")
        return status
    worst = []
    for name in names[1:]:
        other = np.frombuffer(data[name], dtype="<f8")
        a, b = ref.view("<i8"), other.view("<i8")
        # ordered bit patterns: their difference is the distance in ulp, across zero too
        oa = np.where(a >= 0, a, -(a & 0x7FFF_FFFF_FFFF_FFFF))
        ob = np.where(b >= 0, b, -(b & 0x7FFF_FFFF_FFFF_FFFF))
        ulp = np.abs(oa - ob)
        differing = int(np.count_nonzero(ulp))
        worst.append(f"{name}: {differing} of {ref.size} values differ from {ref_name}, "
                     f"at most {int(ulp.max())} ulp")
    print(f"{label}: the languages do NOT agree bit for bit: " + "; ".join(worst))
    return status


HEADER_VALUE = re.compile(r"^# ([a-z][a-z0-9_]*) = (\S+)$")


def read_table(path: Path) -> tuple[list[tuple[str, str | float]], list[list[float]]]:
    """The comment lines (text, or name and value for ``# name = value``) and the numeric rows
    of a text table."""
    header: list[tuple[str, str | float]] = []
    rows: list[list[float]] = []
    for line in path.read_text().splitlines():
        if line.startswith("#"):
            m = HEADER_VALUE.match(line)
            if m is not None:
                header.append((m.group(1), float(m.group(2))))
            else:
                header.append(("text", line))
        elif line.strip():
            try:
                rows.append([float(t) for t in line.split()])
            except ValueError:
                raise SystemExit(f"compare_outputs: {path}: not a row of numbers: {line!r}") from None
    return header, rows


def compare_table(label: str, sources: list[tuple[str, Path]]) -> int:
    """Compares text tables byte for byte, and line by line where they differ; prints a summary."""
    import hashlib

    names = [name for name, _ in sources]
    raw = {name: path.read_bytes() for name, path in sources}
    tables = {name: read_table(path) for name, path in sources}
    ref_name = names[0]
    ref_header, ref_rows = tables[ref_name]
    n_values = sum(len(r) for r in ref_rows)
    langs = ", ".join(names)
    status = 0
    if any(math.isnan(v) for r in ref_rows for v in r):
        print(f"{label}: NaN in {ref_name}'s table")
        status = 1
    if all(raw[n] == raw[ref_name] for n in names[1:]):
        digest = hashlib.sha256(raw[ref_name]).hexdigest()[:16]
        print(f"{label}: {len(ref_rows)} rows ({n_values} values) and {len(ref_header)} header lines, "
              f"byte-identical in {langs} (sha256 {digest}...)")
        return status
    notes = []
    rows_agree = True
    for name in names[1:]:
        header, rows = tables[name]
        if len(rows) != len(ref_rows) or any(len(a) != len(b) for a, b in zip(rows, ref_rows)):
            print(f"{label}: SHAPES DIFFER: {name} vs {ref_name}")
            return 1
        if len(header) != len(ref_header) or any(a[0] != b[0] for a, b in zip(header, ref_header)):
            print(f"{label}: HEADERS DIFFER: {name} vs {ref_name}")
            return 1
        for (key, a), (_, b) in zip(ref_header, header):
            if key == "text":
                if a != b:
                    print(f"{label}: HEADER TEXT DIFFERS: {name}: {b!r} vs {a!r}")
                    status = 1
            elif isinstance(a, float) and isinstance(b, float):
                d = ulp_distance(a, b)
                if d:
                    notes.append(f"header {key}: {name} {d} ulp")
        worst = 0
        differing = 0
        for ra, rb in zip(ref_rows, rows):
            for a, b in zip(ra, rb):
                d = ulp_distance(a, b)
                if d is None:
                    status = 1
                elif d:
                    differing += 1
                    worst = max(worst, d)
        if differing:
            rows_agree = False
            notes.append(f"rows: {name} {differing} of {n_values} values differ, at most {worst} ulp")
    verdict = (f"the {len(ref_rows)} rows ({n_values} values) have identical bits in {langs}"
               if rows_agree else "the rows do NOT agree bit for bit")
    print(f"{label}: files not byte-identical; {verdict}; differences: " + "; ".join(notes))
    return status


def main(argv: list[str]) -> int:
    if len(argv) > 2 and argv[1] == "--table":
        label = argv[2]
        tabs: list[tuple[str, Path]] = []
        for arg in argv[3:]:
            name, _, file = arg.partition("=")
            if not file:
                raise SystemExit(__doc__)
            tabs.append((name, Path(file)))
        if len(tabs) < 2:
            raise SystemExit(__doc__)
        return compare_table(label, tabs)
    if len(argv) > 2 and argv[1] == "--raw-f64":
        label = argv[2]
        raw: list[tuple[str, Path]] = []
        for arg in argv[3:]:
            name, _, file = arg.partition("=")
            if not file:
                raise SystemExit(__doc__)
            raw.append((name, Path(file)))
        if len(raw) < 2:
            raise SystemExit(__doc__)
        return compare_raw_f64(label, raw)
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
