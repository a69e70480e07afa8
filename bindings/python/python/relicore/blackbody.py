"""Blackbody radiometry: Planck's law in every form, exitances, peaks, band integrals,
inversions to temperature, response-weighted radiance, two-load radiometer calibration and
the microwave-sky conversions at the CMB temperature.

Every function here is the Rust core's function of the same name with the same arguments in
the same order; this module only converts, broadcasts and loops (in one native call; the loop
runs in Rust, with the GIL released unless it is short: under 4096 elements for the functions
with a SIMD array form, under 64 for the others). Units are SI: wavelength in m, frequency in Hz, wavenumber in m^-1 (not
cm^-1), temperature in K, spectral radiance in W m^-2 sr^-1 per unit of the spectral variable.
Each function's docstring is the core's documentation of it (``src/blackbody/``): purpose,
arguments with units, result, errors, accuracy (measured against mpmath) and reference. The
errors it names in the core's terms (``NonPositive(i)``, ``i`` the argument position from 0)
are raised as described below.

Inputs and results
------------------
Arguments are scalars, sequences or numpy arrays of any shape, broadcast together by numpy's
rules. When every argument is a scalar (Python or numpy) the result is a Python ``float``;
otherwise it is a new ``ndarray`` of the broadcast shape (a 0-d array when every argument is a
0-d array or a scalar and at least one is an array).

Precision follows numpy's promotion rules (NEP 50) where the core has a single-precision
twin: the functions whose C and Fortran faces have ``_f32`` forms (the three spectral
radiances, ``photon_number_density``, ``radiation_energy_density``,
``band_radiance_wavelength``, the two brightness temperatures, the measured radiances, the
object temperatures and ``object_temperature_{wavelength,frequency}_with_uncertainty``;
``relicore._native.Function.single`` says which) compute float32 input with that twin and
return float32 (the fields of a ``TemperatureUncertainty`` too), bit for bit the C
``relicore_*_f32`` functions, when every array or numpy-scalar argument is float32 (Python
numbers take the arrays' precision); numpy float32 scalars alone give ``numpy.float32``
scalars. Every other call, and every other function (the other ``_with_uncertainty`` forms
included), converts its arguments to float64 and returns float64: integers, bool, float16,
float32 mixed with float64, and float32 input to a function without a twin.

Errors
------
Invalid input raises :class:`relicore.RelicoreError` (a ``ValueError``) naming the function,
the argument, its value and, for arrays, the index of the first offending element in the
broadcast shape, e.g. ``spectral_radiance_wavelength: temperature_k = -3.0 at index 5: must be
positive``. With ``nan_on_error=True`` an element that fails gets NaN instead and every other
element is the exact value it would have had alone; a scalar call returns NaN. Errors in
arguments shared by all elements (a response table, a calibration) always raise.

Cautions
--------
A brightness or thermometer temperature is that of a blackbody of the same radiance; a real
surface with emissivity below 1 is hotter. Radiation thermometry trusted beyond its emissivity
and calibration can hurt people (fever screening, furnace and molten-metal work, fire safety):
follow the applicable standards, local codes and licensed practice.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from relicore import _blackbody, _native
from relicore._blackbody import *  # noqa: F403 (the regular functions, generated from the table)
from relicore._elementwise import SCALAR_TYPES as _SCALAR_TYPES
from relicore._elementwise import contiguous as _contiguous
from relicore._native import TwoLoadCalibration
from relicore._results import TemperatureUncertainty
from relicore._thermometry import *  # noqa: F403 (the response-table and array-uncertainty thermometry forms)
from relicore import _thermometry


def _apply_one(call: Any, value: Any) -> Any:
    """Loops a function of one element-wise argument (the others shared) over `value`."""
    scalar = isinstance(value, _SCALAR_TYPES)
    a = np.asarray(value, dtype=np.float64)
    out = np.empty(a.shape, dtype=np.float64)
    call(_contiguous(a).reshape(-1), out.reshape(-1), a.shape)
    return float(out[()]) if scalar else out


def _table(t: Any) -> np.ndarray[Any, Any]:
    """A response table as a float64 array, contiguous; its shape is checked by the core's face."""
    return _contiguous(np.asarray(t, dtype=np.float64))


