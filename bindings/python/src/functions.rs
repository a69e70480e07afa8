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

use numpy::{
    PyArray1, PyArrayDyn, PyArrayMethods, PyReadonlyArray1, PyReadonlyArrayDyn,
    PyUntypedArrayMethods,
};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use pyo3::sync::PyOnceLock;
use pyo3::types::{PyFloat, PyInt, PyTuple};
use relicore::cosmology::Universe;
use relicore::decoupling::ThermalHistory;
use relicore::growth::{LinearGrowth, LinearPowerSpectrum};
use relicore::{ArrayResult, Error, Result};

use crate::cosmology::PyUniverse;
use crate::decoupling::PyThermalHistory;
use crate::errors::{Arg, Site, core_error_because};
use crate::generated::{GROWTH, HISTORY, PLAIN, SPECTRUM, UNIVERSE};
use crate::growth::{PyLinearGrowth, PyLinearPowerSpectrum};
use crate::kernels::{Element, check_shape, elements, run, run_array, run_frame, run_rows};

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
/// value, the chunk's output: one float per element, or a row of `Spec::width` floats for a
/// result value).
pub(crate) type FrameFn<T = f64> = fn(&[&[T]], &mut [T]) -> ArrayResult;

/// A core array function (SIMD-dispatched): (receiver, the values of the first argument, the
/// single values of the others in order, out).
pub(crate) type ArrayFn<R> = fn(&R, &[f64], &[f64], &mut [f64]) -> ArrayResult;

/// A core array function in single precision (SIMD-dispatched): (the values of the first
/// argument, the single values of the others in order, out).
pub(crate) type SingleArrayFn = fn(&[f32], &[f32], &mut [f32]) -> ArrayResult;

/// The core's single-precision twin of a regular function (`f32 = true` in the table; numbers
/// only, called on nothing): its call on a slice of the function's arity and, with `array_f32`,
/// its SIMD array form (the values of the first argument, the single values of the others, out).
pub(crate) struct Single {
    pub(crate) body: SingleBody,
    pub(crate) array: Option<SingleArrayFn>,
    /// The core's frame form in single precision (its leading single values as `Spec::frame`).
    pub(crate) frame: Option<FrameFn<f32>>,
}

/// How a single-precision twin is called: on a slice of the function's arity, returning a
/// number or writing the row of `Spec::width` floats of a result value.
pub(crate) enum SingleBody {
    Number(fn(&[f32]) -> Result<f32>),
    Row(fn(&[f32], &mut [f32]) -> Result<()>),
}

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
    /// The single-precision twin that computes float32 input, where the core has one.
    pub(crate) single: Option<Single>,
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

/// Loops of less work than this (elements, each of the core's SIMD array forms counting 1 and
/// every other call [`CALL_WORK`]) run with the GIL held: releasing and taking it back costs
/// more than such a loop (a few microseconds at most), and other threads wait no longer.
const DETACH_MIN: usize = 4096;
/// The work of one element of a loop that is not a SIMD array form.
const CALL_WORK: usize = 64;

/// Runs `f` with the GIL released when its `work` (see [`DETACH_MIN`]) is worth it.
fn loop_over<T: Send>(py: Python<'_>, work: usize, f: impl FnOnce() -> T + Send) -> T {
    if work < DETACH_MIN { f() } else { py.detach(f) }
}

/// Whether every slice in `x` has one value.
fn single_values<T>(x: &[&[T]]) -> bool {
    x.iter().all(|s| s.len() == 1)
}

