#!/usr/bin/env python3
"""Writes every generated face of relicore from one table (bindings/functions.toml) and the
core's rustdoc: the C exports, the Fortran module, the Python registrations, wrappers and stubs,
and the function lists of the test harnesses.

    python3 bindings/generate.py --write    rewrite the generated files (or only the paths given)
    python3 bindings/generate.py --check    regenerate in memory; fail with a diff on drift
                                            (RELICORE_BLESS=1 turns --check into --write)

Standard-library Python only (tomllib, 3.11+), so it runs before any venv or cargo build.
"""

from __future__ import annotations

import difflib
import os
import sys
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parent))

from gen import c_face, constants_face, fortran_face, harness, python_face, rust_tests, table  # noqa: E402

EMITTERS = (c_face, fortran_face, python_face, harness, rust_tests, constants_face)


def generated() -> dict[Path, str]:
    fns = table.load()
    out: dict[Path, str] = {}
    for emitter in EMITTERS:
        for path, text in emitter.outputs(fns).items():
            if path in out:
                raise SystemExit(f"generate.py: {path} written by two emitters")
            out[path] = text
    return out


def main(argv: list[str]) -> int:
    mode = argv[1] if len(argv) > 1 else "--check"
    only = [Path(a).resolve() for a in argv[2:]]  # optional: just these generated files
    if mode not in ("--check", "--write"):
        print(__doc__)
        return 2
    if mode == "--check" and os.environ.get("RELICORE_BLESS") == "1":
        mode = "--write"
    files = generated()
    if only:
        files = {p: t for p, t in files.items() if p in only}
    drift = 0
    for path, text in sorted(files.items()):
        rel = path.relative_to(table.ROOT)
        old = path.read_text() if path.exists() else ""
        if old == text:
            continue
        if mode == "--write":
            path.parent.mkdir(parents=True, exist_ok=True)
            path.write_text(text)
            print(f"wrote {rel}")
        else:
            drift += 1
            diff = difflib.unified_diff(
                old.splitlines(True), text.splitlines(True), f"{rel} (committed)", f"{rel} (generated)"
            )
            sys.stdout.writelines(list(diff)[:200])
    if drift:
        print(
            f"\ngenerate.py: {drift} generated file(s) differ from bindings/functions.toml and the "
            "core's rustdoc; run `python3 bindings/generate.py --write` (or RELICORE_BLESS=1 make test)"
        )
        return 1
    if mode == "--check":
        print(f"generate.py: {len(files)} generated files are current")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
