#!/usr/bin/env python3
"""An INDEPENDENT double-precision re-implementation of relicore's decoupling model, for the
reference vectors of tests/data/decoupling.txt, the Python comparison tests and the speed
comparison.  Nothing here reads, runs or imitates relicore's code or any other recombination
program: the equations are those written in the module documentation of src/decoupling/mod.rs
(the definition of the model), implemented from the published laws with scipy.

    from decoupling_model import ReferenceHistory
    h = ReferenceHistory(h0_km_s_mpc=67.36, omega_matter=0.3153, omega_baryon=0.0493,
                         n_eff=3.046, neutrino_masses_ev=(0.06, 0.0, 0.0))
    h.ionized_fraction(1100.0), h.last_scattering_redshift, ...

THE MODEL (as in src/decoupling/mod.rs)
=======================================
Universe (keyword names as relicore.Universe): h0_km_s_mpc, omega_matter (all non-relativistic
matter today, massive neutrinos included), omega_baryon, omega_curvature, cmb_temperature_k (T0),
n_eff, neutrino_masses_ev (three), w0, wa, helium_mass_fraction (Y_p).  The expansion rate is
re-implemented here from scipy.constants: photons a_r T0^4/c^2/rho_crit,0 (a_r = 4 sigma_SB/c),
N_eff shared equally by three species at T_nu = (4/11)^(1/3) T0, each (7/8)(4/11)^(4/3) of the
photon density per species when massless, a massive species scaled by F(y a)/F(0) with
F(y) = int_0^inf x^2 sqrt(x^2+y^2)/(e^x+1) dx, y = m c^2/(k T_nu0); curvature; dark energy
Omega_de = 1 - Omega_m - Omega_r - Omega_k with density a^(-3(1+w0+wa)) exp(-3 wa (1-a))
(Chevallier & Polarski 2001; Linder 2003).  E^2 = Omega_cb a^-3 + Omega_r a^-4 + massive
neutrinos + Omega_k a^-2 + dark energy; H = H0 E, H0 = h0 * 1000 / Mpc, Mpc = 1e6 parsec.

Species: n_H = (1 - Y_p) Omega_b rho_crit,0 (1+z)^3 / m_H, f_He = Y_p m_H/((1 - Y_p) m_He),
m_H = 1.007825031898 u, m_He = 4.002603254130 u (as printed in mod.rs, AME 2020 from memory),
u = atomic mass constant (CODATA 2022).  T_r = T0 (1+z).

Saha factor of a stage (energy chi, weight factor g) at temperature T:
S(T) = g (2 pi m_e k T/h^2)^(3/2) exp(-chi/kT) / n_H; hydrogen chi_H = 13.598434599702 eV (g=1),
He I -> He II 24.587389011 eV (g=4), He II -> He III 54.4177655 eV (g=1) (as printed in mod.rs).
Helium stages at electron fraction x_e: r1 = S_HeI/x_e, r2 = S_HeII/x_e,
y1 = r1/(1 + r1 + r1 r2), y2 = r1 r2/(1 + r1 + r1 r2).
Saha equilibrium at T_r: x_e = x_p + f_He (y1 + 2 y2), x_p = S_H/(S_H + x_e).

History: state (x_p, T_m) from the highest redshift (default 1e4; Saha equilibrium there,
T_m = T_r) to z = 0, with helium in Saha equilibrium at T_r at every evaluation
(x_e = x_p + f_He (y1(x_e) + 2 y2(x_e))), and
    dx_p/dt = -C [alpha(T_m) n_H x_e x_p - beta(T_r) (1 - x_p) exp(-E_alpha/kT_r)]
    (Peebles 1968, ApJ 153, 1)
    alpha(T) = 1.14 * 1e-19 * 4.309 t^-0.6166/(1 + 0.6703 t^0.5300) m^3/s, t = T/1e4 K
    (Pequignot, Petitjean & Boisson 1991, A&A 251, 680; fudge 1.14 of Seager, Sasselov & Scott
    1999, ApJ 523, L1)
    beta(T) = alpha(T) (2 pi m_e k T/h^2)^(3/2) exp(-B_2/kT), B_2 = chi_H/4
    C = (1 + K Lambda n_H (1-x_p)) / (1 + K (Lambda + beta(T_r)) n_H (1-x_p)),
    K = lambda_alpha^3/(8 pi H), lambda_alpha = h c/E_alpha, E_alpha = 3/4 chi_H, Lambda = 8.2245809/s
    dT_m/dt = -2 H T_m + (8 sigma_T a_r T_r^4/(3 m_e c)) x_e/(1 + f_He + x_e) (T_r - T_m)
    dt = -dz/((1+z) H).
Reionisation (optional z_re), with y = (1+z)^(3/2), dy = (3/2)(1+z_re)^(1/2) * 0.5:
    x_e,tot = x_e + max(0, 1 + f_He - x_e) (1 + tanh((y(z_re) - y)/dy))/2
              + f_He (1 + tanh((z_He - z)/dz_He))/2
(helium's second reionisation at z_He = 3.5 with dz_He = 0.5 by default, options
helium_reionization_redshift and helium_reionization_width; the default values are those of
Planck Collaboration 2020, A&A 641, A6, Sect. 3.3, from memory)
(it changes x_e, the optical depth and the visibility, not T_m).
Derived: tau(z) = int_0^z x_e,tot n_H sigma_T c dz'/((1+z')H) (tau_rec: x_e instead);
z*: tau_rec = 1; z_drag: tau_drag = 1, tau_drag = int_0^z x_e n_H sigma_T c/(R (1+z') H) dz',
R = 3 Omega_b/(4 Omega_gamma (1+z)) (photons only); r_s(z) = int_z^inf c/sqrt(3(1+R)) dz'/H (Mpc);
theta* = r_s(z*)/D_M(z*); age at z* (Julian years); T(z*) = T0 (1+z*);
visibility g = x_e,tot n_H sigma_T a exp(-tau) * (1 Mpc) (per Mpc of conformal time) and its peak
around last scattering; thermal decoupling: the highest z where T_m/T_r = 0.99; reionisation
optical depth: tau - tau_rec at the top of the table.
Fits: Hu & Sugiyama 1996 (ApJ 471, 542) z*, Eisenstein & Hu 1998 (ApJ 496, 605) z_drag, with
the coefficients recalled from memory (see the functions).

METHOD (none of it shared with relicore)
========================================
* The ODE in u = ln(1+z) for the state (x_p, T_m/T_r): scipy.integrate.solve_ivp with the
  implicit Radau IIA method (order 5), rtol = 1e-10 by default (1e-11 for the vector file),
  atol = 1e-30 (pure relative control), dense output, and the analytic Jacobian.  At z = 1e4 the
  relaxation of hydrogen to Saha equilibrium is ~1e18 times faster than the expansion
  (per unit ln(1+z)), so the right-hand side is dominated by rounding noise there: finite-difference
  Jacobians make Radau fail, and scipy's BDF and LSODA fail even with the analytic Jacobian.  The
  Peebles factor C is evaluated at max(1 - x_p, 0), so that a trial state with x_p a rounding
  above 1 cannot flip its sign (physical states are unaffected).
* The helium balance is solved at every evaluation by a safeguarded Newton iteration (bracketed,
  bisection fallback) to full double precision.
* Optical depths: 16-point Gauss-Legendre on every solver step (the dense output is one
  polynomial per step; steps are further split to <= 0.005 in u below a reionisation edge),
  summed into cumulative tables, plus a partial step at the end.  z*, z_drag: brentq on these.
  Visibility peak: bounded Brent maximisation after a 201-point scan of [z*/2, 3z*/2].  Thermal
  decoupling: brentq on the dense T_m/T_r.
* r_s, D_M, ages: scipy quad in a (integrands smooth at a -> 0 with radiation), epsrel 1e-13.
* Massive neutrinos: F(y)/F(0) by Chebyshev interpolation in ln y (pieces of width 1, degree 40)
  whose nodes come from scipy quad; checked against quad at 40 other points to 1e-13 when built;
  below y = 1e-4 the expansion 1 + 5 y^2/(7 pi^2) (error ~ y^4 ln y < 1e-15).
* Accuracy (`python3 decoupling_model.py --convergence`, Planck-like universe reionised at 7.67):
  at rtol 1e-11, x_e and T_m on z = 50..9000 differ from an rtol 1e-13 run by <= 2.2e-12 and
  1.4e-12, tau(z) by 4e-14, z*, z_drag, r_s, theta*, ages by ~1e-15, the visibility peak by 4e-12,
  thermal decoupling by 2e-13; halving and doubling the tolerance change them by the same order.
  At the default rtol 1e-10 the x_e and T_m differences are ~2e-11.  The background (E(z), r_s)
  agrees with the mpmath one of cosmology_vectors.py to ~3e-16 and the Saha fraction with
  mpmath to ~7e-15 (asserted by decoupling_vectors.py).
"""

