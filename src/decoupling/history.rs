//! The recombination and thermal history on a fixed-capacity table, and its summary.
//!
//! Layout: N nodes uniform in u = ln(1+z) from 0 to u_top = ln(1 + highest redshift). The
//! stiff stepper of [`crate::math::ode`] carries (x_p, θ = T_m/T_r) down from the top, with
//! adaptive steps that land on every node above z = 200 and may span up to 8 nodes below (the
//! nodes inside are cubic Hermite interpolants of the state). At every node the table keeps
//! ln x_e, ln T_m, the Thomson and drag optical depths from z = 0 and their u-derivatives:
//! ln T_m's and τ's from the equations, ln x_e's by fourth-order differences of the node values
//! (see `slopes_of_ln_xe`), so queries are cubic Hermite interpolants. Optical depths are
//! accumulated node to node by Simpson's rule with the midpoint value from the interpolant; the
//! reionisation part of the optical depth (a tanh of width Δz = 0.5) by one Gauss-Kronrod panel
//! of the shared quadrature per interval.

use super::species::{Balance, Hydrogen, Species, electron_balance, proton_balance};
use crate::arg;
use crate::check::finite_result;
use crate::cosmology::Universe;
use crate::math::exp::exp;
use crate::math::ode::StiffStepper;
use crate::math::quadrature::{gauss_kronrod_15, integrate};
use crate::math::roots::bracketed_newton;
use crate::{Arg, Error, Real, Result};

/// Number of nodes of the table in every face (C, Fortran, Python use
/// `ThermalHistory<f64, HISTORY_NODES>`): a node spacing of 0.0045 in ln(1+z) up to z = 10⁴.
pub const HISTORY_NODES: usize = 2048;
/// Default highest redshift of the table.
pub const DEFAULT_HIGHEST_REDSHIFT: f64 = 1e4;
/// Lowest allowed highest redshift: the start must lie where hydrogen is still in Saha
/// equilibrium to far better than the accuracy of the history.
pub const LOWEST_HIGHEST_REDSHIFT: f64 = 3000.0;
/// Highest allowed reionisation redshift: the tanh transition must finish well after the
/// recombination era.
pub const HIGHEST_REIONIZATION_REDSHIFT: f64 = 100.0;
/// ln 10⁴ (the temperature unit of the recombination-coefficient fit).
const LN_1E4: f64 = 9.210_340_371_976_184;
/// Most nodes one step of the stepper may span (the nodes inside are interpolated), and the
/// redshift below which it may (where no rate of the equations exceeds a few H).
const MAX_SPAN: usize = 8;
const SPAN_BELOW_REDSHIFT: f64 = 200.0;
/// Width Δz of the hydrogen reionisation tanh (Lewis 2008).
const REIONIZATION_WIDTH: f64 = 0.5;
/// Default redshift and width Δz of helium's second reionisation (He II → He III): z = 3.5 and
/// Δz = 0.5, the values assumed with the tanh model of hydrogen reionisation by Planck
/// Collaboration 2020, A&A 641, A6, Sect. 3.3 (from memory).
pub const DEFAULT_HELIUM_REIONIZATION_REDSHIFT: f64 = 3.5;
/// Default width Δz of helium's second reionisation (see
/// [`DEFAULT_HELIUM_REIONIZATION_REDSHIFT`]).
pub const DEFAULT_HELIUM_REIONIZATION_WIDTH: f64 = 0.5;
/// Highest allowed redshift of helium's second reionisation.
pub const HIGHEST_HELIUM_REIONIZATION_REDSHIFT: f64 = 20.0;
/// Narrowest and widest allowed width Δz of helium's second reionisation: at least 0.1, so that
/// at z ≤ 20 the tanh spans at least one node interval (Δu = Δz/(1+z) ≥ 0.0048, where one
/// Gauss-Kronrod panel per interval integrates it to rounding), and at most 10.
pub const HELIUM_REIONIZATION_WIDTH_RANGE: [f64; 2] = [0.1, 10.0];
/// Largest node spacing in u (that of HISTORY_NODES nodes up to z = 10⁴): a table with fewer
/// nodes per unit of u is refused as too small.
fn max_spacing() -> f64 {
    libm::log1p(DEFAULT_HIGHEST_REDSHIFT) / (HISTORY_NODES as f64 - 1.0)
}
/// Relative tolerance per step of the stepper. Measured: x_e and T_m within 6e-8 relative (z
/// from 1600 to 50) of the same integration at 1e-10.
const RTOL: f64 = 1e-7;

/// Options of a thermal history.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct HistoryOptions<T> {
    /// Reionisation redshift z_re of the tanh model (`None`: no reionisation). 0 ≤ z_re ≤ 100.
    pub reionization_redshift: Option<T>,
    /// Highest redshift of the table, where the integration starts in Saha equilibrium
    /// (default 10⁴; at least 3000; at most what the capacity allows, 10⁴ for
    /// [`HISTORY_NODES`] nodes).
    pub highest_redshift: T,
    /// Redshift of helium's second reionisation, the centre of its tanh in z (used only with
    /// reionisation; default 3.5, Planck Collaboration 2020, A&A 641, A6, Sect. 3.3, from
    /// memory). Finite, 0 ≤ z ≤ 20.
    pub helium_reionization_redshift: T,
    /// Width Δz of helium's second reionisation tanh (used only with reionisation; default 0.5,
    /// same source). Finite, 0.1 ≤ Δz ≤ 10.
    pub helium_reionization_width: T,
}

impl<T: Real> Default for HistoryOptions<T> {
    fn default() -> Self {
        Self {
            reionization_redshift: None,
            highest_redshift: T::c(DEFAULT_HIGHEST_REDSHIFT),
            helium_reionization_redshift: T::c(DEFAULT_HELIUM_REIONIZATION_REDSHIFT),
            helium_reionization_width: T::c(DEFAULT_HELIUM_REIONIZATION_WIDTH),
        }
    }
}

