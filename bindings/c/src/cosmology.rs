//! The cosmological background in `double`: one export per redshift function of
//! `relicore::cosmology::Universe`, same name with the `relicore_` prefix, the universe first,
//! then the arguments of the core method, the result through `out`. Array forms are in
//! `cosmology_array`; the universe, its parameters and its constants in `universe`.
//!
//! Units: Mpc, Gyr (of Julian years), km s⁻¹ Mpc⁻¹, kg m⁻³, Gpc³, K, as the names say.

use crate::universe::{relicore_universe, universe_scalar};

/// Dimensionless Hubble rate E(z) = H(z)/H0, from the Friedmann equation E² = Ω_cb(1+z)³ +
/// Ω_r(1+z)⁴ + Σ ρ_ν,i(z)/ρ_c + Ω_k(1+z)² + Ω_de f_de(z), with massive neutrinos by the exact
/// Fermi-Dirac energy integral and f_de(z) of the w0–wa dark energy.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: E, dimensionless (≥ 1 for ordinary models).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: Friedmann equation; w0–wa dark energy of Chevallier & Polarski 2001, Int. J. Mod.
/// Phys. D 10, 213 and Linder 2003, PRL 90, 091301; neutrino energy density as in Lesgourgues &
/// Pastor 2006, Phys. Rep. 429, 307, eq. 13.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_dimensionless_hubble(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.dimensionless_hubble(z)) }
}

/// Hubble parameter H(z) = H0 E(z).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: H in km s⁻¹ Mpc⁻¹.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_hubble_parameter_km_s_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.hubble_parameter_km_s_mpc(z)) }
}

/// Matter density parameter at z: cold dark matter, baryons and massive neutrinos (the bookkeeping
/// of `omega_matter`) over the critical density at z.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: Ω_m(z), dimensionless (in [0, 1] for flat models).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_omega_matter_at(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.omega_matter_at(z)) }
}

/// Radiation density parameter at z: photons and massless neutrino species over the critical
/// density at z.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: Ω_r(z), dimensionless.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_omega_radiation_at(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.omega_radiation_at(z)) }
}

/// Dark-energy density parameter at z, Ω_de f_de(z)/E².
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: Ω_de(z), dimensionless.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_omega_dark_energy_at(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.omega_dark_energy_at(z)) }
}

/// Curvature density parameter at z, Ω_k(1+z)²/E².
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: Ω_k(z), dimensionless.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_omega_curvature_at(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.omega_curvature_at(z)) }
}

/// Critical density at z, ρ_c(z) = 3H(z)²/(8πG), with G of CODATA 2022.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: ρ_c in kg m⁻³, > 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: within 1e-14 relative against mpmath (1e-12 for universes with massive neutrinos,
/// whose density is a Fermi-Dirac integral), `tests/data/cosmology.txt`.
///
/// Reference: the Friedmann equation, as `relicore_dimensionless_hubble`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_critical_density_kg_m3(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.critical_density_kg_m3(z)) }
}

/// CMB (radiation) temperature at z, T0(1+z).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: T in K, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0.
///
/// Accuracy: exact to one rounding (within 2 ulp against mpmath).
///
/// Reference: adiabatic expansion of a blackbody, T ∝ 1/a.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_cmb_temperature_at_k(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.cmb_temperature_at_k(z)) }
}

/// Line-of-sight comoving distance D_C = (c/H0) ∫₀^z dz'/E(z').
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: D_C in Mpc, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z from 0 to 1e4 in every model of
/// `tests/data/cosmology.txt` (with and without radiation, open, flat, closed, w0–wa, massive
/// neutrinos). Method: the per-universe Chebyshev table for z ≤ 16383, adaptive Gauss-Kronrod
/// quadrature in s = √a beyond.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 15.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_comoving_distance_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.comoving_distance_mpc(z)) }
}

/// Transverse comoving distance D_M: D_C in a flat universe, (D_H/√Ω_k) sinh(√Ω_k D_C/D_H) in an
/// open one, the sin form in a closed one.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: D_M in Mpc (≥ 0 except past the antipode of a closed universe).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z from 0 to 1e4; method as
/// `relicore_comoving_distance_mpc`.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 16.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_transverse_comoving_distance_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.transverse_comoving_distance_mpc(z)) }
}

/// Angular-diameter distance D_A = D_M/(1+z).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: D_A in Mpc.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z from 0 to 1e4; method as
/// `relicore_comoving_distance_mpc`.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 18.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_angular_diameter_distance_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.angular_diameter_distance_mpc(z)) }
}

/// Luminosity distance D_L = (1+z) D_M.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: D_L in Mpc.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z from 0 to 1e4; method as
/// `relicore_comoving_distance_mpc`.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 21.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_luminosity_distance_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.luminosity_distance_mpc(z)) }
}

