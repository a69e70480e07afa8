//! Two-load (hot/cold) linear calibration of a radiometer channel: the calibration struct and
//! its init function, then temperatures from raw readings, in `double` and `float`.
//!
//! The radiometer reading is modelled as `reading = gain · J + offset`, J the Rayleigh-Jeans
//! brightness temperature (hν/k)/(e^(hν/kT) − 1) of a blackbody at physical temperature T; two
//! loads at known temperatures fix gain and offset (common practice in microwave radiometry,
//! e.g. Ulaby & Long, Microwave Radar and Radiometric Remote Sensing, 2014, ch. 7).

use crate::boundary::{Failure, NotANumber, boundary, non_null, put};
use crate::status::status_of_struct_call;
use relicore::blackbody::{self as bb, TwoLoadCalibration};

/// The gain and offset of a two-load calibration at one frequency, filled in by
/// `relicore_two_load_calibration`; a plain value the caller owns (no allocation, no
/// cleanup). `reading = gain · J + offset`, J the Rayleigh-Jeans brightness temperature in K.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct relicore_two_load_calibration {
    /// Channel frequency ν in Hz.
    pub frequency_hz: f64,
    /// Gain in reading units per kelvin of Rayleigh-Jeans brightness temperature.
    pub gain: f64,
    /// Offset in reading units (the reading for J = 0).
    pub offset: f64,
}

/// `float` twin of `struct relicore_two_load_calibration`, filled in by
/// `relicore_two_load_calibration_f32`.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct relicore_two_load_calibration_f32 {
    /// Channel frequency ν in Hz.
    pub frequency_hz: f32,
    /// Gain in reading units per kelvin of Rayleigh-Jeans brightness temperature.
    pub gain: f32,
    /// Offset in reading units (the reading for J = 0).
    pub offset: f32,
}

macro_rules! conversions {
    ($c:ty, $t:ty) => {
        impl NotANumber for $c {
            const NAN: Self = Self {
                frequency_hz: <$t>::NAN,
                gain: <$t>::NAN,
                offset: <$t>::NAN,
            };
        }
        impl From<TwoLoadCalibration<$t>> for $c {
            fn from(c: TwoLoadCalibration<$t>) -> Self {
                Self {
                    frequency_hz: c.frequency_hz,
                    gain: c.gain,
                    offset: c.offset,
                }
            }
        }
        impl From<$c> for TwoLoadCalibration<$t> {
            fn from(c: $c) -> Self {
                Self {
                    frequency_hz: c.frequency_hz,
                    gain: c.gain,
                    offset: c.offset,
                }
            }
        }
    };
}
conversions!(relicore_two_load_calibration, f64);
conversions!(relicore_two_load_calibration_f32, f32);

/// Fills `*out` from the core's two-load calibration (NaN fields on failure).
///
/// # Safety
/// `out` is NULL or valid for one write of `C`.
unsafe fn init<C: NotANumber + From<TwoLoadCalibration<T>>, T>(
    out: *mut C,
    f: impl FnOnce() -> relicore::Result<TwoLoadCalibration<T>>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let c = C::from(f()?);
            // SAFETY: out is non-NULL and writable (caller's contract).
            unsafe { out.write(c) };
            Ok(())
        },
        // SAFETY: out is NULL or writable.
        || unsafe { put(out, C::NAN) },
    )
}

