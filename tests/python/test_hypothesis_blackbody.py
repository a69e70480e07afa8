"""Hypothesis tests of every function of relicore.blackbody with hostile inputs.

Arrays of any broadcastable shapes (0-d, empty, up to 3-D), filled with NaN, +-inf, +-0,
subnormals, the largest floats, arbitrary floats and physical values of every scale, given as
contiguous arrays, strided or reversed views, Fortran-ordered arrays, Python scalars or lists;
integer and narrower float dtypes; dtypes that are not numbers; shapes that do not broadcast;
response tables of any length and content; forged calibrations. For every call:

* either the result has the broadcast shape and every element is finite and equal, bit for
  bit, to the scalar call on that element,
* or it raises relicore.RelicoreError naming the function, an argument of the function, its
  value (as Python prints it) and the index of the first element whose scalar call fails (in
  C order of the broadcast shape; no index for scalar calls), with that element's status;
* with nan_on_error=True the failing elements (exactly those whose scalar call raises) are NaN
  and every other element is the scalar call's value, bit for bit.

The expected values are never numbers of our own: every array result is compared with the
scalar calls of the same function (the face's own convention); the physics is tested in
tests/proptest_*.rs and test_vectors.py / test_quad.py.

Also here: every array loop releases the GIL (a second Python thread keeps running during it).
"""

from __future__ import annotations

import math
import sys
import threading
import time
import warnings

import numpy as np
import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st
from hypothesis.extra import numpy as hnp

import relicore
from relicore import blackbody as bb
from relicore._elementwise import FUNCTIONS
from faces_table import BLACKBODY, BLACKBODY_RESULTS, native_blackbody

# Every regular element-wise function of relicore.blackbody and its arguments, from the table of
# regular functions (bindings/functions.toml); test_the_tables_cover_the_module checks it, with
# the irregular functions listed below, against the native module.
ELEMENTWISE = BLACKBODY
# functions of a shared table (wavelengths_m, response) or calibration, element-wise in the last
TABLE = {
    "response_weighted_radiance": "temperature_k",
    "temperature_from_response_weighted_radiance": "radiance",
}
CALIBRATED = {
    "calibrated_temperature": "reading",
    "calibrated_brightness_temperature": "reading",
}
# scalar only: builds the calibration value
CONSTRUCTORS = ("two_load_calibration",)

# Functions whose element costs microseconds (root finding, quadrature): smaller arrays.
SLOW = {"temperature_from_band_radiance_wavelength", "ratio_temperature", "band_fraction_wavelength",
        "band_radiance_wavelength", "band_photon_radiance_wavelength", "band_radiance_frequency"}

SETTINGS = settings(
    max_examples=100,
    deadline=None,  # never timed
    suppress_health_check=[HealthCheck.too_slow, HealthCheck.data_too_large],
    derandomize=True,  # reproducible in `make test`: the examples follow from the test's name
    database=None,  # nothing written into the tree
)

SPECIAL = [
    math.nan, -math.nan, math.inf, -math.inf, 0.0, -0.0, 5e-324, -5e-324, 2.2250738585072009e-308,
    sys.float_info.min, sys.float_info.max, -sys.float_info.max, 1e300, 1e-300, sys.float_info.epsilon,
    1.0, -1.0, 0.5, 2.7255, 1e-6, 1e4,
]

# any float: special values, every float hypothesis knows (subnormals, NaN, inf included), and
# log-uniform magnitudes of every scale, mostly positive so that successful paths are common
VALUES = st.one_of(
    st.sampled_from(SPECIAL),
    st.floats(allow_nan=True, allow_infinity=True, allow_subnormal=True),
    st.floats(-40.0, 40.0).map(lambda e: 10.0**e),
    st.floats(-40.0, 40.0).map(lambda e: -(10.0**e)),
)


def same_bits(a, b) -> bool:
    a, b = np.asarray(a, dtype=np.float64), np.asarray(b, dtype=np.float64)
    return a.shape == b.shape and bool(np.all(a.view(np.uint64) == b.view(np.uint64)))