/// The recombination and thermal history of a universe, computed once onto a fixed-capacity
/// table of `N` nodes, then queried at any redshift of the table; the summary (last scattering,
/// drag epoch, sound horizons, θ*, …) is computed with it. A plain value the caller owns (no
/// heap): about 8·8·N bytes plus a copy of the universe (about 150 KB for `f64` and
/// [`HISTORY_NODES`]).
///
/// The model and its references: the module doc of [`crate::decoupling`].
///
/// Accuracy (`f64`, measured against an independent scipy `solve_ivp` (Radau) integration of
/// the same equations, `tests/python/test_decoupling_scipy.py` and `tests/data/decoupling.txt`):
/// x_e and T_m within 1e-5 relative from z = 1600 to 50, z* and z_drag within 1e-5. The model
/// itself (Peebles atom with the 1.14 fudge factor, helium in Saha equilibrium) reproduces
/// full recombination calculations only to about 0.1 % near last scattering.
///
/// `f32`: the per-step tolerance is 1.7e-4 (half the square root of the rounding unit, the
/// floor of the finite-difference Jacobian), relative to x_p ≈ 1, so 1 − x_p is resolved only
/// once it exceeds about 1e-3. Measured against the `f64` history: x_e within 4e-5 relative
/// from z = 1600 to 50 for the Planck 2018 parameters (H0 = 67.36, Ω_m = 0.3153,
/// Ω_b h² = 0.02237); in models whose hydrogen recombines late and fast it is much coarser,
/// 3e-2 near z = 445 in a model found by fuzzing (T0 = 10 K, H0 = 190, Ω_b = Ω_m = 3.16,
/// Ω_k = −1). Use `f64` where the history matters.
#[derive(Debug, Clone, PartialEq)]
pub struct ThermalHistory<T, const N: usize = HISTORY_NODES> {
    universe: Universe<T>,
    species: Species<T>,
    /// Reionisation: 1 when on (then `reion_z` and `reion_dy` hold), 0 when off.
    reion_on: u8,
    reion_z: T,
    reion_y: T,
    reion_dy: T,
    /// Helium's second reionisation: redshift and width of its tanh in z.
    helium_z: T,
    helium_width: T,
    top_z: T,
    top_u: T,
    spacing: T,
    /// Columns at node i (u = i·spacing).
    ln_xe: [T; N],
    dln_xe: [T; N],
    ln_tm: [T; N],
    dln_tm: [T; N],
    tau: [T; N],
    dtau: [T; N],
    tau_drag: [T; N],
    /// H in s⁻¹ at node i (exact; between nodes [`hubble_si`](Self::hubble_si) interpolates).
    hubble: [T; N],
    /// Optical depth of the reionisation excess from z = 0 (zero when reionisation is off).
    tau_reion: [T; N],
    z_star: T,
    z_drag: T,
    rs_star: T,
    rs_drag: T,
    theta_star: T,
    age_star_yr: T,
    z_visibility_peak: T,
    z_thermal: T,
    tau_reion_total: T,
}

/// One evaluation of the equations: u, the state, its rates and its electron balance.
type LastEvaluation<T> = (T, [T; 2], [T; 2], Balance<T>);

/// The state-independent quantities of the equations at one u = ln(1+z).
#[derive(Clone, Copy)]
struct Background<T> {
    u: T,
    ln_s: [T; 3],
    /// S_HeI and S_HeII (the exponentials of the last two of `ln_s`).
    s12: [T; 2],
    /// H in s⁻¹, n_H in m⁻³.
    hub: T,
    n_h: T,
    /// ln T_r.
    ln_t: T,
    beta: T,
    ionise: T,
    compton: T,
    /// λ_α³/(8πH).
    escape: T,
}

/// Cubic Hermite interpolation on [0, 1]: value, derivative and second derivative in the
/// node variable, with spacing `h` and end values/slopes (p0, m0), (p1, m1).
#[inline]
fn hermite<T: Real>(t: T, h: T, p0: T, m0: T, p1: T, m1: T) -> (T, T, T) {
    let one = T::one();
    let two = T::c(2.0);
    let three = T::c(3.0);
    let s = one - t;
    let h00 = (one + two * t) * s * s;
    let h10 = t * s * s;
    let h01 = t * t * (three - two * t);
    let h11 = t * t * (t - one);
    let v = h00 * p0 + h10 * h * m0 + h01 * p1 + h11 * h * m1;
    let dp = p0 - p1;
    let d1 = T::c(6.0) * t * (t - one) * dp / h
        + (three * t * t - T::c(4.0) * t + one) * m0
        + (three * t * t - two * t) * m1;
    let d2 = ((T::c(12.0) * t - T::c(6.0)) * dp / h
        + (T::c(6.0) * t - T::c(4.0)) * m0
        + (T::c(6.0) * t - two) * m1)
        / h;
    (v, d1, d2)
}

/// The u-derivative of a column at node i by fourth-order finite differences of the node values
/// (central inside, one-sided at the two ends; error h⁴ f⁽⁵⁾/30 and smaller).
fn fd_slope<T: Real, const N: usize>(col: &[T; N], i: usize, h: T) -> T {
    let h12 = T::c(12.0) * h;
    let f = |i: usize| at(col, i);
    let c = |k: f64| T::c(k);
    if N < 5 {
        // too few nodes for the stencils (refused earlier; kept total for safety)
        T::zero()
    } else if i == 0 {
        (c(-25.0) * f(0) + c(48.0) * f(1) - c(36.0) * f(2) + c(16.0) * f(3) - c(3.0) * f(4)) / h12
    } else if i == 1 {
        (c(-3.0) * f(0) - c(10.0) * f(1) + c(18.0) * f(2) - c(6.0) * f(3) + f(4)) / h12
    } else if i == N - 2 {
        -(c(-3.0) * f(N - 1) - c(10.0) * f(N - 2) + c(18.0) * f(N - 3) - c(6.0) * f(N - 4)
            + f(N - 5))
            / h12
    } else if i >= N - 1 {
        -(c(-25.0) * f(N - 1) + c(48.0) * f(N - 2) - c(36.0) * f(N - 3) + c(16.0) * f(N - 4)
            - c(3.0) * f(N - 5))
            / h12
    } else {
        (f(i - 2) - c(8.0) * f(i - 1) + c(8.0) * f(i + 1) - f(i + 2)) / h12
    }
}

/// Value at index i of a column (0 outside: never reached for indices the callers form).
#[inline]
fn at<T: Real, const N: usize>(c: &[T; N], i: usize) -> T {
    c.get(i).copied().unwrap_or(T::zero())
}