from __future__ import annotations

import bisect
import math
import time

import numpy as np
import scipy.constants as sc
from numpy.polynomial import chebyshev as cheb
from numpy.polynomial.legendre import leggauss
from scipy.integrate import quad, solve_ivp
from scipy.optimize import brentq, minimize_scalar

# ---------------------------------------------------------------------------------------------
# constants: scipy.constants (CODATA 2022, exact SI values); atom data as printed in mod.rs
# ---------------------------------------------------------------------------------------------
C = sc.c
H_PLANCK = sc.h
K_B = sc.k
EV = sc.e
G = sc.G
M_E = sc.m_e
U_ATOMIC = sc.physical_constants["atomic mass constant"][0]
SIGMA_T = sc.physical_constants["Thomson cross section"][0]
A_RAD = 4.0 * sc.Stefan_Boltzmann / sc.c
MPC = sc.parsec * 1e6
YEAR = sc.Julian_year

M_H = 1.007825031898 * U_ATOMIC
M_HE = 4.002603254130 * U_ATOMIC
CHI_H = 13.598434599702 * EV
CHI_HE1 = 24.587389011 * EV
CHI_HE2 = 54.4177655 * EV
G_HE1 = 4.0
G_HE2 = 1.0
E_ALPHA = 0.75 * CHI_H
B_2 = 0.25 * CHI_H
LAMBDA_ALPHA = H_PLANCK * C / E_ALPHA
TWO_PHOTON = 8.2245809
FUDGE = 1.14
PPB = (4.309, -0.6166, 0.6703, 0.5300)
THERMAL = (2.0 * math.pi * M_E * K_B / H_PLANCK**2) ** 1.5   # times T^(3/2): m^-3
COMPTON = 8.0 * SIGMA_T * A_RAD / (3.0 * M_E * C)             # times T_r^4 x_e/(1+f+x_e): 1/s

