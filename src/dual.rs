//! Forward-mode dual numbers: a value with N exact partial derivatives, a [`Real`] type of its
//! own, so that every generic function of the core differentiates itself.
//!
//! A [`Dual<T, N>`] holds a value v and partials ∂v/∂p₁ … ∂v/∂p_N with respect to N inputs the
//! caller chooses (seed input i with [`Dual::variable`]; constants with [`Dual::constant`]).
//! Every operation applies the chain rule (forward-mode automatic differentiation; e.g.
//! A. Griewank & A. Walther, Evaluating Derivatives, 2nd ed., SIAM 2008, ch. 3):
//!
//! * arithmetic by the rules of sums, products and quotients, evaluated with the value's own
//!   result (the partials of a/b use the rounded quotient q: (a' − q·b')/b);
//! * every transcendental through [`Real`] by its derivative evaluated on the value's own
//!   result (e^x: e^x·x' with the computed e^x; ln x: x'/x; √x: x'/(2√x); …);
//! * the bit-level kernels of [`crate::math`] (the table-driven exponential, the logarithm, sine
//!   and cosine, the error-free sums and products of the double-length Planck exponent) run on
//!   the value with the `f32`/`f64` code, unchanged, and the partials follow by the chain rule
//!   from that result: the partials of an error-free pair (s, e) are those of the exact sum or
//!   product, carried by s;
//! * comparisons, classification (`is_nan`, `is_finite`, …) and hence every branch look at the
//!   value only; functions that are piecewise constant (floor, rounding, signum, the bit-level
//!   integer and power-of-two helpers) have partials 0.
//!
//! So the value part of a dual computation goes through exactly the operations of the plain
//! float computation, in the same order: it is bit-identical to it (tested for the blackbody
//! and cosmology functions). Numerics that iterate do not differentiate their iterations: the
//! shared root finder returns the partials of the converged root by the implicit function
//! theorem (one evaluation at the root), and the shared quadrature controls the error of the
//! partials as well as of the value (see [`crate::math::quadrature`] and
//! [`crate::math::roots`]).
//!
//! No heap, no `std`, no panic: a `Dual<f64, N>` is N + 1 doubles on the stack. Nested duals
//! (`Dual<Dual<f64, 1>, 1>`) compile, but only first derivatives are documented and tested.
//!
//! Accuracy: each operation adds a few roundings to the partials relative to their own size
//! (the chain rule factors are computed results, within a few ulp); measured against mpmath
//! numerical differentiation of independent implementations in `tests/dual_*.rs`.

use crate::Real;
use core::cmp::Ordering;
use core::num::FpCategory;
use core::ops::{Add, Div, Mul, Neg, Rem, Sub};
use num_traits::float::FloatCore;
use num_traits::{Num, NumCast, One, ToPrimitive, Zero};

/// A value of type `T` with its partial derivatives with respect to N inputs.
///
/// Build inputs with [`Dual::variable`] (partial 1 at its own index) and constants with
/// [`Dual::constant`]; pass them to any generic function of the core; read the result with
/// [`Dual::value`] and [`Dual::partials`]. Equality and order compare values only.
#[derive(Clone, Copy)]
pub struct Dual<T, const N: usize> {
    value: T,
    partials: [T; N],
}

#[inline(always)]
fn map<T: Real, const N: usize>(a: &[T; N], f: impl Fn(T) -> T) -> [T; N] {
    let mut out = [T::ZERO; N];
    for (o, &x) in out.iter_mut().zip(a.iter()) {
        *o = f(x);
    }
    out
}

#[inline(always)]
fn map2<T: Real, const N: usize>(a: &[T; N], b: &[T; N], f: impl Fn(T, T) -> T) -> [T; N] {
    let mut out = [T::ZERO; N];
    for ((o, &x), &y) in out.iter_mut().zip(a.iter()).zip(b.iter()) {
        *o = f(x, y);
    }
    out
}

impl<T: Real, const N: usize> Dual<T, N> {
    /// A dual number from its value and its N partials.
    #[inline(always)]
    pub const fn new(value: T, partials: [T; N]) -> Self {
        Dual { value, partials }
    }

    /// A constant: the value with every partial 0.
    #[inline(always)]
    pub fn constant(value: T) -> Self {
        Dual {
            value,
            partials: [T::ZERO; N],
        }
    }

