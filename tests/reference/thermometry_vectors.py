#!/usr/bin/env python3
"""Independent high-precision reference vectors for the radiation-thermometry functions of
relicore (the measurement equation, its inverse, sensitivity coefficients and the combined
standard uncertainty of JCGM 100:2008).

Run from anywhere:

    .venv/bin/python tests/reference/thermometry_vectors.py

Writes (overwrites) tests/data/thermometry.txt (scalar vectors) and
tests/data/thermometry_response.txt (vectors with a response table), in the format of
tests/data/FORMAT.md (section "Thermometry files").

The model (what the vectors define):

    L_meas = tau [eps L(T_obj) + (1 - eps) L(T_refl)] + (1 - tau) L(T_path)

with L the Planck spectral radiance B_lambda at one wavelength or B_nu at one frequency, the band
radiance int_{l1}^{l2} B_lambda dlambda, or the response-weighted radiance int r(l) B_lambda dl
with r linear between the table points (zero outside).  L(0) = 0.  The object temperature is the
T_obj > 0 that reproduces a signal.  Sensitivity coefficients are the partial derivatives of
T_obj with respect to (signal, eps, T_refl, tau, T_path) at fixed other inputs; the combined
standard uncertainty is u_c = sqrt(sum c_i^2 u_i^2) (JCGM 100:2008 eq. 10) or, with a correlation
matrix r, sqrt(sum_ij c_i c_j u_i u_j r_ij) (eq. 13).  The two-load calibrated temperature is the
physical temperature T with J(T) = J(T_c) + (r - r_c)/(r_h - r_c) (J(T_h) - J(T_c)),
J(T) = (h nu/k)/(exp(h nu/kT) - 1), and its coefficients are with respect to
(r_h, T_h, r_c, T_c, r).

Independence: every expected value is computed here from the formulas above with mpmath at
mp.dps = 50 from the exact binary value of the printed arguments; nothing reads, runs or imitates
the project's Rust code.  Checks inside the script:
  * band integrals by two routes: mpmath.quad in wavelength and the polylogarithm closed form
    of the Bose integral; their temperature derivatives by quad of dB/dT and by the Leibniz
    rule on the closed form;
  * response integrals by tanh-sinh and Gauss-Legendre quadrature;
  * every object temperature substituted back into the forward equation;
  * every analytic sensitivity coefficient (implicit differentiation) against a central
    difference of the inverse itself at 70 digits with step 1e-18 relative (truncation ~1e-36);
  * the exact reductions: eps = tau = 1 is the brightness temperature; T_refl = T_obj makes
    the emissivity coefficient 0; tau = 1 makes the result independent of T_path.

Only mpmath and the Python standard library are used; the output is deterministic (random
choices come from random.Random seeded with a fixed string).
"""

import math
import os
import random
import struct
import sys
from fractions import Fraction

import mpmath
from mpmath import mp, mpf

DPS = 50
DIFF_DPS = 70
# two integration routes must agree to this (relative): far below every tolerance of the file
ROUTES = mpf(10) ** -25
SEED = "relicore-thermometry-reference-v1"
mp.dps = DPS

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.normpath(os.path.join(HERE, "..", "data"))
SCRIPT = "tests/reference/thermometry_vectors.py"

# ---------------------------------------------------------------------------------------------
# ONE central tolerance table: key -> (kind, value, reason).  A value None means "computed per
# vector" (the function that computes it is named in the reason).
# ---------------------------------------------------------------------------------------------
TOL = {
    "forward": ("rel", 1e-14,
                "sum of three non-negative terms, each a Planck radiance within 4 ulp"),
    "forward_band": ("rel", 2e-14,
                     "band radiances within 1e-14 (their documented accuracy) summed without cancellation"),
    "forward_response": ("rel", 1e-13,
                         "response-weighted radiances within 1e-13 (their documented accuracy), no cancellation"),
    "inverse": ("rel", 1e-13,
                "corrected radiance with condition kappa <= 20 (a few roundings each amplified by kappa), "
                "then a brightness temperature or root within 1e-14; the target of issue 12"),
    "derivative_band": ("rel", 1e-13,
                        "4L + edge terms of the band: cancellation at most 4/x ~ 10 at the long-wave edge (x >= 0.4)"),
    "derivative_response": ("rel", 1e-13,
                            "per-segment Gauss-Kronrod of dB/dT at tolerance 2 eps, summed without cancellation"),
    "coefficient": ("rel", 1e-12,
                    "1/(tau eps L'(T)) times a sum without cancellation: L' within 8 ulp, T within 1e-13 amplified by "
                    "d ln L'/d ln T ~ x <= 40; the target of issue 12"),
    "coefficient_terms": ("abs", None,
                          "coefficients of eps and tau are differences that vanish (T_refl = T_obj, balanced scene): "
                          "1e-12 times the sum of the magnitudes of their terms (term_scale)"),
    "uc": ("rel", 1e-12,
           "root sum of squares of coefficients each within 1e-12 of its term scale; the target of issue 12"),
    "uc_formula": ("rel", 1e-14,
                   "eq. 10 of given coefficients: n products, n squares, a sum and a square root"),
    "uc_correlated": ("abs", None,
                      "eq. 13: (4 n^2 + 4) eps times the sum of the absolute terms, over 2 u_c, floored at 1e-14 u_c "
                      "(correlated_tolerance)"),
    "calibration": ("rel", 1e-13,
                    "two-load calibrated temperature with reading condition <= 50 (as blackbody.txt)"),
    "brightness": ("rel", 1e-14,
                   "closed-form brightness temperature (as blackbody.txt)"),
    "inverse_f32": ("ulp32", 4,
                    "f32 object temperature with kappa <= 2 and x >= 2: counted in f32 ulps; the target of issue 12"),
    "forward_f32": ("ulp32", 8,
                    "f32 sum of three f32 radiances (4 ulp each) and four products"),
    "coefficient_f32": ("rel", 4e-6,
                        "f32 coefficient: dB/dT within ~8 f32 ulps at a T within 4 ulps, amplified by x <= 30 (about 32 f32 ulps)"),
    "coefficient_terms_f32": ("abs", None,
                              "f32 eps/tau coefficient: 4e-6 times the term scale (term_scale)"),
    "uc_f32": ("rel", 4e-6,
               "f32 u_c: as the f32 coefficients"),
}


