//! The parameter set of a homogeneous universe, its validation, derived constants and the
//! expansion rate.

use super::neutrino::density_ratio;
use super::table::DistanceTable;
use crate::arg;
use crate::check::non_negative;
use crate::constants as k;
use crate::{Arg, Error, Real, Result};

/// (7/8)(4/11)^(4/3): energy density of one massless neutrino species per photon energy density.
pub(crate) const NEUTRINO_PER_PHOTON: f64 = 0.227_107_317_660_238_95;
/// (4/11)^(1/3): T_ν0/T0.
pub(crate) const NEUTRINO_TEMPERATURE_RATIO: f64 = 0.713_765_855_503_608_2;

/// The parameters of a universe, with the defaults of common practice. A plain value; pass it
/// to [`Universe::new`], which validates it once and precomputes everything derived.
///
/// Parameter positions (used by `Error::InvalidParameter`): 0 `h0_km_s_mpc`, 1 `omega_matter`,
/// 2 `omega_baryon`, 3 `omega_curvature`, 4 `cmb_temperature_k`, 5 `n_eff`,
/// 6 `neutrino_masses_ev`, 7 `w0`, 8 `wa`, 9 `helium_mass_fraction`.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct UniverseParameters<T> {
    /// Hubble constant H0 in km s⁻¹ Mpc⁻¹, > 0.
    pub h0_km_s_mpc: T,
    /// Density parameter of everything non-relativistic today (cold dark matter, baryons and
    /// massive neutrinos, as published tables quote it), ≥ 0.
    pub omega_matter: T,
    /// Baryon density parameter today, 0 ≤ Ω_b ≤ Ω_m (default 0: the background does not need
    /// it; the decoupling functions refuse a universe without baryons).
    pub omega_baryon: T,
    /// Curvature density parameter Ω_k today (default 0, flat). Dark energy is what remains:
    /// Ω_de = 1 − Ω_m − Ω_r − Ω_k.
    pub omega_curvature: T,
    /// CMB temperature today in K (default 2.7255; 0 switches photons and neutrinos off).
    pub cmb_temperature_k: T,
    /// Effective number of neutrino species (default 3.044), shared equally by three species.
    pub n_eff: T,
    /// The three neutrino masses in eV (default all 0), each ≥ 0.
    pub neutrino_masses_ev: [T; 3],
    /// Dark-energy equation of state today, w0 (default −1).
    pub w0: T,
    /// Dark-energy equation-of-state slope, w(a) = w0 + wa (1 − a) (default 0).
    pub wa: T,
    /// Primordial helium mass fraction Y_p (default 0.245; used by the decoupling topic).
    pub helium_mass_fraction: T,
}

impl<T: Real> UniverseParameters<T> {
    /// A flat universe with the given H0 (km s⁻¹ Mpc⁻¹) and Ω_m, and every other parameter at
    /// its default: Ω_b = 0, Ω_k = 0, T0 = 2.7255 K (Fixsen 2009, ApJ 707, 916, rounded),
    /// N_eff = 3.044 (common practice: standard-model value with QED and non-instantaneous
    /// decoupling corrections), massless neutrinos, w0 = −1, wa = 0, Y_p = 0.245.
    pub fn new(h0_km_s_mpc: T, omega_matter: T) -> Self {
        Self {
            h0_km_s_mpc,
            omega_matter,
            omega_baryon: T::zero(),
            omega_curvature: T::zero(),
            cmb_temperature_k: T::c(2.7255),
            n_eff: T::c(3.044),
            neutrino_masses_ev: [T::zero(); 3],
            w0: T::c(-1.0),
            wa: T::zero(),
            helium_mass_fraction: T::c(0.245),
        }
    }
}

