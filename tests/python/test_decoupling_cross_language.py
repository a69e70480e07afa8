"""The same number in every language, for the decoupling topic: the C and Fortran test programs
in `--dump FILE` mode print one line `target function bits` per value line (status lines
excluded) of tests/data/decoupling.txt, in file order; `target` is the line's universe, history
or "-", `bits` the 16 hex digits of the IEEE-754 double. relicore.decoupling must give the
identical bits for every one of them (Saha, the fits, the five queries and the ten summary
values of every history).

A missing program is a failure when RELICORE_REQUIRE_CROSS=1 (make test sets it) and a skip
otherwise. Programs (paths relative to the repository root unless absolute): the environment
variable when set, else the first default that exists.
  RELICORE_C_DECOUPLING_DUMP_BIN  build/c-tests/test_decoupling, build/c/test_decoupling
                                  (tests/c/run.sh)
  RELICORE_F_DECOUPLING_DUMP_BIN  build/fortran/test_decoupling, build/fortran-tests/test_decoupling
                                  (tests/fortran/run.sh)
"""

from __future__ import annotations

import os
import subprocess

import pytest
from decoupling_refdata import DECOUPLING_FILE, dump_line, read_decoupling_file
from refdata import ROOT
from test_cosmology_cross_language import parse_dump
from test_cross_language import as_float, program

PROGRAMS = [
    ("C", "RELICORE_C_DECOUPLING_DUMP_BIN", ("build/c-tests/test_decoupling", "build/c/test_decoupling")),
    ("Fortran", "RELICORE_F_DECOUPLING_DUMP_BIN",
     ("build/fortran/test_decoupling", "build/fortran-tests/test_decoupling")),
]


def python_dump() -> list[tuple[str, str, str]]:
    vectors = read_decoupling_file().vectors
    return [dump_line(v) for v in vectors if not v.is_status]


@pytest.mark.parametrize("language, env, defaults", PROGRAMS, ids=[p[0] for p in PROGRAMS])
def test_identical_bits(language, env, defaults):
    assert DECOUPLING_FILE.exists(), f"missing {DECOUPLING_FILE}"
    exe = program(env, defaults)
    if not exe.exists():
        message = f"{language} decoupling dump program {exe} not found (set {env} or build it)"
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(message)
        pytest.skip(message)
    command = [str(exe), "--dump", str(DECOUPLING_FILE)]
    run = subprocess.run(command, capture_output=True, text=True, timeout=600, cwd=ROOT)
    assert run.returncode == 0, f"{' '.join(command)} failed ({run.returncode}):\n{run.stderr[-2000:]}"
    theirs = parse_dump(run.stdout)
    ours = python_dump()
    assert [(t, n) for t, n, _ in theirs] == [(t, n) for t, n, _ in ours], (
        f"{language} dumped {len(theirs)} values, Python has {len(ours)} value vectors; "
        "the (target, function) pairs in file order differ"
    )
    differ = [
        f"#{i} {t}.{name}: {language} {as_float(b):.17e} ({b}), Python {as_float(a):.17e} ({a})"
        for i, ((t, name, a), (_, _, b)) in enumerate(zip(ours, theirs))
        if a != b
    ]
    assert not differ, f"{len(differ)} of {len(ours)} values differ in bits:\n" + "\n".join(differ[:40])