def scalar_outcome(call, args):
    """The scalar call on Python floats: ('ok', value) or ('err', status)."""
    try:
        return ("ok", call(*[float(a) for a in args]))
    except relicore.RelicoreError as err:
        return ("err", err.status)


@st.composite
def layouts(draw, arr):
    """The same values as `arr` in another memory layout: itself, a strided view, a reversed
    view of a reversed copy, a Fortran-ordered copy, a list, or (0-d) a Python float."""
    kind = draw(st.sampled_from(["plain", "strided", "reversed", "fortran", "list", "scalar"]))
    if arr.ndim == 0:
        return float(arr) if kind in ("scalar", "list") else arr
    if kind == "strided":
        base = np.zeros(arr.shape[:-1] + (2 * arr.shape[-1],))
        base[..., ::2] = arr
        view = base[..., ::2]
        assert view.size <= 1 or not view.flags.c_contiguous
        return view
    if kind == "reversed":
        return np.ascontiguousarray(arr[..., ::-1])[..., ::-1]
    if kind == "fortran":
        return np.asfortranarray(arr)
    if kind == "list" and (arr.size > 0 or arr.ndim == 1):  # ([] would lose a shape (0, 3))
        return arr.tolist()
    return arr


@st.composite
def element_arguments(draw, nargs):
    """nargs arguments of mutually broadcastable shapes (0-d and empty included) filled with
    hostile values, in random layouts; returns (arguments, float64 arrays, broadcast shape)."""
    shapes = draw(hnp.mutually_broadcastable_shapes(num_shapes=nargs, min_dims=0, max_dims=3, min_side=0, max_side=4))
    arrays = [draw(hnp.arrays(np.float64, s, elements=VALUES)) for s in shapes.input_shapes]
    args = [draw(layouts(a)) for a in arrays]
    return args, arrays, shapes.result_shape


def check_elementwise(name, argnames, call, args, arrays, shape):
    """The contract of one element-wise call (see the module docstring)."""
    bcast = np.broadcast_arrays(*arrays)
    flat = [b.reshape(-1) for b in bcast]
    n = int(np.prod(shape, dtype=np.int64))
    outcomes = [scalar_outcome(call, [f[i] for f in flat]) for i in range(n)]
    all_scalars = all(isinstance(a, float) for a in args)
    try:
        got = call(*args)
    except relicore.RelicoreError as err:
        first = next((i for i, o in enumerate(outcomes) if o[0] == "err"), None)
        assert first is not None, f"{name} raised {err} although every element succeeds alone"
        assert err.function == name, err.function
        assert err.status == outcomes[first][1], (str(err), outcomes[first])
        if all_scalars or shape == ():
            assert err.index is None, err.index
            idx = ()
        else:
            idx = tuple(int(i) for i in np.unravel_index(first, shape))
            assert err.index == idx, f"{name}: index {err.index}, first failing element {idx}: {err}"
            assert f"at index {idx[0] if len(idx) == 1 else idx}" in str(err), str(err)
        if err.argument is None:
            # an error of no single argument (no convergence): every argument's value is shown
            assert err.status == -11, str(err)
            named = argnames[: len(arrays)]
        else:
            assert err.argument in argnames, (err.argument, argnames)
            named = [err.argument]
        for arg in named:
            value = float(bcast[argnames.index(arg)][idx])
            assert f"{arg} = {value!r}" in str(err), f"{err} does not show {arg} = {value!r}"
        assert str(err).startswith(f"{name}:"), str(err)
    else:
        assert all(o[0] == "ok" for o in outcomes), f"{name} returned although an element fails alone"
        if all_scalars:
            assert type(got) is float
        else:
            assert isinstance(got, np.ndarray) and got.dtype == np.float64 and got.shape == shape
        assert np.all(np.isfinite(got))
        assert same_bits(np.asarray(got).reshape(-1), [o[1] for o in outcomes])
    # nan_on_error: NaN exactly where the element fails alone, the scalar value elsewhere
    got = np.asarray(call(*args, nan_on_error=True), dtype=np.float64).reshape(-1)
    want = [o[1] if o[0] == "ok" else math.nan for o in outcomes]
    assert same_bits(np.isnan(got), np.isnan(want)), f"{name}: NaN pattern differs"
    assert same_bits(got[~np.isnan(got)], np.asarray(want)[~np.isnan(want)])


