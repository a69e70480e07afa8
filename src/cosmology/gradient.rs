//! Gradients of the background with respect to the redshift and every parameter of the
//! universe, by forward-mode dual numbers ([`crate::dual`]) through the same generic code.
//!
//! A [`GradientUniverse`] is a [`Universe`] whose parameters are dual numbers seeded at the
//! positions of [`GRADIENT_LEN`] partials: 0 H0, 1 Ω_m, 2 Ω_b, 3 Ω_k, 4 T0, 5 N_eff, 6–8 the
//! three neutrino masses, 9 w0, 10 wa, 11 Y_p, and 12 the function's own argument (the
//! redshift, or the target of an inversion). Its construction builds the distance table in dual
//! arithmetic: every node is an integral whose partials the shared quadrature brings to the
//! same tolerance as the value (see [`crate::math::quadrature::integrate`]), and the table's
//! a-posteriori check of the dropped Chebyshev coefficients covers the partials too. A query then
//! carries the partials of the table, the same operations as the plain query.
//!
//! Every `_gradient` method returns (value, partials) with the value the plain `f64` (or `f32`)
//! method's result bit for bit (the value part goes through the same operations; tested), the
//! plain method's errors for the same arguments, and the partials in the order above. Partials
//! with respect to parameters the quantity does not depend on are exactly 0 (Ω_b and Y_p for the
//! background; a mass of exactly 0, where the density of the species is flat in the mass). The
//! inversions differentiate the root by the implicit function theorem at the converged redshift.
//!
//! Accuracy (`f64`): partials within 1e-12 relative (or absolute for a partial that crosses 0)
//! against mpmath (`mpmath.diff` at 40 digits of an independent mpmath background,
//! `tests/data/gradients/cosmology.txt`; closed forms of the Einstein-de Sitter and Milne
//! models and the flat ΛCDM age as second routes), for models with massless neutrinos; the
//! partials with respect to a non-zero neutrino mass are not yet checked against an outside
//! source.
//!
//! Reference: the background model of [`Universe`]; forward-mode automatic differentiation:
//! A. Griewank & A. Walther, Evaluating Derivatives, 2nd ed., SIAM 2008.

use super::{Universe, UniverseParameters};
use crate::dual::Dual;
use crate::{ArrayResult, ElementError, Error, Real, Result};

/// Number of partials of a universe gradient: the twelve parameters and the argument.
pub const GRADIENT_LEN: usize = 13;
/// Position of ∂/∂H0 (per km s⁻¹ Mpc⁻¹).
pub const GRADIENT_H0: usize = 0;
/// Position of ∂/∂Ω_m.
pub const GRADIENT_OMEGA_MATTER: usize = 1;
/// Position of ∂/∂Ω_b.
pub const GRADIENT_OMEGA_BARYON: usize = 2;
/// Position of ∂/∂Ω_k.
pub const GRADIENT_OMEGA_CURVATURE: usize = 3;
/// Position of ∂/∂T0 (per K).
pub const GRADIENT_CMB_TEMPERATURE: usize = 4;
/// Position of ∂/∂N_eff.
pub const GRADIENT_N_EFF: usize = 5;
/// Position of ∂/∂m₁ (per eV); m₂ and m₃ follow.
pub const GRADIENT_NEUTRINO_MASS_1: usize = 6;
/// Position of ∂/∂w0.
pub const GRADIENT_W0: usize = 9;
/// Position of ∂/∂wa.
pub const GRADIENT_WA: usize = 10;
/// Position of ∂/∂Y_p.
pub const GRADIENT_HELIUM_MASS_FRACTION: usize = 11;
/// Position of the partial with respect to the method's argument (the redshift, or the target
/// value of an inversion).
pub const GRADIENT_ARGUMENT: usize = 12;

/// A universe whose parameters carry [`GRADIENT_LEN`] partials (build it with
/// [`Universe::with_gradients`]).
pub type GradientUniverse<T> = Universe<Dual<T, GRADIENT_LEN>>;

/// A value and its partials in the order of the `GRADIENT_*` positions.
pub type Gradient<T> = (T, [T; GRADIENT_LEN]);

