#!/usr/bin/env python3
"""The strong scipy baseline of the thermal-history comparison: NOT relicore.

What a careful scientist writes with numpy and scipy for the same equations (the model of the
module doc of src/decoupling/mod.rs, as re-implemented independently in
tests/reference/decoupling_model.py, whose background, Saha factors and helium balance it
reuses), tuned for speed at an accuracy that still beats what the results are used for:

* the background once, vectorised: ln H(u) on a uniform grid in u = ln(1+z) (numpy, the massive
  neutrino's Fermi-Dirac ratio by the reference's Chebyshev pieces evaluated with
  numpy.polynomial.chebyshev), then a scipy CubicSpline whose piecewise polynomial the
  right-hand side evaluates in plain Python (no per-call scipy overhead);
* the stiff ODE for (x_p, T_m/T_r) by scipy.integrate.solve_ivp, Radau (BDF and LSODA fail at
  z = 1e4, where hydrogen relaxes ~1e18 times faster than the expansion), with the analytic
  Jacobian, a scalar right-hand side in plain Python floats (with an analytic Jacobian Radau
  never calls a vectorised right-hand side; numpy on single numbers is slower than math), a
  sensible first step, and relative tolerance rtol with absolute floors per component;
* optical depths after the solve, vectorised: the dense output at 6001 points of z <= 2500
  (one call), x_e by the closed-form helium balance (He III negligible there), cumulative
  Simpson, a cubic spline of tau; z*, z_drag by brentq on the spline; the visibility peak by a
  bounded Brent search on the spline of ln g; thermal decoupling by brentq on the dense T_m/T_r;
* r_s, D_M and the age by 64-point Gauss-Legendre (scipy.integrate.fixed_quad, vectorised).

`CarefulHistory(**params, rtol=...)`; `.summary()` gives the ten summary quantities.
"""

from __future__ import annotations

import math
import pathlib
import sys

import numpy as np
from numpy.polynomial import chebyshev as cheb
from scipy.integrate import cumulative_simpson, fixed_quad, solve_ivp
from scipy.interpolate import CubicSpline
from scipy.optimize import brentq, minimize_scalar

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tests" / "reference"))

import decoupling_model as dm  # noqa: E402  (the independent re-implementation: NOT relicore)

SUMMARY = dm.SUMMARY_NAMES


def _fd_ratio_vec(fd: dm.FermiDiracRatio, y: np.ndarray) -> np.ndarray:
    """phi(y) = F(y)/F(0) for an array, by the reference's Chebyshev pieces (vectorised)."""
    out = 1.0 + 5.0 * y * y / (7.0 * math.pi**2)
    big = y >= 1e-4
    if np.any(big):
        ly = np.log(y[big]) - fd.LN_MIN
        p = np.minimum(ly.astype(int), fd.PIECES - 1)
        t = 2.0 * (ly - p) - 1.0
        v = np.empty_like(ly)
        for piece in np.unique(p):
            sel = p == piece
            v[sel] = cheb.chebval(t[sel], fd.coef[piece])
        out[big] = v
    return out


def _helium(x_p: float, s1: float, s2: float, f: float) -> tuple[float, float]:
    """(x_e, dx_e/dx_p) with helium in Saha equilibrium: closed forms where He III (or all of
    helium) is below 1e-17 of x_p, the reference's safeguarded Newton iteration otherwise."""
    if f * s1 <= 1e-22 * x_p:
        return x_p, 1.0
    if 2.0 * f * s2 <= 1e-17 * x_p * x_p:
        b = s1 - x_p
        c = s1 * (x_p + f)
        root = math.sqrt(b * b + 4.0 * c)
        x = 2.0 * c / (b + root) if b >= 0.0 else 0.5 * (root - b)
        return x, (x + s1) / (2.0 * x + b)
    return dm.helium_electron_fraction(x_p, s1, s2, f, derivative=True)


