//! `relicore.growth.LinearGrowth` and `LinearPowerSpectrum`: the native base classes computing
//! and holding the core's `LinearGrowth<f64>` and `LinearPowerSpectrum<f64>`, and what the
//! regular functions of a growth or a spectrum add to their error messages.
//!
//! The Python classes derive from these bases (to give the constructors their keywords and
//! defaults) and from the generated mixins of their methods and properties, which call
//! [`crate::functions`]. Both computations run with the GIL released, on a thread with a known
//! stack (the core values are about 103 KB each); every number comes from `relicore::growth`.

use std::collections::hash_map::DefaultHasher;
use std::hash::{Hash, Hasher};

use pyo3::exceptions::PyValueError;
use pyo3::prelude::*;
use pyo3::types::PyDict;
use relicore::growth::{LinearGrowth, LinearPowerSpectrum, PIVOT_WAVENUMBER_PER_MPC, TransferForm};
use relicore::{Error, Result};

use crate::cosmology::PyUniverse;
use crate::decoupling::universe_refused;
use crate::errors::{Arg, build, core_error_because, py_repr, status_code};
use crate::functions::{G, Receiver, S};

/// Stack of the thread that computes a growth or a spectrum: the values are about 103 KB and
/// are computed in place on the heap, but the integration and σ8's quadrature keep their own
/// state; 1 MiB plus four values leaves a wide margin whatever the caller's stack is.
const COMPUTE_STACK: usize = (1 << 20) + 4 * std::mem::size_of::<S>();

/// Runs `f` on a thread of its own with a stack of [`COMPUTE_STACK`] bytes (on the caller's
/// thread if none can be started).
fn on_big_stack<T: Send, F: FnOnce() -> T + Send + Copy>(f: F) -> T {
    std::thread::scope(|scope| {
        let worker = std::thread::Builder::new()
            .name("relicore-growth".into())
            .stack_size(COMPUTE_STACK)
            .spawn_scoped(scope, f);
        match worker {
            // the core does not panic; should it, the panic goes on to pyo3 (PanicException)
            Ok(handle) => handle
                .join()
                .unwrap_or_else(|payload| std::panic::resume_unwind(payload)),
            Err(_) => f(),
        }
    })
}

/// Bits of a float for hashing, with −0 and +0 together (they compare equal).
fn key(x: f64) -> u64 {
    if x == 0.0 { 0 } else { x.to_bits() }
}

// ------------------------------------------------------------------------------ the growth

/// The linear growth of a universe (frozen; compares and hashes by its universe; pickles from
/// it). Python users meet it as `relicore.growth.LinearGrowth`.
#[pyclass(
    frozen,
    subclass,
    module = "relicore._native",
    name = "LinearGrowthBase"
)]
pub(crate) struct PyLinearGrowth {
    /// About 75 KB: on the heap.
    inner: Box<G>,
    universe: Py<PyUniverse>,
}

impl PyLinearGrowth {
    pub(crate) fn value(&self) -> &G {
        &self.inner
    }
}

/// The growth of `u`, computed on a thread with a large stack.
fn compute_growth(u: &relicore::cosmology::Universe<f64>) -> Result<Box<G>> {
    on_big_stack(move || LinearGrowth::new(u).map(Box::new))
}

#[pymethods]
impl PyLinearGrowth {
    /// Integrates the growth equation of `universe` (the GIL is released while it runs).
    #[new]
    #[pyo3(signature = (universe))]
    fn new(py: Python<'_>, universe: &Bound<'_, PyUniverse>) -> PyResult<Self> {
        let u = universe.get().value();
        match py.detach(|| compute_growth(u)) {
            Ok(inner) => Ok(Self {
                inner,
                universe: universe.clone().unbind(),
            }),
            Err(e) => {
                let because = match e {
                    Error::OutOfDomain(a) if a.position() == 0 => Some(
                        "has no clustering matter, or its curvature, dark energy or neutrino \
                         masses matter at a = 2^-47 (the growing mode is not known there)",
                    ),
                    _ => None,
                };
                Err(core_error_because(
                    py,
                    "LinearGrowth",
                    &["universe"],
                    &[Arg::Shared],
                    None,
                    e,
                    because,
                ))
            }
        }
    }

