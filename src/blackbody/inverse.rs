//! Temperatures from measured radiance: brightness temperature (the closed-form inverse of
//! Planck's law), Rayleigh-Jeans temperature, and the two-colour ratio temperature.
//!
//! Cautions: a brightness temperature is the temperature of a blackbody of the same radiance;
//! a real surface with emissivity ε < 1 is hotter than its brightness temperature. Do not use
//! these numbers for safety decisions (fever screening, furnace, molten-metal or fire work)
//! without the emissivity, calibration and procedure that the applicable standards, local codes
//! and licensed practice require.

use super::kernel::{
    brightness_temperature_small_quotient, ln1p_quotient, ln1p_quotient_fast, two_h_nu3_over_c2,
    x_wavelength,
};
use crate::arg;
use crate::check::{finite_result, positive};
use crate::constants as k;
use crate::math::{dd, roots};
use crate::{Error, Real, Result};

/// (c²/2k)·2^-120 as a double-length constant (representable in `f32` too).
const RJ_CONST_HI: f64 = 2_448.660_907_448_376_7;
const RJ_CONST_LO: f64 = 1.920_485_280_622_186_2e-13;

/// Brightness temperature at a wavelength: the T of the blackbody whose B_λ equals the given
/// spectral radiance, T = c₂ / (λ ln(1 + 2hc²/(λ⁵ L))).
///
/// * `wavelength_m`: m, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ m⁻¹, finite and > 0.
///
/// Returns K. Errors: `NonFinite(i)`, `NonPositive(i)`.
/// Accuracy: round trip with [`spectral_radiance_wavelength`](super::spectral_radiance_wavelength)
/// within 1e-14 relative (`f64`) against mpmath for a normal radiance, 2hc²/λ⁵ or its ratio
/// to the radiance below the normal range included (`tests/blackbody_edges.rs`); for a
/// radiance below the normal range within 5e-13.
/// Reference: Planck's law solved for T (closed form).
pub fn brightness_temperature_wavelength<T: Real>(
    wavelength_m: T,
    spectral_radiance: T,
) -> Result<T> {
    let l = positive(wavelength_m, arg!(0, wavelength_m))?;
    let b = positive(spectral_radiance, arg!(1, spectral_radiance))?;
    finite_result(
        brightness_temperature_wavelength_unchecked(l, b),
        arg!(1, spectral_radiance),
    )
}

#[inline(always)]
pub(crate) fn brightness_temperature_wavelength_unchecked<T: Real>(l: T, b: T) -> T {
    brightness_temperature_wavelength_parts(l, b).0
}

/// The brightness temperature at a wavelength (λ, L > 0 checked by the caller) with the
/// constants it used: (T, c₂/λ, 2hc²/λ⁵), so that a caller that also needs ∂B_λ/∂T at T
/// ([`derivative_at_brightness`](super::measurement::derivative_at_brightness)) forms them once.
#[inline(always)]
pub(crate) fn brightness_temperature_wavelength_parts<T: Real>(l: T, b: T) -> (T, T, T) {
    let (c2_over_l, a) = brightness_constants_wavelength(l);
    let t = match ln1p_quotient_fast(a, b) {
        (v, true) => c2_over_l / v,
        _ => brightness_temperature_outside(l, b, a, c2_over_l, false, || {
            T::c(k::FIRST_RADIATION_RADIANCE).ln() - T::c(5.0) * l.ln()
        }),
    };
    (t, c2_over_l, a)
}

/// θ/ln(1 + a/L) outside the common case of [`ln1p_quotient`] (θ = c₂/λ or hν/k, a = 2hc²/λ⁵ or
/// 2hν³/c²): where a/L < 1 and a or a/L is below the normal range, from exact powers of two
/// ([`brightness_temperature_small_quotient`]); elsewhere θ/[`ln1p_quotient`].
#[cold]
#[inline(never)]
fn brightness_temperature_outside<T: Real>(
    x: T,
    b: T,
    a: T,
    theta: T,
    frequency: bool,
    ln_a: impl Fn() -> T,
) -> T {
    let a_is_normal = a >= T::min_positive_value() && a <= T::max_value();
    match brightness_temperature_small_quotient(x, b, a_is_normal, frequency) {
        Some(t) => t,
        None => theta / ln1p_quotient(a, ln_a, b),
    }
}

/// The two constants of the brightness temperature at one wavelength: c₂/λ (rounded from
/// double length) and a = 2hc²/λ⁵, so that T = (c₂/λ)/ln(1 + a/L).
#[inline(always)]
pub(crate) fn brightness_constants_wavelength<T: Real>(l: T) -> (T, T) {
    let a = T::c(k::FIRST_RADIATION_RADIANCE) / super::kernel::pow5(l);
    let (ch, cl) = T::c2(k::SECOND_RADIATION, k::SECOND_RADIATION_LO);
    let (qh, ql) = dd::div_dd_dd(ch, cl, l, T::zero());
    (qh + ql, a)
}

