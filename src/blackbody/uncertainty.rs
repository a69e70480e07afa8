//! Uncertainty of inferred temperatures: the result value of every `_with_uncertainty`
//! function, the combined standard uncertainty of the law of propagation of uncertainty
//! (JCGM 100:2008, eqs. 10 and 13), and the sensitivity coefficients of the brightness
//! temperature and of the two-load calibrated temperature.
//!
//! Every sensitivity coefficient is a partial derivative of the inferred temperature with
//! respect to one input, obtained by implicit differentiation of the defining equation with the
//! library's own dB/dT (no finite differences). The combined standard uncertainty is the first
//! order (linear) propagation of the standard uncertainties given by the caller; it covers only
//! those inputs, not the model (emissivity model, size-of-source effect, non-linearity of the
//! detector, drift of the calibration, ...).
//!
//! # Cautions
//! Emissivity and reflections dominate the errors of real radiation thermometry; an uncertainty
//! computed here is only as honest as the standard uncertainties the caller gives it. Fever
//! screening, furnaces, molten metal and fire safety follow the applicable standards, local
//! codes and licensed practice.
//!
//! Reference: JCGM 100:2008, Evaluation of measurement data — Guide to the expression of
//! uncertainty in measurement (GUM), §5.1.2 eq. (10), §5.2.2 eq. (13).

use super::measurement::{Frequency, Quantity, Wavelength};
use super::microwave::thermodynamic_to_rayleigh_jeans_factor;
use super::{calibrated_temperature, two_load_calibration};
use crate::arg;
use crate::check::{finite, finite_result, non_negative, positive};
use crate::{Arg, Error, Real, Result};

/// The number of sensitivity coefficients a [`TemperatureUncertainty`] can hold.
pub const SENSITIVITY_CAPACITY: usize = 5;

/// An inferred temperature with its combined standard uncertainty and its sensitivity
/// coefficients: the result of every `_with_uncertainty` function. A plain value
/// (`#[repr(C)]`, no `Option`, enum or `bool`), mirrored by a struct in C and a derived type in
/// Fortran.
///
/// `sensitivity_coefficients[i]` is ∂T/∂xᵢ for the i-th uncertain input of the function that
/// produced the value, in the order its documentation gives (for the measurement equation:
/// signal, emissivity, reflected temperature, path transmittance, path temperature), in K per
/// unit of that input; the first `inputs` entries are used, the others are 0.
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct TemperatureUncertainty<T> {
    /// The inferred temperature, K.
    pub temperature_k: T,
    /// Combined standard uncertainty u_c(T), K (JCGM 100:2008 eq. 10, uncorrelated inputs).
    pub combined_standard_uncertainty_k: T,
    /// ∂T/∂xᵢ, K per unit of input i; entries at and beyond `inputs` are 0.
    pub sensitivity_coefficients: [T; SENSITIVITY_CAPACITY],
    /// Number of inputs used (1 to [`SENSITIVITY_CAPACITY`]).
    pub inputs: u32,
}

impl<T: Real> TemperatureUncertainty<T> {
    /// Builds the value from the coefficients and standard uncertainties of `n` inputs.
    pub(crate) fn from_parts(
        temperature_k: T,
        coefficients: [T; SENSITIVITY_CAPACITY],
        uncertainties: [T; SENSITIVITY_CAPACITY],
        n: usize,
        result_arg: Arg,
    ) -> Result<Self> {
        let mut c = [T::zero(); SENSITIVITY_CAPACITY];
        for (d, s) in c.iter_mut().zip(coefficients.iter()).take(n) {
            *d = finite_result(*s, result_arg)?;
        }
        let u = root_sum_of_squares(&c, &uncertainties, result_arg)?;
        Ok(Self {
            temperature_k: finite_result(temperature_k, result_arg)?,
            combined_standard_uncertainty_k: u,
            sensitivity_coefficients: c,
            inputs: n as u32,
        })
    }
}

/// (Σ (cᵢuᵢ)²)^½ over the common length: the plain sum where it is safe
/// ([`sum_of_squares_is_safe`]), otherwise scaled by the largest |cᵢuᵢ| so that no square
/// overflows or underflows early (in `f32` the products span many decades).
fn root_sum_of_squares<T: Real>(c: &[T], u: &[T], result_arg: Arg) -> Result<T> {
    let mut s = T::zero();
    for (&ci, &ui) in c.iter().zip(u.iter()) {
        let y = ci * ui;
        s = s + y * y;
    }
    if sum_of_squares_is_safe(s) {
        return Ok(s.sqrt());
    }
    root_sum_of_squares_scaled(c, u, result_arg)
}

