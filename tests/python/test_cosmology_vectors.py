"""The shared cosmology reference vectors (tests/data/cosmology.txt, written by
tests/reference/cosmology_vectors.py with mpmath; format in tests/data/FORMAT.md) through
relicore.Universe: every value line within its own tolerance, every status line raising
RelicoreError with that status (and giving NaN with nan_on_error=True).

Each vector is checked twice: as a scalar call and as one element of a single array call over
all the vectors of its universe and method (the two must agree to the bit).
"""

from __future__ import annotations

import math

import numpy as np
import pytest

import relicore
from faces_table import UNIVERSE_METHODS
from cosmo_refdata import (
    COSMOLOGY_FILE,
    PROPERTIES,
    CosmologyVector,
    call,
    read_cosmology_file,
    report,
    universe,
    within,
)

UNIVERSES, VECTORS = read_cosmology_file() if COSMOLOGY_FILE.exists() else ({}, [])
METHODS = set(UNIVERSE_METHODS)


def test_reference_file_exists_and_is_not_empty():
    # source: tests/data/cosmology.txt (mpmath reference script); without it nothing below runs
    assert COSMOLOGY_FILE.exists(), f"missing {COSMOLOGY_FILE}"
    assert len(UNIVERSES) >= 5
    assert len([v for v in VECTORS if not v.is_status]) > 100
    assert any(v.is_status for v in VECTORS)


def test_every_name_in_the_file_is_known():
    unknown = sorted({v.name for v in VECTORS if v.name not in METHODS and v.name not in PROPERTIES})
    assert not unknown, f"vector names without a Python face: {unknown}"


def test_every_universe_of_the_file_builds():
    for name, kwargs in UNIVERSES.items():
        u = universe(name)
        assert u.parameters == {**kwargs, "neutrino_masses_ev": tuple(kwargs["neutrino_masses_ev"])}


def _by_name() -> dict[str, list[CosmologyVector]]:
    out: dict[str, list[CosmologyVector]] = {}
    for v in VECTORS:
        out.setdefault(v.name, []).append(v)
    return out


BY_NAME = _by_name()


def _check(v: CosmologyVector) -> list[str]:
    problems = []
    if v.is_status:
        try:
            got = call(v)
        except relicore.RelicoreError as err:
            if err.status != v.status:
                problems.append(
                    f"{v.where()} {v.universe}.{v.name}{v.args}: status {err.status}, want {v.status} ({err})"
                )
        else:
            problems.append(f"{v.where()} {v.universe}.{v.name}{v.args}: want status {v.status}, got {got!r}")
        if v.args:  # a method: with nan_on_error the failure is a NaN
            got = call(v, nan_on_error=True)
            if not (isinstance(got, float) and math.isnan(got)):
                problems.append(f"{v.where()} {v.universe}.{v.name}{v.args}: nan_on_error=True gave {got!r}")
        return problems
    got = call(v)
    if not isinstance(got, float):
        problems.append(f"{v.where()} {v.universe}.{v.name}: returned {type(got).__name__}, not float")
    elif not within(v, got):
        problems.append(report(v, got))
    return problems


@pytest.mark.parametrize("name", sorted(BY_NAME))
def test_vectors(name):
    # source: each line's source field (mpmath, closed forms with their reference,
    # planck2020-memory, common-practice, spec); tolerance: each line's own
    vectors = BY_NAME[name]
    problems = [p for v in vectors for p in _check(v)]
    assert not problems, f"{len(problems)} of {len(vectors)} vectors of {name} failed:\n" + "\n".join(problems)


def _groups() -> list[tuple[str, str]]:
    return sorted({(v.universe, v.name) for v in VECTORS if v.args})


@pytest.mark.parametrize("universe_name, name", _groups(), ids=[f"{u}-{n}" for u, n in _groups()])
def test_vectors_as_one_array_call(universe_name, name):
    # source: as test_vectors; the array path gives the scalar path's bits, and with nan_on_error
    # the status vectors become NaN while the others keep their exact values
    vectors = [v for v in VECTORS if v.universe == universe_name and v.name == name]
    u = universe(universe_name)
    method = getattr(u, name)
    columns = [np.array(c) for c in zip(*(v.args for v in vectors))]
    got = method(*columns, nan_on_error=True)
    assert isinstance(got, np.ndarray) and got.shape == (len(vectors),)
    problems = []
    for v, g in zip(vectors, got):
        if v.is_status:
            if not math.isnan(g):
                problems.append(f"{v.where()}: nan_on_error gave {g!r}, want nan")
        else:
            alone = method(*v.args)
            if g != alone:
                problems.append(f"{v.where()} {name}{v.args}: array element {g!r}, scalar call {alone!r}")
    assert not problems, "\n".join(problems)
    values = [v for v in vectors if not v.is_status]
    if values and len(values) < len(vectors):
        only = [np.array(c) for c in zip(*(v.args for v in values))]
        assert np.array_equal(method(*only), got[[not v.is_status for v in vectors]])
        # without nan_on_error the first status vector stops the call and is named
        first = next(i for i, v in enumerate(vectors) if v.is_status)
        with pytest.raises(relicore.RelicoreError) as info:
            method(*columns)
        assert info.value.status == vectors[first].status
        assert info.value.index == (first,)
