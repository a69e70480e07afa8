//! Plumbing shared by every export: the panic boundary, the NaN fill of outputs on failure,
//! NULL checks and the loops of the array forms. No physics here.

use crate::status::{RELICORE_ERROR_NULL_POINTER, RELICORE_ERROR_PANIC, RELICORE_OK, status_of};
use relicore::Error;
use std::panic::{AssertUnwindSafe, catch_unwind};

/// How a call body failed.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(crate) enum Failure {
    /// The call failed as a whole: the boundary sets every (non-NULL) output to NaN.
    Call(i32),
    /// Some elements of an array call failed: the body has set them to NaN and computed the
    /// others, which stay as they are; the code is that of the first failing element.
    Elements(i32),
    /// The call failed and the body has written every output itself (an output that is not a
    /// floating-point number, such as the index of a bad parameter, has no NaN to take).
    Reported(i32),
}

impl From<Error> for Failure {
    fn from(e: Error) -> Self {
        Failure::Call(status_of(e))
    }
}

/// THE boundary every export runs in. Runs `body`; on success returns `RELICORE_OK`. On a
/// whole-call failure, or when `body` panics, calls `fill_nan` (which must set every non-NULL
/// output to NaN and must not panic) and returns the status code, `RELICORE_ERROR_PANIC` for a
/// panic. In the `release-c` profile (panic = "abort") a panic aborts instead; the core is
/// written not to panic (no unwrap, no failing index).
pub(crate) fn boundary(body: impl FnOnce() -> Result<(), Failure>, fill_nan: impl FnOnce()) -> i32 {
    let code = match catch_unwind(AssertUnwindSafe(body)) {
        Ok(Ok(())) => return RELICORE_OK,
        Ok(Err(Failure::Elements(code) | Failure::Reported(code))) => return code,
        Ok(Err(Failure::Call(code))) => code,
        Err(_) => RELICORE_ERROR_PANIC,
    };
    fill_nan();
    code
}

/// A value an output can be set to when a call fails.
pub(crate) trait NotANumber: Copy {
    /// NaN, or a struct whose fields are all NaN.
    const NAN: Self;
}

impl NotANumber for f64 {
    const NAN: Self = f64::NAN;
}

impl NotANumber for f32 {
    const NAN: Self = f32::NAN;
}

/// `Err(Failure::Call(RELICORE_ERROR_NULL_POINTER))` when `p` is NULL.
#[inline(always)]
pub(crate) fn non_null<T>(p: *const T) -> Result<(), Failure> {
    if p.is_null() {
        Err(Failure::Call(RELICORE_ERROR_NULL_POINTER))
    } else {
        Ok(())
    }
}

/// Writes `v` to `*p` unless `p` is NULL.
///
/// # Safety
/// `p` is NULL or valid for one write of `T` (aligned).
#[inline(always)]
pub(crate) unsafe fn put<T>(p: *mut T, v: T) {
    if !p.is_null() {
        // SAFETY: non-NULL, and the caller guarantees it is valid for a write.
        unsafe { p.write(v) };
    }
}

/// Writes NaN to `p[0..n]` unless `p` is NULL.
///
/// # Safety
/// `p` is NULL or valid for `n` writes of `T` (aligned).
pub(crate) unsafe fn put_nan_n<T: NotANumber>(p: *mut T, n: usize) {
    if !p.is_null() {
        for i in 0..n {
            // SAFETY: the caller guarantees p[0..n] is writable.
            unsafe { p.add(i).write(T::NAN) };
        }
    }
}

/// A scalar call: runs `f` in the boundary and writes its value to `*out` (NaN on failure).
///
/// # Safety
/// `out` is NULL or valid for one write of `T`.
#[inline(always)]
pub(crate) unsafe fn scalar<T: NotANumber>(
    out: *mut T,
    f: impl FnOnce() -> relicore::Result<T>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let v = f()?;
            // SAFETY: out is non-NULL and, by the caller's contract, writable.
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (caller's contract).
        || unsafe { put(out, T::NAN) },
    )
}

