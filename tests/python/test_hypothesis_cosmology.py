"""Hypothesis tests of relicore.Universe with hostile inputs: construction from
parameter sets with NaN, +-inf, +-0, subnormal, huge and arbitrary values, and every method on
hostile arrays of any broadcastable shapes and layouts (see test_hypothesis_blackbody.py for the
contract every element-wise call keeps: the result equals the scalar calls bit for bit and is
finite, or RelicoreError names the method, the argument, its value and the first failing
index; nan_on_error=True gives NaN exactly at the failing elements). Also: integer and narrow
float dtypes, dtypes that are not numbers, shapes that do not broadcast, and the GIL released by
every method's array loop.

Expected values are never numbers of our own: arrays are compared with the scalar calls of the
same method; the physics is tested in tests/proptest_cosmology.rs and the cosmology vectors.
"""

from __future__ import annotations

import inspect
import math
import pickle
import warnings

import numpy as np
import pytest
from hypothesis import given
from hypothesis import strategies as st
from hypothesis.extra import numpy as hnp
from test_hypothesis_blackbody import (
    NOT_NUMBERS,
    NUMERIC_DTYPES,
    SETTINGS,
    VALUES,
    check_elementwise,
    long_enough,
    mismatched_shapes,
    runs_alongside,
    same_bits,
)

import relicore
from relicore import _native
from faces_table import UNIVERSE_METHODS, UNIVERSE_PROPERTIES, native_signatures

# Every method of a universe and its arguments, and the constants of a universe (read-only
# properties), from the table of regular functions (bindings/functions.toml);
# test_the_tables_cover_the_class checks them against the native module and the class.
METHODS = UNIVERSE_METHODS
CONSTANTS = UNIVERSE_PROPERTIES

PARAMETERS = ("h0_km_s_mpc", "omega_matter", "omega_baryon", "omega_curvature", "cmb_temperature_k",
              "n_eff", "neutrino_masses_ev", "w0", "wa", "helium_mass_fraction")

# A few universes of every kind the core handles: flat with radiation, massive neutrinos, open,
# closed, w0-wa, Einstein-de Sitter without radiation (built once: about a millisecond each).
UNIVERSES = [
    relicore.Universe(67.7, 0.31),
    relicore.Universe(67.4, 0.315, neutrino_masses_ev=[0.06, 0.0, 0.0], omega_baryon=0.049),
    relicore.Universe(70.0, 0.3, omega_curvature=0.1),
    relicore.Universe(70.0, 0.3, omega_curvature=-0.05, w0=-0.9, wa=0.2),
    relicore.Universe(50.0, 1.0, cmb_temperature_k=0.0),
]

# redshift-like arguments: hostile, or ordinary values for each method (targets of the
# inversions included)
ARGUMENTS = st.one_of(VALUES, st.floats(0.0, 20.0), st.floats(-6.0, 4.0).map(lambda e: 10.0**e))


@st.composite
def method_arguments(draw, nargs):
    shapes = draw(hnp.mutually_broadcastable_shapes(num_shapes=nargs, min_dims=0, max_dims=2, min_side=0, max_side=4))
    arrays = [draw(hnp.arrays(np.float64, s, elements=ARGUMENTS)) for s in shapes.input_shapes]
    from test_hypothesis_blackbody import layouts

    args = [draw(layouts(a)) for a in arrays]
    return args, arrays, shapes.result_shape


@pytest.mark.parametrize("name", sorted(METHODS))
@SETTINGS
@given(data=st.data())
def test_methods_on_hostile_arrays(name, data):
    u = data.draw(st.sampled_from(UNIVERSES))
    argnames = METHODS[name]
    args, arrays, shape = data.draw(method_arguments(len(argnames)))
    check_elementwise(f"Universe.{name}", argnames, getattr(u, name), args, arrays, shape)


@pytest.mark.parametrize("name", sorted(METHODS))
@SETTINGS
@given(data=st.data())
def test_integer_and_narrow_float_dtypes_are_converted_to_float64(name, data):
    u = data.draw(st.sampled_from(UNIVERSES))
    dtype = data.draw(NUMERIC_DTYPES)
    arr = data.draw(hnp.arrays(dtype, data.draw(hnp.array_shapes(min_dims=1, max_dims=2, min_side=0, max_side=4))))
    rest = [1.0] * (len(METHODS[name]) - 1)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", RuntimeWarning)
        as64 = arr.astype(np.float64)
    call = getattr(u, name)
    try:
        want = call(as64, *rest)
    except relicore.RelicoreError as err:
        with pytest.raises(relicore.RelicoreError) as info:
            call(arr, *rest)
        assert (info.value.argument, info.value.index, info.value.status) == (err.argument, err.index, err.status)
    else:
        assert same_bits(call(arr, *rest), want)


@pytest.mark.parametrize("bad", NOT_NUMBERS, ids=lambda a: a.dtype.name)
def test_arrays_that_are_not_numbers_are_refused_naming_the_argument(bad):
    u = UNIVERSES[0]
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        for name, argnames in METHODS.items():
            with pytest.raises(relicore.RelicoreError) as info:
                getattr(u, name)(bad, *[1.0] * (len(argnames) - 1))
            assert info.value.argument == argnames[0]


@SETTINGS
@given(data=st.data())
def test_redshifts_that_do_not_broadcast_raise_value_error(data):
    shapes = data.draw(mismatched_shapes(2))
    args = [np.full(s, 1.0) for s in shapes]
    with pytest.raises(ValueError):
        UNIVERSES[0].angular_diameter_distance_between_mpc(*args)
    with pytest.raises(ValueError):
        UNIVERSES[0].angular_diameter_distance_between_mpc(*args, nan_on_error=True)