def tol(key, value=None):
    kind, v, _ = TOL[key]
    return kind, (v if v is not None else value)


# ---------------------------------------------------------------------------------------------
# exact rounding to binary64 / binary32
# ---------------------------------------------------------------------------------------------
def to_fraction(v):
    v = mpf(v)
    if v == 0:
        return Fraction(0)
    s, man, exp, _ = v._mpf_
    man = int(man)
    q = Fraction(man << exp) if exp >= 0 else Fraction(man, 1 << (-exp))
    return -q if s else q


def round_binary(q, p, emin):
    if q == 0:
        return 0.0
    neg = q < 0
    q = -q if neg else q
    n, d = q.numerator, q.denominator
    e = n.bit_length() - d.bit_length()
    if (n << max(0, -e)) < (d << max(0, e)):
        e -= 1
    e = max(e, emin)
    sh = e - p + 1
    num, den = (n, d << sh) if sh >= 0 else (n << (-sh), d)
    m, r = divmod(num, den)
    if 2 * r > den or (2 * r == den and (m & 1)):
        m += 1
    out = math.ldexp(m, sh)
    return -out if neg else out


def f64(v):
    q = to_fraction(v)
    out = round_binary(q, 53, -1022)
    assert q == 0 or out == float(q)
    return out


def f32v(v):
    return round_binary(to_fraction(v), 24, -126)


def f32(x):
    return struct.unpack("f", struct.pack("f", x))[0]


def is_f32(x):
    return math.isnan(x) or f32(x) == x


# ---------------------------------------------------------------------------------------------
# constants and the defining formulas (mpf in, mpf out)
# ---------------------------------------------------------------------------------------------
def H():
    return mpf("6.62607015e-34")


def C():
    return mpf(299792458)


def KB():
    return mpf("1.380649e-23")


def C1L():
    return 2 * H() * C() ** 2


def C2():
    return H() * C() / KB()


def planck_wl(lam, T):
    if T == 0:
        return mpf(0)
    x = C2() / (lam * T)
    return C1L() / lam ** 5 / mp.expm1(x)


def dplanck_wl(lam, T):
    """dB_lambda/dT = B x e^x / (T (e^x - 1))."""
    if T == 0:
        return mpf(0)
    x = C2() / (lam * T)
    return planck_wl(lam, T) * x / T / (-mp.expm1(-x))


def planck_nu(nu, T):
    if T == 0:
        return mpf(0)
    x = H() * nu / (KB() * T)
    return 2 * H() * nu ** 3 / C() ** 2 / mp.expm1(x)


def dplanck_nu(nu, T):
    if T == 0:
        return mpf(0)
    x = H() * nu / (KB() * T)
    return planck_nu(nu, T) * x / T / (-mp.expm1(-x))


def bose_tail(x):
    """int_x^inf t^3/(e^t - 1) dt in closed form (polylogarithms), x >= 0."""
    if x == mp.inf:
        return mpf(0)
    if x == 0:
        return mp.pi ** 4 / 15
    q = mp.exp(-x)
    return x ** 3 * mp.polylog(1, q) + 3 * x ** 2 * mp.polylog(2, q) + 6 * x * mp.polylog(3, q) + 6 * mp.polylog(4, q)


def k4():
    return 2 * KB() ** 4 / (H() ** 3 * C() ** 2)


class Spectral:
    """One wavelength (kind 'wl') or one frequency (kind 'nu')."""

    def __init__(self, kind, a):
        self.kind, self.a = kind, mpf(a)

    def L(self, T):
        return planck_wl(self.a, T) if self.kind == "wl" else planck_nu(self.a, T)

    def dL(self, T):
        return dplanck_wl(self.a, T) if self.kind == "wl" else dplanck_nu(self.a, T)

    def inv(self, l, T0=None):
        """Closed-form brightness temperature."""
        if self.kind == "wl":
            return C2() / (self.a * mp.log1p(C1L() / (self.a ** 5 * l)))
        th = H() * self.a / KB()
        return th / mp.log1p(2 * H() * self.a ** 3 / (C() ** 2 * l))


class Band:
    """Band radiance between two wavelengths (lo may be 0, hi may be inf)."""

    def __init__(self, lo, hi):
        self.lo, self.hi = mpf(lo), (mp.inf if hi == math.inf else mpf(hi))
        self.cache = {}

    def edges(self, T):
        xa = mpf(0) if self.hi == mp.inf else C2() / (self.hi * T)
        xb = mp.inf if self.lo == 0 else C2() / (self.lo * T)
        return xa, xb

    def L(self, T, check=True):
        if T == 0:
            return mpf(0)
        key = ("L", T, mp.prec)
        if key in self.cache:
            return self.cache[key]
        xa, xb = self.edges(T)
        closed = k4() * T ** 4 * (bose_tail(xa) - bose_tail(xb))
        if check:
            lo = self.lo if self.lo > 0 else C2() / (T * 2000)
            hi = self.hi if self.hi != mp.inf else C2() / (T * mpf("1e-6"))
            pts = mp.linspace(lo, hi, 9) if hi / lo < 4 else [lo * (hi / lo) ** (mpf(i) / 8) for i in range(9)]
            q = mp.quad(lambda l: planck_wl(l, T), pts)
            if self.hi == mp.inf:
                q += k4() * T ** 4 * (mp.pi ** 4 / 15 - bose_tail(C2() / (hi * T)))
            if self.lo == 0:
                q += k4() * T ** 4 * bose_tail(C2() / (lo * T))
            assert abs(q - closed) <= ROUTES * closed, ("band routes", T, q, closed)
        self.cache[key] = closed
        return closed

    def dL(self, T, check=True):
        if T == 0:
            return mpf(0)
        xa, xb = self.edges(T)

        def edge(x):
            return mpf(0) if x == 0 or x == mp.inf else x ** 4 / mp.expm1(x)

        leibniz = (4 * self.L(T, check=False) + k4() * T ** 4 * (edge(xa) - edge(xb))) / T
        if check and self.lo > 0 and self.hi != mp.inf:
            q = mp.quad(lambda l: dplanck_wl(l, T), mp.linspace(self.lo, self.hi, 9))
            assert abs(q - leibniz) <= ROUTES * leibniz, ("band derivative routes", T)
        return leibniz

    def inv(self, l, T0):
        return newton(lambda T: self.L(T, check=False) - l, lambda T: self.dL(T, check=False), T0)