@pytest.mark.parametrize("name", sorted(ELEMENTWISE))
@SETTINGS
@given(data=st.data())
def test_elementwise_functions_on_hostile_arrays(name, data):
    argnames = ELEMENTWISE[name]
    args, arrays, shape = data.draw(element_arguments(len(argnames)))
    check_elementwise(name, argnames, getattr(bb, name), args, arrays, shape)


NUMERIC_DTYPES = st.one_of(
    hnp.integer_dtypes(endianness="="),
    hnp.unsigned_integer_dtypes(endianness="="),
    hnp.floating_dtypes(sizes=(16, 32, 64), endianness="="),
)


@pytest.mark.parametrize("name", sorted(ELEMENTWISE))
@SETTINGS
@given(data=st.data())
def test_integer_and_narrow_float_dtypes_are_converted_to_float64(name, data):
    """Integer and float16/32 arrays (as the module documents) give the result of their float64
    conversion, bit for bit, or the same error; float32 only for functions without a
    single-precision twin (with one, float32 stays float32: test_float32.py)."""
    argnames = ELEMENTWISE[name]
    dtype = data.draw(NUMERIC_DTYPES.filter(lambda d: not (np.dtype(d) == np.float32 and FUNCTIONS[name].single)))
    shape = data.draw(hnp.array_shapes(min_dims=1, max_dims=2, min_side=0, max_side=4))
    arr = data.draw(hnp.arrays(dtype, shape))
    rest = [data.draw(st.sampled_from([300.0, 1e-5, 2.7255, 1e9])) for _ in argnames[1:]]
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", RuntimeWarning)  # float16 overflow to inf on conversion
        as64 = arr.astype(np.float64)
    call = getattr(bb, name)
    try:
        want = call(as64, *rest)
    except relicore.RelicoreError as err:
        with pytest.raises(relicore.RelicoreError) as info:
            call(arr, *rest)
        assert (info.value.argument, info.value.index, info.value.status) == (err.argument, err.index, err.status)
    else:
        assert same_bits(call(arr, *rest), want)


NOT_NUMBERS = [
    np.array([1e-5 + 1e-6j, 300.0 + 0j]),  # complex: the imaginary part would be lost
    np.array(["2020-01-01", "2021-01-01"], dtype="datetime64[D]"),
    np.array([1, 2], dtype="timedelta64[s]"),
    np.array(["1e-5", "300"]),  # text
    np.array([b"1e-5", b"300"]),
]


@pytest.mark.parametrize("bad", NOT_NUMBERS, ids=lambda a: a.dtype.name)
def test_arrays_that_are_not_numbers_are_refused_naming_the_argument(bad):
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # a warning instead of an error is not a refusal
        for name, argnames in ELEMENTWISE.items():
            with pytest.raises(relicore.RelicoreError) as info:
                getattr(bb, name)(bad, *[300.0] * (len(argnames) - 1))
            assert info.value.argument == argnames[0]


@st.composite
def mismatched_shapes(draw, nargs):
    """nargs shapes that do not broadcast: two arguments with different lengths > 1 on the last
    axis."""
    n = draw(st.integers(2, 5))
    m = draw(st.integers(2, 5).filter(lambda m: m != n))
    shapes = [(n,), (m,)] + [()] * (nargs - 2)
    return draw(st.permutations(shapes))


@pytest.mark.parametrize("name", sorted(n for n, a in ELEMENTWISE.items() if len(a) >= 2))
@SETTINGS
@given(data=st.data())
def test_shapes_that_do_not_broadcast_raise_value_error(name, data):
    shapes = data.draw(mismatched_shapes(len(ELEMENTWISE[name])))
    args = [np.full(s, 1.0) for s in shapes]
    with pytest.raises(ValueError):
        getattr(bb, name)(*args)
    with pytest.raises(ValueError):
        getattr(bb, name)(*args, nan_on_error=True)


