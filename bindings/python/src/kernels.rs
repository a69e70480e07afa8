//! The one generic element loop of the Python face, and the checks of its operands.
//!
//! The loop runs with the GIL released, reads each input either at the element index or at
//! index 0 (a broadcast scalar), writes one output per element and allocates nothing per
//! element; large arrays are split over cores.

use numpy::PyReadonlyArray1;
use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use relicore::{ArrayResult, ElementError, Error, Result};

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
pub(crate) fn run_array<T: Element>(
    x: &[T],
    out: &mut [T],
    nan_on_error: bool,
    f: impl Fn(&[T], &mut [T]) -> ArrayResult + Sync,
) -> Option<(usize, Error)> {
    let first = split(out, |start, part| {
        let Some(xs) = x.get(start..start + part.len()) else {
            return Some((start, Error::LengthMismatch(relicore::arg!(0, arrays))));
        };
        f(xs, part).err().map(|e| (start + e.index, e.error))
    });
    if nan_on_error { None } else { first }
}

/// Runs `body(start, part)` over `out`: on the calling thread for short arrays, else over one
/// contiguous part per core (see [`run`]); returns the failure of the lowest index.
fn split<T: Element>(
    out: &mut [T],
    body: impl Fn(usize, &mut [T]) -> Option<(usize, Error)> + Sync,
) -> Option<(usize, Error)> {
    split_rows(out, 1, body)
}

