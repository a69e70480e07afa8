"""The same number in every language, for the cosmology topic: the C and Fortran test programs
in `--dump FILE` mode print one line `universe function bits` per value line (status lines
excluded) of tests/data/cosmology.txt, in file order; `bits` is the 16 hex digits of the
IEEE-754 double. relicore.Universe must give the identical bits for every one of them.

A missing program is a failure when RELICORE_REQUIRE_CROSS=1 (make test sets it) and a skip
otherwise. Programs (paths relative to the repository root unless absolute): the environment
variable when set, else the first default that exists.
  RELICORE_C_COSMOLOGY_DUMP_BIN  build/c-tests/test_cosmology, build/c/test_cosmology
                                 (tests/c/run.sh)
  RELICORE_F_COSMOLOGY_DUMP_BIN  build/fortran/test_cosmology, build/fortran-tests/test_cosmology
                                 (tests/fortran/run.sh)
"""

from __future__ import annotations

import os
import subprocess

import pytest

from cosmo_refdata import COSMOLOGY_FILE, dump_line, read_cosmology_file
from refdata import ROOT
from test_cross_language import as_float, program

PROGRAMS = [
    ("C", "RELICORE_C_COSMOLOGY_DUMP_BIN", ("build/c-tests/test_cosmology", "build/c/test_cosmology")),
    ("Fortran", "RELICORE_F_COSMOLOGY_DUMP_BIN", ("build/fortran/test_cosmology", "build/fortran-tests/test_cosmology")),
]


def python_dump() -> list[tuple[str, str, str]]:
    _, vectors = read_cosmology_file()
    return [dump_line(v) for v in vectors if not v.is_status]


def parse_dump(text: str) -> list[tuple[str, str, str]]:
    out = []
    for n, line in enumerate(text.splitlines(), start=1):
        if not line.strip():
            continue
        fields = line.split()
        assert len(fields) == 3, f"dump line {n}: expected 'universe function bits', got {line!r}"
        universe, name, hexbits = fields
        assert len(hexbits) == 16, f"dump line {n}: an f64 result has 16 hex digits: {line!r}"
        int(hexbits, 16)
        out.append((universe, name, hexbits.lower()))
    return out


@pytest.mark.parametrize("language, env, defaults", PROGRAMS, ids=[p[0] for p in PROGRAMS])
def test_identical_bits(language, env, defaults):
    assert COSMOLOGY_FILE.exists(), f"missing {COSMOLOGY_FILE}"
    exe = program(env, defaults)
    if not exe.exists():
        message = f"{language} cosmology dump program {exe} not found (set {env} or build it)"
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(message)
        pytest.skip(message)
    command = [str(exe), "--dump", str(COSMOLOGY_FILE)]
    run = subprocess.run(command, capture_output=True, text=True, timeout=600, cwd=ROOT)
    assert run.returncode == 0, f"{' '.join(command)} failed ({run.returncode}):\n{run.stderr[-2000:]}"
    theirs = parse_dump(run.stdout)
    ours = python_dump()
    assert [(u, n) for u, n, _ in theirs] == [(u, n) for u, n, _ in ours], (
        f"{language} dumped {len(theirs)} values, Python has {len(ours)} value vectors; "
        "the (universe, function) pairs in file order differ"
    )
    differ = [
        f"#{i} {u}.{name}: {language} {as_float(b):.17e} ({b}), Python {as_float(a):.17e} ({a})"
        for i, ((u, name, a), (_, _, b)) in enumerate(zip(ours, theirs))
        if a != b
    ]
    assert not differ, f"{len(differ)} of {len(ours)} values differ in bits:\n" + "\n".join(differ[:40])
