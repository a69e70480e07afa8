"""The Python calling conventions of relicore.Universe: construction, defaults, properties,
equality, hashing, repr, pickling, scalars and arrays, broadcasting, nan_on_error, error
messages for every kind of bad input, and the GIL.

Expected values here are never numbers from our own code: array results are compared with the
scalar calls of the same method, properties with the values passed, error fields with the
inputs; the physics is checked in test_cosmology_vectors.py (mpmath) and
test_cosmology_quad.py (an independent scipy implementation).
"""

from __future__ import annotations

import copy
import inspect
import math
import pickle
import sys
import threading
import time

import numpy as np
import pytest

import relicore
from relicore import RelicoreError, Universe
from relicore import _native
from faces_table import UNIVERSE_METHODS

# an invented model with every term: radiation, curvature, w0-wa, massive neutrinos
FULL = dict(
    omega_baryon=0.05,
    omega_curvature=0.02,
    cmb_temperature_k=2.7,
    n_eff=3.1,
    neutrino_masses_ev=(0.05, 0.01, 0.0),
    w0=-0.9,
    wa=0.1,
    helium_mass_fraction=0.25,
)
METHODS = {n: list(a) for n, a in UNIVERSE_METHODS.items()}
ONE_REDSHIFT = sorted(n for n, a in METHODS.items() if a == ["z"])
INVERSIONS = sorted(n for n, a in METHODS.items() if n.startswith("redshift_at_"))


@pytest.fixture(scope="module")
def u() -> Universe:
    return Universe(70.0, 0.3)


@pytest.fixture(scope="module")
def full() -> Universe:
    return Universe(67.0, 0.32, **FULL)


def scalar_map(fn, *arrays):
    b = np.broadcast_arrays(*[np.asarray(a, dtype=np.float64) for a in arrays])
    out = np.empty(b[0].shape)
    for idx in np.ndindex(out.shape):
        out[idx] = fn(*(float(x[idx]) for x in b))
    return out


def same_bits(a, b) -> bool:
    a, b = np.asarray(a, dtype=np.float64), np.asarray(b, dtype=np.float64)
    return a.shape == b.shape and bool(np.all(a.view(np.uint64) == b.view(np.uint64)))


# --- construction, defaults, properties -------------------------------------------------------


def test_signature_keywords_and_defaults_are_the_cores():
    sig = inspect.signature(Universe)
    params = list(sig.parameters.values())
    assert [p.name for p in params[:2]] == ["h0_km_s_mpc", "omega_matter"]
    assert all(p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD and p.default is p.empty for p in params[:2])
    keywords = {p.name: p.default for p in params[2:]}
    assert all(p.kind is inspect.Parameter.KEYWORD_ONLY for p in params[2:])
    assert list(keywords) == [
        "omega_baryon",
        "omega_curvature",
        "cmb_temperature_k",
        "n_eff",
        "neutrino_masses_ev",
        "w0",
        "wa",
        "helium_mass_fraction",
    ]
    # the defaults are those of the core's UniverseParameters::new, read from it
    assert keywords == dict(_native.universe_defaults())
    # and a universe built with only the two required arguments holds exactly them
    u = Universe(70.0, 0.3)
    assert {k: getattr(u, k) for k in keywords} == keywords


def test_the_defaults_are_the_documented_ones():
    # the core's defaults: Omega_b 0, flat, T0 2.7255 K, N_eff 3.044, massless neutrinos, w0 -1, wa 0, Y_p 0.245
    assert dict(_native.universe_defaults()) == dict(
        omega_baryon=0.0,
        omega_curvature=0.0,
        cmb_temperature_k=2.7255,
        n_eff=3.044,
        neutrino_masses_ev=(0.0, 0.0, 0.0),
        w0=-1.0,
        wa=0.0,
        helium_mass_fraction=0.245,
    )


