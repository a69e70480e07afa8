//! The transfer functions of Eisenstein & Hu 1998 (ApJ 496, 605): the fitting formula for cold
//! dark matter and baryons with baryon acoustic oscillations (its section 3), and the form
//! without oscillations (its section 4.2). Equation numbers are those of the paper as recalled
//! from memory; the formulae are checked against an mpmath evaluation written from the paper
//! (`tests/reference/growth_vectors.py`).

use crate::arg;
use crate::check::{finite, finite_result, non_negative, positive};
use crate::math::{exp, log, trig};
use crate::{Arg, Error, Real, Result};

/// x^p for x > 0.
#[inline]
fn pow<T: Real>(x: T, p: T) -> T {
    (p * x.ln()).exp()
}

/// The k-independent coefficients of the two fitting formulae for one (ω_m, ω_b, T0).
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub(crate) struct EisensteinHu<T> {
    /// Ω_b/Ω_0 and Ω_c/Ω_0.
    fb: T,
    fc: T,
    /// k_eq (eq. 3), Mpc⁻¹; 1/(13.41 k_eq) for q (eq. 10).
    k_eq: T,
    q_per_k: T,
    /// ln q_per_k and ln k_Silk, for the powers q^1.08 and (k/k_Silk)^1.4 of the kernels.
    ln_q_per_k: T,
    ln_k_silk: T,
    /// 1/β_node and 14.2/α_c (eq. 20), for the kernels.
    inv_beta_node: T,
    c_alpha: T,
    /// Sound horizon at the drag epoch s (eq. 6), Mpc.
    s: T,
    /// Silk damping scale (eq. 7), Mpc⁻¹.
    k_silk: T,
    alpha_c: T,
    beta_c: T,
    alpha_b: T,
    beta_b: T,
    beta_node: T,
    /// 1 when baryons are present (the oscillating form needs them).
    has_baryons: u8,
    /// No-wiggle form: approximate sound horizon (eq. 26), α_Γ (eq. 31), ω_m and Θ².
    s_nw: T,
    alpha_gamma: T,
    omega_m: T,
    theta2: T,
}

