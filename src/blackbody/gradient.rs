//! Gradients: the value of a blackbody function together with its exact partial derivatives
//! with respect to every scalar argument, by forward-mode dual numbers ([`crate::dual`])
//! through the same generic code as the plain function.
//!
//! Every function here returns `(value, [∂/∂arg₀, ∂/∂arg₁, …])` in the order of the plain
//! function's arguments. The value is the plain function's result bit for bit (the same
//! operations on the value part; tested), the errors are the plain function's errors for the
//! same arguments (the checks look at values only), and the partials are the derivatives of
//! what the function computes: chain rule through the double-length Planck exponent and the
//! table-driven e^x − 1 (see [`crate::dual`]), the quadrature of narrow bands with error
//! control on the partials too, and for the band-radiance inversion the implicit function
//! theorem at the converged root (never the derivative of the iteration).
//!
//! Accuracy of the partials (`f64`): within 1e-12 relative against mpmath (`mpmath.diff` at 40
//! digits of independent mpmath implementations of Planck's law, its closed-form inverse and
//! its band integral by `mpmath.quad`; `tests/data/gradients/blackbody.txt`, script
//! `tests/reference/gradient_vectors.py`); measured worst errors are printed by
//! `tests/dual_blackbody.rs`. The temperature partial of B_λ and B_ν equals the library's
//! closed-form ∂B/∂T ([`radiance_temperature_derivative_wavelength`](super::radiance_temperature_derivative_wavelength))
//! within a few ulp (tested).
//!
//! Reference: Planck 1901 (see [`spectral_radiance_wavelength`]); forward-mode automatic
//! differentiation: A. Griewank & A. Walther, Evaluating Derivatives, 2nd ed., SIAM 2008.
//!
//! Cautions: as for the plain functions (see [`crate::blackbody`]); a derivative is a local
//! sensitivity, no substitute for the uncertainty analysis the applicable standards require.

use super::{
    band_radiance_frequency, band_radiance_wavelength, brightness_temperature_frequency,
    brightness_temperature_wavelength, spectral_radiance_frequency, spectral_radiance_wavelength,
    temperature_from_band_radiance_wavelength,
};
use crate::dual::Dual;
use crate::{Real, Result};

/// Value and partials of a function of two arguments.
#[inline]
fn gradient2<T: Real>(
    f: impl Fn(Dual<T, 2>, Dual<T, 2>) -> Result<Dual<T, 2>>,
    x0: T,
    x1: T,
) -> Result<(T, [T; 2])> {
    let r = f(Dual::variable(x0, 0), Dual::variable(x1, 1))?;
    Ok((r.value(), r.partials()))
}

/// Value and partials of a function of three arguments.
#[inline]
fn gradient3<T: Real>(
    f: impl Fn(Dual<T, 3>, Dual<T, 3>, Dual<T, 3>) -> Result<Dual<T, 3>>,
    x0: T,
    x1: T,
    x2: T,
) -> Result<(T, [T; 3])> {
    let r = f(
        Dual::variable(x0, 0),
        Dual::variable(x1, 1),
        Dual::variable(x2, 2),
    )?;
    Ok((r.value(), r.partials()))
}

/// Planck spectral radiance per unit wavelength B_λ(λ, T) with its gradient.
///
/// * `wavelength_m`: λ in m, finite and > 0.
/// * `temperature_k`: T in K, finite and > 0.
///
/// Returns (B_λ in W m⁻² sr⁻¹ m⁻¹, [∂B_λ/∂λ in W m⁻² sr⁻¹ m⁻², ∂B_λ/∂T in W m⁻² sr⁻¹ m⁻¹ K⁻¹]);
/// B_λ is [`spectral_radiance_wavelength`]'s result bit for bit.
///
/// Errors: those of [`spectral_radiance_wavelength`].
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation);
/// ∂B_λ/∂T agrees with the closed form of
/// [`radiance_temperature_derivative_wavelength`](super::radiance_temperature_derivative_wavelength).
pub fn spectral_radiance_wavelength_gradient<T: Real>(
    wavelength_m: T,
    temperature_k: T,
) -> Result<(T, [T; 2])> {
    gradient2(spectral_radiance_wavelength, wavelength_m, temperature_k)
}

/// Planck spectral radiance per unit frequency B_ν(ν, T) with its gradient.
///
/// * `frequency_hz`: ν in Hz, finite and > 0.
/// * `temperature_k`: T in K, finite and > 0.
///
/// Returns (B_ν in W m⁻² sr⁻¹ Hz⁻¹, [∂B_ν/∂ν in W m⁻² sr⁻¹ Hz⁻², ∂B_ν/∂T in
/// W m⁻² sr⁻¹ Hz⁻¹ K⁻¹]); B_ν is [`spectral_radiance_frequency`]'s result bit for bit.
///
/// Errors: those of [`spectral_radiance_frequency`].
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn spectral_radiance_frequency_gradient<T: Real>(
    frequency_hz: T,
    temperature_k: T,
) -> Result<(T, [T; 2])> {
    gradient2(spectral_radiance_frequency, frequency_hz, temperature_k)
}

