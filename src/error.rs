//! The one error type of the core.

use core::fmt;

/// The argument an [`Error`] refers to: its zero-based position in the function's parameter list
/// (the receiver `self` excluded; for [`Error::InvalidParameter`], the field's position in the
/// parameter set) and its name there, the core's parameter name.
///
/// One pointer to a `'static` pair, so that [`Error`] stays two words and `Copy`, and building
/// one costs nothing where no error happens. Made by [`arg!`](crate::arg). `Display` prints the
/// name; faces that call the core under other names (Python) map the position to their own.
/// Equality compares position and name.
#[derive(Clone, Copy, PartialEq, Eq)]
pub struct Arg(&'static (u8, &'static str));

impl Arg {
    /// The argument at `at.0` named `at.1`; use [`arg!`](crate::arg), which makes the `'static`
    /// pair.
    pub const fn new(at: &'static (u8, &'static str)) -> Self {
        Arg(at)
    }

    /// Zero-based position of the argument in the function's parameter list.
    pub const fn position(self) -> u8 {
        self.0.0
    }

    /// The argument's name in the core's signature (for example `"temperature_k"`).
    pub const fn name(self) -> &'static str {
        self.0.1
    }
}

impl fmt::Display for Arg {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.name())
    }
}

impl fmt::Debug for Arg {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}@{}", self.name(), self.position())
    }
}

/// An [`Arg`]: `arg!(1, temperature_k)` is the argument at position 1 named `temperature_k`
/// (a constant: the pair is a `'static` promoted at compile time).
#[macro_export]
macro_rules! arg {
    ($position:expr, $name:ident) => {
        $crate::Arg::new(const { &($position, stringify!($name)) })
    };
}

/// What was wrong with a call. Small (two words) and `Copy`; the [`Arg`] payload names the
/// offending argument and gives its zero-based position in the function's parameter list, so
/// every face can name it (C maps the kind to a status code, Python names the argument in its own
/// signature, its value and the array index). The functions' documentation writes the error
/// naming the argument at position i as `NonFinite(i)`, `NonPositive(i)`, ….
#[derive(Debug, Clone, Copy, PartialEq, Eq, thiserror::Error)]
#[non_exhaustive]
pub enum Error {
    /// An argument is NaN or infinite.
    #[error("argument {0} is not finite")]
    NonFinite(Arg),
    /// An argument that must be strictly positive (temperature, wavelength, frequency,
    /// radiance, reading span) is zero or negative.
    #[error("argument {0} must be positive")]
    NonPositive(Arg),
    /// An argument that must not be negative (redshift, spectral response) is negative.
    #[error("argument {0} must not be negative")]
    Negative(Arg),
    /// An interval whose lower bound (the argument given) is not below its upper bound.
    #[error("interval starting at argument {0} is empty: lower bound must be below upper bound")]
    EmptyInterval(Arg),
    /// An array argument has fewer elements than the function needs.
    #[error("array argument {0} is too short")]
    ArrayTooShort(Arg),
    /// Two array arguments that must have the same length do not.
    #[error("array argument {0} has a different length from the first array")]
    LengthMismatch(Arg),
    /// An array argument that must be strictly increasing is not.
    #[error("array argument {0} is not strictly increasing")]
    NotIncreasing(Arg),
    /// A calibration whose two loads (or two readings) coincide, so no gain can be formed.
    #[error("degenerate calibration: the two loads or the two readings coincide (argument {0})")]
    DegenerateCalibration(Arg),
    /// A value outside the documented domain of the function (for example a radiance ratio
    /// no blackbody can produce). Also returned when finite arguments give a result that the
    /// floating-point type cannot hold (it would overflow to ±∞, or an intermediate under- or
    /// overflowed so that no number can be formed): every `Ok` holds a finite value.
    #[error("argument {0} is outside the domain of the function")]
    OutOfDomain(Arg),
    /// An iteration did not converge within its budget.
    #[error("no convergence")]
    NoConvergence,
    /// A parameter of a parameter set (a universe) is invalid; the payload names the parameter
    /// and gives its position in the documented parameter list (for `UniverseParameters`:
    /// 0 h0_km_s_mpc, 1 omega_matter, 2 omega_baryon, 3 omega_curvature, 4 cmb_temperature_k,
    /// 5 n_eff, 6 neutrino_masses_ev, 7 w0, 8 wa, 9 helium_mass_fraction).
    #[error("parameter {0} is invalid")]
    InvalidParameter(Arg),
    /// The model has no big bang: E(z)² ≤ 0 somewhere on the way back (a bounce or a
    /// loitering universe), so ages and distances to high redshift do not exist.
    #[error("the model has no big bang: E(z)^2 <= 0 on the way back")]
    NoBigBang,
    /// A fixed-capacity table (a thermal history) has too few nodes for what the argument
    /// given asks of it (the highest redshift of the history).
    #[error("the table capacity is too small for argument {0}")]
    CapacityTooSmall(Arg),
}