class Response:
    """Response-weighted radiance, r linear between (wavelength, response) points."""

    def __init__(self, wl, r):
        self.wl, self.r = [mpf(x) for x in wl], [mpf(x) for x in r]

    def _int(self, g, method):
        s = mpf(0)
        for a, b, ra, rb in zip(self.wl, self.wl[1:], self.r, self.r[1:]):
            if ra == 0 and rb == 0:
                continue
            s += mp.quad(lambda l: (ra + (rb - ra) * (l - a) / (b - a)) * g(l), [a, b], method=method)
        return s

    def L(self, T, check=True):
        if T == 0:
            return mpf(0)
        v = self._int(lambda l: planck_wl(l, T), "tanh-sinh")
        if check:
            w = self._int(lambda l: planck_wl(l, T), "gauss-legendre")
            assert abs(v - w) <= ROUTES * v, ("response routes", T)
        return v

    def dL(self, T, check=True):
        if T == 0:
            return mpf(0)
        v = self._int(lambda l: dplanck_wl(l, T), "tanh-sinh")
        if check:
            w = self._int(lambda l: dplanck_wl(l, T), "gauss-legendre")
            assert abs(v - w) <= ROUTES * v, ("response derivative routes", T)
        return v

    def inv(self, l, T0):
        return newton(lambda T: self.L(T, check=False) - l, lambda T: self.dL(T, check=False), T0)


def newton(f, df, T0):
    T = mpf(T0)
    for _ in range(100):
        step = f(T) / df(T)
        T -= step
        if abs(step) <= mpf(10) ** (-mp.dps + 10) * T:
            break
    else:
        raise RuntimeError("newton did not converge")
    return T


# ---------------------------------------------------------------------------------------------
# the measurement equation in mpmath
# ---------------------------------------------------------------------------------------------
def forward(Q, T, e, Tr, tau, Tp):
    return tau * (e * Q.L(T) + (1 - e) * Q.L(Tr)) + (1 - tau) * Q.L(Tp)


def corrected(Q, S, e, Tr, tau, Tp):
    return ((S - (1 - tau) * Q.L(Tp)) / tau - (1 - e) * Q.L(Tr)) / e


def inverse(Q, S, e, Tr, tau, Tp, T0):
    l = corrected(Q, S, e, Tr, tau, Tp)
    assert l > 0
    return Q.inv(l, T0)


def kappa(Q, S, e, Tr, tau, Tp):
    """Condition number of the corrected object radiance."""
    l = corrected(Q, S, e, Tr, tau, Tp)
    return (abs(S) + (1 - tau) * Q.L(Tp) + tau * (1 - e) * Q.L(Tr)) / (tau * e * l)


def coefficients(Q, T, e, Tr, tau, Tp):
    """Analytic implicit derivatives and the scale of the terms of each."""
    L, Lr, Lp = Q.L(T), Q.L(Tr), Q.L(Tp)
    D = tau * e * Q.dL(T)
    c = [1 / D,
         -tau * (L - Lr) / D,
         -tau * (1 - e) * Q.dL(Tr) / D,
         -(e * L + (1 - e) * Lr - Lp) / D,
         -(1 - tau) * Q.dL(Tp) / D]
    scale = [abs(c[0]), tau * (L + Lr) / D, abs(c[2]), (e * L + (1 - e) * Lr + Lp) / D, abs(c[4])]
    return c, scale


def numeric_coefficients(Q, S, e, Tr, tau, Tp, T):
    """Central differences of the inverse at DIFF_DPS digits (step 1e-18 relative)."""
    out = []
    with mp.workdps(DIFF_DPS):
        x = [mpf(S), mpf(e), mpf(Tr), mpf(tau), mpf(Tp)]
        for i in range(5):
            if x[i] == 0:
                out.append(None)  # a zero temperature: L and all its derivatives vanish there
                continue
            h = abs(x[i]) * mpf(10) ** -18
            xp, xm = list(x), list(x)
            xp[i] += h
            xm[i] -= h
            tp = inverse(Q, *xp, T0=T)
            tm = inverse(Q, *xm, T0=T)
            out.append((tp - tm) / (2 * h))
    return out


def check_coefficients(Q, S, e, Tr, tau, Tp, T, c, scale):
    num = numeric_coefficients(Q, S, e, Tr, tau, Tp, T)
    x = [S, e, Tr, tau, Tp]
    for i, (a, n, s) in enumerate(zip(c, num, scale)):
        if n is None:
            assert a == 0, ("coefficient at T = 0 must vanish", i, a)
            continue
        # truncation ~1e-36 relative; rounding of the difference quotient ~1e-70 T / (1e-18 |x_i|)
        bound = mpf(10) ** -25 * max(s, abs(a)) + mpf(10) ** -48 * T / abs(x[i])
        assert abs(a - n) <= bound, ("coefficient %d" % i, a, n)


def uc(c, u):
    return mp.sqrt(sum((ci * ui) ** 2 for ci, ui in zip(c, u)))


# ---------------------------------------------------------------------------------------------
# output
# ---------------------------------------------------------------------------------------------
def fmt(v):
    if isinstance(v, str):
        return v
    if math.isnan(v):
        return "nan"
    if math.isinf(v):
        return "inf" if v > 0 else "-inf"
    return "%.17e" % v


def fmt_tol(kind, t):
    return str(int(t)) if kind in ("ulp32", "status") else "%.17e" % t


NAN = math.nan
NF, NP, NEG, LEN, OOD = -2, -3, -4, -7, -10


