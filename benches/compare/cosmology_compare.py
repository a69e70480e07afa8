#!/usr/bin/env python3
"""Side-by-side speed and accuracy of the luminosity distance of a catalogue of redshifts.

In ONE run, on the SAME inputs (n random redshifts, uniform in [0.01, 3], seeded; a flat
Lambda-CDM universe with photons and massless neutrinos, H0 = 70 km/s/Mpc, Omega_m = 0.3,
T0 = 2.7255 K, N_eff = 3.044):

  relicore                relicore.Universe.luminosity_distance_mpc on the numpy array;
  grid recipe (BASELINE)  NOT relicore: what an analyst writes instead -- E(z) as a numpy
                          expression, scipy.integrate.cumulative_trapezoid of 1/E on a 4001-point
                          grid in z from 0 to 3, numpy.interp to the catalogue, times (1+z) D_H
                          (the whole recipe is timed: grid, integral and interpolation);
  quad loop (BASELINE)    NOT relicore: a Python loop calling scipy.integrate.quad(1/E, 0, z)
                          with its default tolerances for each redshift, timed on a subsample of
                          the catalogue and scaled to the whole per element.

The baselines' E(z) and density parameters are written here from scipy.constants (CODATA 2022,
the exact SI values): Omega_gamma = 4 sigma T0^4/c^3/rho_crit, each massless neutrino species
(7/8)(4/11)^(4/3) of it per species, Omega_Lambda = 1 - Omega_m - Omega_r.

Each timed method runs several times (repetitions interleaved) and the median is reported, with
the ratios. Accuracy: the relative error of each method against an mpmath reference (30 digits,
its own quadrature of the same definition, written here) on an evenly spaced subsample of the
redshifts; the quad loop is also compared with relicore on its whole subsample.

Targets (from the issue): relicore at most 1/3 of the grid recipe's time, and at least 1000x
faster than the quad loop per element. This is a benchmark, not a test: nothing is asserted.
Timings on a shared 2-core machine vary by tens of per cent from run to run.

Usage (benches/compare/run.sh does this): cosmology_compare.py [--n N] [--repetitions R]
[--quad-samples Q] [--samples S] [--seed SEED]
"""

from __future__ import annotations

import argparse
import math
import statistics
import sys
import time

import mpmath as mp
import numpy as np
import scipy.constants as sc
from scipy.integrate import cumulative_trapezoid, quad

import relicore

H0 = 70.0
OMEGA_M = 0.3
T0 = 2.7255
N_EFF = 3.044
Z_MIN, Z_MAX = 0.01, 3.0
GRID_POINTS = 4001


# --- BASELINES, NOT relicore: what an analyst writes instead ---------------------------------
def baseline_densities() -> tuple[float, float, float, float]:
    """BASELINE: (Omega_m, Omega_r, Omega_Lambda, D_H in Mpc) from scipy.constants."""
    h0_si = H0 * 1000.0 / (sc.parsec * 1e6)
    rho_crit = 3.0 * h0_si**2 / (8.0 * math.pi * sc.G)
    omega_gamma = 4.0 * sc.Stefan_Boltzmann * T0**4 / sc.c**3 / rho_crit
    omega_r = omega_gamma * (1.0 + N_EFF * 7.0 / 8.0 * (4.0 / 11.0) ** (4.0 / 3.0))
    return OMEGA_M, omega_r, 1.0 - OMEGA_M - omega_r, sc.c / 1000.0 / H0


OM, OR, OL, DH = baseline_densities()


def baseline_e(z):
    """BASELINE: E(z) of flat Lambda-CDM with radiation, as a numpy expression."""
    opz = 1.0 + z
    return np.sqrt(OM * opz**3 + OR * opz**4 + OL)


def grid_recipe(z: np.ndarray) -> np.ndarray:
    """BASELINE: cumulative trapezoid of 1/E on a 4001-point grid, then numpy.interp."""
    grid = np.linspace(0.0, Z_MAX, GRID_POINTS)
    dc_grid = cumulative_trapezoid(1.0 / baseline_e(grid), grid, initial=0.0)
    return np.interp(z, grid, dc_grid) * (1.0 + z) * DH


