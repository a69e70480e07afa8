//! The linear matter power spectrum, σ(R), σ8, S8 and fσ8.
//!
//! σ²(R) = ∫ Δ²(k) W(kR)² d ln k with Δ² = k³P/(2π²) is integrated in x = kR in three parts,
//! each with the shared adaptive Gauss-Kronrod quadrature: (A) ln x from x_min to 4, where the
//! window is smooth (x_min = k_min R with k_min = min(10⁻⁷ Mpc⁻¹, 10⁻⁶/R), below which Δ² ∝ k⁴
//! leaves less than 1e-20); (B) x from 4 to 100 in chunks of 4π (eight periods of W²); (C) beyond
//! x = 100, W² = (9/2)(x⁻⁴ + x⁻⁶) + 9[(x² − 1) cos 2x/2 − x sin 2x]/x⁶: the smooth part by
//! quadrature in ln x up to x = 100 e⁴⁰, the oscillating part by two integrations by parts
//! (−g sin 2X/2 − g′ cos 2X/4 for ∫ g cos 2x, h cos 2X/2 − h′ sin 2X/4 for ∫ h sin 2x, g′ and h′
//! by central differences); the next terms are below 1e-15 of σ² for every R (g ∝ X⁻⁵).

use super::linear::LinearGrowth;
use super::transfer::{self, EisensteinHu};
use crate::arg;
use crate::check::{finite, finite_result, positive};
use crate::math::quadrature::integrate;
use crate::{Arg, Error, Real, Result};

/// The pivot scale of the primordial spectrum, k_p = 0.05 Mpc⁻¹.
pub const PIVOT_WAVENUMBER_PER_MPC: f64 = 0.05;
/// ln k_p (ln 0.05 rounded; mpmath: −2.99573227355399099343…).
const LN_PIVOT: f64 = -2.995732273553991;

/// Which Eisenstein & Hu 1998 transfer function a power spectrum uses.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum TransferForm {
    /// The full fitting formula with baryon acoustic oscillations (needs Ω_b > 0).
    BaryonOscillations,
    /// The form without oscillations (section 4.2 of the paper).
    NoWiggle,
}

/// A linear matter power spectrum: a universe's growth, its Eisenstein & Hu 1998 transfer
/// function and a primordial spectrum A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p)) at
/// k_p = 0.05 Mpc⁻¹, either given or derived from a given σ8 (module doc of [`crate::growth`]
/// for the meanings). A plain value the caller owns (no heap; every field plain old data; about
/// 103 KB for `f64`, a copy of the growth included); σ8 is computed once at construction.
#[derive(Debug, Clone, PartialEq)]
pub struct LinearPowerSpectrum<T> {
    growth: LinearGrowth<T>,
    transfer: EisensteinHu<T>,
    /// 0: with baryon oscillations; 1: without.
    form: u8,
    scalar_amplitude: T,
    spectral_index: T,
    running: T,
    /// A_s [(2/5) (c/H0)² / Ω_m]²: Δ²(k, a) = this · k⁴ T² D_u² · (k/k_p)^(n_s−1+…).
    amplitude: T,
    sigma8: T,
    /// 8 h⁻¹ Mpc in Mpc.
    r8_mpc: T,
}

/// Top-hat window W(x) = 3(sin x − x cos x)/x³, by its series below x = 0.3 (where the
/// difference cancels; the first term left out is below 2e-17).
#[inline]
fn top_hat<T: Real>(x: T) -> T {
    if x < T::c(0.3) {
        let x2 = x * x;
        // Σ (−1)^m 6(m+1) x^(2m)/(2m+3)!
        T::one()
            + x2 * (T::c(-1.0 / 10.0)
                + x2 * (T::c(1.0 / 280.0)
                    + x2 * (T::c(-1.0 / 15_120.0)
                        + x2 * (T::c(1.0 / 1_330_560.0) + x2 * T::c(-1.0 / 172_972_800.0)))))
    } else {
        let (s, c) = crate::math::trig::sin_cos(x);
        T::c(3.0) * (s - x * c) / (x * x * x)
    }
}

