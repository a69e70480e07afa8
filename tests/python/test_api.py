"""The Python calling conventions of relicore.blackbody: scalars and arrays, broadcasting,
conversion, error messages, nan_on_error, the calibration value, and the GIL.

The expected values here are never numbers from our own code: array results are compared with
the scalar calls of the same function (the Python face's own conventions), error fields with
the inputs the test passed, and the physics is checked elsewhere (test_vectors.py against
mpmath, test_quad.py against scipy).
"""

from __future__ import annotations

import math
import pickle
import sys
import threading
import time

import numpy as np
import pytest

import relicore
from relicore import blackbody as bb

SRW = bb.spectral_radiance_wavelength


def scalar_map(fn, *arrays):
    """fn called on scalars, element by element over the broadcast arrays."""
    b = np.broadcast_arrays(*[np.asarray(a, dtype=np.float64) for a in arrays])
    out = np.empty(b[0].shape)
    for idx in np.ndindex(out.shape):
        out[idx] = fn(*(float(x[idx]) for x in b))
    return out


def same_bits(a, b) -> bool:
    a, b = np.asarray(a, dtype=np.float64), np.asarray(b, dtype=np.float64)
    return a.shape == b.shape and bool(np.all(a.view(np.uint64) == b.view(np.uint64)))


# --- scalars and arrays ----------------------------------------------------------------------


@pytest.mark.parametrize(
    "wavelength, temperature",
    [(1e-5, 300.0), (1e-5, 300), (np.float64(1e-5), np.float32(300.0)), (np.float32(1e-5), np.int64(300))],
)
def test_scalar_inputs_give_a_python_float(wavelength, temperature):
    got = SRW(wavelength, temperature)
    assert type(got) is float
    assert got == SRW(float(np.float64(wavelength)), float(temperature))


def test_scalar_result_equals_the_array_element_bit_for_bit():
    t = np.array([250.0, 300.0, 6000.0])
    arr = SRW(1e-5, t)
    assert same_bits(arr, [SRW(1e-5, x) for x in t.tolist()])


@pytest.mark.parametrize(
    "shapes, want",
    [
        (((3, 1), (4,)), (3, 4)),
        (((), (5,)), (5,)),
        (((2, 1, 3), (1, 4, 1)), (2, 4, 3)),
        (((1,), (2, 3)), (2, 3)),
    ],
)
def test_broadcasting_shapes_and_values(shapes, want):
    rng = np.random.default_rng(1)
    lam = rng.uniform(1e-6, 1e-4, size=shapes[0])
    t = rng.uniform(100.0, 3000.0, size=shapes[1])
    got = SRW(lam, t)
    assert isinstance(got, np.ndarray) and got.dtype == np.float64 and got.shape == want
    assert same_bits(got, scalar_map(SRW, lam, t))


def test_three_and_four_argument_broadcasting():
    lower = np.array([[1e-6], [2e-6]])
    upper = np.array([3e-6, 5e-6, np.inf])
    got = bb.band_radiance_wavelength(lower, upper, 1000.0)
    assert got.shape == (2, 3)
    assert same_bits(got, scalar_map(bb.band_radiance_wavelength, lower, upper, 1000.0))
    l1 = np.array([0.9e-6, 1.0e-6])
    got = bb.ratio_temperature(l1, 1.6e-6, np.array([[2.0], [3.0]]), 1.0)
    assert got.shape == (2, 2)
    assert same_bits(got, scalar_map(bb.ratio_temperature, l1, 1.6e-6, np.array([[2.0], [3.0]]), 1.0))


def test_one_argument_functions_keep_the_shape():
    t = np.array([[100.0, 200.0], [300.0, 400.0]])
    for fn in (bb.radiant_exitance, bb.peak_wavelength, bb.thermal_sz_null_frequency):
        got = fn(t)
        assert got.shape == (2, 2)
        assert same_bits(got, scalar_map(fn, t))


