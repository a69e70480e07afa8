//! Radiation thermometry in C: the result struct of every `_with_uncertainty` function (a
//! temperature with its combined standard uncertainty and sensitivity coefficients), and the
//! irregular forms of the measurement equation: the response-table functions, the combined
//! standard uncertainty of caller arrays (JCGM 100:2008 eqs. 10 and 13), and `frame_call`, the
//! body of the frame (image) forms with per-pixel or shared parameters. The regular thermometry
//! functions are generated into `gen_blackbody.rs` and their frame forms into `gen_frames.rs`
//! from `bindings/functions.toml`.
//!
//! Radiation thermometry can hurt someone when it is trusted beyond its emissivity and
//! calibration: fever screening, furnaces, molten metal and fire safety follow the applicable
//! standards, local codes and licensed practice. The uncertainty returned covers only the inputs
//! and standard uncertainties given.

use crate::boundary::{Failure, NotANumber, boundary, input_slice, non_null, put, put_nan_n};
use crate::status::status_of;
use relicore::blackbody::{self as bb, TemperatureUncertainty};

/// An inferred temperature with its combined standard uncertainty and sensitivity coefficients
/// (the core's `TemperatureUncertainty<f64>`), written by every `_with_uncertainty` function.
///
/// `sensitivity_coefficients[i]` is dT/dx_i for the i-th uncertain input of the function, in
/// the order its documentation gives (measurement equation: signal, emissivity, reflected
/// temperature, transmittance, path temperature), in K per unit of that input; the first
/// `inputs` entries are used, the others are 0. On failure every real field is NaN and
/// `inputs` is 0.
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
#[allow(non_camel_case_types)]
pub struct relicore_temperature_uncertainty {
    /// The inferred temperature, K.
    pub temperature_k: f64,
    /// Combined standard uncertainty u_c in K (JCGM 100:2008 eq. 10, uncorrelated inputs).
    pub combined_standard_uncertainty_k: f64,
    /// dT/dx_i, K per unit of input i; entries at and beyond `inputs` are 0.
    pub sensitivity_coefficients: [f64; 5],
    /// Number of inputs used (1 to 5; 0 after a failure).
    pub inputs: u32,
}

/// `float` twin of `relicore_temperature_uncertainty` (the core's
/// `TemperatureUncertainty<f32>`), written by the `_f32` forms.
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
#[allow(non_camel_case_types)]
pub struct relicore_temperature_uncertainty_f32 {
    /// The inferred temperature, K.
    pub temperature_k: f32,
    /// Combined standard uncertainty u_c in K.
    pub combined_standard_uncertainty_k: f32,
    /// dT/dx_i, K per unit of input i; entries at and beyond `inputs` are 0.
    pub sensitivity_coefficients: [f32; 5],
    /// Number of inputs used (1 to 5; 0 after a failure).
    pub inputs: u32,
}

impl From<TemperatureUncertainty<f64>> for relicore_temperature_uncertainty {
    fn from(v: TemperatureUncertainty<f64>) -> Self {
        Self {
            temperature_k: v.temperature_k,
            combined_standard_uncertainty_k: v.combined_standard_uncertainty_k,
            sensitivity_coefficients: v.sensitivity_coefficients,
            inputs: v.inputs,
        }
    }
}

impl From<TemperatureUncertainty<f32>> for relicore_temperature_uncertainty_f32 {
    fn from(v: TemperatureUncertainty<f32>) -> Self {
        Self {
            temperature_k: v.temperature_k,
            combined_standard_uncertainty_k: v.combined_standard_uncertainty_k,
            sensitivity_coefficients: v.sensitivity_coefficients,
            inputs: v.inputs,
        }
    }
}

impl NotANumber for relicore_temperature_uncertainty {
    const NAN: Self = Self {
        temperature_k: f64::NAN,
        combined_standard_uncertainty_k: f64::NAN,
        sensitivity_coefficients: [f64::NAN; 5],
        inputs: 0,
    };
}

impl NotANumber for relicore_temperature_uncertainty_f32 {
    const NAN: Self = Self {
        temperature_k: f32::NAN,
        combined_standard_uncertainty_k: f32::NAN,
        sensitivity_coefficients: [f32::NAN; 5],
        inputs: 0,
    };
}

