//! Expansion rate, density parameters, critical density and radiation temperature at a
//! redshift; the constants of a universe.

use super::Universe;
use super::universe::check_redshift;
use crate::arg;
use crate::check::finite_result;
use crate::{Error, Real, Result};

impl<T: Real> Universe<T> {
    /// a = 1/(1+z) and q² = a⁴E² at a validated redshift.
    #[inline]
    fn at(&self, z: T) -> Result<(T, T)> {
        let z = check_redshift(z, arg!(0, z))?;
        let a = T::one() / (T::one() + z);
        Ok((a, self.q_squared(a)))
    }

    /// Dimensionless Hubble rate E(z) = H(z)/H0, from the Friedmann equation
    /// E² = Ω_cb(1+z)³ + Ω_r(1+z)⁴ + Σ ρ_ν,i(z)/ρ_c + Ω_k(1+z)² + Ω_de f_de(z), with massive
    /// neutrinos by the exact Fermi-Dirac energy integral and f_de of the w0–wa model.
    ///
    /// * `z`: redshift, finite and ≥ 0. Returns a number ≥ 1 for ordinary models.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`. Accuracy: within 1e-14 relative (`f64`) against
    /// mpmath (`tests/data/cosmology.txt`).
    pub fn dimensionless_hubble(&self, z: T) -> Result<T> {
        let (a, q2) = self.at(z)?;
        finite_result(q2.sqrt() / (a * a), arg!(0, z))
    }

    /// Hubble parameter H(z) = H0 E(z), km s⁻¹ Mpc⁻¹. Errors and accuracy as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn hubble_parameter_km_s_mpc(&self, z: T) -> Result<T> {
        finite_result(
            self.params.h0_km_s_mpc * self.dimensionless_hubble(z)?,
            arg!(0, z),
        )
    }

    /// Matter density parameter at z (cold dark matter, baryons and massive neutrinos, the
    /// same bookkeeping as `omega_matter` today), in [0, 1] for flat models. Errors as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn omega_matter_at(&self, z: T) -> Result<T> {
        let (a, q2) = self.at(z)?;
        let mut m = self.omega_cb * a;
        for &(c, ym) in self.massive.iter().take(self.n_massive) {
            m = m + c * super::neutrino::density_ratio(ym * a);
        }
        finite_result(m / q2, arg!(0, z))
    }

    /// Radiation density parameter at z (photons and massless neutrino species). Errors as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn omega_radiation_at(&self, z: T) -> Result<T> {
        let (_, q2) = self.at(z)?;
        finite_result(self.omega_radiation / q2, arg!(0, z))
    }

    /// Dark-energy density parameter at z. Errors as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn omega_dark_energy_at(&self, z: T) -> Result<T> {
        let (a, q2) = self.at(z)?;
        finite_result(self.dark_energy_term(a) / q2, arg!(0, z))
    }

    /// Curvature density parameter at z, Ω_k(1+z)²/E². Errors as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn omega_curvature_at(&self, z: T) -> Result<T> {
        let (a, q2) = self.at(z)?;
        finite_result(self.params.omega_curvature * a * a / q2, arg!(0, z))
    }

    /// Critical density at z, ρ_c(z) = 3H(z)²/(8πG), kg m⁻³ (G from CODATA 2022). Errors as
    /// [`dimensionless_hubble`](Self::dimensionless_hubble).
    pub fn critical_density_kg_m3(&self, z: T) -> Result<T> {
        let e = self.dimensionless_hubble(z)?;
        finite_result(self.critical_density * e * e, arg!(0, z))
    }

    /// CMB temperature at z, T0(1+z), K. Errors: `NonFinite(0)`, `Negative(0)`. Exact to one
    /// rounding.
    pub fn cmb_temperature_at_k(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        finite_result(self.params.cmb_temperature_k * (T::one() + z), arg!(0, z))
    }

    /// Hubble distance c/H0, Mpc.
    pub fn hubble_distance_mpc(&self) -> T {
        self.hubble_distance_mpc
    }

    /// Hubble time 1/H0, Gyr (Julian years of 365.25 days; 13.97 Gyr for H0 = 70).
    pub fn hubble_time_gyr(&self) -> T {
        self.hubble_time_gyr
    }

    /// Radiation density parameter today: photons plus massless neutrino species (massive
    /// species are counted in `omega_matter`).
    pub fn omega_radiation(&self) -> T {
        self.omega_radiation
    }

    /// Dark-energy density parameter today, 1 − Ω_m − Ω_r − Ω_k.
    pub fn omega_dark_energy(&self) -> T {
        self.omega_de
    }

    /// Redshift of matter-radiation equality, Ω_cb/Ω_r − 1, with Ω_cb = cold dark matter plus
    /// baryons and Ω_r = photons plus all N_eff neutrino species counted as massless (the
    /// convention of published parameter tables).
    ///
    /// Errors: `OutOfDomain(0)` for a universe without radiation (T0 = 0).
    pub fn matter_radiation_equality_redshift(&self) -> Result<T> {
        if !(self.omega_radiation_all_massless > T::zero()) {
            return Err(Error::OutOfDomain(arg!(0, universe)));
        }
        finite_result(
            self.omega_cb / self.omega_radiation_all_massless - T::one(),
            arg!(0, universe),
        )
    }
}
