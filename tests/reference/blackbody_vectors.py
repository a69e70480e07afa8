#!/usr/bin/env python3
"""Independent high-precision reference vectors for the relicore blackbody topic.

Run from anywhere:

    python3 tests/reference/blackbody_vectors.py

Writes (overwrites) tests/data/blackbody.txt (scalar vectors) and
tests/data/blackbody_response.txt (array vectors), in the format of tests/data/FORMAT.md.

Independence: every `mpmath` expected value below is an evaluation of the defining formula
(or a direct mpmath.quad integral) at mp.dps = 50, from the exact binary value of the printed
double (or float) arguments.  Nothing here reads, runs or imitates the project's Rust code.
Each closed-form value is recomputed at 80 digits and must agree; each integral is computed
twice by two different routes (mpmath.quad of the integrand, and the exact polylogarithm form
at 90 digits) and must agree.  Root-finding results are checked by substituting them back.

Only mpmath and the Python standard library are used.  The output is deterministic: every
random choice comes from random.Random seeded with a fixed string.

Physical constants: SI 2019 exact values of h, c, k; c1L = 2 h c^2, c2 = h c / k,
sigma = 2 pi^5 k^4 / (15 h^3 c^2), all evaluated exactly in mpmath.
"""

import math
import os
import random
import struct
import sys
import time
from fractions import Fraction

import mpmath
from mpmath import mp, mpf

DPS = 50          # working precision of every reference value
CHECK_DPS = 80    # closed forms are recomputed at this precision and must agree
POLY_DPS = 90     # precision of the polylogarithm cross-check of integrals
SEED = "relicore-blackbody-reference-v1"

mp.dps = DPS

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.normpath(os.path.join(HERE, "..", "data"))
SCRIPT = "tests/reference/blackbody_vectors.py"

DBL_MIN = 2.2250738585072014e-308
DBL_TRUE_MIN = 5e-324            # 2^-1074, parsed exactly
FLT_MIN = 1.1754943508222875e-38  # 2^-126
FLT_MAX = 3.4028234663852886e38

# ---------------------------------------------------------------------------------------------
# ONE central tolerance table.  key -> (kind, value or function of the vector context, reason)
# ---------------------------------------------------------------------------------------------
TOL = {
    "radiance": ("ulp", 4,
                 "B = prefactor/expm1(x): ~6 roundings; for x >> 1 x itself must carry extra precision (condition ~x)"),
    "radiance_f32": ("ulp32", 4,
                     "f32 twin of the spectral radiance: same rounding budget counted in f32 ulps"),
    "derivative": ("ulp", 8,
                   "B times x/(1-exp(-x))/T: three more roundings than B itself"),
    "exitance": ("ulp", 2,
                 "an exact-formula constant times T^4 or T^3: one constant, one power, one product"),
    "density_f32": ("ulp32", 2,
                    "f32 twin of a density: a constant times T^3 or T^4 formed to double length, in f32 ulps"),
    "peak": ("ulp", 1,
             "one precomputed constant and one product or quotient"),
    "band_fraction": ("abs", 1e-15,
                      "fraction of a unit total: absolute error of the incomplete Bose integrals"),
    "band": ("abs", lambda v, full: max(1e-14 * abs(v), 1e-15 * full),
             "difference of two incomplete integrals: relative 1e-14, floored at 1e-15 of the full-band value"),
    "inversion": ("rel", 1e-14,
                  "logarithm/root of a well-conditioned monotone function of T (condition <= ~1)"),
    "ratio_temperature": ("rel", 1e-13,
                          "root of ln(B1/B2) with x1-x2 >= 0.5: condition in T up to ~4, plus the solver"),
    "rayleigh_jeans": ("ulp", 2,
                       "c^2 L/(2 k nu^2): a constant and three products/quotients"),
    "response": ("rel", 1e-13,
                 "sum of per-segment closed forms or quadratures with O(1) cancellation between segments"),
    "response_inversion": ("rel", 1e-14,
                           "root in T of the response-weighted radiance (monotone, condition <= ~1)"),
    "calibration": ("rel", 1e-13,
                    "two-load linear calibration; vectors kept to input condition number <= 50"),
    "cmb_factor": ("ulp", 8,
                   "x^2 e^x/(e^x-1)^2 and a constant: ~8 roundings, x condition <= ~20 in the tested range"),
    "tsz_f": ("abs", lambda x: 1e-15 * (x + 4.0),
              "x coth(x/2) - 4 crosses zero at the null: absolute error scaled by the size of its terms"),
    "tsz_g": ("abs", lambda x, w: 1e-15 * (x + 4.0) * w,
              "tsz_f times the positive weight w = x^4 e^x/(e^x-1)^2: same scaling times w"),
    "tsz_null": ("ulp", 2,
                 "a root constant times k T0/h: a constant and one product"),
    "brightness_f32": ("ulp32", 4,
                       "f32 brightness temperature: logarithm of a well-conditioned ratio, counted in f32 ulps"),
    "band_f32": ("rel", 2e-6,
                 "f32 band radiance: about 16 f32 ulps for the difference of two incomplete integrals"),
    "calibration_f32": ("rel", 2e-6,
                        "f32 calibration: about 16 f32 ulps, or the (gain, offset) representation bound of calibration_tolerance() where larger"),
    "response_f32": ("rel", 2e-6,
                     "f32 response-weighted radiance: about 16 f32 ulps"),
    "response_inversion_f32": ("rel", 2e-6,
                               "f32 inverse of the response-weighted radiance: about 16 f32 ulps"),
    "subnormal_f64": ("abs", 8 * 2.0 ** -1074,
                      "want below DBL_MIN: gradual underflow leaves a fixed grid 2^-1074; allow 8 steps of it"),
    "zero_f64": ("abs", 2.0 ** -1074,
                 "want rounds to 0: accept 0 or the smallest subnormal"),
    "subnormal_f32": ("abs", 1.2e-38,
                      "want below FLT_MIN: f32 may flush to zero; only |got| < ~FLT_MIN is asserted"),
    "handbook": ("abs", 1e-4,
                 "blackbody fraction tables print 4 decimals (values recalled from memory)"),
    "fixsen_peak": ("rel", 1e-3,
                    "published rounded number (160.23 GHz), 5 digits"),
    "fixsen_null": ("rel", 2e-3,
                    "commonly quoted rounded number (217.5 GHz), 4 digits"),
    "wien_rule": ("rel", 1e-2,
                  "rule-of-thumb lambda_max T ~ 2898 um K, 3 digits"),
    "its90": ("rel", 1e-14,
              "exact inverse of the printed radiance, same as the other inversions"),
}


def tol(key, *ctx):
    kind, val, _ = TOL[key]
    return kind, (val(*ctx) if callable(val) else val)


def tol_for_value(key, want):
    """Tolerance for a value vector; swaps in the underflow entries for ulp-type tolerances."""
    kind, val = tol(key)
    if kind == "ulp" and abs(want) < DBL_MIN:
        return tol("zero_f64" if want == 0 else "subnormal_f64")
    if kind == "ulp32" and abs(want) < FLT_MIN:
        return tol("subnormal_f32")
    return kind, val


# ---------------------------------------------------------------------------------------------
# exact rounding of mpf values to binary64 / binary32 (round to nearest, ties to even)
# ---------------------------------------------------------------------------------------------
def to_fraction(v):
    v = mpf(v)
    if not mpmath.isfinite(v):
        raise ValueError("non-finite value %r" % v)
    if v == 0:
        return Fraction(0)
    s, man, exp, _ = v._mpf_
    man = int(man)
    q = Fraction(man << exp) if exp >= 0 else Fraction(man, 1 << (-exp))
    return -q if s else q


def round_binary(q, p, emin, emax):
    """Round a Fraction q to a binary format with p significand bits (incl. hidden)."""
    if q == 0:
        return 0.0
    neg = q < 0
    q = -q if neg else q
    n, d = q.numerator, q.denominator
    e = n.bit_length() - d.bit_length()
    # make 2^e <= q < 2^(e+1)
    if (n << max(0, -e)) < (d << max(0, e)):
        e -= 1
    e = max(e, emin)
    sh = e - p + 1
    num, den = (n, d << sh) if sh >= 0 else (n << (-sh), d)
    m, r = divmod(num, den)
    if 2 * r > den or (2 * r == den and (m & 1)):
        m += 1
    if m == 1 << p:
        m >>= 1
        sh += 1
    if sh + p - 1 > emax:
        out = math.inf
    else:
        out = math.ldexp(m, sh)
    return -out if neg else out


def f64(v):
    """Nearest binary64 to the mpf value v."""
    if isinstance(v, float):
        return v
    q = to_fraction(v)
    out = round_binary(q, 53, -1022, 1023)
    # independent check with CPython's correctly rounded integer division
    if q != 0:
        assert out == float(q), (v, out, float(q))
    return out


def f32v(v):
    """Nearest binary32 to the mpf (or float) value v, returned as a Python float."""
    return round_binary(to_fraction(mpf(v)), 24, -126, 127)


def f32(x):
    """Round a double input to binary32 (inputs are chosen values, rounding them is fine)."""
    return struct.unpack("f", struct.pack("f", x))[0]


def is_f32(x):
    return math.isnan(x) or f32(x) == x


# ---------------------------------------------------------------------------------------------
# constants (re-evaluated at the current precision)
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


def SIGMA():
    return 2 * mp.pi ** 5 * KB() ** 4 / (15 * H() ** 3 * C() ** 2)


_root_cache = {}