def test_properties_give_the_parameters_back(full):
    assert full.h0_km_s_mpc == 67.0 and full.omega_matter == 0.32
    for k, v in FULL.items():
        assert getattr(full, k) == v, k
    assert isinstance(full.neutrino_masses_ev, tuple)
    assert full.parameters == {"h0_km_s_mpc": 67.0, "omega_matter": 0.32, **FULL}
    assert Universe(**full.parameters) == full


def test_constants_are_floats(full, u):
    for x in (u, full):
        for name in ("hubble_distance_mpc", "hubble_time_gyr", "omega_radiation", "omega_dark_energy",
                     "matter_radiation_equality_redshift"):
            assert type(getattr(x, name)) is float, name


def test_numbers_of_any_kind_are_accepted_as_parameters():
    a = Universe(np.float32(70.0), 1 / 4, neutrino_masses_ev=np.array([0.06, 0, 0]), n_eff=3)
    assert a.h0_km_s_mpc == 70.0 and a.n_eff == 3.0 and a.neutrino_masses_ev == (0.06, 0.0, 0.0)
    assert Universe(70, 0.3, neutrino_masses_ev=[0, 0, 0]) == Universe(70.0, 0.3)


def test_frozen():
    u = Universe(70.0, 0.3)
    with pytest.raises(AttributeError):
        u.h0_km_s_mpc = 71.0  # type: ignore[misc]
    with pytest.raises(AttributeError):
        u.anything = 1  # type: ignore[attr-defined]


def test_equality_hash_and_repr():
    a = Universe(70.0, 0.3, **FULL)
    b = Universe(70.0, 0.3, **FULL)
    assert a == b and hash(a) == hash(b) and a is not b
    assert a != Universe(70.0, 0.3) and a != "Universe" and a != 70.0
    assert len({a, b, Universe(70.0, 0.3)}) == 2
    assert Universe(70.0, 0.3, wa=0.0) == Universe(70.0, 0.3, wa=-0.0)
    assert hash(Universe(70.0, 0.3, wa=0.0)) == hash(Universe(70.0, 0.3, wa=-0.0))
    r = repr(a)
    assert r.startswith("Universe(h0_km_s_mpc=70.0, omega_matter=0.3, omega_baryon=0.05, ")
    assert "neutrino_masses_ev=(0.05, 0.01, 0.0)" in r
    assert eval(r, {"Universe": Universe}) == a
    assert isinstance(a, relicore.cosmology.Universe) and relicore.Universe is relicore.cosmology.Universe


# --- pickling -----------------------------------------------------------------------------


@pytest.mark.parametrize("protocol", range(pickle.HIGHEST_PROTOCOL + 1))
def test_pickle_round_trip_gives_bit_identical_results(full, protocol):
    back = pickle.loads(pickle.dumps(full, protocol=protocol))
    assert type(back) is Universe and back == full and back is not full
    z = np.concatenate([[0.0, 1e-6], np.geomspace(1e-3, 1e5, 60)])
    for name in ONE_REDSHIFT:
        a = getattr(full, name)(z, nan_on_error=True)
        b = getattr(back, name)(z, nan_on_error=True)
        assert same_bits(a, b), name
    for name in ("hubble_distance_mpc", "hubble_time_gyr", "omega_radiation", "omega_dark_energy",
                 "matter_radiation_equality_redshift"):
        assert getattr(back, name) == getattr(full, name)


def test_bound_methods_pickle(full):
    fn = pickle.loads(pickle.dumps(full.luminosity_distance_mpc))
    assert fn(2.0) == full.luminosity_distance_mpc(2.0)


def test_dask_token_follows_the_parameters(full):
    tokenize = pytest.importorskip("dask.base").tokenize
    assert tokenize(full) == tokenize(Universe(**full.parameters))
    assert tokenize(full) != tokenize(Universe(67.0, 0.32))
    assert tokenize(full.age_gyr) != tokenize(full.lookback_time_gyr)


def test_copy_returns_the_same_immutable_value(full):
    assert copy.copy(full) is full and copy.deepcopy(full) is full
    assert copy.deepcopy([full])[0] == full


