//! Response-weighted radiance: what a radiometer channel or an infrared thermometer with a
//! tabulated relative spectral response actually measures, and its inverse to temperature.
//!
//! The response r(λ) is given as caller-owned slices of (wavelength, response) points and is
//! linear between them, zero outside. The measured quantity is
//! L_r(T) = ∫ r(λ) B_λ(λ, T) dλ over the table (W m⁻² sr⁻¹ when r is dimensionless), computed
//! segment by segment with the shared adaptive Gauss-Kronrod quadrature.
//!
//! Cautions: a thermometer reading is only as good as its emissivity setting and calibration;
//! see the crate documentation. Defer to the applicable standards and licensed practice where
//! people or plant can be harmed.

use super::kernel::invert_increasing;
use super::planck::{
    radiance_temperature_derivative_wavelength_unchecked, spectral_radiance_wavelength_unchecked,
};
use crate::arg;
use crate::check::{finite_result, positive};
use crate::math::quadrature::integrate;
use crate::{Error, Real, Result};

pub(crate) fn check_table<T: Real>(wavelengths_m: &[T], response: &[T]) -> Result<()> {
    if wavelengths_m.len() < 2 {
        return Err(Error::ArrayTooShort(arg!(0, wavelengths_m)));
    }
    if response.len() != wavelengths_m.len() {
        return Err(Error::LengthMismatch(arg!(1, response)));
    }
    for &l in wavelengths_m {
        positive(l, arg!(0, wavelengths_m))?;
    }
    for &r in response {
        if !r.is_finite() {
            return Err(Error::NonFinite(arg!(1, response)));
        }
        if r < T::zero() {
            return Err(Error::Negative(arg!(1, response)));
        }
    }
    for w in wavelengths_m.windows(2) {
        if let [a, b] = w {
            if b <= a {
                return Err(Error::NotIncreasing(arg!(0, wavelengths_m)));
            }
        }
    }
    Ok(())
}

/// ∫ r(λ) g(λ) dλ over the piecewise-linear response, for g = B_λ or ∂B_λ/∂T.
fn weighted<T: Real, G: Fn(T) -> T>(wavelengths_m: &[T], response: &[T], g: G) -> Result<T> {
    let tol = T::epsilon() * T::c(2.0);
    let mut total = T::zero();
    for (w, r) in wavelengths_m.windows(2).zip(response.windows(2)) {
        if let ([a, b], [ra, rb]) = (w, r) {
            let (a, b, ra, rb) = (*a, *b, *ra, *rb);
            if ra == T::zero() && rb == T::zero() {
                continue;
            }
            // integrate in the local variable u = λ − a, so the quadrature nodes keep their
            // relative precision on narrow segments far from λ = 0 (matters in f32)
            let h = b - a;
            let slope = (rb - ra) / h;
            let part = integrate(
                |u: T| (ra + slope * u) * g(a + u),
                T::zero(),
                h,
                tol,
                T::zero(),
            )?;
            total = total + part;
        }
    }
    Ok(total)
}

/// Response-weighted radiance, L_r = ∫ r(λ) B_λ(λ, T) dλ with r linear between table points.
///
/// * `wavelengths_m`: strictly increasing wavelengths in m, all finite and > 0, at least 2.
/// * `response`: relative spectral response at those wavelengths, finite and ≥ 0, same length.
/// * `temperature_k`: K, finite and > 0.
///
/// Returns W m⁻² sr⁻¹ (times the unit of the response). Errors: `ArrayTooShort(0)`,
/// `LengthMismatch(1)`, `NonFinite(0|1|2)`, `NonPositive(0|2)`, `Negative(1)`,
/// `NotIncreasing(0)`, `NoConvergence` if the quadrature cannot meet its tolerance.
///
/// Accuracy: within 1e-13 relative (`f64`) against mpmath quadrature of the same
/// piecewise-linear integrand (quadrature tolerance 2 ε per segment).
pub fn response_weighted_radiance<T: Real>(
    wavelengths_m: &[T],
    response: &[T],
    temperature_k: T,
) -> Result<T> {
    check_table(wavelengths_m, response)?;
    let t = positive(temperature_k, arg!(2, temperature_k))?;
    let v = weighted(wavelengths_m, response, |l| {
        spectral_radiance_wavelength_unchecked(l, t)
    })?;
    finite_result(v, arg!(2, temperature_k))
}