def peak_root(n):
    """Root of x = n (1 - e^-x), x > 0: x = n + W0(-n e^-n), checked by findroot."""
    key = ("peak", n, mp.prec)
    if key not in _root_cache:
        n = mpf(n)
        x = n + mp.lambertw(-n * mp.exp(-n)).real
        y = mp.findroot(lambda t: t - n * (1 - mp.exp(-t)), x)
        assert abs(x - y) < mpf(10) ** (-mp.dps + 3)
        _root_cache[key] = x
    return _root_cache[key]


def tsz_root():
    """Root of x coth(x/2) = 4."""
    key = ("tsz", mp.prec)
    if key not in _root_cache:
        x = mp.findroot(lambda t: t * mp.coth(t / 2) - 4, mpf("3.83"))
        assert abs(x * mp.coth(x / 2) - 4) < mpf(10) ** (-mp.dps + 3)
        _root_cache[key] = x
    return _root_cache[key]


# ---------------------------------------------------------------------------------------------
# defining formulas (mpf in, mpf out)
# ---------------------------------------------------------------------------------------------
def x_wl(lam, T):
    return C2() / (lam * T)


def x_fr(nu, T):
    return H() * nu / (KB() * T)


def x_wn(wn, T):
    return C2() * wn / T


def bose(x):
    return 1 / mp.expm1(x)


def L_wl(lam, T):
    return C1L() / lam ** 5 * bose(x_wl(lam, T))


def L_fr(nu, T):
    return 2 * H() * nu ** 3 / C() ** 2 * bose(x_fr(nu, T))


def L_wn(wn, T):
    return C1L() * wn ** 3 * bose(x_wn(wn, T))


def N_wl(lam, T):
    return 2 * C() / lam ** 4 * bose(x_wl(lam, T))


def N_fr(nu, T):
    return 2 * nu ** 2 / C() ** 2 * bose(x_fr(nu, T))


def N_wn(wn, T):
    return 2 * C() * wn ** 2 * bose(x_wn(wn, T))


def dLdT_wl(lam, T):
    x = x_wl(lam, T)
    return L_wl(lam, T) * x / (-mp.expm1(-x) * T)


def dLdT_fr(nu, T):
    x = x_fr(nu, T)
    return L_fr(nu, T) * x / (-mp.expm1(-x) * T)


def radiant_exitance(T):
    return SIGMA() * T ** 4


def photon_exitance(T):
    return 4 * mp.pi * mp.zeta(3) * KB() ** 3 * T ** 3 / (H() ** 3 * C() ** 2)


def photon_number_density(T):
    """n = 16 pi zeta(3) (kT/hc)^3: Planck's photon spectrum 8 pi nu^2/c^3/(e^(h nu/kT) - 1)
    integrated over nu (the Bose integral 2 zeta(3)); written from the defining constants, not
    from the core's rounded constant."""
    return 16 * mp.pi * mp.zeta(3) * (KB() * T / (H() * C())) ** 3


def radiation_energy_density(T):
    """u = a T^4, a = 8 pi^5 k^4/(15 h^3 c^3) (= 4 sigma/c)."""
    return 8 * mp.pi ** 5 * KB() ** 4 * T ** 4 / (15 * H() ** 3 * C() ** 3)


def peak_wavelength(T):
    return C2() / (peak_root(5) * T)


def peak_frequency(T):
    return peak_root(3) * KB() * T / H()


def peak_wavenumber(T):
    return peak_root(3) * T / C2()


def photon_peak_wavelength(T):
    return C2() / (peak_root(4) * T)


def photon_peak_frequency(T):
    return peak_root(2) * KB() * T / H()


def temperature_from_peak_wavelength(lam):
    return C2() / (peak_root(5) * lam)


def temperature_from_peak_frequency(nu):
    return H() * nu / (peak_root(3) * KB())


def brightness_temperature_wavelength(lam, L):
    return C2() / (lam * mp.log1p(C1L() / (lam ** 5 * L)))


def brightness_temperature_frequency(nu, L):
    return (H() * nu / KB()) / mp.log1p(2 * H() * nu ** 3 / (C() ** 2 * L))


def rayleigh_jeans_temperature(nu, L):
    return C() ** 2 * L / (2 * KB() * nu ** 2)


def rj_brightness(nu, T):
    a = H() * nu / KB()
    return a / mp.expm1(a / T)


def calibrated_brightness_temperature(nu, rh, Th, rc, Tc, r):
    jh, jc = rj_brightness(nu, Th), rj_brightness(nu, Tc)
    gain = (rh - rc) / (jh - jc)
    offset = rh - gain * jh
    return (r - offset) / gain


def calibrated_temperature(nu, rh, Th, rc, Tc, r):
    js = calibrated_brightness_temperature(nu, rh, Th, rc, Tc, r)
    a = H() * nu / KB()
    return a / mp.log1p(a / js)


def rj_factor(nu, T0):
    x = x_fr(nu, T0)
    return x ** 2 * mp.exp(x) / mp.expm1(x) ** 2


def kcmb_to_mjy_per_sr(nu, T0):
    return mpf(10) ** 20 * 2 * KB() * nu ** 2 / C() ** 2 * rj_factor(nu, T0)


def tsz_f(nu, T0):
    x = x_fr(nu, T0)
    return x * mp.coth(x / 2) - 4


def tsz_weight(nu, T0):
    x = x_fr(nu, T0)
    return x ** 4 * mp.exp(x) / mp.expm1(x) ** 2


def tsz_g(nu, T0):
    return tsz_weight(nu, T0) * tsz_f(nu, T0)


def tsz_null(T0):
    return tsz_root() * KB() * T0 / H()


# ---------------------------------------------------------------------------------------------
# evaluation helpers
# ---------------------------------------------------------------------------------------------
def hp(fn, *args, scale=0):
    """fn at DPS and at CHECK_DPS from the exact double args; asserts agreement (relative to
    max(|f|, scale): scale is the size of the cancelling terms for functions crossing zero);
    returns the DPS value."""
    with mp.workdps(DPS):
        a = fn(*[mpf(x) for x in args])
    with mp.workdps(CHECK_DPS):
        b = fn(*[mpf(x) for x in args])
        if b == 0:
            assert a == 0
        else:
            assert abs(a - b) <= max(abs(b), scale) * mpf(10) ** (-(DPS - 6)), (fn.__name__, args, a, b)
    return +a


COND = {}



def calibration_tolerance(args, base, unit_roundoff):
    """Relative tolerance of a calibrated temperature.

    The calibration is handed to the caller as (gain, offset) floats, so the offset is only
    known to about u*(|reading_hot| + |gain*J_hot|) absolute (it is the small difference of two
    such terms), and J = (reading - offset)/gain inherits an absolute error of about
    u*(|reading_hot| + |reading_cold| + |reading| + |offset|)/|gain| kelvin.  Relative to J this
    is the bound below (4 roundings' worth); the physical temperature T(J) has d ln T/d ln J <= 1
    so the same relative bound applies to it.  With f64 it stays far below `base`."""
    nu, rh, th, rc, tc, r = [mpf(v) for v in args]
    with mp.workdps(DPS):
        jh, jc = rj_brightness(nu, th), rj_brightness(nu, tc)
        gain = (rh - rc) / (jh - jc)
        offset = rh - gain * jh
        j = (r - offset) / gain
        cond = (abs(rh) + abs(rc) + abs(r) + abs(offset)) / abs(gain * j)
    return max(base, float(4 * unit_roundoff * cond))


def note_condition(name, fn, args):
    """Record sum_i |d ln f / d ln a_i| (relative condition number w.r.t. the inputs)."""
    with mp.workdps(DPS):
        a = [mpf(x) for x in args]
        f0 = fn(*a)
        if f0 == 0:
            return
        d = mpf(10) ** -20
        k = mpf(0)
        for i in range(len(a)):
            if a[i] == 0:
                continue
            ap, am = list(a), list(a)
            ap[i] = a[i] * (1 + d)
            am[i] = a[i] * (1 - d)
            k += abs((fn(*ap) - fn(*am)) / (2 * d * f0))
    COND[name] = max(COND.get(name, 0.0), float(k))


def rng_for(name):
    return random.Random(SEED + ":" + name)


def logu(rng, a, b):
    return math.exp(rng.uniform(math.log(a), math.log(b)))


def logspace(a, b, n):
    return [a * (b / a) ** (i / (n - 1)) for i in range(n)]


# ---------------------------------------------------------------------------------------------
# incomplete Bose integrals  I_p(a, b) = integral_a^b t^p / (e^t - 1) dt   (b may be inf)
# ---------------------------------------------------------------------------------------------
def bose_quad(p, a, b):
    a, b = mpf(a), mpf(b)
    assert 0 <= a < b
    # mp.quad stops on an ABSOLUTE error estimate: scale the integrand to O(1) first
    g = lambda t: t ** p / mp.expm1(t)
    sc = g(min(max(a, mpf(p) - mpf("0.2")), b))
    f = lambda t: g(t) / sc
    inner = set()
    for s in (1, 4, 16, 64, 256):
        inner.add(mpf(s))
    for s in (1, 8, 40, 200):
        inner.add(a + s)
    pts = [a] + sorted(s for s in inner if a < s < b) + [b]
    return mp.quad(f, pts) * sc


def bose_tail(p, x):
    """integral_x^inf t^p/(e^t-1) dt in closed polylog form (p = 2 or 3)."""
    x = mpf(x)
    if x == 0:
        return mp.gamma(p + 1) * mp.zeta(p + 1)
    if mp.isinf(x):
        return mpf(0)
    z = mp.exp(-x)
    li1 = -mp.log(-mp.expm1(-x))
    if p == 3:
        return x ** 3 * li1 + 3 * x ** 2 * mp.polylog(2, z) + 6 * x * mp.polylog(3, z) + 6 * mp.polylog(4, z)
    if p == 2:
        return x ** 2 * li1 + 2 * x * mp.polylog(2, z) + 2 * mp.polylog(3, z)
    raise ValueError(p)