/// An element-wise array call: `out[i] = f(x[i])` for i in 0..n, each element computed by the
/// same core call as the scalar export (so the two agree bit for bit). A failing element is
/// set to NaN, the others are computed, and the code of the first failure is returned. n = 0
/// writes nothing and succeeds. NULL `x` or `out` fails the whole call (NaN to a non-NULL
/// `out`). Allocates nothing.
///
/// Each element is read before its output is written, so `out` may be the same buffer as `x`
/// (an in-place transform).
///
/// # Safety
/// `x` is NULL or valid for `n` reads, `out` is NULL or valid for `n` writes (aligned).
#[inline(always)]
pub(crate) unsafe fn elementwise<T: NotANumber>(
    x: *const T,
    n: usize,
    out: *mut T,
    f: impl Fn(T) -> relicore::Result<T>,
) -> i32 {
    boundary(
        || {
            non_null(x)?;
            non_null(out)?;
            // SAFETY: both non-NULL and valid for n elements (caller's contract).
            unsafe { each(x, n, out, f) }
        },
        // SAFETY: out is NULL or valid for n writes (caller's contract).
        || unsafe { put_nan_n(out, n) },
    )
}

/// The loop of every array form (to be run inside [`boundary`]): `out[i] = f(x[i])` for i in
/// 0..n, each element read before its output is written; a failing element is set to NaN and
/// the first failure's code is returned as `Failure::Elements`.
///
/// # Safety
/// `x` is valid for `n` reads and `out` for `n` writes (both non-NULL and aligned); `out` may
/// be `x` itself.
#[inline(always)]
pub(crate) unsafe fn each<T: NotANumber>(
    x: *const T,
    n: usize,
    out: *mut T,
    f: impl Fn(T) -> relicore::Result<T>,
) -> Result<(), Failure> {
    let mut first: Option<i32> = None;
    for i in 0..n {
        // SAFETY: i < n and x is valid for n reads (caller's contract).
        let xi = unsafe { x.add(i).read() };
        let v = match f(xi) {
            Ok(v) => v,
            Err(e) => {
                first.get_or_insert(status_of(e));
                T::NAN
            }
        };
        // SAFETY: i < n and out is valid for n writes (caller's contract).
        unsafe { out.add(i).write(v) };
    }
    match first {
        None => Ok(()),
        Some(code) => Err(Failure::Elements(code)),
    }
}

/// An array call through one of the core's array functions (the `_array` forms, which compute
/// blockwise with SIMD and give the scalar function's bits): `f(x, out)` on the caller's
/// buffers. Semantics as [`elementwise`]: failing elements NaN, the others computed, the code
/// of the first failure returned; NULL fails the whole call; n = 0 succeeds.
///
/// The core takes an input slice and a distinct output slice. When the caller's buffers
/// overlap (the documented in-place use, `out == x`), the input is copied block by block to a
/// stack buffer first, so no input slice ever aliases the output.
///
/// # Safety
/// `x` is NULL or valid for `n` reads, `out` is NULL or valid for `n` writes (aligned); `out`
/// may be `x`.
#[inline(always)]
pub(crate) unsafe fn through_array<T: NotANumber>(
    x: *const T,
    n: usize,
    out: *mut T,
    f: impl Fn(&[T], &mut [T]) -> relicore::ArrayResult,
) -> i32 {
    boundary(
        // SAFETY: as this function's contract.
        || unsafe { array_body(x, n, out, f) },
        // SAFETY: out is NULL or valid for n writes (caller's contract).
        || unsafe { put_nan_n(out, n) },
    )
}