impl<T: Real> UniverseParameters<T> {
    /// The parameters as dual numbers, each seeded at its `GRADIENT_*` position (partial 1
    /// there, 0 elsewhere).
    pub fn seeded(&self) -> UniverseParameters<Dual<T, GRADIENT_LEN>> {
        let v = |x: T, i: usize| Dual::variable(x, i);
        let [m1, m2, m3] = self.neutrino_masses_ev;
        UniverseParameters {
            h0_km_s_mpc: v(self.h0_km_s_mpc, GRADIENT_H0),
            omega_matter: v(self.omega_matter, GRADIENT_OMEGA_MATTER),
            omega_baryon: v(self.omega_baryon, GRADIENT_OMEGA_BARYON),
            omega_curvature: v(self.omega_curvature, GRADIENT_OMEGA_CURVATURE),
            cmb_temperature_k: v(self.cmb_temperature_k, GRADIENT_CMB_TEMPERATURE),
            n_eff: v(self.n_eff, GRADIENT_N_EFF),
            neutrino_masses_ev: [
                v(m1, GRADIENT_NEUTRINO_MASS_1),
                v(m2, GRADIENT_NEUTRINO_MASS_1 + 1),
                v(m3, GRADIENT_NEUTRINO_MASS_1 + 2),
            ],
            w0: v(self.w0, GRADIENT_W0),
            wa: v(self.wa, GRADIENT_WA),
            helium_mass_fraction: v(self.helium_mass_fraction, GRADIENT_HELIUM_MASS_FRACTION),
        }
    }
}

impl<T: Real> GradientUniverse<T> {
    /// Validates the parameters and builds the universe in dual arithmetic, every parameter
    /// seeded at its `GRADIENT_*` position.
    ///
    /// * `params`: the parameters (units and domains of [`UniverseParameters`]).
    ///
    /// Errors: those of [`Universe::new`] for the same parameters; besides, `NoConvergence`
    /// when a quadrature of the distance table cannot bring the partials to its tolerance
    /// within its capacity (not seen for the models of the tests).
    /// Cost: about 10 to 20 times [`Universe::new`] (13 partials per operation).
    /// A `GradientUniverse<f64>` is about 200 KB: keep it off small stacks.
    pub fn with_gradients(params: UniverseParameters<T>) -> Result<Self> {
        Universe::new(params.seeded())
    }

    /// The plain-valued universe parameters (the value parts).
    pub fn parameter_values(&self) -> UniverseParameters<T> {
        let p = self.parameters();
        let [m1, m2, m3] = p.neutrino_masses_ev;
        UniverseParameters {
            h0_km_s_mpc: p.h0_km_s_mpc.value(),
            omega_matter: p.omega_matter.value(),
            omega_baryon: p.omega_baryon.value(),
            omega_curvature: p.omega_curvature.value(),
            cmb_temperature_k: p.cmb_temperature_k.value(),
            n_eff: p.n_eff.value(),
            neutrino_masses_ev: [m1.value(), m2.value(), m3.value()],
            w0: p.w0.value(),
            wa: p.wa.value(),
            helium_mass_fraction: p.helium_mass_fraction.value(),
        }
    }

    /// Runs a method at an argument seeded at [`GRADIENT_ARGUMENT`].
    #[inline(always)]
    fn gradient_at(
        &self,
        x: T,
        f: impl Fn(&Self, Dual<T, GRADIENT_LEN>) -> Result<Dual<T, GRADIENT_LEN>>,
    ) -> Result<Gradient<T>> {
        let r = f(self, Dual::variable(x, GRADIENT_ARGUMENT))?;
        Ok((r.value(), r.partials()))
    }

