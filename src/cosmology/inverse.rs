//! Inversions: the redshift at a given age, lookback time, comoving or luminosity distance.
//!
//! Each solves in u = ln(1+z) with the shared safeguarded Newton iteration
//! ([`crate::math::roots`]), bracketed by [0, ln(1 + 1e12)] (or below, where the function
//! cannot be computed up to z = 1e12: see `check_reachable`), with the exact derivative
//! (dχ/du = D_H/(q(1+z)), dt/du = t_H/E, …) and a relative tolerance of a few ulp in u.
//! Up to 1100 iterations: enough for bisection alone to reach a redshift of 1e-300 from the
//! top of the bracket, so tiny targets converge too. A target so small that its ratio to D_H
//! (or to 1/H0) is subnormal (a distance below about 1e-304 Mpc, a lookback time below about
//! 1e-306 Gyr in `f64`), where no relative tolerance can be met, is inverted by the series of
//! the function at z = 0 to second order, z = x + k x² with k from E′(0): the third-order term
//! lies far below the smallest subnormal, so the result is the series' value to its rounding.

use super::Universe;
use super::neutrino::density_ratio;
use crate::arg;
use crate::check::{finite_result, non_negative, positive};
use crate::math::roots::bracketed_newton_relative;
use crate::{Arg, Error, Real, Result};

/// Upper end of the search, z = 1e12.
const U_MAX: f64 = 27.631_021_115_928_547;

impl<T: Real> Universe<T> {
    /// E′(0) = dE/dz at z = 0, for the series of the inversions at a subnormal target. With
    /// E²(z) = q²(a)/a⁴ and a = 1/(1+z), dE²/dz = 4q²(1) − dq²/da(1) at z = 0 and
    /// E′ = (dE²/dz)/(2E). dq²/da(1) = Ω_cb + 2Ω_k + Ω_de (4 + p + 3w_a) (p the exponent of the
    /// dark-energy term, `de_power`) plus the massive neutrinos' A·d R(y a)/da, the one part taken
    /// by a central difference (h = 2⁻¹⁰: relative error about 1e-7 of that part, which moves no
    /// result of the series by a bit).
    fn slope_today(&self) -> T {
        let one = T::one();
        let mut dq2 = self.omega_cb + T::c(2.0) * self.params.omega_curvature;
        let h = T::c(1.0 / 1024.0);
        for &(c, ym) in self.massive.iter().take(self.n_massive) {
            let d = density_ratio(ym * (one + h)) - density_ratio(ym * (one - h));
            dq2 = dq2 + c * d / (h + h);
        }
        if self.omega_de != T::zero() {
            dq2 = dq2 + self.omega_de * (T::c(4.0) + self.de_power + T::c(3.0) * self.params.wa);
        }
        let q2 = self.q_squared(one);
        (T::c(4.0) * q2 - dq2) / (T::c(2.0) * q2.sqrt())
    }

    /// The redshift of a subnormal dimensionless target x (a distance in units of D_H, a
    /// lookback time in units of 1/H0) from the series of the function at z = 0,
    /// x = z − k z² + O(z³), inverted: z = x + k x² + O(x³) (the O(x³) is far below the smallest
    /// subnormal). The Newton iteration cannot meet its relative tolerance there: the spacing of
    /// subnormals is absolute. `None` where the second-order term is not a finite number.
    fn series_at_subnormal(x: T, k: T) -> Option<T> {
        let z = x + (k * x) * x;
        (z.is_finite() && z >= T::zero()).then_some(z)
    }

    fn solve_u<F: FnMut(T) -> (T, T)>(&self, f: F, top: T, target: Arg) -> Result<T> {
        let u = bracketed_newton_relative(f, T::zero(), top, T::epsilon() * T::c(2.0), 1100)?;
        finite_result(u.exp_m1(), target)
    }

    /// The top of the search, u = ln(1 + 1e12), when the target lies between the values at
    /// u = 0 and there; `OutOfDomain(target)` when it does not. Where the function fails at
    /// u = ln(1 + 1e12) (an integral the quadrature cannot resolve, or a value past the largest
    /// float: a past in which E(z) falls toward 0, found by the fuzzing), the top is the
    /// largest u found to 1e-3 of itself, by halving and then bisection, where it succeeds.
    fn check_reachable<F: FnMut(T) -> (T, T)>(mut f: F, target: Arg) -> Result<T> {
        let (lo, _) = f(T::zero());
        let mut top = T::c(U_MAX);
        let (mut hi, _) = f(top);
        if hi.is_nan() {
            let mut failed = top;
            let mut found = false;
            for _ in 0..64 {
                top = T::c(0.5) * top;
                hi = f(top).0;
                if !hi.is_nan() {
                    found = true;
                    break;
                }
                failed = top;
            }
            if !found {
                return Err(Error::OutOfDomain(target));
            }
            for _ in 0..32 {
                if failed - top <= T::c(1e-3) * top {
                    break;
                }
                let mid = T::c(0.5) * (top + failed);
                let v = f(mid).0;
                if v.is_nan() {
                    failed = mid;
                } else {
                    (top, hi) = (mid, v);
                }
            }
        }
        // a target equal to the value at either end is reached there (at the top: a distance
        // or lookback time flat to the last bit toward z = 1e12)
        let same_side = (lo > T::zero()) == (hi > T::zero());
        if lo.is_nan() || hi.is_nan() || same_side && lo != T::zero() && hi != T::zero() {
            return Err(Error::OutOfDomain(target));
        }
        Ok(top)
    }

