//! The one place where a core [`Error`] (or a shape problem of an argument) becomes a Python
//! `relicore.RelicoreError`.
//!
//! The message names the function, the argument, its value and, for arrays, the first
//! offending index in the broadcast shape:
//! `spectral_radiance_wavelength: temperature_k = -3.0 at index 5: must be positive`.
//! The exception also carries the fields as attributes: `function`, `argument` (name or
//! `None`), `index` (tuple or `None`) and `status` (the stable status code of the C ABI, listed
//! in `tests/data/FORMAT.md`, or `None`).

use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyTuple;
use relicore::Error;
use relicore::blackbody::TwoLoadCalibration;

pyo3::create_exception!(
    relicore,
    RelicoreError,
    PyValueError,
    "Invalid input to a relicore function. A subclass of ValueError. Attributes: function, \
     argument (name or None), index (tuple of ints into the broadcast shape, or None) and status \
     (the stable status code of the C ABI, or None)."
);

/// What an argument position held in the failing call, as far as the message needs it.
#[derive(Clone, Copy)]
pub(crate) enum Arg<'a> {
    /// A scalar, or the element of a broadcast array at the failing index.
    Value(f64),
    /// A 1-D table (response functions).
    Table(&'a [f64]),
    /// A calibration value.
    Calibration(&'a TwoLoadCalibration<f64>),
    /// A value shared by all elements that the message names but does not print (a universe,
    /// a thermal history).
    Shared,
}

/// Where an element-wise call failed: the flat index into the broadcast shape and that shape.
#[derive(Clone, Copy)]
pub(crate) struct Site<'a> {
    pub(crate) index: usize,
    pub(crate) shape: &'a [usize],
}

/// Stable status code of the C ABI for an error kind (tests/data/FORMAT.md).
pub(crate) fn status_code(err: Error) -> Option<i32> {
    match err {
        Error::NonFinite(_) => Some(-2),
        Error::NonPositive(_) => Some(-3),
        Error::Negative(_) => Some(-4),
        Error::EmptyInterval(_) => Some(-5),
        Error::ArrayTooShort(_) => Some(-6),
        Error::LengthMismatch(_) => Some(-7),
        Error::NotIncreasing(_) => Some(-8),
        Error::DegenerateCalibration(_) => Some(-9),
        Error::OutOfDomain(_) => Some(-10),
        Error::NoConvergence => Some(-11),
        Error::InvalidParameter(_) => Some(-14),
        Error::NoBigBang => Some(-15),
        Error::CapacityTooSmall(_) => Some(-16),
        _ => None,
    }
}

fn reason(err: Error) -> &'static str {
    match err {
        Error::NonFinite(_) => "must be finite",
        Error::NonPositive(_) => "must be positive",
        Error::Negative(_) => "must not be negative",
        Error::EmptyInterval(_) => "empty interval: the lower bound must be below the upper bound",
        Error::ArrayTooShort(_) => "too short",
        Error::LengthMismatch(_) => "lengths must match",
        Error::NotIncreasing(_) => "must be strictly increasing",
        Error::DegenerateCalibration(_) => {
            "degenerate calibration: the two loads or the two readings coincide"
        }
        Error::OutOfDomain(_) => "outside the domain of the function",
        Error::NoConvergence => "no convergence",
        Error::InvalidParameter(_) => "invalid parameter",
        Error::NoBigBang => "the model has no big bang",
        Error::CapacityTooSmall(_) => "too large for the capacity of the table",
        _ => "invalid input",
    }
}

/// A float as Python's `repr` prints it (shortest round-trip digits; `nan`, `inf`; exponent
/// form below 1e-4 and from 1e16 on).
pub(crate) fn py_repr(x: f64) -> String {
    if x.is_nan() {
        return "nan".into();
    }
    if x.is_infinite() {
        return if x > 0.0 { "inf".into() } else { "-inf".into() };
    }
    let sci = format!("{x:e}");
    let (mantissa, exponent) = sci.split_once('e').unwrap_or((sci.as_str(), "0"));
    let exponent: i32 = exponent.parse().unwrap_or(0);
    let (sign, mantissa) = match mantissa.strip_prefix('-') {
        Some(m) => ("-", m),
        None => ("", mantissa),
    };
    let digits: String = mantissa.chars().filter(char::is_ascii_digit).collect();
    if (-4..16).contains(&exponent) {
        let n = digits.len() as i32;
        if exponent >= 0 {
            let point = (exponent + 1) as usize;
            if n <= exponent + 1 {
                let zeros = "0".repeat(point - digits.len());
                format!("{sign}{digits}{zeros}.0")
            } else {
                let (int, frac) = digits.split_at(point);
                format!("{sign}{int}.{frac}")
            }
        } else {
            let zeros = "0".repeat((-exponent - 1) as usize);
            format!("{sign}0.{zeros}{digits}")
        }
    } else {
        let exp_sign = if exponent < 0 { '-' } else { '+' };
        format!("{sign}{mantissa}e{exp_sign}{:02}", exponent.abs())
    }
}