def test_list_and_tuple_inputs():
    got = SRW([1e-5, 2e-5], (300.0, 400.0))
    assert isinstance(got, np.ndarray) and got.shape == (2,)
    assert same_bits(got, [SRW(1e-5, 300.0), SRW(2e-5, 400.0)])
    nested = bb.radiant_exitance([[100, 200], [300, 400]])
    assert nested.shape == (2, 2)


def test_integer_arrays_and_float32_without_a_twin_are_converted_to_float64():
    # float32 input of a function with a single-precision twin stays float32: test_float32.py
    t32 = np.array([300.5, 1234.25, 5800.125], dtype=np.float32)
    got = bb.peak_wavelength(t32)
    assert got.dtype == np.float64
    assert same_bits(got, bb.peak_wavelength(t32.astype(np.float64)))
    ti = np.arange(100, 105)
    assert same_bits(bb.radiant_exitance(ti), bb.radiant_exitance(ti.astype(np.float64)))


def test_zero_dimensional_arrays_give_zero_dimensional_arrays():
    got = SRW(np.array(1e-5), np.array(300.0))
    assert isinstance(got, np.ndarray) and got.shape == ()
    assert got[()] == SRW(1e-5, 300.0)
    mixed = SRW(np.array(1e-5), 300.0)
    assert isinstance(mixed, np.ndarray) and mixed.shape == ()


@pytest.mark.parametrize("shape", [(0,), (0, 3), (2, 0)])
def test_empty_arrays(shape):
    got = SRW(np.empty(shape), 300.0)
    assert isinstance(got, np.ndarray) and got.shape == shape and got.dtype == np.float64
    got = bb.band_radiance_wavelength(np.empty(shape), np.inf, 300.0)
    assert got.shape == shape


def test_non_contiguous_views():
    base = np.linspace(1e-6, 5e-5, 40).reshape(8, 5)
    t = np.linspace(200.0, 2000.0, 40).reshape(5, 8).T  # Fortran-ordered view
    views = [
        (base[::2], t[::2]),
        (base[:, ::-2], t[:, ::2]),
        (base.T, t.T),
    ]
    for lam, temp in views:
        assert not (lam.flags.c_contiguous and temp.flags.c_contiguous)
        got = SRW(lam, temp)
        assert same_bits(got, SRW(np.ascontiguousarray(lam), np.ascontiguousarray(temp)))
        assert same_bits(got, scalar_map(SRW, lam, temp))


def test_inputs_are_not_modified_and_results_are_new_arrays():
    lam = np.linspace(1e-6, 2e-5, 7)
    keep = lam.copy()
    got = SRW(lam, 300.0)
    assert same_bits(lam, keep)
    assert not np.shares_memory(got, lam)
    got2 = SRW(lam, 300.0)
    assert not np.shares_memory(got, got2)


def test_incompatible_shapes_raise_value_error():
    with pytest.raises(ValueError):
        SRW(np.ones(3), np.ones(4) * 300.0)


def test_non_numeric_input_raises():
    with pytest.raises((TypeError, ValueError)):
        SRW("ten microns", 300.0)
    with pytest.raises((TypeError, ValueError)):
        SRW([1e-5, "x"], 300.0)


# --- errors ----------------------------------------------------------------------------------


def test_relicore_error_is_a_value_error_defined_by_the_native_module():
    assert issubclass(relicore.RelicoreError, ValueError)
    assert relicore.RelicoreError is relicore._native.RelicoreError


def test_error_names_function_argument_value_and_index():
    t = np.array([300.0, 310.0, 320.0, 330.0, 340.0, -3.0, -4.0])
    with pytest.raises(relicore.RelicoreError) as info:
        SRW(1e-5, t)
    err = info.value
    assert str(err) == "spectral_radiance_wavelength: temperature_k = -3.0 at index 5: must be positive"
    assert (err.function, err.argument, err.index) == ("spectral_radiance_wavelength", "temperature_k", (5,))
    # status code of the C ABI for a non-positive argument (tests/data/FORMAT.md)
    assert err.status == -3


