"""The shared decoupling reference vectors (tests/data/decoupling.txt, written by
tests/reference/decoupling_vectors.py: mpmath for Saha, the sound horizon and the fits, an
independent scipy solve_ivp integration of the same equations for the history, published and
common-practice values; format in tests/data/FORMAT.md) through relicore.decoupling: every value
line within its own tolerance, every status line raising RelicoreError with that status (and
giving NaN with nan_on_error=True).

Each vector of a function of arguments is checked twice: as a scalar call and as one element of
a single array call over all the vectors of its target and function (the two must agree to the
bit). test_worst_deviations prints, per function, the largest deviation from the reference
relative to the expected value and to the line's tolerance (run pytest with -s to see it).
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from decoupling_refdata import (
    DECOUPLING_FILE,
    NARGS,
    SUMMARY,
    DecouplingVector,
    call,
    data,
    function_of,
    history,
    report,
    universe,
    within,
)
from refdata import allowed_error

import relicore

EXISTS = DECOUPLING_FILE.exists()
VECTORS = data().vectors if EXISTS else []


def test_reference_file_exists_and_covers_every_function():
    # source: tests/data/decoupling.txt (tests/reference/decoupling_vectors.py); without it
    # nothing below runs
    assert EXISTS, f"missing {DECOUPLING_FILE}"
    values = {v.name for v in VECTORS if not v.is_status}
    assert values == set(NARGS), f"functions without value vectors: {sorted(set(NARGS) - values)}"
    assert any(v.is_status for v in VECTORS)
    assert len(data().histories) >= 2 and any(z is not None for _, z in data().histories.values())


def test_every_universe_and_history_of_the_file_builds():
    for name, kwargs in data().universes.items():
        u = universe(name)
        assert u.parameters == {**kwargs, "neutrino_masses_ev": tuple(kwargs["neutrino_masses_ev"])}
    for name, (universe_name, z_re) in data().histories.items():
        h = history(name)
        assert h.universe == universe(universe_name) and h.reionization_redshift == z_re
        assert h.highest_redshift == 1e4


def _by_name() -> dict[str, list[DecouplingVector]]:
    out: dict[str, list[DecouplingVector]] = {}
    for v in VECTORS:
        out.setdefault(v.name, []).append(v)
    return out


BY_NAME = _by_name()


def _check(v: DecouplingVector) -> list[str]:
    problems = []
    if v.is_status:
        try:
            got = call(v)
        except relicore.RelicoreError as err:
            if err.status != v.status:
                problems.append(f"{v.label()}: status {err.status}, want {v.status} ({err})")
        else:
            problems.append(f"{v.label()}: want status {v.status}, got {got!r}")
        if v.args:  # a function: with nan_on_error the failure is a NaN
            got = call(v, nan_on_error=True)
            if not (isinstance(got, float) and math.isnan(got)):
                problems.append(f"{v.label()}: nan_on_error=True gave {got!r}")
        return problems
    got = call(v)
    if not isinstance(got, float):
        problems.append(f"{v.label()}: returned {type(got).__name__}, not float")
    elif not within(v, got):
        problems.append(report(v, got))
    return problems


@pytest.mark.parametrize("name", sorted(BY_NAME))
def test_vectors(name):
    # source: each line's source field (mpmath, scipy-solve-ivp, planck2020-memory,
    # common-practice, fit-published-accuracy, spec); tolerance: each line's own
    vectors = BY_NAME[name]
    problems = [p for v in vectors for p in _check(v)]
    assert not problems, f"{len(problems)} of {len(vectors)} vectors of {name} failed:\n" + "\n".join(problems)


def _groups() -> list[tuple[str, str]]:
    return sorted({(v.target, v.name) for v in VECTORS if v.args})


@pytest.mark.parametrize("target, name", _groups(), ids=[f"{t}-{n}" for t, n in _groups()])
def test_vectors_as_one_array_call(target, name):
    # source: as test_vectors; the array path gives the scalar path's bits, and with nan_on_error
    # the status vectors become NaN while the others keep their exact values
    vectors = [v for v in VECTORS if v.target == target and v.name == name]
    fn = function_of(vectors[0])
    columns = [np.array(c) for c in zip(*(v.args for v in vectors))]
    got = fn(*columns, nan_on_error=True)
    assert isinstance(got, np.ndarray) and got.shape == (len(vectors),)
    problems = []
    for v, g in zip(vectors, got):
        if v.is_status:
            if not math.isnan(g):
                problems.append(f"{v.where()}: nan_on_error gave {g!r}, want nan")
        else:
            alone = fn(*v.args)
            if g != alone:
                problems.append(f"{v.label()}: array element {g!r}, scalar call {alone!r}")
    assert not problems, "\n".join(problems)
    values = [v for v in vectors if not v.is_status]
    if values and len(values) < len(vectors):
        only = [np.array(c) for c in zip(*(v.args for v in values))]
        assert np.array_equal(fn(*only), got[[not v.is_status for v in vectors]])
        # without nan_on_error the first status vector stops the call and is named
        first = next(i for i, v in enumerate(vectors) if v.is_status)
        with pytest.raises(relicore.RelicoreError) as info:
            fn(*columns)
        assert info.value.status == vectors[first].status
        assert info.value.index == (first,)


def test_summary_lines_are_properties():
    for v in VECTORS:
        if v.name in SUMMARY:
            assert not v.args and not v.is_status, v.label()


def test_worst_deviations():
    """Prints the worst deviation per function (value lines), as a relative error and as a
    fraction of the line's own tolerance; fails only where test_vectors fails."""
    worst: dict[str, tuple[float, float, str]] = {}
    for v in VECTORS:
        if v.is_status:
            continue
        got = float(call(v))
        diff = abs(got - v.expected)
        rel = diff / abs(v.expected) if v.expected else diff
        allowed = allowed_error(v)  # type: ignore[arg-type]
        # `rel` with expected 0 means exactly 0
        frac = diff / allowed if allowed > 0 else (0.0 if diff == 0 else math.inf)
        key = f"{v.name} [{v.source}]"
        if key not in worst or frac > worst[key][1]:
            worst[key] = (rel, frac, v.label())
    print("\nworst deviation per function and source (relative; fraction of the line's tolerance):")
    for key in sorted(worst):
        rel, frac, where = worst[key]
        print(f"  {key:58s} {rel:9.2e} {frac:7.3f}  {where}")
    assert all(frac <= 1.0 for _, frac, _ in worst.values())
