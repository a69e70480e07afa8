//! The time-step factors of a comoving leapfrog (Quinn, Katz, Stadel & Lake 1997,
//! arXiv:astro-ph/9710043, eqs. 31–32 as recalled from memory): with comoving positions x and
//! canonical momenta p = a² ẋ, a drift moves x by p ∫ dt/a² = p ∫ da/(a³H) and a kick moves p by
//! the force times ∫ dt/a = ∫ da/(a²H).
//!
//! With q = a²E (finite at a → 0): drift = t_H ∫ da/(a q), kick = t_H ∫ da/q, t_H = 1/H0. One
//! Gauss-Kronrod 7-15 panel in a is taken first (a time step is short: the panel is exact to
//! rounding); when its error estimate exceeds 1e-14 of the value the shared adaptive quadrature
//! integrates in N = ln a instead (drift = t_H ∫ dN/q, kick = t_H ∫ a dN/q, smooth over any
//! range).

use crate::check::{finite, finite_result};
use crate::cosmology::Universe;
use crate::math::quadrature::{gauss_kronrod_15, integrate};
use crate::{Error, Real, Result};

/// A scale factor: finite, > 0 (`NonPositive`) and ≤ 1 (`OutOfDomain`).
fn scale_factor<T: Real>(a: T, arg: u8) -> Result<T> {
    let a = finite(a, arg)?;
    if !(a > T::zero()) {
        return Err(Error::NonPositive(arg));
    }
    if a > T::one() {
        return Err(Error::OutOfDomain(arg));
    }
    Ok(a)
}

impl<T: Real> Universe<T> {
    /// t_H ∫_{a1}^{a2} a^power da / q(a) (power −1 or 0), signed.
    fn leapfrog_integral(&self, a1: T, a2: T, drift: bool) -> Result<T> {
        if a1 == a2 {
            return Ok(T::zero());
        }
        let mut in_a = |a: T| {
            let q = self.q_squared(a).sqrt();
            if drift {
                T::one() / (a * q)
            } else {
                T::one() / q
            }
        };
        let (v, err) = gauss_kronrod_15(&mut in_a, a1, a2);
        let value = if v.is_finite() && err <= T::c(1e-14).max(T::epsilon() * T::c(16.0)) * v.abs()
        {
            v
        } else {
            integrate(
                |n: T| {
                    let a = n.exp();
                    let q = self.q_squared(a).sqrt();
                    if drift { T::one() / q } else { a / q }
                },
                a1.ln(),
                a2.ln(),
                T::epsilon() * T::c(8.0),
                T::zero(),
            )
            .map_err(|_| Error::OutOfDomain(0))?
        };
        finite_result(self.hubble_time_gyr * value, 0)
    }

    /// Drift factor of a comoving leapfrog step, ∫_{a1}^{a2} da/(a³H), Gyr (Quinn, Katz, Stadel
    /// & Lake 1997): the time a drift multiplies the canonical momentum p = a²ẋ by.
    ///
    /// * `start_scale_factor`: a1, 0 < a1 ≤ 1.
    /// * `end_scale_factor`: a2, 0 < a2 ≤ 1 (a2 < a1 gives the negative factor of a backward
    ///   step).
    ///
    /// Errors: `NonFinite(i)`, `NonPositive(i)`, `OutOfDomain(i)` above 1 (the universe is
    /// validated up to today only); `OutOfDomain(0)` when the integral is not representable.
    /// Accuracy: within 1e-12 relative (`f64`) of an mpmath quadrature (`tests/data/growth.txt`).
    pub fn leapfrog_drift_factor_gyr(
        &self,
        start_scale_factor: T,
        end_scale_factor: T,
    ) -> Result<T> {
        let a1 = scale_factor(start_scale_factor, 0)?;
        let a2 = scale_factor(end_scale_factor, 1)?;
        self.leapfrog_integral(a1, a2, true)
    }

    /// Kick factor of a comoving leapfrog step, ∫_{a1}^{a2} da/(a²H), Gyr (Quinn, Katz, Stadel
    /// & Lake 1997): the time a kick multiplies the comoving force by. Arguments, errors and
    /// accuracy as [`leapfrog_drift_factor_gyr`](Self::leapfrog_drift_factor_gyr).
    pub fn leapfrog_kick_factor_gyr(
        &self,
        start_scale_factor: T,
        end_scale_factor: T,
    ) -> Result<T> {
        let a1 = scale_factor(start_scale_factor, 0)?;
        let a2 = scale_factor(end_scale_factor, 1)?;
        self.leapfrog_integral(a1, a2, false)
    }
}
