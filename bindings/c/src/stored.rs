//! The caller-owned structs that hold a core value (a universe, a thermal history, ...): one
//! implementation of their checks and of the calls made on them, shared by every such struct.
//!
//! Each struct is a validity tag and a fixed number of 8-byte storage words. The function that
//! fills it zeroes the words, writes the core value into them (every such core value is plain
//! old data: floating-point and integer fields and arrays only, so every bit pattern, the
//! all-zero one included, is a valid value, and it owns no resource) and then sets the tag;
//! every other function refuses a struct whose tag is not that one
//! (`RELICORE_ERROR_INVALID_STRUCT`). The tag mixes a name with the size of the core value, so a
//! struct written by a library with another layout is refused too. [`stored!`] checks at
//! compile time that the core value fits the words and needs no alignment above 8.

use crate::boundary::{Failure, array_body, boundary, each, non_null, put, put_nan_n};
use crate::status::RELICORE_ERROR_INVALID_STRUCT;

/// A `#[repr(C)]` struct of a `tag: u64` and `storage: [u64; N]` holding a `Core` value.
///
/// # Safety
/// The implementor is such a struct (see [`stored!`]), `Core` is plain old data that fits the
/// storage and needs an alignment of at most 8.
pub(crate) unsafe trait Stored {
    /// The core value inside.
    type Core;
    /// The tag of a filled struct.
    const TAG: u64;
    /// Pointer to the tag field of `*p` (no read).
    fn tag(p: *const Self) -> *const u64;
    /// Pointer to the start of the storage of `*p` (no read).
    fn storage(p: *const Self) -> *const u64;
}

/// Implements [`Stored`] for `$s` (fields `tag` and `storage`) holding `$core`, with a tag made
/// of the eight ASCII bytes `$name` and the size of the core value, and the compile-time checks
/// of size and alignment.
macro_rules! stored {
    ($s:ty, $core:ty, $words:expr, $name:expr) => {
        const _: () = assert!(
            core::mem::size_of::<$core>() <= $words * core::mem::size_of::<u64>(),
            "the core value no longer fits its storage words"
        );
        const _: () = assert!(
            core::mem::align_of::<$core>() <= core::mem::align_of::<u64>(),
            "the core value needs an alignment above 8"
        );
        // SAFETY: the struct is `#[repr(C)]` with `tag: u64` and `storage: [u64; $words]`; the
        // core value is plain old data (see the module doc) and fits (assertions above).
        unsafe impl $crate::stored::Stored for $s {
            type Core = $core;
            const TAG: u64 = u64::from_be_bytes(*$name) ^ (core::mem::size_of::<$core>() as u64);
            fn tag(p: *const Self) -> *const u64 {
                // SAFETY: a place expression, nothing is read.
                unsafe { core::ptr::addr_of!((*p).tag) }
            }
            fn storage(p: *const Self) -> *const u64 {
                // SAFETY: a place expression, nothing is read.
                unsafe { core::ptr::addr_of!((*p).storage).cast() }
            }
        }
    };
}
pub(crate) use stored;

/// The core value inside `*p`, after the NULL and tag checks.
///
/// # Safety
/// `p` is NULL or points to a readable struct that nothing writes while the returned reference
/// lives (in particular no output of the same call).
#[inline(always)]
pub(crate) unsafe fn stored_ref<'a, S: Stored>(p: *const S) -> Result<&'a S::Core, Failure> {
    non_null(p)?;
    // SAFETY: p is non-NULL and points to a readable struct (caller's contract).
    if unsafe { S::tag(p).read() } != S::TAG {
        return Err(Failure::Call(RELICORE_ERROR_INVALID_STRUCT));
    }
    // SAFETY: the tag says the fill function wrote a core value at the start of the storage
    // (possibly copied since, which keeps it valid: it is plain old data); the storage is
    // aligned to 8 and large enough (`stored!`); nothing writes it while the reference lives.
    Ok(unsafe { &*S::storage(p).cast::<S::Core>() })
}

/// A call on a stored value with one `double` result: checks `p` and `out`, runs `f` and
/// writes its value to `*out` (NaN on failure).
///
/// # Safety
/// `p` is NULL or points to a readable struct; `out` is NULL or valid for one write and does
/// not point into `*p`.
#[inline(always)]
pub(crate) unsafe fn stored_scalar<S: Stored>(
    p: *const S,
    out: *mut f64,
    f: impl FnOnce(&S::Core) -> relicore::Result<f64>,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: NULL or readable, not written during the call (caller's contract).
            let v = f(unsafe { stored_ref(p) }?)?;
            // SAFETY: out is non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (caller's contract).
        || unsafe { put(out, f64::NAN) },
    )
}

