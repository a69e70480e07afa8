//! The sealed floating-point trait every core function is generic over.
//!
//! Arithmetic, comparisons and classification come from [`num_traits::float::FloatCore`]
//! (pure Rust, no platform library). Every transcendental function is routed through the
//! `libm` crate directly, so the same input gives the same bits in every build, whatever
//! features other crates switch on in a workspace (`num-traits/std` would
//! otherwise silently send `exp_m1` to the platform libm and make the C and Python faces
//! differ by an ulp on some inputs).

use num_traits::float::FloatCore;

mod sealed {
    pub trait Sealed {}
    impl Sealed for f32 {}
    impl Sealed for f64 {}
    impl<T: super::Real, const N: usize> Sealed for crate::dual::Dual<T, N> {}
}

/// A real floating-point type the core computes in: `f32`, `f64`, or the dual number
/// [`Dual`](crate::dual::Dual) over one of them (a value with exact partial derivatives).
///
/// The trait is sealed; its methods are thin calls into `libm` (transcendentals) or exact
/// arithmetic helpers (error-free transformations used for double-length intermediates).
///
/// The `kernel_*` methods are the whole numerical kernels of [`crate::math`] that work on the
/// bits of a float (the table-driven exponential, the logarithm, sine and cosine, the
/// error-free sums and products). For `f32` and `f64` they are the kernels themselves; a dual
/// number evaluates the kernel on its value and applies the chain rule with the kernel's own
/// result, so its partials are the exact derivatives of what the kernel computes. The
/// quadrature and root-finder methods at the end let the shared numerics control the error of
/// the partials and differentiate a root at its solution (implicit function theorem); for
/// `f32` and `f64` they do nothing.
pub trait Real:
    FloatCore + sealed::Sealed + core::fmt::Debug + core::fmt::Display + Default + Send + Sync + 'static
{
    /// Number of bits in the significand, including the implicit bit (24 or 53).
    const MANTISSA_DIGITS: u32;
    /// Dekker's splitting constant 2^ceil(p/2) + 1.
    const SPLITTER: Self;
    /// ln of the largest finite value: above this `exp` overflows.
    const LN_MAX: Self;
    /// −ln of the smallest positive subnormal: beyond this `exp(-x)` is zero.
    const LN_MIN_SUBNORMAL_NEG: Self;
    /// Zero, as a constant (`FloatCore::zero` is not usable in constants).
    const ZERO: Self;

    /// Converts an `f64` literal, rounding to nearest for `f32`.
    fn c(x: f64) -> Self;
    /// Converts to `f64` exactly.
    fn to_f64_exact(self) -> f64;
    /// A constant given as an unevaluated sum `hi + lo` of two `f64` (about 106 bits),
    /// returned as a double-length pair of `Self`.
    fn c2(hi: f64, lo: f64) -> (Self, Self);
    /// e^x.
    fn exp(self) -> Self;
    /// e^x − 1, accurate for small x.
    fn exp_m1(self) -> Self;
    /// Natural logarithm.
    fn ln(self) -> Self;
    /// ln(1 + x), accurate for small x.
    fn ln_1p(self) -> Self;
    /// Square root (correctly rounded).
    fn sqrt(self) -> Self;
    /// Cube root.
    fn cbrt(self) -> Self;
    /// Hyperbolic sine.
    fn sinh(self) -> Self;
    /// Hyperbolic tangent.
    fn tanh(self) -> Self;
    /// Hyperbolic cosine.
    fn cosh(self) -> Self;
    /// Sine.
    fn sin(self) -> Self;
    /// Cosine.
    fn cos(self) -> Self;
    /// Largest integer not above x. (`FloatCore::floor` is implemented with `%`, which
    /// compiles to a call of the platform `fmod`; that call drags the unwinding runtime, and
    /// with it `malloc`, into a static C link. This one is `libm`'s.)
    fn floor_libm(self) -> Self;

    /// Smallest exponent m of a normal number 2^m (−1022 or −126).
    const MIN_NORMAL_EXPONENT: i32;
    /// Largest exponent m of a finite number 2^m (1023 or 127).
    const MAX_EXPONENT: i32;
    /// x rounded to the nearest integer (ties to even), as a float and as an `i32`, by adding
    /// and subtracting 1.5·2^(p−1) (p = [`Real::MANTISSA_DIGITS`]); valid for |x| < 2^(p−2).
    /// No library call, no branch.
    fn round_to_i32(self) -> (Self, i32);
    /// 2^m exactly, assembled from its bits, for m in
    /// [`Real::MIN_NORMAL_EXPONENT`, `Real::MAX_EXPONENT`]; another m gives an unspecified
    /// value (never a panic).
    fn pow2i(m: i32) -> Self;
    /// The integer k, 0 ≤ k < 2^20, exactly, assembled from its bits (a float with k in the low
    /// bits of the significand, minus the power of two that carries them): the same value as
    /// `k as Self`, in operations that SIMD units without integer-to-float conversion of 64-bit
    /// lanes have. Another k gives an unspecified value (never a panic).
    fn small_integer(k: i32) -> Self;
    /// x with the low ⌈p/2⌉ bits of its significand cleared (26 significant bits are left in
    /// `f64`, 12 in `f32`): the high part of the splitting x = hi + (x − hi), both parts exact,
    /// by one bit mask (no multiplication, no overflow, valid for subnormal x too).
    fn split_high(self) -> Self;
    /// For a positive normal finite x: (f, k, m) with x = 2^m·f exactly, √½ ≤ f < √2 (the
    /// bounds rounded to `Self`), k = m as a float, m in [`Real::MIN_NORMAL_EXPONENT`,
    /// `Real::MAX_EXPONENT` + 1]: the argument reduction of [`crate::math::log`], by integer
    /// operations on the bits (no branch, no library call). Another x gives unspecified values
    /// (never a panic).
    fn split_sqrt2(self) -> (Self, Self, i32);

    /// [`crate::math::exp::exp_dd`]: e^(xh + xl) for a double-length argument.
    fn kernel_exp_dd(xh: Self, xl: Self) -> Self;
    /// The common case of [`crate::math::exp::exp`]: (e^x, inside).
    fn kernel_exp_fast(x: Self) -> (Self, bool);
    /// e^(xh + xl) − 1 for −40 < xh < ln(MAX) − 1 (not checked).
    fn kernel_exp_m1_in_range(xh: Self, xl: Self) -> Self;
    /// e^(xh + xl) − 1 for 0 ≤ xh < ln(MAX) − 1 (not checked; the same bits, shorter).
    fn kernel_exp_m1_nonnegative_in_range(xh: Self, xl: Self) -> Self;
    /// The common case of [`crate::math::log::ln`]: (ln x, inside).
    fn kernel_ln_fast(x: Self) -> (Self, bool);
    /// The common case of [`crate::math::log::ln_1p`]: (ln(1 + x), inside).
    fn kernel_ln_1p_fast(x: Self) -> (Self, bool);
    /// The common case of [`crate::math::trig::sin_cos`]: (sin x, cos x, inside).
    fn kernel_sin_cos_fast(x: Self) -> (Self, Self, bool);
    /// [`crate::math::dd::two_sum`]: (s, e) with s + e = a + b exactly.
    fn kernel_two_sum(a: Self, b: Self) -> (Self, Self);
    /// [`crate::math::dd::fast_two_sum`]: as `kernel_two_sum` for |a| ≥ |b|.
    fn kernel_fast_two_sum(a: Self, b: Self) -> (Self, Self);
    /// [`crate::math::dd::two_prod`]: (p, e) with p + e = a·b exactly.
    fn kernel_two_prod(a: Self, b: Self) -> (Self, Self);
    /// [`crate::math::dd::two_prod_masked`]: (p, e) with p + e = a·b (to 2^-103 in `f64`).
    fn kernel_two_prod_masked(a: Self, b: Self) -> (Self, Self);

    /// Whether the type carries partial derivatives (true for a dual number only).
    const HAS_PARTIALS: bool;
    /// The size of a quadrature error estimate: |x| for a float, every part's absolute value
    /// for a dual number (its value part is |value|).
    fn error_magnitude(self) -> Self;
    /// Whether the partial derivatives of an integral `total` meet the quadrature tolerance
    /// part by part, given its summed error estimate `err` (from [`Real::error_magnitude`]):
    /// err_i ≤ max(abs_tol, rel_tol·max(|total_i|, |total|)), relative to the partial or, where
    /// the partial is smaller than the value (per unit of its parameter), to the value: a
    /// partial whose integrand cancels (a − a⁴ near a = 1) carries a rounding noise of the
    /// value's size that no subdivision removes. Always true for a float (it has no partials).
    fn partials_within(err: Self, total: Self, rel_tol: Self, abs_tol: Self) -> bool;
    /// The share of the tolerance an interval's error estimate `err` of the partials takes, as
    /// the value part of the result (the largest over the partials of err_i/tol_i with the
    /// tol_i of [`Real::partials_within`]); for a float, `err` itself.
    fn partials_error_score(err: Self, total: Self, rel_tol: Self, abs_tol: Self) -> Self;
    /// `self` with its value part replaced by that of `value` (partials kept); a float returns
    /// `value`.
    fn with_value_of(self, value: Self) -> Self;
    /// The value alone, partials set to 0 (a float returns itself).
    fn detach(self) -> Self;
    /// The root x of f(x; p) = 0 with its partials by the implicit function theorem, from the
    /// converged value `x` and one evaluation at it, f = f(x) and dfdx = ∂f/∂x (value parts):
    /// ∂x/∂p = −(∂f/∂p)/(∂f/∂x). A float returns `x`.
    fn implicit_root(x: Self, f: Self, dfdx: Self) -> Self;
}

