#!/usr/bin/env python3
"""Side-by-side speed and accuracy of Planck's spectral radiance per wavelength over one array.

In ONE run, on the SAME inputs (n wavelengths log-spaced 0.2-200 µm at one temperature):

  relicore C ABI          relicore_spectral_radiance_wavelength_array from a C driver (-O3,
                          linked against target/release-c/librelicore.a), see planck_c.c;
  C loop (exp / expm1)    BASELINES, NOT relicore: the textbook formula a user would otherwise
                          write in C, a plain -O3 loop calling exp (or expm1), see planck_c.c;
  relicore Python         relicore.blackbody.spectral_radiance_wavelength on a numpy array;
  numpy (exp / expm1)     BASELINES, NOT relicore: the numpy expression a user would otherwise
                          write, 2hc²/λ**5 / (np.exp(hc/(λkT)) − 1) or with np.expm1.

Each method is timed several times (repetitions interleaved between methods) and the median
is reported, with the ratios relicore/C loop and relicore/numpy. Accuracy is measured against
an mpmath reference (50 digits, exact SI h, c, k) on an evenly spaced subsample of the same
inputs, as the error in units in the last place (ulp) of the correctly rounded result.

This is a benchmark, not a test: it asserts nothing about speed. Timings on a shared 2-core
machine vary by tens of per cent from run to run; read the ratios, not the digits.

Usage (benches/compare/run.sh does this): compare.py --c-driver PATH [--n N] [--temperature T]
[--repetitions R] [--samples S] [--work-dir DIR]
"""

from __future__ import annotations

import argparse
import statistics
import subprocess
import sys
import time
from pathlib import Path

import mpmath as mp
import numpy as np

import relicore
import relicore.blackbody as bb

# Exact SI 2019 values of the defining constants (used by the baselines and the reference).
H = 6.62607015e-34
C = 299792458.0
K = 1.380649e-23


# --- BASELINES, NOT relicore: the numpy expressions a user would otherwise write -------------
def numpy_exp(wavelength_m: np.ndarray, temperature_k: float) -> np.ndarray:
    """BASELINE (what a user would write in numpy), exp form."""
    return 2 * H * C**2 / wavelength_m**5 / (np.exp(H * C / (wavelength_m * K * temperature_k)) - 1)


def numpy_expm1(wavelength_m: np.ndarray, temperature_k: float) -> np.ndarray:
    """BASELINE (what a user would write in numpy), expm1 form."""
    return 2 * H * C**2 / wavelength_m**5 / np.expm1(H * C / (wavelength_m * K * temperature_k))


def relicore_python(wavelength_m: np.ndarray, temperature_k: float) -> np.ndarray:
    """relicore through its Python face."""
    return bb.spectral_radiance_wavelength(wavelength_m, temperature_k)


PY_METHODS = [
    ("relicore_python", relicore_python),
    ("numpy_exp", numpy_exp),
    ("numpy_expm1", numpy_expm1),
]

LABELS = {
    "relicore_c_abi": "relicore  C ABI array function, C driver -O3",
    "c_loop_exp": "BASELINE  C loop with exp, -O3",
    "c_loop_expm1": "BASELINE  C loop with expm1, -O3",
    "relicore_python": "relicore  Python, numpy array in and out",
    "numpy_exp": "BASELINE  numpy expression with np.exp",
    "numpy_expm1": "BASELINE  numpy expression with np.expm1",
}


def time_python(wavelength_m: np.ndarray, temperature_k: float, repetitions: int) -> tuple[dict, dict]:
    """Median and minimum seconds of each Python method, and each method's last result."""
    times: dict[str, list[float]] = {name: [] for name, _ in PY_METHODS}
    results = {name: fn(wavelength_m, temperature_k) for name, fn in PY_METHODS}  # warm-up
    for _ in range(repetitions):
        for name, fn in PY_METHODS:
            t0 = time.perf_counter()
            results[name] = fn(wavelength_m, temperature_k)
            times[name].append(time.perf_counter() - t0)
    stats = {name: (statistics.median(v), min(v)) for name, v in times.items()}
    return stats, results


def run_c_driver(driver: str, inputs: Path, temperature_k: float, repetitions: int, work: Path) -> dict:
    proc = subprocess.run(
        [driver, str(inputs), repr(temperature_k), str(repetitions), str(work)],
        check=True,
        capture_output=True,
        text=True,
    )
    stats = {}
    for line in proc.stdout.splitlines():
        parts = line.split()
        if parts and parts[0] == "timing":
            stats[parts[1]] = (float(parts[2]), float(parts[3]))
    return stats


