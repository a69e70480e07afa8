//! The blackbody scalar functions in `double`: one export per public function of
//! `relicore::blackbody`, same name (with the `relicore_` prefix) and argument order, the
//! result through `out`. Array forms are in `array`, `float` twins in `single`, the response
//! and calibration functions in their own modules.

use crate::boundary::scalar;
use relicore::blackbody as bb;

/// Planck spectral radiance per unit wavelength, B_λ = 2hc²/λ⁵ / (e^(hc/λkT) − 1).
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
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavelength(
    wavelength_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_wavelength(wavelength_m, temperature_k)
        })
    }
}

/// Planck spectral radiance per unit frequency, B_ν = (2hν³/c²) / (e^(hν/kT) − 1).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: B_ν in W m⁻² sr⁻¹ Hz⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_frequency(
    frequency_hz: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_frequency(frequency_hz, temperature_k)
        })
    }
}

/// Planck spectral radiance per unit wavenumber, B_ṽ = 2hc²ṽ³ / (e^(hcṽ/kT) − 1).
///
/// * `wavenumber_per_m`: wavenumber ṽ = 1/λ in m⁻¹ (not cm⁻¹), finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: B_ṽ in W m⁻² sr⁻¹ per m⁻¹ (W m⁻¹ sr⁻¹), ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_spectral_radiance_wavenumber(
    wavenumber_per_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::spectral_radiance_wavenumber(wavenumber_per_m, temperature_k)
        })
    }
}

/// Photon spectral radiance per unit wavelength, N_λ = (2c/λ⁴) / (e^x − 1), x = hc/(λkT).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: N_λ in photons s⁻¹ m⁻² sr⁻¹ m⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_wavelength(
    wavelength_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::photon_radiance_wavelength(wavelength_m, temperature_k)
        })
    }
}

/// Photon spectral radiance per unit frequency, N_ν = (2ν²/c²) / (e^(hν/kT) − 1).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: N_ν in photons s⁻¹ m⁻² sr⁻¹ Hz⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_frequency(
    frequency_hz: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::photon_radiance_frequency(frequency_hz, temperature_k)
        })
    }
}

/// Photon spectral radiance per unit wavenumber, N_ṽ = 2cṽ² / (e^(hcṽ/kT) − 1).
///
/// * `wavenumber_per_m`: wavenumber ṽ = 1/λ in m⁻¹ (not cm⁻¹), finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: N_ṽ in photons s⁻¹ m⁻² sr⁻¹ per m⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 4 ulp (normal results) against mpmath at 50 digits over x = 1e-10 … 1e3, T = 1 … 1e6
/// K; subnormal results correctly scaled or 0.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_radiance_wavenumber(
    wavenumber_per_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::photon_radiance_wavenumber(wavenumber_per_m, temperature_k)
        })
    }
}

/// Temperature derivative of B_λ: ∂B_λ/∂T = B_λ · (x/T) / (1 − e^−x), x = hc/(λkT).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: ∂B_λ/∂T in W m⁻² sr⁻¹ m⁻¹ K⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 8 ulp (normal results) against mpmath at 50 digits.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_radiance_temperature_derivative_wavelength(
    wavelength_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::radiance_temperature_derivative_wavelength(wavelength_m, temperature_k)
        })
    }
}

/// Temperature derivative of B_ν: ∂B_ν/∂T = B_ν · (x/T) / (1 − e^−x), x = hν/(kT).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: ∂B_ν/∂T in W m⁻² sr⁻¹ Hz⁻¹ K⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 8 ulp (normal results) against mpmath at 50 digits.
///
/// Reference: M. Planck, Ann. Phys. 309 (1901) 553; forms as in Modest, Radiative Heat Transfer,
/// 3rd ed. 2013, ch. 1. Exact SI 2019 h, c, k.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_radiance_temperature_derivative_frequency(
    frequency_hz: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::radiance_temperature_derivative_frequency(frequency_hz, temperature_k)
        })
    }
}

/// Radiant exitance of a blackbody, M = σT⁴ (Stefan-Boltzmann law).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: M in W m⁻².
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 2 ulp against mpmath (T⁴ formed to double length).
///
/// Reference: J. Stefan (1879); L. Boltzmann (1884).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_radiant_exitance(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::radiant_exitance(temperature_k)) }
}

/// Photon exitance of a blackbody, M_p = 4πζ(3)k³T³/(h³c²).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: M_p in photons s⁻¹ m⁻².
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 2 ulp against mpmath.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_exitance(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::photon_exitance(temperature_k)) }
}

/// Wavelength of the maximum of B_λ, λ_max = b/T with b = c₂/x₅, x₅ = 5(1 − e^−x₅) (Wien's
/// displacement law).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: λ_max in m.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// Reference: W. Wien (1893); roots x = n(1 − e^−x) computed with mpmath.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_peak_wavelength(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::peak_wavelength(temperature_k)) }
}

