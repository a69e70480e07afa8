//! Shared numerical pieces of the Planck function (no validation here).

use crate::constants as k;
use crate::math::{dd, exp, log};
use crate::{Arg, Real};

/// 2^-55: exact scaling that keeps ν³-type products inside the `f32` range.
pub(crate) const SCALE_55: f64 = 2.775_557_561_562_891_4e-17;
/// (2h/c²)·2^110, so that (ν·2^-55)²·(ν·this) = (2h/c²)ν³ with exact scalings.
pub(crate) const TWO_H_OVER_C2_SCALED: f64 = 1.914_009_734_699_457_5e-17;
/// 2/c², s² m⁻².
pub(crate) const TWO_OVER_C2: f64 = 2.225_300_112_107_237e-17;
/// 2c, m s⁻¹.
pub(crate) const TWO_C: f64 = 599_584_916.0;
/// 2k⁴/(h³c²), W m⁻² sr⁻¹ K⁻⁴: radiance per T⁴ per unit of ∫ t³/(eᵗ−1) dt.
pub(crate) const K4: f64 = 2.779_416_505_426_625_4e-9;
/// 2k³/(h³c²), photons s⁻¹ m⁻² sr⁻¹ K⁻³ per unit of ∫ t²/(eᵗ−1) dt.
pub(crate) const K3: f64 = 201_312_318_005_997.56;
/// π⁴/15 = ∫₀^∞ t³/(eᵗ−1) dt.
pub(crate) const PI4_OVER_15: f64 = 6.493_939_402_266_829;
/// 2ζ(3) = ∫₀^∞ t²/(eᵗ−1) dt.
pub(crate) const TWO_ZETA3: f64 = 2.404_113_806_319_188_5;

const LN2_HI: f64 = core::f64::consts::LN_2;
const LN2_LO: f64 = 2.319_046_813_846_299_6e-17;

/// x = c₂/(λT) as an unnormalized double-length pair: xh is the rounded quotient c₂/fl(λT) and
/// |xl| is up to about two ulp of xh (the form [`planck_quotient`] consumes directly).
#[inline(always)]
pub(crate) fn x_wavelength_pair<T: Real>(wavelength: T, temperature: T) -> (T, T) {
    let (ch, cl) = T::c2(k::SECOND_RADIATION, k::SECOND_RADIATION_LO);
    let (ph, pl) = dd::two_prod_masked(wavelength, temperature);
    let q = ch / ph;
    // residual c₂ − q·λT to double length (q·ph to 2^-103); the correction residual/(λT) needs
    // only a few correct bits, and 1/(λT) = q/c₂ to an ulp: a product, not a second division
    let (e1, e2) = dd::two_prod_masked(q, ph);
    let r = ((ch - e1) - e2) + (cl - q * pl);
    (q, r * (q * T::c(1.0 / k::SECOND_RADIATION)))
}

/// x = c₂/(λT) as a double-length pair, normalized (|xl| ≤ ulp(xh)/2).
#[inline(always)]
pub(crate) fn x_wavelength<T: Real>(wavelength: T, temperature: T) -> (T, T) {
    let (h, l) = x_wavelength_pair(wavelength, temperature);
    dd::fast_two_sum(h, l)
}

/// c·(a/t) for a double-length constant c = ch + cl and a, t > 0, as an unnormalized
/// double-length pair (|lo| up to about two ulp of hi). One division, by t alone (a loop over a
/// at one t needs it once): a/t = q + ql with q = a·(1/t) and ql = (a − q·t)·(1/t), the
/// residual a − q·t exact to 2^-103.
#[inline(always)]
fn constant_times_quotient<T: Real>(ch: T, cl: T, a: T, t: T) -> (T, T) {
    let inv = T::one() / t;
    if !(inv <= T::max_value()) {
        // t below 1/MAX (a subnormal temperature): 1/t overflows, divide directly
        return constant_times_quotient_by_division(ch, cl, a, t);
    }
    constant_times_quotient_with_inverse(ch, cl, a, t, inv)
}

/// [`constant_times_quotient`] given inv = 1/t ≤ MAX (computed once for a loop at one t).
#[inline(always)]
fn constant_times_quotient_with_inverse<T: Real>(ch: T, cl: T, a: T, t: T, inv: T) -> (T, T) {
    let q = a * inv;
    let (e1, e2) = dd::two_prod_masked(q, t);
    let ql = ((a - e1) - e2) * inv;
    let (xh, e) = dd::two_prod_masked(q, ch);
    (xh, e + (ch * ql + cl * q))
}