F0 = 7.0 * math.pi**4 / 120.0
PER_PHOTON = 7.0 / 8.0 * (4.0 / 11.0) ** (4.0 / 3.0)

REIONIZATION_WIDTH = 0.5
HELIUM_REIONIZATION_REDSHIFT = 3.5
HELIUM_REIONIZATION_WIDTH = 0.5
THERMAL_DECOUPLING_RATIO = 0.99


class DomainError(ValueError):
    """A query outside the model's domain (the reference's analogue of relicore's errors)."""


# ---------------------------------------------------------------------------------------------
# massive neutrinos: phi(y) = F(y)/F(0)
# ---------------------------------------------------------------------------------------------
def fermi_dirac_energy_quad(y: float) -> float:
    """F(y) = int_0^inf x^2 sqrt(x^2+y^2)/(e^x+1) dx by scipy quad (the integrand beyond x = 90 is
    below 1e-30 of F and is dropped)."""

    def f(x: float) -> float:
        return x * x * math.sqrt(x * x + y * y) * math.exp(-x) / (1.0 + math.exp(-x))

    pts = sorted({p for p in (y, 1.0, 5.0, 20.0) if 0.0 < p < 90.0})
    edges = [0.0] + pts + [90.0]
    total = 0.0
    for a, b in zip(edges, edges[1:]):
        v, _ = quad(f, a, b, epsabs=0.0, epsrel=1e-13, limit=200)
        total += v
    return total


class FermiDiracRatio:
    """phi(y) = F(y)/F(0): Chebyshev pieces in ln y of width 1 on [ln 1e-4, ln 1e-4 + 20]."""

    LN_MIN = math.log(1e-4)
    PIECES = 20
    DEGREE = 40

    def __init__(self) -> None:
        t0 = time.perf_counter()
        self.coef = []
        n = self.DEGREE + 1
        k = np.arange(n)
        nodes = np.cos(math.pi * (k + 0.5) / n)
        for p in range(self.PIECES):
            lo = self.LN_MIN + p
            vals = np.array([fermi_dirac_energy_quad(math.exp(lo + 0.5 + 0.5 * t)) / F0 for t in nodes])
            self.coef.append(cheb.chebfit(nodes, vals, self.DEGREE))
        self.y_max = math.exp(self.LN_MIN + self.PIECES)
        # independent check at points that are not nodes
        rng = np.random.default_rng(12345)
        errs = []
        for ly in rng.uniform(self.LN_MIN, self.LN_MIN + self.PIECES, 40):
            y = math.exp(ly)
            want = fermi_dirac_energy_quad(y) / F0
            errs.append(abs(self(y) / want - 1.0))
        self.max_error = max(errs)
        assert self.max_error < 1e-13, self.max_error
        self.build_seconds = time.perf_counter() - t0

    def __call__(self, y: float) -> float:
        if y < 1e-4:
            return 1.0 + 5.0 * y * y / (7.0 * math.pi**2)
        if y > self.y_max:
            raise DomainError(f"neutrino mass parameter y = {y} beyond the table")
        ly = math.log(y) - self.LN_MIN
        p = min(int(ly), self.PIECES - 1)
        t = 2.0 * (ly - p) - 1.0
        c = self.coef[p]
        b1 = b2 = 0.0
        for ck in c[:0:-1]:
            b1, b2 = 2.0 * t * b1 - b2 + ck, b1
        return t * b1 - b2 + c[0]


_FD: FermiDiracRatio | None = None


def fermi_dirac_ratio() -> FermiDiracRatio:
    global _FD
    if _FD is None:
        _FD = FermiDiracRatio()
    return _FD