impl<T: Real, const N: usize> ThermalHistory<T, N> {
    /// Computes the history of `universe` with `options`.
    ///
    /// Errors: `InvalidParameter(2)` for a universe without baryons (Ω_b = 0) and
    /// `InvalidParameter(4)` for one without radiation (T0 = 0); for the reionisation redshift
    /// (argument 1) `NonFinite(1)`, `Negative(1)`, `OutOfDomain(1)` above 100; for the highest
    /// redshift (argument 2) `NonFinite(2)`, `OutOfDomain(2)` below 3000, and
    /// `CapacityTooSmall(2)` when N nodes cannot cover it at the spacing of [`HISTORY_NODES`]
    /// nodes up to z = 10⁴ (at most 10⁴ for N = [`HISTORY_NODES`]); for helium's second
    /// reionisation redshift (argument 3) `NonFinite(3)`, `Negative(3)`, `OutOfDomain(3)` above
    /// 20, and for its width (argument 4) `NonFinite(4)`, `OutOfDomain(4)` outside [0.1, 10]
    /// (both checked whether or not reionisation is on); `NoConvergence` if the integration
    /// fails (not seen for physical parameters).
    pub fn new(universe: &Universe<T>, options: HistoryOptions<T>) -> Result<Self> {
        let mut h = Self::blank(universe)?;
        h.compute(options)?;
        Ok(h)
    }

    /// As [`new`](Self::new), writing into an existing value instead of returning a new one (no
    /// large temporary on the stack: the form for small stacks and for the C face). On error
    /// the value is left holding an incomplete history and must not be queried.
    pub fn compute_in_place(
        &mut self,
        universe: &Universe<T>,
        options: HistoryOptions<T>,
    ) -> Result<()> {
        self.universe = universe.clone();
        self.species = Species::new(universe)?;
        self.reion_on = 0;
        self.reion_z = T::zero();
        self.reion_y = T::zero();
        self.reion_dy = T::one();
        self.tau_reion_total = T::zero();
        self.compute(options)
    }

    fn blank(universe: &Universe<T>) -> Result<Self> {
        let species = Species::new(universe)?;
        Ok(Self {
            universe: universe.clone(),
            species,
            reion_on: 0,
            reion_z: T::zero(),
            reion_y: T::zero(),
            reion_dy: T::one(),
            helium_z: T::c(DEFAULT_HELIUM_REIONIZATION_REDSHIFT),
            helium_width: T::c(DEFAULT_HELIUM_REIONIZATION_WIDTH),
            top_z: T::zero(),
            top_u: T::zero(),
            spacing: T::one(),
            ln_xe: [T::zero(); N],
            dln_xe: [T::zero(); N],
            ln_tm: [T::zero(); N],
            dln_tm: [T::zero(); N],
            tau: [T::zero(); N],
            dtau: [T::zero(); N],
            tau_drag: [T::zero(); N],
            hubble: [T::zero(); N],
            tau_reion: [T::zero(); N],
            z_star: T::zero(),
            z_drag: T::zero(),
            rs_star: T::zero(),
            rs_drag: T::zero(),
            theta_star: T::zero(),
            age_star_yr: T::zero(),
            z_visibility_peak: T::zero(),
            z_thermal: T::zero(),
            tau_reion_total: T::zero(),
        })
    }

    fn compute(&mut self, options: HistoryOptions<T>) -> Result<()> {
        if let Some(zr) = options.reionization_redshift {
            if !zr.is_finite() {
                return Err(Error::NonFinite(arg!(1, reionization_redshift)));
            }
            if zr < T::zero() {
                return Err(Error::Negative(arg!(1, reionization_redshift)));
            }
            if zr > T::c(HIGHEST_REIONIZATION_REDSHIFT) {
                return Err(Error::OutOfDomain(arg!(1, reionization_redshift)));
            }
            self.reion_on = 1;
            self.reion_z = zr;
            let r = (T::one() + zr).sqrt();
            self.reion_y = r * r * r;
            self.reion_dy = T::c(1.5 * REIONIZATION_WIDTH) * r;
        }
        let top = options.highest_redshift;
        if !top.is_finite() {
            return Err(Error::NonFinite(arg!(2, highest_redshift)));
        }
        if !(top >= T::c(LOWEST_HIGHEST_REDSHIFT)) {
            return Err(Error::OutOfDomain(arg!(2, highest_redshift)));
        }
        if N < 5 {
            return Err(Error::CapacityTooSmall(arg!(2, highest_redshift)));
        }
        let top_u = top.ln_1p();
        let spacing = top_u / T::c((N - 1) as f64);
        if spacing > T::c(max_spacing() * (1.0 + 1e-12)) {
            return Err(Error::CapacityTooSmall(arg!(2, highest_redshift)));
        }
        let hz = options.helium_reionization_redshift;
        if !hz.is_finite() {
            return Err(Error::NonFinite(arg!(3, helium_reionization_redshift)));
        }
        if hz < T::zero() {
            return Err(Error::Negative(arg!(3, helium_reionization_redshift)));
        }
        if hz > T::c(HIGHEST_HELIUM_REIONIZATION_REDSHIFT) {
            return Err(Error::OutOfDomain(arg!(3, helium_reionization_redshift)));
        }
        let hw = options.helium_reionization_width;
        if !hw.is_finite() {
            return Err(Error::NonFinite(arg!(4, helium_reionization_width)));
        }
        let [w_lo, w_hi] = HELIUM_REIONIZATION_WIDTH_RANGE;
        if !(hw >= T::c(w_lo)) || hw > T::c(w_hi) {
            return Err(Error::OutOfDomain(arg!(4, helium_reionization_width)));
        }
        self.helium_z = hz;
        self.helium_width = hw;
        self.top_z = top;
        self.top_u = top_u;
        self.spacing = spacing;
        self.integrate()?;
        self.accumulate_optical_depths()?;
        self.summarise()
    }

    /// H(u) in s⁻¹ from the node column `hubble`: the node value at a node, between nodes the
    /// cubic Hermite interpolant with fourth-order finite-difference slopes (H ∝ e^{2u} or
    /// slower, so the error is about h⁴/384 · 16 ≈ 2e-11 relative at the node spacing h = 0.0045;
    /// checked against the direct evaluation to 1e-10 by a unit test). The direct evaluation
    /// sums the Fermi-Dirac density of every massive neutrino, which was a third of the time of
    /// a whole history when done at every evaluation of the equations.
    #[inline]
    fn hubble_si(&self, u: T) -> T {
        let (i, t) = self.locate(u);
        if t == T::zero() {
            return at(&self.hubble, i);
        }
        let h = self.spacing;
        let (v, _, _) = hermite(
            t,
            h,
            at(&self.hubble, i),
            fd_slope(&self.hubble, i, h),
            at(&self.hubble, i + 1),
            fd_slope(&self.hubble, i + 1, h),
        );
        v
    }

    /// Fills the column `hubble` (H at every node, from the universe).
    fn tabulate_hubble(&mut self) {
        for i in 0..N {
            let v = self.hubble_si_at(T::one() / exp(self.node_u(i)));
            if let Some(slot) = self.hubble.get_mut(i) {
                *slot = v;
            }
        }
    }

