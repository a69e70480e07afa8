//! The table of core functions the Python package exposes, and the one generic element loop.
//!
//! Each entry names a core function, its parameter names (for error messages; the Python
//! tests check them against both the core's source and the Python signatures) and a pointer to
//! its `f64` instance. The loop runs with the GIL released, reads each input either at the
//! element index or at index 0 (a broadcast scalar), writes one output per element and
//! allocates nothing per element.

use numpy::{
    PyArray1, PyArrayMethods, PyReadonlyArray1, PyReadonlyArrayDyn, PyUntypedArrayMethods,
};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use relicore::blackbody as bb;
use relicore::{ArrayResult, Error, Result};
use relicore_dispatch::widest;

use crate::calibration::PyTwoLoadCalibration;
use crate::errors::{Arg, Site, core_error, shape_error};

type Cal = bb::TwoLoadCalibration<f64>;

/// How a core function is called.
#[derive(Clone, Copy)]
pub(crate) enum Body {
    A1(fn(f64) -> Result<f64>),
    A2(fn(f64, f64) -> Result<f64>),
    A3(fn(f64, f64, f64) -> Result<f64>),
    A4(fn(f64, f64, f64, f64) -> Result<f64>),
    /// (wavelengths_m, response, value): two 1-D tables and one element-wise argument.
    Table(fn(&[f64], &[f64], f64) -> Result<f64>),
    /// (calibration, reading): a calibration value and one element-wise argument.
    Calibrated(fn(&Cal, f64) -> Result<f64>),
}

/// A core array function of (many values, one shared value), dispatched to the widest SIMD
/// compilation of the CPU (see [`planck_array`]).
pub(crate) type ArrayFn = fn(&[f64], f64, &mut [f64]) -> ArrayResult;

/// A core function: its name, its parameter names in order, how to call it, and its core array
/// form where it has one (used when the first input is an array and the second a scalar).
pub(crate) struct Spec {
    pub(crate) name: &'static str,
    pub(crate) args: &'static [&'static str],
    pub(crate) body: Body,
    pub(crate) array: Option<ArrayFn>,
}

macro_rules! spec {
    ($kind:ident, $name:ident, [$($arg:ident),+]) => {
        Spec { name: stringify!($name), args: &[$(stringify!($arg)),+], body: Body::$kind(bb::$name::<f64>), array: None }
    };
    ($kind:ident, $name:ident, [$($arg:ident),+], $array:ident) => {
        Spec { name: stringify!($name), args: &[$(stringify!($arg)),+], body: Body::$kind(bb::$name::<f64>), array: Some($array) }
    };
}

/// A core Planck array function, compiled for each SIMD level and chosen at run time.
macro_rules! planck_array {
    ($($name:ident),+) => {$(
        fn $name(x: &[f64], t: f64, out: &mut [f64]) -> ArrayResult {
            widest!(|x: &[f64], t: f64, out: &mut [f64]| -> ArrayResult { bb::$name(x, t, out) })
        }
    )+};
}

planck_array!(
    spectral_radiance_wavelength_array,
    spectral_radiance_frequency_array,
    spectral_radiance_wavenumber_array
);