impl<T: Real> LinearPowerSpectrum<T> {
    /// A power spectrum with the given primordial amplitude A_s.
    ///
    /// * `growth`: the linear growth of the universe (its ω_m, ω_b, T0 and H0 are used).
    /// * `form`: the transfer function.
    /// * `scalar_amplitude`: A_s at k_p = 0.05 Mpc⁻¹, > 0 (about 2.1e-9 today's fits).
    /// * `spectral_index`: n_s, finite.
    /// * `running`: α_s = dn_s/d ln k, finite.
    ///
    /// Errors: `NonFinite(2)`, `NonPositive(2)`, `NonFinite(3)`, `NonFinite(4)`;
    /// `InvalidParameter(2)` for the oscillating form in a universe without baryons (Ω_b = 0),
    /// `InvalidParameter(4)` for a universe without radiation (T0 = 0: the transfer function
    /// needs T0); `OutOfDomain(0)` when σ8 cannot be formed (parameters far outside physical
    /// ones); `NoConvergence` if its quadrature fails (not seen in testing).
    pub fn with_scalar_amplitude(
        growth: &LinearGrowth<T>,
        form: TransferForm,
        scalar_amplitude: T,
        spectral_index: T,
        running: T,
    ) -> Result<Self> {
        let mut s = Self::blank(growth);
        s.compute_with_scalar_amplitude_in_place(
            growth,
            form,
            scalar_amplitude,
            spectral_index,
            running,
        )?;
        Ok(s)
    }

    /// A power spectrum normalised to the given σ8 = σ(8 h⁻¹ Mpc, z = 0); A_s is derived
    /// ([`scalar_amplitude`](Self::scalar_amplitude)). Arguments and errors as
    /// [`with_scalar_amplitude`](Self::with_scalar_amplitude), with `sigma8` (> 0) in place of
    /// A_s.
    pub fn with_sigma8(
        growth: &LinearGrowth<T>,
        form: TransferForm,
        sigma8: T,
        spectral_index: T,
        running: T,
    ) -> Result<Self> {
        let mut s = Self::blank(growth);
        s.compute_with_sigma8_in_place(growth, form, sigma8, spectral_index, running)?;
        Ok(s)
    }

    fn blank(growth: &LinearGrowth<T>) -> Self {
        LinearPowerSpectrum {
            growth: growth.clone(),
            transfer: EisensteinHu::default(),
            form: 0,
            scalar_amplitude: T::zero(),
            spectral_index: T::one(),
            running: T::zero(),
            amplitude: T::zero(),
            sigma8: T::zero(),
            r8_mpc: T::one(),
        }
    }

    /// As [`with_scalar_amplitude`](Self::with_scalar_amplitude), writing into an existing
    /// value (no large temporary on the stack). On error the value must not be queried.
    pub fn compute_with_scalar_amplitude_in_place(
        &mut self,
        growth: &LinearGrowth<T>,
        form: TransferForm,
        scalar_amplitude: T,
        spectral_index: T,
        running: T,
    ) -> Result<()> {
        let a_s = positive(scalar_amplitude, arg!(2, scalar_amplitude))?;
        self.setup(growth, form, spectral_index, running)?;
        self.set_amplitude(a_s);
        let s = self.sigma_today(self.r8_mpc, arg!(0, growth))?;
        self.sigma8 = finite_result(s, arg!(0, growth))?;
        Ok(())
    }

    /// As [`with_sigma8`](Self::with_sigma8), writing into an existing value.
    pub fn compute_with_sigma8_in_place(
        &mut self,
        growth: &LinearGrowth<T>,
        form: TransferForm,
        sigma8: T,
        spectral_index: T,
        running: T,
    ) -> Result<()> {
        let s8 = positive(sigma8, arg!(2, sigma8))?;
        self.setup(growth, form, spectral_index, running)?;
        self.set_amplitude(T::one());
        let unit = self.sigma_today(self.r8_mpc, arg!(0, growth))?;
        if !(unit > T::zero() && unit.is_finite()) {
            return Err(Error::OutOfDomain(arg!(0, growth)));
        }
        let ratio = s8 / unit;
        let a_s = finite_result(ratio * ratio, arg!(2, sigma8))?;
        if !(a_s > T::zero()) {
            return Err(Error::OutOfDomain(arg!(2, sigma8)));
        }
        self.set_amplitude(a_s);
        self.sigma8 = s8;
        Ok(())
    }

