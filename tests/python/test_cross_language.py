"""The same number in every language: the C and Fortran test programs in `--dump` mode print
one line `name bits` per value vector (status lines excluded) of tests/data/blackbody.txt and
then of blackbody_response.txt, in file order; `bits` is the 16 hex digits of the IEEE-754
double. The Python face must give the identical bits for every one of them.

The C program takes both files in one run (`--dump SCALAR_FILE RESPONSE_FILE`); the Fortran
program one file per run (`--dump FILE`).

The C program also prints the `_f32` vectors (8 hex digits), which Python does not have; they
are skipped. A missing program is a failure when RELICORE_REQUIRE_CROSS=1 (make test sets it)
and a skip otherwise.

Programs (paths relative to the repository root unless absolute): the environment variable
when set, else the first default that exists.
  RELICORE_C_DUMP_BIN  build/c/test_blackbody, build/c-tests/test_blackbody  (tests/c/run.sh)
  RELICORE_F_DUMP_BIN  build/fortran/test_blackbody, build/fortran-tests/test_blackbody
                       (tests/fortran/run.sh)
"""

from __future__ import annotations

import os
import pathlib
import struct
import subprocess

import pytest

from refdata import RESPONSE_FILE, ROOT, SCALAR_FILE, bits, compute, read_response_file, read_scalar_file

BOTH = [[str(SCALAR_FILE), str(RESPONSE_FILE)]]
EACH = [[str(SCALAR_FILE)], [str(RESPONSE_FILE)]]
PROGRAMS = [
    ("C", "RELICORE_C_DUMP_BIN", ("build/c/test_blackbody", "build/c-tests/test_blackbody"), BOTH),
    ("Fortran", "RELICORE_F_DUMP_BIN", ("build/fortran/test_blackbody", "build/fortran-tests/test_blackbody"), EACH),
]


def program(env: str, defaults: tuple[str, ...]) -> pathlib.Path:
    if os.environ.get(env):
        candidates = [pathlib.Path(os.environ[env])]
    else:
        candidates = [pathlib.Path(d) for d in defaults]
    paths = [p if p.is_absolute() else ROOT / p for p in candidates]
    return next((p for p in paths if p.exists()), paths[0])


def python_dump() -> list[tuple[str, str]]:
    vectors = read_scalar_file(SCALAR_FILE) + read_response_file(RESPONSE_FILE)
    return [(v.name, bits(compute(v))) for v in vectors if not v.is_status and not v.is_f32]


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


@pytest.mark.parametrize("language, env, defaults, runs", PROGRAMS, ids=[p[0] for p in PROGRAMS])
def test_identical_bits(language, env, defaults, runs):
    exe = program(env, defaults)
    if not exe.exists():
        message = f"{language} dump program {exe} not found (set {env} or build it)"
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(message)
        pytest.skip(message)
    theirs = []
    for files in runs:
        command = [str(exe), "--dump", *files]
        run = subprocess.run(command, capture_output=True, text=True, timeout=600, cwd=ROOT)
        assert run.returncode == 0, f"{' '.join(command)} failed ({run.returncode}):\n{run.stderr[-2000:]}"
        theirs += parse_dump(run.stdout)
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