/// Every element-wise blackbody function of the core (`two_load_calibration` builds a value
/// and lives in `calibration.rs`, with its parameter names in [`TWO_LOAD_ARGS`]).
pub(crate) static SPECS: &[Spec] = &[
    spec!(
        A2,
        spectral_radiance_wavelength,
        [wavelength_m, temperature_k],
        spectral_radiance_wavelength_array
    ),
    spec!(
        A2,
        spectral_radiance_frequency,
        [frequency_hz, temperature_k],
        spectral_radiance_frequency_array
    ),
    spec!(
        A2,
        spectral_radiance_wavenumber,
        [wavenumber_per_m, temperature_k],
        spectral_radiance_wavenumber_array
    ),
    spec!(
        A2,
        photon_radiance_wavelength,
        [wavelength_m, temperature_k]
    ),
    spec!(A2, photon_radiance_frequency, [frequency_hz, temperature_k]),
    spec!(
        A2,
        photon_radiance_wavenumber,
        [wavenumber_per_m, temperature_k]
    ),
    spec!(
        A2,
        radiance_temperature_derivative_wavelength,
        [wavelength_m, temperature_k]
    ),
    spec!(
        A2,
        radiance_temperature_derivative_frequency,
        [frequency_hz, temperature_k]
    ),
    spec!(A1, radiant_exitance, [temperature_k]),
    spec!(A1, photon_exitance, [temperature_k]),
    spec!(A1, peak_wavelength, [temperature_k]),
    spec!(A1, peak_frequency, [temperature_k]),
    spec!(A1, peak_wavenumber, [temperature_k]),
    spec!(A1, photon_peak_wavelength, [temperature_k]),
    spec!(A1, photon_peak_frequency, [temperature_k]),
    spec!(A1, temperature_from_peak_wavelength, [wavelength_m]),
    spec!(A1, temperature_from_peak_frequency, [frequency_hz]),
    spec!(
        A3,
        band_fraction_wavelength,
        [lower_m, upper_m, temperature_k]
    ),
    spec!(
        A3,
        band_radiance_wavelength,
        [lower_m, upper_m, temperature_k]
    ),
    spec!(
        A3,
        band_photon_radiance_wavelength,
        [lower_m, upper_m, temperature_k]
    ),
    spec!(
        A3,
        band_radiance_frequency,
        [lower_hz, upper_hz, temperature_k]
    ),
    spec!(
        A3,
        temperature_from_band_radiance_wavelength,
        [lower_m, upper_m, radiance]
    ),
    spec!(
        A2,
        brightness_temperature_wavelength,
        [wavelength_m, spectral_radiance]
    ),
    spec!(
        A2,
        brightness_temperature_frequency,
        [frequency_hz, spectral_radiance]
    ),
    spec!(
        A2,
        rayleigh_jeans_temperature,
        [frequency_hz, spectral_radiance]
    ),
    spec!(
        A4,
        ratio_temperature,
        [
            wavelength_1_m,
            wavelength_2_m,
            radiance_ratio,
            emissivity_ratio
        ]
    ),
    spec!(
        Table,
        response_weighted_radiance,
        [wavelengths_m, response, temperature_k]
    ),
    spec!(
        Table,
        temperature_from_response_weighted_radiance,
        [wavelengths_m, response, radiance]
    ),
    spec!(Calibrated, calibrated_temperature, [calibration, reading]),
    spec!(
        Calibrated,
        calibrated_brightness_temperature,
        [calibration, reading]
    ),
    spec!(
        A2,
        thermodynamic_to_rayleigh_jeans_factor,
        [frequency_hz, cmb_temperature_k]
    ),
    spec!(A2, kcmb_to_mjy_per_sr, [frequency_hz, cmb_temperature_k]),
    spec!(
        A2,
        thermal_sz_spectral_shape,
        [frequency_hz, cmb_temperature_k]
    ),
    spec!(
        A2,
        thermal_sz_temperature_shape,
        [frequency_hz, cmb_temperature_k]
    ),
    spec!(A1, thermal_sz_null_frequency, [cmb_temperature_k]),
];

/// Parameter names of `two_load_calibration`.
pub(crate) const TWO_LOAD_ARGS: &[&str] = &[
    "frequency_hz",
    "reading_hot",
    "temperature_hot_k",
    "reading_cold",
    "temperature_cold_k",
];

/// Whether an error belongs to one element (so `nan_on_error` may turn it into NaN) rather
/// than to a table or calibration shared by all elements.
fn is_element_error(body: Body, err: Error) -> bool {
    !matches!(
        (body, err.argument()),
        (Body::Table(_), Some(0 | 1)) | (Body::Calibrated(_), Some(0))
    )
}

/// Calls `f` once per element: input k is read at the element index when it has `n`
/// elements and at 0 when it has one (a broadcast scalar). On failure the element gets NaN
/// when `nan_on_error` and `keep_going(err)`; otherwise the loop stops and returns the index.
///
/// Arrays of at least [`PARALLEL_MIN`] elements are split into one contiguous chunk per core
/// (at most [`PARALLEL_MAX`]), the first on the calling thread and the others on scoped threads:
/// every element is still one core call
/// on the same inputs, so the outputs are bit for bit those of the serial loop, and the failure
/// reported is the one of the lowest index, as serially.
pub(crate) fn run<const N: usize>(
    inputs: [&[f64]; N],
    out: &mut [f64],
    nan_on_error: bool,
    keep_going: impl Fn(Error) -> bool + Sync,
    f: impl Fn([f64; N]) -> Result<f64> + Sync,
) -> Option<(usize, Error)> {
    split(out, |start, part| {
        run_range(inputs, part, start, nan_on_error, &keep_going, &f)
    })
}

