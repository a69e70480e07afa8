//! The one root finder: Newton's method safeguarded by a bracket (Press et al., Numerical
//! Recipes, 3rd ed., 2007, §9.4 "rtsafe"). Converges quadratically near a simple root and
//! never leaves the bracket: a Newton step that would, or that shrinks the bracket too slowly,
//! is replaced by bisection.
//!
//! Dual numbers ([`crate::dual::Dual`]): the iteration runs on values only (every point is
//! evaluated with its partials set to 0, so the iterates are those of the plain float), and
//! the partials of the root come from the implicit function theorem at the converged root x*:
//! with f(x; p) = 0, ∂x*/∂p = −(∂f/∂p)/(∂f/∂x), from one more evaluation of f at x*. The
//! iteration history is never differentiated.

use crate::{Arg, Error, Real, Result};

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

/// Finds the root of a monotone f on (0, ∞), starting from a positive `guess`: the bracket
/// grows from the guess by factors of 2 until f changes sign (over the whole range of the type
/// if need be: at most about 2,100 doublings or 1,100 halvings in `f64`), then
/// [`bracketed_newton`] polishes the root to about 2 ulp. `increasing` says whether f increases
/// with x; `f` returns (f(x), f'(x)).
///
/// Errors: `NoConvergence` when f(guess) is NaN or the polish fails; `OutOfDomain(domain_arg)`
/// when no sign change lies between 0 and ∞ (x reaches 0 or ∞ first).
pub fn solve_monotone_positive<T: Real, F>(
    mut f: F,
    guess: T,
    increasing: bool,
    domain_arg: Arg,
) -> Result<T>
where
    F: FnMut(T) -> (T, T),
{
    // the root lies above x when f(x) is on the "low" side of zero for its monotonicity
    let root_above = |v: T| {
        if increasing {
            v < T::zero()
        } else {
            v > T::zero()
        }
    };
    let root_below = |v: T| {
        if increasing {
            v > T::zero()
        } else {
            v < T::zero()
        }
    };
    let guess = guess.detach();
    let f0 = f(guess).0;
    if f0.is_nan() {
        return Err(Error::NoConvergence);
    }
    if f0 == T::zero() {
        return Ok(with_root_partials(&mut f, guess));
    }
    let (mut lo, mut hi) = (guess, guess);
    // every doubling from the smallest subnormal to past the largest float, and no more (a
    // guess of 0 or ∞, outside the contract, would otherwise never leave its value)
    let cap = 2 * (T::MAX_EXPONENT - T::MIN_NORMAL_EXPONENT) as u32 + 2 * T::MANTISSA_DIGITS;
    let mut n = 0u32;
    if root_above(f0) {
        while root_above(f(hi.detach()).0) {
            lo = hi;
            hi = hi * T::c(2.0);
            n += 1;
            if n > cap || !hi.is_finite() {
                return Err(Error::OutOfDomain(domain_arg));
            }
        }
    } else {
        while root_below(f(lo.detach()).0) {
            hi = lo;
            lo = lo * T::c(0.5);
            n += 1;
            if n > cap || lo == T::zero() {
                return Err(Error::OutOfDomain(domain_arg));
            }
        }
    }
    bracketed_newton(f, lo, hi, T::c(2.0) * T::epsilon() * lo, 200)
}

fn newton_core<T: Real, F, G>(mut f: F, lo: T, hi: T, tol: G, max_iter: u32) -> Result<T>
where
    F: FnMut(T) -> (T, T),
    G: Fn(T) -> T,
{
    let x = newton_iterate(&mut f, lo, hi, tol, max_iter)?;
    Ok(with_root_partials(&mut f, x))
}

/// The root x with the partials of the implicit function theorem (one evaluation of f at x;
/// nothing for a float).
#[inline(always)]
fn with_root_partials<T: Real, F: FnMut(T) -> (T, T)>(f: &mut F, x: T) -> T {
    if T::HAS_PARTIALS {
        let x0 = x.detach();
        let (fx, dfdx) = f(x0);
        T::implicit_root(x0, fx, dfdx)
    } else {
        x
    }
}

fn newton_iterate<T: Real, F, G>(f: &mut F, lo: T, hi: T, tol: G, max_iter: u32) -> Result<T>
where
    F: FnMut(T) -> (T, T),
    G: Fn(T) -> T,
{
    let lo = lo.detach();
    let hi = hi.detach();
    // the iterates carry no partials (see the module documentation)
    let mut f = |x: T| f(x.detach());
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