def test_error_index_is_a_tuple_in_the_broadcast_shape():
    lam = np.full((3, 4), 1e-5)
    lam[2, 1] = np.nan
    lam[2, 3] = -1.0
    with pytest.raises(relicore.RelicoreError) as info:
        SRW(lam, 300.0)
    assert info.value.index == (2, 1)
    assert info.value.argument == "wavelength_m"
    assert "wavelength_m = nan at index (2, 1): must be finite" in str(info.value)
    assert info.value.status == -2


def test_scalar_errors_carry_no_index():
    with pytest.raises(relicore.RelicoreError) as info:
        SRW(0.0, 300.0)
    assert str(info.value) == "spectral_radiance_wavelength: wavelength_m = 0.0: must be positive"
    assert info.value.index is None


@pytest.mark.parametrize(
    "call, argument, fragment",
    [
        (lambda: bb.band_radiance_wavelength(-1e-6, 2e-6, 300.0), "lower_m", "lower_m = -1e-06: must not be negative"),
        (lambda: bb.band_radiance_wavelength(1e-6, np.nan, 300.0), "upper_m", "upper_m = nan: must be finite"),
        (
            lambda: bb.band_radiance_wavelength([1e-6, 3e-6], [2e-6, 2e-6], 300.0),
            "lower_m",
            "lower_m = 3e-06, upper_m = 2e-06 at index 1: empty interval",
        ),
        (lambda: bb.band_fraction_wavelength(1e-6, 2e-6, -5.0), "temperature_k", "temperature_k = -5.0"),
        (lambda: bb.brightness_temperature_frequency(1e9, [1.0, 0.0]), "spectral_radiance", "at index 1"),
        (lambda: bb.ratio_temperature(1e-6, 2e-6, 1e6, 1.0), "radiance_ratio", "outside the domain"),
        (lambda: bb.kcmb_to_mjy_per_sr(np.inf, 2.72548), "frequency_hz", "frequency_hz = inf: must be finite"),
        (
            lambda: bb.two_load_calibration(90e9, 1000.0, 77.0, 100.0, 300.0),
            "temperature_hot_k",
            "degenerate calibration",
        ),
    ],
)
def test_each_argument_position_is_named(call, argument, fragment):
    with pytest.raises(relicore.RelicoreError) as info:
        call()
    assert info.value.argument == argument
    assert fragment in str(info.value)


WL = np.array([3e-6, 3.5e-6, 4e-6, 4.5e-6, 5e-6])
RESP = np.array([0.0, 0.6, 1.0, 0.7, 0.0])


@pytest.mark.parametrize(
    "wl, resp, argument, fragment",
    [
        (WL, [0.0, 0.6, -1.0, 0.7, 0.0], "response", "response[2] = -1.0: must not be negative"),
        (WL, [0.0, 0.6, np.nan, 0.7, 0.0], "response", "response[2] = nan: must be finite"),
        (WL[[0, 2, 1, 3, 4]], RESP, "wavelengths_m", "wavelengths_m[2] = 3.5e-06: must be strictly increasing"),
        (-WL, RESP, "wavelengths_m", "wavelengths_m[0] = -3e-06: must be positive"),
        (WL, RESP[:4], "response", "response has 4 elements, wavelengths_m has 5"),
        (WL[:1], RESP[:1], "wavelengths_m", "wavelengths_m is too short (1 element)"),
        (WL.reshape(5, 1), RESP, "wavelengths_m", "must be 1-D"),
    ],
)
def test_table_errors_name_the_table_element(wl, resp, argument, fragment):
    with pytest.raises(relicore.RelicoreError) as info:
        bb.response_weighted_radiance(wl, resp, 300.0)
    assert info.value.argument == argument
    assert fragment in str(info.value)
    assert info.value.index is None
    # a table error is not an element error: nan_on_error does not hide it
    with pytest.raises(relicore.RelicoreError):
        bb.response_weighted_radiance(wl, resp, [300.0, 400.0], nan_on_error=True)