/// Runs a response-table function on the caller's two buffers and writes its value to `*out`
/// (NaN, or a struct of NaN, on failure).
///
/// # Safety
/// `wavelengths_m` is NULL or valid for `n_wavelengths` reads, `response` NULL or valid for
/// `n_response` reads, `out` NULL or valid for one write.
unsafe fn table_call<T: Copy, O: NotANumber>(
    wavelengths_m: *const T,
    n_wavelengths: usize,
    response: *const T,
    n_response: usize,
    out: *mut O,
    f: impl FnOnce(&[T], &[T]) -> relicore::Result<O>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: NULL or valid for the given lengths (caller's contract).
            let w = unsafe { input_slice(wavelengths_m, n_wavelengths) }?;
            // SAFETY: as above.
            let r = unsafe { input_slice(response, n_response) }?;
            let v = f(w, r)?;
            // SAFETY: non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable.
        || unsafe { put(out, O::NAN) },
    )
}

/// Runs a slice function (the combined standard uncertainty) on caller buffers.
///
/// # Safety
/// Each `(pointer, length)` is NULL or valid for that many reads; `out` NULL or writable.
unsafe fn slices_call<const K: usize>(
    inputs: [(*const f64, usize); K],
    out: *mut f64,
    f: impl FnOnce([&[f64]; K]) -> relicore::Result<f64>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let mut s: [&[f64]; K] = [&[]; K];
            for (d, (p, n)) in s.iter_mut().zip(inputs) {
                // SAFETY: NULL or valid for n reads (caller's contract).
                *d = unsafe { input_slice(p, n) }?;
            }
            let v = f(s)?;
            // SAFETY: non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable.
        || unsafe { put(out, f64::NAN) },
    )
}

/// Runs a frame function on caller buffers: `params` are the per-pixel-or-shared slices
/// (pointer, length), `outs` the output buffers of `n` elements each. NULL anywhere fails the
/// whole call with NaN in every non-NULL output; otherwise the core writes every output (NaN for
/// failing elements, all NaN for a length mismatch) and its first error is returned.
///
/// # Safety
/// Each parameter is NULL or valid for its length in reads, each output NULL or valid for `n`
/// writes; no output overlaps another buffer.
pub(crate) unsafe fn frame_call<T: NotANumber, const P: usize, const O: usize>(
    n: usize,
    params: [(*const T, usize); P],
    outs: [*mut T; O],
    f: impl FnOnce(&[&[T]; P], &mut [&mut [T]; O]) -> relicore::ArrayResult,
) -> i32 {
    boundary(
        || {
            let mut s: [&[T]; P] = [&[]; P];
            for (d, (p, len)) in s.iter_mut().zip(params) {
                // SAFETY: NULL or valid for len reads (caller's contract).
                *d = unsafe { input_slice(p, len) }?;
            }
            for &o in &outs {
                non_null(o)?;
            }
            // SAFETY: every output is non-NULL, valid for n writes and disjoint from the other
            // buffers (caller's contract).
            let mut o = outs.map(|p| unsafe { std::slice::from_raw_parts_mut(p, n) });
            f(&s, &mut o).map_err(|e| Failure::Elements(status_of(e.error)))
        },
        || {
            for o in outs {
                // SAFETY: NULL or valid for n writes (caller's contract).
                unsafe { put_nan_n(o, n) };
            }
        },
    )
}

