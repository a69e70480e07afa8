//! The one error type of the core.

/// What was wrong with a call. Small and `Copy`; the `u8` payload is the zero-based position
/// of the offending argument in the function's parameter list, so every face can name it
/// (C maps the kind to a status code, Python names the argument, value and array index).
#[derive(Debug, Clone, Copy, PartialEq, Eq, thiserror::Error)]
#[non_exhaustive]
pub enum Error {
    /// An argument is NaN or infinite.
    #[error("argument {0} is not finite")]
    NonFinite(u8),
    /// An argument that must be strictly positive (temperature, wavelength, frequency,
    /// radiance, reading span) is zero or negative.
    #[error("argument {0} must be positive")]
    NonPositive(u8),
    /// An argument that must not be negative (redshift, spectral response) is negative.
    #[error("argument {0} must not be negative")]
    Negative(u8),
    /// An interval whose lower bound (argument given) is not below its upper bound.
    #[error("interval starting at argument {0} is empty: lower bound must be below upper bound")]
    EmptyInterval(u8),
    /// An array argument has fewer elements than the function needs.
    #[error("array argument {0} is too short")]
    ArrayTooShort(u8),
    /// Two array arguments that must have the same length do not.
    #[error("array argument {0} has a different length from the first array")]
    LengthMismatch(u8),
    /// An array argument that must be strictly increasing is not.
    #[error("array argument {0} is not strictly increasing")]
    NotIncreasing(u8),
    /// A calibration whose two loads (or two readings) coincide, so no gain can be formed.
    #[error("degenerate calibration: the two loads or the two readings coincide (argument {0})")]
    DegenerateCalibration(u8),
    /// A value outside the documented domain of the function (for example a radiance ratio
    /// no blackbody can produce). Also returned when finite arguments give a result that the
    /// floating-point type cannot hold (it would overflow to ±∞, or an intermediate under- or
    /// overflowed so that no number can be formed): every `Ok` holds a finite value.
    #[error("argument {0} is outside the domain of the function")]
    OutOfDomain(u8),
    /// An iteration did not converge within its budget.
    #[error("no convergence")]
    NoConvergence,
    /// A parameter of a parameter set (a universe) is invalid; the payload is the parameter's
    /// position in the documented parameter list (for `UniverseParameters`: 0 h0_km_s_mpc,
    /// 1 omega_matter, 2 omega_baryon, 3 omega_curvature, 4 cmb_temperature_k, 5 n_eff,
    /// 6 neutrino_masses_ev, 7 w0, 8 wa, 9 helium_mass_fraction).
    #[error("parameter {0} is invalid")]
    InvalidParameter(u8),
    /// The model has no big bang: E(z)² ≤ 0 somewhere on the way back (a bounce or a
    /// loitering universe), so ages and distances to high redshift do not exist.
    #[error("the model has no big bang: E(z)^2 <= 0 on the way back")]
    NoBigBang,
    /// A fixed-capacity table (a thermal history) has too few nodes for what the argument
    /// given asks of it (the highest redshift of the history).
    #[error("the table capacity is too small for argument {0}")]
    CapacityTooSmall(u8),
}

impl Error {
    /// Zero-based position of the argument the error refers to, when it names one.
    pub const fn argument(self) -> Option<u8> {
        match self {
            Error::NonFinite(a)
            | Error::NonPositive(a)
            | Error::Negative(a)
            | Error::EmptyInterval(a)
            | Error::ArrayTooShort(a)
            | Error::LengthMismatch(a)
            | Error::NotIncreasing(a)
            | Error::DegenerateCalibration(a)
            | Error::OutOfDomain(a)
            | Error::InvalidParameter(a)
            | Error::CapacityTooSmall(a) => Some(a),
            Error::NoConvergence | Error::NoBigBang => None,
        }
    }
}

/// The result type of the core.
pub type Result<T> = core::result::Result<T, Error>;

/// The first failing element of an array function (the `_array` forms): its index and what was
/// wrong with it. Every other element was computed; failing elements are NaN in the output.
#[derive(Debug, Clone, Copy, PartialEq, Eq, thiserror::Error)]
#[error("element {index}: {error}")]
pub struct ElementError {
    /// Zero-based index of the first failing element (for `LengthMismatch`, the length of the
    /// shorter slice).
    pub index: usize,
    /// What was wrong with it; the argument position is that of the scalar function.
    pub error: Error,
}

/// The result type of the array functions: `Ok(())` when every element succeeded.
pub type ArrayResult = core::result::Result<(), ElementError>;