    fn setup(
        &mut self,
        growth: &LinearGrowth<T>,
        form: TransferForm,
        spectral_index: T,
        running: T,
    ) -> Result<()> {
        let ns = finite(spectral_index, arg!(3, spectral_index))?;
        let alpha = finite(running, arg!(4, running))?;
        let u = growth.universe();
        let p = u.parameters();
        let h = p.h0_km_s_mpc / T::c(100.0);
        let h2 = h * h;
        if !(p.cmb_temperature_k > T::zero()) {
            return Err(Error::InvalidParameter(arg!(4, cmb_temperature_k)));
        }
        if form == TransferForm::BaryonOscillations && !(p.omega_baryon > T::zero()) {
            return Err(Error::InvalidParameter(arg!(2, omega_baryon)));
        }
        let wm = p.omega_matter * h2;
        let wb = p.omega_baryon * h2;
        let transfer = EisensteinHu::new(wm, wb, p.cmb_temperature_k, [arg!(0, growth); 3])
            .map_err(|_| Error::OutOfDomain(arg!(0, growth)))?;
        self.growth.clone_from(growth);
        self.transfer = transfer;
        self.form = match form {
            TransferForm::BaryonOscillations => 0,
            TransferForm::NoWiggle => 1,
        };
        self.spectral_index = ns;
        self.running = alpha;
        self.r8_mpc = T::c(8.0) / h;
        Ok(())
    }

    fn set_amplitude(&mut self, a_s: T) {
        let u = self.growth.universe();
        let dh = u.hubble_distance_mpc();
        let c = T::c(0.4) * dh * dh / u.parameters().omega_matter;
        self.scalar_amplitude = a_s;
        self.amplitude = a_s * c * c;
    }

    /// T(k) of the chosen form at k > 0 (no checks), one body for the scalar and the array
    /// functions (see `EisensteinHu::transfer_with`).
    #[inline(always)]
    fn transfer_with<const FAST: bool>(&self, k: T) -> (T, bool) {
        if self.wiggles() {
            self.transfer.transfer_with::<FAST>(k)
        } else {
            self.transfer.no_wiggle_with::<FAST>(k)
        }
    }

    /// Whether T(k) is the full form (the array functions test this once, outside their loops,
    /// so that the loops have no branch and are vectorised).
    #[inline(always)]
    fn wiggles(&self) -> bool {
        self.form == 0 && self.transfer.has_baryons()
    }

    /// T(k) of the given form (`WIGGLES` = [`wiggles`](Self::wiggles)), straight-line.
    #[inline(always)]
    fn transfer_form<const WIGGLES: bool>(&self, k: T) -> (T, bool) {
        if WIGGLES {
            self.transfer.transfer_with::<true>(k)
        } else {
            self.transfer.no_wiggle_with::<true>(k)
        }
    }

    /// T(k) of the chosen form at k > 0 (no checks).
    #[inline]
    fn transfer_at(&self, k: T) -> T {
        self.transfer_with::<false>(k).0
    }

    /// The primordial tilt (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p)) and T(k) at k > 0: one body for
    /// the scalar and the array functions.
    #[inline(always)]
    fn tilt_and_transfer<const FAST: bool>(&self, k: T) -> (T, T, bool) {
        let t = self.transfer_with::<FAST>(k);
        self.tilt_with::<FAST>(k, t)
    }

