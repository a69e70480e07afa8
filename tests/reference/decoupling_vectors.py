#!/usr/bin/env python3
"""Reference vectors for relicore's decoupling module: writes tests/data/decoupling.txt in the
format of tests/data/FORMAT.md (section "Decoupling file").  Run from anywhere:

    .venv/bin/python tests/reference/decoupling_vectors.py

The model is the module documentation of src/decoupling/mod.rs.  Sources of the expected values
(named on every line):

  mpmath             this script's own evaluation at 50 digits, recomputed from scratch at 80
                     digits (agreement 1e-40): the Saha ionised fraction (hydrogen and both
                     helium stages; root of the balance by bisection in ln x_e), the comoving
                     sound horizon r_s(z) (quadrature in s = sqrt(a) on the mpmath background of
                     tests/reference/cosmology_vectors.py, whose docstring defines the universe
                     model), and the two published fitting formulas (closed forms).
  scipy-solve-ivp    tests/reference/decoupling_model.py: an independent double-precision
                     implementation of the same equations (scipy.integrate.solve_ivp, Radau,
                     rtol 1e-11 here), checked against itself at rtol 1e-10 (every emitted value
                     must agree to 1e-8; the measured agreement is printed and written below).
  planck2020-memory  Planck Collaboration 2020, A&A 641, A6 (Planck 2018 results VI), Table 2, base
                     Lambda-CDM (TT,TE,EE+lowE+lensing), values recalled from memory.
  common-practice    rounded numbers of the trade (from memory).
  fit-published-accuracy  a fitting formula against the scipy-solve-ivp value of the same model,
                     at the accuracy its paper claims (from memory).
  spec               expected failure status from the project's argument rules.

Deterministic: no random choices; the scipy-solve-ivp digits beyond ~1e-10 depend on the scipy
and libm versions (they are far inside every tolerance that uses them).
"""

from __future__ import annotations

import math
import os
import sys
import time

import numpy as np
from mpmath import mp, mpf

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

import cosmology_vectors as cv  # noqa: E402  (the mpmath background, constants, f64 rounding)
import decoupling_model as dm  # noqa: E402  (the scipy solve_ivp implementation)

DPS = 50
CHECK_DPS = 80
AGREE = 1e-40
SCIPY_RTOL = 1e-11
SCIPY_CHECK_RTOL = 1e-10
SCIPY_AGREE = 1e-8
DATA = os.path.normpath(os.path.join(HERE, "..", "data"))
SCRIPT = "tests/reference/decoupling_vectors.py"

NF, NP, NEG, OOD = -2, -3, -4, -10
NAN = math.nan
BASE = 1e-5       # the accuracy the issue asks of the history (x_e, T_m, z*, z_drag)