class CarefulHistory:
    def __init__(self, *, reionization_redshift=None, highest_redshift: float = 1e4, rtol: float = 1e-6,
                 **params) -> None:
        if reionization_redshift is not None:
            raise ValueError("the baseline is written for the comparison's history without reionisation")
        self.u = u = dm.ReferenceUniverse(**params)
        self.z_top = float(highest_redshift)
        self.u_top = u_top = math.log1p(self.z_top)
        self.n_rhs = 0
        # ---- the background once: ln H on a uniform grid in u, a cubic spline of it
        grid = np.linspace(0.0, u_top, 2049)
        a = np.exp(-grid)
        self.ln_h = CubicSpline(grid, np.log(self._hubble_vec(a)))
        self._h_step = grid[1] - grid[0]
        self._h_coef = self.ln_h.c.T.tolist()
        # ---- constants of the right-hand side
        self.c_compton = dm.COMPTON * u.t0**4
        self.k_escape = dm.LAMBDA_ALPHA**3 / (8.0 * math.pi)
        # ---- initial state: Saha equilibrium at the top, T_m = T_r
        x_e0 = dm.saha_ionized_fraction(u, self.z_top)
        sh, _, _ = u.saha_factors(u.t0 * (1.0 + self.z_top), self.z_top)
        y0 = [sh / (sh + x_e0), 1.0]
        sol = solve_ivp(self._rhs, (u_top, 0.0), y0, method="Radau", rtol=rtol, atol=[1e-13, 1e-12],
                        dense_output=True, jac=self._jac, first_step=1e-3)
        if not sol.success:
            raise RuntimeError(sol.message)
        self.sol = sol.sol
        self.n_steps = len(sol.t) - 1
        self._depths_and_summary()

    # ---- background ------------------------------------------------------------------------
    def _hubble_vec(self, a: np.ndarray) -> np.ndarray:
        u = self.u
        p = u.omega_cb * a + u.omega_r + u.ok * a * a
        for y in u.massive_y:
            p = p + u.per_species * _fd_ratio_vec(u.fd, y * a)
        if u.omega_de != 0.0:
            de = u.omega_de * a**u.p_de
            if u.wa != 0.0:
                de = de * np.exp(-3.0 * u.wa * (1.0 - a))
            p = p + de
        return u.h0_si * np.sqrt(p) / (a * a)

    def _hubble(self, uu: float) -> float:
        i = min(int(uu / self._h_step), len(self._h_coef) - 1)
        dx = uu - i * self._h_step
        c0, c1, c2, c3 = self._h_coef[i]
        return math.exp(((c0 * dx + c1) * dx + c2) * dx + c3)

    # ---- right-hand side and Jacobian in u = ln(1+z), state (x_p, theta = T_m/T_r) -----------
    def _terms(self, uu, y, jacobian):
        u = self.u
        x_p, theta = float(y[0]), float(y[1])
        opz = math.exp(uu)
        t_r = u.t0 * opz
        t_m = theta * t_r
        n_h = u.n_h0 * opz**3
        hub = self._hubble(uu)
        kt = dm.K_B * t_r
        pre = dm.THERMAL * t_r**1.5
        inv = 1.0 / n_h
        s1 = dm.G_HE1 * pre * math.exp(-dm.CHI_HE1 / kt) * inv
        s2 = dm.G_HE2 * pre * math.exp(-dm.CHI_HE2 / kt) * inv
        x_e, dxe = _helium(x_p, s1, s2, u.f_he)
        a, b, c, d = dm.PPB
        tm4 = (t_m / 1e4) ** d
        alpha_m = dm.FUDGE * 1e-19 * a * (t_m / 1e4) ** b / (1.0 + c * tm4)
        tr4 = (t_r / 1e4) ** d
        alpha_r = dm.FUDGE * 1e-19 * a * (t_r / 1e4) ** b / (1.0 + c * tr4)
        e_b2 = math.exp(-dm.B_2 / kt)
        beta = alpha_r * pre * e_b2
        beta_boltz = beta * e_b2**3                       # exp(-chi_H/kT) = exp(-B_2/kT)^4
        k = self.k_escape / hub
        w = 1.0 - x_p
        ca = k * dm.TWO_PHOTON * n_h
        cb = k * (dm.TWO_PHOTON + beta) * n_h
        wc = max(w, 0.0)
        c_peebles = (1.0 + ca * wc) / (1.0 + cb * wc)
        dd = alpha_m * n_h * x_e * x_p - beta_boltz * w
        cc = self.c_compton * opz**4
        gamma = cc * x_e / (1.0 + u.f_he + x_e)
        if not jacobian:
            return [c_peebles * dd / hub, theta - gamma / hub * (1.0 - theta)]
        dc_dxp = (cb - ca) / (1.0 + cb * wc) ** 2 if w > 0.0 else 0.0
        dd_dxp = alpha_m * n_h * (x_e + x_p * dxe) + beta_boltz
        dalpha_dtheta = alpha_m / theta * (b - c * d * tm4 / (1.0 + c * tm4))
        dgamma_dxp = cc * (1.0 + u.f_he) / (1.0 + u.f_he + x_e) ** 2 * dxe
        return [[(dc_dxp * dd + c_peebles * dd_dxp) / hub, c_peebles * dalpha_dtheta * n_h * x_e * x_p / hub],
                [-dgamma_dxp / hub * (1.0 - theta), 1.0 + gamma / hub]]

    def _rhs(self, uu, y):
        self.n_rhs += 1
        return self._terms(uu, y, False)

    def _jac(self, uu, y):
        return self._terms(uu, y, True)

    # ---- optical depths and the summary ----------------------------------------------------
    def _xe_vec(self, uu: np.ndarray, x_p: np.ndarray) -> np.ndarray:
        """x_e from x_p with He I in Saha equilibrium (He III negligible below z = 2500):
        x_e^2 + (S1 - x_p) x_e - S1 (x_p + f) = 0, in its cancellation-free form."""
        u = self.u
        opz = np.exp(uu)
        t_r = u.t0 * opz
        s1 = dm.G_HE1 * dm.THERMAL * t_r**1.5 * np.exp(-dm.CHI_HE1 / (dm.K_B * t_r)) / (u.n_h0 * opz**3)
        b = s1 - x_p
        c = s1 * (x_p + u.f_he)
        root = np.sqrt(b * b + 4.0 * c)
        with np.errstate(divide="ignore", invalid="ignore"):
            return np.where(b >= 0.0, 2.0 * c / (b + root), 0.5 * (root - b))

    def _depths_and_summary(self) -> None:
        u = self.u
        uu = np.linspace(0.0, math.log1p(2500.0), 6001)
        state = self.sol(uu)
        x_e = self._xe_vec(uu, state[0])
        hub = self._hubble_vec(np.exp(-uu))
        dtau = x_e * u.n_h0 * np.exp(3.0 * uu) * dm.SIGMA_T * dm.C / hub
        tau = cumulative_simpson(dtau, x=uu, initial=0.0)
        drag = cumulative_simpson(dtau * np.exp(uu) / u.r0, x=uu, initial=0.0)
        tau_s = CubicSpline(uu, tau)
        drag_s = CubicSpline(uu, drag)
        u_star = brentq(lambda x: tau_s(x) - 1.0, uu[0], uu[-1], xtol=1e-14)
        u_drag = brentq(lambda x: drag_s(x) - 1.0, uu[0], uu[-1], xtol=1e-14)
        zs = math.expm1(u_star)
        self.last_scattering_redshift = zs
        self.drag_redshift = math.expm1(u_drag)
        self.sound_horizon_last_scattering_mpc = self._sound_horizon(zs)
        self.sound_horizon_drag_mpc = self._sound_horizon(self.drag_redshift)
        a_star = 1.0 / (1.0 + zs)
        # D_M in ln a (the integrand 1/sqrt(a^4 E^2) da has a branch point just below a = 0)
        dm_star = u.dh * fixed_quad(lambda x: np.exp(x) / np.sqrt(self._p(np.exp(x))), math.log(a_star), 0.0,
                                    n=64)[0]
        self.angular_scale_last_scattering = self.sound_horizon_last_scattering_mpc / dm_star
        self.age_at_last_scattering_yr = (fixed_quad(lambda a: a / np.sqrt(self._p(a)), 0.0, a_star, n=64)[0]
                                          / u.h0_si / dm.YEAR)
        self.temperature_at_last_scattering_k = u.t0 * (1.0 + zs)
        # visibility per conformal time: ln g = ln x_e + 2u - tau + const
        ln_g = CubicSpline(uu, np.log(x_e) + 2.0 * uu - tau)
        k = int(np.argmax(ln_g(uu)))
        res = minimize_scalar(lambda x: -float(ln_g(x)), bounds=(uu[k - 1], uu[k + 1]), method="bounded",
                              options={"xatol": 1e-12})
        self.visibility_peak_redshift = math.expm1(float(res.x))
        theta = state[1]
        below = np.nonzero(theta < dm.THERMAL_DECOUPLING_RATIO)[0]
        j = int(below[-1])
        if j + 1 < len(uu):
            lo, hi = uu[j], uu[j + 1]
        else:       # decoupled above z = 2500: search the dense output up to the top
            lo, hi = uu[-1], self.u_top
        u_dec = brentq(lambda x: float(self.sol(x)[1]) - dm.THERMAL_DECOUPLING_RATIO, lo, hi, xtol=1e-14)
        self.thermal_decoupling_redshift = math.expm1(u_dec)
        self.reionization_optical_depth = 0.0

    def _p(self, a: np.ndarray) -> np.ndarray:
        """a^4 E^2(a), vectorised."""
        h = self._hubble_vec(a)
        return (h / self.u.h0_si * a * a) ** 2

    def _sound_horizon(self, z: float) -> float:
        u = self.u
        a_top = 1.0 / (1.0 + z)
        f = lambda a: 1.0 / (np.sqrt(self._p(a)) * np.sqrt(3.0 * (1.0 + u.r0 * a)))  # noqa: E731
        return u.dh * fixed_quad(f, 0.0, a_top, n=64)[0]

    def summary(self) -> dict:
        return {n: float(getattr(self, n)) for n in SUMMARY}


if __name__ == "__main__":
    import time

    planck = dict(h0_km_s_mpc=67.36, omega_matter=0.3153, omega_baryon=0.02237 / 0.6736**2, n_eff=3.046,
                  neutrino_masses_ev=(0.06, 0.0, 0.0), cmb_temperature_k=2.7255, helium_mass_fraction=0.245)
    dm.fermi_dirac_ratio()
    ref = dm.ReferenceHistory(**planck, rtol=1e-10).summary()
    for rtol in (1e-5, 1e-6, 1e-7, 1e-8):
        t0 = time.perf_counter()
        h = CarefulHistory(**planck, rtol=rtol)
        s = h.summary()
        dt = time.perf_counter() - t0
        worst = max(abs(s[k] / ref[k] - 1.0) if ref[k] else abs(s[k]) for k in SUMMARY)
        print(f"rtol {rtol:g}: {dt * 1e3:.1f} ms, {h.n_steps} steps, {h.n_rhs} rhs; worst summary vs reference "
              f"{worst:.1e}; " + ", ".join(f"{k[:12]} {s[k] / ref[k] - 1.0 if ref[k] else s[k]:.1e}" for k in SUMMARY))