def test_a_universe_survives_a_worker_process(full):
    # spawn: the child imports relicore afresh and rebuilds the universe from its parameters
    import multiprocessing

    ctx = multiprocessing.get_context("spawn")
    z = [0.5, 1.0, 2.0]
    with ctx.Pool(1) as pool:
        got = pool.apply(full.luminosity_distance_mpc, (z,))
    assert same_bits(got, full.luminosity_distance_mpc(z))


# --- scalars and arrays -------------------------------------------------------------------


@pytest.mark.parametrize("z", [1.5, 1, np.float64(1.5), np.float32(1.5), np.int64(2)])
def test_scalar_redshift_gives_a_float(u, z):
    got = u.luminosity_distance_mpc(z)
    assert type(got) is float
    assert got == u.luminosity_distance_mpc(float(z))


@pytest.mark.parametrize("name", ONE_REDSHIFT)
def test_every_method_loops_over_arrays_like_the_scalar_calls(full, name):
    fn = getattr(full, name)
    z = np.geomspace(1e-3, 3e3, 24).reshape(4, 6)
    got = fn(z)
    assert isinstance(got, np.ndarray) and got.dtype == np.float64 and got.shape == (4, 6)
    assert same_bits(got, scalar_map(fn, z))
    assert same_bits(fn(z.tolist()), got)
    assert same_bits(fn(z.T), got.T)  # a Fortran-ordered view


@pytest.mark.parametrize("name", INVERSIONS)
def test_inversions_loop_over_arrays(full, name):
    fn = getattr(full, name)
    forward = {
        "redshift_at_age_gyr": full.age_gyr,
        "redshift_at_lookback_time_gyr": full.lookback_time_gyr,
        "redshift_at_comoving_distance_mpc": full.comoving_distance_mpc,
        "redshift_at_luminosity_distance_mpc": full.luminosity_distance_mpc,
    }[name]
    targets = forward(np.array([[0.1, 0.5], [1.0, 4.0]]))
    got = fn(targets)
    assert got.shape == (2, 2) and same_bits(got, scalar_map(fn, targets))


def test_two_redshift_method_broadcasts(full):
    z1 = np.array([[0.0], [0.5], [1.0]])
    z2 = np.array([1.0, 2.0, 5.0, 1100.0])
    got = full.angular_diameter_distance_between_mpc(z1, z2)
    assert got.shape == (3, 4)
    assert same_bits(got, scalar_map(full.angular_diameter_distance_between_mpc, z1, z2))
    assert same_bits(full.angular_diameter_distance_between_mpc(0.5, z2), got[1])
    assert type(full.angular_diameter_distance_between_mpc(0.5, 2)) is float


def test_zero_dimensional_empty_float32_and_non_contiguous_inputs(u):
    got = u.age_gyr(np.array(1.0))
    assert isinstance(got, np.ndarray) and got.shape == () and got[()] == u.age_gyr(1.0)
    for shape in [(0,), (3, 0)]:
        e = u.age_gyr(np.empty(shape))
        assert e.shape == shape and e.dtype == np.float64
    z32 = np.array([0.25, 1.5, 3.0], dtype=np.float32)
    assert same_bits(u.age_gyr(z32), u.age_gyr(z32.astype(np.float64)))
    base = np.linspace(0.0, 5.0, 40)
    assert same_bits(u.comoving_distance_mpc(base[::3]), scalar_map(u.comoving_distance_mpc, base[::3]))


def test_misaligned_and_read_only_arrays(u):
    # what unpickled out-of-band buffers (dask, multiprocessing) can look like
    raw = np.zeros(8 * 5 + 1, dtype=np.uint8)
    z = raw[1:].view(np.float64)
    z[:] = [0.1, 0.5, 1.0, 2.0, 3.0]
    assert not z.flags.aligned
    want = scalar_map(u.luminosity_distance_mpc, z.copy())
    assert same_bits(u.luminosity_distance_mpc(z), want)
    z.flags.writeable = False
    assert same_bits(u.luminosity_distance_mpc(z), want)
    one = raw[1:9].view(np.float64)
    assert same_bits(u.luminosity_distance_mpc(one), want[:1])