/// Whether the plain sum of squares s = Σ (cᵢuᵢ)² (in order) may be used as it is: no term
/// overflowed and a term that underflowed lies below ε·s (s ≥ MIN/ε). Then √s is u_c with the
/// roundings of the n products, n squares and n − 1 additions and the square root only.
#[inline(always)]
pub(crate) fn sum_of_squares_is_safe<T: Real>(s: T) -> bool {
    (s >= T::min_positive_value() / T::epsilon()) & (s <= T::max_value())
}

/// u_c by squares scaled by the largest |cᵢuᵢ| (no overflow or underflow of the squares).
#[cold]
#[inline(never)]
fn root_sum_of_squares_scaled<T: Real>(c: &[T], u: &[T], result_arg: Arg) -> Result<T> {
    let mut m = T::zero();
    for (&ci, &ui) in c.iter().zip(u.iter()) {
        m = m.max((ci * ui).abs());
    }
    let m = finite_result(m, result_arg)?;
    if m == T::zero() {
        return Ok(T::zero());
    }
    let mut s = T::zero();
    for (&ci, &ui) in c.iter().zip(u.iter()) {
        let y = (ci * ui) / m;
        s = s + y * y;
    }
    finite_result(m * s.sqrt(), result_arg)
}

/// Checks sensitivity coefficients (finite) and standard uncertainties (finite, ≥ 0) of the
/// same length.
fn check_coefficients<T: Real>(c: &[T], u: &[T]) -> Result<()> {
    if u.len() != c.len() {
        return Err(Error::LengthMismatch(arg!(1, standard_uncertainties)));
    }
    for &ci in c {
        finite(ci, arg!(0, sensitivity_coefficients))?;
    }
    for &ui in u {
        non_negative(ui, arg!(1, standard_uncertainties))?;
    }
    Ok(())
}

/// Combined standard uncertainty of uncorrelated inputs,
/// u_c = (Σᵢ cᵢ² u(xᵢ)²)^½ (JCGM 100:2008 eq. 10 with cᵢ = ∂f/∂xᵢ).
///
/// * `sensitivity_coefficients`: cᵢ, finite (for example the first `inputs` entries of a
///   [`TemperatureUncertainty`]), in K per unit of input i.
/// * `standard_uncertainties`: u(xᵢ), finite and ≥ 0, in the unit of input i; same length.
///
/// Returns u_c in K (≥ 0; 0 for empty slices). Errors: `NonFinite(0|1)`, `Negative(1)`,
/// `LengthMismatch(1)`; `OutOfDomain(0)` when a product cᵢu(xᵢ) or the result overflows.
///
/// Accuracy: within 2(n + 2) ε relative (a scaled sum of n squares and one square root).
/// Reference: JCGM 100:2008 (GUM), §5.1.2, eq. (10).
pub fn combined_standard_uncertainty<T: Real>(
    sensitivity_coefficients: &[T],
    standard_uncertainties: &[T],
) -> Result<T> {
    check_coefficients(sensitivity_coefficients, standard_uncertainties)?;
    root_sum_of_squares(
        sensitivity_coefficients,
        standard_uncertainties,
        arg!(0, sensitivity_coefficients),
    )
}

