//! Radiation thermometry in C: the result struct of every `_with_uncertainty` function (a
//! temperature with its combined standard uncertainty and sensitivity coefficients), the
//! combined standard uncertainty of caller arrays (JCGM 100:2008 eqs. 10 and 13), and
//! `frame_call`, the body of the frame (image) forms with per-pixel or shared parameters. From
//! `bindings/functions.toml` the regular thermometry functions are generated into
//! `gen_blackbody.rs`, the response-table functions into `gen_tables.rs` (through
//! `boundary::table_call`) and the frame forms into `gen_frames.rs`.
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

/// The core's value as the budget frames write it in place of the C struct (same layout).
impl NotANumber for bb::TemperatureUncertainty<f64> {
    const NAN: Self = Self {
        temperature_k: f64::NAN,
        combined_standard_uncertainty_k: f64::NAN,
        sensitivity_coefficients: [f64::NAN; 5],
        inputs: 0,
    };
}

/// The core's value in `float` (same layout as `relicore_temperature_uncertainty_f32`).
impl NotANumber for bb::TemperatureUncertainty<f32> {
    const NAN: Self = Self {
        temperature_k: f32::NAN,
        combined_standard_uncertainty_k: f32::NAN,
        sensitivity_coefficients: [f32::NAN; 5],
        inputs: 0,
    };
}

/// The budget frames (bindings/c/src/gen_frames.rs) let the core write its
/// `TemperatureUncertainty` values into the caller's C structs: both are `#[repr(C)]` with the
/// same fields in the same order; this checks size, alignment and every offset at compile time.
const _: () = {
    use core::mem::{align_of, offset_of, size_of};
    macro_rules! same_layout {
        ($c:ty, $core:ty) => {
            assert!(size_of::<$c>() == size_of::<$core>());
            assert!(align_of::<$c>() == align_of::<$core>());
            assert!(offset_of!($c, temperature_k) == offset_of!($core, temperature_k));
            assert!(
                offset_of!($c, combined_standard_uncertainty_k)
                    == offset_of!($core, combined_standard_uncertainty_k)
            );
            assert!(
                offset_of!($c, sensitivity_coefficients)
                    == offset_of!($core, sensitivity_coefficients)
            );
            assert!(offset_of!($c, inputs) == offset_of!($core, inputs));
        };
    }
    same_layout!(
        relicore_temperature_uncertainty,
        bb::TemperatureUncertainty<f64>
    );
    same_layout!(
        relicore_temperature_uncertainty_f32,
        bb::TemperatureUncertainty<f32>
    );
};

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
pub(crate) unsafe fn frame_call<T, V: NotANumber, const P: usize, const O: usize>(
    n: usize,
    params: [(*const T, usize); P],
    outs: [*mut V; O],
    f: impl FnOnce(&[&[T]; P], &mut [&mut [V]; O]) -> relicore::ArrayResult,
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
