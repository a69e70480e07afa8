//! Saha equilibrium of hydrogen and both helium stages.

use super::species::{Hydrogen, Species, electron_balance};
use crate::arg;
use crate::check::finite_result;
use crate::cosmology::Universe;
use crate::{Error, Real, Result};

/// Highest redshift of [`saha_ionized_fraction`]: T_r = 2.7e8 K for T0 = 2.7255 K, far below
/// the temperatures where electron-positron pairs matter (kT ≈ 23 keV ≪ m_e c²).
pub const SAHA_HIGHEST_REDSHIFT: f64 = 1e8;

/// Ionised fraction x_e = n_e/n_H in Saha equilibrium at redshift z: hydrogen and both helium
/// stages (He I → He II → He III) in equilibrium with the radiation at T_r = T0 (1+z), coupled
/// through the electron density (equations: the module doc of [`crate::decoupling`]). It exceeds
/// 1 while helium is ionised, up to 1 + 2 n_He/n_H.
///
/// * `universe`: its Ω_b, Y_p, T0 and H0 set the densities.
/// * `z`: redshift, finite, 0 ≤ z ≤ 1e8.
///
/// Returns x_e, dimensionless (0 where the equilibrium value is below the smallest positive
/// number of the type, as at z = 0).
///
/// Errors: `NonFinite(1)`, `Negative(1)`, `OutOfDomain(1)` above z = 1e8;
/// `InvalidParameter(2)` for a universe without baryons, `InvalidParameter(4)` without
/// radiation (T0 = 0). Accuracy: within 1e-13 relative (`f64`) against mpmath
/// (`tests/data/decoupling.txt`).
///
/// Reference: Saha 1920, Phil. Mag. 40, 472; for the cosmological form, e.g. Peebles 1993,
/// Principles of Physical Cosmology, §6.
pub fn saha_ionized_fraction<T: Real>(universe: &Universe<T>, z: T) -> Result<T> {
    if !z.is_finite() {
        return Err(Error::NonFinite(arg!(1, z)));
    }
    if z < T::zero() {
        return Err(Error::Negative(arg!(1, z)));
    }
    if z > T::c(SAHA_HIGHEST_REDSHIFT) {
        return Err(Error::OutOfDomain(arg!(1, z)));
    }
    let s = Species::new(universe)?;
    let u = z.ln_1p();
    let ln_s = s.ln_saha_factors(u);
    let [ln_sh, _, _] = ln_s;
    let b = electron_balance(s.f_he, Hydrogen::Saha(ln_sh), ln_s)?;
    finite_result(b.x_e, arg!(1, z))
}