def test_redshifts_that_do_not_broadcast_name_the_argument():
    with pytest.raises(relicore.RelicoreError) as info:
        UNIVERSES[0].angular_diameter_distance_between_mpc(np.ones(3), np.ones(4))
    assert info.value.argument in ("z1", "z2")


# --- construction ----------------------------------------------------------------------------


@st.composite
def parameter_sets(draw):
    """Ordinary parameters (flat or curved, with or without radiation and massive neutrinos,
    w0-wa) with up to three of them replaced by hostile values."""
    p = {
        "h0_km_s_mpc": draw(st.floats(20.0, 150.0)),
        "omega_matter": draw(st.floats(0.0, 1.5)),
        "omega_curvature": draw(st.one_of(st.just(0.0), st.floats(-0.5, 0.5))),
        "cmb_temperature_k": draw(st.sampled_from([0.0, 2.7255])),
        "n_eff": draw(st.one_of(st.just(3.044), st.floats(0.0, 6.0))),
        "neutrino_masses_ev": [draw(st.one_of(st.just(0.0), st.floats(0.0, 1.0))) for _ in range(3)],
        "w0": draw(st.one_of(st.just(-1.0), st.floats(-2.0, 0.0))),
        "wa": draw(st.one_of(st.just(0.0), st.floats(-1.0, 1.0))),
        "helium_mass_fraction": draw(st.floats(0.0, 0.9)),
    }
    p["omega_baryon"] = draw(st.floats(0.0, 1.0)) * p["omega_matter"]
    if p["cmb_temperature_k"] == 0.0:
        p["neutrino_masses_ev"] = [0.0, 0.0, 0.0]
    for name in draw(st.lists(st.sampled_from(PARAMETERS), max_size=3)):
        if name == "neutrino_masses_ev":
            p[name] = draw(st.lists(VALUES, min_size=3, max_size=3))
        else:
            p[name] = draw(VALUES)
    return p


@SETTINGS
@given(p=parameter_sets())
def test_construction_from_hostile_parameters(p):
    """A universe, or RelicoreError naming the invalid parameter and its value (status -14), or
    saying there is no big bang (-15) or that the core's quadrature could not build the
    distance table (-11, seen only for parameters far outside physical ones); a universe built
    has finite constants, pickles and compares equal to its copy."""
    h0, om = p["h0_km_s_mpc"], p["omega_matter"]
    rest = {k: v for k, v in p.items() if k not in ("h0_km_s_mpc", "omega_matter")}
    try:
        u = relicore.Universe(h0, om, **rest)
    except relicore.RelicoreError as err:
        assert err.function == "Universe" and err.index is None
        assert err.status in (-14, -15, -11), str(err)
        if err.status == -14:
            assert err.argument in PARAMETERS, str(err)
            assert str(err).startswith(f"Universe: {err.argument} = "), str(err)
            if err.argument != "neutrino_masses_ev":
                assert f"{err.argument} = {float(p[err.argument])!r}" in str(err), str(err)
        else:
            assert err.argument is None, str(err)
        return
    for name in CONSTANTS:
        try:
            value = getattr(u, name)
        except relicore.RelicoreError as err:
            assert name == "matter_radiation_equality_redshift" and err.status == -10, str(err)
            continue
        assert type(value) is float and math.isfinite(value), (name, value)
    copy = pickle.loads(pickle.dumps(u))
    assert copy == u and hash(copy) == hash(u)
    z = np.array([0.0, 0.5, 2.0])
    assert same_bits(copy.luminosity_distance_mpc(z, nan_on_error=True), u.luminosity_distance_mpc(z, nan_on_error=True))


def test_the_tables_cover_the_class():
    """Every method of the native module is in METHODS with its arguments, and every parameter
    of the constructor in PARAMETERS (so a new method joins these tests or this test says so)."""
    # the Universe methods of the growth topic (BAO distances) included
    native = {**native_signatures("cosmology", "universe"), **native_signatures("growth", "universe")}
    assert {n: a for n, a in native.items() if a} == METHODS
    assert {n for n, a in native.items() if not a} == set(CONSTANTS)
    assert set(dict(_native.universe_defaults())) | {"h0_km_s_mpc", "omega_matter"} == set(PARAMETERS)
    for name in CONSTANTS:
        assert inspect.isdatadescriptor(inspect.getattr_static(relicore.Universe, name)), name


# --- the GIL ---------------------------------------------------------------------------------

# arguments whose array loop costs microseconds per element (quadrature or root finding)
SLOW = {"lookback_time_gyr", "age_gyr", "conformal_time_mpc", "redshift_at_age_gyr",
        "redshift_at_lookback_time_gyr", "redshift_at_comoving_distance_mpc",
        "redshift_at_luminosity_distance_mpc"}
TARGET = {"redshift_at_age_gyr": 5.0, "redshift_at_lookback_time_gyr": 5.0,
          "redshift_at_comoving_distance_mpc": 3000.0, "redshift_at_luminosity_distance_mpc": 3000.0}


@pytest.mark.parametrize("name", sorted(METHODS))
def test_every_array_loop_releases_the_gil(name):
    u = UNIVERSES[1]
    n = 2_000 if name in SLOW else 400_000
    rest = [3.0] * (len(METHODS[name]) - 1)
    fn = getattr(u, name)

    def make_call(size):
        x = np.linspace(0.5, 1.5, size) * TARGET.get(name, 1.0)
        return lambda: fn(x, *rest, nan_on_error=True)

    assert runs_alongside(long_enough(make_call, n)), f"{name}: the GIL was held"