def bose_poly(p, a, b):
    """I_p(a, b) via the polylog form at POLY_DPS (the cross-check route)."""
    with mp.workdps(POLY_DPS):
        return bose_tail(p, a) - bose_tail(p, b)


def bose_int(p, a, b):
    """Primary: mpmath.quad at DPS; cross-checked against the polylog form."""
    with mp.workdps(DPS):
        q = bose_quad(p, a, b)
    ref = bose_poly(p, a, b)
    full = mp.gamma(p + 1) * mp.zeta(p + 1)
    with mp.workdps(POLY_DPS):
        assert abs(q - ref) <= mpf(10) ** -60 * full + mpf(10) ** -38 * abs(ref), (p, a, b, q, ref)
    return q


def x_of_wl(lam, T):
    """x for a wavelength bound, with 0 -> inf and inf -> 0."""
    lam = mpf(lam)
    if lam == 0:
        return mp.inf
    if mp.isinf(lam):
        return mpf(0)
    return x_wl(lam, mpf(T))


def x_of_fr(nu, T):
    nu = mpf(nu)
    if mp.isinf(nu):
        return mp.inf
    return x_fr(nu, mpf(T))


def band_wl_x(lo, up, T):
    return x_of_wl(up, T), x_of_wl(lo, T)   # (small x, large x)


def band_fraction_wavelength(lo, up, T, fast=False):
    a, b = band_wl_x(lo, up, T)
    i = bose_poly(3, a, b) if fast else bose_int(3, a, b)
    return 15 / mp.pi ** 4 * i


def band_radiance_wavelength(lo, up, T, fast=False):
    a, b = band_wl_x(lo, up, T)
    i = bose_poly(3, a, b) if fast else bose_int(3, a, b)
    T = mpf(T)
    return C1L() * (T / C2()) ** 4 * i


def band_photon_radiance_wavelength(lo, up, T):
    a, b = band_wl_x(lo, up, T)
    T = mpf(T)
    return 2 * C() * (T / C2()) ** 3 * bose_int(2, a, b)


def band_radiance_frequency(lo, up, T):
    a, b = x_of_fr(lo, T), x_of_fr(up, T)
    T = mpf(T)
    return 2 * KB() ** 4 * T ** 4 / (H() ** 3 * C() ** 2) * bose_int(3, a, b)


def full_energy(T):
    return SIGMA() * mpf(T) ** 4 / mp.pi


def full_photon(T):
    T = mpf(T)
    return 2 * KB() ** 3 * T ** 3 / (H() ** 3 * C() ** 2) * 2 * mp.zeta(3)


def solve_lnT(F, target, T0):
    """T > 0 with ln F(T) = ln target, started at T0 (secant on u = ln T), at DPS."""
    target = mpf(target)
    lt = mp.log(target)
    g = lambda u: mp.log(F(mp.exp(u))) - lt
    u0 = mp.log(mpf(T0))
    u = mp.findroot(g, (u0, u0 + mpf(10) ** -8), solver="secant", tol=mpf(10) ** (-2 * DPS + 20))
    T = mp.exp(u)
    assert abs(g(u)) < mpf(10) ** (-DPS + 8), (T0, g(u))
    return T


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
    if kind in ("ulp", "ulp32", "status"):
        return str(int(t))
    return "%.17e" % t


class Out:
    def __init__(self):
        self.lines = []
        self.count = {}
        self.nargs = {}

    def comment(self, text=""):
        for line in text.split("\n"):
            self.lines.append(("# " + line).rstrip())

    def blank(self):
        self.lines.append("")

    def vec(self, name, args, expected, kind, t, source):
        args = [float(a) for a in args]
        n = self.nargs.setdefault(name, len(args))
        assert n == len(args), (name, args)
        if name.endswith("_f32"):
            assert all(is_f32(a) for a in args), (name, args)
            if kind != "status":
                assert is_f32(expected), (name, expected)
        if kind != "status":
            assert math.isfinite(expected), (name, args, expected)
        for a in args:  # round trip of the printed form
            assert math.isnan(a) or float(fmt(a)) == a
        fields = [name, str(len(args))] + [fmt(a) for a in args] + [fmt(expected), kind, fmt_tol(kind, t), source]
        self.lines.append(" ".join(fields))
        key = (name, "status" if kind == "status" else "value")
        self.count[key] = self.count.get(key, 0) + 1

    def value(self, name, args, want, tolkey, source="mpmath", f32out=False, rel_override=None):
        """Print a value vector; want is an mpf reference value; tolerance from TOL (or a
        relative tolerance computed for this vector, whose reason is given where it is made)."""
        e = f32v(want) if f32out else f64(want)
        kind, t = tol_for_value(tolkey, e)
        if rel_override is not None:
            assert kind == "rel"
            t = rel_override
        self.vec(name, args, e, kind, t, source)
        return e

    def status(self, name, args, code, source="spec"):
        self.vec(name, args, "nan", "status", code, source)

    def errors(self, name, valid, cases):
        """cases: list of (position, bad value, expected status); one bad argument each."""
        for pos, bad, code in cases:
            a = list(valid)
            a[pos] = bad
            self.status(name, a, code)

    def write(self, path):
        with open(path, "w") as fh:
            fh.write("\n".join(self.lines) + "\n")


NAN, INF = math.nan, math.inf
NF, NP, NEG, EMPTY, DEGEN, OOD = -2, -3, -4, -5, -9, -10


def header(out, what):
    out.comment("GENERATED FILE - do not edit by hand.")
    out.comment("Generated by %s (deterministic, seeded '%s')." % (SCRIPT, SEED))
    out.comment(what)
    out.comment("Format: tests/data/FORMAT.md.  Constants: SI 2019 exact h, c, k (c1L = 2hc^2, c2 = hc/k).")
    out.comment("Sources:")
    out.comment("  mpmath          independent evaluation of the defining formula (or mpmath.quad of the")
    out.comment("                  integrand) at mp.dps = 50 from the exact binary value of the printed")
    out.comment("                  arguments, rounded to nearest f64 (f32 for *_f32 names); cross-checked at")
    out.comment("                  80 digits / by a second integration route.  Never from project code.")
    out.comment("  spec            expected failure status from the project's argument validation rules.")
    out.comment("  handbook-memory published table value recalled from memory (heat-transfer textbook")
    out.comment("                  blackbody fraction table); loose tolerance.")
    out.comment("  fixsen2009-common-practice  CMB temperature 2.72548 K (Fixsen 2009, ApJ 707, 916) and")
    out.comment("                  the commonly quoted rounded numbers derived from it; loose tolerance.")
    out.comment("  common-practice rule-of-thumb fact of the trade; loose tolerance.")
    out.comment("  its90           ITS-90 (Preston-Thomas 1990, Metrologia 27, 3) radiance-ratio construction;")
    out.comment("                  expected is the exact mpmath inverse of the printed radiance.")
    out.comment("Tolerances (one central table in the script; kind value: reason):")
    for key, (kind, val, reason) in TOL.items():
        v = "f(vector)" if callable(val) else ("%g" % val)
        out.comment("  %-24s %-5s %-10s %s" % (key, kind, v, reason))
    out.blank()


# ---------------------------------------------------------------------------------------------
# scalar sections
# ---------------------------------------------------------------------------------------------
SPECTRAL = [
    # name, formula, argument from (x, T) in mpmath, nice points, nice-point label
    ("spectral_radiance_wavelength", L_wl, lambda x, T: C2() / (x * T),
     [(1e-6, 3000.0), (10e-6, 300.0), (500e-9, 5778.0), (650e-9, 1337.33), (4e-6, 1000.0)]),
    ("spectral_radiance_frequency", L_fr, lambda x, T: x * KB() * T / H(),
     [(160.2e9, 2.72548), (1e9, 2.72548), (30e12, 300.0), (600e12, 5778.0), (1e15, 1e4)]),
    ("spectral_radiance_wavenumber", L_wn, lambda x, T: x * T / C2(),
     [(1e5, 300.0), (2e6, 5778.0), (5.35e2, 2.72548), (2.5e5, 1000.0)]),
    ("photon_radiance_wavelength", N_wl, lambda x, T: C2() / (x * T),
     [(1e-6, 3000.0), (10e-6, 300.0), (500e-9, 5778.0), (2e-3, 2.72548)]),
    ("photon_radiance_frequency", N_fr, lambda x, T: x * KB() * T / H(),
     [(160.2e9, 2.72548), (30e12, 300.0), (600e12, 5778.0)]),
    ("photon_radiance_wavenumber", N_wn, lambda x, T: x * T / C2(),
     [(1e5, 300.0), (2e6, 5778.0), (5.35e2, 2.72548)]),
]

DERIVATIVES = [
    ("radiance_temperature_derivative_wavelength", dLdT_wl, lambda x, T: C2() / (x * T),
     [(1e-6, 3000.0), (10e-6, 300.0), (500e-9, 5778.0), (650e-9, 1337.33)]),
    ("radiance_temperature_derivative_frequency", dLdT_fr, lambda x, T: x * KB() * T / H(),
     [(160.2e9, 2.72548), (30e12, 300.0), (600e12, 5778.0)]),
]

SPECTRAL_XRANGE = (1e-10, 1e3)
SPECTRAL_TRANGE = (1.0, 1e6)
OVERFLOW_X = 709.782712893384  # ln(DBL_MAX)