# ---------------------------------------------------------------------------------------------
# ONE central tolerance table: key -> (kind, value or function of the vector context, reason)
# ---------------------------------------------------------------------------------------------
TOL = {
    "saha": ("rel", 1e-12,
             "root of a smooth monotone balance; rounding of chi/kT (<= 150 on every vector) moves "
             "ln S by <= ~1e-13 and |d ln x_e/d ln S| <= 1; helium adds two more such factors"),
    "fit": ("rel", 1e-13,
            "closed form of ~30 operations with pow; |exponent * ln(argument)| < 10 amplifies an ulp "
            "at most ~10 times"),
    "sound_horizon": ("rel", 1e-12,
                      "quadrature of a smooth positive integrand from a = 0, as the distances of "
                      "cosmology.txt"),
    "history": ("rel", BASE,
                "x_e, T_m, tau(z), z*, z_drag, reionisation optical depth: the accuracy the issue asks "
                "of the recombination history (an integral of x_e inherits x_e's relative error); the "
                "reference itself is converged to ~1e-10"),
    "visibility": ("rel", lambda tau: BASE * (1.0 + tau),
                   "g = x_e n_H sigma_T a e^-tau: x_e's 1e-5 plus tau's error 1e-5 tau in the exponent"),
    "derived": ("rel", lambda kappa: BASE * max(1.0, kappa),
                "r_s(z*), r_s(z_drag), theta*, age(z*), T(z*): the 1e-5 of z* or z_drag times the "
                "condition number kappa = |d ln Q/d ln z| at the root (printed per vector), at least 1e-5"),
    "visibility_peak": ("rel", BASE,
                        "the maximum of g: a smooth 1e-5 error of x_e moves it by ~1e-6 relative; 1e-5 "
                        "leaves room for locating a maximum on a table"),
    "thermal_decoupling": ("rel", lambda kappa: BASE * max(1.0, kappa),
                           "root of T_m/T_r = 0.99: T_m's 1e-5 divided by |d ln(T_m/T_r)/d ln z| there "
                           "(kappa printed per vector)"),
    "no_reionization": ("abs", 1e-12,
                        "without reionisation x_e,tot = x_e and tau - tau_rec vanishes; room for a "
                        "difference of two equal sums of ~1e3 at the top of the table"),
    "planck2020_redshift": ("rel", 1e-3,
                            "z* = 1089.92, z_drag = 1059.94 (Planck 2020 Table 2, from memory): the "
                            "published values come from a fuller recombination model than this "
                            "three-level atom with a fudge factor"),
    "planck2020_horizon": ("rel", 1e-3,
                           "r* = 144.43 Mpc, r_drag = 147.09 Mpc (Planck 2020 Table 2, from memory); as "
                           "above"),
    "planck2020_theta": ("rel", 5e-4,
                         "100 theta* = 1.04110 (Planck 2020 Table 2, from memory): a ratio of two "
                         "distances, less sensitive to the recombination model than z*"),
    "planck2020_tau": ("rel", 0.05,
                       "tau = 0.054 at z_re = 7.67 (Planck 2020 Table 2, from memory; the published value "
                       "0.0544 +- 0.0073 is quoted here to two digits)"),
    "common_redshift": ("rel", 0.02, "1 + z* ~ 1100 (common practice)"),
    "common_temperature": ("rel", 0.1, "the CMB last scattered at ~3000 K (common practice)"),
    "common_age": ("rel", 0.1, "the CMB was released ~380,000 years after the big bang (common practice)"),
    "common_saha_half": ("abs", 0.25,
                         "Saha equilibrium is half ionised at z ~ 1370 (common practice): written as two "
                         "interval vectors, x_e^Saha(0.98 * 1370) in [0, 0.5] and x_e^Saha(1.02 * 1370) "
                         "in [0.5, 1] (expected = interval midpoint, abs = half width)"),
    "fit_published": ("rel", 0.01,
                      "Hu & Sugiyama 1996 and Eisenstein & Hu 1998 describe their fits as accurate to "
                      "about 1% (from memory)"),
}


def tol(key, *ctx):
    kind, val, _ = TOL[key]
    return kind, (val(*ctx) if callable(val) else val)


# ---------------------------------------------------------------------------------------------
# universes and histories
# ---------------------------------------------------------------------------------------------
T0 = 2.7255
UNIVERSES = [
    cv.Universe("planck_like", "flat, H0 = 67.36, Omega_m = 0.3153 with one 0.06 eV neutrino, Omega_b h^2 = "
                "0.02237, N_eff = 3.046, Y_p = 0.245 (the parameters of Planck 2020 Table 2)",
                h0=67.36, omega_matter=0.3153, omega_baryon=cv.PLANCKISH_OB, cmb_temperature_k=T0, n_eff=3.046,
                masses=(0.06, 0.0, 0.0), helium_mass_fraction=0.245),
    cv.Universe("flat_massless", "flat, H0 = 70, Omega_m = 0.3, Omega_b = 0.05, massless neutrinos",
                h0=70.0, omega_matter=0.3, omega_baryon=0.05, cmb_temperature_k=T0, n_eff=3.044,
                helium_mass_fraction=0.245),
    cv.Universe("high_baryon_open", "open (Omega_k = 0.05), H0 = 65, Omega_m = 0.35, Omega_b = 0.08 "
                "(Omega_b h^2 = 0.0338), Y_p = 0.25", h0=65.0, omega_matter=0.35, omega_baryon=0.08,
                omega_curvature=0.05, cmb_temperature_k=T0, n_eff=3.044, helium_mass_fraction=0.25),
    cv.Universe("helium_rich_dynamical", "flat, H0 = 72, Omega_m = 0.28, Omega_b = 0.035, three 0.1 eV "
                "neutrinos, w0 = -0.9, wa = 0.2, Y_p = 0.30", h0=72.0, omega_matter=0.28, omega_baryon=0.035,
                cmb_temperature_k=T0, n_eff=3.044, masses=(0.1, 0.1, 0.1), w0=-0.9, wa=0.2,
                helium_mass_fraction=0.30),
]
UBYNAME = {u.name: u for u in UNIVERSES}

# (history name, universe name, reionisation redshift or None)
HISTORIES = [
    ("planck_like_no_reionization", "planck_like", None),
    ("planck_like_reionized", "planck_like", 7.67),
    ("flat_massless_no_reionization", "flat_massless", None),
    ("flat_massless_reionized", "flat_massless", 10.0),
    ("high_baryon_open_no_reionization", "high_baryon_open", None),
    ("helium_rich_dynamical_no_reionization", "helium_rich_dynamical", None),
]