/// Runs `f` on a copy of `*calibration` and writes the result to `*out`; an error the core
/// attributes to the calibration is `RELICORE_ERROR_INVALID_STRUCT`.
///
/// # Safety
/// `calibration` is NULL or valid for one read of `C`; `out` is NULL or valid for one write.
unsafe fn apply<C: Copy, T: NotANumber>(
    calibration: *const C,
    out: *mut T,
    f: impl FnOnce(C) -> relicore::Result<T>,
) -> i32 {
    boundary(
        || {
            non_null(calibration)?;
            non_null(out)?;
            // SAFETY: non-NULL and readable (caller's contract); copied, so `out` may alias it.
            let c = unsafe { calibration.read() };
            let v = f(c).map_err(|e| Failure::Call(status_of_struct_call(e)))?;
            // SAFETY: non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable.
        || unsafe { put(out, T::NAN) },
    )
}

/// Calibrates a radiometer channel from two blackbody loads: fits `reading = gain · J +
/// offset`, J the Rayleigh-Jeans brightness temperature of each load at the channel frequency.
///
/// * `frequency_hz`: channel frequency ν in Hz, finite and > 0.
/// * `reading_hot`: raw reading (any linear unit: counts, volts) while viewing the hot load,
///   finite.
/// * `temperature_hot_k`: physical temperature of the hot load in K, finite and > 0.
/// * `reading_cold`: raw reading while viewing the cold load, finite.
/// * `temperature_cold_k`: physical temperature of the cold load in K, finite, > 0 and below
///   the hot one.
/// * `out`: the calibration (frequency, gain, offset).
///
/// Returns `RELICORE_OK`, or an error code with every field of `*out` set to NaN:
/// `RELICORE_ERROR_NULL_POINTER` when `out` is NULL; `RELICORE_ERROR_NON_FINITE` for a NaN or
/// infinite argument; `RELICORE_ERROR_NON_POSITIVE` for a frequency or temperature ≤ 0;
/// `RELICORE_ERROR_DEGENERATE_CALIBRATION` when T_hot ≤ T_cold (or their brightness
/// temperatures coincide in floating point) or the two readings are equal.
///
/// Accuracy: gain and offset to a few ulp of the exact line through the two points.
///
/// Reference: common practice in microwave radiometry (e.g. Ulaby & Long, Microwave Radar and
/// Radiometric Remote Sensing, 2014, ch. 7). A calibration is only as good as its loads and
/// the linearity of the receiver; defer to the applicable standards where a reading protects
/// people or plant.
///
/// # Safety
/// `out` is NULL or points to a writable `struct relicore_two_load_calibration`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_two_load_calibration(
    frequency_hz: f64,
    reading_hot: f64,
    temperature_hot_k: f64,
    reading_cold: f64,
    temperature_cold_k: f64,
    out: *mut relicore_two_load_calibration,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        init(out, || {
            bb::two_load_calibration(
                frequency_hz,
                reading_hot,
                temperature_hot_k,
                reading_cold,
                temperature_cold_k,
            )
        })
    }
}

/// Physical temperature of a blackbody scene from a raw reading: J = (reading − offset)/gain,
/// then T = (hν/k) / ln(1 + hν/(kJ)).
///
/// * `calibration`: from `relicore_two_load_calibration`.
/// * `reading`: raw reading, finite.
/// * `out`: the temperature T in K, > 0.
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN:
/// `RELICORE_ERROR_NULL_POINTER` when `calibration` or `out` is NULL;
/// `RELICORE_ERROR_NON_FINITE` for a NaN or infinite reading; `RELICORE_ERROR_OUT_OF_DOMAIN`
/// when the reading corresponds to J ≤ 0 (no blackbody temperature gives it);
/// `RELICORE_ERROR_INVALID_STRUCT` for a calibration that `relicore_two_load_calibration`
/// cannot have produced (non-finite fields, frequency ≤ 0, gain 0).
///
/// Accuracy: within 1e-13 relative against mpmath for readings between and near the loads.
///
/// # Safety
/// `calibration` is NULL or points to a readable `struct relicore_two_load_calibration`; `out`
/// is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_calibrated_temperature(
    calibration: *const relicore_two_load_calibration,
    reading: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        apply(calibration, out, |c| {
            bb::calibrated_temperature(&c.into(), reading)
        })
    }
}

/// Rayleigh-Jeans brightness temperature of the scene from a raw reading, J = (reading −
/// offset)/gain.
///
/// * `calibration`: from `relicore_two_load_calibration`.
/// * `reading`: raw reading, finite.
/// * `out`: J in K (may be ≤ 0 for readings below the zero-radiance level, e.g. noise on a
///   cold sky).
///
/// Returns `RELICORE_OK`, or an error code with `*out` set to NaN:
/// `RELICORE_ERROR_NULL_POINTER` when `calibration` or `out` is NULL;
/// `RELICORE_ERROR_NON_FINITE` for a NaN or infinite reading; `RELICORE_ERROR_INVALID_STRUCT`
/// for a calibration that `relicore_two_load_calibration` cannot have produced.
///
/// Accuracy: within 1e-13 relative against the exact line (mpmath) for readings between and
/// near the loads.
///
/// # Safety
/// `calibration` is NULL or points to a readable `struct relicore_two_load_calibration`; `out`
/// is NULL or points to a writable `double`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_calibrated_brightness_temperature(
    calibration: *const relicore_two_load_calibration,
    reading: f64,
    out: *mut f64,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        apply(calibration, out, |c| {
            bb::calibrated_brightness_temperature(&c.into(), reading)
        })
    }
}

