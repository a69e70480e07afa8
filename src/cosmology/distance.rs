//! Distances: line-of-sight and transverse comoving distance, angular-diameter distance (also
//! between two redshifts), luminosity distance, distance modulus, comoving volume and its
//! derivative, transverse scale. Definitions of Hogg 1999 (arXiv:astro-ph/9905116), eqs. 15–29.

use super::Universe;
use super::table::A_MIN;
use super::universe::check_redshift;
use crate::arg;
use crate::array::blockwise;
use crate::check::finite_result;
use crate::math::quadrature::integrate;
use crate::{ArrayResult, Error, Real, Result};

/// π/648000: radians per arcsecond.
const RAD_PER_ARCSEC: f64 = 4.848_136_811_095_36e-6;

impl<T: Real> Universe<T> {
    /// χ/D_H at a validated redshift: from the table where it is valid, by quadrature otherwise.
    /// The common case is [`comoving_unit_fast`](Self::comoving_unit_fast) itself, so the array
    /// functions agree with the scalar ones by construction.
    pub(crate) fn comoving_unit(&self, z: T) -> Result<T> {
        match self.comoving_unit_fast(z) {
            (chi, true) => Ok(chi),
            _ => self.comoving_unit_outside(z),
        }
    }

    /// [`comoving_unit`](Self::comoving_unit) where the fast path does not apply: z = 0, z so
    /// small that a rounds to 1, beyond the table, or a table that failed its error control.
    #[cold]
    fn comoving_unit_outside(&self, z: T) -> Result<T> {
        if z == T::zero() {
            // a dual number keeps the slope at z = 0: dχ/dz = 1/E(0) = 1
            return Ok(if T::HAS_PARTIALS { z } else { T::zero() });
        }
        let (a, one_minus_a) = Self::a_of_redshift(z);
        if a >= T::c(A_MIN) {
            if let Some(g) = self.table.eval(a) {
                return Ok(one_minus_a * g);
            }
        }
        self.comoving_unit_quadrature(z)
    }

    /// a = 1/(1+z) and 1 − a = z·a (without cancellation), from one division.
    #[inline(always)]
    fn a_of_redshift(z: T) -> (T, T) {
        let a = T::one() / (T::one() + z);
        (a, z * a)
    }

    /// [`comoving_unit`](Self::comoving_unit) as straight-line code for the array functions:
    /// χ/D_H and whether z is inside the table's common case (z > 0 finite, a in the table, a
    /// valid table), where the two agree bit for bit; outside, the value is garbage.
    #[inline(always)]
    fn comoving_unit_fast(&self, z: T) -> (T, bool) {
        let (a, one_minus_a) = Self::a_of_redshift(z);
        if T::HAS_PARTIALS {
            return self.comoving_unit_fast_partials(z, a, one_minus_a);
        }
        let (g, inside) = self.table.eval_fast(a);
        (
            one_minus_a * g,
            inside & (z > T::zero()) & (z <= T::max_value()),
        )
    }

    /// [`comoving_unit_fast`](Self::comoving_unit_fast) for a dual number: the value and the
    /// parameters' partials from the table (the same operations on the value, and the table's
    /// coefficients carry the parameters' partials), the partials carried by a = 1/(1+z) (the
    /// redshift's) through the exact slope dχ/da = −1/q(a) instead of the derivative of the
    /// table's polynomial, which is less accurate than the polynomial (1e-12 against 1e-15).
    #[inline(never)]
    fn comoving_unit_fast_partials(&self, z: T, a: T, one_minus_a: T) -> (T, bool) {
        let a0 = a.detach();
        let (g, inside) = self.table.eval_fast(a0);
        let chi = one_minus_a.detach() * g;
        let slope = -(T::one() / self.q_squared(a0).sqrt()).detach();
        (
            chi + slope * (a - a0),
            inside & (z > T::zero()) & (z <= T::max_value()),
        )
    }

