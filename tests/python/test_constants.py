"""relicore.constants against scipy.constants (scipy 1.17 carries CODATA 2022, the same
adjustment as the core) and against the defining formulas evaluated with mpmath from scipy's
exact SI 2019 h, c and k.

* Exact and tabulated values (SI 2019 defining constants, CODATA 2022 measured values, IAU
  definitions) are the same decimal number in both, so the doubles must be equal.
* Derived values (hbar, the radiation constants, Stefan-Boltzmann, Wien, the parsec) are
  computed by scipy in double arithmetic, so they agree to within 1e-15 relative; the core's
  values are rounded once from 40 digits, so they must also equal the correctly rounded mpmath
  value of the defining formula.
"""

from __future__ import annotations

import math

import mpmath
import pytest
import scipy.constants as sc

from relicore import constants as rc

PC = sc.physical_constants

# source: scipy.constants (CODATA 2022; SI 2019 exact; IAU) — equal as doubles
EQUAL = [
    ("SPEED_OF_LIGHT", sc.c),
    ("PLANCK", sc.h),
    ("BOLTZMANN", sc.k),
    ("ELEMENTARY_CHARGE", sc.e),
    ("AVOGADRO", sc.N_A),
    ("ELECTRON_MASS", sc.m_e),
    ("PROTON_MASS", sc.m_p),
    ("THOMSON_CROSS_SECTION", PC["Thomson cross section"][0]),
    ("GRAVITATIONAL_CONSTANT", sc.G),
    ("FINE_STRUCTURE", sc.alpha),
    ("RYDBERG_ENERGY", PC["Rydberg constant times hc in J"][0]),
    ("ATOMIC_MASS_UNIT", PC["atomic mass constant"][0]),
    ("ASTRONOMICAL_UNIT", sc.astronomical_unit),
    ("JULIAN_YEAR", sc.Julian_year),
]

# source: scipy.constants, derived by scipy in double arithmetic — within 1e-15 relative
DERIVED = [
    ("REDUCED_PLANCK", sc.hbar),
    ("STEFAN_BOLTZMANN", sc.sigma),
    ("FIRST_RADIATION", PC["first radiation constant"][0]),
    ("FIRST_RADIATION_RADIANCE", PC["first radiation constant for spectral radiance"][0]),
    ("SECOND_RADIATION", PC["second radiation constant"][0]),
    ("WIEN_WAVELENGTH", PC["Wien wavelength displacement law constant"][0]),
    ("WIEN_FREQUENCY", PC["Wien frequency displacement law constant"][0]),
    ("PARSEC", sc.parsec),
]


def test_scipy_is_codata_2022():
    # the comparisons below assume scipy's CODATA 2022 table (scipy >= 1.15)
    assert PC["electron mass"][0] == 9.1093837139e-31  # CODATA 2022 value, not 2018's 9.1093837015e-31


@pytest.mark.parametrize("name, want", EQUAL, ids=[n for n, _ in EQUAL])
def test_tabulated_constants_equal_scipy(name, want):
    assert getattr(rc, name) == want, f"{name}: ours {getattr(rc, name)!r}, scipy {want!r}"


@pytest.mark.parametrize("name, want", DERIVED, ids=[n for n, _ in DERIVED])
def test_derived_constants_agree_with_scipy(name, want):
    got = getattr(rc, name)
    assert abs(got - want) <= 1e-15 * abs(want), f"{name}: ours {got!r}, scipy {want!r}"


def _root(n: int) -> mpmath.mpf:
    """Root of x = n (1 - e^-x) near n (the peak conditions of the Planck forms)."""
    return mpmath.findroot(lambda x: x - n * (1 - mpmath.exp(-x)), n)


def _formulas() -> dict[str, mpmath.mpf]:
    """The defining formula of each derived constant from scipy's exact h, c, k (mpmath)."""
    # the exact decimal values (repr gives back the decimal scipy parsed), not their doubles
    h, c, k = (mpmath.mpf(repr(v)) for v in (sc.h, sc.c, sc.k))
    x5, x4, x3, x2 = _root(5), _root(4), _root(3), _root(2)
    x_sz = mpmath.findroot(lambda x: x * mpmath.coth(x / 2) - 4, 3.8)
    c2 = h * c / k
    sigma = 2 * mpmath.pi**5 * k**4 / (15 * h**3 * c**2)
    return {
        "REDUCED_PLANCK": h / (2 * mpmath.pi),
        "FIRST_RADIATION": 2 * mpmath.pi * h * c**2,
        "FIRST_RADIATION_RADIANCE": 2 * h * c**2,
        "SECOND_RADIATION": c2,
        "PLANCK_OVER_BOLTZMANN": h / k,
        "STEFAN_BOLTZMANN": sigma,
        "RADIATION_DENSITY": 4 * sigma / c,
        "PHOTON_STEFAN_BOLTZMANN": 4 * mpmath.pi * mpmath.zeta(3) * k**3 / (h**3 * c**2),
        "WIEN_WAVELENGTH": c2 / x5,
        "WIEN_FREQUENCY": x3 * k / h,
        "WIEN_WAVENUMBER": x3 / c2,
        "WIEN_PHOTON_WAVELENGTH": c2 / x4,
        "WIEN_PHOTON_FREQUENCY": x2 * k / h,
        "WIEN_FREQUENCY_INVERSE": h / (x3 * k),
        "PARSEC": mpmath.mpf(repr(sc.astronomical_unit)) * 648000 / mpmath.pi,
        "MEGAPARSEC": mpmath.mpf(repr(sc.astronomical_unit)) * 648000 / mpmath.pi * 10**6,
        "roots.WAVELENGTH_PEAK": x5,
        "roots.FREQUENCY_PEAK": x3,
        "roots.PHOTON_WAVELENGTH_PEAK": x4,
        "roots.PHOTON_FREQUENCY_PEAK": x2,
        "roots.THERMAL_SZ_NULL": x_sz,
    }


def _ours(name: str) -> float:
    obj = rc
    for part in name.split("."):
        obj = getattr(obj, part)
    return float(obj)


with mpmath.workdps(40):
    FORMULAS = _formulas()


@pytest.mark.parametrize("name", sorted(FORMULAS))
def test_derived_constants_are_the_correctly_rounded_formula(name):
    # source: the defining formula at 40 digits (mpmath) from scipy's exact h, c, k and au;
    # the core documents each derived value as rounded to nearest from such an evaluation
    with mpmath.workdps(40):
        want = FORMULAS[name]
        got = _ours(name)
        # |got - want| <= half an ulp of got (round to nearest)
        half_ulp = mpmath.mpf(math.ulp(got)) / 2
        assert abs(mpmath.mpf(got) - want) <= half_ulp, f"{name}: ours {got!r}, formula {mpmath.nstr(want, 20)}"


@pytest.mark.parametrize(
    "hi, lo, formula",
    [
        ("SECOND_RADIATION", "SECOND_RADIATION_LO", "SECOND_RADIATION"),
        ("PLANCK_OVER_BOLTZMANN", "PLANCK_OVER_BOLTZMANN_LO", "PLANCK_OVER_BOLTZMANN"),
    ],
)
def test_double_length_constants(hi, lo, formula):
    # source: mpmath from scipy's exact h, c, k; the pair must carry about 2 x 53 bits
    with mpmath.workdps(40):
        total = mpmath.mpf(getattr(rc, hi)) + mpmath.mpf(getattr(rc, lo))
        want = FORMULAS[formula]
        assert abs(total - want) <= abs(want) * mpmath.mpf(2) ** -104
        assert abs(getattr(rc, lo)) <= math.ulp(getattr(rc, hi)) / 2