/// The body of [`through_array`] (to be run inside [`boundary`]).
///
/// # Safety
/// As [`through_array`].
#[inline(always)]
pub(crate) unsafe fn array_body<T: NotANumber>(
    x: *const T,
    n: usize,
    out: *mut T,
    f: impl Fn(&[T], &mut [T]) -> relicore::ArrayResult,
) -> Result<(), Failure> {
    non_null(x)?;
    non_null(out)?;
    let bytes = n.saturating_mul(size_of::<T>());
    let (xa, oa) = (x as usize, out as usize);
    let disjoint = xa.saturating_add(bytes) <= oa || oa.saturating_add(bytes) <= xa;
    let result = if disjoint || n == 0 {
        // SAFETY: both non-NULL, aligned and valid for n elements (caller's contract), and
        // disjoint, so the shared and the mutable slice do not alias.
        let (xs, os) = unsafe {
            (
                std::slice::from_raw_parts(x, n),
                std::slice::from_raw_parts_mut(out, n),
            )
        };
        f(xs, os)
    } else {
        // SAFETY: as above; the blocks are read before they are written.
        unsafe { through_array_in_place(x, n, out, &f) }
    };
    result.map_err(|e| Failure::Elements(status_of(e.error)))
}

/// [`through_array`] for overlapping buffers: each block of the input is copied to a stack
/// buffer before the block of the output is formed as a slice and written.
///
/// # Safety
/// As [`through_array`], both non-NULL.
#[inline(never)]
unsafe fn through_array_in_place<T: NotANumber>(
    x: *const T,
    n: usize,
    out: *mut T,
    f: &impl Fn(&[T], &mut [T]) -> relicore::ArrayResult,
) -> relicore::ArrayResult {
    const STEP: usize = 256;
    let mut buffer = [T::NAN; STEP];
    let mut first: Option<relicore::ElementError> = None;
    let mut start = 0;
    while start < n {
        let len = STEP.min(n - start);
        let input = buffer.split_at_mut(len).0;
        // SAFETY: start + len ≤ n: x is valid for those reads, out for those writes (caller's
        // contract); the input is copied out before the output slice is formed.
        let os = unsafe {
            std::ptr::copy(x.add(start), input.as_mut_ptr(), len);
            std::slice::from_raw_parts_mut(out.add(start), len)
        };
        if let Err(mut e) = f(input, os) {
            e.index += start;
            first.get_or_insert(e);
        }
        start += len;
    }
    first.map_or(Ok(()), Err)
}

/// Runs a response-table function on the caller's two buffers and writes its value to `*out`
/// (NaN, or a struct of NaN, on failure).
///
/// # Safety
/// `wavelengths_m` is NULL or valid for `n_wavelengths` reads, `response` NULL or valid for
/// `n_response` reads, `out` NULL or valid for one write.
pub(crate) unsafe fn table_call<T: Copy, O: NotANumber>(
    wavelengths_m: *const T,
    n_wavelengths: usize,
    response: *const T,
    n_response: usize,
    out: *mut O,
    f: impl FnOnce(&[T], &[T]) -> relicore::Result<O>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: NULL or valid for the given lengths (caller's contract).
            let w = unsafe { input_slice(wavelengths_m, n_wavelengths) }?;
            // SAFETY: as above.
            let r = unsafe { input_slice(response, n_response) }?;
            let v = f(w, r)?;
            // SAFETY: non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable.
        || unsafe { put(out, O::NAN) },
    )
}