#[cold]
#[inline(never)]
fn constant_times_quotient_by_division<T: Real>(ch: T, cl: T, a: T, t: T) -> (T, T) {
    let q = a / t;
    if !q.is_finite() {
        // a/t overflows: x = +∞ (the far Wien limit), with no NaN from the splitting
        return (q * ch, T::zero());
    }
    let (qh, ql) = dd::div_d_d(a, t);
    dd::mul_dd_dd(ch, cl, qh, ql)
}

/// x = (h/k)·ν/T as an unnormalized double-length pair (|xl| up to about two ulp of xh).
#[inline(always)]
pub(crate) fn x_frequency_pair<T: Real>(frequency: T, temperature: T) -> (T, T) {
    let (hh, hl) = T::c2(k::PLANCK_OVER_BOLTZMANN, k::PLANCK_OVER_BOLTZMANN_LO);
    constant_times_quotient(hh, hl, frequency, temperature)
}

/// 1/T for the array functions of frequency and wavenumber at one temperature, when it is
/// finite (T above 1/MAX; below, the scalar functions divide directly and so must the array).
#[inline(always)]
pub(crate) fn inverse_temperature<T: Real>(temperature: T) -> Option<T> {
    let inv = T::one() / temperature;
    (inv <= T::max_value()).then_some(inv)
}

/// [`x_frequency_pair`] given inv = [`inverse_temperature`]`(temperature)`: the same bits.
#[inline(always)]
pub(crate) fn x_frequency_pair_with_inverse<T: Real>(
    frequency: T,
    temperature: T,
    inv: T,
) -> (T, T) {
    let (hh, hl) = T::c2(k::PLANCK_OVER_BOLTZMANN, k::PLANCK_OVER_BOLTZMANN_LO);
    constant_times_quotient_with_inverse(hh, hl, frequency, temperature, inv)
}

/// [`x_wavenumber_pair`] given inv = [`inverse_temperature`]`(temperature)`: the same bits.
#[inline(always)]
pub(crate) fn x_wavenumber_pair_with_inverse<T: Real>(
    wavenumber: T,
    temperature: T,
    inv: T,
) -> (T, T) {
    let (ch, cl) = T::c2(k::SECOND_RADIATION, k::SECOND_RADIATION_LO);
    constant_times_quotient_with_inverse(ch, cl, wavenumber, temperature, inv)
}

/// x = (h/k)·ν/T as a double-length pair, normalized (|xl| ≤ ulp(xh)/2).
#[inline(always)]
pub(crate) fn x_frequency<T: Real>(frequency: T, temperature: T) -> (T, T) {
    let (h, l) = x_frequency_pair(frequency, temperature);
    dd::fast_two_sum(h, l)
}

/// x = c₂·ṽ/T as an unnormalized double-length pair (|xl| up to about two ulp of xh).
#[inline(always)]
pub(crate) fn x_wavenumber_pair<T: Real>(wavenumber: T, temperature: T) -> (T, T) {
    let (ch, cl) = T::c2(k::SECOND_RADIATION, k::SECOND_RADIATION_LO);
    constant_times_quotient(ch, cl, wavenumber, temperature)
}

/// e^−(xh+xl)·p computed without overflow or premature underflow, for xh ≥ 0.
///
/// Splits x = (x − m ln 2) + m ln 2 with the reduced exponent kept to double length, so the
/// only inexact step is one [`exp::exp_dd`] of that double-length argument; the 2^−m scaling is
/// exact until the result itself becomes subnormal.
#[cold]
#[inline(never)]
pub(crate) fn scaled_exp_neg<T: Real>(p: T, xh: T, xl: T) -> T {
    if xh > T::LN_MAX + T::LN_MIN_SUBNORMAL_NEG + T::one() {
        // p ≤ largest float = e^LN_MAX, so p·e^−x is below the smallest subnormal.
        return T::zero();
    }
    let half_range = T::c(0.5) * T::LN_MAX;
    if xh <= half_range {
        return p * exp::exp_dd(-xh, -xl);
    }
    let (lh, ll) = T::c2(LN2_HI, LN2_LO);
    // m chosen so that x − m ln2 ≈ half_range: e^−reduced is a normal number.
    let m = ((xh - half_range) / lh).floor_libm();
    let (ph, pl) = dd::two_prod(m, lh);
    let (sh, sl) = dd::two_sum(xh, -ph);
    let rl = ((sl - pl) - m * ll) + xl;
    let mut r = p * exp::exp_dd(-sh, -rl);
    // multiply by 2^−m in exact power-of-two chunks
    let chunk = T::c(8.673_617_379_884_035e-19); // 2^-60
    let mut left = m;
    let sixty = T::c(60.0);
    while left >= sixty {
        r = r * chunk;
        left = left - sixty;
        if r == T::zero() {
            return r;
        }
    }
    // 2^-left for 0 ≤ left < 60, built from the exact f64 power
    let left_f64 = left.to_f64_exact();
    r * T::c(libm::exp2(-left_f64))
}

