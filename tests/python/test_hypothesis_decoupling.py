"""Hypothesis tests of relicore.decoupling with hostile inputs (the contract of
test_hypothesis_blackbody.py for every element-wise call: the result equals the scalar calls
bit for bit and is finite, or RelicoreError names the function, the argument, its value and the
first failing index; nan_on_error=True gives NaN exactly at the failing elements), histories
computed from hostile universes and options (a history, or RelicoreError naming the parameter
with a documented status; never a crash), and the facts the core documents or the physics
guarantees, on histories of random physical universes:

* the Thomson optical depth never decreases with z, and is 0 at z = 0;
* 0 < x_e <= 1 + 2 f_He (f_He = n_He/n_H = Y_p m_H/((1 - Y_p) m_He), the atom masses of
  relicore.constants), 0 <= x_e^Saha <= 1 + 2 f_He;
* T_m <= T_r (1 + 1e-9): matter is heated by the radiation only (no photo-heating modelled);
* the visibility is >= 0 and the sound horizon decreases with z;
* without reionisation x_e never decreases with z (within 4 ulp of rounding); Saha's x_e never
  decreases with z up to z = 1e4 within its documented 1e-13;
* the summary: tau = 1 at z* (reionisation excluded), T_m/T_r = 0.99 at thermal decoupling,
  r_s(z*), theta* = r_s(z*)/D_M(z*), T0 (1 + z*) and the age at z* as the queries and the
  universe give them, and reionisation changes no recombination epoch.

Expected values are never numbers of our own: arrays are compared with the scalar calls of the
same function, the facts with the definitions; the physics is tested by test_decoupling_vectors.py.
"""

from __future__ import annotations

import functools
import math
import pickle

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from hypothesis.extra import numpy as hnp
from test_hypothesis_blackbody import (
    NOT_NUMBERS,
    SETTINGS,
    VALUES,
    check_elementwise,
    element_arguments,
    mismatched_shapes,
    same_bits,
)

import relicore
from faces_table import DECOUPLING, HISTORY_METHODS, HISTORY_PROPERTIES, native_signatures
from relicore import constants as rc
from relicore import decoupling as dc

# Every function, method and summary property of relicore.decoupling, from the table of regular
# functions (bindings/functions.toml); test_the_tables_cover_the_module checks them against the
# native module and the class.
FUNCTIONS = DECOUPLING
QUERIES = HISTORY_METHODS
SUMMARY = HISTORY_PROPERTIES
# the summary values that reionisation leaves as they are
RECOMBINATION_SUMMARY = [n for n in SUMMARY if n != "reionization_optical_depth"]

# Universes of several kinds (flat, massive neutrinos, open, closed w0-wa, helium-free and
# helium-rich) and their histories, with and without reionisation (each a few milliseconds to build).
UNIVERSES = [
    relicore.Universe(67.7, 0.31, omega_baryon=0.049),
    relicore.Universe(67.4, 0.315, omega_baryon=0.049, neutrino_masses_ev=[0.06, 0.0, 0.0]),
    relicore.Universe(70.0, 0.3, omega_baryon=0.1, omega_curvature=0.1, helium_mass_fraction=0.0),
    relicore.Universe(60.0, 0.4, omega_baryon=0.02, omega_curvature=-0.05, w0=-0.9, wa=0.2,
                      helium_mass_fraction=0.4),
]
HISTORY_INPUTS = [
    (0, {}),
    (1, {"reionization_redshift": 7.7}),
    (2, {"reionization_redshift": 0.0}),
    (3, {"reionization_redshift": 100.0, "highest_redshift": 3000.0}),
]


@functools.cache
def history(i: int) -> dc.ThermalHistory:
    """History i of HISTORY_INPUTS, computed on first use (a failure fails the tests that use it,
    not the collection of this file)."""
    universe, options = HISTORY_INPUTS[i]
    return dc.ThermalHistory(UNIVERSES[universe], **options)

REDSHIFTS = st.one_of(VALUES, st.floats(0.0, 1e4), st.floats(-6.0, 9.0).map(lambda e: 10.0**e))

EPS = np.finfo(np.float64).eps

# few examples where one example computes a history (a few milliseconds)
HISTORY_SETTINGS = settings(SETTINGS, max_examples=40)


@st.composite
def redshift_arrays(draw):
    shape = draw(hnp.array_shapes(min_dims=0, max_dims=3, min_side=0, max_side=4))
    arr = draw(hnp.arrays(np.float64, shape, elements=REDSHIFTS))
    from test_hypothesis_blackbody import layouts

    return draw(layouts(arr)), arr, arr.shape


