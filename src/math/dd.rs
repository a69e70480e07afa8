//! Double-length arithmetic from error-free transformations (Dekker 1971, "A floating-point
//! technique for extending the available precision", Numer. Math. 18, 224; Knuth, TAOCP 2,
//! 4.2.2). Values are unevaluated sums `hi + lo` with |lo| ≤ ulp(hi)/2.
//!
//! Generic over [`Real`] so the same code gives ~48-bit intermediates in `f32` and ~106-bit
//! ones in `f64`. No fused multiply-add is assumed (firmware FPUs and the `libm` crate's
//! software FMA would both be slow); Dekker's splitting is exact without it as long as no
//! intermediate overflows (|a| < MAX / SPLITTER).

use crate::Real;
use crate::real::Primitive;

/// Exact sum: returns (s, e) with s = fl(a + b) and a + b = s + e exactly (Knuth's TwoSum).
#[inline(always)]
pub fn two_sum<T: Real>(a: T, b: T) -> (T, T) {
    T::kernel_two_sum(a, b)
}

/// [`two_sum`] of a primitive float (the transformation itself).
#[inline(always)]
pub(crate) fn two_sum_primitive<T: Primitive>(a: T, b: T) -> (T, T) {
    let s = a + b;
    let bb = s - a;
    let e = (a - (s - bb)) + (b - bb);
    (s, e)
}

/// Exact sum when |a| ≥ |b| (Dekker's FastTwoSum).
#[inline(always)]
pub fn fast_two_sum<T: Real>(a: T, b: T) -> (T, T) {
    T::kernel_fast_two_sum(a, b)
}

/// [`fast_two_sum`] of a primitive float (the transformation itself).
#[inline(always)]
pub(crate) fn fast_two_sum_primitive<T: Primitive>(a: T, b: T) -> (T, T) {
    let s = a + b;
    let e = b - (s - a);
    (s, e)
}

#[inline(always)]
fn split<T: Primitive>(a: T) -> (T, T) {
    let t = T::SPLITTER * a;
    let hi = t - (t - a);
    (hi, a - hi)
}

/// Exact product: returns (p, e) with p = fl(a·b) and a·b = p + e exactly (Dekker's TwoProduct),
/// barring overflow or underflow of the partial products.
///
/// `a` is split by a bit mask ([`Real::split_high`]: ⌊p/2⌋ bits in the high part, ⌈p/2⌉ in the
/// low one) and `b` by Veltkamp's multiplication (at most ⌊p/2⌋ bits in each part), so that all
/// four partial products still fit in p bits: the same (p, e) as with two Veltkamp splittings,
/// with two operations fewer and a shorter dependency chain on `a`'s side. Put the operand that
/// arrives last (or that varies in a loop) first.
#[inline(always)]
pub fn two_prod<T: Real>(a: T, b: T) -> (T, T) {
    T::kernel_two_prod(a, b)
}

/// [`two_prod`] of a primitive float (the transformation itself).
#[inline(always)]
pub(crate) fn two_prod_primitive<T: Primitive>(a: T, b: T) -> (T, T) {
    let p = a * b;
    let ah = a.split_high();
    let al = a - ah;
    let (bh, bl) = split(b);
    let e = ((ah * bh - p) + ah * bl + al * bh) + al * bl;
    (p, e)
}

/// Product with its error term from two bit-mask splittings ([`Real::split_high`]): returns
/// (p, e) with p = fl(a·b) and e = a·b − p exactly in `f32` (12 + 12 bits per factor) and to
/// within 2^-103·|a·b| in `f64` (26 + 27 bits: only the product of the two low parts, itself
/// below 2^-50·|a·b|, is rounded). Two operations fewer than [`two_prod`], and no overflow
/// of the splitting; for error terms that only need to be right to a few bits beyond the
/// working precision (the double-length Planck exponent needs about 65).
#[inline(always)]
pub fn two_prod_masked<T: Real>(a: T, b: T) -> (T, T) {
    T::kernel_two_prod_masked(a, b)
}