/// Frequency of the maximum of B_ν, ν_max = x₃kT/h, x₃ = 3(1 − e^−x₃).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: ν_max in Hz.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// Reference: W. Wien (1893).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_peak_frequency(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::peak_frequency(temperature_k)) }
}

/// Wavenumber of the maximum of B_ṽ, ṽ_max = x₃T/c₂ (same root as the frequency form).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: ṽ_max in m⁻¹.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// Reference: W. Wien (1893).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_peak_wavenumber(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::peak_wavenumber(temperature_k)) }
}

/// Wavelength of the maximum of the photon radiance N_λ (and of λB_λ), c₂/(x₄T), x₄ = 4(1 − e^−x₄).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: wavelength in m.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_peak_wavelength(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::photon_peak_wavelength(temperature_k)) }
}

/// Frequency of the maximum of the photon radiance N_ν, x₂kT/h, x₂ = 2(1 − e^−x₂).
///
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: frequency in Hz.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_photon_peak_frequency(temperature_k: f64, out: *mut f64) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::photon_peak_frequency(temperature_k)) }
}

/// Temperature whose B_λ peaks at the given wavelength, T = b/λ_max.
///
/// * `wavelength_m`: wavelength λ_max of the B_λ maximum in m, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// Reference: W. Wien (1893).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_temperature_from_peak_wavelength(
    wavelength_m: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::temperature_from_peak_wavelength(wavelength_m)) }
}

/// Temperature whose B_ν peaks at the given frequency, T = hν_max/(x₃k).
///
/// * `frequency_hz`: frequency ν_max of the B_ν maximum in Hz, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 1 ulp against mpmath.
///
/// Reference: W. Wien (1893).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_temperature_from_peak_frequency(
    frequency_hz: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::temperature_from_peak_frequency(frequency_hz)) }
}

/// Fraction of the total blackbody radiance emitted between two wavelengths, F = ∫_{λ₁}^{λ₂} B_λ dλ
/// / (σT⁴/π).
///
/// * `lower_m`: lower band edge λ₁ in m, finite and ≥ 0 (0: from the start of the spectrum).
/// * `upper_m`: upper band edge λ₂ in m, > λ₁; +∞ allowed (to the end of the spectrum).
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: F, a number in [0, 1].
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument (the upper edge
/// may be +∞); `RELICORE_ERROR_NEGATIVE` for a lower edge < 0; `RELICORE_ERROR_EMPTY_INTERVAL` for
/// upper ≤ lower; `RELICORE_ERROR_NON_POSITIVE` for T ≤ 0.
///
/// Accuracy: within 1e-15 absolute against mpmath quadrature.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_band_fraction_wavelength(
    lower_m: f64,
    upper_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::band_fraction_wavelength(lower_m, upper_m, temperature_k)
        })
    }
}

/// Band radiance between two wavelengths, L = ∫_{λ₁}^{λ₂} B_λ(λ, T) dλ.
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
/// Accuracy: within max(1e-14·L, 1e-15·σT⁴/π) against mpmath quadrature.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_band_radiance_wavelength(
    lower_m: f64,
    upper_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::band_radiance_wavelength(lower_m, upper_m, temperature_k)
        })
    }
}

/// Band photon radiance between two wavelengths, ∫_{λ₁}^{λ₂} N_λ(λ, T) dλ.
///
/// * `lower_m`: lower band edge λ₁ in m, finite and ≥ 0 (0: from the start of the spectrum).
/// * `upper_m`: upper band edge λ₂ in m, > λ₁; +∞ allowed (to the end of the spectrum).
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: photons s⁻¹ m⁻² sr⁻¹.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument (the upper edge
/// may be +∞); `RELICORE_ERROR_NEGATIVE` for a lower edge < 0; `RELICORE_ERROR_EMPTY_INTERVAL` for
/// upper ≤ lower; `RELICORE_ERROR_NON_POSITIVE` for T ≤ 0.
///
/// Accuracy: within max(1e-14·N, 1e-15·N_total) against mpmath quadrature.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_band_photon_radiance_wavelength(
    lower_m: f64,
    upper_m: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::band_photon_radiance_wavelength(lower_m, upper_m, temperature_k)
        })
    }
}

/// Band radiance between two frequencies, L = ∫_{ν₁}^{ν₂} B_ν(ν, T) dν.
///
/// * `lower_hz`: lower band edge ν₁ in Hz, finite and ≥ 0.
/// * `upper_hz`: upper band edge ν₂ in Hz, > ν₁; +∞ allowed.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: where the result is written: L in W m⁻² sr⁻¹.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument (the upper edge
/// may be +∞); `RELICORE_ERROR_NEGATIVE` for a lower edge < 0; `RELICORE_ERROR_EMPTY_INTERVAL` for
/// upper ≤ lower; `RELICORE_ERROR_NON_POSITIVE` for T ≤ 0.
///
/// Accuracy: within max(1e-14·L, 1e-15·σT⁴/π) against mpmath quadrature.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_band_radiance_frequency(
    lower_hz: f64,
    upper_hz: f64,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::band_radiance_frequency(lower_hz, upper_hz, temperature_k)
        })
    }
}

