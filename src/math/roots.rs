//! The one root finder: Newton's method safeguarded by a bracket (Press et al., Numerical
//! Recipes, 3rd ed., 2007, §9.4 "rtsafe"). Converges quadratically near a simple root and
//! never leaves the bracket: a Newton step that would, or that shrinks the bracket too slowly,
//! is replaced by bisection.

use crate::{Error, Real, Result};

/// Finds x in [lo, hi] with f(x) = 0, where `f` returns (f(x), f'(x)).
///
/// Requires finite lo and hi with f(lo) and f(hi) of opposite signs (or one of them zero).
/// Stops when the step or the bracket is below `x_tol` (absolute) or f is exactly zero;
/// returns `Error::NoConvergence` after `max_iter` iterations, or when the bracket is invalid.
pub fn bracketed_newton<T: Real, F>(f: F, lo: T, hi: T, x_tol: T, max_iter: u32) -> Result<T>
where
    F: FnMut(T) -> (T, T),
{
    newton_core(f, lo, hi, |_| x_tol, max_iter)
}

/// As [`bracketed_newton`], with a relative tolerance: stops when the step or the bracket is
/// below `rel_tol·|x|` (for roots that may lie anywhere from tiny to large values).
pub fn bracketed_newton_relative<T: Real, F>(
    f: F,
    lo: T,
    hi: T,
    rel_tol: T,
    max_iter: u32,
) -> Result<T>
where
    F: FnMut(T) -> (T, T),
{
    newton_core(f, lo, hi, |x: T| rel_tol * x.abs(), max_iter)
}

fn newton_core<T: Real, F, G>(mut f: F, lo: T, hi: T, tol: G, max_iter: u32) -> Result<T>
where
    F: FnMut(T) -> (T, T),
    G: Fn(T) -> T,
{
    if !lo.is_finite() || !hi.is_finite() {
        // an infinite or NaN end is no bracket (the midpoint would be ±∞ or NaN)
        return Err(Error::NoConvergence);
    }
    let (flo, _) = f(lo);
    let (fhi, _) = f(hi);
    if flo.is_nan() || fhi.is_nan() {
        return Err(Error::NoConvergence);
    }
    if flo == T::zero() {
        return Ok(lo);
    }
    if fhi == T::zero() {
        return Ok(hi);
    }
    if (flo > T::zero()) == (fhi > T::zero()) {
        return Err(Error::NoConvergence);
    }
    // orient so that f(a) < 0 < f(b)
    let (mut a, mut b) = if flo < T::zero() { (lo, hi) } else { (hi, lo) };
    let half = T::c(0.5);
    // halves before sums, so that a bracket near ±MAX gives a finite midpoint and step (the
    // same bits otherwise: halving is exact)
    let mut x = half * lo + half * hi;
    let mut dx_old = (hi - lo).abs();
    let mut dx = dx_old;
    let (mut fx, mut dfx) = f(x);
    if fx == T::zero() {
        return Ok(x);
    }
    for _ in 0..max_iter {
        if fx.is_nan() {
            return Err(Error::NoConvergence);
        }
        let newton_ok = dfx != T::zero()
            && dfx.is_finite()
            && (((x - b) * dfx - fx) * ((x - a) * dfx - fx)) < T::zero()
            && (fx + fx).abs() <= (dx_old * dfx).abs();
        dx_old = dx;
        if newton_ok {
            dx = fx / dfx;
            x = x - dx;
        } else {
            dx = half * b - half * a;
            x = a + dx;
        }
        if dx.abs() <= tol(x) {
            return Ok(x);
        }
        let r = f(x);
        fx = r.0;
        dfx = r.1;
        if fx == T::zero() {
            return Ok(x);
        }
        if fx < T::zero() {
            a = x;
        } else {
            b = x;
        }
        // the bracket itself is below the tolerance: rounding noise in f can keep Newton
        // steps just above x_tol forever, but the root is pinned
        if (b - a).abs() <= tol(x) {
            return Ok(x);
        }
    }
    Err(Error::NoConvergence)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn finds_the_wien_root_to_one_ulp() {
        // x = 5(1 − e^−x): reference root 4.965114231744276303698759 (mpmath, 30 digits).
        let g = |x: f64| (x - 5.0 * (-libm::expm1(-x)), 1.0 - 5.0 * libm::exp(-x));
        let x = bracketed_newton(g, 3.0, 6.0, 1e-15, 100).unwrap_or(f64::NAN);
        assert!(
            (x - 4.965_114_231_744_276).abs() <= 1.0 * f64::EPSILON * 5.0,
            "{x}"
        );
    }

    #[test]
    fn refuses_a_bracket_without_sign_change() {
        let g = |x: f64| (x * x + 1.0, 2.0 * x);
        assert_eq!(
            bracketed_newton(g, -1.0, 1.0, 1e-12, 50),
            Err(Error::NoConvergence)
        );
    }
}
