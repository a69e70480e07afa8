//! Planck's law: spectral radiance in energy and photon units per wavelength, frequency and
//! wavenumber, and its temperature derivative.
//!
//! Reference: M. Planck, "Ueber das Gesetz der Energieverteilung im Normalspectrum", Ann.
//! Phys. 309 (1901) 553; the forms below are those of any radiometry text (e.g. Modest,
//! Radiative Heat Transfer, 3rd ed. 2013, ch. 1). Constants are the exact SI 2019 h, c, k.
//!
//! Accuracy (all forms; measured against mpmath at 50 digits over x = 1e-10 … 1e3 and
//! T = 1 … 1e6 K, `tests/data/blackbody.txt`): within 4 ulp in `f64` wherever the result is a
//! normal double; within 4 `f32` ulp in `f32` for wavelengths 2e-7 … 1e-1 m, frequencies
//! 1e9 … 3e14 Hz and wavenumbers 1e2 … 5e6 m⁻¹. Results below the smallest normal float are
//! returned as the correctly scaled subnormal or 0, never as garbage.

use super::kernel::{
    TWO_C, TWO_OVER_C2, inverse_temperature, one_minus_exp_neg, planck_frequency_scaled,
    planck_quotient, planck_quotient_fast, planck_ratio, planck_ratio_fast,
    planck_wavelength_scaled, pow5, two_h_nu3_over_c2, x_frequency, x_frequency_pair,
    x_frequency_pair_with_inverse, x_wavelength, x_wavelength_pair, x_wavenumber_pair,
    x_wavenumber_pair_with_inverse,
};
use crate::arg;
use crate::array::blockwise;
use crate::check::{finite_result, positive};
use crate::constants as k;
use crate::math::exp;
use crate::{ArrayResult, Real, Result};

/// Planck spectral radiance per unit wavelength, B_λ = 2hc²/λ⁵ / (e^(hc/λkT) − 1).
///
/// * `wavelength_m`: wavelength λ in m, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ m⁻¹, ≥ 0 (0 only where the true value is below the smallest subnormal).
///
/// Errors: `NonFinite(i)` for NaN or ±∞, `NonPositive(i)` for ≤ 0, i the position of the
/// argument the error names.
///
/// Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath; see the module documentation.
pub fn spectral_radiance_wavelength<T: Real>(wavelength_m: T, temperature_k: T) -> Result<T> {
    let l = positive(wavelength_m, arg!(0, wavelength_m))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    finite_result(
        spectral_radiance_wavelength_unchecked(l, t),
        arg!(0, wavelength_m),
    )
}

#[inline(always)]
pub(crate) fn spectral_radiance_wavelength_unchecked<T: Real>(l: T, t: T) -> T {
    let (xh, xl) = x_wavelength_pair(l, t);
    let l5 = pow5(l);
    if l5 > T::max_value() || xh < T::min_positive_value() {
        return planck_wavelength_scaled(l, t, xh, xl);
    }
    planck_ratio(T::c(k::FIRST_RADIATION_RADIANCE), l5, xh, xl)
}

/// [`spectral_radiance_wavelength`] over many wavelengths at one temperature:
/// `out[i] = spectral_radiance_wavelength(wavelengths_m[i], temperature_k)`, bit for bit.
///
/// * `wavelengths_m`: wavelengths λ in m, each finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: the results, B_λ in W m⁻² sr⁻¹ m⁻¹; the same length as `wavelengths_m`.
///
/// Returns `Ok(())` when every element succeeded. Otherwise the failing elements are NaN, the
/// others are computed, and the error names the first failing index and the scalar function's
/// error (`NonFinite(0)`, `NonPositive(0)`, or `(1)` for the temperature);
/// `LengthMismatch(2)` when `out` has another length (then `out` is all NaN).
///
/// Accuracy: that of the scalar function (≤ 4 ulp in `f64`). Method: the elements are taken in
/// blocks of 64 by a branch-free form of the same operations, which the compiler vectorises;
/// a block holding an element outside the common case (bad input, x beyond ln MAX − 1, a
/// result that is not a normal number) is recomputed by the scalar function.
#[inline(always)]
pub fn spectral_radiance_wavelength_array<T: Real>(
    wavelengths_m: &[T],
    temperature_k: T,
    out: &mut [T],
) -> ArrayResult {
    let num = T::c(k::FIRST_RADIATION_RADIANCE);
    planck_array(
        wavelengths_m,
        temperature_k,
        out,
        |t| {
            Some(move |l| {
                let (xh, xl) = x_wavelength_pair(l, t);
                let (b, inside) = planck_ratio_fast(num, pow5(l), xh, xl);
                // an x below the normal range takes the scalar path
                (b, inside & (xh >= T::min_positive_value()))
            })
        },
        spectral_radiance_wavelength,
    )
}

