//! Blackbody radiometry: Planck's law in every form, exitances, peaks, band integrals,
//! inversions to temperature, response-weighted radiance, two-load radiometer calibration and
//! the microwave-sky conversions at the CMB temperature; the measurement equation of radiation
//! thermometry (emissivity, reflected surroundings, path) with the uncertainty of every
//! inferred temperature (JCGM 100:2008).
//!
//! Every function is generic over [`Real`](crate::Real) (`f32` for firmware, `f64` for
//! pipelines), allocates nothing, and returns [`Result`](crate::Result).
//!
//! Units are SI: wavelength in m, frequency in Hz, wavenumber in m⁻¹ (not cm⁻¹), temperature
//! in K, spectral radiance in W m⁻² sr⁻¹ per unit of the spectral variable.
//!
//! Every `Ok` holds a finite number. Finite arguments so extreme that the result cannot be
//! formed in the type (σT⁴ beyond the largest float, a temperature from a radiance below the
//! smallest one, or an intermediate such as T⁴ overflowing first: in `f32` the exitance is
//! refused from T ≈ 4.3e9 K, in `f64` from T ≈ 1e77 K) give `Err(OutOfDomain(i))`, i the
//! spectral argument for the Planck forms and the microwave conversions, the temperature for
//! exitances, peaks and bands, the radiance or reading for the inversions. Results that are
//! merely below the smallest subnormal are 0, as documented.
//!
//! # Cautions
//! Radiation thermometry infers a temperature from radiance under assumptions on emissivity,
//! the optical path and calibration. Trusted beyond them it misleads, with real harm where
//! people (fever screening), furnaces, molten metal or fire are concerned. These routines give
//! blackbody physics to the stated accuracy; they are not a certified measurement chain. Follow
//! the applicable standards, local codes and licensed practice.
//!
//! # Method
//! The Planck exponent x = hc/(λkT) (or hν/kT) is formed as a double-length number (an
//! unevaluated sum of two floats, [`crate::math::dd`]), because the relative condition number
//! of 1/(eˣ − 1) with respect to x is about x: a single rounding of x would cost up to x ulp in
//! the Wien tail. `expm1` keeps the Rayleigh-Jeans limit (x → 0) exact, and where eˣ would
//! overflow (x beyond ln of the largest float) the factor e^−x is formed as
//! e^−(x − m ln 2)·2^−m so that the radiance is still correct wherever it is representable and
//! underflows cleanly to 0 beyond.

mod band;
mod calibration;
mod exitance;
mod gradient;
mod inverse;
pub(crate) mod kernel;
mod measurement;
mod microwave;
mod planck;
mod response;
mod uncertainty;

pub use band::*;
pub use calibration::*;
pub use exitance::*;
pub use gradient::*;
pub use inverse::*;
pub use measurement::*;
pub use microwave::*;
pub use planck::*;
pub use response::*;
pub use uncertainty::*;