/// Combined standard uncertainty of correlated inputs,
/// u_c² = Σᵢ Σⱼ cᵢ cⱼ u(xᵢ) u(xⱼ) r(xᵢ, xⱼ) (JCGM 100:2008 eq. 13 written with the correlation
/// coefficients r of eq. 14; the double sum over i, j equals the form of eq. 16).
///
/// * `sensitivity_coefficients`: cᵢ, n finite values, in K per unit of input i.
/// * `standard_uncertainties`: u(xᵢ), n finite values ≥ 0.
/// * `correlation`: the n × n correlation matrix r, row-major (r[i·n + j] = r(xᵢ, xⱼ)), a caller
///   slice (a fixed-size array coerces to it): finite, |rᵢⱼ| ≤ 1, rᵢᵢ = 1, symmetric.
///
/// Returns u_c in K, ≥ 0. Errors: as [`combined_standard_uncertainty`]; `LengthMismatch(2)` when
/// the matrix does not hold n² values; `NonFinite(2)`; `OutOfDomain(2)` when it is not a
/// correlation matrix (an entry beyond ±1, a diagonal entry other than 1, rᵢⱼ ≠ rⱼᵢ), or when
/// the quadratic form is negative beyond its rounding error (4 n² ε of the sum of the absolute
/// values of its terms): the matrix is then not positive semi-definite. A form that is negative
/// only by rounding (exactly compensating, fully correlated inputs) gives 0.
///
/// Accuracy: within (4n² + 4) ε of the sum of the absolute values of the terms, relative to
/// u_c²; for r = identity this function gives [`combined_standard_uncertainty`] to a few ulp.
/// Reference: JCGM 100:2008 (GUM), §5.2.2, eqs. (13), (14) and (16).
pub fn combined_standard_uncertainty_correlated<T: Real>(
    sensitivity_coefficients: &[T],
    standard_uncertainties: &[T],
    correlation: &[T],
) -> Result<T> {
    let c = sensitivity_coefficients;
    let u = standard_uncertainties;
    check_coefficients(c, u)?;
    let n = c.len();
    if n.checked_mul(n) != Some(correlation.len()) {
        return Err(Error::LengthMismatch(arg!(2, correlation)));
    }
    for &r in correlation {
        let r = finite(r, arg!(2, correlation))?;
        if r.abs() > T::one() {
            return Err(Error::OutOfDomain(arg!(2, correlation)));
        }
    }
    for i in 0..n {
        for j in 0..n {
            let rij = correlation.get(i * n + j).copied();
            let rji = correlation.get(j * n + i).copied();
            let ok = if i == j {
                rij == Some(T::one())
            } else {
                rij == rji
            };
            if !ok {
                return Err(Error::OutOfDomain(arg!(2, correlation)));
            }
        }
    }
    // scale by the largest |cᵢuᵢ| as in eq. 10
    let mut m = T::zero();
    for (&ci, &ui) in c.iter().zip(u.iter()) {
        m = m.max((ci * ui).abs());
    }
    let m = finite_result(m, arg!(0, sensitivity_coefficients))?;
    if m == T::zero() {
        return Ok(T::zero());
    }
    let mut sum = T::zero();
    let mut size = T::zero();
    for (i, (&ci, &ui)) in c.iter().zip(u.iter()).enumerate() {
        let yi = (ci * ui) / m;
        for (j, (&cj, &uj)) in c.iter().zip(u.iter()).enumerate() {
            let yj = (cj * uj) / m;
            let r = correlation.get(i * n + j).copied().unwrap_or(T::zero());
            let term = yi * yj * r;
            sum = sum + term;
            size = size + term.abs();
        }
    }
    if sum < T::zero() {
        let n2 = T::c((n * n) as f64);
        if -sum > T::c(4.0) * n2 * T::epsilon() * size {
            return Err(Error::OutOfDomain(arg!(2, correlation)));
        }
        return Ok(T::zero());
    }
    finite_result(m * sum.sqrt(), arg!(0, sensitivity_coefficients))
}

/// Brightness temperature at a wavelength with its uncertainty: T from
/// [`brightness_temperature_wavelength`](super::brightness_temperature_wavelength) (the same bits) and the sensitivity coefficient
/// ∂T/∂L = 1/(∂B_λ/∂T) (Planck's law differentiated implicitly; ∂B_λ/∂T at T in closed form
/// from L: with B = a/(eˣ − 1), eˣ − 1 = a/L at the solution, so ∂B_λ/∂T = (x/T)·L·(1 + L/a),
/// the value [`radiance_temperature_derivative_wavelength`](super::radiance_temperature_derivative_wavelength) gives at T, without an exponential).
///
/// * `wavelength_m`: m, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ m⁻¹, finite and > 0.
/// * `spectral_radiance_uncertainty`: standard uncertainty u(L), same unit, finite and ≥ 0.
///
/// Returns a [`TemperatureUncertainty`] with `inputs` = 1, coefficient 0 = ∂T/∂L in
/// K per (W m⁻² sr⁻¹ m⁻¹), u_c = |∂T/∂L| u(L). Errors: those of
/// [`brightness_temperature_wavelength`](super::brightness_temperature_wavelength); `NonFinite(2)`, `Negative(2)`; `OutOfDomain(1)` when
/// dB/dT at T is not a positive normal number (radiances far outside thermal ones).
///
/// Accuracy: temperature as [`brightness_temperature_wavelength`](super::brightness_temperature_wavelength); coefficient within 1e-12
/// relative (`f64`) against mpmath (`tests/data/thermometry.txt`). Reference: JCGM 100:2008
/// eq. 10 with the implicit derivative of Planck's law.
pub fn brightness_temperature_wavelength_with_uncertainty<T: Real>(
    wavelength_m: T,
    spectral_radiance: T,
    spectral_radiance_uncertainty: T,
) -> Result<TemperatureUncertainty<T>> {
    let l = positive(wavelength_m, arg!(0, wavelength_m))?;
    let (t, d) = Wavelength(l).temperature_and_derivative(spectral_radiance)?;
    let u = non_negative(
        spectral_radiance_uncertainty,
        arg!(2, spectral_radiance_uncertainty),
    )?;
    single_input(
        t,
        d.map_err(|_| Error::OutOfDomain(arg!(1, spectral_radiance)))?,
        u,
    )
}