# --- element-wise calls on hostile arrays ---------------------------------------------------


@pytest.mark.parametrize("name", sorted(QUERIES))
@SETTINGS
@given(data=st.data())
def test_queries_on_hostile_arrays(name, data):
    h = history(data.draw(st.sampled_from(range(len(HISTORY_INPUTS)))))
    arg, arr, shape = data.draw(redshift_arrays())
    check_elementwise(f"ThermalHistory.{name}", QUERIES[name], getattr(h, name), [arg], [arr], shape)


@SETTINGS
@given(data=st.data())
def test_saha_on_hostile_arrays(data):
    u = data.draw(st.sampled_from(UNIVERSES))
    arg, arr, shape = data.draw(redshift_arrays())

    def call(z, **kw):
        return dc.saha_ionized_fraction(u, z, **kw)

    check_elementwise("saha_ionized_fraction", ("z",), call, [arg], [arr], shape)


@pytest.mark.parametrize("name", ["last_scattering_redshift_fit", "drag_redshift_fit"])
@SETTINGS
@given(data=st.data())
def test_fits_on_hostile_arrays(name, data):
    args, arrays, shape = data.draw(element_arguments(2))
    check_elementwise(name, FUNCTIONS[name], getattr(dc, name), args, arrays, shape)


@pytest.mark.parametrize("bad", NOT_NUMBERS, ids=lambda a: a.dtype.name)
def test_arrays_that_are_not_numbers_are_refused_naming_the_argument(bad):
    h = history(0)
    for name in QUERIES:
        with pytest.raises(relicore.RelicoreError) as info:
            getattr(h, name)(bad)
        assert info.value.argument == "z"
    with pytest.raises(relicore.RelicoreError) as info:
        dc.saha_ionized_fraction(UNIVERSES[0], bad)
    assert info.value.argument == "z"
    for name in ("last_scattering_redshift_fit", "drag_redshift_fit"):
        with pytest.raises(relicore.RelicoreError) as info:
            getattr(dc, name)(bad, 0.14)
        assert info.value.argument == "omega_baryon_h2"


@SETTINGS
@given(data=st.data())
def test_fit_arguments_that_do_not_broadcast_raise_value_error(data):
    shapes = data.draw(mismatched_shapes(2))
    args = [np.full(s, 0.1) for s in shapes]
    for name in ("last_scattering_redshift_fit", "drag_redshift_fit"):
        with pytest.raises(ValueError):
            getattr(dc, name)(*args)
        with pytest.raises(ValueError):
            getattr(dc, name)(*args, nan_on_error=True)


# --- histories from hostile universes and options -------------------------------------------


@st.composite
def universe_parameters(draw):
    """Ordinary parameters, with or without baryons and radiation, up to two of them replaced by
    hostile values (a universe that does not build is not a decoupling matter: drawn again)."""
    om = draw(st.floats(0.05, 1.2))
    p = {
        "h0_km_s_mpc": draw(st.floats(30.0, 120.0)),
        "omega_matter": om,
        "omega_baryon": draw(st.one_of(st.just(0.0), st.floats(0.0, 1.0))) * om,
        "omega_curvature": draw(st.one_of(st.just(0.0), st.floats(-0.3, 0.3))),
        "cmb_temperature_k": draw(st.one_of(st.just(0.0), st.just(2.7255), st.floats(1.0, 5.0))),
        "n_eff": draw(st.one_of(st.just(3.044), st.floats(0.0, 6.0))),
        "helium_mass_fraction": draw(st.one_of(st.just(0.245), st.floats(0.0, 0.9))),
        "w0": draw(st.one_of(st.just(-1.0), st.floats(-1.5, -0.5))),
    }
    for name in draw(st.lists(st.sampled_from(sorted(p)), max_size=2)):
        p[name] = draw(VALUES)
    return p


OPTIONS = st.fixed_dictionaries(
    {},
    optional={
        "reionization_redshift": st.one_of(st.none(), VALUES, st.floats(0.0, 100.0), st.floats(90.0, 120.0)),
        "highest_redshift": st.one_of(VALUES, st.floats(2900.0, 1e4), st.floats(9999.0, 10001.0)),
    },
)


