#!/usr/bin/env python3
"""Side-by-side time of one whole thermal history and its summary.

In ONE run, for the SAME universe (flat, H0 = 67.36 km/s/Mpc, Omega_m = 0.3153 with one 0.06 eV
neutrino, Omega_b h^2 = 0.02237, T0 = 2.7255 K, N_eff = 3.046, Y_p = 0.245; no reionisation):

  relicore                  relicore.decoupling.ThermalHistory(u), then reading all ten summary
                            attributes (z*, z_drag, both sound horizons, theta*, age and
                            temperature at z*, visibility peak, thermal decoupling, reionisation
                            optical depth);
  careful scipy             NOT relicore: benches/compare/decoupling_baseline.py, the STRONG
  (BASELINE)                baseline: what a careful scientist writes with scipy for the same
                            equations (Radau with the analytic Jacobian, closed-form helium balance,
                            the background tabulated once and splined, a sensible first step,
                            optical depths and roots vectorised after the solve, Gauss-Legendre
                            distances), at rtol 1e-6 and 1e-7;
  scipy reference           NOT relicore: tests/reference/decoupling_model.py, the independent
  (BASELINE)                implementation that writes the reference vectors (Radau with an
                            analytic Jacobian, helium by Newton at every step, optical depths by
                            Gauss-Legendre on every step, quad distances): written for accuracy,
                            not speed, at its reference tolerance rtol = 1e-10 (x_e, T_m good to
                            ~2e-11), which is also the yardstick of every accuracy column.

The universe is constructed once, outside the clock, for both (the baseline's Fermi-Dirac table
for the massive neutrino is also built before the clock starts). Each method runs several times,
interleaved, and the median and the fastest run are reported with the ratios; the summary of
relicore and of each baseline is compared with the rtol-1e-10 reference (largest relative
difference of the ten summary quantities): a faster baseline is only a fair one at a similar
accuracy, so the accuracy stands beside every time.

This is a benchmark, not a test: nothing is asserted. Timings on a shared 2-core machine vary by
tens of per cent from run to run.

Usage (benches/compare/run.sh does this): decoupling_compare.py [--repetitions R]
[--relicore-repetitions N]
"""

from __future__ import annotations

import argparse
import pathlib
import statistics
import sys
import time

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "tests" / "reference"))

import decoupling_model as dm  # noqa: E402  (the baseline: NOT relicore)

sys.path.insert(0, str(ROOT / "benches" / "compare"))
import decoupling_baseline as careful  # noqa: E402  (the strong baseline: NOT relicore)

import relicore  # noqa: E402
from relicore import decoupling  # noqa: E402

PARAMS = dict(h0_km_s_mpc=67.36, omega_matter=0.3153, omega_baryon=0.02237 / 0.6736**2, cmb_temperature_k=2.7255,
              n_eff=3.046, neutrino_masses_ev=(0.06, 0.0, 0.0), helium_mass_fraction=0.245)
SUMMARY = dm.SUMMARY_NAMES


def relicore_once(u) -> dict:
    h = decoupling.ThermalHistory(u)
    return {name: getattr(h, name) for name in SUMMARY}


def baseline_once(kind: str, rtol: float) -> dict:
    if kind == "careful":
        return careful.CarefulHistory(**PARAMS, rtol=rtol).summary()
    return dm.ReferenceHistory(**PARAMS, rtol=rtol).summary()


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--repetitions", type=int, default=5, help="runs of each scipy baseline")
    ap.add_argument("--relicore-repetitions", type=int, default=200, help="relicore runs per baseline run")
    args = ap.parse_args()
    t_start = time.perf_counter()

    u = relicore.Universe(**PARAMS)
    dm.fermi_dirac_ratio()
    relicore_once(u)                       # warm-up
    baselines = {"careful rtol 1e-6": ("careful", 1e-6), "careful rtol 1e-7": ("careful", 1e-7),
                 "scipy rtol 1e-10": ("reference", 1e-10)}
    times = {"relicore": [], **{k: [] for k in baselines}}
    results = {}
    for _ in range(args.repetitions):
        # interleaved, so that every method sees the same machine load
        for _ in range(args.relicore_repetitions):
            t0 = time.perf_counter()
            results["relicore"] = relicore_once(u)
            times["relicore"].append(time.perf_counter() - t0)
        for name, (kind, rtol) in baselines.items():
            t0 = time.perf_counter()
            results[name] = baseline_once(kind, rtol)
            times[name].append(time.perf_counter() - t0)

    median = {k: statistics.median(v) for k, v in times.items()}
    fastest = {k: min(v) for k, v in times.items()}
    ref = results["scipy rtol 1e-10"]

    def max_rel(res: dict) -> float:
        worst = 0.0
        for name in SUMMARY:
            want = ref[name]
            if want == 0.0:
                worst = max(worst, abs(res[name]))
            else:
                worst = max(worst, abs(res[name] / want - 1.0))
        return worst

    print(f"one thermal history and its summary (no reionisation, highest redshift 1e4); H0 = {PARAMS['h0_km_s_mpc']}, "
          f"Omega_m = {PARAMS['omega_matter']}, Omega_b h^2 = 0.02237, m_nu = 0.06 eV; relicore {relicore.__version__}")
    labels = {
        "relicore": "relicore  decoupling.ThermalHistory(u) + 10 summary attributes",
        "careful rtol 1e-6": "BASELINE  careful scipy (Radau, analytic Jacobian), rtol 1e-6",
        "careful rtol 1e-7": "BASELINE  careful scipy (Radau, analytic Jacobian), rtol 1e-7",
        "scipy rtol 1e-10": "BASELINE  scipy reference of the vectors, rtol 1e-10",
    }
    width = max(len(v) for v in labels.values())
    head = f"{'method':<{width}}  {'median':>11}  {'fastest':>11}  {'x relicore':>10}  {'summary vs rtol 1e-10':>21}"
    print()
    print(head)
    print("-" * len(head))
    for name, label in labels.items():
        print(f"{label:<{width}}  {median[name] * 1e3:8.3f} ms  {fastest[name] * 1e3:8.3f} ms  "
              f"{median[name] / median['relicore']:10.1f}  {max_rel(results[name]):21.2e}")
    print("-" * len(head))
    print("BASELINE = benches/compare/decoupling_baseline.py (careful) and tests/reference/decoupling_model.py "
          "(reference): independent scipy implementations, NOT relicore.")
    print(f"median/fastest of {len(times['relicore'])} relicore runs and {args.repetitions} runs of each baseline, "
          "interleaved; summary vs rtol 1e-10: largest relative difference of the ten summary quantities "
          "from the rtol-1e-10 baseline (absolute for the reionisation optical depth, which is 0).")
    print()
    for name in baselines:
        speedup = median[name] / median["relicore"]
        print(f"{name} / relicore time = {speedup:,.0f}x  (summary accuracy: baseline {max_rel(results[name]):.1e}, "
              f"relicore {max_rel(results['relicore']):.1e})")
    print(f"(benchmark, not a test; nothing is asserted about speed; run took {time.perf_counter() - t_start:.1f} s)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