Z_SAHA_FULL = [1e4, 8000.0, 6000.0, 5000.0, 4000.0, 3000.0, 2500.0, 2000.0, 1800.0, 1600.0, 1500.0, 1400.0,
               1370.0, 1300.0, 1200.0, 1100.0, 1000.0, 800.0, 600.0, 400.0]
Z_SAHA_SHORT = [1e4, 6000.0, 3000.0, 2000.0, 1500.0, 1300.0, 1100.0, 800.0]
Z_SOUND = [0.0, 10.0, 100.0, 500.0, 1000.0, 1100.0, 2000.0, 1e4, 2e4, 1e6]   # r_s needs the background only: any z
Z_HISTORY = [1600.0, 1500.0, 1400.0, 1300.0, 1200.0, 1100.0, 1000.0, 900.0, 800.0, 700.0, 600.0, 500.0, 400.0,
             300.0, 200.0, 150.0, 100.0, 75.0, 50.0]
Z_HISTORY_HIGH = [1e4, 9990.0, 9900.0, 9500.0, 8000.0, 5000.0, 3000.0, 2000.0]
Z_HISTORY_LOW = [20.0, 10.0, 0.0]
Z_REIONIZED_LOW = [0.0, 2.0, 3.5, 5.0, 7.0, 7.67, 8.0, 9.0, 10.0, 11.0, 12.0, 15.0, 20.0, 30.0]
Z_TAU = [1e4, 5000.0, 2000.0, 1400.0, 1200.0, 1100.0, 1000.0, 800.0, 500.0, 200.0, 50.0]
Z_VISIBILITY = [1300.0, 1200.0, 1150.0, 1100.0, 1090.0, 1080.0, 1050.0, 1000.0, 900.0, 800.0]
FIT_EXTRA = [(0.01, 0.1), (0.05, 0.3), (0.02237, 0.5), (0.1, 0.15)]
Z_FUNCS = ["ionized_fraction", "matter_temperature_k", "optical_depth", "visibility", "sound_horizon_mpc"]


def params_of(u: cv.Universe) -> dict:
    return dict(h0_km_s_mpc=u.h0, omega_matter=u.om, omega_baryon=u.ob, omega_curvature=u.ok,
                cmb_temperature_k=u.t0, n_eff=u.n_eff, neutrino_masses_ev=tuple(u.masses), w0=u.w0, wa=u.wa,
                helium_mass_fraction=u.yhe)


# ---------------------------------------------------------------------------------------------
# mpmath: species, Saha, sound horizon, fits
# ---------------------------------------------------------------------------------------------
def mp_constants():
    """Constants at the current precision: exact SI values, CODATA 2022 (as printed there) and the
    atom data as printed in src/decoupling/mod.rs."""
    u = mpf("1.66053906892e-27")
    ev = cv.EV()
    return dict(me=mpf("9.1093837139e-31"), h=cv.HP(), k=cv.KB(), mH=mpf("1.007825031898") * u,
                mHe=mpf("4.002603254130") * u, chiH=mpf("13.598434599702") * ev,
                chi1=mpf("24.587389011") * ev, chi2=mpf("54.4177655") * ev)


class MpDecoupling:
    """Species and the Saha balance of one universe at one precision (on the cosmology_vectors
    Background, which holds rho_crit, Omega_gamma, E(z) and its quadrature)."""

    def __init__(self, u: cv.Universe, dps: int, fd) -> None:
        self.u, self.dps = u, dps
        with mp.workdps(dps):
            self.bg = cv.Background(u, dps, fd)
            self.c = mp_constants()
            yp = mpf(u.yhe)
            self.n_h0 = (1 - yp) * mpf(u.ob) * self.bg.rho_crit / self.c["mH"]
            self.f_he = yp * self.c["mH"] / ((1 - yp) * self.c["mHe"])
            self.r0 = 3 * mpf(u.ob) / (4 * self.bg.omega_photon)

    def saha(self, z):
        """x_e = x_p + f_He (y1 + 2 y2), x_p = S_H/(S_H + x_e), by bisection in ln x_e."""
        with mp.workdps(self.dps + 10):
            c = self.c
            z = mpf(z)
            t = mpf(self.u.t0) * (1 + z)
            kt = c["k"] * t
            pre = (2 * mp.pi * c["me"] * kt / c["h"] ** 2) ** (mpf(3) / 2) / (self.n_h0 * (1 + z) ** 3)
            sh = pre * mp.exp(-c["chiH"] / kt)
            s1 = 4 * pre * mp.exp(-c["chi1"] / kt)
            s2 = pre * mp.exp(-c["chi2"] / kt)
            f = self.f_he

            def g(lx):
                x = mp.exp(lx)
                r1, r2 = s1 / x, s2 / x
                return x - sh / (sh + x) - f * (r1 + 2 * r1 * r2) / (1 + r1 + r1 * r2)

            lo, hi = mp.log(sh) / 2 - 5 if sh < 1 else mp.log(mpf("0.1")), mp.log(1 + 2 * f)
            assert g(lo) < 0 < g(hi), z
            for _ in range(mp.prec + 20):       # bisection in ln x: one bit per step
                mid = (lo + hi) / 2
                if hi - lo <= mpf(2) ** (-mp.prec + 3) * max(1, abs(lo)):
                    break
                if g(mid) < 0:
                    lo = mid
                else:
                    hi = mid
            x = mp.exp((lo + hi) / 2)
            chi_over_kt = c["chiH"] / kt
        return +x, float(chi_over_kt)

    def sound_horizon(self, z):
        """r_s(z) = D_H int_0^s(z) 2 s ds/(sqrt(a^4 E^2) sqrt(3(1 + R0 s^2))), a = s^2, in Mpc."""
        with mp.workdps(self.dps):
            bg, r0 = self.bg, self.r0

            def g(s):
                return 2 * s / (mp.sqrt(bg.Ps(s)) * mp.sqrt(3 * (1 + r0 * s * s)))

            return bg.DH * bg.integral(g, mpf(0), cv.s_of_z(z))

    def hubble_e(self, z):
        with mp.workdps(self.dps):
            return self.bg.E(z)


