#!/usr/bin/env python3
"""Side-by-side speed and accuracy of the object temperature with its combined standard
uncertainty for a 1000 x 1000 frame (issue 12), f32 and f64.

In ONE run, on the SAME inputs (an invented scene: a smooth 280...360 K object field with
per-pixel emissivity 0.6...0.98, reflected surroundings at 295 K, a window of transmittance 0.92
at 290 K, seen at 10 um; standard uncertainties: signal 1 %, emissivity 0.02, T_refl 2 K,
tau 0.01, T_path 2 K):

  relicore           the C face's frame function
                     relicore_object_temperature_wavelength_with_uncertainty_array(_f32),
                     called once through ctypes on one core (the core's blockwise frame path
                     in the widest SIMD compilation the CPU supports, through
                     relicore-dispatch);
  python             the Python face: relicore.blackbody.object_temperature_wavelength_with_
                     uncertainty on the arrays, which returns the whole budget per pixel (T, u_c
                     and the five sensitivity coefficients, as a TemperatureUncertainty of
                     arrays) through the core's budget frame form (the same SIMD dispatch; split
                     over the cores for frames of 65,536 pixels or more);
  numpy (BASELINE)   NOT relicore: the same formulas as a competent user writes them in numpy
                     (vectorised expressions with expm1/log1p, the dtype of the frame
                     throughout): the corrected object radiance, the closed-form brightness
                     temperature, dB/dT at T_obj, the five sensitivity coefficients of implicit
                     differentiation and u_c = sqrt(sum (c_i u_i)^2) (JCGM 100:2008 eq. 10).

Constants: scipy.constants (CODATA 2022, the exact SI h, c, k). The signals are formed once by
the forward measurement equation in float64 numpy and rounded to the frame's dtype.

Each method runs several times (repetitions interleaved) and the median and range are
reported, with the ratio. Accuracy: the relative error of T_obj and u_c of each method against
mpmath (30 digits, the same formulas written here) on an evenly spaced subsample of pixels.
Target (issue 12): relicore at most 1/2 of the numpy time, f32 and f64. A benchmark, not a
test: nothing is asserted. Timings on a shared 2-core machine vary by tens of per cent.

Usage (benches/compare/run.sh does this): thermometry_compare.py --lib path/to/librelicore.so
    [--side N] [--repetitions R] [--subsample K]
"""

import argparse
import ctypes
import statistics
import time

import mpmath
import numpy as np
from scipy import constants as sc

from relicore import blackbody as rb

H, C, K = sc.h, sc.c, sc.k
C1 = 2 * H * C * C  # 2hc^2, W m^2 sr^-1
C2 = H * C / K  # hc/k, m K
LAMBDA = 10e-6
T_REFL, TAU, T_PATH = 295.0, 0.92, 290.0
U_EPS, U_TREFL, U_TAU, U_TPATH = 0.02, 2.0, 0.01, 2.0


def scene(side):
    r, c = np.meshgrid(np.arange(side, dtype=np.float64), np.arange(side, dtype=np.float64), indexing="ij")
    t = 280.0 + 80.0 * (0.5 + 0.5 * np.sin(r * 0.01) * np.cos(c * 0.013))
    e = 0.6 + 0.38 * (0.5 + 0.5 * np.sin((r + c) * 0.003))
    b = lambda tt: C1 / LAMBDA**5 / np.expm1(C2 / (LAMBDA * tt))
    s = TAU * (e * b(t) + (1 - e) * b(T_REFL)) + (1 - TAU) * b(T_PATH)
    return s.ravel(), e.ravel()


def numpy_frame(s, e, us):
    """The baseline: the formulas in numpy, in the dtype of s."""
    dt = s.dtype.type
    lam = dt(LAMBDA)
    a = dt(C1) / lam**5
    c2l = dt(C2) / lam

    def planck(t):
        return a / np.expm1(c2l / t)

    def dplanck(t):
        x = c2l / t
        em1 = np.expm1(x)
        return a / em1 * (x / t) * ((em1 + 1) / em1)

    tr, tau, tp = dt(T_REFL), dt(TAU), dt(T_PATH)
    br, bp = planck(tr), planck(tp)
    dbr, dbp = dplanck(tr), dplanck(tp)
    one = dt(1)
    l_obj = ((s - (one - tau) * bp) / tau - (one - e) * br) / e
    t = c2l / np.log1p(a / l_obj)
    d = tau * e * dplanck(t)
    inv = one / d
    c0 = inv
    c1 = -(tau * (l_obj - br)) * inv
    c2 = -(tau * (one - e) * dbr) * inv
    c3 = -((e * l_obj + (one - e) * br) - bp) * inv
    c4 = -((one - tau) * dbp) * inv
    uc = np.sqrt((c0 * us) ** 2 + (c1 * dt(U_EPS)) ** 2 + (c2 * dt(U_TREFL)) ** 2 + (c3 * dt(U_TAU)) ** 2
                 + (c4 * dt(U_TPATH)) ** 2)
    return t, uc


def load(lib_path):
    lib = ctypes.CDLL(lib_path)
    out = {}
    for name, ct in (("relicore_object_temperature_wavelength_with_uncertainty_array", ctypes.c_double),
                     ("relicore_object_temperature_wavelength_with_uncertainty_array_f32", ctypes.c_float)):
        f = getattr(lib, name)
        p = ctypes.POINTER(ct)
        sz = ctypes.c_size_t
        f.argtypes = [ct] + [p, sz] * 10 + [p, p]
        f.restype = ctypes.c_int32
        out[ct] = f
    return out


