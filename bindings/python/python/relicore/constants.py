"""Physical and astronomical constants of the relicore core, each in SI units.

The values are read from the compiled core (``relicore::constants``), never retyped here, so
every language sees the same bits. Sources: SI 2019 defining constants (exact), CODATA 2022,
values derived from the exact constants with 40-digit arithmetic, and IAU resolutions; each
constant's docstring gives its unit and source. ``roots`` holds the dimensionless roots of the
peak conditions and of the thermal Sunyaev-Zeldovich null.
"""

from typing import Final

from relicore._native import CONSTANTS as _C
from relicore._native import ROOTS as _R

SPEED_OF_LIGHT: Final[float] = _C["SPEED_OF_LIGHT"]
"""Speed of light in vacuum, m s⁻¹ (SI 2019, exact)."""

PLANCK: Final[float] = _C["PLANCK"]
"""Planck constant, J s (SI 2019, exact)."""

BOLTZMANN: Final[float] = _C["BOLTZMANN"]
"""Boltzmann constant, J K⁻¹ (SI 2019, exact)."""

ELEMENTARY_CHARGE: Final[float] = _C["ELEMENTARY_CHARGE"]
"""Elementary charge, C (SI 2019, exact)."""

AVOGADRO: Final[float] = _C["AVOGADRO"]
"""Avogadro constant, mol⁻¹ (SI 2019, exact)."""

REDUCED_PLANCK: Final[float] = _C["REDUCED_PLANCK"]
"""Reduced Planck constant h/2π, J s (derived from the exact h)."""

ELECTRON_MASS: Final[float] = _C["ELECTRON_MASS"]
"""Electron mass, kg (CODATA 2022)."""

PROTON_MASS: Final[float] = _C["PROTON_MASS"]
"""Proton mass, kg (CODATA 2022)."""

THOMSON_CROSS_SECTION: Final[float] = _C["THOMSON_CROSS_SECTION"]
"""Thomson cross-section, m² (CODATA 2022)."""

GRAVITATIONAL_CONSTANT: Final[float] = _C["GRAVITATIONAL_CONSTANT"]
"""Newtonian constant of gravitation, m³ kg⁻¹ s⁻² (CODATA 2022)."""

FINE_STRUCTURE: Final[float] = _C["FINE_STRUCTURE"]
"""Fine-structure constant, dimensionless (CODATA 2022)."""

RYDBERG_ENERGY: Final[float] = _C["RYDBERG_ENERGY"]
"""Rydberg energy R∞hc, J (CODATA 2022)."""

ATOMIC_MASS_UNIT: Final[float] = _C["ATOMIC_MASS_UNIT"]
"""Atomic mass constant u, kg (CODATA 2022)."""

HYDROGEN_ATOM_MASS_U: Final[float] = _C["HYDROGEN_ATOM_MASS_U"]
"""Mass of the hydrogen-1 atom, in u (AME 2020; value from memory)."""

HELIUM_ATOM_MASS_U: Final[float] = _C["HELIUM_ATOM_MASS_U"]
"""Mass of the helium-4 atom, in u (AME 2020; value from memory)."""

HYDROGEN_IONIZATION_EV: Final[float] = _C["HYDROGEN_IONIZATION_EV"]
"""Ionisation energy of hydrogen (1s), eV (NIST Atomic Spectra Database; value from memory)."""

HELIUM_FIRST_IONIZATION_EV: Final[float] = _C["HELIUM_FIRST_IONIZATION_EV"]
"""First ionisation energy of helium (He I → He II), eV (NIST ASD; value from memory)."""

HELIUM_SECOND_IONIZATION_EV: Final[float] = _C["HELIUM_SECOND_IONIZATION_EV"]
"""Second ionisation energy of helium (He II → He III), eV (NIST ASD; value from memory)."""

FIRST_RADIATION: Final[float] = _C["FIRST_RADIATION"]
"""First radiation constant c₁ = 2πhc², W m² (derived from the exact h and c)."""

FIRST_RADIATION_RADIANCE: Final[float] = _C["FIRST_RADIATION_RADIANCE"]
"""First radiation constant for spectral radiance c₁L = 2hc², W m² sr⁻¹ (derived)."""

SECOND_RADIATION: Final[float] = _C["SECOND_RADIATION"]
"""Second radiation constant c₂ = hc/k, m K (derived from the exact h, c and k)."""

SECOND_RADIATION_LO: Final[float] = _C["SECOND_RADIATION_LO"]
"""Low part of c₂: ``SECOND_RADIATION + SECOND_RADIATION_LO`` equals hc/k to about 1e-34 m K."""

PLANCK_OVER_BOLTZMANN: Final[float] = _C["PLANCK_OVER_BOLTZMANN"]
"""h/k, s K (derived)."""

PLANCK_OVER_BOLTZMANN_LO: Final[float] = _C["PLANCK_OVER_BOLTZMANN_LO"]
"""Low part of h/k: ``PLANCK_OVER_BOLTZMANN + PLANCK_OVER_BOLTZMANN_LO`` equals h/k to ~1e-43."""

STEFAN_BOLTZMANN: Final[float] = _C["STEFAN_BOLTZMANN"]
"""Stefan-Boltzmann constant σ = 2π⁵k⁴/(15h³c²), W m⁻² K⁻⁴ (derived)."""