/// The primitive floats `f32` and `f64`: the constants of the bit-level kernels, which only
/// ever run on a primitive (a dual number runs them on its value).
pub(crate) trait Primitive: Real {
    /// 2^(j/256) for j = 0, …, 255 as double-length pairs `[hi, lo]` (about 106 bits in `f64`,
    /// 48 in `f32`): the table of the exponential kernel [`crate::math::exp`].
    const EXP2_TABLE: &'static [[Self; 2]; 256];
    /// ln2/256 = L1 + L2 + L3, the split constant of the argument reduction of
    /// [`crate::math::exp`]: k·L1 (and in `f32` also k·L2) is exact for every k the kernel uses.
    const LN2_OVER_256: [Self; 3];
}

macro_rules! impl_real {
    ($t:ty, $digits:expr, $split:expr, $lnmax:expr, $lnmin:expr,
     $exp:path, $expm1:path, $log:path, $log1p:path, $sqrt:path, $cbrt:path, $sinh:path, $tanh:path, $floor:path, $cosh:path, $sin:path, $cos:path,
     $table:expr, $ln2n:expr, $emin:expr, $emax:expr, $shift:expr, $bits:ty, $sqrt_half_bits:expr) => {
        impl Primitive for $t {
            const EXP2_TABLE: &'static [[Self; 2]; 256] = &$table;
            const LN2_OVER_256: [Self; 3] = $ln2n;
        }
        impl Real for $t {
            const MANTISSA_DIGITS: u32 = $digits;
            const ZERO: Self = 0.0;
            const SPLITTER: Self = $split;
            const LN_MAX: Self = $lnmax;
            const LN_MIN_SUBNORMAL_NEG: Self = $lnmin;
            #[inline(always)]
            fn c(x: f64) -> Self {
                x as $t
            }
            #[inline(always)]
            fn to_f64_exact(self) -> f64 {
                self as f64
            }
            #[inline(always)]
            fn c2(hi: f64, lo: f64) -> (Self, Self) {
                let h = hi as $t;
                let l = ((hi - h as f64) + lo) as $t;
                (h, l)
            }
            #[inline(always)]
            fn exp(self) -> Self {
                $exp(self)
            }
            #[inline(always)]
            fn exp_m1(self) -> Self {
                $expm1(self)
            }
            #[inline(always)]
            fn ln(self) -> Self {
                $log(self)
            }
            #[inline(always)]
            fn ln_1p(self) -> Self {
                $log1p(self)
            }
            #[inline(always)]
            fn sqrt(self) -> Self {
                $sqrt(self)
            }
            #[inline(always)]
            fn cbrt(self) -> Self {
                $cbrt(self)
            }
            #[inline(always)]
            fn sinh(self) -> Self {
                $sinh(self)
            }
            #[inline(always)]
            fn tanh(self) -> Self {
                $tanh(self)
            }
            #[inline(always)]
            fn floor_libm(self) -> Self {
                $floor(self)
            }
            #[inline(always)]
            fn cosh(self) -> Self {
                $cosh(self)
            }
            #[inline(always)]
            fn sin(self) -> Self {
                $sin(self)
            }
            #[inline(always)]
            fn cos(self) -> Self {
                $cos(self)
            }
            const MIN_NORMAL_EXPONENT: i32 = $emin;
            const MAX_EXPONENT: i32 = $emax;
            #[inline(always)]
            fn round_to_i32(self) -> (Self, i32) {
                let shift: $t = $shift;
                let t = self + shift;
                // t = shift + k with shift's exponent: the low bits of t are k (two's complement)
                (t - shift, t.to_bits().wrapping_sub(shift.to_bits()) as i32)
            }
            #[inline(always)]
            fn pow2i(m: i32) -> Self {
                let biased = (m as $bits).wrapping_add($emax as $bits);
                <$t>::from_bits(biased.wrapping_shl($digits - 1))
            }
            #[inline(always)]
            fn small_integer(k: i32) -> Self {
                // 2^(p−1) has a zero significand: OR-ing k into it gives 2^(p−1) + k exactly
                let big: $t =
                    <$t>::from_bits((($emax as $bits) + ($digits as $bits) - 1) << ($digits - 1));
                <$t>::from_bits(big.to_bits() | ((k as $bits) & 0xf_ffff)) - big
            }
            #[inline(always)]
            fn split_high(self) -> Self {
                let low: $bits = (1 << (($digits + 1) / 2)) - 1;
                <$t>::from_bits(self.to_bits() & !low)
            }
            #[inline(always)]
            fn split_sqrt2(self) -> (Self, Self, i32) {
                // adding 1 − bits(√½) moves significands ≥ √2 into the next binade (no carry
                // out of the exponent field for finite x): the exponent field is then the
                // biased m, and the significand plus bits(√½) is f
                let one: $bits = ($emax as $bits) << ($digits - 1);
                let t = self
                    .to_bits()
                    .wrapping_add(one.wrapping_sub($sqrt_half_bits));
                let e = (t >> ($digits - 1)) as i32;
                let mask: $bits = (1 << ($digits - 1)) - 1;
                let f = <$t>::from_bits((t & mask).wrapping_add($sqrt_half_bits));
                (f, Self::small_integer(e) - Self::c($emax as f64), e - $emax)
            }
            #[inline(always)]
            fn kernel_exp_dd(xh: Self, xl: Self) -> Self {
                crate::math::exp::exp_dd_primitive(xh, xl)
            }
            #[inline(always)]
            fn kernel_exp_fast(x: Self) -> (Self, bool) {
                crate::math::exp::exp_fast_primitive(x)
            }
            #[inline(always)]
            fn kernel_exp_m1_in_range(xh: Self, xl: Self) -> Self {
                crate::math::exp::exp_m1_core::<Self, false>(xh, xl)
            }
            #[inline(always)]
            fn kernel_exp_m1_nonnegative_in_range(xh: Self, xl: Self) -> Self {
                crate::math::exp::exp_m1_core::<Self, true>(xh, xl)
            }
            #[inline(always)]
            fn kernel_ln_fast(x: Self) -> (Self, bool) {
                crate::math::log::ln_fast_primitive(x)
            }
            #[inline(always)]
            fn kernel_ln_1p_fast(x: Self) -> (Self, bool) {
                crate::math::log::ln_1p_fast_primitive(x)
            }
            #[inline(always)]
            fn kernel_sin_cos_fast(x: Self) -> (Self, Self, bool) {
                crate::math::trig::sin_cos_fast_primitive(x)
            }
            #[inline(always)]
            fn kernel_two_sum(a: Self, b: Self) -> (Self, Self) {
                crate::math::dd::two_sum_primitive(a, b)
            }
            #[inline(always)]
            fn kernel_fast_two_sum(a: Self, b: Self) -> (Self, Self) {
                crate::math::dd::fast_two_sum_primitive(a, b)
            }
            #[inline(always)]
            fn kernel_two_prod(a: Self, b: Self) -> (Self, Self) {
                crate::math::dd::two_prod_primitive(a, b)
            }
            #[inline(always)]
            fn kernel_two_prod_masked(a: Self, b: Self) -> (Self, Self) {
                crate::math::dd::two_prod_masked_primitive(a, b)
            }
            const HAS_PARTIALS: bool = false;
            #[inline(always)]
            fn error_magnitude(self) -> Self {
                FloatCore::abs(self)
            }
            #[inline(always)]
            fn partials_within(_err: Self, _total: Self, _rel_tol: Self, _abs_tol: Self) -> bool {
                true
            }
            #[inline(always)]
            fn partials_error_score(
                err: Self,
                _total: Self,
                _rel_tol: Self,
                _abs_tol: Self,
            ) -> Self {
                err
            }
            #[inline(always)]
            fn with_value_of(self, value: Self) -> Self {
                value
            }
            #[inline(always)]
            fn detach(self) -> Self {
                self
            }
            #[inline(always)]
            fn implicit_root(x: Self, _f: Self, _dfdx: Self) -> Self {
                x
            }
        }
    };
}

