#!/usr/bin/env python3
"""Reference vectors for relicore's structure-growth topic: writes tests/data/growth.txt in the
format of tests/data/FORMAT.md (section "Growth file").  Run from anywhere:

    .venv/bin/python tests/reference/growth_vectors.py

The meanings are those of the module documentation of src/growth/mod.rs (issue 11); the universe
model is the docstring of tests/reference/cosmology_vectors.py, whose mpmath background this
script uses.  Nothing here reads, runs or imitates the project's Rust code.  Sources (named on
every line):

  scipy-solve-ivp  the growth equation D'' + (2 + dlnE/dN) D' = (3/2) Omega_cb a^-3 E^-2 D in
                   N = ln a, written in this second-order form (with dlnE/dN from the analytic
                   derivative of E^2; massive neutrinos by scipy quad of the Fermi-Dirac energy
                   integral and of its y-derivative), integrated by scipy solve_ivp (DOP853,
                   rtol 1e-13, atol 0) from a = 1e-15 with the Meszaros growing mode
                   D = a + (2/3) a_eq, D' = a; checked against itself at rtol 1e-12.
  heath1977        Heath 1977 (MNRAS 179, 351): for w = -1 without radiation, any curvature,
                   D_u = (5/2) Omega_m E(a) int_0^a da'/(a' E)^3, f = dlnE/dlna + 1/(a^2 E^3 I);
                   mpmath quad at 30 digits.
  closed-form-einstein-de-sitter  D = a, f = 1; leapfrog drift 2 t_H (a1^-1/2 - a2^-1/2), kick 2 t_H (a2^1/2 - a1^1/2).
  mpmath           Eisenstein & Hu 1998 (ApJ 496, 605) written from the paper's equations
                   (recalled from memory) at 30 digits; P(k) from its definition; sigma(R) by
                   mpmath quad of the same P(k) (D_u(1) from scipy-solve-ivp) over subintervals
                   (ln k below x = kR = 4, periods of the window from x = 4 to X >= 600 (doubled until the left-out
                   oscillation is bounded by 1e-12 of sigma^2), the tail beyond without its oscillation, whose share is below 1e-11 of sigma^2, asserted); BAO
                   distances and the leapfrog factors by quadrature on the mpmath background of
                   cosmology_vectors.py.
  linder2005-memory  growth index: f = Omega_m(z)^gamma with gamma = 0.55 in flat Lambda-CDM
                   (Linder 2005, PRD 72, 043529, from memory), gamma to +-0.01.
  planck2020-memory  sigma8 = 0.8111 for the base Lambda-CDM parameters of Planck Collaboration
                   2020 (A&A 641, A6, Table 2, from memory), within the 3 % of a fitting formula.
  boss-dr12-memory  BOSS DR12 consensus (Alam et al. 2017, MNRAS 470, 2617, from memory) at
                   z = 0.51: D_M r_d,fid/r_d = 1977 +- 27 Mpc and H r_d/r_d,fid = 90.4 +- 1.9 km/s/Mpc
                   with r_d,fid = 147.78 Mpc; checked within two standard deviations.
  spec             expected failure status from the project's argument rules.
"""

from __future__ import annotations

import math
import os
import sys
import time

import numpy as np
from mpmath import mp, mpf
from scipy.integrate import quad, solve_ivp

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
import cosmology_vectors as cv  # noqa: E402  (mpmath background, constants, formatting)

DATA = os.path.normpath(os.path.join(HERE, "..", "data"))
NF, NP, NEG, OOD, INV = -2, -3, -4, -10, -14
A_START = 1e-15
RTOL, RTOL_CHECK = 1e-13, 1e-12
EH_DPS = 25
SIGMA_DPS = 20
X_SPLIT, X_TAIL = 4, 600

# ---------------------------------------------------------------------------------------------
# ONE central tolerance table: key -> (kind, value, reason)
# ---------------------------------------------------------------------------------------------
TOL = {
    "growth": ("rel", 1e-10, "D, D_u, f against an independent integration of the same equation "
               "(the issue's accuracy; the reference agrees with itself at rtol 1e-12 to ~1e-12)"),
    "heath": ("rel", 1e-12, "D, D_u, f against the Heath (1977) integral, exact for w = -1 without "
              "radiation: the accuracy the issue asks of the closed form (the table's integration, at step "
              "tolerance 1.5e-13 with the exact Jacobian, measured within 6.2e-13)"),
    "eds": ("rel", 1e-12, "Einstein-de Sitter D = a, f = 1 (closed form), as the Heath lines"),
    "transfer": ("rel", 1e-13, "a closed form of ~60 operations with pow, ln, sin: a few ulp, "
                 "amplified at most ~10 times by exponents"),
    "transfer_node": ("abs", 1e-14, "T near a zero of the oscillating baryon term: absolute"),
    "spectrum": ("rel", 5e-10, "P ~ T^2 D_u^2: twice the growth tolerance plus twice T's"),
    "sigma": ("rel", 1e-9, "sigma(R): quadrature of the same P(k) (the issue's accuracy); sigma ~ D_u(1)"),
    "sigma_derived": ("rel", 2e-9, "A_s derived from a given sigma8: twice sigma's tolerance"),
    "fsigma8": ("rel", 2e-9, "f D sigma8: the growth tolerance plus sigma's"),
    "bao": ("rel", 1e-12, "D_M/r_d, D_V/r_d: quadrature of a smooth integrand (the issue's accuracy)"),
    "bao_hubble": ("rel", 1e-13, "c/H(z): closed form"),
    "leapfrog": ("rel", 1e-12, "drift and kick: quadrature of a smooth integrand"),
    "linder": ("rel", "f(vector)", "growth index gamma = ln f/ln Omega_m(z) equal to 0.55 to two "
               "digits (+-0.01), as the trade quotes it: tolerance 0.01 |ln Omega_m(z)| on f"),
    "planck": ("rel", 3e-2, "sigma8 of a fitting-formula transfer function vs a Boltzmann code"),
}


