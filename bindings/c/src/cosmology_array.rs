//! Array forms of the cosmology functions of one argument: a universe, a buffer and its
//! length in, a buffer of the same length out, one core call per element, or the core's array
//! form for the distances (no allocation, no second implementation).

use crate::universe::{relicore_universe, universe_array, universe_through_array};
use relicore::ArrayResult;
use relicore::cosmology::Universe;
use relicore_dispatch::widest;

/// Array form of `relicore_dimensionless_hubble`: out[i] = dimensionless_hubble(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, E, dimensionless (≥ 1 for ordinary models).
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
pub unsafe extern "C" fn relicore_dimensionless_hubble_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.dimensionless_hubble(x)
        })
    }
}

/// Array form of `relicore_hubble_parameter_km_s_mpc`: out[i] = hubble_parameter_km_s_mpc(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, H in km s⁻¹ Mpc⁻¹.
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
pub unsafe extern "C" fn relicore_hubble_parameter_km_s_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.hubble_parameter_km_s_mpc(x)
        })
    }
}

/// Array form of `relicore_omega_matter_at`: out[i] = omega_matter_at(universe, redshifts[i]) for i
/// < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, Ω_m(z), dimensionless (in [0, 1] for flat models).
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
pub unsafe extern "C" fn relicore_omega_matter_at_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.omega_matter_at(x)) }
}

/// Array form of `relicore_omega_radiation_at`: out[i] = omega_radiation_at(universe, redshifts[i])
/// for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, Ω_r(z), dimensionless.
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
pub unsafe extern "C" fn relicore_omega_radiation_at_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.omega_radiation_at(x)) }
}

/// Array form of `relicore_omega_dark_energy_at`: out[i] = omega_dark_energy_at(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, Ω_de(z), dimensionless.
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
pub unsafe extern "C" fn relicore_omega_dark_energy_at_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.omega_dark_energy_at(x)
        })
    }
}

/// Array form of `relicore_omega_curvature_at`: out[i] = omega_curvature_at(universe, redshifts[i])
/// for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, Ω_k(z), dimensionless.
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
pub unsafe extern "C" fn relicore_omega_curvature_at_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.omega_curvature_at(x)) }
}

/// Array form of `relicore_critical_density_kg_m3`: out[i] = critical_density_kg_m3(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, ρ_c in kg m⁻³, > 0.
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
pub unsafe extern "C" fn relicore_critical_density_kg_m3_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.critical_density_kg_m3(x)
        })
    }
}

/// Array form of `relicore_cmb_temperature_at_k`: out[i] = cmb_temperature_at_k(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, T in K, ≥ 0.
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
pub unsafe extern "C" fn relicore_cmb_temperature_at_k_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.cmb_temperature_at_k(x)
        })
    }
}

/// Array form of `relicore_comoving_distance_mpc`: out[i] = comoving_distance_mpc(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, D_C in Mpc, ≥ 0.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_comoving_distance_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_through_array(universe, redshifts, n, out, |u, x, out| {
            widest!(
                |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                    u.comoving_distance_mpc_array(x, out)
                }
            )
        })
    }
}

/// Array form of `relicore_transverse_comoving_distance_mpc`: out[i] =
/// transverse_comoving_distance_mpc(universe, redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, D_M in Mpc (≥ 0 except past the antipode of a closed universe).
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_transverse_comoving_distance_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_through_array(universe, redshifts, n, out, |u, x, out| {
            widest!(
                |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                    u.transverse_comoving_distance_mpc_array(x, out)
                }
            )
        })
    }
}

/// Array form of `relicore_angular_diameter_distance_mpc`: out[i] =
/// angular_diameter_distance_mpc(universe, redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, D_A in Mpc.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_angular_diameter_distance_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_through_array(universe, redshifts, n, out, |u, x, out| {
            widest!(
                |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                    u.angular_diameter_distance_mpc_array(x, out)
                }
            )
        })
    }
}

/// Array form of `relicore_luminosity_distance_mpc`: out[i] = luminosity_distance_mpc(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, D_L in Mpc.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `redshifts` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Computed by the core's array form (blocks of 64 elements in SIMD, in the widest compilation
/// the CPU supports: AVX-512, AVX2 or the baseline), which gives the scalar function's bits;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `redshifts` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `redshifts` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_luminosity_distance_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_through_array(universe, redshifts, n, out, |u, x, out| {
            widest!(
                |u: &Universe<f64>, x: &[f64], out: &mut [f64]| -> ArrayResult {
                    u.luminosity_distance_mpc_array(x, out)
                }
            )
        })
    }
}

/// Array form of `relicore_distance_modulus`: out[i] = distance_modulus(universe, redshifts[i]) for
/// i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, the distance modulus in magnitudes.
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
pub unsafe extern "C" fn relicore_distance_modulus_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.distance_modulus(x)) }
}

/// Array form of `relicore_comoving_volume_gpc3`: out[i] = comoving_volume_gpc3(universe,
/// redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, V_C in Gpc³, ≥ 0.
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
pub unsafe extern "C" fn relicore_comoving_volume_gpc3_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.comoving_volume_gpc3(x)
        })
    }
}

