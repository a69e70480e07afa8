"""The cosmological background: :class:`Universe`, a validated parameter set whose methods give
the expansion rate, density parameters, distances, volumes, times and their inverses.

Every method is the Rust core's method of the same name with the same arguments in the same
order (``src/cosmology/``); this module only converts, broadcasts and loops (the loop runs in
Rust with the GIL released). Units are in the names: Mpc, Gyr (Julian years), km s^-1 Mpc^-1,
kg m^-3, Gpc^3, K. Accuracy, domain and references of each method are documented in the core;
the accuracy quoted below is the core's, measured against mpmath (``tests/data/cosmology.txt``).

Conventions (DESIGN 4a): ``omega_matter`` counts everything non-relativistic today, massive
neutrinos included; the universe is flat unless ``omega_curvature`` is given, and dark energy
is what remains, 1 - omega_matter - omega_radiation - omega_curvature, with equation of state
w(a) = w0 + wa (1 - a); ``cmb_temperature_k = 0`` switches radiation (photons and neutrinos)
off; ``n_eff`` is shared equally by three neutrino species, of masses ``neutrino_masses_ev``.

Inputs and results
------------------
Redshifts (and the targets of the inversions) are scalars, sequences or numpy arrays of any
shape, converted to float64; ``angular_diameter_distance_between_mpc(z1, z2)`` broadcasts its two
arguments by numpy's rules. All-scalar calls return a Python ``float``; anything else a new
float64 ``ndarray`` of the (broadcast) shape.

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
from relicore._elementwise import SCALAR_TYPES, float_arrays, operand

__all__ = ["Universe"]

_M = {name: _native.universe_method(name) for name, _ in _native.universe_method_signatures()}
_ARGS = dict(_native.universe_method_signatures())
_D: dict[str, Any] = dict(_native.universe_defaults())


def _apply(universe: Any, method: Any, args: tuple[Any, ...], nan_on_error: bool) -> Any:
    if all(isinstance(a, SCALAR_TYPES) for a in args):
        return method.call(universe, args, nan_on_error)
    arrays, shape = float_arrays(method.name, _ARGS[method.name], args)
    out = np.empty(shape, dtype=np.float64)
    method.map(universe, [operand(a, shape) for a in arrays], out.reshape(-1), shape, nan_on_error)
    return out


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


class Universe(_native.UniverseBase):
    """A homogeneous universe: validated parameters, derived constants and a precomputed
    distance table (about a millisecond to build; then each method call costs nanoseconds per
    element).

    Parameters (the defaults are the core's, ``UniverseParameters::new``)
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

    Raises RelicoreError naming the offending parameter and its value (status -14), or saying
    the model has no big bang (status -15). Frozen; compares and hashes by its parameters;
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

    # --- expansion -------------------------------------------------------------------------

    def dimensionless_hubble(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """E(z) = H(z)/H0 (Friedmann equation with radiation, massive neutrinos, curvature and
        w0-wa dark energy). z: redshift, >= 0. Accuracy: 1e-14 relative (1e-12 with massive
        neutrinos)."""
        return _apply(self, _M["dimensionless_hubble"], (z,), nan_on_error)

    def hubble_parameter_km_s_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """H(z) = H0 E(z), km s^-1 Mpc^-1. z: redshift, >= 0."""
        return _apply(self, _M["hubble_parameter_km_s_mpc"], (z,), nan_on_error)

    def omega_matter_at(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Matter density parameter at z (cold dark matter, baryons, massive neutrinos).
        z: redshift, >= 0."""
        return _apply(self, _M["omega_matter_at"], (z,), nan_on_error)

    def omega_radiation_at(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Radiation density parameter at z (photons and massless neutrino species).
        z: redshift, >= 0."""
        return _apply(self, _M["omega_radiation_at"], (z,), nan_on_error)

    def omega_dark_energy_at(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Dark-energy density parameter at z. z: redshift, >= 0."""
        return _apply(self, _M["omega_dark_energy_at"], (z,), nan_on_error)

    def omega_curvature_at(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Curvature density parameter at z, omega_curvature (1+z)^2/E^2. z: redshift, >= 0."""
        return _apply(self, _M["omega_curvature_at"], (z,), nan_on_error)

    def critical_density_kg_m3(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Critical density 3 H(z)^2/(8 pi G), kg m^-3. z: redshift, >= 0."""
        return _apply(self, _M["critical_density_kg_m3"], (z,), nan_on_error)

    def cmb_temperature_at_k(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """CMB temperature T0 (1+z), K. z: redshift, >= 0."""
        return _apply(self, _M["cmb_temperature_at_k"], (z,), nan_on_error)

    # --- distances and volumes (Hogg 1999) ------------------------------------------------

    def comoving_distance_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Line-of-sight comoving distance D_C = D_H int_0^z dz'/E, Mpc. z: redshift, >= 0.
        Accuracy: 1e-12 relative for z up to 1e4."""
        return _apply(self, _M["comoving_distance_mpc"], (z,), nan_on_error)

    def transverse_comoving_distance_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Transverse comoving distance D_M (D_C when flat; sinh/sin forms when open/closed),
        Mpc. z: redshift, >= 0."""
        return _apply(self, _M["transverse_comoving_distance_mpc"], (z,), nan_on_error)

    def angular_diameter_distance_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Angular-diameter distance D_A = D_M/(1+z), Mpc. z: redshift, >= 0."""
        return _apply(self, _M["angular_diameter_distance_mpc"], (z,), nan_on_error)

    def angular_diameter_distance_between_mpc(self, z1: Any, z2: Any, *, nan_on_error: bool = False) -> Any:
        """Angular-diameter distance of an object at z2 seen from z1, Mpc. z1, z2: redshifts,
        0 <= z1 <= z2 (broadcast together)."""
        return _apply(self, _M["angular_diameter_distance_between_mpc"], (z1, z2), nan_on_error)

    def luminosity_distance_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Luminosity distance D_L = (1+z) D_M, Mpc. z: redshift, >= 0. Accuracy: 1e-12
        relative."""
        return _apply(self, _M["luminosity_distance_mpc"], (z,), nan_on_error)

    def distance_modulus(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Distance modulus 5 log10(D_L / 10 pc), magnitudes. z: redshift, > 0."""
        return _apply(self, _M["distance_modulus"], (z,), nan_on_error)

    def comoving_volume_gpc3(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Comoving volume inside z over the whole sky, Gpc^3. z: redshift, >= 0."""
        return _apply(self, _M["comoving_volume_gpc3"], (z,), nan_on_error)

    def differential_comoving_volume_mpc3_sr(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Differential comoving volume dV_C/dz/dOmega = D_H D_M^2/E, Mpc^3 sr^-1.
        z: redshift, >= 0."""
        return _apply(self, _M["differential_comoving_volume_mpc3_sr"], (z,), nan_on_error)

    def transverse_scale_kpc_per_arcsec(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Proper transverse size per arcsecond at z, kpc per arcsec. z: redshift, >= 0."""
        return _apply(self, _M["transverse_scale_kpc_per_arcsec"], (z,), nan_on_error)

    # --- times ----------------------------------------------------------------------------

    def lookback_time_gyr(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Lookback time t(0) - t(z), Gyr. z: redshift, >= 0. Accuracy: 1e-12 relative."""
        return _apply(self, _M["lookback_time_gyr"], (z,), nan_on_error)

    def age_gyr(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Age of the universe at z, Gyr (z = 0: the age today). z: redshift, >= 0. Raises
        where the age diverges (a model whose past is infinite)."""
        return _apply(self, _M["age_gyr"], (z,), nan_on_error)

    def conformal_time_mpc(self, z: Any, *, nan_on_error: bool = False) -> Any:
        """Conformal time times c, c eta(z) = D_H int_z^inf dz'/E, Mpc (the comoving horizon).
        z: redshift, >= 0. Raises where it diverges (neither radiation nor matter)."""
        return _apply(self, _M["conformal_time_mpc"], (z,), nan_on_error)

    # --- inversions -----------------------------------------------------------------------

    def redshift_at_age_gyr(self, age_gyr: Any, *, nan_on_error: bool = False) -> Any:
        """Redshift at which the age of the universe is age_gyr. age_gyr: Gyr, > 0 and at most
        the age today. Round trip within 1e-12 relative."""
        return _apply(self, _M["redshift_at_age_gyr"], (age_gyr,), nan_on_error)

    def redshift_at_lookback_time_gyr(self, lookback_gyr: Any, *, nan_on_error: bool = False) -> Any:
        """Redshift at which the lookback time is lookback_gyr. lookback_gyr: Gyr, >= 0 and
        below the age today."""
        return _apply(self, _M["redshift_at_lookback_time_gyr"], (lookback_gyr,), nan_on_error)

    def redshift_at_comoving_distance_mpc(self, distance_mpc: Any, *, nan_on_error: bool = False) -> Any:
        """Redshift at which the line-of-sight comoving distance is distance_mpc. distance_mpc:
        Mpc, >= 0 and within the distance reachable by z = 1e12."""
        return _apply(self, _M["redshift_at_comoving_distance_mpc"], (distance_mpc,), nan_on_error)

    def redshift_at_luminosity_distance_mpc(self, distance_mpc: Any, *, nan_on_error: bool = False) -> Any:
        """Redshift at which the luminosity distance is distance_mpc. distance_mpc: Mpc, >= 0.
        (In a closed model D_L need not be monotone; the root found is returned.)"""
        return _apply(self, _M["redshift_at_luminosity_distance_mpc"], (distance_mpc,), nan_on_error)


Universe.__module__ = "relicore"