def test_shapes_that_do_not_broadcast_name_the_argument():
    with pytest.raises(relicore.RelicoreError) as info:
        bb.spectral_radiance_wavelength(np.ones(3) * 1e-5, np.ones(4) * 300.0)
    assert info.value.argument in ("wavelength_m", "temperature_k")


# --- response tables and calibrations --------------------------------------------------------


@st.composite
def tables(draw):
    """A response table: arbitrary lengths (often different) and values, or a valid one."""
    if draw(st.booleans()):
        n = draw(st.integers(2, 6))
        start = draw(st.floats(-7.0, -3.0))
        steps = draw(st.lists(st.floats(0.01, 1.0), min_size=n, max_size=n))
        w = 10.0**start * np.cumprod([1.0] + [1.0 + s for s in steps[:-1]])
        r = np.asarray(draw(st.lists(st.floats(0.0, 1.0), min_size=n, max_size=n)))
        return w, r
    nw = draw(st.integers(0, 6))
    nr = draw(st.one_of(st.just(nw), st.integers(0, 6)))
    w = draw(hnp.arrays(np.float64, nw, elements=VALUES))
    r = draw(hnp.arrays(np.float64, nr, elements=VALUES))
    return w, r


@pytest.mark.parametrize("name", sorted(TABLE))
@SETTINGS
@given(table=tables(), data=st.data())
def test_response_functions_on_hostile_tables_and_values(name, table, data):
    w, r = table
    call = getattr(bb, name)
    arg = TABLE[name]
    try:
        call(w, r, 300.0 if arg == "temperature_k" else 1.0)
    except relicore.RelicoreError as err:
        if err.argument in ("wavelengths_m", "response"):
            # a table error: raised whatever the values, even with nan_on_error, with no index
            assert err.index is None and err.function == name
            shape = data.draw(hnp.array_shapes(min_dims=1, max_dims=2, max_side=3))
            with pytest.raises(relicore.RelicoreError) as info:
                call(w, r, np.full(shape, 300.0), nan_on_error=True)
            assert info.value.argument == err.argument
            return
    # the table is usable: the values are element-wise like every other function
    args, arrays, shape = data.draw(element_arguments(1))
    check_elementwise(name, (arg, "wavelengths_m", "response"), lambda v, **kw: call(w, r, v, **kw), args, arrays, shape)


@st.composite
def calibrations(draw):
    if draw(st.booleans()):
        try:
            return bb.two_load_calibration(*[draw(VALUES) for _ in range(5)])
        except relicore.RelicoreError as err:
            assert err.function == "two_load_calibration" and err.index is None
            assert err.argument in ("frequency_hz", "reading_hot", "temperature_hot_k", "reading_cold", "temperature_cold_k")
    return bb.TwoLoadCalibration(draw(VALUES), draw(VALUES), draw(VALUES))


@pytest.mark.parametrize("name", sorted(CALIBRATED))
@SETTINGS
@given(cal=calibrations(), data=st.data())
def test_calibrated_functions_on_hostile_calibrations_and_readings(name, cal, data):
    call = getattr(bb, name)
    try:
        call(cal, 1.0)
    except relicore.RelicoreError as err:
        if err.argument == "calibration":
            with pytest.raises(relicore.RelicoreError):
                call(cal, [1.0, 2.0], nan_on_error=True)
            return
    args, arrays, shape = data.draw(element_arguments(1))
    check_elementwise(name, ("reading", "calibration"), lambda v, **kw: call(cal, v, **kw), args, arrays, shape)


def test_the_tables_cover_the_module():
    """Every function of the native module is in one of the tables above (so a new function
    joins these tests, or this test says it has not)."""
    from test_hypothesis_thermometry import IRREGULAR as THERMOMETRY_IRREGULAR

    native = set(native_blackbody())
    here = (set(ELEMENTWISE) | set(TABLE) | set(CALIBRATED) | set(CONSTRUCTORS) | set(BLACKBODY_RESULTS)
            | set(THERMOMETRY_IRREGULAR))
    assert native == here, f"missing here: {sorted(native - here)}; not in the module: {sorted(here - native)}"
    for name, argnames in native_blackbody().items():
        if name in ELEMENTWISE:
            assert tuple(argnames) == ELEMENTWISE[name], name


