//! The time-step factors of a comoving leapfrog (Quinn, Katz, Stadel & Lake 1997,
//! arXiv:astro-ph/9710043, eqs. 31–32 as recalled from memory): with comoving positions x and
//! canonical momenta p = a² ẋ, a drift moves x by p ∫ dt/a² = p ∫ da/(a³H) and a kick moves p by
//! the force times ∫ dt/a = ∫ da/(a²H).
//!
//! With q = a²E (finite at a → 0): drift = t_H ∫ da/(a q), kick = t_H ∫ da/q, t_H = 1/H0.
//!
//! Method: a [`LinearGrowth`] holds, for a ∈ [2⁻²⁰, 1] (z < 1 048 575), the two integrands on
//! the pieces of its own table (8 per octave), each as 10 Chebyshev coefficients from its values
//! at 12 Chebyshev points (the same error control as the growth table: the two dropped
//! coefficients below 1e-12 of the largest), with the integral of every piece. A step is the
//! integral of the piece polynomials: within a piece,
//! (t₂ − t₁) Σ c_k h_k(t₁, t₂)/(k + 1) with h_k = Σ t₂ʲ t₁^(k−j) (no difference of two
//! antiderivatives, so no cancellation however short the step), plus the whole pieces between.
//! Outside the table (a < 2⁻²⁰, or a table that failed its error control) one Gauss-Kronrod 7-15
//! panel in a is taken (a time step is short: the panel is exact to rounding); when its error
//! estimate exceeds 1e-14 of the value the shared adaptive quadrature integrates in N = ln a
//! (drift = t_H ∫ dN/q, kick = t_H ∫ a dN/q, smooth over any range).

use super::linear::{LinearGrowth, NCOEF, SUB, coefficients_of, locate_inside, piece_bounds};
use crate::arg;
use crate::check::{finite_result, unit_interval};
use crate::cosmology::Universe;
use crate::math::quadrature::{gauss_kronrod_15, integrate};
use crate::{Error, Real, Result};

/// Octaves of a covered by the step tables: a ∈ [2⁻²⁰, 1].
pub(crate) const STEP_OCTAVES: usize = 20;
/// Pieces of the step tables (the first `STEP_PIECES` pieces of the growth table's layout).
pub(crate) const STEP_PIECES: usize = STEP_OCTAVES * SUB;
/// Smallest a of the step tables, 2⁻²⁰.
const A_STEP_MIN: f64 = 9.536_743_164_062_5e-7;

/// One integrand of a time-step factor on the pieces of the table: monomial coefficients (in
/// t ∈ [−1, 1]) per piece, each divided by k + 1 (those of the integral), and the integral over
/// each piece (in a). Plain old data.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct StepTable<T> {
    poly: [[T; NCOEF]; STEP_PIECES],
    total: [T; STEP_PIECES],
}

impl<T: Real> StepTable<T> {
    pub(crate) fn zero() -> Self {
        StepTable {
            poly: [[T::zero(); NCOEF]; STEP_PIECES],
            total: [T::zero(); STEP_PIECES],
        }
    }

    /// Fills the table with `g` (an integrand in a); false when a piece fails the error control.
    pub(crate) fn fill(&mut self, g: impl Fn(T) -> T) -> bool {
        let mut ok = true;
        for p in 0..STEP_PIECES {
            let (lo, width) = piece_bounds(p);
            let (c, ok1) = coefficients_of(|t: f64| g(T::c(lo + width * 0.5 * (t + 1.0))));
            ok &= ok1;
            if let Some(slot) = self.poly.get_mut(p) {
                // c_k/(k + 1), the coefficients of the integral: the queries then multiply only
                for (k, (d, &ck)) in slot.iter_mut().zip(c.iter()).enumerate() {
                    *d = ck / T::small_integer(k as i32 + 1);
                }
            }
        }
        for p in 0..STEP_PIECES {
            let (_, width) = piece_bounds(p);
            let tot = self.piece_integral(p, -T::one(), T::one()) * T::c(0.5 * width);
            if let Some(t) = self.total.get_mut(p) {
                *t = tot;
            }
        }
        ok
    }

    /// ∫_{t1}^{t2} Σ c_k t^k dt of piece p = (t2 − t1) Σ [c_k/(k + 1)] h_k, h_k = Σ t2^j t1^(k−j)
    /// (the table holds c_k/(k + 1)).
    #[inline(always)]
    fn piece_integral(&self, p: usize, t1: T, t2: T) -> T {
        let Some(c) = self.poly.get(p) else {
            return T::nan();
        };
        let (mut h, mut t1k, mut acc) = (T::one(), T::one(), T::zero());
        for (k, &ck) in c.iter().enumerate() {
            if k > 0 {
                t1k = t1k * t1;
                h = t2 * h + t1k;
            }
            acc = acc + ck * h;
        }
        (t2 - t1) * acc
    }

    /// ∫_{a1}^{a2} g da for table points 2⁻²⁰ ≤ a1 < a2 ≤ 1.
    fn integral(&self, a1: T, a2: T) -> T {
        let (p1, t1) = locate_step(a1);
        let (p2, t2) = locate_step(a2);
        let half = |p: usize| T::c(0.5 * piece_bounds(p).1);
        if p1 == p2 {
            return self.piece_integral(p1, t1, t2) * half(p1);
        }
        // a1's piece from t1 to its top, a2's piece from its bottom to t2, and the whole pieces
        // between, summed one by one (a difference of running sums would cancel for a long step
        // far below a = 1; a step spans at most the table's 160 pieces)
        let (r1, r2) = (rank_of_piece(p1), rank_of_piece(p2));
        let ends = self.piece_integral(p1, t1, T::one()) * half(p1)
            + self.piece_integral(p2, -T::one(), t2) * half(p2);
        let between = (r2 + 1..r1).fold(T::zero(), |s, r| {
            s + self
                .total
                .get(piece_of_rank(r))
                .copied()
                .unwrap_or(T::nan())
        });
        ends + between
    }
}