def tail_points(fn, argfn, T, rng):
    """x values in the far Wien tail, chosen by the size of the result: a normal result near
    1e-300, a normal result with e^x beyond the double range (when the result at x = 709.78 is
    still above DBL_MIN), subnormal results, and a result rounding to 0."""
    pts = []
    with mp.workdps(DPS):
        Tm = mpf(T)
        lnf = lambda x: mp.log(fn(argfn(x, Tm), Tm))
        x0 = mpf(700)

        def x_at(v):
            target = mp.log(mpf(v))
            return mp.findroot(lambda t: lnf(t) - target, x0 + (lnf(x0) - target))
        for v in ("1e-300", "1e-312", "1e-321", "1e-330"):
            pts.append(x_at(v))
        xc = x_at(DBL_MIN)
        if xc > OVERFLOW_X + mpf("0.01"):
            pts.append(OVERFLOW_X + (xc - OVERFLOW_X) * rng.uniform(0.1, 0.9))
    return pts


def spectral_section(out, name, fn, argfn, nice, n_grid, n_rand, n_peak, n_tail_T, tolkey):
    rng = rng_for(name)
    cases = []   # (x, T) in mpmath / float
    xs = logspace(SPECTRAL_XRANGE[0], SPECTRAL_XRANGE[1], n_grid)
    Ts = logspace(SPECTRAL_TRANGE[0], SPECTRAL_TRANGE[1], n_grid)
    rng.shuffle(Ts)
    cases += list(zip(xs, Ts))
    for _ in range(n_rand):
        cases.append((logu(rng, *SPECTRAL_XRANGE), logu(rng, *SPECTRAL_TRANGE)))
    for _ in range(n_peak):
        cases.append((rng.uniform(0.5, 12.0), logu(rng, *SPECTRAL_TRANGE)))
    tail_T = [1.0, 1e6] + [logu(rng, 10.0, 1e5) for _ in range(n_tail_T - 2)]
    for T in tail_T:
        for x in tail_points(fn, argfn, T, rng):
            cases.append((x, T))
    cases.append((1e4, logu(rng, 1.0, 1e6)))
    cases.append((1e5, logu(rng, 1.0, 1e6)))
    args_list = []
    for x, T in cases:
        T = float(T)
        with mp.workdps(DPS):
            a = f64(argfn(mpf(x), mpf(T)))
        args_list.append((a, T))
    args_list += [(float(a), float(T)) for a, T in nice]
    xmin, xmax = math.inf, 0.0
    n_sub = n_zero = n_beyond = 0
    for a, T in args_list:
        want = hp(fn, a, T)
        e = out.value(name, [a, T], want, tolkey)
        with mp.workdps(DPS):
            xv = float(x_wl(mpf(a), mpf(T)) if "wavelength" in name else
                       x_fr(mpf(a), mpf(T)) if "frequency" in name else x_wn(mpf(a), mpf(T)))
        xmin, xmax = min(xmin, xv), max(xmax, xv)
        if e == 0:
            n_zero += 1
        elif abs(e) < DBL_MIN:
            n_sub += 1
        elif xv > OVERFLOW_X:
            n_beyond += 1
        if e != 0 and xv < 800:
            note_condition(name, fn, [a, T])
    return dict(xmin=xmin, xmax=xmax, n_zero=n_zero, n_sub=n_sub, n_beyond=n_beyond, n=len(args_list))


def spectral_errors(out, name, valid):
    out.errors(name, valid, [(0, NAN, NF), (1, INF, NF), (0, 0.0, NP), (1, -0.0, NP), (0, -valid[0], NP)])


def spectral_f32_section(out, name, fn, argfn, nice, lo, hi, n_rand):
    rng = rng_for(name + "_f32")
    args_list = []
    while len(args_list) < n_rand:
        a, T = f32(logu(rng, lo, hi)), f32(logu(rng, 1.0, 1e5))
        with mp.workdps(DPS):
            xv = (x_wl if "wavelength" in name else x_fr if "frequency" in name else x_wn)(mpf(a), mpf(T))
        if xv <= 150:
            args_list.append((a, T))
    # edge points: x near 150 at both ends of the temperature range, domain corners
    for T in (1.0, 30.0, 1e3, 1e5):
        with mp.workdps(DPS):
            a = f32(f64(argfn(mpf(149.5), mpf(T))))
        if lo <= a <= hi:
            args_list.append((a, f32(T)))
    for a in (lo, hi):
        for T in (1.0, 1e5):
            a32, T32 = f32(a), f32(T)
            with mp.workdps(DPS):
                xv = (x_wl if "wavelength" in name else x_fr if "frequency" in name else x_wn)(mpf(a32), mpf(T32))
            if xv <= 150:
                args_list.append((a32, T32))
    args_list += [(f32(a), f32(T)) for a, T in nice]
    n_under = 0
    for a, T in args_list:
        want = hp(fn, a, T)
        e = out.value(name + "_f32", [a, T], want, "radiance_f32", f32out=True)
        if abs(e) < FLT_MIN:
            n_under += 1
    out.errors(name + "_f32", [args_list[0][0], args_list[0][1]], [(0, NAN, NF), (1, 0.0, NP)])
    return len(args_list), n_under


def simple_T_section(out, name, fn, tolkey, Ts, nice=()):
    for T in list(Ts) + list(nice):
        want = hp(fn, T)
        out.value(name, [T], want, tolkey)
        note_condition(name, fn, [T])


def band_cases(rng, n_each):
    """(lower_x_is_inf?, ...) returns list of (x_small, x_large, T) with inf for the ends."""
    cases = []
    for _ in range(n_each):
        cases.append((0.0, logu(rng, 1e-3, 200.0)))          # x_small = 0 -> unbounded upper end
    for _ in range(n_each):
        cases.append((logu(rng, 1e-3, 200.0), math.inf))     # x_large = inf -> lower end 0
    cases.append((0.0, math.inf))
    for _ in range(n_each + 4):
        xs = logu(rng, 1e-4, 50.0)
        cases.append((xs, xs * logu(rng, 1.5, 1e3)))
    for _ in range(n_each - 2):
        xs = logu(rng, 1e-3, 100.0)
        cases.append((xs, xs * (1 + logu(rng, 1e-6, 1e-2))))
    cases.append((1e-9, 1e-8))          # deep Rayleigh-Jeans band
    cases.append((0.0, 1e-8))           # almost nothing from the long-wave end ... (0 < x < 1e-8)
    cases.append((1e-8, math.inf))      # almost the full band
    cases.append((300.0, 330.0))        # far Wien band
    return [(a, b, logu(rng, 1.0, 1e6)) for a, b in cases]


def wl_bounds(xs, xl, T):
    """wavelength (lower, upper) for x in (xs, xl); printed doubles."""
    with mp.workdps(DPS):
        lo = 0.0 if math.isinf(xl) else f64(C2() / (mpf(xl) * mpf(T)))
        up = math.inf if xs == 0 else f64(C2() / (mpf(xs) * mpf(T)))
    return lo, up


def fr_bounds(xs, xl, T):
    with mp.workdps(DPS):
        lo = 0.0 if xs == 0 else f64(mpf(xs) * KB() * mpf(T) / H())
        up = math.inf if math.isinf(xl) else f64(mpf(xl) * KB() * mpf(T) / H())
    return lo, up


def band_errors(out, name, valid, unit):
    lo, up, T = valid
    out.status(name, [NAN, up, T], NF)
    out.status(name, [INF, INF, T], NF)
    out.status(name, [lo, -INF, T], NF)
    out.status(name, [-unit, up, T], NEG)
    out.status(name, [up, up, T], EMPTY)
    out.status(name, [up, lo, T], EMPTY)
    out.status(name, [lo, up, 0.0], NP)