def test_inputs_are_not_modified(u):
    z = np.linspace(0.0, 3.0, 7)
    keep = z.copy()
    u.luminosity_distance_mpc(z)
    assert same_bits(z, keep)


# --- errors -------------------------------------------------------------------------------


BAD_PARAMETERS = [
    # (keyword arguments changed from Universe(70.0, 0.3), parameter named, value shown)
    (dict(h0_km_s_mpc=0.0), "h0_km_s_mpc", "0.0"),
    (dict(h0_km_s_mpc=-70.0), "h0_km_s_mpc", "-70.0"),
    (dict(h0_km_s_mpc=math.nan), "h0_km_s_mpc", "nan"),
    (dict(h0_km_s_mpc=math.inf), "h0_km_s_mpc", "inf"),
    # finite, but c/H0, 1/H0 or the critical density is not a finite positive double
    (dict(h0_km_s_mpc=5e-324), "h0_km_s_mpc", "5e-324"),
    (dict(h0_km_s_mpc=1e300), "h0_km_s_mpc", "1e+300"),
    (dict(omega_matter=-0.1), "omega_matter", "-0.1"),
    (dict(omega_matter=math.nan), "omega_matter", "nan"),
    (dict(omega_baryon=-0.01), "omega_baryon", "-0.01"),
    (dict(omega_baryon=0.31), "omega_baryon", "0.31"),
    (dict(omega_curvature=math.inf), "omega_curvature", "inf"),
    (dict(cmb_temperature_k=-2.7), "cmb_temperature_k", "-2.7"),
    (dict(cmb_temperature_k=math.nan), "cmb_temperature_k", "nan"),
    (dict(cmb_temperature_k=1e300), "cmb_temperature_k", "1e+300"),  # the radiation density overflows
    (dict(n_eff=-1.0), "n_eff", "-1.0"),
    (dict(neutrino_masses_ev=(0.1, -0.05, 0.0)), "neutrino_masses_ev", "(0.1, -0.05, 0.0)"),
    (dict(neutrino_masses_ev=(math.nan, 0.0, 0.0)), "neutrino_masses_ev", "(nan, 0.0, 0.0)"),
    (dict(cmb_temperature_k=0.0, neutrino_masses_ev=(0.06, 0.0, 0.0)), "neutrino_masses_ev", "(0.06, 0.0, 0.0)"),
    (dict(omega_matter=0.001, neutrino_masses_ev=(1.0, 1.0, 1.0)), "neutrino_masses_ev", "(1.0, 1.0, 1.0)"),
    (dict(w0=math.nan), "w0", "nan"),
    (dict(wa=-math.inf), "wa", "-inf"),
    (dict(helium_mass_fraction=-0.1), "helium_mass_fraction", "-0.1"),
    (dict(helium_mass_fraction=1.0), "helium_mass_fraction", "1.0"),
]


@pytest.mark.parametrize("change, name, shown", BAD_PARAMETERS, ids=[f"{n}={s}" for _, n, s in BAD_PARAMETERS])
def test_invalid_parameters_raise_naming_the_parameter_and_value(change, name, shown):
    kwargs = dict(h0_km_s_mpc=70.0, omega_matter=0.3)
    kwargs.update(change)
    with pytest.raises(RelicoreError) as info:
        Universe(**kwargs)
    err = info.value
    assert isinstance(err, ValueError)
    assert err.argument == name and err.function == "Universe" and err.status == -14 and err.index is None
    assert str(err).startswith(f"Universe: {name} = {shown}: "), str(err)


