//! Two-load (hot/cold) linear calibration of a radiometer.
//!
//! A total-power radiometer's output is linear in the power it receives, and so in the
//! spectral radiance of the scene, which at frequency ν is proportional to the Rayleigh-Jeans
//! brightness temperature J(T) = (hν/k)/(e^(hν/kT) − 1) of a blackbody at physical temperature
//! T. Two blackbody loads at known temperatures give the gain and offset of the line
//! reading = gain·J + offset; a reading then gives J of the scene, and inverting J gives the
//! physical temperature of a blackbody scene. Using J rather than T itself is what keeps the
//! calibration exact when a cold load (liquid nitrogen, 77 K) is observed at millimetre
//! wavelengths, where hν/k is several kelvin (common practice in microwave radiometry; e.g.
//! Ulaby & Long, Microwave Radar and Radiometric Remote Sensing, 2014, ch. 7).
//!
//! Cautions: a calibration is only as good as its loads (their emissivity, temperature
//! uniformity and reflections) and the linearity of the receiver. Defer to the applicable
//! standards and licensed practice where a reading protects people or plant.

use super::kernel::{planck_quotient, x_frequency};
use crate::arg;
use crate::check::{finite, finite_result, positive};
use crate::constants as k;
use crate::{Error, Real, Result};

/// The gain and offset of a two-load calibration at one frequency; a plain value the caller
/// owns. `reading = gain · J + offset`, J the Rayleigh-Jeans brightness temperature in K.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoLoadCalibration<T> {
    /// Channel frequency ν in Hz.
    pub frequency_hz: T,
    /// Gain in reading units per kelvin of Rayleigh-Jeans brightness temperature.
    pub gain: T,
    /// Offset in reading units (the reading for J = 0).
    pub offset: T,
}

fn rj_brightness<T: Real>(nu: T, t: T) -> T {
    let (xh, xl) = x_frequency(nu, t);
    let theta = T::c(k::PLANCK_OVER_BOLTZMANN) * nu;
    planck_quotient(theta, xh, xl)
}

/// Calibrates a radiometer channel from two blackbody loads.
///
/// * `frequency_hz`: channel frequency ν in Hz, finite and > 0.
/// * `reading_hot`: raw reading (any linear unit: counts, volts) while viewing the hot load.
/// * `temperature_hot_k`: physical temperature of the hot load, K, > 0.
/// * `reading_cold`: raw reading while viewing the cold load.
/// * `temperature_cold_k`: physical temperature of the cold load, K, > 0 and below the hot one.
///
/// Returns the [`TwoLoadCalibration`]. Errors: `NonFinite(i)`, `NonPositive(0|2|4)`,
/// `DegenerateCalibration(2)` when T_hot ≤ T_cold (or their brightness temperatures coincide
/// in floating point), `DegenerateCalibration(1)` when the two readings are equal.
///
/// Accuracy: gain and offset to a few ulp of the exact line through the two points.
pub fn two_load_calibration<T: Real>(
    frequency_hz: T,
    reading_hot: T,
    temperature_hot_k: T,
    reading_cold: T,
    temperature_cold_k: T,
) -> Result<TwoLoadCalibration<T>> {
    let nu = positive(frequency_hz, arg!(0, frequency_hz))?;
    let rh = finite(reading_hot, arg!(1, reading_hot))?;
    let th = positive(temperature_hot_k, arg!(2, temperature_hot_k))?;
    let rc = finite(reading_cold, arg!(3, reading_cold))?;
    let tc = positive(temperature_cold_k, arg!(4, temperature_cold_k))?;
    if th <= tc {
        return Err(Error::DegenerateCalibration(arg!(2, temperature_hot_k)));
    }
    if rh == rc {
        return Err(Error::DegenerateCalibration(arg!(1, reading_hot)));
    }
    let jh = rj_brightness(nu, th);
    let jc = rj_brightness(nu, tc);
    let dj = jh - jc;
    if !(dj > T::zero()) {
        return Err(Error::DegenerateCalibration(arg!(2, temperature_hot_k)));
    }
    let gain = (rh - rc) / dj;
    let offset = rh - gain * jh;
    if !gain.is_finite() || !offset.is_finite() {
        return Err(Error::DegenerateCalibration(arg!(1, reading_hot)));
    }
    Ok(TwoLoadCalibration {
        frequency_hz: nu,
        gain,
        offset,
    })
}

fn check_calibration<T: Real>(cal: &TwoLoadCalibration<T>) -> Result<()> {
    positive(cal.frequency_hz, arg!(0, calibration))?;
    finite(cal.offset, arg!(0, calibration))?;
    let g = finite(cal.gain, arg!(0, calibration))?;
    if g == T::zero() {
        return Err(Error::DegenerateCalibration(arg!(0, calibration)));
    }
    Ok(())
}

/// Rayleigh-Jeans brightness temperature of the scene from a raw reading, J = (reading −
/// offset)/gain.
///
/// * `calibration`: from [`two_load_calibration`].
/// * `reading`: raw reading, finite.
///
/// Returns K (may be ≤ 0 for readings below the zero-radiance level, e.g. noise on a cold
/// sky). Errors: `NonFinite(1)`; `NonFinite(0)`, `NonPositive(0)`, `DegenerateCalibration(0)`
/// for a calibration value that [`two_load_calibration`] cannot have produced.
/// Accuracy: within 1e-13 relative (`f64`) against the exact line (mpmath) for readings
/// between and near the loads.
pub fn calibrated_brightness_temperature<T: Real>(
    calibration: &TwoLoadCalibration<T>,
    reading: T,
) -> Result<T> {
    check_calibration(calibration)?;
    let r = finite(reading, arg!(1, reading))?;
    finite_result(
        (r - calibration.offset) / calibration.gain,
        arg!(1, reading),
    )
}

/// Physical temperature of a blackbody scene from a raw reading: J from
/// [`calibrated_brightness_temperature`], then T = (hν/k) / ln(1 + hν/(kJ)).
///
/// * `calibration`: from [`two_load_calibration`].
/// * `reading`: raw reading, finite.
///
/// Returns K, > 0. Errors: as [`calibrated_brightness_temperature`], and `OutOfDomain(1)` when
/// the reading corresponds to J ≤ 0 (no blackbody temperature gives it).
/// Accuracy: within 1e-13 relative (`f64`) against mpmath for readings between and near the
/// loads.
pub fn calibrated_temperature<T: Real>(
    calibration: &TwoLoadCalibration<T>,
    reading: T,
) -> Result<T> {
    let j = calibrated_brightness_temperature(calibration, reading)?;
    if !(j > T::zero()) {
        return Err(Error::OutOfDomain(arg!(1, reading)));
    }
    let theta = T::c(k::PLANCK_OVER_BOLTZMANN) * calibration.frequency_hz;
    finite_result(theta / (theta / j).ln_1p(), arg!(1, reading))
}