# ---------------------------------------------------------------------------------------------
# the universe
# ---------------------------------------------------------------------------------------------
class ReferenceUniverse:
    """The homogeneous background, re-implemented from scipy.constants."""

    def __init__(self, h0_km_s_mpc: float, omega_matter: float, omega_baryon: float = 0.0,
                 omega_curvature: float = 0.0, cmb_temperature_k: float = 2.7255, n_eff: float = 3.044,
                 neutrino_masses_ev=(0.0, 0.0, 0.0), w0: float = -1.0, wa: float = 0.0,
                 helium_mass_fraction: float = 0.245) -> None:
        self.params = dict(h0_km_s_mpc=float(h0_km_s_mpc), omega_matter=float(omega_matter),
                           omega_baryon=float(omega_baryon), omega_curvature=float(omega_curvature),
                           cmb_temperature_k=float(cmb_temperature_k), n_eff=float(n_eff),
                           neutrino_masses_ev=tuple(float(m) for m in neutrino_masses_ev), w0=float(w0),
                           wa=float(wa), helium_mass_fraction=float(helium_mass_fraction))
        if not omega_baryon > 0.0:
            raise DomainError("the decoupling model needs omega_baryon > 0")
        if not cmb_temperature_k > 0.0:
            raise DomainError("the decoupling model needs cmb_temperature_k > 0")
        self.h0 = float(h0_km_s_mpc)
        self.t0 = float(cmb_temperature_k)
        self.ok = float(omega_curvature)
        self.om = float(omega_matter)
        self.ob = float(omega_baryon)
        self.w0, self.wa = float(w0), float(wa)
        self.yp = float(helium_mass_fraction)
        self.h0_si = self.h0 * 1000.0 / MPC
        self.rho_crit = 3.0 * self.h0_si**2 / (8.0 * math.pi * G)
        self.omega_photon = A_RAD * self.t0**4 / C**2 / self.rho_crit
        self.per_species = float(n_eff) / 3.0 * PER_PHOTON * self.omega_photon
        t_nu = (4.0 / 11.0) ** (1.0 / 3.0) * self.t0
        self.massive_y = [m * EV / (K_B * t_nu) for m in self.params["neutrino_masses_ev"] if m > 0.0]
        self.fd = fermi_dirac_ratio() if self.massive_y else None
        self.omega_r = self.omega_photon + (3 - len(self.massive_y)) * self.per_species
        self.omega_nu_massive = sum(self.per_species * self.fd(y) for y in self.massive_y)
        self.omega_cb = self.om - self.omega_nu_massive
        self.omega_de = 1.0 - self.om - self.omega_r - self.ok
        self.p_de = 1.0 - 3.0 * (self.w0 + self.wa)        # a^4 f_de(a) = a^p_de exp(-3 wa (1-a))
        self.dh = C / 1000.0 / self.h0                    # Mpc
        # species
        self.n_h0 = (1.0 - self.yp) * self.ob * self.rho_crit / M_H
        self.f_he = self.yp * M_H / ((1.0 - self.yp) * M_HE)
        self.r0 = 3.0 * self.ob / (4.0 * self.omega_photon)   # R = r0 a

    # a^4 E^2(a)
    def p_of_a(self, a: float) -> float:
        nu = 0.0
        for y in self.massive_y:
            nu += self.per_species * self.fd(y * a)
        de = 0.0
        if self.omega_de != 0.0 and a > 0.0:
            de = self.omega_de * a**self.p_de
            if self.wa != 0.0:
                de *= math.exp(-3.0 * self.wa * (1.0 - a))
        return self.omega_cb * a + self.omega_r + nu + self.ok * a * a + de

    def e(self, z: float) -> float:
        a = 1.0 / (1.0 + z)
        return math.sqrt(self.p_of_a(a)) / (a * a)

    def hubble_si(self, z: float) -> float:
        return self.h0_si * self.e(z)

    # quadratures in a (smooth at a -> 0 when there is radiation)
    def _quad(self, f, lo: float, hi: float) -> float:
        v, err = quad(f, lo, hi, epsabs=0.0, epsrel=1e-13, limit=400)
        assert err <= 1e-11 * abs(v), (v, err)
        return v

    def comoving_distance_mpc(self, z: float) -> float:
        a = 1.0 / (1.0 + z)
        return self.dh * self._quad(lambda x: 1.0 / math.sqrt(self.p_of_a(x)), a, 1.0)

    def transverse_comoving_distance_mpc(self, z: float) -> float:
        chi = self.comoving_distance_mpc(z) / self.dh
        if self.ok > 0:
            r = math.sqrt(self.ok)
            return self.dh * math.sinh(r * chi) / r
        if self.ok < 0:
            r = math.sqrt(-self.ok)
            return self.dh * math.sin(r * chi) / r
        return self.dh * chi

    def age_yr(self, z: float) -> float:
        a = 1.0 / (1.0 + z)
        return self._quad(lambda x: x / math.sqrt(self.p_of_a(x)), 0.0, a) / self.h0_si / YEAR

    def sound_horizon_mpc(self, z: float) -> float:
        """r_s(z) = int_z^inf c dz'/(H sqrt(3(1+R))) = D_H int_0^a da/(sqrt(a^4 E^2) sqrt(3(1 + R0 a)))."""
        a = 1.0 / (1.0 + z)
        return self.dh * self._quad(
            lambda x: 1.0 / (math.sqrt(self.p_of_a(x)) * math.sqrt(3.0 * (1.0 + self.r0 * x))), 0.0, a)

    # Saha factors per hydrogen nucleus at temperature T and redshift z
    def saha_factors(self, t: float, z: float) -> tuple[float, float, float]:
        n_h = self.n_h0 * (1.0 + z) ** 3
        pre = THERMAL * t**1.5 / n_h
        kt = K_B * t
        return (pre * math.exp(-CHI_H / kt), G_HE1 * pre * math.exp(-CHI_HE1 / kt),
                G_HE2 * pre * math.exp(-CHI_HE2 / kt))


# ---------------------------------------------------------------------------------------------
# helium in Saha equilibrium for a given free-proton fraction; Saha equilibrium of everything
# ---------------------------------------------------------------------------------------------
def helium_electron_fraction(x_p: float, s1: float, s2: float, f_he: float, derivative: bool = False):
    """x_e solving x_e = x_p + f_He q(x_e), q = y1 + 2 y2 = (r1 + 2 r1 r2)/(1 + r1 + r1 r2),
    r_i = s_i/x_e.  q decreases with x_e, so the root is unique in [x_p, x_p + 2 f_He];
    safeguarded Newton to full precision.  With derivative=True returns (x_e, dx_e/dx_p)."""
    if f_he == 0.0 or f_he * s1 <= 1e-22 * x_p:   # helium's electrons below 1e-22 of x_p
        return (x_p, 1.0) if derivative else x_p
    s12 = s1 * s2

    def g(x):
        d = x * x + s1 * x + s12
        n = s1 * x + 2.0 * s12
        dq = (s1 * d - n * (2.0 * x + s1)) / (d * d)
        return x - x_p - f_he * n / d, 1.0 - f_he * dq

    lo, hi = x_p, x_p + 2.0 * f_he
    x = x_p + f_he          # the middle
    for _ in range(200):
        gv, dg = g(x)
        if gv == 0.0:
            break
        if gv < 0.0:
            lo = x
        else:
            hi = x
        xn = x - gv / dg
        if not (lo < xn < hi):
            xn = 0.5 * (lo + hi)
        done = abs(xn - x) <= 2e-16 * x or hi - lo <= 2e-16 * hi
        x = xn
        if done:
            break
    else:
        raise RuntimeError("helium balance did not converge")
    if derivative:
        return x, 1.0 / g(x)[1]
    return x


