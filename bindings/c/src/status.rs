//! Status codes, the one mapping from core errors to codes, the status messages and the
//! version of the library.
//!
//! The numbers are those of `tests/data/FORMAT.md`: stable, never reused; 0 is success and
//! every error is negative.

use core::ffi::{CStr, c_char};
use relicore::Error;

/// Success.
pub const RELICORE_OK: i32 = 0;
/// A pointer argument is NULL.
pub const RELICORE_ERROR_NULL_POINTER: i32 = -1;
/// An argument is NaN or infinite.
pub const RELICORE_ERROR_NON_FINITE: i32 = -2;
/// An argument that must be strictly positive (temperature, wavelength, frequency, radiance)
/// is zero or negative.
pub const RELICORE_ERROR_NON_POSITIVE: i32 = -3;
/// An argument that must not be negative (a band edge, a spectral response) is negative.
pub const RELICORE_ERROR_NEGATIVE: i32 = -4;
/// An interval whose lower bound is not below its upper bound.
pub const RELICORE_ERROR_EMPTY_INTERVAL: i32 = -5;
/// An array has fewer elements than the function needs.
pub const RELICORE_ERROR_ARRAY_TOO_SHORT: i32 = -6;
/// Two arrays that must have the same length do not.
pub const RELICORE_ERROR_LENGTH_MISMATCH: i32 = -7;
/// An array that must be strictly increasing is not.
pub const RELICORE_ERROR_NOT_INCREASING: i32 = -8;
/// A calibration whose two loads (or two readings) coincide, so no gain can be formed.
pub const RELICORE_ERROR_DEGENERATE_CALIBRATION: i32 = -9;
/// A value outside the documented domain of the function.
pub const RELICORE_ERROR_OUT_OF_DOMAIN: i32 = -10;
/// An iteration did not converge within its budget.
pub const RELICORE_ERROR_NO_CONVERGENCE: i32 = -11;
/// A struct argument holds values that its init function cannot have produced.
pub const RELICORE_ERROR_INVALID_STRUCT: i32 = -12;
/// A Rust panic was caught at the boundary (a bug in relicore: please report it).
pub const RELICORE_ERROR_PANIC: i32 = -13;
/// A parameter of a parameter set (a universe) is invalid; `relicore_universe_check_parameters`
/// names which one.
pub const RELICORE_ERROR_INVALID_PARAMETER: i32 = -14;
/// The model has no big bang: E(z)² ≤ 0 somewhere on the way back (a bounce or a loitering
/// universe), so ages and distances to high redshift do not exist.
pub const RELICORE_ERROR_NO_BIG_BANG: i32 = -15;
/// A fixed-capacity table (a thermal history) has too few nodes for what an argument asks of it
/// (the highest redshift of the history).
pub const RELICORE_ERROR_CAPACITY_TOO_SMALL: i32 = -16;

/// Major version of the library (equal to the core crate's version, checked by a test).
pub const RELICORE_VERSION_MAJOR: u32 = 0;
/// Minor version of the library.
pub const RELICORE_VERSION_MINOR: u32 = 1;
/// Patch version of the library.
pub const RELICORE_VERSION_PATCH: u32 = 0;

/// The version as a C string; a unit test checks it equals `relicore::VERSION` and the three
/// numeric constants.
pub(crate) const VERSION: &CStr = c"0.1.0";

/// THE mapping from a core error to a status code (every export goes through it).
pub(crate) fn status_of(e: Error) -> i32 {
    match e {
        Error::NonFinite(_) => RELICORE_ERROR_NON_FINITE,
        Error::NonPositive(_) => RELICORE_ERROR_NON_POSITIVE,
        Error::Negative(_) => RELICORE_ERROR_NEGATIVE,
        Error::EmptyInterval(_) => RELICORE_ERROR_EMPTY_INTERVAL,
        Error::ArrayTooShort(_) => RELICORE_ERROR_ARRAY_TOO_SHORT,
        Error::LengthMismatch(_) => RELICORE_ERROR_LENGTH_MISMATCH,
        Error::NotIncreasing(_) => RELICORE_ERROR_NOT_INCREASING,
        Error::DegenerateCalibration(_) => RELICORE_ERROR_DEGENERATE_CALIBRATION,
        Error::OutOfDomain(_) => RELICORE_ERROR_OUT_OF_DOMAIN,
        Error::NoConvergence => RELICORE_ERROR_NO_CONVERGENCE,
        Error::InvalidParameter(_) => RELICORE_ERROR_INVALID_PARAMETER,
        Error::NoBigBang => RELICORE_ERROR_NO_BIG_BANG,
        Error::CapacityTooSmall(_) => RELICORE_ERROR_CAPACITY_TOO_SMALL,
        // `Error` is `#[non_exhaustive]`: a variant added to the core later must get its own
        // code here; until then it is reported as outside the domain of the function.
        _ => RELICORE_ERROR_OUT_OF_DOMAIN,
    }
}