/// `out[i] = f(x[i])` through a core array function `f(x, out)` (which computes every element,
/// failing ones as NaN, with the scalar function's bits), split over cores as [`run`] does.
/// Returns the first failing element; with `nan_on_error` the call succeeds with its NaN.
pub(crate) fn run_array(
    x: &[f64],
    out: &mut [f64],
    nan_on_error: bool,
    f: impl Fn(&[f64], &mut [f64]) -> ArrayResult + Sync,
) -> Option<(usize, Error)> {
    let first = split(out, |start, part| {
        let Some(xs) = x.get(start..start + part.len()) else {
            return Some((start, Error::LengthMismatch(0)));
        };
        f(xs, part).err().map(|e| (start + e.index, e.error))
    });
    if nan_on_error { None } else { first }
}

/// Runs `body(start, part)` over `out`: on the calling thread for short arrays, else over one
/// contiguous part per core (see [`run`]); returns the failure of the lowest index.
fn split(
    out: &mut [f64],
    body: impl Fn(usize, &mut [f64]) -> Option<(usize, Error)> + Sync,
) -> Option<(usize, Error)> {
    let n = out.len();
    let threads = worker_count().min(n / PARALLEL_MIN.max(1) + 1);
    if n < PARALLEL_MIN || threads < 2 {
        return body(0, out);
    }
    let chunk = n.div_ceil(threads);
    let body = &body;
    let spawned = std::thread::scope(|s| {
        let mut parts = out.chunks_mut(chunk);
        // the first part runs on the calling thread (idle otherwise: the GIL is released), the
        // others on one new thread each
        let own = parts.next();
        let mut handles = Vec::with_capacity(threads);
        for (k, part) in parts.enumerate() {
            let start = (k + 1) * chunk;
            let h = std::thread::Builder::new().spawn_scoped(s, move || body(start, part));
            handles.push(h);
        }
        let mut first: Option<(usize, Error)> = own.and_then(|part| body(0, part));
        let mut all_ran = true;
        for h in handles {
            match h.map(|h| h.join()) {
                Ok(Ok(Some((i, e)))) => {
                    if first.is_none_or(|(j, _)| i < j) {
                        first = Some((i, e));
                    }
                }
                Ok(Ok(None)) => {}
                // a thread that could not start or that panicked: redo serially below
                _ => all_ran = false,
            }
        }
        all_ran.then_some(first)
    });
    match spawned {
        Some(first) => first,
        None => body(0, out),
    }
}

/// Arrays shorter than this are computed on the calling thread (thread start-up, tens of
/// microseconds, would not pay off).
const PARALLEL_MIN: usize = 1 << 16;
/// At most this many threads per call.
const PARALLEL_MAX: usize = 8;

/// Threads for a large array: the cores available to the process (read once), at most
/// [`PARALLEL_MAX`].
fn worker_count() -> usize {
    use std::sync::OnceLock;
    static COUNT: OnceLock<usize> = OnceLock::new();
    *COUNT.get_or_init(|| {
        std::thread::available_parallelism()
            .map(|c| c.get())
            .unwrap_or(1)
            .clamp(1, PARALLEL_MAX)
    })
}

/// The serial loop over `out`, whose element 0 is element `start` of the whole array.
fn run_range<const N: usize>(
    inputs: [&[f64]; N],
    out: &mut [f64],
    start: usize,
    nan_on_error: bool,
    keep_going: &(impl Fn(Error) -> bool + Sync),
    f: &(impl Fn([f64; N]) -> Result<f64> + Sync),
) -> Option<(usize, Error)> {
    let strides = inputs.map(|s| usize::from(s.len() != 1));
    for (i, o) in out.iter_mut().enumerate() {
        let i = start + i;
        let mut x = [f64::NAN; N];
        for ((xk, s), stride) in x.iter_mut().zip(inputs).zip(strides) {
            *xk = s.get(i * stride).copied().unwrap_or(f64::NAN);
        }
        match f(x) {
            Ok(v) => *o = v,
            Err(e) if nan_on_error && keep_going(e) => *o = f64::NAN,
            Err(e) => return Some((i, e)),
        }
    }
    None
}