RADIATION_DENSITY: Final[float] = _C["RADIATION_DENSITY"]
"""Radiation density constant a = 4σ/c, J m⁻³ K⁻⁴ (derived)."""

PHOTON_STEFAN_BOLTZMANN: Final[float] = _C["PHOTON_STEFAN_BOLTZMANN"]
"""Photon analogue of σ: photon exitance per T³, 4πζ(3)k³/(h³c²), photons s⁻¹ m⁻² K⁻³ (derived)."""

WIEN_WAVELENGTH: Final[float] = _C["WIEN_WAVELENGTH"]
"""Wien wavelength displacement constant b = c₂/x₅, m K, with x₅ = 5(1 − e^−x₅) (derived)."""

WIEN_FREQUENCY: Final[float] = _C["WIEN_FREQUENCY"]
"""Wien frequency displacement constant x₃k/h, Hz K⁻¹, with x₃ = 3(1 − e^−x₃) (derived)."""

WIEN_WAVENUMBER: Final[float] = _C["WIEN_WAVENUMBER"]
"""Wien wavenumber displacement constant x₃/c₂, m⁻¹ K⁻¹ (derived)."""

WIEN_PHOTON_WAVELENGTH: Final[float] = _C["WIEN_PHOTON_WAVELENGTH"]
"""Photon (N_λ) peak constant c₂/x₄, m K, with x₄ = 4(1 − e^−x₄) (derived)."""

WIEN_PHOTON_FREQUENCY: Final[float] = _C["WIEN_PHOTON_FREQUENCY"]
"""Photon (N_ν) peak constant x₂k/h, Hz K⁻¹, with x₂ = 2(1 − e^−x₂) (derived)."""

WIEN_FREQUENCY_INVERSE: Final[float] = _C["WIEN_FREQUENCY_INVERSE"]
"""h/(x₃k), K Hz⁻¹: temperature per hertz of the B_ν peak (derived)."""

ASTRONOMICAL_UNIT: Final[float] = _C["ASTRONOMICAL_UNIT"]
"""Astronomical unit, m (IAU 2012 Resolution B2, exact)."""

PARSEC: Final[float] = _C["PARSEC"]
"""Parsec, m: au × 648000/π (IAU 2015 Resolution B2)."""

MEGAPARSEC: Final[float] = _C["MEGAPARSEC"]
"""Megaparsec, m."""

JULIAN_YEAR: Final[float] = _C["JULIAN_YEAR"]
"""Julian year, s (365.25 days of 86400 s; IAU)."""

class roots:
    """Dimensionless roots of the peak conditions x = n(1 - e^-x) and of the thermal SZ null."""

    __slots__ = ()

    WAVELENGTH_PEAK: Final[float] = _R["WAVELENGTH_PEAK"]
    """Root of x = 5(1 − e^−x): peak of B_λ."""

    FREQUENCY_PEAK: Final[float] = _R["FREQUENCY_PEAK"]
    """Root of x = 3(1 − e^−x): peak of B_ν (and of the wavenumber form)."""

    PHOTON_WAVELENGTH_PEAK: Final[float] = _R["PHOTON_WAVELENGTH_PEAK"]
    """Root of x = 4(1 − e^−x): peak of N_λ (and of λB_λ)."""

    PHOTON_FREQUENCY_PEAK: Final[float] = _R["PHOTON_FREQUENCY_PEAK"]
    """Root of x = 2(1 − e^−x): peak of N_ν."""

    THERMAL_SZ_NULL: Final[float] = _R["THERMAL_SZ_NULL"]
    """Root of x coth(x/2) = 4: null of the thermal Sunyaev-Zeldovich spectral distortion."""


__all__ = [
    "SPEED_OF_LIGHT",
    "PLANCK",
    "BOLTZMANN",
    "ELEMENTARY_CHARGE",
    "AVOGADRO",
    "REDUCED_PLANCK",
    "ELECTRON_MASS",
    "PROTON_MASS",
    "THOMSON_CROSS_SECTION",
    "GRAVITATIONAL_CONSTANT",
    "FINE_STRUCTURE",
    "RYDBERG_ENERGY",
    "ATOMIC_MASS_UNIT",
    "HYDROGEN_ATOM_MASS_U",
    "HELIUM_ATOM_MASS_U",
    "HYDROGEN_IONIZATION_EV",
    "HELIUM_FIRST_IONIZATION_EV",
    "HELIUM_SECOND_IONIZATION_EV",
    "FIRST_RADIATION",
    "FIRST_RADIATION_RADIANCE",
    "SECOND_RADIATION",
    "SECOND_RADIATION_LO",
    "PLANCK_OVER_BOLTZMANN",
    "PLANCK_OVER_BOLTZMANN_LO",
    "STEFAN_BOLTZMANN",
    "RADIATION_DENSITY",
    "PHOTON_STEFAN_BOLTZMANN",
    "WIEN_WAVELENGTH",
    "WIEN_FREQUENCY",
    "WIEN_WAVENUMBER",
    "WIEN_PHOTON_WAVELENGTH",
    "WIEN_PHOTON_FREQUENCY",
    "WIEN_FREQUENCY_INVERSE",
    "ASTRONOMICAL_UNIT",
    "PARSEC",
    "MEGAPARSEC",
    "JULIAN_YEAR",
    "roots",
]