impl<T: Real> EisensteinHu<T> {
    /// Coefficients from ω_m = Ω_m h², ω_b = Ω_b h² and T0 (`args`: the arguments the errors
    /// name for each of the three). ω_b may be 0 (only the no-wiggle form is then
    /// available).
    pub(crate) fn new(omega_m: T, omega_b: T, t0: T, args: [Arg; 3]) -> Result<Self> {
        let [arg_m, arg_b, arg_t0] = args;
        let wm = positive(omega_m, arg_m)?;
        let wb = non_negative(omega_b, arg_b)?;
        let t0 = positive(t0, arg_t0)?;
        if wb > wm {
            return Err(Error::OutOfDomain(arg_b));
        }
        let c = |x: f64| T::c(x);
        let theta = t0 / c(2.7);
        let theta2 = theta * theta;
        let theta4 = theta2 * theta2;
        let fb = wb / wm;
        let fc = (wm - wb) / wm;
        // eqs. 2, 3: equality
        let z_eq = c(2.50e4) * wm / theta4;
        let k_eq = c(7.46e-2) * wm / theta2;
        let mut e = EisensteinHu {
            fb,
            fc,
            k_eq,
            q_per_k: T::one() / (c(13.41) * k_eq),
            omega_m: wm,
            theta2,
            ..Default::default()
        };
        // eq. 31 and eq. 26 (no-wiggle form)
        e.alpha_gamma = T::one() - c(0.328) * (c(431.0) * wm).ln() * fb
            + c(0.38) * (c(22.3) * wm).ln() * fb * fb;
        e.s_nw = if wb > T::zero() {
            c(44.5) * (c(9.83) / wm).ln() / (T::one() + c(10.0) * pow(wb, c(0.75))).sqrt()
        } else {
            c(44.5) * (c(9.83) / wm).ln()
        };
        // eqs. 11, 12: cold dark matter suppression and shift
        let a1 = pow(c(46.9) * wm, c(0.670)) * (T::one() + pow(c(32.1) * wm, c(-0.532)));
        let a2 = pow(c(12.0) * wm, c(0.424)) * (T::one() + pow(c(45.0) * wm, c(-0.582)));
        e.alpha_c = pow(a1, -fb) * pow(a2, -(fb * fb * fb));
        let b1 = c(0.944) / (T::one() + pow(c(458.0) * wm, c(-0.708)));
        let b2 = pow(c(0.395) * wm, c(-0.0266));
        e.beta_c = T::one() / (T::one() + b1 * (pow(fc, b2) - T::one()));
        e.ln_q_per_k = e.q_per_k.ln();
        e.c_alpha = c(14.2) / e.alpha_c;
        if wb > T::zero() {
            e.has_baryons = 1;
            // eq. 4: drag epoch
            let bd1 = c(0.313) * pow(wm, c(-0.419)) * (T::one() + c(0.607) * pow(wm, c(0.674)));
            let bd2 = c(0.238) * pow(wm, c(0.223));
            let z_d = c(1291.0) * pow(wm, c(0.251)) / (T::one() + c(0.659) * pow(wm, c(0.828)))
                * (T::one() + bd1 * pow(wb, bd2));
            // eq. 5: baryon-to-photon momentum ratio R = 31.5 ω_b Θ⁻⁴ (z/10³)⁻¹
            let r_d = c(31.5) * wb / theta4 * (c(1000.0) / z_d);
            let r_eq = c(31.5) * wb / theta4 * (c(1000.0) / z_eq);
            // eq. 6: sound horizon
            e.s = c(2.0) / (c(3.0) * k_eq)
                * (c(6.0) / r_eq).sqrt()
                * (((T::one() + r_d).sqrt() + (r_d + r_eq).sqrt()) / (T::one() + r_eq.sqrt())).ln();
            // eq. 7: Silk damping
            e.k_silk = c(1.6)
                * pow(wb, c(0.52))
                * pow(wm, c(0.73))
                * (T::one() + pow(c(10.4) * wm, c(-0.95)));
            // eqs. 14, 15: baryon suppression
            let y = (T::one() + z_eq) / (T::one() + z_d);
            let sy = (T::one() + y).sqrt();
            let g = y
                * (c(-6.0) * sy + (c(2.0) + c(3.0) * y) * ((sy + T::one()) / (sy - T::one())).ln());
            e.alpha_b = c(2.07) * k_eq * e.s * pow(T::one() + r_d, c(-0.75)) * g;
            // eq. 24: baryon shift; eq. 23: node shift
            e.beta_b =
                c(0.5) + fb + (c(3.0) - c(2.0) * fb) * ((c(17.2) * wm).powi(2) + T::one()).sqrt();
            e.beta_node = c(8.41) * pow(wm, c(0.435));
            e.ln_k_silk = e.k_silk.ln();
            e.inv_beta_node = T::one() / e.beta_node;
        }
        for v in [
            e.alpha_gamma,
            e.s_nw,
            e.alpha_c,
            e.beta_c,
            e.s,
            e.k_silk,
            e.alpha_b,
            e.beta_b,
            e.beta_node,
            e.q_per_k,
            e.ln_q_per_k,
            e.ln_k_silk,
            e.inv_beta_node,
            e.c_alpha,
        ] {
            if !v.is_finite() {
                return Err(Error::OutOfDomain(arg_m));
            }
        }
        Ok(e)
    }

    /// Whether the oscillating form is available (ω_b > 0).
    /// The sound horizon s at the drag epoch (eq. 6), Mpc: the period 2π/s in k of the
    /// oscillating part of the full form.
    pub(crate) fn sound_horizon_mpc(&self) -> T {
        self.s
    }

    pub(crate) fn has_baryons(&self) -> bool {
        self.has_baryons == 1
    }

    /// The full form T(k) (eqs. 8, 16–24) at k > 0 in Mpc⁻¹; requires baryons.
    #[inline]
    pub(crate) fn transfer(&self, k: T) -> T {
        self.transfer_with::<false>(k).0
    }