/// p / (e^x − 1) for x = xh + xl ≥ 0 given to double length: the Planck occupation factor
/// times a prefactor, accurate from x ≈ 1e-10 (Rayleigh-Jeans) to the far Wien tail.
#[inline(always)]
pub(crate) fn planck_quotient<T: Real>(p: T, xh: T, xl: T) -> T {
    match planck_quotient_fast(p, xh, xl) {
        (v, true) => v,
        // e^x − 1 = e^x (1 − e^−x), and e^−x < 1e-300 here: the correction is below an ulp.
        _ => scaled_exp_neg(p, xh, xl),
    }
}

/// The common case of [`planck_quotient`] as straight-line code for the array functions: its
/// value and whether x is inside that case (xh < ln MAX − 1); outside, the value is garbage.
#[inline(always)]
pub(crate) fn planck_quotient_fast<T: Real>(p: T, xh: T, xl: T) -> (T, bool) {
    // e^x − 1 of the double-length x ≥ 0, rounded once (Tang's table-driven kernel)
    (
        p / exp::exp_m1_nonnegative_in_range(xh, xl),
        xh < T::LN_MAX - T::one(),
    )
}

/// num / (den·(e^x − 1)) for x = xh + xl ≥ 0 and den > 0: [`planck_quotient`] of num/den with
/// one division instead of two (divisions are the slowest operations of the Planck function).
/// Same number of roundings; whenever den·(e^x − 1) is not a normal number (the far Wien tail,
/// or extreme arguments) it is computed as `planck_quotient(num / den, xh, xl)`.
#[inline(always)]
pub(crate) fn planck_ratio<T: Real>(num: T, den: T, xh: T, xl: T) -> T {
    match planck_ratio_fast(num, den, xh, xl) {
        (v, true) => v,
        _ => planck_ratio_outside(num, den, xh, xl),
    }
}

/// The common case of [`planck_ratio`] as straight-line code for the array functions: its
/// value and whether the arguments are inside that case (xh < ln MAX − 1 and den·(e^x − 1) a
/// normal number); outside, the value is garbage.
#[inline(always)]
pub(crate) fn planck_ratio_fast<T: Real>(num: T, den: T, xh: T, xl: T) -> (T, bool) {
    let d = den * exp::exp_m1_nonnegative_in_range(xh, xl);
    let inside =
        (xh < T::LN_MAX - T::one()) & (d >= T::min_positive_value()) & (d <= T::max_value());
    (num / d, inside)
}

#[cold]
#[inline(never)]
fn planck_ratio_outside<T: Real>(num: T, den: T, xh: T, xl: T) -> T {
    planck_quotient(num / den, xh, xl)
}

/// −expm1(−x) = 1 − e^−x, for the Planck derivative x eˣ/(eˣ − 1) = x / (1 − e^−x).
#[inline(always)]
pub(crate) fn one_minus_exp_neg<T: Real>(x: T) -> T {
    -exp::exp_m1(-x)
}

/// λ⁵ by products (three roundings).
#[inline(always)]
pub(crate) fn pow5<T: Real>(x: T) -> T {
    let x2 = x * x;
    x2 * x2 * x
}

/// (2h/c²)·ν³ with exact power-of-two scalings, so that the `f32` evaluation does not
/// overflow although 2h/c² itself is below the `f32` range.
#[inline(always)]
pub(crate) fn two_h_nu3_over_c2<T: Real>(nu: T) -> T {
    let s = T::c(SCALE_55);
    let a = nu * s;
    (a * a) * (nu * T::c(TWO_H_OVER_C2_SCALED))
}

