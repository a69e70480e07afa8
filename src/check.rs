//! Argument checks shared by every topic. Each returns the value when it is acceptable and
//! the error naming the argument (its position and name) otherwise.

use crate::{Arg, Error, Real, Result};

/// The value when finite, else `NonFinite(arg)`.
#[inline(always)]
pub(crate) fn finite<T: Real>(x: T, arg: Arg) -> Result<T> {
    if x.is_finite() {
        Ok(x)
    } else {
        Err(Error::NonFinite(arg))
    }
}

/// The value when finite and strictly positive (−0 and +0 are refused).
#[inline(always)]
pub(crate) fn positive<T: Real>(x: T, arg: Arg) -> Result<T> {
    let x = finite(x, arg)?;
    if x > T::zero() {
        Ok(x)
    } else {
        Err(Error::NonPositive(arg))
    }
}

/// A value in (0, 1] (an emissivity, a transmittance, a scale factor up to today): `NonFinite`,
/// `NonPositive`, or `OutOfDomain` above 1.
#[inline(always)]
pub(crate) fn unit_interval<T: Real>(x: T, arg: Arg) -> Result<T> {
    let x = positive(x, arg)?;
    if x > T::one() {
        return Err(Error::OutOfDomain(arg));
    }
    Ok(x)
}

/// A computed result when it is finite, else `OutOfDomain(arg)`: an input combination whose
/// result overflows the floating-point type, or cannot be formed in it (∞ − ∞, 0/0 of
/// intermediates that under- or overflowed), is refused rather than returned as ∞ or NaN. Every
/// public function passes its result through this, so `Ok` always holds a finite value.
#[inline(always)]
pub(crate) fn finite_result<T: Real>(x: T, arg: Arg) -> Result<T> {
    if x.is_finite() {
        Ok(x)
    } else {
        Err(Error::OutOfDomain(arg))
    }
}

/// The value when finite and not negative (+0 and −0 accepted).
#[inline(always)]
pub(crate) fn non_negative<T: Real>(x: T, arg: Arg) -> Result<T> {
    let x = finite(x, arg)?;
    if x >= T::zero() {
        Ok(x)
    } else {
        Err(Error::Negative(arg))
    }
}