/// The element loop of a regular function over `x` (each input of `out`'s length in elements or
/// of one value), writing `out` (`width` floats per element) of the broadcast `shape`.
fn map_slices<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    x: &[&[f64]],
    out: &mut [f64],
    shape: &[usize],
    nan_on_error: bool,
) -> PyResult<()> {
    let r = receiver.core();
    let width = spec.width.max(1);
    let n = out.len() / width;
    check_shape(shape, n, spec.label)?;
    if n * width != out.len() || x.len() != spec.args.len() {
        return Err(arity_error(spec, x.len()));
    }
    let keep = |e: Error| is_element_error(spec, e);
    let calls = n.saturating_mul(CALL_WORK);
    let array_path = match (spec.array, x.split_first()) {
        (Some(f), Some((first, rest))) if first.len() == n && single_values(rest) => {
            let values: Vec<f64> = rest.iter().filter_map(|s| s.first().copied()).collect();
            Some((f, *first, values))
        }
        _ => None,
    };
    let frame_path = spec
        .frame
        .filter(|&(k, _)| frame_fits(x, k, n))
        .map(|(_, f)| f);
    let failed = if let Some(f) = frame_path {
        loop_over(py, calls, || run_frame(x, out, width, nan_on_error, f))
    } else {
        match (array_path, &spec.body, x) {
            (_, Body::AN(f), _) => loop_over(py, calls, || {
                run_rows(x, out, 1, nan_on_error, keep, |v, o| {
                    for slot in o.iter_mut() {
                        *slot = f(r, v)?;
                    }
                    Ok(())
                })
            }),
            (_, Body::Row(f), _) => loop_over(py, calls, || {
                run_rows(x, out, width, nan_on_error, keep, |v, o| f(r, v, o))
            }),
            (Some((f, first, values)), _, _) => loop_over(py, n, || {
                run_array(first, out, nan_on_error, |xs, os| f(r, xs, &values, os))
            }),
            (None, Body::A1(f), &[a]) => loop_over(py, calls, || {
                run([a], out, nan_on_error, keep, |[a]| f(r, a))
            }),
            (None, Body::A2(f), &[a, b]) => loop_over(py, calls, || {
                run([a, b], out, nan_on_error, keep, |[a, b]| f(r, a, b))
            }),
            (None, Body::A3(f), &[a, b, c]) => loop_over(py, calls, || {
                run([a, b, c], out, nan_on_error, keep, |[a, b, c]| {
                    f(r, a, b, c)
                })
            }),
            (None, Body::A4(f), &[a, b, c, d]) => loop_over(py, calls, || {
                run([a, b, c, d], out, nan_on_error, keep, |[a, b, c, d]| {
                    f(r, a, b, c, d)
                })
            }),
            _ => return Err(arity_error(spec, x.len())),
        }
    };
    raise_first(py, spec, receiver, x, shape, failed)
}

/// [`map_slices`] through the single-precision twin `single` (float32 in, float32 out).
#[allow(clippy::too_many_arguments)]
fn map_single<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    single: &Single,
    receiver: &P,
    x: &[&[f32]],
    out: &mut [f32],
    shape: &[usize],
    nan_on_error: bool,
) -> PyResult<()> {
    let width = spec.width.max(1);
    let n = out.len() / width;
    check_shape(shape, n, spec.label)?;
    if n * width != out.len() || x.len() != spec.args.len() {
        return Err(arity_error(spec, x.len()));
    }
    let keep = |e: Error| is_element_error(spec, e);
    let calls = n.saturating_mul(CALL_WORK);
    let frame_path = match (spec.frame, single.frame) {
        (Some((k, _)), Some(f)) if frame_fits(x, k, n) => Some(f),
        _ => None,
    };
    if let Some(f) = frame_path {
        let failed = loop_over(py, calls, || run_frame(x, out, width, nan_on_error, f));
        return raise_first(py, spec, receiver, x, shape, failed);
    }
    let failed = match (single.array, x.split_first()) {
        (Some(f), Some((first, rest))) if first.len() == n && single_values(rest) => {
            let values: Vec<f32> = rest.iter().filter_map(|s| s.first().copied()).collect();
            loop_over(py, n, || {
                run_array(first, out, nan_on_error, |xs, os| f(xs, &values, os))
            })
        }
        _ => match single.body {
            SingleBody::Number(f) => loop_over(py, calls, || {
                run_rows(x, out, 1, nan_on_error, keep, |v, o| {
                    for slot in o.iter_mut() {
                        *slot = f(v)?;
                    }
                    Ok(())
                })
            }),
            SingleBody::Row(f) => {
                loop_over(py, calls, || run_rows(x, out, width, nan_on_error, keep, f))
            }
        },
    };
    raise_first(py, spec, receiver, x, shape, failed)
}

/// Whether a frame form fits the operands: its first `k` arguments single values and the next
/// one (the signals) of one value per element.
fn frame_fits<T>(x: &[&[T]], k: usize, n: usize) -> bool {
    x.iter().take(k).all(|s| s.len() == 1) && x.get(k).is_some_and(|s| s.len() == n)
}