/// Array form of `relicore_differential_comoving_volume_mpc3_sr`: out[i] =
/// differential_comoving_volume_mpc3_sr(universe, redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, dV_C/dz/dΩ in Mpc³ sr⁻¹, ≥ 0.
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
pub unsafe extern "C" fn relicore_differential_comoving_volume_mpc3_sr_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.differential_comoving_volume_mpc3_sr(x)
        })
    }
}

/// Array form of `relicore_transverse_scale_kpc_per_arcsec`: out[i] =
/// transverse_scale_kpc_per_arcsec(universe, redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, kpc per arcsec.
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
pub unsafe extern "C" fn relicore_transverse_scale_kpc_per_arcsec_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, redshifts, n, out, |u, x| {
            u.transverse_scale_kpc_per_arcsec(x)
        })
    }
}

/// Array form of `relicore_lookback_time_gyr`: out[i] = lookback_time_gyr(universe, redshifts[i])
/// for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, the lookback time in Gyr (Julian years), ≥ 0.
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
pub unsafe extern "C" fn relicore_lookback_time_gyr_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.lookback_time_gyr(x)) }
}

/// Array form of `relicore_age_gyr`: out[i] = age_gyr(universe, redshifts[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, the age in Gyr (Julian years), > 0.
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
pub unsafe extern "C" fn relicore_age_gyr_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.age_gyr(x)) }
}

/// Array form of `relicore_conformal_time_mpc`: out[i] = conformal_time_mpc(universe, redshifts[i])
/// for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `redshifts`: n redshifts, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, c·η in Mpc, > 0.
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
pub unsafe extern "C" fn relicore_conformal_time_mpc_array(
    universe: *const relicore_universe,
    redshifts: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, redshifts, n, out, |u, x| u.conformal_time_mpc(x)) }
}

/// Array form of `relicore_redshift_at_age_gyr`: out[i] = redshift_at_age_gyr(universe,
/// ages_gyr[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `ages_gyr`: n ages of the universe in Gyr, each finite and > 0, at most the age today.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, redshifts z, ≥ 0.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `ages_gyr` or `out` is NULL (even for n = 0) and
/// `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `ages_gyr` is NULL or
/// points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `ages_gyr` (computed in place); other overlaps give
/// unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_age_gyr_array(
    universe: *const relicore_universe,
    ages_gyr: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe { universe_array(universe, ages_gyr, n, out, |u, x| u.redshift_at_age_gyr(x)) }
}

/// Array form of `relicore_redshift_at_lookback_time_gyr`: out[i] =
/// redshift_at_lookback_time_gyr(universe, lookback_times_gyr[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `lookback_times_gyr`: n lookback times in Gyr, each finite and ≥ 0, below the age today.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, redshifts z, ≥ 0.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `lookback_times_gyr` or `out` is NULL (even for n
/// = 0) and `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `lookback_times_gyr` is
/// NULL or points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `lookback_times_gyr` (computed in place); other
/// overlaps give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_lookback_time_gyr_array(
    universe: *const relicore_universe,
    lookback_times_gyr: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, lookback_times_gyr, n, out, |u, x| {
            u.redshift_at_lookback_time_gyr(x)
        })
    }
}

/// Array form of `relicore_redshift_at_comoving_distance_mpc`: out[i] =
/// redshift_at_comoving_distance_mpc(universe, distances_mpc[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `distances_mpc`: n line-of-sight comoving distances in Mpc, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, redshifts z, ≥ 0.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `distances_mpc` or `out` is NULL (even for n = 0)
/// and `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `distances_mpc` is NULL
/// or points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `distances_mpc` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_comoving_distance_mpc_array(
    universe: *const relicore_universe,
    distances_mpc: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, distances_mpc, n, out, |u, x| {
            u.redshift_at_comoving_distance_mpc(x)
        })
    }
}

/// Array form of `relicore_redshift_at_luminosity_distance_mpc`: out[i] =
/// redshift_at_luminosity_distance_mpc(universe, distances_mpc[i]) for i < n.
///
/// * `universe`: from `relicore_universe_init`.
/// * `distances_mpc`: n luminosity distances in Mpc, each finite and ≥ 0.
/// * `n`: number of elements of both arrays.
/// * `out`: n results, redshifts z, ≥ 0.
///
/// Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). When
/// some elements fail, those outputs are NaN, the others are computed, and the code of the first
/// failing element is returned (the element errors of the scalar function).
/// `RELICORE_ERROR_NULL_POINTER` when `universe`, `distances_mpc` or `out` is NULL (even for n = 0)
/// and `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a successful
/// `relicore_universe_init`; then every element of a non-NULL `out` is NaN.
///
/// Each element is computed by the same code as the scalar function, so the two agree bit for bit;
/// accuracy as there. Allocates nothing.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `distances_mpc` is NULL
/// or points to n readable `double`; `out` is NULL or points to n writable `double` outside
/// `*universe`. `out` may be the same buffer as `distances_mpc` (computed in place); other overlaps
/// give unspecified values.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_luminosity_distance_mpc_array(
    universe: *const relicore_universe,
    distances_mpc: *const f64,
    n: usize,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).
    unsafe {
        universe_array(universe, distances_mpc, n, out, |u, x| {
            u.redshift_at_luminosity_distance_mpc(x)
        })
    }
}
