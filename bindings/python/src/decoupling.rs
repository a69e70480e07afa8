//! `relicore.decoupling.ThermalHistory`: the native base class computing and holding the
//! core's `ThermalHistory<f64>`, and what the regular functions of a history add to their
//! error messages.
//!
//! The Python class derives from [`PyThermalHistory`] to give the constructor its keyword
//! defaults (read from the core by [`history_defaults`]) and from the generated mixin of its
//! methods and properties, which call [`crate::functions`]. The computation of a history runs
//! with the GIL released; every number comes from the core's `relicore::decoupling`.

use std::collections::hash_map::DefaultHasher;
use std::hash::{Hash, Hasher};

use pyo3::prelude::*;
use pyo3::types::PyDict;
use relicore::cosmology::UniverseParameters;
use relicore::decoupling::{self as dc, HistoryOptions};
use relicore::{Error, Result};

use crate::cosmology::{PARAMETER_NAMES, PyUniverse};
use crate::errors::{Arg, build, core_error_because, py_repr, status_code};
use crate::functions::{H, Receiver, U};

// ------------------------------------------------------------------ errors of the universe

/// Whether a failure belongs to one element (so `nan_on_error` may make it NaN) rather than to
/// the universe shared by every element (the decoupling model refuses it whatever z is).
fn is_element_error(err: Error) -> bool {
    !matches!(err, Error::InvalidParameter(_))
}

/// The `RelicoreError` for a universe the decoupling model refuses (`InvalidParameter(i)`,
/// `i` a position in `UniverseParameters`): argument `universe`, the parameter and its value in
/// the message.
pub(crate) fn universe_refused(
    py: Python<'_>,
    function: &str,
    p: &UniverseParameters<f64>,
    err: Error,
) -> PyErr {
    let i = match err {
        Error::InvalidParameter(i) => usize::from(i.position()),
        _ => usize::MAX,
    };
    let name = PARAMETER_NAMES.get(i).copied().unwrap_or("a parameter");
    let (value, why) = match i {
        2 if !(p.omega_baryon > 0.0) => (
            p.omega_baryon,
            "must be positive: a universe without baryons has no recombination history",
        ),
        4 if !(p.cmb_temperature_k > 0.0) => (
            p.cmb_temperature_k,
            "must be positive: a universe without radiation has no thermal history",
        ),
        2 => (
            p.omega_baryon,
            "so far from physical values (with h0_km_s_mpc, cmb_temperature_k and \
             helium_mass_fraction) that the densities of the decoupling model are not finite \
             positive numbers",
        ),
        4 => (p.cmb_temperature_k, "refused by the decoupling model"),
        _ => (f64::NAN, "refused by the decoupling model"),
    };
    let message = format!("{function}: universe.{name} = {}: {why}", py_repr(value));
    build(
        py,
        message,
        function,
        Some("universe"),
        None,
        status_code(err),
    )
}

// ---------------------------------------------------------------------------- the history

/// Parameter names of the history's constructor, in the order of the core's error positions
/// (`ThermalHistory::new(universe, options)`: 1 is the reionisation redshift, 2 the highest
/// redshift, 3 and 4 the redshift and width of helium's second reionisation).
pub(crate) const HISTORY_ARGS: &[&str] = &[
    "universe",
    "reionization_redshift",
    "highest_redshift",
    "helium_reionization_redshift",
    "helium_reionization_width",
];

/// The history of `u` on the heap, computed on the current thread. Never inlined: its large
/// stack frame must exist only on the thread that runs it, not in its caller's frame.
#[inline(never)]
fn compute_here(u: &U, options: HistoryOptions<f64>) -> Result<Box<H>> {
    H::new(u, options).map(Box::new)
}

/// Stack of the thread that computes a history: `ThermalHistory::new` returns the value (about
/// 150 KB) on the stack, and with its temporaries it needs about 300 KB (measured: a Python
/// thread of 256 KiB crashed, one of 320 KiB did not), more than a Python thread may have
/// (`threading.stack_size`, or a C library with small default thread stacks).
const HISTORY_STACK: usize = (1 << 20) + 4 * std::mem::size_of::<H>();

