//! `relicore.decoupling`: Saha equilibrium, the published fits of the last-scattering and drag
//! redshifts, and the native base of `relicore.decoupling.ThermalHistory` with the table of its
//! queries and their element loop.
//!
//! The Python module broadcasts the inputs, allocates the outputs and calls the loops here,
//! which run with the GIL released (the computation of a history too); every number comes from
//! the core's `relicore::decoupling`.

use std::collections::hash_map::DefaultHasher;
use std::hash::{Hash, Hasher};

use numpy::{PyArray1, PyArrayMethods, PyReadonlyArray1};
use pyo3::exceptions::{PyTypeError, PyValueError};
use pyo3::prelude::*;
use pyo3::types::PyDict;
use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{self as dc, HistoryOptions, ThermalHistory};
use relicore::{Error, Result};

use crate::cosmology::{PARAMETER_NAMES, PyUniverse};
use crate::errors::{Arg, Site, build, core_error_because, py_repr, status_code};
use crate::kernels::{Body as KernelBody, Kernel, Spec as KernelSpec, check_shape, elements, run};

type U = Universe<f64>;
type H = ThermalHistory<f64>;

// ------------------------------------------------------------------------ the published fits

/// The fits of the last-scattering and drag redshifts: plain functions of (ω_b, ω_m), called
/// through the generic kernel of `kernels.rs`.
pub(crate) static FITS: &[KernelSpec] = &[
    KernelSpec {
        name: "last_scattering_redshift_fit",
        args: &["omega_baryon_h2", "omega_matter_h2"],
        body: KernelBody::A2(dc::last_scattering_redshift_fit::<f64>),
        array: None,
    },
    KernelSpec {
        name: "drag_redshift_fit",
        args: &["omega_baryon_h2", "omega_matter_h2"],
        body: KernelBody::A2(dc::drag_redshift_fit::<f64>),
        array: None,
    },
];

/// The kernel of a fit by name.
#[pyfunction]
pub(crate) fn fit_kernel(name: &str) -> PyResult<Kernel> {
    FITS.iter()
        .find(|s| s.name == name)
        .map(Kernel::of)
        .ok_or_else(|| PyValueError::new_err(format!("no relicore fit named {name:?}")))
}

/// Names and parameter names of the fits, in table order.
#[pyfunction]
pub(crate) fn fit_signatures() -> Vec<(&'static str, Vec<&'static str>)> {
    FITS.iter().map(|s| (s.name, s.args.to_vec())).collect()
}

// ------------------------------------------------------------------ errors of the universe

/// Whether a failure belongs to one element (so `nan_on_error` may make it NaN) rather than to
/// the universe shared by every element (the decoupling model refuses it whatever z is).
fn is_element_error(err: Error) -> bool {
    !matches!(err, Error::InvalidParameter(_))
}

