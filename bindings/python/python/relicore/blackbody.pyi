"""Type stubs for relicore.blackbody (hand-kept; tests/python/test_stubs.py checks them against
the module). Element-wise arguments take scalars, sequences or arrays: all scalars give a float,
anything else a float64 ndarray of the broadcast shape."""

from typing import Any, Final, TypeAlias, final, overload

import numpy as np
from numpy.typing import ArrayLike, NDArray

_Scalar: TypeAlias = float | int | np.floating[Any] | np.integer[Any]
_Array: TypeAlias = NDArray[np.float64]

@final
class TwoLoadCalibration:
    """Gain and offset of a two-load radiometer calibration: reading = gain * J + offset."""

    def __new__(cls, frequency_hz: float, gain: float, offset: float) -> TwoLoadCalibration: ...
    @property
    def frequency_hz(self) -> float: ...
    @property
    def gain(self) -> float: ...
    @property
    def offset(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __reduce__(self) -> tuple[type[TwoLoadCalibration], tuple[float, float, float]]: ...

def two_load_calibration(
    frequency_hz: float,
    reading_hot: float,
    temperature_hot_k: float,
    reading_cold: float,
    temperature_cold_k: float,
) -> TwoLoadCalibration: ...

@overload
def band_fraction_wavelength(  # type: ignore[overload-overlap]
    lower_m: _Scalar,
    upper_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def band_fraction_wavelength(
    lower_m: ArrayLike,
    upper_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def band_photon_radiance_wavelength(  # type: ignore[overload-overlap]
    lower_m: _Scalar,
    upper_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def band_photon_radiance_wavelength(
    lower_m: ArrayLike,
    upper_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def band_radiance_frequency(  # type: ignore[overload-overlap]
    lower_hz: _Scalar,
    upper_hz: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def band_radiance_frequency(
    lower_hz: ArrayLike,
    upper_hz: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def band_radiance_wavelength(  # type: ignore[overload-overlap]
    lower_m: _Scalar,
    upper_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def band_radiance_wavelength(
    lower_m: ArrayLike,
    upper_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def brightness_temperature_frequency(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    spectral_radiance: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def brightness_temperature_frequency(
    frequency_hz: ArrayLike,
    spectral_radiance: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def brightness_temperature_wavelength(  # type: ignore[overload-overlap]
    wavelength_m: _Scalar,
    spectral_radiance: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def brightness_temperature_wavelength(
    wavelength_m: ArrayLike,
    spectral_radiance: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def calibrated_brightness_temperature(  # type: ignore[overload-overlap]
    calibration: TwoLoadCalibration,
    reading: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def calibrated_brightness_temperature(
    calibration: TwoLoadCalibration,
    reading: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def calibrated_temperature(  # type: ignore[overload-overlap]
    calibration: TwoLoadCalibration,
    reading: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def calibrated_temperature(
    calibration: TwoLoadCalibration,
    reading: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def kcmb_to_mjy_per_sr(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    cmb_temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def kcmb_to_mjy_per_sr(
    frequency_hz: ArrayLike,
    cmb_temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def peak_frequency(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def peak_frequency(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def peak_wavelength(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def peak_wavelength(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def peak_wavenumber(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def peak_wavenumber(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def photon_exitance(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_exitance(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def photon_peak_frequency(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_peak_frequency(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def photon_peak_wavelength(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_peak_wavelength(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def photon_radiance_frequency(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_radiance_frequency(
    frequency_hz: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def photon_radiance_wavelength(  # type: ignore[overload-overlap]
    wavelength_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_radiance_wavelength(
    wavelength_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def photon_radiance_wavenumber(  # type: ignore[overload-overlap]
    wavenumber_per_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def photon_radiance_wavenumber(
    wavenumber_per_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def radiance_temperature_derivative_frequency(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def radiance_temperature_derivative_frequency(
    frequency_hz: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def radiance_temperature_derivative_wavelength(  # type: ignore[overload-overlap]
    wavelength_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def radiance_temperature_derivative_wavelength(
    wavelength_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def radiant_exitance(  # type: ignore[overload-overlap]
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def radiant_exitance(temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def ratio_temperature(  # type: ignore[overload-overlap]
    wavelength_1_m: _Scalar,
    wavelength_2_m: _Scalar,
    radiance_ratio: _Scalar,
    emissivity_ratio: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def ratio_temperature(
    wavelength_1_m: ArrayLike,
    wavelength_2_m: ArrayLike,
    radiance_ratio: ArrayLike,
    emissivity_ratio: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def rayleigh_jeans_temperature(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    spectral_radiance: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def rayleigh_jeans_temperature(
    frequency_hz: ArrayLike,
    spectral_radiance: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def response_weighted_radiance(  # type: ignore[overload-overlap]
    wavelengths_m: ArrayLike,
    response: ArrayLike,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def response_weighted_radiance(
    wavelengths_m: ArrayLike,
    response: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def spectral_radiance_frequency(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def spectral_radiance_frequency(
    frequency_hz: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def spectral_radiance_wavelength(  # type: ignore[overload-overlap]
    wavelength_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def spectral_radiance_wavelength(
    wavelength_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def spectral_radiance_wavenumber(  # type: ignore[overload-overlap]
    wavenumber_per_m: _Scalar,
    temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def spectral_radiance_wavenumber(
    wavenumber_per_m: ArrayLike,
    temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def temperature_from_band_radiance_wavelength(  # type: ignore[overload-overlap]
    lower_m: _Scalar,
    upper_m: _Scalar,
    radiance: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def temperature_from_band_radiance_wavelength(
    lower_m: ArrayLike,
    upper_m: ArrayLike,
    radiance: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def temperature_from_peak_frequency(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def temperature_from_peak_frequency(
    frequency_hz: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def temperature_from_peak_wavelength(  # type: ignore[overload-overlap]
    wavelength_m: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def temperature_from_peak_wavelength(
    wavelength_m: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def temperature_from_response_weighted_radiance(  # type: ignore[overload-overlap]
    wavelengths_m: ArrayLike,
    response: ArrayLike,
    radiance: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def temperature_from_response_weighted_radiance(
    wavelengths_m: ArrayLike,
    response: ArrayLike,
    radiance: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def thermal_sz_null_frequency(  # type: ignore[overload-overlap]
    cmb_temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def thermal_sz_null_frequency(
    cmb_temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def thermal_sz_spectral_shape(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    cmb_temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def thermal_sz_spectral_shape(
    frequency_hz: ArrayLike,
    cmb_temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def thermal_sz_temperature_shape(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    cmb_temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def thermal_sz_temperature_shape(
    frequency_hz: ArrayLike,
    cmb_temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...
@overload
def thermodynamic_to_rayleigh_jeans_factor(  # type: ignore[overload-overlap]
    frequency_hz: _Scalar,
    cmb_temperature_k: _Scalar,
    *,
    nan_on_error: bool = False,
) -> float: ...
@overload
def thermodynamic_to_rayleigh_jeans_factor(
    frequency_hz: ArrayLike,
    cmb_temperature_k: ArrayLike,
    *,
    nan_on_error: bool = False,
) -> _Array: ...

__all__: Final[list[str]]