impl Error {
    /// The argument the error refers to, when it names one.
    pub const fn arg(self) -> Option<Arg> {
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

    /// Zero-based position of the argument the error refers to, when it names one.
    pub const fn argument(self) -> Option<u8> {
        match self.arg() {
            Some(a) => Some(a.position()),
            None => None,
        }
    }

    /// The core's name of the argument the error refers to, when it names one.
    pub const fn argument_name(self) -> Option<&'static str> {
        match self.arg() {
            Some(a) => Some(a.name()),
            None => None,
        }
    }

    /// The same kind of error, naming `arg` instead: for a function that checks an argument
    /// through a helper whose own parameter list differs.
    pub const fn with_arg(self, arg: Arg) -> Self {
        match self {
            Error::NonFinite(_) => Error::NonFinite(arg),
            Error::NonPositive(_) => Error::NonPositive(arg),
            Error::Negative(_) => Error::Negative(arg),
            Error::EmptyInterval(_) => Error::EmptyInterval(arg),
            Error::ArrayTooShort(_) => Error::ArrayTooShort(arg),
            Error::LengthMismatch(_) => Error::LengthMismatch(arg),
            Error::NotIncreasing(_) => Error::NotIncreasing(arg),
            Error::DegenerateCalibration(_) => Error::DegenerateCalibration(arg),
            Error::OutOfDomain(_) => Error::OutOfDomain(arg),
            Error::InvalidParameter(_) => Error::InvalidParameter(arg),
            Error::CapacityTooSmall(_) => Error::CapacityTooSmall(arg),
            Error::NoConvergence => Error::NoConvergence,
            Error::NoBigBang => Error::NoBigBang,
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
    /// What was wrong with it; the argument (position and name) is that of the scalar function.
    pub error: Error,
}

/// The result type of the array functions: `Ok(())` when every element succeeded.
pub type ArrayResult = core::result::Result<(), ElementError>;

#[cfg(test)]
mod tests {
    use super::*;

    extern crate std;
    use std::format;

    #[test]
    fn error_stays_two_words_and_results_do_not_grow() {
        // an error is a tag and one pointer; a Result of a double is no larger than before the
        // argument names (16 bytes: the tag's niche holds Ok)
        assert_eq!(core::mem::size_of::<Arg>(), core::mem::size_of::<usize>());
        assert!(core::mem::size_of::<Error>() <= 2 * core::mem::size_of::<usize>());
        assert!(core::mem::size_of::<Result<f64>>() <= 16);
    }

    #[test]
    fn messages_name_the_argument() {
        let e = Error::NonPositive(crate::arg!(1, temperature_k));
        assert_eq!(format!("{e}"), "argument temperature_k must be positive");
        assert_eq!(e.argument(), Some(1));
        assert_eq!(e.argument_name(), Some("temperature_k"));
        assert_eq!(format!("{e:?}"), "NonPositive(temperature_k@1)");
        let p = Error::InvalidParameter(crate::arg!(2, omega_baryon));
        assert_eq!(format!("{p}"), "parameter omega_baryon is invalid");
        assert_eq!(Error::NoConvergence.argument(), None);
        assert_eq!(Error::NoConvergence.argument_name(), None);
        let moved = e.with_arg(crate::arg!(0, wavelength_m));
        assert_eq!(moved, Error::NonPositive(crate::arg!(0, wavelength_m)));
        // equality compares the name as well as the position
        assert_ne!(e, Error::NonPositive(crate::arg!(1, spectral_radiance)));
        let el = ElementError {
            index: 3,
            error: Error::Negative(crate::arg!(0, z)),
        };
        assert_eq!(
            format!("{el}"),
            "element 3: argument z must not be negative"
        );
    }

    #[test]
    fn public_functions_name_their_own_parameters() {
        // the name in the message is the parameter's name in the core's signature
        let e = crate::blackbody::spectral_radiance_wavelength(1e-6, -3.0_f64).unwrap_err();
        assert_eq!(format!("{e}"), "argument temperature_k must be positive");
        let e = crate::blackbody::band_radiance_frequency(2e12, 1e12, 300.0_f64).unwrap_err();
        assert_eq!(e, Error::EmptyInterval(crate::arg!(0, lower_hz)));
        let e = crate::blackbody::band_radiance_wavelength(-1.0, 1e-5, 300.0_f64).unwrap_err();
        assert_eq!(e, Error::Negative(crate::arg!(0, lower_m)));
        let u = crate::cosmology::Universe::new(crate::cosmology::UniverseParameters::new(
            67.36, 0.3153,
        ))
        .unwrap();
        let e = u.luminosity_distance_mpc(-1.0_f64).unwrap_err();
        assert_eq!(format!("{e}"), "argument z must not be negative");
        let e = u.redshift_at_luminosity_distance_mpc(f64::NAN).unwrap_err();
        assert_eq!(format!("{e}"), "argument distance_mpc is not finite");
    }
}