def saha_ionized_fraction(universe: ReferenceUniverse, z: float) -> float:
    """Saha equilibrium x_e = n_e/n_H at T_r(z) (hydrogen and both helium stages)."""
    z = float(z)
    if math.isnan(z):
        raise DomainError("z is NaN")
    if z < 0.0:
        raise DomainError("negative redshift")
    sh, s1, s2 = universe.saha_factors(universe.t0 * (1.0 + z), z)
    f = universe.f_he

    def g(x):
        r1, r2 = s1 / x, s2 / x
        he = (r1 + 2.0 * r1 * r2) / (1.0 + r1 + r1 * r2) if r1 > 0.0 else 0.0
        return x - sh / (sh + x) - f * he

    if sh == 0.0:
        return 0.0
    hi = 1.0 + 2.0 * f
    lo = 0.5 * math.sqrt(sh) if sh < 1.0 else 0.25      # hydrogen alone: x ~ sqrt(S_H) when small
    while g(lo) > 0.0:
        lo *= 0.5
    return brentq(g, lo, hi, xtol=1e-300, rtol=8.9e-16, maxiter=1000)


# ---------------------------------------------------------------------------------------------
# the published fits (coefficients from memory)
# ---------------------------------------------------------------------------------------------
def last_scattering_redshift_fit(omega_baryon_h2: float, omega_matter_h2: float) -> float:
    """Hu & Sugiyama 1996, ApJ 471, 542, eq. E1 (coefficients from memory)."""
    wb, wm = omega_baryon_h2, omega_matter_h2
    g1 = 0.0783 * wb**-0.238 / (1.0 + 39.5 * wb**0.763)
    g2 = 0.560 / (1.0 + 21.1 * wb**1.81)
    return 1048.0 * (1.0 + 0.00124 * wb**-0.738) * (1.0 + g1 * wm**g2)


def drag_redshift_fit(omega_baryon_h2: float, omega_matter_h2: float) -> float:
    """Eisenstein & Hu 1998, ApJ 496, 605, eq. 4 (coefficients from memory)."""
    wb, wm = omega_baryon_h2, omega_matter_h2
    b1 = 0.313 * wm**-0.419 * (1.0 + 0.607 * wm**0.674)
    b2 = 0.238 * wm**0.223
    return 1291.0 * wm**0.251 / (1.0 + 0.659 * wm**0.828) * (1.0 + b1 * wb**b2)


# ---------------------------------------------------------------------------------------------
# the thermal history
# ---------------------------------------------------------------------------------------------
def case_b_recombination(t: float) -> float:
    """alpha_B(T) in m^3/s: Pequignot et al. 1991 times the fudge 1.14 (Seager et al. 1999)."""
    a, b, c, d = PPB
    x = t / 1e4
    return FUDGE * 1e-19 * a * x**b / (1.0 + c * x**d)


GL_NODES, GL_WEIGHTS = leggauss(16)