# --- the GIL ---------------------------------------------------------------------------------



def long_enough(make_call, n: int, seconds: float = 0.1, cap: int = 1 << 24):
    """A call over an array large enough that one call keeps the GIL released for at least
    `seconds` (so a busy scheduler cannot make the helper thread miss every window). The size is
    chosen by running the call; no time is asserted."""
    while True:
        call = make_call(n)
        t0 = time.perf_counter()
        call()
        if time.perf_counter() - t0 >= seconds or n >= cap:
            return call
        n *= 4


def runs_alongside(work, attempts: int = 30) -> bool:
    """Whether a second Python thread executes bytecode while `work()` runs in the main thread.

    The switch interval is set far beyond the test, so the interpreter never forces the main
    thread to hand over the GIL: the helper thread can count only while native code has released
    it. The helper may not be scheduled during one short call on a busy machine, so `work()` is
    repeated until the count moves during a call, up to `attempts` times; with the GIL held it
    never moves. No time is measured or asserted."""
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
    moved = False
    try:
        worker.start()
        started.wait()
        for _ in range(attempts):
            before = counter[0]
            work()
            if counter[0] > before:
                moved = True
                break
    finally:
        stop.set()
        worker.join()
        sys.setswitchinterval(old)
    return moved


# physical arguments per argument name (any valid value would do: only the loop matters)
PHYSICAL = {
    "wavelength_m": 1e-5, "frequency_hz": 3e13, "wavenumber_per_m": 1e5, "temperature_k": 300.0,
    "lower_m": 1e-6, "upper_m": 2e-5, "lower_hz": 1e12, "upper_hz": 3e13, "radiance": 50.0,
    "spectral_radiance": 1e6, "wavelength_1_m": 1e-6, "wavelength_2_m": 2e-6, "radiance_ratio": 0.5,
    "emissivity_ratio": 1.0, "cmb_temperature_k": 2.7255,
    "object_temperature_k": 300.0, "signal": 5e6, "emissivity": 0.9, "reflected_temperature_k": 293.0,
    "transmittance": 0.95, "path_temperature_k": 280.0,
}


@pytest.mark.parametrize("name", sorted(ELEMENTWISE))
def test_every_array_loop_releases_the_gil(name):
    argnames = ELEMENTWISE[name]
    n = 20_000 if name in SLOW else 400_000
    rest = [PHYSICAL[a] for a in argnames[1:]]
    fn = getattr(bb, name)
    top = 1.0 if name.startswith("band_") or name == "temperature_from_band_radiance_wavelength" else 1.5

    def make_call(size):
        # the first argument varies over the array (so nothing is a broadcast scalar)
        first = np.linspace(0.5, top, size) * PHYSICAL[argnames[0]]
        return lambda: fn(first, *rest, nan_on_error=True)

    assert runs_alongside(long_enough(make_call, n)), f"{name}: the GIL was held"


def test_table_and_calibration_loops_release_the_gil():
    w = np.array([8e-6, 1e-5, 1.2e-5, 1.4e-5])
    r = np.array([0.1, 0.9, 1.0, 0.2])
    t = np.linspace(200.0, 400.0, 20_000)
    assert runs_alongside(lambda: bb.response_weighted_radiance(w, r, t))
    assert runs_alongside(lambda: bb.temperature_from_response_weighted_radiance(w, r, t * 0.01))
    cal = bb.two_load_calibration(30e9, 2.0, 300.0, 1.0, 77.0)
    readings = np.linspace(1.0, 2.0, 400_000)
    assert runs_alongside(lambda: bb.calibrated_temperature(cal, readings))
    assert runs_alongside(lambda: bb.calibrated_brightness_temperature(cal, readings))
