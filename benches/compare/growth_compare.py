#!/usr/bin/env python3
"""Side-by-side speed and accuracy of structure growth: what a user would otherwise write, timed
in ONE run on the SAME inputs as relicore.

Universe: flat Lambda-CDM with photons and massless neutrinos (H0 = 70 km/s/Mpc, Omega_m = 0.3,
Omega_b = 0.05, T0 = 2.7255 K, N_eff = 3.044); the baselines' E(a) and densities are written here
from scipy.constants (CODATA 2022, exact SI values), independently of relicore.

1. Growth factor D and growth rate f at n redshifts (uniform in [0, 10], seeded):
     relicore            LinearGrowth(universe) built once (timed), then growth_factor(z) and
                         growth_rate(z) on the numpy array;
     BASELINE dense      scipy.integrate.solve_ivp (DOP853, rtol 1e-12, atol 1e-15,
                         dense_output=True) of D'' + (2 + dlnE/dN) D' = 1.5 Omega_m a^-3 E^-2 D in
                         N = ln a from a = 1e-6 (growing mode D = a + 2/3 a_eq, D' = a), then the
                         dense output at every redshift (vectorised);
     BASELINE grid       the same solve on a grid of 4001 points in N (t_eval), then numpy.interp
                         of D and D' to the redshifts.
   Accuracy: each method against relicore (which the reference vectors tie to an independent
   solve_ivp at rtol 1e-13 within 1e-11).
2. Linear matter power spectrum at n wavenumbers (log-uniform in [1e-4, 10] Mpc^-1) at z = 0.5,
     relicore            LinearPowerSpectrum.linear_power_spectrum_mpc3(k, z) on the array;
     BASELINE numpy      the Eisenstein & Hu 1998 (ApJ 496, 605, eqs. 2-24) transfer function with
                         baryon oscillations as a numpy expression (written here from the paper),
                         times the primordial spectrum and relicore's D_u(z) (a scalar).
3. sigma(R = 8/h Mpc, z = 0) of the same spectrum:
     relicore            density_rms_in_sphere(8/h, 0);
     BASELINE quad       scipy.integrate.quad over ln k of k^3 P(k) W(kR)^2 / (2 pi^2), P from the
                         numpy formula above (scalar calls), limit 500, epsrel 1e-10.
4. Leapfrog drift and kick factors of 10^4 steps uniform in ln a from a = 0.02 to 1:
     relicore            leapfrog_drift_factor_gyr(a[:-1], a[1:]) and the kick, one array call each;
     BASELINE quad loop  a Python loop of scipy.integrate.quad(1/(a^3 H)) and quad(1/(a^2 H)) per
                         step with default tolerances.

Targets (from the issue): 1. at most 1/3 of the baseline at its accuracy or better; 2. at most 1/2
of the numpy expression; 3. at least 100x quad; 4. at least 300x the quad loop. A benchmark, not
a test: nothing is asserted. Medians of interleaved repetitions; a shared 2-core machine varies by
tens of per cent between runs.
"""

from __future__ import annotations

import argparse
import math
import statistics
import time

import numpy as np
import scipy.constants as sc
from scipy.integrate import quad, solve_ivp

import relicore
from relicore import growth as rg

H0, OMEGA_M, OMEGA_B, T0, N_EFF = 70.0, 0.3, 0.05, 2.7255, 3.044
A_S, N_S = 2.1e-9, 0.965
KM_S = sc.c / 1000.0


# --- BASELINES, NOT relicore ------------------------------------------------------------------
def densities() -> tuple[float, float, float, float]:
    """(Omega_m, Omega_r, Omega_Lambda, t_H in Gyr) from scipy.constants."""
    h0_si = H0 * 1000.0 / (sc.parsec * 1e6)
    rho_c = 3 * h0_si**2 / (8 * math.pi * sc.G)
    a_rad = 4 * sc.Stefan_Boltzmann / sc.c
    omega_gamma = a_rad * T0**4 / sc.c**2 / rho_c
    omega_r = omega_gamma * (1 + N_EFF * 7 / 8 * (4 / 11) ** (4 / 3))
    t_h = 1 / h0_si / (sc.Julian_year * 1e9)
    return OMEGA_M, omega_r, 1 - OMEGA_M - omega_r, t_h


def growth_rhs(om: float, orad: float, ol: float):
    def rhs(n: float, y: np.ndarray) -> list[float]:
        a = math.exp(n)
        e2 = om / a**3 + orad / a**4 + ol
        dlne = (-3 * om / a**3 - 4 * orad / a**4) / (2 * e2)
        return [y[1], -(2 + dlne) * y[1] + 1.5 * om / (a**3 * e2) * y[0]]

    return rhs


