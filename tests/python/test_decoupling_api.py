"""The Python calling conventions of relicore.decoupling: the ThermalHistory constructor, its
defaults, attributes and summary properties, equality, hashing, repr, pickling and dask tokens;
scalars and arrays, broadcasting and nan_on_error for saha_ionized_fraction, the two fits and
the five queries of a history; error messages for every kind of bad input (NaN, negative,
above the table, a bad reionisation or highest redshift, a universe without baryons or
radiation); the GIL released by every array loop and by the computation of a history; a
history computed from a thread with a small stack.

Expected values here are never numbers from our own code: array results are compared with the
scalar calls of the same function, attributes with the values passed, error fields with the
inputs and with the rules documented in the core (src/decoupling/); the physics is checked in
test_decoupling_vectors.py (mpmath and an independent scipy integration).
"""

from __future__ import annotations

import copy
import inspect
import math
import pickle
import subprocess
import sys
import textwrap

import numpy as np
import pytest
from test_hypothesis_blackbody import long_enough, runs_alongside

import relicore
from relicore import RelicoreError, ThermalHistory, Universe
from relicore import _native
from faces_table import FITS as FITS_TABLE
from faces_table import HISTORY_METHODS, HISTORY_PROPERTIES
from relicore import decoupling as dc

QUERIES = list(HISTORY_METHODS)
# the queries that need the table (sound_horizon_mpc takes any z >= 0: it needs the background only)
TABLE_QUERIES = [n for n in QUERIES if n != "sound_horizon_mpc"]
SUMMARY = list(HISTORY_PROPERTIES)
# the summary values that reionisation leaves as they are
RECOMBINATION_SUMMARY = [n for n in SUMMARY if n != "reionization_optical_depth"]
FITS = list(FITS_TABLE)

# an invented universe with every term the background knows
PARAMETERS = dict(
    omega_baryon=0.048,
    omega_curvature=0.01,
    cmb_temperature_k=2.7255,
    n_eff=3.044,
    neutrino_masses_ev=(0.06, 0.0, 0.0),
    w0=-0.95,
    wa=0.05,
    helium_mass_fraction=0.246,
)


@pytest.fixture(scope="module")
def u() -> Universe:
    return Universe(68.0, 0.31, **PARAMETERS)


@pytest.fixture(scope="module")
def h(u) -> ThermalHistory:
    return ThermalHistory(u)


@pytest.fixture(scope="module")
def hr(u) -> ThermalHistory:
    return ThermalHistory(u, reionization_redshift=8.0)


def scalar_map(fn, *arrays):
    b = np.broadcast_arrays(*[np.asarray(a, dtype=np.float64) for a in arrays])
    out = np.empty(b[0].shape)
    for idx in np.ndindex(out.shape):
        out[idx] = fn(*(float(x[idx]) for x in b))
    return out


def same_bits(a, b) -> bool:
    a, b = np.asarray(a, dtype=np.float64), np.asarray(b, dtype=np.float64)
    return a.shape == b.shape and bool(np.all(a.view(np.uint64) == b.view(np.uint64)))


def grid(top: float = 1e4) -> np.ndarray:
    return np.concatenate([[0.0, 1e-6], np.geomspace(1e-3, top, 80)])


# --- construction, defaults, attributes ------------------------------------------------------


def test_signature_and_defaults_are_the_cores_and_the_documented_ones():
    params = list(inspect.signature(ThermalHistory).parameters.values())
    assert [p.name for p in params] == ["universe", "reionization_redshift", "highest_redshift",
                                        "helium_reionization_redshift", "helium_reionization_width"]
    assert params[0].kind is inspect.Parameter.POSITIONAL_OR_KEYWORD and params[0].default is params[0].empty
    assert all(p.kind is inspect.Parameter.KEYWORD_ONLY for p in params[1:])
    defaults = {p.name: p.default for p in params[1:]}
    # the core's HistoryOptions::default(), read from it ...
    assert defaults == dict(_native.history_defaults())
    # ... which are the documented ones (src/decoupling/history.rs: no reionisation, z = 1e4,
    # helium's second reionisation at z = 3.5 with width 0.5, Planck Collaboration 2020, A&A 641,
    # A6, Sect. 3.3, from memory)
    assert defaults == {"reionization_redshift": None, "highest_redshift": 1e4,
                        "helium_reionization_redshift": 3.5, "helium_reionization_width": 0.5}