    /// H in s⁻¹ at scale factor a.
    #[inline]
    fn hubble_si_at(&self, a: T) -> T {
        let e = self.universe.q_squared(a).sqrt() / (a * a);
        self.species.h0_si * e
    }

    /// The state-independent part of the equations at u.
    fn background(&self, u: T) -> Background<T> {
        let s = &self.species;
        let zp1 = exp(u);
        let z3 = zp1 * zp1 * zp1;
        let t_r = s.t0 * zp1;
        let inv_t = T::one() / t_r;
        let ln_t = s.ln_t0 + u;
        let ln_s = s.ln_saha_factors_at(u, inv_t);
        let [ln_sh, ln_s1, ln_s2] = ln_s;
        let hub = self.hubble_si(u);
        let alpha_r = Species::alpha_ln(ln_t - T::c(LN_1E4));
        // β = α(T_r) (2π m_e k T_r/h²)^{3/2} e^{−B₂/kT_r}, B₂ = χ_H/4
        let beta =
            alpha_r * exp(s.ln_saha_density_free + T::c(1.5) * ln_t - T::c(0.25) * s.chi_h * inv_t);
        Background {
            u,
            ln_s,
            s12: [exp(ln_s1), exp(ln_s2)],
            hub,
            n_h: s.n_h0 * z3,
            ln_t,
            beta,
            // β e^{−E_α/kT_r} = α(T_r) n_H S_H: the photoionisation term per neutral atom / n_H
            ionise: alpha_r * exp(ln_sh),
            compton: s.compton0 * z3 * zp1,
            escape: s.lyman_k / hub,
        }
    }

    /// The recombination coefficient at the matter temperature θ T_r, m³ s⁻¹.
    #[inline]
    fn alpha_matter(bg: &Background<T>, theta: T) -> T {
        Species::alpha_ln(theta.ln() + bg.ln_t - T::c(LN_1E4))
    }

    /// dx_p/du and dθ/du at (x_p, θ) with the background `bg`, the balance `b` at x_p and the
    /// recombination coefficient α(T_m) ([`alpha_matter`](Self::alpha_matter)).
    fn rates(&self, bg: &Background<T>, b: &Balance<T>, xp: T, theta: T, alpha_m: T) -> (T, T) {
        let s = &self.species;
        let n1s = bg.n_h * (T::one() - xp).max(T::zero());
        let lam = T::c(super::species::TWO_PHOTON_RATE);
        let c = (T::one() + bg.escape * lam * n1s) / (T::one() + bg.escape * (lam + bg.beta) * n1s);
        // (1 − x_p) unclamped here: a trial state just above x_p = 1 must feel the restoring
        // term, or the stiff equilibrium at x_p ≈ 1 − 1e-14 gets a kink the stepper cannot pass
        let dxp_dt = -c * bg.n_h * (alpha_m * b.x_e * xp - bg.ionise * (T::one() - xp));
        let gamma = bg.compton * b.x_e / (T::one() + s.f_he + b.x_e);
        (
            -dxp_dt / bg.hub,
            theta - gamma / bg.hub * (T::one() - theta),
        )
    }

    fn integrate(&mut self) -> Result<()> {
        self.tabulate_hubble();
        let s = self.species;
        let top_u = self.top_u;
        // start in Saha equilibrium
        let ln_s = s.ln_saha_factors(top_u);
        let [ln_sh, _, _] = ln_s;
        let start = electron_balance(s.f_he, Hydrogen::Saha(ln_sh), ln_s)?;
        // and T_m on the tightly coupled (slow) solution of dθ/du = θ − (Γ/H)(1 − θ), where
        // the two terms balance: θ = (Γ/H)/(1 + Γ/H). Starting at θ = 1 instead would begin
        // 1e-8 off that solution, relax within Δu ~ H/Γ, and give the first node the slope of
        // the relaxation (d ln T_m/du = 2 instead of 1), which the interpolant would carry
        // over the first interval.
        let bg = self.background(top_u);
        let gamma = bg.compton * start.x_e / (T::one() + s.f_he + start.x_e) / bg.hub;
        let mut y = [start.x_p, gamma / (T::one() + gamma)];
        // per-step tolerance: RTOL in f64; half the square root of the rounding unit in f32, the
        // floor set by the finite-difference Jacobian
        let rtol = T::c(RTOL).max(T::epsilon().sqrt() * T::c(0.5));
        let mut stepper = StiffStepper::new(rtol, [T::c(1e-16), T::c(1e-14)], 2_000_000);
        let mut i = N - 1;
        let mut fi = self.state_rates(top_u, &y)?;
        self.record(i, top_u, &y, at(&fi, 1), None)?;
        let span_below = T::c(SPAN_BELOW_REDSHIFT).ln_1p();
        while i > 0 {
            let ui = self.node_u(i);
            // below z = 200, where no rate of the equations exceeds a few H (nothing is
            // stiff), one step may span several nodes where the stepper wants long steps; the
            // nodes inside are filled by cubic Hermite interpolation of the state (values and
            // derivatives at both ends), at most MAX_SPAN nodes apart. Above, the derivatives
            // of the stiff unknowns reflect their fast relaxation, not the slow solution, and
            // every node is a step end.
            let want = (stepper.step / self.spacing).to_f64_exact();
            let k = if ui <= span_below && want.is_finite() && want >= 2.0 {
                (want as usize).min(MAX_SPAN).min(i)
            } else {
                1
            };
            let j = i - k;
            let uj = self.node_u(j);
            // the last evaluation of the equations (u, state, rates, balance): the stepper's
            // last one is usually at the end of the step, whose rates and electron balance the
            // node needs as well
            let mut last_eval: Option<LastEvaluation<T>> = None;
            let yj = {
                let this: &Self = self;
                let last_eval = &mut last_eval;
                // the stepper evaluates several states at one u (the Jacobian columns, the
                // second stage and the end of a step) and several u at one x_p: keep the
                // last two backgrounds and the last balance
                let mut recent: [Option<Background<T>>; 2] = [None, None];
                let mut last_balance: Option<(T, T, Balance<T>)> = None;
                // and the last α(T_m) (the Jacobian's x_p column shares u and θ with f)
                let mut last_alpha: Option<(T, T, T)> = None;
                let mut f = |uu: T, st: &[T; 2]| -> Result<[T; 2]> {
                    let [xp, th] = *st;
                    if !(xp > T::zero()) || !(th > T::zero()) {
                        return Err(Error::NoConvergence);
                    }
                    let bg = match recent {
                        [Some(b), _] if b.u == uu => b,
                        [_, Some(b)] if b.u == uu => b,
                        [first, _] => {
                            let b = this.background(uu);
                            recent = [Some(b), first];
                            b
                        }
                    };
                    let bal = match last_balance {
                        Some((lu, lx, b)) if lu == uu && lx == xp => b,
                        _ => proton_balance(this.species.f_he, xp, bg.ln_s, bg.s12)?,
                    };
                    last_balance = Some((uu, xp, bal));
                    let alpha = match last_alpha {
                        Some((lu, lt, al)) if lu == uu && lt == th => al,
                        _ => Self::alpha_matter(&bg, th),
                    };
                    last_alpha = Some((uu, th, alpha));
                    let (a, b) = this.rates(&bg, &bal, xp, th, alpha);
                    *last_eval = Some((uu, *st, [a, b], bal));
                    Ok([a, b])
                };
                stepper.advance(&mut f, ui, y, uj)?
            };
            // the same function at the same point gives the same bits: reuse it when it is there
            let (fj, xe_j) = match last_eval {
                Some((lu, ly, lf, lb)) if lu == uj && ly == yj => (lf, Some(lb.x_e)),
                _ => (self.state_rates(uj, &yj)?, None),
            };
            let h = uj - ui;
            for m in j + 1..i {
                let t = (self.node_u(m) - ui) / h;
                let (v, _, _) = hermite(t, h, at(&y, 0), at(&fi, 0), at(&yj, 0), at(&fj, 0));
                let (th, dth, _) = hermite(t, h, at(&y, 1), at(&fi, 1), at(&yj, 1), at(&fj, 1));
                self.record(m, self.node_u(m), &[v, th], dth, None)?;
            }
            self.record(j, uj, &yj, at(&fj, 1), xe_j)?;
            y = yj;
            fi = fj;
            i = j;
        }
        self.slopes_of_ln_xe();
        Ok(())
    }