def baseline_growth(z: np.ndarray, grid: bool) -> tuple[np.ndarray, np.ndarray]:
    om, orad, ol, _ = densities()
    a_i = 1e-6
    a_eq = orad / om
    y0 = [a_i + 2 / 3 * a_eq, a_i]
    n = -np.log1p(z)
    if grid:
        ng = np.linspace(math.log(a_i), 0.0, 4001)
        sol = solve_ivp(growth_rhs(om, orad, ol), (ng[0], 0.0), y0, method="DOP853", rtol=1e-12,
                        atol=1e-15, t_eval=ng)
        d, dp = np.interp(n, sol.t, sol.y[0]), np.interp(n, sol.t, sol.y[1])
        d1 = sol.y[0][-1]
    else:
        sol = solve_ivp(growth_rhs(om, orad, ol), (math.log(a_i), 0.0), y0, method="DOP853", rtol=1e-12,
                        atol=1e-15, dense_output=True)
        d, dp = sol.sol(n)
        d1 = sol.y[0][-1]
    return d / d1, dp / d


def eh_transfer(k: np.ndarray | float, om: float, ob: float, h: float, t0: float):
    """Eisenstein & Hu 1998 transfer function with baryon oscillations, eqs. 2-24 (numpy)."""
    th = t0 / 2.7
    wm, wb = om * h * h, ob * h * h
    fb, fc = ob / om, (om - ob) / om
    zeq = 2.50e4 * wm * th**-4
    keq = 7.46e-2 * wm * th**-2
    b1 = 0.313 * wm**-0.419 * (1 + 0.607 * wm**0.674)
    b2 = 0.238 * wm**0.223
    zd = 1291 * wm**0.251 / (1 + 0.659 * wm**0.828) * (1 + b1 * wb**b2)
    rd = 31.5 * wb * th**-4 * (zd / 1e3) ** -1
    req = 31.5 * wb * th**-4 * (zeq / 1e3) ** -1
    s = 2 / (3 * keq) * math.sqrt(6 / req) * math.log((math.sqrt(1 + rd) + math.sqrt(rd + req)) / (1 + math.sqrt(req)))
    ksilk = 1.6 * wb**0.52 * wm**0.73 * (1 + (10.4 * wm) ** -0.95)
    a1 = (46.9 * wm) ** 0.670 * (1 + (32.1 * wm) ** -0.532)
    a2 = (12.0 * wm) ** 0.424 * (1 + (45.0 * wm) ** -0.582)
    alpha_c = a1**-fb * a2 ** (-(fb**3))
    bb1 = 0.944 / (1 + (458 * wm) ** -0.708)
    bb2 = (0.395 * wm) ** -0.0266
    beta_c = 1 / (1 + bb1 * (fc**bb2 - 1))
    y = (1 + zeq) / (1 + zd)
    sq = math.sqrt(1 + y)
    gy = y * (-6 * sq + (2 + 3 * y) * math.log((sq + 1) / (sq - 1)))
    alpha_b = 2.07 * keq * s * (1 + rd) ** -0.75 * gy
    beta_node = 8.41 * wm**0.435
    beta_b = 0.5 + fb + (3 - 2 * fb) * math.sqrt((17.2 * wm) ** 2 + 1)
    q = k / (13.41 * keq)

    def t0t(alpha, beta):
        lg = np.log(math.e + 1.8 * beta * q)
        c = 14.2 / alpha + 386 / (1 + 69.9 * q**1.08)
        return lg / (lg + c * q * q)

    ks = k * s
    f = 1 / (1 + (ks / 5.4) ** 4)
    tc = f * t0t(1.0, beta_c) + (1 - f) * t0t(alpha_c, beta_c)
    st = s / (1 + (beta_node / ks) ** 3) ** (1 / 3)
    x = k * st
    tb = (t0t(1.0, 1.0) / (1 + (ks / 5.2) ** 2) + alpha_b / (1 + (beta_b / ks) ** 3) * np.exp(-((k / ksilk) ** 1.4))) * (
        np.sin(x) / x
    )
    return fb * tb + fc * tc


def eh_power(k, du: float):
    h = H0 / 100
    t = eh_transfer(k, OMEGA_M, OMEGA_B, h, T0)
    return 2 * math.pi**2 / k**3 * A_S * (k / 0.05) ** (N_S - 1) * (0.4 * (KM_S * k / H0) ** 2 * t * du / OMEGA_M) ** 2


def top_hat(x):
    return 3 * (math.sin(x) - x * math.cos(x)) / x**3


# ----------------------------------------------------------------------------------------------
def median_time(fn, reps: int) -> tuple[float, object]:
    times, out = [], None
    for _ in range(reps):
        t = time.perf_counter()
        out = fn()
        times.append(time.perf_counter() - t)
    return statistics.median(times), out


def rel_err(a, b) -> float:
    a, b = np.asarray(a, dtype=float), np.asarray(b, dtype=float)
    return float(np.max(np.abs(a - b) / np.abs(b)))


