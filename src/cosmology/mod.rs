//! The cosmological background: the [`Universe`] parameter set, its expansion rate and density
//! parameters, distances, times and their inverses.
//!
//! Conventions:
//! * `omega_matter` counts everything non-relativistic today, massive neutrinos included, as
//!   published parameter tables quote it; Ω_cb = Ω_m − Ω_ν,massive is cold dark matter plus
//!   baryons.
//! * Radiation: photons from T0 (a_rad T⁴), and N_eff neutrino species shared equally by three
//!   species at T_ν = (4/11)^(1/3) T0; a massive species follows the exact Fermi-Dirac energy
//!   integral (see `neutrino.rs`). `omega_radiation` today counts photons and the massless
//!   species.
//! * Flatness is the default: Ω_k = 0, and dark energy is what remains,
//!   Ω_de = 1 − Ω_m − Ω_r − Ω_k, with w(a) = w0 + wa(1 − a).
//! * Units: Mpc, Gyr (Julian years), km s⁻¹ Mpc⁻¹, kg m⁻³, Gpc³, K.
//! * Every `Ok` holds a finite number: a redshift or target so large (or a parameter set so
//!   extreme) that the result is not representable gives `Err(OutOfDomain(i))` instead, i the
//!   argument (0, or 1 for the second redshift of a two-redshift method).
//!
//! Method: every integral is taken in s = √a, where the integrands stay smooth down to a → 0
//! with or without radiation, by the shared adaptive Gauss-Kronrod quadrature; distances use a
//! per-universe fixed-size Chebyshev table with an a-posteriori error check (`table.rs`) so an
//! array of a million redshifts costs a few nanoseconds per element.

mod bao;
mod distance;
mod expansion;
mod gradient;
mod inverse;
mod neutrino;
#[rustfmt::skip]
mod neutrino_table;
mod table;
mod time;
mod universe;

pub use gradient::*;
pub use universe::{Universe, UniverseParameters};