    /// u of node i (the top node is exactly top_u).
    #[inline]
    fn node_u(&self, i: usize) -> T {
        if i >= N - 1 {
            self.top_u
        } else {
            T::c(i as f64) * self.spacing
        }
    }

    /// dx_p/du and dθ/du at (u, x_p, θ).
    fn state_rates(&self, u: T, y: &[T; 2]) -> Result<[T; 2]> {
        let [xp, th] = *y;
        if !(xp > T::zero()) || !(th > T::zero()) {
            return Err(Error::NoConvergence);
        }
        let bg = self.background(u);
        let b = proton_balance(self.species.f_he, xp, bg.ln_s, bg.s12)?;
        let (a, c) = self.rates(&bg, &b, xp, th, Self::alpha_matter(&bg, th));
        Ok([a, c])
    }

    /// Writes node i from (x_p, θ) and dθ/du, with x_e when the caller has it (from the same
    /// electron balance at the same u and x_p).
    fn record(&mut self, i: usize, u: T, y: &[T; 2], dtheta: T, x_e: Option<T>) -> Result<()> {
        let s = self.species;
        let [xp, theta] = *y;
        if !(xp > T::zero()) || !(theta > T::zero()) {
            return Err(Error::NoConvergence);
        }
        let zp1 = exp(u);
        let x_e = match x_e {
            Some(x) => x,
            None => {
                let inv_t = T::one() / (s.t0 * zp1);
                electron_balance(s.f_he, Hydrogen::Fixed(xp), s.ln_saha_factors_at(u, inv_t))?.x_e
            }
        };
        let hub = at(&self.hubble, i);
        if let (Some(a), Some(c), Some(d), Some(e)) = (
            self.ln_xe.get_mut(i),
            self.ln_tm.get_mut(i),
            self.dln_tm.get_mut(i),
            self.dtau.get_mut(i),
        ) {
            *a = x_e.ln();
            *c = theta.ln() + s.ln_t0 + u;
            *d = dtheta / theta + T::one();
            *e = s.thomson0 * x_e * zp1 * zp1 * zp1 / hub;
        }
        Ok(())
    }

    /// d ln x_e/du at every node by fourth-order finite differences of the node values
    /// (central inside, one-sided at the two ends; error h⁴ f⁽⁵⁾/30 and smaller). The right-hand
    /// side of the equations is not used for this slope: while hydrogen is nearly fully ionised
    /// its photoionisation rate exceeds H by up to 10¹⁶, so the rounding of x_p alone makes
    /// dx_p/du noisy by O(1) although x_p itself tracks equilibrium to 1e-16.
    fn slopes_of_ln_xe(&mut self) {
        let h = self.spacing;
        let mut out = [T::zero(); N];
        for (i, o) in out.iter_mut().enumerate() {
            *o = fd_slope(&self.ln_xe, i, h);
        }
        self.dln_xe = out;
    }

    /// Node index and position in the interval for u ∈ [0, top_u].
    #[inline]
    fn locate(&self, u: T) -> (usize, T) {
        let x = u / self.spacing;
        let fl = x.floor_libm();
        let i = fl.to_f64_exact();
        let i = if i < 0.0 {
            0
        } else if i as usize >= N - 1 {
            N - 2
        } else {
            i as usize
        };
        (i, x - T::c(i as f64))
    }

    /// Hermite interpolant of a column with slope column at u: (value, d/du, d²/du²).
    #[inline]
    fn interp(&self, val: &[T; N], slope: &[T; N], u: T) -> (T, T, T) {
        let (i, t) = self.locate(u);
        hermite(
            t,
            self.spacing,
            at(val, i),
            at(slope, i),
            at(val, i + 1),
            at(slope, i + 1),
        )
    }

    /// Recombination-only x_e at u, with d ln x_e/du.
    ///
    /// The model's x_e never exceeds 1 + 2f_He: x_p ≤ 1 (at x_p = 1 the Peebles rate is
    /// −C n_H α x_e < 0, so x_p cannot cross 1 from below, and the Saha start has x_p < 1) and
    /// helium adds f_He (y₁ + 2y₂) ≤ 2f_He. The table can: its nodes carry the stepper's error
    /// (per step RTOL relative to x_p ≈ 1, so while 1 − x_p is below about 100·RTOL it is
    /// resolved only coarsely, and a node may even lie above 1), and the cubic interpolant
    /// between nodes overshoots where those node values bend sharply (a fuzzing finding:
    /// x_e(1153.9) = 1 + 3.8e-7 with Y_p = 5e-324, Ω_m = 8.3e9; in `f32`, whose per-step
    /// tolerance is 1.7e-4, x_e(444.3) = 1.0021 with Y_p = 0). The value is clamped to the
    /// bound: the model's solution lies at or below it, so the clamp never moves the value
    /// away from it, and it changes nothing where the interpolant is inside the bound.
    #[inline]
    fn xe_rec(&self, u: T) -> (T, T) {
        let (l, d, _) = self.interp(&self.ln_xe, &self.dln_xe, u);
        let bound = T::one() + T::c(2.0) * self.species.f_he;
        let x = crate::math::exp::exp(l);
        // written as a comparison, not `min`, so that a NaN stays a NaN
        (if x > bound { bound } else { x }, d)
    }