    /// The input number `index` (0-based): the value with partial 1 at `index` and 0 elsewhere.
    /// An `index` ≥ N gives a constant (no panic).
    #[inline]
    pub fn variable(value: T, index: usize) -> Self {
        let mut d = Self::constant(value);
        if let Some(p) = d.partials.get_mut(index) {
            *p = T::one();
        }
        d
    }

    /// The value.
    #[inline(always)]
    pub fn value(&self) -> T {
        self.value
    }

    /// The partial derivatives, in the order of the inputs.
    #[inline(always)]
    pub fn partials(&self) -> [T; N] {
        self.partials
    }

    /// The partial derivative with respect to input `index`, or `None` for `index` ≥ N.
    #[inline]
    pub fn partial(&self, index: usize) -> Option<T> {
        self.partials.get(index).copied()
    }

    /// A result with value `v` whose partials are those of `self` times `factor` (the chain
    /// rule for a function of one argument with derivative `factor`).
    #[inline(always)]
    fn chain(self, v: T, factor: T) -> Self {
        Dual {
            value: v,
            partials: map(&self.partials, |d| d * factor),
        }
    }

    /// A constant usable in constant expressions.
    const fn constant_const(value: T) -> Self {
        Dual {
            value,
            partials: [T::ZERO; N],
        }
    }
}

impl<T: Real, const N: usize> core::fmt::Debug for Dual<T, N> {
    fn fmt(&self, f: &mut core::fmt::Formatter<'_>) -> core::fmt::Result {
        f.debug_struct("Dual")
            .field("value", &self.value)
            .field("partials", &self.partials)
            .finish()
    }
}

impl<T: Real, const N: usize> core::fmt::Display for Dual<T, N> {
    fn fmt(&self, f: &mut core::fmt::Formatter<'_>) -> core::fmt::Result {
        write!(f, "{} [", self.value)?;
        for (i, d) in self.partials.iter().enumerate() {
            if i > 0 {
                write!(f, ", ")?;
            }
            write!(f, "{d}")?;
        }
        write!(f, "]")
    }
}

impl<T: Real, const N: usize> Default for Dual<T, N> {
    fn default() -> Self {
        Self::constant(T::ZERO)
    }
}

impl<T: Real, const N: usize> PartialEq for Dual<T, N> {
    #[inline(always)]
    fn eq(&self, other: &Self) -> bool {
        self.value == other.value
    }
}

impl<T: Real, const N: usize> PartialOrd for Dual<T, N> {
    #[inline(always)]
    fn partial_cmp(&self, other: &Self) -> Option<Ordering> {
        self.value.partial_cmp(&other.value)
    }
}

impl<T: Real, const N: usize> Add for Dual<T, N> {
    type Output = Self;
    #[inline(always)]
    fn add(self, o: Self) -> Self {
        Dual {
            value: self.value + o.value,
            partials: map2(&self.partials, &o.partials, |a, b| a + b),
        }
    }
}

impl<T: Real, const N: usize> Sub for Dual<T, N> {
    type Output = Self;
    #[inline(always)]
    fn sub(self, o: Self) -> Self {
        Dual {
            value: self.value - o.value,
            partials: map2(&self.partials, &o.partials, |a, b| a - b),
        }
    }
}

impl<T: Real, const N: usize> Mul for Dual<T, N> {
    type Output = Self;
    // the product rule adds the two partial products
    #[allow(clippy::suspicious_arithmetic_impl)]
    #[inline(always)]
    fn mul(self, o: Self) -> Self {
        let (a, b) = (self.value, o.value);
        Dual {
            value: a * b,
            partials: map2(&self.partials, &o.partials, |da, db| da * b + a * db),
        }
    }
}

impl<T: Real, const N: usize> Div for Dual<T, N> {
    type Output = Self;
    #[inline(always)]
    fn div(self, o: Self) -> Self {
        let q = self.value / o.value;
        let b = o.value;
        let inv = T::one() / b;
        let partials = if inv.is_finite() && inv != T::zero() {
            map2(&self.partials, &o.partials, |da, db| (da - q * db) * inv)
        } else {
            map2(&self.partials, &o.partials, |da, db| (da - q * db) / b)
        };
        Dual { value: q, partials }
    }
}