# ---------------------------------------------------------------------------------------------
# the scalar file
# ---------------------------------------------------------------------------------------------
def build_scalar(summary):
    out = Out()
    header(out, "Scalar reference vectors for the blackbody functions (f64 and _f32 twins).")

    # ---------------- spectral radiances ----------------
    for name, fn, argfn, nice in SPECTRAL:
        out.comment("%s: x = hc/(lambda k T) (or h nu/(kT), hc wn/(kT)) log-spaced %g..%g, random, near the"
                    % (name, SPECTRAL_XRANGE[0], SPECTRAL_XRANGE[1]))
        out.comment("peak, and far Wien tail (x > 709.78: e^x overflows in f64; subnormal and zero results);")
        out.comment("T 1..1e6 K; then 'nice' points.  Results below DBL_MIN use abs 8*2^-1074, zero results abs 2^-1074.")
        info = spectral_section(out, name, fn, argfn, nice, 40, 20, 8, 4, "radiance")
        spectral_errors(out, name, list(out_last_args(out)))
        summary[name] = info
        out.blank()

    for name, fn, argfn, nice in DERIVATIVES:
        out.comment("%s: d/dT of the spectral radiance, B x e^x/((e^x-1) T); same x and T coverage." % name)
        info = spectral_section(out, name, fn, argfn, nice, 30, 14, 5, 3, "derivative")
        spectral_errors(out, name, list(out_last_args(out)))
        summary[name] = info
        out.blank()

    # f32 twins of the spectral radiances
    f32_domains = {
        "spectral_radiance_wavelength": (2e-7, 1e-1, [(1e-6, 3000.0), (10e-6, 300.0), (500e-9, 5778.0)]),
        "spectral_radiance_frequency": (1e9, 3e14, [(160.2e9, 2.72548), (30e12, 300.0)]),
        "spectral_radiance_wavenumber": (1e2, 5e6, [(1e5, 300.0), (2e6, 5778.0)]),
    }
    for name, fn, argfn, _ in SPECTRAL[:3]:
        lo, hi, nice = f32_domains[name]
        out.comment("%s_f32: f32 arguments in %g..%g and T 1..1e5 K with x <= 150; expected rounded to f32;"
                    % (name, lo, hi))
        out.comment("results below FLT_MIN use abs 1.2e-38.")
        n, nu = spectral_f32_section(out, name, fn, argfn, nice, lo, hi, 36)
        summary[name + "_f32"] = dict(n=n, n_under=nu)
        out.blank()

    # ---------------- exitance ----------------
    rng = rng_for("exitance")
    Ts = logspace(1e-3, 1e8, 23) + [logu(rng, 1e-3, 1e8) for _ in range(8)]
    out.comment("radiant_exitance = sigma T^4, photon_exitance = 4 pi zeta(3) k^3 T^3/(h^3 c^2); T 1e-3..1e8 K.")
    simple_T_section(out, "radiant_exitance", radiant_exitance, "exitance", Ts, (300.0, 5772.0, 2.72548))
    out.errors("radiant_exitance", [300.0], [(0, NAN, NF), (0, -INF, NF), (0, 0.0, NP), (0, -300.0, NP)])
    simple_T_section(out, "photon_exitance", photon_exitance, "exitance", Ts, (300.0, 5772.0, 2.72548))
    out.errors("photon_exitance", [300.0], [(0, NAN, NF), (0, INF, NF), (0, -0.0, NP), (0, -1.0, NP)])
    out.blank()

    # ---------------- densities of blackbody radiation ----------------
    rng = rng_for("density")
    Ts = logspace(1e-3, 1e8, 23) + [logu(rng, 1e-3, 1e8) for _ in range(8)]
    out.comment("photon_number_density = 16 pi zeta(3) (kT/hc)^3, radiation_energy_density = 8 pi^5 k^4 T^4/(15 h^3 c^3);")
    out.comment("T 1e-3..1e8 K; the _f32 twins at f32 temperatures 1e-3..1e8 K, expected rounded to f32.")
    for name, fn in (("photon_number_density", photon_number_density),
                     ("radiation_energy_density", radiation_energy_density)):
        simple_T_section(out, name, fn, "exitance", Ts, (300.0, 5772.0, 2.7255))
        out.errors(name, [300.0], [(0, NAN, NF), (0, INF, NF), (0, -INF, NF), (0, 0.0, NP), (0, -0.0, NP),
                                   (0, -1.0, NP)])
        for T in [f32(x) for x in logspace(1e-3, 1e8, 12)] + [f32(2.7255), 300.0]:
            out.value(name + "_f32", [T], hp(fn, T), "density_f32", f32out=True)
        out.errors(name + "_f32", [300.0], [(0, NAN, NF), (0, 0.0, NP), (0, -1.0, NP)])
    # overflow of the f64 result is refused, not returned as infinity
    out.status("radiation_energy_density", [1e80], OOD)
    out.status("photon_number_density", [1e110], OOD)
    out.status("radiation_energy_density_f32", [f32(1e14)], OOD)
    out.status("photon_number_density_f32", [f32(1e14)], OOD)
    out.blank()

    # ---------------- peaks ----------------
    out.comment("Peaks: x5, x4, x3, x2 = n + W0(-n e^-n) roots of x = n(1 - e^-x); T 1e-3..1e8 K.")
    rng = rng_for("peaks")
    Ts = logspace(1e-3, 1e8, 17) + [logu(rng, 1e-3, 1e8) for _ in range(6)]
    for name, fn in (("peak_wavelength", peak_wavelength), ("peak_frequency", peak_frequency),
                     ("peak_wavenumber", peak_wavenumber), ("photon_peak_wavelength", photon_peak_wavelength),
                     ("photon_peak_frequency", photon_peak_frequency)):
        simple_T_section(out, name, fn, "peak", Ts, (300.0, 5772.0, 2.72548, 3000.0))
        out.errors(name, [300.0], [(0, NAN, NF), (0, INF, NF), (0, 0.0, NP), (0, -5772.0, NP)])
    rng = rng_for("temperature_from_peak")
    lams = logspace(1e-10, 1e3, 17) + [logu(rng, 1e-10, 1e3) for _ in range(6)] + [500e-9, 10e-6, 1.063e-3]
    for lam in lams:
        out.value("temperature_from_peak_wavelength", [lam], hp(temperature_from_peak_wavelength, lam), "peak")
    out.errors("temperature_from_peak_wavelength", [500e-9],
               [(0, NAN, NF), (0, INF, NF), (0, 0.0, NP), (0, -500e-9, NP)])
    nus = logspace(1e6, 1e20, 17) + [logu(rng, 1e6, 1e20) for _ in range(6)] + [160.2e9, 3.4e14]
    for nu in nus:
        out.value("temperature_from_peak_frequency", [nu], hp(temperature_from_peak_frequency, nu), "peak")
    out.errors("temperature_from_peak_frequency", [160.2e9],
               [(0, NAN, NF), (0, -INF, NF), (0, -0.0, NP), (0, -1e9, NP)])
    out.blank()

    # ---------------- band integrals ----------------
    out.comment("Band integrals: bounds chosen by x = c2/(lambda T) (or h nu/kT) from 1e-9 to 330 and the")
    out.comment("open ends (lower 0, upper inf), wide and narrow (relative width 1e-6..1e-2) bands; T 1..1e6 K.")
    out.comment("Expected: mpmath.quad of t^p/(e^t-1) over the x range, cross-checked by the polylog form.")
    for name, unitlo, mk in (("band_fraction_wavelength", 1e-6, wl_bounds),
                             ("band_radiance_wavelength", 1e-6, wl_bounds),
                             ("band_photon_radiance_wavelength", 1e-6, wl_bounds),
                             ("band_radiance_frequency", 1e9, fr_bounds)):
        rng = rng_for(name)
        cs = band_cases(rng, 8)
        for xs, xl, T in cs:
            lo, up = mk(xs, xl, T)
            if name == "band_fraction_wavelength":
                want = band_fraction_wavelength(lo, up, T)
                out.value(name, [lo, up, T], want, "band_fraction")
            else:
                if name == "band_radiance_wavelength":
                    want = band_radiance_wavelength(lo, up, T)
                    full = full_energy(T)
                elif name == "band_photon_radiance_wavelength":
                    want = band_photon_radiance_wavelength(lo, up, T)
                    full = full_photon(T)
                else:
                    want = band_radiance_frequency(lo, up, T)
                    full = full_energy(T)
                kind, t = tol("band", float(want), float(full))
                out.vec(name, [lo, up, T], f64(want), kind, t, "mpmath")
        valid = (1e-6, 2e-6, 1000.0) if "wavelength" in name else (1e12, 2e12, 300.0)
        band_errors(out, name, valid, unitlo)
        out.blank()

    # f32 band radiance
    name = "band_radiance_wavelength_f32"
    out.comment("%s: f32 bounds in 2e-7..1e-1 m (or 0 / inf), T 1..1e5 K, x <= 150 at the long-wave end." % name)
    rng = rng_for(name)
    n = 0
    while n < 22:
        T = f32(logu(rng, 1.0, 1e5))
        kind = rng.choice(["finite", "finite", "zero", "inf"])
        l1, l2 = sorted((f32(logu(rng, 2e-7, 1e-1)), f32(logu(rng, 2e-7, 1e-1))))
        if kind == "zero":
            l1 = 0.0
        if kind == "inf":
            l1, l2 = l2, INF
        if not l1 < l2:
            continue
        with mp.workdps(DPS):
            xs = float(x_of_wl(l2, T))
        if xs > 150:
            continue
        want = band_radiance_wavelength(l1, l2, T)
        e = f32v(want)
        if e < FLT_MIN or e > FLT_MAX:
            continue
        kd, t = tol("band_f32")
        out.vec(name, [l1, l2, T], e, kd, t, "mpmath")
        n += 1
    for l1, l2, T in ((0.0, INF, 300.0), (8e-6, 14e-6, 300.0), (0.0, f32(2.898e-6), 1000.0)):
        out.vec(name, [f32(l1), f32(l2) if l2 != INF else INF, f32(T)],
                f32v(band_radiance_wavelength(f32(l1), f32(l2) if l2 != INF else INF, f32(T))),
                *tol("band_f32"), "mpmath")
    out.errors(name, [f32(8e-6), f32(14e-6), 300.0], [(2, NAN, NF), (0, f32(20e-6), EMPTY)])
    summary[name] = dict(n=25)
    out.blank()

    # ---------------- inverse of the band radiance ----------------
    name = "temperature_from_band_radiance_wavelength"
    out.comment("%s: T chosen (1..1e6 K), band radiance computed in mpmath and rounded to f64," % name)
    out.comment("expected = exact T (mpmath findroot) reproducing the ROUNDED radiance.")
    rng = rng_for(name)
    cs = band_cases(rng, 6)
    n = 0
    for xs, xl, T in cs:
        if xs > 200:
            continue
        lo, up = wl_bounds(xs, xl, T)
        L = f64(band_radiance_wavelength(lo, up, T))
        with mp.workdps(DPS):
            Tx = solve_lnT(lambda TT: band_radiance_wavelength(lo, up, TT, fast=True), L, T)
            # substitute back with the quadrature route
            assert abs(band_radiance_wavelength(lo, up, Tx) / mpf(L) - 1) < mpf(10) ** -35
        out.value(name, [lo, up, L], Tx, "inversion")
        n += 1
    band_errors_inv = [(2, 0.0, NP), (2, -1.0, NP), (2, NAN, NF), (0, 3e-6, EMPTY), (0, -1e-6, NEG)]
    out.errors(name, [1e-6, 2e-6, 10.0], band_errors_inv)
    out.blank()

    # ---------------- brightness temperatures ----------------
    for name, Lfn, Tbfn, argfn in (
            ("brightness_temperature_wavelength", L_wl, brightness_temperature_wavelength,
             lambda x, T: C2() / (x * T)),
            ("brightness_temperature_frequency", L_fr, brightness_temperature_frequency,
             lambda x, T: x * KB() * T / H())):
        out.comment("%s: T chosen 1..1e6 K, x 1e-8..730 (e^x beyond f64 for x > 709.78 while the" % name)
        out.comment("radiance is still normal); radiance rounded to f64; expected = exact inverse of the rounded radiance.")
        rng = rng_for(name)
        Tgrid = logspace(1.0, 1e6, 24)
        rng.shuffle(Tgrid)
        cases = list(zip(logspace(1e-8, 700.0, 24), Tgrid))
        cases += [(logu(rng, 1e-8, 700.0), logu(rng, 1.0, 1e6)) for _ in range(12)]
        cases += [(rng.uniform(710.0, 730.0), T) for T in (1e3, 1e5, 1e6)]
        nice = [(1e-6, 3000.0), (10e-6, 300.0), (650e-9, 1337.33)] if "wavelength" in name else \
            [(160.2e9, 2.72548), (30e12, 300.0)]
        pairs = []
        for x, T in cases:
            with mp.workdps(DPS):
                a = f64(argfn(mpf(x), mpf(T)))
            pairs.append((a, T))
        pairs += nice
        for a, T in pairs:
            L = f64(hp(Lfn, a, T))
            if not L >= DBL_MIN:
                continue
            want = hp(Tbfn, a, L)
            out.value(name, [a, L], want, "inversion")
            note_condition(name, Tbfn, [a, L])
        # subnormal (still positive, valid) radiances: the argument of the logarithm must not be
        # formed as c1/(lambda^5 L) with a subnormal product lambda^5 L
        a = pairs[0][0]
        for L in (1e-310, 5e-324):
            out.value(name, [a, L], hp(Tbfn, a, L), "inversion")
        out.errors(name, [pairs[-1][0], f64(hp(Lfn, *pairs[-1]))],
                   [(1, 0.0, NP), (0, -1e-6 if "wavelength" in name else -1e9, NP), (1, INF, NF), (0, NAN, NF),
                    (1, -1.0, NP)])
        out.blank()

    # f32 brightness temperatures
    for name, Lfn, Tbfn, lo, hi, xfn in (
            ("brightness_temperature_wavelength", L_wl, brightness_temperature_wavelength, 2e-7, 1e-1, x_wl),
            ("brightness_temperature_frequency", L_fr, brightness_temperature_frequency, 1e9, 3e14, x_fr)):
        out.comment("%s_f32: f32 argument and T 1..1e5 K with x <= 150, radiance rounded to f32 (normal range),"
                    % name)
        out.comment("expected = exact inverse of the f32 radiance, rounded to f32.")
        rng = rng_for(name + "_f32")
        n = 0
        while n < 26:
            a, T = f32(logu(rng, lo, hi)), f32(logu(rng, 1.0, 1e5))
            with mp.workdps(DPS):
                if xfn(mpf(a), mpf(T)) > 150:
                    continue
            L = f32v(hp(Lfn, a, T))
            if not FLT_MIN <= L <= FLT_MAX:
                continue
            out.value(name + "_f32", [a, L], hp(Tbfn, a, L), "brightness_f32", f32out=True)
            n += 1
        out.errors(name + "_f32", [a, L], [(1, 0.0, NP), (0, NAN, NF)])
        out.blank()

    # ---------------- Rayleigh-Jeans temperature ----------------
    name = "rayleigh_jeans_temperature"
    out.comment("%s = c^2 L/(2 k nu^2); nu 1e6..1e16 Hz, L log-uniform over a wide range." % name)
    rng = rng_for(name)
    for _ in range(22):
        nu = logu(rng, 1e6, 1e16)
        L = logu(rng, 1e-30, 1e-5)
        out.value(name, [nu, L], hp(rayleigh_jeans_temperature, nu, L), "rayleigh_jeans")
    for nu, T in ((160.2e9, 2.72548), (30e9, 20.0)):
        L = f64(hp(L_fr, nu, T))
        out.value(name, [nu, L], hp(rayleigh_jeans_temperature, nu, L), "rayleigh_jeans")
    # the edges: subnormal radiances, and frequencies whose square is subnormal, where the result
    # is a normal number (c^2 L/2k must not be formed from the subnormal L: 3e-12 at L = 1.5e-316)
    for nu, L in ((3e15, 1.5e-316), (3.3e15, 1.5e-316), (1e9, 1e-310), (1e6, 5e-324), (2.5e7, 1.23456e-320),
                  (1e-150, 1e-300), (3e-160, 2e-320), (1.7e-154, 3.3e-318)):
        want = hp(rayleigh_jeans_temperature, nu, L)
        assert DBL_MIN <= want <= 1.7e308, (nu, L, want)
        out.value(name, [nu, L], want, "rayleigh_jeans")
    out.errors(name, [30e9, 1e-18], [(0, 0.0, NP), (1, -1e-18, NP), (1, NAN, NF), (0, INF, NF)])
    out.blank()

    # ---------------- ratio temperature ----------------
    name = "ratio_temperature"
    out.comment("%s(lambda1 < lambda2, radiance_ratio, emissivity_ratio): exact Planck (not Wien)." % name)
    out.comment("T chosen, ratio = e B1/B2 rounded to f64, expected = exact root for the rounded ratio;")
    out.comment("only x1 - x2 >= 0.5 (well conditioned).")
    rng = rng_for(name)
    n = 0
    while n < 30:
        if n < 12:   # two-colour pyrometer style pairs
            l1 = logu(rng, 0.4e-6, 2.0e-6)
            l2 = l1 * rng.uniform(1.05, 2.0)
        else:
            l1 = logu(rng, 1e-7, 1e-2)
            l2 = l1 * logu(rng, 1.01, 100.0)
        T = logu(rng, 200.0, 1e5) if n < 12 else logu(rng, 1.0, 1e6)
        eps = rng.uniform(0.5, 2.0) if rng.random() < 0.7 else 1.0
        with mp.workdps(DPS):
            x1, x2 = x_wl(mpf(l1), mpf(T)), x_wl(mpf(l2), mpf(T))
            if x1 - x2 < 0.5 or x1 > 600:
                continue
            R = f64(mpf(eps) * L_wl(mpf(l1), mpf(T)) / L_wl(mpf(l2), mpf(T)))
            F = lambda TT: mpf(eps) * L_wl(mpf(l1), TT) / L_wl(mpf(l2), TT)
            Tx = solve_lnT(F, R, T)
        with mp.workdps(CHECK_DPS):
            Ty = solve_lnT(lambda TT: mpf(eps) * L_wl(mpf(l1), TT) / L_wl(mpf(l2), TT), R, Tx)
            assert abs(Ty / Tx - 1) < mpf(10) ** -40
        out.value(name, [l1, l2, R, eps], Tx, "ratio_temperature")
        n += 1
    l1, l2 = 0.65e-6, 0.9e-6
    with mp.workdps(DPS):
        Rok = f64(L_wl(mpf(l1), mpf(1500.0)) / L_wl(mpf(l2), mpf(1500.0)))
    Rbad = f64(1.5 * (mpf(l2) / mpf(l1)) ** 4)
    out.errors(name, [l1, l2, Rok, 1.0], [(2, 0.0, NP), (3, -1.0, NP), (2, NAN, NF), (1, l1, OOD), (2, Rbad, OOD)])
    out.blank()

    # ---------------- calibration ----------------
    for name in ("calibrated_temperature", "calibrated_brightness_temperature"):
        fn = calibrated_temperature if name == "calibrated_temperature" else calibrated_brightness_temperature
        out.comment("%s(nu, reading_hot, T_hot, reading_cold, T_cold, reading): two-load calibration linear in" % name)
        out.comment("J(T) = (h nu/k)/(e^{h nu/kT}-1); readings = gain J + offset rounded to f64 (invented gain and")
        out.comment("offset); nu 1e9..1e12 Hz; scenes 3..1500 K; vectors with input condition number <= 50.")
        rng = rng_for(name)
        n = 0
        while n < 26:
            nu = logu(rng, 1e9, 1e12)
            Tc = logu(rng, 2.7, 90.0)
            Th = rng.uniform(250.0, 400.0)
            Ts = logu(rng, 3.0, 1500.0)
            g = logu(rng, 1e-3, 1e3) * rng.choice([1, 1, 1, -1])
            o = g * rng.uniform(-50.0, 50.0)
            with mp.workdps(DPS):
                rd = lambda T: f64(mpf(g) * rj_brightness(mpf(nu), mpf(T)) + mpf(o))
                rh, rc, rs = rd(Th), rd(Tc), rd(Ts)
            args = [nu, rh, Th, rc, Tc, rs]
            with mp.workdps(DPS):
                js = calibrated_brightness_temperature(*[mpf(v) for v in args])
            if js <= 0:
                continue
            COND.pop("_probe", None)
            note_condition("_probe", fn, args)
            if COND.pop("_probe", 0) > 50:
                continue
            out.value(name, args, hp(fn, *args), "calibration",
                      rel_override=calibration_tolerance(args, TOL["calibration"][1], 2.0 ** -53))
            note_condition(name, fn, args)
            n += 1
        # a negative scene brightness: accepted by calibrated_brightness_temperature only
        nu, Th, Tc = 100e9, 300.0, 20.0
        with mp.workdps(DPS):
            jh, jc = rj_brightness(mpf(nu), mpf(Th)), rj_brightness(mpf(nu), mpf(Tc))
            rh, rc = f64(2 * jh + 1), f64(2 * jc + 1)
            r_neg = f64(2 * (-mpf(5)) + 1)
        if name == "calibrated_brightness_temperature":
            out.value(name, [nu, rh, Th, rc, Tc, r_neg], hp(fn, nu, rh, Th, rc, Tc, r_neg), "calibration")
            out.value(name, [nu, rh, Th, rc, Tc, -100.0], hp(fn, nu, rh, Th, rc, Tc, -100.0), "calibration")
        valid = [nu, rh, Th, rc, Tc, f64(mpf(rh + rc) / 2)]
        cases = [(2, Tc, DEGEN), (2, 10.0, DEGEN), (3, rh, DEGEN), (4, 0.0, NP), (0, -nu, NP), (5, NAN, NF)]
        if name == "calibrated_temperature":
            cases.append((5, r_neg, OOD))
        out.errors(name, valid, cases)
        out.blank()

    # f32 calibration
    for name in ("calibrated_temperature", "calibrated_brightness_temperature"):
        fn = calibrated_temperature if name == "calibrated_temperature" else calibrated_brightness_temperature
        out.comment("%s_f32: all six arguments f32; readings rounded to f32; expected rounded to f32;" % name)
        out.comment("input condition number <= 4.")
        rng = rng_for(name + "_f32")
        n = 0
        while n < 20:
            nu = f32(logu(rng, 1e9, 1e12))
            Tc = f32(logu(rng, 2.7, 90.0))
            Th = f32(rng.uniform(250.0, 400.0))
            Ts = f32(logu(rng, 3.0, 1000.0))
            g = logu(rng, 1e-2, 1e2)
            o = g * rng.uniform(-5.0, 5.0)
            with mp.workdps(DPS):
                rd = lambda T: f32v(mpf(g) * rj_brightness(mpf(nu), mpf(T)) + mpf(o))
                rh, rc, rs = rd(Th), rd(Tc), rd(Ts)
            args = [nu, rh, Th, rc, Tc, rs]
            with mp.workdps(DPS):
                js = calibrated_brightness_temperature(*[mpf(v) for v in args])
            if js <= 0 or rh == rc:
                continue
            note_condition("_probe", fn, args)
            if COND.pop("_probe", 0) > 4:
                continue
            out.value(name + "_f32", args, hp(fn, *args), "calibration_f32", f32out=True,
                      rel_override=calibration_tolerance(args, TOL["calibration_f32"][1], 2.0 ** -24))
            n += 1
        out.errors(name + "_f32", args, [(2, args[4], DEGEN), (5, NAN, NF)])
        out.blank()

    # ---------------- CMB conversions and thermal SZ ----------------
    out.comment("CMB / SZ helpers: nu 1e8..1e12 Hz, T0 in {2.72548, 2.725, random 2.5..30 K}: x = h nu/(k T0) <= 19.2.")
    rng = rng_for("cmb")
    pts = []
    for nu in logspace(1e8, 1e12, 24):
        pts.append((nu, 2.72548))
    for _ in range(10):
        pts.append((logu(rng, 1e8, 1e12), logu(rng, 2.5, 30.0)))
    pts += [(30e9, 2.725), (143e9, 2.72548), (353e9, 2.72548), (217e9, 2.72548), (218e9, 2.72548)]
    for name, fn in (("thermodynamic_to_rayleigh_jeans_factor", rj_factor), ("kcmb_to_mjy_per_sr", kcmb_to_mjy_per_sr)):
        for nu, T0 in pts:
            out.value(name, [nu, T0], hp(fn, nu, T0), "cmb_factor")
            note_condition(name, fn, [nu, T0])
        out.errors(name, [143e9, 2.72548], [(0, 0.0, NP), (1, -2.72548, NP), (0, NAN, NF), (1, INF, NF)])
    # thermal SZ shapes, including points hugging the null
    with mp.workdps(DPS):
        nnull = f64(tsz_null(mpf(2.72548)))
    sz_pts = pts + [(nnull, 2.72548), (math.nextafter(nnull, INF), 2.72548), (nnull * (1 + 1e-9), 2.72548)]
    for nu, T0 in sz_pts:
        with mp.workdps(DPS):
            x = float(x_fr(mpf(nu), mpf(T0)))
            w = float(tsz_weight(mpf(nu), mpf(T0)))
        want = hp(tsz_f, nu, T0, scale=x + 4)
        kind, t = tol("tsz_f", x)
        out.vec("thermal_sz_temperature_shape", [nu, T0], f64(want), kind, t, "mpmath")
    out.errors("thermal_sz_temperature_shape", [143e9, 2.72548], [(0, -143e9, NP), (1, 0.0, NP), (1, NAN, NF)])
    for nu, T0 in sz_pts:
        with mp.workdps(DPS):
            x = float(x_fr(mpf(nu), mpf(T0)))
            w = float(tsz_weight(mpf(nu), mpf(T0)))
        want = hp(tsz_g, nu, T0, scale=(x + 4) * w)
        kind, t = tol("tsz_g", x, w)
        out.vec("thermal_sz_spectral_shape", [nu, T0], f64(want), kind, t, "mpmath")
    out.errors("thermal_sz_spectral_shape", [143e9, 2.72548], [(0, 0.0, NP), (1, -0.0, NP), (0, INF, NF)])
    T0s = logspace(0.1, 100.0, 12) + [logu(rng, 0.1, 100.0) for _ in range(4)] + [2.72548, 2.725]
    for T0 in T0s:
        out.value("thermal_sz_null_frequency", [T0], hp(tsz_null, T0), "tsz_null")
    out.errors("thermal_sz_null_frequency", [2.72548], [(0, 0.0, NP), (0, -2.72548, NP), (0, NAN, NF), (0, INF, NF)])
    out.blank()

    # ---------------- published / handbook checks ----------------
    published(out)
    return out


