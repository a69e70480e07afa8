//! # relicore
//!
//! One validated core for three topics of the physics of thermal radiation and the early
//! universe — **blackbody radiometry**, the **cosmological background** and **decoupling** —
//! shared unchanged by Rust, C, Fortran and Python.
//!
//! * `#![no_std]`, no heap, no global state: every context is a value the caller owns.
//! * Generic over the sealed [`Real`] trait (`f32` and `f64`); every transcendental goes
//!   through the `libm` crate, so every build and every language gets the same bits.
//! * Every function returns [`Result`]; bad input is an [`Error`] naming the argument, never a
//!   panic or a silent number.
//!
//! Topics: [`blackbody`], [`cosmology`], [`decoupling`], [`growth`] (structure growth: growth
//! factor and rate, transfer function, linear power spectrum, σ8, BAO ratios, leapfrog factors). Constants: [`constants`]. Numerical kernels shared by
//! every topic: [`math`].
//!
//! # Cautions
//! Radiation thermometry can hurt someone when it is trusted beyond its emissivity and
//! calibration (fever screening, furnace and molten-metal work, fire safety). The functions
//! compute blackbody physics to their stated accuracy; they are not a certified measurement
//! chain. Follow the applicable standards, local codes and licensed practice.

#![no_std]
#![forbid(unsafe_code)]
#![deny(missing_docs)]
// No panic can reach a caller: no unwrap, expect, panic or fallible indexing in the core.
#![cfg_attr(
    not(test),
    deny(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::panic,
        clippy::indexing_slicing
    )
)]
// `!(x > 0)` is used on purpose: it is true for NaN, which must be refused too.
#![allow(clippy::neg_cmp_op_on_partial_ord)]

#[cfg(feature = "std")]
extern crate std;

mod array;
pub mod blackbody;
mod check;
pub mod constants;
pub mod cosmology;
pub mod decoupling;
pub mod dual;
mod error;
pub mod growth;
pub mod math;
mod real;

pub use dual::Dual;
pub use error::{Arg, ArrayResult, ElementError, Error, Result};
pub use real::Real;

/// Version of the core crate (`major.minor.patch`).
pub const VERSION: &str = env!("CARGO_PKG_VERSION");