    /// Luminosity distance D_L (Mpc) with its partials with respect to every parameter and z.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Returns (D_L in Mpc, partials in Mpc per unit of each parameter and of z, in the order of
    /// the `GRADIENT_*` positions). Errors: those of
    /// [`luminosity_distance_mpc`](Universe::luminosity_distance_mpc).
    /// Accuracy: see the module documentation (1e-12 relative against mpmath).
    pub fn luminosity_distance_mpc_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.luminosity_distance_mpc(z))
    }

    /// Line-of-sight comoving distance D_C (Mpc) with its partials (as
    /// [`luminosity_distance_mpc_gradient`](Self::luminosity_distance_mpc_gradient)).
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of [`comoving_distance_mpc`](Universe::comoving_distance_mpc).
    /// Accuracy: see the module documentation.
    pub fn comoving_distance_mpc_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.comoving_distance_mpc(z))
    }

    /// Transverse comoving distance D_M (Mpc) with its partials.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of
    /// [`transverse_comoving_distance_mpc`](Universe::transverse_comoving_distance_mpc).
    /// Accuracy: see the module documentation.
    pub fn transverse_comoving_distance_mpc_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.transverse_comoving_distance_mpc(z))
    }

    /// Angular-diameter distance D_A (Mpc) with its partials.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of [`angular_diameter_distance_mpc`](Universe::angular_diameter_distance_mpc).
    /// Accuracy: see the module documentation.
    pub fn angular_diameter_distance_mpc_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.angular_diameter_distance_mpc(z))
    }

    /// Hubble parameter H(z) (km s⁻¹ Mpc⁻¹) with its partials.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of [`hubble_parameter_km_s_mpc`](Universe::hubble_parameter_km_s_mpc).
    /// Accuracy: see the module documentation.
    pub fn hubble_parameter_km_s_mpc_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.hubble_parameter_km_s_mpc(z))
    }

    /// Age of the universe at z (Gyr) with its partials (the integral in dual arithmetic with
    /// error control on the partials).
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of [`age_gyr`](Universe::age_gyr). Accuracy: see the module documentation.
    pub fn age_gyr_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.age_gyr(z))
    }

    /// Lookback time to z (Gyr) with its partials.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: those of [`lookback_time_gyr`](Universe::lookback_time_gyr).
    /// Accuracy: see the module documentation.
    pub fn lookback_time_gyr_gradient(&self, z: T) -> Result<Gradient<T>> {
        self.gradient_at(z, |u, z| u.lookback_time_gyr(z))
    }

    /// The redshift at a luminosity distance, with its partials: with respect to the
    /// parameters at fixed distance, and (position [`GRADIENT_ARGUMENT`]) to the distance, by
    /// the implicit function theorem at the converged redshift (∂z/∂p = −(∂D_L/∂p)/(∂D_L/∂z)).
    ///
    /// * `distance_mpc`: D_L in Mpc, finite and ≥ 0.
    ///
    /// Errors: those of
    /// [`redshift_at_luminosity_distance_mpc`](Universe::redshift_at_luminosity_distance_mpc).
    /// Accuracy: see the module documentation.
    pub fn redshift_at_luminosity_distance_mpc_gradient(
        &self,
        distance_mpc: T,
    ) -> Result<Gradient<T>> {
        self.gradient_at(distance_mpc, |u, d| {
            u.redshift_at_luminosity_distance_mpc(d)
        })
    }

    /// [`luminosity_distance_mpc_gradient`](Self::luminosity_distance_mpc_gradient) over many
    /// redshifts: `values[i]`, `gradients[i]` are its result at `redshifts[i]`.
    ///
    /// * `redshifts`: redshifts z, each finite and ≥ 0.
    /// * `values`: D_L in Mpc, the same length.
    /// * `gradients`: the partials, the same length.
    ///
    /// Returns `Ok(())` when every element succeeded; otherwise the failing elements are NaN
    /// and the error names the first failing index and the scalar method's error;
    /// `LengthMismatch` naming `values` or `gradients` when one has another length (then
    /// nothing is computed). Accuracy: that of the scalar method.
    pub fn luminosity_distance_mpc_gradient_array(
        &self,
        redshifts: &[T],
        values: &mut [T],
        gradients: &mut [[T; GRADIENT_LEN]],
    ) -> ArrayResult {
        let n = redshifts.len();
        for (len, arg) in [
            (values.len(), crate::arg!(1, values)),
            (gradients.len(), crate::arg!(2, gradients)),
        ] {
            if len != n {
                return Err(ElementError {
                    index: n.min(len),
                    error: Error::LengthMismatch(arg),
                });
            }
        }
        let mut first: Option<ElementError> = None;
        for (i, ((&z, v), g)) in redshifts
            .iter()
            .zip(values.iter_mut())
            .zip(gradients.iter_mut())
            .enumerate()
        {
            match self.luminosity_distance_mpc_gradient(z) {
                Ok((dl, d)) => {
                    *v = dl;
                    *g = d;
                }
                Err(error) => {
                    *v = T::nan();
                    *g = [T::nan(); GRADIENT_LEN];
                    if first.is_none() {
                        first = Some(ElementError { index: i, error });
                    }
                }
            }
        }
        first.map_or(Ok(()), Err)
    }
}
