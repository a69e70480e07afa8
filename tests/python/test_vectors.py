"""The shared reference vectors (tests/data/blackbody.txt and blackbody_response.txt, written by
tests/reference/blackbody_vectors.py with mpmath; format in tests/data/FORMAT.md) through the
Python face: every f64 vector within its line's tolerance, every status vector raising
RelicoreError with that status (and giving NaN with nan_on_error=True). `_f32` lines are the
single-precision twins, which Python does not expose; the Rust and C tests check them.

Each vector is checked twice: as a scalar call and as one element of a single array call over
all the vectors of its function (the two must agree to the bit).
"""

from __future__ import annotations

import math

import numpy as np
import pytest

import relicore
from refdata import (
    RESPONSE_FILE,
    RESPONSE_NAMES,
    SCALAR_DISPATCH,
    SCALAR_FILE,
    Vector,
    call_response,
    read_response_file,
    read_scalar_file,
    report,
    within,
)

SCALAR = read_scalar_file() if SCALAR_FILE.exists() else []
RESPONSE = read_response_file() if RESPONSE_FILE.exists() else []


def test_reference_files_exist_and_are_not_empty():
    # source: tests/data (mpmath reference script); without it nothing below is checked
    assert SCALAR_FILE.exists(), f"missing {SCALAR_FILE}"
    assert RESPONSE_FILE.exists(), f"missing {RESPONSE_FILE}"
    assert len([v for v in SCALAR if not v.is_f32]) > 100
    assert len([v for v in RESPONSE if not v.is_f32]) > 3


def test_every_name_in_the_files_is_known():
    # an unknown name in the data fails every harness (DEVELOPERS.md): a new function needs a face
    unknown = sorted(
        {v.name for v in SCALAR if not v.is_f32 and v.name not in SCALAR_DISPATCH}
        | {v.name for v in RESPONSE if not v.is_f32 and v.name not in RESPONSE_NAMES}
    )
    assert not unknown, f"vector names without a Python dispatch: {unknown}"


def _by_name(vectors: list[Vector]) -> dict[str, list[Vector]]:
    out: dict[str, list[Vector]] = {}
    for v in vectors:
        if not v.is_f32:
            out.setdefault(v.name, []).append(v)
    return out


SCALAR_BY_NAME = _by_name(SCALAR)


def _check_status(v: Vector, call) -> list[str]:
    problems = []
    try:
        got = call(False)
    except relicore.RelicoreError as err:
        if err.status != v.status:
            problems.append(f"{v.where()} {v.name}{v.args}: status {err.status}, want {v.status} ({err})")
    else:
        problems.append(f"{v.where()} {v.name}{v.args}: want status {v.status}, got value {got!r}")
    return problems


@pytest.mark.parametrize("name", sorted(SCALAR_BY_NAME))
def test_scalar_vectors(name):
    # source: each line's source field (mpmath, handbook-memory, its90, fixsen2009, spec)
    vectors = SCALAR_BY_NAME[name]
    call = SCALAR_DISPATCH.get(name)
    assert call is not None, f"unknown vector name {name}"
    problems = []
    for v in vectors:
        if v.is_status:
            problems += _check_status(v, lambda nan, v=v: call(v.args, nan_on_error=nan))
            try:
                got = call(v.args, nan_on_error=True)
            except relicore.RelicoreError as err:
                # only a failure of two_load_calibration (a scalar constructor) may still raise
                if not (name in ("calibrated_temperature", "calibrated_brightness_temperature") and err.function == "two_load_calibration"):
                    problems.append(f"{v.where()} {name}{v.args}: raised with nan_on_error=True: {err}")
            else:
                if not math.isnan(got):
                    problems.append(f"{v.where()} {name}{v.args}: nan_on_error=True gave {got!r}, want nan")
        else:
            got = call(v.args)
            if not isinstance(got, float):
                problems.append(f"{v.where()} {name}: scalar call returned {type(got).__name__}, not float")
            elif not within(v, got):
                problems.append(report(v, got))
    assert not problems, f"{len(problems)} of {len(vectors)} vectors of {name} failed:\n" + "\n".join(problems)


@pytest.mark.parametrize("name", sorted(n for n in SCALAR_BY_NAME if n not in ("calibrated_temperature", "calibrated_brightness_temperature")))
def test_scalar_vectors_as_one_array_call(name):
    # source: as test_scalar_vectors; the array path must give the scalar path's bits, and with
    # nan_on_error the status vectors become NaN while the others keep their exact values
    vectors = SCALAR_BY_NAME[name]
    call = SCALAR_DISPATCH[name]
    columns = tuple(np.array(c) for c in zip(*(v.args for v in vectors)))
    got = call(columns, nan_on_error=True)
    assert isinstance(got, np.ndarray) and got.shape == (len(vectors),)
    problems = []
    for v, g in zip(vectors, got):
        if v.is_status:
            if not math.isnan(g):
                problems.append(f"{v.where()} {name}{v.args}: nan_on_error gave {g!r}, want nan")
        else:
            alone = call(v.args)
            if not (g == alone or (math.isnan(g) and math.isnan(alone))):
                problems.append(f"{v.where()} {name}{v.args}: array element {g!r} differs from scalar call {alone!r}")
    assert not problems, "\n".join(problems)
    values = [v for v in vectors if not v.is_status]
    if values:
        only = tuple(np.array(c) for c in zip(*(v.args for v in values)))
        assert np.array_equal(call(only), got[[not v.is_status for v in vectors]])


@pytest.mark.parametrize("calibrated", ["calibrated_temperature", "calibrated_brightness_temperature"])
def test_calibrated_vectors_as_array_calls(calibrated):
    # source: as test_scalar_vectors; readings of one calibration looped in one array call
    fn = getattr(relicore.blackbody, calibrated)
    problems = []
    groups: dict[tuple[float, ...], list[Vector]] = {}
    for v in SCALAR_BY_NAME.get(calibrated, []):
        if not v.is_status:
            groups.setdefault(v.args[:5], []).append(v)
    for setup, vectors in groups.items():
        cal = relicore.blackbody.two_load_calibration(*setup)
        got = fn(cal, np.array([v.args[5] for v in vectors]))
        for v, g in zip(vectors, got):
            if not within(v, float(g)):
                problems.append(report(v, float(g)))
    assert groups
    assert not problems, "\n".join(problems)


RESPONSE_F64 = [v for v in RESPONSE if not v.is_f32]


@pytest.mark.parametrize("v", RESPONSE_F64, ids=[f"{v.name}:{v.line}" for v in RESPONSE_F64])
def test_response_vectors(v):
    # source: the line's source field (mpmath quadrature of the piecewise-linear response)
    assert v.name in RESPONSE_NAMES, f"unknown vector name {v.name}"
    if v.is_status:
        assert not _check_status(v, lambda nan: call_response(v, v.args[0], nan)), _check_status(
            v, lambda nan: call_response(v, v.args[0], nan)
        )
        return
    got = call_response(v, v.args[0])
    assert isinstance(got, float)
    assert within(v, got), report(v, got)
    # the same table looped over an array: the element is the scalar call's value
    arr = call_response(v, np.array([v.args[0], v.args[0]]))
    assert arr.shape == (2,) and arr[0] == got and arr[1] == got
