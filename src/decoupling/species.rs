//! The particle content of a universe for decoupling: number densities, Saha factors, the
//! helium stages in Saha equilibrium coupled through the electron density, the recombination
//! coefficient and the rates of the Peebles atom. Equations: the module doc of
//! [`crate::decoupling`].

use crate::arg;
use crate::constants as k;
use crate::cosmology::Universe;
use crate::math::exp::exp;
use crate::math::roots::{bracketed_newton, bracketed_newton_relative};
use crate::{Error, Real, Result};

/// The 2s → 1s two-photon decay rate Λ, s⁻¹ (the value used with the Peebles atom by Seager,
/// Sasselov & Scott 1999, ApJ 523, L1).
pub(crate) const TWO_PHOTON_RATE: f64 = 8.224_580_9;
/// The fudge factor F on the case-B coefficient (Seager, Sasselov & Scott 1999).
pub(crate) const FUDGE: f64 = 1.14;
/// Case-B fit of Pequignot, Petitjean & Boisson 1991 (A&A 251, 680): 1e-19 a t^b/(1 + c t^d)
/// m³ s⁻¹ with t = T/10⁴ K (coefficients from memory).
const PPB: [f64; 4] = [4.309, -0.6166, 0.6703, 0.5300];

/// ln of (2π m_e k/h²)^{3/2}, in ln(m⁻³ K^{−3/2}).
fn ln_saha_constant() -> f64 {
    let a = 2.0 * core::f64::consts::PI * k::ELECTRON_MASS * k::BOLTZMANN / (k::PLANCK * k::PLANCK);
    1.5 * libm::log(a)
}

/// Constants of one universe for decoupling. Plain old data.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct Species<T> {
    /// Hydrogen nuclei per m³ today.
    pub n_h0: T,
    /// n_He/n_H.
    pub f_he: T,
    /// ln T0 (K).
    pub ln_t0: T,
    /// T0, K.
    pub t0: T,
    /// ln[(2π m_e k/h²)^{3/2} / n_H0]: ln S = ln g + this + (3/2) ln T − 3u − χ/kT.
    pub ln_saha: T,
    /// ln[(2π m_e k/h²)^{3/2}], for β.
    pub ln_saha_density_free: T,
    /// χ/k of hydrogen, He I, He II, K.
    pub chi_h: T,
    pub chi_he1: T,
    pub chi_he2: T,
    /// H0 in s⁻¹.
    pub h0_si: T,
    /// λ_α³/(8π), m³.
    pub lyman_k: T,
    /// 8 σ_T a_r T0⁴/(3 m_e c), s⁻¹ (times (1+z)⁴ at z).
    pub compton0: T,
    /// σ_T c n_H0, s⁻¹ (times x_e (1+z)³ at z).
    pub thomson0: T,
    /// R0 = 3Ω_b/(4Ω_γ): R(z) = R0/(1+z).
    pub baryon_photon0: T,
    /// n_H0 σ_T · 1 Mpc (m² m⁻³ m: dimensionless per Mpc), for the visibility per Mpc.
    pub thomson_mpc0: T,
}