/// A value computed once when the struct was filled (a summary): written to `*out` when finite.
/// A filled struct holds finite summary values only, so a non-finite one means storage
/// overwritten behind an intact tag: `RELICORE_ERROR_INVALID_STRUCT`.
///
/// # Safety
/// As [`stored_scalar`].
#[inline(always)]
pub(crate) unsafe fn stored_summary<S: Stored>(
    p: *const S,
    out: *mut f64,
    f: impl FnOnce(&S::Core) -> f64,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: NULL or readable, not written during the call (caller's contract).
            let v = f(unsafe { stored_ref(p) }?);
            if !v.is_finite() {
                return Err(Failure::Call(RELICORE_ERROR_INVALID_STRUCT));
            }
            // SAFETY: out is non-NULL and writable (caller's contract).
            unsafe { out.write(v) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (caller's contract).
        || unsafe { put(out, f64::NAN) },
    )
}

/// The array form of a one-argument call on a stored value: `out[i] = f(value, x[i])` for
/// i < n, element by element as [`crate::boundary::elementwise`] (failing elements NaN, first
/// code returned); a NULL pointer or an invalid struct fails the whole call (NaN to every
/// element of a non-NULL `out`).
///
/// # Safety
/// `p` is NULL or points to a readable struct; `x` is NULL or valid for n reads, `out` NULL or
/// valid for n writes (it may be `x`, it must not overlap `*p`).
#[inline(always)]
pub(crate) unsafe fn stored_array<S: Stored>(
    p: *const S,
    x: *const f64,
    n: usize,
    out: *mut f64,
    f: impl Fn(&S::Core, f64) -> relicore::Result<f64>,
) -> i32 {
    boundary(
        || {
            non_null(x)?;
            non_null(out)?;
            // SAFETY: NULL or readable, not written during the call (caller's contract).
            let c = unsafe { stored_ref(p) }?;
            // SAFETY: x and out are non-NULL and valid for n elements (caller's contract).
            unsafe { each(x, n, out, |xi| f(c, xi)) }
        },
        // SAFETY: out is NULL or valid for n writes (caller's contract).
        || unsafe { put_nan_n(out, n) },
    )
}

/// [`stored_array`] through one of the core's array functions `f(value, x, out)` (see
/// [`crate::boundary::through_array`]): the same semantics, the scalar function's bits.
///
/// # Safety
/// As [`stored_array`].
#[inline(always)]
pub(crate) unsafe fn stored_through_array<S: Stored>(
    p: *const S,
    x: *const f64,
    n: usize,
    out: *mut f64,
    f: impl Fn(&S::Core, &[f64], &mut [f64]) -> relicore::ArrayResult,
) -> i32 {
    boundary(
        || {
            non_null(x)?;
            non_null(out)?;
            // SAFETY: NULL or readable, not written during the call (caller's contract).
            let c = unsafe { stored_ref(p) }?;
            // SAFETY: x and out are non-NULL and valid for n elements (caller's contract).
            unsafe { array_body(x, n, out, |xs, os| f(c, xs, os)) }
        },
        // SAFETY: out is NULL or valid for n writes (caller's contract).
        || unsafe { put_nan_n(out, n) },
    )
}

/// Clears `*out`: tag 0, every storage word 0 (the state of a struct whose fill failed).
///
/// # Safety
/// `out` is NULL or valid for one write of `S`.
pub(crate) unsafe fn stored_clear<S: Stored>(out: *mut S) {
    if !out.is_null() {
        // SAFETY: non-NULL and writable (caller's contract); the fields take any bits.
        unsafe { out.cast::<u8>().write_bytes(0, core::mem::size_of::<S>()) };
    }
}

/// The storage of `*out` as the core value's place, for the fill function to compute into.
///
/// # Safety
/// `out` is non-NULL, valid for writes and cleared ([`stored_clear`]); the returned reference
/// is the only access to the storage while it lives.
pub(crate) unsafe fn stored_place<'a, S: Stored>(out: *mut S) -> &'a mut S::Core {
    // SAFETY: the storage is aligned and large enough (`stored!`), zeroed bits are a valid core
    // value (plain old data), and the caller gives exclusive access.
    unsafe { &mut *S::storage(out).cast_mut().cast::<S::Core>() }
}

/// Marks `*out` as filled (written last, after the core value).
///
/// # Safety
/// `out` is non-NULL and valid for writes; its storage holds a complete core value.
pub(crate) unsafe fn stored_seal<S: Stored>(out: *mut S) {
    // SAFETY: as the contract says.
    unsafe { S::tag(out).cast_mut().write(S::TAG) };
}
