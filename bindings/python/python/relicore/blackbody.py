"""Blackbody radiometry: Planck's law in every form, exitances, peaks, band integrals,
inversions to temperature, response-weighted radiance, two-load radiometer calibration and
the microwave-sky conversions at the CMB temperature.

Every function here is the Rust core's function of the same name with the same arguments in
the same order; this module only converts, broadcasts and loops (the loop runs in Rust with
the GIL released). Units are SI: wavelength in m, frequency in Hz, wavenumber in m^-1 (not
cm^-1), temperature in K, spectral radiance in W m^-2 sr^-1 per unit of the spectral variable.
Accuracy, domain and references of each function are documented in the core
(``src/blackbody/``); the accuracy quoted below is the core's, measured against mpmath.

Inputs and results
------------------
Arguments are scalars, sequences or numpy arrays of any shape; they are converted to float64
and broadcast together by numpy's rules. When every argument is a scalar (Python or numpy) the
result is a Python ``float``; otherwise it is a new float64 ``ndarray`` of the broadcast shape
(a 0-d array when every argument is a 0-d array or a scalar and at least one is an array).

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

from relicore import _native
from relicore._elementwise import SCALAR_TYPES as _SCALAR_TYPES
from relicore._elementwise import contiguous as _contiguous
from relicore._elementwise import float_arrays as _float_arrays
from relicore._elementwise import operand as _operand
from relicore._native import TwoLoadCalibration

_K = {name: _native.kernel(name) for name, _ in _native.kernel_signatures() if name != "two_load_calibration"}
_ARGS = dict(_native.kernel_signatures())


def _apply(kernel: Any, args: tuple[Any, ...], nan_on_error: bool) -> Any:
    if all(isinstance(a, _SCALAR_TYPES) for a in args):
        return kernel.call(args, nan_on_error)
    arrays, shape = _float_arrays(kernel.name, _ARGS[kernel.name], args)
    out = np.empty(shape, dtype=np.float64)
    kernel.map([_operand(a, shape) for a in arrays], out.reshape(-1), shape, nan_on_error)
    return out


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


# --- Planck's law --------------------------------------------------------------------------


def spectral_radiance_wavelength(wavelength_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Planck spectral radiance per unit wavelength B_lambda, W m^-2 sr^-1 m^-1.

    wavelength_m: m, > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp for normal results.
    """
    return _apply(_K["spectral_radiance_wavelength"], (wavelength_m, temperature_k), nan_on_error)


