"""Band and response-weighted radiance against scipy.integrate.quad of a Planck integrand
written here from scipy.constants (an independent second implementation: adaptive
Gauss-Kronrod in double precision, none of the core's series or its quadrature).

Tolerance: 1e-10 relative or quad's own error estimate, whichever is larger (quad in double
precision reaches about 1e-12 on these smooth integrands; 1e-10 leaves room for its estimate
being optimistic without hiding a real error of the core, which is documented at 1e-13 or
better).
"""

from __future__ import annotations

import math

import numpy as np
import pytest
import scipy.constants as sc
from scipy.integrate import quad

from relicore import blackbody as bb

H, C, K = sc.h, sc.c, sc.k
REL = 1e-10


def planck_wavelength(lam: float, t: float) -> float:
    """B_lambda in W m^-2 sr^-1 m^-1, written with e^-x/(1 - e^-x) so nothing overflows."""
    if lam <= 0.0:
        return 0.0
    x = H * C / (lam * K * t)
    return 2.0 * H * C * C / lam**5 * math.exp(-x) / -math.expm1(-x)


def planck_frequency(nu: float, t: float) -> float:
    """B_nu in W m^-2 sr^-1 Hz^-1."""
    if nu <= 0.0:
        return 0.0
    x = H * nu / (K * t)
    return 2.0 * H * nu**3 / (C * C) * math.exp(-x) / -math.expm1(-x)


def integrate(f, a: float, b: float, peak: float | None = None) -> tuple[float, float]:
    """quad over [a, b], split at the peak (where the integrand is largest) when inside."""
    points = [peak] if peak is not None and a < peak < b else None
    value, err = quad(f, a, b, points=points, epsabs=0.0, epsrel=1e-13, limit=500)
    return value, err


def check(got: float, want: float, err: float, what: str) -> None:
    allowed = max(REL * abs(want), err)
    assert abs(got - want) <= allowed, (
        f"{what}: relicore {got:.17e}, quad {want:.17e} (|diff| {abs(got - want):.3e}, allowed {allowed:.3e})"
    )


WAVELENGTH_BANDS = [
    # (lower m, upper m, T K): thermal-infrared window, MWIR, visible, near-IR pyrometry,
    # a wide band across the peak, millimetre band of the CMB, a narrow line-like band
    (8e-6, 14e-6, 300.0),
    (3e-6, 5e-6, 300.0),
    (0.4e-6, 0.7e-6, 5772.0),
    (0.9e-6, 1.1e-6, 1500.0),
    (0.2e-6, 50e-6, 3000.0),
    (1e-3, 1e-2, 2.72548),
    (10.0e-6, 10.01e-6, 300.0),
    (2e-6, 2.5e-6, 77.0),
]


@pytest.mark.parametrize("lower, upper, t", WAVELENGTH_BANDS)
def test_band_radiance_wavelength(lower, upper, t):
    peak = sc.physical_constants["Wien wavelength displacement law constant"][0] / t
    want, err = integrate(lambda lam: planck_wavelength(lam, t), lower, upper, peak)
    check(bb.band_radiance_wavelength(lower, upper, t), want, err, f"band_radiance_wavelength({lower}, {upper}, {t})")


@pytest.mark.parametrize("lower, upper, t", WAVELENGTH_BANDS)
def test_band_photon_radiance_wavelength(lower, upper, t):
    # N_lambda = B_lambda / (h c / lambda)
    peak = sc.physical_constants["Wien wavelength displacement law constant"][0] / t
    want, err = integrate(lambda lam: planck_wavelength(lam, t) * lam / (H * C), lower, upper, peak)
    got = bb.band_photon_radiance_wavelength(lower, upper, t)
    check(got, want, err, f"band_photon_radiance_wavelength({lower}, {upper}, {t})")


@pytest.mark.parametrize("lower, t", [(8e-6, 300.0), (0.5e-6, 5772.0), (1e-3, 2.72548)])
def test_band_radiance_wavelength_to_infinity(lower, t):
    # the band [lower, inf) in wavelength is the band [0, c/lower] in frequency
    nu_top = C / lower
    peak = sc.physical_constants["Wien frequency displacement law constant"][0] * t
    want, err = integrate(lambda nu: planck_frequency(nu, t), 0.0, nu_top, peak)
    check(bb.band_radiance_wavelength(lower, math.inf, t), want, err, f"band_radiance_wavelength({lower}, inf, {t})")