    /// The universe the growth was computed for (the object given to the constructor).
    #[getter]
    fn universe(&self, py: Python<'_>) -> Py<PyUniverse> {
        self.universe.clone_ref(py)
    }

    /// D_u(1): the unnormalised growth factor today (the normalisation of the growth factor).
    #[getter]
    fn unnormalized_growth_factor_today(&self) -> f64 {
        self.inner.unnormalized_growth_factor_today()
    }

    fn __repr__(slf: &Bound<'_, Self>) -> PyResult<String> {
        let name = slf.get_type().qualname()?;
        let universe = slf.get().universe.bind(slf.py()).repr()?;
        Ok(format!("{name}({universe})"))
    }

    fn __eq__(&self, py: Python<'_>, other: PyRef<'_, Self>) -> bool {
        self.universe.bind(py).get().value().parameters()
            == other.universe.bind(py).get().value().parameters()
    }

    fn __hash__(&self, py: Python<'_>) -> PyResult<u64> {
        let mut h = DefaultHasher::new();
        "LinearGrowth".hash(&mut h);
        self.universe.bind(py).hash()?.hash(&mut h);
        Ok(h.finish())
    }
}

impl Receiver for PyLinearGrowth {
    type Core = G;
    const ARGUMENT: &'static str = "growth";

    fn core(&self) -> &G {
        &self.inner
    }
}

// ------------------------------------------------------------------------ the spectrum

/// Parameter names of the spectrum's constructor in the order of the core's error positions
/// (`with_scalar_amplitude(growth, form, A_s or σ8, n_s, α_s)`); position 2 is named by the
/// normalisation given.
const SPECTRUM_ARGS_AMPLITUDE: &[&str] = &[
    "growth",
    "transfer_form",
    "scalar_amplitude",
    "spectral_index",
    "running",
];
const SPECTRUM_ARGS_SIGMA8: &[&str] = &[
    "growth",
    "transfer_form",
    "sigma8",
    "spectral_index",
    "running",
];

/// The Python spelling of a transfer form.
fn form_name(form: TransferForm) -> &'static str {
    match form {
        TransferForm::BaryonOscillations => "baryon_oscillations",
        TransferForm::NoWiggle => "no_wiggle",
    }
}

/// Everything a spectrum is computed from besides its growth.
#[derive(Clone, Copy, PartialEq)]
struct SpectrumInputs {
    form: TransferForm,
    /// true: `value` is σ8; false: A_s.
    sigma8: bool,
    value: f64,
    spectral_index: f64,
    running: f64,
}

fn compute_spectrum(g: &G, i: SpectrumInputs) -> Result<Box<S>> {
    on_big_stack(move || {
        if i.sigma8 {
            LinearPowerSpectrum::with_sigma8(g, i.form, i.value, i.spectral_index, i.running)
        } else {
            LinearPowerSpectrum::with_scalar_amplitude(
                g,
                i.form,
                i.value,
                i.spectral_index,
                i.running,
            )
        }
        .map(Box::new)
    })
}