class Out:
    def __init__(self):
        self.lines, self.count = [], {}

    def comment(self, text=""):
        for line in text.split("\n"):
            self.lines.append(("# " + line).rstrip())

    def vec(self, name, args, expected, kind, t, source="mpmath", table=None):
        args = [float(a) for a in args]
        base = name.split("@")[0]
        if base.endswith("_f32"):
            assert all(is_f32(a) for a in args), (name, args)
            if kind != "status":
                assert is_f32(expected), (name, expected)
        if kind != "status":
            assert math.isfinite(expected), (name, args, expected)
        for a in args:
            assert math.isnan(a) or float(fmt(a)) == a
        head = [name] + ([str(len(table))] if table is not None else []) + [str(len(args))]
        fields = head + [fmt(a) for a in args] + [fmt(expected), kind, fmt_tol(kind, t), source]
        self.lines.append(" ".join(fields))
        if table is not None:
            for w, r in table:
                self.lines.append("%s %s" % (fmt(w), fmt(r)))
        key = base if kind != "status" else base + " (status)"
        self.count[key] = self.count.get(key, 0) + 1

    def status(self, name, args, code, table=None):
        self.vec(name, args, NAN, "status", code, "spec", table)

    def write(self, path):
        with open(path, "w") as fh:
            fh.write("\n".join(self.lines) + "\n")


def header(out, what):
    out.comment("GENERATED FILE - do not edit by hand.")
    out.comment("Generated by %s (deterministic, seeded '%s')." % (SCRIPT, SEED))
    out.comment(what)
    out.comment("Format: tests/data/FORMAT.md, section 'Thermometry files'.  Constants: SI 2019 exact h, c, k.")
    out.comment("Model: L_meas = tau [eps L(T_obj) + (1 - eps) L(T_refl)] + (1 - tau) L(T_path), L(0) = 0;")
    out.comment("  see the docstring of the script.  A name 'f@field' is one field of the result value of f:")
    out.comment("  temperature_k, combined_standard_uncertainty_k, sensitivity_0 .. sensitivity_4.")
    out.comment("Sources:")
    out.comment("  mpmath  the defining formulas at mp.dps = 50 from the exact binary value of the printed")
    out.comment("          arguments, rounded to nearest f64 (f32 for *_f32 names); band integrals by quad and")
    out.comment("          the polylogarithm closed form, response integrals by two quadrature rules;")
    out.comment("          coefficients by implicit differentiation, checked against central differences of")
    out.comment("          the inverse at 70 digits.  Never from project code.")
    out.comment("  mpmath-reduction  an exact reduction of the model (eps = tau = 1: the brightness temperature;")
    out.comment("          T_refl = T_obj: emissivity coefficient 0; tau = 1: independent of T_path), the")
    out.comment("          expected value computed by mpmath from the reduced formula and asserted equal to the")
    out.comment("          full one.")
    out.comment("  spec    expected failure status from the documented argument checks.")
    out.comment("Inverse vectors: a scene (T_obj) was chosen, its signal computed and rounded to f64 (f32), and")
    out.comment("  expected is the exact object temperature (or coefficient, u_c) for the ROUNDED signal.")
    out.comment("Tolerances (one central table in the script; kind value: reason):")
    for k, (kind, v, why) in TOL.items():
        out.comment("  %-22s %-5s %-9s %s" % (k, kind, "f(vector)" if v is None else ("%g" % v), why))


def rng_for(name):
    return random.Random(SEED + ":" + name)


def logu(rng, a, b):
    return math.exp(rng.uniform(math.log(a), math.log(b)))


FIELDS = ["temperature_k", "combined_standard_uncertainty_k"] + ["sensitivity_%d" % i for i in range(5)]


# ---------------------------------------------------------------------------------------------
# scene generation
# ---------------------------------------------------------------------------------------------
def random_scene(rng, Tobj, single):
    """(eps, T_refl, tau, T_path), rounded to f64 (or f32 when single)."""
    rnd = f32 if single else (lambda v: v)
    e = 1.0 if rng.random() < 0.12 else rnd(rng.uniform(0.3, 1.0))
    tau = 1.0 if rng.random() < 0.2 else rnd(rng.uniform(0.5, 1.0))
    u = rng.random()
    if u < 0.06:
        Tr = 0.0
    elif u < 0.3:
        Tr = rnd(Tobj * rng.uniform(0.5, 1.3))
    else:
        Tr = rnd(rng.uniform(250.0, 400.0))
    Tp = 0.0 if rng.random() < 0.06 else rnd(rng.uniform(230.0, 320.0))
    return e, Tr, tau, Tp


def spectral_scenes(name, kind, n, single, kmax, xrange):
    """Random scenes of the spectral forms with kappa <= kmax: (Q, a, T, scene, S, kappa)."""
    rng = rng_for(name)
    rnd = f32 if single else (lambda v: v)
    out = []
    while len(out) < n:
        if kind == "wl":
            a = rnd(logu(rng, 0.65e-6, 14e-6))
            T = rnd(float(C2()) / (a * logu(rng, *xrange)))
        else:
            a = rnd(logu(rng, 1e10, 3e13))
            T = rnd(float(H() * a / KB()) / logu(rng, *xrange))
        if not (2.0 <= T <= 4000.0):
            continue
        Q = Spectral(kind, a)
        scene = random_scene(rng, T, single)
        S = forward(Q, mpf(T), *[mpf(v) for v in scene])
        Sr = f32v(S) if single else f64(S)
        if corrected(Q, mpf(Sr), *[mpf(v) for v in scene]) <= 0:
            continue
        k = kappa(Q, mpf(Sr), *[mpf(v) for v in scene])
        if k > kmax:
            continue
        out.append((Q, a, T, scene, Sr, k))
    return out


def uncertainties(rng, S, T, single):
    rnd = f32 if single else (lambda v: v)
    return [rnd(abs(S) * rng.uniform(0.001, 0.02)), rnd(rng.uniform(0.005, 0.03)),
            rnd(rng.uniform(0.5, 5.0)), rnd(rng.uniform(0.002, 0.02)), rnd(rng.uniform(0.5, 5.0))]