/// Distance modulus 5 log10(D_L / 10 pc).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: the distance modulus in magnitudes.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing); `RELICORE_ERROR_NON_POSITIVE` at z = 0
/// (D_L = 0).
///
/// Accuracy: within 1e-12 relative against mpmath.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 25.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_distance_modulus(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.distance_modulus(z)) }
}

/// Comoving volume inside redshift z over the whole sky, computed as V = 2πχ³ Σₙ 4ⁿ⁺¹ wⁿ/(2n+3)!, w
/// = Ω_k (χ/D_H)², exact for open, flat and closed models without the cancellation of the closed
/// forms at small w (which are used for |w| > 10).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: V_C in Gpc³, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 3e-12 relative against mpmath.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 29 (and its closed-model analogue).
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_comoving_volume_gpc3(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.comoving_volume_gpc3(z)) }
}

/// Differential comoving volume dV_C/dz/dΩ = D_H D_M²/E(z).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: dV_C/dz/dΩ in Mpc³ sr⁻¹, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 3e-12 relative against mpmath.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 28.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_differential_comoving_volume_mpc3_sr(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.differential_comoving_volume_mpc3_sr(z)) }
}

/// Proper transverse size subtended by one arcsecond at z, D_A · π/648000.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: kpc per arcsec.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_NO_CONVERGENCE` if the
/// quadrature beyond the table fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z from 0 to 1e4; method as
/// `relicore_comoving_distance_mpc`.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 18 (small-angle form).
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_transverse_scale_kpc_per_arcsec(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.transverse_scale_kpc_per_arcsec(z)) }
}

/// Lookback time t(0) − t(z) = (1/H0) ∫₀^z dz'/((1+z')E(z')).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: the lookback time in Gyr (Julian years), ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_OUT_OF_DOMAIN` if the
/// quadrature fails (not seen in testing).
///
/// Accuracy: within 1e-12 relative against mpmath for z up to 1e4. Method: adaptive Gauss-Kronrod
/// quadrature in s = √a.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 30.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_lookback_time_gyr(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.lookback_time_gyr(z)) }
}

/// Age of the universe at redshift z, (1/H0) ∫_z^∞ dz'/((1+z')E(z')) (z = 0: the age today).
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: the age in Gyr (Julian years), > 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_OUT_OF_DOMAIN` when the
/// integral diverges (a model whose past is infinite, e.g. pure de Sitter).
///
/// Accuracy: within 1e-12 relative against mpmath for z up to 1e8; the Einstein-de Sitter and flat
/// ΛCDM closed forms are among the reference vectors. Method: adaptive Gauss-Kronrod quadrature in
/// s = √a, smooth down to a → 0.
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 30 integrated to z = ∞.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_age_gyr(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.age_gyr(z)) }
}

/// Conformal time at z times c, c·η(z) = (c/H0) ∫_z^∞ dz'/E(z'): the comoving particle horizon.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z`: redshift z, finite and ≥ 0.
/// * `out`: c·η in Mpc, > 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite z; `RELICORE_ERROR_NEGATIVE` for z < 0; `RELICORE_ERROR_OUT_OF_DOMAIN` where the
/// integral diverges (a model with neither radiation nor matter, e.g. the empty Milne model).
///
/// Accuracy: within 1e-12 relative against mpmath for z up to 1e8. Method: adaptive Gauss-Kronrod
/// quadrature in s = √a.
///
/// Reference: the conformal time of the Friedmann-Lemaître-Robertson-Walker metric, dη = dt/a.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_conformal_time_mpc(
    universe: *const relicore_universe,
    z: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.conformal_time_mpc(z)) }
}

/// Angular-diameter distance of an object at z2 seen from z1 ≤ z2, D_M(χ2 − χ1)/(1 + z2), χ the
/// line-of-sight comoving distance and D_M() the curvature function of
/// `relicore_transverse_comoving_distance_mpc` applied to the difference.
///
/// * `universe`: from `relicore_universe_init`.
/// * `z1`: redshift of the observer, finite and ≥ 0.
/// * `z2`: redshift of the source, finite and ≥ z1.
/// * `out`: D_A(z1, z2) in Mpc.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite redshift; `RELICORE_ERROR_NEGATIVE` for a redshift < 0; `RELICORE_ERROR_EMPTY_INTERVAL`
/// when z2 < z1; `RELICORE_ERROR_NO_CONVERGENCE` if the quadrature beyond the table fails (not seen
/// in testing).
///
/// Accuracy: within 1e-12 relative against mpmath, or 1e-15 κ when the interval is so short that χ2
/// − χ1 cancels (κ ≈ z/(z2 − z1), the condition number).
///
/// Reference: Hogg 1999, arXiv:astro-ph/9905116, eq. 19, and its sin form for closed models.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_angular_diameter_distance_between_mpc(
    universe: *const relicore_universe,
    z1: f64,
    z2: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        universe_scalar(universe, out, |u| {
            u.angular_diameter_distance_between_mpc(z1, z2)
        })
    }
}