    /// The form without oscillations (eqs. 26–31) at k > 0 in Mpc⁻¹.
    #[inline]
    pub(crate) fn no_wiggle(&self, k: T) -> T {
        self.no_wiggle_with::<false>(k).0
    }

    /// The full form T(k) (eqs. 8, 16–24), one body for the scalar function (`FAST` false:
    /// the kernels of `math` with their `libm` fallbacks, the flag always true) and for the
    /// array functions (`FAST` true: straight-line code and whether every kernel stayed in its
    /// branch-free domain, where the bits are those of the scalar form).
    ///
    /// Written with ln k computed once: q^1.08 = e^(1.08 ln q), (k/k_Silk)^1.4 =
    /// e^(1.4 (ln k − ln k_Silk)); the node shift of eq. 22 as k s̃ = ks·m̂·(1 + m³)^(−1/3)
    /// with m = min(β_node/ks, ks/β_node) and m̂ = m below the node (ks < β_node), 1 above
    /// (no overflow at either end); the Silk damping e^(−(k/k_Silk)^1.4) with its exponent
    /// capped at 700 (`f64`; 80 in `f32`), where it is below 1e-304 and the baryon term it
    /// multiplies is lost against the other one.
    #[inline(always)]
    pub(crate) fn transfer_with<const FAST: bool>(&self, k: T) -> (T, bool) {
        let one = T::one();
        let c = |x: f64| T::c(x);
        let (lk, in_k) = ln_k::<T, FAST>(k);
        let q = k * self.q_per_k;
        // q^1.08 (eq. 20)
        let (q108, in_q) = exp_k::<T, FAST>(c(1.08) * (lk + self.ln_q_per_k));
        let ks = k * self.s;
        // eqs. 19–20: T̃0 for (α, β) = (1, β_c), (α_c, β_c), (1, 1)
        let (l_c, in_lc) = ln_k::<T, FAST>(c(core::f64::consts::E) + c(1.8) * self.beta_c * q);
        let (l_1, in_l1) = ln_k::<T, FAST>(c(core::f64::consts::E) + c(1.8) * q);
        let c386 = c(386.0) / (one + c(69.9) * q108);
        let q2 = q * q;
        let tt_1c = l_c / (l_c + (c(14.2) + c386) * q2);
        let tt_ac = l_c / (l_c + (self.c_alpha + c386) * q2);
        let tt_11 = l_1 / (l_1 + (c(14.2) + c386) * q2);
        // eq. 18 and 17: cold dark matter
        let ks54 = ks * c(1.0 / 5.4);
        let ks54_2 = ks54 * ks54;
        let f = one / (one + ks54_2 * ks54_2);
        let tc = f * tt_1c + (one - f) * tt_ac;
        // eq. 22: k s̃ = ks/[1 + (β_node/ks)³]^(1/3)
        let bn = self.beta_node;
        let below = ks < bn;
        let inv_ks = one / ks;
        let m = if below {
            ks * self.inv_beta_node
        } else {
            bn * inv_ks
        };
        let (l_m, in_m) = ln_1p_k::<T, FAST>(m * m * m);
        let (shrink, in_s) = exp_k::<T, FAST>(l_m * c(-1.0 / 3.0));
        let x = ks * (if below { m } else { one }) * shrink;
        // eq. 21: baryons
        let ks52 = ks * c(1.0 / 5.2);
        let first = tt_11 / (one + ks52 * ks52);
        let r = self.beta_b * inv_ks;
        let (damp, in_d) = exp_k::<T, FAST>(c(1.4) * (lk - self.ln_k_silk));
        let cap = if T::MANTISSA_DIGITS < 53 {
            c(80.0)
        } else {
            c(700.0)
        };
        let (silk, in_e) = exp_k::<T, FAST>(-(damp.min(cap)));
        let second = self.alpha_b / (one + r * r * r) * silk;
        let (sin_x, _, in_x) = sin_cos_k::<T, FAST>(x);
        let j0 = if x < c(1e-4) {
            one - x * x * c(1.0 / 6.0)
        } else {
            sin_x / x
        };
        let tb = (first + second) * j0;
        // eq. 16
        (
            self.fb * tb + self.fc * tc,
            in_k & in_q & in_lc & in_l1 & in_m & in_s & in_d & in_e & in_x,
        )
    }