    /// Redshift at which the conformal time c·η equals `eta` (in units of D_H, > 0): the
    /// inversion of the comoving distance near the particle horizon, as the age for the
    /// lookback time.
    fn redshift_at_conformal_unit(&self, eta: T) -> Result<T> {
        let ln_eta = eta.ln();
        let f = |u: T| {
            let z = u.exp_m1();
            let v = self
                .conformal_time_mpc(z)
                .map(|x| x / self.hubble_distance_mpc)
                .unwrap_or(T::nan());
            let a = T::one() / (T::one() + z);
            // d ln η/du = −((1+z)/E)/η = −(a/q)/η
            (v.ln() - ln_eta, -(a / self.q_squared(a).sqrt()) / v)
        };
        let top = Self::check_reachable(f, arg!(0, distance_mpc))?;
        self.solve_u(f, top, arg!(0, distance_mpc))
    }

    /// Redshift at which the line-of-sight comoving distance equals `distance_mpc`.
    ///
    /// * `distance_mpc`: Mpc, finite and ≥ 0.
    ///
    /// From half the particle horizon (the conformal time today c·η0, where it is finite) on,
    /// the redshift is that of the conformal time c·η0 minus the target (an exact difference
    /// there): near the horizon the distance is flat to the last bit over decades of z, where
    /// inverting it directly is decided by rounding noise; elsewhere by the distance itself.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `OutOfDomain(0)` at or beyond the particle
    /// horizon, or beyond the distance reached at z = 1e12 (or, where the distance cannot be
    /// computed up to z = 1e12, at the largest redshift at which it can). Accuracy: round trip
    /// within 1e-12 relative (`f64`).
    pub fn redshift_at_comoving_distance_mpc(&self, distance_mpc: T) -> Result<T> {
        let distance = non_negative(distance_mpc, arg!(0, distance_mpc))?;
        let d = distance / self.hubble_distance_mpc;
        if d == T::zero() {
            // a dual number keeps the slope at 0: z = d to first order (E(0) = 1)
            return Ok(if T::HAS_PARTIALS { d } else { T::zero() });
        }
        // χ = z − E′(0) z²/2 + O(z³)
        if d < T::min_positive_value() {
            if let Some(z) = Self::series_at_subnormal(d, T::c(0.5) * self.slope_today()) {
                return Ok(z);
            }
        }
        if let Ok(horizon) = self.conformal_time_mpc(T::zero()) {
            if distance >= horizon {
                return Err(Error::OutOfDomain(arg!(0, distance_mpc)));
            }
            if distance >= T::c(0.5) * horizon {
                // horizon − distance is exact here (Sterbenz, Floating-Point Computation, 1974)
                let rest = (horizon - distance) / self.hubble_distance_mpc;
                if let Ok(z) = self.redshift_at_conformal_unit(rest) {
                    return Ok(z);
                }
            }
        }
        let f = |u: T| {
            let z = u.exp_m1();
            let chi = self.comoving_unit(z).unwrap_or(T::nan());
            let a = T::one() / (T::one() + z);
            // dχ/du = (1+z)/E = a/q
            (chi - d, a / self.q_squared(a).sqrt())
        };
        let top = Self::check_reachable(f, arg!(0, distance_mpc))?;
        self.solve_u(f, top, arg!(0, distance_mpc))
    }