/// The error of the first failing element of a loop (its inputs in the message), if any.
fn raise_first<P: Receiver, T: Element + Into<f64>>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    x: &[&[T]],
    shape: &[usize],
    failed: Option<(usize, Error)>,
) -> PyResult<()> {
    match failed {
        None => Ok(()),
        Some((i, e)) => {
            let at = |s: &&[T]| s.get(if s.len() == 1 { 0 } else { i }).copied();
            let values: Vec<f64> = x
                .iter()
                .map(|s| at(s).map_or(f64::NAN, Into::into))
                .collect();
            let site = Site { index: i, shape };
            Err(failure(py, spec, receiver, &values, Some(site), e))
        }
    }
}

/// `Function.map` with float64 operands and output.
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
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.label)))?;
    let n = out.len() / spec.width.max(1);
    let x = elements(inputs, n, spec.label)?;
    map_slices(py, spec, receiver, &x, out, shape, nan_on_error)
}

/// `Function.map` with float32 operands and output (the single-precision twin).
#[allow(clippy::too_many_arguments)]
fn map32<P: Receiver>(
    py: Python<'_>,
    spec: &Spec<P::Core>,
    receiver: &P,
    inputs: &[PyReadonlyArray1<'_, f32>],
    out: &Bound<'_, PyArray1<f32>>,
    shape: &[usize],
    nan_on_error: bool,
) -> PyResult<()> {
    let Some(single) = &spec.single else {
        return Err(PyTypeError::new_err(format!(
            "{}: has no single-precision twin",
            spec.label
        )));
    };
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{}: out: {e}", spec.label)))?;
    let n = out.len() / spec.width.max(1);
    let x = elements(inputs, n, spec.label)?;
    map_single(py, spec, single, receiver, &x, out, shape, nan_on_error)
}

/// One argument of `Function.apply` in a form the native path takes without numpy's help.
enum Operand<'py> {
    /// A Python float or int (weak in numpy's promotion: it takes the arrays' precision).
    Number(f64),
    /// A numpy.float64 scalar (strong in numpy's promotion: the call is float64).
    Double64(f64),
    /// A C-contiguous, aligned float64 array.
    Double(Bound<'py, PyArrayDyn<f64>>),
    /// A C-contiguous, aligned float32 array.
    Single(Bound<'py, PyArrayDyn<f32>>),
}

fn plain_array<'py, A: PyUntypedArrayMethods<'py>>(a: &A) -> bool {
    a.is_c_contiguous() && a.is_aligned()
}

/// `a` as an [`Operand`], or None when the Python path must convert it first (lists, other
/// dtypes, numpy scalars other than float64, non-contiguous or misaligned arrays).
fn operand<'py>(a: &Bound<'py, PyAny>) -> Option<Operand<'py>> {
    if let Ok(f) = a.cast_exact::<PyFloat>() {
        return Some(Operand::Number(f.value()));
    }
    if let Ok(f) = a.cast::<PyFloat>() {
        // numpy.float64 (a float subclass): a float64 operand in numpy's promotion
        return Some(Operand::Double64(f.value()));
    }
    if a.is_instance_of::<PyInt>() {
        return a.extract::<f64>().ok().map(Operand::Number);
    }
    if let Ok(x) = a.cast::<PyArrayDyn<f64>>() {
        return plain_array(x).then(|| Operand::Double(x.clone()));
    }
    if let Ok(x) = a.cast::<PyArrayDyn<f32>>() {
        return plain_array(x).then(|| Operand::Single(x.clone()));
    }
    None
}

/// numpy's broadcast of `shapes`, or None when they do not broadcast.
fn broadcast(shapes: &[&[usize]]) -> Option<Vec<usize>> {
    let ndim = shapes.iter().map(|s| s.len()).max().unwrap_or(0);
    let mut out = vec![1usize; ndim];
    for s in shapes {
        for (o, &d) in out.iter_mut().rev().zip(s.iter().rev()) {
            if *o == 1 {
                *o = d;
            } else if d != 1 && d != *o {
                return None;
            }
        }
    }
    Some(out)
}

/// The slices of the operands for the loop: an array's data, a number as one value.
fn slices<'a, T: numpy::Element + Copy>(
    arrays: &'a [Option<PyReadonlyArrayDyn<'_, T>>],
    numbers: &'a [T],
) -> Option<Vec<&'a [T]>> {
    arrays
        .iter()
        .zip(numbers)
        .map(|(a, v)| match a {
            Some(a) => a.as_slice().ok(),
            None => Some(std::slice::from_ref(v)),
        })
        .collect()
}

