"""Structure growth: the linear growth factor and growth rate of a universe
(:class:`LinearGrowth`), the Eisenstein & Hu 1998 transfer functions, the linear matter power
spectrum with σ(R), σ8, S8 and fσ8 (:class:`LinearPowerSpectrum`). The BAO distances
(``hubble_distance_at_mpc``, ``volume_averaged_distance_mpc`` and the three ratios to a
drag-epoch sound horizon) are methods of :class:`relicore.Universe`; the leapfrog drift and
kick factors are methods of :class:`LinearGrowth` (from tables of their integrands computed with
the growth).

Every function and method is the Rust core's of the same name with the same arguments in the
same order (``src/growth/``), and its docstring is the core's documentation of it; this module
only converts, broadcasts and loops (the loops, and the computation of a growth or a spectrum,
run in Rust with the GIL released). The meanings, fixed for every language, are in the core's
module documentation: Ω_cb = Ω_m − Ω_ν,massive; D″ + (2 + d ln E/dN) D′ = (3/2) Ω_cb a⁻³ E⁻² D
in N = ln a with the Mészáros growing mode D_u → a + (2/3) a_eq; D = D_u(a)/D_u(1);
f = d ln D/d ln a; P(k, z) = (2π²/k³) A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p))
[(2/5)(ck/H0)² T(k) D_u(a)/Ω_m]² with k_p = 0.05 Mpc⁻¹; σ² = ∫ k² P W(kR)² dk/2π² with the
top-hat window; σ8 = σ(8 h⁻¹ Mpc, 0); S8 = σ8 (Ω_m/0.3)^½; fσ8(z) = f(z) σ(8 h⁻¹ Mpc, z).

Units are in the names and carry no hidden h: k in Mpc⁻¹, R in Mpc, P in Mpc³.

Accuracy (measured against ``tests/data/growth.txt``): D, f, D_u within 1e-10 relative of an
independent scipy ``solve_ivp`` integration and of the Heath (1977) closed form; T(k) within
1e-13 of an mpmath evaluation of the formulae; σ(R) within 1e-9 of an mpmath quadrature of the
same P(k). The Eisenstein & Hu fitting formulae themselves reproduce full Boltzmann
calculations only to a few per cent.

Inputs and results
------------------
Redshifts, wavenumbers and radii are scalars, sequences or numpy arrays of any shape,
converted to float64 and broadcast by numpy's rules. All-scalar calls return a Python
``float``; anything else a new float64 ``ndarray`` of the (broadcast) shape.

Errors
------
Invalid input raises :class:`relicore.RelicoreError` (a ``ValueError``) naming the function,
the argument, its value and, for arrays, the first offending index (k or R ≤ 0: status -3; a
negative z: -4; NaN or infinite: -2). With ``nan_on_error=True`` failing elements become NaN.
The constructors name their parameter: ``scalar_amplitude`` or ``sigma8`` ≤ 0 (-3), a
non-finite ``spectral_index`` or ``running`` (-2), ``transfer_form='baryon_oscillations'`` in a
universe without baryons (-14; the message suggests ``'no_wiggle'``), a universe without
radiation (``universe``, -14: the transfer function needs T0).

Pickling
--------
A growth pickles as its universe, a spectrum as its growth and inputs; both are recomputed
where they are unpickled (about 10 ms and under a millisecond), with bit-identical results.
"""

from __future__ import annotations

from typing import Any

from relicore import _native
from relicore._growth import LinearGrowthFunctions, LinearPowerSpectrumFunctions
from relicore._growth import eisenstein_hu_no_wiggle_transfer_function, eisenstein_hu_transfer_function

__all__ = [
    "PIVOT_WAVENUMBER_PER_MPC",
    "TRANSFER_FORMS",
    "LinearGrowth",
    "LinearPowerSpectrum",
    "eisenstein_hu_no_wiggle_transfer_function",
    "eisenstein_hu_transfer_function",
]

_CONSTANTS: dict[str, Any] = dict(_native.growth_constants())

PIVOT_WAVENUMBER_PER_MPC: float = _CONSTANTS["PIVOT_WAVENUMBER_PER_MPC"]
"""The pivot scale k_p of the primordial spectrum, 0.05 Mpc⁻¹."""
TRANSFER_FORMS: tuple[str, ...] = tuple(_CONSTANTS["TRANSFER_FORMS"])
"""The transfer forms a spectrum takes: ``'baryon_oscillations'`` and ``'no_wiggle'``."""