/// `float` twin of `relicore_two_load_calibration` for firmware: the same fit computed in
/// single precision.
///
/// * `frequency_hz`, `reading_hot`, `temperature_hot_k`, `reading_cold`,
///   `temperature_cold_k`: as for `relicore_two_load_calibration` (Hz, reading units, K).
/// * `out`: the calibration.
///
/// Returns and errors as `relicore_two_load_calibration` (every field NaN on failure).
///
/// Accuracy: gain and offset to a few `float` ulp of the exact line.
///
/// # Safety
/// `out` is NULL or points to a writable `struct relicore_two_load_calibration_f32`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_two_load_calibration_f32(
    frequency_hz: f32,
    reading_hot: f32,
    temperature_hot_k: f32,
    reading_cold: f32,
    temperature_cold_k: f32,
    out: *mut relicore_two_load_calibration_f32,
) -> i32 {
    // SAFETY: out is NULL or writable (this function's contract).
    unsafe {
        init(out, || {
            bb::two_load_calibration(
                frequency_hz,
                reading_hot,
                temperature_hot_k,
                reading_cold,
                temperature_cold_k,
            )
        })
    }
}

/// `float` twin of `relicore_calibrated_temperature`: physical temperature in K of a
/// blackbody scene from a raw reading.
///
/// * `calibration`: from `relicore_two_load_calibration_f32`.
/// * `reading`: raw reading, finite.
/// * `out`: the temperature in K.
///
/// Returns and errors as `relicore_calibrated_temperature`.
///
/// Accuracy: within 2e-6 relative against mpmath for readings between and near the loads.
///
/// # Safety
/// `calibration` is NULL or points to a readable `struct relicore_two_load_calibration_f32`;
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_calibrated_temperature_f32(
    calibration: *const relicore_two_load_calibration_f32,
    reading: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        apply(calibration, out, |c| {
            bb::calibrated_temperature(&c.into(), reading)
        })
    }
}

/// `float` twin of `relicore_calibrated_brightness_temperature`: Rayleigh-Jeans brightness
/// temperature in K of the scene from a raw reading.
///
/// * `calibration`: from `relicore_two_load_calibration_f32`.
/// * `reading`: raw reading, finite.
/// * `out`: J in K.
///
/// Returns and errors as `relicore_calibrated_brightness_temperature`.
///
/// Accuracy: within 2e-6 relative against mpmath for readings between and near the loads.
///
/// # Safety
/// `calibration` is NULL or points to a readable `struct relicore_two_load_calibration_f32`;
/// `out` is NULL or points to a writable `float`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_calibrated_brightness_temperature_f32(
    calibration: *const relicore_two_load_calibration_f32,
    reading: f32,
    out: *mut f32,
) -> i32 {
    // SAFETY: the pointers are NULL or valid (this function's contract).
    unsafe {
        apply(calibration, out, |c| {
            bb::calibrated_brightness_temperature(&c.into(), reading)
        })
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::status::*;

    #[test]
    fn calibration_round_trip_and_struct_errors() {
        let mut cal = relicore_two_load_calibration {
            frequency_hz: 0.0,
            gain: 0.0,
            offset: 0.0,
        };
        // SAFETY: cal is writable.
        let code = unsafe { relicore_two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0, &mut cal) };
        assert_eq!(code, RELICORE_OK);
        let core = bb::two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0).ok();
        assert_eq!(Some(TwoLoadCalibration::from(cal)), core);

        let mut t = 0.0;
        // SAFETY: valid pointers.
        let code = unsafe { relicore_calibrated_temperature(&cal, 2.0, &mut t) };
        assert_eq!(code, RELICORE_OK);
        assert_eq!(
            Some(t),
            core.and_then(|c| bb::calibrated_temperature(&c, 2.0).ok())
        );

        // a struct the init function cannot produce
        let bad = relicore_two_load_calibration {
            frequency_hz: 90e9,
            gain: 0.0,
            offset: 0.0,
        };
        // SAFETY: valid pointers.
        let code = unsafe { relicore_calibrated_brightness_temperature(&bad, 2.0, &mut t) };
        assert_eq!(code, RELICORE_ERROR_INVALID_STRUCT);
        assert!(t.is_nan());
        // a bad reading is the reading's error, not the struct's
        // SAFETY: valid pointers.
        let code = unsafe { relicore_calibrated_brightness_temperature(&cal, f64::NAN, &mut t) };
        assert_eq!(code, RELICORE_ERROR_NON_FINITE);

        // degenerate loads: every field NaN
        // SAFETY: cal is writable.
        let code = unsafe { relicore_two_load_calibration(90e9, 2.0, 77.0, 1.0, 300.0, &mut cal) };
        assert_eq!(code, RELICORE_ERROR_DEGENERATE_CALIBRATION);
        assert!(cal.frequency_hz.is_nan() && cal.gain.is_nan() && cal.offset.is_nan());

        // NULL pointers
        // SAFETY: NULL is allowed.
        let code = unsafe { relicore_calibrated_temperature(std::ptr::null(), 2.0, &mut t) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        assert!(t.is_nan());
    }
}