def emit_uncertainty(out, name, args, Q, S, scene, T, us, single, source="mpmath"):
    """The seven field lines of an object temperature with uncertainty."""
    e, Tr, tau, Tp = [mpf(v) for v in scene]
    c, scale = coefficients(Q, T, e, Tr, tau, Tp)
    check_coefficients(Q, mpf(S), e, Tr, tau, Tp, T, c, scale)
    u = uc(c, [mpf(v) for v in us])
    rnd = f32v if single else f64
    suffix = "_f32" if single else ""
    kt, vt = tol("inverse_f32") if single else tol("inverse")
    out.vec(name + suffix + "@temperature_k", args, rnd(T), kt, vt, source)
    ku, vu = tol("uc_f32" if single else "uc")
    out.vec(name + suffix + "@combined_standard_uncertainty_k", args, rnd(u), ku, vu, source)
    for i in range(5):
        if i in (1, 3):
            kc, vc = tol("coefficient_terms_f32" if single else "coefficient_terms",
                         (4e-6 if single else 1e-12) * float(scale[i]))
        else:
            kc, vc = tol("coefficient_f32" if single else "coefficient")
        out.vec(name + suffix + "@sensitivity_%d" % i, args, rnd(c[i]), kc, vc, source)
    return c, u


def scene_status_lines(out, name, pre, S, scene, us=None, table=None):
    """Failure lines of the scene checks; pre = the spectral arguments before the signal."""
    base = list(pre) + [S] + list(scene) + (list(us) if us else [])
    p = len(pre)
    cases = [(p, NAN, NF), (p + 1, 0.0, NP), (p + 1, 1.5, OOD), (p + 1, NAN, NF), (p + 2, -1.0, NEG),
             (p + 2, math.inf, NF), (p + 3, 0.0, NP), (p + 3, 1.0000001, OOD), (p + 4, -0.5, NEG)]
    if us:
        cases += [(p + 5, -1.0, NEG), (p + 7, NAN, NF), (p + 9, -1e-3, NEG)]
    for pos, bad, code in cases:
        a = list(base)
        a[pos] = bad
        out.status(name, a, code, table)


# ---------------------------------------------------------------------------------------------
# sections
# ---------------------------------------------------------------------------------------------
def spectral_section(out, kind):
    tag = "wavelength" if kind == "wl" else "frequency"
    fwd = "measured_spectral_radiance_" + tag
    inv = "object_temperature_" + tag
    unc = inv + "_with_uncertainty"
    xr = (1.5, 40.0) if kind == "wl" else (0.02, 30.0)
    out.comment("")
    out.comment("---- %s: %s form.  Random scenes, x = hc/(lambda k T) in %g..%g, kappa <= 20 ----" % (tag, tag, *xr))
    worst = 0
    for Q, a, T, scene, S, k in spectral_scenes(inv, kind, 36, False, 20.0, xr):
        worst = max(worst, k)
        Tm = mpf(T)
        Sx = forward(Q, Tm, *[mpf(v) for v in scene])
        kf, vf = tol("forward")
        out.vec(fwd, [a, T] + list(scene), f64(Sx), kf, vf)
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=Tm)
        assert abs(forward(Q, Tinv, *[mpf(v) for v in scene]) - S) <= mpf(10) ** (-DPS + 8) * abs(S)
        ki, vi = tol("inverse")
        out.vec(inv, [a, S] + list(scene), f64(Tinv), ki, vi)
    out.comment("%s: worst kappa of these scenes %.3g" % (inv, worst))
    # with uncertainty
    rng = rng_for(unc)
    for Q, a, T, scene, S, k in spectral_scenes(unc, kind, 14, False, 20.0, xr):
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(T))
        us = uncertainties(rng, S, T, False)
        emit_uncertainty(out, unc, [a, S] + list(scene) + us, Q, S, scene, Tinv, us, False)
    # reductions
    out.comment("%s reductions (mpmath-reduction): eps = tau = 1 is the brightness temperature; tau = 1 with two" % tag)
    out.comment("  path temperatures gives one value; T_refl = T_obj makes sensitivity_1 (emissivity) vanish.")
    a = 10e-6 if kind == "wl" else 150e9
    Q = Spectral(kind, a)
    for T in (300.0, 1200.0) if kind == "wl" else (2.7255, 300.0):
        S = f64(Q.L(mpf(T)))
        bright = Q.inv(mpf(S))
        full = inverse(Q, mpf(S), mpf(1), mpf(290), mpf(1), mpf(280), T0=mpf(T))
        assert full == bright
        ki, vi = tol("inverse")
        out.vec(inv, [a, S, 1.0, 290.0, 1.0, 280.0], f64(bright), ki, vi, "mpmath-reduction")
    for Tp in (250.0, 310.0, 0.0):
        scene = (0.9, 295.0, 1.0, Tp)
        S = f64(forward(Q, mpf(320), *[mpf(v) for v in scene]))
        Tv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(320))
        Tnopath = inverse(Q, mpf(S), mpf(0.9), mpf(295), mpf(1), mpf(0), T0=mpf(320))
        assert Tv == Tnopath
        ki, vi = tol("inverse")
        out.vec(inv, [a, S] + list(scene), f64(Tv), ki, vi, "mpmath-reduction")
    Tobj = 350.0 if kind == "wl" else 40.0
    scene = (0.6, Tobj, 0.8, 290.0)
    S = f64(forward(Q, mpf(Tobj), *[mpf(v) for v in scene]))
    Tv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(Tobj))
    with mp.workdps(DPS):
        # with the exact signal the emissivity coefficient is 0 to the working precision
        Sx = forward(Q, mpf(Tobj), *[mpf(v) for v in scene])
        cx, _ = coefficients(Q, inverse(Q, Sx, *[mpf(v) for v in scene], T0=mpf(Tobj)), *[mpf(v) for v in scene])
        assert abs(cx[1]) <= mpf(10) ** (-DPS + 10) * abs(cx[0]) * Sx
    us = [S * 0.01, 0.02, 2.0, 0.01, 2.0]
    emit_uncertainty(out, unc, [a, S] + list(scene) + us, Q, S, scene, Tv, us, False, "mpmath-reduction")
    # f32
    out.comment("%s_f32: f32 arguments, kappa <= 2, x in 2..30; expected rounded to f32." % inv)
    for Q, a, T, scene, S, k in spectral_scenes(inv + "_f32", kind, 24, True, 2.0, (2.0, 30.0)):
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(T))
        ki, vi = tol("inverse_f32")
        out.vec(inv + "_f32", [a, S] + list(scene), f32v(Tinv), ki, vi)
        Sx = forward(Q, mpf(T), *[mpf(v) for v in scene])
        kf, vf = tol("forward_f32")
        out.vec(fwd + "_f32", [a, T] + list(scene), f32v(Sx), kf, vf)
    rng = rng_for(unc + "_f32")
    for Q, a, T, scene, S, k in spectral_scenes(unc + "_f32", kind, 6, True, 2.0, (2.0, 30.0)):
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(T))
        us = uncertainties(rng, S, T, True)
        emit_uncertainty(out, unc, [a, S] + list(scene) + us, Q, S, scene, Tinv, us, True)
    # failures
    a, T = (10e-6, 300.0) if kind == "wl" else (150e9, 30.0)
    Q = Spectral(kind, a)
    scene = (0.9, 290.0, 0.95, 280.0)
    S = f64(forward(Q, mpf(T), *[mpf(v) for v in scene]))
    scene_status_lines(out, inv, [a], S, scene)
    us = [S * 0.01, 0.01, 1.0, 0.01, 1.0]
    scene_status_lines(out, unc, [a], S, scene, us)
    # the signal of the surroundings and the path alone (or less): no object temperature
    floor = f64((1 - mpf(0.95)) * Q.L(mpf(280)) + mpf(0.95) * (1 - mpf(0.9)) * Q.L(mpf(290)))
    for bad in (floor * 0.999, 0.0, -S):
        out.status(inv, [a, bad] + list(scene), OOD)
    out.status(inv, [0.0, S] + list(scene), NP)
    out.status(fwd, [a, 0.0] + list(scene), NP)


