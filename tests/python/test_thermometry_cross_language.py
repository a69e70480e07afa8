"""The same number in every language for radiation thermometry: the C and Fortran test programs
in `--dump` mode print one line `name bits` per double value line of tests/data/thermometry.txt
and then of thermometry_response.txt, in file order (`name` as in the file, with its `@field`);
the Python face must give the identical bits for every one of them.

Programs: RELICORE_C_THERMOMETRY_BIN (default build/c-tests/test_thermometry, built by
tests/c/run.sh) and RELICORE_F_THERMOMETRY_BIN (default build/fortran/test_thermometry, built by
tests/fortran/run.sh). A missing program is a failure when RELICORE_REQUIRE_CROSS=1 and a skip
otherwise.
"""

from __future__ import annotations

import os
import subprocess

import pytest

from refdata import bits
from thermometry_refdata import RESPONSE_FILE, ROOT, SCALAR_FILE, all_lines, call, field

PROGRAMS = [("C", "RELICORE_C_THERMOMETRY_BIN", "build/c-tests/test_thermometry"),
            ("Fortran", "RELICORE_F_THERMOMETRY_BIN", "build/fortran/test_thermometry")]


def python_dump() -> list[tuple[str, str]]:
    return [(v.name, bits(field(call(v), v.field)).upper()) for v in all_lines() if not v.is_status and not v.is_f32]


@pytest.mark.parametrize("language, env, default", PROGRAMS)
def test_python_gives_the_bits_of_the_other_languages(language, env, default):
    path = ROOT / os.environ.get(env, default)
    if not path.exists():
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(f"{language}: {path} is missing")
        pytest.skip(f"{language}: {path} not built")
    out = subprocess.run([str(path), "--dump", str(SCALAR_FILE), str(RESPONSE_FILE)], capture_output=True,
                         text=True, check=True).stdout
    theirs = [tuple(line.split()) for line in out.splitlines() if line.strip()]
    theirs = [(n, b.upper()) for n, b in theirs]
    ours = python_dump()
    assert len(theirs) == len(ours) > 600
    diff = [(a, b) for a, b in zip(ours, theirs) if a != b]
    assert not diff, f"{language}: {len(diff)} of {len(ours)} differ, first {diff[:3]}"