/// The array form of a Planck function f(x, T): `fast_at(T)` gives, for a valid T, the
/// branch-free form of the common case (or `None` where there is none, then every element
/// takes the scalar path); `scalar` is the function itself. Elements must be finite and
/// positive and the result finite, as the scalar function requires; an invalid temperature
/// fails every element with the scalar function's error (its own argument checked first).
#[inline(always)]
fn planck_array<T: Real, F: Fn(T) -> (T, bool)>(
    x: &[T],
    temperature_k: T,
    out: &mut [T],
    fast_at: impl FnOnce(T) -> Option<F>,
    scalar: impl Fn(T, T) -> Result<T>,
) -> ArrayResult {
    let Ok(t) = positive(temperature_k, arg!(1, temperature_k)) else {
        return blockwise(
            x,
            out,
            arg!(2, out),
            |_| (T::nan(), false),
            |v| scalar(v, temperature_k),
        );
    };
    match fast_at(t) {
        Some(fast) => blockwise(
            x,
            out,
            arg!(2, out),
            |v| {
                let (b, inside) = fast(v);
                let valid = (v > T::zero()) & (v <= T::max_value()) & (b <= T::max_value());
                (b, inside & valid)
            },
            |v| scalar(v, t),
        ),
        None => blockwise(
            x,
            out,
            arg!(2, out),
            |_| (T::nan(), false),
            |v| scalar(v, t),
        ),
    }
}

/// Planck spectral radiance per unit frequency, B_ν = (2hν³/c²) / (e^(hν/kT) − 1).
///
/// * `frequency_hz`: frequency ν in Hz, finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ Hz⁻¹, ≥ 0. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath.
pub fn spectral_radiance_frequency<T: Real>(frequency_hz: T, temperature_k: T) -> Result<T> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    finite_result(
        spectral_radiance_frequency_unchecked(nu, t),
        arg!(0, frequency_hz),
    )
}

#[inline(always)]
pub(crate) fn spectral_radiance_frequency_unchecked<T: Real>(nu: T, t: T) -> T {
    let (xh, xl) = x_frequency_pair(nu, t);
    let p = two_h_nu3_over_c2(nu);
    if p < T::min_positive_value() || xh < T::min_positive_value() {
        return planck_frequency_scaled(nu, t, xh, xl);
    }
    planck_quotient(p, xh, xl)
}

/// Planck spectral radiance per unit wavenumber, B_ṽ = 2hc²ṽ³ / (e^(hcṽ/kT) − 1).
///
/// * `wavenumber_per_m`: wavenumber ṽ = 1/λ in m⁻¹ (not cm⁻¹), finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ per m⁻¹ (that is W m⁻¹ sr⁻¹), ≥ 0. Errors as
/// [`spectral_radiance_wavelength`]. Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath.
pub fn spectral_radiance_wavenumber<T: Real>(wavenumber_per_m: T, temperature_k: T) -> Result<T> {
    let v = positive(wavenumber_per_m, arg!(0, wavenumber_per_m))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    let (xh, xl) = x_wavenumber_pair(v, t);
    finite_result(
        planck_quotient(wavenumber_prefactor(v), xh, xl),
        arg!(0, wavenumber_per_m),
    )
}

/// 2hc²ṽ³, by products.
#[inline(always)]
fn wavenumber_prefactor<T: Real>(v: T) -> T {
    ((T::c(k::FIRST_RADIATION_RADIANCE) * v) * v) * v
}

/// [`spectral_radiance_frequency`] over many frequencies at one temperature:
/// `out[i] = spectral_radiance_frequency(frequencies_hz[i], temperature_k)`, bit for bit.
///
/// * `frequencies_hz`: frequencies ν in Hz, each finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: the results, B_ν in W m⁻² sr⁻¹ Hz⁻¹; the same length as `frequencies_hz`.
///
/// Returns and errors as [`spectral_radiance_wavelength_array`]. Accuracy: that of the scalar
/// function. Method as [`spectral_radiance_wavelength_array`].
#[inline(always)]
pub fn spectral_radiance_frequency_array<T: Real>(
    frequencies_hz: &[T],
    temperature_k: T,
    out: &mut [T],
) -> ArrayResult {
    planck_array(
        frequencies_hz,
        temperature_k,
        out,
        |t| {
            inverse_temperature(t).map(|inv| {
                move |nu| {
                    let (xh, xl) = x_frequency_pair_with_inverse(nu, t, inv);
                    let p = two_h_nu3_over_c2(nu);
                    let (b, inside) = planck_quotient_fast(p, xh, xl);
                    // a prefactor or an x below the normal range takes the scalar path
                    let tiny = T::min_positive_value();
                    (b, inside & (p >= tiny) & (xh >= tiny))
                }
            })
        },
        spectral_radiance_frequency,
    )
}