/// The native path of `Function.apply`: Some(result) when every argument is a Python number or
/// a plain float64 (or, with a single-precision twin, float32) array whose shape is the broadcast
/// shape or holds one element; None when the Python path must convert the arguments.
fn apply_native<'py, P: Receiver>(
    py: Python<'py>,
    spec: &Spec<P::Core>,
    receiver: &P,
    args: &Bound<'py, PyTuple>,
    nan_on_error: bool,
) -> PyResult<Option<Bound<'py, PyAny>>> {
    if spec.width != 1 || args.len() != spec.args.len() {
        return Ok(None);
    }
    let mut ops = Vec::with_capacity(args.len());
    for a in args.iter() {
        match operand(&a) {
            Some(op) => ops.push(op),
            None => return Ok(None),
        }
    }
    let numbers: Vec<f64> = ops
        .iter()
        .map(|op| match op {
            Operand::Number(v) | Operand::Double64(v) => *v,
            _ => f64::NAN,
        })
        .collect();
    let (mut doubles, mut singles) = (false, false);
    let mut shapes: Vec<&[usize]> = Vec::with_capacity(ops.len());
    for op in &ops {
        match op {
            Operand::Number(_) => {}
            Operand::Double64(_) => doubles = true,
            Operand::Double(a) => {
                doubles = true;
                shapes.push(a.shape());
            }
            Operand::Single(a) => {
                singles = true;
                shapes.push(a.shape());
            }
        }
    }
    if shapes.is_empty() {
        let v = call(py, spec, receiver, &numbers, nan_on_error)?;
        return Ok(Some(PyFloat::new(py, v).into_any()));
    }
    // mixed precisions, or float32 without a twin: numpy's promotion is float64 (Python path)
    let single = match (&spec.single, doubles, singles) {
        (_, true, false) => None,
        (Some(s), false, true) => Some(s),
        _ => return Ok(None),
    };
    let Some(shape) = broadcast(&shapes) else {
        return Ok(None);
    };
    let n: usize = shape.iter().product();
    if shapes
        .iter()
        .any(|s| *s != shape.as_slice() && s.iter().product::<usize>() != 1)
    {
        return Ok(None);
    }
    if let Some(single) = single {
        let arrays: Vec<Option<PyReadonlyArrayDyn<'_, f32>>> = ops
            .iter()
            .map(|op| match op {
                Operand::Single(a) => a.try_readonly().ok(),
                _ => None,
            })
            .collect();
        if arrays
            .iter()
            .zip(&ops)
            .any(|(a, op)| a.is_none() && !matches!(op, Operand::Number(_) | Operand::Double64(_)))
        {
            return Ok(None);
        }
        let numbers32: Vec<f32> = numbers.iter().map(|&v| v as f32).collect();
        let Some(x) = slices(&arrays, &numbers32) else {
            return Ok(None);
        };
        // SAFETY: a new array, uninitialised, that nothing else references; the loop writes
        // every element before Python sees it (on failure it is dropped).
        let out = unsafe { PyArrayDyn::<f32>::new(py, shape.as_slice(), false) };
        let mut w = out.try_readwrite()?;
        let o = w
            .as_slice_mut()
            .map_err(|e| PyValueError::new_err(e.to_string()))?;
        debug_assert_eq!(o.len(), n);
        map_single(py, spec, single, receiver, &x, o, &shape, nan_on_error)?;
        drop(w);
        return Ok(Some(out.into_any()));
    }
    let arrays: Vec<Option<PyReadonlyArrayDyn<'_, f64>>> = ops
        .iter()
        .map(|op| match op {
            Operand::Double(a) => a.try_readonly().ok(),
            _ => None,
        })
        .collect();
    if arrays
        .iter()
        .zip(&ops)
        .any(|(a, op)| a.is_none() && !matches!(op, Operand::Number(_) | Operand::Double64(_)))
    {
        return Ok(None);
    }
    let Some(x) = slices(&arrays, &numbers) else {
        return Ok(None);
    };
    // SAFETY: as above.
    let out = unsafe { PyArrayDyn::<f64>::new(py, shape.as_slice(), false) };
    let mut w = out.try_readwrite()?;
    let o = w
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(e.to_string()))?;
    map_slices(py, spec, receiver, &x, o, &shape, nan_on_error)?;
    drop(w);
    Ok(Some(out.into_any()))
}