def out_last_args(out):
    """Arguments of the last value vector written (used as the valid base of error vectors)."""
    for line in reversed(out.lines):
        if line and not line.startswith("#"):
            f = line.split()
            n = int(f[1])
            return [float(v) for v in f[2:2 + n]]
    raise RuntimeError


def published(out):
    out.comment("==== Published / handbook checks (loose tolerances; each also checked against mpmath) ====")

    out.comment("Heat-transfer textbook blackbody fraction table F(0 -> lambda T), recalled from memory")
    out.comment("(e.g. the table of blackbody radiation functions in a standard heat-transfer text):")
    out.comment("lambda T = 1000, 2898, 5000, 10000 um K -> 0.00032, 0.2501, 0.6337, 0.9142.  T = 1000 K.")
    for lamT_um, F in ((2898.0, 0.2501), (1000.0, 0.00032), (5000.0, 0.6337), (10000.0, 0.9142)):
        lam = lamT_um * 1e-6 / 1000.0
        args = [0.0, lam, 1000.0]
        ref = band_fraction_wavelength(0.0, lam, 1000.0)
        kind, t = tol("handbook")
        assert abs(ref - F) <= t, (lamT_um, ref, F)
        out.vec("band_fraction_wavelength", args, F, kind, t, "handbook-memory")

    out.comment("Fixsen 2009 (ApJ 707, 916): T_CMB = 2.72548 K; the B_nu peak is at ~160.23 GHz and the thermal")
    out.comment("SZ null near 217.5 GHz (commonly quoted rounded numbers).")
    kind, t = tol("fixsen_peak")
    assert abs(peak_frequency(mpf(2.72548)) / mpf(160.23e9) - 1) <= t
    out.vec("peak_frequency", [2.72548], 160.23e9, kind, t, "fixsen2009-common-practice")
    kind, t = tol("fixsen_null")
    assert abs(tsz_null(mpf(2.72548)) / mpf(217.5e9) - 1) <= t
    out.vec("thermal_sz_null_frequency", [2.72548], 217.5e9, kind, t, "fixsen2009-common-practice")

    out.comment("Common practice (Wien's displacement rule of thumb): lambda_max T ~ 2898 um K, a 3000 K source")
    out.comment("peaks near 0.966 um.")
    kind, t = tol("wien_rule")
    assert abs(peak_wavelength(mpf(3000.0)) / mpf(9.66e-7) - 1) <= t
    out.vec("peak_wavelength", [3000.0], 9.66e-7, kind, t, "common-practice")

    out.comment("ITS-90 (Preston-Thomas 1990, Metrologia 27, 3): above the silver point T90 is defined by")
    out.comment("  L(T90)/L(T_ref) = (exp(c2/(lambda T_ref)) - 1)/(exp(c2/(lambda T90)) - 1),")
    out.comment("  c2 = 0.014388 m K (exact in ITS-90), T_ref = 1337.33 K (gold point).")
    out.comment("At lambda = 650 nm and T90 = 1500, 2000, 2500, 3000 K the ITS-90 ratio r is formed with c2 = 0.014388,")
    out.comment("and the radiance given to brightness_temperature_wavelength is L = r * B_lambda(650 nm, 1337.33 K)")
    out.comment("with the SI 2019 (CODATA) c2 = hc/k, rounded to f64.  Expected = exact inverse of that printed L.")
    out.comment("Note: this is NOT exactly T90 * c2_CODATA/0.014388 (the reference point 1337.33 K is not rescaled);")
    out.comment("the differences from that scaled value are listed below, for information.")
    lam = 650e-9
    for T90 in (1500.0, 2000.0, 2500.0, 3000.0):
        with mp.workdps(DPS):
            c2i = mpf("0.014388")
            Tref = mpf("1337.33")
            lm = mpf(lam)
            r = mp.expm1(c2i / (lm * Tref)) / mp.expm1(c2i / (lm * mpf(T90)))
            L = f64(r * L_wl(lm, Tref))
            want = brightness_temperature_wavelength(lm, mpf(L))
            # closed form for the unrounded L: T' = c2/(lambda ln(1 + expm1(c2/(lambda Tref))/r))
            Tp = C2() / (lm * mp.log1p(mp.expm1(C2() / (lm * Tref)) / r))
            assert abs(want / Tp - 1) < mpf(10) ** -15
            scaled = mpf(T90) * C2() / c2i
            out.comment("  T90 = %g K: expected %.10f K, T90*c2/0.014388 = %.10f K, difference %.3e K"
                        % (T90, float(want), float(scaled), float(want - scaled)))
        kind, t = tol("its90")
        out.vec("brightness_temperature_wavelength", [lam, L], f64(want), kind, t, "its90")
    out.blank()