/// [`spectral_radiance_wavenumber`] over many wavenumbers at one temperature:
/// `out[i] = spectral_radiance_wavenumber(wavenumbers_per_m[i], temperature_k)`, bit for bit.
///
/// * `wavenumbers_per_m`: wavenumbers ṽ in m⁻¹, each finite and > 0.
/// * `temperature_k`: temperature T in K, finite and > 0 (when it is not, every element fails).
/// * `out`: the results, B_ṽ in W m⁻² sr⁻¹ per m⁻¹; the same length as `wavenumbers_per_m`.
///
/// Returns and errors as [`spectral_radiance_wavelength_array`]. Accuracy: that of the scalar
/// function. Method as [`spectral_radiance_wavelength_array`].
#[inline(always)]
pub fn spectral_radiance_wavenumber_array<T: Real>(
    wavenumbers_per_m: &[T],
    temperature_k: T,
    out: &mut [T],
) -> ArrayResult {
    planck_array(
        wavenumbers_per_m,
        temperature_k,
        out,
        |t| {
            inverse_temperature(t).map(|inv| {
                move |v| {
                    let (xh, xl) = x_wavenumber_pair_with_inverse(v, t, inv);
                    planck_quotient_fast(wavenumber_prefactor(v), xh, xl)
                }
            })
        },
        spectral_radiance_wavenumber,
    )
}

/// Photon spectral radiance per unit wavelength, N_λ = B_λ/(hc/λ) = (2c/λ⁴) / (e^x − 1).
///
/// * `wavelength_m`: m, > 0; `temperature_k`: K, > 0.
///
/// Returns photons s⁻¹ m⁻² sr⁻¹ m⁻¹. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath.
pub fn photon_radiance_wavelength<T: Real>(wavelength_m: T, temperature_k: T) -> Result<T> {
    let l = positive(wavelength_m, arg!(0, wavelength_m))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    let (xh, xl) = x_wavelength_pair(l, t);
    let l2 = l * l;
    finite_result(
        planck_ratio(T::c(TWO_C), l2 * l2, xh, xl),
        arg!(0, wavelength_m),
    )
}

/// Photon spectral radiance per unit frequency, N_ν = B_ν/(hν) = (2ν²/c²) / (e^(hν/kT) − 1).
///
/// * `frequency_hz`: Hz, > 0; `temperature_k`: K, > 0.
///
/// Returns photons s⁻¹ m⁻² sr⁻¹ Hz⁻¹. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath.
pub fn photon_radiance_frequency<T: Real>(frequency_hz: T, temperature_k: T) -> Result<T> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    let (xh, xl) = x_frequency_pair(nu, t);
    let p = (T::c(TWO_OVER_C2) * nu) * nu;
    finite_result(planck_quotient(p, xh, xl), arg!(0, frequency_hz))
}

/// Photon spectral radiance per unit wavenumber, N_ṽ = 2cṽ² / (e^(hcṽ/kT) − 1).
///
/// * `wavenumber_per_m`: m⁻¹, > 0; `temperature_k`: K, > 0.
///
/// Returns photons s⁻¹ m⁻² sr⁻¹ per m⁻¹. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 4 ulp (`f64`, normal results) against mpmath.
pub fn photon_radiance_wavenumber<T: Real>(wavenumber_per_m: T, temperature_k: T) -> Result<T> {
    let v = positive(wavenumber_per_m, arg!(0, wavenumber_per_m))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    let (xh, xl) = x_wavenumber_pair(v, t);
    let p = (T::c(TWO_C) * v) * v;
    finite_result(planck_quotient(p, xh, xl), arg!(0, wavenumber_per_m))
}

