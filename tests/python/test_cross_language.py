"""The same number in every language: the C and Fortran test programs, run in `--dump FILE`
mode on tests/data/blackbody.txt, print one line `name bits` per value vector of the file (in
file order; `bits` is the 16 hex digits of the IEEE-754 double). The Python face must give the
identical bits for every one of them.

The C program also prints the `_f32` vectors (8 hex digits), which Python does not have; they
are skipped. A missing program is a failure when RELICORE_REQUIRE_CROSS=1 (make test sets it)
and a skip otherwise.

Programs (paths relative to the repository root unless absolute):
  RELICORE_C_DUMP_BIN  default build/c/test_blackbody        (built by tests/c/run.sh)
  RELICORE_F_DUMP_BIN  default build/fortran/test_blackbody  (built by tests/fortran/run.sh)
"""

from __future__ import annotations

import os
import pathlib
import struct
import subprocess

import pytest

from refdata import ROOT, SCALAR_FILE, bits, compute, read_scalar_file

PROGRAMS = [
    ("C", "RELICORE_C_DUMP_BIN", "build/c/test_blackbody"),
    ("Fortran", "RELICORE_F_DUMP_BIN", "build/fortran/test_blackbody"),
]


def program(env: str, default: str) -> pathlib.Path:
    p = pathlib.Path(os.environ.get(env, default))
    return p if p.is_absolute() else ROOT / p


def python_dump() -> list[tuple[str, str]]:
    return [
        (v.name, bits(compute(v)))
        for v in read_scalar_file(SCALAR_FILE)
        if not v.is_status and not v.is_f32
    ]


def parse_dump(text: str) -> list[tuple[str, str]]:
    out = []
    for n, line in enumerate(text.splitlines(), start=1):
        if not line.strip():
            continue
        fields = line.split()
        assert len(fields) == 2, f"dump line {n}: expected 'name bits', got {line!r}"
        name, hexbits = fields
        if name.endswith("_f32"):
            assert len(hexbits) == 8, f"dump line {n}: an f32 result has 8 hex digits: {line!r}"
            continue
        assert len(hexbits) == 16, f"dump line {n}: an f64 result has 16 hex digits: {line!r}"
        int(hexbits, 16)
        out.append((name, hexbits.lower()))
    return out


def as_float(hexbits: str) -> float:
    return struct.unpack(">d", bytes.fromhex(hexbits))[0]


@pytest.mark.parametrize("language, env, default", PROGRAMS, ids=[p[0] for p in PROGRAMS])
def test_identical_bits(language, env, default):
    exe = program(env, default)
    if not exe.exists():
        message = f"{language} dump program {exe} not found (set {env} or build it)"
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(message)
        pytest.skip(message)
    run = subprocess.run(
        [str(exe), "--dump", str(SCALAR_FILE)], capture_output=True, text=True, timeout=600, cwd=ROOT
    )
    assert run.returncode == 0, f"{exe} --dump failed ({run.returncode}):\n{run.stderr[-2000:]}"
    theirs = parse_dump(run.stdout)
    ours = python_dump()
    assert [n for n, _ in theirs] == [n for n, _ in ours], (
        f"{language} dumped {len(theirs)} f64 values, Python has {len(ours)} value vectors; "
        "the names in file order differ"
    )
    differ = [
        f"#{i} {name}: {language} {as_float(b):.17e} ({b}), Python {as_float(a):.17e} ({a})"
        for i, ((name, a), (_, b)) in enumerate(zip(ours, theirs))
        if a != b
    ]
    assert not differ, f"{len(differ)} of {len(ours)} values differ in bits:\n" + "\n".join(differ[:40])