# ---------------------------------------------------------------------------------------------
# the array file
# ---------------------------------------------------------------------------------------------
def response_tables():
    rng = rng_for("response-tables")
    tabs = []
    tabs.append(dict(
        name="thermometer 8-14 um trapezoid with non-zero shoulders (invented)",
        wl=[8.0e-6, 8.5e-6, 13.5e-6, 14.0e-6], r=[0.2, 0.9, 0.9, 0.2],
        T=[200.0, 250.0, 300.0, 500.0, 1000.0, 3000.0], Tinv=[220.0, 310.0, 1800.0]))
    tabs.append(dict(
        name="narrow 0.65 um pyrometer band (invented)",
        wl=[0.645e-6, 0.648e-6, 0.650e-6, 0.652e-6, 0.655e-6], r=[0.1, 0.7, 1.0, 0.7, 0.1],
        T=[200.0, 600.0, 1000.0, 1337.33, 2000.0, 3000.0], Tinv=[700.0, 1500.0, 2900.0]))
    wl = [3e-6 + i * (2e-6 / 19) for i in range(20)]
    r = [round(0.55 + 0.25 * math.sin(2 * math.pi * i / 7) + 0.1 * rng.uniform(-1, 1), 4) for i in range(20)]
    tabs.append(dict(
        name="3-5 um band, bumpy 20-point response (invented, seeded)",
        wl=wl, r=r, T=[200.0, 300.0, 450.0, 800.0, 1500.0, 3000.0], Tinv=[260.0, 900.0, 2500.0]))
    tabs.append(dict(
        name="millimetre-wave band 1-3 mm (invented)",
        wl=[1.0e-3, 1.3e-3, 1.7e-3, 2.0e-3, 2.4e-3, 3.0e-3], r=[0.3, 0.8, 1.0, 0.9, 0.7, 0.2],
        T=[2.0, 2.72548, 10.0, 77.0, 300.0], Tinv=[2.5, 20.0, 290.0]))
    tabs.append(dict(
        name="minimal 2-point table (linear ramp)",
        wl=[9.0e-6, 11.0e-6], r=[0.5, 1.0],
        T=[200.0, 300.0, 1000.0, 3000.0], Tinv=[240.0, 2000.0]))
    tabs.append(dict(
        name="zero response at both ends",
        wl=[1.0e-6, 1.2e-6, 1.5e-6, 1.8e-6, 2.0e-6], r=[0.0, 0.7, 1.0, 0.8, 0.0],
        T=[200.0, 500.0, 1000.0, 2000.0, 3000.0], Tinv=[400.0, 1200.0, 2800.0]))
    return tabs


