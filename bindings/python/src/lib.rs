//! `relicore._native`: the compiled part of the Python package.
//!
//! It converts, checks and loops; the physics is the core's. The Python modules in
//! `bindings/python/python/relicore/` broadcast the inputs, allocate the outputs and call the
//! element loops here, which run with the GIL released.
//!
//! * [`functions`]: the regular functions (tables generated into [`generated`] from
//!   `bindings/functions.toml`) and the one class `Function` that calls or loops any of them.
//! * [`kernels`]: the generic element loop.
//! * [`blackbody`]: the irregular blackbody functions (calibration, response tables).
//! * [`cosmology`]: the native base of `relicore.Universe`.
//! * [`decoupling`]: the native base of `relicore.decoupling.ThermalHistory`.
//! * [`growth`]: the native bases of `relicore.growth.LinearGrowth` and `LinearPowerSpectrum`.
//! * [`errors`]: the one mapping from a core error to `relicore.RelicoreError`.
//! * the constants of `relicore::constants`, as the dicts `CONSTANTS` and `ROOTS` (their names
//!   generated into [`gen_constants`] from `src/constants.rs`), and the core's `VERSION`.

// No panic may unwind into the interpreter: no unwrap, expect, panic or fallible indexing.
#![cfg_attr(
    not(test),
    deny(
        clippy::unwrap_used,
        clippy::expect_used,
        clippy::panic,
        clippy::indexing_slicing
    )
)]
// `!(x > 0.0)` is used on purpose: it is true for NaN too.
#![allow(clippy::neg_cmp_op_on_partial_ord)]

use pyo3::prelude::*;
use pyo3::types::PyDict;

mod blackbody;
mod cosmology;
mod decoupling;
mod errors;
mod functions;
mod gen_constants;
mod growth;
// written by bindings/generate.py, which keeps its own layout
#[rustfmt::skip]
mod generated;
mod kernels;
mod thermometry;

/// A dict of (name, value) pairs: the constants of `gen_constants`.
fn constants_dict<'py>(py: Python<'py>, items: &[(&str, f64)]) -> PyResult<Bound<'py, PyDict>> {
    let d = PyDict::new(py);
    for &(name, value) in items {
        d.set_item(name, value)?;
    }
    Ok(d)
}

/// The SIMD compilation the array functions run in: (level in use, level the CPU supports);
/// 2 = AVX-512, 1 = AVX2, 0 = the baseline (see `relicore-dispatch`).
#[pyfunction]
fn simd_level() -> (u8, u8) {
    (
        relicore_dispatch::level(),
        relicore_dispatch::detected_level(),
    )
}

/// Caps the SIMD level for the whole process (tests of the narrower compilations, speed
/// comparisons); returns the previous cap. Every level gives the same bits.
#[pyfunction]
fn cap_simd_level(cap: u8) -> u8 {
    relicore_dispatch::cap_level(cap)
}

#[pymodule]
fn _native(m: &Bound<'_, PyModule>) -> PyResult<()> {
    let py = m.py();
    m.add("RelicoreError", py.get_type::<errors::RelicoreError>())?;
    m.add_class::<functions::Function>()?;
    m.add_function(wrap_pyfunction!(functions::functions, m)?)?;
    m.add_class::<blackbody::PyTwoLoadCalibration>()?;
    m.add_function(wrap_pyfunction!(blackbody::two_load_calibration, m)?)?;
    m.add_function(wrap_pyfunction!(blackbody::table_map, m)?)?;
    m.add_function(wrap_pyfunction!(blackbody::calibrated_map, m)?)?;
    m.add_function(wrap_pyfunction!(blackbody::irregular_signatures, m)?)?;
    m.add_function(wrap_pyfunction!(thermometry::thermometry_table_map, m)?)?;
    m.add_function(wrap_pyfunction!(thermometry::combined_uncertainty, m)?)?;
    m.add_class::<cosmology::PyUniverse>()?;
    m.add_function(wrap_pyfunction!(cosmology::universe_defaults, m)?)?;
    m.add_class::<decoupling::PyThermalHistory>()?;
    m.add_function(wrap_pyfunction!(decoupling::history_defaults, m)?)?;
    m.add_function(wrap_pyfunction!(decoupling::decoupling_constants, m)?)?;
    m.add_class::<growth::PyLinearGrowth>()?;
    m.add_class::<growth::PyLinearPowerSpectrum>()?;
    m.add_function(wrap_pyfunction!(growth::growth_constants, m)?)?;
    m.add("CONSTANTS", constants_dict(py, gen_constants::CONSTANTS)?)?;
    m.add("ROOTS", constants_dict(py, gen_constants::ROOTS)?)?;
    m.add_function(wrap_pyfunction!(simd_level, m)?)?;
    m.add_function(wrap_pyfunction!(cap_simd_level, m)?)?;
    m.add("VERSION", relicore::VERSION)?;
    Ok(())
}
