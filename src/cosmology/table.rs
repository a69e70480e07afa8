//! The per-universe distance table: a fixed-size piecewise Chebyshev interpolant of the
//! line-of-sight comoving distance, built once by [`Universe::new`](super::Universe::new).
//!
//! With a = 1/(1+z), χ(z)/D_H = ∫_a^1 da'/q(a') where q = a²E. The table stores
//! g(a) = χ/(D_H (1 − a)), smooth and of order one, so that (1 − a) g(a), with 1 − a = z·a
//! formed from z without cancellation, keeps full relative accuracy down to z → 0. A call then
//! needs one division (a) and no square root.
//!
//! Pieces: the octaves [2^−j−1, 2^−j) of a for j = 0…13 (z up to 16383), each cut into 16
//! equal pieces, so a piece is never wider than 1/16 of its distance from a = 0, where χ has
//! its square-root singularity. In each piece, 10 Chebyshev coefficients come from the values at
//! the 10 Chebyshev points of the first kind; the values are the cumulative integral from
//! a = 1 down to each node, piece by piece with the shared adaptive Gauss-Kronrod quadrature
//! (relative tolerance 4ε) in a, summed with compensation. The first 8 coefficients are kept.
//! The piece index comes from the exponent and leading mantissa bits of a: no logarithm per
//! call.
//!
//! Error control (a posteriori): the table is used only if, in every piece, the two dropped
//! coefficients (the 9th and 10th) together are below 1e-14 of the largest one (see
//! [`TAIL_LIMIT`] for why not 1e-15). For analytic g the coefficients decay geometrically and
//! the truncation error is of the order of the first neglected ones (Trefethen, Approximation
//! Theory and Approximation Practice, SIAM 2013, ch. 8). Measured with mpmath (30 digits) for
//! flat and closed Λ models with radiation, without radiation, and a low-density model, the
//! 9th coefficient is below 2e-16 of the largest and the 10th at the quadrature's noise.
//! Otherwise every call falls back to direct quadrature in s = √a (slower). The tests compare
//! the table with mpmath vectors.
//!
//! Why this layout (the first one had 16 pieces of 14 coefficients per octave of s = √a): the
//! array functions evaluate many redshifts at once with SIMD, and there the cost is the
//! gathering of each element's coefficients from its own piece, plus the square root and the
//! division; 8 gathers and no square root instead of 14 and one more than halve the time of a
//! catalogue of distances, and the table keeps its size (1792 numbers).

use super::Universe;
use crate::math::dd::two_sum;
use crate::math::quadrature::integrate;
use crate::{Real, Result};

pub(crate) const OCTAVES: usize = 14;
pub(crate) const SUB: usize = 16;
pub(crate) const PIECES: usize = OCTAVES * SUB;
/// Coefficients kept per piece.
pub(crate) const NCOEF: usize = 8;
/// Chebyshev points (and coefficients computed) per piece.
const NODES: usize = 10;
/// Largest admitted sum of the dropped coefficients, relative to the largest coefficient. The
/// computed coefficients have a noise floor of about 7e-16 (the node values are accurate to a
/// few 1e-16: quadrature tolerance and rounding), so a limit at 1e-15 would refuse tables whose
/// true tail is 1e-17; 1e-14 still keeps the truncation error 100 times below the 1e-12 the
/// reference vectors demand.
const TAIL_LIMIT: f64 = 1e-14;
/// Smallest a in the table, 2^−14 (z = 16383).
pub(crate) const A_MIN: f64 = 6.103_515_625e-5;

/// Chebyshev coefficients of g(s) per piece; `valid` is false when the error control failed.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct DistanceTable<T> {
    /// The piece polynomials in the monomial basis of t (converted from their Chebyshev
    /// coefficients after the error check), evaluated by Estrin's scheme: a short dependency
    /// chain, where a Clenshaw recurrence of 8 terms is an 8-step serial chain.
    monomial: [[T; NCOEF]; PIECES],
    /// 1 when the error control passed. A byte rather than a `bool`: every field of a
    /// universe is plain old data, so any bit pattern is a valid value (the C face keeps the
    /// value in caller-owned storage and must not be able to create undefined behaviour from a
    /// corrupted struct; a validity tag there refuses structs it did not initialise).
    valid: u8,
}