BANDS = [(8e-6, 14e-6), (3e-6, 5e-6), (7.5e-6, 13.5e-6), (0.9e-6, 1.1e-6), (2e-6, 2.2e-6), (8e-6, math.inf)]


def band_section(out):
    out.comment("")
    out.comment("---- band form: bands %s; T_obj with x at the long-wave edge >= 0.4, kappa <= 20 ----"
                % ", ".join("%g-%g um" % (lo * 1e6, hi * 1e6) for lo, hi in BANDS))
    rng = rng_for("band")
    nvec = 0
    while nvec < 18:
        lo, hi = BANDS[nvec % len(BANDS)]
        Q = Band(lo, hi)
        ref = hi if hi != math.inf else 30e-6
        T = logu(rng, 200.0, min(3000.0, float(C2()) / (0.4 * ref)))
        scene = random_scene(rng, T, False)
        S = f64(forward(Q, mpf(T), *[mpf(v) for v in scene]))
        if corrected(Q, mpf(S), *[mpf(v) for v in scene]) <= 0 or kappa(Q, mpf(S), *[mpf(v) for v in scene]) > 20:
            continue
        nvec += 1
        kf, vf = tol("forward_band")
        out.vec("measured_band_radiance_wavelength", [lo, hi, T] + list(scene),
                f64(forward(Q, mpf(T), *[mpf(v) for v in scene])), kf, vf)
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(T))
        assert abs(forward(Q, Tinv, *[mpf(v) for v in scene]) - S) <= mpf(10) ** (-DPS + 8) * S
        ki, vi = tol("inverse")
        out.vec("object_temperature_band", [lo, hi, S] + list(scene), f64(Tinv), ki, vi)
        kd, vd = tol("derivative_band")
        out.vec("band_radiance_temperature_derivative_wavelength", [lo, hi, T], f64(Q.dL(mpf(T))), kd, vd)
        if nvec % 3 == 0:
            us = uncertainties(rng, S, T, False)
            emit_uncertainty(out, "object_temperature_band_with_uncertainty", [lo, hi, S] + list(scene) + us,
                             Q, S, scene, Tinv, us, False)
    # reduction: eps = tau = 1 is the band temperature
    Q = Band(8e-6, 14e-6)
    S = f64(Q.L(mpf(300)))
    Tb = Q.inv(mpf(S), mpf(300))
    ki, vi = tol("inverse")
    out.vec("object_temperature_band", [8e-6, 14e-6, S, 1.0, 250.0, 1.0, 200.0], f64(Tb), ki, vi, "mpmath-reduction")
    scene = (0.9, 290.0, 0.95, 280.0)
    scene_status_lines(out, "object_temperature_band", [8e-6, 14e-6], S, scene)
    out.status("object_temperature_band", [14e-6, 8e-6, S] + list(scene), -5)
    out.status("object_temperature_band", [8e-6, 14e-6, 0.0] + list(scene), OOD)


RESPONSES = [
    ("8-14 um trapezoid", [7.5e-6, 8.0e-6, 13.5e-6, 14.0e-6], [0.0, 1.0, 1.0, 0.0]),
    ("thermopile 8-14 um, sloped", [7.0e-6, 8.0e-6, 10.0e-6, 12.0e-6, 14.0e-6, 15.0e-6], [0.0, 0.6, 0.95, 0.9, 0.5, 0.0]),
    ("MWIR 3-5 um", [2.9e-6, 3.2e-6, 4.0e-6, 4.8e-6, 5.1e-6], [0.0, 0.8, 1.0, 0.7, 0.0]),
    ("pyrometer 0.9-1.05 um", [0.85e-6, 0.9e-6, 1.0e-6, 1.05e-6], [0.0, 0.7, 1.0, 0.0]),
]