    /// Runs one of the distance array functions: `distance(d_m, z)` of the transverse
    /// comoving distance D_M, by the fast path where it applies (the flat case without a call
    /// per element), by `scalar` where it does not. `distance` must be the operations of the
    /// scalar function after D_M, and its result finite exactly when the scalar one is `Ok`.
    #[inline(always)]
    fn distance_array(
        &self,
        redshifts: &[T],
        out: &mut [T],
        distance: impl Fn(T, T) -> (T, bool),
        scalar: impl Fn(T) -> Result<T>,
    ) -> ArrayResult {
        let dh = self.hubble_distance_mpc;
        if self.params.omega_curvature == T::zero() && !T::HAS_PARTIALS {
            blockwise(
                redshifts,
                out,
                arg!(1, out),
                |z| {
                    let (chi, inside) = self.comoving_unit_fast(z);
                    let (v, ok) = distance(dh * chi, z);
                    (v, inside & ok)
                },
                scalar,
            )
        } else {
            blockwise(
                redshifts,
                out,
                arg!(1, out),
                |z| {
                    let (chi, inside) = self.comoving_unit_fast(z);
                    let (v, ok) = distance(dh * self.transverse_unit(chi), z);
                    (v, inside & ok)
                },
                scalar,
            )
        }
    }

    /// χ/D_H at z > 0 by the shared quadrature, without the table. For z < 1 as
    /// ∫_0^(1−a) du/q(1 − u), whose upper limit 1 − a = z·a is formed without cancellation
    /// (in s = √a the limit s = 1/√(1+z) carries an absolute rounding error of about 1e-16,
    /// which is 1e-10 of an interval 1 − s ≈ z/2 at z = 1e-6); beyond, ∫_s^1 2s'/q(s') ds',
    /// smooth down to a = 0.
    // out of line: its fixed-capacity interval stack would otherwise enlarge the frame of
    // every distance function that inlines it, on the table path too
    #[inline(never)]
    #[cold]
    pub(crate) fn comoving_unit_quadrature(&self, z: T) -> Result<T> {
        let tol = T::epsilon() * T::c(4.0);
        if z < T::one() {
            let (_, one_minus_a) = Self::a_of_redshift(z);
            return integrate(
                |u: T| T::one() / self.q_squared(T::one() - u).sqrt(),
                T::zero(),
                one_minus_a,
                tol,
                T::zero(),
            );
        }
        let s = T::one() / (T::one() + z).sqrt();
        integrate(
            |x: T| T::c(2.0) * x / self.q_of_s(x),
            s,
            T::one(),
            tol,
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
        } else if T::HAS_PARTIALS {
            // a dual number at Ω_k = 0: D_M/D_H = χ(1 + Ω_k χ²/6 + …) has the value χ and the
            // partial χ³/6 with respect to Ω_k
            chi * (T::one() + ok * chi * chi * T::c(1.0 / 6.0))
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
        } else if T::HAS_PARTIALS {
            // a dual number at Ω_k = 0: cosh(√Ω_k χ) = 1 + Ω_k χ²/2 + …
            T::one() + ok * chi * chi * T::c(0.5)
        } else {
            T::one()
        }
    }