def test_a_response_that_is_zero_everywhere_has_no_temperature():
    for nan_on_error in (False, True):
        with pytest.raises(relicore.RelicoreError) as info:
            bb.temperature_from_response_weighted_radiance(WL, np.zeros(5), [1.0, 2.0], nan_on_error=nan_on_error)
        assert info.value.argument == "response" and info.value.index is None
        assert info.value.status == -10  # OUT_OF_DOMAIN (tests/data/FORMAT.md)


# --- nan_on_error ----------------------------------------------------------------------------


def test_nan_on_error_marks_bad_elements_and_keeps_good_ones_exact():
    lam = np.array([1e-5, -1.0, 2e-5, np.nan, 3e-5])
    t = np.array([300.0, 300.0, 0.0, 300.0, 500.0])
    got = SRW(lam, t, nan_on_error=True)
    bad = np.array([False, True, True, True, False])
    assert np.array_equal(np.isnan(got), bad)
    assert same_bits(got[~bad], [SRW(1e-5, 300.0), SRW(3e-5, 500.0)])


def test_nan_on_error_for_scalars_and_each_family():
    assert math.isnan(SRW(-1.0, 300.0, nan_on_error=True))
    assert math.isnan(bb.ratio_temperature(1e-6, 2e-6, 1e6, 1.0, nan_on_error=True))
    got = bb.temperature_from_response_weighted_radiance(WL, RESP, [1.0, -1.0, 5.0], nan_on_error=True)
    assert np.isnan(got[1]) and not np.isnan(got[[0, 2]]).any()
    assert got[0] == bb.temperature_from_response_weighted_radiance(WL, RESP, 1.0)
    cal = bb.two_load_calibration(90e9, 1000.0, 300.0, 100.0, 77.0)
    readings = np.array([500.0, -1000.0, np.inf, 900.0])
    got = bb.calibrated_temperature(cal, readings, nan_on_error=True)
    assert np.array_equal(np.isnan(got), [False, True, True, False])
    assert got[3] == bb.calibrated_temperature(cal, 900.0)


def test_without_nan_on_error_the_first_bad_element_raises():
    cal = bb.two_load_calibration(90e9, 1000.0, 300.0, 100.0, 77.0)
    with pytest.raises(relicore.RelicoreError) as info:
        bb.calibrated_temperature(cal, [500.0, 600.0, -1000.0, np.nan])
    assert info.value.index == (2,) and info.value.argument == "reading"
    assert info.value.status == -10  # OUT_OF_DOMAIN (tests/data/FORMAT.md)


def test_an_invalid_calibration_raises_even_with_nan_on_error():
    bad = bb.TwoLoadCalibration(90e9, 0.0, 1.0)
    with pytest.raises(relicore.RelicoreError) as info:
        bb.calibrated_brightness_temperature(bad, [1.0, 2.0], nan_on_error=True)
    assert info.value.argument == "calibration"
    assert "TwoLoadCalibration(frequency_hz=90000000000.0, gain=0.0, offset=1.0)" in str(info.value)


# --- the calibration value -------------------------------------------------------------------


def test_calibration_is_frozen_comparable_and_pickles():
    cal = bb.two_load_calibration(37e9, 2.5, 300.0, 0.5, 77.0)
    assert isinstance(cal, bb.TwoLoadCalibration)
    assert cal.frequency_hz == 37e9
    # the line through the two loads: reading = gain * J + offset (J the RJ brightness
    # temperature, which lies below the physical one), checked on the calibrated readings
    assert cal.gain > 0.0
    for protocol in range(pickle.HIGHEST_PROTOCOL + 1):
        back = pickle.loads(pickle.dumps(cal, protocol=protocol))
        assert back == cal and type(back) is bb.TwoLoadCalibration
        assert (back.frequency_hz, back.gain, back.offset) == (cal.frequency_hz, cal.gain, cal.offset)
        assert bb.calibrated_temperature(back, 1.7) == bb.calibrated_temperature(cal, 1.7)
    with pytest.raises(AttributeError):
        cal.gain = 1.0  # type: ignore[misc]
    assert cal != bb.TwoLoadCalibration(cal.frequency_hz, cal.gain, cal.offset + 1.0)
    assert repr(cal).startswith("TwoLoadCalibration(frequency_hz=37000000000.0, gain=")
    assert eval(repr(cal), {"TwoLoadCalibration": bb.TwoLoadCalibration}) == cal