    /// The tilt at k > 0 joined to a T(k) already computed (flag and all).
    #[inline(always)]
    fn tilt_with<const FAST: bool>(&self, k: T, (t, in_t): (T, bool)) -> (T, T, bool) {
        let (lk, in_k) = transfer::ln_k::<T, FAST>(k);
        let l = lk - T::c(LN_PIVOT);
        let (tilt, in_e) = transfer::exp_k::<T, FAST>(
            l * (self.spectral_index - T::one() + T::c(0.5) * self.running * l),
        );
        (tilt, t, in_t & in_k & in_e)
    }

    /// Δ²(k)/D_u² = k³P/(2π² D_u²) at k > 0 (no checks).
    #[inline]
    fn delta2_per_du2(&self, k: T) -> T {
        let (tilt, t, _) = self.tilt_and_transfer::<false>(k);
        let kt = k * k * t;
        self.amplitude * tilt * kt * kt
    }

    /// P(k) at k > 0 for D_u = du, one body for the scalar and the array functions: P =
    /// 2π² Δ²/k³ = 2π² · amplitude · tilt · k T² D_u² (no k⁴ formed). The flag (array form)
    /// also requires a normal result.
    #[inline(always)]
    fn power_with<const FAST: bool>(&self, k: T, du: T) -> (T, bool) {
        self.power_from(k, du, self.tilt_and_transfer::<FAST>(k))
    }

    /// P from the tilt and T(k) at k (flag and all).
    #[inline(always)]
    fn power_from(&self, k: T, du: T, (tilt, t, inside): (T, T, bool)) -> (T, bool) {
        let p = T::c(2.0 * core::f64::consts::PI * core::f64::consts::PI)
            * self.amplitude
            * tilt
            * k
            * (t * du)
            * (t * du);
        (
            p,
            inside & (p >= T::min_positive_value()) & (p <= T::max_value()),
        )
    }