fn spectrum_error(py: Python<'_>, g: &G, i: SpectrumInputs, err: Error) -> PyErr {
    const F: &str = "LinearPowerSpectrum";
    let names = if i.sigma8 {
        SPECTRUM_ARGS_SIGMA8
    } else {
        SPECTRUM_ARGS_AMPLITUDE
    };
    match err {
        // the oscillating form in a universe without baryons: the form is what to change
        Error::InvalidParameter(a) if a.position() == 2 => {
            let message = format!(
                "{F}: transfer_form = 'baryon_oscillations': needs baryons, and growth.universe.\
                 omega_baryon = {} (use transfer_form='no_wiggle' or a universe with baryons)",
                py_repr(g.universe().parameters().omega_baryon)
            );
            return build(
                py,
                message,
                F,
                Some("transfer_form"),
                None,
                status_code(err),
            );
        }
        // no radiation: the universe's parameter, as the decoupling functions say it
        Error::InvalidParameter(_) => {
            return universe_refused(py, F, g.universe().parameters(), err);
        }
        _ => {}
    }
    // σ8 (or A_s from σ8) not formable: no single argument is at fault, so every value is shown
    if let Error::OutOfDomain(_) = err {
        let message = format!(
            "{F}: sigma8 cannot be formed for these parameters ({} = {}, spectral_index = {}, \
             running = {}): far outside physical ones",
            names.get(2).copied().unwrap_or("value"),
            py_repr(i.value),
            py_repr(i.spectral_index),
            py_repr(i.running)
        );
        return build(py, message, F, None, None, status_code(err));
    }
    core_error_because(
        py,
        F,
        names,
        &[
            Arg::Shared,
            Arg::Shared,
            Arg::Value(i.value),
            Arg::Value(i.spectral_index),
            Arg::Value(i.running),
        ],
        None,
        err,
        None,
    )
}

/// A linear matter power spectrum (frozen; compares and hashes by its growth and inputs;
/// pickles from them). Python users meet it as `relicore.growth.LinearPowerSpectrum`.
#[pyclass(
    frozen,
    subclass,
    module = "relicore._native",
    name = "LinearPowerSpectrumBase"
)]
pub(crate) struct PyLinearPowerSpectrum {
    /// About 75 KB: on the heap.
    inner: Box<S>,
    growth: Py<PyLinearGrowth>,
    inputs: SpectrumInputs,
}

#[pymethods]
impl PyLinearPowerSpectrum {
    /// Computes the spectrum (every argument given; the keywords and defaults live in the
    /// Python subclass). `transfer_form` is "baryon_oscillations" or "no_wiggle"; exactly one
    /// of `scalar_amplitude` and `sigma8` is a number. The GIL is released while it runs.
    #[new]
    #[pyo3(signature = (growth, transfer_form, scalar_amplitude, sigma8, spectral_index, running))]
    fn new(
        py: Python<'_>,
        growth: &Bound<'_, PyLinearGrowth>,
        transfer_form: &str,
        scalar_amplitude: Option<f64>,
        sigma8: Option<f64>,
        spectral_index: f64,
        running: f64,
    ) -> PyResult<Self> {
        const F: &str = "LinearPowerSpectrum";
        let form = match transfer_form {
            "baryon_oscillations" => TransferForm::BaryonOscillations,
            "no_wiggle" => TransferForm::NoWiggle,
            other => {
                let message = format!(
                    "{F}: transfer_form = {other:?}: must be 'baryon_oscillations' or 'no_wiggle'"
                );
                return Err(build(
                    py,
                    message,
                    F,
                    Some("transfer_form"),
                    None,
                    status_code(Error::OutOfDomain(relicore::arg!(1, z))),
                ));
            }
        };
        let (is_sigma8, value) = match (scalar_amplitude, sigma8) {
            (Some(a), None) => (false, a),
            (None, Some(s)) => (true, s),
            _ => {
                return Err(PyValueError::new_err(format!(
                    "{F}: give exactly one of scalar_amplitude and sigma8 (the normalisation)"
                )));
            }
        };
        let inputs = SpectrumInputs {
            form,
            sigma8: is_sigma8,
            value,
            spectral_index,
            running,
        };
        let g = growth.get().value();
        match py.detach(|| compute_spectrum(g, inputs)) {
            Ok(inner) => Ok(Self {
                inner,
                growth: growth.clone().unbind(),
                inputs,
            }),
            Err(e) => Err(spectrum_error(py, g, inputs, e)),
        }
    }