/// Temperature of the blackbody whose response-weighted radiance equals the given value: the
/// inverse in T of [`response_weighted_radiance`] — what an infrared thermometer or a
/// radiometer channel reports for a blackbody scene.
///
/// * `wavelengths_m`, `response`: the response table, as for [`response_weighted_radiance`].
/// * `radiance`: the measured response-weighted radiance, finite and > 0.
///
/// Returns K. Errors: as [`response_weighted_radiance`], `NonPositive(2)` for radiance ≤ 0,
/// `OutOfDomain(1)` when the response is zero everywhere, `OutOfDomain(2)` when no temperature
/// between about 1e-120 and 1e120 K reproduces the radiance.
///
/// Method: safeguarded Newton on ln L_r(T) with dL_r/dT = ∫ r ∂B_λ/∂T dλ from the same
/// quadrature, started from the brightness temperature at the response centroid.
/// Accuracy: round trip within 1e-14 relative (`f64`) against mpmath root finding.
pub fn temperature_from_response_weighted_radiance<T: Real>(
    wavelengths_m: &[T],
    response: &[T],
    radiance: T,
) -> Result<T> {
    check_table(wavelengths_m, response)?;
    let target = positive(radiance, arg!(2, radiance))?;
    // response area and centroid by the trapezoid rule (exact for the linear response)
    let mut area = T::zero();
    let mut moment = T::zero();
    for (w, r) in wavelengths_m.windows(2).zip(response.windows(2)) {
        if let ([a, b], [ra, rb]) = (w, r) {
            let h = *b - *a;
            area = area + T::c(0.5) * h * (*ra + *rb);
            // ∫ λ r dλ on the segment for linear r: h/6 (ra(2a+b) + rb(a+2b))
            moment = moment + h / T::c(6.0) * (*ra * (*a + *a + *b) + *rb * (*a + *b + *b));
        }
    }
    if !(area > T::zero()) {
        return Err(Error::OutOfDomain(arg!(1, response)));
    }
    let centre = moment / area;
    let guess = super::inverse::brightness_temperature_wavelength_unchecked(centre, target / area);
    let mut failure = None;
    let f = |t: T| {
        let v = weighted(wavelengths_m, response, |l| {
            spectral_radiance_wavelength_unchecked(l, t)
        });
        let d = weighted(wavelengths_m, response, |l| {
            radiance_temperature_derivative_wavelength_unchecked(l, t)
        });
        match (v, d) {
            (Ok(v), Ok(d)) => (v, d),
            (Err(e), _) | (_, Err(e)) => {
                failure = Some(e);
                (T::nan(), T::nan())
            }
        }
    };
    let res = invert_increasing(f, target, guess, arg!(2, radiance));
    match (res, failure) {
        (Ok(t), _) => finite_result(t, arg!(2, radiance)),
        (Err(_), Some(e)) => Err(e),
        (Err(e), None) => Err(e),
    }
}

/// ∫ r(λ) ∂B_λ/∂T dλ for a table checked by [`check_table`] and T > 0: the temperature
/// derivative of [`response_weighted_radiance`], by the same quadrature of the library's dB/dT.
pub(crate) fn response_weighted_derivative_unchecked<T: Real>(
    wavelengths_m: &[T],
    response: &[T],
    t: T,
) -> Result<T> {
    weighted(wavelengths_m, response, |l| {
        radiance_temperature_derivative_wavelength_unchecked(l, t)
    })
}