/// Brightness temperature at a frequency with its uncertainty: T from
/// [`brightness_temperature_frequency`](super::brightness_temperature_frequency) (the same bits) and ∂T/∂L = 1/(∂B_ν/∂T), ∂B_ν/∂T at T
/// in closed form from L as for the wavelength form (the value of
/// [`radiance_temperature_derivative_frequency`](super::radiance_temperature_derivative_frequency) at T).
///
/// * `frequency_hz`: Hz, finite and > 0.
/// * `spectral_radiance`: L in W m⁻² sr⁻¹ Hz⁻¹, finite and > 0.
/// * `spectral_radiance_uncertainty`: u(L), same unit, finite and ≥ 0.
///
/// Returns a [`TemperatureUncertainty`] with `inputs` = 1 (coefficient 0 = ∂T/∂L in
/// K per W m⁻² sr⁻¹ Hz⁻¹). Errors as [`brightness_temperature_wavelength_with_uncertainty`].
/// Accuracy: coefficient within 1e-12 relative (`f64`) against mpmath. Reference: JCGM 100:2008
/// eq. 10.
pub fn brightness_temperature_frequency_with_uncertainty<T: Real>(
    frequency_hz: T,
    spectral_radiance: T,
    spectral_radiance_uncertainty: T,
) -> Result<TemperatureUncertainty<T>> {
    let (t, d) = Frequency(frequency_hz).temperature_and_derivative(spectral_radiance)?;
    let u = non_negative(
        spectral_radiance_uncertainty,
        arg!(2, spectral_radiance_uncertainty),
    )?;
    single_input(
        t,
        d.map_err(|_| Error::OutOfDomain(arg!(1, spectral_radiance)))?,
        u,
    )
}

fn single_input<T: Real>(t: T, d: T, u: T) -> Result<TemperatureUncertainty<T>> {
    if !(d >= T::min_positive_value()) {
        return Err(Error::OutOfDomain(arg!(1, spectral_radiance)));
    }
    let mut c = [T::zero(); SENSITIVITY_CAPACITY];
    let mut us = [T::zero(); SENSITIVITY_CAPACITY];
    if let (Some(c0), Some(u0)) = (c.first_mut(), us.first_mut()) {
        *c0 = T::one() / d;
        *u0 = u;
    }
    TemperatureUncertainty::from_parts(t, c, us, 1, arg!(1, spectral_radiance))
}

