//! Distances of baryon-acoustic-oscillation analyses: the Hubble distance at z, the
//! volume-averaged distance, and the three distances over a drag-epoch sound horizon r_d
//! (Eisenstein et al. 2005, ApJ 633, 560, eq. 2 for D_V; the ratios as galaxy surveys quote
//! them, common practice).

use super::Universe;
use super::universe::check_redshift;
use crate::arg;
use crate::check::{finite_result, positive};
use crate::{Real, Result};

impl<T: Real> Universe<T> {
    /// Hubble distance at z, D_H(z) = c/H(z), Mpc.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`. Accuracy: within 1e-14 relative (`f64`) of mpmath,
    /// as E(z).
    pub fn hubble_distance_at_mpc(&self, z: T) -> Result<T> {
        let e = self.dimensionless_hubble(z)?;
        finite_result(self.hubble_distance_mpc / e, arg!(0, z))
    }

    /// Volume-averaged distance D_V(z) = [z D_M² D_H(z)]^⅓, Mpc (Eisenstein et al. 2005, ApJ
    /// 633, 560, eq. 2), 0 at z = 0.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`. Accuracy: within 1e-12 relative (`f64`) of mpmath
    /// (that of D_M).
    pub fn volume_averaged_distance_mpc(&self, z: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        let dm = self.transverse_comoving_distance_mpc(z)?;
        let dh = self.hubble_distance_at_mpc(z)?;
        // (z D_M² D_H)^(1/3) as cbrt(z D_H) cbrt(D_M)² would round more; one cbrt of the product,
        // scaled so that it cannot overflow for any representable D_M
        finite_result((z * dh).cbrt() * dm.cbrt() * dm.cbrt(), arg!(0, z))
    }

    /// D_M(z)/r_d: the transverse comoving distance over the drag-epoch sound horizon.
    ///
    /// * `z`: redshift, finite and ≥ 0.
    /// * `sound_horizon_drag_mpc`: r_d in Mpc, > 0 (e.g. `ThermalHistory::sound_horizon_drag_mpc`).
    ///
    /// Errors: `NonFinite(i)`, `Negative(0)`, `NonPositive(1)`. Accuracy: within 1e-12 relative
    /// (`f64`) of mpmath.
    pub fn transverse_comoving_distance_over_sound_horizon(
        &self,
        z: T,
        sound_horizon_drag_mpc: T,
    ) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        let rd = positive(sound_horizon_drag_mpc, arg!(1, sound_horizon_drag_mpc))?;
        finite_result(self.transverse_comoving_distance_mpc(z)? / rd, arg!(0, z))
    }

    /// D_H(z)/r_d = c/(H(z) r_d). Arguments and errors as
    /// [`transverse_comoving_distance_over_sound_horizon`](Self::transverse_comoving_distance_over_sound_horizon).
    /// Accuracy: within 1e-14 relative (`f64`) of mpmath.
    pub fn hubble_distance_over_sound_horizon(&self, z: T, sound_horizon_drag_mpc: T) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        let rd = positive(sound_horizon_drag_mpc, arg!(1, sound_horizon_drag_mpc))?;
        finite_result(self.hubble_distance_at_mpc(z)? / rd, arg!(0, z))
    }

    /// D_V(z)/r_d. Arguments and errors as
    /// [`transverse_comoving_distance_over_sound_horizon`](Self::transverse_comoving_distance_over_sound_horizon).
    /// Accuracy: within 1e-12 relative (`f64`) of mpmath.
    pub fn volume_averaged_distance_over_sound_horizon(
        &self,
        z: T,
        sound_horizon_drag_mpc: T,
    ) -> Result<T> {
        let z = check_redshift(z, arg!(0, z))?;
        let rd = positive(sound_horizon_drag_mpc, arg!(1, sound_horizon_drag_mpc))?;
        finite_result(self.volume_averaged_distance_mpc(z)? / rd, arg!(0, z))
    }
}