/// Measured response-weighted radiance of a scene (the forward measurement equation with the
/// response-weighted radiance of a tabulated spectral response): L_meas = t[e L_r(T_obj) + (1 -
/// e) L_r(T_refl)] + (1 - t) L_r(T_path).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `object_temperature_k`: object temperature in K, finite and > 0.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `out`: L_meas in W m⁻² sr⁻¹ (times the unit of the response), >= 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); `RELICORE_ERROR_NON_POSITIVE` (T_obj, e or t <=
/// 0), `RELICORE_ERROR_NEGATIVE` (T_refl or T_path < 0), `RELICORE_ERROR_OUT_OF_DOMAIN` (e or t
/// above 1, a radiance that overflows), `RELICORE_ERROR_NO_CONVERGENCE` if a quadrature cannot
/// meet its tolerance. `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: within 1e-13 relative against mpmath quadrature
/// (`tests/data/thermometry_response.txt`). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `double`, `response_table` NULL or
/// to `n_response_table` readable `double`; `out` is NULL or points to a writable `double`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_measured_response_weighted_radiance(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response_table: *const f64,
    n_response_table: usize,
    object_temperature_k: f64,
    emissivity: f64,
    reflected_temperature_k: f64,
    transmittance: f64,
    path_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::measured_response_weighted_radiance(
                    w,
                    r,
                    object_temperature_k,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                )
            },
        )
    }
}

/// `float` twin of `relicore_measured_response_weighted_radiance` for firmware: the same core
/// function computed in single precision (table, arguments and result `float`).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `object_temperature_k`: object temperature in K, finite and > 0.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `out`: L_meas in W m⁻² sr⁻¹ (times the unit of the response), >= 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); `RELICORE_ERROR_NON_POSITIVE` (T_obj, e or t <=
/// 0), `RELICORE_ERROR_NEGATIVE` (T_refl or T_path < 0), `RELICORE_ERROR_OUT_OF_DOMAIN` (e or t
/// above 1, a radiance that overflows), `RELICORE_ERROR_NO_CONVERGENCE` if a quadrature cannot
/// meet its tolerance. `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: that of the core function in f32 (a few f32 ulp of the f64 result where the inputs
/// are representable). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `float`, `response_table` NULL or to
/// `n_response_table` readable `float`; `out` is NULL or points to a writable `float`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_measured_response_weighted_radiance_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response_table: *const f32,
    n_response_table: usize,
    object_temperature_k: f32,
    emissivity: f32,
    reflected_temperature_k: f32,
    transmittance: f32,
    path_temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::measured_response_weighted_radiance(
                    w,
                    r,
                    object_temperature_k,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                )
            },
        )
    }
}

/// Object temperature from a response-weighted signal (the inverse measurement equation): the
/// temperature whose response-weighted radiance equals the corrected object radiance L_obj =
/// ([L_meas - (1 - t) L_r(T_path)]/t - (1 - e) L_r(T_refl))/e, by the shared root finder.
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `signal`: L_meas in W m⁻² sr⁻¹ (times the unit of the response), finite.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `out`: T_obj in K, > 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); the scene errors of
/// `relicore_measured_response_weighted_radiance`; `RELICORE_ERROR_OUT_OF_DOMAIN` when L_obj <=
/// 0 (the signal is at or below what the surroundings and the path alone give: no object
/// temperature exists) or the response is zero everywhere; `RELICORE_ERROR_NO_CONVERGENCE`.
/// `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: within 1e-13 relative against mpmath for a correction condition number of at most
/// 20 (see the core's module documentation). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `double`, `response_table` NULL or
/// to `n_response_table` readable `double`; `out` is NULL or points to a writable `double`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_object_temperature_response(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response_table: *const f64,
    n_response_table: usize,
    signal: f64,
    emissivity: f64,
    reflected_temperature_k: f64,
    transmittance: f64,
    path_temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::object_temperature_response(
                    w,
                    r,
                    signal,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                )
            },
        )
    }
}

/// `float` twin of `relicore_object_temperature_response` for firmware: the same core function
/// computed in single precision (table, arguments and result `float`).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `signal`: L_meas in W m⁻² sr⁻¹ (times the unit of the response), finite.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `out`: T_obj in K, > 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); the scene errors of
/// `relicore_measured_response_weighted_radiance`; `RELICORE_ERROR_OUT_OF_DOMAIN` when L_obj <=
/// 0 (the signal is at or below what the surroundings and the path alone give: no object
/// temperature exists) or the response is zero everywhere; `RELICORE_ERROR_NO_CONVERGENCE`.
/// `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: that of the core function in f32 (a few f32 ulp of the f64 result where the inputs
/// are representable). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `float`, `response_table` NULL or to
/// `n_response_table` readable `float`; `out` is NULL or points to a writable `float`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_object_temperature_response_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response_table: *const f32,
    n_response_table: usize,
    signal: f32,
    emissivity: f32,
    reflected_temperature_k: f32,
    transmittance: f32,
    path_temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::object_temperature_response(
                    w,
                    r,
                    signal,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                )
            },
        )
    }
}