    /// The form without oscillations (eqs. 26–31), one body for the scalar and the array
    /// functions as [`transfer_with`](Self::transfer_with).
    #[inline(always)]
    pub(crate) fn no_wiggle_with<const FAST: bool>(&self, k: T) -> (T, bool) {
        let ks = T::c(0.43) * k * self.s_nw;
        let ks2 = ks * ks;
        // eq. 30: Γ_eff h = ω_m [α_Γ + (1 − α_Γ)/(1 + (0.43 k s)⁴)]
        let gamma_h = self.omega_m
            * (self.alpha_gamma + (T::one() - self.alpha_gamma) / (T::one() + ks2 * ks2));
        // eq. 28: q = k Θ²/(Γ_eff h)
        let q = k * self.theta2 / gamma_h;
        // eq. 29
        let (l0, inside) = ln_k::<T, FAST>(T::c(2.0 * core::f64::consts::E) + T::c(1.8) * q);
        let c0 = T::c(14.2) + T::c(731.0) / (T::one() + T::c(62.5) * q);
        (l0 / (l0 + c0 * q * q), inside)
    }
}

/// ln x by the kernel of `math::log`: straight-line with its domain flag (`FAST`), or with its
/// `libm` fallback and the flag true.
#[inline(always)]
pub(crate) fn ln_k<T: Real, const FAST: bool>(x: T) -> (T, bool) {
    if FAST {
        log::ln_fast(x)
    } else {
        (log::ln(x), true)
    }
}

/// ln(1 + x) by the kernel of `math::log`, as [`ln_k`].
#[inline(always)]
fn ln_1p_k<T: Real, const FAST: bool>(x: T) -> (T, bool) {
    if FAST {
        log::ln_1p_fast(x)
    } else {
        (log::ln_1p(x), true)
    }
}

/// e^x by the kernel of `math::exp`, as [`ln_k`].
#[inline(always)]
pub(crate) fn exp_k<T: Real, const FAST: bool>(x: T) -> (T, bool) {
    if FAST {
        exp::exp_fast(x)
    } else {
        (exp::exp(x), true)
    }
}

/// sin x and cos x by the kernel of `math::trig`, as [`ln_k`].
#[inline(always)]
pub(crate) fn sin_cos_k<T: Real, const FAST: bool>(x: T) -> (T, T, bool) {
    if FAST {
        trig::sin_cos_fast(x)
    } else {
        let (s, c) = trig::sin_cos(x);
        (s, c, true)
    }
}