/// The history of `u` on the heap, computed on a thread of its own with a stack of
/// [`HISTORY_STACK`] bytes whatever the caller's stack is (starting and joining the thread
/// measured about 25 µs, against several milliseconds for the history); on the caller's thread
/// if no thread can be started.
fn compute_history(u: &U, options: HistoryOptions<f64>) -> Result<Box<H>> {
    let compute = move || compute_here(u, options);
    std::thread::scope(|scope| {
        let worker = std::thread::Builder::new()
            .name("relicore-history".into())
            .stack_size(HISTORY_STACK)
            .spawn_scoped(scope, compute);
        match worker {
            // the core does not panic; should it, the panic goes on to pyo3 (PanicException)
            Ok(handle) => handle
                .join()
                .unwrap_or_else(|payload| std::panic::resume_unwind(payload)),
            Err(_) => compute(),
        }
    })
}

fn construction_error(py: Python<'_>, u: &U, options: HistoryOptions<f64>, err: Error) -> PyErr {
    const F: &str = "ThermalHistory";
    if !is_element_error(err) {
        return universe_refused(py, F, u.parameters(), err);
    }
    let because = match err {
        Error::OutOfDomain(a) if a.position() == 1 => Some(format!(
            "must not exceed {} (the reionisation must end well after recombination)",
            py_repr(dc::HIGHEST_REIONIZATION_REDSHIFT)
        )),
        Error::OutOfDomain(a) if a.position() == 2 => Some(format!(
            "must be at least {} (the history starts where hydrogen is in Saha equilibrium)",
            py_repr(dc::LOWEST_HIGHEST_REDSHIFT)
        )),
        Error::CapacityTooSmall(a) if a.position() == 2 => Some(format!(
            "more than the {} nodes of the table can cover (at most {})",
            dc::HISTORY_NODES,
            py_repr(dc::DEFAULT_HIGHEST_REDSHIFT)
        )),
        Error::OutOfDomain(a) if a.position() == 3 => Some(format!(
            "must not exceed {}",
            py_repr(dc::HIGHEST_HELIUM_REIONIZATION_REDSHIFT)
        )),
        Error::OutOfDomain(a) if a.position() == 4 => Some(format!(
            "must lie between {} and {}",
            py_repr(dc::HELIUM_REIONIZATION_WIDTH_RANGE[0]),
            py_repr(dc::HELIUM_REIONIZATION_WIDTH_RANGE[1])
        )),
        _ => None,
    };
    let reionization = match options.reionization_redshift {
        Some(z) => Arg::Value(z),
        None => Arg::Shared,
    };
    core_error_because(
        py,
        F,
        HISTORY_ARGS,
        &[
            Arg::Shared,
            reionization,
            Arg::Value(options.highest_redshift),
            Arg::Value(options.helium_reionization_redshift),
            Arg::Value(options.helium_reionization_width),
        ],
        None,
        err,
        because.as_deref(),
    )
}

/// Bits of a float for hashing, with −0 and +0 together (they compare equal).
fn key(x: f64) -> u64 {
    if x == 0.0 { 0 } else { x.to_bits() }
}

/// A computed thermal history (frozen; compares and hashes by its universe and options;
/// pickles from them). Python users meet it as `relicore.decoupling.ThermalHistory`, a subclass
/// that adds the keyword defaults and the broadcasting query methods.
#[pyclass(
    frozen,
    subclass,
    module = "relicore._native",
    name = "ThermalHistoryBase"
)]
pub(crate) struct PyThermalHistory {
    /// About 150 KB: on the heap.
    inner: Box<H>,
    universe: Py<PyUniverse>,
    options: HistoryOptions<f64>,
}