def fit_last_scattering_mp(wb, wm):
    """Hu & Sugiyama 1996, ApJ 471, 542, eq. E1 (coefficients from memory)."""
    wb, wm = mpf(wb), mpf(wm)
    g1 = mpf("0.0783") * wb ** mpf("-0.238") / (1 + mpf("39.5") * wb ** mpf("0.763"))
    g2 = mpf("0.560") / (1 + mpf("21.1") * wb ** mpf("1.81"))
    return 1048 * (1 + mpf("0.00124") * wb ** mpf("-0.738")) * (1 + g1 * wm ** g2)


def fit_drag_mp(wb, wm):
    """Eisenstein & Hu 1998, ApJ 496, 605, eq. 4 (coefficients from memory)."""
    wb, wm = mpf(wb), mpf(wm)
    b1 = mpf("0.313") * wm ** mpf("-0.419") * (1 + mpf("0.607") * wm ** mpf("0.674"))
    b2 = mpf("0.238") * wm ** mpf("0.223")
    return 1291 * wm ** mpf("0.251") / (1 + mpf("0.659") * wm ** mpf("0.828")) * (1 + b1 * wb ** b2)


def both(fn_a, fn_b, what):
    """Value at DPS after checking it against the CHECK_DPS recomputation."""
    with mp.workdps(DPS):
        a = fn_a()
    with mp.workdps(CHECK_DPS):
        b = fn_b()
        assert abs(a - b) <= abs(b) * mpf(AGREE), (what, a, b)
    return a


def summary_tolerances(hist) -> dict:
    """name -> (kind, tolerance, kappa or None) for the summary of a reference history: the central
    table's keys with their condition numbers (numerical log-derivatives of the reference's own
    functions at its z* or z_drag; kappa of thermal decoupling from the dense T_m/T_r)."""
    ru = hist.universe
    zs_, zd_ = hist.last_scattering_redshift, hist.drag_redshift

    def dlog(f, z, h=1e-3):
        return (math.log(f(z * (1 + h))) - math.log(f(z * (1 - h)))) / (math.log1p(h) - math.log1p(-h))

    kappa = {
        "sound_horizon_last_scattering_mpc": abs(dlog(ru.sound_horizon_mpc, zs_)),
        "sound_horizon_drag_mpc": abs(dlog(ru.sound_horizon_mpc, zd_)),
        "angular_scale_last_scattering": abs(dlog(lambda z: ru.sound_horizon_mpc(z)
                                                  / ru.transverse_comoving_distance_mpc(z), zs_)),
        "age_at_last_scattering_yr": abs(dlog(ru.age_yr, zs_)),
        "temperature_at_last_scattering_k": zs_ / (1 + zs_),
    }
    out = {}
    for name in ("last_scattering_redshift", "drag_redshift"):
        out[name] = tol("history") + (None,)
    for name, k in kappa.items():
        out[name] = tol("derived", k) + (k,)
    out["visibility_peak_redshift"] = tol("visibility_peak") + (None,)
    ztd = hist.thermal_decoupling_redshift
    dz = 1e-3 * ztd
    slope = (hist.temperature_ratio(ztd + dz) - hist.temperature_ratio(ztd - dz)) / (2 * dz)
    k_td = dm.THERMAL_DECOUPLING_RATIO / (ztd * abs(slope))
    out["thermal_decoupling_redshift"] = tol("thermal_decoupling", k_td) + (k_td,)
    if hist.z_re is None:
        out["reionization_optical_depth"] = tol("no_reionization") + (None,)
    else:
        out["reionization_optical_depth"] = tol("history") + (None,)
    return out