/// `relicore_object_temperature_response` with its sensitivity coefficients (implicit
/// differentiation with the library's dT derivative of the response-weighted radiance) and its
/// combined standard uncertainty (JCGM 100:2008 eq. 10, uncorrelated inputs).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `signal`: L_meas in W m⁻² sr⁻¹, finite.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `signal_uncertainty`, `emissivity_uncertainty`, `reflected_temperature_uncertainty_k`,
///   `transmittance_uncertainty`, `path_temperature_uncertainty_k`: the standard uncertainties
///   of the five inputs, finite and >= 0, in their units.
/// * `out`: a `struct relicore_temperature_uncertainty` (`_f32` for the twin): T_obj in K (the
///   bits of `relicore_object_temperature_response`), u_c in K, `inputs` = 5 and the
///   coefficients dT/d(L_meas, e, T_refl, t, T_path).
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN in every
/// real field (and inputs 0): the table errors of `relicore_response_weighted_radiance`
/// (`RELICORE_ERROR_NULL_POINTER` for a NULL table even of length 0, `ARRAY_TOO_SHORT`,
/// `LENGTH_MISMATCH`, `NOT_INCREASING`, `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); those of
/// `relicore_object_temperature_response`; `RELICORE_ERROR_NON_FINITE` or
/// `RELICORE_ERROR_NEGATIVE` for an uncertainty. `RELICORE_ERROR_NULL_POINTER` when `out` is
/// NULL.
///
/// Accuracy: coefficients and u_c within 1e-12 relative against mpmath quadrature. Allocates
/// nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `double`, `response_table` NULL or
/// to `n_response_table` readable `double`; `out` is NULL or points to a writable `struct
/// relicore_temperature_uncertainty`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_object_temperature_response_with_uncertainty(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response_table: *const f64,
    n_response_table: usize,
    signal: f64,
    emissivity: f64,
    reflected_temperature_k: f64,
    transmittance: f64,
    path_temperature_k: f64,
    signal_uncertainty: f64,
    emissivity_uncertainty: f64,
    reflected_temperature_uncertainty_k: f64,
    transmittance_uncertainty: f64,
    path_temperature_uncertainty_k: f64,
    out: *mut relicore_temperature_uncertainty,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::object_temperature_response_with_uncertainty(
                    w,
                    r,
                    signal,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                    signal_uncertainty,
                    emissivity_uncertainty,
                    reflected_temperature_uncertainty_k,
                    transmittance_uncertainty,
                    path_temperature_uncertainty_k,
                )
                .map(relicore_temperature_uncertainty::from)
            },
        )
    }
}