    /// Line-of-sight comoving distance D_C = (c/H0) ∫₀^z dz'/E(z'), Mpc (Hogg 1999 eq. 15).
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `NoConvergence` (seen only far from physical
    /// models: a past in which E(z) falls toward 0, where D_C grows past 1e30 D_H).
    /// Accuracy: within 1e-12 relative (`f64`) for z from 0 to 1e4 against mpmath, for every
    /// model of `tests/data/cosmology.txt` (with and without radiation, curved, w0–wa, massive
    /// neutrinos). Method: the per-universe table (see `table.rs`) for z ≤ 16383, the shared
    /// quadrature in s = √a beyond.
    pub fn comoving_distance_mpc(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        finite_result(
            self.hubble_distance_mpc * self.comoving_unit(z)?,
            arg!(0, z),
        )
    }

    /// Transverse comoving distance D_M, Mpc (Hogg 1999 eq. 16: equal to D_C when flat, the
    /// sinh/sin form when open/closed). Errors and accuracy as
    /// [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn transverse_comoving_distance_mpc(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        finite_result(
            self.hubble_distance_mpc * self.transverse_unit(self.comoving_unit(z)?),
            arg!(0, z),
        )
    }

    /// Angular-diameter distance D_A = D_M/(1+z), Mpc (Hogg 1999 eq. 18). Errors and accuracy
    /// as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn angular_diameter_distance_mpc(&self, z: T) -> Result<T> {
        finite_result(
            self.transverse_comoving_distance_mpc(z)? / (T::one() + z),
            arg!(0, z),
        )
    }

    /// Angular-diameter distance of an object at z2 seen from z1 ≤ z2, D_M(χ2 − χ1)/(1 + z2),
    /// Mpc (Hogg 1999 eq. 19, and its sin form for closed models).
    ///
    /// Errors: `NonFinite(i)`, `Negative(i)`, `EmptyInterval(0)` when z2 < z1.
    /// Accuracy: within 1e-12 relative (`f64`) unless z2 − z1 is so small that χ2 − χ1 cancels.
    pub fn angular_diameter_distance_between_mpc(&self, z1: T, z2: T) -> Result<T> {
        let z1 = check_redshift(z1, arg!(0, z1))?;
        let z2 = check_redshift(z2, arg!(1, z2))?;
        if z2 < z1 {
            return Err(Error::EmptyInterval(arg!(0, z1)));
        }
        let d = self.comoving_unit(z2)? - self.comoving_unit(z1)?;
        finite_result(
            self.hubble_distance_mpc * self.transverse_unit(d) / (T::one() + z2),
            arg!(1, z2),
        )
    }

    /// Luminosity distance D_L = (1+z) D_M, Mpc (Hogg 1999 eq. 21). Errors and accuracy as
    /// [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn luminosity_distance_mpc(&self, z: T) -> Result<T> {
        finite_result(
            self.transverse_comoving_distance_mpc(z)? * (T::one() + z),
            arg!(0, z),
        )
    }

    /// [`comoving_distance_mpc`](Self::comoving_distance_mpc) over many redshifts:
    /// `out[i] = comoving_distance_mpc(redshifts[i])`, bit for bit.
    ///
    /// * `redshifts`: redshifts z, each finite and ≥ 0.
    /// * `out`: D_C in Mpc, the same length as `redshifts`.
    ///
    /// Returns `Ok(())` when every element succeeded; otherwise failing elements are NaN and
    /// the error names the first failing index and the scalar function's error;
    /// `LengthMismatch(1)` when `out` has another length (then `out` is all NaN).
    ///
    /// Accuracy: that of the scalar function. Method: blocks of 64 redshifts go through a
    /// branch-free form of the table evaluation, which the compiler vectorises; a block holding
    /// a redshift outside the table (z = 0, z > 16383, bad input) is recomputed by the scalar
    /// function.
    #[inline(always)]
    pub fn comoving_distance_mpc_array(&self, redshifts: &[T], out: &mut [T]) -> ArrayResult {
        let dh = self.hubble_distance_mpc;
        blockwise(
            redshifts,
            out,
            arg!(1, out),
            |z| {
                let (chi, inside) = self.comoving_unit_fast(z);
                let v = dh * chi;
                (v, inside & (v.abs() <= T::max_value()))
            },
            |z| self.comoving_distance_mpc(z),
        )
    }

    /// [`transverse_comoving_distance_mpc`](Self::transverse_comoving_distance_mpc) over many
    /// redshifts, bit for bit. Arguments, errors and method as
    /// [`comoving_distance_mpc_array`](Self::comoving_distance_mpc_array) (curved models add
    /// one sinh or sin per element).
    #[inline(always)]
    pub fn transverse_comoving_distance_mpc_array(
        &self,
        redshifts: &[T],
        out: &mut [T],
    ) -> ArrayResult {
        self.distance_array(
            redshifts,
            out,
            |dm, _| (dm, dm.abs() <= T::max_value()),
            |z| self.transverse_comoving_distance_mpc(z),
        )
    }

    /// [`angular_diameter_distance_mpc`](Self::angular_diameter_distance_mpc) over many
    /// redshifts, bit for bit. Arguments, errors and method as
    /// [`comoving_distance_mpc_array`](Self::comoving_distance_mpc_array).
    #[inline(always)]
    pub fn angular_diameter_distance_mpc_array(
        &self,
        redshifts: &[T],
        out: &mut [T],
    ) -> ArrayResult {
        self.distance_array(
            redshifts,
            out,
            |dm, z| (dm / (T::one() + z), dm.abs() <= T::max_value()),
            |z| self.angular_diameter_distance_mpc(z),
        )
    }

    /// [`luminosity_distance_mpc`](Self::luminosity_distance_mpc) over many redshifts, bit for
    /// bit: the catalogue call. Arguments, errors and method as
    /// [`comoving_distance_mpc_array`](Self::comoving_distance_mpc_array).
    #[inline(always)]
    pub fn luminosity_distance_mpc_array(&self, redshifts: &[T], out: &mut [T]) -> ArrayResult {
        self.distance_array(
            redshifts,
            out,
            |dm, z| {
                let v = dm * (T::one() + z);
                (v, v.abs() <= T::max_value())
            },
            |z| self.luminosity_distance_mpc(z),
        )
    }

    /// Distance modulus 5 log10(D_L / 10 pc), magnitudes (Hogg 1999 eq. 25).
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`, `NonPositive(0)` at z = 0 (D_L = 0).
    /// Accuracy: within 1e-12 absolute (`f64`) against mpmath.
    pub fn distance_modulus(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        if z == T::zero() {
            return Err(Error::NonPositive(arg!(0, z)));
        }
        let dl = self.luminosity_distance_mpc(z)?;
        finite_result(
            T::c(5.0 / core::f64::consts::LN_10) * dl.ln() + T::c(25.0),
            arg!(0, z),
        )
    }

    /// Comoving volume inside redshift z over the whole sky, Gpc³ (Hogg 1999 eq. 29), written
    /// as V = 2πχ³ Σₙ 4ⁿ⁺¹ wⁿ/(2n+3)!, w = Ω_k (χ/D_H)², which is exact for open, flat and
    /// closed models and free of the cancellation of the closed forms at small w (the closed
    /// forms (sinh φ cosh φ − φ) and (φ − sin φ cos φ) are used for |w| > 10).
    ///
    /// Errors and accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn comoving_volume_gpc3(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
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
        finite_result(v * mpc3_to_gpc3, arg!(0, z))
    }

    /// Differential comoving volume dV_C/dz/dΩ = D_H D_M²/E(z), Mpc³ sr⁻¹ (Hogg 1999 eq. 28).
    /// Errors and accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn differential_comoving_volume_mpc3_sr(&self, z: T) -> Result<T> {
        let dm = self.transverse_comoving_distance_mpc(z)?;
        let e = self.dimensionless_hubble(z)?;
        finite_result(self.hubble_distance_mpc * dm * dm / e, arg!(0, z))
    }

    /// Proper transverse size per arcsecond at z, D_A·π/648000, kpc per arcsec. Errors and
    /// accuracy as [`comoving_distance_mpc`](Self::comoving_distance_mpc).
    pub fn transverse_scale_kpc_per_arcsec(&self, z: T) -> Result<T> {
        finite_result(
            self.angular_diameter_distance_mpc(z)? * T::c(1000.0 * RAD_PER_ARCSEC),
            arg!(0, z),
        )
    }
}
