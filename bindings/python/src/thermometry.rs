//! The radiation-thermometry functions that do not fit the table of regular functions: the
//! measurement equation with a response table shared by every element (any number of
//! element-wise scene arguments, a number or a temperature with its uncertainty per element)
//! and the combined standard uncertainty of caller arrays (JCGM 100:2008 eqs. 10 and 13).
//! The regular thermometry functions (and their image path through the core's frame forms)
//! are generated into `generated.rs`.

use numpy::{
    PyArray1, PyArrayMethods, PyReadonlyArray1, PyReadonlyArrayDyn, PyUntypedArrayMethods,
};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use relicore::blackbody as bb;
use relicore::{Error, Result};

use crate::errors::{Arg, Site, core_error, shape_error};
use crate::kernels::{check_shape, elements, run_rows};

/// Floats per element of a temperature with its uncertainty: temperature, u_c, the five
/// coefficients, the number of inputs (the order of the generated `temperature_uncertainty_row`).
const ROW: usize = 8;

/// A response-table function: the two tables, the element-wise values, the row it writes.
type TableRowFn = fn(&[f64], &[f64], &[f64], &mut [f64]) -> Result<()>;

const SCENE: [&str; 4] = [
    "emissivity",
    "reflected_temperature_k",
    "transmittance",
    "path_temperature_k",
];
const UNCERTAINTIES: [&str; 5] = [
    "signal_uncertainty",
    "emissivity_uncertainty",
    "reflected_temperature_uncertainty_k",
    "transmittance_uncertainty",
    "path_temperature_uncertainty_k",
];

fn put(out: &mut [f64], v: f64) {
    if let Some(o) = out.first_mut() {
        *o = v;
    }
}

fn put_row(v: bb::TemperatureUncertainty<f64>, out: &mut [f64]) {
    let values = [v.temperature_k, v.combined_standard_uncertainty_k]
        .into_iter()
        .chain(v.sensitivity_coefficients)
        .chain([f64::from(v.inputs)]);
    for (o, x) in out.iter_mut().zip(values) {
        *o = x;
    }
}

/// `f(w, r, a, b, c, d, e)` of a slice of five values.
macro_rules! five {
    ($x:expr, |$a:ident, $b:ident, $c:ident, $d:ident, $e:ident| $body:expr) => {
        match *$x {
            [$a, $b, $c, $d, $e] => $body,
            _ => Err(Error::LengthMismatch(relicore::arg!(2, values))),
        }
    };
}

fn measured(w: &[f64], r: &[f64], x: &[f64], out: &mut [f64]) -> Result<()> {
    five!(x, |t, e, tr, tau, tp| {
        bb::measured_response_weighted_radiance(w, r, t, e, tr, tau, tp).map(|v| put(out, v))
    })
}

fn object(w: &[f64], r: &[f64], x: &[f64], out: &mut [f64]) -> Result<()> {
    five!(x, |s, e, tr, tau, tp| {
        bb::object_temperature_response(w, r, s, e, tr, tau, tp).map(|v| put(out, v))
    })
}

fn object_uncertainty(w: &[f64], r: &[f64], x: &[f64], out: &mut [f64]) -> Result<()> {
    match *x {
        [s, e, tr, tau, tp, us, ue, utr, utau, utp] => {
            bb::object_temperature_response_with_uncertainty(
                w, r, s, e, tr, tau, tp, us, ue, utr, utau, utp,
            )
            .map(|v| put_row(v, out))
        }
        _ => Err(Error::LengthMismatch(relicore::arg!(2, values))),
    }
}

fn derivative(w: &[f64], r: &[f64], x: &[f64], out: &mut [f64]) -> Result<()> {
    match *x {
        [t] => bb::response_weighted_radiance_temperature_derivative(w, r, t).map(|v| put(out, v)),
        _ => Err(Error::LengthMismatch(relicore::arg!(2, values))),
    }
}

/// The response-table thermometry functions: name, element-wise parameter names (after the
/// two tables), floats per element, core call.
static TABLE_FUNCTIONS: [(&str, &[&str], usize, TableRowFn); 4] = [
    (
        "measured_response_weighted_radiance",
        &[
            "object_temperature_k",
            SCENE[0],
            SCENE[1],
            SCENE[2],
            SCENE[3],
        ],
        1,
        measured,
    ),
    (
        "object_temperature_response",
        &["signal", SCENE[0], SCENE[1], SCENE[2], SCENE[3]],
        1,
        object,
    ),
    (
        "object_temperature_response_with_uncertainty",
        &[
            "signal",
            SCENE[0],
            SCENE[1],
            SCENE[2],
            SCENE[3],
            UNCERTAINTIES[0],
            UNCERTAINTIES[1],
            UNCERTAINTIES[2],
            UNCERTAINTIES[3],
            UNCERTAINTIES[4],
        ],
        ROW,
        object_uncertainty,
    ),
    (
        "response_weighted_radiance_temperature_derivative",
        &["temperature_k"],
        1,
        derivative,
    ),
];