/// Temperature of the blackbody whose band radiance between two wavelengths equals the given value
/// (inverse in T of `relicore_band_radiance_wavelength`; safeguarded Newton).
///
/// * `lower_m`: lower band edge λ₁ in m, finite and ≥ 0 (0: from the start of the spectrum).
/// * `upper_m`: upper band edge λ₂ in m, > λ₁; +∞ allowed (to the end of the spectrum).
/// * `radiance`: band radiance in W m⁻² sr⁻¹, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument (the upper edge
/// may be +∞); `RELICORE_ERROR_NEGATIVE` for a lower edge < 0; `RELICORE_ERROR_EMPTY_INTERVAL` for
/// upper ≤ lower; `RELICORE_ERROR_NON_POSITIVE` for radiance ≤ 0; `RELICORE_ERROR_OUT_OF_DOMAIN`
/// when no temperature between about 1e-120 and 1e120 K reproduces it;
/// `RELICORE_ERROR_NO_CONVERGENCE` (seen only for arguments far outside physical ones).
///
/// Accuracy: round trip within 1e-14 relative against mpmath root finding.
///
/// Reference: series of Chang & Rhee 1984, Int. Commun. Heat Mass Transfer 11, 451; Widger &
/// Woodall 1976, Bull. Am. Meteorol. Soc. 57, 1217.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_temperature_from_band_radiance_wavelength(
    lower_m: f64,
    upper_m: f64,
    radiance: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::temperature_from_band_radiance_wavelength(lower_m, upper_m, radiance)
        })
    }
}

/// Brightness temperature at a wavelength: the T of the blackbody whose B_λ equals the given
/// spectral radiance, T = c₂ / (λ ln(1 + 2hc²/(λ⁵ L))).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `spectral_radiance`: spectral radiance L in W m⁻² sr⁻¹ m⁻¹, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: round trip with `relicore_spectral_radiance_wavelength` within 1e-14 relative against
/// mpmath.
///
/// Reference: Planck's law solved for T (closed form). A real surface with emissivity < 1 is hotter
/// than its brightness temperature: do not use for safety decisions without the emissivity,
/// calibration and procedure the applicable standards require.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_wavelength(
    wavelength_m: f64,
    spectral_radiance: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::brightness_temperature_wavelength(wavelength_m, spectral_radiance)
        })
    }
}

/// Brightness temperature at a frequency: T = (hν/k) / ln(1 + 2hν³/(c² L)).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `spectral_radiance`: spectral radiance L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: round trip within 1e-14 relative against mpmath.
///
/// Reference: Planck's law solved for T (closed form).
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_brightness_temperature_frequency(
    frequency_hz: f64,
    spectral_radiance: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::brightness_temperature_frequency(frequency_hz, spectral_radiance)
        })
    }
}

/// Rayleigh-Jeans temperature T_RJ = c² L / (2kν²), the radio astronomer's brightness temperature
/// (below the Planck brightness temperature by about hν/2k).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `spectral_radiance`: spectral radiance L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
/// * `out`: where the result is written: T_RJ in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 2 ulp against mpmath.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_rayleigh_jeans_temperature(
    frequency_hz: f64,
    spectral_radiance: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::rayleigh_jeans_temperature(frequency_hz, spectral_radiance)
        })
    }
}

/// Two-colour (ratio) temperature: the T at which ε₁B_λ(λ₁,T) / (ε₂B_λ(λ₂,T)) equals the measured
/// radiance ratio, with the exact Planck law (not Wien's approximation).
///
/// * `wavelength_1_m`: first wavelength λ₁ in m, finite and > 0.
/// * `wavelength_2_m`: second wavelength λ₂ in m, finite, > 0 and ≠ λ₁.
/// * `radiance_ratio`: measured ratio L(λ₁)/L(λ₂), finite and > 0.
/// * `emissivity_ratio`: ε(λ₁)/ε(λ₂), finite and > 0 (1 for a gray body).
/// * `out`: where the result is written: T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0; `RELICORE_ERROR_OUT_OF_DOMAIN` when the ratio
/// is one no blackbody can produce (for λ₁ < λ₂ it must lie in (0, (λ₂/λ₁)⁴)) or λ₁ = λ₂;
/// `RELICORE_ERROR_NO_CONVERGENCE` (seen only for arguments far outside physical ones).
///
/// Accuracy: within 1e-13 relative against mpmath for |x₁ − x₂| ≥ 0.5.
///
/// Reference: two-colour pyrometry, e.g. DeWitt & Nutter (eds.), Theory and Practice of Radiation
/// Thermometry, Wiley 1988, ch. 6.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_ratio_temperature(
    wavelength_1_m: f64,
    wavelength_2_m: f64,
    radiance_ratio: f64,
    emissivity_ratio: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::ratio_temperature(
                wavelength_1_m,
                wavelength_2_m,
                radiance_ratio,
                emissivity_ratio,
            )
        })
    }
}