/// The status of a call whose argument 0 is a struct passed by pointer: an error the core
/// attributes to that argument means the struct holds values its init function cannot have
/// produced (`RELICORE_ERROR_INVALID_STRUCT`); any other error maps as [`status_of`].
pub(crate) fn status_of_struct_call(e: Error) -> i32 {
    if e.argument() == Some(0) {
        RELICORE_ERROR_INVALID_STRUCT
    } else {
        status_of(e)
    }
}

/// The message of a status code as a static C string.
pub(crate) fn message(status: i32) -> &'static CStr {
    match status {
        RELICORE_OK => c"ok",
        RELICORE_ERROR_NULL_POINTER => c"a pointer argument is NULL",
        RELICORE_ERROR_NON_FINITE => c"an argument is NaN or infinite",
        RELICORE_ERROR_NON_POSITIVE => c"an argument that must be positive is zero or negative",
        RELICORE_ERROR_NEGATIVE => c"an argument that must not be negative is negative",
        RELICORE_ERROR_EMPTY_INTERVAL => {
            c"empty interval: the lower bound is not below the upper bound"
        }
        RELICORE_ERROR_ARRAY_TOO_SHORT => c"an array has fewer elements than the function needs",
        RELICORE_ERROR_LENGTH_MISMATCH => c"two arrays that must have the same length do not",
        RELICORE_ERROR_NOT_INCREASING => c"an array that must be strictly increasing is not",
        RELICORE_ERROR_DEGENERATE_CALIBRATION => {
            c"degenerate calibration: the two loads or the two readings coincide"
        }
        RELICORE_ERROR_OUT_OF_DOMAIN => c"an argument is outside the domain of the function",
        RELICORE_ERROR_NO_CONVERGENCE => c"an iteration did not converge",
        RELICORE_ERROR_INVALID_STRUCT => {
            c"a struct argument holds values its init function cannot have produced"
        }
        RELICORE_ERROR_PANIC => c"internal error: a Rust panic was caught (please report it)",
        RELICORE_ERROR_INVALID_PARAMETER => c"a parameter of the parameter set is invalid",
        RELICORE_ERROR_NO_BIG_BANG => {
            c"the model has no big bang: E(z)^2 <= 0 somewhere on the way back"
        }
        RELICORE_ERROR_CAPACITY_TOO_SMALL => {
            c"a fixed-capacity table is too small for what the arguments ask of it"
        }
        _ => c"unknown status",
    }
}

/// A static, NUL-terminated English message for a status code.
///
/// * `status`: a code returned by any relicore function.
///
/// Returns a pointer to a string with static storage duration (never NULL, never to be
/// freed); "unknown status" for a number that is not a relicore status code. Thread-safe.
#[unsafe(no_mangle)]
pub extern "C" fn relicore_status_message(status: i32) -> *const c_char {
    message(status).as_ptr()
}

/// The version of the library as a static, NUL-terminated string "major.minor.patch"
/// (equal to `RELICORE_VERSION_MAJOR`, `_MINOR`, `_PATCH` of the header it was built with).
///
/// Returns a pointer to a string with static storage duration (never NULL, never to be freed).
#[unsafe(no_mangle)]
pub extern "C" fn relicore_version() -> *const c_char {
    VERSION.as_ptr()
}

#[cfg(test)]
mod tests {
    use super::*;

    const ALL: [i32; 17] = [
        RELICORE_OK,
        RELICORE_ERROR_NULL_POINTER,
        RELICORE_ERROR_NON_FINITE,
        RELICORE_ERROR_NON_POSITIVE,
        RELICORE_ERROR_NEGATIVE,
        RELICORE_ERROR_EMPTY_INTERVAL,
        RELICORE_ERROR_ARRAY_TOO_SHORT,
        RELICORE_ERROR_LENGTH_MISMATCH,
        RELICORE_ERROR_NOT_INCREASING,
        RELICORE_ERROR_DEGENERATE_CALIBRATION,
        RELICORE_ERROR_OUT_OF_DOMAIN,
        RELICORE_ERROR_NO_CONVERGENCE,
        RELICORE_ERROR_INVALID_STRUCT,
        RELICORE_ERROR_PANIC,
        RELICORE_ERROR_INVALID_PARAMETER,
        RELICORE_ERROR_NO_BIG_BANG,
        RELICORE_ERROR_CAPACITY_TOO_SMALL,
    ];

