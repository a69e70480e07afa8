"""Type stubs for relicore.decoupling (hand-kept; tests/python/test_decoupling_faces.py checks
them against the module). Element-wise arguments take scalars, sequences or arrays: all scalars
give a float, anything else a float64 ndarray of the (broadcast) shape."""

from typing import Any, Final, TypeAlias, overload

import numpy as np
from numpy.typing import ArrayLike, NDArray

from relicore.cosmology import Universe

_Scalar: TypeAlias = float | int | np.floating[Any] | np.integer[Any]
_Array: TypeAlias = NDArray[np.float64]

HISTORY_NODES: Final[int]
DEFAULT_HIGHEST_REDSHIFT: Final[float]
LOWEST_HIGHEST_REDSHIFT: Final[float]
HIGHEST_REIONIZATION_REDSHIFT: Final[float]
SAHA_HIGHEST_REDSHIFT: Final[float]

@overload
def saha_ionized_fraction(universe: Universe, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def saha_ionized_fraction(universe: Universe, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def last_scattering_redshift_fit(omega_baryon_h2: _Scalar, omega_matter_h2: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def last_scattering_redshift_fit(omega_baryon_h2: ArrayLike, omega_matter_h2: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def drag_redshift_fit(omega_baryon_h2: _Scalar, omega_matter_h2: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def drag_redshift_fit(omega_baryon_h2: ArrayLike, omega_matter_h2: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...

class ThermalHistory:
    """The recombination and thermal history of a universe, computed once onto a fixed table."""

    def __new__(
        cls,
        universe: Universe,
        *,
        reionization_redshift: float | None = None,
        highest_redshift: float = 10000.0,
    ) -> ThermalHistory: ...
    @property
    def universe(self) -> Universe: ...
    @property
    def reionization_redshift(self) -> float | None: ...
    @property
    def highest_redshift(self) -> float: ...
    @property
    def last_scattering_redshift(self) -> float: ...
    @property
    def drag_redshift(self) -> float: ...
    @property
    def sound_horizon_last_scattering_mpc(self) -> float: ...
    @property
    def sound_horizon_drag_mpc(self) -> float: ...
    @property
    def angular_scale_last_scattering(self) -> float: ...
    @property
    def age_at_last_scattering_yr(self) -> float: ...
    @property
    def temperature_at_last_scattering_k(self) -> float: ...
    @property
    def visibility_peak_redshift(self) -> float: ...
    @property
    def thermal_decoupling_redshift(self) -> float: ...
    @property
    def reionization_optical_depth(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(self) -> tuple[Any, tuple[type[ThermalHistory], Universe, float | None, float]]: ...
    def __copy__(self) -> ThermalHistory: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> ThermalHistory: ...
    def __dask_tokenize__(self) -> tuple[str, Any, float | None, float]: ...
    @overload
    def ionized_fraction(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def ionized_fraction(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def matter_temperature_k(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def matter_temperature_k(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def optical_depth(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def optical_depth(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def visibility(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def visibility(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def sound_horizon_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def sound_horizon_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...

__all__: Final[list[str]]