/// A validated universe with its derived constants and a precomputed distance table: a plain,
/// fixed-size value the caller owns (no heap, no global state). Build it once with
/// [`Universe::new`]; every method then takes the redshift first.
#[derive(Debug, Clone, PartialEq)]
pub struct Universe<T> {
    pub(crate) params: UniverseParameters<T>,
    /// Ω of photons plus massless neutrino species today.
    pub(crate) omega_radiation: T,
    /// Ω of cold dark matter plus baryons today.
    pub(crate) omega_cb: T,
    /// Ω of dark energy today.
    pub(crate) omega_de: T,
    /// Per massive species: the coefficient A (Ω of one massless species) and y = m c²/(k T_ν0).
    pub(crate) massive: [(T, T); 3],
    /// Number of massive species (0..=3); any value is safe, it only bounds `take`.
    pub(crate) n_massive: usize,
    /// Dark-energy exponents: ρ_de ∝ a^(−3(1+w0+wa)) e^(−3 wa (1 − a)).
    pub(crate) de_power: T,
    /// Hubble distance c/H0 in Mpc and Hubble time 1/H0 in Gyr.
    pub(crate) hubble_distance_mpc: T,
    pub(crate) hubble_time_gyr: T,
    /// Critical density today, kg m⁻³.
    pub(crate) critical_density: T,
    /// Ω of photons plus all N_eff species counted as massless (for the equality redshift).
    pub(crate) omega_radiation_all_massless: T,
    pub(crate) table: DistanceTable<T>,
}

fn finite_param<T: Real>(x: T, i: Arg) -> Result<T> {
    if x.is_finite() {
        Ok(x)
    } else {
        Err(Error::InvalidParameter(i))
    }
}