impl_real!(
    f64,
    53,
    134_217_729.0,
    709.782_712_893_384,
    744.440_071_921_381_3,
    libm::exp,
    libm::expm1,
    libm::log,
    libm::log1p,
    libm::sqrt,
    libm::cbrt,
    libm::sinh,
    libm::tanh,
    libm::floor,
    libm::cosh,
    libm::sin,
    libm::cos,
    crate::math::exp::EXP2_TABLE_F64,
    crate::math::exp::LN2_OVER_256_F64,
    -1022,
    1023,
    6_755_399_441_055_744.0, // 1.5·2^52
    u64,
    0x3fe6_a09e_667f_3bcd // √½ rounded to nearest
);
impl_real!(
    f32,
    24,
    4097.0,
    88.722_84,
    103.278_93,
    libm::expf,
    libm::expm1f,
    libm::logf,
    libm::log1pf,
    libm::sqrtf,
    libm::cbrtf,
    libm::sinhf,
    libm::tanhf,
    libm::floorf,
    libm::coshf,
    libm::sinf,
    libm::cosf,
    crate::math::exp::EXP2_TABLE_F32,
    crate::math::exp::LN2_OVER_256_F32,
    -126,
    127,
    12_582_912.0, // 1.5·2^23
    u32,
    0x3f35_04f3 // √½ rounded to nearest
);

#[cfg(test)]
mod tests {
    use super::Real;

    #[test]
    fn small_integer_is_the_integer_for_every_k_below_2_to_the_20() {
        for k in 0..(1 << 20) {
            assert_eq!(f64::small_integer(k), f64::from(k), "f64 {k}");
            assert_eq!(f32::small_integer(k), k as f32, "f32 {k}");
        }
    }
}