def test_module_exports(h):
    assert relicore.ThermalHistory is dc.ThermalHistory
    assert "decoupling" in relicore.__all__ and "ThermalHistory" in relicore.__all__
    assert set(dc.__all__) >= {"ThermalHistory", "saha_ionized_fraction", *FITS}
    assert type(h).__module__ == "relicore.decoupling"
    # the documented limits (src/decoupling/: 2048 nodes, 1e4 default and highest, 3000 lowest,
    # reionisation at most 100, Saha up to 1e8)
    assert dc.HISTORY_NODES == 2048
    assert (dc.DEFAULT_HIGHEST_REDSHIFT, dc.LOWEST_HIGHEST_REDSHIFT) == (1e4, 3000.0)
    assert dc.HIGHEST_REIONIZATION_REDSHIFT == 100.0 and dc.SAHA_HIGHEST_REDSHIFT == 1e8


def test_attributes_give_the_inputs_back(u, h, hr):
    assert h.universe is u and hr.universe is u
    assert h.reionization_redshift is None and hr.reionization_redshift == 8.0
    assert h.highest_redshift == 1e4 and type(h.highest_redshift) is float
    h2 = ThermalHistory(u, reionization_redshift=np.float32(6.5), highest_redshift=5000)
    assert h2.reionization_redshift == 6.5 and type(h2.reionization_redshift) is float
    assert h2.highest_redshift == 5000.0 and type(h2.highest_redshift) is float


@pytest.mark.parametrize("name", SUMMARY)
def test_summary_properties_are_finite_read_only_floats(h, hr, name):
    for x in (h, hr):
        value = getattr(x, name)
        assert type(value) is float and math.isfinite(value), (name, value)
        with pytest.raises(AttributeError):
            setattr(x, name, value)
    assert inspect.isdatadescriptor(inspect.getattr_static(ThermalHistory, name))


def test_reionization_optical_depth_is_zero_without_reionization(h, hr):
    # documented: 0 without reionisation
    assert h.reionization_optical_depth == 0.0
    assert hr.reionization_optical_depth > 0.0


def test_frozen(h):
    with pytest.raises(AttributeError):
        h.highest_redshift = 5000.0  # type: ignore[misc]
    with pytest.raises(AttributeError):
        h.universe = None  # type: ignore[misc]
    with pytest.raises(AttributeError):
        h.anything = 1  # type: ignore[attr-defined]


def test_the_summary_is_consistent_with_the_queries_and_the_universe(u, h, hr):
    """The definitions (the core's docs, src/decoupling/) between the summary, the queries and the universe, at the
    accuracy each side documents (r_s 1e-12, distances and ages 1e-12, the tau = 1 root)."""
    for x in (h, hr):
        zs, zd = x.last_scattering_redshift, x.drag_redshift
        assert x.sound_horizon_last_scattering_mpc == pytest.approx(x.sound_horizon_mpc(zs), rel=1e-12)
        assert x.sound_horizon_drag_mpc == pytest.approx(x.sound_horizon_mpc(zd), rel=1e-12)
        theta = x.sound_horizon_mpc(zs) / u.transverse_comoving_distance_mpc(zs)
        assert x.angular_scale_last_scattering == pytest.approx(theta, rel=1e-12)
        assert x.temperature_at_last_scattering_k == pytest.approx(u.cmb_temperature_at_k(zs), rel=1e-15)
        assert x.age_at_last_scattering_yr == pytest.approx(u.age_gyr(zs) * 1e9, rel=1e-12)
        # tau = 1 at z*, reionisation excluded: the reionised history adds all of its excess there
        assert x.optical_depth(zs) - x.reionization_optical_depth == pytest.approx(1.0, abs=1e-12)
        # thermal decoupling: T_m/T_r = 0.99
        ztd = x.thermal_decoupling_redshift
        assert x.matter_temperature_k(ztd) / u.cmb_temperature_at_k(ztd) == pytest.approx(0.99, rel=1e-9)
    # reionisation changes neither the recombination epochs nor the matter temperature
    for name in RECOMBINATION_SUMMARY:
        assert getattr(hr, name) == getattr(h, name), name
    z = grid()
    assert same_bits(hr.matter_temperature_k(z), h.matter_temperature_k(z))