/// [`split`] over rows of `width` floats: `start` counts rows and every part holds whole rows.
fn split_rows<T: Element>(
    out: &mut [T],
    width: usize,
    body: impl Fn(usize, &mut [T]) -> Option<(usize, Error)> + Sync,
) -> Option<(usize, Error)> {
    let width = width.max(1);
    let n = out.len() / width;
    let threads = worker_count().min(n / PARALLEL_MIN.max(1) + 1);
    if n < PARALLEL_MIN || threads < 2 {
        return body(0, out);
    }
    let chunk = n.div_ceil(threads) * width;
    let body = &body;
    let spawned = std::thread::scope(|s| {
        let mut parts = out.chunks_mut(chunk);
        // the first part runs on the calling thread (idle otherwise: the GIL is released), the
        // others on one new thread each
        let own = parts.next();
        let mut handles = Vec::with_capacity(threads);
        for (k, part) in parts.enumerate() {
            let start = (k + 1) * (chunk / width);
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

/// An element type of the loops: `f64`, and `f32` for the single-precision twins.
pub(crate) trait Element: Copy + Send + Sync + 'static {
    const NAN: Self;
}

impl Element for f64 {
    const NAN: Self = f64::NAN;
}

impl Element for f32 {
    const NAN: Self = f32::NAN;
}

/// The most element-wise arguments a regular function has (the loops below gather them on the
/// stack).
const MAX_ARGS: usize = 16;

/// [`run`] for any number of inputs and a result of `width` floats per element:
/// `f(values, row)` writes element i's row `out[i·width..(i + 1)·width]` from its input values
/// (input k read at i, or at 0 when it has one element). A failing element's row is NaN when
/// `nan_on_error` and `keep_going(err)`; otherwise the failure of the lowest index is returned.
/// Split over cores as [`run`], with the serial bits.
pub(crate) fn run_rows<T: Element>(
    inputs: &[&[T]],
    out: &mut [T],
    width: usize,
    nan_on_error: bool,
    keep_going: impl Fn(Error) -> bool + Sync,
    f: impl Fn(&[T], &mut [T]) -> Result<()> + Sync,
) -> Option<(usize, Error)> {
    let m = inputs.len();
    if m > MAX_ARGS {
        return Some((0, Error::LengthMismatch(relicore::arg!(0, arrays))));
    }
    let width = width.max(1);
    split_rows(out, width, |start, part| {
        let mut x = [T::NAN; MAX_ARGS];
        for (j, row) in part.chunks_exact_mut(width).enumerate() {
            let i = start + j;
            for (xk, s) in x.iter_mut().zip(inputs) {
                *xk = s
                    .get(if s.len() == 1 { 0 } else { i })
                    .copied()
                    .unwrap_or(T::NAN);
            }
            let values = x.get(..m).unwrap_or(&[]);
            match f(values, row) {
                Ok(()) => {}
                Err(e) if nan_on_error && keep_going(e) => row.fill(T::NAN),
                Err(e) => return Some((i, e)),
            }
        }
        None
    })
}

/// `out[i]` through a core frame function `f(chunk inputs, chunk out)` (the signals and the
/// per-pixel parameters cut to each chunk, single values passed whole), split over cores as
/// [`run`]; every element is the core's frame element, which is bit for bit the scalar
/// function's. Returns the first failing element; with `nan_on_error` the call succeeds with its
/// NaN.
pub(crate) fn run_frame<T: Element>(
    inputs: &[&[T]],
    out: &mut [T],
    width: usize,
    nan_on_error: bool,
    f: impl Fn(&[&[T]], &mut [T]) -> ArrayResult + Sync,
) -> Option<(usize, Error)> {
    let m = inputs.len();
    if m > MAX_ARGS {
        return Some((0, Error::LengthMismatch(relicore::arg!(0, arrays))));
    }
    let width = width.max(1);
    let n = out.len() / width;
    let first = split_rows(out, width, |start, part| {
        let rows = part.len() / width;
        let mut chunk: [&[T]; MAX_ARGS] = [&[]; MAX_ARGS];
        for (c, s) in chunk.iter_mut().zip(inputs) {
            *c = if s.len() == 1 && n != 1 {
                s
            } else {
                match s.get(start..start + rows) {
                    Some(piece) => piece,
                    None => return Some((start, Error::LengthMismatch(relicore::arg!(0, arrays)))),
                }
            };
        }
        f(chunk.get(..m).unwrap_or(&[]), part)
            .err()
            .map(|e| (start + e.index, e.error))
    });
    if nan_on_error { None } else { first }
}

/// A core frame form whose results are values (a struct per element), writing rows of `width`
/// floats: the element-wise `inputs` (each of the rows' count or of one value) go to `call` in
/// pieces of [`ROWS_PIECE`] elements through one buffer of values, which `row` turns into
/// rows. Every value is the core's (the scalar function's bits); a failing element's row is
/// `row` of the core's failed value (NaN fields, zero counts). Returns the first failure, its
/// index counted from the start of `out`.
pub(crate) fn rows_frame<T: Element, V: Copy + Default, const K: usize>(
    inputs: [&[T]; K],
    out: &mut [T],
    width: usize,
    call: impl Fn([&[T]; K], &mut [V]) -> ArrayResult,
    row: impl Fn(V, &mut [T]),
) -> ArrayResult {
    let width = width.max(1);
    let n = out.len() / width;
    let mut values = vec![V::default(); ROWS_PIECE.min(n)];
    let mut first = None;
    let mut start = 0;
    for rows in out.chunks_mut(ROWS_PIECE * width) {
        let m = rows.len() / width;
        let mut piece = inputs;
        for (p, s) in piece.iter_mut().zip(inputs) {
            if s.len() != 1 || n == 1 {
                *p = s.get(start..start + m).unwrap_or(&[]);
            }
        }
        let buffer = values.get_mut(..m).unwrap_or(&mut []);
        if let Err(e) = call(piece, buffer) {
            first.get_or_insert(ElementError {
                index: start + e.index,
                error: e.error,
            });
        }
        for (v, r) in buffer.iter().zip(rows.chunks_exact_mut(width)) {
            row(*v, r);
        }
        start += m;
    }
    first.map_or(Ok(()), Err)
}

/// Elements per call of a core frame form in [`rows_frame`] (a buffer of this many values).
const ROWS_PIECE: usize = 4096;

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

pub(crate) fn elements<'a, T: numpy::Element>(
    inputs: &'a [PyReadonlyArray1<'_, T>],
    n: usize,
    name: &str,
) -> PyResult<Vec<&'a [T]>> {
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

#[cfg(test)]
mod tests {
    use super::*;
    use relicore::blackbody as bb;

    #[test]
    fn loop_broadcasts_length_one_inputs_and_stops_at_the_first_failure() {
        let t = [300.0, -1.0, 500.0];
        let l = [1e-5];
        let mut out = [0.0; 3];
        let f = |[a, b]: [f64; 2]| bb::spectral_radiance_wavelength(a, b);
        let failure = run([&l, &t], &mut out, false, |_| true, f);
        assert_eq!(
            failure,
            Some((1, Error::NonPositive(relicore::arg!(1, temperature_k))))
        );
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
}