/// 2hν³/c² for ν = f·2^m (f in [√½, √2)) as (r, e), 2hν³/c² = r·2^e with r a normal number:
/// the operations of [`two_h_nu3_over_c2`] on f, so r·2^e is its value before any underflow.
#[inline(always)]
pub(crate) fn two_h_nu3_over_c2_parts<T: Real>(f: T, m: i32) -> (T, i32) {
    ((f * f) * (f * T::c(TWO_H_OVER_C2_SCALED)), 3 * m - 110)
}

/// The Planck function per frequency, (2hν³/c²)/(eˣ − 1) with x = hν/kT = xh + xl as the
/// caller formed it, where 2hν³/c² or x is below the normal range (ν below about 1e-86 Hz, or
/// ν/T below about 5e-298 Hz/K, in `f64`): the number lost its bits to the underflow (2.3e-3
/// relative at ν = 3.07e-91 Hz, T = 0.01 K, and 9e-3 at ν = 1.04e-13 Hz, T = 1e300 K, where
/// B_ν is normal: fuzzing findings), so the quotient is formed from normal significands and
/// scaled by the power of two afterwards, once. The prefactor is
/// [`two_h_nu3_over_c2_parts`]; with x normal the operations are those of a normal
/// prefactor, so is the accuracy; with x below the normal range eˣ − 1 = x to far better than
/// the rounding unit (the next term is x/2 ≤ 2^-1023 of it), x = (h/k)(f_ν/f_T)·2^(m_ν − m_T)
/// for ν = f_ν 2^m_ν and T = f_T 2^m_T, formed to double length as for normal arguments.
#[cold]
#[inline(never)]
pub(crate) fn planck_frequency_scaled<T: Real>(nu: T, t: T, xh: T, xl: T) -> T {
    let (Some((f, m)), Some((ft, mt))) = (significand_exponent(nu), significand_exponent(t)) else {
        return planck_quotient(two_h_nu3_over_c2(nu), xh, xl);
    };
    let (r, e) = two_h_nu3_over_c2_parts(f, m);
    if xh >= T::min_positive_value() {
        return scale_by_pow2(planck_quotient(r, xh, xl), e);
    }
    let (qh, ql) = x_frequency_pair(f, ft);
    scale_by_pow2(r / (qh + ql), e - (m - mt))
}

/// The Planck function per wavelength, (2hc²/λ⁵)/(eˣ − 1) with x = c₂/(λT) = xh + xl as the
/// caller formed it, where λ⁵ overflows (λ above about 2.5e61 m in `f64`) or x is below the
/// normal range (λT above about 6.5e305 m K): the quotient came out as 0, or with the bits x
/// lost, where B_λ is a normal number. As [`planck_frequency_scaled`]: λ = f·2^m, the prefactor
/// 2hc²/f⁵ (normal), the quotient, then the power of two 2^(−5m), once; with x below the
/// normal range eˣ − 1 = x = (c₂/(f f_T))·2^(−m − m_T), T = f_T 2^m_T, to double length.
#[cold]
#[inline(never)]
pub(crate) fn planck_wavelength_scaled<T: Real>(l: T, t: T, xh: T, xl: T) -> T {
    let num = T::c(k::FIRST_RADIATION_RADIANCE);
    let (Some((f, m)), Some((ft, mt))) = (significand_exponent(l), significand_exponent(t)) else {
        return planck_ratio(num, pow5(l), xh, xl);
    };
    let p = num / pow5(f);
    if xh >= T::min_positive_value() {
        return scale_by_pow2(planck_quotient(p, xh, xl), -5 * m);
    }
    let (qh, ql) = x_wavelength_pair(f, ft);
    scale_by_pow2(p / (qh + ql), mt - 4 * m)
}