def quad_loop(z: np.ndarray) -> np.ndarray:
    """BASELINE: scipy.integrate.quad of 1/E for each redshift (default tolerances)."""
    out = np.empty(len(z))
    for i, zi in enumerate(z.tolist()):
        out[i] = quad(lambda x: 1.0 / math.sqrt(OM * (1 + x) ** 3 + OR * (1 + x) ** 4 + OL), 0.0, zi)[0]
    return out * (1.0 + z) * DH


# --- the reference (mpmath, 30 digits), also written here -------------------------------------
def mpmath_reference(z: np.ndarray) -> np.ndarray:
    """D_L = (1+z) D_H int_0^z dz'/E by mpmath at 30 digits, from the exact SI constants, CODATA
    2022 G and the IAU au (the definition the core documents)."""
    mp.mp.dps = 30
    c = mp.mpf(299792458)
    h = mp.mpf("6.62607015e-34")
    k = mp.mpf("1.380649e-23")
    g = mp.mpf("6.67430e-11")
    mpc = mp.mpf(149597870700) * 648000 / mp.pi * mp.mpf(10) ** 6
    h0 = mp.mpf(H0) * 1000 / mpc
    rho_crit = 3 * h0**2 / (8 * mp.pi * g)
    hbar = h / (2 * mp.pi)
    a_rad = mp.pi**2 * k**4 / (15 * hbar**3 * c**3)
    omega_gamma = a_rad * mp.mpf(T0) ** 4 / c**2 / rho_crit
    omega_r = omega_gamma * (1 + mp.mpf(N_EFF) * mp.mpf(7) / 8 * (mp.mpf(4) / 11) ** (mp.mpf(4) / 3))
    om = mp.mpf(OMEGA_M)
    ol = 1 - om - omega_r
    dh = c / 1000 / mp.mpf(H0)

    def inv_e(x):
        return 1 / mp.sqrt(om * (1 + x) ** 3 + omega_r * (1 + x) ** 4 + ol)

    out = np.empty(len(z))
    for i, zi in enumerate(z.tolist()):
        zz = mp.mpf(zi)
        out[i] = float((1 + zz) * dh * mp.quad(inv_e, [0, zz]))
    return out


