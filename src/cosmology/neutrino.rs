//! Energy density of a massive neutrino species relative to a massless one.
//!
//! R(y) = F(y)/F(0), F(y) = ∫₀^∞ x² √(x² + y²)/(eˣ + 1) dx, y = m c² a/(k T_ν0): the exact
//! Fermi-Dirac energy integral of a relativistic-decoupled species (e.g. Lesgourgues & Pastor
//! 2006, Phys. Rep. 429, 307, eq. 13). Evaluated from a universal Chebyshev table in ln y
//! (`neutrino_table.rs`, generated with mpmath by `tests/reference/neutrino_density_table.py`,
//! tail below 1e-17 relative), and outside it from the small-y expansion
//! R = 1 + 5y²/(7π²) (error ~y⁴ ln y < 1e-17 for y < e^−10) or the non-relativistic series
//! F = I₂y + I₄/(2y) − I₆/(8y³) + I₈/(16y⁵), Iₙ = (1 − 2^−n) n! ζ(n+1) (relative error
//! < 1e-25 for y > e^10).

use super::neutrino_table::{COEFFS, NCOEF, PIECES, U_MIN, WIDTH};
use crate::Real;

/// 5/(7π²).
const SMALL_Y: f64 = 0.072_372_274_030_241_27;
/// Iₙ/F(0) for n = 2, 4, 6, 8 with F(0) = 7π⁴/120: (1 − 2^−n) n! ζ(n+1) · 120/(7π⁴).
const I2: f64 = 0.317_321_867_236_042_33;
const I4: f64 = 4.105_960_174_423_864;
const I6: f64 = 125.773_103_825_738_09;
const I8: f64 = 7_082.324_361_490_462;

/// R(y) for y ≥ 0.
pub(crate) fn density_ratio<T: Real>(y: T) -> T {
    if y <= T::zero() {
        return T::one();
    }
    let u = y.ln();
    let lo = T::c(U_MIN);
    let hi = T::c(U_MIN + WIDTH * PIECES as f64);
    if u < lo {
        return T::one() + T::c(SMALL_Y) * y * y;
    }
    if u >= hi {
        let r = T::one() / (y * y);
        return y * (T::c(I2) + r * (T::c(I4 / 2.0) + r * (T::c(-I6 / 8.0) + r * T::c(I8 / 16.0))));
    }
    let pos = (u - lo) / T::c(WIDTH);
    let mut i = pos.to_f64_exact() as usize;
    if i >= PIECES {
        i = PIECES - 1;
    }
    let t = T::c(2.0) * (pos - T::c(i as f64)) - T::one();
    let Some(cs) = COEFFS.get(i) else {
        return T::nan();
    };
    clenshaw(cs, t)
}

fn clenshaw<T: Real>(cs: &[f64; NCOEF], t: T) -> T {
    let (mut b1, mut b2) = (T::zero(), T::zero());
    let two_t = t + t;
    for &c in cs.iter().skip(1).rev() {
        let b0 = two_t * b1 - b2 + T::c(c);
        b2 = b1;
        b1 = b0;
    }
    let c0 = cs.first().copied().unwrap_or(0.0);
    t * b1 - b2 + T::c(c0)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn limits_join_the_table() {
        // the expansions and the table agree at both joins to ~1e-15 (continuity of the model)
        let e10 = libm::exp(10.0);
        // R grows like y there: compare R/y on both sides of the join
        let (y1, y2) = (e10 * (1.0 - 1e-12), e10 * (1.0 + 1e-12));
        let inside = density_ratio(y1) / y1;
        let outside = density_ratio(y2) / y2;
        assert!(
            ((inside - outside) / outside).abs() < 1e-14,
            "{inside} {outside}"
        );
        // and the value at the join against mpmath (40 digits, quad of the definition):
        // R(e^10) = 6989.47934782403455116229982234
        let want = 6_989.479_347_824_035;
        assert!(
            ((density_ratio(e10) - want) / want).abs() < 4e-16,
            "{}",
            density_ratio(e10)
        );
        let em10 = libm::exp(-10.0);
        let inside = density_ratio(em10 * (1.0 + 1e-12));
        let outside = density_ratio(em10 * (1.0 - 1e-12));
        assert!((inside - outside).abs() < 1e-15, "{inside} {outside}");
    }
}