impl<T: Real, const N: usize> Rem for Dual<T, N> {
    type Output = Self;
    /// a mod b = a − n·b with n the integer quotient (truncated): partials a' − n·b'.
    #[inline]
    fn rem(self, o: Self) -> Self {
        let r = self.value % o.value;
        let n = ((self.value - r) / o.value).round();
        Dual {
            value: r,
            partials: map2(&self.partials, &o.partials, |da, db| da - n * db),
        }
    }
}

impl<T: Real, const N: usize> Neg for Dual<T, N> {
    type Output = Self;
    #[inline(always)]
    fn neg(self) -> Self {
        Dual {
            value: -self.value,
            partials: map(&self.partials, |d| -d),
        }
    }
}

impl<T: Real, const N: usize> Zero for Dual<T, N> {
    #[inline(always)]
    fn zero() -> Self {
        Self::constant(T::zero())
    }
    #[inline(always)]
    fn is_zero(&self) -> bool {
        self.value == T::zero()
    }
}

impl<T: Real, const N: usize> One for Dual<T, N> {
    #[inline(always)]
    fn one() -> Self {
        Self::constant(T::one())
    }
}

impl<T: Real, const N: usize> Num for Dual<T, N> {
    type FromStrRadixErr = T::FromStrRadixErr;
    fn from_str_radix(s: &str, radix: u32) -> Result<Self, Self::FromStrRadixErr> {
        T::from_str_radix(s, radix).map(Self::constant)
    }
}

impl<T: Real, const N: usize> ToPrimitive for Dual<T, N> {
    fn to_i64(&self) -> Option<i64> {
        self.value.to_i64()
    }
    fn to_u64(&self) -> Option<u64> {
        self.value.to_u64()
    }
    fn to_f64(&self) -> Option<f64> {
        self.value.to_f64()
    }
    fn to_f32(&self) -> Option<f32> {
        self.value.to_f32()
    }
}

impl<T: Real, const N: usize> NumCast for Dual<T, N> {
    fn from<U: ToPrimitive>(n: U) -> Option<Self> {
        <T as NumCast>::from(n).map(Self::constant)
    }
}

impl<T: Real, const N: usize> FloatCore for Dual<T, N> {
    fn infinity() -> Self {
        Self::constant(T::infinity())
    }
    fn neg_infinity() -> Self {
        Self::constant(T::neg_infinity())
    }
    fn nan() -> Self {
        Self::constant(T::nan())
    }
    fn neg_zero() -> Self {
        Self::constant(T::neg_zero())
    }
    fn min_value() -> Self {
        Self::constant(T::min_value())
    }
    fn min_positive_value() -> Self {
        Self::constant(T::min_positive_value())
    }
    fn epsilon() -> Self {
        Self::constant(T::epsilon())
    }
    fn max_value() -> Self {
        Self::constant(T::max_value())
    }
    #[inline(always)]
    fn is_nan(self) -> bool {
        self.value.is_nan()
    }
    #[inline(always)]
    fn is_infinite(self) -> bool {
        self.value.is_infinite()
    }
    #[inline(always)]
    fn is_finite(self) -> bool {
        self.value.is_finite()
    }
    #[inline(always)]
    fn is_normal(self) -> bool {
        self.value.is_normal()
    }
    fn classify(self) -> FpCategory {
        self.value.classify()
    }
    fn floor(self) -> Self {
        Self::constant(self.value.floor())
    }
    fn ceil(self) -> Self {
        Self::constant(self.value.ceil())
    }
    fn round(self) -> Self {
        Self::constant(self.value.round())
    }
    fn trunc(self) -> Self {
        Self::constant(self.value.trunc())
    }
    fn fract(self) -> Self {
        Dual {
            value: self.value.fract(),
            partials: self.partials,
        }
    }
    /// |x|: the partials change sign with the value (at x = ±0 they are those of x).
    #[inline(always)]
    fn abs(self) -> Self {
        if self.value < T::zero() { -self } else { self }
    }
    fn signum(self) -> Self {
        Self::constant(self.value.signum())
    }
    #[inline(always)]
    fn is_sign_positive(self) -> bool {
        self.value.is_sign_positive()
    }
    #[inline(always)]
    fn is_sign_negative(self) -> bool {
        self.value.is_sign_negative()
    }
    /// The smaller operand (with its partials), chosen as `FloatCore::min` chooses values.
    #[inline(always)]
    fn min(self, other: Self) -> Self {
        if self.value.is_nan() {
            other
        } else if other.value.is_nan() || self.value <= other.value {
            self
        } else {
            other
        }
    }
    /// The larger operand (with its partials), chosen as `FloatCore::max` chooses values.
    #[inline(always)]
    fn max(self, other: Self) -> Self {
        if self.value.is_nan() {
            other
        } else if other.value.is_nan() || self.value >= other.value {
            self
        } else {
            other
        }
    }
    fn recip(self) -> Self {
        Self::one() / self
    }
    /// x^n with the value of `T::powi` and partials n·x^(n−1)·x'.
    fn powi(self, n: i32) -> Self {
        let v = self.value.powi(n);
        if n == 0 {
            return Self::constant(v);
        }
        let factor = T::c(<f64 as From<i32>>::from(n)) * self.value.powi(n - 1);
        self.chain(v, factor)
    }
    fn to_degrees(self) -> Self {
        let v = self.value.to_degrees();
        self.chain(v, T::c(180.0 / core::f64::consts::PI))
    }
    fn to_radians(self) -> Self {
        let v = self.value.to_radians();
        self.chain(v, T::c(core::f64::consts::PI / 180.0))
    }
    fn integer_decode(self) -> (u64, i16, i8) {
        self.value.integer_decode()
    }
}