/// [`two_prod_masked`] of a primitive float (the transformation itself).
#[inline(always)]
pub(crate) fn two_prod_masked_primitive<T: Primitive>(a: T, b: T) -> (T, T) {
    let p = a * b;
    let ah = a.split_high();
    let al = a - ah;
    let bh = b.split_high();
    let bl = b - bh;
    (p, ((ah * bh - p) + ah * bl + al * bh) + al * bl)
}

/// Double-length product of a double-length (ah + al) and a plain b.
#[inline(always)]
pub fn mul_dd_d<T: Real>(ah: T, al: T, b: T) -> (T, T) {
    let (p, e) = two_prod(ah, b);
    fast_two_sum(p, e + al * b)
}

/// Double-length product of two double-length numbers.
#[inline(always)]
pub fn mul_dd_dd<T: Real>(ah: T, al: T, bh: T, bl: T) -> (T, T) {
    let (p, e) = two_prod(ah, bh);
    fast_two_sum(p, e + (ah * bl + al * bh))
}

/// Double-length quotient of a double-length (ah + al) by a double-length (bh + bl).
#[inline(always)]
pub fn div_dd_dd<T: Real>(ah: T, al: T, bh: T, bl: T) -> (T, T) {
    let q = ah / bh;
    // remainder r = a − q·b computed to double length
    let (p, e) = two_prod(q, bh);
    let r = (((ah - p) - e) + al) - q * bl;
    fast_two_sum(q, r / bh)
}

/// Double-length quotient a / b of two plain numbers.
#[inline(always)]
pub fn div_d_d<T: Real>(a: T, b: T) -> (T, T) {
    let q = a / b;
    let (p, e) = two_prod(q, b);
    let r = (a - p) - e;
    fast_two_sum(q, r / b)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn two_prod_is_exact_on_known_case() {
        // (1 + 2^-30)^2 = 1 + 2^-29 + 2^-60: the last term is the rounding error.
        let a = 1.0 + libm::ldexp(1.0, -30);
        let (p, e) = two_prod(a, a);
        assert_eq!(p, 1.0 + libm::ldexp(1.0, -29));
        assert_eq!(e, libm::ldexp(1.0, -60));
    }

    #[test]
    fn division_recovers_one_third_to_double_length() {
        let (q, r) = div_d_d(1.0f64, 3.0);
        // 1 − 3(q + r) must vanish to ~2^-106.
        let (p, e) = two_prod(q, 3.0);
        let resid = ((1.0 - p) - e) - 3.0 * r;
        assert!(resid.abs() < 1e-31, "{resid}");
    }

    #[test]
    fn two_prod_is_exact_on_random_operands() {
        // f32: the exact product fits in an f64; f64: against the exact error obtained with
        // two Veltkamp splittings (Dekker's original form) over many binades
        let mut st: u64 = 0x9e37_79b9_7f4a_7c15;
        let mut next = || {
            st ^= st << 13;
            st ^= st >> 7;
            st ^= st << 17;
            st
        };
        for _ in 0..200_000 {
            let r = next();
            let a = f32::from_bits((r as u32 & 0x807f_ffff) | ((97 + (r >> 40) as u32 % 60) << 23));
            let b = f32::from_bits(
                ((r >> 32) as u32 & 0x807f_ffff) | ((97 + (r >> 50) as u32 % 60) << 23),
            );
            let (p, e) = two_prod(a, b);
            assert_eq!(p, a * b);
            assert_eq!(e, (a as f64 * b as f64 - p as f64) as f32, "{a:e} {b:e}");
            let a = f64::from_bits((next() & 0x800f_ffff_ffff_ffff) | ((923 + next() % 200) << 52));
            let b = f64::from_bits((next() & 0x800f_ffff_ffff_ffff) | ((923 + next() % 200) << 52));
            let (p, e) = two_prod(a, b);
            let (ah, al) = split(a);
            let (bh, bl) = split(b);
            assert_eq!(p, a * b);
            assert_eq!(
                e,
                ((ah * bh - p) + ah * bl + al * bh) + al * bl,
                "{a:e} {b:e}"
            );
        }
    }
}