# --- equality, hashing, repr, copies ----------------------------------------------------------


def test_equality_hash_and_repr(u, h, hr):
    again = ThermalHistory(Universe(68.0, 0.31, **PARAMETERS))
    assert again == h and hash(again) == hash(h) and again is not h
    assert h != hr and h != ThermalHistory(u, highest_redshift=5000.0) and h != u and h != 1.0
    assert len({h, again, hr}) == 2
    zero = ThermalHistory(u, reionization_redshift=0.0)
    negative_zero = ThermalHistory(u, reionization_redshift=-0.0)
    assert zero == negative_zero and hash(zero) == hash(negative_zero)
    r = repr(hr)
    assert r.startswith("ThermalHistory(Universe(h0_km_s_mpc=68.0, ")
    assert r.endswith(", reionization_redshift=8.0, highest_redshift=10000.0, helium_reionization_redshift=3.5, "
                      "helium_reionization_width=0.5)")
    assert eval(r, {"ThermalHistory": ThermalHistory, "Universe": Universe}) == hr
    assert eval(repr(h), {"ThermalHistory": ThermalHistory, "Universe": Universe}) == h


def test_copy_returns_the_same_immutable_value(h):
    assert copy.copy(h) is h and copy.deepcopy(h) is h
    assert copy.deepcopy([h])[0] == h


# --- pickling and dask ------------------------------------------------------------------------


@pytest.mark.parametrize("protocol", range(pickle.HIGHEST_PROTOCOL + 1))
def test_pickle_round_trip_gives_bit_identical_results(h, hr, protocol):
    for x in (h, hr):
        back = pickle.loads(pickle.dumps(x, protocol=protocol))
        assert type(back) is ThermalHistory and back == x and back is not x
        assert back.universe == x.universe
        assert (back.reionization_redshift, back.highest_redshift) == (x.reionization_redshift, x.highest_redshift)
        z = grid()
        for name in QUERIES:
            assert same_bits(getattr(back, name)(z), getattr(x, name)(z)), name
        for name in SUMMARY:
            assert same_bits(getattr(back, name), getattr(x, name)), name


def test_a_pickle_holds_the_inputs_not_the_table(hr):
    # the history is recomputed where it is unpickled (its table is about 150 KB)
    assert len(pickle.dumps(hr)) < 2000


def test_bound_methods_pickle(hr):
    fn = pickle.loads(pickle.dumps(hr.optical_depth))
    assert same_bits(fn(grid()), hr.optical_depth(grid()))


def test_dask_token_follows_the_universe_and_the_options(u, h, hr):
    tokenize = pytest.importorskip("dask.base").tokenize
    assert tokenize(h) == tokenize(ThermalHistory(Universe(**u.parameters)))
    assert tokenize(h) != tokenize(hr)
    assert tokenize(h) != tokenize(ThermalHistory(u, highest_redshift=5000.0))
    assert tokenize(h) != tokenize(ThermalHistory(u, helium_reionization_width=0.7))
    assert tokenize(h) != tokenize(ThermalHistory(Universe(68.0, 0.31, **{**PARAMETERS, "omega_baryon": 0.05})))
    assert tokenize(hr.optical_depth) != tokenize(hr.visibility)


def test_a_history_survives_a_worker_process(hr):
    # spawn: the child imports relicore afresh and recomputes the history from its inputs
    import multiprocessing

    ctx = multiprocessing.get_context("spawn")
    z = [0.0, 7.5, 1100.0, 9999.0]
    with ctx.Pool(1) as pool:
        got = pool.apply(hr.ionized_fraction, (z,))
    assert same_bits(got, hr.ionized_fraction(z))


# --- scalars and arrays -----------------------------------------------------------------------


@pytest.mark.parametrize("z", [1100.5, 1100, np.float64(1100.5), np.float32(1100.5), np.int64(1100)])
def test_scalar_redshift_gives_a_float(h, u, z):
    for fn in [getattr(h, n) for n in QUERIES] + [lambda z: dc.saha_ionized_fraction(u, z)]:
        got = fn(z)
        assert type(got) is float
        assert got == fn(float(z))