/// The Python path of `Function.apply` (relicore._elementwise.apply): conversion, broadcasting
/// and dtype checks of arguments the native path does not take.
static PYTHON_APPLY: PyOnceLock<Py<PyAny>> = PyOnceLock::new();

/// The `out=` form of `Function.apply` (relicore._elementwise.apply_out).
static PYTHON_APPLY_OUT: PyOnceLock<Py<PyAny>> = PyOnceLock::new();

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

    /// Whether float32 input is computed by the core's single-precision twin.
    #[getter]
    fn single(&self) -> bool {
        match self.entry {
            Entry::Plain(s) => s.single.is_some(),
            Entry::Universe(s) => s.single.is_some(),
            Entry::History(s) => s.single.is_some(),
            Entry::Growth(s) => s.single.is_some(),
            Entry::Spectrum(s) => s.single.is_some(),
        }
    }

    /// Element loop: `inputs` are contiguous 1-D float64 arrays of `prod(shape)` elements or of
    /// one (broadcast) element, `out` the contiguous output of `prod(shape)` elements; float32
    /// inputs and output instead run the single-precision twin. Runs with the GIL released
    /// (large arrays).
    #[pyo3(signature = (receiver, inputs, out, shape, nan_on_error=false))]
    fn map(
        &self,
        py: Python<'_>,
        receiver: &Bound<'_, PyAny>,
        inputs: Vec<Bound<'_, PyAny>>,
        out: &Bound<'_, PyAny>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        if let Ok(out) = out.cast::<PyArray1<f32>>() {
            let inputs = inputs
                .iter()
                .map(|a| Ok(a.cast::<PyArray1<f32>>()?.try_readonly()?))
                .collect::<PyResult<Vec<_>>>()?;
            return with_receiver!(self.entry, receiver, |spec, r| map32(
                py,
                spec,
                r,
                &inputs,
                out,
                &shape,
                nan_on_error
            ));
        }
        let out = out.cast::<PyArray1<f64>>()?;
        let inputs = inputs
            .iter()
            .map(|a| Ok(a.cast::<PyArray1<f64>>()?.try_readonly()?))
            .collect::<PyResult<Vec<_>>>()?;
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

    /// Calls the function on `args` (of `receiver`, None for a plain function) as the public
    /// wrappers do: a float for Python numbers, else an array of the broadcast shape, float32
    /// where the core's single-precision twin computes float32 input. Plain float64 (float32)
    /// arrays and Python numbers are handled here in one native call; anything else goes
    /// through the Python path (relicore._elementwise.apply), which converts and checks it.
    ///
    /// With `out` (an array) the result is written into it (relicore._elementwise.apply_out:
    /// computed as above, then copied) and `out` is returned.
    #[pyo3(signature = (receiver, args, nan_on_error=false, out=None))]
    fn apply<'py>(
        slf: &Bound<'py, Self>,
        receiver: &Bound<'py, PyAny>,
        args: &Bound<'py, PyTuple>,
        nan_on_error: bool,
        out: Option<&Bound<'py, PyAny>>,
    ) -> PyResult<Bound<'py, PyAny>> {
        let py = slf.py();
        if let Some(out) = out.filter(|o| !o.is_none()) {
            let python = PYTHON_APPLY_OUT.get_or_try_init(py, || {
                Ok::<_, PyErr>(
                    py.import("relicore._elementwise")?
                        .getattr("apply_out")?
                        .unbind(),
                )
            })?;
            return python
                .bind(py)
                .call1((slf, receiver, args, nan_on_error, out));
        }
        let done = with_receiver!(slf.get().entry, receiver, |spec, r| apply_native(
            py,
            spec,
            r,
            args,
            nan_on_error
        ))?;
        if let Some(result) = done {
            return Ok(result);
        }
        let python = PYTHON_APPLY.get_or_try_init(py, || {
            Ok::<_, PyErr>(
                py.import("relicore._elementwise")?
                    .getattr("apply")?
                    .unbind(),
            )
        })?;
        python.bind(py).call1((slf, receiver, args, nan_on_error))
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
            Some((1, Error::Negative(relicore::arg!(0, z))))
        );
        assert_eq!(run([&z], &mut out, true, |_| true, f), None);
        assert!(out[1].is_nan());
        assert_eq!(out[0], u.luminosity_distance_mpc(0.1).unwrap());
        assert_eq!(out[2], u.luminosity_distance_mpc(2.0).unwrap());
    }
}