/// The `RelicoreError` for a universe the decoupling model refuses (`InvalidParameter(i)`,
/// `i` a position in `UniverseParameters`): argument `universe`, the parameter and its value in
/// the message.
fn universe_refused(
    py: Python<'_>,
    function: &str,
    p: &UniverseParameters<f64>,
    err: Error,
) -> PyErr {
    let i = match err {
        Error::InvalidParameter(i) => usize::from(i),
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

// --------------------------------------------------------------------------- Saha equilibrium

const SAHA: &str = "saha_ionized_fraction";
/// Parameter names of `saha_ionized_fraction`, in the core's order (z is argument 1).
pub(crate) const SAHA_ARGS: &[&str] = &["universe", "z"];

fn saha_error(py: Python<'_>, u: &U, z: f64, site: Option<Site<'_>>, err: Error) -> PyErr {
    if !is_element_error(err) {
        return universe_refused(py, SAHA, u.parameters(), err);
    }
    let because = match err {
        Error::OutOfDomain(1) => Some(format!(
            "must not exceed {} (the highest redshift of the function)",
            py_repr(dc::SAHA_HIGHEST_REDSHIFT)
        )),
        _ => None,
    };
    core_error_because(
        py,
        SAHA,
        SAHA_ARGS,
        &[Arg::Shared, Arg::Value(z)],
        site,
        err,
        because.as_deref(),
    )
}

/// `saha_ionized_fraction(universe, z)` on a scalar z; with `nan_on_error` a failure of z gives
/// NaN (a universe the model refuses always raises).
#[pyfunction]
#[pyo3(signature = (universe, z, nan_on_error=false))]
pub(crate) fn saha_ionized_fraction(
    py: Python<'_>,
    universe: &Bound<'_, PyUniverse>,
    z: f64,
    nan_on_error: bool,
) -> PyResult<f64> {
    let u = universe.get().value();
    match dc::saha_ionized_fraction(u, z) {
        Ok(v) => Ok(v),
        Err(e) if nan_on_error && is_element_error(e) => Ok(f64::NAN),
        Err(e) => Err(saha_error(py, u, z, None, e)),
    }
}

/// Element loop of `saha_ionized_fraction`: `inputs` is one contiguous 1-D float64 array of z
/// (`prod(shape)` elements or one), `out` the contiguous output. Runs with the GIL released.
#[pyfunction]
#[pyo3(signature = (universe, inputs, out, shape, nan_on_error=false))]
pub(crate) fn saha_ionized_fraction_map(
    py: Python<'_>,
    universe: &Bound<'_, PyUniverse>,
    inputs: Vec<PyReadonlyArray1<'_, f64>>,
    out: &Bound<'_, PyArray1<f64>>,
    shape: Vec<usize>,
    nan_on_error: bool,
) -> PyResult<()> {
    let u = universe.get().value();
    let mut out = out.try_readwrite()?;
    let out = out
        .as_slice_mut()
        .map_err(|e| PyValueError::new_err(format!("{SAHA}: out: {e}")))?;
    let n = out.len();
    check_shape(&shape, n, SAHA)?;
    let x = elements(&inputs, n, SAHA)?;
    let [z] = x.as_slice() else {
        return Err(PyTypeError::new_err(format!(
            "{SAHA}: one z array expected, got {}",
            x.len()
        )));
    };
    let failure = py.detach(|| {
        run([*z], out, nan_on_error, is_element_error, |[z]| {
            dc::saha_ionized_fraction(u, z)
        })
    });
    match failure {
        None => Ok(()),
        Some((i, e)) => {
            let zi = z
                .get(if z.len() == 1 { 0 } else { i })
                .copied()
                .unwrap_or(f64::NAN);
            let site = Site {
                index: i,
                shape: &shape,
            };
            Err(saha_error(py, u, zi, Some(site), e))
        }
    }
}

// ---------------------------------------------------------------------------- the history

/// Parameter names of the history's constructor, in the order of the core's error positions
/// (`ThermalHistory::new(universe, options)`: 1 is the reionisation redshift, 2 the highest
/// redshift of the options).
pub(crate) const HISTORY_ARGS: &[&str] = &["universe", "reionization_redshift", "highest_redshift"];

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
        Error::OutOfDomain(1) => Some(format!(
            "must not exceed {} (the reionisation must end well after recombination)",
            py_repr(dc::HIGHEST_REIONIZATION_REDSHIFT)
        )),
        Error::OutOfDomain(2) => Some(format!(
            "must be at least {} (the history starts where hydrogen is in Saha equilibrium)",
            py_repr(dc::LOWEST_HIGHEST_REDSHIFT)
        )),
        Error::CapacityTooSmall(2) => Some(format!(
            "more than the {} nodes of the table can cover (at most {})",
            dc::HISTORY_NODES,
            py_repr(dc::DEFAULT_HIGHEST_REDSHIFT)
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

impl PyThermalHistory {
    pub(crate) fn value(&self) -> &H {
        &self.inner
    }
}

#[pymethods]
impl PyThermalHistory {
    /// Computes the history of `universe` (every argument given; the defaults live in the
    /// Python subclass, read from [`history_defaults`]). The GIL is released while it runs.
    #[new]
    #[pyo3(signature = (universe, reionization_redshift, highest_redshift))]
    fn new(
        py: Python<'_>,
        universe: &Bound<'_, PyUniverse>,
        reionization_redshift: Option<f64>,
        highest_redshift: f64,
    ) -> PyResult<Self> {
        let options = HistoryOptions {
            reionization_redshift,
            highest_redshift,
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

    /// Redshift of last scattering z*, where the Thomson optical depth (reionisation excluded)
    /// reaches 1.
    #[getter]
    fn last_scattering_redshift(&self) -> f64 {
        self.inner.last_scattering_redshift()
    }

    /// Redshift of the drag epoch, where the baryon-drag optical depth reaches 1.
    #[getter]
    fn drag_redshift(&self) -> f64 {
        self.inner.drag_redshift()
    }

    /// Comoving sound horizon at last scattering r_s(z*), Mpc.
    #[getter]
    fn sound_horizon_last_scattering_mpc(&self) -> f64 {
        self.inner.sound_horizon_last_scattering_mpc()
    }

    /// Comoving sound horizon at the drag epoch r_s(z_drag), Mpc.
    #[getter]
    fn sound_horizon_drag_mpc(&self) -> f64 {
        self.inner.sound_horizon_drag_mpc()
    }

    /// Angular scale of the sound horizon at last scattering θ* = r_s(z*)/D_M(z*), radians.
    #[getter]
    fn angular_scale_last_scattering(&self) -> f64 {
        self.inner.angular_scale_last_scattering()
    }

    /// Age of the universe at last scattering, years (Julian).
    #[getter]
    fn age_at_last_scattering_yr(&self) -> f64 {
        self.inner.age_at_last_scattering_yr()
    }

    /// Radiation temperature at last scattering T0 (1 + z*), K.
    #[getter]
    fn temperature_at_last_scattering_k(&self) -> f64 {
        self.inner.temperature_at_last_scattering_k()
    }

    /// Redshift of the peak of the visibility function (per conformal time) at recombination.
    #[getter]
    fn visibility_peak_redshift(&self) -> f64 {
        self.inner.visibility_peak_redshift()
    }

    /// Highest redshift at which the matter temperature has fallen 1 % below the radiation
    /// temperature.
    #[getter]
    fn thermal_decoupling_redshift(&self) -> f64 {
        self.inner.thermal_decoupling_redshift()
    }

    /// Thomson optical depth of reionisation (0 without reionisation).
    #[getter]
    fn reionization_optical_depth(&self) -> f64 {
        self.inner.reionization_optical_depth()
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
            "{name}({universe}, reionization_redshift={reionization}, highest_redshift={})",
            py_repr(this.options.highest_redshift)
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
    Ok(d)
}

// ------------------------------------------------------------------------- history queries

/// A query of the core's `ThermalHistory` at one redshift: its name, parameter names (after
/// `self`) and body.
pub(crate) struct Query {
    pub(crate) name: &'static str,
    pub(crate) args: &'static [&'static str],
    pub(crate) body: fn(&H, f64) -> Result<f64>,
}

macro_rules! query {
    ($name:ident) => {
        Query {
            name: stringify!($name),
            args: &["z"],
            body: H::$name,
        }
    };
}

/// Every element-wise query of the core's `ThermalHistory` (DESIGN 4a order).
pub(crate) static QUERIES: &[Query] = &[
    query!(ionized_fraction),
    query!(matter_temperature_k),
    query!(optical_depth),
    query!(visibility),
    query!(sound_horizon_mpc),
];

/// The reason of a failure in the query's own terms, where the generic one would be vague.
fn query_because(highest_redshift: f64, err: Error) -> Option<String> {
    match err {
        Error::OutOfDomain(0) => Some(format!(
            "above the highest redshift of the history ({})",
            py_repr(highest_redshift)
        )),
        _ => None,
    }
}

/// One query of `ThermalHistory`, as the Python class calls it
/// (`relicore._native.history_method`).
#[pyclass(frozen, module = "relicore._native", name = "HistoryMethod")]
pub(crate) struct HistoryMethod {
    spec: &'static Query,
}

/// The history query of the core by name.
#[pyfunction]
pub(crate) fn history_method(name: &str) -> PyResult<HistoryMethod> {
    QUERIES
        .iter()
        .find(|s| s.name == name)
        .map(|spec| HistoryMethod { spec })
        .ok_or_else(|| PyValueError::new_err(format!("no ThermalHistory method named {name:?}")))
}

/// Names and parameter names of every history query, in table order.
#[pyfunction]
pub(crate) fn history_method_signatures() -> Vec<(&'static str, Vec<&'static str>)> {
    QUERIES.iter().map(|s| (s.name, s.args.to_vec())).collect()
}

impl HistoryMethod {
    fn error(
        &self,
        py: Python<'_>,
        history: &PyThermalHistory,
        z: f64,
        site: Option<Site<'_>>,
        e: Error,
    ) -> PyErr {
        let function = format!("ThermalHistory.{}", self.spec.name);
        let because = query_because(history.options.highest_redshift, e);
        core_error_because(
            py,
            &function,
            self.spec.args,
            &[Arg::Value(z)],
            site,
            e,
            because.as_deref(),
        )
    }
}

#[pymethods]
impl HistoryMethod {
    /// Name of the core method.
    #[getter]
    fn name(&self) -> &'static str {
        self.spec.name
    }

    /// Parameter names of the core method (after the history), in order.
    #[getter]
    fn arguments(&self) -> Vec<&'static str> {
        self.spec.args.to_vec()
    }

    /// Calls the query of `history` at a scalar z; with `nan_on_error` a failure gives NaN.
    #[pyo3(signature = (history, z, nan_on_error=false))]
    fn call(
        &self,
        py: Python<'_>,
        history: &Bound<'_, PyThermalHistory>,
        z: f64,
        nan_on_error: bool,
    ) -> PyResult<f64> {
        let history = history.get();
        match (self.spec.body)(history.value(), z) {
            Ok(v) => Ok(v),
            Err(_) if nan_on_error => Ok(f64::NAN),
            Err(e) => Err(self.error(py, history, z, None, e)),
        }
    }

    /// Element loop: `inputs` is one contiguous 1-D float64 array of z (`prod(shape)` elements
    /// or one), `out` the contiguous output of `prod(shape)` elements. Runs with the GIL
    /// released.
    #[pyo3(signature = (history, inputs, out, shape, nan_on_error=false))]
    fn map(
        &self,
        py: Python<'_>,
        history: &Bound<'_, PyThermalHistory>,
        inputs: Vec<PyReadonlyArray1<'_, f64>>,
        out: &Bound<'_, PyArray1<f64>>,
        shape: Vec<usize>,
        nan_on_error: bool,
    ) -> PyResult<()> {
        let spec = self.spec;
        let f = spec.body;
        let history = history.get();
        let h = history.value();
        let mut out = out.try_readwrite()?;
        let out = out.as_slice_mut().map_err(|e| {
            PyValueError::new_err(format!("ThermalHistory.{}: out: {e}", spec.name))
        })?;
        let n = out.len();
        check_shape(&shape, n, spec.name)?;
        let x = elements(&inputs, n, spec.name)?;
        let [z] = x.as_slice() else {
            return Err(PyTypeError::new_err(format!(
                "ThermalHistory.{}: takes 1 input, got {}",
                spec.name,
                x.len()
            )));
        };
        let failure = py.detach(|| run([*z], out, nan_on_error, |_| true, |[z]| f(h, z)));
        match failure {
            None => Ok(()),
            Some((i, e)) => {
                let zi = z
                    .get(if z.len() == 1 { 0 } else { i })
                    .copied()
                    .unwrap_or(f64::NAN);
                let site = Site {
                    index: i,
                    shape: &shape,
                };
                Err(self.error(py, history, zi, Some(site), e))
            }
        }
    }

    fn __repr__(&self) -> String {
        format!(
            "<relicore ThermalHistory method {}({})>",
            self.spec.name,
            self.spec.args.join(", ")
        )
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use relicore::cosmology::UniverseParameters;

    #[test]
    fn names_are_unique() {
        for (i, a) in QUERIES.iter().enumerate() {
            assert!(
                QUERIES.iter().skip(i + 1).all(|b| b.name != a.name),
                "{}",
                a.name
            );
        }
    }

    #[test]
    fn universe_errors_are_not_element_errors() {
        let mut p = UniverseParameters::new(70.0, 0.3);
        p.omega_baryon = 0.0;
        let u = U::new(p).unwrap();
        let e = dc::saha_ionized_fraction(&u, 1000.0).unwrap_err();
        assert_eq!(e, Error::InvalidParameter(2));
        assert!(!is_element_error(e));
        assert!(is_element_error(Error::Negative(1)));
        assert!(is_element_error(Error::NoConvergence));
        // the core's positions for the history: options argument 1 and 2
        p.omega_baryon = 0.05;
        let u = U::new(p).unwrap();
        let o = HistoryOptions {
            reionization_redshift: Some(-1.0),
            highest_redshift: 1e4,
        };
        assert_eq!(H::new(&u, o).err(), Some(Error::Negative(1)));
        assert_eq!(HISTORY_ARGS[1], "reionization_redshift");
        let o = HistoryOptions {
            reionization_redshift: None,
            highest_redshift: 2e4,
        };
        assert_eq!(H::new(&u, o).err(), Some(Error::CapacityTooSmall(2)));
        assert_eq!(HISTORY_ARGS[2], "highest_redshift");
        assert_eq!(SAHA_ARGS[1], "z");
        assert_eq!(dc::saha_ionized_fraction(&u, -1.0), Err(Error::Negative(1)));
    }
}