def test_band_fraction_of_the_whole_spectrum_is_one():
    # sigma T^4 / pi is the whole band (Stefan-Boltzmann, scipy.constants.sigma)
    for t in (2.72548, 300.0, 6000.0):
        assert bb.band_fraction_wavelength(0.0, math.inf, t) == pytest.approx(1.0, abs=1e-15)
        total = sc.sigma * t**4 / math.pi
        assert bb.band_radiance_wavelength(0.0, math.inf, t) == pytest.approx(total, rel=1e-15)


FREQUENCY_BANDS = [
    (1e9, 1e12, 2.72548),
    (100e9, 200e9, 2.72548),
    (1e12, 1e14, 300.0),
    (0.0, 1e13, 300.0),
    (5e14, 7e14, 5772.0),
    (30e9, 31e9, 300.0),
]


@pytest.mark.parametrize("lower, upper, t", FREQUENCY_BANDS)
def test_band_radiance_frequency(lower, upper, t):
    peak = sc.physical_constants["Wien frequency displacement law constant"][0] * t
    want, err = integrate(lambda nu: planck_frequency(nu, t), lower, upper, peak)
    check(bb.band_radiance_frequency(lower, upper, t), want, err, f"band_radiance_frequency({lower}, {upper}, {t})")


def test_band_radiance_frequency_and_wavelength_describe_the_same_band():
    # the same band in the two spectral variables (a change of variable, exact)
    lo, hi, t = 8e-6, 14e-6, 300.0
    a = bb.band_radiance_wavelength(lo, hi, t)
    b = bb.band_radiance_frequency(C / hi, C / lo, t)
    assert a == pytest.approx(b, rel=1e-13)


# --- response-weighted radiance --------------------------------------------------------------

# Invented response tables (test-only shapes, not any real instrument): a trapezoid for an
# 8-14 um thermometer, a bumpy 3-5 um band, a 2-point ramp, and one with zero segments.
TABLES = {
    "trapezoid 8-14 um": ([7.5e-6, 8e-6, 14e-6, 14.5e-6], [0.0, 1.0, 1.0, 0.0]),
    "bumpy 3-5 um": (
        list(np.linspace(3e-6, 5e-6, 9)),
        [0.0, 0.3, 0.9, 0.7, 1.0, 0.8, 0.95, 0.4, 0.0],
    ),
    "ramp 1-1.6 um": ([1.0e-6, 1.6e-6], [0.2, 1.0]),
    "two bands with a gap": ([2e-6, 2.2e-6, 2.4e-6, 4e-6, 4.2e-6, 4.4e-6], [0.0, 1.0, 0.0, 0.0, 0.5, 0.0]),
}


def quad_response(wl, resp, t):
    total, err_total = 0.0, 0.0
    for a, b, ra, rb in zip(wl[:-1], wl[1:], resp[:-1], resp[1:]):
        if ra == 0.0 and rb == 0.0:
            continue

        def f(lam, a=a, b=b, ra=ra, rb=rb):
            return (ra + (rb - ra) * (lam - a) / (b - a)) * planck_wavelength(lam, t)

        v, e = integrate(f, a, b)
        total += v
        err_total += e
    return total, err_total


@pytest.mark.parametrize("table", sorted(TABLES))
@pytest.mark.parametrize("t", [77.0, 300.0, 1000.0, 3000.0])
def test_response_weighted_radiance(table, t):
    wl, resp = TABLES[table]
    want, err = quad_response(wl, resp, t)
    got = bb.response_weighted_radiance(wl, resp, t)
    check(got, want, err, f"response_weighted_radiance({table}, {t})")


@pytest.mark.parametrize("table", sorted(TABLES))
def test_temperature_from_response_weighted_radiance_inverts_the_quad_value(table):
    # source: the quad radiance at a known T; the inverse must give T back (condition ~ 1/4..1
    # in T per unit relative radiance near these temperatures, so 1e-10 in L is < 1e-10 in T)
    wl, resp = TABLES[table]
    for t in (250.0, 800.0):
        radiance, _ = quad_response(wl, resp, t)
        got = bb.temperature_from_response_weighted_radiance(wl, resp, radiance)
        assert got == pytest.approx(t, rel=REL), f"{table}: T {t} -> L {radiance!r} -> {got!r}"