/// `float` twin of `relicore_object_temperature_response_with_uncertainty` for firmware: the
/// same core function computed in single precision (table, arguments and result `float`).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `signal`: L_meas in W m⁻² sr⁻¹, finite.
/// * `emissivity`: surface emissivity, 0 < e <= 1. `reflected_temperature_k`: temperature of the
///   reflected surroundings in K, >= 0. `transmittance`: path transmittance, 0 < t <= 1.
///   `path_temperature_k`: path temperature in K, >= 0.
/// * `signal_uncertainty`, `emissivity_uncertainty`, `reflected_temperature_uncertainty_k`,
///   `transmittance_uncertainty`, `path_temperature_uncertainty_k`: the standard uncertainties
///   of the five inputs, finite and >= 0, in their units.
/// * `out`: a `struct relicore_temperature_uncertainty` (`_f32` for the twin): T_obj in K (the
///   bits of `relicore_object_temperature_response`), u_c in K, `inputs` = 5 and the
///   coefficients dT/d(L_meas, e, T_refl, t, T_path).
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN in every
/// real field (and inputs 0): the table errors of `relicore_response_weighted_radiance`
/// (`RELICORE_ERROR_NULL_POINTER` for a NULL table even of length 0, `ARRAY_TOO_SHORT`,
/// `LENGTH_MISMATCH`, `NOT_INCREASING`, `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); those of
/// `relicore_object_temperature_response`; `RELICORE_ERROR_NON_FINITE` or
/// `RELICORE_ERROR_NEGATIVE` for an uncertainty. `RELICORE_ERROR_NULL_POINTER` when `out` is
/// NULL.
///
/// Accuracy: that of the core function in f32 (a few f32 ulp of the f64 result where the inputs
/// are representable). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `float`, `response_table` NULL or to
/// `n_response_table` readable `float`; `out` is NULL or points to a writable `struct
/// relicore_temperature_uncertainty_f32`.
#[allow(clippy::too_many_arguments)]
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_object_temperature_response_with_uncertainty_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response_table: *const f32,
    n_response_table: usize,
    signal: f32,
    emissivity: f32,
    reflected_temperature_k: f32,
    transmittance: f32,
    path_temperature_k: f32,
    signal_uncertainty: f32,
    emissivity_uncertainty: f32,
    reflected_temperature_uncertainty_k: f32,
    transmittance_uncertainty: f32,
    path_temperature_uncertainty_k: f32,
    out: *mut relicore_temperature_uncertainty_f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| {
                bb::object_temperature_response_with_uncertainty(
                    w,
                    r,
                    signal,
                    emissivity,
                    reflected_temperature_k,
                    transmittance,
                    path_temperature_k,
                    signal_uncertainty,
                    emissivity_uncertainty,
                    reflected_temperature_uncertainty_k,
                    transmittance_uncertainty,
                    path_temperature_uncertainty_k,
                )
                .map(relicore_temperature_uncertainty_f32::from)
            },
        )
    }
}

/// Temperature derivative of the response-weighted radiance, the integral of r(lambda)
/// dB_lambda/dT over the table (the shared quadrature).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `temperature_k`: T in K, finite and > 0.
/// * `out`: dL_r/dT in W m⁻² sr⁻¹ K⁻¹ (times the unit of the response), >= 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); `RELICORE_ERROR_NON_POSITIVE` for T <= 0;
/// `RELICORE_ERROR_NO_CONVERGENCE`. `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: within 1e-13 relative against mpmath quadrature. Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `double`, `response_table` NULL or
/// to `n_response_table` readable `double`; `out` is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_response_weighted_radiance_temperature_derivative(
    wavelengths_m: *const f64,
    n_wavelengths: usize,
    response_table: *const f64,
    n_response_table: usize,
    temperature_k: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| bb::response_weighted_radiance_temperature_derivative(w, r, temperature_k),
        )
    }
}

/// `float` twin of `relicore_response_weighted_radiance_temperature_derivative` for firmware:
/// the same core function computed in single precision (table, arguments and result `float`).
///
/// * `wavelengths_m`, `n_wavelengths`, `response_table`, `n_response_table`: the response table, as for
///   `relicore_response_weighted_radiance` (strictly increasing wavelengths in m, > 0, at least
///   2; response finite and >= 0, same length).
/// * `temperature_k`: T in K, finite and > 0.
/// * `out`: dL_r/dT in W m⁻² sr⁻¹ K⁻¹ (times the unit of the response), >= 0.
///
/// Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the
/// table errors of `relicore_response_weighted_radiance` (`RELICORE_ERROR_NULL_POINTER` for a
/// NULL table even of length 0, `ARRAY_TOO_SHORT`, `LENGTH_MISMATCH`, `NOT_INCREASING`,
/// `NON_FINITE`, `NON_POSITIVE`, `NEGATIVE`); `RELICORE_ERROR_NON_POSITIVE` for T <= 0;
/// `RELICORE_ERROR_NO_CONVERGENCE`. `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// Accuracy: that of the core function in f32 (a few f32 ulp of the f64 result where the inputs
/// are representable). Allocates nothing.
///
/// # Safety
/// `wavelengths_m` is NULL or points to `n_wavelengths` readable `float`, `response_table` NULL or to
/// `n_response_table` readable `float`; `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_response_weighted_radiance_temperature_derivative_f32(
    wavelengths_m: *const f32,
    n_wavelengths: usize,
    response_table: *const f32,
    n_response_table: usize,
    temperature_k: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        table_call(
            wavelengths_m,
            n_wavelengths,
            response_table,
            n_response_table,
            out,
            |w, r| bb::response_weighted_radiance_temperature_derivative(w, r, temperature_k),
        )
    }
}

