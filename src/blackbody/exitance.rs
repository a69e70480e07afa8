//! Hemispherical exitance (Stefan-Boltzmann law and its photon analogue) and the peaks of the
//! Planck function in every form, with their inverses.
//!
//! The peak positions follow from the roots of x = n(1 − e^−x): n = 5 for B_λ, 3 for B_ν and
//! B_ṽ, 4 for N_λ (also the peak of λB_λ), 2 for N_ν (Wien 1893; the roots as in any
//! radiometry text). The roots and the resulting displacement constants are computed with
//! mpmath at 40 digits and rounded once (`tests/reference/blackbody_vectors.py` re-derives
//! them; the core's root finder reproduces the roots in a unit test).

use crate::arg;
use crate::check::{finite_result, positive};
use crate::constants as k;
use crate::math::dd;
use crate::{Real, Result};

/// Radiant exitance of a blackbody, M = σT⁴ (Stefan 1879, Boltzmann 1884).
///
/// * `temperature_k`: K, finite and > 0.
///
/// Returns W m⁻². Errors: `NonFinite(0)`, `NonPositive(0)`.
/// Accuracy: ≤ 2 ulp (`f64`) against mpmath (T⁴ is formed to double length).
pub fn radiant_exitance<T: Real>(temperature_k: T) -> Result<T> {
    let t = positive(temperature_k, arg!(0, temperature_k))?;
    let (h2, l2) = dd::two_prod(t, t);
    let (h4, l4) = dd::mul_dd_dd(h2, l2, h2, l2);
    finite_result(
        T::c(k::STEFAN_BOLTZMANN) * h4 + T::c(k::STEFAN_BOLTZMANN) * l4,
        arg!(0, temperature_k),
    )
}

/// Photon exitance of a blackbody, M_p = 4πζ(3)k³T³/(h³c²).
///
/// * `temperature_k`: K, finite and > 0.
///
/// Returns photons s⁻¹ m⁻². Errors: `NonFinite(0)`, `NonPositive(0)`.
/// Accuracy: ≤ 2 ulp (`f64`) against mpmath.
pub fn photon_exitance<T: Real>(temperature_k: T) -> Result<T> {
    let t = positive(temperature_k, arg!(0, temperature_k))?;
    let (h2, l2) = dd::two_prod(t, t);
    let (h3, l3) = dd::mul_dd_d(h2, l2, t);
    finite_result(
        T::c(k::PHOTON_STEFAN_BOLTZMANN) * h3 + T::c(k::PHOTON_STEFAN_BOLTZMANN) * l3,
        arg!(0, temperature_k),
    )
}

/// Photon number density of blackbody radiation per T³, 16πζ(3)k³/(hc)³, m⁻³ K⁻³: derived from
/// the exact SI 2019 h, c, k with mpmath at 50 digits and rounded once (20286846.0339070466…;
/// `tests/reference/blackbody_vectors.py` recomputes it).
const PHOTON_DENSITY: f64 = 20_286_846.033_907_05;

/// Photon number density of blackbody radiation at temperature T (isotropic, in equilibrium),
/// n = 16πζ(3)(kT/hc)³ = 4M_p/c, M_p the photon exitance.
///
/// * `temperature_k`: K, finite and > 0.
///
/// Returns photons m⁻³ (about 4.11e8 m⁻³, i.e. 411 cm⁻³, at the CMB temperature 2.7255 K).
/// Errors: `NonFinite(0)`, `NonPositive(0)`; `OutOfDomain(0)` when the result would overflow.
///
/// Accuracy: ≤ 2 ulp (`f64`) against mpmath at 50 digits (T³ is formed to double length).
///
/// Reference: Planck's law integrated over frequency and solid angle, ∫ 8πν²/c³ /(e^(hν/kT) − 1) dν
/// (e.g. Rybicki & Lightman, Radiative Processes in Astrophysics, 1979, ch. 1).
pub fn photon_number_density<T: Real>(temperature_k: T) -> Result<T> {
    let t = positive(temperature_k, arg!(0, temperature_k))?;
    let (h2, l2) = dd::two_prod(t, t);
    let (h3, l3) = dd::mul_dd_d(h2, l2, t);
    finite_result(
        T::c(PHOTON_DENSITY) * h3 + T::c(PHOTON_DENSITY) * l3,
        arg!(0, temperature_k),
    )
}

