//! The regular functions of the core (one declaration each in `bindings/functions.toml`, their
//! tables generated into `generated.rs`) and the one native class that calls any of them on
//! scalars or loops it over arrays: `relicore._native.Function`.
//!
//! A regular function has element-wise `f64` arguments (up to four as plain `fn` values, more
//! as a slice) and is called on nothing, on a universe or on a thermal history (its receiver);
//! it returns a number, or a result value written as one row of `width` floats (a temperature
//! with its uncertainty). Where the core has a frame form (an image of signals with per-pixel or
//! shared parameters) the loop goes through it. The receiver decides what the error
//! message adds (a reason in the function's own terms, a universe the model refuses); the rest
//! (broadcast inputs, the parallel loop with the GIL released, NaN on failure, the message
//! naming the argument, its value and the index) is the same code for every function.

use numpy::{PyArray1, PyArrayMethods, PyReadonlyArray1};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use relicore::cosmology::Universe;
use relicore::decoupling::ThermalHistory;
use relicore::growth::{LinearGrowth, LinearPowerSpectrum};
use relicore::{ArrayResult, Error, Result};

use crate::cosmology::PyUniverse;
use crate::decoupling::PyThermalHistory;
use crate::errors::{Arg, Site, core_error_because};
use crate::generated::{GROWTH, HISTORY, PLAIN, SPECTRUM, UNIVERSE};
use crate::growth::{PyLinearGrowth, PyLinearPowerSpectrum};
use crate::kernels::{check_shape, elements, run, run_array, run_frame, run_rows};

pub(crate) type U = Universe<f64>;
pub(crate) type H = ThermalHistory<f64>;
pub(crate) type G = LinearGrowth<f64>;
pub(crate) type S = LinearPowerSpectrum<f64>;

/// How a core function is called: on its receiver `R` and 0 to 4 element-wise arguments.
pub(crate) enum Body<R: 'static> {
    A0(fn(&R) -> Result<f64>),
    A1(fn(&R, f64) -> Result<f64>),
    A2(fn(&R, f64, f64) -> Result<f64>),
    A3(fn(&R, f64, f64, f64) -> Result<f64>),
    A4(fn(&R, f64, f64, f64, f64) -> Result<f64>),
    /// Any number of arguments, as a slice of the function's arity.
    AN(fn(&R, &[f64]) -> Result<f64>),
    /// A result value: writes the row of `Spec::width` floats of the arguments' result.
    Row(fn(&R, &[f64], &mut [f64]) -> Result<()>),
}

/// A core frame function: (the inputs of one chunk, each of the chunk's length or of one
/// value, the chunk's output).
pub(crate) type FrameFn = fn(&[&[f64]], &mut [f64]) -> ArrayResult;

/// A core array function (SIMD-dispatched): (receiver, the values of the first argument, the
/// single values of the others in order, out).
pub(crate) type ArrayFn<R> = fn(&R, &[f64], &[f64], &mut [f64]) -> ArrayResult;

/// One regular function, as `generated.rs` declares it.
pub(crate) struct Spec<R: 'static> {
    pub(crate) name: &'static str,
    /// Its topic (`blackbody`, `cosmology`, `decoupling`, `growth`).
    pub(crate) topic: &'static str,
    /// How error messages name it (`Universe.age_gyr`, `saha_ionized_fraction`).
    pub(crate) label: &'static str,
    /// The element-wise parameter names, in the core's order.
    pub(crate) args: &'static [&'static str],
    /// A free function of the core taking the receiver as its argument 0 (so the core's error
    /// positions count the receiver), rather than a method.
    pub(crate) free: bool,
    pub(crate) body: Body<R>,
    /// The core's SIMD array form, used when the first argument is an array and the others are
    /// single values.
    pub(crate) array: Option<ArrayFn<R>>,
    /// The core's frame form and the number of leading arguments it takes as single values,
    /// used when those are single values and the next argument has one value per element.
    pub(crate) frame: Option<(usize, FrameFn)>,
    /// Floats per element of the result: 1 for a number, the row width of a result value.
    pub(crate) width: usize,
}

/// A value returned by the core as it is (`T`) or as a `Result<T>`, as a `Result<f64>`.
pub(crate) trait Lift {
    fn lift(self) -> Result<f64>;
}

impl Lift for f64 {
    fn lift(self) -> Result<f64> {
        Ok(self)
    }
}

impl Lift for Result<f64> {
    fn lift(self) -> Result<f64> {
        self
    }
}

