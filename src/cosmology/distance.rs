//! Distances: line-of-sight and transverse comoving distance, angular-diameter distance (also
//! between two redshifts), luminosity distance, distance modulus, comoving volume and its
//! derivative, transverse scale. Definitions of Hogg 1999 (arXiv:astro-ph/9905116), eqs. 15–29.

use super::Universe;
use super::table::S_MIN;
use super::universe::check_redshift;
use crate::check::finite_result;
use crate::math::quadrature::integrate;
use crate::{Error, Real, Result};

/// π/648000: radians per arcsecond.
const RAD_PER_ARCSEC: f64 = 4.848_136_811_095_36e-6;

impl<T: Real> Universe<T> {
    /// χ/D_H at a validated redshift: from the table where it is valid, by quadrature otherwise.
    pub(crate) fn comoving_unit(&self, z: T) -> Result<T> {
        if z == T::zero() {
            return Ok(T::zero());
        }
        let r = (T::one() + z).sqrt();
        // s = 1/r and 1 − s = z/(r(1 + r)) (without cancellation) from one division
        let inv = T::one() / (r * (T::one() + r));
        let s = (T::one() + r) * inv;
        let one_minus_s = z * inv;
        if s >= T::c(S_MIN) {
            if let Some(g) = self.table.eval(s) {
                return Ok(one_minus_s * g);
            }
        }
        self.comoving_unit_quadrature(s)
    }

    /// χ/D_H = ∫_s^1 2s'/q(s') ds' by the shared quadrature.
    // out of line: its fixed-capacity interval stack would otherwise enlarge the frame of
    // every distance function that inlines it, on the table path too
    #[inline(never)]
    #[cold]
    pub(crate) fn comoving_unit_quadrature(&self, s: T) -> Result<T> {
        integrate(
            |x: T| T::c(2.0) * x / self.q_of_s(x),
            s,
            T::one(),
            T::epsilon() * T::c(4.0),
            T::zero(),
        )
    }

    /// D_M/D_H from χ/D_H (the curvature function of Hogg 1999 eq. 16).
    pub(crate) fn transverse_unit(&self, chi: T) -> T {
        let ok = self.params.omega_curvature;
        if ok > T::zero() {
            let r = ok.sqrt();
            (r * chi).sinh() / r
        } else if ok < T::zero() {
            let r = (-ok).sqrt();
            (r * chi).sin() / r
        } else {
            chi
        }
    }

    /// d(D_M/D_H)/d(χ/D_H): cosh, cos or 1.
    pub(crate) fn transverse_slope(&self, chi: T) -> T {
        let ok = self.params.omega_curvature;
        if ok > T::zero() {
            (ok.sqrt() * chi).cosh()
        } else if ok < T::zero() {
            ((-ok).sqrt() * chi).cos()
        } else {
            T::one()
        }
    }

    /// Line-of-sight comoving distance D_C = (c/H0) ∫₀^z dz'/E(z'), Mpc (Hogg 1999 eq. 15).
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `NoConvergence` (not seen in testing).
    /// Accuracy: within 1e-12 relative (`f64`) for z from 0 to 1e4 against mpmath, for every
    /// model of `tests/data/cosmology.txt` (with and without radiation, curved, w0–wa, massive
    /// neutrinos). Method: the per-universe table (see `table.rs`) for z ≤ 16383, the shared
    /// quadrature in s = √a beyond.
    pub fn comoving_distance_mpc(&self, z: T) -> Result<T> {
        let z = check_redshift(z, 0)?;
        finite_result(self.hubble_distance_mpc * self.comoving_unit(z)?, 0)
    }