def ulp_errors(samples_m: np.ndarray, temperature_k: float, values: dict[str, np.ndarray]) -> dict[str, np.ndarray]:
    """Error of each method against mpmath at each sample point, counted as the project's
    tolerance table counts it (tests/data/FORMAT.md): |got - want| / ulp(want), with want the
    correctly rounded mpmath value (50 digits, exact SI h, c, k) and ulp(want) its spacing."""
    mp.mp.dps = 50
    h, c, k, t = mp.mpf("6.62607015e-34"), mp.mpf(299792458), mp.mpf("1.380649e-23"), mp.mpf(temperature_k)
    want = np.empty(len(samples_m))
    for i, lam in enumerate(samples_m):
        lam_mp = mp.mpf(float(lam))  # the double, exactly
        want[i] = float(2 * h * c**2 / lam_mp**5 / mp.expm1(h * c / (lam_mp * k * t)))
    ulp = np.spacing(np.abs(want))
    # exact: both are doubles within a few ulp of each other
    return {name: np.abs(np.asarray(v, dtype=np.float64) - want) / ulp for name, v in values.items()}


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--c-driver", required=True)
    ap.add_argument("--n", type=int, default=1_000_000)
    ap.add_argument("--temperature", type=float, default=1500.0)
    ap.add_argument("--repetitions", type=int, default=21)
    ap.add_argument("--samples", type=int, default=2000)
    ap.add_argument("--work-dir", default="build/bench")
    args = ap.parse_args()

    work = Path(args.work_dir)
    work.mkdir(parents=True, exist_ok=True)
    wavelength_m = np.geomspace(0.2e-6, 200e-6, args.n)
    inputs = work / "wavelengths.f64"
    wavelength_m.astype("=f8").tofile(inputs)
    t = args.temperature

    print(
        f"Planck B_lambda for n = {args.n:,} wavelengths log-spaced 0.2-200 µm at T = {t:g} K "
        f"(x = hc/λkT from {H * C / (200e-6 * K * t):.3g} to {H * C / (0.2e-6 * K * t):.3g}); "
        f"median of {args.repetitions} interleaved repetitions; relicore {relicore.__version__}"
    )
    t_start = time.perf_counter()
    c_stats = run_c_driver(args.c_driver, inputs, t, args.repetitions, work)
    py_stats, py_results = time_python(wavelength_m, t, args.repetitions)
    stats = {**c_stats, **py_stats}

    idx = np.unique(np.linspace(0, args.n - 1, args.samples).round().astype(np.int64))
    values = {name: np.fromfile(work / f"{name}.f64", dtype="=f8")[idx] for name in c_stats}
    values.update({name: np.asarray(r)[idx] for name, r in py_results.items()})
    errors = ulp_errors(wavelength_m[idx], t, values)
    acc = {name: (float(e.max()), float(np.median(e)), float(np.mean(e == 0))) for name, e in errors.items()}
    # where the errors come from: the Planck exponent x = hc/(lambda k T) of each sample
    x = H * C / (wavelength_m[idx] * K * t)
    regions = [("<1", x < 1), ("1-10", (x >= 1) & (x <= 10)), (">10", x > 10)]
    same_bits = np.array_equal(
        np.fromfile(work / "relicore_c_abi.f64", dtype="=f8").view(np.uint64),
        np.asarray(py_results["relicore_python"]).view(np.uint64),
    )

    width = max(len(v) for v in LABELS.values())
    head = (
        f"{'method':<{width}}  {'median ms':>9}  {'min ms':>6}  {'ns/value':>8}  {'max ulp':>7}  {'median ulp':>10}"
        f"  {'exact':>6}  " + "  ".join(f"{'x ' + r:>6}" for r, _ in regions)
    )
    print()
    print(head)
    print("-" * len(head))
    for name, label in LABELS.items():
        if name not in stats:
            continue
        med, fastest = stats[name]
        max_ulp, med_ulp, exact = acc[name]
        print(
            f"{label:<{width}}  {med * 1e3:9.2f}  {fastest * 1e3:6.2f}  {med / args.n * 1e9:8.2f}"
            f"  {max_ulp:7.0f}  {med_ulp:10.1f}  {exact * 100:5.1f}%  "
            + "  ".join(f"{errors[name][m].max():6.0f}" for _, m in regions)
        )
    print("-" * len(head))
    print("BASELINE = the formula a user would otherwise write (plain C loop, numpy expression): NOT relicore.")
    print(
        f"ulp = |result - correctly rounded mpmath value (50 digits)| in ulps of that value, on {len(idx)} of the "
        f"{args.n:,} inputs, evenly spaced;\nexact = share of those results that are correctly rounded; x <1, x 1-10, x >10 = "
        f"max ulp where the Planck exponent x = hc/(λkT) is in that range "
        f"({', '.join(f'{int(m.sum())} samples with x {r}' for r, m in regions)})."
    )
    print()
    print("time ratios (median / median; > 1 means relicore is slower):")
    for num, den in [
        ("relicore_c_abi", "c_loop_exp"),
        ("relicore_c_abi", "c_loop_expm1"),
        ("relicore_python", "numpy_exp"),
        ("relicore_python", "numpy_expm1"),
        ("relicore_python", "relicore_c_abi"),
    ]:
        if num in stats and den in stats:
            print(f"  {num:<16} / {den:<15} = {stats[num][0] / stats[den][0]:6.2f}")
    best_baseline = min(acc[n][0] for n in acc if not n.startswith("relicore"))
    worst_relicore = max(acc[n][0] for n in acc if n.startswith("relicore"))
    print()
    print(
        f"accuracy: relicore max {worst_relicore:.0f} ulp; most accurate baseline max {best_baseline:.0f} ulp"
        + ("  -> relicore is the more accurate" if worst_relicore < best_baseline else "  -> relicore is NOT more accurate here")
    )
    print(f"relicore C ABI and relicore Python give identical bits on all {args.n:,} inputs: {'yes' if same_bits else 'NO'}")
    print(f"(benchmark, not a test; nothing is asserted about speed; run took {time.perf_counter() - t_start:.1f} s)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
