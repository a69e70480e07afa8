//! Structure growth: the linear growth factor and growth rate, the transfer functions of
//! Eisenstein & Hu 1998, the linear matter power spectrum with σ(R), σ8, S8 and fσ8, and the
//! time-step factors of a comoving leapfrog. The BAO distance ratios are functions of a
//! [`Universe`](crate::cosmology::Universe) (`hubble_distance_at_mpc`,
//! `volume_averaged_distance_mpc` and their ratios to a drag-epoch sound horizon); the leapfrog
//! factors ([`leapfrog_drift_factor_gyr`](LinearGrowth::leapfrog_drift_factor_gyr),
//! [`leapfrog_kick_factor_gyr`](LinearGrowth::leapfrog_kick_factor_gyr)) are functions of a
//! [`LinearGrowth`], which holds tables of their integrands.
//!
//! # Meanings (every face follows them)
//!
//! * Clustering matter Ω_cb = Ω_m − Ω_ν,massive today (massive neutrinos are in Ω_m, as the
//!   universe's parameters already define, and are treated as smooth for growth).
//! * **Growth**: with N = ln a and ′ = d/dN, D″ + (2 + d ln E/dN) D′ = (3/2) Ω_cb a⁻³ E(a)⁻² D,
//!   with E(a) the universe's full expansion rate (radiation, massive neutrinos, curvature,
//!   w0–wa dark energy). The growing mode is the one with D_u(a) → a + (2/3) a_eq as a → 0,
//!   where a_eq = Ω_r,early/Ω_cb counts photons and all N_eff species as massless (the Mészáros
//!   growing mode; without radiation D_u → a). The **growth factor** is D(z) = D_u(a)/D_u(1)
//!   (1 today); the **growth rate** is f(z) = d ln D/d ln a; D_u itself is available too (the
//!   primordial normalisation needs it).
//! * **Transfer function**: the fitting formulae of Eisenstein & Hu 1998 (ApJ 496, 605) for
//!   cold dark matter and baryons — the full form with baryon acoustic oscillations, and the
//!   form without them (its section 4.2) — of ω_m = Ω_m h², ω_b = Ω_b h² and T0, as published.
//! * **Linear matter power spectrum**: P(k, z) = (2π²/k³) A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p))
//!   · [(2/5) (ck/H0)² T(k) D_u(a) / Ω_m]², pivot k_p = 0.05 Mpc⁻¹; or normalised instead to a
//!   given σ8 (then A_s is derived and reported).
//! * **σ(R, z)**: the r.m.s. of the linear density in a top-hat sphere of radius R,
//!   σ² = ∫ k² P(k, z) W(kR)² dk / 2π², W(x) = 3(sin x − x cos x)/x³; **σ8** = σ(8 h⁻¹ Mpc, 0);
//!   S8 = σ8 (Ω_m/0.3)^½; **fσ8(z)** = f(z) σ(8 h⁻¹ Mpc, z).
//! * **BAO distances**: D_H(z) = c/H(z), D_M the transverse comoving distance,
//!   D_V = [z D_M² D_H]^⅓, and their ratios to a drag-epoch sound horizon r_d (from a thermal
//!   history's `sound_horizon_drag_mpc`, or given by the caller).
//! * **Time-step factors** of a comoving leapfrog (Quinn, Katz, Stadel & Lake 1997,
//!   arXiv:astro-ph/9710043): drift ∫ da/(a³ H) and kick ∫ da/(a² H) between two scale factors,
//!   in Gyr.
//!
//! Units: k in Mpc⁻¹, R and distances in Mpc, P in Mpc³, times in Gyr; no factor of h is
//! hidden in a unit (σ8 keeps the trade's definition at R = 8 h⁻¹ Mpc).
//!
//! # Method
//!
//! The growth equation is integrated once per universe, as the first-order system
//! D′ = P/q, P′ = (3/2) Ω_cb a D/q in N = ln a, with P = a²E D′ and q = a²E (the form needs no
//! derivative of E: d(a²E D′)/dN = a²E [D″ + (2 + d ln E/dN) D′]), by the one stepper of
//! [`crate::math::ode`], from a = 2⁻⁴⁷ (where the Mészáros mode is exact to 1e-13 for the
//! universes accepted) onto a table of Chebyshev pieces; see [`LinearGrowth`].

mod leapfrog;
mod linear;
mod spectrum;
mod transfer;

pub use linear::LinearGrowth;
pub use spectrum::{LinearPowerSpectrum, PIVOT_WAVENUMBER_PER_MPC, TransferForm};
pub use transfer::{eisenstein_hu_no_wiggle_transfer_function, eisenstein_hu_transfer_function};