/// One core function, as the Python package sees it (`relicore._native.kernel(name)`).
#[pyclass(frozen, module = "relicore._native", name = "Kernel")]
pub(crate) struct Kernel {
    spec: &'static Spec,
}

impl Kernel {
    /// The kernel of an entry of another table of plain functions (the decoupling fits).
    pub(crate) fn of(spec: &'static Spec) -> Self {
        Self { spec }
    }
}

/// The kernel of a core function by name.
#[pyfunction]
pub(crate) fn kernel(name: &str) -> PyResult<Kernel> {
    SPECS
        .iter()
        .find(|s| s.name == name)
        .map(|spec| Kernel { spec })
        .ok_or_else(|| PyValueError::new_err(format!("no relicore function named {name:?}")))
}

/// Names and parameter names of every kernel, in table order.
#[pyfunction]
pub(crate) fn kernel_signatures() -> Vec<(&'static str, Vec<&'static str>)> {
    let mut all: Vec<_> = SPECS.iter().map(|s| (s.name, s.args.to_vec())).collect();
    all.push(("two_load_calibration", TWO_LOAD_ARGS.to_vec()));
    all
}

pub(crate) fn elements<'a>(
    inputs: &'a [PyReadonlyArray1<'_, f64>],
    n: usize,
    name: &str,
) -> PyResult<Vec<&'a [f64]>> {
    inputs
        .iter()
        .map(|a| {
            let s = a
                .as_slice()
                .map_err(|e| PyValueError::new_err(format!("{name}: {e}")))?;
            if s.len() == n || s.len() == 1 {
                Ok(s)
            } else {
                Err(PyValueError::new_err(format!(
                    "{name}: an input has {} elements, not {n} or 1",
                    s.len()
                )))
            }
        })
        .collect()
}

pub(crate) fn check_shape(shape: &[usize], n: usize, name: &str) -> PyResult<()> {
    if shape.iter().product::<usize>() == n {
        Ok(())
    } else {
        Err(PyValueError::new_err(format!(
            "{name}: shape {shape:?} does not hold {n} elements"
        )))
    }
}

fn table<'a>(
    py: Python<'_>,
    spec: &Spec,
    a: &'a PyReadonlyArrayDyn<'_, f64>,
    pos: usize,
) -> PyResult<&'a [f64]> {
    let arg = spec.args.get(pos).copied().unwrap_or("table");
    if a.ndim() != 1 {
        return Err(shape_error(
            py,
            spec.name,
            arg,
            &format!("must be 1-D, got shape {:?}", a.shape()),
        ));
    }
    a.as_slice()
        .map_err(|e| PyValueError::new_err(format!("{}: {arg}: {e}", spec.name)))
}

impl Kernel {
    fn wrong_kind(&self, method: &str) -> PyErr {
        PyTypeError::new_err(format!(
            "{}: kernel does not support {method}",
            self.spec.name
        ))
    }
}

