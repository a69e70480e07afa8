//! The one ODE stepper: the L-stable modified Rosenbrock pair of order 2(3) of Shampine &
//! Reichelt 1997 ("The MATLAB ODE suite", SIAM J. Sci. Comput. 18, 1, section 3.1), for stiff
//! systems y' = f(t, y) with a fixed-size state of `D` components and no heap.
//!
//! One step from (t, y) with step h, d = 1/(2 + √2), e₃₂ = 6 + √2, W = I − h d J,
//! J = ∂f/∂y and T = ∂f/∂t (a non-autonomous system is treated as the autonomous one with t
//! appended to the state, which the T term expresses):
//!
//! ```text
//! F₀ = f(t, y)                      k₁ = W⁻¹ (F₀ + h d T)
//! F₁ = f(t + h/2, y + h k₁/2)       k₂ = W⁻¹ (F₁ − k₁) + k₁
//! y₁ = y + h k₂                     F₂ = f(t + h, y₁)
//! k₃ = W⁻¹ (F₂ − e₃₂ (k₂ − F₁) − 2 (k₁ − F₀) + h d T)
//! error estimate = (h/6) (k₁ − 2k₂ + k₃)
//! ```
//!
//! F₂ is the next step's F₀ (first same as last). J and T are formed once per step by forward
//! differences (D + 1 extra evaluations of f). The step is accepted when
//! maxᵢ |errᵢ| / (atolᵢ + rtol·max(|yᵢ|, |y₁ᵢ|)) ≤ 1, and the next step is
//! h · min(5, max(0.2, 0.8 · ratio^(−1/3))). An evaluation of f that fails (returns an error,
//! for a trial state outside its domain) rejects the step and quarters h.
//!
//! The stepper lands exactly on the requested end point, so a caller that needs values on a
//! grid advances from node to node and keeps the step size between calls.

use crate::{Error, Real, Result};

/// Adaptive state of the stepper: tolerances, the step size carried from call to call, the
/// last derivative (first same as last) and counters. Plain fixed-size value, no heap.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct StiffStepper<T, const D: usize> {
    /// Relative tolerance (per step, on every component).
    pub rtol: T,
    /// Absolute tolerance of each component.
    pub atol: [T; D],
    /// Size of the next step to try (its sign is set by the direction of integration; 0 makes
    /// the first call try the whole interval).
    pub step: T,
    /// Maximum number of steps (accepted and rejected) over the stepper's life.
    pub max_steps: u32,
    /// Accepted steps so far.
    pub accepted: u32,
    /// Rejected steps so far.
    pub rejected: u32,
    /// Evaluations of f so far.
    pub evaluations: u32,
    last: Option<(T, [T; D], [T; D])>,
}

impl<T: Real, const D: usize> StiffStepper<T, D> {
    /// A stepper with the given tolerances and step budget.
    pub fn new(rtol: T, atol: [T; D], max_steps: u32) -> Self {
        Self {
            rtol,
            atol,
            step: T::zero(),
            max_steps,
            accepted: 0,
            rejected: 0,
            evaluations: 0,
            last: None,
        }
    }

    fn eval<F>(&mut self, f: &mut F, t: T, y: &[T; D]) -> Result<[T; D]>
    where
        F: FnMut(T, &[T; D]) -> Result<[T; D]>,
    {
        self.evaluations = self.evaluations.saturating_add(1);
        let v = f(t, y)?;
        if v.iter().all(|x| x.is_finite()) {
            Ok(v)
        } else {
            Err(Error::NoConvergence)
        }
    }