/// What a regular function is called on, as Python passes it: nothing, a universe or a thermal
/// history.
pub(crate) trait Receiver: Sync {
    type Core: Sync + 'static;
    /// The receiver's name as an argument of a free function of it.
    const ARGUMENT: &'static str;
    fn core(&self) -> &Self::Core;
    /// The error of a free function when the receiver itself is refused (raised even with
    /// `nan_on_error`: it is not the fault of one element).
    fn refused(&self, _py: Python<'_>, _label: &str, _err: Error) -> Option<PyErr> {
        None
    }
    /// The reason of a failure in the function's own terms, where the generic one is vague.
    fn because(&self, _name: &str, _err: Error) -> Option<String> {
        None
    }
}

impl Receiver for () {
    type Core = ();
    const ARGUMENT: &'static str = "";
    fn core(&self) -> &() {
        self
    }
}

fn eval<R>(body: &Body<R>, r: &R, x: &[f64]) -> Option<Result<f64>> {
    Some(match (body, x) {
        (Body::A0(f), []) => f(r),
        (Body::A1(f), &[a]) => f(r, a),
        (Body::A2(f), &[a, b]) => f(r, a, b),
        (Body::A3(f), &[a, b, c]) => f(r, a, b, c),
        (Body::A4(f), &[a, b, c, d]) => f(r, a, b, c, d),
        (Body::AN(f), x) => f(r, x),
        _ => return None,
    })
}

fn arity_error<R>(spec: &Spec<R>, got: usize) -> PyErr {
    PyTypeError::new_err(format!(
        "{}: takes {} arguments, got {got}",
        spec.label,
        spec.args.len()
    ))
}

/// Whether `nan_on_error` may turn this failure into NaN (a refused receiver always raises).
fn is_element_error<R>(spec: &Spec<R>, err: Error) -> bool {
    !(spec.free && matches!(err, Error::InvalidParameter(_)))
}

fn failure<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    values: &[f64],
    site: Option<Site<'_>>,
    err: Error,
) -> PyErr {
    if !is_element_error(spec, err)
        && let Some(e) = receiver.refused(py, spec.label, err)
    {
        return e;
    }
    let because = receiver.because(spec.name, err);
    let mut names = Vec::with_capacity(spec.args.len() + 1);
    let mut args = Vec::with_capacity(spec.args.len() + 1);
    if spec.free {
        names.push(P::ARGUMENT);
        args.push(Arg::Shared);
    }
    names.extend_from_slice(spec.args);
    args.extend(values.iter().map(|&v| Arg::Value(v)));
    core_error_because(py, spec.label, &names, &args, site, err, because.as_deref())
}

fn call<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    args: &[f64],
    nan_on_error: bool,
) -> PyResult<f64> {
    if args.len() != spec.args.len() {
        return Err(arity_error(spec, args.len()));
    }
    match eval(&spec.body, receiver.core(), args) {
        None => Err(arity_error(spec, args.len())),
        Some(Ok(v)) => Ok(v),
        Some(Err(e)) if nan_on_error && is_element_error(spec, e) => Ok(f64::NAN),
        Some(Err(e)) => Err(failure(py, spec, receiver, args, None, e)),
    }
}

fn call_row<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    args: &[f64],
    nan_on_error: bool,
) -> PyResult<Vec<f64>> {
    let Body::Row(f) = spec.body else {
        return call(py, spec, receiver, args, nan_on_error).map(|v| vec![v]);
    };
    if args.len() != spec.args.len() {
        return Err(arity_error(spec, args.len()));
    }
    let mut row = vec![f64::NAN; spec.width];
    match f(receiver.core(), args, &mut row) {
        Ok(()) => Ok(row),
        Err(e) if nan_on_error && is_element_error(spec, e) => Ok(vec![f64::NAN; spec.width]),
        Err(e) => Err(failure(py, spec, receiver, args, None, e)),
    }
}