    /// σ(R) today, by the quadrature of the module doc.
    fn sigma_today(&self, r: T, at: Arg) -> Result<T> {
        let du1 = self.growth.unnormalized_growth_factor_today();
        let du2 = du1 * du1;
        let d2 = |x: T| self.delta2_per_du2(x / r) * du2;
        // σ² to 1e-10 relative (σ to 5e-11): below the 1e-9 documented for σ(R), above the
        // noise of the growth table that multiplies it
        let tol = T::c(1e-10).max(T::epsilon() * T::c(64.0));
        // Where the baryon oscillations of the full form live, in x = kR: from k = π/s (below,
        // less than half a period) to k = 100 Mpc⁻¹ (beyond, their relative size ~ (ks)⁻³ is
        // below 1e-13); None for the form without them.
        let x_max = T::c(100.0);
        let four = T::c(4.0);
        let wiggles = match (self.form, self.transfer.has_baryons()) {
            (0, true) if self.transfer.sound_horizon_mpc() > T::zero() => {
                let s = self.transfer.sound_horizon_mpc();
                Some((
                    r * T::c(core::f64::consts::PI) / s,
                    r * T::c(100.0),
                    T::c(16.0 * core::f64::consts::PI) * r / s,
                ))
            }
            _ => None,
        };
        // (A) ln x from x_min to 4, or to the first baryon oscillation where that comes first
        let k_min = T::c(1e-7).min(T::c(1e-6) / r);
        let lo = (k_min * r).ln();
        let x_a = match wiggles {
            Some((x_lo, _, _)) => four.min(x_lo.max(k_min * r * T::c(2.0))),
            None => four,
        };
        let part_a = integrate(
            |u: T| {
                let x = u.exp();
                let w = top_hat(x);
                d2(x) * w * w
            },
            lo,
            x_a.ln(),
            tol,
            T::zero(),
        )?;
        if !(part_a > T::zero()) {
            return Err(Error::OutOfDomain(at));
        }
        let abs_tol = part_a * T::c(1e-11);
        // (B) x from there to 100 in chunks of 4π (the period of W² is π), or of 8 periods 2πR/s
        // of the baryon oscillations while they matter: each chunk holds a few oscillations,
        // which the adaptive rule resolves within its capacity
        let mut part_b = T::zero();
        let mut x0 = x_a;
        while x0 < x_max {
            let width = match wiggles {
                Some((_, x_hi, period8)) if x0 < x_hi => {
                    period8.min(T::c(4.0 * core::f64::consts::PI))
                }
                _ => T::c(4.0 * core::f64::consts::PI),
            };
            let x1 = (x0 + width).min(x_max);
            part_b = part_b
                + integrate(
                    |x: T| {
                        let w = top_hat(x);
                        d2(x) * w * w / x
                    },
                    x0,
                    x1,
                    tol,
                    abs_tol,
                )?;
            x0 = x1;
        }
        // (C) beyond x = 100: smooth part by quadrature, oscillating part by parts
        let smooth = integrate(
            |u: T| {
                let x = u.exp();
                let x2 = x * x;
                let x4 = x2 * x2;
                d2(x) * T::c(4.5) * (T::one() / x4 + T::one() / (x4 * x2))
            },
            x_max.ln(),
            x_max.ln() + T::c(40.0),
            tol,
            abs_tol,
        )?;
        // ∫ g cos 2x + ∫ h sin 2x over [X, ∞), g = Δ² 9(x² − 1)/(2x⁷), h = −Δ² 9/x⁶
        let g = |x: T| {
            let x2 = x * x;
            d2(x) * T::c(4.5) * (x2 - T::one()) / (x2 * x2 * x2 * x)
        };
        let hh = |x: T| {
            let x2 = x * x;
            -d2(x) * T::c(9.0) / (x2 * x2 * x2)
        };
        let dx = x_max * T::c(1e-4);
        let gp = (g(x_max + dx) - g(x_max - dx)) / (dx + dx);
        let hp = (hh(x_max + dx) - hh(x_max - dx)) / (dx + dx);
        let (s2, c2) = ((x_max + x_max).sin(), (x_max + x_max).cos());
        let osc = -g(x_max) * s2 / T::c(2.0) - gp * c2 / T::c(4.0) + hh(x_max) * c2 / T::c(2.0)
            - hp * s2 / T::c(4.0);
        let total = part_a + part_b + smooth + osc;
        if !(total > T::zero()) || !total.is_finite() {
            return Err(Error::OutOfDomain(at));
        }
        Ok(total.sqrt())
    }

    /// The linear growth this spectrum uses.
    pub fn growth(&self) -> &LinearGrowth<T> {
        &self.growth
    }

    /// The primordial amplitude A_s at k_p = 0.05 Mpc⁻¹: the given one, or the one derived
    /// from σ8 (then within 2e-9 relative (`f64`) of A_s σ8²/σ8(A_s)², σ8's accuracy doubled).
    pub fn scalar_amplitude(&self) -> T {
        self.scalar_amplitude
    }

    /// The transfer function T(k) of the chosen form (Eisenstein & Hu 1998; see
    /// [`eisenstein_hu_transfer_function`](crate::growth::eisenstein_hu_transfer_function) and
    /// [`eisenstein_hu_no_wiggle_transfer_function`](crate::growth::eisenstein_hu_no_wiggle_transfer_function)
    /// for the formulae, domain and accuracy).
    ///
    /// * `wavenumber_per_mpc`: k in Mpc⁻¹, > 0.
    ///
    /// Errors: `NonFinite(0)`, `NonPositive(0)`.
    pub fn transfer_function(&self, wavenumber_per_mpc: T) -> Result<T> {
        let k = positive(wavenumber_per_mpc, arg!(0, wavenumber_per_mpc))?;
        finite_result(self.transfer_at(k), arg!(0, wavenumber_per_mpc))
    }