impl<T: Real> Species<T> {
    /// Errors: `InvalidParameter(2)` without baryons, `InvalidParameter(4)` without radiation.
    pub fn new(u: &Universe<T>) -> Result<Self> {
        let p = u.parameters();
        if !(p.omega_baryon > T::zero()) {
            return Err(Error::InvalidParameter(arg!(2, omega_baryon)));
        }
        if !(p.cmb_temperature_k > T::zero()) {
            return Err(Error::InvalidParameter(arg!(4, cmb_temperature_k)));
        }
        let y = p.helium_mass_fraction;
        let m_h = T::c(k::HYDROGEN_ATOM_MASS_U * k::ATOMIC_MASS_UNIT);
        let rho_b = p.omega_baryon * u.critical_density;
        let n_h0 = (T::one() - y) * rho_b / m_h;
        let f_he = y / (T::one() - y) * T::c(k::HYDROGEN_ATOM_MASS_U / k::HELIUM_ATOM_MASS_U);
        let t0 = p.cmb_temperature_k;
        let ev_over_k = k::ELEMENTARY_CHARGE / k::BOLTZMANN;
        let e_alpha = 0.75 * k::HYDROGEN_IONIZATION_EV * k::ELEMENTARY_CHARGE;
        let lambda_alpha = k::PLANCK * k::SPEED_OF_LIGHT / e_alpha;
        let t2 = t0 * t0;
        let omega_photon =
            T::c(k::RADIATION_DENSITY / (k::SPEED_OF_LIGHT * k::SPEED_OF_LIGHT)) * t2 * t2
                / u.critical_density;
        let s = Self {
            n_h0,
            f_he,
            ln_t0: t0.ln(),
            t0,
            ln_saha: T::c(ln_saha_constant()) - n_h0.ln(),
            ln_saha_density_free: T::c(ln_saha_constant()),
            chi_h: T::c(k::HYDROGEN_IONIZATION_EV * ev_over_k),
            chi_he1: T::c(k::HELIUM_FIRST_IONIZATION_EV * ev_over_k),
            chi_he2: T::c(k::HELIUM_SECOND_IONIZATION_EV * ev_over_k),
            h0_si: p.h0_km_s_mpc * T::c(1000.0 / k::MEGAPARSEC),
            lyman_k: T::c(
                lambda_alpha * lambda_alpha * lambda_alpha / (8.0 * core::f64::consts::PI),
            ),
            compton0: T::c(
                8.0 * k::THOMSON_CROSS_SECTION * k::RADIATION_DENSITY
                    / (3.0 * k::ELECTRON_MASS * k::SPEED_OF_LIGHT),
            ) * t2
                * t2,
            thomson0: T::c(k::THOMSON_CROSS_SECTION * k::SPEED_OF_LIGHT) * n_h0,
            baryon_photon0: T::c(0.75) * p.omega_baryon / omega_photon,
            thomson_mpc0: T::c(k::THOMSON_CROSS_SECTION * k::MEGAPARSEC) * n_h0,
        };
        for v in [
            s.n_h0,
            s.ln_saha,
            s.compton0,
            s.thomson0,
            s.baryon_photon0,
            s.thomson_mpc0,
        ] {
            if !v.is_finite() || !(v.abs() > T::zero()) {
                return Err(Error::InvalidParameter(arg!(2, omega_baryon)));
            }
        }
        Ok(s)
    }

    /// The three ln S (hydrogen, He I, He II) at u = ln(1+z), temperature T_r = T0 e^u.
    #[inline]
    pub fn ln_saha_factors(&self, u: T) -> [T; 3] {
        self.ln_saha_factors_at(u, T::one() / (self.t0 * exp(u)))
    }

    /// As [`ln_saha_factors`](Self::ln_saha_factors) with 1/T_r given.
    #[inline]
    pub fn ln_saha_factors_at(&self, u: T, inv_t: T) -> [T; 3] {
        let base = self.ln_saha + T::c(1.5) * (self.ln_t0 + u) - T::c(3.0) * u;
        [
            base - self.chi_h * inv_t,
            base + T::c(core::f64::consts::LN_2 * 2.0) - self.chi_he1 * inv_t,
            base - self.chi_he2 * inv_t,
        ]
    }

    /// Case-B coefficient with the fudge factor, m³ s⁻¹, at the temperature T whose
    /// ln(T/10⁴ K) is `lt`.
    #[inline]
    pub fn alpha_ln(lt: T) -> T {
        let [a, b, c, d] = PPB;
        T::c(FUDGE * 1e-19 * a) * exp(T::c(b) * lt) / (T::one() + T::c(c) * exp(T::c(d) * lt))
    }
}

/// How hydrogen enters the electron balance.
#[derive(Clone, Copy)]
pub(crate) enum Hydrogen<T> {
    /// Free-proton fraction x_p given (the history).
    Fixed(T),
    /// In Saha equilibrium with this ln S_H.
    Saha(T),
}

/// The solution of the electron balance x_e = x_p + f_He (y₁ + 2y₂).
#[derive(Clone, Copy, Debug)]
pub(crate) struct Balance<T> {
    pub x_e: T,
    pub x_p: T,
}

/// ln(e^a + e^b + e^c) without overflow.
#[inline]
fn log_sum_exp3<T: Real>(a: T, b: T, c: T) -> T {
    let m = a.max(b).max(c);
    if m == T::neg_infinity() {
        return m;
    }
    m + ((a - m).exp() + (b - m).exp() + (c - m).exp()).ln()
}

/// ln(1 + e^x) without overflow.
#[inline]
fn softplus<T: Real>(x: T) -> T {
    if x > T::c(40.0) { x } else { x.exp().ln_1p() }
}

/// Helium fractions (ln y₁, ln y₂, y₁, y₂) at ξ = ln x_e.
#[inline]
fn helium<T: Real>(xi: T, ln_s1: T, ln_s2: T) -> (T, T, T, T) {
    let a1 = ln_s1 - xi;
    let a2 = a1 + ln_s2 - xi;
    let m = a1.max(a2).max(T::zero());
    let ln_sum = m + ((-m).exp() + (a1 - m).exp() + (a2 - m).exp()).ln();
    let l1 = a1 - ln_sum;
    let l2 = a2 - ln_sum;
    (l1, l2, l1.exp(), l2.exp())
}