def _rebuild_growth(cls: type, universe: Any) -> Any:
    """Unpickling: the growth recomputed from its universe."""
    return cls(universe)


def _rebuild_spectrum(cls: type, growth: Any, transfer_form: str, normalisation: tuple[str, float],
                      spectral_index: float, running: float) -> Any:
    """Unpickling: the spectrum recomputed from its growth and inputs."""
    name, value = normalisation
    return cls(growth, transfer_form=transfer_form, spectral_index=spectral_index, running=running,
               **{name: value})


class LinearGrowth(LinearGrowthFunctions, _native.LinearGrowthBase):
    """The linear growth of a universe, computed once (about 10 ms, with the GIL released) onto a
    table in the scale factor, then queried at any redshift in nanoseconds.

    Parameters
    ----------
    universe : a :class:`relicore.Universe` with clustering matter (omega_matter above the
        massive-neutrino density).

    Methods of a redshift z (scalar or array, z >= 0): ``growth_factor`` (D, 1 today),
    ``growth_rate`` (f), ``unnormalized_growth_factor`` (D_u). Read-only properties:
    ``universe``, ``unnormalized_growth_factor_today`` (D_u(1)). Frozen; compares and hashes
    by its universe; pickles (recomputed from the universe, bit-identical).
    """

    __slots__ = ()

    def __new__(cls, universe: Any) -> LinearGrowth:
        return super().__new__(cls, universe)

    def __reduce__(self) -> tuple[Any, tuple[type, Any]]:
        return (_rebuild_growth, (type(self), self.universe))

    def __copy__(self) -> LinearGrowth:
        return self

    def __deepcopy__(self, memo: dict[int, Any]) -> LinearGrowth:
        return self


class LinearPowerSpectrum(LinearPowerSpectrumFunctions, _native.LinearPowerSpectrumBase):
    """A linear matter power spectrum on a computed growth: the Eisenstein & Hu 1998 transfer
    function of the growth's universe and the primordial spectrum
    A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p)) at k_p = 0.05 Mpc⁻¹, normalised by A_s or by σ8;
    σ8 is computed once (under a millisecond, with the GIL released).

    Parameters (keywords after the growth)
    ----------
    growth : a :class:`LinearGrowth`.
    transfer_form : ``'baryon_oscillations'`` (default: the paper's full fitting formula; needs
        a universe with baryons) or ``'no_wiggle'`` (its section 4.2, without the oscillations).
    scalar_amplitude : A_s at k_p, > 0 (about 2.1e-9 in today's fits); or
    sigma8 : σ8 > 0 (then A_s is derived: the ``scalar_amplitude`` property). Exactly one of the
        two; no default (the normalisation is the caller's choice).
    spectral_index : n_s, finite; required (no single value is common practice: fits give
        0.96-0.97, the scale-invariant spectrum is 1).
    running : α_s = dn_s/d ln k, finite; default 0 (no running, common practice).

    Methods: ``transfer_function(k)``, ``linear_power_spectrum_mpc3(k, z)``,
    ``density_rms_in_sphere(R, z)`` (σ(R, z)), ``growth_rate_times_sigma8(z)``. Read-only
    properties: ``sigma8``, ``s8``, ``scalar_amplitude`` and the inputs (``growth``,
    ``transfer_form``, ``normalisation`` as (name, value), ``spectral_index``, ``running``).
    Frozen; compares and hashes by its growth and inputs; pickles (recomputed, bit-identical).
    """

    __slots__ = ()

    def __new__(
        cls,
        growth: Any,
        *,
        transfer_form: str = "baryon_oscillations",
        scalar_amplitude: float | None = None,
        sigma8: float | None = None,
        spectral_index: float,
        running: float = 0.0,
    ) -> LinearPowerSpectrum:
        return super().__new__(cls, growth, transfer_form, scalar_amplitude, sigma8, spectral_index, running)

    def __reduce__(self) -> tuple[Any, tuple[Any, ...]]:
        return (_rebuild_spectrum, (type(self), self.growth, self.transfer_form, self.normalisation,
                                    self.spectral_index, self.running))

    def __copy__(self) -> LinearPowerSpectrum:
        return self

    def __deepcopy__(self, memo: dict[int, Any]) -> LinearPowerSpectrum:
        return self


LinearGrowth.__module__ = "relicore.growth"
LinearPowerSpectrum.__module__ = "relicore.growth"
