//! The radiation-thermometry functions that do not fit the table of regular functions: the
//! measurement equation with a response table shared by every element (any number of
//! element-wise scene arguments, a number or a temperature with its uncertainty per element)
//! and the combined standard uncertainty of caller arrays (JCGM 100:2008 eqs. 10 and 13).
//! The regular thermometry functions (and their image path through the core's frame forms)
//! and the list of the response-table functions are generated into `generated.rs`.

use numpy::{
    PyArray1, PyArrayMethods, PyReadonlyArray1, PyReadonlyArrayDyn, PyUntypedArrayMethods,
};
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use relicore::blackbody as bb;
use relicore::{Error, Result};

use crate::errors::{Arg, Site, core_error, shape_error};
use crate::generated::TABLE_FUNCTIONS;
use crate::kernels::{check_shape, elements, run_rows};

/// A response-table function: the two tables, the element-wise values, the row it writes (the
/// functions are [[table_function]] entries of `bindings/functions.toml`, listed in
/// `generated::TABLE_FUNCTIONS`).
pub(crate) type TableRowFn = fn(&[f64], &[f64], &[f64], &mut [f64]) -> Result<()>;

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