    /// Redshift at which the luminosity distance equals `distance_mpc`.
    ///
    /// * `distance_mpc`: Mpc, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `OutOfDomain(0)` when no redshift up to 1e12
    /// gives it (up to the largest redshift at which the distance can be computed, where that
    /// is below 1e12). Accuracy: round trip within 1e-12 relative (`f64`). (In a closed model D_L
    /// need not be monotone; the root in the bracket found is returned.)
    pub fn redshift_at_luminosity_distance_mpc(&self, distance_mpc: T) -> Result<T> {
        let d = non_negative(distance_mpc, arg!(0, distance_mpc))? / self.hubble_distance_mpc;
        if d == T::zero() {
            // a dual number keeps the slope at 0: z = d to first order (E(0) = 1)
            return Ok(if T::HAS_PARTIALS { d } else { T::zero() });
        }
        // D_L/D_H = (1+z) D_M/D_H = z + (1 − E′(0)/2) z² + O(z³) (D_M = χ + O(χ³))
        if d < T::min_positive_value() {
            let k = T::c(0.5) * self.slope_today() - T::one();
            if let Some(z) = Self::series_at_subnormal(d, k) {
                return Ok(z);
            }
        }
        let f = |u: T| {
            let z = u.exp_m1();
            let opz = T::one() + z;
            let chi = self.comoving_unit(z).unwrap_or(T::nan());
            let dm = self.transverse_unit(chi);
            let a = T::one() / opz;
            // dχ/dz = 1/E = a²/q; dD_L/du = (1+z)(D_M + (1+z) D_M'(χ) dχ/dz)
            let dchi_dz = a * a / self.q_squared(a).sqrt();
            let slope = opz * (dm + opz * self.transverse_slope(chi) * dchi_dz);
            (opz * dm - d, slope)
        };
        let top = Self::check_reachable(f, arg!(0, distance_mpc))?;
        self.solve_u(f, top, arg!(0, distance_mpc))
    }

    /// Redshift at which the lookback time equals `lookback_gyr`.
    ///
    /// * `lookback_gyr`: Gyr, finite and ≥ 0, below the age today.
    ///
    /// From half the age today on, the redshift is that of the age today minus the target (an
    /// exact difference there), by [`redshift_at_age_gyr`](Self::redshift_at_age_gyr): near
    /// the age today the lookback time is flat to the last bit over decades of z (it is the age
    /// today minus an age of 1e-19 of it at z = 1e4 in a model without radiation), where
    /// inverting it directly is decided by rounding noise; elsewhere (and where the age is not
    /// available) by the lookback time itself.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `OutOfDomain(0)` at or beyond the age today, or
    /// beyond the lookback time at z = 1e12 (the top of the search; in a model whose past is
    /// infinite, such as a nearly empty one, the lookback time grows without bound) or at the
    /// largest redshift below it at which the lookback time can be computed.
    /// Accuracy: round trip within 1e-12 relative (`f64`).
    pub fn redshift_at_lookback_time_gyr(&self, lookback_gyr: T) -> Result<T> {
        let lookback = non_negative(lookback_gyr, arg!(0, lookback_gyr))?;
        let t = lookback / self.hubble_time_gyr;
        if t == T::zero() {
            // a dual number keeps the slope at 0: z = t to first order (E(0) = 1)
            return Ok(if T::HAS_PARTIALS { t } else { T::zero() });
        }
        // H0 t = z − (1 + E′(0)) z²/2 + O(z³)
        if t < T::min_positive_value() {
            let k = T::c(0.5) * (T::one() + self.slope_today());
            if let Some(z) = Self::series_at_subnormal(t, k) {
                return Ok(z);
            }
        }
        if let Ok(age) = self.age_gyr(T::zero()) {
            if lookback >= age {
                return Err(Error::OutOfDomain(arg!(0, lookback_gyr)));
            }
            if lookback >= T::c(0.5) * age {
                // age − lookback is exact here (Sterbenz, Floating-Point Computation, 1974)
                if let Ok(z) = self.redshift_at_age_gyr(age - lookback) {
                    return Ok(z);
                }
            }
        }
        let f = |u: T| {
            let z = u.exp_m1();
            let v = self
                .lookback_time_gyr(z)
                .map(|x| x / self.hubble_time_gyr)
                .unwrap_or(T::nan());
            let a = T::one() / (T::one() + z);
            // dt/du = (1+z) dt/dz = 1/E = a²/q
            (v - t, a * a / self.q_squared(a).sqrt())
        };
        let top = Self::check_reachable(f, arg!(0, lookback_gyr))?;
        self.solve_u(f, top, arg!(0, lookback_gyr))
    }

    /// Redshift at which the age of the universe equals `age_gyr`.
    ///
    /// * `age_gyr`: Gyr, finite and > 0, at most the age today.
    ///
    /// Errors: `NonFinite(0)`, `NonPositive(0)`, `OutOfDomain(0)` above the age today or
    /// below the age at z = 1e12 (or at the largest redshift below it at which the age can be
    /// computed). Accuracy: round trip within 1e-12 relative (`f64`).
    pub fn redshift_at_age_gyr(&self, age_gyr: T) -> Result<T> {
        let t = positive(age_gyr, arg!(0, age_gyr))? / self.hubble_time_gyr;
        let ln_t = t.ln();
        let f = |u: T| {
            let z = u.exp_m1();
            let v = self
                .age_gyr(z)
                .map(|x| x / self.hubble_time_gyr)
                .unwrap_or(T::nan());
            let a = T::one() / (T::one() + z);
            // d ln t/du = −(1/E)/t
            (v.ln() - ln_t, -(a * a / self.q_squared(a).sqrt()) / v)
        };
        let top = Self::check_reachable(f, arg!(0, age_gyr))?;
        self.solve_u(f, top, arg!(0, age_gyr))
    }
}