def documented_failure(err, p, options):
    """Whether a refused history is refused as documented (ThermalHistory::new)."""
    assert err.function == "ThermalHistory" and err.index is None, str(err)
    z_re = options.get("reionization_redshift")
    top = options.get("highest_redshift", 1e4)
    if err.argument == "universe":
        assert err.status == -14, str(err)
        return True
    if err.argument == "reionization_redshift":
        assert z_re is not None
        want = -2 if not math.isfinite(z_re) else -4 if z_re < 0 else -10
        assert z_re != z_re or not 0.0 <= z_re <= 100.0, str(err)
        assert err.status == want, str(err)
        assert f"reionization_redshift = {float(z_re)!r}: " in str(err)
        return True
    if err.argument == "highest_redshift":
        want = -2 if not math.isfinite(top) else -10 if top < 3000.0 else -16
        assert not 3000.0 <= top <= 1e4, str(err)
        assert err.status == want, str(err)
        assert f"highest_redshift = {float(top)!r}: " in str(err)
        return True
    # no convergence: documented as not seen for physical parameters
    assert err.argument is None and err.status == -11, str(err)
    return True


@HISTORY_SETTINGS
@given(p=universe_parameters(), options=OPTIONS)
def test_histories_from_hostile_universes_and_options(p, options):
    try:
        u = relicore.Universe(**p)
    except relicore.RelicoreError:
        return  # the universe's own tests cover its refusals
    try:
        h = dc.ThermalHistory(u, **options)
    except relicore.RelicoreError as err:
        assert documented_failure(err, p, options)
        if err.argument == "universe":
            assert not (u.omega_baryon > 0 and u.cmb_temperature_k > 0) or "so far from physical" in str(err), str(err)
        return
    assert u.omega_baryon > 0 and u.cmb_temperature_k > 0
    for name in SUMMARY:
        value = getattr(h, name)
        assert type(value) is float and math.isfinite(value), (name, value)
    assert 0.0 < h.last_scattering_redshift < h.highest_redshift
    back = pickle.loads(pickle.dumps(h))
    assert back == h
    z = np.array([0.0, 10.0, 1000.0, h.highest_redshift])
    for name in QUERIES:
        assert same_bits(getattr(back, name)(z, nan_on_error=True), getattr(h, name)(z, nan_on_error=True)), name


# --- facts on histories of random physical universes ----------------------------------------


@st.composite
def physical_histories(draw):
    om = draw(st.floats(0.15, 0.6))
    u = relicore.Universe(
        draw(st.floats(50.0, 90.0)),
        om,
        omega_baryon=draw(st.floats(0.05, 0.4)) * om,
        omega_curvature=draw(st.one_of(st.just(0.0), st.floats(-0.1, 0.1))),
        cmb_temperature_k=draw(st.one_of(st.just(2.7255), st.floats(2.0, 3.5))),
        n_eff=draw(st.one_of(st.just(3.044), st.floats(2.0, 4.5))),
        neutrino_masses_ev=[draw(st.one_of(st.just(0.0), st.floats(0.0, 0.3))), 0.0, 0.0],
        helium_mass_fraction=draw(st.floats(0.0, 0.35)),
    )
    z_re = draw(st.one_of(st.none(), st.floats(0.0, 100.0)))
    top = draw(st.one_of(st.just(1e4), st.floats(3000.0, 1e4)))
    return dc.ThermalHistory(u, reionization_redshift=z_re, highest_redshift=top)


def helium_ratio(u) -> float:
    """f_He = n_He/n_H of the core's documented species (src/decoupling/mod.rs)."""
    y = u.helium_mass_fraction
    return y / (1.0 - y) * rc.HYDROGEN_ATOM_MASS_U / rc.HELIUM_ATOM_MASS_U


@HISTORY_SETTINGS
@given(h=physical_histories(), data=st.data())
def test_documented_facts_of_a_history(h, data):
    u = h.universe
    top = h.highest_redshift
    z = np.unique(np.concatenate([
        np.linspace(0.0, top, 2001),
        np.geomspace(1e-3, top, 2001),
        data.draw(hnp.arrays(np.float64, 50, elements=st.floats(0.0, top))),
    ]))
    z = z[z <= top]
    tau = h.optical_depth(z)
    assert tau[0] == 0.0 and z[0] == 0.0
    assert np.all(np.diff(tau) >= 0.0), "the optical depth decreases somewhere"
    xe = h.ionized_fraction(z)
    bound = 1.0 + 2.0 * helium_ratio(u)
    assert np.all(xe > 0.0) and np.all(xe <= bound), (xe.min(), xe.max(), bound)
    if h.reionization_redshift is None:
        # physically monotone; numerically within rounding: where hydrogen is fully ionised and
        # there is no helium, x_e = exp(ln x_e) = 1 alternates with 1 - 1 ulp (seen by hypothesis)
        assert np.all(xe[1:] >= xe[:-1] * (1.0 - 4 * EPS)), "x_e decreases with z without reionisation"
    tm = h.matter_temperature_k(z)
    tr = u.cmb_temperature_at_k(z)
    assert np.all(tm > 0.0) and np.all(tm <= tr * (1.0 + 1e-9)), float(np.max(tm / tr))
    assert np.all(h.visibility(z) >= 0.0)
    rs = h.sound_horizon_mpc(z[::20])
    assert np.all(rs > 0.0) and np.all(np.diff(rs) < 0.0)