/// Brightness temperature at a wavelength with its gradient.
///
/// * `wavelength_m`: λ in m, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ m⁻¹, finite and > 0.
///
/// Returns (T in K, [∂T/∂λ in K m⁻¹, ∂T/∂L in K per W m⁻² sr⁻¹ m⁻¹]); T is
/// [`brightness_temperature_wavelength`]'s result bit for bit (a closed form: no iteration).
///
/// Errors: those of [`brightness_temperature_wavelength`].
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn brightness_temperature_wavelength_gradient<T: Real>(
    wavelength_m: T,
    spectral_radiance: T,
) -> Result<(T, [T; 2])> {
    gradient2(
        brightness_temperature_wavelength,
        wavelength_m,
        spectral_radiance,
    )
}

/// Brightness temperature at a frequency with its gradient.
///
/// * `frequency_hz`: ν in Hz, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
///
/// Returns (T in K, [∂T/∂ν in K Hz⁻¹, ∂T/∂L in K per W m⁻² sr⁻¹ Hz⁻¹]); T is
/// [`brightness_temperature_frequency`]'s result bit for bit.
///
/// Errors: those of [`brightness_temperature_frequency`].
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn brightness_temperature_frequency_gradient<T: Real>(
    frequency_hz: T,
    spectral_radiance: T,
) -> Result<(T, [T; 2])> {
    gradient2(
        brightness_temperature_frequency,
        frequency_hz,
        spectral_radiance,
    )
}

/// Band radiance between two wavelengths with its gradient.
///
/// * `lower_m`, `upper_m`: band edges λ₁, λ₂ in m, 0 ≤ λ₁ < λ₂ (finite).
/// * `temperature_k`: T in K, > 0.
///
/// Returns (L in W m⁻² sr⁻¹, [∂L/∂λ₁ = −B_λ(λ₁), ∂L/∂λ₂ = B_λ(λ₂) in W m⁻² sr⁻¹ m⁻¹, ∂L/∂T in
/// W m⁻² sr⁻¹ K⁻¹]); L is [`band_radiance_wavelength`]'s result bit for bit.
///
/// Errors: those of [`band_radiance_wavelength`]. An infinite λ₂ is accepted as there; its
/// partial is then not meaningful (NaN or 0).
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn band_radiance_wavelength_gradient<T: Real>(
    lower_m: T,
    upper_m: T,
    temperature_k: T,
) -> Result<(T, [T; 3])> {
    gradient3(band_radiance_wavelength, lower_m, upper_m, temperature_k)
}

/// Band radiance between two frequencies with its gradient.
///
/// * `lower_hz`, `upper_hz`: band edges ν₁, ν₂ in Hz, 0 ≤ ν₁ < ν₂ (finite).
/// * `temperature_k`: T in K, > 0.
///
/// Returns (L in W m⁻² sr⁻¹, [∂L/∂ν₁ = −B_ν(ν₁), ∂L/∂ν₂ = B_ν(ν₂) in W m⁻² sr⁻¹ Hz⁻¹, ∂L/∂T in
/// W m⁻² sr⁻¹ K⁻¹]); L is [`band_radiance_frequency`]'s result bit for bit.
///
/// Errors: those of [`band_radiance_frequency`]; an infinite ν₂ as for the wavelength form.
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn band_radiance_frequency_gradient<T: Real>(
    lower_hz: T,
    upper_hz: T,
    temperature_k: T,
) -> Result<(T, [T; 3])> {
    gradient3(band_radiance_frequency, lower_hz, upper_hz, temperature_k)
}

/// Temperature from a band radiance between two wavelengths, with its gradient: the partials
/// of the root by the implicit function theorem (one evaluation at the converged T).
///
/// * `lower_m`, `upper_m`: band edges λ₁, λ₂ in m, 0 ≤ λ₁ < λ₂ (finite).
/// * `radiance`: band radiance L in W m⁻² sr⁻¹, > 0.
///
/// Returns (T in K, [∂T/∂λ₁, ∂T/∂λ₂ in K m⁻¹, ∂T/∂L in K per W m⁻² sr⁻¹]) with
/// ∂T/∂x = −(∂L/∂x)/(∂L/∂T); T is [`temperature_from_band_radiance_wavelength`]'s result bit
/// for bit.
///
/// Errors: those of [`temperature_from_band_radiance_wavelength`].
/// Accuracy: partials within 1e-12 relative (`f64`) against mpmath (module documentation).
pub fn temperature_from_band_radiance_wavelength_gradient<T: Real>(
    lower_m: T,
    upper_m: T,
    radiance: T,
) -> Result<(T, [T; 3])> {
    gradient3(
        temperature_from_band_radiance_wavelength,
        lower_m,
        upper_m,
        radiance,
    )
}