# --- response-weighted radiance ------------------------------------------------------------


def response_weighted_radiance(
    wavelengths_m: Any, response: Any, temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """Response-weighted radiance, the integral of r(lambda) B_lambda(lambda, T), W m^-2 sr^-1
    (times the unit of the response).

    wavelengths_m: 1-D, strictly increasing, m, > 0, at least 2 points. response: 1-D, same
    length, >= 0, linear between the points and zero outside. temperature_k: K, > 0, scalar
    or array (the result has its shape). Accuracy: 1e-13 relative.
    """
    w, r = _table(wavelengths_m), _table(response)
    return _apply_one(
        lambda v, out, shape: _native.table_map("response_weighted_radiance", w, r, v, out, shape, nan_on_error),
        temperature_k,
    )


def temperature_from_response_weighted_radiance(
    wavelengths_m: Any, response: Any, radiance: Any, *, nan_on_error: bool = False
) -> Any:
    """Temperature of the blackbody whose response-weighted radiance equals `radiance`, K.

    wavelengths_m, response: the response table as for `response_weighted_radiance`.
    radiance: > 0, scalar or array. Accuracy: round trip within 1e-14 relative.
    """
    w, r = _table(wavelengths_m), _table(response)
    name = "temperature_from_response_weighted_radiance"
    return _apply_one(lambda v, out, shape: _native.table_map(name, w, r, v, out, shape, nan_on_error), radiance)


# --- two-load calibration ------------------------------------------------------------------


def two_load_calibration(
    frequency_hz: float,
    reading_hot: float,
    temperature_hot_k: float,
    reading_cold: float,
    temperature_cold_k: float,
) -> TwoLoadCalibration:
    """Calibrates a radiometer channel from two blackbody loads (scalars).

    frequency_hz: channel frequency, Hz, > 0. reading_hot, reading_cold: raw readings (any
    linear unit) viewing the hot and the cold load, different. temperature_hot_k,
    temperature_cold_k: physical load temperatures, K, 0 < cold < hot. Returns the frozen,
    picklable TwoLoadCalibration (reading = gain * J + offset, J the Rayleigh-Jeans brightness
    temperature in K).
    """
    return _native.two_load_calibration(
        frequency_hz, reading_hot, temperature_hot_k, reading_cold, temperature_cold_k
    )


def calibrated_brightness_temperature(
    calibration: TwoLoadCalibration, reading: Any, *, nan_on_error: bool = False
) -> Any:
    """Rayleigh-Jeans brightness temperature (reading - offset)/gain of the scene, K (may be
    <= 0 for readings below the zero-radiance level).

    calibration: from `two_load_calibration`. reading: raw reading, finite, scalar or array.
    """
    name = "calibrated_brightness_temperature"
    return _apply_one(lambda v, out, shape: _native.calibrated_map(name, calibration, v, out, shape, nan_on_error), reading)


def calibrated_temperature(calibration: TwoLoadCalibration, reading: Any, *, nan_on_error: bool = False) -> Any:
    """Physical temperature of a blackbody scene from a raw reading, K, > 0.

    calibration: from `two_load_calibration`. reading: raw reading, finite, scalar or array;
    a reading at or below the zero-radiance level is outside the domain.
    """
    name = "calibrated_temperature"
    return _apply_one(lambda v, out, shape: _native.calibrated_map(name, calibration, v, out, shape, nan_on_error), reading)


__all__ = sorted(
    [
        *_blackbody.__all__,
        *_thermometry.__all__,
        "TemperatureUncertainty",
        "TwoLoadCalibration",
        "calibrated_brightness_temperature",
        "calibrated_temperature",
        "response_weighted_radiance",
        "temperature_from_response_weighted_radiance",
        "two_load_calibration",
    ]
)