#[pymethods]
impl PyThermalHistory {
    /// Computes the history of `universe` (every argument given; the defaults live in the
    /// Python subclass, read from [`history_defaults`]). The GIL is released while it runs.
    #[new]
    #[pyo3(signature = (universe, reionization_redshift, highest_redshift,
                        helium_reionization_redshift, helium_reionization_width))]
    fn new(
        py: Python<'_>,
        universe: &Bound<'_, PyUniverse>,
        reionization_redshift: Option<f64>,
        highest_redshift: f64,
        helium_reionization_redshift: f64,
        helium_reionization_width: f64,
    ) -> PyResult<Self> {
        let options = HistoryOptions {
            reionization_redshift,
            highest_redshift,
            helium_reionization_redshift,
            helium_reionization_width,
        };
        let u = universe.get().value();
        match py.detach(|| compute_history(u, options)) {
            Ok(inner) => Ok(Self {
                inner,
                universe: universe.clone().unbind(),
                options,
            }),
            Err(e) => Err(construction_error(py, u, options, e)),
        }
    }

    /// The universe the history was computed for (the object given to the constructor).
    #[getter]
    fn universe(&self, py: Python<'_>) -> Py<PyUniverse> {
        self.universe.clone_ref(py)
    }

    /// Reionisation redshift of the tanh model, or None (no reionisation).
    #[getter]
    fn reionization_redshift(&self) -> Option<f64> {
        self.options.reionization_redshift
    }

    /// Highest redshift of the table, where the integration starts in Saha equilibrium.
    #[getter]
    fn highest_redshift(&self) -> f64 {
        self.options.highest_redshift
    }

    /// Redshift of helium's second reionisation (the centre of its tanh in z; used with
    /// reionisation).
    #[getter]
    fn helium_reionization_redshift(&self) -> f64 {
        self.options.helium_reionization_redshift
    }

    /// Width Δz of helium's second reionisation tanh (used with reionisation).
    #[getter]
    fn helium_reionization_width(&self) -> f64 {
        self.options.helium_reionization_width
    }

    fn __repr__(slf: &Bound<'_, Self>) -> PyResult<String> {
        let name = slf.get_type().qualname()?;
        let this = slf.get();
        let universe = this.universe.bind(slf.py()).repr()?;
        let reionization = match this.options.reionization_redshift {
            Some(z) => py_repr(z),
            None => "None".into(),
        };
        Ok(format!(
            "{name}({universe}, reionization_redshift={reionization}, highest_redshift={}, \
             helium_reionization_redshift={}, helium_reionization_width={})",
            py_repr(this.options.highest_redshift),
            py_repr(this.options.helium_reionization_redshift),
            py_repr(this.options.helium_reionization_width)
        ))
    }

    fn __eq__(&self, py: Python<'_>, other: PyRef<'_, Self>) -> bool {
        self.options == other.options
            && self.universe.bind(py).get().value().parameters()
                == other.universe.bind(py).get().value().parameters()
    }

    fn __hash__(&self, py: Python<'_>) -> PyResult<u64> {
        let mut h = DefaultHasher::new();
        self.universe.bind(py).hash()?.hash(&mut h);
        match self.options.reionization_redshift {
            Some(z) => (1u8, key(z)).hash(&mut h),
            None => 0u8.hash(&mut h),
        }
        key(self.options.highest_redshift).hash(&mut h);
        key(self.options.helium_reionization_redshift).hash(&mut h);
        key(self.options.helium_reionization_width).hash(&mut h);
        Ok(h.finish())
    }
}