/// The common case of [`brightness_temperature_wavelength`] as straight-line code, given the
/// constants of [`brightness_constants_wavelength`] and the radiance L: T and whether the
/// arguments are inside that case (where it is the scalar function's result bit for bit).
#[inline(always)]
pub(crate) fn brightness_temperature_wavelength_fast<T: Real>(
    c2_over_l: T,
    a: T,
    radiance: T,
) -> (T, bool) {
    let (v, inside) = ln1p_quotient_fast(a, radiance);
    let t = c2_over_l / v;
    (t, inside & (t <= T::max_value()))
}

/// Brightness temperature at a frequency: T = (hν/k) / ln(1 + 2hν³/(c² L)).
///
/// * `frequency_hz`: Hz, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
///
/// Returns K. Errors: `NonFinite(i)`, `NonPositive(i)`.
/// Accuracy: round trip within 1e-14 relative (`f64`) against mpmath for a normal radiance,
/// 2hν³/c² (ν below about 1e-86 Hz in `f64`) or its ratio to the radiance below the normal
/// range included; for a radiance below the normal range within 5e-13
/// (`tests/blackbody_edges.rs`).
pub fn brightness_temperature_frequency<T: Real>(
    frequency_hz: T,
    spectral_radiance: T,
) -> Result<T> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let b = positive(spectral_radiance, arg!(1, spectral_radiance))?;
    let a = two_h_nu3_over_c2(nu);
    let ln_a = || {
        let s = nu * T::c(super::kernel::SCALE_55);
        T::c(2.0) * s.ln() + (nu * T::c(super::kernel::TWO_H_OVER_C2_SCALED)).ln()
    };
    let (hh, hl) = T::c2(k::PLANCK_OVER_BOLTZMANN, k::PLANCK_OVER_BOLTZMANN_LO);
    let (th, tl) = dd::mul_dd_d(hh, hl, nu);
    let theta = th + tl;
    let t = match ln1p_quotient_fast(a, b) {
        (v, true) => theta / v,
        _ => brightness_temperature_outside(nu, b, a, theta, true, ln_a),
    };
    finite_result(t, arg!(1, spectral_radiance))
}

/// Rayleigh-Jeans temperature: T_RJ = c² L / (2kν²), the temperature the long-wavelength limit
/// of Planck's law assigns to a spectral radiance (the radio astronomer's "brightness
/// temperature"; below the Planck brightness temperature by about hν/2k).
///
/// * `frequency_hz`: Hz, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
///
/// Returns K. Errors: `NonFinite(i)`, `NonPositive(i)` (and `NonFinite(1)` when the result
/// overflows). Accuracy: ≤ 2 ulp (`f64` and `f32`) against mpmath whenever the result is a
/// normal number, subnormal radiances and frequencies included (`tests/data/blackbody.txt`);
/// a subnormal result carries the rounding of its fewer bits.
///
/// Method: ν = 2^m f and L = 2^n g with f, g in [√½, √2) (a subnormal input first scaled up
/// exactly by 2^p), the double-length quotient (c²/2k)·2^-120 · g/f² of numbers near 1, then
/// one exact scaling by 2^(120 + n − 2m) in steps that round at most once. Forming c²L/2k
/// directly lost the bits a subnormal L lacks (3e-12 relative at L = 1.5e-316, where the
/// result 5.4e-308 K is normal).
pub fn rayleigh_jeans_temperature<T: Real>(frequency_hz: T, spectral_radiance: T) -> Result<T> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let b = positive(spectral_radiance, arg!(1, spectral_radiance))?;
    let p = T::MANTISSA_DIGITS as i32;
    let normal = |x: T| -> (T, i32) {
        if x < T::min_positive_value() {
            (x * T::pow2i(p), -p)
        } else {
            (x, 0)
        }
    };
    let (nu_n, nu_shift) = normal(nu);
    let (b_n, b_shift) = normal(b);
    let (f, _, m) = nu_n.split_sqrt2();
    let (g, _, n) = b_n.split_sqrt2();
    let (ch, cl) = T::c2(RJ_CONST_HI, RJ_CONST_LO);
    let (nh, nl) = dd::two_prod(f, f);
    let (ah, al) = dd::mul_dd_d(ch, cl, g);
    let (qh, ql) = dd::div_dd_dd(ah, al, nh, nl);
    // q = qh + ql lies within [2448/2, 2448·4); the scaling moves monotonically towards the
    // result by at most 2^(MAX_EXPONENT − 12) per step, so the steps are exact while they stay
    // in the normal range and only a step into the subnormal range (or overflow) rounds; six
    // steps cover every exponent of either type
    let mut q = qh + ql;
    let mut e = 120 + (n + b_shift) - 2 * (m + nu_shift);
    let step = T::MAX_EXPONENT - 12;
    for _ in 0..6 {
        let k = e.clamp(-step, step);
        q = q * T::pow2i(k);
        e -= k;
    }
    finite_result(q, arg!(1, spectral_radiance))
}

