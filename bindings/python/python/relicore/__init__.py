"""relicore: blackbody radiometry, the cosmological background and decoupling from one validated
Rust core, shared by Rust, C, Fortran and Python.

Modules
-------
relicore.blackbody
    Planck's law in every form, exitances, peaks, band integrals, inversions to temperature,
    response-weighted radiance, two-load radiometer calibration and the microwave-sky
    conversions at the CMB temperature. Functions take scalars, lists or numpy arrays
    (broadcast together) and return a float for scalar inputs, else an ndarray.
relicore.cosmology (its class is also ``relicore.Universe``)
    :class:`Universe`: a validated parameter set (H0, densities, CMB temperature, neutrinos,
    w0-wa dark energy) whose methods take redshifts (scalars or arrays) and give the expansion
    rate, density parameters, distances, volumes, lookback time, age, conformal time and the
    inversions to redshift. Pickles, so dask and multiprocessing workers can use it.
relicore.decoupling (its class is also ``relicore.ThermalHistory``)
    Saha equilibrium, the published fits of the last-scattering and drag redshifts, and
    :class:`ThermalHistory`: the recombination and thermal history of a universe (ionised
    fraction, matter temperature, Thomson optical depth, visibility, sound horizon) with its
    summary (last scattering, drag epoch, sound horizons, angular scale, thermal decoupling,
    reionisation optical depth). Pickles.
relicore.growth
    :class:`LinearGrowth` (the growth factor and rate of a universe) and
    :class:`LinearPowerSpectrum` (Eisenstein & Hu 1998 transfer functions, P(k, z), sigma(R),
    sigma8, S8, f sigma8). The BAO distances are Universe methods, the leapfrog drift and kick
    factors LinearGrowth methods. Pickles.
relicore.constants
    The physical and astronomical constants of the core, each in SI units.

Errors
------
Invalid input raises :class:`RelicoreError`, a subclass of ``ValueError`` whose message names
the function, the argument, its value and, for arrays, the first offending index.

Cautions
--------
Radiation thermometry can hurt someone when it is trusted beyond its emissivity and
calibration (fever screening, furnace and molten-metal work, fire safety). These functions give
blackbody physics to their stated accuracy; they are not a certified measurement chain. Follow
the applicable standards, local codes and licensed practice.
"""

from relicore._native import VERSION as _VERSION
from relicore._native import RelicoreError

from relicore import blackbody, constants, cosmology, decoupling, growth
from relicore.cosmology import Universe
from relicore.decoupling import ThermalHistory

__version__: str = _VERSION
"""Version of the Rust core this package was built from."""

__all__ = [
    "RelicoreError",
    "ThermalHistory",
    "Universe",
    "blackbody",
    "constants",
    "cosmology",
    "decoupling",
    "growth",
    "__version__",
]