def tol(key):
    kind, val, _ = TOL[key]
    return kind, val


# ---------------------------------------------------------------------------------------------
# universes (the model of cosmology_vectors.py)
# ---------------------------------------------------------------------------------------------
U = cv.Universe
T0 = cv.T0_CMB
PL_H = 0.6736
PL_OB = 0.02237 / (PL_H * PL_H)
MODELS = [
    U("einstein_de_sitter", "Omega_m = 1, no radiation", omega_matter=1.0),
    U("flat_lcdm", "Omega_m = 0.3, Lambda, no radiation"),
    U("open_lcdm", "Omega_m = 0.3, Omega_k = 0.1, Lambda, no radiation", omega_curvature=0.1),
    U("closed_lcdm", "Omega_m = 0.3, Omega_k = -0.1, Lambda, no radiation", omega_curvature=-0.1),
    U("flat_lcdm_radiation", "flat_lcdm with radiation", cmb_temperature_k=T0),
    U("closed_dynamical_radiation", "Omega_k = -0.05, w0 = -0.9, wa = 0.2, radiation",
      omega_curvature=-0.05, w0=-0.9, wa=0.2, cmb_temperature_k=T0),
    U("planck_like", "base Lambda-CDM of Planck 2020 (memory): one 0.06 eV neutrino",
      h0=67.36, omega_matter=0.3153, omega_baryon=PL_OB, cmb_temperature_k=T0, n_eff=3.046,
      masses=(0.06, 0.0, 0.0)),
]
HEATH = ("flat_lcdm", "open_lcdm", "closed_lcdm")
Z_GROWTH = [0.0, 0.1, 0.5, 1.0, 2.0, 5.0, 10.0, 49.0, 100.0, 1089.0, 1e4, 1e5]
A_S_PLANCK = math.exp(3.044) / 1e10
NS_PLANCK = 0.9649

FD_F0 = 7 * math.pi ** 4 / 120


def fd_ratio(y):
    """R(y) = F(y)/F(0) and dR/dy by scipy quad (double precision)."""
    if y < 1e-6:
        return 1 + 5 * y * y / (7 * math.pi ** 2), 10 * y / (7 * math.pi ** 2)
    f = quad(lambda x: x * x * math.sqrt(x * x + y * y) / (math.exp(x) + 1), 0, 60,
             epsabs=0, epsrel=2e-14, limit=200)[0]
    fp = quad(lambda x: x * x * y / math.sqrt(x * x + y * y) / (math.exp(x) + 1), 0, 60,
              epsabs=0, epsrel=2e-14, limit=200)[0]
    return f / FD_F0, fp / FD_F0


class DoubleBackground:
    """E^2(a) and dE^2/dN in double precision, from the mpmath background's densities."""

    def __init__(self, bg):
        self.ocb = float(bg.omega_cb)
        self.orad = float(bg.omega_r)
        self.orall = float(bg.omega_r_all)
        self.ok = float(bg.omega_k)
        self.ode = float(bg.omega_de)
        self.w0, self.wa = bg.u.w0, bg.u.wa
        self.groups = [(float(y), n, float(bg.omega_species)) for y, n in bg.groups]

    def e2(self, a):
        """(E^2, dE^2/dN)."""
        e2 = self.ocb / a ** 3 + self.orad / a ** 4 + self.ok / a ** 2
        d = -3 * self.ocb / a ** 3 - 4 * self.orad / a ** 4 - 2 * self.ok / a ** 2
        for y, n, c in self.groups:
            r, rp = fd_ratio(y * a)
            e2 += n * c * r / a ** 4
            d += n * c * (-4 * r + y * a * rp) / a ** 4
        if self.ode != 0:
            fde = a ** (-3 * (1 + self.w0 + self.wa)) * math.exp(-3 * self.wa * (1 - a))
            e2 += self.ode * fde
            d += self.ode * fde * (-3 * (1 + self.w0 + self.wa) + 3 * self.wa * a)
        return e2, d