    /// [`transfer_function`](Self::transfer_function) over many wavenumbers:
    /// `out[i] = transfer_function(wavenumbers[i])`, bit for bit.
    ///
    /// * `wavenumbers_per_mpc`: k in Mpc⁻¹, each > 0.
    /// * `out`: T(k), the same length as `wavenumbers_per_mpc`.
    ///
    /// Returns `Ok(())` when every element succeeded; otherwise failing elements are NaN and the
    /// error names the first failing index; `LengthMismatch(1)` when `out` has another length.
    /// Method: as [`linear_power_spectrum_mpc3_array`](Self::linear_power_spectrum_mpc3_array).
    #[inline(always)]
    pub fn transfer_function_array(
        &self,
        wavenumbers_per_mpc: &[T],
        out: &mut [T],
    ) -> crate::ArrayResult {
        let check = |k: T, (t, inside): (T, bool)| {
            let k_in = (k >= T::min_positive_value()) & (k <= T::max_value());
            let t_in = (t >= T::min_positive_value()) & (t <= T::max_value());
            (t, inside & k_in & t_in)
        };
        let scalar = |k| self.transfer_function(k);
        let x = wavenumbers_per_mpc;
        if self.wiggles() {
            crate::array::blockwise(
                x,
                out,
                arg!(1, out),
                #[inline(always)]
                |k| check(k, self.transfer_form::<true>(k)),
                scalar,
            )
        } else {
            crate::array::blockwise(
                x,
                out,
                arg!(1, out),
                #[inline(always)]
                |k| check(k, self.transfer_form::<false>(k)),
                scalar,
            )
        }
    }

    /// The linear matter power spectrum P(k, z) = (2π²/k³) A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p))
    /// · [(2/5) (ck/H0)² T(k) D_u(a)/Ω_m]², Mpc³ (module doc of [`crate::growth`]).
    ///
    /// * `wavenumber_per_mpc`: k in Mpc⁻¹ (no h), > 0.
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(i)`, `NonPositive(0)`, `Negative(1)`; `OutOfDomain(0)` when P is not
    /// representable (k beyond about 1e70 Mpc⁻¹). Accuracy: that of T(k) (1e-13 of the
    /// formula), doubled, plus that of D_u (1e-10), doubled.
    pub fn linear_power_spectrum_mpc3(&self, wavenumber_per_mpc: T, z: T) -> Result<T> {
        let k = positive(wavenumber_per_mpc, arg!(0, wavenumber_per_mpc))?;
        let z = crate::check::non_negative(z, arg!(1, z))?;
        let du = self
            .growth
            .unnormalized_growth_factor(z)
            .map_err(|e| match e {
                Error::NonFinite(_) => Error::NonFinite(arg!(1, z)),
                Error::Negative(_) => Error::Negative(arg!(1, z)),
                other => other,
            })?;
        finite_result(
            self.power_with::<false>(k, du).0,
            arg!(0, wavenumber_per_mpc),
        )
    }

    /// [`linear_power_spectrum_mpc3`](Self::linear_power_spectrum_mpc3) at one redshift over
    /// many wavenumbers: `out[i] = linear_power_spectrum_mpc3(wavenumbers[i], z)`, bit for bit.
    ///
    /// * `wavenumbers_per_mpc`: k in Mpc⁻¹, each > 0.
    /// * `z`: redshift, finite and ≥ 0 (an invalid z fails every element).
    /// * `out`: P in Mpc³, the same length as `wavenumbers_per_mpc`.
    ///
    /// Returns `Ok(())` when every element succeeded; otherwise failing elements are NaN and the
    /// error names the first failing index; `LengthMismatch(2)` when `out` has another length.
    /// Method: D_u(z) once, then the scalar function's body as straight-line code (the
    /// logarithm, exponential and sine kernels of `math`), which the compiler vectorises; a
    /// block with an element outside the kernels' common domain (k below about 1e-300 or above
    /// about 6000 Mpc⁻¹, a result that is not a normal number, bad input) is computed again by
    /// the scalar function.
    #[inline(always)]
    pub fn linear_power_spectrum_mpc3_array(
        &self,
        wavenumbers_per_mpc: &[T],
        z: T,
        out: &mut [T],
    ) -> crate::ArrayResult {
        let du = match crate::check::non_negative(z, arg!(1, z))
            .and_then(|z| self.growth.unnormalized_growth_factor(z))
        {
            Ok(du) => du,
            Err(_) => T::nan(),
        };
        let valid = du.is_finite();
        let scalar = |k| self.linear_power_spectrum_mpc3(k, z);
        let x = wavenumbers_per_mpc;
        if self.wiggles() {
            crate::array::blockwise(
                x,
                out,
                arg!(2, out),
                #[inline(always)]
                |k| {
                    let t = self.transfer_form::<true>(k);
                    let (p, inside) = self.power_from(k, du, self.tilt_with::<true>(k, t));
                    (p, inside & valid)
                },
                scalar,
            )
        } else {
            crate::array::blockwise(
                x,
                out,
                arg!(2, out),
                #[inline(always)]
                |k| {
                    let t = self.transfer_form::<false>(k);
                    let (p, inside) = self.power_from(k, du, self.tilt_with::<true>(k, t));
                    (p, inside & valid)
                },
                scalar,
            )
        }
    }

    /// σ(R, z): the r.m.s. linear density contrast in a top-hat sphere of radius R,
    /// σ² = ∫ k² P(k, z) W(kR)² dk/2π², W(x) = 3(sin x − x cos x)/x³ (module doc of
    /// [`crate::growth`]).
    ///
    /// * `radius_mpc`: R in Mpc (no h), > 0.
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(i)`, `NonPositive(0)`, `Negative(1)`; `OutOfDomain(0)` for an R so
    /// extreme that σ is not representable; `NoConvergence` if the quadrature fails (not seen).
    /// Accuracy: within 1e-9 relative (`f64`) of an mpmath quadrature of the same P(k)
    /// (`tests/data/growth.txt`). Cost: about a thousand evaluations of P (a fraction of a
    /// millisecond); [`sigma8`](Self::sigma8) is stored.
    pub fn density_rms_in_sphere(&self, radius_mpc: T, z: T) -> Result<T> {
        let r = positive(radius_mpc, arg!(0, radius_mpc))?;
        let z = crate::check::non_negative(z, arg!(1, z))?;
        let d = self
            .growth
            .growth_factor(z)
            .map_err(|_| Error::OutOfDomain(arg!(1, z)))?;
        let s = self
            .sigma_today(r, arg!(0, radius_mpc))
            .map_err(|e| match e {
                Error::NoConvergence => Error::NoConvergence,
                _ => Error::OutOfDomain(arg!(0, radius_mpc)),
            })?;
        finite_result(s * d, arg!(0, radius_mpc))
    }