impl<T: Real> Universe<T> {
    /// Validates the parameters, computes the derived constants and builds the distance table.
    ///
    /// Errors: `InvalidParameter(i)` (positions in [`UniverseParameters`]) for a non-finite
    /// value, H0 ≤ 0 (or so far from any physical value that c/H0, 1/H0 or the critical density
    /// is not a positive finite number of the type), T0 or N_eff so large that the radiation
    /// density overflows, Ω_m < 0, Ω_b < 0 or Ω_b > Ω_m, T0 < 0, N_eff < 0, a negative mass, a
    /// positive mass with T0 = 0 (no neutrino background), massive neutrinos denser today than
    /// Ω_m, Y_p outside [0, 1); `NoBigBang` when E(z)² ≤ 0 somewhere between today and a → 0
    /// (checked on the 4097 points of a logarithmic grid in a from 1e-30 to 1 and on every node
    /// of the distance table); `InvalidParameter(7)` (w0, with wa) when the dark-energy density
    /// overflows the type somewhere on that grid, so that E(z) has no value there: an equation
    /// of state far from physical ones (for `f64`, w0 above about 3.8, or w0 + wa, the
    /// early-time w, above about 3.8 to 4.8 with the e^(−3 wa) factor; for `f32`, 0.8 to 1.8),
    /// `InvalidParameter(1)` when E(z)² overflows otherwise (densities near the largest number
    /// of the type); `NoConvergence` when a quadrature of the distance table fails
    /// (seen only for parameters far outside physical ones, such as Ω_m in the hundreds or
    /// |Ω_k|, N_eff or |wa| in the thousands and more).
    ///
    /// Reference: the Friedmann equation with radiation, massive neutrinos (see
    /// [`dimensionless_hubble`](Self::dimensionless_hubble)), curvature and w0–wa dark energy
    /// (Chevallier & Polarski 2001, Int. J. Mod. Phys. D 10, 213; Linder 2003, PRL 90, 091301).
    pub fn new(params: UniverseParameters<T>) -> Result<Self> {
        let p = params;
        let h0 = finite_param(p.h0_km_s_mpc, arg!(0, h0_km_s_mpc))?;
        if !(h0 > T::zero()) {
            return Err(Error::InvalidParameter(arg!(0, h0_km_s_mpc)));
        }
        let om = finite_param(p.omega_matter, arg!(1, omega_matter))?;
        if om < T::zero() {
            return Err(Error::InvalidParameter(arg!(1, omega_matter)));
        }
        let ob = finite_param(p.omega_baryon, arg!(2, omega_baryon))?;
        if ob < T::zero() || ob > om {
            return Err(Error::InvalidParameter(arg!(2, omega_baryon)));
        }
        let ok = finite_param(p.omega_curvature, arg!(3, omega_curvature))?;
        let t0 = finite_param(p.cmb_temperature_k, arg!(4, cmb_temperature_k))?;
        if t0 < T::zero() {
            return Err(Error::InvalidParameter(arg!(4, cmb_temperature_k)));
        }
        let n_eff = finite_param(p.n_eff, arg!(5, n_eff))?;
        if n_eff < T::zero() {
            return Err(Error::InvalidParameter(arg!(5, n_eff)));
        }
        for &m in &p.neutrino_masses_ev {
            let m = finite_param(m, arg!(6, neutrino_masses_ev))?;
            if m < T::zero() || (m > T::zero() && t0 == T::zero()) {
                return Err(Error::InvalidParameter(arg!(6, neutrino_masses_ev)));
            }
        }
        let w0 = finite_param(p.w0, arg!(7, w0))?;
        let wa = finite_param(p.wa, arg!(8, wa))?;
        let y = finite_param(p.helium_mass_fraction, arg!(9, helium_mass_fraction))?;
        if y < T::zero() || y >= T::one() {
            return Err(Error::InvalidParameter(arg!(9, helium_mass_fraction)));
        }

        // H0 in s⁻¹ and the critical density 3H0²/(8πG)
        let h0_si = h0 * T::c(1000.0 / k::MEGAPARSEC);
        let rho_crit =
            T::c(3.0 / (8.0 * core::f64::consts::PI * k::GRAVITATIONAL_CONSTANT)) * h0_si * h0_si;
        let hubble_distance_mpc = T::c(k::SPEED_OF_LIGHT / 1000.0) / h0;
        let hubble_time_gyr = T::c(k::MEGAPARSEC / 1000.0 / (k::JULIAN_YEAR * 1e9)) / h0;
        // an H0 so small or large that c/H0, 1/H0 or 3H0²/8πG is not a positive finite number
        // of the type (for f64: H0 below about 1e-147 or above 1e169 km/s/Mpc)
        for derived in [rho_crit, hubble_distance_mpc, hubble_time_gyr] {
            if !(derived > T::zero() && derived.is_finite()) {
                return Err(Error::InvalidParameter(arg!(0, h0_km_s_mpc)));
            }
        }
        // photons: ρ_γ = a_rad T⁴/c² (mass density)
        let t2 = t0 * t0;
        let omega_photon = T::c(k::RADIATION_DENSITY / (k::SPEED_OF_LIGHT * k::SPEED_OF_LIGHT))
            * (t2 * t2)
            / rho_crit;
        if !omega_photon.is_finite() {
            // T0 so large that Ω_γ overflows
            return Err(Error::InvalidParameter(arg!(4, cmb_temperature_k)));
        }
        let per_species = n_eff / T::c(3.0) * T::c(NEUTRINO_PER_PHOTON) * omega_photon;
        if !per_species.is_finite() {
            return Err(Error::InvalidParameter(arg!(5, n_eff)));
        }
        let mut massive = [(T::zero(), T::zero()); 3];
        let mut n_massive = 0usize;
        let mut omega_radiation = omega_photon;
        let mut omega_nu_massive = T::zero();
        let kt_nu_ev = T::c(NEUTRINO_TEMPERATURE_RATIO * k::BOLTZMANN / k::ELEMENTARY_CHARGE) * t0;
        for &m in &p.neutrino_masses_ev {
            if m > T::zero() && per_species > T::zero() {
                let ym = m / kt_nu_ev;
                if let Some(slot) = massive.get_mut(n_massive) {
                    *slot = (per_species, ym);
                }
                n_massive += 1;
                omega_nu_massive = omega_nu_massive + per_species * density_ratio(ym);
            } else {
                omega_radiation = omega_radiation + per_species;
            }
        }
        let omega_cb = om - omega_nu_massive;
        if omega_cb < T::zero() {
            return Err(Error::InvalidParameter(arg!(6, neutrino_masses_ev)));
        }
        let omega_de = T::one() - om - omega_radiation - ok;
        let mut u = Universe {
            params: p,
            omega_radiation,
            omega_cb,
            omega_de,
            massive,
            n_massive,
            de_power: T::c(-3.0) * (T::one() + w0 + wa),
            hubble_distance_mpc,
            hubble_time_gyr,
            critical_density: rho_crit,
            omega_radiation_all_massless: omega_photon
                * (T::one() + n_eff * T::c(NEUTRINO_PER_PHOTON)),
            table: DistanceTable::empty(),
        };
        // no big bang: E² ≤ 0 somewhere on the way back; an expansion rate the type cannot
        // hold: E² overflows somewhere on the way back (the time and distance integrands are
        // then 0 there, and where that starts just before today the quadratures see nothing
        // but zeros: lookback times and distances of exactly 0, found by the fuzzing)
        let steps = 4096;
        for i in 0..=steps {
            let la = T::c(-30.0 * core::f64::consts::LN_10 * (1.0 - i as f64 / steps as f64));
            let a = la.exp();
            let q2 = u.q_squared(a);
            if !(q2 > T::zero()) {
                return Err(Error::NoBigBang);
            }
            if !q2.is_finite() {
                let culprit = if u.dark_energy_term(a).is_finite() {
                    arg!(1, omega_matter)
                } else {
                    arg!(7, w0)
                };
                return Err(Error::InvalidParameter(culprit));
            }
        }
        u.table = DistanceTable::build(&u)?;
        Ok(u)
    }

