//! `relicore.blackbody.TwoLoadCalibration` and `two_load_calibration`.

use pyo3::prelude::*;
use pyo3::types::PyTuple;
use relicore::blackbody as bb;

use crate::errors::{Arg, core_error};
use crate::kernels::TWO_LOAD_ARGS;

/// Gain and offset of a two-load radiometer calibration at one frequency:
/// reading = gain * J + offset, J the Rayleigh-Jeans brightness temperature in K.
///
/// Frozen; compares equal by value; pickles. Built by `two_load_calibration`, or directly
/// from known values (which the calibrated functions check when they use them).
#[pyclass(frozen, eq, module = "relicore.blackbody", name = "TwoLoadCalibration")]
#[derive(Clone, Copy, PartialEq)]
pub(crate) struct PyTwoLoadCalibration {
    inner: bb::TwoLoadCalibration<f64>,
}

impl PyTwoLoadCalibration {
    pub(crate) fn value(&self) -> bb::TwoLoadCalibration<f64> {
        self.inner
    }
}

#[pymethods]
impl PyTwoLoadCalibration {
    #[new]
    fn new(frequency_hz: f64, gain: f64, offset: f64) -> Self {
        Self {
            inner: bb::TwoLoadCalibration {
                frequency_hz,
                gain,
                offset,
            },
        }
    }

    /// Channel frequency in Hz.
    #[getter]
    fn frequency_hz(&self) -> f64 {
        self.inner.frequency_hz
    }

    /// Gain in reading units per kelvin of Rayleigh-Jeans brightness temperature.
    #[getter]
    fn gain(&self) -> f64 {
        self.inner.gain
    }

    /// Offset in reading units (the reading for J = 0).
    #[getter]
    fn offset(&self) -> f64 {
        self.inner.offset
    }

    fn __repr__(&self) -> String {
        format!(
            "TwoLoadCalibration(frequency_hz={}, gain={}, offset={})",
            crate::errors::py_repr(self.inner.frequency_hz),
            crate::errors::py_repr(self.inner.gain),
            crate::errors::py_repr(self.inner.offset)
        )
    }

    fn __reduce__<'py>(
        slf: &Bound<'py, Self>,
    ) -> PyResult<(Bound<'py, PyAny>, Bound<'py, PyTuple>)> {
        let c = slf.get().inner;
        let args = PyTuple::new(slf.py(), [c.frequency_hz, c.gain, c.offset])?;
        Ok((slf.get_type().into_any(), args))
    }
}

/// Calibrates a radiometer channel from two blackbody loads (scalars only); see the core's
/// `two_load_calibration`.
#[pyfunction]
pub(crate) fn two_load_calibration(
    py: Python<'_>,
    frequency_hz: f64,
    reading_hot: f64,
    temperature_hot_k: f64,
    reading_cold: f64,
    temperature_cold_k: f64,
) -> PyResult<PyTwoLoadCalibration> {
    match bb::two_load_calibration(
        frequency_hz,
        reading_hot,
        temperature_hot_k,
        reading_cold,
        temperature_cold_k,
    ) {
        Ok(inner) => Ok(PyTwoLoadCalibration { inner }),
        Err(e) => {
            let vals = [
                frequency_hz,
                reading_hot,
                temperature_hot_k,
                reading_cold,
                temperature_cold_k,
            ]
            .map(Arg::Value);
            Err(core_error(
                py,
                "two_load_calibration",
                TWO_LOAD_ARGS,
                &vals,
                None,
                e,
            ))
        }
    }
}