    /// Integrates y' = f(t, y) from (t0, y0) to t1 (either direction) and returns y(t1).
    ///
    /// `f` returns the derivative, or an error for a state outside its domain (a trial step
    /// that leaves the domain is rejected and retried with a smaller step). Errors:
    /// `NoConvergence` when the step budget is spent, the step size underflows, or f fails at
    /// the starting point.
    pub fn advance<F>(&mut self, f: &mut F, t0: T, y0: [T; D], t1: T) -> Result<[T; D]>
    where
        F: FnMut(T, &[T; D]) -> Result<[T; D]>,
    {
        let span = t1 - t0;
        if span == T::zero() {
            return Ok(y0);
        }
        let dir = if span > T::zero() {
            T::one()
        } else {
            -T::one()
        };
        let mut h = self.step.abs();
        if h == T::zero() || !h.is_finite() {
            // the whole interval: the controller shrinks a step that is too long
            h = span.abs();
        }
        let sqrt2 = T::c(core::f64::consts::SQRT_2);
        let d = T::one() / (T::c(2.0) + sqrt2);
        let e32 = T::c(6.0) + sqrt2;
        let root_eps = T::epsilon().sqrt();
        let mut t = t0;
        let mut y = y0;
        // F₀ at the start: reuse the last F₂ when this call continues the previous one
        let mut f0 = match self.last {
            Some((tl, yl, fl)) if tl == t0 && yl == y0 => fl,
            _ => self.eval(f, t, &y)?,
        };
        loop {
            let remaining = (t1 - t).abs();
            let last_step = h >= remaining;
            let hs = if last_step { remaining } else { h } * dir;
            if self.accepted.saturating_add(self.rejected) >= self.max_steps {
                return Err(Error::NoConvergence);
            }
            if !(hs.abs() > T::epsilon() * t.abs().max(T::one()) * T::c(16.0)) {
                return Err(Error::NoConvergence);
            }
            let trial = self.try_step(f, t, &y, &f0, hs, d, e32, root_eps);
            let (y1, f2, ratio) = match trial {
                Ok(v) => v,
                Err(_) => {
                    self.rejected += 1;
                    h = hs.abs() * T::c(0.25);
                    continue;
                }
            };
            let grow = if ratio == T::zero() {
                T::c(5.0)
            } else {
                (T::c(0.8) / ratio.cbrt()).min(T::c(5.0)).max(T::c(0.2))
            };
            if ratio <= T::one() {
                self.accepted += 1;
                t = if last_step { t1 } else { t + hs };
                y = y1;
                f0 = f2;
                if !last_step {
                    h = hs.abs() * grow;
                } else if ratio > T::zero() {
                    // keep the size the controller wants, not the clipped last step
                    h = h.max(hs.abs() * grow);
                }
                if last_step {
                    self.step = h;
                    self.last = Some((t, y, f0));
                    return Ok(y);
                }
            } else {
                self.rejected += 1;
                h = hs.abs() * grow;
            }
        }
    }

    /// One trial step: (y₁, F₂ = f(t + h, y₁), error ratio).
    #[allow(clippy::too_many_arguments)]
    fn try_step<F>(
        &mut self,
        f: &mut F,
        t: T,
        y: &[T; D],
        f0: &[T; D],
        h: T,
        d: T,
        e32: T,
        root_eps: T,
    ) -> Result<([T; D], [T; D], T)>
    where
        F: FnMut(T, &[T; D]) -> Result<[T; D]>,
    {
        // J by forward differences, column by column; T likewise
        let mut jac = [[T::zero(); D]; D];
        for j in 0..D {
            let mut yp = *y;
            let (yj, aj) = match (yp.get(j).copied(), self.atol.get(j).copied()) {
                (Some(v), Some(a)) => (v, a),
                _ => return Err(Error::NoConvergence),
            };
            let delta = root_eps * yj.abs().max(aj / self.rtol);
            if let Some(slot) = yp.get_mut(j) {
                *slot = yj + delta;
            }
            let delta = yj + delta - yj;
            let fp = self.eval(f, t, &yp)?;
            for (row, (a, b)) in jac.iter_mut().zip(fp.iter().zip(f0.iter())) {
                if let Some(slot) = row.get_mut(j) {
                    *slot = (*a - *b) / delta;
                }
            }
        }
        let dt = root_eps * t.abs().max(h.abs());
        let tp = t + dt;
        let dt = tp - t;
        let ft = self.eval(f, tp, y)?;
        let mut dfdt = [T::zero(); D];
        for ((o, a), b) in dfdt.iter_mut().zip(ft.iter()).zip(f0.iter()) {
            *o = (*a - *b) / dt;
        }
        // W = I − h d J, factorised once
        let hd = h * d;
        let mut w = [[T::zero(); D]; D];
        for (i, (wr, jr)) in w.iter_mut().zip(jac.iter()).enumerate() {
            for (j, (wv, jv)) in wr.iter_mut().zip(jr.iter()).enumerate() {
                *wv = if i == j { T::one() } else { T::zero() } - hd * *jv;
            }
        }
        let lu = Lu::factor(w)?;
        let mut r1 = [T::zero(); D];
        for ((o, a), b) in r1.iter_mut().zip(f0.iter()).zip(dfdt.iter()) {
            *o = *a + hd * *b;
        }
        let k1 = lu.solve(r1);
        let mut ymid = *y;
        for ((o, a), k) in ymid.iter_mut().zip(y.iter()).zip(k1.iter()) {
            *o = *a + T::c(0.5) * h * *k;
        }
        let f1 = self.eval(f, t + T::c(0.5) * h, &ymid)?;
        let mut r2 = [T::zero(); D];
        for ((o, a), b) in r2.iter_mut().zip(f1.iter()).zip(k1.iter()) {
            *o = *a - *b;
        }
        let mut k2 = lu.solve(r2);
        for (o, b) in k2.iter_mut().zip(k1.iter()) {
            *o = *o + *b;
        }
        let mut y1 = *y;
        for ((o, a), k) in y1.iter_mut().zip(y.iter()).zip(k2.iter()) {
            *o = *a + h * *k;
        }
        let f2 = self.eval(f, t + h, &y1)?;
        let mut r3 = [T::zero(); D];
        for i in 0..D {
            let g = |a: &[T; D]| a.get(i).copied().unwrap_or(T::zero());
            if let Some(o) = r3.get_mut(i) {
                *o =
                    g(&f2) - e32 * (g(&k2) - g(&f1)) - T::c(2.0) * (g(&k1) - g(f0)) + hd * g(&dfdt);
            }
        }
        let k3 = lu.solve(r3);
        let mut ratio = T::zero();
        for i in 0..D {
            let g = |a: &[T; D]| a.get(i).copied().unwrap_or(T::zero());
            let err = h / T::c(6.0) * (g(&k1) - T::c(2.0) * g(&k2) + g(&k3));
            let scale = g(&self.atol) + self.rtol * g(y).abs().max(g(&y1).abs());
            let r = (err / scale).abs();
            if !r.is_finite() {
                return Err(Error::NoConvergence);
            }
            ratio = ratio.max(r);
        }
        Ok((y1, f2, ratio))
    }
}