impl<T: Real, const N: usize> Real for Dual<T, N> {
    const MANTISSA_DIGITS: u32 = T::MANTISSA_DIGITS;
    const SPLITTER: Self = Self::constant_const(T::SPLITTER);
    const LN_MAX: Self = Self::constant_const(T::LN_MAX);
    const LN_MIN_SUBNORMAL_NEG: Self = Self::constant_const(T::LN_MIN_SUBNORMAL_NEG);
    const ZERO: Self = Self::constant_const(T::ZERO);
    const MIN_NORMAL_EXPONENT: i32 = T::MIN_NORMAL_EXPONENT;
    const MAX_EXPONENT: i32 = T::MAX_EXPONENT;
    const HAS_PARTIALS: bool = true;

    #[inline(always)]
    fn c(x: f64) -> Self {
        Self::constant(T::c(x))
    }
    #[inline(always)]
    fn to_f64_exact(self) -> f64 {
        self.value.to_f64_exact()
    }
    #[inline(always)]
    fn c2(hi: f64, lo: f64) -> (Self, Self) {
        let (h, l) = T::c2(hi, lo);
        (Self::constant(h), Self::constant(l))
    }
    #[inline]
    fn exp(self) -> Self {
        let v = self.value.exp();
        self.chain(v, v)
    }
    #[inline]
    fn exp_m1(self) -> Self {
        let v = self.value.exp_m1();
        // e^x: from the result where that keeps its relative accuracy, directly below
        let e = if self.value < -T::one() {
            self.value.exp()
        } else {
            v + T::one()
        };
        self.chain(v, e)
    }
    #[inline]
    fn ln(self) -> Self {
        let x = self.value;
        Dual {
            value: x.ln(),
            partials: map(&self.partials, |d| d / x),
        }
    }
    #[inline]
    fn ln_1p(self) -> Self {
        let x = self.value;
        let one_plus = T::one() + x;
        Dual {
            value: x.ln_1p(),
            partials: map(&self.partials, |d| d / one_plus),
        }
    }
    #[inline]
    fn sqrt(self) -> Self {
        let v = self.value.sqrt();
        let two_v = v + v;
        Dual {
            value: v,
            partials: map(&self.partials, |d| d / two_v),
        }
    }
    #[inline]
    fn cbrt(self) -> Self {
        let v = self.value.cbrt();
        let three_v2 = T::c(3.0) * (v * v);
        Dual {
            value: v,
            partials: map(&self.partials, |d| d / three_v2),
        }
    }
    #[inline]
    fn sinh(self) -> Self {
        let v = self.value.sinh();
        self.chain(v, self.value.cosh())
    }
    #[inline]
    fn tanh(self) -> Self {
        let v = self.value.tanh();
        // 1 − tanh² = 1/cosh², without the cancellation of 1 − v² at large |x|
        let c = self.value.cosh();
        let c2 = c * c;
        Dual {
            value: v,
            partials: map(&self.partials, |d| d / c2),
        }
    }
    #[inline]
    fn cosh(self) -> Self {
        let v = self.value.cosh();
        self.chain(v, self.value.sinh())
    }
    #[inline]
    fn sin(self) -> Self {
        let v = self.value.sin();
        self.chain(v, self.value.cos())
    }
    #[inline]
    fn cos(self) -> Self {
        let v = self.value.cos();
        self.chain(v, -self.value.sin())
    }
    #[inline]
    fn floor_libm(self) -> Self {
        Self::constant(self.value.floor_libm())
    }
    #[inline(always)]
    fn round_to_i32(self) -> (Self, i32) {
        let (r, n) = self.value.round_to_i32();
        (Self::constant(r), n)
    }
    #[inline(always)]
    fn pow2i(m: i32) -> Self {
        Self::constant(T::pow2i(m))
    }
    #[inline(always)]
    fn small_integer(k: i32) -> Self {
        Self::constant(T::small_integer(k))
    }
    /// The high part carries the partials; the low part x − hi then has none (x = hi + lo
    /// holds for the partials too).
    #[inline(always)]
    fn split_high(self) -> Self {
        Dual {
            value: self.value.split_high(),
            partials: self.partials,
        }
    }
    /// f = x·2^−m: the partials of f are those of x times 2^−m (f/x, exact).
    #[inline(always)]
    fn split_sqrt2(self) -> (Self, Self, i32) {
        let (f, k, m) = self.value.split_sqrt2();
        let scale = f / self.value;
        (self.chain(f, scale), Self::constant(k), m)
    }

