//! Array forms of the decoupling functions of one argument: a buffer and its length in, a buffer
//! of the same length out, one core call per element (no allocation, no second
//! implementation): Saha equilibrium of a universe, the two fits over ω_b at one ω_m, and the
//! queries of a thermal history.

use crate::boundary::elementwise;
use crate::decoupling::{history_array, relicore_thermal_history};
use crate::universe::{relicore_universe, universe_array};
use relicore::decoupling as dc;

/// Array form of `relicore_saha_ionized_fraction`: out[i] = saha_ionized_fraction(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init` (with baryons and radiation).
/// * `redshifts`: n redshifts, each finite, 0 ≤ z ≤ 1e8.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, x_e = n_e/n_H in Saha equilibrium, dimensionless.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_saha_ionized_fraction_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, z| {
            dc::saha_ionized_fraction(u, z)
        })
    }
}

/// Array form of `relicore_last_scattering_redshift_fit`: out[i] = last_scattering_redshift_fit(omega_baryon_h2[i],
/// omega_matter_h2) for i < n, at one ω_m.
///
/// * `omega_baryon_h2`: n values of ω_b = Ω_b h², each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `omega_matter_h2`: ω_m = Ω_m h², finite and > 0 (when it is not, every element fails).
/// * `out`: n results, z*, the last-scattering redshift of the fit of Hu & Sugiyama 1996.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`,
/// `RELICORE_ERROR_OUT_OF_DOMAIN`). `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL
/// (even for n = 0); then every output of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `omega_baryon_h2` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `omega_baryon_h2` (computed in place); other
/// overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_last_scattering_redshift_fit_array(
    omega_baryon_h2: *const f64,
    n: usize,
    omega_matter_h2: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(omega_baryon_h2, n, out, |wb| {
            dc::last_scattering_redshift_fit(wb, omega_matter_h2)
        })
    }
}

/// Array form of `relicore_drag_redshift_fit`: out[i] = drag_redshift_fit(omega_baryon_h2[i],
/// omega_matter_h2) for i < n, at one ω_m.
///
/// * `omega_baryon_h2`: n values of ω_b = Ω_b h², each finite and > 0.
/// * `n`: number of elements of both arrays.
/// * `omega_matter_h2`: ω_m = Ω_m h², finite and > 0 (when it is not, every element fails).
/// * `out`: n results, z_drag, the drag redshift of the fit of Eisenstein & Hu 1998.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (`RELICORE_ERROR_NON_FINITE`, `RELICORE_ERROR_NON_POSITIVE`,
/// `RELICORE_ERROR_OUT_OF_DOMAIN`). `RELICORE_ERROR_NULL_POINTER` when an array pointer is NULL
/// (even for n = 0); then every output of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `omega_baryon_h2` is NULL or points to n readable `double`; `out` is NULL or points to n
/// writable `double`. `out` may be the same buffer as `omega_baryon_h2` (computed in place); other
/// overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_drag_redshift_fit_array(
    omega_baryon_h2: *const f64,
    n: usize,
    omega_matter_h2: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the buffers are NULL or valid for n elements (this function's contract).
    unsafe {
        elementwise(omega_baryon_h2, n, out, |wb| {
            dc::drag_redshift_fit(wb, omega_matter_h2)
        })
    }
}

/// Array form of `relicore_ionized_fraction`: out[i] = ionized_fraction(history, redshifts[i]) for i < n.
///
/// * `history`: from `relicore_thermal_history_compute`.
/// * `redshifts`: n redshifts, each finite, 0 ≤ z ≤ the highest redshift of the history.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, x_e = n_e/n_H, dimensionless.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `history`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*history` was not filled by a successful
/// `relicore_thermal_history_compute`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `history` is NULL or points to a readable `struct relicore_thermal_history`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*history`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_ionized_fraction_array(
    history: *const relicore_thermal_history,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { history_array(history, redshifts, n, out, |h, z| h.ionized_fraction(z)) }
}

/// Array form of `relicore_matter_temperature_k`: out[i] = matter_temperature_k(history, redshifts[i]) for i < n.
///
/// * `history`: from `relicore_thermal_history_compute`.
/// * `redshifts`: n redshifts, each finite, 0 ≤ z ≤ the highest redshift of the history.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, T_m in K.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `history`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*history` was not filled by a successful
/// `relicore_thermal_history_compute`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `history` is NULL or points to a readable `struct relicore_thermal_history`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*history`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_matter_temperature_k_array(
    history: *const relicore_thermal_history,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { history_array(history, redshifts, n, out, |h, z| h.matter_temperature_k(z)) }
}

/// Array form of `relicore_optical_depth`: out[i] = optical_depth(history, redshifts[i]) for i < n.
///
/// * `history`: from `relicore_thermal_history_compute`.
/// * `redshifts`: n redshifts, each finite, 0 ≤ z ≤ the highest redshift of the history.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, τ, dimensionless.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `history`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*history` was not filled by a successful
/// `relicore_thermal_history_compute`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `history` is NULL or points to a readable `struct relicore_thermal_history`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*history`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_optical_depth_array(
    history: *const relicore_thermal_history,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { history_array(history, redshifts, n, out, |h, z| h.optical_depth(z)) }
}

/// Array form of `relicore_visibility`: out[i] = visibility(history, redshifts[i]) for i < n.
///
/// * `history`: from `relicore_thermal_history_compute`.
/// * `redshifts`: n redshifts, each finite, 0 ≤ z ≤ the highest redshift of the history.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, g in Mpc⁻¹.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `history`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*history` was not filled by a successful
/// `relicore_thermal_history_compute`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `history` is NULL or points to a readable `struct relicore_thermal_history`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*history`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_visibility_array(
    history: *const relicore_thermal_history,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { history_array(history, redshifts, n, out, |h, z| h.visibility(z)) }
}

/// Array form of `relicore_sound_horizon_mpc`: out[i] = sound_horizon_mpc(history, redshifts[i]) for i < n.
///
/// * `history`: from `relicore_thermal_history_compute`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, r_s in Mpc.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `history`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*history` was not filled by a successful
/// `relicore_thermal_history_compute`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `history` is NULL or points to a readable `struct relicore_thermal_history`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*history`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_sound_horizon_mpc_array(
    history: *const relicore_thermal_history,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { history_array(history, redshifts, n, out, |h, z| h.sound_horizon_mpc(z)) }
}