/// The defaults of the history's options, from the core's `HistoryOptions::default()`.
#[pyfunction]
pub(crate) fn history_defaults(py: Python<'_>) -> PyResult<Bound<'_, PyDict>> {
    let o = HistoryOptions::<f64>::default();
    let d = PyDict::new(py);
    d.set_item("reionization_redshift", o.reionization_redshift)?;
    d.set_item("highest_redshift", o.highest_redshift)?;
    d.set_item(
        "helium_reionization_redshift",
        o.helium_reionization_redshift,
    )?;
    d.set_item("helium_reionization_width", o.helium_reionization_width)?;
    Ok(d)
}

/// The public constants of the core's decoupling module.
#[pyfunction]
pub(crate) fn decoupling_constants(py: Python<'_>) -> PyResult<Bound<'_, PyDict>> {
    let d = PyDict::new(py);
    d.set_item("HISTORY_NODES", dc::HISTORY_NODES)?;
    d.set_item("DEFAULT_HIGHEST_REDSHIFT", dc::DEFAULT_HIGHEST_REDSHIFT)?;
    d.set_item("LOWEST_HIGHEST_REDSHIFT", dc::LOWEST_HIGHEST_REDSHIFT)?;
    d.set_item(
        "HIGHEST_REIONIZATION_REDSHIFT",
        dc::HIGHEST_REIONIZATION_REDSHIFT,
    )?;
    d.set_item("SAHA_HIGHEST_REDSHIFT", dc::SAHA_HIGHEST_REDSHIFT)?;
    d.set_item(
        "HIGHEST_HELIUM_REIONIZATION_REDSHIFT",
        dc::HIGHEST_HELIUM_REIONIZATION_REDSHIFT,
    )?;
    d.set_item(
        "DEFAULT_HELIUM_REIONIZATION_REDSHIFT",
        dc::DEFAULT_HELIUM_REIONIZATION_REDSHIFT,
    )?;
    d.set_item(
        "DEFAULT_HELIUM_REIONIZATION_WIDTH",
        dc::DEFAULT_HELIUM_REIONIZATION_WIDTH,
    )?;
    Ok(d)
}

// ------------------------------------------------------------- receiver of regular functions

impl Receiver for PyThermalHistory {
    type Core = H;
    const ARGUMENT: &'static str = "history";

    fn core(&self) -> &H {
        &self.inner
    }

    fn because(&self, _name: &str, err: Error) -> Option<String> {
        match err {
            Error::OutOfDomain(a) if a.position() == 0 => Some(format!(
                "above the highest redshift of the history ({})",
                py_repr(self.options.highest_redshift)
            )),
            _ => None,
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use relicore::cosmology::UniverseParameters;

    #[test]
    fn universe_errors_are_not_element_errors() {
        let mut p = UniverseParameters::new(70.0, 0.3);
        p.omega_baryon = 0.0;
        let u = U::new(p).unwrap();
        let e = dc::saha_ionized_fraction(&u, 1000.0).unwrap_err();
        assert_eq!(e, Error::InvalidParameter(relicore::arg!(2, omega_baryon)));
        assert!(!is_element_error(e));
        assert!(is_element_error(Error::Negative(relicore::arg!(1, z))));
        assert!(is_element_error(Error::NoConvergence));
        // the core's positions for the history: options argument 1 and 2
        p.omega_baryon = 0.05;
        let u = U::new(p).unwrap();
        let o = HistoryOptions {
            reionization_redshift: Some(-1.0),
            highest_redshift: 1e4,
            ..HistoryOptions::default()
        };
        assert_eq!(
            H::new(&u, o).err(),
            Some(Error::Negative(relicore::arg!(1, reionization_redshift)))
        );
        assert_eq!(HISTORY_ARGS[1], "reionization_redshift");
        let o = HistoryOptions {
            reionization_redshift: None,
            highest_redshift: 2e4,
            ..HistoryOptions::default()
        };
        assert_eq!(
            H::new(&u, o).err(),
            Some(Error::CapacityTooSmall(relicore::arg!(2, highest_redshift)))
        );
        assert_eq!(HISTORY_ARGS[2], "highest_redshift");
        let o = HistoryOptions {
            helium_reionization_redshift: -1.0,
            ..HistoryOptions::default()
        };
        assert_eq!(
            H::new(&u, o).err(),
            Some(Error::Negative(relicore::arg!(
                3,
                helium_reionization_redshift
            )))
        );
        assert_eq!(HISTORY_ARGS[3], "helium_reionization_redshift");
        let o = HistoryOptions {
            helium_reionization_width: 0.0,
            ..HistoryOptions::default()
        };
        assert_eq!(
            H::new(&u, o).err(),
            Some(Error::OutOfDomain(relicore::arg!(
                4,
                helium_reionization_width
            )))
        );
        assert_eq!(HISTORY_ARGS[4], "helium_reionization_width");
        assert_eq!(
            dc::saha_ionized_fraction(&u, -1.0),
            Err(Error::Negative(relicore::arg!(1, z)))
        );
    }
}