    /// The reionisation excess of x_e over the recombination value x at z.
    #[inline]
    fn reion_excess(&self, z: T, x: T) -> T {
        if self.reion_on == 0 {
            return T::zero();
        }
        let zp1 = T::one() + z;
        let y = zp1 * zp1.sqrt();
        // ½(1 + tanh w) = 1/(1 + e^{−2w}), without the cancellation of 1 + tanh w in the tail
        let step = |w: T| T::one() / (T::one() + (T::c(-2.0) * w).exp());
        let sh = step((self.reion_y - y) / self.reion_dy);
        let she = step((self.helium_z - z) / self.helium_width);
        let f = self.species.f_he;
        (T::one() + f - x).max(T::zero()) * sh + f * she
    }

    /// dτ/du of the reionisation excess at u.
    fn dtau_reion(&self, u: T) -> T {
        let (x, _) = self.xe_rec(u);
        let z = u.exp_m1();
        let zp1 = u.exp();
        self.reion_excess(z, x) * self.species.thomson0 * zp1 * zp1 * zp1 / self.hubble_si(u)
    }

    /// Highest u where the reionisation excess matters (beyond it, it is below 1e-30 of 1).
    fn reion_top_u(&self) -> T {
        if self.reion_on == 0 {
            return T::zero();
        }
        // tanh tail: ½(1 + tanh(−w)) ≈ e^{−2w} < 1e-30 for w > 35
        let y = self.reion_y + T::c(35.0) * self.reion_dy;
        let z_h = y.cbrt() * y.cbrt() - T::one();
        let z = z_h.max(self.helium_z + T::c(35.0) * self.helium_width);
        z.ln_1p().min(self.top_u)
    }

    fn accumulate_optical_depths(&mut self) -> Result<()> {
        let h = self.spacing;
        let r0 = self.species.baryon_photon0;
        let reion_top = self.reion_top_u();
        let mut tau = T::zero();
        let mut tau_d = T::zero();
        let mut tau_r = T::zero();
        let six = T::c(6.0);
        // e^u at the lower end of the interval (the upper end of the previous one)
        let mut e0 = T::zero().exp();
        for i in 0..N {
            if i > 0 {
                let u0 = T::c((i - 1) as f64) * h;
                let u1 = if i == N - 1 {
                    self.top_u
                } else {
                    T::c(i as f64) * h
                };
                let um = T::c(0.5) * (u0 + u1);
                let (xm, _) = self.xe_rec(um);
                let zm = um.exp();
                let dm = self.species.thomson0 * xm * zm * zm * zm / self.hubble_si(um);
                let d0 = at(&self.dtau, i - 1);
                let d1 = at(&self.dtau, i);
                let w = u1 - u0;
                tau = tau + w / six * (d0 + T::c(4.0) * dm + d1);
                // drag: dτ_d/du = dτ/du · (1+z)/R0
                let e1 = u1.exp();
                tau_d = tau_d + w / six / r0 * (d0 * e0 + T::c(4.0) * dm * zm + d1 * e1);
                e0 = e1;
                if self.reion_on != 0 && u0 < reion_top {
                    // one Kronrod panel per interval: the tanh is at least as wide as an
                    // interval (Δu ≥ 0.005 up to z_re = 100), where the 15-point rule is exact
                    // to rounding (checked against the adaptive rule in the unit tests)
                    let (v, _) = gauss_kronrod_15(&mut |uu: T| self.dtau_reion(uu), u0, u1);
                    tau_r = tau_r + v;
                }
            }
            if let (Some(a), Some(b), Some(c)) = (
                self.tau.get_mut(i),
                self.tau_drag.get_mut(i),
                self.tau_reion.get_mut(i),
            ) {
                *a = tau;
                *b = tau_d;
                *c = tau_r;
            }
        }
        self.tau_reion_total = tau_r;
        Ok(())
    }

    /// dτ_drag/du at node i.
    #[inline]
    fn dtau_drag_node(&self, i: usize) -> T {
        let u = if i == N - 1 {
            self.top_u
        } else {
            T::c(i as f64) * self.spacing
        };
        at(&self.dtau, i) * u.exp() / self.species.baryon_photon0
    }

    /// τ_rec or τ_drag at u by the Hermite interpolant: (value, d/du).
    fn depth(&self, drag: bool, u: T) -> (T, T) {
        let (i, t) = self.locate(u);
        let (v0, v1, m0, m1) = if drag {
            (
                at(&self.tau_drag, i),
                at(&self.tau_drag, i + 1),
                self.dtau_drag_node(i),
                self.dtau_drag_node(i + 1),
            )
        } else {
            (
                at(&self.tau, i),
                at(&self.tau, i + 1),
                at(&self.dtau, i),
                at(&self.dtau, i + 1),
            )
        };
        let (v, d, _) = hermite(t, self.spacing, v0, m0, v1, m1);
        (v, d)
    }

    /// u where τ (drag or not) equals 1.
    fn depth_unity(&self, drag: bool) -> Result<T> {
        let col = if drag { &self.tau_drag } else { &self.tau };
        let mut idx = None;
        for i in 1..N {
            if at(col, i) >= T::one() {
                idx = Some(i);
                break;
            }
        }
        let i = idx.ok_or(Error::NoConvergence)?;
        let lo = T::c((i - 1) as f64) * self.spacing;
        let hi = if i == N - 1 {
            self.top_u
        } else {
            T::c(i as f64) * self.spacing
        };
        bracketed_newton(
            |u: T| {
                let (v, d) = self.depth(drag, u);
                (v - T::one(), d)
            },
            lo,
            hi,
            T::epsilon() * T::c(16.0),
            200,
        )
    }

