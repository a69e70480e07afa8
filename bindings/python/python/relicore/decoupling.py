"""Decoupling: Saha equilibrium, the recombination and thermal history of a universe
(:class:`ThermalHistory`), the Thomson optical depth and visibility, the last-scattering and
drag epochs, the sound horizon, and the published fits of the last-scattering and drag
redshifts.

Every function and method is the Rust core's of the same name with the same arguments in the
same order (``src/decoupling/``), and its docstring is the core's documentation of it (errors
in the core's terms: ``OutOfDomain(i)``, ``i`` the argument position from 0, the history
excluded, the universe of a function counted); this module only converts, broadcasts and loops (the loops,
and the computation of a history, run in Rust with the GIL released). The model, its
equations and references are in the core's module documentation: hydrogen by the Peebles
three-level atom (case-B coefficient of Pequignot et al. 1991 with the factor 1.14 of Seager,
Sasselov & Scott 1999), helium in Saha equilibrium, the matter temperature coupled to the
radiation by Compton scattering, an optional tanh reionisation. It reproduces full
recombination calculations to about 0.1 % near last scattering; the core solves it to 1e-5
relative (measured against an independent scipy integration of the same equations,
``tests/data/decoupling.txt``).

Units are in the names: redshifts are dimensionless, temperatures in K, distances in Mpc
(comoving), ages in Julian years, the visibility per Mpc of conformal distance, angles in
radians. ``x_e = n_e/n_H`` counts the electrons per hydrogen nucleus, so it exceeds 1 while
helium is ionised (up to 1 + 2 n_He/n_H).

Inputs and results
------------------
Redshifts (and the fits' ω_b = Ω_b h², ω_m = Ω_m h²) are scalars, sequences or numpy arrays of
any shape, converted to float64 and broadcast by numpy's rules. All-scalar calls return a
Python ``float``; anything else a new float64 ``ndarray`` of the (broadcast) shape.

Errors
------
Invalid input raises :class:`relicore.RelicoreError` (a ``ValueError``) naming the function,
the argument, its value and, for arrays, the first offending index, e.g.
``ThermalHistory.optical_depth: z = 20000.0 at index 3: above the highest redshift of the
history (10000.0)``. With ``nan_on_error=True`` failing elements become NaN and every other
element is the exact value it would have had alone. A universe the model cannot describe
(without baryons or without radiation) always raises, with ``argument`` ``"universe"`` and the
parameter named in the message (``status`` -14). Constructing a history with a highest redshift
beyond what its fixed table can cover raises with ``status`` -16 (capacity too small).

Pickling
--------
A history pickles as its universe and options and is recomputed (a few milliseconds) where it is
unpickled; the recomputed history gives bit-identical results.
"""

from __future__ import annotations

from typing import Any

from relicore import _native
from relicore._decoupling import ThermalHistoryFunctions, drag_redshift_fit, last_scattering_redshift_fit
from relicore._decoupling import saha_ionized_fraction

__all__ = [
    "DEFAULT_HELIUM_REIONIZATION_REDSHIFT",
    "DEFAULT_HELIUM_REIONIZATION_WIDTH",
    "DEFAULT_HIGHEST_REDSHIFT",
    "HIGHEST_HELIUM_REIONIZATION_REDSHIFT",
    "HIGHEST_REIONIZATION_REDSHIFT",
    "HISTORY_NODES",
    "LOWEST_HIGHEST_REDSHIFT",
    "SAHA_HIGHEST_REDSHIFT",
    "ThermalHistory",
    "drag_redshift_fit",
    "last_scattering_redshift_fit",
    "saha_ionized_fraction",
]

_CONSTANTS: dict[str, Any] = dict(_native.decoupling_constants())

HISTORY_NODES: int = _CONSTANTS["HISTORY_NODES"]
"""Number of nodes of the table of every history (spacing 0.0045 in ln(1+z) up to z = 1e4)."""
DEFAULT_HIGHEST_REDSHIFT: float = _CONSTANTS["DEFAULT_HIGHEST_REDSHIFT"]
"""Default highest redshift of a history (also the highest its table can cover)."""
LOWEST_HIGHEST_REDSHIFT: float = _CONSTANTS["LOWEST_HIGHEST_REDSHIFT"]
"""Lowest allowed highest redshift of a history (hydrogen still in Saha equilibrium there)."""
HIGHEST_REIONIZATION_REDSHIFT: float = _CONSTANTS["HIGHEST_REIONIZATION_REDSHIFT"]
"""Highest allowed reionisation redshift."""
SAHA_HIGHEST_REDSHIFT: float = _CONSTANTS["SAHA_HIGHEST_REDSHIFT"]
"""Highest redshift of :func:`saha_ionized_fraction`."""
HIGHEST_HELIUM_REIONIZATION_REDSHIFT: float = _CONSTANTS["HIGHEST_HELIUM_REIONIZATION_REDSHIFT"]
"""Highest allowed redshift of helium's second reionisation."""
DEFAULT_HELIUM_REIONIZATION_REDSHIFT: float = _CONSTANTS["DEFAULT_HELIUM_REIONIZATION_REDSHIFT"]
"""Default redshift of helium's second reionisation (Planck Collaboration 2020, A&A 641, A6,
Sect. 3.3; from memory)."""
DEFAULT_HELIUM_REIONIZATION_WIDTH: float = _CONSTANTS["DEFAULT_HELIUM_REIONIZATION_WIDTH"]
"""Default width in z of helium's second reionisation (same source)."""