# ---------------------------------------------------------------------------------------------
# the file
# ---------------------------------------------------------------------------------------------
def header(out, notes):
    c = out.comment
    c("GENERATED FILE - do not edit by hand.")
    c("Generated by %s (deterministic)." % SCRIPT)
    c("Reference vectors for the decoupling module (Saha, the thermal history, its summary, the fits).")
    c("Format: tests/data/FORMAT.md, section 'Decoupling file'.  The model is the module documentation of")
    c("src/decoupling/mod.rs; the universe model is the docstring of tests/reference/cosmology_vectors.py.")
    c("Constants: SI 2019 exact h, c, k, e; CODATA 2022 m_e = 9.1093837139e-31 kg, u = 1.66053906892e-27 kg,")
    c("sigma_T = 6.6524587051e-29 m^2, G = 6.67430e-11; atom data as printed in mod.rs; Julian year.")
    c("Sources:")
    c("  mpmath             this script at 50 digits, recomputed at 80 (agreement 1e-40), from the exact")
    c("                     binary values of the printed arguments: saha_ionized_fraction (bisection in")
    c("                     ln x_e), sound_horizon_mpc (quadrature in s = sqrt(a) on the background of")
    c("                     cosmology_vectors.py), the fits (closed forms).")
    c("  scipy-solve-ivp    tests/reference/decoupling_model.py: the same equations in double precision,")
    c("                     scipy.integrate.solve_ivp (Radau, rtol %g), optical depths by Gauss-Legendre on" % SCIPY_RTOL)
    c("                     every solver step, z* and z_drag by brentq, distances and ages by quad.")
    c("                     Recomputed at rtol %g: largest relative change of an emitted value %.1e." %
      (SCIPY_CHECK_RTOL, notes["scipy_agreement"]))
    c("                     Cross-checks asserted by the script: its Saha against mpmath (max %.1e), its" %
      notes["saha_cross"])
    c("                     E(z) against mpmath (max %.1e), its r_s against mpmath (max %.1e), its fits" %
      (notes["e_cross"], notes["rs_cross"]))
    c("                     against mpmath (max %.1e)." % notes["fit_cross"])
    c("  planck2020-memory  Planck Collaboration 2020, A&A 641, A6, Table 2 (base Lambda-CDM,")
    c("                     TT,TE,EE+lowE+lensing), values recalled from memory: z* = 1089.92,")
    c("                     z_drag = 1059.94, r* = 144.43 Mpc, r_drag = 147.09 Mpc, 100 theta* = 1.04110,")
    c("                     tau = 0.054 at z_re = 7.67; for the universe 'planck_like'.")
    c("  common-practice    1 + z* ~ 1100, T(z*) ~ 3000 K, age(z*) ~ 380,000 yr, Saha half-ionised at")
    c("                     z ~ 1370 (here at z = %.2f by mpmath for 'planck_like')." % notes["saha_half"])
    c("  fit-published-accuracy  a fit against the scipy-solve-ivp z* or z_drag at the fit's claimed")
    c("                     accuracy (about 1%, from memory).")
    c("  spec               expected failure status from the project's argument rules.")
    c("Tolerances (one central table in the script; kind value: reason):")
    for key, (kind, val, reason) in TOL.items():
        v = "f(vector)" if callable(val) else ("%g" % val)
        c("  %-20s %-4s %-10s %s" % (key, kind, v, reason))
    out.blank()