class ReferenceHistory:
    """The thermal history of one universe by scipy.integrate.solve_ivp (Radau).  Keyword names
    of the universe as relicore.Universe; reionization_redshift None = no reionisation."""

    def __init__(self, h0_km_s_mpc: float, omega_matter: float, omega_baryon: float, *,
                 omega_curvature: float = 0.0, cmb_temperature_k: float = 2.7255, n_eff: float = 3.044,
                 neutrino_masses_ev=(0.0, 0.0, 0.0), w0: float = -1.0, wa: float = 0.0,
                 helium_mass_fraction: float = 0.245, reionization_redshift: float | None = None,
                 highest_redshift: float = 1e4, rtol: float = 1e-10, method: str = "Radau",
                 helium_reionization_redshift: float = HELIUM_REIONIZATION_REDSHIFT,
                 helium_reionization_width: float = HELIUM_REIONIZATION_WIDTH) -> None:
        self.helium_z = float(helium_reionization_redshift)
        self.helium_width = float(helium_reionization_width)
        self.universe = u = ReferenceUniverse(
            h0_km_s_mpc, omega_matter, omega_baryon, omega_curvature, cmb_temperature_k, n_eff,
            neutrino_masses_ev, w0, wa, helium_mass_fraction)
        self.z_top = float(highest_redshift)
        self.z_re = None if reionization_redshift is None else float(reionization_redshift)
        self.rtol = rtol
        self.n_rhs = 0
        self.n_jac = 0
        # initial state: Saha equilibrium at the top, T_m = T_r
        u_top = math.log1p(self.z_top)
        x_e0 = saha_ionized_fraction(u, self.z_top)
        sh, _, _ = u.saha_factors(u.t0 * (1.0 + self.z_top), self.z_top)
        x_p0 = sh / (sh + x_e0)
        sol = solve_ivp(self._rhs, (u_top, 0.0), [x_p0, 1.0], method=method, rtol=rtol, atol=1e-30,
                        dense_output=True, jac=self._jac)
        if not sol.success:
            raise RuntimeError(sol.message)
        self.sol = sol.sol
        self.n_steps = len(sol.t) - 1
        # panels: every solver step (the dense output is one polynomial per step), split further
        # to at most 0.005 in u below the reionisation edges (tanh widths ~0.06 in u)
        us = np.array(sol.t[::-1])
        us[0] = 0.0
        if self.z_re is not None:
            u_edge = min(math.log1p(max(self.z_re + 40.0, self.helium_z + 35.0 * self.helium_width)), u_top)
            us = np.union1d(us, np.linspace(0.0, u_edge, int(u_edge / 0.005) + 2))
        self.us = us
        self.tau_nodes, self.drag_nodes, self.reion_nodes = self._cumulative()
        self._summary()

    # ---- right-hand side in u = ln(1+z); state (x_p, theta = T_m/T_r) ----
    def _terms(self, uu, y, jacobian):
        u = self.universe
        x_p, theta = float(y[0]), float(y[1])
        opz = math.exp(uu)
        z = opz - 1.0
        t_r = u.t0 * opz
        t_m = theta * t_r
        n_h = u.n_h0 * opz**3
        hub = u.hubble_si(z)
        kt = K_B * t_r
        pre = THERMAL * t_r**1.5
        s1 = G_HE1 * pre * math.exp(-CHI_HE1 / kt) / n_h
        s2 = G_HE2 * pre * math.exp(-CHI_HE2 / kt) / n_h
        x_e, dxe = helium_electron_fraction(x_p, s1, s2, u.f_he, derivative=True)
        alpha_m = case_b_recombination(t_m)
        alpha_r = case_b_recombination(t_r)
        beta = alpha_r * pre * math.exp(-B_2 / kt)
        beta_boltz = alpha_r * pre * math.exp(-CHI_H / kt)      # beta exp(-E_alpha/kT_r)
        k = LAMBDA_ALPHA**3 / (8.0 * math.pi * hub)
        w = 1.0 - x_p
        ca = k * TWO_PHOTON * n_h
        cb = k * (TWO_PHOTON + beta) * n_h
        # the Peebles factor at the neutral fraction max(w, 0): identical for physical states; a
        # trial state of the stepper with x_p above 1 (by rounding-level overshoot near x_p = 1)
        # must not flip the sign of C
        wc = max(w, 0.0)
        c_peebles = (1.0 + ca * wc) / (1.0 + cb * wc)
        d = alpha_m * n_h * x_e * x_p - beta_boltz * w        # C d = -dx_p/dt
        cc = COMPTON * t_r**4
        gamma = cc * x_e / (1.0 + u.f_he + x_e)
        f = [c_peebles * d / hub, theta - gamma / hub * (1.0 - theta)]
        if not jacobian:
            return f
        dc_dxp = (cb - ca) / (1.0 + cb * wc) ** 2 if w > 0.0 else 0.0
        dd_dxp = alpha_m * n_h * (x_e + x_p * dxe) + beta_boltz
        dalpha_dt = alpha_m / t_m * (PPB[1] - PPB[2] * PPB[3] * (t_m / 1e4) ** PPB[3] / (1.0 + PPB[2] * (t_m / 1e4) ** PPB[3]))
        dgamma_dxp = cc * (1.0 + u.f_he) / (1.0 + u.f_he + x_e) ** 2 * dxe
        return [[(dc_dxp * d + c_peebles * dd_dxp) / hub, c_peebles * dalpha_dt * t_r * n_h * x_e * x_p / hub],
                [-dgamma_dxp / hub * (1.0 - theta), 1.0 + gamma / hub]]

    def _rhs(self, uu, y):
        self.n_rhs += 1
        return self._terms(uu, y, False)

    def _jac(self, uu, y):
        self.n_jac += 1
        return np.array(self._terms(uu, y, True))

    # ---- state at u (arrays) ----
    def _check_z(self, z):
        z = np.asarray(z, dtype=float)
        if np.any(np.isnan(z)):
            raise DomainError("z is NaN")
        if np.any(z < 0.0):
            raise DomainError("negative redshift")
        if np.any(z > self.z_top):
            raise DomainError("redshift above the top of the table")
        return z

    def _xe_of_u(self, uu):
        """x_e (no reionisation) at the points uu (1-d array)."""
        u = self.universe
        uu = np.atleast_1d(np.asarray(uu, dtype=float))
        x_p = self.sol(uu)[0]
        out = np.empty(len(uu))
        for i, (ui, xp) in enumerate(zip(uu.tolist(), x_p.tolist())):
            z = math.expm1(ui)
            _, s1, s2 = u.saha_factors(u.t0 * (1.0 + z), z)
            out[i] = helium_electron_fraction(xp, s1, s2, u.f_he)
        return out

    def _extra_electrons(self, z, x_e):
        """x_e,tot - x_e of the reionisation model (arrays)."""
        if self.z_re is None:
            return np.zeros_like(x_e)
        f = self.universe.f_he
        y = (1.0 + z) ** 1.5
        y_re = (1.0 + self.z_re) ** 1.5
        dy = 1.5 * math.sqrt(1.0 + self.z_re) * REIONIZATION_WIDTH
        hyd = np.maximum(0.0, 1.0 + f - x_e) * 0.5 * (1.0 + np.tanh((y_re - y) / dy))
        hel = f * 0.5 * (1.0 + np.tanh((self.helium_z - z) / self.helium_width))
        return hyd + hel

    def _thomson_per_u(self, uu, x_e):
        """d tau/du = x_e n_H sigma_T c / H (arrays)."""
        u = self.universe
        z = np.expm1(uu)
        hub = np.array([u.hubble_si(zi) for zi in z.tolist()])
        return x_e * u.n_h0 * np.exp(3.0 * uu) * SIGMA_T * C / hub

    def _panel(self, a, b):
        """(tau_rec, tau_drag, tau_reion) increments over u in [a, b] by 16-point Gauss-Legendre;
        tau_reion is the optical depth of the reionisation model's extra electrons."""
        if b == a:
            return 0.0, 0.0, 0.0
        uu = 0.5 * (a + b) + 0.5 * (b - a) * GL_NODES
        x_e = self._xe_of_u(uu)
        per_electron = self._thomson_per_u(uu, np.ones_like(uu))
        dtau = x_e * per_electron
        r = self.universe.r0 * np.exp(-uu)
        w = 0.5 * (b - a) * GL_WEIGHTS
        extra = 0.0
        if self.z_re is not None:
            extra = float(np.dot(w, self._extra_electrons(np.expm1(uu), x_e) * per_electron))
        return float(np.dot(w, dtau)), float(np.dot(w, dtau / r)), extra

    def _cumulative(self):
        rows = [(0.0, 0.0, 0.0)]
        for a, b in zip(self.us[:-1], self.us[1:]):
            inc = self._panel(a, b)
            rows.append(tuple(p + q for p, q in zip(rows[-1], inc)))
        arr = np.array(rows)
        return arr[:, 0], arr[:, 1], arr[:, 2]

    def _depths(self, z: float):
        """(tau_rec, tau_drag, tau_reion) from 0 to z."""
        uu = math.log1p(z)
        i = min(max(bisect.bisect_right(self.us, uu) - 1, 0), len(self.us) - 2)
        t, d, r = self._panel(self.us[i], uu)
        return self.tau_nodes[i] + t, self.drag_nodes[i] + d, self.reion_nodes[i] + r

    def recombination_optical_depth(self, z: float) -> float:
        return self._depths(float(z))[0]

    def drag_optical_depth(self, z: float) -> float:
        return self._depths(float(z))[1]

    def _total_optical_depth(self, z: float) -> float:
        t, _, r = self._depths(float(z))
        return t + r

    # ---- public functions of z (scalars or arrays) ----
    def _map(self, fn, z):
        z = self._check_z(z)
        if z.ndim == 0:
            return float(fn(float(z)))
        return np.array([fn(float(zi)) for zi in z.ravel()]).reshape(z.shape)

    def ionized_fraction(self, z):
        def fn(zz):
            xe = self._xe_of_u(np.array([math.log1p(zz)]))
            return float((xe + self._extra_electrons(np.array([zz]), xe))[0])
        return self._map(fn, z)

    def matter_temperature_k(self, z):
        def fn(zz):
            return float(self.sol(math.log1p(zz))[1]) * self.universe.t0 * (1.0 + zz)
        return self._map(fn, z)

    def temperature_ratio(self, z):
        """T_m/T_r."""
        return self._map(lambda zz: float(self.sol(math.log1p(zz))[1]), z)

    def optical_depth(self, z):
        return self._map(self._total_optical_depth, z)

    def visibility(self, z):
        """g = x_e,tot n_H sigma_T a exp(-tau) * (1 Mpc), per Mpc of conformal time."""
        u = self.universe

        def fn(zz):
            xe = self._xe_of_u(np.array([math.log1p(zz)]))
            xt = float((xe + self._extra_electrons(np.array([zz]), xe))[0])
            tau = self._total_optical_depth(zz)
            return xt * u.n_h0 * (1.0 + zz) ** 3 * SIGMA_T / (1.0 + zz) * math.exp(-tau) * MPC
        return self._map(fn, z)

    def sound_horizon_mpc(self, z):
        return self._map(self.universe.sound_horizon_mpc, z)

    # ---- summary ----
    def _summary(self):
        u = self.universe
        zt = self.z_top
        tau_top, drag_top, reion_top = self._depths(zt)
        if not (tau_top > 1.0 and drag_top > 1.0):
            raise DomainError("no last scattering below the top of the table")
        self.last_scattering_redshift = brentq(lambda z: self.recombination_optical_depth(z) - 1.0, 0.0, zt,
                                               xtol=1e-13, rtol=8.9e-16, maxiter=200)
        self.drag_redshift = brentq(lambda z: self.drag_optical_depth(z) - 1.0, 0.0, zt,
                                    xtol=1e-13, rtol=8.9e-16, maxiter=200)
        zs = self.last_scattering_redshift
        self.sound_horizon_last_scattering_mpc = u.sound_horizon_mpc(zs)
        self.sound_horizon_drag_mpc = u.sound_horizon_mpc(self.drag_redshift)
        self.transverse_distance_last_scattering_mpc = u.transverse_comoving_distance_mpc(zs)
        self.angular_scale_last_scattering = (self.sound_horizon_last_scattering_mpc
                                              / self.transverse_distance_last_scattering_mpc)
        self.age_at_last_scattering_yr = u.age_yr(zs)
        self.temperature_at_last_scattering_k = u.t0 * (1.0 + zs)
        self.visibility_peak_redshift = self._visibility_peak()
        self.thermal_decoupling_redshift = self._thermal_decoupling()
        self.reionization_optical_depth = float(reion_top)

    def _visibility_peak(self) -> float:
        zs = self.last_scattering_redshift
        lo, hi = 0.5 * zs, min(1.5 * zs, self.z_top)
        grid = np.linspace(lo, hi, 201)
        g = self.visibility(grid)
        k = int(np.argmax(g))
        assert 0 < k < len(grid) - 1, "visibility peak at the edge of the search interval"
        res = minimize_scalar(lambda z: -self.visibility(z), bounds=(grid[k - 1], grid[k + 1]),
                              method="bounded", options={"xatol": 1e-9 * zs, "maxiter": 500})
        return float(res.x)

    def _thermal_decoupling(self) -> float:
        # the highest z with T_m/T_r = 0.99: first step point (from the top) below the ratio
        theta = self.sol(self.us)[1]
        below = np.nonzero(theta < THERMAL_DECOUPLING_RATIO)[0]
        k = int(below[-1])            # us ascending: the last index below is the highest z
        assert k + 1 < len(self.us) and np.all(theta[k + 1:] >= THERMAL_DECOUPLING_RATIO)
        uu = brentq(lambda x: float(self.sol(x)[1]) - THERMAL_DECOUPLING_RATIO, self.us[k], self.us[k + 1],
                    xtol=1e-15, rtol=8.9e-16)
        return math.expm1(uu)

    def summary(self) -> dict:
        return {n: float(getattr(self, n)) for n in SUMMARY_NAMES}


