"""Hostile inputs to the radiation-thermometry face of relicore.blackbody (hypothesis,
derandomized): the functions with a named result (a temperature with its uncertainty), the
image path through the core's frame forms (object_temperature_wavelength_array,
object_temperature_frequency_array, object_temperature_band_array) and the response-table and
array-uncertainty forms. The contract: never a crash; a scalar call returns a named result of
finite numbers or raises RelicoreError with a status; an array call returns, element by
element, exactly what the scalar call returns (NaN-filled with nan_on_error where it raises);
the frame forms with uncertainty (object_temperature_wavelength_with_uncertainty_array,
object_temperature_frequency_with_uncertainty_array,
object_temperature_band_with_uncertainty_array) give T and u_c that the Python array call gives.
"""

from __future__ import annotations

import math

import numpy as np
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

import relicore
from faces_table import BLACKBODY_RESULTS, FRAMES
from relicore import blackbody as bb

#: the hand-written thermometry functions of relicore.blackbody (not in the table)
IRREGULAR = (
    "measured_response_weighted_radiance",
    "object_temperature_response",
    "object_temperature_response_with_uncertainty",
    "response_weighted_radiance_temperature_derivative",
    "combined_standard_uncertainty",
    "combined_standard_uncertainty_correlated",
)

SETTINGS = settings(max_examples=60, deadline=None, derandomize=True, database=None,
                    suppress_health_check=[HealthCheck.too_slow])

# near a physical scene, or anything at all
PLAUSIBLE = {"wavelength_m": 1e-5, "frequency_hz": 3e13, "lower_m": 8e-6, "upper_m": 1.4e-5, "signal": 5e6,
             "spectral_radiance": 5e6, "emissivity": 0.9, "reflected_temperature_k": 293.0, "transmittance": 0.95,
             "path_temperature_k": 280.0, "temperature_hot_k": 300.0, "temperature_cold_k": 77.0,
             "reading_hot": 2.0, "reading_cold": 1.0, "reading": 1.5}
ANY = st.one_of(st.floats(allow_nan=True, allow_infinity=True), st.sampled_from([0.0, -0.0, 1.0, -1.0, 1e-300]))


def value(name):
    base = PLAUSIBLE.get(name, 1.0 if "uncertainty" not in name else 0.01)
    return st.one_of(st.floats(0.5, 1.5).map(lambda f: base * f), ANY)


def outcome(fn, args):
    try:
        return ("ok", fn(*args))
    except relicore.RelicoreError as err:
        return ("err", err.status)


@SETTINGS
@given(st.data())
def test_named_results_on_hostile_arguments(data):
    name = data.draw(st.sampled_from(sorted(BLACKBODY_RESULTS)))
    fn = getattr(bb, name)
    names = BLACKBODY_RESULTS[name]
    rows = [[data.draw(value(a)) for a in names] for _ in range(4)]
    outcomes = [outcome(fn, r) for r in rows]
    for kind, v in outcomes:
        if kind == "ok":
            assert math.isfinite(v.temperature_k) and v.combined_standard_uncertainty_k >= 0
            assert 1 <= v.inputs <= 5 and all(math.isfinite(c) for c in v.sensitivity_coefficients)
        else:
            assert isinstance(v, int) and v < 0
    cols = [np.array(c) for c in zip(*rows)]
    got = fn(*cols, nan_on_error=True)
    for k, (kind, v) in enumerate(outcomes):
        if kind == "ok":
            assert got.temperature_k[k] == v.temperature_k
            assert tuple(got.sensitivity_coefficients[k]) == v.sensitivity_coefficients
            assert got.inputs[k] == v.inputs
        else:
            assert math.isnan(got.temperature_k[k]) and got.inputs[k] == 0
    if any(kind == "err" for kind, _ in outcomes):
        try:
            fn(*cols)
            raise AssertionError("an element that fails must raise without nan_on_error")
        except relicore.RelicoreError as err:
            first = next(k for k, (kind, _) in enumerate(outcomes) if kind == "err")
            assert err.index == (first,) and err.status == outcomes[first][1]