/// Solves value(T) = target for T > 0 where value is increasing in T and `f` returns
/// (value, d value/dT). Works on ln(value/target), so Newton's step is well scaled over the
/// many decades a radiance spans; the bracket is grown by factors of 2 from `guess` and the root
/// is polished by the shared safeguarded Newton iteration to about one ulp. Near the root the
/// logarithm is taken of the quotient, not as ln value − ln target: the difference of two
/// logarithms resolves value only to |ln target|·ε relative (8e-14 for a radiance of 1e158),
/// the quotient to about ε (a fuzzing finding, `tests/fuzz_regressions.rs`).
pub(crate) fn invert_increasing<T: Real, F: FnMut(T) -> (T, T)>(
    mut f: F,
    target: T,
    guess: T,
    domain_arg: Arg,
) -> crate::Result<T> {
    let ln_target = target.ln();
    let g = |t: T| {
        let (v, dv) = f(t);
        let q = v / target;
        let residual = if q.is_normal() {
            q.ln()
        } else {
            // far from the root, where the quotient under- or overflows
            v.ln() - ln_target
        };
        (residual, dv / v)
    };
    let guess = if guess.is_finite() && guess > T::zero() {
        guess
    } else {
        T::one()
    };
    crate::math::roots::solve_monotone_positive(g, guess, true, domain_arg)
}

/// ln(1 + a/b) for a, b > 0 without overflow or underflow of the quotient: the argument of the
/// logarithm in every closed-form brightness temperature. `ln_a` is used when `a` itself is
/// not a normal number (it is then ln of the exact a). The common case (a, b and a/b normal,
/// a/b < 1e30) is [`log::ln_1p`] of a/b, the bits of [`ln1p_quotient_fast`].
#[inline(always)]
pub(crate) fn ln1p_quotient<T: Real>(a: T, ln_a: impl Fn() -> T, b: T) -> T {
    match ln1p_quotient_fast(a, b) {
        (v, true) => v,
        _ => ln1p_quotient_outside(a, ln_a, b),
    }
}

/// [`ln1p_quotient`] outside its common case (out of line: the rare path).
#[cold]
#[inline(never)]
fn ln1p_quotient_outside<T: Real>(a: T, ln_a: impl Fn() -> T, b: T) -> T {
    let a_ok = a.is_finite() && a >= T::min_positive_value();
    if a_ok && b >= T::min_positive_value() {
        let q = a / b;
        if q.is_finite() && q >= T::min_positive_value() && q < T::c(1e30) {
            return log::ln_1p(q);
        }
    }
    // with d = ln a − ln b = ln(a/b): ln(1 + a/b) = d + ln(1 + e^−d) for a/b > 1 and
    // ln(1 + e^d) below (a/b large, or a below the normal range: a subnormal or underflowing
    // 2hν³/c² at a far-infrared frequency, where the quotient may be small; the first form
    // alone returned d + (−d) = 0 there). The logarithms carry an absolute error of about
    // ulp(ln a), so the result is then good to about |ln a|·ε relative (up to 2e-13 in `f64`).
    let la = if a_ok { a.ln() } else { ln_a() };
    let lb = b.ln();
    let d = la - lb;
    if d > T::zero() {
        d + (-d).exp().ln_1p()
    } else {
        d.exp().ln_1p()
    }
}