    #[inline(always)]
    fn kernel_exp_dd(xh: Self, xl: Self) -> Self {
        let v = T::kernel_exp_dd(xh.value, xl.value);
        Dual {
            value: v,
            partials: map2(&xh.partials, &xl.partials, |a, b| (a + b) * v),
        }
    }
    #[inline(always)]
    fn kernel_exp_fast(x: Self) -> (Self, bool) {
        let (v, inside) = T::kernel_exp_fast(x.value);
        (x.chain(v, v), inside)
    }
    #[inline(always)]
    fn kernel_exp_m1_in_range(xh: Self, xl: Self) -> Self {
        let w = T::kernel_exp_m1_in_range(xh.value, xl.value);
        // e^x = w + 1 keeps its relative accuracy for x ≥ −1; below, e^x itself
        let e = if xh.value < -T::one() {
            T::kernel_exp_dd(xh.value, xl.value)
        } else {
            w + T::one()
        };
        Dual {
            value: w,
            partials: map2(&xh.partials, &xl.partials, |a, b| (a + b) * e),
        }
    }
    #[inline(always)]
    fn kernel_exp_m1_nonnegative_in_range(xh: Self, xl: Self) -> Self {
        let w = T::kernel_exp_m1_nonnegative_in_range(xh.value, xl.value);
        let e = w + T::one();
        Dual {
            value: w,
            partials: map2(&xh.partials, &xl.partials, |a, b| (a + b) * e),
        }
    }
    #[inline(always)]
    fn kernel_ln_fast(x: Self) -> (Self, bool) {
        let (v, inside) = T::kernel_ln_fast(x.value);
        let xv = x.value;
        (
            Dual {
                value: v,
                partials: map(&x.partials, |d| d / xv),
            },
            inside,
        )
    }
    #[inline(always)]
    fn kernel_ln_1p_fast(x: Self) -> (Self, bool) {
        let (v, inside) = T::kernel_ln_1p_fast(x.value);
        let one_plus = T::one() + x.value;
        (
            Dual {
                value: v,
                partials: map(&x.partials, |d| d / one_plus),
            },
            inside,
        )
    }
    #[inline(always)]
    fn kernel_sin_cos_fast(x: Self) -> (Self, Self, bool) {
        let (s, c, inside) = T::kernel_sin_cos_fast(x.value);
        (x.chain(s, c), x.chain(c, -s), inside)
    }
    #[inline(always)]
    fn kernel_two_sum(a: Self, b: Self) -> (Self, Self) {
        let (s, e) = T::kernel_two_sum(a.value, b.value);
        (
            Dual {
                value: s,
                partials: map2(&a.partials, &b.partials, |x, y| x + y),
            },
            Self::constant(e),
        )
    }
    #[inline(always)]
    fn kernel_fast_two_sum(a: Self, b: Self) -> (Self, Self) {
        let (s, e) = T::kernel_fast_two_sum(a.value, b.value);
        (
            Dual {
                value: s,
                partials: map2(&a.partials, &b.partials, |x, y| x + y),
            },
            Self::constant(e),
        )
    }
    #[inline(always)]
    fn kernel_two_prod(a: Self, b: Self) -> (Self, Self) {
        let (p, e) = T::kernel_two_prod(a.value, b.value);
        let (av, bv) = (a.value, b.value);
        (
            Dual {
                value: p,
                partials: map2(&a.partials, &b.partials, |x, y| x * bv + av * y),
            },
            Self::constant(e),
        )
    }
    #[inline(always)]
    fn kernel_two_prod_masked(a: Self, b: Self) -> (Self, Self) {
        let (p, e) = T::kernel_two_prod_masked(a.value, b.value);
        let (av, bv) = (a.value, b.value);
        (
            Dual {
                value: p,
                partials: map2(&a.partials, &b.partials, |x, y| x * bv + av * y),
            },
            Self::constant(e),
        )
    }

