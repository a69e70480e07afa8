//! The one quadrature: globally adaptive Gauss-Kronrod 7-15 on a fixed-capacity interval
//! stack, with no heap (Kronrod 1965; nodes and weights as tabulated in Piessens et al.,
//! QUADPACK, Springer 1983, routine QK15). The interval with the largest error estimate is
//! bisected until the summed estimate meets the tolerance.
//!
//! The error estimate of an interval is |K15 − G7|, the error of the embedded 7-point Gauss
//! rule: deliberately pessimistic (the returned K15 value is far more accurate for smooth
//! integrands), so the stopping test is safe.

use crate::{Error, Real, Result};

/// Maximum number of subintervals the adaptive scheme keeps.
pub const CAPACITY: usize = 200;

const XGK: [f64; 8] = [
    0.991_455_371_120_812_6,
    0.949_107_912_342_758_5,
    0.864_864_423_359_769_1,
    0.741_531_185_599_394_4,
    0.586_087_235_467_691_1,
    0.405_845_151_377_397_2,
    0.207_784_955_007_898_5,
    0.0,
];
const WGK: [f64; 8] = [
    0.022_935_322_010_529_225,
    0.063_092_092_629_978_55,
    0.104_790_010_322_250_18,
    0.140_653_259_715_525_92,
    0.169_004_726_639_267_9,
    0.190_350_578_064_785_4,
    0.204_432_940_075_298_9,
    0.209_482_141_084_727_83,
];
const WG: [f64; 4] = [
    0.129_484_966_168_869_7,
    0.279_705_391_489_276_7,
    0.381_830_050_505_118_9,
    0.417_959_183_673_469_4,
];

/// One Gauss-Kronrod 7-15 panel on [a, b]: (K15 estimate, |K15 − G7|).
pub fn gauss_kronrod_15<T: Real, F: FnMut(T) -> T>(f: &mut F, a: T, b: T) -> (T, T) {
    let half = T::c(0.5);
    let centre = half * (a + b);
    let h = half * (b - a);
    let fc = f(centre);
    let mut k = fc * T::c(WGK[7]);
    let mut g = fc * T::c(WG[3]);
    for (j, (&x, &w)) in XGK.iter().zip(WGK.iter()).take(7).enumerate() {
        let dx = h * T::c(x);
        let s = f(centre - dx) + f(centre + dx);
        k = k + s * T::c(w);
        if j % 2 == 1 {
            // odd Kronrod nodes 1, 3, 5 are the Gauss nodes
            let wg = match j {
                1 => WG[0],
                3 => WG[1],
                _ => WG[2],
            };
            g = g + s * T::c(wg);
        }
    }
    (k * h, ((k - g) * h).error_magnitude())
}