/// Solves the electron balance at ln S = `ln_s` (hydrogen, He I, He II) with hydrogen as given.
/// Accurate to a few ulp of x_e (a bracketed Newton iteration in ln x_e).
pub(crate) fn electron_balance<T: Real>(
    f_he: T,
    hyd: Hydrogen<T>,
    ln_s: [T; 3],
) -> Result<Balance<T>> {
    match hyd {
        Hydrogen::Fixed(xp) => {
            let [_, ln_s1, ln_s2] = ln_s;
            proton_balance(f_he, xp, ln_s, [exp(ln_s1), exp(ln_s2)])
        }
        Hydrogen::Saha(_) => newton_balance(f_he, hyd, ln_s),
    }
}

/// The electron balance with x_p given, the helium Saha factors given both as logarithms and
/// as numbers (`s12` = [S_HeI, S_HeII], +∞ where they overflow).
pub(crate) fn proton_balance<T: Real>(
    f_he: T,
    xp: T,
    ln_s: [T; 3],
    s12: [T; 2],
) -> Result<Balance<T>> {
    if !(xp > T::zero()) {
        return Err(Error::NoConvergence);
    }
    let [s1, s2] = s12;
    let tiny = T::epsilon() * T::c(1e-3);
    if f_he == T::zero() {
        return Ok(Balance { x_e: xp, x_p: xp });
    }
    if s1.is_finite() && s2.is_finite() && s1 < T::c(1e100) && s2 < T::c(1e100) {
        // fast path: the helium share f(y₁ + 2y₂) ≤ f S₁(x_p + 2S₂)/x_p² (y₁ ≤ r₁ and
        // y₂ ≤ r₁r₂ with r = S/x_e and x_e ≥ x_p) is below 1e-3 ulp of x_p
        if f_he * s1 * (xp + T::c(2.0) * s2) < tiny * xp * xp * xp {
            return Ok(Balance { x_e: xp, x_p: xp });
        }
        // He III below 1e-3 ulp (2f y₂ ≤ 2f S_HeII/x_p): one helium stage, and the balance
        // x_e = x_p + f S₁/(x_e + S₁) is the quadratic x_e² + (S₁ − x_p) x_e − S₁(x_p + f) = 0
        if T::c(2.0) * f_he * s2 < tiny * xp * xp {
            let b = s1 - xp;
            let c = s1 * (xp + f_he);
            let root = (b * b + T::c(4.0) * c).sqrt();
            let x_e = if b >= T::zero() {
                T::c(2.0) * c / (b + root)
            } else {
                T::c(0.5) * (root - b)
            };
            return Ok(Balance { x_e, x_p: xp });
        }
        // both stages: with x = x_p + d, the balance d (x² + S₁x + S₁S₂) = f S₁ (x + 2S₂) is a
        // cubic in the helium share d ∈ [0, 2f] (negative at 0, positive at 2f), solved by a
        // bracketed Newton iteration without transcendental functions
        let cubic = |d: T| -> (T, T) {
            let x = xp + d;
            let q = x * x + s1 * x + s1 * s2;
            (
                d * q - f_he * s1 * (x + T::c(2.0) * s2),
                q + d * (T::c(2.0) * x + s1) - f_he * s1,
            )
        };
        let d = bracketed_newton_relative(
            cubic,
            T::zero(),
            T::c(2.0) * f_he,
            T::epsilon() * T::c(2.0),
            200,
        )?;
        return Ok(Balance {
            x_e: xp + d,
            x_p: xp,
        });
    }
    fixed_balance(f_he, xp, ln_s)
}

/// The electron balance with x_p given, by a bracketed Newton iteration in η = ln(x_e/x_p) ∈
/// [0, ln(1 + 2f/x_p)]: G(η) = ln(1 + (f/x_p) m) − η with m = y₁ + 2y₂ at x_e = x_p e^η. Working
/// in η rather than ln x_e keeps every bit of the (small) helium share.
fn fixed_balance<T: Real>(f_he: T, xp: T, ln_s: [T; 3]) -> Result<Balance<T>> {
    let [_, ln_s1, ln_s2] = ln_s;
    let lxp = xp.ln();
    let (l1, l2) = (ln_s1 - lxp, ln_s2 - lxp);
    let ratio = f_he / xp;
    let g = |eta: T| -> (T, T) {
        let (_, _, y1, y2) = helium(eta, l1, l2);
        let m = y1 + T::c(2.0) * y2;
        let dm = y1 * (m - T::one()) + T::c(2.0) * y2 * (m - T::c(2.0));
        let n = T::one() + ratio * m;
        (n.ln() - eta, ratio * dm / n - T::one())
    };
    let hi = (T::one() + T::c(2.0) * ratio).ln() + T::c(1e-3);
    let eta = bracketed_newton(g, T::zero(), hi, T::epsilon() * T::c(2.0), 200)?;
    Ok(Balance {
        x_e: xp * eta.exp(),
        x_p: xp,
    })
}