def resp_quad(wl, r, T):
    """integral of r(lambda) B_lambda over [wl[0], wl[-1]], r piecewise linear; mpmath.quad per segment."""
    T = mpf(T)
    total = mpf(0)
    for i in range(len(wl) - 1):
        a, b = mpf(wl[i]), mpf(wl[i + 1])
        ra, rb = mpf(r[i]), mpf(r[i + 1])
        sc = L_wl((a + b) / 2, T)   # mp.quad stops on an absolute error estimate: scale to O(1)
        f = lambda lm: (ra + (rb - ra) * (lm - a) / (b - a)) * L_wl(lm, T) / sc
        total += mp.quad(f, [a, (a + b) / 2, b]) * sc
    return total


def resp_poly(wl, r, T):
    """Same integral via the exact polylog forms, at POLY_DPS."""
    with mp.workdps(POLY_DPS):
        T = mpf(T)
        total = mpf(0)
        for i in range(len(wl) - 1):
            a, b = mpf(wl[i]), mpf(wl[i + 1])
            ra, rb = mpf(r[i]), mpf(r[i + 1])
            beta = (rb - ra) / (b - a)
            alpha = ra - beta * a
            xa, xb = x_wl(a, T), x_wl(b, T)          # xa > xb
            i3 = bose_tail(3, xb) - bose_tail(3, xa)
            i2 = bose_tail(2, xb) - bose_tail(2, xa)
            total += C1L() * (alpha * (T / C2()) ** 4 * i3 + beta * (T / C2()) ** 3 * i2)
        return total


def response_radiance(wl, r, T):
    with mp.workdps(DPS):
        q = resp_quad(wl, r, T)
    p = resp_poly(wl, r, T)
    with mp.workdps(POLY_DPS):
        assert abs(q / p - 1) < mpf(10) ** -38, (wl, r, T, q, p)
    return q


def build_response(summary):
    out = Out()
    header(out, "Array reference vectors: response_weighted_radiance(wavelengths_m[], response[], T) =\n"
                "integral from the first to the last wavelength of r(lambda) B_lambda(lambda, T), r the piecewise-\n"
                "LINEAR interpolation of the table (zero outside), and its inverse in T.  Each block: a header line\n"
                "'name npoints arg expected kind tolerance source' and npoints lines 'wavelength_m response'.\n"
                "Inverse vectors: T chosen, radiance rounded to f64 (f32), expected = exact T for the ROUNDED radiance.")
    counts = {}

    def block(name, wl, r, arg, expected, kind, t):
        out.lines.append(" ".join([name, str(len(wl)), fmt(arg), fmt(expected), kind, fmt_tol(kind, t), "mpmath"]))
        for a, b in zip(wl, r):
            out.lines.append("%s %s" % (fmt(a), fmt(b)))
        counts[name] = counts.get(name, 0) + 1

    for tab in response_tables():
        wl, r = tab["wl"], tab["r"]
        out.comment("Table: %s; %d points, %g..%g m." % (tab["name"], len(wl), wl[0], wl[-1]))
        for T in tab["T"]:
            want = response_radiance(wl, r, T)
            kind, t = tol("response")
            block("response_weighted_radiance", wl, r, T, f64(want), kind, t)
        for T in tab["Tinv"]:
            L = f64(response_radiance(wl, r, T))
            with mp.workdps(DPS):
                Tx = solve_lnT(lambda TT: resp_poly(wl, r, TT), L, T)
                assert abs(resp_quad(wl, r, Tx) / mpf(L) - 1) < mpf(10) ** -35
            kind, t = tol("response_inversion")
            block("temperature_from_response_weighted_radiance", wl, r, L, f64(Tx), kind, t)
        # f32 twins: table and temperature rounded to f32
        wl32 = [f32(v) for v in wl]
        r32 = [f32(v) for v in r]
        for T in (tab["T"][1], tab["T"][-1]):
            T32 = f32(T)
            want = response_radiance(wl32, r32, T32)
            kind, t = tol("response_f32")
            block("response_weighted_radiance_f32", wl32, r32, T32, f32v(want), kind, t)
        T = tab["Tinv"][0]
        L32 = f32v(response_radiance(wl32, r32, f32(T)))
        with mp.workdps(DPS):
            Tx = solve_lnT(lambda TT: resp_poly(wl32, r32, TT), L32, T)
            assert abs(resp_quad(wl32, r32, Tx) / mpf(L32) - 1) < mpf(10) ** -35
        kind, t = tol("response_inversion_f32")
        block("temperature_from_response_weighted_radiance_f32", wl32, r32, L32, f32v(Tx), kind, t)
        out.blank()
    summary["_response_counts"] = counts
    return out


def main():
    t0 = time.time()
    os.makedirs(DATA, exist_ok=True)
    summary = {}
    scalar = build_scalar(summary)
    response = build_response(summary)
    scalar.write(os.path.join(DATA, "blackbody.txt"))
    response.write(os.path.join(DATA, "blackbody_response.txt"))
    print("wrote %s and %s in %.1f s" % (os.path.join(DATA, "blackbody.txt"),
                                          os.path.join(DATA, "blackbody_response.txt"), time.time() - t0))
    names = []
    for (n, _k) in scalar.count:
        if n not in names:
            names.append(n)
    print("%-50s %6s %6s" % ("function", "values", "status"))
    for n in names:
        print("%-50s %6d %6d" % (n, scalar.count.get((n, "value"), 0), scalar.count.get((n, "status"), 0)))
    for n, c in summary["_response_counts"].items():
        print("%-50s %6d %6d" % (n, c, 0))
    print("\nspectral coverage (x range, results beyond e^x overflow / subnormal / zero):")
    for n, info in summary.items():
        if isinstance(info, dict) and "xmin" in info:
            print("  %-46s x %.3g..%.3g  beyond-overflow %d, subnormal %d, zero %d"
                  % (n, info["xmin"], info["xmax"], info["n_beyond"], info["n_sub"], info["n_zero"]))
        elif isinstance(info, dict) and "n_under" in info:
            print("  %-46s below FLT_MIN: %d" % (n, info["n_under"]))
    print("\nmax relative condition number w.r.t. the inputs (sum |d ln f/d ln a_i|), closed forms only:")
    for n, k in sorted(COND.items()):
        print("  %-46s %.4g" % (n, k))


if __name__ == "__main__":
    sys.exit(main())