/// LU factors of a D × D matrix with partial pivoting (Golub & Van Loan, Matrix Computations,
/// algorithm 3.4.1).
struct Lu<T, const D: usize> {
    a: [[T; D]; D],
    perm: [usize; D],
}

// Every index below is a loop variable bounded by the array length D, so no access can fail.
#[allow(clippy::indexing_slicing)]
impl<T: Real, const D: usize> Lu<T, D> {
    fn factor(mut a: [[T; D]; D]) -> Result<Self> {
        let mut perm = [0usize; D];
        for (i, p) in perm.iter_mut().enumerate() {
            *p = i;
        }
        for k in 0..D {
            let mut piv = k;
            for i in k + 1..D {
                if a[i][k].abs() > a[piv][k].abs() {
                    piv = i;
                }
            }
            if !(a[piv][k].abs() > T::zero()) {
                return Err(Error::NoConvergence);
            }
            a.swap(k, piv);
            perm.swap(k, piv);
            let pivot_row = a[k];
            for row in a.iter_mut().skip(k + 1) {
                let m = row[k] / pivot_row[k];
                row[k] = m;
                for (x, r) in row.iter_mut().zip(pivot_row.iter()).skip(k + 1) {
                    *x = *x - m * *r;
                }
            }
        }
        Ok(Self { a, perm })
    }

    fn solve(&self, b: [T; D]) -> [T; D] {
        let mut x = [T::zero(); D];
        for i in 0..D {
            x[i] = b[self.perm[i]];
        }
        for i in 0..D {
            for j in 0..i {
                x[i] = x[i] - self.a[i][j] * x[j];
            }
        }
        for i in (0..D).rev() {
            for j in i + 1..D {
                x[i] = x[i] - self.a[i][j] * x[j];
            }
            x[i] = x[i] / self.a[i][i];
        }
        x
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn linear_stiff_system_matches_exponential() {
        // y0' = −1000 (y0 − cos t) − sin t has the solution cos t from y0(0) = 1; y1' = −y1
        let mut f = |t: f64, y: &[f64; 2]| Ok([-1000.0 * (y[0] - t.cos()) - t.sin(), -y[1]]);
        let mut s = StiffStepper::new(1e-9, [1e-12; 2], 100_000);
        let y = s.advance(&mut f, 0.0, [1.0, 1.0], 2.0).unwrap();
        assert!((y[0] - 2.0f64.cos()).abs() < 1e-7, "{}", y[0]);
        assert!((y[1] - (-2.0f64).exp()).abs() < 1e-7, "{}", y[1]);
    }
}
