//! Response-weighted radiance of a tabulated spectral response, and its inverse to
//! temperature: what a radiometer channel or an infrared thermometer measures. The table is
//! given as two caller buffers, each followed by its length.

use crate::boundary::table_call;
use relicore::blackbody as bb;

/// Response-weighted radiance, L_r = ∫ r(λ) B_λ(λ, T) dλ, with the relative spectral response
/// r linear between the table points and zero outside.
///
/// * `wavelengths_m`: strictly increasing wavelengths in m, all finite and > 0, at least 2.
/// * `n_wavelengths`: number of wavelengths.
/// * `response`: relative spectral response at those wavelengths, finite and ≥ 0.
/// * `n_response`: number of response values, equal to `n_wavelengths`.
/// * `temperature_k`: temperature T in K, finite and > 0.
/// * `out`: L_r in W m⁻² sr⁻¹ (times the unit of the response).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN:
/// `RELICORE_ERROR_NULL_POINTER` when a pointer is NULL (also for a zero length);
/// `RELICORE_ERROR_ARRAY_TOO_SHORT` for fewer than 2 wavelengths;
/// `RELICORE_ERROR_LENGTH_MISMATCH` when the lengths differ; `RELICORE_ERROR_NON_FINITE`,
/// `RELICORE_ERROR_NON_POSITIVE` (wavelength or T), `RELICORE_ERROR_NEGATIVE` (response);
/// `RELICORE_ERROR_NOT_INCREASING` for a wavelength grid that is not strictly increasing;
/// `RELICORE_ERROR_NO_CONVERGENCE` if the quadrature cannot meet its tolerance.
///
/// Accuracy: within 1e-13 relative against mpmath quadrature of the same piecewise-linear
/// integrand (adaptive Gauss-Kronrod per segment). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `double`, `response` NULL or
/// to `n_response` readable `double`; `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_response_weighted_radiance(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response: *const f64,
    n_response: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response,
            n_response,
            out,
            |w, r| bb::response_weighted_radiance(w, r, temperature_k),
        )
    }
}

/// Temperature of the blackbody whose response-weighted radiance equals the given value (the
/// inverse in T of `relicore_response_weighted_radiance`): what an infrared thermometer or a
/// radiometer channel reports for a blackbody scene.
///
/// * `wavelengths_m`, `n_wavelengths`, `response`, `n_response`: the response table, as for
///   `relicore_response_weighted_radiance`.
/// * `radiance`: the measured response-weighted radiance in W m⁻² sr⁻¹, finite and > 0.
/// * `out`: the temperature T in K.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: the errors of
/// `relicore_response_weighted_radiance`; `RELICORE_ERROR_NON_POSITIVE` for radiance ≤ 0;
/// `RELICORE_ERROR_OUT_OF_DOMAIN` when the response is zero everywhere or no temperature
/// between about 1e-120 and 1e120 K reproduces the radiance.
///
/// Accuracy: round trip within 1e-14 relative against mpmath root finding (safeguarded
/// Newton on ln L_r(T)). Allocates nothing. A thermometer reading is only as good as its
/// emissivity setting and calibration: defer to the applicable standards and licensed
/// practice where people or plant can be harmed.
///
/// # Safety
/// As `relicore_response_weighted_radiance`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_temperature_from_response_weighted_radiance(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response: *const f64,
    n_response: usize,
    radiance: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response,
            n_response,
            out,
            |w, r| bb::temperature_from_response_weighted_radiance(w, r, radiance),
        )
    }
}

/// `float` twin of `relicore_response_weighted_radiance` for firmware (table, temperature and
/// result in single precision).
///
/// * `wavelengths_m`, `n_wavelengths`, `response`, `n_response`: the response table (m, 1).
/// * `temperature_k`: T in K, finite and > 0.
/// * `out`: L_r in W m⁻² sr⁻¹.
///
/// Returns and errors as `relicore_response_weighted_radiance`.
///
/// Accuracy: within 2e-6 relative against mpmath quadrature. Allocates nothing.
///
/// # Safety
/// As `relicore_response_weighted_radiance`, with `float` buffers.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_response_weighted_radiance_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response: *const f32,
    n_response: usize,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response,
            n_response,
            out,
            |w, r| bb::response_weighted_radiance(w, r, temperature_k),
        )
    }
}

/// `float` twin of `relicore_temperature_from_response_weighted_radiance` for firmware.
///
/// * `wavelengths_m`, `n_wavelengths`, `response`, `n_response`: the response table (m, 1).
/// * `radiance`: measured response-weighted radiance in W m⁻² sr⁻¹, finite and > 0.
/// * `out`: T in K.
///
/// Returns and errors as `relicore_temperature_from_response_weighted_radiance`.
///
/// Accuracy: within 2e-6 relative against mpmath root finding. Allocates nothing.
///
/// # Safety
/// As `relicore_response_weighted_radiance`, with `float` buffers.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_temperature_from_response_weighted_radiance_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response: *const f32,
    n_response: usize,
    radiance: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response,
            n_response,
            out,
            |w, r| bb::temperature_from_response_weighted_radiance(w, r, radiance),
        )
    }
}
