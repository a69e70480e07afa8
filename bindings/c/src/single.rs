//! `float` twins of the blackbody functions firmware uses (DESIGN 3): the same core code
//! instantiated for `f32`, so a microcontroller with a single-precision FPU computes in
//! single precision throughout. Accuracy in `f32` ulps (2^-23 relative) where stated, else
//! relative to the `f32` rounding of the exact value.

use crate::boundary::scalar;
use relicore::blackbody as bb;

/// `float` twin of `relicore_spectral_radiance_wavelength`. Planck spectral radiance per unit
/// wavelength, B_λ = 2hc²/λ⁵ / (e^(hc/λkT) − 1).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: B_λ in W m⁻² sr⁻¹ m⁻¹, ≥ 0 (0 only where the true value is
///   below the smallest subnormal).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 f32 ulp against mpmath for wavelengths 2e-7 … 1e-1 m (normal results).
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavelength_f32(
    wavelength_m: f32,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_wavelength(wavelength_m, temperature_k)
        })
    }
}

/// `float` twin of `relicore_spectral_radiance_frequency`. Planck spectral radiance per unit
/// frequency, B_ν = (2hν³/c²) / (e^(hν/kT) − 1).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: B_ν in W m⁻² sr⁻¹ Hz⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 f32 ulp against mpmath for frequencies 1e9 … 3e14 Hz (normal results).
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_frequency_f32(
    frequency_hz: f32,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_frequency(frequency_hz, temperature_k)
        })
    }
}

/// `float` twin of `relicore_spectral_radiance_wavenumber`. Planck spectral radiance per unit
/// wavenumber, B_ṽ = 2hc²ṽ³ / (e^(hcṽ/kT) − 1).
///
/// * `wavenumber_per_m`: wavenumber ṽ = 1/λ in m⁻¹ (not cm⁻¹), finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: B_ṽ in W m⁻² sr⁻¹ per m⁻¹ (W m⁻¹ sr⁻¹), ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 f32 ulp against mpmath for wavenumbers 1e2 … 5e6 m⁻¹ (normal results).
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavenumber_f32(
    wavenumber_per_m: f32,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_wavenumber(wavenumber_per_m, temperature_k)
        })
    }
}

/// `float` twin of `relicore_band_radiance_wavelength`. Band radiance between two wavelengths, L =
/// ∫_{λ₁}^{λ₂} B_λ(λ, T) dλ.
///
/// * `lower_m`: lower band edge λ₁ in m, finite and ≥ 0 (0: from the start of the spectrum).
/// * `upper_m`: upper band edge λ₂ in m, > λ₁; +∞ allowed (to the end of the spectrum).
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: L in W m⁻² sr⁻¹.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument (the upper edge
/// may be +∞); `RELICORE_ERROR_NEGATIVE` for a lower edge < 0; `RELICORE_ERROR_EMPTY_INTERVAL` for
/// upper ≤ lower; `RELICORE_ERROR_NON_POSITIVE` for T ≤ 0.
///
/// Accuracy: within 2e-6 relative against mpmath quadrature.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_band_radiance_wavelength_f32(
    lower_m: f32,
    upper_m: f32,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::band_radiance_wavelength(lower_m, upper_m, temperature_k)
        })
    }
}

/// `float` twin of `relicore_brightness_temperature_wavelength`. Brightness temperature at a
/// wavelength: the T of the blackbody whose B_λ equals the given spectral radiance, T = c₂ / (λ
/// ln(1 + 2hc²/(λ⁵ L))).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `spectral_radiance`: spectral radiance L in W m⁻² sr⁻¹ m⁻¹, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 f32 ulp against mpmath (normal-range radiances).
///
/// Reference: Planck's law solved for T (closed form). A real surface with emissivity < 1 is hotter
/// than its brightness temperature: do not use for safety decisions without the emissivity,
/// calibration and procedure the applicable standards require.
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_wavelength_f32(
    wavelength_m: f32,
    spectral_radiance: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::brightness_temperature_wavelength(wavelength_m, spectral_radiance)
        })
    }
}

/// `float` twin of `relicore_brightness_temperature_frequency`. Brightness temperature at a
/// frequency: T = (hν/k) / ln(1 + 2hν³/(c² L)).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `spectral_radiance`: spectral radiance L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 f32 ulp against mpmath (normal-range radiances).
///
/// Reference: Planck's law solved for T (closed form).
///
/// # Safety
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_frequency_f32(
    frequency_hz: f32,
    spectral_radiance: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::brightness_temperature_frequency(frequency_hz, spectral_radiance)
        })
    }
}