/// Piece (octave j, sub-piece k) containing a ∈ [A_MIN, 1], and the local variable t ∈ [−1, 1].
#[inline]
fn locate<T: Real>(a: T) -> Option<(usize, T)> {
    if !(a >= T::c(A_MIN)) || a > T::one() {
        return None;
    }
    if a == T::one() {
        return Some((SUB - 1, T::one()));
    }
    Some(locate_inside(a))
}

/// [`locate`] for A_MIN ≤ a < 1 as straight-line code (no branch, no table): another a gives
/// some piece index below [`PIECES`] and a garbage t.
#[inline(always)]
fn locate_inside<T: Real>(a: T) -> (usize, T) {
    let (m, e, _) = a.integer_decode();
    let d = T::MANTISSA_DIGITS as i32;
    let octave_exp = i32::from(e) + d - 1; // a ∈ [2^E, 2^(E+1))
    // a ∈ [2^E, 2^(E+1)): octave j = −E − 1 (any value for an a outside the table: the
    // caller bounds the index and ignores t there)
    let j = (-octave_exp - 1) & 63;
    let k = ((m >> (d - 5)) & 15) as i32;
    // t = 32 (a / 2^E) − 32 − 2k − 1, exact; 2^(j+1) = 2^−E maps the octave onto [1, 2)
    let t = T::c(32.0) * (a * T::pow2i(j + 1)) - T::small_integer(33 + 2 * k);
    ((j * SUB as i32 + k) as usize, t)
}

fn piece_bounds(p: usize) -> (f64, f64) {
    let j = p / SUB;
    let k = p % SUB;
    let base = libm::ldexp(1.0, -(j as i32) - 1);
    (base * (1.0 + k as f64 / SUB as f64), base / SUB as f64)
}

fn chebyshev_node(m: usize) -> f64 {
    libm::cos(core::f64::consts::PI * (m as f64 + 0.5) / NODES as f64)
}

/// Monomial coefficients (in t) of Σ c_k T_k(t), from the Chebyshev recurrence
/// T_(k+1) = 2t T_k − T_(k−1) (integer coefficients, exact). For the rapidly decaying c_k of
/// these tables the conversion and the monomial evaluation on |t| ≤ 1 lose well under a digit;
/// the reference vectors check the result to 1e-12.
fn chebyshev_to_monomial<T: Real>(c: &[T; NCOEF]) -> [T; NCOEF] {
    let mut out = [T::zero(); NCOEF];
    let mut prev = [0.0f64; NCOEF]; // T_(k−1)
    let mut cur = [0.0f64; NCOEF]; // T_k
    if let Some(x) = cur.first_mut() {
        *x = 1.0; // T_0 = 1
    }
    for (k, &ck) in c.iter().enumerate() {
        for (o, &tk) in out.iter_mut().zip(cur.iter()) {
            *o = *o + ck * T::c(tk);
        }
        // next = 2t·cur − prev (for k = 0, T_1 = t)
        let mut next = [0.0f64; NCOEF];
        for m in 0..NCOEF - 1 {
            let shifted = cur.get(m).copied().unwrap_or(0.0);
            if let Some(n) = next.get_mut(m + 1) {
                *n = if k == 0 { shifted } else { 2.0 * shifted };
            }
        }
        if k > 0 {
            for (n, &p) in next.iter_mut().zip(prev.iter()) {
                *n -= p;
            }
        }
        prev = cur;
        cur = next;
    }
    out
}

/// Σ a_k t^k for 8 coefficients by Estrin's scheme (depth 3 instead of 7).
#[inline(always)]
fn estrin<T: Real>(a: &[T; NCOEF], t: T) -> T {
    let [a0, a1, a2, a3, a4, a5, a6, a7] = *a;
    let t2 = t * t;
    let t4 = t2 * t2;
    let q0 = (a0 + a1 * t) + (a2 + a3 * t) * t2;
    let q1 = (a4 + a5 * t) + (a6 + a7 * t) * t2;
    q0 + q1 * t4
}