/// ln(eˣ − 1) without overflow.
fn ln_expm1<T: Real>(x: T) -> T {
    if x > T::c(20.0) {
        x + (-(-x).exp()).ln_1p()
    } else {
        x.exp_m1().ln()
    }
}

/// Two-colour (ratio) temperature: the T at which ε₁B_λ(λ₁,T) / (ε₂B_λ(λ₂,T)) equals the
/// measured radiance ratio, with the exact Planck law (not Wien's approximation).
///
/// * `wavelength_1_m`, `wavelength_2_m`: the two wavelengths in m, finite, > 0, different.
/// * `radiance_ratio`: L(λ₁)/L(λ₂), finite and > 0.
/// * `emissivity_ratio`: ε(λ₁)/ε(λ₂), finite and > 0 (1 for a gray body).
///
/// Returns K. Errors: `NonFinite(i)`, `NonPositive(i)`; `OutOfDomain(2)` when the ratio is one
/// no blackbody can produce (for λ₁ < λ₂, B₁/B₂ lies in (0, (λ₂/λ₁)⁴), the upper limit being
/// the Rayleigh-Jeans limit T → ∞); `OutOfDomain(1)` when λ₁ = λ₂; `NoConvergence` (seen only for
/// arguments far outside physical ones, such as subnormal wavelengths).
///
/// Method: safeguarded Newton in u = 1/T on ln(B₁/B₂), which is nearly linear in u, started
/// from the Wien-approximation solution.
/// Accuracy: within 1e-13 relative (`f64`) against mpmath for |x₁ − x₂| ≥ 0.5.
/// Reference: two-colour pyrometry, e.g. DeWitt & Nutter (eds.), Theory and Practice of
/// Radiation Thermometry, Wiley 1988, ch. 6. Cautions as in the module documentation.
pub fn ratio_temperature<T: Real>(
    wavelength_1_m: T,
    wavelength_2_m: T,
    radiance_ratio: T,
    emissivity_ratio: T,
) -> Result<T> {
    let l1 = positive(wavelength_1_m, arg!(0, wavelength_1_m))?;
    let l2 = positive(wavelength_2_m, arg!(1, wavelength_2_m))?;
    let r = positive(radiance_ratio, arg!(2, radiance_ratio))?;
    let e = positive(emissivity_ratio, arg!(3, emissivity_ratio))?;
    if l1 == l2 {
        // two equal wavelengths carry no temperature information
        return Err(Error::OutOfDomain(arg!(1, wavelength_2_m)));
    }
    // target ln(B1/B2) = ln(R/ε)
    let target = r.ln() - e.ln();
    let five_ln = T::c(5.0) * (l2 / l1).ln();
    let four_ln = T::c(4.0) * (l2 / l1).ln();
    // limits: u → 0 gives 4 ln(λ2/λ1); u → ∞ gives −∞ (λ1 < λ2) or +∞ (λ1 > λ2)
    let increasing_in_u_is_down = l1 < l2; // ln ρ decreases with u when λ1 < λ2
    if (increasing_in_u_is_down && target >= four_ln)
        || (!increasing_in_u_is_down && target <= four_ln)
    {
        return Err(Error::OutOfDomain(arg!(2, radiance_ratio)));
    }
    let c2 = T::c(k::SECOND_RADIATION);
    let g = |u: T| {
        let t = T::one() / u;
        let (x1, _) = x_wavelength(l1, t);
        let (x2, _) = x_wavelength(l2, t);
        let v = five_ln + ln_expm1(x2) - ln_expm1(x1) - target;
        let d = (c2 / l2) / super::kernel::one_minus_exp_neg(x2)
            - (c2 / l1) / super::kernel::one_minus_exp_neg(x1);
        (v, d)
    };
    // Wien-approximation start: ln ρ ≈ 5 ln(λ2/λ1) − c2 u (1/λ1 − 1/λ2)
    let slope = c2 * (T::one() / l1 - T::one() / l2);
    let mut u0 = (five_ln - target) / slope;
    if !(u0 > T::zero()) || !u0.is_finite() {
        u0 = T::c(1e-3);
    }
    // g(u) = ln ρ(u) − target is monotone in u: decreasing when λ1 < λ2
    let u =
        roots::solve_monotone_positive(g, u0, !increasing_in_u_is_down, arg!(2, radiance_ratio))?;
    finite_result(T::one() / u, arg!(2, radiance_ratio))
}