#[allow(clippy::too_many_arguments)]
fn map<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    inputs: &[PyReadonlyArray1<'_, f64>],
    out: &Bound<'_, PyArray1<f64>>,
    shape: &[usize],
    nan_on_error: bool,
) -> PyResult<()> {
    let r = receiver.core();
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.label)))?;
    let width = spec.width.max(1);
    let n = out.len() / width;
    check_shape(shape, n, spec.label)?;
    if n * width != out.len() || inputs.len() != spec.args.len() {
        return Err(arity_error(spec, inputs.len()));
    }
    let x = elements(inputs, n, spec.label)?;
    let keep = |e: Error| is_element_error(spec, e);
    let single = |s: &[f64]| s.len() == 1;
    let array_path = match (spec.array, x.split_first()) {
        (Some(f), Some((first, rest))) if first.len() == n && rest.iter().all(|s| single(s)) => {
            let values: Vec<f64> = rest.iter().filter_map(|s| s.first().copied()).collect();
            Some((f, *first, values))
        }
        _ => None,
    };
    let frame_path = match spec.frame {
        Some((k, f))
            if x.iter().take(k).all(|s| single(s)) && x.get(k).is_some_and(|s| s.len() == n) =>
        {
            Some(f)
        }
        _ => None,
    };
    let failed = if let Some(f) = frame_path {
        py.detach(|| run_frame(&x, out, nan_on_error, f))
    } else {
        match (array_path, &spec.body, x.as_slice()) {
            (_, Body::AN(f), _) => py.detach(|| {
                run_rows(&x, out, 1, nan_on_error, keep, |v, o| {
                    for slot in o.iter_mut() {
                        *slot = f(r, v)?;
                    }
                    Ok(())
                })
            }),
            (_, Body::Row(f), _) => {
                py.detach(|| run_rows(&x, out, width, nan_on_error, keep, |v, o| f(r, v, o)))
            }
            (Some((f, first, values)), _, _) => {
                py.detach(|| run_array(first, out, nan_on_error, |xs, os| f(r, xs, &values, os)))
            }
            (None, Body::A1(f), &[a]) => {
                py.detach(|| run([a], out, nan_on_error, keep, |[a]| f(r, a)))
            }
            (None, Body::A2(f), &[a, b]) => {
                py.detach(|| run([a, b], out, nan_on_error, keep, |[a, b]| f(r, a, b)))
            }
            (None, Body::A3(f), &[a, b, c]) => py.detach(|| {
                run([a, b, c], out, nan_on_error, keep, |[a, b, c]| {
                    f(r, a, b, c)
                })
            }),
            (None, Body::A4(f), &[a, b, c, d]) => py.detach(|| {
                run([a, b, c, d], out, nan_on_error, keep, |[a, b, c, d]| {
                    f(r, a, b, c, d)
                })
            }),
            _ => return Err(arity_error(spec, x.len())),
        }
    };
    match failed {
        None => Ok(()),
        Some((i, e)) => {
            let at = |s: &&[f64]| s.get(if s.len() == 1 { 0 } else { i }).copied();
            let values: Vec<f64> = x.iter().map(|s| at(s).unwrap_or(f64::NAN)).collect();
            let site = Site { index: i, shape };
            Err(failure(py, spec, receiver, &values, Some(site), e))
        }
    }
}

/// A regular function of one of the generated tables.
#[derive(Clone, Copy)]
enum Entry {
    Plain(&'static Spec<()>),
    Universe(&'static Spec<U>),
    History(&'static Spec<H>),
    Growth(&'static Spec<G>),
    Spectrum(&'static Spec<S>),
}

/// Runs `$body` with `$spec` the entry's spec and `$receiver` the receiver Python passed, as
/// the Rust value the entry's functions take.
macro_rules! with_receiver {
    ($entry:expr, $object:expr, |$spec:ident, $receiver:ident| $body:expr) => {
        match $entry {
            Entry::Plain($spec) => {
                let $receiver = &();
                $body
            }
            Entry::Universe($spec) => {
                let bound = $object.cast::<PyUniverse>()?;
                let $receiver = bound.get();
                $body
            }
            Entry::History($spec) => {
                let bound = $object.cast::<PyThermalHistory>()?;
                let $receiver = bound.get();
                $body
            }
            Entry::Growth($spec) => {
                let bound = $object.cast::<PyLinearGrowth>()?;
                let $receiver = bound.get();
                $body
            }
            Entry::Spectrum($spec) => {
                let bound = $object.cast::<PyLinearPowerSpectrum>()?;
                let $receiver = bound.get();
                $body
            }
        }
    };
}

/// One regular function of the core, as the Python wrappers call it
/// (`relicore._native.functions()`).
#[pyclass(frozen, module = "relicore._native", name = "Function")]
pub(crate) struct Function {
    entry: Entry,
}

impl Function {
    fn parts(
        &self,
    ) -> (
        &'static str,
        &'static str,
        &'static str,
        &'static [&'static str],
    ) {
        match self.entry {
            Entry::Plain(s) => (s.name, s.topic, s.label, s.args),
            Entry::Universe(s) => (s.name, s.topic, s.label, s.args),
            Entry::History(s) => (s.name, s.topic, s.label, s.args),
            Entry::Growth(s) => (s.name, s.topic, s.label, s.args),
            Entry::Spectrum(s) => (s.name, s.topic, s.label, s.args),
        }
    }
}

#[pymethods]
impl Function {
    /// Name of the core function.
    #[getter]
    fn name(&self) -> &'static str {
        self.parts().0
    }

    /// Its topic: blackbody, cosmology, decoupling or growth.
    #[getter]
    fn topic(&self) -> &'static str {
        self.parts().1
    }

    /// How error messages name it.
    #[getter]
    fn label(&self) -> &'static str {
        self.parts().2
    }

    /// What it is called on: "none", "universe", "history", "growth" or "power_spectrum".
    #[getter]
    fn receiver(&self) -> &'static str {
        match self.entry {
            Entry::Plain(_) => "none",
            Entry::Universe(_) => "universe",
            Entry::History(_) => "history",
            Entry::Growth(_) => "growth",
            Entry::Spectrum(_) => "power_spectrum",
        }
    }