    /// r_s(z) in Mpc: (c/H0) ∫₀^{s(z)} 2s/(q(s) √(3(1 + R0 s²))) ds, s = √a.
    fn sound_horizon_at(&self, z: T) -> Result<T> {
        let s_top = T::one() / (T::one() + z).sqrt();
        let r0 = self.species.baryon_photon0;
        let v = integrate(
            |s: T| {
                T::c(2.0) * s
                    / (self.universe.q_of_s(s) * (T::c(3.0) * (T::one() + r0 * s * s)).sqrt())
            },
            T::zero(),
            s_top,
            T::epsilon() * T::c(4.0),
            T::zero(),
        )?;
        finite_result(self.universe.hubble_distance_mpc() * v, arg!(0, z))
    }

    fn summarise(&mut self) -> Result<()> {
        let u_star = self.depth_unity(false)?;
        let u_drag = self.depth_unity(true)?;
        self.z_star = u_star.exp_m1();
        self.z_drag = u_drag.exp_m1();
        self.rs_star = self.sound_horizon_at(self.z_star)?;
        self.rs_drag = self.sound_horizon_at(self.z_drag)?;
        let dm = self
            .universe
            .transverse_comoving_distance_mpc(self.z_star)?;
        self.theta_star = self.rs_star / dm;
        self.age_star_yr = self.universe.age_gyr(self.z_star)? * T::c(1e9);
        // visibility peak (recombination only: the reionisation factor e^{−τ_re} is constant
        // there): d ln g/du = d ln x_e/du + 2 − dτ/du = 0
        let mut best = 0usize;
        let mut best_v = T::neg_infinity();
        for i in 0..N {
            let u = T::c(i as f64) * self.spacing;
            let v = at(&self.ln_xe, i) + T::c(2.0) * u - at(&self.tau, i);
            if v > best_v {
                best_v = v;
                best = i;
            }
        }
        let lo = T::c(best.saturating_sub(1) as f64) * self.spacing;
        let hi = T::c(((best + 1).min(N - 1)) as f64) * self.spacing;
        let u_peak = bracketed_newton(
            |u: T| {
                let (_, d1, d2) = self.interp(&self.ln_xe, &self.dln_xe, u);
                let (i, t) = self.locate(u);
                let (_, t1, t2) = hermite(
                    t,
                    self.spacing,
                    at(&self.tau, i),
                    at(&self.dtau, i),
                    at(&self.tau, i + 1),
                    at(&self.dtau, i + 1),
                );
                (d1 + T::c(2.0) - t1, d2 - t2)
            },
            lo,
            hi,
            T::epsilon() * T::c(16.0),
            200,
        )?;
        self.z_visibility_peak = u_peak.exp_m1();
        // thermal decoupling: the highest z where ln(T_m/T_r) = ln 0.99
        let target = T::c(0.99).ln();
        let ratio = |i: usize| -> T {
            let u = if i == N - 1 {
                self.top_u
            } else {
                T::c(i as f64) * self.spacing
            };
            at(&self.ln_tm, i) - self.species.ln_t0 - u - target
        };
        let mut idx = None;
        for i in (0..N - 1).rev() {
            if ratio(i) < T::zero() {
                idx = Some(i);
                break;
            }
        }
        let i = idx.ok_or(Error::NoConvergence)?;
        let lo = T::c(i as f64) * self.spacing;
        let hi = if i + 1 == N - 1 {
            self.top_u
        } else {
            T::c((i + 1) as f64) * self.spacing
        };
        let u_dec = bracketed_newton(
            |u: T| {
                let (v, d, _) = self.interp(&self.ln_tm, &self.dln_tm, u);
                (v - self.species.ln_t0 - u - target, d - T::one())
            },
            lo,
            hi,
            T::epsilon() * T::c(16.0),
            200,
        )?;
        self.z_thermal = u_dec.exp_m1();
        Ok(())
    }

    /// u = ln(1+z) of a query redshift (argument position `arg`), checked against the table.
    #[inline]
    fn query_u(&self, z: T, arg: Arg) -> Result<T> {
        if !z.is_finite() {
            return Err(Error::NonFinite(arg));
        }
        if z < T::zero() {
            return Err(Error::Negative(arg));
        }
        if z > self.top_z {
            return Err(Error::OutOfDomain(arg));
        }
        Ok(z.ln_1p().min(self.top_u))
    }

    /// Ionised fraction x_e = n_e/n_H at redshift z (reionisation included when it was
    /// requested; above 1 while helium is ionised).
    ///
    /// * `z`: redshift, finite, 0 ≤ z ≤ the highest redshift of the table.
    ///
    /// Returns x_e, 0 < x_e ≤ 1 + 2f_He (f_He = n_He/n_H: hydrogen and helium fully ionised, the
    /// model's bound; the interpolant between nodes is held to it).
    /// Errors: `NonFinite(0)`, `Negative(0)`, `OutOfDomain(0)` above the table. Accuracy:
    /// within 1e-5 relative from z = 1600 to 50 against scipy `solve_ivp` on the same
    /// equations; cubic Hermite interpolation in ln(1+z) between nodes.
    pub fn ionized_fraction(&self, z: T) -> Result<T> {
        let u = self.query_u(z, arg!(0, z))?;
        let (x, _) = self.xe_rec(u);
        finite_result(x + self.reion_excess(z, x), arg!(0, z))
    }

    /// Matter (gas) temperature T_m at redshift z, K (reionisation heating is not modelled).
    ///
    /// Errors and accuracy as [`ionized_fraction`](Self::ionized_fraction).
    pub fn matter_temperature_k(&self, z: T) -> Result<T> {
        let u = self.query_u(z, arg!(0, z))?;
        let (l, _, _) = self.interp(&self.ln_tm, &self.dln_tm, u);
        finite_result(crate::math::exp::exp(l), arg!(0, z))
    }

    /// τ of the reionisation excess from 0 to u (exact quadrature from the node below).
    fn tau_reion_at(&self, u: T) -> Result<T> {
        if self.reion_on == 0 {
            return Ok(T::zero());
        }
        let (i, _) = self.locate(u);
        let u0 = T::c(i as f64) * self.spacing;
        if u0 >= self.reion_top_u() {
            // the excess vanishes beyond: all of it lies below
            return Ok(self.tau_reion_total);
        }
        Ok(at(&self.tau_reion, i)
            + integrate(
                |uu: T| self.dtau_reion(uu),
                u0,
                u,
                T::c(1e-12),
                T::min_positive_value(),
            )?)
    }