/// The multi-index of a flat (C-order) index into `shape`.
pub(crate) fn unravel(mut flat: usize, shape: &[usize]) -> Vec<usize> {
    let mut index = vec![0; shape.len()];
    for (slot, &extent) in index.iter_mut().zip(shape).rev() {
        if extent > 0 {
            *slot = flat % extent;
            flat /= extent;
        }
    }
    index
}

fn format_index(index: &[usize]) -> String {
    match index {
        [i] => format!("{i}"),
        _ => {
            let parts: Vec<String> = index.iter().map(usize::to_string).collect();
            format!("({})", parts.join(", "))
        }
    }
}

fn describe_calibration(c: &TwoLoadCalibration<f64>) -> String {
    format!(
        "TwoLoadCalibration(frequency_hz={}, gain={}, offset={})",
        py_repr(c.frequency_hz),
        py_repr(c.gain),
        py_repr(c.offset)
    )
}

/// First index of a table element that violates the condition `err` names (for the message).
fn table_offender(err: Error, t: &[f64]) -> Option<usize> {
    match err {
        Error::NonFinite(_) => t.iter().position(|v| !v.is_finite()),
        Error::NonPositive(_) => t.iter().position(|v| !(*v > 0.0)),
        Error::Negative(_) => t.iter().position(|v| *v < 0.0),
        Error::NotIncreasing(_) => t
            .windows(2)
            .position(|w| matches!(w, [a, b] if !(b > a)))
            .map(|i| i + 1),
        _ => None,
    }
}