def spectral_radiance_frequency(frequency_hz: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Planck spectral radiance per unit frequency B_nu, W m^-2 sr^-1 Hz^-1.

    frequency_hz: Hz, > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp for normal results.
    """
    return _apply(_K["spectral_radiance_frequency"], (frequency_hz, temperature_k), nan_on_error)


def spectral_radiance_wavenumber(wavenumber_per_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Planck spectral radiance per unit wavenumber, W m^-2 sr^-1 per m^-1.

    wavenumber_per_m: m^-1 (not cm^-1), > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp.
    """
    return _apply(_K["spectral_radiance_wavenumber"], (wavenumber_per_m, temperature_k), nan_on_error)


def photon_radiance_wavelength(wavelength_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Photon spectral radiance per unit wavelength N_lambda, photons s^-1 m^-2 sr^-1 m^-1.

    wavelength_m: m, > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp for normal results.
    """
    return _apply(_K["photon_radiance_wavelength"], (wavelength_m, temperature_k), nan_on_error)


def photon_radiance_frequency(frequency_hz: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Photon spectral radiance per unit frequency N_nu, photons s^-1 m^-2 sr^-1 Hz^-1.

    frequency_hz: Hz, > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp for normal results.
    """
    return _apply(_K["photon_radiance_frequency"], (frequency_hz, temperature_k), nan_on_error)


def photon_radiance_wavenumber(wavenumber_per_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Photon spectral radiance per unit wavenumber, photons s^-1 m^-2 sr^-1 per m^-1.

    wavenumber_per_m: m^-1, > 0. temperature_k: K, > 0. Accuracy: <= 4 ulp.
    """
    return _apply(_K["photon_radiance_wavenumber"], (wavenumber_per_m, temperature_k), nan_on_error)


def radiance_temperature_derivative_wavelength(
    wavelength_m: Any, temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """dB_lambda/dT, W m^-2 sr^-1 m^-1 K^-1.

    wavelength_m: m, > 0. temperature_k: K, > 0. Accuracy: <= 8 ulp for normal results.
    """
    return _apply(_K["radiance_temperature_derivative_wavelength"], (wavelength_m, temperature_k), nan_on_error)


def radiance_temperature_derivative_frequency(
    frequency_hz: Any, temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """dB_nu/dT, W m^-2 sr^-1 Hz^-1 K^-1.

    frequency_hz: Hz, > 0. temperature_k: K, > 0. Accuracy: <= 8 ulp for normal results.
    """
    return _apply(_K["radiance_temperature_derivative_frequency"], (frequency_hz, temperature_k), nan_on_error)


# --- exitance and peaks --------------------------------------------------------------------


def radiant_exitance(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Radiant exitance sigma T^4 (Stefan-Boltzmann law), W m^-2. temperature_k: K, > 0."""
    return _apply(_K["radiant_exitance"], (temperature_k,), nan_on_error)


def photon_exitance(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Photon exitance 4 pi zeta(3) k^3 T^3/(h^3 c^2), photons s^-1 m^-2. temperature_k: K, > 0."""
    return _apply(_K["photon_exitance"], (temperature_k,), nan_on_error)


def peak_wavelength(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Wavelength of the maximum of B_lambda (Wien's displacement law), m. temperature_k: K, > 0."""
    return _apply(_K["peak_wavelength"], (temperature_k,), nan_on_error)


def peak_frequency(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Frequency of the maximum of B_nu, Hz. temperature_k: K, > 0."""
    return _apply(_K["peak_frequency"], (temperature_k,), nan_on_error)


def peak_wavenumber(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Wavenumber of the maximum of the wavenumber form, m^-1. temperature_k: K, > 0."""
    return _apply(_K["peak_wavenumber"], (temperature_k,), nan_on_error)


def photon_peak_wavelength(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Wavelength of the maximum of N_lambda (and of lambda B_lambda), m. temperature_k: K, > 0."""
    return _apply(_K["photon_peak_wavelength"], (temperature_k,), nan_on_error)


def photon_peak_frequency(temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Frequency of the maximum of N_nu, Hz. temperature_k: K, > 0."""
    return _apply(_K["photon_peak_frequency"], (temperature_k,), nan_on_error)


def temperature_from_peak_wavelength(wavelength_m: Any, *, nan_on_error: bool = False) -> Any:
    """Temperature whose B_lambda peaks at the given wavelength, K. wavelength_m: m, > 0."""
    return _apply(_K["temperature_from_peak_wavelength"], (wavelength_m,), nan_on_error)


def temperature_from_peak_frequency(frequency_hz: Any, *, nan_on_error: bool = False) -> Any:
    """Temperature whose B_nu peaks at the given frequency, K. frequency_hz: Hz, > 0."""
    return _apply(_K["temperature_from_peak_frequency"], (frequency_hz,), nan_on_error)


# --- band integrals ------------------------------------------------------------------------


def band_fraction_wavelength(lower_m: Any, upper_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Fraction of the total blackbody radiance between two wavelengths, in [0, 1].

    lower_m: m, >= 0 (0 = from the start). upper_m: m, > lower_m, +inf allowed.
    temperature_k: K, > 0. Accuracy: 1e-15 absolute.
    """
    return _apply(_K["band_fraction_wavelength"], (lower_m, upper_m, temperature_k), nan_on_error)


def band_radiance_wavelength(lower_m: Any, upper_m: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Radiance between two wavelengths, the integral of B_lambda, W m^-2 sr^-1.

    lower_m: m, >= 0. upper_m: m, > lower_m, +inf allowed. temperature_k: K, > 0.
    """
    return _apply(_K["band_radiance_wavelength"], (lower_m, upper_m, temperature_k), nan_on_error)


def band_photon_radiance_wavelength(
    lower_m: Any, upper_m: Any, temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """Photon radiance between two wavelengths, the integral of N_lambda, photons s^-1 m^-2 sr^-1.

    lower_m: m, >= 0. upper_m: m, > lower_m, +inf allowed. temperature_k: K, > 0.
    """
    return _apply(_K["band_photon_radiance_wavelength"], (lower_m, upper_m, temperature_k), nan_on_error)


def band_radiance_frequency(lower_hz: Any, upper_hz: Any, temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Radiance between two frequencies, the integral of B_nu, W m^-2 sr^-1.

    lower_hz: Hz, >= 0. upper_hz: Hz, > lower_hz, +inf allowed. temperature_k: K, > 0.
    """
    return _apply(_K["band_radiance_frequency"], (lower_hz, upper_hz, temperature_k), nan_on_error)


def temperature_from_band_radiance_wavelength(
    lower_m: Any, upper_m: Any, radiance: Any, *, nan_on_error: bool = False
) -> Any:
    """Temperature whose band radiance between two wavelengths equals `radiance`, K.

    lower_m, upper_m: band edges in m, 0 <= lower_m < upper_m <= +inf.
    radiance: W m^-2 sr^-1, > 0. Accuracy: round trip within 1e-14 relative.
    """
    return _apply(_K["temperature_from_band_radiance_wavelength"], (lower_m, upper_m, radiance), nan_on_error)


# --- temperatures from radiance ------------------------------------------------------------


def brightness_temperature_wavelength(
    wavelength_m: Any, spectral_radiance: Any, *, nan_on_error: bool = False
) -> Any:
    """Brightness temperature: the T whose B_lambda equals the given spectral radiance, K.

    wavelength_m: m, > 0. spectral_radiance: W m^-2 sr^-1 m^-1, > 0.
    """
    return _apply(_K["brightness_temperature_wavelength"], (wavelength_m, spectral_radiance), nan_on_error)


def brightness_temperature_frequency(frequency_hz: Any, spectral_radiance: Any, *, nan_on_error: bool = False) -> Any:
    """Brightness temperature: the T whose B_nu equals the given spectral radiance, K.

    frequency_hz: Hz, > 0. spectral_radiance: W m^-2 sr^-1 Hz^-1, > 0.
    """
    return _apply(_K["brightness_temperature_frequency"], (frequency_hz, spectral_radiance), nan_on_error)


def rayleigh_jeans_temperature(frequency_hz: Any, spectral_radiance: Any, *, nan_on_error: bool = False) -> Any:
    """Rayleigh-Jeans temperature c^2 L / (2 k nu^2), K.

    frequency_hz: Hz, > 0. spectral_radiance: W m^-2 sr^-1 Hz^-1, > 0.
    """
    return _apply(_K["rayleigh_jeans_temperature"], (frequency_hz, spectral_radiance), nan_on_error)


def ratio_temperature(
    wavelength_1_m: Any,
    wavelength_2_m: Any,
    radiance_ratio: Any,
    emissivity_ratio: Any,
    *,
    nan_on_error: bool = False,
) -> Any:
    """Two-colour (ratio) temperature with the exact Planck law, K.

    wavelength_1_m, wavelength_2_m: m, > 0, different. radiance_ratio: L(l1)/L(l2), > 0.
    emissivity_ratio: eps(l1)/eps(l2), > 0 (1 for a gray body). A ratio no blackbody can
    produce is outside the domain.
    """
    return _apply(
        _K["ratio_temperature"], (wavelength_1_m, wavelength_2_m, radiance_ratio, emissivity_ratio), nan_on_error
    )


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
    k = _K["response_weighted_radiance"]
    w, r = _table(wavelengths_m), _table(response)
    return _apply_one(lambda v, out, shape: k.map_table(w, r, v, out, shape, nan_on_error), temperature_k)


def temperature_from_response_weighted_radiance(
    wavelengths_m: Any, response: Any, radiance: Any, *, nan_on_error: bool = False
) -> Any:
    """Temperature of the blackbody whose response-weighted radiance equals `radiance`, K.

    wavelengths_m, response: the response table as for `response_weighted_radiance`.
    radiance: > 0, scalar or array. Accuracy: round trip within 1e-14 relative.
    """
    k = _K["temperature_from_response_weighted_radiance"]
    w, r = _table(wavelengths_m), _table(response)
    return _apply_one(lambda v, out, shape: k.map_table(w, r, v, out, shape, nan_on_error), radiance)


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
    k = _K["calibrated_brightness_temperature"]
    return _apply_one(lambda v, out, shape: k.map_calibrated(calibration, v, out, shape, nan_on_error), reading)


def calibrated_temperature(calibration: TwoLoadCalibration, reading: Any, *, nan_on_error: bool = False) -> Any:
    """Physical temperature of a blackbody scene from a raw reading, K, > 0.

    calibration: from `two_load_calibration`. reading: raw reading, finite, scalar or array;
    a reading at or below the zero-radiance level is outside the domain.
    """
    k = _K["calibrated_temperature"]
    return _apply_one(lambda v, out, shape: k.map_calibrated(calibration, v, out, shape, nan_on_error), reading)


# --- microwave sky -------------------------------------------------------------------------


def thermodynamic_to_rayleigh_jeans_factor(
    frequency_hz: Any, cmb_temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """dT_RJ/dT_CMB = x^2 e^x/(e^x - 1)^2 with x = h nu/(k T0), in (0, 1).

    frequency_hz: Hz, > 0. cmb_temperature_k: T0 in K, > 0 (2.72548 K today, Fixsen 2009).
    """
    return _apply(_K["thermodynamic_to_rayleigh_jeans_factor"], (frequency_hz, cmb_temperature_k), nan_on_error)


def kcmb_to_mjy_per_sr(frequency_hz: Any, cmb_temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """dB_nu/dT at the CMB temperature, MJy sr^-1 per K_CMB.

    frequency_hz: Hz, > 0. cmb_temperature_k: K, > 0.
    """
    return _apply(_K["kcmb_to_mjy_per_sr"], (frequency_hz, cmb_temperature_k), nan_on_error)


def thermal_sz_spectral_shape(frequency_hz: Any, cmb_temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Thermal Sunyaev-Zeldovich intensity shape g(x) = x^4 e^x/(e^x - 1)^2 (x coth(x/2) - 4).

    frequency_hz: Hz, > 0. cmb_temperature_k: K, > 0.
    """
    return _apply(_K["thermal_sz_spectral_shape"], (frequency_hz, cmb_temperature_k), nan_on_error)


def thermal_sz_temperature_shape(frequency_hz: Any, cmb_temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Thermal Sunyaev-Zeldovich temperature shape f(x) = x coth(x/2) - 4.

    frequency_hz: Hz, > 0. cmb_temperature_k: K, > 0.
    """
    return _apply(_K["thermal_sz_temperature_shape"], (frequency_hz, cmb_temperature_k), nan_on_error)


def thermal_sz_null_frequency(cmb_temperature_k: Any, *, nan_on_error: bool = False) -> Any:
    """Frequency of the null of the thermal SZ distortion, Hz. cmb_temperature_k: K, > 0."""
    return _apply(_K["thermal_sz_null_frequency"], (cmb_temperature_k,), nan_on_error)


__all__ = [
    "TwoLoadCalibration",
    "band_fraction_wavelength",
    "band_photon_radiance_wavelength",
    "band_radiance_frequency",
    "band_radiance_wavelength",
    "brightness_temperature_frequency",
    "brightness_temperature_wavelength",
    "calibrated_brightness_temperature",
    "calibrated_temperature",
    "kcmb_to_mjy_per_sr",
    "peak_frequency",
    "peak_wavelength",
    "peak_wavenumber",
    "photon_exitance",
    "photon_peak_frequency",
    "photon_peak_wavelength",
    "photon_radiance_frequency",
    "photon_radiance_wavelength",
    "photon_radiance_wavenumber",
    "radiance_temperature_derivative_frequency",
    "radiance_temperature_derivative_wavelength",
    "radiant_exitance",
    "ratio_temperature",
    "rayleigh_jeans_temperature",
    "response_weighted_radiance",
    "spectral_radiance_frequency",
    "spectral_radiance_wavelength",
    "spectral_radiance_wavenumber",
    "temperature_from_band_radiance_wavelength",
    "temperature_from_peak_frequency",
    "temperature_from_peak_wavelength",
    "temperature_from_response_weighted_radiance",
    "thermal_sz_null_frequency",
    "thermal_sz_spectral_shape",
    "thermal_sz_temperature_shape",
    "thermodynamic_to_rayleigh_jeans_factor",
    "two_load_calibration",
]