@pytest.mark.parametrize("name", QUERIES)
def test_every_query_loops_over_arrays_like_the_scalar_calls(hr, name):
    fn = getattr(hr, name)
    z = np.geomspace(1e-2, 1e4, 24).reshape(4, 6)
    got = fn(z)
    assert isinstance(got, np.ndarray) and got.dtype == np.float64 and got.shape == (4, 6)
    assert same_bits(got, scalar_map(fn, z))
    assert same_bits(fn(z.tolist()), got)
    assert same_bits(fn(z.T), got.T)  # a Fortran-ordered view
    assert same_bits(fn(z[:, ::2]), got[:, ::2])  # a strided view


def test_saha_loops_over_arrays_like_the_scalar_calls(u):
    z = np.geomspace(1.0, 1e8, 30).reshape(5, 6)
    got = dc.saha_ionized_fraction(u, z)
    assert got.shape == (5, 6) and same_bits(got, scalar_map(lambda x: dc.saha_ionized_fraction(u, x), z))
    assert same_bits(dc.saha_ionized_fraction(u, z.tolist()), got)
    assert same_bits(dc.saha_ionized_fraction(u, z.T), got.T)


@pytest.mark.parametrize("name", FITS)
def test_fits_broadcast_over_both_arguments(name):
    fn = getattr(dc, name)
    wb = np.array([[0.01], [0.0224], [0.05]])
    wm = np.array([0.1, 0.14, 0.3, 0.5])
    got = fn(wb, wm)
    assert got.shape == (3, 4) and same_bits(got, scalar_map(fn, wb, wm))
    assert same_bits(fn(0.0224, wm), got[1])
    assert same_bits(fn(wb, 0.3), got[:, 2:3])
    assert type(fn(0.0224, 0.14)) is float


def test_zero_dimensional_empty_float32_and_integer_inputs(h, u):
    got = h.optical_depth(np.array(1100.0))
    assert isinstance(got, np.ndarray) and got.shape == () and got[()] == h.optical_depth(1100.0)
    for shape in [(0,), (3, 0)]:
        for e in (h.visibility(np.empty(shape)), dc.saha_ionized_fraction(u, np.empty(shape)),
                  dc.drag_redshift_fit(np.empty(shape), 0.14)):
            assert e.shape == shape and e.dtype == np.float64
    z32 = np.array([500.25, 1100.5, 3000.0], dtype=np.float32)
    assert same_bits(h.ionized_fraction(z32), h.ionized_fraction(z32.astype(np.float64)))
    zi = np.array([0, 10, 1100, 10000])
    assert same_bits(h.matter_temperature_k(zi), h.matter_temperature_k(zi.astype(np.float64)))


def test_misaligned_and_read_only_arrays(h, u):
    raw = np.zeros(8 * 4 + 1, dtype=np.uint8)
    z = raw[1:].view(np.float64)
    z[:] = [10.0, 500.0, 1100.0, 5000.0]
    assert not z.flags.aligned
    want = scalar_map(h.visibility, z.copy())
    assert same_bits(h.visibility(z), want)
    z.flags.writeable = False
    assert same_bits(h.visibility(z), want)
    assert same_bits(dc.saha_ionized_fraction(u, z), scalar_map(lambda x: dc.saha_ionized_fraction(u, x), z.copy()))


def test_inputs_are_not_modified(h):
    z = np.linspace(0.0, 3000.0, 7)
    keep = z.copy()
    for name in QUERIES:
        getattr(h, name)(z)
    assert same_bits(z, keep)


def test_nan_on_error_gives_nan_exactly_at_the_failing_elements(h, u):
    z = np.array([[100.0, -1.0, 1100.0], [np.nan, 2e4, 9999.0]])
    for name in TABLE_QUERIES:
        fn = getattr(h, name)
        got = fn(z, nan_on_error=True)
        assert same_bits(np.isnan(got), [[False, True, False], [True, True, False]]), name
        assert got[0, 0] == fn(100.0) and got[0, 2] == fn(1100.0) and got[1, 2] == fn(9999.0)
    # sound_horizon_mpc takes any z >= 0: only the negative and the NaN fail
    got = h.sound_horizon_mpc(z, nan_on_error=True)
    assert same_bits(np.isnan(got), [[False, True, False], [True, False, False]])
    assert got[1, 1] == h.sound_horizon_mpc(2e4)
    got = dc.saha_ionized_fraction(u, np.array([1e3, -1.0, 2e8, np.inf]), nan_on_error=True)
    assert same_bits(np.isnan(got), [False, True, True, True])
    assert math.isnan(dc.saha_ionized_fraction(u, -1.0, nan_on_error=True))
    for name in FITS:
        got = getattr(dc, name)([0.02, 0.0, 0.02], [0.14, 0.14, np.nan], nan_on_error=True)
        assert same_bits(np.isnan(got), [False, True, True]), name