/// Rank of a piece in order of decreasing a (0: the piece ending at a = 1).
fn rank_of_piece(p: usize) -> usize {
    (p / SUB) * SUB + (SUB - 1 - p % SUB)
}

/// The piece of a rank.
fn piece_of_rank(r: usize) -> usize {
    (r / SUB) * SUB + (SUB - 1 - r % SUB)
}

/// (piece, t) of a table point a ∈ [2⁻²⁰, 1]; a = 1 is t = 1 of the top piece.
fn locate_step<T: Real>(a: T) -> (usize, T) {
    if a >= T::one() {
        return (SUB - 1, T::one());
    }
    let (p, t) = locate_inside(a);
    (p.min(STEP_PIECES - 1), t)
}

impl<T: Real> LinearGrowth<T> {
    /// Fills the drift and kick tables; whether both passed their error control.
    pub(crate) fn compute_steps(
        universe: &Universe<T>,
        drift: &mut StepTable<T>,
        kick: &mut StepTable<T>,
    ) -> bool {
        let q = |a: T| universe.q_squared(a).sqrt();
        let ok_d = drift.fill(|a| T::one() / (a * q(a)));
        let ok_k = kick.fill(|a| T::one() / q(a));
        ok_d & ok_k
    }

    /// t_H ∫_{a1}^{a2} (drift: da/(a q), kick: da/q), signed, through the tables where they
    /// apply.
    fn step_factor(&self, start: T, end: T, drift: bool) -> Result<T> {
        let a1 = unit_interval(start, arg!(0, start_scale_factor))?;
        let a2 = unit_interval(end, arg!(1, end_scale_factor))?;
        let (lo, hi, sign) = if a1 <= a2 {
            (a1, a2, T::one())
        } else {
            (a2, a1, -T::one())
        };
        if lo == hi {
            return Ok(T::zero());
        }
        let (table, valid) = self.step_table(drift);
        if valid && lo >= T::c(A_STEP_MIN) {
            let u = self.universe();
            return finite_result(
                u.hubble_time_gyr * (sign * table.integral(lo, hi)),
                arg!(0, start_scale_factor),
            );
        }
        self.step_factor_outside(a1, a2, drift)
    }

    /// [`step_factor`](Self::step_factor) below the tables or where they failed their check:
    /// the quadrature (out of line, so that the table path stays small and inlined).
    #[cold]
    #[inline(never)]
    fn step_factor_outside(&self, a1: T, a2: T, drift: bool) -> Result<T> {
        self.universe().leapfrog_integral(a1, a2, drift)
    }

    /// Drift factor of a comoving leapfrog step, ∫_{a1}^{a2} da/(a³H), Gyr (Quinn, Katz, Stadel
    /// & Lake 1997): the time a drift multiplies the canonical momentum p = a²ẋ by.
    ///
    /// * `start_scale_factor`: a1, 0 < a1 ≤ 1.
    /// * `end_scale_factor`: a2, 0 < a2 ≤ 1 (a2 < a1 gives the negative factor of a backward
    ///   step).
    ///
    /// Errors: `NonFinite(i)`, `NonPositive(i)`, `OutOfDomain(i)` above 1 (the universe is
    /// validated up to today only); `OutOfDomain(0)` when the integral is not representable.
    /// Accuracy: within 1e-12 relative (`f64`) of an mpmath quadrature (`tests/data/growth.txt`).
    /// Cost: tens of nanoseconds on the table (a ≥ 2⁻²⁰), a quadrature below.
    pub fn leapfrog_drift_factor_gyr(
        &self,
        start_scale_factor: T,
        end_scale_factor: T,
    ) -> Result<T> {
        self.step_factor(start_scale_factor, end_scale_factor, true)
    }

    /// Kick factor of a comoving leapfrog step, ∫_{a1}^{a2} da/(a²H), Gyr (Quinn, Katz, Stadel
    /// & Lake 1997): the time a kick multiplies the comoving force by. Arguments, errors,
    /// accuracy and cost as [`leapfrog_drift_factor_gyr`](Self::leapfrog_drift_factor_gyr).
    pub fn leapfrog_kick_factor_gyr(
        &self,
        start_scale_factor: T,
        end_scale_factor: T,
    ) -> Result<T> {
        self.step_factor(start_scale_factor, end_scale_factor, false)
    }
}

impl<T: Real> Universe<T> {
    /// t_H ∫_{a1}^{a2} a^power da / q(a) (power −1 or 0), signed.
    pub(crate) fn leapfrog_integral(&self, a1: T, a2: T, drift: bool) -> Result<T> {
        if a1 == a2 {
            return Ok(T::zero());
        }
        let mut in_a = |a: T| {
            let q = self.q_squared(a).sqrt();
            if drift {
                T::one() / (a * q)
            } else {
                T::one() / q
            }
        };
        let (v, err) = gauss_kronrod_15(&mut in_a, a1, a2);
        let value = if v.is_finite() && err <= T::c(1e-14).max(T::epsilon() * T::c(16.0)) * v.abs()
        {
            v
        } else {
            integrate(
                |n: T| {
                    let a = n.exp();
                    let q = self.q_squared(a).sqrt();
                    if drift { T::one() / q } else { a / q }
                },
                a1.ln(),
                a2.ln(),
                T::epsilon() * T::c(8.0),
                T::zero(),
            )
            .map_err(|_| Error::OutOfDomain(arg!(0, start_scale_factor)))?
        };
        finite_result(self.hubble_time_gyr * value, arg!(0, start_scale_factor))
    }
}