@SETTINGS
@given(st.data())
def test_image_path_on_hostile_frames(data):
    """The frame path (leading spectral arguments single, the signals one per element, the scene
    per element or shared) gives the scalar bits element by element."""
    name, lead = data.draw(st.sampled_from(FRAMES))
    fn = getattr(bb, name)
    args = bb_args = list(fn.__code__.co_varnames[: fn.__code__.co_argcount])
    n = data.draw(st.integers(0, 9))
    call = [data.draw(value(a)) for a in args[:lead]]
    call.append(np.array([data.draw(value("signal")) for _ in range(n)]))
    for a in args[lead + 1:]:
        shared = data.draw(st.booleans())
        call.append(data.draw(value(a)) if shared else np.array([data.draw(value(a)) for _ in range(n)]))
    got = fn(*call, nan_on_error=True)
    # a function with a result value (the budget frames): every real field, bit for bit, and the count
    fields = got._fields if isinstance(got, tuple) else None
    columns = [np.asarray(getattr(got, f)) for f in fields] if fields else [got]
    for c in columns:
        assert c.shape[:1] == (n,)
    for i in range(n):
        one = [c if np.ndim(c) == 0 else float(c[i]) for c in call]
        want = fn(*one, nan_on_error=True)
        wants = [np.asarray(getattr(want, f)) for f in fields] if fields else [np.asarray(want)]
        for w, c in zip(wants, columns):
            g = np.asarray(c[i])
            if g.dtype.kind == "f":
                same = np.float64(w).view(np.uint64) == np.float64(g).view(np.uint64) if w.ndim == 0 else \
                    np.array_equal(w.astype(np.float64).view(np.uint64), g.astype(np.float64).view(np.uint64))
                assert same or (np.all(np.isnan(w)) and np.all(np.isnan(g))), (name, i, w, g)
            else:
                assert int(w) == int(g), (name, i, w, g)
    del bb_args


def test_the_frames_with_uncertainty_agree_with_the_array_call():
    """T and u_c of the Python array call, which loops the scalar _with_uncertainty function, are
    those of the core's frame forms (reached from C and Fortran) on the same pixels; here through
    the relation u_c = |dT/dL| u(L) of a lone signal uncertainty, computed both ways."""
    s = bb.spectral_radiance_wavelength(1e-5, 300.0) * np.linspace(0.9, 1.5, 50)
    r = bb.object_temperature_wavelength_with_uncertainty(1e-5, s, 0.9, 293.0, 0.95, 280.0, 0.01 * s, 0, 0, 0, 0)
    t = bb.object_temperature_wavelength(1e-5, s, 0.9, 293.0, 0.95, 280.0)
    assert np.array_equal(r.temperature_k, t)
    assert np.allclose(r.combined_standard_uncertainty_k, np.abs(r.sensitivity_coefficients[:, 0]) * 0.01 * s,
                       rtol=1e-15, atol=0)


@SETTINGS
@given(st.lists(ANY, min_size=0, max_size=6), st.data())
def test_combined_uncertainty_on_hostile_arrays(c, data):
    u = [data.draw(ANY) for _ in c]
    try:
        v = bb.combined_standard_uncertainty(c, u)
        assert math.isfinite(v) and v >= 0
    except relicore.RelicoreError as err:
        assert err.status in (-2, -4, -10)
    n = len(c)
    r = np.eye(n)
    if n > 1 and data.draw(st.booleans()):
        r[0, 1] = data.draw(ANY)
    try:
        v = bb.combined_standard_uncertainty_correlated(c, u, r)
        assert math.isfinite(v) and v >= 0
    except relicore.RelicoreError as err:
        assert err.status in (-2, -4, -7, -10)


@SETTINGS
@given(st.data())
def test_response_forms_on_hostile_scenes(data):
    w = np.linspace(8e-6, 14e-6, 7)
    r = np.ones(7)
    name = data.draw(st.sampled_from(IRREGULAR[:4]))
    fn = getattr(bb, name)
    nargs = {"measured_response_weighted_radiance": 5, "object_temperature_response": 5,
             "object_temperature_response_with_uncertainty": 10,
             "response_weighted_radiance_temperature_derivative": 1}[name]
    scene = ["signal", "emissivity", "reflected_temperature_k", "transmittance", "path_temperature_k"] + \
        ["u"] * 5
    if name == "measured_response_weighted_radiance":
        scene[0] = "reflected_temperature_k"
    args = [data.draw(value(scene[k] if name != "response_weighted_radiance_temperature_derivative" else "t"))
            for k in range(nargs)]
    if name.startswith("object_temperature"):
        args[0] = data.draw(st.one_of(st.floats(1.0, 100.0), ANY))
    try:
        v = fn(w, r, *args)
        x = v.temperature_k if hasattr(v, "temperature_k") else v
        assert math.isfinite(x)
    except relicore.RelicoreError as err:
        assert isinstance(err.status, int) and err.status < 0
