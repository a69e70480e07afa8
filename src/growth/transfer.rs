//! The transfer functions of Eisenstein & Hu 1998 (ApJ 496, 605): the fitting formula for cold
//! dark matter and baryons with baryon acoustic oscillations (its section 3), and the form
//! without oscillations (its section 4.2). Equation numbers are those of the paper as recalled
//! from memory; the formulae are checked against an mpmath evaluation written from the paper
//! (`tests/reference/growth_vectors.py`).

use crate::check::{finite, finite_result, non_negative, positive};
use crate::{Error, Real, Result};

/// x^p for x > 0.
#[inline]
fn pow<T: Real>(x: T, p: T) -> T {
    (p * x.ln()).exp()
}

/// j0(x) = sin x / x, with its series below 1e-4 (error below x⁴/120).
#[inline]
fn spherical_bessel_j0<T: Real>(x: T) -> T {
    if x.abs() < T::c(1e-4) {
        T::one() - x * x / T::c(6.0)
    } else {
        x.sin() / x
    }
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
    /// Coefficients from ω_m = Ω_m h², ω_b = Ω_b h² and T0 (argument positions `first`,
    /// `first` + 1, `first` + 2 in the errors). ω_b may be 0 (only the no-wiggle form is then
    /// available).
    pub(crate) fn new(omega_m: T, omega_b: T, t0: T, first: u8) -> Result<Self> {
        let wm = positive(omega_m, first)?;
        let wb = non_negative(omega_b, first + 1)?;
        let t0 = positive(t0, first + 2)?;
        if wb > wm {
            return Err(Error::OutOfDomain(first + 1));
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
        ] {
            if !v.is_finite() {
                return Err(Error::OutOfDomain(first));
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

    /// T̃0(k, α_c, β_c) of eqs. 19–20 at q = k/(13.41 k_eq).
    #[inline]
    fn t_tilde(q: T, alpha_c: T, beta_c: T) -> T {
        let l = (T::c(core::f64::consts::E) + T::c(1.8) * beta_c * q).ln();
        let cc = T::c(14.2) / alpha_c + T::c(386.0) / (T::one() + T::c(69.9) * pow(q, T::c(1.08)));
        l / (l + cc * q * q)
    }

    /// The full form T(k) (eqs. 8, 16–24) at k > 0 in Mpc⁻¹; requires baryons.
    pub(crate) fn transfer(&self, k: T) -> T {
        let one = T::one();
        let q = k * self.q_per_k;
        let ks = k * self.s;
        // eq. 18 and 17: cold dark matter
        let ks54 = ks / T::c(5.4);
        let ks54_2 = ks54 * ks54;
        let f = one / (one + ks54_2 * ks54_2);
        let tc = f * Self::t_tilde(q, one, self.beta_c)
            + (one - f) * Self::t_tilde(q, self.alpha_c, self.beta_c);
        // eq. 22: s̃ = s/[1 + (β_node/ks)³]^(1/3), so k s̃ = ks/[1 + (β_node/ks)³]^(1/3),
        // written without overflow at small and large ks
        let bn = self.beta_node;
        let x = if ks < bn {
            ks * ks / (ks * ks * ks + bn * bn * bn).cbrt()
        } else {
            let r = bn / ks;
            ks / (one + r * r * r).cbrt()
        };
        // eq. 21: baryons
        let ks52 = ks / T::c(5.2);
        let first = Self::t_tilde(q, one, one) / (one + ks52 * ks52);
        let second = if ks > T::zero() {
            let r = self.beta_b / ks;
            let damp = pow(k / self.k_silk, T::c(1.4));
            self.alpha_b / (one + r * r * r) * (-damp).exp()
        } else {
            T::zero()
        };
        let tb = (first + second) * spherical_bessel_j0(x);
        // eq. 16
        self.fb * tb + self.fc * tc
    }

    /// The form without oscillations (eqs. 26–31) at k > 0 in Mpc⁻¹.
    pub(crate) fn no_wiggle(&self, k: T) -> T {
        let ks = T::c(0.43) * k * self.s_nw;
        let ks2 = ks * ks;
        // eq. 30: Γ_eff h = ω_m [α_Γ + (1 − α_Γ)/(1 + (0.43 k s)⁴)]
        let gamma_h = self.omega_m
            * (self.alpha_gamma + (T::one() - self.alpha_gamma) / (T::one() + ks2 * ks2));
        // eq. 28: q = k Θ²/(Γ_eff h)
        let q = k * self.theta2 / gamma_h;
        // eq. 29
        let l0 = (T::c(2.0 * core::f64::consts::E) + T::c(1.8) * q).ln();
        let c0 = T::c(14.2) + T::c(731.0) / (T::one() + T::c(62.5) * q);
        l0 / (l0 + c0 * q * q)
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
    let k = positive(wavenumber_per_mpc, 0)?;
    let wb = positive(omega_baryon_h2, 2)?;
    let e = EisensteinHu::new(omega_matter_h2, wb, cmb_temperature_k, 1)?;
    finite_result(e.transfer(k), 0)
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
    let k = positive(wavenumber_per_mpc, 0)?;
    let _ = finite(omega_baryon_h2, 2)?;
    let e = EisensteinHu::new(omega_matter_h2, omega_baryon_h2, cmb_temperature_k, 1)?;
    finite_result(e.no_wiggle(k), 0)
}
