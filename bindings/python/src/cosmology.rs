//! `relicore.Universe`: the native base class wrapping the core's `Universe<f64>`, and what
//! the regular functions of a universe add to their error messages.
//!
//! The Python class `relicore.cosmology.Universe` derives from [`PyUniverse`] to give the
//! constructor its keyword defaults (read from the core by [`universe_defaults`]) and from the
//! generated mixin of its methods and properties, which call [`crate::functions`].

use std::collections::hash_map::DefaultHasher;
use std::hash::{Hash, Hasher};

use pyo3::prelude::*;
use pyo3::types::{PyDict, PyTuple};
use relicore::Error;
use relicore::cosmology::{Universe, UniverseParameters};

use crate::decoupling::universe_refused;
use crate::errors::{build, py_repr, shape_error};
use crate::functions::{Receiver, U};

/// Names of the parameters in the order of the positions of the core's
/// `Error::InvalidParameter`.
pub(crate) const PARAMETER_NAMES: [&str; 10] = [
    "h0_km_s_mpc",
    "omega_matter",
    "omega_baryon",
    "omega_curvature",
    "cmb_temperature_k",
    "n_eff",
    "neutrino_masses_ev",
    "w0",
    "wa",
    "helium_mass_fraction",
];

/// A validated universe (frozen; compares and hashes by its parameters; pickles from them).
/// Python users meet it as `relicore.Universe`, a subclass that adds the keyword defaults and
/// the broadcasting methods.
#[pyclass(frozen, subclass, module = "relicore._native", name = "UniverseBase")]
pub(crate) struct PyUniverse {
    inner: Box<U>,
}

impl PyUniverse {
    pub(crate) fn value(&self) -> &U {
        &self.inner
    }

    fn params(&self) -> &UniverseParameters<f64> {
        self.inner.parameters()
    }
}

/// Why parameter `i` was refused, in words, given the values the caller passed (the core says
/// which parameter; this says which of its documented rules the values break).
fn parameter_rule(p: &UniverseParameters<f64>, i: u8) -> String {
    let finite = |x: f64| {
        if x.is_finite() {
            None
        } else {
            Some("must be finite".to_string())
        }
    };
    let masses = p.neutrino_masses_ev;
    match i {
        0 => finite(p.h0_km_s_mpc).unwrap_or_else(|| {
            if p.h0_km_s_mpc > 0.0 {
                "so far from any physical value that c/H0, 1/H0 or the critical density is not a \
                 finite positive number"
                    .into()
            } else {
                "must be positive".into()
            }
        }),
        1 => finite(p.omega_matter).unwrap_or_else(|| {
            if p.omega_matter < 0.0 {
                "must not be negative".into()
            } else {
                "so large that E(z)^2 overflows on the way back".into()
            }
        }),
        2 => finite(p.omega_baryon).unwrap_or_else(|| {
            if p.omega_baryon < 0.0 {
                "must not be negative".into()
            } else {
                format!("must not exceed omega_matter = {}", py_repr(p.omega_matter))
            }
        }),
        4 => finite(p.cmb_temperature_k).unwrap_or_else(|| {
            if p.cmb_temperature_k < 0.0 {
                "must not be negative".into()
            } else {
                "so large that the radiation density overflows".into()
            }
        }),
        5 => finite(p.n_eff).unwrap_or_else(|| {
            if p.n_eff < 0.0 {
                "must not be negative".into()
            } else {
                "so large that the neutrino density overflows".into()
            }
        }),
        6 => {
            if masses.iter().any(|m| !m.is_finite()) {
                "each mass must be finite".into()
            } else if masses.iter().any(|m| *m < 0.0) {
                "each mass must not be negative".into()
            } else if p.cmb_temperature_k == 0.0 {
                "a positive mass needs a neutrino background (cmb_temperature_k > 0)".into()
            } else if !(p.n_eff > 0.0) {
                "a positive mass needs neutrino species (n_eff > 0)".into()
            } else {
                format!(
                    "the massive neutrinos alone are denser today than omega_matter = {} allows",
                    py_repr(p.omega_matter)
                )
            }
        }
        // the core names w0 (with wa) when the dark-energy density overflows on the way back
        7 | 8 => finite(if i == 7 { p.w0 } else { p.wa }).unwrap_or_else(|| {
            "with wa, an equation of state so far from physical ones that the dark-energy \
             density overflows on the way back (w0 + wa is the early-time w)"
                .into()
        }),
        9 => finite(p.helium_mass_fraction)
            .unwrap_or_else(|| "must be at least 0 and below 1".into()),
        _ => "must be finite".into(),
    }
}

