//! The one element loop of the core's array functions (the `_array` forms).
//!
//! An array function computes one scalar function over a slice. Its elements are taken in
//! blocks of [`BLOCK`]: each block first goes through the function's *fast path*, straight-line
//! code without branches or calls that the compiler turns into SIMD instructions, which
//! returns the value and whether the element stayed inside the domain where the fast path
//! performs exactly the operations of the scalar function. A block in which any element left
//! that domain (bad input, an exponent past overflow, a result that is not a normal number) is
//! computed again, element by element, by the scalar function itself. Either way every output
//! is the scalar function's result bit for bit (the property tests check it), and the first
//! failing element is reported as the scalar function would report it.

use crate::{Arg, ArrayResult, ElementError, Error, Real, Result};

/// Elements per block: long enough for SIMD loops to run at full speed, short enough that a
/// block recomputed by the scalar path costs little and stays in the L1 cache.
pub(crate) const BLOCK: usize = 64;

/// `out[i] = scalar(x[i])`, computed blockwise by `fast` where every element of a block stays in
/// its domain. Failing elements get NaN; the first is returned. A length mismatch fills `out`
/// with NaN and returns `LengthMismatch(out_arg)` at the shorter length.
///
/// `fast(x)` must return `(scalar(x)?, true)` bit for bit, or `(_, false)`; it must not branch
/// or call anything that is not inlined, or the loop is not vectorised (still correct).
#[inline(always)]
pub(crate) fn blockwise<T: Real>(
    x: &[T],
    out: &mut [T],
    out_arg: Arg,
    fast: impl Fn(T) -> (T, bool),
    scalar: impl Fn(T) -> Result<T>,
) -> ArrayResult {
    same_length(x.len(), out, out_arg)?;
    let mut first: Option<ElementError> = None;
    for (b, (xs, os)) in x.chunks(BLOCK).zip(out.chunks_mut(BLOCK)).enumerate() {
        let mut all_in = true;
        for (&xi, o) in xs.iter().zip(os.iter_mut()) {
            let (v, inside) = fast(xi);
            *o = v;
            all_in &= inside;
        }
        if !all_in {
            redo_block(xs, os, b * BLOCK, &mut first, &scalar);
        }
    }
    first.map_or(Ok(()), Err)
}

/// Recomputes one block by the scalar function (out of line: the rare path).
#[inline(never)]
#[cold]
fn redo_block<T: Real>(
    xs: &[T],
    os: &mut [T],
    start: usize,
    first: &mut Option<ElementError>,
    scalar: &impl Fn(T) -> Result<T>,
) {
    for (k, (&xi, o)) in xs.iter().zip(os.iter_mut()).enumerate() {
        match scalar(xi) {
            Ok(v) => *o = v,
            Err(error) => {
                *o = T::nan();
                if first.is_none() {
                    *first = Some(ElementError {
                        index: start + k,
                        error,
                    });
                }
            }
        }
    }
}

/// `Ok` when the output has the input's length; otherwise `out` is filled with NaN and the error
/// is `LengthMismatch(out_arg)` at the shorter length.
fn same_length<T: Real>(n: usize, out: &mut [T], out_arg: Arg) -> ArrayResult {
    if n == out.len() {
        return Ok(());
    }
    out.fill(T::nan());
    Err(ElementError {
        index: n.min(out.len()),
        error: Error::LengthMismatch(out_arg),
    })
}