_D: dict[str, Any] = dict(_native.history_defaults())


def _rebuild(cls: type, universe: Any, reionization_redshift: Any, highest_redshift: float,
             helium_reionization_redshift: float = _D["helium_reionization_redshift"],
             helium_reionization_width: float = _D["helium_reionization_width"]) -> Any:
    """Unpickling: the history recomputed from its universe and options."""
    return cls(universe, reionization_redshift=reionization_redshift, highest_redshift=highest_redshift,
               helium_reionization_redshift=helium_reionization_redshift,
               helium_reionization_width=helium_reionization_width)


class ThermalHistory(ThermalHistoryFunctions, _native.ThermalHistoryBase):
    """The recombination and thermal history of a universe, computed once (a few milliseconds, with
    the GIL released) onto a table of HISTORY_NODES nodes in ln(1+z) from z = 0 to
    ``highest_redshift``, then queried at any redshift of the table.

    Parameters
    ----------
    universe : a :class:`relicore.Universe` with baryons (omega_baryon > 0) and radiation
        (cmb_temperature_k > 0).
    reionization_redshift : redshift z_re of the tanh reionisation (width 0.5 in z), 0 <= z_re
        <= 100; None (the default): no reionisation.
    highest_redshift : where the integration starts in Saha equilibrium; at least 3000 and at
        most 1e4 (the default; what the fixed table can cover).
    helium_reionization_redshift : redshift of helium's second reionisation, the centre of its
        tanh in z, 0 <= z <= 20 (default 3.5, Planck Collaboration 2020, A&A 641, A6, Sect. 3.3;
        from memory); used with reionisation, checked always.
    helium_reionization_width : width of that tanh in z, 0.1 <= width <= 10 (default 0.5, same
        source); used with reionisation, checked always.

    Raises RelicoreError naming the parameter: ``universe`` (status -14, the parameter named in
    the message), ``reionization_redshift`` (NaN or infinite -2, negative -4, above 100 -10),
    ``highest_redshift`` (NaN or infinite -2, below 3000 -10, above what the table can cover
    -16), ``helium_reionization_redshift`` (NaN or infinite -2, negative -4, above 20 -10),
    ``helium_reionization_width`` (NaN or infinite -2, outside [0.1, 10] -10). Frozen; compares and hashes by its universe and options; pickles.

    Methods of a redshift z (scalar or array; 0 <= z <= highest_redshift, except
    ``sound_horizon_mpc``, any z >= 0): ``ionized_fraction``, ``matter_temperature_k``,
    ``optical_depth``, ``visibility``, ``sound_horizon_mpc``. Read-only properties: the
    summary (``last_scattering_redshift``, ``drag_redshift``,
    ``sound_horizon_last_scattering_mpc``, ``sound_horizon_drag_mpc``,
    ``angular_scale_last_scattering``, ``age_at_last_scattering_yr``,
    ``temperature_at_last_scattering_k``, ``visibility_peak_redshift``,
    ``thermal_decoupling_redshift``, ``reionization_optical_depth``) and the inputs
    (``universe``, ``reionization_redshift``, ``highest_redshift``,
    ``helium_reionization_redshift``, ``helium_reionization_width``).
    """

    __slots__ = ()

    def __new__(
        cls,
        universe: Any,
        *,
        reionization_redshift: float | None = _D["reionization_redshift"],
        highest_redshift: float = _D["highest_redshift"],
        helium_reionization_redshift: float = _D["helium_reionization_redshift"],
        helium_reionization_width: float = _D["helium_reionization_width"],
    ) -> ThermalHistory:
        return super().__new__(cls, universe, reionization_redshift, highest_redshift, helium_reionization_redshift,
                               helium_reionization_width)

    def __reduce__(self) -> tuple[Any, tuple[type, Any, float | None, float, float, float]]:
        return (_rebuild, (type(self), self.universe, self.reionization_redshift, self.highest_redshift,
                           self.helium_reionization_redshift, self.helium_reionization_width))

    def __copy__(self) -> ThermalHistory:
        return self

    def __deepcopy__(self, memo: dict[int, Any]) -> ThermalHistory:
        return self

    def __dask_tokenize__(self) -> tuple[str, Any, float | None, float, float, float]:
        """dask's name for this value: equal universe and options, equal token (no pickling)."""
        return ("relicore.ThermalHistory", self.universe.__dask_tokenize__(), self.reionization_redshift,
                self.highest_redshift, self.helium_reionization_redshift, self.helium_reionization_width)


ThermalHistory.__module__ = "relicore.decoupling"