/// Thermodynamic-to-Rayleigh-Jeans conversion factor dT_RJ/dT_CMB = x²eˣ/(eˣ − 1)², x = hν/(kT₀).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `cmb_temperature_k`: CMB temperature T₀ in K, finite and > 0 (2.72548 K today, Fixsen 2009).
/// * `out`: where the result is written: a number in (0, 1).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 8 ulp against mpmath.
///
/// Reference: common practice in CMB analysis.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermodynamic_to_rayleigh_jeans_factor(
    frequency_hz: f64,
    cmb_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::thermodynamic_to_rayleigh_jeans_factor(frequency_hz, cmb_temperature_k)
        })
    }
}

/// dB_ν/dT at the CMB temperature, in MJy sr⁻¹ per K_CMB: converts a CMB temperature fluctuation to
/// a specific-intensity fluctuation.
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `cmb_temperature_k`: CMB temperature T₀ in K, finite and > 0 (2.72548 K today, Fixsen 2009).
/// * `out`: where the result is written: MJy sr⁻¹ K⁻¹ (1e20 × the SI value in W m⁻² sr⁻¹ Hz⁻¹ K⁻¹).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 8 ulp against mpmath.
///
/// Reference: common practice in CMB analysis.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_kcmb_to_mjy_per_sr(
    frequency_hz: f64,
    cmb_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::kcmb_to_mjy_per_sr(frequency_hz, cmb_temperature_k)
        })
    }
}

/// Thermal Sunyaev-Zeldovich intensity shape g(x) = x⁴eˣ/(eˣ − 1)² (x coth(x/2) − 4), ΔI/I₀ = y
/// g(x).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `cmb_temperature_k`: CMB temperature T₀ in K, finite and > 0 (2.72548 K today, Fixsen 2009).
/// * `out`: where the result is written: g(x), a pure number (negative below the null, positive
///   above).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: within 1e-15·(x + 4)·x⁴eˣ/(eˣ − 1)² absolute against mpmath.
///
/// Reference: Sunyaev & Zeldovich 1972, Comments Astrophys. Space Phys. 4, 173; Birkinshaw 1999,
/// Phys. Rep. 310, 97, eq. 81.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermal_sz_spectral_shape(
    frequency_hz: f64,
    cmb_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::thermal_sz_spectral_shape(frequency_hz, cmb_temperature_k)
        })
    }
}

/// Thermal Sunyaev-Zeldovich temperature shape f(x) = x coth(x/2) − 4, ΔT_CMB/T₀ = y f(x).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `cmb_temperature_k`: CMB temperature T₀ in K, finite and > 0 (2.72548 K today, Fixsen 2009).
/// * `out`: where the result is written: f(x), a pure number: −2 in the Rayleigh-Jeans limit, 0 at
///   the null.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: within 1e-15·(x + 4) absolute against mpmath.
///
/// Reference: Sunyaev & Zeldovich 1972, Comments Astrophys. Space Phys. 4, 173; Birkinshaw 1999,
/// Phys. Rep. 310, 97, eq. 81.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermal_sz_temperature_shape(
    frequency_hz: f64,
    cmb_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        scalar(out, || {
            bb::thermal_sz_temperature_shape(frequency_hz, cmb_temperature_k)
        })
    }
}

/// Frequency of the thermal Sunyaev-Zeldovich null, ν₀ = x₀kT₀/h with x₀ coth(x₀/2) = 4 (x₀ =
/// 3.830016…).
///
/// * `cmb_temperature_k`: CMB temperature T₀ in K, finite and > 0 (2.72548 K today, Fixsen 2009).
/// * `out`: where the result is written: ν₀ in Hz (217.5 GHz for T₀ = 2.72548 K).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite argument;
/// `RELICORE_ERROR_NON_POSITIVE` for an argument ≤ 0.
///
/// Accuracy: ≤ 2 ulp against mpmath (non-relativistic limit).
///
/// Reference: Sunyaev & Zeldovich 1972, Comments Astrophys. Space Phys. 4, 173; Birkinshaw 1999,
/// Phys. Rep. 310, 97, eq. 81.
///
/// # Safety
/// `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermal_sz_null_frequency(
    cmb_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe { scalar(out, || bb::thermal_sz_null_frequency(cmb_temperature_k)) }
}