def main():
    t_start = time.time()
    fd = cv.FermiDirac()
    dm.fermi_dirac_ratio()
    out = cv.Out()
    notes = {"scipy_agreement": 0.0, "saha_cross": 0.0, "e_cross": 0.0, "rs_cross": 0.0, "fit_cross": 0.0}
    body = cv.Out()
    report = []

    body.comment("Universes: universe NAME " + " ".join(cv.Universe.FIELDS))
    for u in UNIVERSES:
        body.lines.append(u.line())
    body.blank()
    body.comment("Histories: history NAME UNIVERSE | history_reionized NAME UNIVERSE z_re "
                 "(highest redshift 1e4)")
    for hname, uname, zre in HISTORIES:
        if zre is None:
            body.lines.append("history %s %s" % (hname, uname))
        else:
            body.lines.append("history_reionized %s %s %s" % (hname, uname, cv.fmt(zre)))
    body.blank()

    # ---------------- per universe: Saha, fits (mpmath) ----------------
    mpd = {}
    refu = {}
    for u in UNIVERSES:
        t1 = time.time()
        a = MpDecoupling(u, DPS, fd)
        b = MpDecoupling(u, CHECK_DPS, fd)
        mpd[u.name] = (a, b)
        ru = dm.ReferenceUniverse(**params_of(u))
        refu[u.name] = ru
        body.comment("---------------------------------------------------------------------------------------")
        body.comment("universe %s: %s" % (u.name, u.about))
        with mp.workdps(DPS):
            body.comment("  derived (mpmath): n_H0 = %s m^-3, f_He = %s, R0 = 3 Omega_b/(4 Omega_gamma) = %s"
                         % (mp.nstr(a.n_h0, 12), mp.nstr(a.f_he, 12), mp.nstr(a.r0, 12)))
        # the scipy background against the mpmath one
        for z in (0.0, 1.0, 10.0, 100.0, 1000.0, 1e4, 1e6):
            want = a.hubble_e(z)
            e = abs(ru.e(z) / float(want) - 1)
            assert e < 1e-12, (u.name, z, e)
            notes["e_cross"] = max(notes["e_cross"], e)
        zs = Z_SAHA_FULL if u.name == "planck_like" else Z_SAHA_SHORT
        for z in zs:
            x, chi_kt = both(lambda: a.saha(z)[0], lambda: b.saha(z)[0], ("saha", u.name, z)), a.saha(z)[1]
            assert chi_kt <= 150.0, (u.name, z, chi_kt)
            want = cv.f64(x)
            e = abs(dm.saha_ionized_fraction(ru, z) / want - 1)
            assert e < 1e-13, (u.name, z, e)
            notes["saha_cross"] = max(notes["saha_cross"], e)
            kind, t = tol("saha")
            body.vec("saha_ionized_fraction", u.name, [z], want, kind, t, "mpmath")
        if u.name == "planck_like":
            # where Saha is half ionised (mpmath), and the common-practice interval vectors
            with mp.workdps(DPS):
                zh = mp.findroot(lambda z: a.saha(z)[0] - mpf("0.5"), (mpf(1300), mpf(1450)), solver="anderson")
            notes["saha_half"] = float(zh)
            report.append("Saha half-ionisation (mpmath, planck_like): z = %.4f (%+.3f%% from 1370)"
                          % (float(zh), 100 * (float(zh) / 1370 - 1)))
            if abs(float(zh) / 1370 - 1) > 0.02:
                raise SystemExit("Saha half-ionisation z = %.2f differs from 1370 by more than 2%%: report it"
                                 % float(zh))
            body.comment("  common practice: Saha half-ionised at z ~ 1370 (mpmath: z = %.4f); interval vectors:"
                         % float(zh))
            kind, t = tol("common_saha_half")
            for z, mid in ((0.98 * 1370.0, 0.25), (1.02 * 1370.0, 0.75)):
                x = a.saha(z)[0]
                assert abs(float(x) - mid) <= t, (z, x)
                body.vec("saha_ionized_fraction", u.name, [z], mid, kind, t, "common-practice")
        body.status("saha_ionized_fraction", u.name, [-1.0], NEG)
        body.status("saha_ionized_fraction", u.name, [-1e-300], NEG)
        body.status("saha_ionized_fraction", u.name, [NAN], NF)
        body.blank()
        print("universe %-24s mpmath part %.1f s" % (u.name, time.time() - t1))

    # ---------------- fits (mpmath) ----------------
    body.comment("---------------------------------------------------------------------------------------")
    body.comment("published fits (target '-'; args Omega_b h^2, Omega_m h^2 with Omega_m including massive "
                 "neutrinos)")
    fit_args = []
    for u in UNIVERSES:
        h = u.h0 / 100.0
        fit_args.append((u.ob * h * h, u.om * h * h))
    fit_args += FIT_EXTRA
    for wb, wm in fit_args:
        for fname, fmp, fpy in (("last_scattering_redshift_fit", fit_last_scattering_mp, dm.last_scattering_redshift_fit),
                                ("drag_redshift_fit", fit_drag_mp, dm.drag_redshift_fit)):
            want = cv.f64(both(lambda: fmp(wb, wm), lambda: fmp(wb, wm), (fname, wb, wm)))
            e = abs(fpy(wb, wm) / want - 1)
            assert e < 1e-14, (fname, wb, wm, e)
            notes["fit_cross"] = max(notes["fit_cross"], e)
            kind, t = tol("fit")
            body.vec(fname, "-", [wb, wm], want, kind, t, "mpmath")
    for fname in ("last_scattering_redshift_fit", "drag_redshift_fit"):
        body.status(fname, "-", [NAN, 0.14], NF)
        body.status(fname, "-", [0.022, NAN], NF)
        body.status(fname, "-", [0.0, 0.14], NP)
        body.status(fname, "-", [-0.022, 0.14], NP)
        body.status(fname, "-", [0.022, 0.0], NP)
        body.status(fname, "-", [0.022, -0.14], NP)
    body.blank()

    # ---------------- histories (scipy-solve-ivp; sound horizon mpmath) ----------------
    fit_lines = []
    for hname, uname, zre in HISTORIES:
        t1 = time.time()
        u = UBYNAME[uname]
        ru = refu[uname]
        a, b = mpd[uname]
        p = params_of(u)
        hist = dm.ReferenceHistory(**p, reionization_redshift=zre, rtol=SCIPY_RTOL)
        t_hist = time.time() - t1
        check = dm.ReferenceHistory(**p, reionization_redshift=zre, rtol=SCIPY_CHECK_RTOL)
        body.comment("---------------------------------------------------------------------------------------")
        body.comment("history %s: universe %s, %s (scipy: %d Radau steps)" %
                     (hname, uname, "no reionisation" if zre is None else "reionised at z_re = %g" % zre,
                      hist.n_steps))

        def agree(fn, what):
            v, w = fn(hist), fn(check)
            if v == 0.0:
                assert w == 0.0 or abs(w) < 1e-14, (hname, what, v, w)
                return v
            e = abs(w / v - 1)
            assert e < SCIPY_AGREE, (hname, what, v, w, e)
            notes["scipy_agreement"] = max(notes["scipy_agreement"], e)
            return v

        zs_x = sorted(set(Z_HISTORY + Z_HISTORY_HIGH + Z_HISTORY_LOW + (Z_REIONIZED_LOW if zre else [])),
                      reverse=True)
        kind, t = tol("history")
        for z in zs_x:
            v = agree(lambda h: h.ionized_fraction(z), ("x_e", z))
            body.vec("ionized_fraction", hname, [z], v, kind, t, "scipy-solve-ivp")
        for z in zs_x:
            v = agree(lambda h: h.matter_temperature_k(z), ("T_m", z))
            body.vec("matter_temperature_k", hname, [z], v, kind, t, "scipy-solve-ivp")
        zs_tau = sorted(set(Z_TAU + (Z_REIONIZED_LOW if zre else [])), reverse=True)
        for z in zs_tau:
            v = agree(lambda h: h.optical_depth(z), ("tau", z))
            body.vec("optical_depth", hname, [z], v, kind, t, "scipy-solve-ivp")
        if zre is None:
            assert hist.optical_depth(0.0) == 0.0
            body.vec("optical_depth", hname, [0.0], 0.0, kind, t, "scipy-solve-ivp")
        zs_g = Z_VISIBILITY + ([30.0, 12.0, 10.0, 8.0, 7.67, 7.0, 5.0] if zre else [])
        for z in zs_g:
            v = agree(lambda h: h.visibility(z), ("g", z))
            tau = hist.optical_depth(z)
            kind_g, t_g = tol("visibility", tau)
            body.vec("visibility", hname, [z], v, kind_g, t_g, "scipy-solve-ivp")
        # sound horizon at given z: mpmath (depends on the universe only)
        for z in Z_SOUND:
            want = cv.f64(both(lambda: a.sound_horizon(z), lambda: b.sound_horizon(z), ("r_s", uname, z)))
            e = abs(ru.sound_horizon_mpc(z) / want - 1)
            assert e < 1e-11, (uname, z, e)
            notes["rs_cross"] = max(notes["rs_cross"], e)
            kind_s, t_s = tol("sound_horizon")
            body.vec("sound_horizon_mpc", hname, [z], want, kind_s, t_s, "mpmath")

        # summary
        zs_ = hist.last_scattering_redshift
        zd_ = hist.drag_redshift
        tols = summary_tolerances(hist)
        for name in dm.SUMMARY_NAMES:
            kind_q, t_q, k = tols[name]
            if k is not None:
                body.comment("  %s: kappa = %.4f" % (name, k))
            if name == "reionization_optical_depth" and zre is None:
                assert hist.reionization_optical_depth == 0.0
                v = 0.0
            else:
                v = agree(lambda h: getattr(h, name), name)
            body.vec(name, hname, [], v, kind_q, t_q, "scipy-solve-ivp")

        # published and common-practice values
        if hname == "planck_like_no_reionization":
            published = [
                ("last_scattering_redshift", 1089.92, "planck2020_redshift"),
                ("drag_redshift", 1059.94, "planck2020_redshift"),
                ("sound_horizon_last_scattering_mpc", 144.43, "planck2020_horizon"),
                ("sound_horizon_drag_mpc", 147.09, "planck2020_horizon"),
                ("angular_scale_last_scattering", 1.04110e-2, "planck2020_theta"),
            ]
            for name, want, key in published:
                got = getattr(hist, name)
                kind_q, t_q = tol(key)
                report.append("planck2020 %-36s model %.6g  published %.6g  (%+.2e, tolerance %g)"
                              % (name, got, want, got / want - 1, t_q))
                assert abs(got / want - 1) <= t_q, (name, got, want)
                body.vec(name, hname, [], want, kind_q, t_q, "planck2020-memory")
            common = [
                ("last_scattering_redshift", 1099.0, "common_redshift"),
                ("temperature_at_last_scattering_k", 3000.0, "common_temperature"),
                ("age_at_last_scattering_yr", 380000.0, "common_age"),
            ]
            for name, want, key in common:
                got = getattr(hist, name)
                kind_q, t_q = tol(key)
                report.append("common     %-36s model %.6g  rule of thumb %.6g  (%+.2e, tolerance %g)"
                              % (name, got, want, got / want - 1, t_q))
                assert abs(got / want - 1) <= t_q, (name, got, want)
                body.vec(name, hname, [], want, kind_q, t_q, "common-practice")
        if hname == "planck_like_reionized":
            kind_q, t_q = tol("planck2020_tau")
            got = hist.reionization_optical_depth
            report.append("planck2020 %-36s model %.6g  published %.6g  (%+.2e, tolerance %g)"
                          % ("reionization_optical_depth", got, 0.054, got / 0.054 - 1, t_q))
            assert abs(got / 0.054 - 1) <= t_q
            body.vec("reionization_optical_depth", hname, [], 0.054, kind_q, t_q, "planck2020-memory")

        # the fits against the model (non-reionised histories: z* and z_drag exclude reionisation)
        if zre is None:
            h = u.h0 / 100.0
            wb, wm = u.ob * h * h, u.om * h * h
            kind_f, t_f = tol("fit_published")
            for fname, fpy, model in (("last_scattering_redshift_fit", dm.last_scattering_redshift_fit, zs_),
                                      ("drag_redshift_fit", dm.drag_redshift_fit, zd_)):
                fit = fpy(wb, wm)
                dev = fit / model - 1
                report.append("fit        %-28s %-38s fit %.3f  model %.3f  (%+.3f%%)"
                              % (fname, uname, fit, model, 100 * dev))
                if abs(dev) <= t_f:
                    fit_lines.append((fname, wb, wm, model, kind_f, t_f))
                else:
                    fit_lines.append((fname, wb, wm, model, None, dev))

        # status vectors
        if hname in ("planck_like_no_reionization", "planck_like_reionized"):
            for fname in Z_FUNCS:
                body.status(fname, hname, [-0.5], NEG)
                body.status(fname, hname, [NAN], NF)
                if fname != "sound_horizon_mpc":        # the table's functions end at its top
                    body.status(fname, hname, [1.0001e4], OOD)
                    body.status(fname, hname, [2e4], OOD)
        body.blank()
        print("history %-40s scipy %.1f s (one history %.1f s), total %.1f s"
              % (hname, time.time() - t1, t_hist, time.time() - t1))

    body.comment("---------------------------------------------------------------------------------------")
    body.comment("fits against the model (scipy-solve-ivp z* and z_drag of the non-reionised histories) at the")
    body.comment("fits' claimed accuracy; a comparison outside it is NOT emitted and is listed here instead:")
    for fname, wb, wm, model, kind_f, t_f in fit_lines:
        if kind_f is None:
            fpy = dm.last_scattering_redshift_fit if fname == "last_scattering_redshift_fit" else dm.drag_redshift_fit
            body.comment("  NOT EMITTED: %s(%.6g, %.6g) = %.3f vs model %.3f: %+.2f%%, beyond the claimed ~1%%"
                         % (fname, wb, wm, fpy(wb, wm), model, 100 * t_f))
    for fname, wb, wm, model, kind_f, t_f in fit_lines:
        if kind_f is not None:
            body.vec(fname, "-", [wb, wm], model, kind_f, t_f, "fit-published-accuracy")

    header(out, notes)
    out.lines += body.lines
    os.makedirs(DATA, exist_ok=True)
    path = os.path.join(DATA, "decoupling.txt")
    out.write(path)
    print("wrote %s in %.1f s" % (path, time.time() - t_start))
    names = []
    for (n, _k) in body.count:
        if n not in names:
            names.append(n)
    print("%-36s %6s %6s" % ("function", "values", "status"))
    for n in names:
        print("%-36s %6d %6d" % (n, body.count.get((n, "value"), 0), body.count.get((n, "status"), 0)))
    print("total %d vector lines" % sum(body.count.values()))
    print("cross-checks: " + ", ".join("%s %.1e" % (k, v) for k, v in notes.items()))
    print("\n".join(report))


if __name__ == "__main__":
    sys.exit(main())
