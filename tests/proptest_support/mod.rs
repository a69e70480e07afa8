//! Shared pieces of the property tests (`tests/proptest_*.rs`): input strategies that reach
//! every class of floating-point value, and the one contract every public function keeps:
//! **`Ok` with a finite value, or an `Err` naming an argument that exists; never a panic, and
//! never `Ok` for an input that holds a NaN.**
//!
//! The number of cases per property comes from `cases(n)`: `n` by default, or the
//! `PROPTEST_CASES` environment variable when it is set (to run longer locally). The random
//! inputs come from a fixed seed, so `make test` is reproducible; `PROPTEST_RNG_SEED=<u64>`
//! draws other inputs, and `PROPTEST_RNG_SEED=random` new ones on every run.

#![allow(dead_code)]

use proptest::prelude::*;
use proptest::test_runner::{Config, RngSeed, TestCaseError};
use relicore::{Error, Real, Result};

/// Configuration with `n` cases (or `PROPTEST_CASES`), no persistence of failures to files (the
/// failing input is printed in the test output instead; nothing is written into the tree).
pub fn cases(n: u32) -> Config {
    let n = std::env::var("PROPTEST_CASES")
        .ok()
        .and_then(|s| s.parse().ok())
        .unwrap_or(n);
    // Config::default() reads PROPTEST_RNG_SEED; without it the seed is fixed here
    let base = Config::default();
    let rng_seed = if std::env::var_os("PROPTEST_RNG_SEED").is_some() {
        base.rng_seed
    } else {
        RngSeed::Fixed(0x5eed_2026_0005)
    };
    Config {
        cases: n,
        failure_persistence: None,
        rng_seed,
        // properties that draw a wider space and `prop_assume!` the part they test
        max_global_rejects: 4 * n + 1024,
        ..base
    }
}

/// Values every `f64` function must survive: NaN (both signs), ±∞, ±0, the smallest subnormal
/// and normal numbers, the largest finite numbers, and ordinary values.
pub const SPECIAL64: [f64; 22] = [
    f64::NAN,
    -f64::NAN,
    f64::INFINITY,
    f64::NEG_INFINITY,
    0.0,
    -0.0,
    5e-324,
    -5e-324,
    2.225_073_858_507_201e-308, // largest subnormal
    f64::MIN_POSITIVE,
    -f64::MIN_POSITIVE,
    f64::MAX,
    -f64::MAX,
    1e300,
    1e-300,
    f64::EPSILON,
    1.0,
    -1.0,
    0.5,
    2.7255,
    1e-6,
    1e4,
];

/// The same for `f32`.
pub const SPECIAL32: [f32; 20] = [
    f32::NAN,
    -f32::NAN,
    f32::INFINITY,
    f32::NEG_INFINITY,
    0.0,
    -0.0,
    1e-45,
    -1e-45,
    1.175_494_2e-38, // largest subnormal
    f32::MIN_POSITIVE,
    f32::MAX,
    -f32::MAX,
    1e38,
    1e-38,
    f32::EPSILON,
    1.0,
    -1.0,
    2.7255,
    1e-6,
    1e4,
];

/// Any `f64`: special values, every class proptest knows (normal, subnormal, zero, infinite,
/// NaN, both signs), raw bit patterns, and log-uniform magnitudes from 1e-40 to 1e40 of either
/// sign (so that valid inputs of every scale are common too).
pub fn any64() -> impl Strategy<Value = f64> {
    prop_oneof![
        3 => prop::sample::select(SPECIAL64.to_vec()),
        2 => proptest::num::f64::ANY,
        1 => any::<u64>().prop_map(f64::from_bits),
        4 => (-40.0f64..40.0).prop_map(|e| 10f64.powf(e)),
        1 => (-40.0f64..40.0).prop_map(|e| -10f64.powf(e)),
    ]
}

/// Any `f32`, as [`any64`] (log-uniform magnitudes from 1e-45 to 1e38).
pub fn any32() -> impl Strategy<Value = f32> {
    prop_oneof![
        3 => prop::sample::select(SPECIAL32.to_vec()),
        2 => proptest::num::f32::ANY,
        1 => any::<u32>().prop_map(f32::from_bits),
        4 => (-45.0f64..38.5).prop_map(|e| 10f64.powf(e) as f32),
        1 => (-45.0f64..38.5).prop_map(|e| -(10f64.powf(e) as f32)),
    ]
}

/// A log-uniform positive value in [10^lo, 10^hi].
pub fn log_uniform(lo: f64, hi: f64) -> impl Strategy<Value = f64> {
    (lo..hi).prop_map(|e| 10f64.powf(e))
}

/// The contract of every public function: `r` is `Ok(finite)` or an `Err` whose argument
/// position (if it names one) is below `nargs`; and when any input is NaN, `r` is an `Err`.
/// `what` describes the call for the failure message (the inputs are printed in full).
pub fn contract<T: Real>(
    what: &str,
    inputs: &[f64],
    nargs: usize,
    r: Result<T>,
) -> std::result::Result<(), TestCaseError> {
    match r {
        Ok(v) => {
            prop_assert!(
                v.is_finite(),
                "{what}{inputs:?} = Ok({v:?}): a successful result must be finite"
            );
            prop_assert!(
                !inputs.iter().any(|x| x.is_nan()),
                "{what}{inputs:?} = Ok({v:?}) for a NaN input"
            );
        }
        Err(e) => {
            if let Some(a) = e.argument() {
                prop_assert!(
                    usize::from(a) < nargs.max(1),
                    "{what}{inputs:?} = Err({e:?}) names argument {a} of {nargs}"
                );
            }
            // every error has a message (Display never panics)
            let message = e.to_string();
            prop_assert!(!message.is_empty(), "{what}: empty message for {e:?}");
        }
    }
    Ok(())
}

/// `f32` inputs as `f64` (exact), for the messages.
pub fn wide(xs: &[f32]) -> Vec<f64> {
    xs.iter().map(|&x| f64::from(x)).collect()
}

/// The error's kind without its argument, for comparisons between faces.
pub fn kind(e: Error) -> core::mem::Discriminant<Error> {
    core::mem::discriminant(&e)
}

/// |got − want| ≤ tol, with a message that prints both to 17 digits.
pub fn close(what: &str, got: f64, want: f64, tol: f64) -> std::result::Result<(), TestCaseError> {
    prop_assert!(
        (got - want).abs() <= tol,
        "{what}: got {got:.17e} want {want:.17e} (|diff| {:.3e} > tol {tol:.3e})",
        (got - want).abs()
    );
    Ok(())
}

/// Unwraps a result inside a property, failing the case (not panicking) on `Err`.
pub fn ok<T: core::fmt::Debug>(what: &str, r: Result<T>) -> std::result::Result<T, TestCaseError> {
    match r {
        Ok(v) => Ok(v),
        Err(e) => Err(TestCaseError::fail(format!(
            "{what}: unexpected Err({e:?})"
        ))),
    }
}