def main() -> None:
    ap = argparse.ArgumentParser()
    ap.add_argument("--n", type=int, default=10**6)
    ap.add_argument("--repetitions", type=int, default=5)
    ap.add_argument("--seed", type=int, default=11)
    args = ap.parse_args()
    rng = np.random.default_rng(args.seed)
    u = relicore.Universe(H0, OMEGA_M, omega_baryon=OMEGA_B, cmb_temperature_k=T0, n_eff=N_EFF)

    # 1. growth factor and rate
    z = rng.uniform(0.0, 10.0, args.n)

    def rc_growth():
        g = rg.LinearGrowth(u)
        return g.growth_factor(z), g.growth_rate(z)

    t_rc, (d_rc, f_rc) = median_time(rc_growth, args.repetitions)
    t_dense, (d_de, f_de) = median_time(lambda: baseline_growth(z, grid=False), args.repetitions)
    t_grid, (d_gr, f_gr) = median_time(lambda: baseline_growth(z, grid=True), args.repetitions)
    print(f"1. D and f at {args.n} redshifts (construction included)")
    print(f"   relicore       {t_rc * 1e3:9.2f} ms")
    print(f"   dense output   {t_dense * 1e3:9.2f} ms   ratio {t_rc / t_dense:.3f}   max rel. diff D {rel_err(d_de, d_rc):.1e}, f {rel_err(f_de, f_rc):.1e}")
    print(f"   grid + interp  {t_grid * 1e3:9.2f} ms   ratio {t_rc / t_grid:.3f}   max rel. diff D {rel_err(d_gr, d_rc):.1e}, f {rel_err(f_gr, f_rc):.1e}")
    print("   target: relicore <= 1/3 of the baseline at its accuracy or better")

    # 2. P(k) at n wavenumbers
    g = rg.LinearGrowth(u)
    ps = rg.LinearPowerSpectrum(g, scalar_amplitude=A_S, spectral_index=N_S, running=0.0)
    k = np.exp(rng.uniform(math.log(1e-4), math.log(10.0), args.n))
    zp = 0.5
    du = g.unnormalized_growth_factor(zp)
    t_prc, p_rc = median_time(lambda: ps.linear_power_spectrum_mpc3(k, zp), args.repetitions)
    t_pnp, p_np = median_time(lambda: eh_power(k, du), args.repetitions)
    print(f"2. P(k, z = 0.5) at {args.n} wavenumbers")
    print(f"   relicore       {t_prc * 1e3:9.2f} ms")
    print(f"   numpy formula  {t_pnp * 1e3:9.2f} ms   ratio {t_prc / t_pnp:.3f}   max rel. diff {rel_err(p_np, p_rc):.1e}")
    print("   target: relicore <= 1/2 of the numpy expression")

    # 3. sigma(8/h Mpc)
    r8 = 8.0 / (H0 / 100)
    du0 = g.unnormalized_growth_factor(0.0)

    def sig_quad():
        def integrand(lnk):
            kk = math.exp(lnk)
            w = top_hat(kk * r8)
            return kk**3 * float(eh_power(kk, du0)) * w * w / (2 * math.pi**2)

        v, _ = quad(integrand, math.log(1e-5), math.log(1e3), limit=500, epsrel=1e-10, epsabs=0.0)
        return math.sqrt(v)

    t_src, s_rc = median_time(lambda: ps.density_rms_in_sphere(r8, 0.0), args.repetitions)
    t_sq, s_q = median_time(sig_quad, max(1, args.repetitions // 2))
    print("3. sigma(8/h Mpc, z = 0)")
    print(f"   relicore       {t_src * 1e6:9.1f} us")
    print(f"   quad           {t_sq * 1e6:9.1f} us   ratio {t_sq / t_src:.0f}x   rel. diff {abs(s_q - s_rc) / s_rc:.1e}")
    print("   target: relicore >= 100x quad")

    # 4. leapfrog factors
    a = np.exp(np.linspace(math.log(0.02), 0.0, 10**4 + 1))
    om, orad, ol, t_h = densities()

    def hub(x):
        return math.sqrt(om / x**3 + orad / x**4 + ol)

    def rc_steps():
        return g.leapfrog_drift_factor_gyr(a[:-1], a[1:]), g.leapfrog_kick_factor_gyr(a[:-1], a[1:])

    def quad_steps(m: int):
        dr = [t_h * quad(lambda x: 1 / (x**3 * hub(x)), a[i], a[i + 1])[0] for i in range(m)]
        ki = [t_h * quad(lambda x: 1 / (x**2 * hub(x)), a[i], a[i + 1])[0] for i in range(m)]
        return np.array(dr), np.array(ki)

    t_lrc, (dr_rc, ki_rc) = median_time(rc_steps, args.repetitions)
    m = 1000
    t_lq, (dr_q, ki_q) = median_time(lambda: quad_steps(m), 1)
    t_lq *= 10**4 / m
    print("4. leapfrog drift and kick of 10^4 steps")
    print(f"   relicore       {t_lrc * 1e3:9.3f} ms")
    print(f"   quad loop      {t_lq * 1e3:9.1f} ms (timed on {m} steps, scaled)   ratio {t_lq / t_lrc:.0f}x   "
          f"max rel. diff drift {rel_err(dr_q, dr_rc[:m]):.1e}, kick {rel_err(ki_q, ki_rc[:m]):.1e}")
    print("   target: relicore >= 300x the quad loop")


if __name__ == "__main__":
    main()