def growth_ivp(db, zs, rtol):
    """(D_u(z), f(z)) for each z, and D_u(1), by solve_ivp in N."""
    a_eq = db.orall / db.ocb

    def rhs(n, y):
        a = math.exp(n)
        e2, de2 = db.e2(a)
        dlne = 0.5 * de2 / e2
        return [y[1], -(2 + dlne) * y[1] + 1.5 * db.ocb / (a ** 3 * e2) * y[0]]

    ns = sorted(set([0.0] + [-math.log1p(z) for z in zs]))
    n0 = math.log(A_START)
    sol = solve_ivp(rhs, (n0, 0.0), [A_START + 2 * a_eq / 3, A_START], method="DOP853", rtol=rtol,
                    atol=1e-300, t_eval=ns, dense_output=False)
    assert sol.success, sol.message
    vals = {n: (d, dp / d) for n, d, dp in zip(sol.t, sol.y[0], sol.y[1])}
    out = [vals[-math.log1p(z)] for z in zs]
    return out, vals[0.0][0]


def heath(bg, z):
    """(D_u, f) of Heath (1977) at 30 digits (w = -1, no radiation)."""
    with mp.workdps(30):
        om, ok, ol = bg.omega_m, bg.omega_k, bg.omega_de
        E = lambda a: mp.sqrt(om / a ** 3 + ok / a ** 2 + ol)
        a = 1 / (1 + mpf(z))
        integral = mp.quad(lambda x: 1 / (x * E(x)) ** 3, [0, a / 4, a / 2, a])
        du = mpf(5) / 2 * om * E(a) * integral
        dlne = (-3 * om / a ** 3 - 2 * ok / a ** 2) / (2 * E(a) ** 2)
        f = dlne + 1 / (a ** 2 * E(a) ** 3 * integral)
        return du, f


# ---------------------------------------------------------------------------------------------
# Eisenstein & Hu 1998, written from the paper (mpmath)
# ---------------------------------------------------------------------------------------------
class EH:
    def __init__(self, wm, wb, t0):
        with mp.workdps(EH_DPS):
            wm, wb, t0 = mpf(wm), mpf(wb), mpf(t0)
            self.wm, self.wb = wm, wb
            th = t0 / mpf("2.7")
            self.th = th
            self.fb = wb / wm
            self.fc = (wm - wb) / wm
            self.z_eq = mpf("2.50e4") * wm * th ** -4                          # eq. 2
            self.k_eq = mpf("7.46e-2") * wm * th ** -2                         # eq. 3
            self.ag = (1 - mpf("0.328") * mp.log(431 * wm) * self.fb
                       + mpf("0.38") * mp.log(mpf("22.3") * wm) * self.fb ** 2)  # eq. 31
            self.s_nw = mpf("44.5") * mp.log(mpf("9.83") / wm) / mp.sqrt(1 + 10 * wb ** mpf("0.75"))  # eq. 26
            a1 = (mpf("46.9") * wm) ** mpf("0.670") * (1 + (mpf("32.1") * wm) ** mpf("-0.532"))
            a2 = (12 * wm) ** mpf("0.424") * (1 + (45 * wm) ** mpf("-0.582"))
            self.alpha_c = a1 ** (-self.fb) * a2 ** (-self.fb ** 3)            # eq. 11
            b1 = mpf("0.944") / (1 + (458 * wm) ** mpf("-0.708"))
            b2 = (mpf("0.395") * wm) ** mpf("-0.0266")
            self.beta_c = 1 / (1 + b1 * (self.fc ** b2 - 1))                   # eq. 12
            if wb > 0:
                bd1 = mpf("0.313") * wm ** mpf("-0.419") * (1 + mpf("0.607") * wm ** mpf("0.674"))
                bd2 = mpf("0.238") * wm ** mpf("0.223")
                self.z_d = (1291 * wm ** mpf("0.251") / (1 + mpf("0.659") * wm ** mpf("0.828"))
                            * (1 + bd1 * wb ** bd2))                          # eq. 4
                R = lambda z: mpf("31.5") * wb * th ** -4 * (z / 1000) ** -1   # eq. 5
                rd, req = R(self.z_d), R(self.z_eq)
                self.s = (2 / (3 * self.k_eq) * mp.sqrt(6 / req)
                          * mp.log((mp.sqrt(1 + rd) + mp.sqrt(rd + req)) / (1 + mp.sqrt(req))))  # eq. 6
                self.k_silk = (mpf("1.6") * wb ** mpf("0.52") * wm ** mpf("0.73")
                               * (1 + (mpf("10.4") * wm) ** mpf("-0.95")))     # eq. 7
                y = (1 + self.z_eq) / (1 + self.z_d)
                G = y * (-6 * mp.sqrt(1 + y) + (2 + 3 * y) * mp.log((mp.sqrt(1 + y) + 1) / (mp.sqrt(1 + y) - 1)))
                self.alpha_b = mpf("2.07") * self.k_eq * self.s * (1 + rd) ** mpf("-0.75") * G  # eq. 14
                self.beta_b = mpf("0.5") + self.fb + (3 - 2 * self.fb) * mp.sqrt((mpf("17.2") * wm) ** 2 + 1)  # eq. 24
                self.beta_node = mpf("8.41") * wm ** mpf("0.435")                # eq. 23

    @staticmethod
    def t0(q, ac, bc):
        L = mp.log(mp.e + mpf("1.8") * bc * q)                               # eq. 19
        C = mpf("14.2") / ac + 386 / (1 + mpf("69.9") * q ** mpf("1.08"))      # eq. 20
        return L / (L + C * q * q)

    def full(self, k):
        with mp.workdps(EH_DPS):
            k = mpf(k)
            q = k / (mpf("13.41") * self.k_eq)                                 # eq. 10
            ks = k * self.s
            f = 1 / (1 + (ks / mpf("5.4")) ** 4)                               # eq. 18
            tc = f * self.t0(q, 1, self.beta_c) + (1 - f) * self.t0(q, self.alpha_c, self.beta_c)  # eq. 17
            st = self.s / (1 + (self.beta_node / ks) ** 3) ** (mpf(1) / 3)   # eq. 22
            x = k * st
            tb = (self.t0(q, 1, 1) / (1 + (ks / mpf("5.2")) ** 2)
                  + self.alpha_b / (1 + (self.beta_b / ks) ** 3) * mp.exp(-(k / self.k_silk) ** mpf("1.4"))
                  ) * mp.sin(x) / x                                            # eq. 21
            return self.fb * tb + self.fc * tc                                 # eq. 16

    def nowiggle(self, k):
        with mp.workdps(EH_DPS):
            k = mpf(k)
            gh = self.wm * (self.ag + (1 - self.ag) / (1 + (mpf("0.43") * k * self.s_nw) ** 4))  # eq. 30
            q = k * self.th ** 2 / gh                                          # eq. 28
            L = mp.log(2 * mp.e + mpf("1.8") * q)
            C = mpf("14.2") + 731 / (1 + mpf("62.5") * q)
            return L / (L + C * q * q)                                         # eq. 29


