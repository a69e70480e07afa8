//! The blackbody functions that do not fit the table of regular functions: the two-load
//! calibration (`TwoLoadCalibration`, `two_load_calibration`), the calibrated readings and the
//! response-weighted radiance (a response table shared by every element).

use numpy::{
    PyArray1, PyArrayMethods, PyReadonlyArray1, PyReadonlyArrayDyn, PyUntypedArrayMethods,
};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyTuple;
use relicore::blackbody as bb;
use relicore::{Error, Result};

use crate::errors::{Arg, Site, core_error, shape_error};
use crate::kernels::{check_shape, elements, run};

type Cal = bb::TwoLoadCalibration<f64>;
type TableFn = fn(&[f64], &[f64], f64) -> Result<f64>;
type CalibratedFn = fn(&Cal, f64) -> Result<f64>;

/// Parameter names of `two_load_calibration`.
const TWO_LOAD_ARGS: &[&str] = &[
    "frequency_hz",
    "reading_hot",
    "temperature_hot_k",
    "reading_cold",
    "temperature_cold_k",
];
const TABLE_ARGS: [&[&str]; 2] = [
    &["wavelengths_m", "response", "temperature_k"],
    &["wavelengths_m", "response", "radiance"],
];
const CALIBRATED_ARGS: &[&str] = &["calibration", "reading"];

/// The response-table functions: name, parameter names, core function.
static TABLES: [(&str, &[&str], TableFn); 2] = [
    (
        "response_weighted_radiance",
        TABLE_ARGS[0],
        bb::response_weighted_radiance::<f64>,
    ),
    (
        "temperature_from_response_weighted_radiance",
        TABLE_ARGS[1],
        bb::temperature_from_response_weighted_radiance::<f64>,
    ),
];

/// The calibrated-reading functions: name, core function.
static CALIBRATED: [(&str, CalibratedFn); 2] = [
    ("calibrated_temperature", bb::calibrated_temperature::<f64>),
    (
        "calibrated_brightness_temperature",
        bb::calibrated_brightness_temperature::<f64>,
    ),
];

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

/// Names and parameter names of the functions of this file, for the tests.
#[pyfunction]
pub(crate) fn irregular_signatures() -> Vec<(&'static str, Vec<&'static str>)> {
    let tables = TABLES.iter().map(|(n, a, _)| (*n, a.to_vec()));
    let calibrated = CALIBRATED
        .iter()
        .map(|(n, _)| (*n, CALIBRATED_ARGS.to_vec()));
    let two_load = std::iter::once(("two_load_calibration", TWO_LOAD_ARGS.to_vec()));
    let thermometry = crate::thermometry::signatures();
    tables
        .chain(calibrated)
        .chain(two_load)
        .chain(thermometry)
        .collect()
}

fn table<'a>(
    py: Python<'_>,
    function: &str,
    arg: &str,
    a: &'a PyReadonlyArrayDyn<'_, f64>,
) -> PyResult<&'a [f64]> {
    if a.ndim() != 1 {
        let what = format!("must be 1-D, got shape {:?}", a.shape());
        return Err(shape_error(py, function, arg, &what));
    }
    a.as_slice()
        .map_err(|e| PyValueError::new_err(format!("{function}: {arg}: {e}")))
}

/// The element loop of one shared-value function over `values` (`prod(shape)` elements or
/// one, and `out` as in the regular functions); `shared` says which failures are not the
/// element's, `describe(value)` what each argument position held when the element failed.
#[allow(clippy::too_many_arguments)]
fn loop_values<'a>(
    py: Python<'_>,
    function: &str,
    names: &[&str],
    values: PyReadonlyArray1<'_, f64>,
    out: &Bound<'_, PyArray1<f64>>,
    shape: &[usize],
    nan_on_error: bool,
    shared: impl Fn(Error) -> bool + Sync,
    f: impl Fn(f64) -> Result<f64> + Sync,
    describe: impl Fn(f64) -> Vec<Arg<'a>>,
) -> PyResult<()> {
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{function}: out: {e}")))?;
    let n = out.len();
    check_shape(shape, n, function)?;
    let inputs = [values];
    let x = elements(&inputs, n, function)?;
    let [v] = x.as_slice() else {
        return Err(PyValueError::new_err(format!(
            "{function}: one value array expected"
        )));
    };
    let keep = |e: Error| !shared(e);
    let failure = py.detach(|| run([*v], out, nan_on_error, keep, |[t]| f(t)));
    match failure {
        None => Ok(()),
        Some((i, e)) => {
            let vi = v.get(if v.len() == 1 { 0 } else { i }).copied();
            let args = describe(vi.unwrap_or(f64::NAN));
            let site = Site { index: i, shape };
            Err(core_error(py, function, names, &args, Some(site), e))
        }
    }
}

/// Element loop of a response-table function: the two tables are 1-D and shared by every
/// element of `values`. Runs with the GIL released.
#[pyfunction]
#[pyo3(signature = (name, wavelengths_m, response, values, out, shape, nan_on_error=false))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn table_map(
    py: Python<'_>,
    name: &str,
    wavelengths_m: PyReadonlyArrayDyn<'_, f64>,
    response: PyReadonlyArrayDyn<'_, f64>,
    values: PyReadonlyArray1<'_, f64>,
    out: &Bound<'_, PyArray1<f64>>,
    shape: Vec<usize>,
    nan_on_error: bool,
) -> PyResult<()> {
    let Some(&(function, names, f)) = TABLES.iter().find(|t| t.0 == name) else {
        return Err(PyValueError::new_err(format!("no table function {name:?}")));
    };
    let w = table(py, function, "wavelengths_m", &wavelengths_m)?;
    let r = table(py, function, "response", &response)?;
    let shared = |e: Error| matches!(e.argument(), Some(0 | 1));
    let describe = |v| vec![Arg::Table(w), Arg::Table(r), Arg::Value(v)];
    let f = |t| f(w, r, t);
    loop_values(
        py,
        function,
        names,
        values,
        out,
        &shape,
        nan_on_error,
        shared,
        f,
        describe,
    )
}

/// Element loop of a calibrated-reading function over the readings `values`. Runs with the
/// GIL released.
#[pyfunction]
#[pyo3(signature = (name, calibration, values, out, shape, nan_on_error=false))]
pub(crate) fn calibrated_map(
    py: Python<'_>,
    name: &str,
    calibration: &PyTwoLoadCalibration,
    values: PyReadonlyArray1<'_, f64>,
    out: &Bound<'_, PyArray1<f64>>,
    shape: Vec<usize>,
    nan_on_error: bool,
) -> PyResult<()> {
    let Some(&(function, f)) = CALIBRATED.iter().find(|c| c.0 == name) else {
        return Err(PyValueError::new_err(format!(
            "no calibrated function {name:?}"
        )));
    };
    let cal = calibration.value();
    let shared = |e: Error| matches!(e.argument(), Some(0));
    let describe = |v| vec![Arg::Calibration(&cal), Arg::Value(v)];
    let f = |x| f(&cal, x);
    loop_values(
        py,
        function,
        CALIBRATED_ARGS,
        values,
        out,
        &shape,
        nan_on_error,
        shared,
        f,
        describe,
    )
}