SUMMARY_NAMES = ("last_scattering_redshift", "drag_redshift", "sound_horizon_last_scattering_mpc",
                 "sound_horizon_drag_mpc", "angular_scale_last_scattering", "age_at_last_scattering_yr",
                 "temperature_at_last_scattering_k", "visibility_peak_redshift", "thermal_decoupling_redshift",
                 "reionization_optical_depth")


def time_one_history(**params) -> float:
    """Wall time in seconds of one full compute: history, optical depths and every summary
    quantity (the Fermi-Dirac table, built once per process, is built before the clock starts)."""
    if any(m > 0 for m in params.get("neutrino_masses_ev", ())):
        fermi_dirac_ratio()
    t0 = time.perf_counter()
    h = ReferenceHistory(**params)
    h.summary()
    return time.perf_counter() - t0


def convergence_report(params: dict, base_rtol: float = 1e-11, other_rtols=(2e-11, 5e-12, 1e-13),
                       redshifts=None) -> dict:
    """Recompute one history at other tolerances and return, for each, the largest relative
    difference from the base run of x_e and T_m on a grid (z = 50..1600 and 2000..9000), of tau(z)
    at five redshifts and of every summary quantity (exact zeros compared absolutely).  Radau's
    error falls with the tolerance, so the difference from a much tighter run estimates the base
    run's error and the halved/doubled runs show the trend."""
    if redshifts is None:
        redshifts = np.concatenate([np.geomspace(50.0, 1600.0, 60), [2000.0, 3000.0, 5000.0, 8000.0]])

    def grab(rtol):
        t0 = time.perf_counter()
        h = ReferenceHistory(**params, rtol=rtol)
        seconds = time.perf_counter() - t0
        return h, seconds, {"x_e": h.ionized_fraction(redshifts), "T_m": h.matter_temperature_k(redshifts),
                            "tau": np.array([h.optical_depth(z) for z in (200.0, 800.0, 1000.0, 1100.0, 1400.0)]),
                            **{n: getattr(h, n) for n in SUMMARY_NAMES}}

    base, seconds, b = grab(base_rtol)
    out = {"base_rtol": base_rtol, "base_steps": base.n_steps, "base_seconds": seconds}
    for rtol in other_rtols:
        h, sec, o = grab(rtol)
        rep = {}
        for k, v in b.items():
            v, w = np.asarray(v), np.asarray(o[k])
            rep[k] = float(np.max(np.abs(w - v))) if np.all(v == 0) else float(np.max(np.abs(w / v - 1.0)))
        out["rtol %g (%d steps, %.1f s)" % (rtol, h.n_steps, sec)] = rep
    return out