    /// σ8 = σ(8 h⁻¹ Mpc, z = 0): the given one, or the one computed from A_s at construction
    /// (accuracy as [`density_rms_in_sphere`](Self::density_rms_in_sphere)).
    pub fn sigma8(&self) -> T {
        self.sigma8
    }

    /// S8 = σ8 (Ω_m/0.3)^½.
    pub fn s8(&self) -> T {
        self.sigma8 * (self.growth.universe().parameters().omega_matter / T::c(0.3)).sqrt()
    }

    /// fσ8(z) = f(z) σ(8 h⁻¹ Mpc, z) = f(z) D(z) σ8.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`. Accuracy: that of f and D (1e-10) and σ8 (1e-9).
    pub fn growth_rate_times_sigma8(&self, z: T) -> Result<T> {
        let d = self.growth.growth_factor(z)?;
        let f = self.growth.growth_rate(z)?;
        finite_result(f * d * self.sigma8, arg!(0, z))
    }
}

#[cfg(test)]
mod tests {
    use super::top_hat;

    #[test]
    fn top_hat_series_joins_the_closed_form() {
        // the series and the closed form agree at the switch (x = 0.3) to a few ulp
        let x = 0.3f64;
        let closed = 3.0 * (libm::sin(x) - x * libm::cos(x)) / (x * x * x);
        assert!((top_hat(x - 1e-15) - closed).abs() < 2e-15);
        assert_eq!(top_hat(0.0f64), 1.0);
    }
}