    /// Names of the element-wise parameters, in order.
    #[getter]
    fn arguments(&self) -> Vec<&'static str> {
        self.parts().3.to_vec()
    }

    /// Floats per element of the result: 1 for a number, more for a result value (a row).
    #[getter]
    fn width(&self) -> usize {
        match self.entry {
            Entry::Plain(s) => s.width,
            Entry::Universe(s) => s.width,
            Entry::History(s) => s.width,
            Entry::Growth(s) => s.width,
            Entry::Spectrum(s) => s.width,
        }
    }

    /// Calls a function with a result value on scalars: its row of `width` floats (NaN with
    /// `nan_on_error` when the arguments fail).
    #[pyo3(signature = (receiver, args, nan_on_error=false))]
    fn call_row(
        &self,
        py: Python<'_>,
        receiver: &Bound<'_, PyAny>,
        args: Vec<f64>,
        nan_on_error: bool,
    ) -> PyResult<Vec<f64>> {
        with_receiver!(self.entry, receiver, |spec, r| call_row(
            py,
            spec,
            r,
            &args,
            nan_on_error
        ))
    }

    /// Calls the function on scalars (of `receiver`, None for a plain function); with
    /// `nan_on_error` a failure of the arguments gives NaN.
    #[pyo3(signature = (receiver, args, nan_on_error=false))]
    fn call(
        &self,
        py: Python<'_>,
        receiver: &Bound<'_, PyAny>,
        args: Vec<f64>,
        nan_on_error: bool,
    ) -> PyResult<f64> {
        with_receiver!(self.entry, receiver, |spec, r| call(
            py,
            spec,
            r,
            &args,
            nan_on_error
        ))
    }

    /// Element loop: `inputs` are contiguous 1-D float64 arrays of `prod(shape)` elements or of
    /// one (broadcast) element, `out` the contiguous output of `prod(shape)` elements. Runs
    /// with the GIL released.
    #[pyo3(signature = (receiver, inputs, out, shape, nan_on_error=false))]
    fn map(
        &self,
        py: Python<'_>,
        receiver: &Bound<'_, PyAny>,
        inputs: Vec<PyReadonlyArray1<'_, f64>>,
        out: &Bound<'_, PyArray1<f64>>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        with_receiver!(self.entry, receiver, |spec, r| map(
            py,
            spec,
            r,
            &inputs,
            out,
            &shape,
            nan_on_error
        ))
    }

    fn __repr__(&self) -> String {
        let (_, _, label, args) = self.parts();
        format!("<relicore function {label}({})>", args.join(", "))
    }
}

/// Every regular function, in the order of the table.
#[pyfunction]
pub(crate) fn functions() -> Vec<Function> {
    let plain = PLAIN.iter().map(Entry::Plain);
    let universe = UNIVERSE.iter().map(Entry::Universe);
    let history = HISTORY.iter().map(Entry::History);
    let growth = GROWTH.iter().map(Entry::Growth);
    let spectrum = SPECTRUM.iter().map(Entry::Spectrum);
    plain
        .chain(universe)
        .chain(history)
        .chain(growth)
        .chain(spectrum)
        .map(|entry| Function { entry })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn names_are_unique() {
        let names: Vec<&str> = functions().iter().map(|f| f.parts().0).collect();
        for (i, a) in names.iter().enumerate() {
            assert!(names.iter().skip(i + 1).all(|b| b != a), "{a}");
        }
    }

    #[test]
    fn the_loop_gives_the_scalar_results() {
        let u = U::new(relicore::cosmology::UniverseParameters::new(70.0, 0.3)).unwrap();
        let z = [0.1, -1.0, 2.0];
        let mut out = [0.0; 3];
        let f = |[z]: [f64; 1]| u.luminosity_distance_mpc(z);
        assert_eq!(
            run([&z], &mut out, false, |_| true, f),
            Some((1, Error::Negative(0)))
        );
        assert_eq!(run([&z], &mut out, true, |_| true, f), None);
        assert!(out[1].is_nan());
        assert_eq!(out[0], u.luminosity_distance_mpc(0.1).unwrap());
        assert_eq!(out[2], u.luminosity_distance_mpc(2.0).unwrap());
    }
}
