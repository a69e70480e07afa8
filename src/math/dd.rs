//! Double-length arithmetic from error-free transformations (Dekker 1971, "A floating-point
//! technique for extending the available precision", Numer. Math. 18, 224; Knuth, TAOCP 2,
//! 4.2.2). Values are unevaluated sums `hi + lo` with |lo| ≤ ulp(hi)/2.
//!
//! Generic over [`Real`] so the same code gives ~48-bit intermediates in `f32` and ~106-bit
//! ones in `f64`. No fused multiply-add is assumed (firmware FPUs and the `libm` crate's
//! software FMA would both be slow); Dekker's splitting is exact without it as long as no
//! intermediate overflows (|a| < MAX / SPLITTER).

use crate::Real;

/// Exact sum: returns (s, e) with s = fl(a + b) and a + b = s + e exactly (Knuth's TwoSum).
#[inline(always)]
pub fn two_sum<T: Real>(a: T, b: T) -> (T, T) {
    let s = a + b;
    let bb = s - a;
    let e = (a - (s - bb)) + (b - bb);
    (s, e)
}

/// Exact sum when |a| ≥ |b| (Dekker's FastTwoSum).
#[inline(always)]
pub fn fast_two_sum<T: Real>(a: T, b: T) -> (T, T) {
    let s = a + b;
    let e = b - (s - a);
    (s, e)
}

#[inline(always)]
fn split<T: Real>(a: T) -> (T, T) {
    let t = T::SPLITTER * a;
    let hi = t - (t - a);
    (hi, a - hi)
}

/// Exact product: returns (p, e) with p = fl(a·b) and a·b = p + e exactly (Dekker's TwoProduct),
/// barring overflow or underflow of the partial products.
#[inline(always)]
pub fn two_prod<T: Real>(a: T, b: T) -> (T, T) {
    let p = a * b;
    let (ah, al) = split(a);
    let (bh, bl) = split(b);
    let e = ((ah * bh - p) + ah * bl + al * bh) + al * bl;
    (p, e)
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
}