    #[inline]
    fn error_magnitude(self) -> Self {
        Dual {
            value: self.value.error_magnitude(),
            partials: map(&self.partials, |d| d.error_magnitude()),
        }
    }
    fn partials_within(err: Self, total: Self, rel_tol: Self, abs_tol: Self) -> bool {
        let (rel, abs) = (rel_tol.value, abs_tol.value);
        if !T::partials_within(err.value, total.value, rel, abs) {
            return false;
        }
        let size = total.value.error_magnitude();
        err.partials
            .iter()
            .zip(total.partials.iter())
            .all(|(&e, &t)| {
                let tol = abs.max(rel * t.error_magnitude().max(size));
                e <= tol && T::partials_within(e, t, rel, abs)
            })
    }
    fn partials_error_score(err: Self, total: Self, rel_tol: Self, abs_tol: Self) -> Self {
        let (rel, abs) = (rel_tol.value, abs_tol.value);
        let size = total.value.error_magnitude();
        let mut score = T::zero();
        for (&e, &t) in err.partials.iter().zip(total.partials.iter()) {
            let tol = abs.max(rel * t.error_magnitude().max(size));
            let s = if e == T::zero() {
                T::zero()
            } else if tol > T::zero() {
                e / tol
            } else {
                T::infinity()
            };
            score = score.max(s);
        }
        Self::constant(score)
    }
    #[inline(always)]
    fn with_value_of(self, value: Self) -> Self {
        Dual {
            value: value.value,
            partials: self.partials,
        }
    }
    #[inline(always)]
    fn detach(self) -> Self {
        Self::constant(self.value)
    }
    #[inline]
    fn implicit_root(x: Self, f: Self, dfdx: Self) -> Self {
        let s = dfdx.value;
        Dual {
            value: x.value,
            partials: map(&f.partials, |d| -d / s),
        }
    }
}

#[cfg(test)]
mod tests {
    use super::Dual;
    use crate::Real;
    use num_traits::float::FloatCore;

    type D2 = Dual<f64, 2>;

    #[test]
    fn product_quotient_and_chain_rule_on_known_cases() {
        // f(x, y) = x²y / (1 + y), at (3, 2): ∂f/∂x = 2xy/(1+y) = 4, ∂f/∂y = x²/(1+y)² = 1
        let x = D2::variable(3.0, 0);
        let y = D2::variable(2.0, 1);
        let f = x * x * y / (D2::c(1.0) + y);
        assert_eq!(f.value(), 6.0);
        assert_eq!(f.partials(), [4.0, 1.0]);
        // e^(ln x) = x: partial 1 to rounding
        let g = x.ln().exp();
        assert!((g.partials()[0] - 1.0).abs() < 4e-16);
    }

    #[test]
    fn branches_and_constants_have_no_partials() {
        let x = D2::variable(2.7, 0);
        assert_eq!(x.floor().partials(), [0.0, 0.0]);
        assert_eq!(x.round_to_i32().0.partials(), [0.0, 0.0]);
        assert_eq!(<D2 as Real>::pow2i(3).value(), 8.0);
        assert!(x > D2::c(2.0) && x == D2::constant(2.7));
        assert_eq!((-x).abs().partials(), [1.0, 0.0]);
    }
}