/// Combined standard uncertainty of uncorrelated inputs, u_c = (sum of c_i² u(x_i)²)^½
/// (JCGM 100:2008 eq. 10), for any number of inputs given as caller arrays.
///
/// * `sensitivity_coefficients`, `n_coefficients`: the c_i, finite (for example the first
///   `inputs` entries of a `relicore_temperature_uncertainty`), in K per unit of input i.
/// * `standard_uncertainties`, `n_uncertainties`: the u(x_i), finite and >= 0; same length.
/// * `out`: u_c in K, >= 0 (0 for n = 0).
///
/// Returns `RELICORE_OK`, or a negative code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// (a NULL pointer, also for length 0), `RELICORE_ERROR_LENGTH_MISMATCH` when the lengths
/// differ, `RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NEGATIVE` (an uncertainty < 0),
/// `RELICORE_ERROR_OUT_OF_DOMAIN` when a product or the result overflows.
///
/// Accuracy: within 2(n + 2) epsilon relative (a scaled sum of squares and one square root).
/// Allocates nothing.
///
/// # Safety
/// Each pointer is NULL or points to its length of readable `double`; `out` is NULL or points
/// to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_combined_standard_uncertainty(
    sensitivity_coefficients: *const f64,
    n_coefficients: usize,
    standard_uncertainties: *const f64,
    n_uncertainties: usize,
    out: *mut f64,
) -> i32 {
    let inputs = [
        (sensitivity_coefficients, n_coefficients),
        (standard_uncertainties, n_uncertainties),
    ];
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        slices_call(inputs, out, |[c, u]| {
            bb::combined_standard_uncertainty(c, u)
        })
    }
}

/// Combined standard uncertainty of correlated inputs, u_c² = sum over i, j of
/// c_i c_j u(x_i) u(x_j) r(x_i, x_j) (JCGM 100:2008 eqs. 13 and 14).
///
/// * `sensitivity_coefficients`, `n_coefficients`, `standard_uncertainties`, `n_uncertainties`:
///   as `relicore_combined_standard_uncertainty` (n values each).
/// * `correlation`, `n_correlation`: the n × n correlation matrix r, row-major
///   (r[i·n + j] = r(x_i, x_j)): finite, |r_ij| <= 1, r_ii = 1, symmetric; n_correlation = n².
/// * `out`: u_c in K, >= 0.
///
/// Returns `RELICORE_OK`, or a negative code with `*out` set to NaN: the errors of
/// `relicore_combined_standard_uncertainty`; `RELICORE_ERROR_LENGTH_MISMATCH` when the matrix
/// does not hold n² values; `RELICORE_ERROR_OUT_OF_DOMAIN` when it is not a correlation matrix
/// or the quadratic form is negative beyond its rounding error (not positive semi-definite).
///
/// Accuracy: within (4n² + 4) epsilon of the sum of the absolute values of the terms, relative
/// to u_c². Allocates nothing.
///
/// # Safety
/// Each pointer is NULL or points to its length of readable `double`; `out` is NULL or points
/// to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_combined_standard_uncertainty_correlated(
    sensitivity_coefficients: *const f64,
    n_coefficients: usize,
    standard_uncertainties: *const f64,
    n_uncertainties: usize,
    correlation: *const f64,
    n_correlation: usize,
    out: *mut f64,
) -> i32 {
    let inputs = [
        (sensitivity_coefficients, n_coefficients),
        (standard_uncertainties, n_uncertainties),
        (correlation, n_correlation),
    ];
    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).
    unsafe {
        slices_call(inputs, out, |[c, u, r]| {
            bb::combined_standard_uncertainty_correlated(c, u, r)
        })
    }
}