if __name__ == "__main__":
    # python3 decoupling_model.py [--convergence]: one Planck-like history, its summary and time
    import sys

    planck = dict(h0_km_s_mpc=67.36, omega_matter=0.3153, omega_baryon=0.02237 / 0.6736**2, n_eff=3.046,
                  neutrino_masses_ev=(0.06, 0.0, 0.0), cmb_temperature_k=2.7255, helium_mass_fraction=0.245)
    fermi_dirac_ratio()
    t = time.perf_counter()
    h = ReferenceHistory(**planck, reionization_redshift=7.67)
    print("one history (rtol %g) %.2f s, %d steps, %d rhs calls, %d jacobians"
          % (h.rtol, time.perf_counter() - t, h.n_steps, h.n_rhs, h.n_jac))
    for k, v in h.summary().items():
        print("%-36s %.12g" % (k, v))
    if "--convergence" in sys.argv:
        rep = convergence_report(dict(planck, reionization_redshift=7.67))
        print("convergence: base rtol %g, %d steps, %.1f s" % (rep["base_rtol"], rep["base_steps"], rep["base_seconds"]))
        for k, v in rep.items():
            if isinstance(v, dict):
                print("  against %s:" % k)
                for q, e in v.items():
                    print("    %-36s %.1e" % (q, e))