# --- errors -----------------------------------------------------------------------------------


BAD_Z = [
    # (z, status, text in the message) for the table queries of the default history (1e4)
    (-0.5, -4, "z = -0.5: must not be negative"),
    (-1e-300, -4, "z = -1e-300: must not be negative"),
    (math.nan, -2, "z = nan: must be finite"),
    (math.inf, -2, "z = inf: must be finite"),
    (10000.000000000002, -10, "z = 10000.000000000002: above the highest redshift of the history (10000.0)"),
    (2e4, -10, "z = 20000.0: above the highest redshift of the history (10000.0)"),
]


@pytest.mark.parametrize("name", TABLE_QUERIES)
@pytest.mark.parametrize("z, status, text", BAD_Z, ids=[repr(b[0]) for b in BAD_Z])
def test_bad_redshifts_raise_naming_the_argument_and_value(h, name, z, status, text):
    with pytest.raises(RelicoreError) as info:
        getattr(h, name)(z)
    err = info.value
    assert isinstance(err, ValueError)
    assert err.argument == "z" and err.status == status and err.index is None
    assert err.function == f"ThermalHistory.{name}"
    assert str(err) == f"ThermalHistory.{name}: {text}"
    assert math.isnan(getattr(h, name)(z, nan_on_error=True))


def test_the_table_ends_at_its_highest_redshift(u, h):
    # z = highest_redshift itself is inside the table; the next double above is not
    for name in TABLE_QUERIES:
        assert math.isfinite(getattr(h, name)(1e4)), name
    low = ThermalHistory(u, highest_redshift=3000.0)
    for name in TABLE_QUERIES:
        assert math.isfinite(getattr(low, name)(3000.0))
        with pytest.raises(RelicoreError) as info:
            getattr(low, name)(3000.0000000000005)
        assert info.value.status == -10 and "(3000.0)" in str(info.value)
    # the sound horizon needs the background only: any z >= 0
    assert math.isfinite(low.sound_horizon_mpc(1e6))


@pytest.mark.parametrize("z, status", [(-1.0, -4), (math.nan, -2), (-math.inf, -2)])
def test_bad_redshifts_of_the_sound_horizon(h, z, status):
    with pytest.raises(RelicoreError) as info:
        h.sound_horizon_mpc(z)
    assert info.value.argument == "z" and info.value.status == status
    assert info.value.function == "ThermalHistory.sound_horizon_mpc"


@pytest.mark.parametrize("z, status, text", [
    (-1.0, -4, "z = -1.0: must not be negative"),
    (math.nan, -2, "z = nan: must be finite"),
    (2e8, -10, "z = 200000000.0: must not exceed 100000000.0"),
])
def test_bad_saha_redshifts(u, z, status, text):
    with pytest.raises(RelicoreError) as info:
        dc.saha_ionized_fraction(u, z)
    err = info.value
    assert err.argument == "z" and err.status == status and err.function == "saha_ionized_fraction"
    assert str(err).startswith(f"saha_ionized_fraction: {text}"), str(err)
    assert math.isfinite(dc.saha_ionized_fraction(u, 1e8))  # the documented top is inside


@pytest.mark.parametrize("name", FITS)
@pytest.mark.parametrize("args, argument, status", [
    ((0.0, 0.14), "omega_baryon_h2", -3),
    ((-0.02, 0.14), "omega_baryon_h2", -3),
    ((math.nan, 0.14), "omega_baryon_h2", -2),
    ((0.02, 0.0), "omega_matter_h2", -3),
    ((0.02, math.inf), "omega_matter_h2", -2),
])
def test_bad_fit_arguments(name, args, argument, status):
    with pytest.raises(RelicoreError) as info:
        getattr(dc, name)(*args)
    err = info.value
    assert err.argument == argument and err.status == status and err.function == name
    assert f"{argument} = {args[0] if argument == 'omega_baryon_h2' else args[1]!r}" in str(err)