    /// Transverse comoving distance D_M, Mpc (Hogg 1999 eq. 16: equal to D_C when flat, the
    /// sinh/sin form when open/closed). Errors and accuracy as
    /// [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn transverse_comoving_distance_mpc(&self, z: T) -> Result<T> {
        let z = check_redshift(z, 0)?;
        finite_result(
            self.hubble_distance_mpc * self.transverse_unit(self.comoving_unit(z)?),
            0,
        )
    }

    /// Angular-diameter distance D_A = D_M/(1+z), Mpc (Hogg 1999 eq. 18). Errors and accuracy
    /// as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn angular_diameter_distance_mpc(&self, z: T) -> Result<T> {
        finite_result(
            self.transverse_comoving_distance_mpc(z)? / (T::one() + z),
            0,
        )
    }

    /// Angular-diameter distance of an object at z2 seen from z1 ≤ z2, D_M(χ2 − χ1)/(1 + z2),
    /// Mpc (Hogg 1999 eq. 19, and its sin form for closed models).
    ///
    /// Errors: `NonFinite(i)`, `Negative(i)`, `EmptyInterval(0)` when z2 < z1.
    /// Accuracy: within 1e-12 relative (`f64`) unless z2 − z1 is so small that χ2 − χ1 cancels.
    pub fn angular_diameter_distance_between_mpc(&self, z1: T, z2: T) -> Result<T> {
        let z1 = check_redshift(z1, 0)?;
        let z2 = check_redshift(z2, 1)?;
        if z2 < z1 {
            return Err(Error::EmptyInterval(0));
        }
        let d = self.comoving_unit(z2)? - self.comoving_unit(z1)?;
        finite_result(
            self.hubble_distance_mpc * self.transverse_unit(d) / (T::one() + z2),
            1,
        )
    }

    /// Luminosity distance D_L = (1+z) D_M, Mpc (Hogg 1999 eq. 21). Errors and accuracy as
    /// [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn luminosity_distance_mpc(&self, z: T) -> Result<T> {
        finite_result(
            self.transverse_comoving_distance_mpc(z)? * (T::one() + z),
            0,
        )
    }

    /// Distance modulus 5 log10(D_L / 10 pc), magnitudes (Hogg 1999 eq. 25).
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `NonPositive(0)` at z = 0 (D_L = 0).
    /// Accuracy: within 1e-12 absolute (`f64`) against mpmath.
    pub fn distance_modulus(&self, z: T) -> Result<T> {
        let z = check_redshift(z, 0)?;
        if z == T::zero() {
            return Err(Error::NonPositive(0));
        }
        let dl = self.luminosity_distance_mpc(z)?;
        finite_result(
            T::c(5.0 / core::f64::consts::LN_10) * dl.ln() + T::c(25.0),
            0,
        )
    }

    /// Comoving volume inside redshift z over the whole sky, Gpc³ (Hogg 1999 eq. 29), written
    /// as V = 2πχ³ Σₙ 4ⁿ⁺¹ wⁿ/(2n+3)!, w = Ω_k (χ/D_H)², which is exact for open, flat and
    /// closed models and free of the cancellation of the closed forms at small w (the closed
    /// forms (sinh φ cosh φ − φ) and (φ − sin φ cos φ) are used for |w| > 10).
    ///
    /// Errors and accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn comoving_volume_gpc3(&self, z: T) -> Result<T> {
        let z = check_redshift(z, 0)?;
        let x = self.comoving_unit(z)?;
        let dh = self.hubble_distance_mpc;
        let ok = self.params.omega_curvature;
        let w = ok * x * x;
        let two_pi = T::c(2.0 * core::f64::consts::PI);
        let mpc3_to_gpc3 = T::c(1e-9);
        let v = if w.abs() <= T::c(10.0) {
            // Σ 4^(n+1) w^n/(2n+3)!: term ratio 4w/((2n+4)(2n+5))
            let mut term = T::c(4.0 / 6.0);
            let mut sum = term;
            for n in 0..60 {
                let nn = T::c(n as f64);
                term = term * T::c(4.0) * w
                    / ((T::c(2.0) * nn + T::c(4.0)) * (T::c(2.0) * nn + T::c(5.0)));
                sum = sum + term;
                if term.abs() <= T::epsilon() * T::c(0.25) * sum.abs() {
                    break;
                }
            }
            two_pi * (dh * x) * (dh * x) * (dh * x) * sum
        } else if w > T::zero() {
            let phi = w.sqrt();
            let r = ok.sqrt();
            let scale = dh / r;
            two_pi * scale * scale * scale * (phi.sinh() * phi.cosh() - phi)
        } else {
            let phi = (-w).sqrt();
            let r = (-ok).sqrt();
            let scale = dh / r;
            two_pi * scale * scale * scale * (phi - phi.sin() * phi.cos())
        };
        finite_result(v * mpc3_to_gpc3, 0)
    }

    /// Differential comoving volume dV_C/dz/dΩ = D_H D_M²/E(z), Mpc³ sr⁻¹ (Hogg 1999 eq. 28).
    /// Errors and accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn differential_comoving_volume_mpc3_sr(&self, z: T) -> Result<T> {
        let dm = self.transverse_comoving_distance_mpc(z)?;
        let e = self.dimensionless_hubble(z)?;
        finite_result(self.hubble_distance_mpc * dm * dm / e, 0)
    }

    /// Proper transverse size per arcsecond at z, D_A·π/648000, kpc per arcsec. Errors and
    /// accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn transverse_scale_kpc_per_arcsec(&self, z: T) -> Result<T> {
        finite_result(
            self.angular_diameter_distance_mpc(z)? * T::c(1000.0 * RAD_PER_ARCSEC),
            0,
        )
    }
}