def response_section(out):
    out.comment("Response-table vectors of the thermometry functions.  Tables (invented response shapes):")
    for d, w, r in RESPONSES:
        out.comment("  %s: %d points" % (d, len(w)))
    rng = rng_for("response")
    nvec = 0
    while nvec < 8:
        d, w, r = RESPONSES[nvec % len(RESPONSES)]
        table = list(zip(w, r))
        Q = Response(w, r)
        T = logu(rng, 250.0, 900.0) if w[0] > 2e-6 else logu(rng, 900.0, 2500.0)
        scene = random_scene(rng, T, False)
        S = f64(forward(Q, mpf(T), *[mpf(v) for v in scene]))
        if corrected(Q, mpf(S), *[mpf(v) for v in scene]) <= 0 or kappa(Q, mpf(S), *[mpf(v) for v in scene]) > 20:
            continue
        nvec += 1
        kf, vf = tol("forward_response")
        out.vec("measured_response_weighted_radiance", [T] + list(scene),
                f64(forward(Q, mpf(T), *[mpf(v) for v in scene])), kf, vf, table=table)
        Tinv = inverse(Q, mpf(S), *[mpf(v) for v in scene], T0=mpf(T))
        ki, vi = tol("inverse")
        out.vec("object_temperature_response", [S] + list(scene), f64(Tinv), ki, vi, table=table)
        kd, vd = tol("derivative_response")
        out.vec("response_weighted_radiance_temperature_derivative", [T], f64(Q.dL(mpf(T))), kd, vd, table=table)
        if nvec % 2 == 0:
            us = uncertainties(rng, S, T, False)
            args = [S] + list(scene) + us
            e, Tr, tau, Tp = [mpf(v) for v in scene]
            c, scale = coefficients(Q, Tinv, e, Tr, tau, Tp)
            check_coefficients(Q, mpf(S), e, Tr, tau, Tp, Tinv, c, scale)
            name = "object_temperature_response_with_uncertainty"
            ki, vi = tol("inverse")
            out.vec(name + "@temperature_k", args, f64(Tinv), ki, vi, table=table)
            ku, vu = tol("uc")
            out.vec(name + "@combined_standard_uncertainty_k", args, f64(uc(c, [mpf(v) for v in us])), ku, vu,
                    table=table)
            for i in range(5):
                kc, vc = tol("coefficient_terms", 1e-12 * float(scale[i])) if i in (1, 3) else tol("coefficient")
                out.vec(name + "@sensitivity_%d" % i, args, f64(c[i]), kc, vc, table=table)
    d, w, r = RESPONSES[0]
    table = list(zip(w, r))
    out.status("object_temperature_response", [0.0, 0.9, 290.0, 0.95, 280.0], OOD, table=table)
    out.status("object_temperature_response", [10.0, 1.5, 290.0, 0.95, 280.0], OOD, table=table)
    out.status("object_temperature_response", [10.0, 0.9, 290.0, 0.0, 280.0], NP, table=table)


def brightness_section(out):
    out.comment("")
    out.comment("---- brightness temperature with uncertainty: T and dT/dL = 1/(dB/dT) ----")
    rng = rng_for("brightness")
    for kind, name in (("wl", "brightness_temperature_wavelength_with_uncertainty"),
                       ("nu", "brightness_temperature_frequency_with_uncertainty")):
        for _ in range(10):
            if kind == "wl":
                a = logu(rng, 0.5e-6, 20e-6)
                T = float(C2()) / (a * logu(rng, 0.5, 40.0))
            else:
                a = logu(rng, 1e9, 3e13)
                T = float(H() * a / KB()) / logu(rng, 0.01, 30.0)
            Q = Spectral(kind, a)
            L = f64(Q.L(mpf(T)))
            Tb = Q.inv(mpf(L))
            uL = L * rng.uniform(0.001, 0.02)
            c = 1 / Q.dL(Tb)
            # cross-check dT/dL by a central difference of the closed form at 70 digits
            with mp.workdps(DIFF_DPS):
                h = mpf(L) * mpf(10) ** -18
                n = (Q.inv(mpf(L) + h) - Q.inv(mpf(L) - h)) / (2 * h)
            assert abs(n - c) <= mpf(10) ** -25 * c
            ki, vi = tol("brightness")
            out.vec(name + "@temperature_k", [a, L, uL], f64(Tb), ki, vi)
            kc, vc = tol("coefficient")
            out.vec(name + "@sensitivity_0", [a, L, uL], f64(c), kc, vc)
            out.vec(name + "@combined_standard_uncertainty_k", [a, L, uL], f64(c * mpf(uL)), *tol("uc"))
        out.status(name, [a, L, -1.0], NEG)
        out.status(name, [a, 0.0, 1.0], NP)


def calibration_section(out):
    out.comment("")
    out.comment("---- two-load calibrated temperature with uncertainty: arguments nu, r_h, T_h, r_c, T_c, r, then")
    out.comment("     u(r_h), u(T_h), u(r_c), u(T_c), u(r); coefficients in that order.  Readings made from an")
    out.comment("     invented linear receiver r = g J(T) + o; reading condition <= 50. ----")
    rng = rng_for("calibration")
    name = "calibrated_temperature_with_uncertainty"
    th = lambda nu: H() * nu / KB()
    J = lambda nu, T: th(nu) / mp.expm1(th(nu) / T)
    dJ = lambda nu, T: (th(nu) / T) ** 2 * mp.exp(th(nu) / T) / mp.expm1(th(nu) / T) ** 2

    def temperature(nu, rh, Th, rc, Tc, r):
        j = J(nu, Tc) + (r - rc) / (rh - rc) * (J(nu, Th) - J(nu, Tc))
        return th(nu) / mp.log1p(th(nu) / j)

    n = 0
    while n < 10:
        nu = logu(rng, 1e9, 500e9)
        Th, Tc = rng.uniform(280.0, 370.0), rng.choice([77.0, rng.uniform(20.0, 120.0)])
        g, o = logu(rng, 1e-3, 1e3), rng.uniform(-50.0, 50.0)
        T = rng.uniform(Tc * 0.8, Th * 1.1)
        nu_m = mpf(nu)
        rh, rc, r = [f64(g * J(nu_m, mpf(t)) + o) for t in (Th, Tc, T)]
        args6 = [nu, rh, Th, rc, Tc, r]
        m6 = [mpf(v) for v in args6]
        Tx = temperature(*m6)
        # condition of T in the readings
        cond = max(abs(v) for v in (rh, rc, r)) / abs(rh - rc) * abs(J(nu_m, Th) - J(nu_m, Tc)) / (dJ(nu_m, Tx) * Tx)
        if cond > 50:
            continue
        n += 1
        w = (m6[5] - m6[3]) / (m6[1] - m6[3])
        gain = (m6[1] - m6[3]) / (J(nu_m, m6[2]) - J(nu_m, m6[4]))
        d = dJ(nu_m, Tx)
        c = [-w / (gain * d), w * dJ(nu_m, m6[2]) / d, -(1 - w) / (gain * d), (1 - w) * dJ(nu_m, m6[4]) / d,
             1 / (gain * d)]
        with mp.workdps(DIFF_DPS):
            for i, pos in enumerate((1, 2, 3, 4, 5)):
                h = abs(mpf(args6[pos])) * mpf(10) ** -18
                p, m = [mpf(v) for v in args6], [mpf(v) for v in args6]
                p[pos] += h
                m[pos] -= h
                num = (temperature(*p) - temperature(*m)) / (2 * h)
                assert abs(num - c[i]) <= mpf(10) ** -22 * max(abs(x) for x in c) * 10, (i, num, c[i])
        us = [abs(rh - rc) * 1e-3, 0.1, abs(rh - rc) * 1e-3, 0.2, abs(rh - rc) * 2e-3]
        args = args6 + us
        ki, vi = tol("calibration")
        out.vec(name + "@temperature_k", args, f64(Tx), ki, vi)
        out.vec(name + "@combined_standard_uncertainty_k", args, f64(uc(c, [mpf(v) for v in us])), *tol("uc"))
        for i in range(5):
            out.vec(name + "@sensitivity_%d" % i, args, f64(c[i]), *tol("coefficient"))
    out.status(name, args6 + [-1.0, 0.1, 1.0, 0.1, 1.0], NEG)
    out.status(name, args6[:5] + [NAN] + us, NF)