def test_array_errors_name_the_first_offending_index(h, u):
    z = np.array([[500.0, 1000.0, 2000.0], [3000.0, 2e4, -1.0]])
    with pytest.raises(RelicoreError) as info:
        h.ionized_fraction(z)
    err = info.value
    assert err.index == (1, 1) and err.argument == "z" and err.status == -10
    assert "z = 20000.0 at index (1, 1): above the highest redshift" in str(err)
    with pytest.raises(RelicoreError) as info:
        dc.saha_ionized_fraction(u, [1.0, 2.0, -3.0])
    assert info.value.index == (2,) and "z = -3.0 at index 2" in str(info.value)
    with pytest.raises(RelicoreError) as info:
        dc.last_scattering_redshift_fit([[0.02], [0.03]], [0.1, 0.0])
    assert info.value.index == (0, 1) and info.value.argument == "omega_matter_h2"


BAD_OPTIONS = [
    # (options, parameter named, status, text) against the rules of HistoryOptions
    (dict(reionization_redshift=-1.0), "reionization_redshift", -4, "reionization_redshift = -1.0: must not be negative"),
    (dict(reionization_redshift=-1e-300), "reionization_redshift", -4, "reionization_redshift = -1e-300"),
    (dict(reionization_redshift=100.00000000000001), "reionization_redshift", -10,
     "reionization_redshift = 100.00000000000001: must not exceed 100.0"),
    (dict(reionization_redshift=1e3), "reionization_redshift", -10, "reionization_redshift = 1000.0: must not exceed 100.0"),
    (dict(reionization_redshift=math.nan), "reionization_redshift", -2, "reionization_redshift = nan: must be finite"),
    (dict(reionization_redshift=math.inf), "reionization_redshift", -2, "reionization_redshift = inf: must be finite"),
    (dict(highest_redshift=2999.9999999999995), "highest_redshift", -10,
     "highest_redshift = 2999.9999999999995: must be at least 3000.0"),
    (dict(highest_redshift=0.0), "highest_redshift", -10, "highest_redshift = 0.0: must be at least 3000.0"),
    (dict(highest_redshift=-5e3), "highest_redshift", -10, "highest_redshift = -5000.0"),
    (dict(highest_redshift=math.nan), "highest_redshift", -2, "highest_redshift = nan: must be finite"),
    (dict(highest_redshift=math.inf), "highest_redshift", -2, "highest_redshift = inf: must be finite"),
    # beyond what the 2048 nodes cover at their fixed spacing: the capacity error
    (dict(highest_redshift=10001.0), "highest_redshift", -16, "highest_redshift = 10001.0: more than the 2048 nodes"),
    (dict(highest_redshift=2e4), "highest_redshift", -16, "highest_redshift = 20000.0"),
    (dict(highest_redshift=1e300), "highest_redshift", -16, "highest_redshift = 1e+300"),
    (dict(helium_reionization_redshift=-0.5), "helium_reionization_redshift", -4,
     "helium_reionization_redshift = -0.5"),
    (dict(helium_reionization_redshift=20.5), "helium_reionization_redshift", -10,
     "helium_reionization_redshift = 20.5: must not exceed 20.0"),
    (dict(helium_reionization_redshift=math.nan), "helium_reionization_redshift", -2,
     "helium_reionization_redshift = nan: must be finite"),
    (dict(helium_reionization_width=0.05), "helium_reionization_width", -10,
     "helium_reionization_width = 0.05: must lie between 0.1 and 10.0"),
    (dict(helium_reionization_width=11.0, reionization_redshift=7.0), "helium_reionization_width", -10,
     "helium_reionization_width = 11.0: must lie between 0.1 and 10.0"),
    (dict(helium_reionization_width=math.inf), "helium_reionization_width", -2,
     "helium_reionization_width = inf: must be finite"),
]