/// Redshift at which the age of the universe equals `age_gyr` (inverse of `relicore_age_gyr`).
///
/// * `universe`: from `relicore_universe_init`.
/// * `age_gyr`: age of the universe in Gyr, finite and > 0, at most the age today.
/// * `out`: the redshift z, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite age; `RELICORE_ERROR_NON_POSITIVE` for an age ≤ 0; `RELICORE_ERROR_OUT_OF_DOMAIN` above
/// the age today or below the age at z = 1e12; `RELICORE_ERROR_NO_CONVERGENCE` if the iteration
/// fails (not seen in testing).
///
/// Accuracy: round trip within 1e-12 relative; against mpmath within max(1e-12, 1e-13 κ) relative,
/// κ = |d ln z/d ln target| (the condition number of the inversion). Method: safeguarded Newton
/// iteration in u = ln(1+z), bracketed by [0, ln(1 + 1e12)], with the exact derivative.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_age_gyr(
    universe: *const relicore_universe,
    age_gyr: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe { universe_scalar(universe, out, |u| u.redshift_at_age_gyr(age_gyr)) }
}

/// Redshift at which the lookback time equals `lookback_gyr` (inverse of
/// `relicore_lookback_time_gyr`).
///
/// * `universe`: from `relicore_universe_init`.
/// * `lookback_gyr`: lookback time in Gyr, finite and ≥ 0, below the age today.
/// * `out`: the redshift z, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite time; `RELICORE_ERROR_NEGATIVE` for a time < 0; `RELICORE_ERROR_OUT_OF_DOMAIN` at or
/// beyond the age today; `RELICORE_ERROR_NO_CONVERGENCE` if the iteration fails (not seen in
/// testing).
///
/// Accuracy: round trip within 1e-12 relative; against mpmath within max(1e-12, 1e-13 κ) relative,
/// κ = |d ln z/d ln target| (the condition number of the inversion). Method: safeguarded Newton
/// iteration in u = ln(1+z), bracketed by [0, ln(1 + 1e12)], with the exact derivative.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_lookback_time_gyr(
    universe: *const relicore_universe,
    lookback_gyr: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        universe_scalar(universe, out, |u| {
            u.redshift_at_lookback_time_gyr(lookback_gyr)
        })
    }
}

/// Redshift at which the line-of-sight comoving distance equals `distance_mpc` (inverse of
/// `relicore_comoving_distance_mpc`).
///
/// * `universe`: from `relicore_universe_init`.
/// * `distance_mpc`: line-of-sight comoving distance in Mpc, finite and ≥ 0.
/// * `out`: the redshift z, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite distance; `RELICORE_ERROR_NEGATIVE` for a distance < 0; `RELICORE_ERROR_OUT_OF_DOMAIN`
/// beyond the distance reached at z = 1e12 (the particle horizon); `RELICORE_ERROR_NO_CONVERGENCE`
/// if the iteration fails (not seen in testing).
///
/// Accuracy: round trip within 1e-12 relative; against mpmath within max(1e-12, 1e-13 κ) relative,
/// κ = |d ln z/d ln target| (the condition number of the inversion). Method: safeguarded Newton
/// iteration in u = ln(1+z), bracketed by [0, ln(1 + 1e12)], with the exact derivative.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_comoving_distance_mpc(
    universe: *const relicore_universe,
    distance_mpc: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        universe_scalar(universe, out, |u| {
            u.redshift_at_comoving_distance_mpc(distance_mpc)
        })
    }
}

/// Redshift at which the luminosity distance equals `distance_mpc` (inverse of
/// `relicore_luminosity_distance_mpc`). In a closed universe D_L need not grow monotonically; the
/// root found in the bracket is returned.
///
/// * `universe`: from `relicore_universe_init`.
/// * `distance_mpc`: luminosity distance in Mpc, finite and ≥ 0.
/// * `out`: the redshift z, ≥ 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN: `RELICORE_ERROR_NULL_POINTER`
/// when `universe` or `out` is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not
/// filled by a successful `relicore_universe_init`; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite distance; `RELICORE_ERROR_NEGATIVE` for a distance < 0; `RELICORE_ERROR_OUT_OF_DOMAIN`
/// when no redshift up to 1e12 gives it; `RELICORE_ERROR_NO_CONVERGENCE` if the iteration fails
/// (not seen in testing).
///
/// Accuracy: round trip within 1e-12 relative; against mpmath within max(1e-12, 1e-13 κ) relative,
/// κ = |d ln z/d ln target| (the condition number of the inversion). Method: safeguarded Newton
/// iteration in u = ln(1+z), bracketed by [0, ln(1 + 1e12)], with the exact derivative.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or points
/// to a writable `double` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_redshift_at_luminosity_distance_mpc(
    universe: *const relicore_universe,
    distance_mpc: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        universe_scalar(universe, out, |u| {
            u.redshift_at_luminosity_distance_mpc(distance_mpc)
        })
    }
}