    /// The linear growth the spectrum was computed on (the object given to the constructor).
    #[getter]
    fn growth(&self, py: Python<'_>) -> Py<PyLinearGrowth> {
        self.growth.clone_ref(py)
    }

    /// The transfer form: "baryon_oscillations" or "no_wiggle".
    #[getter]
    fn transfer_form(&self) -> &'static str {
        form_name(self.inputs.form)
    }

    /// The normalisation given: ("scalar_amplitude", A_s) or ("sigma8", σ8).
    #[getter]
    fn normalisation(&self) -> (&'static str, f64) {
        let name = if self.inputs.sigma8 {
            "sigma8"
        } else {
            "scalar_amplitude"
        };
        (name, self.inputs.value)
    }

    /// The primordial spectral index n_s.
    #[getter]
    fn spectral_index(&self) -> f64 {
        self.inputs.spectral_index
    }

    /// The running α_s = dn_s/d ln k.
    #[getter]
    fn running(&self) -> f64 {
        self.inputs.running
    }

    fn __repr__(slf: &Bound<'_, Self>) -> PyResult<String> {
        let name = slf.get_type().qualname()?;
        let this = slf.get();
        let growth = this.growth.bind(slf.py()).repr()?;
        let (norm, value) = this.normalisation();
        Ok(format!(
            "{name}({growth}, transfer_form='{}', {norm}={}, spectral_index={}, running={})",
            form_name(this.inputs.form),
            py_repr(value),
            py_repr(this.inputs.spectral_index),
            py_repr(this.inputs.running)
        ))
    }

    fn __eq__(&self, py: Python<'_>, other: PyRef<'_, Self>) -> PyResult<bool> {
        if self.inputs != other.inputs {
            return Ok(false);
        }
        self.growth.bind(py).eq(other.growth.bind(py))
    }

    fn __hash__(&self, py: Python<'_>) -> PyResult<u64> {
        let mut h = DefaultHasher::new();
        self.growth.bind(py).hash()?.hash(&mut h);
        form_name(self.inputs.form).hash(&mut h);
        self.inputs.sigma8.hash(&mut h);
        key(self.inputs.value).hash(&mut h);
        key(self.inputs.spectral_index).hash(&mut h);
        key(self.inputs.running).hash(&mut h);
        Ok(h.finish())
    }
}

impl Receiver for PyLinearPowerSpectrum {
    type Core = S;
    const ARGUMENT: &'static str = "power_spectrum";

    fn core(&self) -> &S {
        &self.inner
    }

    fn because(&self, name: &str, err: Error) -> Option<String> {
        match (name, err) {
            ("linear_power_spectrum_mpc3", Error::OutOfDomain(a)) if a.position() == 0 => Some(
                "P is not representable at this wavenumber (k beyond about 1e70 Mpc^-1)".into(),
            ),
            ("density_rms_in_sphere", Error::OutOfDomain(a)) if a.position() == 0 => {
                Some("so extreme that sigma is not representable".into())
            }
            _ => None,
        }
    }
}

/// The public constants of the core's growth module.
#[pyfunction]
pub(crate) fn growth_constants(py: Python<'_>) -> PyResult<Bound<'_, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("PIVOT_WAVENUMBER_PER_MPC", PIVOT_WAVENUMBER_PER_MPC)?;
    d.set_item("TRANSFER_FORMS", ("baryon_oscillations", "no_wiggle"))?;
    Ok(d)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn constructor_names_follow_the_core_positions() {
        assert_eq!(SPECTRUM_ARGS_AMPLITUDE[2], "scalar_amplitude");
        assert_eq!(SPECTRUM_ARGS_SIGMA8[3], "spectral_index");
        assert_eq!(SPECTRUM_ARGS_SIGMA8[4], "running");
    }
}