def test_calibrated_functions_take_scalars_and_arrays():
    cal = bb.two_load_calibration(37e9, 2.5, 300.0, 0.5, 77.0)
    readings = np.array([[0.5, 1.0], [2.0, 2.5]])
    for fn in (bb.calibrated_temperature, bb.calibrated_brightness_temperature):
        got = fn(cal, readings)
        assert got.shape == (2, 2)
        assert same_bits(got, scalar_map(lambda r: fn(cal, r), readings))
        assert type(fn(cal, 1.0)) is float
    # the loads come back: the hot reading gives the hot load's temperature (the definition
    # of the calibration; tolerance: a few roundings of the line and of its inverse)
    assert bb.calibrated_temperature(cal, 2.5) == pytest.approx(300.0, rel=1e-13)
    assert bb.calibrated_temperature(cal, 0.5) == pytest.approx(77.0, rel=1e-13)


def test_response_functions_take_lists_and_any_value_shape():
    temps = np.array([[250.0, 300.0], [350.0, 400.0]])
    got = bb.response_weighted_radiance(WL.tolist(), RESP.tolist(), temps)
    assert got.shape == (2, 2)
    assert same_bits(got, scalar_map(lambda t: bb.response_weighted_radiance(WL, RESP, t), temps))
    assert type(bb.response_weighted_radiance(WL, RESP, 300.0)) is float
    back = bb.temperature_from_response_weighted_radiance(WL, RESP, got)
    # round trip of the inverse (documented accuracy 1e-14 relative)
    assert np.allclose(back, temps, rtol=1e-13, atol=0.0)


# --- the GIL ---------------------------------------------------------------------------------


def test_array_loop_releases_the_gil():
    """A second Python thread runs while a large array call is in the native loop.

    With the switch interval set far beyond the test's duration, the interpreter never forces
    the main thread to hand over the GIL; the helper thread can count only if the native loop
    releases it. No timing is asserted: the count before and after the call is compared."""
    lam = np.linspace(1e-7, 1e-3, 4_000_000)  # contiguous float64: the wrapper copies nothing
    t = np.full_like(lam, 300.0)
    counter = [0]
    started = threading.Event()
    stop = threading.Event()

    def spin():
        started.set()
        while not stop.is_set():
            counter[0] += 1
            time.sleep(0)  # gives the GIL back each round so the main thread can proceed

    old = sys.getswitchinterval()
    sys.setswitchinterval(1000.0)
    worker = threading.Thread(target=spin, daemon=True)
    try:
        worker.start()
        started.wait()
        before = counter[0]
        SRW(lam, t)
        after = counter[0]
    finally:
        stop.set()
        worker.join()
        sys.setswitchinterval(old)
    assert after > before, "no Python bytecode ran in another thread during the array call"


def test_concurrent_calls_on_shared_inputs_agree_with_serial_calls():
    # several threads read the same input arrays at once (read-only borrows may overlap) and
    # each writes its own output
    from concurrent.futures import ThreadPoolExecutor

    lam = np.linspace(1e-6, 1e-4, 200_000)
    temps = [250.0, 300.0, 1000.0, 5772.0, 77.0, 2.72548]
    serial = [SRW(lam, t) for t in temps]
    with ThreadPoolExecutor(max_workers=4) as pool:
        parallel = list(pool.map(lambda t: SRW(lam, t), temps))
    for a, b in zip(serial, parallel):
        assert same_bits(a, b)