/// The electron balance by a bracketed Newton iteration in ξ = ln x_e (hydrogen in Saha
/// equilibrium; relative accuracy about ulp(ξ), a few ulp of x_e).
fn newton_balance<T: Real>(f_he: T, hyd: Hydrogen<T>, ln_s: [T; 3]) -> Result<Balance<T>> {
    let [_, ln_s1, ln_s2] = ln_s;
    let ln_f = f_he.ln();
    let ln_2f = (T::c(2.0) * f_he).ln();
    // ln x_p at ξ and d ln x_p/dξ (= −(1 − x_p) in Saha equilibrium)
    let hydrogen = |xi: T| -> (T, T) {
        match hyd {
            Hydrogen::Fixed(xp) => (xp.ln(), T::zero()),
            Hydrogen::Saha(ls) => {
                let lx = -softplus(xi - ls);
                (lx, -(T::one() - lx.exp()))
            }
        }
    };
    let g = |xi: T| -> (T, T) {
        let (lxp, dlxp) = hydrogen(xi);
        let (l1, l2, y1, y2) = helium(xi, ln_s1, ln_s2);
        let (ln_n, m) = if f_he > T::zero() {
            (
                log_sum_exp3(lxp, ln_f + l1, ln_2f + l2),
                y1 + T::c(2.0) * y2,
            )
        } else {
            (lxp, T::zero())
        };
        // d ln N/dξ = [x_p dlnx_p + f y₁ (m − 1) + 2f y₂ (m − 2)]/N
        let mut dn = dlxp * (lxp - ln_n).exp();
        if f_he > T::zero() {
            dn = dn
                + (m - T::one()) * (ln_f + l1 - ln_n).exp()
                + (m - T::c(2.0)) * (ln_2f + l2 - ln_n).exp();
        }
        (ln_n - xi, dn - T::one())
    };
    let hi = (T::one() + T::c(2.0) * f_he).ln() + T::c(1e-3);
    let lo = match hyd {
        Hydrogen::Fixed(xp) => xp.ln() - T::c(1e-3),
        Hydrogen::Saha(ls) => {
            // hydrogen alone gives x² /(1 − x) = S_H, a lower bound for x_e
            let lx = if ls < T::c(-40.0) {
                T::c(0.5) * ls
            } else {
                (T::c(2.0) / (T::one() + (T::one() + T::c(4.0) * (-ls).exp()).sqrt())).ln()
            };
            lx - T::one()
        }
    };
    // ξ may be anything from about −10⁴ (deep neutral, below the smallest number) to 0.2
    let tol = T::epsilon() * T::c(4.0) * lo.abs().max(hi.abs()).max(T::one());
    let xi = bracketed_newton(g, lo, hi, tol, 200)?;
    let (lxp, _) = hydrogen(xi);
    Ok(Balance {
        x_e: xi.exp(),
        x_p: lxp.exp(),
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    /// The closed forms (helium negligible; one helium stage) and the cubic in the helium share
    /// give the root of the same balance as the general Newton iteration in ln(x_e/x_p), to a
    /// few ulp, over the states where they apply.
    #[test]
    fn fast_paths_agree_with_the_general_solution() {
        let f = 0.0815f64;
        let mut checked = 0;
        for i in 0..60 {
            let xp = 10f64.powf(-4.0 + 4.0 * i as f64 / 59.0).min(1.0);
            for j in 0..40 {
                let ln_s1 = -60.0 + 65.0 * j as f64 / 39.0;
                let ln_s2 = [-200.0, -30.0, -5.0, 0.0, 3.0][j % 5];
                let ln_s = [0.0, ln_s1, ln_s2];
                let fast = electron_balance(f, Hydrogen::Fixed(xp), ln_s).unwrap();
                let slow = fixed_balance(f, xp, ln_s).unwrap();
                let rel = ((fast.x_e - slow.x_e) / slow.x_e).abs();
                // the iteration's unknown η = ln(x_e/x_p) is a double: x_e carries its
                // rounding, ulp(η) relative, on top of a few ulp of arithmetic
                let eta = (slow.x_e / xp).ln();
                assert!(
                    rel <= 4.0 * f64::EPSILON * eta.max(1.0),
                    "xp {xp} ln_s1 {ln_s1}: {} vs {}",
                    fast.x_e,
                    slow.x_e
                );
                checked += 1;
            }
        }
        assert_eq!(checked, 2400);
    }
}