fn masses_repr(m: [f64; 3]) -> String {
    format!("({}, {}, {})", py_repr(m[0]), py_repr(m[1]), py_repr(m[2]))
}

fn parameter_repr(p: &UniverseParameters<f64>, i: usize) -> String {
    match i {
        0 => py_repr(p.h0_km_s_mpc),
        1 => py_repr(p.omega_matter),
        2 => py_repr(p.omega_baryon),
        3 => py_repr(p.omega_curvature),
        4 => py_repr(p.cmb_temperature_k),
        5 => py_repr(p.n_eff),
        6 => masses_repr(p.neutrino_masses_ev),
        7 => py_repr(p.w0),
        8 => py_repr(p.wa),
        _ => py_repr(p.helium_mass_fraction),
    }
}

/// The `RelicoreError` for a universe the core refused to build.
fn construction_error(py: Python<'_>, p: &UniverseParameters<f64>, err: Error) -> PyErr {
    let status = crate::errors::status_code(err);
    match err {
        Error::InvalidParameter(a) => {
            let i = a.position();
            let name = PARAMETER_NAMES
                .get(usize::from(i))
                .copied()
                .unwrap_or("a parameter");
            let message = format!(
                "Universe: {name} = {}: {}",
                parameter_repr(p, usize::from(i)),
                parameter_rule(p, i)
            );
            build(py, message, "Universe", Some(name), None, status)
        }
        Error::NoBigBang => {
            let message = format!(
                "Universe: the model has no big bang: E(z)^2 <= 0 somewhere on the way back to \
                 a -> 0 (a bouncing or loitering model), so ages and distances to high redshift \
                 do not exist (omega_matter = {}, omega_curvature = {}, cmb_temperature_k = {}, \
                 w0 = {}, wa = {})",
                py_repr(p.omega_matter),
                py_repr(p.omega_curvature),
                py_repr(p.cmb_temperature_k),
                py_repr(p.w0),
                py_repr(p.wa)
            );
            build(py, message, "Universe", None, None, status)
        }
        other => build(
            py,
            format!("Universe: the core refused the parameters ({other})"),
            "Universe",
            None,
            None,
            status,
        ),
    }
}

/// Bits of a float for hashing, with −0 and +0 together (they compare equal).
fn key(x: f64) -> u64 {
    if x == 0.0 { 0 } else { x.to_bits() }
}

#[pymethods]
impl PyUniverse {
    /// Validates the parameters and builds the universe (every argument given; the defaults
    /// live in the Python subclass, read from [`universe_defaults`]).
    #[new]
    #[pyo3(signature = (h0_km_s_mpc, omega_matter, omega_baryon, omega_curvature, cmb_temperature_k, n_eff, neutrino_masses_ev, w0, wa, helium_mass_fraction))]
    #[allow(clippy::too_many_arguments)]
    fn new(
        py: Python<'_>,
        h0_km_s_mpc: f64,
        omega_matter: f64,
        omega_baryon: f64,
        omega_curvature: f64,
        cmb_temperature_k: f64,
        n_eff: f64,
        neutrino_masses_ev: Vec<f64>,
        w0: f64,
        wa: f64,
        helium_mass_fraction: f64,
    ) -> PyResult<Self> {
        let masses: [f64; 3] = match neutrino_masses_ev.as_slice() {
            &[a, b, c] => [a, b, c],
            other => {
                return Err(shape_error(
                    py,
                    "Universe",
                    "neutrino_masses_ev",
                    &format!(
                        "must hold three masses (one per species), got {}",
                        other.len()
                    ),
                ));
            }
        };
        let params = UniverseParameters {
            h0_km_s_mpc,
            omega_matter,
            omega_baryon,
            omega_curvature,
            cmb_temperature_k,
            n_eff,
            neutrino_masses_ev: masses,
            w0,
            wa,
            helium_mass_fraction,
        };
        // building the distance table takes about a millisecond: let other threads run
        match py.detach(|| Universe::new(params).map(Box::new)) {
            Ok(inner) => Ok(Self { inner }),
            Err(e) => Err(construction_error(py, &params, e)),
        }
    }