def relicore_frame(funcs, s, e, us):
    dt = s.dtype
    ct = ctypes.c_float if dt == np.float32 else ctypes.c_double
    f = funcs[ct]
    n = s.size
    t = np.empty(n, dt)
    u = np.empty(n, dt)
    one = lambda v: np.array([v], dt)
    keep = [one(T_REFL), one(TAU), one(T_PATH), one(U_EPS), one(U_TREFL), one(U_TAU), one(U_TPATH)]
    ptr = lambda arr: arr.ctypes.data_as(ctypes.POINTER(ct))
    status = f(ct(LAMBDA), ptr(s), n, ptr(e), e.size, ptr(keep[0]), 1, ptr(keep[1]), 1, ptr(keep[2]), 1,
               ptr(us), us.size, ptr(keep[3]), 1, ptr(keep[4]), 1, ptr(keep[5]), 1, ptr(keep[6]), 1,
               ptr(t), ptr(u))
    return t, u, status


def python_frame(s, e, us):
    """The Python face: the whole budget per pixel (T, u_c, five coefficients)."""
    dt = s.dtype.type
    r = rb.object_temperature_wavelength_with_uncertainty(
        dt(LAMBDA), s, e, dt(T_REFL), dt(TAU), dt(T_PATH), us, dt(U_EPS), dt(U_TREFL), dt(U_TAU), dt(U_TPATH))
    return r.temperature_k, r.combined_standard_uncertainty_k


def reference(s, e, us, idx):
    """mpmath at 30 digits: T_obj and u_c of the pixels idx, from the exact binary inputs."""
    mpmath.mp.dps = 30
    mf = mpmath.mpf
    lam, c1, c2 = mf(LAMBDA), mf(C1), mf(C2)
    b = lambda t: c1 / lam**5 / mpmath.expm1(c2 / (lam * t))
    db = lambda t: b(t) * (c2 / (lam * t)) / t / (1 - mpmath.exp(-c2 / (lam * t)))
    tr, tau, tp = mf(T_REFL), mf(TAU), mf(T_PATH)
    out_t, out_u = [], []
    for i in idx:
        si, ei, ui = mf(float(s[i])), mf(float(e[i])), mf(float(us[i]))
        l = ((si - (1 - tau) * b(tp)) / tau - (1 - ei) * b(tr)) / ei
        t = c2 / (lam * mpmath.log1p(c1 / (lam**5 * l)))
        d = tau * ei * db(t)
        cs = [1 / d, -tau * (l - b(tr)) / d, -tau * (1 - ei) * db(tr) / d,
              -((ei * l + (1 - ei) * b(tr)) - b(tp)) / d, -(1 - tau) * db(tp) / d]
        uu = [ui, mf(U_EPS), mf(U_TREFL), mf(U_TAU), mf(U_TPATH)]
        out_t.append(t)
        out_u.append(mpmath.sqrt(sum((ci * uj) ** 2 for ci, uj in zip(cs, uu))))
    return out_t, out_u


def worst(values, ref, idx):
    return max(abs((mpmath.mpf(float(values[i])) - r) / r) for i, r in zip(idx, ref))


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--lib", required=True)
    ap.add_argument("--side", type=int, default=1000)
    ap.add_argument("--repetitions", type=int, default=7)
    ap.add_argument("--subsample", type=int, default=300)
    args = ap.parse_args()
    funcs = load(args.lib)
    s64, e64 = scene(args.side)
    n = s64.size
    print(f"object temperature with u_c, {args.side} x {args.side} frame at 10 um, per-pixel emissivity; "
          f"medians of {args.repetitions} interleaved repetitions (range in brackets)")
    for dt in (np.float64, np.float32):
        s = s64.astype(dt)
        e = e64.astype(dt)
        us = (s * dt(0.01)).astype(dt)
        times = {"relicore": [], "python": [], "numpy": []}
        for _ in range(args.repetitions):
            t0 = time.perf_counter()
            tr_, ur_, status = relicore_frame(funcs, s, e, us)
            times["relicore"].append(time.perf_counter() - t0)
            t0 = time.perf_counter()
            tp_, up_ = python_frame(s, e, us)
            times["python"].append(time.perf_counter() - t0)
            t0 = time.perf_counter()
            tn, un = numpy_frame(s, e, us)
            times["numpy"].append(time.perf_counter() - t0)
        idx = np.linspace(0, n - 1, args.subsample).astype(int)
        ref_t, ref_u = reference(s, e, us, idx)
        name = np.dtype(dt).name
        med = {k: statistics.median(v) for k, v in times.items()}
        print(f"\n{name}: relicore status {status}")
        results = {"relicore": (tr_, ur_), "python": (tp_, up_), "numpy": (tn, un)}
        for k in ("relicore", "python", "numpy"):
            v = times[k]
            wt = worst(results[k][0], ref_t, idx)
            wu = worst(results[k][1], ref_u, idx)
            print(f"  {k:<9} {med[k] * 1e3:8.2f} ms  [{min(v) * 1e3:.2f} .. {max(v) * 1e3:.2f}]"
                  f"   worst rel. error vs mpmath on {len(idx)} pixels: T {float(wt):.2e}, u_c {float(wu):.2e}")
        print(f"  relicore / numpy = {med['relicore'] / med['numpy']:.3f}   (target <= 0.5)")
        print(f"  python / numpy = {med['python'] / med['numpy']:.3f}   (target <= 0.5; python also returns the "
              "five coefficients per pixel)")
        same = np.array_equal(tp_, tr_) and np.array_equal(up_, ur_)
        print(f"  python and C frames give the same bits: {same}")
        d = np.max(np.abs(tr_.astype(np.float64) - tn.astype(np.float64)) / tn.astype(np.float64))
        print(f"  max |T_relicore - T_numpy| / T over the frame: {d:.2e}")


if __name__ == "__main__":
    main()