impl<T: Real> DistanceTable<T> {
    pub(crate) fn empty() -> Self {
        DistanceTable {
            monomial: [[T::zero(); NCOEF]; PIECES],
            valid: 0,
        }
    }

    pub(crate) fn build(u: &Universe<T>) -> Result<Self> {
        let mut table = Self::empty();
        let tol = T::epsilon() * T::c(4.0);
        // cumulative integral from a = 1 downwards, compensated
        let (mut acc, mut comp) = (T::zero(), T::zero());
        let mut a_prev = T::one();
        let mut values = [T::zero(); NODES];
        let mut ok = true;
        // pieces in order of decreasing a: octave 0 first, sub-pieces from the top
        for j in 0..OCTAVES {
            for k in (0..SUB).rev() {
                let p = j * SUB + k;
                let (lo, h) = piece_bounds(p);
                for (m, v) in values.iter_mut().enumerate() {
                    // m = 0 is the node nearest the top of the piece: a decreases with m
                    let t = chebyshev_node(m);
                    let a = T::c(lo + h * 0.5 * (t + 1.0));
                    // dχ/D_H = da/q(a), q = a²E = √(q²(a)); the limits are the nodes themselves
                    let part = integrate(
                        |x: T| T::one() / u.q_squared(x).sqrt(),
                        a,
                        a_prev,
                        tol,
                        T::zero(),
                    )?;
                    let (sum, e) = two_sum(acc, part);
                    acc = sum;
                    comp = comp + e;
                    a_prev = a;
                    *v = (acc + comp) / (T::one() - a);
                }
                let mut cs = [T::zero(); NODES];
                for (jj, c) in cs.iter_mut().enumerate() {
                    let mut sum = T::zero();
                    for (m, v) in values.iter().enumerate() {
                        let ang =
                            core::f64::consts::PI * jj as f64 * (m as f64 + 0.5) / NODES as f64;
                        sum = sum + *v * T::c(libm::cos(ang));
                    }
                    let w = if jj == 0 { 1.0 } else { 2.0 };
                    *c = sum * T::c(w / NODES as f64);
                }
                // a posteriori error control: the coefficients that are dropped
                let big = cs.iter().fold(T::zero(), |m, c| m.max(c.abs()));
                let tail = cs.iter().skip(NCOEF).fold(T::zero(), |m, c| m + c.abs());
                if !(tail <= T::c(TAIL_LIMIT).max(T::epsilon() * T::c(40.0)) * big) {
                    ok = false;
                }
                // a dual number: the partials' dropped coefficients against the sum of their
                // magnitudes, part by part (always true for a float)
                if T::HAS_PARTIALS {
                    let size = cs.iter().fold(T::zero(), |m, c| m + c.error_magnitude());
                    let dropped = cs
                        .iter()
                        .skip(NCOEF)
                        .fold(T::zero(), |m, c| m + c.error_magnitude());
                    if !T::partials_within(dropped, size, T::c(TAIL_LIMIT), T::zero()) {
                        ok = false;
                    }
                }
                let mut kept = [T::zero(); NCOEF];
                for (k, c) in kept.iter_mut().zip(cs.iter()) {
                    *k = *c;
                }
                if let Some(slot) = table.monomial.get_mut(p) {
                    *slot = chebyshev_to_monomial(&kept);
                }
            }
        }
        table.valid = u8::from(ok);
        Ok(table)
    }

    /// g(a) from the table, or `None` outside it (or when the table failed its error control).
    #[inline]
    pub(crate) fn eval(&self, a: T) -> Option<T> {
        if self.valid != 1 {
            return None;
        }
        let (p, t) = locate(a)?;
        let a = self.monomial.get(p)?;
        Some(estrin(a, t))
    }

