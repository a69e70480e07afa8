#!/usr/bin/env python3
"""Per-call cost of the Python face on small and large arrays, against the numpy expression.

In ONE run, on the SAME inputs (n wavelengths log-spaced 0.2-200 µm at 1500 K, float64):

  relicore                relicore.blackbody.spectral_radiance_wavelength(wavelengths, 1500.0)
  numpy (expm1)           BASELINE, NOT relicore: the numpy expression a user would otherwise
                          write, 2hc²/λ⁵ / np.expm1(hc/(λkT)), the more accurate of the two
                          textbook forms (benches/compare/compare.py reports both and their
                          accuracy)
  numpy ufunc             REFERENCE POINT, NOT relicore: one numpy ufunc call (np.exp) on the
                          same array, the floor of what any numpy function costs

for n = 1, 10, 100, 1000, 10⁴, 10⁶; then a scalar call (Python floats in, a float out) of
relicore, of the same expression on Python floats with math.expm1 (BASELINE) and of
Universe.luminosity_distance_mpc on a scalar and on 100 redshifts. It also times float32 input
(computed by the core's single-precision twin and returned as float32).

Each timing is the best of several repetitions of a loop long enough to take about 20 ms
(timeit's convention: the minimum is the least disturbed run); repetitions of the methods are
interleaved. Reports the time per call and the ratio relicore / numpy expression. A benchmark,
not a test: nothing asserts on speed. On a shared 2-core machine the numbers move by tens of per
cent from run to run; read the ratios.

Usage: python benches/compare/small_arrays_compare.py [--repetitions R]
"""

from __future__ import annotations

import argparse
import math
import timeit

import numpy as np

import relicore
import relicore.blackbody as bb

# Exact SI 2019 values of the defining constants (used by the baseline).
H = 6.62607015e-34
C = 299792458.0
K = 1.380649e-23


# --- BASELINES, NOT relicore -----------------------------------------------------------------
def numpy_expm1(wavelength_m, temperature_k):
    """BASELINE (what a user would write in numpy)."""
    return 2 * H * C**2 / wavelength_m**5 / np.expm1(H * C / (wavelength_m * K * temperature_k))


def math_expm1(wavelength_m: float, temperature_k: float) -> float:
    """BASELINE (what a user would write for one value in plain Python)."""
    return 2 * H * C**2 / wavelength_m**5 / math.expm1(H * C / (wavelength_m * K * temperature_k))


def best_time(fn, repetitions: int) -> float:
    """Seconds per call: the best of `repetitions` loops of about 20 ms each."""
    timer = timeit.Timer(fn)
    number, _ = timer.autorange()
    number = max(1, number // 10)
    return min(timer.repeat(repeat=repetitions, number=number)) / number


def interleaved(methods: dict, repetitions: int) -> dict:
    """Best time per call of each method, their repetitions interleaved (one pass each round)."""
    best = {name: math.inf for name in methods}
    for _ in range(repetitions):
        for name, fn in methods.items():
            best[name] = min(best[name], best_time(fn, 1))
    return best


def fmt(seconds: float) -> str:
    if seconds < 1e-3:
        return f"{seconds * 1e6:9.2f} µs"
    return f"{seconds * 1e3:9.2f} ms"


def main() -> int:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--repetitions", type=int, default=5)
    args = parser.parse_args()
    r = args.repetitions
    t = 1500.0
    print(f"relicore {relicore.__version__}, numpy {np.__version__}; best of {r} interleaved repetitions")
    print()
    print(f"{'n':>8} {'relicore':>12} {'numpy expr':>12} {'np.exp':>12} {'ratio':>7} {'f32 relicore':>13} {'f32 numpy':>12}")
    for n in (1, 10, 100, 1000, 10**4, 10**6):
        lam = np.geomspace(0.2e-6, 200e-6, n)
        lam32 = lam.astype(np.float32)
        t32 = np.float32(t)
        assert np.allclose(bb.spectral_radiance_wavelength(lam, t), numpy_expm1(lam, t), rtol=1e-12)
        reps = r if n < 10**6 else max(3, r // 2)
        best = interleaved(
            {
                "relicore": lambda: bb.spectral_radiance_wavelength(lam, t),
                "numpy": lambda: numpy_expm1(lam, t),
                "ufunc": lambda: np.exp(lam),
                "relicore32": lambda: bb.spectral_radiance_wavelength(lam32, t),
                "numpy32": lambda: numpy_expm1(lam32, t32),
            },
            reps,
        )
        ratio = best["relicore"] / best["numpy"]
        print(
            f"{n:>8} {fmt(best['relicore'])} {fmt(best['numpy'])} {fmt(best['ufunc'])} {ratio:7.2f}"
            f" {fmt(best['relicore32'])}  {fmt(best['numpy32'])}"
        )
    print()
    u = relicore.Universe(h0_km_s_mpc=67.4, omega_matter=0.315)
    z100 = np.linspace(0.01, 3.0, 100)
    best = interleaved(
        {
            "relicore scalar": lambda: bb.spectral_radiance_wavelength(1e-5, t),
            "math.expm1 scalar (BASELINE)": lambda: math_expm1(1e-5, t),
            "numpy expression on floats (BASELINE)": lambda: numpy_expm1(1e-5, t),
            "Universe.luminosity_distance_mpc scalar": lambda: u.luminosity_distance_mpc(1.0),
            "Universe.luminosity_distance_mpc 100 z": lambda: u.luminosity_distance_mpc(z100),
        },
        r,
    )
    for name, s in best.items():
        print(f"{name:<42} {fmt(s)}")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
