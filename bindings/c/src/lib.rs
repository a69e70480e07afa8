//! # relicore C ABI
//!
//! The C face of relicore: `include/relicore.h` (generated from this crate by cbindgen) with
//! `librelicore.a` / `librelicore.so`. Physics lives only in the core crate; this crate
//! converts, checks pointers, maps errors and loops over arrays.
//!
//! Calling convention (every export):
//! * inputs by value (or `const T *` for arrays and structs), outputs through pointers, a
//!   buffer always followed by its length, no in/out parameters;
//! * the result is an `int32_t` status: `RELICORE_OK` (0) or a negative `RELICORE_ERROR_*`
//!   code, stable and never reused; `relicore_status_message` turns it into text;
//! * on failure every output is NaN (all fields of a struct), never a sentinel; array forms
//!   set only the failing elements to NaN and return the first failing element's code;
//! * every pointer is checked for NULL (`RELICORE_ERROR_NULL_POINTER`), and every call runs
//!   inside one panic boundary (`RELICORE_ERROR_PANIC`; in the `release-c` profile the
//!   artefacts are built with panic = "abort");
//! * nothing allocates, nothing keeps global state: every function is thread-safe.
//!
//! Module map: `status` (codes, messages, version), the generated `gen_constants` (physical
//! constants, from `src/constants.rs`),
//! `boundary` (plumbing), `calibration` (two-load calibration), `response` (response-weighted
//! radiance), `thermometry` (the temperature-with-uncertainty struct, the response-table,
//! combined-uncertainty forms of radiation thermometry and the body of its frame forms), `universe` (the universe
//! struct, its init function and parameters),
//! `decoupling` (the thermal-history struct and its compute function), `growth` (the
//! linear-growth and power-spectrum structs, the spectrum's options and the compute functions), and the generated
//! `gen_blackbody`, `gen_tables` (response-table functions), `gen_frames`, `gen_cosmology`, `gen_decoupling`, `gen_growth`: the exports of every regular function of
//! `bindings/functions.toml` (`double`, `float` twins, array and frame forms), written by
//! `bindings/generate.py` from that table and the core's rustdoc.

#![deny(missing_docs)]
#![cfg_attr(
    not(test),
    deny(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::panic,
        clippy::indexing_slicing
    )
)]

// Declaration order is the order of the header (cbindgen `sort_by = "None"`); the groups are
// kept apart so rustfmt does not sort them.
pub mod status;

pub mod gen_constants;

mod boundary;

mod stored;

pub mod gen_blackbody;

pub mod calibration;

pub mod response;

pub mod gen_tables;

pub mod thermometry;

pub mod gen_frames;

pub mod universe;

pub mod gen_cosmology;

pub mod decoupling;

pub mod gen_decoupling;

pub mod growth;

pub mod gen_growth;

#[cfg(test)]
mod header;