/// A caller's (pointer, length) buffer as a slice; NULL is `RELICORE_ERROR_NULL_POINTER`
/// (also for n = 0).
///
/// # Safety
/// `p` is NULL or valid for `n` reads of `T` (aligned), not written during the returned
/// lifetime.
#[inline(always)]
pub(crate) unsafe fn input_slice<'a, T>(p: *const T, n: usize) -> Result<&'a [T], Failure> {
    non_null(p)?;
    // SAFETY: non-NULL, aligned and valid for n reads (caller's contract), so n·size_of::<T>()
    // fits in isize (it is the size of one object in the caller's memory).
    Ok(unsafe { std::slice::from_raw_parts(p, n) })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::status::*;
    use std::cell::Cell;

    #[test]
    fn a_panic_inside_the_boundary_returns_the_panic_code_and_fills_outputs() {
        let filled = Cell::new(false);
        let code = boundary(
            || {
                let v: Vec<u8> = Vec::new();
                // an out-of-bounds index panics
                let i = v.len() + 3;
                #[allow(clippy::indexing_slicing)]
                let _ = v[i];
                Ok(())
            },
            || filled.set(true),
        );
        assert_eq!(code, RELICORE_ERROR_PANIC);
        assert!(filled.get(), "outputs not set to NaN after a panic");

        let mut out = 1.0_f64;
        // SAFETY: out is a valid f64.
        let code = unsafe {
            scalar(&mut out, || -> relicore::Result<f64> {
                panic!("deliberate panic in a test")
            })
        };
        assert_eq!(code, RELICORE_ERROR_PANIC);
        assert!(out.is_nan());
    }

    #[test]
    fn success_and_failures_through_the_boundary() {
        let filled = Cell::new(0);
        assert_eq!(
            boundary(|| Ok(()), || filled.set(filled.get() + 1)),
            RELICORE_OK
        );
        assert_eq!(filled.get(), 0);
        let code = boundary(
            || Err(Error::NonPositive(relicore::arg!(1, x)).into()),
            || filled.set(filled.get() + 1),
        );
        assert_eq!(code, RELICORE_ERROR_NON_POSITIVE);
        assert_eq!(filled.get(), 1);
        // element failures leave the outputs to the body
        let code = boundary(
            || Err(Failure::Elements(RELICORE_ERROR_NON_FINITE)),
            || filled.set(filled.get() + 1),
        );
        assert_eq!(code, RELICORE_ERROR_NON_FINITE);
        assert_eq!(filled.get(), 1);
    }

    #[test]
    fn null_pointers_return_the_null_code() {
        // SAFETY: a NULL out is allowed by the contract of `scalar`.
        let code = unsafe { scalar(std::ptr::null_mut::<f64>(), || Ok(1.0)) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);

        let mut out = [1.0_f64; 3];
        // SAFETY: NULL input, out valid for 3 writes.
        let code = unsafe { elementwise(std::ptr::null(), 3, out.as_mut_ptr(), Ok) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        assert!(out.iter().all(|v| v.is_nan()));

        let x = [1.0_f64; 3];
        // SAFETY: x valid for 3 reads, NULL out.
        let code = unsafe { elementwise(x.as_ptr(), 3, std::ptr::null_mut(), Ok) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);

        let mut o = 2.0_f64;
        // SAFETY: o valid.
        let code = unsafe {
            crate::gen_blackbody::relicore_spectral_radiance_wavelength(1e-6, 300.0, &mut o)
        };
        assert_eq!(code, RELICORE_OK);
        // SAFETY: NULL out is allowed.
        let code = unsafe {
            crate::gen_blackbody::relicore_spectral_radiance_wavelength(
                1e-6,
                300.0,
                std::ptr::null_mut(),
            )
        };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
    }

    #[test]
    fn elementwise_marks_failing_elements_and_returns_the_first_code() {
        let x = [1.0_f64, -1.0, 2.0, f64::NAN, 3.0];
        let mut out = [0.0_f64; 5];
        let f = |v: f64| {
            if v.is_nan() {
                Err(Error::NonFinite(relicore::arg!(0, x)))
            } else if v < 0.0 {
                Err(Error::NonPositive(relicore::arg!(0, x)))
            } else {
                Ok(v * 2.0)
            }
        };
        // SAFETY: both buffers hold 5 elements.
        let code = unsafe { elementwise(x.as_ptr(), 5, out.as_mut_ptr(), f) };
        assert_eq!(code, RELICORE_ERROR_NON_POSITIVE);
        assert_eq!(out[0], 2.0);
        assert!(out[1].is_nan());
        assert_eq!(out[2], 4.0);
        assert!(out[3].is_nan());
        assert_eq!(out[4], 6.0);
        // n = 0 writes nothing
        let mut sentinel = [7.0_f64];
        // SAFETY: n = 0, nothing is read or written.
        let code = unsafe { elementwise(x.as_ptr(), 0, sentinel.as_mut_ptr(), f) };
        assert_eq!(code, RELICORE_OK);
        assert_eq!(sentinel[0], 7.0);
    }
}
