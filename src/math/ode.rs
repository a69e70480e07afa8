//! The one ODE stepper: the Rosenbrock method of order 4 with an embedded order-3 error
//! estimate of Kaps & Rentrop 1979 (Numer. Math. 33, 55) with the parameters of Shampine 1982
//! (ACM Trans. Math. Softw. 8, 93), for stiff systems y' = f(t, y) with a fixed-size state of
//! `D` components and no heap. Coefficients as tabulated in Press et al., Numerical Recipes,
//! 2nd ed., 1992, §16.6 (from memory; the order-4 convergence is checked by a unit test).
//!
//! One step from (t, y) with step h, γ = 1/2, W = I/(γh) − J, J = ∂f/∂y and T = ∂f/∂t (a
//! non-autonomous system is treated as the autonomous one with t appended to the state, which
//! the T terms express):
//!
//! ```text
//! g₁ = W⁻¹ (f(t, y)             + h c₁ T)
//! g₂ = W⁻¹ (f(t + h, y + a₂₁g₁) + h c₂ T + c₂₁ g₁/h)
//! F₃ = f(t + 3h/5, y + a₃₁g₁ + a₃₂g₂)
//! g₃ = W⁻¹ (F₃ + h c₃ T + (c₃₁g₁ + c₃₂g₂)/h)
//! g₄ = W⁻¹ (F₃ + h c₄ T + (c₄₁g₁ + c₄₂g₂ + c₄₃g₃)/h)
//! y₁ = y + b₁g₁ + b₂g₂ + b₃g₃ + b₄g₄,   error estimate e₁g₁ + e₂g₂ + e₃g₃ + e₄g₄
//! ```
//!
//! J and T are formed once per step by forward differences (D + 1 extra evaluations of f), or J is
//! given exactly (`advance_with`, then T by a central difference on the scale of the step);
//! f(t + h, y₁) is the next step's f(t, y). The step is accepted when
//! maxᵢ |errᵢ| / (atolᵢ + rtol·max(|yᵢ|, |y₁ᵢ|)) ≤ 1, and the next step is
//! h · min(5, max(0.2, 0.9 · ratio^(−1/4))). An evaluation of f that fails (returns an error,
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
        let mut none = |_: T, _: &[T; D]| -> Option<[[T; D]; D]> { None };
        self.advance_with(f, &mut none, t0, y0, t1)
    }

    /// As [`advance`](Self::advance), with the Jacobian J = ∂f/∂y given by `jac` where it returns
    /// `Some` (exact, for a linear system) instead of forward differences. With an exact J,
    /// T = ∂f/∂t is taken by a central difference on the scale of the step, h·ε^(1/3), instead of a
    /// forward difference on the scale of t: where |t| ≫ h (an integration in ln a from
    /// a = 2⁻⁴⁷) the forward difference's error in T limited the global error to a few 1e-12
    /// whatever the tolerance (measured on the growth equation).
    pub fn advance_with<F, J>(
        &mut self,
        f: &mut F,
        jac: &mut J,
        t0: T,
        y0: [T; D],
        t1: T,
    ) -> Result<[T; D]>
    where
        F: FnMut(T, &[T; D]) -> Result<[T; D]>,
        J: FnMut(T, &[T; D]) -> Option<[[T; D]; D]>,
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
            let trial = self.try_step(f, jac, t, &y, &f0, hs, root_eps);
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
                (T::c(0.9) / ratio.sqrt().sqrt())
                    .min(T::c(5.0))
                    .max(T::c(0.2))
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

    /// One trial step: (y₁, f(t + h, y₁), error ratio).
    #[allow(clippy::too_many_arguments)]
    fn try_step<F, J>(
        &mut self,
        f: &mut F,
        jacf: &mut J,
        t: T,
        y: &[T; D],
        f0: &[T; D],
        h: T,
        root_eps: T,
    ) -> Result<([T; D], [T; D], T)>
    where
        F: FnMut(T, &[T; D]) -> Result<[T; D]>,
        J: FnMut(T, &[T; D]) -> Option<[[T; D]; D]>,
    {
        let c = |x: f64| T::c(x);
        let (gam, a21, a31, a32) = (c(0.5), c(2.0), c(48.0 / 25.0), c(6.0 / 25.0));
        let (c21, c31, c32) = (c(-8.0), c(372.0 / 25.0), c(12.0 / 5.0));
        let (c41, c42, c43) = (c(-112.0 / 125.0), c(-54.0 / 125.0), c(-2.0 / 5.0));
        let (b1, b2, b3, b4) = (c(19.0 / 9.0), c(0.5), c(25.0 / 108.0), c(125.0 / 108.0));
        let (e1, e2, e3, e4) = (c(17.0 / 54.0), c(7.0 / 36.0), c(0.0), c(125.0 / 108.0));
        let (c1x, c2x, c3x, c4x) = (c(0.5), c(-1.5), c(121.0 / 50.0), c(29.0 / 250.0));
        let (a2x, a3x) = (c(1.0), c(0.6));
        // J: given, or by forward differences (D more evaluations of f)
        let exact = jacf(t, y);
        let mut jac = exact.unwrap_or([[T::zero(); D]; D]);
        for j in 0..if exact.is_some() { 0 } else { D } {
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
        let mut dfdt = [T::zero(); D];
        if exact.is_some() {
            // central difference on the scale of the step (t may be far from 0)
            let dt = T::epsilon().cbrt() * h.abs();
            let (tp, tm) = (t + dt, t - dt);
            let fp = self.eval(f, tp, y)?;
            let fm = self.eval(f, tm, y)?;
            for ((o, a), b) in dfdt.iter_mut().zip(fp.iter()).zip(fm.iter()) {
                *o = (*a - *b) / (tp - tm);
            }
        } else {
            let dt = root_eps * t.abs().max(h.abs());
            let tp = t + dt;
            let dt = tp - t;
            let ft = self.eval(f, tp, y)?;
            for ((o, a), b) in dfdt.iter_mut().zip(ft.iter()).zip(f0.iter()) {
                *o = (*a - *b) / dt;
            }
        }
        let inv = T::one() / (gam * h);
        let mut w = [[T::zero(); D]; D];
        for (i, (wr, jr)) in w.iter_mut().zip(jac.iter()).enumerate() {
            for (j, (wv, jv)) in wr.iter_mut().zip(jr.iter()).enumerate() {
                *wv = if i == j { inv } else { T::zero() } - *jv;
            }
        }
        let lu = Lu::factor(w)?;
        let comb = |fs: &[T; D], cx: T, terms: &[(T, &[T; D])]| -> [T; D] {
            let mut r = [T::zero(); D];
            for (i, o) in r.iter_mut().enumerate() {
                let g = |a: &[T; D]| a.get(i).copied().unwrap_or(T::zero());
                let mut v = g(fs) + h * cx * g(&dfdt);
                for (k, arr) in terms {
                    v = v + *k * g(arr) / h;
                }
                *o = v;
            }
            r
        };
        let add = |terms: &[(T, &[T; D])]| -> [T; D] {
            let mut r = *y;
            for (i, o) in r.iter_mut().enumerate() {
                for (k, arr) in terms {
                    *o = *o + *k * arr.get(i).copied().unwrap_or(T::zero());
                }
            }
            r
        };
        let g1 = lu.solve(comb(f0, c1x, &[]));
        let y2 = add(&[(a21, &g1)]);
        let f2 = self.eval(f, t + a2x * h, &y2)?;
        let g2 = lu.solve(comb(&f2, c2x, &[(c21, &g1)]));
        let y3 = add(&[(a31, &g1), (a32, &g2)]);
        let f3 = self.eval(f, t + a3x * h, &y3)?;
        let g3 = lu.solve(comb(&f3, c3x, &[(c31, &g1), (c32, &g2)]));
        let g4 = lu.solve(comb(&f3, c4x, &[(c41, &g1), (c42, &g2), (c43, &g3)]));
        let y1 = add(&[(b1, &g1), (b2, &g2), (b3, &g3), (b4, &g4)]);
        let mut ratio = T::zero();
        for i in 0..D {
            let g = |a: &[T; D]| a.get(i).copied().unwrap_or(T::zero());
            let err = e1 * g(&g1) + e2 * g(&g2) + e3 * g(&g3) + e4 * g(&g4);
            let scale = g(&self.atol) + self.rtol * g(y).abs().max(g(&y1).abs());
            let r = (err / scale).abs();
            if !r.is_finite() {
                return Err(Error::NoConvergence);
            }
            ratio = ratio.max(r);
        }
        let fend = self.eval(f, t + h, &y1)?;
        Ok((y1, fend, ratio))
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
        // perm holds a permutation of 0..D, but the compiler cannot know it: a checked read
        // (never NaN) keeps the panic path out of every caller (the C library's firmware check
        // links no panic machinery)
        for (xi, &p) in x.iter_mut().zip(self.perm.iter()) {
            *xi = b.get(p).copied().unwrap_or(T::nan());
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

    /// Fixed steps on a non-autonomous nonlinear problem with a known solution: the error
    /// falls by 2⁴ per halving of h (order 4), which checks every coefficient of the method.
    /// y' = −(y − sin t)² + cos t, whose solution from y(0) = 1 is 1/(1 + t) + sin t.
    #[test]
    fn fixed_steps_converge_with_order_four() {
        let exact = |t: f64| 1.0 / (1.0 + t) + t.sin();
        let mut f = |t: f64, y: &[f64; 1]| Ok([-(y[0] - t.sin()) * (y[0] - t.sin()) + t.cos()]);
        let mut errors = [0.0; 4];
        for (k, n) in [8u32, 16, 32, 64].into_iter().enumerate() {
            let mut s = StiffStepper::new(1e300, [1e300], 1000);
            let h = 2.0 / f64::from(n);
            let mut y = [exact(0.0)];
            let mut t = 0.0;
            let mut f0 = f(t, &y).unwrap();
            for _ in 0..n {
                let mut none = |_: f64, _: &[f64; 1]| -> Option<[[f64; 1]; 1]> { None };
                let (y1, f1, _) = s
                    .try_step(&mut f, &mut none, t, &y, &f0, h, f64::EPSILON.sqrt())
                    .unwrap();
                y = y1;
                f0 = f1;
                t += h;
            }
            errors[k] = (y[0] - exact(2.0)).abs();
        }
        for w in errors.windows(2) {
            let order = (w[0] / w[1]).log2();
            assert!(
                (3.6..4.6).contains(&order),
                "observed order {order}, errors {errors:?}"
            );
        }
    }

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