/// Two-load calibrated temperature with its uncertainty: T from [`two_load_calibration`] and
/// [`calibrated_temperature`] (the same bits), and its sensitivity to the three readings and
/// the two load temperatures.
///
/// With J(T) the Rayleigh-Jeans brightness temperature (hν/k)/(e^(hν/kT) − 1),
/// w = (r − r_c)/(r_h − r_c) and the scene J = J(T_c) + w (J(T_h) − J(T_c)), implicit
/// differentiation of J(T) = J gives, with J′ = dJ/dT = x²eˣ/(eˣ − 1)²
/// ([`thermodynamic_to_rayleigh_jeans_factor`]) and g the gain:
/// ∂T/∂r_h = −w/(g J′(T)), ∂T/∂T_h = w J′(T_h)/J′(T), ∂T/∂r_c = −(1 − w)/(g J′(T)),
/// ∂T/∂T_c = (1 − w) J′(T_c)/J′(T), ∂T/∂r = 1/(g J′(T)).
///
/// * `frequency_hz`, `reading_hot`, `temperature_hot_k`, `reading_cold`, `temperature_cold_k`:
///   as [`two_load_calibration`] (arguments 0 to 4).
/// * `reading`: the scene reading, as [`calibrated_temperature`] (argument 5).
/// * `reading_hot_uncertainty`, `temperature_hot_uncertainty_k`, `reading_cold_uncertainty`,
///   `temperature_cold_uncertainty_k`, `reading_uncertainty`: standard uncertainties of the
///   five inputs, finite and ≥ 0 (arguments 6 to 10), in reading units or K.
///
/// Returns a [`TemperatureUncertainty`] with `inputs` = 5 and the coefficients in the order
/// (reading_hot, temperature_hot, reading_cold, temperature_cold, reading), in K per reading
/// unit or K/K. Errors: those of [`two_load_calibration`] and [`calibrated_temperature`]
/// (`OutOfDomain(5)` for a reading no blackbody gives, `DegenerateCalibration(1)` for a gain
/// that underflows to 0); `NonFinite(i)`, `Negative(i)` for
/// i = 6…10; `OutOfDomain(5)` when J′(T) is not a positive normal number.
///
/// Accuracy: temperature as [`calibrated_temperature`]; coefficients within 1e-12 relative
/// (`f64`) against mpmath (`tests/data/thermometry.txt`). Reference: JCGM 100:2008 eq. 10;
/// the calibration line as in [`two_load_calibration`].
#[allow(clippy::too_many_arguments)]
pub fn calibrated_temperature_with_uncertainty<T: Real>(
    frequency_hz: T,
    reading_hot: T,
    temperature_hot_k: T,
    reading_cold: T,
    temperature_cold_k: T,
    reading: T,
    reading_hot_uncertainty: T,
    temperature_hot_uncertainty_k: T,
    reading_cold_uncertainty: T,
    temperature_cold_uncertainty_k: T,
    reading_uncertainty: T,
) -> Result<TemperatureUncertainty<T>> {
    let cal = two_load_calibration(
        frequency_hz,
        reading_hot,
        temperature_hot_k,
        reading_cold,
        temperature_cold_k,
    )?;
    // the calibration is argument 0 of calibrated_temperature, built here from arguments 0 to 4:
    // a gain that is 0 (the readings' span underflowed against the loads' span) is a degenerate
    // calibration, named by the reading as two_load_calibration names a gain it cannot form
    let t = calibrated_temperature(&cal, reading).map_err(|e| match e {
        Error::NonFinite(_) => Error::NonFinite(arg!(5, reading)),
        Error::OutOfDomain(_) => Error::OutOfDomain(arg!(5, reading)),
        Error::DegenerateCalibration(_) => Error::DegenerateCalibration(arg!(1, reading_hot)),
        other => other,
    })?;
    let us = [
        non_negative(reading_hot_uncertainty, arg!(6, reading_hot_uncertainty))?,
        non_negative(
            temperature_hot_uncertainty_k,
            arg!(7, temperature_hot_uncertainty_k),
        )?,
        non_negative(reading_cold_uncertainty, arg!(8, reading_cold_uncertainty))?,
        non_negative(
            temperature_cold_uncertainty_k,
            arg!(9, temperature_cold_uncertainty_k),
        )?,
        non_negative(reading_uncertainty, arg!(10, reading_uncertainty))?,
    ];
    let nu = cal.frequency_hz;
    let domain = |_| Error::OutOfDomain(arg!(5, reading));
    let jt = thermodynamic_to_rayleigh_jeans_factor(nu, t).map_err(domain)?;
    let jh = thermodynamic_to_rayleigh_jeans_factor(nu, temperature_hot_k).map_err(domain)?;
    let jc = thermodynamic_to_rayleigh_jeans_factor(nu, temperature_cold_k).map_err(domain)?;
    if !(jt >= T::min_positive_value()) {
        return Err(Error::OutOfDomain(arg!(5, reading)));
    }
    let span = reading_hot - reading_cold;
    let w = (reading - reading_cold) / span;
    let w_cold = (reading_hot - reading) / span;
    let per_reading = T::one() / (cal.gain * jt);
    let c = [
        -w * per_reading,
        w * jh / jt,
        -w_cold * per_reading,
        w_cold * jc / jt,
        per_reading,
    ];
    TemperatureUncertainty::from_parts(t, c, us, 5, arg!(5, reading))
}