/// Energy density of blackbody radiation at temperature T, u = aT⁴ = 4σT⁴/c, with the radiation
/// density constant a = 8π⁵k⁴/(15h³c³).
///
/// * `temperature_k`: K, finite and > 0.
///
/// Returns J m⁻³ (about 4.17e-14 J m⁻³ at the CMB temperature 2.7255 K).
/// Errors: `NonFinite(0)`, `NonPositive(0)`; `OutOfDomain(0)` when the result would overflow.
///
/// Accuracy: ≤ 2 ulp (`f64`) against mpmath at 50 digits (T⁴ is formed to double length).
///
/// Reference: Stefan 1879, Boltzmann 1884; u = 4M/c for isotropic radiation (e.g. Rybicki &
/// Lightman 1979, ch. 1).
pub fn radiation_energy_density<T: Real>(temperature_k: T) -> Result<T> {
    let t = positive(temperature_k, arg!(0, temperature_k))?;
    let (h2, l2) = dd::two_prod(t, t);
    let (h4, l4) = dd::mul_dd_dd(h2, l2, h2, l2);
    finite_result(
        T::c(k::RADIATION_DENSITY) * h4 + T::c(k::RADIATION_DENSITY) * l4,
        arg!(0, temperature_k),
    )
}

/// Wavelength of the maximum of B_λ, λ_max = b/T with b = c₂/x₅ (Wien's displacement law).
///
/// * `temperature_k`: K, > 0. Returns m. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn peak_wavelength<T: Real>(temperature_k: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_WAVELENGTH) / positive(temperature_k, arg!(0, temperature_k))?,
        arg!(0, temperature_k),
    )
}

/// Frequency of the maximum of B_ν, ν_max = x₃kT/h.
///
/// * `temperature_k`: K, > 0. Returns Hz. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn peak_frequency<T: Real>(temperature_k: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_FREQUENCY) * positive(temperature_k, arg!(0, temperature_k))?,
        arg!(0, temperature_k),
    )
}

/// Wavenumber of the maximum of B_ṽ, ṽ_max = x₃T/c₂ (same x as the frequency form).
///
/// * `temperature_k`: K, > 0. Returns m⁻¹. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn peak_wavenumber<T: Real>(temperature_k: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_WAVENUMBER) * positive(temperature_k, arg!(0, temperature_k))?,
        arg!(0, temperature_k),
    )
}

/// Wavelength of the maximum of the photon radiance N_λ (and of λB_λ), c₂/(x₄T).
///
/// * `temperature_k`: K, > 0. Returns m. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn photon_peak_wavelength<T: Real>(temperature_k: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_PHOTON_WAVELENGTH) / positive(temperature_k, arg!(0, temperature_k))?,
        arg!(0, temperature_k),
    )
}

/// Frequency of the maximum of the photon radiance N_ν, x₂kT/h.
///
/// * `temperature_k`: K, > 0. Returns Hz. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn photon_peak_frequency<T: Real>(temperature_k: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_PHOTON_FREQUENCY) * positive(temperature_k, arg!(0, temperature_k))?,
        arg!(0, temperature_k),
    )
}

/// Temperature whose B_λ peaks at the given wavelength, T = b/λ_max.
///
/// * `wavelength_m`: m, > 0. Returns K. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn temperature_from_peak_wavelength<T: Real>(wavelength_m: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_WAVELENGTH) / positive(wavelength_m, arg!(0, wavelength_m))?,
        arg!(0, wavelength_m),
    )
}

/// Temperature whose B_ν peaks at the given frequency, T = hν_max/(x₃k).
///
/// * `frequency_hz`: Hz, > 0. Returns K. Errors: `NonFinite(0)`, `NonPositive(0)`.
///
/// Accuracy: ≤ 1 ulp (`f64`) against mpmath.
pub fn temperature_from_peak_frequency<T: Real>(frequency_hz: T) -> Result<T> {
    finite_result(
        T::c(k::WIEN_FREQUENCY_INVERSE) * positive(frequency_hz, arg!(0, frequency_hz))?,
        arg!(0, frequency_hz),
    )
}