#[pymethods]
impl Kernel {
    /// Name of the core function.
    #[getter]
    fn name(&self) -> &'static str {
        self.spec.name
    }

    /// Parameter names of the core function, in order.
    #[getter]
    fn arguments(&self) -> Vec<&'static str> {
        self.spec.args.to_vec()
    }

    /// Calls the function on scalars; with `nan_on_error` a failure gives NaN.
    #[pyo3(signature = (args, nan_on_error=false))]
    fn call(&self, py: Python<'_>, args: Vec<f64>, nan_on_error: bool) -> PyResult<f64> {
        let spec = self.spec;
        let r = match (spec.body, args.as_slice()) {
            (Body::A1(f), &[a]) => f(a),
            (Body::A2(f), &[a, b]) => f(a, b),
            (Body::A3(f), &[a, b, c]) => f(a, b, c),
            (Body::A4(f), &[a, b, c, d]) => f(a, b, c, d),
            (Body::Table(_) | Body::Calibrated(_), _) => return Err(self.wrong_kind("call")),
            _ => {
                return Err(PyTypeError::new_err(format!(
                    "{}: takes {} arguments, got {}",
                    spec.name,
                    spec.args.len(),
                    args.len()
                )));
            }
        };
        match r {
            Ok(v) => Ok(v),
            Err(_) if nan_on_error => Ok(f64::NAN),
            Err(e) => {
                let vals: Vec<Arg<'_>> = args.iter().map(|&v| Arg::Value(v)).collect();
                Err(core_error(py, spec.name, spec.args, &vals, None, e))
            }
        }
    }

    /// Element loop of a plain function: `inputs` are contiguous 1-D float64 arrays of
    /// `prod(shape)` elements or of one (broadcast) element, `out` is the contiguous output of
    /// `prod(shape)` elements.
    #[pyo3(signature = (inputs, out, shape, nan_on_error=false))]
    fn map(
        &self,
        py: Python<'_>,
        inputs: Vec<PyReadonlyArray1<'_, f64>>,
        out: &Bound<'_, PyArray1<f64>>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        let spec = self.spec;
        let mut out = out.try_readwrite()?;
        let out = out
            .as_slice_mut()
            .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.name)))?;
        let n = out.len();
        check_shape(&shape, n, spec.name)?;
        let x = elements(&inputs, n, spec.name)?;
        let all = |_: Error| true;
        let failure = match (spec.body, x.as_slice()) {
            (Body::A1(f), &[a]) => py.detach(|| run([a], out, nan_on_error, all, |[a]| f(a))),
            (Body::A2(_), &[a, &[b]]) if a.len() == n && spec.array.is_some() => {
                let array = spec.array.ok_or_else(|| self.wrong_kind("map"))?;
                py.detach(|| run_array(a, out, nan_on_error, |xs, os| array(xs, b, os)))
            }
            (Body::A2(f), &[a, b]) => {
                py.detach(|| run([a, b], out, nan_on_error, all, |[a, b]| f(a, b)))
            }
            (Body::A3(f), &[a, b, c]) => {
                py.detach(|| run([a, b, c], out, nan_on_error, all, |[a, b, c]| f(a, b, c)))
            }
            (Body::A4(f), &[a, b, c, d]) => py.detach(|| {
                run([a, b, c, d], out, nan_on_error, all, |[a, b, c, d]| {
                    f(a, b, c, d)
                })
            }),
            (Body::Table(_) | Body::Calibrated(_), _) => return Err(self.wrong_kind("map")),
            _ => {
                return Err(PyTypeError::new_err(format!(
                    "{}: takes {} inputs, got {}",
                    spec.name,
                    spec.args.len(),
                    x.len()
                )));
            }
        };
        match failure {
            None => Ok(()),
            Some((i, e)) => {
                let vals: Vec<Arg<'_>> = x
                    .iter()
                    .map(|s| {
                        Arg::Value(
                            s.get(if s.len() == 1 { 0 } else { i })
                                .copied()
                                .unwrap_or(f64::NAN),
                        )
                    })
                    .collect();
                Err(core_error(
                    py,
                    spec.name,
                    spec.args,
                    &vals,
                    Some(Site {
                        index: i,
                        shape: &shape,
                    }),
                    e,
                ))
            }
        }
    }

    /// Element loop of a response-table function: the two tables are 1-D, `values` and `out`
    /// as in [`Kernel::map`].
    #[pyo3(signature = (wavelengths_m, response, values, out, shape, nan_on_error=false))]
    #[allow(clippy::too_many_arguments)]
    fn map_table(
        &self,
        py: Python<'_>,
        wavelengths_m: PyReadonlyArrayDyn<'_, f64>,
        response: PyReadonlyArrayDyn<'_, f64>,
        values: PyReadonlyArray1<'_, f64>,
        out: &Bound<'_, PyArray1<f64>>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        let spec = self.spec;
        let Body::Table(f) = spec.body else {
            return Err(self.wrong_kind("map_table"));
        };
        let w = table(py, spec, &wavelengths_m, 0)?;
        let r = table(py, spec, &response, 1)?;
        let mut out = out.try_readwrite()?;
        let out = out
            .as_slice_mut()
            .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.name)))?;
        let n = out.len();
        check_shape(&shape, n, spec.name)?;
        let inputs = [values];
        let x = elements(&inputs, n, spec.name)?;
        let [v] = x.as_slice() else {
            return Err(PyTypeError::new_err(format!(
                "{}: one value array expected",
                spec.name
            )));
        };
        let keep = |e: Error| is_element_error(spec.body, e);
        let failure = py.detach(|| run([*v], out, nan_on_error, keep, |[t]| f(w, r, t)));
        match failure {
            None => Ok(()),
            Some((i, e)) => {
                let vi = v
                    .get(if v.len() == 1 { 0 } else { i })
                    .copied()
                    .unwrap_or(f64::NAN);
                let vals = [Arg::Table(w), Arg::Table(r), Arg::Value(vi)];
                Err(core_error(
                    py,
                    spec.name,
                    spec.args,
                    &vals,
                    Some(Site {
                        index: i,
                        shape: &shape,
                    }),
                    e,
                ))
            }
        }
    }

    /// Element loop of a calibrated-reading function: `values` (the readings) and `out` as in
    /// [`Kernel::map`].
    #[pyo3(signature = (calibration, values, out, shape, nan_on_error=false))]
    fn map_calibrated(
        &self,
        py: Python<'_>,
        calibration: &PyTwoLoadCalibration,
        values: PyReadonlyArray1<'_, f64>,
        out: &Bound<'_, PyArray1<f64>>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        let spec = self.spec;
        let Body::Calibrated(f) = spec.body else {
            return Err(self.wrong_kind("map_calibrated"));
        };
        let cal = calibration.value();
        let mut out = out.try_readwrite()?;
        let out = out
            .as_slice_mut()
            .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.name)))?;
        let n = out.len();
        check_shape(&shape, n, spec.name)?;
        let inputs = [values];
        let x = elements(&inputs, n, spec.name)?;
        let [v] = x.as_slice() else {
            return Err(PyTypeError::new_err(format!(
                "{}: one value array expected",
                spec.name
            )));
        };
        let keep = |e: Error| is_element_error(spec.body, e);
        let failure = py.detach(|| run([*v], out, nan_on_error, keep, |[x]| f(&cal, x)));
        match failure {
            None => Ok(()),
            Some((i, e)) => {
                let vi = v
                    .get(if v.len() == 1 { 0 } else { i })
                    .copied()
                    .unwrap_or(f64::NAN);
                let vals = [Arg::Calibration(&cal), Arg::Value(vi)];
                Err(core_error(
                    py,
                    spec.name,
                    spec.args,
                    &vals,
                    Some(Site {
                        index: i,
                        shape: &shape,
                    }),
                    e,
                ))
            }
        }
    }

    fn __repr__(&self) -> String {
        format!(
            "<relicore kernel {}({})>",
            self.spec.name,
            self.spec.args.join(", ")
        )
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn loop_broadcasts_length_one_inputs_and_stops_at_the_first_failure() {
        let t = [300.0, -1.0, 500.0];
        let l = [1e-5];
        let mut out = [0.0; 3];
        let f = |[a, b]: [f64; 2]| bb::spectral_radiance_wavelength(a, b);
        let failure = run([&l, &t], &mut out, false, |_| true, f);
        assert_eq!(failure, Some((1, Error::NonPositive(1))));
        let failure = run([&l, &t], &mut out, true, |_| true, f);
        assert_eq!(failure, None);
        assert!(out[1].is_nan());
        // the good elements are exactly what the core returns for them
        assert_eq!(
            out[0],
            bb::spectral_radiance_wavelength(1e-5, 300.0)
                .ok()
                .unwrap_or(f64::NAN)
        );
        assert_eq!(
            out[2],
            bb::spectral_radiance_wavelength(1e-5, 500.0)
                .ok()
                .unwrap_or(f64::NAN)
        );
    }

    #[test]
    fn table_and_calibration_errors_are_not_element_errors() {
        let table = Body::Table(bb::response_weighted_radiance::<f64>);
        assert!(!is_element_error(table, Error::Negative(1)));
        assert!(is_element_error(table, Error::NonPositive(2)));
        assert!(is_element_error(table, Error::NoConvergence));
        let cal = Body::Calibrated(bb::calibrated_temperature::<f64>);
        assert!(!is_element_error(cal, Error::DegenerateCalibration(0)));
        assert!(is_element_error(cal, Error::OutOfDomain(1)));
    }

    #[test]
    fn names_are_unique() {
        for (i, a) in SPECS.iter().enumerate() {
            assert!(
                SPECS.iter().skip(i + 1).all(|b| b.name != a.name),
                "{}",
                a.name
            );
        }
    }
}