    /// Hubble constant H0, km s^-1 Mpc^-1.
    #[getter]
    fn h0_km_s_mpc(&self) -> f64 {
        self.params().h0_km_s_mpc
    }

    /// Density parameter of everything non-relativistic today (massive neutrinos included).
    #[getter]
    fn omega_matter(&self) -> f64 {
        self.params().omega_matter
    }

    /// Baryon density parameter today.
    #[getter]
    fn omega_baryon(&self) -> f64 {
        self.params().omega_baryon
    }

    /// Curvature density parameter today (0: flat).
    #[getter]
    fn omega_curvature(&self) -> f64 {
        self.params().omega_curvature
    }

    /// CMB temperature today, K (0: no radiation).
    #[getter]
    fn cmb_temperature_k(&self) -> f64 {
        self.params().cmb_temperature_k
    }

    /// Effective number of neutrino species.
    #[getter]
    fn n_eff(&self) -> f64 {
        self.params().n_eff
    }

    /// The three neutrino masses, eV.
    #[getter]
    fn neutrino_masses_ev<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyTuple>> {
        PyTuple::new(py, self.params().neutrino_masses_ev)
    }

    /// Dark-energy equation of state today, w0.
    #[getter]
    fn w0(&self) -> f64 {
        self.params().w0
    }

    /// Dark-energy equation-of-state slope wa: w(a) = w0 + wa (1 - a).
    #[getter]
    fn wa(&self) -> f64 {
        self.params().wa
    }

    /// Primordial helium mass fraction.
    #[getter]
    fn helium_mass_fraction(&self) -> f64 {
        self.params().helium_mass_fraction
    }

    /// The ten parameters as a dict of keyword arguments: `Universe(**u.parameters) == u`.
    #[getter]
    fn parameters<'py>(&self, py: Python<'py>) -> PyResult<Bound<'py, PyDict>> {
        let p = self.params();
        let d = PyDict::new(py);
        d.set_item("h0_km_s_mpc", p.h0_km_s_mpc)?;
        d.set_item("omega_matter", p.omega_matter)?;
        d.set_item("omega_baryon", p.omega_baryon)?;
        d.set_item("omega_curvature", p.omega_curvature)?;
        d.set_item("cmb_temperature_k", p.cmb_temperature_k)?;
        d.set_item("n_eff", p.n_eff)?;
        d.set_item(
            "neutrino_masses_ev",
            PyTuple::new(py, p.neutrino_masses_ev)?,
        )?;
        d.set_item("w0", p.w0)?;
        d.set_item("wa", p.wa)?;
        d.set_item("helium_mass_fraction", p.helium_mass_fraction)?;
        Ok(d)
    }

    fn __repr__(slf: &Bound<'_, Self>) -> PyResult<String> {
        let name = slf.get_type().qualname()?;
        let p = slf.get().params();
        let fields: Vec<String> = PARAMETER_NAMES
            .iter()
            .enumerate()
            .map(|(i, n)| format!("{n}={}", parameter_repr(p, i)))
            .collect();
        Ok(format!("{name}({})", fields.join(", ")))
    }

    fn __eq__(&self, other: PyRef<'_, Self>) -> bool {
        self.params() == other.params()
    }

    fn __hash__(&self) -> u64 {
        let p = self.params();
        let mut h = DefaultHasher::new();
        for x in [
            p.h0_km_s_mpc,
            p.omega_matter,
            p.omega_baryon,
            p.omega_curvature,
            p.cmb_temperature_k,
            p.n_eff,
            p.neutrino_masses_ev[0],
            p.neutrino_masses_ev[1],
            p.neutrino_masses_ev[2],
            p.w0,
            p.wa,
            p.helium_mass_fraction,
        ] {
            key(x).hash(&mut h);
        }
        h.finish()
    }
}