    #[test]
    fn codes_are_zero_then_consecutive_negatives() {
        // FORMAT.md: 0 OK, then -1 ... -16 in this order
        for (i, &c) in ALL.iter().enumerate() {
            assert_eq!(c, -(i as i32), "status constant at position {i}");
        }
    }

    #[test]
    fn every_status_has_a_distinct_message() {
        let unknown = message(1);
        assert_eq!(unknown, c"unknown status");
        assert_eq!(message(-17), unknown);
        assert_eq!(message(i32::MIN), unknown);
        assert_eq!(message(i32::MAX), unknown);
        for (i, &a) in ALL.iter().enumerate() {
            assert_ne!(message(a), unknown, "code {a} has no message");
            assert!(!message(a).is_empty());
            for &b in ALL.iter().skip(i + 1) {
                assert_ne!(message(a), message(b), "codes {a} and {b} share a message");
            }
        }
        // the exported function returns the same static strings
        for &a in &ALL {
            // SAFETY: relicore_status_message returns a pointer to a static C string.
            let s = unsafe { CStr::from_ptr(relicore_status_message(a)) };
            assert_eq!(s, message(a));
        }
    }

    #[test]
    fn every_core_error_maps_to_its_code() {
        let cases = [
            (
                Error::NonFinite(relicore::arg!(1, x)),
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                Error::NonPositive(relicore::arg!(0, x)),
                RELICORE_ERROR_NON_POSITIVE,
            ),
            (
                Error::Negative(relicore::arg!(1, x)),
                RELICORE_ERROR_NEGATIVE,
            ),
            (
                Error::EmptyInterval(relicore::arg!(0, x)),
                RELICORE_ERROR_EMPTY_INTERVAL,
            ),
            (
                Error::ArrayTooShort(relicore::arg!(0, x)),
                RELICORE_ERROR_ARRAY_TOO_SHORT,
            ),
            (
                Error::LengthMismatch(relicore::arg!(1, x)),
                RELICORE_ERROR_LENGTH_MISMATCH,
            ),
            (
                Error::NotIncreasing(relicore::arg!(0, x)),
                RELICORE_ERROR_NOT_INCREASING,
            ),
            (
                Error::DegenerateCalibration(relicore::arg!(2, x)),
                RELICORE_ERROR_DEGENERATE_CALIBRATION,
            ),
            (
                Error::OutOfDomain(relicore::arg!(2, x)),
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (Error::NoConvergence, RELICORE_ERROR_NO_CONVERGENCE),
            (
                Error::InvalidParameter(relicore::arg!(3, x)),
                RELICORE_ERROR_INVALID_PARAMETER,
            ),
            (Error::NoBigBang, RELICORE_ERROR_NO_BIG_BANG),
            (
                Error::CapacityTooSmall(relicore::arg!(2, x)),
                RELICORE_ERROR_CAPACITY_TOO_SMALL,
            ),
        ];
        for (e, c) in cases {
            assert_eq!(status_of(e), c, "{e:?}");
        }
        assert_eq!(
            status_of_struct_call(Error::NonFinite(relicore::arg!(0, x))),
            RELICORE_ERROR_INVALID_STRUCT
        );
        assert_eq!(
            status_of_struct_call(Error::DegenerateCalibration(relicore::arg!(0, x))),
            RELICORE_ERROR_INVALID_STRUCT
        );
        assert_eq!(
            status_of_struct_call(Error::NonFinite(relicore::arg!(1, x))),
            RELICORE_ERROR_NON_FINITE
        );
        assert_eq!(
            status_of_struct_call(Error::OutOfDomain(relicore::arg!(1, x))),
            RELICORE_ERROR_OUT_OF_DOMAIN
        );
    }

    #[test]
    fn version_constants_equal_the_core_version() {
        let core = relicore::VERSION;
        assert_eq!(
            VERSION.to_str().ok(),
            Some(core),
            "C version string differs from the core's"
        );
        let parts: Vec<u32> = core
            .split('.')
            .map(|p| p.parse().unwrap_or(u32::MAX))
            .collect();
        assert_eq!(
            parts,
            vec![
                RELICORE_VERSION_MAJOR,
                RELICORE_VERSION_MINOR,
                RELICORE_VERSION_PATCH
            ],
            "RELICORE_VERSION_* differ from the core version {core}"
        );
        // SAFETY: relicore_version returns a pointer to a static C string.
        let s = unsafe { CStr::from_ptr(relicore_version()) };
        assert_eq!(s, VERSION);
        // the pkg-config template carries the same version
        let pc = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/relicore.pc.in"))
            .unwrap_or_default();
        assert!(
            pc.lines().any(|l| l == format!("Version: {core}")),
            "bindings/c/relicore.pc.in must say `Version: {core}`"
        );
    }
}