def timed(fn, arg, repetitions: int) -> tuple[list[float], np.ndarray]:
    result = fn(arg)
    times = []
    for _ in range(repetitions):
        t0 = time.perf_counter()
        result = fn(arg)
        times.append(time.perf_counter() - t0)
    return times, result


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--n", type=int, default=1_000_000)
    ap.add_argument("--repetitions", type=int, default=15)
    ap.add_argument("--quad-samples", type=int, default=1000)
    ap.add_argument("--samples", type=int, default=200, help="redshifts compared with mpmath")
    ap.add_argument("--seed", type=int, default=20260806)
    args = ap.parse_args()
    t_start = time.perf_counter()

    rng = np.random.default_rng(args.seed)
    z = rng.uniform(Z_MIN, Z_MAX, args.n)
    u = relicore.Universe(H0, OMEGA_M, cmb_temperature_k=T0, n_eff=N_EFF)
    quad_idx = np.unique(np.linspace(0, args.n - 1, args.quad_samples).round().astype(np.int64))
    z_quad = z[quad_idx]

    print(
        f"luminosity distance of n = {args.n:,} random redshifts uniform in [{Z_MIN}, {Z_MAX}] (seed {args.seed}); "
        f"flat Lambda-CDM with radiation: H0 = {H0}, Omega_m = {OMEGA_M}, T0 = {T0} K, N_eff = {N_EFF}; "
        f"relicore {relicore.__version__}"
    )
    # interleave the array methods so that both see the same machine load
    times = {"relicore": [], "grid": []}
    results = {"relicore": u.luminosity_distance_mpc(z), "grid": grid_recipe(z)}
    for _ in range(args.repetitions):
        for name, fn in (("relicore", u.luminosity_distance_mpc), ("grid", grid_recipe)):
            t0 = time.perf_counter()
            results[name] = fn(z)
            times[name].append(time.perf_counter() - t0)
    quad_reps = max(3, args.repetitions // 5)
    quad_times, quad_result = timed(quad_loop, z_quad, quad_reps)
    per_element = {
        "relicore": statistics.median(times["relicore"]) / args.n,
        "grid": statistics.median(times["grid"]) / args.n,
        "quad": statistics.median(quad_times) / len(z_quad),
    }
    fastest = {
        "relicore": min(times["relicore"]) / args.n,
        "grid": min(times["grid"]) / args.n,
        "quad": min(quad_times) / len(z_quad),
    }

    ref_idx = np.unique(np.linspace(0, args.n - 1, args.samples).round().astype(np.int64))
    want = mpmath_reference(z[ref_idx])
    # the quad loop's values at the mpmath samples: computed once more on exactly those
    quad_at_ref = quad_loop(z[ref_idx])
    rel = {
        "relicore": np.max(np.abs(results["relicore"][ref_idx] / want - 1)),
        "grid": np.max(np.abs(results["grid"][ref_idx] / want - 1)),
        "quad": np.max(np.abs(quad_at_ref / want - 1)),
    }
    quad_vs_relicore = np.max(np.abs(quad_result / results["relicore"][quad_idx] - 1))

    labels = {
        "relicore": "relicore  Universe.luminosity_distance_mpc, numpy array",
        "grid": f"BASELINE  cumulative_trapezoid on {GRID_POINTS} points + numpy.interp",
        "quad": f"BASELINE  scipy.integrate.quad loop ({len(z_quad)} redshifts, scaled)",
    }
    width = max(len(v) for v in labels.values())
    head = (
        f"{'method':<{width}}  {'time for n':>11}  {'ns/value':>10}  {'min ns/value':>12}  {'x relicore':>10}"
        f"  {'max rel. error':>14}"
    )
    print()
    print(head)
    print("-" * len(head))
    for name, label in labels.items():
        total = per_element[name] * args.n
        total_text = f"{total * 1e3:8.1f} ms" if total < 10 else f"{total:8.1f} s "
        ratio = per_element[name] / per_element["relicore"]
        print(
            f"{label:<{width}}  {total_text:>11}  {per_element[name] * 1e9:10.1f}  {fastest[name] * 1e9:12.1f}"
            f"  {ratio:10.1f}  {rel[name]:14.2e}"
        )
    print("-" * len(head))
    print("BASELINE = what an analyst writes instead, with E(z) from scipy.constants: NOT relicore.")
    print(
        f"time for n, ns/value: median of {args.repetitions} interleaved runs (min ns/value: the fastest run) (quad loop: median of {quad_reps} runs on "
        f"{len(z_quad)} redshifts, times n/{len(z_quad)}); max rel. error: against mpmath (30 digits, its own "
        f"quadrature of the same definition) on {len(ref_idx)} of the redshifts, evenly spaced."
    )
    print()
    ratio_grid = per_element["relicore"] / per_element["grid"]
    speedup_quad = per_element["quad"] / per_element["relicore"]
    print(
        f"relicore / grid recipe time = {ratio_grid:.3f}  (target <= 0.333: "
        f"{'met' if ratio_grid <= 1 / 3 else 'NOT met'})"
    )
    print(
        f"quad loop / relicore time per element = {speedup_quad:,.0f}x  (target >= 1000x: "
        f"{'met' if speedup_quad >= 1000 else 'NOT met'})"
    )
    print(f"quad loop against relicore on its {len(z_quad)} redshifts: max relative difference {quad_vs_relicore:.2e}")
    print(f"(benchmark, not a test; nothing is asserted about speed; run took {time.perf_counter() - t_start:.1f} s)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
