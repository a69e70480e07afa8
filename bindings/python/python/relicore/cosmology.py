"""The cosmological background: :class:`Universe`, a validated parameter set whose methods give
the expansion rate, density parameters, distances, volumes, times and their inverses.

Every method is the Rust core's method of the same name with the same arguments in the same
order (``src/cosmology/``); this module only converts, broadcasts and loops (in one native
call; the loop runs in Rust, with the GIL released unless it is short: under 4096 elements for
the methods with a SIMD array form, under 64 for the others). Units are in the names: Mpc, Gyr (Julian years), km s^-1 Mpc^-1,
kg m^-3, Gpc^3, K. Each method's docstring is the core's documentation of it: purpose,
arguments, result, errors in the core's terms (``Negative(i)``, ``i`` the argument position
from 0, the universe excluded), accuracy (measured against mpmath, ``tests/data/cosmology.txt``)
and reference.

Conventions: ``omega_matter`` counts everything non-relativistic today, massive
neutrinos included; the universe is flat unless ``omega_curvature`` is given, and dark energy
is what remains, 1 - omega_matter - omega_radiation - omega_curvature, with equation of state
w(a) = w0 + wa (1 - a); ``cmb_temperature_k = 0`` switches radiation (photons and neutrinos)
off; ``n_eff`` is shared equally by three neutrino species, of masses ``neutrino_masses_ev``.

Inputs and results
------------------
Redshifts (and the targets of the inversions) are scalars, sequences or numpy arrays of any
shape, converted to float64 (float32 input too: the background has no single-precision form in
Python, so it is computed and returned in float64); ``angular_diameter_distance_between_mpc(z1,
z2)`` broadcasts its two arguments by numpy's rules. All-scalar calls return a Python ``float``;
anything else a new float64 ``ndarray`` of the (broadcast) shape.

Errors
------
Invalid parameters raise :class:`relicore.RelicoreError` (a ``ValueError``) naming the parameter
and its value (``status`` -14), and a model without a big bang raises it saying so (``status``
-15). Invalid arguments of a method raise it naming the method, the argument, its value and, for
arrays, the first offending index, e.g. ``Universe.luminosity_distance_mpc: z = -1.0 at index 3:
must not be negative``. With ``nan_on_error=True`` failing elements become NaN and every other
element is the exact value it would have had alone.

Pickling
--------
A universe pickles as its parameters and is rebuilt (about a millisecond) where it is
unpickled, so dask, multiprocessing and concurrent.futures workers can use it and its bound
methods; the rebuilt universe gives bit-identical results.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from relicore import _native
from relicore._cosmology import UniverseFunctions

__all__ = ["Universe"]

_D: dict[str, Any] = dict(_native.universe_defaults())


def _masses(value: Any) -> Any:
    """The neutrino masses as a list of floats for the native constructor, which insists on
    three (a scalar becomes a one-element list, so the error says how many were given)."""
    a = np.asarray(value, dtype=np.float64)
    if a.ndim == 0:
        return [float(a)]
    if a.ndim == 1:
        return a.tolist()
    return value


def _rebuild(cls: type, parameters: dict[str, Any]) -> Any:
    """Unpickling: the universe rebuilt from its parameters."""
    return cls(**parameters)


class Universe(UniverseFunctions, _native.UniverseBase):
    """A homogeneous universe: validated parameters, derived constants and a precomputed
    distance table (about a millisecond to build; then each method call costs nanoseconds per
    element).

    Parameters (the defaults, shown in the signature, are the same in every language)
    ----------
    h0_km_s_mpc : Hubble constant H0, km s^-1 Mpc^-1, > 0.
    omega_matter : density parameter of everything non-relativistic today (cold dark matter,
        baryons and massive neutrinos), >= 0.
    omega_baryon : baryon density parameter, 0 <= omega_baryon <= omega_matter (the background
        does not use it).
    omega_curvature : curvature density parameter (0: flat; > 0 open; < 0 closed).
    cmb_temperature_k : CMB temperature today, K, >= 0 (0 switches radiation off).
    n_eff : effective number of neutrino species, >= 0.
    neutrino_masses_ev : the three neutrino masses, eV, each >= 0 (a sequence of three).
    w0, wa : dark-energy equation of state w(a) = w0 + wa (1 - a).
    helium_mass_fraction : primordial helium mass fraction, 0 <= Y_p < 1 (used by decoupling).

    Raises RelicoreError naming the offending parameter and its value (status -14): a value out
    of its range above, or one that makes E(z) overflow somewhere on the way back to a = 1e-30
    (w0 when the dark-energy density overflows, an equation of state far from physical ones:
    w0, or the early-time w0 + wa, above about 3.8; omega_matter when E(z)^2 overflows
    otherwise; h0_km_s_mpc so far from physical values that c/H0, 1/H0 or the critical density
    is not a finite positive number; cmb_temperature_k or n_eff when the radiation density
    overflows), or saying the model has no big bang (status -15). Frozen; compares and hashes by its parameters;
    pickles. Read-only properties give every parameter, ``parameters`` (a dict of them) and
    the constants ``hubble_distance_mpc``, ``hubble_time_gyr``, ``omega_radiation``,
    ``omega_dark_energy`` and ``matter_radiation_equality_redshift``.
    """

    __slots__ = ()

    def __new__(
        cls,
        h0_km_s_mpc: float,
        omega_matter: float,
        *,
        omega_baryon: float = _D["omega_baryon"],
        omega_curvature: float = _D["omega_curvature"],
        cmb_temperature_k: float = _D["cmb_temperature_k"],
        n_eff: float = _D["n_eff"],
        neutrino_masses_ev: Any = _D["neutrino_masses_ev"],
        w0: float = _D["w0"],
        wa: float = _D["wa"],
        helium_mass_fraction: float = _D["helium_mass_fraction"],
    ) -> Universe:
        return super().__new__(
            cls,
            h0_km_s_mpc,
            omega_matter,
            omega_baryon,
            omega_curvature,
            cmb_temperature_k,
            n_eff,
            _masses(neutrino_masses_ev),
            w0,
            wa,
            helium_mass_fraction,
        )

    def __reduce__(self) -> tuple[Any, tuple[type, dict[str, Any]]]:
        return (_rebuild, (type(self), self.parameters))

    def __copy__(self) -> Universe:
        return self

    def __dask_tokenize__(self) -> tuple[str, tuple[tuple[str, Any], ...]]:
        """dask's name for this value: equal parameters, equal token (no pickling needed)."""
        return ("relicore.Universe", tuple(self.parameters.items()))

    def __deepcopy__(self, memo: dict[int, Any]) -> Universe:
        return self


Universe.__module__ = "relicore"