@pytest.mark.parametrize("w0, wa", [(5.0, 0.0), (2.0, 3.0)])
def test_dark_energy_that_overflows_names_w0_and_says_why(w0, wa):
    # the core's documented refusal (src/cosmology/universe.rs, Universe::new): the dark-energy
    # density overflows on the way back to a = 1e-30 for w0, or the early-time w0 + wa, above
    # about 3.8 to 4.8; (1e-30)^(-3(1 + 5)) = 1e540 overflows a double (common practice)
    with pytest.raises(RelicoreError) as info:
        Universe(70.0, 0.3, w0=w0, wa=wa)
    err = info.value
    assert err.argument == "w0" and err.status == -14
    assert "dark-energy density overflows" in str(err) and "must be finite" not in str(err), str(err)


@pytest.mark.parametrize("masses", [(0.1,), (0.1, 0.0), (0.0, 0.0, 0.0, 0.0), 0.06, ()])
def test_neutrino_masses_must_be_three(masses):
    with pytest.raises(RelicoreError) as info:
        Universe(70.0, 0.3, neutrino_masses_ev=masses)
    assert info.value.argument == "neutrino_masses_ev"
    assert "three masses" in str(info.value)


@pytest.mark.parametrize(
    "kwargs",
    [
        # a closed model with a large cosmological constant bounces: E^2 < 0 on the way back
        dict(h0_km_s_mpc=70.0, omega_matter=0.3, omega_curvature=-3.0),
        # an open-ish model whose dark energy with w0 > 0 drives E^2 negative in the past
        dict(h0_km_s_mpc=70.0, omega_matter=0.0, omega_curvature=2.0, cmb_temperature_k=0.0, w0=0.5),
    ],
)
def test_a_model_with_no_big_bang_raises_saying_so(kwargs):
    with pytest.raises(RelicoreError) as info:
        Universe(**kwargs)
    err = info.value
    assert err.status == -15 and err.argument is None and err.function == "Universe"
    assert "no big bang" in str(err)


BAD_ARGUMENTS = [
    # (method, args, argument named, status, text in the message)
    ("luminosity_distance_mpc", (-0.5,), "z", -4, "z = -0.5: must not be negative"),
    ("luminosity_distance_mpc", (math.nan,), "z", -2, "z = nan: must be finite"),
    ("age_gyr", (math.inf,), "z", -2, "z = inf: must be finite"),
    ("dimensionless_hubble", (-1e-300,), "z", -4, "z = -1e-300"),
    ("distance_modulus", (0.0,), "z", -3, "z = 0.0: must be positive"),
    ("angular_diameter_distance_between_mpc", (2.0, 1.0), "z1", -5, "z1 = 2.0, z2 = 1.0: z2 must not be below z1"),
    ("angular_diameter_distance_between_mpc", (-1.0, 1.0), "z1", -4, "z1 = -1.0: must not be negative"),
    ("angular_diameter_distance_between_mpc", (0.5, math.nan), "z2", -2, "z2 = nan: must be finite"),
    ("redshift_at_age_gyr", (100.0,), "age_gyr", -10, "age_gyr = 100.0: no redshift has this age"),
    ("redshift_at_age_gyr", (math.nan,), "age_gyr", -2, "age_gyr = nan"),
    ("redshift_at_lookback_time_gyr", (100.0,), "lookback_gyr", -10, "lookback_gyr = 100.0"),
    ("redshift_at_comoving_distance_mpc", (1e6,), "distance_mpc", -10, "distance_mpc = 1000000.0"),
    ("redshift_at_luminosity_distance_mpc", (math.inf,), "distance_mpc", -2, "distance_mpc = inf"),
]


@pytest.mark.parametrize("name, args, argument, status, text", BAD_ARGUMENTS,
                         ids=[f"{n}{a}" for n, a, *_ in BAD_ARGUMENTS])