/// The transfer function of cold dark matter and baryons with baryon acoustic oscillations, by
/// the fitting formula of Eisenstein & Hu 1998 (ApJ 496, 605, eqs. 2–24 as recalled from
/// memory: T = (Ω_b/Ω_0) T_b + (Ω_c/Ω_0) T_c with the sound horizon of eq. 6, the Silk scale of
/// eq. 7, α_c, β_c of eqs. 11–12, T_c of eqs. 17–20 and T_b of eqs. 21–24).
///
/// * `wavenumber_per_mpc`: k in Mpc⁻¹ (no h), > 0.
/// * `omega_matter_h2`: ω_m = Ω_m h² (all matter; the formula's Ω_0 h²), > 0.
/// * `omega_baryon_h2`: ω_b = Ω_b h², 0 < ω_b ≤ ω_m.
/// * `cmb_temperature_k`: T0 in K, > 0 (the formula's Θ_2.7 = T0/2.7 K).
///
/// Returns T(k), 1 at k → 0, falling like ln k/k² at large k (it oscillates around the
/// no-wiggle form). Errors: `NonFinite(i)`, `NonPositive(i)` (k, ω_m, T0 and ω_b = 0: the
/// oscillating form needs baryons), `Negative(2)`, `OutOfDomain(2)` for ω_b > ω_m,
/// `OutOfDomain(1)` for parameters so extreme that a coefficient is not finite.
/// Domain: the formula is a fit, accurate to a few per cent of the full calculation for
/// 0.025 ≲ ω_m ≲ 0.5 and ω_b/ω_m ≲ 0.5 (the paper's statement, from memory); it is evaluated
/// for any positive input. Accuracy of the evaluation: within 1e-13 relative (`f64`) of an
/// mpmath evaluation of the same formulae (`tests/data/growth.txt`), except near the zeros of
/// T_b's oscillation where the absolute error stays within 1e-14.
pub fn eisenstein_hu_transfer_function<T: Real>(
    wavenumber_per_mpc: T,
    omega_matter_h2: T,
    omega_baryon_h2: T,
    cmb_temperature_k: T,
) -> Result<T> {
    let k = positive(wavenumber_per_mpc, arg!(0, wavenumber_per_mpc))?;
    let wb = positive(omega_baryon_h2, arg!(2, omega_baryon_h2))?;
    let e = EisensteinHu::new(
        omega_matter_h2,
        wb,
        cmb_temperature_k,
        [
            arg!(1, omega_matter_h2),
            arg!(2, omega_baryon_h2),
            arg!(3, cmb_temperature_k),
        ],
    )?;
    finite_result(e.transfer(k), arg!(0, wavenumber_per_mpc))
}

/// The transfer function without baryon acoustic oscillations of Eisenstein & Hu 1998 (ApJ
/// 496, 605, section 4.2, eqs. 26–31 as recalled from memory): T0(q) = L0/(L0 + C0 q²),
/// L0 = ln(2e + 1.8q), C0 = 14.2 + 731/(1 + 62.5q), q = k Θ²/(Γ_eff h), with the shape
/// Γ_eff h = ω_m [α_Γ + (1 − α_Γ)/(1 + (0.43 k s)⁴)], the approximate sound horizon
/// s = 44.5 ln(9.83/ω_m)/√(1 + 10 ω_b^¾) Mpc and α_Γ = 1 − 0.328 ln(431 ω_m) f_b
/// + 0.38 ln(22.3 ω_m) f_b², f_b = ω_b/ω_m.
///
/// * `wavenumber_per_mpc`: k in Mpc⁻¹ (no h), > 0.
/// * `omega_matter_h2`: ω_m = Ω_m h², > 0.
/// * `omega_baryon_h2`: ω_b = Ω_b h², 0 ≤ ω_b ≤ ω_m (0 gives the zero-baryon form).
/// * `cmb_temperature_k`: T0 in K, > 0.
///
/// Returns T(k) in (0, 1]. Errors: `NonFinite(i)`, `NonPositive(i)` (k, ω_m, T0),
/// `Negative(2)`, `OutOfDomain(2)` for ω_b > ω_m. Domain and accuracy of the fit as
/// [`eisenstein_hu_transfer_function`]; the evaluation is within 1e-13 relative (`f64`) of an
/// mpmath evaluation of the same formulae (`tests/data/growth.txt`).
pub fn eisenstein_hu_no_wiggle_transfer_function<T: Real>(
    wavenumber_per_mpc: T,
    omega_matter_h2: T,
    omega_baryon_h2: T,
    cmb_temperature_k: T,
) -> Result<T> {
    let k = positive(wavenumber_per_mpc, arg!(0, wavenumber_per_mpc))?;
    let _ = finite(omega_baryon_h2, arg!(2, omega_baryon_h2))?;
    let e = EisensteinHu::new(
        omega_matter_h2,
        omega_baryon_h2,
        cmb_temperature_k,
        [
            arg!(1, omega_matter_h2),
            arg!(2, omega_baryon_h2),
            arg!(3, cmb_temperature_k),
        ],
    )?;
    finite_result(e.no_wiggle(k), arg!(0, wavenumber_per_mpc))
}