class Spectrum:
    def __init__(self, name, gname, u, bg, form, kind, value, ns, alpha, du1, growth):
        self.name, self.gname, self.form, self.kind = name, gname, form, kind
        self.value, self.ns, self.alpha = value, ns, alpha
        self.u, self.bg, self.du1, self.growth = u, bg, du1, growth
        h = u.h0 / 100
        self.eh = EH(u.om * h * h, u.ob * h * h, u.t0)
        self.r8 = 8 / h
        with mp.workdps(EH_DPS):
            self.coef = (mpf("0.4") * bg.DH ** 2 / mpf(u.om)) ** 2
        self.a_s = mpf(value) if kind == "scalar_amplitude" else mpf(1)
        if kind == "sigma8":
            s1 = self.sigma(self.r8)
            self.a_s = (mpf(value) / s1) ** 2

    def line(self):
        return "spectrum %s %s %s %s %s %s %s" % (self.name, self.gname, self.form, self.kind,
                                                 cv.fmt(self.value), cv.fmt(self.ns), cv.fmt(self.alpha))

    def T(self, k):
        return self.eh.full(k) if self.form == "oscillations" else self.eh.nowiggle(k)

    def delta2(self, k, du):
        """k^3 P/(2 pi^2)."""
        k = mpf(k)
        l = mp.log(k / mpf("0.05"))
        return self.a_s * mp.exp(l * (self.ns - 1 + self.alpha * l / 2)) * self.coef * (k * k * self.T(k) * du) ** 2

    def power(self, k, du):
        with mp.workdps(EH_DPS):
            return 2 * mp.pi ** 2 * self.delta2(k, mpf(du)) / mpf(k) ** 3

    def sigma(self, r):
        """sigma(R, z = 0) by mpmath quad of the same P(k)."""
        with mp.workdps(SIGMA_DPS):
            r = mpf(r)
            du = mpf(self.du1)

            def w(x):
                if x < mpf("0.01"):
                    return 1 - x * x / 10 + x ** 4 / 280 - x ** 6 / 15120
                return 3 * (mp.sin(x) - x * mp.cos(x)) / x ** 3

            kmin = min(mpf("1e-7"), mpf("1e-6") / r)
            kmax = X_SPLIT / r
            pts = [kmin]
            while pts[-1] * mpf("1.5") < kmax:
                pts.append(pts[-1] * mpf("1.5"))
            # BAO wiggles: steps of 0.01 Mpc^-1 between 0.01 and 1 Mpc^-1
            pts += [mpf(i) / 100 for i in range(1, 101) if kmin < mpf(i) / 100 < kmax]
            pts = sorted(set(pts + [kmax]))
            lp = [mp.log(p) for p in pts]
            fa = lambda u: self.delta2(mp.exp(u), du) * w(mp.exp(u) * r) ** 2
            a, ea = mp.quad(fa, lp, error=True)
            fb = lambda x: self.delta2(x / r, du) * w(x) ** 2 / x
            xs = [mpf(X_SPLIT)]
            # the tail point: from 600 up by doubling until the left-out oscillation's bound
            # 2 Delta^2(X/R)/X^5 is below 1e-12 of part (A) (a lower bound of sigma^2)
            x_tail = mpf(X_TAIL)
            while 2 * self.delta2(x_tail / r, du) / x_tail ** 5 > mpf("1e-12") * a:
                x_tail *= 2
            while xs[-1] < x_tail:
                step = mp.pi / 2 if xs[-1] * r < 100 else mp.pi  # finer where wiggles remain
                xs.append(min(xs[-1] + step, mpf(x_tail)))
            b, eb = mp.quad(fb, xs, error=True)
            # beyond X_TAIL: the window's mean 9/(2x^4) (1 + 1/x^2); the oscillating share is
            # below g(X)/2 ~ 2 Delta^2/X^5 (asserted below 1e-11 of sigma^2, 100 times below the tolerance) and left out
            fc = lambda u: self.delta2(mp.exp(u) / r, du) * mpf(9) / 2 * (mp.exp(-4 * u) + mp.exp(-6 * u))
            c, ec = mp.quad(fc, [mp.log(x_tail), mp.log(x_tail) + 10, mp.log(x_tail) + 40], error=True)
            total = a + b + c
            assert (ea + eb + ec) < mpf("1e-13") * total, (ea, eb, ec, total)
            osc_bound = 2 * self.delta2(mpf(x_tail) / r, du) / mpf(x_tail) ** 5
            assert osc_bound < mpf("1e-11") * total, osc_bound / total
            return mp.sqrt(total)


