"""The array paths of the Python face: a 1-D float64 array with a scalar temperature (blackbody)
or a 1-D array of redshifts (cosmology distances) runs through the core's array functions
(spectral_radiance_wavelength_array, spectral_radiance_frequency_array,
spectral_radiance_wavenumber_array, comoving_distance_mpc_array,
transverse_comoving_distance_mpc_array, angular_diameter_distance_mpc_array,
luminosity_distance_mpc_array), compiled for AVX-512, AVX2 and the baseline and chosen at run
time. Whatever the level, the result must be the scalar calls' bits, NaN exactly where they fail
(nan_on_error), and the error of the first failing element otherwise.

Expected values are the scalar calls of the same function; the physics is checked by the
reference vectors (mpmath) elsewhere. The levels this CPU lacks are skipped, and said so.
"""

from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st
from test_hypothesis_blackbody import SETTINGS, VALUES, same_bits

import relicore
import relicore.blackbody as bb
from relicore import _native
from faces_table import BLACKBODY as BLACKBODY_ARGS
from faces_table import SIMD

CURRENT, DETECTED = _native.simd_level()
LEVELS = list(range(DETECTED + 1))

# a range of ordinary values (log10) of the array argument of each SIMD array form
RANGES = {"wavelength_m": (-8.0, 0.0), "frequency_hz": (8.0, 16.0), "wavenumber_per_m": (0.0, 8.0)}
# the Python function, its core array function, a range of ordinary values (log10)
BLACKBODY = [
    (getattr(bb, name), core, RANGES[BLACKBODY_ARGS[name][0]]) for name, core, receiver in SIMD if receiver == "none"
]
DISTANCES = [(name, core) for name, core, receiver in SIMD if receiver == "universe"]
UNIVERSES = [
    relicore.Universe(70.0, 0.3, n_eff=3.044),
    relicore.Universe(67.0, 0.3, omega_curvature=0.1),
    relicore.Universe(67.0, 0.3, omega_curvature=-0.1, w0=-0.9, wa=0.2),
]


def arrays(lo: float, hi: float):
    """1-D arrays of up to 400 elements (several 64-element blocks), mostly ordinary values
    with hostile ones sprinkled in."""
    element = st.one_of(
        st.floats(lo, hi).map(lambda e: 10.0**e),
        st.floats(lo, hi).map(lambda e: 10.0**e),
        st.floats(lo, hi).map(lambda e: 10.0**e),
        VALUES,
    )
    return st.lists(element, min_size=1, max_size=400).map(lambda v: np.array(v, dtype=np.float64))


def scalar_calls(call, x):
    """Per element: the scalar call's value, or None where it fails."""
    out = []
    for xi in x:
        try:
            out.append(call(float(xi)))
        except relicore.RelicoreError:
            out.append(None)
    return out


def check(call, x, level):
    """The array call at one SIMD level against the scalar calls."""
    previous = _native.cap_simd_level(level)
    try:
        assert _native.simd_level()[0] == level
        want = scalar_calls(call, x)
        got = call(x, nan_on_error=True)
        for i, (w, g) in enumerate(zip(want, got)):
            if w is None:
                assert np.isnan(g), f"level {level}, element {i}: scalar fails, array gave {g!r}"
            else:
                assert same_bits(w, g), f"level {level}, element {i}: array {g!r}, scalar {w!r}"
        first = next((i for i, w in enumerate(want) if w is None), None)
        if first is None:
            assert same_bits(call(x), got)
        else:
            with pytest.raises(relicore.RelicoreError) as info:
                call(x)
            assert info.value.index == (first,), (info.value.index, first)
    finally:
        _native.cap_simd_level(previous)


@pytest.mark.parametrize("level", LEVELS)
@pytest.mark.parametrize("fn,core_name,span", BLACKBODY, ids=[b[1] for b in BLACKBODY])
@given(data=st.data())
@SETTINGS
def test_blackbody_array_functions_give_the_scalar_bits(level, fn, core_name, span, data):
    x = data.draw(arrays(*span))
    t = data.draw(st.one_of(st.floats(0.0, 6.0).map(lambda e: 10.0**e), VALUES))
    check(lambda v, **kw: fn(v, t, **kw), x, level)


@pytest.mark.parametrize("level", LEVELS)
@pytest.mark.parametrize("method,core_name", DISTANCES, ids=[d[1] for d in DISTANCES])
@given(data=st.data())
@SETTINGS
def test_distance_array_functions_give_the_scalar_bits(level, method, core_name, data):
    z = data.draw(arrays(-6.0, 4.5))
    for u in UNIVERSES:
        check(getattr(u, method), z, level)


def test_levels_this_cpu_runs():
    """Which compilations the tests above covered on this machine (the others need another CPU)."""
    assert 0 <= CURRENT <= DETECTED <= 2
    print(f"SIMD levels tested here: {LEVELS} (2 = AVX-512, 1 = AVX2, 0 = baseline)")


@pytest.mark.parametrize("level", LEVELS)
def test_large_arrays_split_over_threads_give_the_scalar_bits(level):
    """Arrays of 2**17 elements are split over cores; every part runs the array function."""
    rng = np.random.default_rng(20261202)
    z = rng.uniform(0.0, 20.0, 1 << 17)
    z[[3, 70000, 131000]] = [np.nan, -1.0, 2e4]
    u = UNIVERSES[0]
    previous = _native.cap_simd_level(level)
    try:
        got = u.luminosity_distance_mpc(z, nan_on_error=True)
        sample = np.r_[0:200, 65530:65600, 69990:70010, 131000:131072]
        for i in sample:
            try:
                want = u.luminosity_distance_mpc(float(z[i]))
                assert np.float64(want).view(np.uint64) == got[i].view(np.uint64), i
            except relicore.RelicoreError:
                assert np.isnan(got[i]), i
        with pytest.raises(relicore.RelicoreError) as info:
            u.luminosity_distance_mpc(z)
        assert info.value.index == (3,)
        lam = rng.uniform(1e-7, 1e-3, 1 << 17)
        b = bb.spectral_radiance_wavelength(lam, 1500.0)
        for i in sample:
            assert np.float64(bb.spectral_radiance_wavelength(float(lam[i]), 1500.0)).view(np.uint64) == b[i].view(np.uint64)
    finally:
        _native.cap_simd_level(previous)