/// (name, parameters) of the irregular thermometry functions of relicore.blackbody.
pub(crate) fn signatures() -> Vec<(&'static str, Vec<&'static str>)> {
    let tables = TABLE_FUNCTIONS.iter().map(|(n, a, _, _)| {
        let mut args = vec!["wavelengths_m", "response_table"];
        args.extend_from_slice(a);
        (*n, args)
    });
    let combined = [
        (
            "combined_standard_uncertainty",
            vec!["sensitivity_coefficients", "standard_uncertainties"],
        ),
        (
            "combined_standard_uncertainty_correlated",
            vec![
                "sensitivity_coefficients",
                "standard_uncertainties",
                "correlation",
            ],
        ),
    ];
    tables.chain(combined).collect()
}

fn one_d<'a>(
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

/// Element loop of a response-table thermometry function: the two tables are 1-D and shared
/// by every element; `inputs` are the element-wise arguments (contiguous, `prod(shape)` or one
/// element each), `out` holds `prod(shape)` rows of the function's width (1, or 8 for a
/// temperature with its uncertainty). Runs with the GIL released, split over cores.
#[pyfunction]
#[pyo3(signature = (name, wavelengths_m, response_table, inputs, out, shape, nan_on_error=false))]
#[allow(clippy::too_many_arguments)]
pub(crate) fn thermometry_table_map(
    py: Python<'_>,
    name: &str,
    wavelengths_m: PyReadonlyArrayDyn<'_, f64>,
    response_table: PyReadonlyArrayDyn<'_, f64>,
    inputs: Vec<PyReadonlyArray1<'_, f64>>,
    out: &Bound<'_, PyArray1<f64>>,
    shape: Vec<usize>,
    nan_on_error: bool,
) -> PyResult<()> {
    let Some(&(function, names, width, f)) = TABLE_FUNCTIONS.iter().find(|t| t.0 == name) else {
        return Err(PyValueError::new_err(format!(
            "no thermometry table function {name:?}"
        )));
    };
    if inputs.len() != names.len() {
        return Err(PyValueError::new_err(format!(
            "{function}: takes {} element-wise arguments, got {}",
            names.len(),
            inputs.len()
        )));
    }
    let w = one_d(py, function, "wavelengths_m", &wavelengths_m)?;
    let r = one_d(py, function, "response_table", &response_table)?;
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{function}: out: {e}")))?;
    let n = out.len() / width;
    check_shape(&shape, n, function)?;
    let x = elements(&inputs, n, function)?;
    // a failure of the tables (arguments 0 and 1) is not the element's: it always raises
    let keep = |e: Error| !matches!(e.argument(), Some(0 | 1));
    let failure = py.detach(|| run_rows(&x, out, width, nan_on_error, keep, |v, o| f(w, r, v, o)));
    match failure {
        None => Ok(()),
        Some((i, e)) => {
            let mut all = vec!["wavelengths_m", "response_table"];
            all.extend_from_slice(names);
            let mut args = vec![Arg::Table(w), Arg::Table(r)];
            args.extend(x.iter().map(|s| {
                Arg::Value(
                    s.get(if s.len() == 1 { 0 } else { i })
                        .copied()
                        .unwrap_or(f64::NAN),
                )
            }));
            let site = (!shape.is_empty()).then_some(Site {
                index: i,
                shape: &shape,
            });
            Err(core_error(py, function, &all, &args, site, e))
        }
    }
}

/// Combined standard uncertainty of caller arrays: uncorrelated (JCGM 100:2008 eq. 10) without
/// `correlation`, correlated (eq. 13) with the n × n (row-major, flattened) matrix.
#[pyfunction]
#[pyo3(signature = (sensitivity_coefficients, standard_uncertainties, correlation=None))]
pub(crate) fn combined_uncertainty(
    py: Python<'_>,
    sensitivity_coefficients: PyReadonlyArrayDyn<'_, f64>,
    standard_uncertainties: PyReadonlyArrayDyn<'_, f64>,
    correlation: Option<PyReadonlyArrayDyn<'_, f64>>,
) -> PyResult<f64> {
    let function = if correlation.is_some() {
        "combined_standard_uncertainty_correlated"
    } else {
        "combined_standard_uncertainty"
    };
    let c = one_d(
        py,
        function,
        "sensitivity_coefficients",
        &sensitivity_coefficients,
    )?;
    let u = one_d(
        py,
        function,
        "standard_uncertainties",
        &standard_uncertainties,
    )?;
    let names = [
        "sensitivity_coefficients",
        "standard_uncertainties",
        "correlation",
    ];
    let result = match &correlation {
        None => bb::combined_standard_uncertainty(c, u),
        Some(m) => {
            let m = one_d(py, function, "correlation", m)?;
            bb::combined_standard_uncertainty_correlated(c, u, m)
        }
    };
    result.map_err(|e| {
        let empty: &[f64] = &[];
        let args = [Arg::Table(c), Arg::Table(u), Arg::Table(empty)];
        core_error(py, function, &names, &args, None, e)
    })
}