# ---------------------------------------------------------------------------------------------
def main():
    t_start = time.time()
    fd = cv.FermiDirac()
    out = cv.Out()
    w = out.comment
    w("GENERATED FILE - do not edit by hand.")
    w("Generated by tests/reference/growth_vectors.py (deterministic up to the last digits of scipy).")
    w("Reference vectors for structure growth (src/growth, BAO and leapfrog functions of Universe).")
    w("Format: tests/data/FORMAT.md, section 'Growth file'. Meanings: module doc of src/growth/mod.rs;")
    w("the universe model: docstring of tests/reference/cosmology_vectors.py.")
    w("Sources: see the docstring of the script; in brief:")
    for line in __doc__.split("Sources (named on\nevery line):")[-1].strip("\n").split("\n"):
        w(line)
    w("Tolerances (one central table in the script; kind value: reason):")
    for key, (kind, val, why) in TOL.items():
        w("  %-14s %-4s %-9s %s" % (key, kind, val if isinstance(val, str) else "%g" % val, why))
    out.blank()
    w("Universes: universe NAME " + " ".join(U.FIELDS))
    for u in MODELS:
        out.lines.append(u.line())
    out.blank()

    bgs = {}
    for u in MODELS:
        bg = cv.Background(u, 30, fd)
        bgs[u.name] = bg
        out.lines.append("growth g_%s %s" % (u.name, u.name))
    out.blank()
    growth = {}
    agree = 0.0
    for u in MODELS:
        bg = bgs[u.name]
        t1 = time.time()
        db = DoubleBackground(bg)
        vals, du1 = growth_ivp(db, Z_GROWTH, RTOL)
        chk, du1c = growth_ivp(db, Z_GROWTH, RTOL_CHECK)
        for (d, f), (dc, fc_) in zip(vals, chk):
            agree = max(agree, abs(d / dc - 1), abs(f / fc_ - 1))
        agree = max(agree, abs(du1 / du1c - 1))
        growth[u.name] = (vals, du1)
        g = "g_" + u.name
        w("growth of %s (%s): solve_ivp %.1f s" % (u.name, u.about, time.time() - t1))
        for z, (d, f) in zip(Z_GROWTH, vals):
            if u.name == "einstein_de_sitter":
                a = 1 / (1 + z)
                out.vec("growth_factor", g, [z], a, *tol("eds"), "closed-form-einstein-de-sitter")
                out.vec("growth_rate", g, [z], 1.0, *tol("eds"), "closed-form-einstein-de-sitter")
                out.vec("unnormalized_growth_factor", g, [z], a, *tol("eds"), "closed-form-einstein-de-sitter")
                continue
            if u.name in HEATH:
                du_h, f_h = heath(bg, z)
                du_h1, _ = heath(bg, 0.0)
                assert abs(float(du_h) / d - 1) < 1e-10, (u.name, z, float(du_h), d)
                out.vec("growth_factor", g, [z], cv.f64(du_h / du_h1), *tol("heath"), "heath1977")
                out.vec("growth_rate", g, [z], cv.f64(f_h), *tol("heath"), "heath1977")
                out.vec("unnormalized_growth_factor", g, [z], cv.f64(du_h), *tol("heath"), "heath1977")
                continue
            out.vec("growth_factor", g, [z], d / du1, *tol("growth"), "scipy-solve-ivp")
            out.vec("growth_rate", g, [z], f, *tol("growth"), "scipy-solve-ivp")
            out.vec("unnormalized_growth_factor", g, [z], d, *tol("growth"), "scipy-solve-ivp")
        for bad, code in ((math.nan, NF), (-1.0, NEG), (math.inf, NF)):
            for n in ("growth_factor", "growth_rate", "unnormalized_growth_factor"):
                out.status(n, g, [bad], code)
        out.blank()
    w("solve_ivp at rtol %g and %g: largest relative difference of an emitted value %.2e" % (RTOL, RTOL_CHECK, agree))
    w("growth index (Linder 2005, from memory): f(z) = Omega_m(z)^0.55 in flat Lambda-CDM")
    bg = bgs["flat_lcdm"]
    for z in (0.0, 0.5, 1.0, 2.0):
        with mp.workdps(30):
            a = 1 / (1 + mpf(z))
            om_z = bg.omega_cb * a / bg.P(a)
            out.vec("growth_rate", "g_flat_lcdm", [z], cv.f64(om_z ** mpf("0.55")), "rel",
                    float(mpf("0.01") * abs(mp.log(om_z))), "linder2005-memory")
    out.blank()

    # ---- Eisenstein & Hu, free functions ----
    w("Eisenstein & Hu 1998 transfer functions (free functions: k, omega_m h^2, omega_b h^2, T0)")
    params = [(0.1430, 0.02237, 2.7255), (0.147, 0.0, 2.7255), (0.30, 0.06, 2.725), (0.05, 0.02, 2.7)]
    ks = [1e-5, 1e-3, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1.0, 3.0, 10.0, 100.0]
    for wm, wb, t0 in params:
        eh = EH(wm, wb, t0)
        for k in ks:
            if wb > 0:
                v = eh.full(k)
                kind, t = tol("transfer")
                if abs(v) < 1e-3 * float(eh.fc * EH.t0(k / (mpf("13.41") * eh.k_eq), eh.alpha_c, eh.beta_c)):
                    kind, t = tol("transfer_node")
                out.vec("eisenstein_hu_transfer_function", "-", [k, wm, wb, t0], cv.f64(v), kind, t, "mpmath")
            out.vec("eisenstein_hu_no_wiggle_transfer_function", "-", [k, wm, wb, t0], cv.f64(eh.nowiggle(k)),
                    *tol("transfer"), "mpmath")
    for n in ("eisenstein_hu_transfer_function", "eisenstein_hu_no_wiggle_transfer_function"):
        out.status(n, "-", [0.0, 0.14, 0.02, 2.7255], NP)
        out.status(n, "-", [math.nan, 0.14, 0.02, 2.7255], NF)
        out.status(n, "-", [0.1, 0.0, 0.0, 2.7255], NP)
        out.status(n, "-", [0.1, 0.14, 0.02, 0.0], NP)
        out.status(n, "-", [0.1, 0.14, 0.2, 2.7255], OOD)
    out.status("eisenstein_hu_transfer_function", "-", [0.1, 0.14, 0.0, 2.7255], NP)
    out.status("eisenstein_hu_transfer_function", "-", [0.1, 0.14, -0.01, 2.7255], NP)
    out.status("eisenstein_hu_no_wiggle_transfer_function", "-", [0.1, 0.14, -0.01, 2.7255], NEG)
    out.blank()

    # ---- power spectra ----
    w("Power spectra: spectrum SNAME GNAME FORM KIND VALUE n_s alpha_s")
    specs = []
    pl_vals, pl_du1 = growth["planck_like"]
    fl_vals, fl_du1 = growth["flat_lcdm_radiation"]
    t1 = time.time()
    for name, gname, uname, form, kind, value, ns, alpha in [
            ("p_planck", "g_planck_like", "planck_like", "oscillations", "scalar_amplitude", A_S_PLANCK,
             NS_PLANCK, 0.0),
            ("p_planck_nowiggle", "g_planck_like", "planck_like", "no_wiggle", "scalar_amplitude", A_S_PLANCK,
             NS_PLANCK, 0.0),
            ("p_flat_sigma8", "g_flat_lcdm_radiation", "flat_lcdm_radiation", "oscillations", "sigma8", 0.8,
             0.96, -0.01),
            ("p_flat_nowiggle_sigma8", "g_flat_lcdm_radiation", "flat_lcdm_radiation", "no_wiggle", "sigma8",
             0.75, 1.0, 0.02)]:
        u = next(m for m in MODELS if m.name == uname)
        vals, du1 = growth[uname]
        sp = Spectrum(name, gname, u, bgs[uname], form, kind, value, ns, alpha, du1, vals)
        specs.append(sp)
        out.lines.append(sp.line())
    for sp in specs:
        vals, du1 = sp.growth, sp.du1
        for k in (1e-4, 0.01, 0.05, 0.1, 0.3, 1.0, 10.0):
            out.vec("transfer_function", sp.name, [k], cv.f64(sp.T(k)), *tol("transfer"), "mpmath")
            for z, (d, _f) in zip(Z_GROWTH, vals):
                if z in (0.0, 1.0, 49.0):
                    out.vec("linear_power_spectrum_mpc3", sp.name, [k, z], cv.f64(sp.power(k, d)),
                            *tol("spectrum"), "mpmath")
        s8 = sp.sigma(sp.r8)
        if sp.kind == "scalar_amplitude":
            out.vec("sigma8", sp.name, [], cv.f64(s8), *tol("sigma"), "mpmath")
        else:
            out.vec("scalar_amplitude", sp.name, [], cv.f64(sp.a_s), *tol("sigma_derived"), "mpmath")
            out.vec("sigma8", sp.name, [], sp.value, "rel", 1e-15, "spec")
        with mp.workdps(30):
            om = mpf(sp.u.om)
            out.vec("s8", sp.name, [], cv.f64(s8 * mp.sqrt(om / mpf("0.3"))), *tol("sigma"), "mpmath")
        for r in (1.0, 20.0, 150.0):
            out.vec("density_rms_in_sphere", sp.name, [r, 0.0], cv.f64(sp.sigma(r)), *tol("sigma"), "mpmath")
        for z, (d, f) in zip(Z_GROWTH, vals):
            if z in (0.5, 1.0, 2.0):
                out.vec("density_rms_in_sphere", sp.name, [sp.r8, z], cv.f64(s8 * d / du1), *tol("sigma"),
                        "mpmath")
                out.vec("growth_rate_times_sigma8", sp.name, [z], cv.f64(s8 * f * d / du1), *tol("fsigma8"),
                        "mpmath")
        out.status("transfer_function", sp.name, [0.0], NP)
        out.status("linear_power_spectrum_mpc3", sp.name, [-1.0, 0.0], NP)
        out.status("linear_power_spectrum_mpc3", sp.name, [0.1, -1.0], NEG)
        out.status("linear_power_spectrum_mpc3", sp.name, [math.nan, 0.0], NF)
        out.status("density_rms_in_sphere", sp.name, [0.0, 0.0], NP)
        out.status("density_rms_in_sphere", sp.name, [8.0, -0.5], NEG)
        out.status("growth_rate_times_sigma8", sp.name, [-1.0], NEG)
    w("sigma8 for the Planck 2020 base Lambda-CDM parameters (from memory): 0.8111")
    out.vec("sigma8", "p_planck", [], 0.8111, *tol("planck"), "planck2020-memory")
    print("spectra %.1f s" % (time.time() - t1))
    out.blank()

    # ---- BAO and leapfrog ----
    w("BAO distances and ratios (r_d = 147.09 Mpc given), leapfrog factors (Universe functions)")
    rd = 147.09
    for uname in ("flat_lcdm_radiation", "closed_dynamical_radiation", "planck_like", "open_lcdm"):
        bg = bgs[uname]
        zs = [0.0, 0.1, 0.38, 0.51, 0.61, 1.0, 2.33, 10.0]
        bg.build(zs)
        with mp.workdps(30):
            for z in zs:
                dh = bg.DH / bg.E(z)
                dm = bg.DH * bg.S(bg.x_tab(z))
                dv = mp.cbrt(z * dm * dm * dh)
                out.vec("hubble_distance_at_mpc", uname, [z], cv.f64(dh), *tol("bao_hubble"), "mpmath")
                out.vec("hubble_distance_over_sound_horizon", uname, [z, rd], cv.f64(dh / rd), *tol("bao_hubble"),
                        "mpmath")
                out.vec("transverse_comoving_distance_over_sound_horizon", uname, [z, rd], cv.f64(dm / rd),
                        *tol("bao"), "mpmath")
                if z > 0:
                    out.vec("volume_averaged_distance_mpc", uname, [z], cv.f64(dv), *tol("bao"), "mpmath")
                    out.vec("volume_averaged_distance_over_sound_horizon", uname, [z, rd], cv.f64(dv / rd),
                            *tol("bao"), "mpmath")
                else:
                    out.vec("volume_averaged_distance_mpc", uname, [z], 0.0, "abs", 1e-300, "spec")
        for n, args, code in (("hubble_distance_at_mpc", [-1.0], NEG), ("volume_averaged_distance_mpc", [math.nan], NF),
                              ("transverse_comoving_distance_over_sound_horizon", [0.5, 0.0], NP),
                              ("hubble_distance_over_sound_horizon", [0.5, -1.0], NP),
                              ("volume_averaged_distance_over_sound_horizon", [-0.5, 147.0], NEG),
                              ):
            out.status(n, uname, args, code)
        out.blank()
    # ---- leapfrog factors (functions of a growth: its step tables cover a >= 2^-20) ----
    w("leapfrog drift and kick factors of a growth: mpmath quadrature (30 digits) on the mpmath background;")
    w("steps inside one piece of the table (down to 1e-9 of a), across pieces and octaves, on piece and")
    w("octave boundaries, at the lower end of the table (2^-20) and below it, backwards, and the whole range")
    steps = ((0.01, 0.0101), (0.5, 0.51), (0.98, 1.0), (0.02, 1.0), (1e-3, 0.1), (0.9, 0.8), (1e-6, 1e-5),
             (0.3, 0.3 + 3e-10), (0.7, 0.7000001), (0.25, 0.5), (0.124, 0.126), (0.5, 1.0), (0.03, 0.031),
             (2.0 ** -20, 2.0 ** -19), (1e-7, 2e-7), (5e-7, 2e-6), (1e-6, 1.0), (0.015625, 0.0625),
             (0.12, 0.08), (0.999999, 1.0))
    for uname in ("einstein_de_sitter", "flat_lcdm_radiation", "closed_dynamical_radiation", "planck_like",
                  "open_lcdm"):
        bg = bgs[uname]
        with mp.workdps(30):
            for a1, a2 in steps:
                # drift = t_H int da/(a q), kick = t_H int da/q, q = sqrt(P(a)) = a^2 E
                pa = [mpf(a1), mpf(a2)]
                drift = bg.tH * mp.quad(lambda a: 1 / (a * mp.sqrt(bg.P(a))), pa)
                kick = bg.tH * mp.quad(lambda a: 1 / mp.sqrt(bg.P(a)), pa)
                out.vec("leapfrog_drift_factor_gyr", "g_" + uname, [a1, a2], cv.f64(drift), *tol("leapfrog"),
                        "mpmath")
                out.vec("leapfrog_kick_factor_gyr", "g_" + uname, [a1, a2], cv.f64(kick), *tol("leapfrog"),
                        "mpmath")
            if uname == "einstein_de_sitter":
                # closed forms: q = a^(1/2), drift = 2 t_H (a1^-1/2 - a2^-1/2), kick = 2 t_H (a2^1/2 - a1^1/2)
                for a1, a2 in steps:
                    drift = 2 * bg.tH * (mpf(a1) ** -0.5 - mpf(a2) ** -0.5)
                    kick = 2 * bg.tH * (mp.sqrt(mpf(a2)) - mp.sqrt(mpf(a1)))
                    out.vec("leapfrog_drift_factor_gyr", "g_" + uname, [a1, a2], cv.f64(drift),
                            *tol("leapfrog"), "closed-form-einstein-de-sitter")
                    out.vec("leapfrog_kick_factor_gyr", "g_" + uname, [a1, a2], cv.f64(kick), *tol("leapfrog"),
                            "closed-form-einstein-de-sitter")
        for n, args, code in (("leapfrog_drift_factor_gyr", [0.0, 0.5], NP),
                              ("leapfrog_drift_factor_gyr", [-0.5, 0.5], NP),
                              ("leapfrog_kick_factor_gyr", [0.5, 1.5], OOD),
                              ("leapfrog_kick_factor_gyr", [0.5, math.nan], NF),
                              ("leapfrog_drift_factor_gyr", [math.inf, 0.5], NF)):
            out.status(n, "g_" + uname, args, code)
        out.blank()
    w("BOSS DR12 consensus at z = 0.51 (Alam et al. 2017, from memory), within two standard deviations;")
    w("r_d = 147.09 Mpc (Planck 2020 Table 2, from memory)")
    rd_fid = 147.78
    dm_obs, dm_err = 1977.0 / rd_fid, 27.0 / rd_fid
    dh_obs = 299792.458 / (90.4 * rd_fid)
    dh_err = dh_obs * 1.9 / 90.4
    out.vec("transverse_comoving_distance_over_sound_horizon", "planck_like", [0.51, rd], dm_obs, "abs",
            2 * dm_err, "boss-dr12-memory")
    out.vec("hubble_distance_over_sound_horizon", "planck_like", [0.51, rd], dh_obs, "abs", 2 * dh_err,
            "boss-dr12-memory")

    path = os.path.join(DATA, "growth.txt")
    out.write(path)
    print("wrote %s in %.1f s; solve_ivp rtol %g vs %g agree to %.2e" % (path, time.time() - t_start, RTOL,
                                                                       RTOL_CHECK, agree))
    print("total %d vector lines" % sum(out.count.values()))


if __name__ == "__main__":
    sys.exit(main())