    /// [`eval`](Self::eval) as straight-line code for the array functions: g(a) and whether a
    /// is inside the table's common case (A_MIN ≤ a < 1 and a valid table); outside, the value
    /// is garbage. For a inside, the same operations as `eval`, bit for bit.
    #[inline(always)]
    pub(crate) fn eval_fast(&self, a: T) -> (T, bool) {
        let (p, t) = locate_inside(a);
        let g = match self.monomial.get(p.min(PIECES - 1)) {
            Some(a) => estrin(a, t),
            None => T::nan(), // unreachable: the index is clamped below PIECES
        };
        let inside = (self.valid == 1) & (a >= T::c(A_MIN)) & (a < T::one());
        (g, inside)
    }

    /// Whether the table passed its error control.
    #[cfg(test)]
    pub(crate) fn is_valid(&self) -> bool {
        self.valid == 1
    }
}

#[cfg(test)]
mod tests {
    use crate::cosmology::{Universe, UniverseParameters};

    #[test]
    fn table_passes_its_error_control_for_ordinary_models() {
        for (om, ok, t0, m) in [
            (0.3, 0.0, 2.7255, 0.0),
            (1.0, 0.0, 0.0, 0.0),
            (0.3, 0.1, 2.7255, 0.0),
            (0.3153, 0.0, 2.7255, 0.06),
        ] {
            let mut p = UniverseParameters::new(67.0f64, om);
            p.omega_curvature = ok;
            p.cmb_temperature_k = t0;
            p.neutrino_masses_ev = [m, 0.0, 0.0];
            let u = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
            assert!(u.table.is_valid(), "table invalid for {om} {ok} {t0} {m}");
        }
    }

    #[test]
    fn quadrature_without_the_table_agrees_with_the_table() {
        // the fallback (used when a table fails its error control, and beyond z = 16383)
        // against the table, which the mpmath vectors check, from z = 1e-9 to 1e4
        for (om, ok, t0, m, w0, wa) in [
            (0.3, 0.0, 2.7255, 0.0, -1.0, 0.0),
            (0.3, 0.1, 2.7255, 0.0, -1.0, 0.0),
            (0.3, -0.1, 2.7255, 0.06, -0.9, 0.3),
            (1.0, 0.0, 0.0, 0.0, -1.0, 0.0),
            (0.05, 0.0, 0.0, 0.0, -1.0, 0.0),
        ] {
            let mut p = UniverseParameters::new(67.0f64, om);
            p.omega_curvature = ok;
            p.cmb_temperature_k = t0;
            p.neutrino_masses_ev = [m, 0.0, 0.0];
            p.w0 = w0;
            p.wa = wa;
            let u = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
            for k in 0..=130 {
                let z = 10f64.powf(-9.0 + 0.1 * f64::from(k));
                let table = u.comoving_unit(z).unwrap_or(f64::NAN);
                let quad = u.comoving_unit_quadrature(z).unwrap_or(f64::NAN);
                assert!(
                    ((quad - table) / table).abs() < 1e-13,
                    "model {om} {ok} {t0} {m} {w0} {wa}, z={z}: quadrature {quad}, table {table}"
                );
            }
        }
    }

    #[test]
    fn einstein_de_sitter_distance_matches_closed_form() {
        // D_C = 2 D_H (1 − 1/√(1+z)) (closed form, e.g. Hogg 1999 §5)
        let mut p = UniverseParameters::new(70.0f64, 1.0);
        p.cmb_temperature_k = 0.0;
        let u = Universe::new(p).unwrap_or_else(|e| panic!("{e}"));
        for z in [1e-8, 1e-3, 0.1, 1.0, 3.0, 100.0, 1e4, 1e6] {
            let got = u.comoving_distance_mpc(z).unwrap_or(f64::NAN);
            let r = libm::sqrt(1.0 + z);
            let want = 2.0 * u.hubble_distance_mpc() * (z / (r * (1.0 + r)));
            assert!(
                ((got - want) / want).abs() < 1e-13,
                "z={z} got {got} want {want}"
            );
        }
    }
}