/// Builds the `RelicoreError` for a core error in `function`, whose parameters are `names`;
/// `args` holds what each position was in the failing call and `site` where an element-wise
/// call failed (None for a scalar call).
pub(crate) fn core_error(
    py: Python<'_>,
    function: &str,
    names: &[&str],
    args: &[Arg<'_>],
    site: Option<Site<'_>>,
    err: Error,
) -> PyErr {
    core_error_because(py, function, names, args, site, err, None)
}

/// As [`core_error`], with the reason said in the function's own terms when `because` is given
/// (for example "the age diverges in this universe" rather than "outside the domain").
pub(crate) fn core_error_because(
    py: Python<'_>,
    function: &str,
    names: &[&str],
    args: &[Arg<'_>],
    site: Option<Site<'_>>,
    err: Error,
    because: Option<&str>,
) -> PyErr {
    let position = err.argument().map(usize::from);
    let name = position.and_then(|p| names.get(p)).copied();
    let arg = position.and_then(|p| args.get(p)).copied();
    // an index into the broadcast shape belongs to element arguments and to argument-free
    // failures of one element (no convergence); never to a table or a calibration
    let element_failure = matches!(arg, Some(Arg::Value(_)) | None);
    let index = match site {
        Some(s) if element_failure && !s.shape.is_empty() => Some(unravel(s.index, s.shape)),
        _ => None,
    };
    let at = index
        .as_deref()
        .map(|i| format!(" at index {}", format_index(i)))
        .unwrap_or_default();
    let why = because.unwrap_or(reason(err));
    let message = match (name, arg) {
        (Some(n), Some(Arg::Value(v))) => match err {
            Error::EmptyInterval(p) => {
                let upper_name = names
                    .get(usize::from(p.position()) + 1)
                    .copied()
                    .unwrap_or("upper bound");
                let upper = match args.get(usize::from(p.position()) + 1) {
                    Some(Arg::Value(u)) => py_repr(*u),
                    _ => "?".into(),
                };
                format!(
                    "{function}: {n} = {}, {upper_name} = {upper}{at}: {why}",
                    py_repr(v)
                )
            }
            _ => format!("{function}: {n} = {}{at}: {why}", py_repr(v)),
        },
        (Some(n), Some(Arg::Table(t))) => match err {
            Error::ArrayTooShort(_) => {
                let count = if t.len() == 1 {
                    "1 element".to_string()
                } else {
                    format!("{} elements", t.len())
                };
                format!("{function}: {n} is too short ({count})")
            }
            Error::LengthMismatch(_) => {
                let first = names.first().copied().unwrap_or("the first array");
                let first_len = match args.first() {
                    Some(Arg::Table(f)) => f.len(),
                    _ => 0,
                };
                format!(
                    "{function}: {n} has {} elements, {first} has {first_len}: {why}",
                    t.len()
                )
            }
            Error::OutOfDomain(_) => format!("{function}: {n}: {why} (no positive response)"),
            _ => match table_offender(err, t) {
                Some(i) => {
                    let v = t.get(i).copied().unwrap_or(f64::NAN);
                    let previous = match (err, i.checked_sub(1).and_then(|j| t.get(j))) {
                        (Error::NotIncreasing(_), Some(p)) => {
                            format!(" ({n}[{}] = {})", i - 1, py_repr(*p))
                        }
                        _ => String::new(),
                    };
                    format!("{function}: {n}[{i}] = {}: {why}{previous}", py_repr(v))
                }
                None => format!("{function}: {n}: {why}"),
            },
        },
        (Some(n), Some(Arg::Calibration(c))) => {
            format!("{function}: {n} = {}: {why}", describe_calibration(c))
        }
        (Some(n), Some(Arg::Shared)) => format!("{function}: {n}: {why}"),
        (Some(n), None) => format!("{function}: {n}{at}: {why}"),
        (None, _) => {
            let inputs: Vec<String> = names
                .iter()
                .zip(args)
                .filter_map(|(n, a)| match a {
                    Arg::Value(v) => Some(format!("{n} = {}", py_repr(*v))),
                    _ => None,
                })
                .collect();
            if inputs.is_empty() {
                format!("{function}{at}: {why}")
            } else {
                format!("{function}: {why}{at} ({})", inputs.join(", "))
            }
        }
    };
    build(py, message, function, name, index, status_code(err))
}

/// Builds the `RelicoreError` for an argument whose shape the function cannot take.
pub(crate) fn shape_error(py: Python<'_>, function: &str, name: &str, what: &str) -> PyErr {
    build(
        py,
        format!("{function}: {name} {what}"),
        function,
        Some(name),
        None,
        None,
    )
}

pub(crate) fn build(
    py: Python<'_>,
    message: String,
    function: &str,
    argument: Option<&str>,
    index: Option<Vec<usize>>,
    status: Option<i32>,
) -> PyErr {
    let err = RelicoreError::new_err(message);
    let value = err.value(py);
    let index = match index {
        Some(i) => PyTuple::new(py, i).map(|t| t.into_any().unbind()).ok(),
        None => None,
    };
    let attributes = [
        value.setattr("function", function),
        value.setattr("argument", argument),
        value.setattr("index", index),
        value.setattr("status", status),
    ];
    match attributes.into_iter().find_map(Result::err) {
        Some(e) => e,
        None => err,
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn repr_matches_python_rules() {
        // expected strings are what CPython's repr() prints for these doubles (common practice,
        // Python language reference: repr gives the shortest round-trip digits)
        let cases = [
            (-3.0, "-3.0"),
            (0.0, "0.0"),
            (-0.0, "-0.0"),
            (0.1, "0.1"),
            (1e-4, "0.0001"),
            (1.5e-5, "1.5e-05"),
            (123456.789, "123456.789"),
            (1e15, "1000000000000000.0"),
            (1e16, "1e+16"),
            (2.5e-300, "2.5e-300"),
            (6.02214076e23, "6.02214076e+23"),
            (f64::NAN, "nan"),
            (f64::NEG_INFINITY, "-inf"),
        ];
        for (x, want) in cases {
            assert_eq!(py_repr(x), want, "{x:e}");
        }
    }

    #[test]
    fn unravel_is_c_order() {
        assert_eq!(unravel(5, &[2, 3]), vec![1, 2]);
        assert_eq!(unravel(7, &[2, 2, 2]), vec![1, 1, 1]);
        assert_eq!(unravel(4, &[10]), vec![4]);
    }
}
