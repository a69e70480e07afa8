//! The published fitting formulas for the last-scattering and drag redshifts.

use crate::arg;
use crate::check::{finite_result, positive};
use crate::{Real, Result};

/// x^p for x > 0.
#[inline]
fn pow<T: Real>(x: T, p: f64) -> T {
    (T::c(p) * x.ln()).exp()
}

/// Redshift of last scattering by the fit of Hu & Sugiyama 1996 (ApJ 471, 542, eqs. E1–E2;
/// coefficients from memory):
/// z* = 1048 [1 + 0.00124 ω_b^−0.738] [1 + g₁ ω_m^g₂], g₁ = 0.0783 ω_b^−0.238/(1 + 39.5 ω_b^0.763),
/// g₂ = 0.560/(1 + 21.1 ω_b^1.81).
///
/// * `omega_baryon_h2`: ω_b = Ω_b h², > 0.
/// * `omega_matter_h2`: ω_m = Ω_m h², > 0.
///
/// Returns z*, dimensionless. Errors: `NonFinite(i)`, `NonPositive(i)`. Accuracy: the fit's
/// own, about 1% against full recombination calculations (as its authors state; from memory);
/// the formula itself is evaluated to a few ulp (mpmath vectors).
pub fn last_scattering_redshift_fit<T: Real>(omega_baryon_h2: T, omega_matter_h2: T) -> Result<T> {
    let wb = positive(omega_baryon_h2, arg!(0, omega_baryon_h2))?;
    let wm = positive(omega_matter_h2, arg!(1, omega_matter_h2))?;
    let g1 = T::c(0.0783) * pow(wb, -0.238) / (T::one() + T::c(39.5) * pow(wb, 0.763));
    let g2 = T::c(0.560) / (T::one() + T::c(21.1) * pow(wb, 1.81));
    let z = T::c(1048.0)
        * (T::one() + T::c(0.00124) * pow(wb, -0.738))
        * (T::one() + g1 * (g2 * wm.ln()).exp());
    finite_result(z, arg!(0, omega_baryon_h2))
}

/// Redshift of the drag epoch by the fit of Eisenstein & Hu 1998 (ApJ 496, 605, eq. 4;
/// coefficients from memory):
/// z_d = 1291 ω_m^0.251/(1 + 0.659 ω_m^0.828) [1 + b₁ ω_b^b₂],
/// b₁ = 0.313 ω_m^−0.419 [1 + 0.607 ω_m^0.674], b₂ = 0.238 ω_m^0.223.
///
/// * `omega_baryon_h2`: ω_b = Ω_b h², > 0.
/// * `omega_matter_h2`: ω_m = Ω_m h², > 0.
///
/// Returns z_d, dimensionless. Errors: `NonFinite(i)`, `NonPositive(i)`. Accuracy: the fit's
/// own (its authors quote a few per cent or better over the usual parameter range; from
/// memory); the formula itself is evaluated to a few ulp (mpmath vectors).
pub fn drag_redshift_fit<T: Real>(omega_baryon_h2: T, omega_matter_h2: T) -> Result<T> {
    let wb = positive(omega_baryon_h2, arg!(0, omega_baryon_h2))?;
    let wm = positive(omega_matter_h2, arg!(1, omega_matter_h2))?;
    let b1 = T::c(0.313) * pow(wm, -0.419) * (T::one() + T::c(0.607) * pow(wm, 0.674));
    let b2 = T::c(0.238) * pow(wm, 0.223);
    let z = T::c(1291.0) * pow(wm, 0.251) / (T::one() + T::c(0.659) * pow(wm, 0.828))
        * (T::one() + b1 * (b2 * wb.ln()).exp());
    finite_result(z, arg!(0, omega_baryon_h2))
}