    /// The parameters this universe was built from.
    pub fn parameters(&self) -> &UniverseParameters<T> {
        &self.params
    }

    /// q² = a⁴E²(a) = Ω_r + Σ A_i R(y_i a) + Ω_cb a + Ω_k a² + Ω_de a⁴ f_de(a): finite at a → 0.
    #[inline]
    pub(crate) fn q_squared(&self, a: T) -> T {
        let mut q2 = self.omega_radiation + a * (self.omega_cb + a * self.params.omega_curvature);
        for &(c, ym) in self.massive.iter().take(self.n_massive) {
            q2 = q2 + c * density_ratio(ym * a);
        }
        q2 + self.dark_energy_term(a)
    }

    /// Ω_de a⁴ f_de(a): the dark-energy part of q², with f_de(a) = ρ_de(a)/ρ_de(1) =
    /// a^(−3(1+w0+wa)) e^(−3 wa (1 − a)). Outside Λ (w0 = −1, wa = 0: Ω_de a⁴) as one
    /// exponential of (4 − 3(1+w0+wa)) ln a − 3 wa (1 − a): the product a⁴ · f_de overflowed
    /// (f_de alone passes the largest float at a = 1e-30 for w0 + wa above 2.4 in `f64`, −0.57 in
    /// `f32`, where a⁴ even underflows to 0 and the product is NaN) while the term itself
    /// was a finite number.
    #[inline]
    pub(crate) fn dark_energy_term(&self, a: T) -> T {
        if self.omega_de == T::zero() {
            if T::HAS_PARTIALS {
                // a dual number: Ω_de = 0 exactly, but not its partials (∂Ω_de/∂Ω_m = −1):
                // the term is 0·a⁴f_de, with the partials Ω_de'·a⁴f_de (where that is finite)
                let f = self.dark_energy_shape(a);
                if f.is_finite() {
                    return self.omega_de * f;
                }
            }
            return T::zero();
        }
        if self.de_power == T::zero() && self.params.wa == T::zero() {
            let a2 = a * a;
            if T::HAS_PARTIALS {
                // a dual number: w0 = −1 and wa = 0 exactly, but the partials of a⁴f_de with
                // respect to w0 and wa are not 0: a⁴f_de = a⁴ e^ε with ε = −3(1 + w0 + wa) ln a
                // − 3 wa (1 − a) = 0 in value, so a⁴(1 + ε) has the value a⁴ and the partials
                return self.omega_de * a2 * a2 * (T::one() + self.dark_energy_exponent(a));
            }
            return self.omega_de * a2 * a2;
        }
        self.omega_de * self.dark_energy_shape(a)
    }

    /// a⁴ f_de(a) = e^((4 − 3(1+w0+wa)) ln a − 3 wa (1 − a)).
    #[inline]
    fn dark_energy_shape(&self, a: T) -> T {
        let exponent =
            (T::c(4.0) + self.de_power) * a.ln() - T::c(3.0) * self.params.wa * (T::one() - a);
        exponent.exp()
    }

    /// ln f_de(a) = −3(1+w0+wa) ln a − 3 wa (1 − a).
    #[inline]
    fn dark_energy_exponent(&self, a: T) -> T {
        self.de_power * a.ln() - T::c(3.0) * self.params.wa * (T::one() - a)
    }

    /// q(s²) for the integrands in s = √a.
    #[inline]
    pub(crate) fn q_of_s(&self, s: T) -> T {
        self.q_squared(s * s).sqrt()
    }
}

/// Checks a redshift: finite and ≥ 0.
pub(crate) fn check_redshift<T: Real>(z: T, arg: Arg) -> Result<T> {
    non_negative(z, arg)
}