/// Temperature derivative of B_λ: ∂B_λ/∂T = B_λ · (x/T) / (1 − e^−x), x = hc/(λkT).
///
/// * `wavelength_m`: m, > 0; `temperature_k`: K, > 0.
///
/// Returns W m⁻² sr⁻¹ m⁻¹ K⁻¹, ≥ 0. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 8 ulp (`f64`, normal results) against mpmath (five roundings more than B_λ).
/// Method: B_λ·x(1 + E)/(T E) with E = e^x − 1, the one exponential B_λ needs (the
/// overflow-safe form B_λ·(x/T)/(1 − e^−x) where an intermediate is not a normal number).
pub fn radiance_temperature_derivative_wavelength<T: Real>(
    wavelength_m: T,
    temperature_k: T,
) -> Result<T> {
    let l = positive(wavelength_m, arg!(0, wavelength_m))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    finite_result(
        radiance_temperature_derivative_wavelength_unchecked(l, t),
        arg!(0, wavelength_m),
    )
}

#[inline(always)]
pub(crate) fn radiance_temperature_derivative_wavelength_unchecked<T: Real>(l: T, t: T) -> T {
    radiance_and_derivative_wavelength_unchecked(l, t).1
}

/// B_λ and ∂B_λ/∂T at one (λ, T) from one exponent and one e^x − 1: B_λ the bits of
/// [`spectral_radiance_wavelength`], ∂B_λ/∂T those of
/// [`radiance_temperature_derivative_wavelength`] (λ, T > 0 checked by the caller).
#[inline(always)]
pub(crate) fn radiance_and_derivative_wavelength_unchecked<T: Real>(l: T, t: T) -> (T, T) {
    match radiance_and_derivative_wavelength_fast(l, t) {
        (b, d, true) => (b, d),
        _ => (
            spectral_radiance_wavelength_unchecked(l, t),
            derivative_wavelength_outside(l, t),
        ),
    }
}

/// The common case of [`radiance_and_derivative_wavelength_unchecked`] as straight-line code:
/// with E = e^x − 1 (the one exponential), B = (2hc²/λ⁵)/E as in [`planck_ratio_fast`] and
/// ∂B/∂T = B·x·(1 + E)/(T·E) (that is B (x/T) eˣ/(eˣ − 1), five roundings more than B), and
/// whether every intermediate stays a normal number (x < ln MAX − 1); outside, garbage.
#[inline(always)]
pub(crate) fn radiance_and_derivative_wavelength_fast<T: Real>(l: T, t: T) -> (T, T, bool) {
    let (xh, xl) = x_wavelength_pair(l, t);
    let e = exp::exp_m1_nonnegative_in_range(xh, xl);
    let den = pow5(l) * e;
    let b = T::c(k::FIRST_RADIATION_RADIANCE) / den;
    let te = t * e;
    let num = (b * (xh + xl)) * (T::one() + e);
    let d = num / te;
    let normal = |v: T| (v >= T::min_positive_value()) & (v <= T::max_value());
    let inside = (xh < T::LN_MAX - T::one())
        & normal(den)
        & normal(te)
        & normal(b)
        & normal(num)
        & normal(d);
    (b, d, inside)
}

/// ∂B_λ/∂T where [`radiance_and_derivative_wavelength_fast`] is outside its common case (the far
/// Wien tail, results that are not normal numbers).
#[cold]
#[inline(never)]
fn derivative_wavelength_outside<T: Real>(l: T, t: T) -> T {
    let (xh, xl) = x_wavelength(l, t);
    // fold x/(T(1 − e^−x)) into the prefactor so no intermediate underflows before the result
    let p = T::c(k::FIRST_RADIATION_RADIANCE) / pow5(l) * ((xh + xl) / one_minus_exp_neg(xh)) / t;
    planck_quotient(p, xh, xl)
}

/// Temperature derivative of B_ν: ∂B_ν/∂T = B_ν · (x/T) / (1 − e^−x), x = hν/(kT).
///
/// * `frequency_hz`: Hz, > 0; `temperature_k`: K, > 0.
///
/// Returns W m⁻² sr⁻¹ Hz⁻¹ K⁻¹, ≥ 0. Errors as [`spectral_radiance_wavelength`].
/// Accuracy: ≤ 8 ulp (`f64`, normal results) against mpmath.
pub fn radiance_temperature_derivative_frequency<T: Real>(
    frequency_hz: T,
    temperature_k: T,
) -> Result<T> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let t = positive(temperature_k, arg!(1, temperature_k))?;
    let (xh, xl) = x_frequency(nu, t);
    let p = two_h_nu3_over_c2(nu) * ((xh + xl) / one_minus_exp_neg(xh)) / t;
    finite_result(planck_quotient(p, xh, xl), arg!(0, frequency_hz))
}