/// ∫ₐᵇ f(x) dx to |error| ≤ max(abs_tol, rel_tol·|result|), by adaptive bisection.
///
/// Finite limits only (substitute to map infinite ones). `Error::NoConvergence` when the
/// tolerance cannot be met within [`CAPACITY`] subintervals or an integrand value is not
/// finite.
///
/// For a dual number ([`crate::dual::Dual`]) the error estimate is kept part by part and every
/// partial must meet the tolerance too: |error of ∂I/∂p| ≤ max(abs_tol, rel_tol·max(|∂I/∂p|,
/// |I|)) (see [`Real::partials_within`] for why the value bounds it from below). The value part is the integral of the value's own subdivision, the one a
/// plain float takes (bit-identical to it); the intervals are bisected further, worst share of
/// the partials' tolerance first, until the partials meet theirs (`NoConvergence` if they
/// cannot within [`CAPACITY`]).
pub fn integrate<T: Real, F: FnMut(T) -> T>(
    mut f: F,
    a: T,
    b: T,
    rel_tol: T,
    abs_tol: T,
) -> Result<T> {
    if a == b {
        return Ok(T::zero());
    }
    let mut lo = [T::zero(); CAPACITY];
    let mut hi = [T::zero(); CAPACITY];
    let mut val = [T::zero(); CAPACITY];
    let mut err = [T::zero(); CAPACITY];
    let (v0, e0) = gauss_kronrod_15(&mut f, a, b);
    lo[0] = a;
    hi[0] = b;
    val[0] = v0;
    err[0] = e0;
    let mut n = 1usize;
    // a dual number: the value part once it met the tolerance, with the subdivision of a plain
    // float (so that it is bit-identical to the float's integral); the intervals are then
    // bisected further by the error of the partials until they meet the tolerance too
    let mut value_done: Option<T> = None;
    loop {
        let mut total = T::zero();
        let mut total_err = T::zero();
        let mut worst = 0usize;
        let mut worst_err = -T::one();
        for i in 0..n {
            let (v, e) = (val.get(i).copied(), err.get(i).copied());
            let (v, e) = match (v, e) {
                (Some(v), Some(e)) => (v, e),
                _ => return Err(Error::NoConvergence),
            };
            total = total + v;
            total_err = total_err + e;
            if e > worst_err {
                worst_err = e;
                worst = i;
            }
        }
        if !total.is_finite() || !total_err.is_finite() {
            return Err(Error::NoConvergence);
        }
        let tol = abs_tol.max(rel_tol * total.abs());
        if total_err <= tol || value_done.is_some() {
            if T::partials_within(total_err, total, rel_tol, abs_tol) {
                return Ok(match value_done {
                    Some(v) => total.with_value_of(v),
                    None => total,
                });
            }
            if value_done.is_none() {
                value_done = Some(total);
            }
            worst = worst_partials(err.get(..n).unwrap_or(&[]), total, rel_tol, abs_tol);
        }
        if n >= CAPACITY {
            return Err(Error::NoConvergence);
        }
        let (l, h) = match (lo.get(worst).copied(), hi.get(worst).copied()) {
            (Some(l), Some(h)) => (l, h),
            _ => return Err(Error::NoConvergence),
        };
        let m = T::c(0.5) * (l + h);
        if m <= l.min(h) || m >= l.max(h) {
            // interval can no longer be split: accept only if its share is negligible
            return Err(Error::NoConvergence);
        }
        let (v1, e1) = gauss_kronrod_15(&mut f, l, m);
        let (v2, e2) = gauss_kronrod_15(&mut f, m, h);
        if let (Some(hw), Some(vw), Some(ew)) =
            (hi.get_mut(worst), val.get_mut(worst), err.get_mut(worst))
        {
            *hw = m;
            *vw = v1;
            *ew = e1;
        }
        if let (Some(ln), Some(hn), Some(vn), Some(en)) =
            (lo.get_mut(n), hi.get_mut(n), val.get_mut(n), err.get_mut(n))
        {
            *ln = m;
            *hn = h;
            *vn = v2;
            *en = e2;
        }
        n += 1;
    }
}

/// The interval whose error estimate of the partials takes the largest share of their
/// tolerance (a dual number's integral once its value has converged).
#[cold]
fn worst_partials<T: Real>(err: &[T], total: T, rel_tol: T, abs_tol: T) -> usize {
    let mut worst = 0usize;
    let mut worst_score = -T::one();
    for (i, &e) in err.iter().enumerate() {
        let s = T::partials_error_score(e, total, rel_tol, abs_tol);
        if s > worst_score {
            worst_score = s;
            worst = i;
        }
    }
    worst
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn kronrod_panel_is_exact_for_degree_22() {
        // ∫_0^1 x^22 dx = 1/23 exactly (closed form); a 15-point Kronrod rule integrates
        // polynomials of degree 3·7+1 = 22 exactly (Kronrod 1965).
        let (v, _) = gauss_kronrod_15(&mut |x: f64| libm::pow(x, 22.0), 0.0, 1.0);
        assert!((v - 1.0 / 23.0).abs() < 1e-16, "{v}");
        // and the embedded Gauss rule is exact to degree 13: the estimate vanishes for x^13.
        let (_, e) = gauss_kronrod_15(&mut |x: f64| libm::pow(x, 13.0), 0.0, 1.0);
        assert!(e < 1e-16, "{e}");
    }

    #[test]
    fn adaptive_integral_of_a_peaked_function() {
        // ∫_0^1 1/(1e-4 + x^2) dx = atan(1/0.01)/0.01 (closed form).
        let want = libm::atan(100.0) / 0.01;
        let got =
            integrate(|x: f64| 1.0 / (1e-4 + x * x), 0.0, 1.0, 1e-14, 0.0).unwrap_or(f64::NAN);
        assert!(((got - want) / want).abs() < 1e-13, "{got} {want}");
    }
}