@pytest.mark.parametrize("options, name, status, text", BAD_OPTIONS, ids=[f"{n}={o[n]!r}" for o, n, *_ in BAD_OPTIONS])
def test_invalid_options_raise_naming_the_parameter_and_value(u, options, name, status, text):
    with pytest.raises(RelicoreError) as info:
        ThermalHistory(u, **options)
    err = info.value
    assert err.argument == name and err.function == "ThermalHistory" and err.status == status and err.index is None
    assert str(err).startswith(f"ThermalHistory: {text}"), str(err)


def test_the_limits_of_the_options_are_inside(u):
    # documented: 0 <= z_re <= 100, 3000 <= highest redshift <= 1e4 for 2048 nodes
    # and 0 <= z_He <= 20, 0.1 <= width <= 10
    for options in (dict(reionization_redshift=0.0), dict(reionization_redshift=100.0),
                    dict(highest_redshift=3000.0), dict(highest_redshift=1e4),
                    dict(reionization_redshift=7.0, helium_reionization_redshift=0.0, helium_reionization_width=0.1),
                    dict(reionization_redshift=7.0, helium_reionization_redshift=20.0, helium_reionization_width=10.0)):
        x = ThermalHistory(u, **options)
        assert math.isfinite(x.last_scattering_redshift), options


@pytest.mark.parametrize("change, parameter, shown", [
    (dict(omega_baryon=0.0), "omega_baryon", "0.0"),  # the Universe default: no baryons
    (dict(omega_baryon=0.048, cmb_temperature_k=0.0), "cmb_temperature_k", "0.0"),
])
def test_a_universe_without_baryons_or_radiation_is_refused(change, parameter, shown):
    bare = Universe(68.0, 0.31, **change)
    with pytest.raises(RelicoreError) as info:
        ThermalHistory(bare)
    err = info.value
    assert err.argument == "universe" and err.status == -14 and err.function == "ThermalHistory"
    assert str(err).startswith(f"ThermalHistory: universe.{parameter} = {shown}: must be positive"), str(err)
    # Saha too, and always (the universe is shared by every element: nan_on_error cannot help)
    for z, nan_on_error in [(1000.0, False), (1000.0, True), ([1000.0, 2000.0], True), (np.full((2, 2), 1e3), False)]:
        with pytest.raises(RelicoreError) as info:
            dc.saha_ionized_fraction(bare, z, nan_on_error=nan_on_error)
        err = info.value
        assert err.argument == "universe" and err.status == -14 and err.index is None
        assert str(err).startswith(f"saha_ionized_fraction: universe.{parameter} = {shown}: "), str(err)


def test_non_numeric_and_non_universe_input_is_refused(u, h):
    with pytest.raises(TypeError):
        ThermalHistory("universe")  # type: ignore[arg-type]
    with pytest.raises(TypeError):
        ThermalHistory(u, 8.0)  # type: ignore[misc]  (the options are keyword-only)
    with pytest.raises(TypeError):
        ThermalHistory(u, reionization_redshift="8")  # type: ignore[arg-type]
    with pytest.raises(TypeError):
        dc.saha_ionized_fraction(h, 1000.0)
    with pytest.raises((TypeError, ValueError)):
        h.optical_depth("one")
    with pytest.raises(RelicoreError) as info:
        h.optical_depth(np.array(["1", "2"]))
    assert info.value.argument == "z"


# --- the GIL and threads ----------------------------------------------------------------------


@pytest.mark.parametrize("name", QUERIES)
def test_query_loops_release_the_gil(hr, name):
    fn = getattr(hr, name)
    n = 2_000 if name == "sound_horizon_mpc" else 100_000

    def make_call(size):
        z = np.linspace(0.0, 9000.0, size)
        return lambda: fn(z, nan_on_error=True)

    assert runs_alongside(long_enough(make_call, n)), f"{name}: the GIL was held"


def test_saha_and_fit_loops_release_the_gil(u):
    def saha(size):
        z = np.geomspace(1.0, 1e8, size)
        return lambda: dc.saha_ionized_fraction(u, z)

    assert runs_alongside(long_enough(saha, 20_000)), "saha_ionized_fraction: the GIL was held"
    for name in FITS:
        fn = getattr(dc, name)

        def fit(size, fn=fn):
            wb = np.linspace(0.01, 0.05, size)
            return lambda: fn(wb, 0.14)

        assert runs_alongside(long_enough(fit, 100_000)), f"{name}: the GIL was held"