@HISTORY_SETTINGS
@given(h=physical_histories())
def test_the_summary_follows_its_definitions(h):
    u = h.universe
    zs, zd, ztd = h.last_scattering_redshift, h.drag_redshift, h.thermal_decoupling_redshift
    assert 0.0 < zs < h.highest_redshift and 0.0 < zd < h.highest_redshift and 0.0 < ztd < h.highest_redshift
    # tau = 1 at z* with reionisation excluded (the whole reionisation excess lies below z*)
    assert h.optical_depth(zs) - h.reionization_optical_depth == pytest.approx(1.0, abs=1e-12)
    assert h.matter_temperature_k(ztd) / u.cmb_temperature_at_k(ztd) == pytest.approx(0.99, rel=1e-9)
    assert h.sound_horizon_last_scattering_mpc == pytest.approx(h.sound_horizon_mpc(zs), rel=1e-12)
    assert h.sound_horizon_drag_mpc == pytest.approx(h.sound_horizon_mpc(zd), rel=1e-12)
    theta = h.sound_horizon_mpc(zs) / u.transverse_comoving_distance_mpc(zs)
    assert h.angular_scale_last_scattering == pytest.approx(theta, rel=1e-12)
    assert h.temperature_at_last_scattering_k == pytest.approx(u.cmb_temperature_at_k(zs), rel=1e-15)
    assert h.age_at_last_scattering_yr == pytest.approx(u.age_gyr(zs) * 1e9, rel=1e-12)
    # the visibility peak is the maximum of g around last scattering
    g_peak = h.visibility(h.visibility_peak_redshift)
    around = np.linspace(0.8 * zs, min(1.2 * zs, h.highest_redshift), 401)
    assert np.all(h.visibility(around) <= g_peak * (1.0 + 1e-9))
    if h.reionization_redshift is None:
        assert h.reionization_optical_depth == 0.0
    else:
        plain = dc.ThermalHistory(u, highest_redshift=h.highest_redshift)
        assert h.reionization_optical_depth > 0.0
        for name in RECOMBINATION_SUMMARY:
            assert getattr(plain, name) == getattr(h, name), name


@SETTINGS
@given(data=st.data())
def test_saha_facts(data):
    u = data.draw(st.sampled_from(UNIVERSES))
    z = np.sort(data.draw(hnp.arrays(np.float64, 200, elements=st.floats(0.0, 1e8))))
    x = dc.saha_ionized_fraction(u, z)
    bound = 1.0 + 2.0 * helium_ratio(u)
    assert np.all(x >= 0.0) and np.all(x <= bound)
    # non-decreasing with z through the recombination era, within the documented 1e-13 relative
    # (far above it, n_H ~ (1+z)^3 outgrows T^(3/2) and the equilibrium recombines very slowly
    # again: x_e peaks near z ~ 1e5 and is 2e-13 lower at z = 2e7, as hypothesis found)
    low = z <= 1e4
    x, z = x[low], z[low]
    assert np.all(x[1:] >= x[:-1] * (1.0 - 2e-13))


def test_the_tables_cover_the_module():
    """Every function of the native decoupling part is in the tables above (so a new one joins
    these tests, or this test says it has not)."""
    history = native_signatures("decoupling", "history")
    assert {n: a for n, a in history.items() if a} == QUERIES
    assert {n for n, a in history.items() if not a} == set(SUMMARY)
    fits = native_signatures("decoupling", "none")
    assert fits == {k: v for k, v in FUNCTIONS.items() if k != "saha_ionized_fraction"}
    public = {n for n in dir(dc.ThermalHistory) if not n.startswith("_")}
    # the options a history was computed with (properties; their values are tested in
    # tests/python/test_decoupling_api.py)
    options = {"universe", "reionization_redshift", "highest_redshift",
               "helium_reionization_redshift", "helium_reionization_width"}
    assert public == set(QUERIES) | set(SUMMARY) | options
    assert {n for n in dc.__all__ if callable(getattr(dc, n)) and n != "ThermalHistory"} == set(FUNCTIONS)