/// The defaults of every keyword parameter, from the core's `UniverseParameters::new`.
#[pyfunction]
pub(crate) fn universe_defaults(py: Python<'_>) -> PyResult<Bound<'_, PyDict>> {
    let p = UniverseParameters::<f64>::new(f64::NAN, f64::NAN);
    let d = PyDict::new(py);
    d.set_item("omega_baryon", p.omega_baryon)?;
    d.set_item("omega_curvature", p.omega_curvature)?;
    d.set_item("cmb_temperature_k", p.cmb_temperature_k)?;
    d.set_item("n_eff", p.n_eff)?;
    d.set_item(
        "neutrino_masses_ev",
        PyTuple::new(py, p.neutrino_masses_ev)?,
    )?;
    d.set_item("w0", p.w0)?;
    d.set_item("wa", p.wa)?;
    d.set_item("helium_mass_fraction", p.helium_mass_fraction)?;
    Ok(d)
}

// ------------------------------------------------------------- receiver of regular functions

impl Receiver for PyUniverse {
    type Core = U;
    const ARGUMENT: &'static str = "universe";

    fn core(&self) -> &U {
        &self.inner
    }

    fn refused(&self, py: Python<'_>, label: &str, err: Error) -> Option<PyErr> {
        Some(universe_refused(py, label, self.params(), err))
    }

    fn because(&self, name: &str, err: Error) -> Option<String> {
        match (name, err) {
            ("matter_radiation_equality_redshift", _) => Some(format!(
                "undefined for a universe without radiation (cmb_temperature_k = {})",
                py_repr(self.params().cmb_temperature_k)
            )),
            ("saha_ionized_fraction", Error::OutOfDomain(a)) if a.position() == 1 => Some(format!(
                "must not exceed {} (the highest redshift of the function)",
                py_repr(relicore::decoupling::SAHA_HIGHEST_REDSHIFT)
            )),
            _ => because(name, err).map(str::to_string),
        }
    }
}

/// The reason of a failure in the method's own terms, where the generic one would be vague.
fn because(method: &str, err: Error) -> Option<&'static str> {
    Some(match (method, err) {
        ("age_gyr", Error::OutOfDomain(_)) => {
            "the age diverges in this universe (its past is infinite)"
        }
        ("conformal_time_mpc", Error::OutOfDomain(_)) => {
            "the conformal time diverges in this universe (neither radiation nor matter at early \
             times)"
        }
        ("distance_modulus", Error::NonPositive(_)) => {
            "must be positive (the luminosity distance is 0 at z = 0)"
        }
        ("angular_diameter_distance_between_mpc", Error::EmptyInterval(_)) => {
            "z2 must not be below z1"
        }
        ("redshift_at_age_gyr", Error::OutOfDomain(_)) => {
            "no redshift has this age (above the age today, or below the age at z = 1e12)"
        }
        ("redshift_at_lookback_time_gyr", Error::OutOfDomain(_)) => {
            "no redshift has this lookback time (at or beyond the age today)"
        }
        ("redshift_at_comoving_distance_mpc", Error::OutOfDomain(_)) => {
            "no redshift up to 1e12 is this far (beyond the particle horizon)"
        }
        ("redshift_at_luminosity_distance_mpc", Error::OutOfDomain(_)) => {
            "no redshift up to 1e12 has this luminosity distance"
        }
        _ => return None,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn parameter_names_follow_the_core_positions() {
        // Error::InvalidParameter names the field of UniverseParameters at its position
        let mut p = UniverseParameters::new(70.0, 0.3);
        p.omega_baryon = 0.5;
        assert_eq!(
            U::new(p).err(),
            Some(Error::InvalidParameter(relicore::arg!(2, omega_baryon)))
        );
        assert_eq!(PARAMETER_NAMES[2], "omega_baryon");
        let mut p = UniverseParameters::new(70.0, 0.3);
        p.helium_mass_fraction = 1.0;
        assert_eq!(
            U::new(p).err(),
            Some(Error::InvalidParameter(relicore::arg!(
                9,
                helium_mass_fraction
            )))
        );
        assert_eq!(PARAMETER_NAMES[9], "helium_mass_fraction");
        assert!(parameter_rule(&p, 9).contains("below 1"));
    }
}