def test_bad_arguments_raise_naming_the_argument_and_value(u, name, args, argument, status, text):
    with pytest.raises(RelicoreError) as info:
        getattr(u, name)(*args)
    err = info.value
    assert err.argument == argument and err.status == status and err.index is None
    assert err.function == f"Universe.{name}"
    assert str(err).startswith(f"Universe.{name}: "), str(err)
    assert text in str(err), str(err)
    assert math.isnan(getattr(u, name)(*args, nan_on_error=True))


def test_array_errors_name_the_first_offending_index(u):
    z = np.array([[0.5, 1.0, 2.0], [3.0, -1.0, np.nan]])
    with pytest.raises(RelicoreError) as info:
        u.comoving_distance_mpc(z)
    err = info.value
    assert err.index == (1, 1) and err.argument == "z" and err.status == -4
    assert "z = -1.0 at index (1, 1): must not be negative" in str(err)
    got = u.comoving_distance_mpc(z, nan_on_error=True)
    assert np.isnan(got[1, 1]) and np.isnan(got[1, 2])
    assert same_bits(got[0], u.comoving_distance_mpc(z[0]))
    with pytest.raises(RelicoreError) as info:
        u.angular_diameter_distance_between_mpc([0.0, 2.0, 1.0], [1.0, 1.0, 1.0])
    assert info.value.index == (1,) and "z1 = 2.0, z2 = 1.0 at index 1" in str(info.value)


def test_diverging_times_raise_with_their_reason():
    milne = Universe(70.0, 0.0, omega_curvature=1.0, cmb_temperature_k=0.0)
    with pytest.raises(RelicoreError) as info:
        milne.conformal_time_mpc(1.0)
    assert info.value.status == -10 and "conformal time diverges" in str(info.value)
    de_sitter = Universe(70.0, 0.0, cmb_temperature_k=0.0)
    with pytest.raises(RelicoreError) as info:
        de_sitter.age_gyr(0.0)
    assert info.value.status == -10 and "age diverges" in str(info.value)


def test_equality_redshift_without_radiation_raises():
    dark = Universe(70.0, 0.3, cmb_temperature_k=0.0)
    with pytest.raises(RelicoreError) as info:
        dark.matter_radiation_equality_redshift
    assert info.value.status == -10 and "without radiation" in str(info.value)


def test_non_numeric_input_is_refused(u):
    with pytest.raises((TypeError, ValueError)):
        u.luminosity_distance_mpc("one")
    with pytest.raises(TypeError):
        Universe("70", 0.3)
    with pytest.raises(TypeError):
        Universe(70.0, 0.3, 0.05)  # the densities after omega_matter are keyword-only


# --- the GIL ------------------------------------------------------------------------------


def test_array_loop_releases_the_gil(u):
    """A second Python thread runs while a large array call is in the native loop (the same
    method as test_api.py: with a huge switch interval only a released GIL lets it count)."""
    z = np.linspace(0.0, 5.0, 3_000_000)
    counter = [0]
    started = threading.Event()
    stop = threading.Event()

    def spin():
        started.set()
        while not stop.is_set():
            counter[0] += 1
            time.sleep(0)

    old = sys.getswitchinterval()
    sys.setswitchinterval(1000.0)
    worker = threading.Thread(target=spin, daemon=True)
    try:
        worker.start()
        started.wait()
        before = counter[0]
        u.luminosity_distance_mpc(z)
        after = counter[0]
    finally:
        stop.set()
        worker.join()
        sys.setswitchinterval(old)
    assert after > before, "no Python bytecode ran in another thread during the array call"


def test_threads_share_one_universe(full):
    from concurrent.futures import ThreadPoolExecutor

    z = np.linspace(0.0, 10.0, 20_000)
    names = ["luminosity_distance_mpc", "age_gyr", "comoving_volume_gpc3", "lookback_time_gyr"]
    serial = [getattr(full, n)(z) for n in names]
    with ThreadPoolExecutor(max_workers=4) as pool:
        parallel = list(pool.map(lambda n: getattr(full, n)(z), names))
    for a, b in zip(serial, parallel):
        assert same_bits(a, b)