def correlated_tolerance(c, u, r):
    n = len(c)
    terms = [c[i] * c[j] * u[i] * u[j] * r[i * n + j] for i in range(n) for j in range(n)]
    v = mp.sqrt(sum(terms))
    size = sum(abs(t) for t in terms)
    return v, max(float(v) * 1e-14, (4 * n * n + 4) * 2.0 ** -53 * float(size) / (2 * float(v)))


def combination_section(out):
    out.comment("")
    out.comment("---- combined standard uncertainty of given coefficients: args n, c_1..c_n, u_1..u_n (eq. 10);")
    out.comment("     correlated: n, c_1..c_n, u_1..u_n, r_11..r_nn row-major (eq. 13) ----")
    rng = rng_for("combination")
    for n in (1, 2, 3, 5, 5, 4):
        c = [rng.choice([-1, 1]) * logu(rng, 1e-6, 1e3) for _ in range(n)]
        u = [logu(rng, 1e-4, 1e2) for _ in range(n)]
        v = uc([mpf(x) for x in c], [mpf(x) for x in u])
        out.vec("combined_standard_uncertainty", [n] + c + u, f64(v), *tol("uc_formula"))
    # correlation: a reflected and a path temperature read from the same room sensor (r = 0.8),
    # a negative correlation, identity, and full correlation that compensates exactly
    cases = [
        (3, [0.5, 0.2, -0.3], [1.0, 2.0, 2.0], [1, 0, 0, 0, 1, 0.8, 0, 0.8, 1]),
        (3, [0.5, 0.2, 0.3], [1.0, 2.0, 2.0], [1, -0.5, 0.25, -0.5, 1, 0.1, 0.25, 0.1, 1]),
        (2, [1e-3, 40.0], [100.0, 0.01], [1, 0, 0, 1]),
        (5, [1e-5, -60.0, 0.05, -80.0, 0.01], [2e3, 0.02, 2.0, 0.01, 2.0],
         [1, 0, 0, 0, 0, 0, 1, 0, 0.3, 0, 0, 0, 1, 0, 0.9, 0, 0.3, 0, 1, 0, 0, 0, 0.9, 0, 1]),
        (2, [1.0, 0.5], [1.0, 1.0], [1, 0.999, 0.999, 1]),
    ]
    for n, c, u, r in cases:
        v, t = correlated_tolerance([mpf(x) for x in c], [mpf(x) for x in u], [mpf(x) for x in r])
        out.vec("combined_standard_uncertainty_correlated", [n] + c + u + r, f64(v), "abs", t)
    out.status("combined_standard_uncertainty", [2, 1.0, 2.0, 1.0, -1.0], NEG)
    out.status("combined_standard_uncertainty", [2, NAN, 2.0, 1.0, 1.0], NF)
    out.status("combined_standard_uncertainty_correlated", [2, 1.0, 2.0, 1.0, 1.0, 1, 0.5, 0.4, 1], OOD)
    out.status("combined_standard_uncertainty_correlated", [2, 1.0, 2.0, 1.0, 1.0, 0.9, 0, 0, 1], OOD)
    out.status("combined_standard_uncertainty_correlated", [2, 1.0, 2.0, 1.0, 1.0, 1, 1.5, 1.5, 1], OOD)
    # not positive semi-definite: r12 = r13 = 0.9, r23 = -0.9; y = (-1, 1, 1) gives y'Ry = -2.4
    out.status("combined_standard_uncertainty_correlated",
               [3, -1.0, 1.0, 1.0, 1.0, 1.0, 1.0, 1, 0.9, 0.9, 0.9, 1, -0.9, 0.9, -0.9, 1], OOD)


def main():
    out = Out()
    header(out, "Scalar reference vectors of the radiation-thermometry functions (issue 12).")
    for kind in ("wl", "nu"):
        spectral_section(out, kind)
    band_section(out)
    brightness_section(out)
    calibration_section(out)
    combination_section(out)
    out.write(os.path.join(DATA, "thermometry.txt"))
    resp = Out()
    header(resp, "Response-table reference vectors of the radiation-thermometry functions (issue 12).")
    response_section(resp)
    resp.write(os.path.join(DATA, "thermometry_response.txt"))
    for o, f in ((out, "thermometry.txt"), (resp, "thermometry_response.txt")):
        print(f)
        for k in sorted(o.count):
            print("  %-70s %d" % (k, o.count[k]))


if __name__ == "__main__":
    sys.exit(main())