    /// Thomson optical depth from today to redshift z, τ = ∫₀^z n_e σ_T c dz'/((1+z')H),
    /// dimensionless (reionisation included when it was requested).
    ///
    /// Errors as [`ionized_fraction`](Self::ionized_fraction). Accuracy: within 1e-5 relative
    /// against scipy `solve_ivp` on the same equations.
    pub fn optical_depth(&self, z: T) -> Result<T> {
        let u = self.query_u(z, arg!(0, z))?;
        let (t, _) = self.depth(false, u);
        finite_result(t + self.tau_reion_at(u)?, arg!(0, z))
    }

    /// Visibility function per unit conformal distance, g = −dτ/dη e^{−τ} = n_e σ_T a e^{−τ},
    /// in Mpc⁻¹ (its integral over comoving conformal distance is 1 − e^{−τ}).
    ///
    /// Errors as [`ionized_fraction`](Self::ionized_fraction). Accuracy: within 1e-5 relative
    /// against scipy `solve_ivp` near the peak.
    pub fn visibility(&self, z: T) -> Result<T> {
        let u = self.query_u(z, arg!(0, z))?;
        let (x, _) = self.xe_rec(u);
        let xe = x + self.reion_excess(z, x);
        let (t, _) = self.depth(false, u);
        let tau = t + self.tau_reion_at(u)?;
        let zp1 = u.exp();
        finite_result(
            self.species.thomson_mpc0 * xe * zp1 * zp1 * (-tau).exp(),
            arg!(0, z),
        )
    }

    /// Comoving sound horizon r_s(z) = ∫_z^∞ c_s dz'/H(z'), c_s = c/√(3(1+R)),
    /// R = 3ρ_b/(4ρ_γ), in Mpc.
    ///
    /// * `z`: redshift, finite and ≥ 0 (any z: it needs the background only).
    ///
    /// Errors: `NonFinite(0)`, `Negative(0)`. Accuracy: within 1e-12 relative against mpmath.
    pub fn sound_horizon_mpc(&self, z: T) -> Result<T> {
        if !z.is_finite() {
            return Err(Error::NonFinite(arg!(0, z)));
        }
        if z < T::zero() {
            return Err(Error::Negative(arg!(0, z)));
        }
        self.sound_horizon_at(z)
    }

    /// Redshift of last scattering z*, where the Thomson optical depth (reionisation excluded)
    /// reaches 1.
    pub fn last_scattering_redshift(&self) -> T {
        self.z_star
    }

    /// Redshift of the drag epoch, where the baryon-drag optical depth reaches 1.
    pub fn drag_redshift(&self) -> T {
        self.z_drag
    }

    /// Comoving sound horizon at last scattering r_s(z*), Mpc.
    pub fn sound_horizon_last_scattering_mpc(&self) -> T {
        self.rs_star
    }

    /// Comoving sound horizon at the drag epoch r_s(z_drag), Mpc.
    pub fn sound_horizon_drag_mpc(&self) -> T {
        self.rs_drag
    }

    /// Angular scale of the sound horizon at last scattering θ* = r_s(z*)/D_M(z*), radians.
    pub fn angular_scale_last_scattering(&self) -> T {
        self.theta_star
    }

    /// Age of the universe at last scattering, years (Julian).
    pub fn age_at_last_scattering_yr(&self) -> T {
        self.age_star_yr
    }

    /// Radiation temperature at last scattering T0 (1 + z*), K.
    pub fn temperature_at_last_scattering_k(&self) -> T {
        self.species.t0 * (T::one() + self.z_star)
    }

    /// Redshift of the peak of the visibility function (per conformal time) at recombination.
    pub fn visibility_peak_redshift(&self) -> T {
        self.z_visibility_peak
    }

    /// Thermal decoupling: the highest redshift at which the matter temperature has fallen 1 %
    /// below the radiation temperature (T_m/T_r = 0.99).
    pub fn thermal_decoupling_redshift(&self) -> T {
        self.z_thermal
    }

    /// Thomson optical depth of reionisation (0 without reionisation).
    pub fn reionization_optical_depth(&self) -> T {
        self.tau_reion_total
    }
}

#[cfg(test)]
mod tests {
    extern crate std;
    use super::*;
    use crate::cosmology::UniverseParameters;
    use std::boxed::Box;

    /// The reionisation optical depth accumulated with one Kronrod panel per node interval
    /// equals the adaptive quadrature of the same integrand over the whole range (to 1e-12),
    /// from an early, wide transition to the latest, narrowest one allowed (z_re = 100).
    /// The interpolated H between nodes agrees with the direct evaluation from the universe
    /// (massive neutrino included) to 1e-10 relative over the whole table.
    #[test]
    fn interpolated_hubble_rate_matches_the_universe() {
        let mut p = UniverseParameters::new(67.36, 0.3153);
        p.omega_baryon = 0.02237 / (0.6736 * 0.6736);
        p.neutrino_masses_ev = [0.06, 0.0, 0.0];
        let u = Universe::new(p).unwrap();
        let h = Box::new(ThermalHistory::<f64>::new(&u, HistoryOptions::default()).unwrap());
        let mut worst = 0.0f64;
        for k in 0..20_000 {
            let uu = h.top_u * (k as f64 + 0.37) / 20_000.0;
            let want = h.hubble_si_at(1.0 / uu.exp());
            worst = worst.max((h.hubble_si(uu) / want - 1.0).abs());
        }
        assert!(worst < 1e-10, "worst relative error {worst:e}");
    }

    #[test]
    fn reionization_depth_per_panel_equals_adaptive_quadrature() {
        let mut p = UniverseParameters::new(67.36, 0.3153);
        p.omega_baryon = 0.02237 / (0.6736 * 0.6736);
        let u = Universe::new(p).unwrap();
        for zr in [0.0, 3.0, 7.67, 30.0, 100.0] {
            let h = Box::new(
                ThermalHistory::<f64>::new(
                    &u,
                    HistoryOptions {
                        reionization_redshift: Some(zr),
                        ..HistoryOptions::default()
                    },
                )
                .unwrap(),
            );
            let top = h.reion_top_u();
            let mut adaptive = 0.0;
            // split at the nodes' scale so the adaptive rule resolves the tanh
            let pieces = 64;
            for k in 0..pieces {
                let a = top * k as f64 / pieces as f64;
                let b = top * (k + 1) as f64 / pieces as f64;
                adaptive += integrate(|uu: f64| h.dtau_reion(uu), a, b, 1e-13, 1e-300).unwrap();
            }
            let got = h.reionization_optical_depth();
            assert!(
                (got / adaptive - 1.0).abs() < 1e-12,
                "z_re {zr}: {got} vs {adaptive}"
            );
        }
    }
}