/// The brightness temperature θ/ln(1 + a/L) (θ = c₂/λ, a = 2hc²/λ⁵ at a wavelength;
/// θ = hν/k, a = 2hν³/c² at a frequency `x`, L > 0 the radiance) where a/L < 1 and a or a/L
/// lies below the normal range; `None` elsewhere, where the caller's forms hold (`a_is_normal`:
/// whether the caller's rounded a is a normal number).
///
/// There a rounded to the type has lost bits (or is 0), and ln(1 + e^(ln a − ln L)), the form
/// that needs no normal a, carries the absolute error of the logarithms, about |ln a|·ε,
/// into a result of size a/L: 1.4e-13 relative at λ = 1.04e59 m, T = 0.01 K, and 3.6e-14 at
/// λ = 1 m, T = 1.38e306 K, where a is normal and a/L = 1e-308 is not (fuzzing findings).
/// Here every quantity is a normal significand times a power of two, exactly: x = f·2^m and
/// L = g·2^n (a subnormal argument first scaled up exactly), a = r_a·2^e_a and θ = r_θ·2^e_θ
/// with r_a, r_θ computed from f as the caller computes them from x (so with the same
/// roundings), a/L = (r_a/g)·2^(e_a − n). A normal a/L is formed exactly from that and
/// [`log::ln_1p`] taken of it; below the normal range ln(1 + a/L) = a/L to far better than
/// the rounding unit (the next term, (a/L)²/2, is 1e-308 of it), and the power of two is kept
/// apart. T = (r_θ/w)·2^(e_θ − e_w) with one rounding of the scaling at most (only for a
/// subnormal T). About eight roundings in all: within 1e-15 relative of the exact inverse.
#[cold]
#[inline(never)]
pub(crate) fn brightness_temperature_small_quotient<T: Real>(
    x: T,
    l: T,
    a_is_normal: bool,
    frequency: bool,
) -> Option<T> {
    let split = significand_exponent::<T>;
    let (f, m) = split(x)?;
    let (g, n) = split(l)?;
    let (ra, ea, rt, et) = if frequency {
        // a = (2h/c²)·2^110 f³ · 2^(3m − 110), θ = (h/k) f · 2^m
        let (hh, hl) = T::c2(k::PLANCK_OVER_BOLTZMANN, k::PLANCK_OVER_BOLTZMANN_LO);
        let (th, tl) = dd::mul_dd_d(hh, hl, f);
        let (ra, ea) = two_h_nu3_over_c2_parts(f, m);
        (ra, ea, th + tl, m)
    } else {
        // a = (2hc²/f⁵)·2^(−5m), θ = (c₂/f)·2^(−m)
        let (ch, cl) = T::c2(k::SECOND_RADIATION, k::SECOND_RADIATION_LO);
        let (qh, ql) = dd::div_dd_dd(ch, cl, f, T::zero());
        (
            T::c(k::FIRST_RADIATION_RADIANCE) / pow5(f),
            -5 * m,
            qh + ql,
            -m,
        )
    };
    // a/L = fq·2^e
    let (fq, e) = split(ra / g)?;
    let e = e + ea - n;
    if e > 0 || (e == 0 && fq >= T::one()) {
        return None;
    }
    let q_is_normal = e > T::MIN_NORMAL_EXPONENT || (e == T::MIN_NORMAL_EXPONENT && fq >= T::one());
    if a_is_normal && q_is_normal {
        return None;
    }
    // ln(1 + a/L) = w·2^ew
    let (w, ew) = if q_is_normal {
        (log::ln_1p(fq * T::pow2i(e)), 0)
    } else {
        (fq, e)
    };
    let (ft, mt) = split(rt / w)?;
    Some(times_pow2(ft, mt + et - ew))
}

/// A positive finite v as (f, m), v = f·2^m exactly with f in [√½, √2) (subnormal v
/// included); `None` for v ≤ 0, ∞ or NaN.
pub(crate) fn significand_exponent<T: Real>(v: T) -> Option<(T, i32)> {
    if !(v > T::zero() && v <= T::max_value()) {
        return None;
    }
    let p = T::MANTISSA_DIGITS as i32;
    let (v, shift) = if v < T::min_positive_value() {
        (v * T::pow2i(p), -p)
    } else {
        (v, 0)
    };
    let (f, _, m) = v.split_sqrt2();
    Some((f, m + shift))
}

/// v·2^e for a positive finite v, rounded once (only where the result is subnormal); v itself
/// where v is not positive and finite.
pub(crate) fn scale_by_pow2<T: Real>(v: T, e: i32) -> T {
    match significand_exponent(v) {
        Some((f, m)) => times_pow2(f, m.saturating_add(e)),
        None => v,
    }
}

/// f·2^e for f in [√½, √2), rounded once (only where the result is subnormal), +∞ beyond the
/// largest number, 0 far below the smallest.
fn times_pow2<T: Real>(f: T, e: i32) -> T {
    let (lo, hi) = (T::MIN_NORMAL_EXPONENT, T::MAX_EXPONENT);
    if e > hi + 1 {
        T::infinity()
    } else if e == hi + 1 {
        (f * T::c(2.0)) * T::pow2i(hi)
    } else if e >= lo {
        f * T::pow2i(e)
    } else if e >= 2 * lo {
        // exact into the normal range, then the one rounding into the subnormal range
        (f * T::pow2i(lo)) * T::pow2i(e - lo)
    } else {
        T::zero()
    }
}

/// The common case of [`ln1p_quotient`] as straight-line code for the array functions: its
/// value and whether (a, b) are inside that case; outside, the value is garbage.
#[inline(always)]
pub(crate) fn ln1p_quotient_fast<T: Real>(a: T, b: T) -> (T, bool) {
    let q = a / b;
    let (v, _) = log::ln_1p_fast(q);
    let inside = (a >= T::min_positive_value())
        & (a <= T::max_value())
        & (b >= T::min_positive_value())
        & (q >= T::min_positive_value())
        & (q < T::c(1e30));
    (v, inside)
}