def test_the_computation_of_a_history_releases_the_gil(u):
    """Another Python thread runs while histories are computed (each computation is milliseconds
    of native code with the GIL released; several in a row make one call of at least 0.1 s)."""

    def make_call(count):
        return lambda: [ThermalHistory(u, reionization_redshift=8.0) for _ in range(count)]

    assert runs_alongside(long_enough(make_call, 4)), "ThermalHistory(...): the GIL was held"


def test_threads_share_one_history_and_compute_the_same_ones(u, hr):
    from concurrent.futures import ThreadPoolExecutor

    z = np.linspace(0.0, 9000.0, 5_000)
    serial = [getattr(hr, n)(z) for n in QUERIES]
    with ThreadPoolExecutor(max_workers=4) as pool:
        parallel = list(pool.map(lambda n: getattr(hr, n)(z), QUERIES))
        built = list(pool.map(lambda _: ThermalHistory(u, reionization_redshift=8.0), range(4)))
    for a, b in zip(serial, parallel):
        assert same_bits(a, b)
    for x in built:
        assert x == hr and same_bits(x.visibility(z), hr.visibility(z))


def test_a_history_is_computed_from_a_thread_with_a_small_stack(hr):
    """The core returns a history of about 150 KB by value; the face computes it on a thread of
    its own, so a caller thread with a 256 KiB stack (which overflowed when the history was
    computed on it) works. In a child process, so that a crash fails this test only."""
    script = textwrap.dedent(
        """
        import threading, relicore
        threading.stack_size(256 * 1024)
        u = relicore.Universe(**PARAMETERS)
        out = []
        t = threading.Thread(target=lambda: out.append(
            relicore.ThermalHistory(u, reionization_redshift=8.0).visibility_peak_redshift.hex()))
        t.start()
        t.join()
        print(out[0])
        """
    ).replace("PARAMETERS", repr({"h0_km_s_mpc": 68.0, "omega_matter": 0.31, **PARAMETERS}))
    run = subprocess.run([sys.executable, "-c", script], capture_output=True, text=True, timeout=300)
    assert run.returncode == 0, f"exit {run.returncode}: {run.stderr[-2000:]}"
    assert run.stdout.strip() == hr.visibility_peak_redshift.hex()


def test_helium_reionisation_options_move_the_late_ionisation_by_the_model(u):
    """x_e(z) differs from the default history by f_He [S((z_He - z)/w) - S((3.5 - z)/0.5)] with
    S(x) = (1 + tanh x)/2 (the model of src/decoupling/mod.rs), f_He = Y_p m_H/((1 - Y_p) m_He)
    from the atom masses printed there; recombination is untouched; the options are kept,
    compared, hashed and pickled."""
    y = u.helium_mass_fraction
    f_he = y / (1.0 - y) * (1.007825031898 / 4.002603254130)
    base = ThermalHistory(u, reionization_redshift=7.5)
    other = ThermalHistory(u, reionization_redshift=7.5, helium_reionization_redshift=5.0,
                           helium_reionization_width=1.0)
    z = np.array([0.0, 1.0, 2.5, 3.5, 4.0, 5.0, 6.0, 9.0])
    want = f_he * (0.5 * (1.0 + np.tanh((5.0 - z) / 1.0)) - 0.5 * (1.0 + np.tanh((3.5 - z) / 0.5)))
    np.testing.assert_allclose(other.ionized_fraction(z) - base.ionized_fraction(z), want, rtol=0, atol=1e-13)
    assert other.ionized_fraction(1100.0) == base.ionized_fraction(1100.0)
    assert other.reionization_optical_depth > base.reionization_optical_depth
    assert (other.helium_reionization_redshift, other.helium_reionization_width) == (5.0, 1.0)
    assert other != base and hash(other) != hash(base)
    assert ThermalHistory(u, reionization_redshift=7.5, helium_reionization_redshift=3.5) == base
    back = pickle.loads(pickle.dumps(other))
    assert back == other and back.ionized_fraction(4.0) == other.ionized_fraction(4.0)
    assert "helium_reionization_width=1.0" in repr(other)
