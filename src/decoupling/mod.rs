//! Decoupling: Saha equilibrium, the recombination and thermal history, the Thomson optical
//! depth and visibility, the last-scattering and drag epochs and the sound horizon.
//!
//! # The model (every face and every test uses exactly these equations)
//!
//! **Species.** Per hydrogen nucleus: hydrogen n_H(z) = (1 − Y_p) Ω_b ρ_crit,0 (1+z)³ / m_H and
//! helium f_He = n_He/n_H = Y_p m_H / ((1 − Y_p) m_He), with the atom masses m_H = 1.007 825 031 898 u
//! and m_He = 4.002 603 254 130 u (AME 2020; values from memory) and u of CODATA 2022. The
//! radiation temperature is T_r(z) = T0 (1 + z); H(z) = H0 E(z) is the universe's own expansion
//! rate (radiation, massive neutrinos, curvature and dark energy included).
//!
//! **Saha factors.** For an ionisation stage with energy χ and statistical-weight factor g, at
//! temperature T: S(T) = g (2π m_e k T / h²)^{3/2} e^{−χ/kT} / n_H(z) (dimensionless, per
//! hydrogen nucleus). Hydrogen: χ_H = 13.598 434 599 702 eV, g = 1; He I → He II:
//! χ = 24.587 389 011 eV, g = 4; He II → He III: χ = 54.417 765 5 eV, g = 1 (ionisation energies
//! of the NIST Atomic Spectra Database; values from memory). With electron fraction x_e = n_e/n_H
//! the helium stages in Saha equilibrium are, with r₁ = S_HeI/x_e and r₂ = S_HeII/x_e,
//! y₁ = n_HeII/n_He = r₁/(1 + r₁ + r₁r₂) and y₂ = n_HeIII/n_He = r₁r₂/(1 + r₁ + r₁r₂).
//!
//! **Saha equilibrium** ([`saha_ionized_fraction`]): at T = T_r(z), the x_e that solves
//! x_e = x_p + f_He (y₁ + 2y₂) with the free-proton fraction x_p = S_H/(S_H + x_e) (from
//! x_p x_e/(1 − x_p) = S_H). It exceeds 1 while helium is ionised (up to 1 + 2f_He).
//!
//! **The history** ([`ThermalHistory`]). The state is x_p and the matter temperature T_m.
//! At every evaluation helium is in Saha equilibrium at T_r, coupled through the electron
//! density: x_e solves x_e = x_p + f_He (y₁(x_e) + 2y₂(x_e)). Hydrogen follows the Peebles
//! three-level atom (Peebles 1968, ApJ 153, 1):
//!
//! dx_p/dt = −C [α(T_m) n_H x_e x_p − β(T_r) (1 − x_p) e^{−E_α/kT_r}],
//!
//! * α(T) = F · 10⁻¹⁹ a t^b/(1 + c t^d) m³ s⁻¹, t = T/10⁴ K, a = 4.309, b = −0.6166,
//!   c = 0.6703, d = 0.5300 (the case-B fit of Pequignot, Petitjean & Boisson 1991, A&A 251,
//!   680) and F = 1.14 (Seager, Sasselov & Scott 1999, ApJ 523, L1);
//! * β(T) = α(T) (2π m_e k T/h²)^{3/2} e^{−B₂/kT}, photoionisation from n = 2 in detailed
//!   balance with the radiation (so evaluated at T_r), B₂ = χ_H/4;
//! * C = (1 + K Λ n_H (1 − x_p)) / (1 + K (Λ + β(T_r)) n_H (1 − x_p)), the Peebles factor, with
//!   K = λ_α³/(8π H(z)), λ_α = hc/E_α, E_α = (3/4) χ_H (Lyman α escape by redshifting) and the
//!   2s → 1s two-photon rate Λ = 8.2245809 s⁻¹.
//!
//! The matter temperature follows Compton scattering on the radiation and adiabatic cooling:
//!
//! dT_m/dt = −2H T_m + (8 σ_T a_r T_r⁴ / (3 m_e c)) · x_e/(1 + f_He + x_e) · (T_r − T_m),
//!
//! with dt = −dz/((1+z) H(z)). The integration starts at the highest redshift of the table
//! (default 10⁴) in Saha equilibrium (x_p = S_H/(S_H + x_e) of the Saha solution, T_m = T_r) and
//! runs to z = 0 with the one stiff stepper of [`crate::math::ode`], in u = ln(1+z).
//!
//! **Reionisation** (optional, at z_re): with y = (1+z)^{3/2}, Δy = (3/2)(1+z_re)^{1/2} Δz and
//! Δz = 0.5 (the tanh form of Lewis 2008, PRD 78, 023002), and helium's second reionisation at
//! z_He with width Δz_He (options; by default z_He = 3.5 and Δz_He = 0.5, the values assumed with
//! that tanh model by Planck Collaboration 2020, A&A 641, A6, Sect. 3.3; from memory),
//!
//! x_e,tot = x_e + max(0, 1 + f_He − x_e) · ½[1 + tanh((y(z_re) − y)/Δy)] + f_He · ½[1 + tanh((z_He − z)/Δz_He)].
//!
//! It changes x_e, the optical depth and the visibility, not the matter temperature (no
//! photo-heating is modelled).
//!
//! **Derived quantities.**
//! * Thomson optical depth τ(z) = ∫₀^z x_e,tot n_H σ_T c dz'/((1+z')H(z')); τ_rec is the same
//!   with x_e (reionisation excluded).
//! * Last scattering z*: τ_rec(z*) = 1. Drag epoch z_drag: τ_drag(z_drag) = 1 with
//!   τ_drag(z) = ∫₀^z x_e n_H σ_T c/(R (1+z')H) dz' and R = 3ρ_b/(4ρ_γ) = 3Ω_b/(4Ω_γ (1+z)),
//!   Ω_γ = a_r T0⁴/(c² ρ_crit,0) (photons only).
//! * Comoving sound horizon r_s(z) = ∫_z^∞ c/√(3(1 + R(z'))) dz'/H(z'), in Mpc; θ* = r_s(z*)/D_M(z*).
//! * Visibility per Mpc of conformal time: g(z) = x_e,tot n_H(z) σ_T a e^{−τ(z)} · (1 Mpc).
//! * The visibility peak: the maximum of g around last scattering. Thermal decoupling: the
//!   highest z at which T_m/T_r falls to 0.99. Reionisation optical depth: τ − τ_rec at the
//!   top of the table.
//!
//! **Published fits**: [`last_scattering_redshift_fit`] (Hu & Sugiyama 1996, ApJ 471, 542) and
//! [`drag_redshift_fit`] (Eisenstein & Hu 1998, ApJ 496, 605), functions of Ω_b h² and Ω_m h².

mod fits;
mod history;
mod saha;
mod species;

pub use fits::{drag_redshift_fit, last_scattering_redshift_fit};
pub use history::{
    DEFAULT_HELIUM_REIONIZATION_REDSHIFT, DEFAULT_HELIUM_REIONIZATION_WIDTH,
    DEFAULT_HIGHEST_REDSHIFT, HELIUM_REIONIZATION_WIDTH_RANGE,
    HIGHEST_HELIUM_REIONIZATION_REDSHIFT, HIGHEST_REIONIZATION_REDSHIFT, HISTORY_NODES,
    HistoryOptions, LOWEST_HIGHEST_REDSHIFT, ThermalHistory,
};
pub use saha::{SAHA_HIGHEST_REDSHIFT, saha_ionized_fraction};
