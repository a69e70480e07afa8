"""Type stubs for relicore.cosmology (hand-kept; tests/python/test_cosmology_faces.py checks
them against the module). Element-wise arguments take scalars, sequences or arrays: all scalars
give a float, anything else a float64 ndarray of the (broadcast) shape."""

from typing import Any, Final, TypeAlias, overload

import numpy as np
from numpy.typing import ArrayLike, NDArray

_Scalar: TypeAlias = float | int | np.floating[Any] | np.integer[Any]
_Array: TypeAlias = NDArray[np.float64]

class Universe:
    """A homogeneous universe: validated parameters, derived constants and a distance table."""

    def __new__(
        cls,
        h0_km_s_mpc: float,
        omega_matter: float,
        *,
        omega_baryon: float = 0.0,
        omega_curvature: float = 0.0,
        cmb_temperature_k: float = 2.7255,
        n_eff: float = 3.044,
        neutrino_masses_ev: ArrayLike = (0.0, 0.0, 0.0),
        w0: float = -1.0,
        wa: float = 0.0,
        helium_mass_fraction: float = 0.245,
    ) -> Universe: ...
    @property
    def h0_km_s_mpc(self) -> float: ...
    @property
    def omega_matter(self) -> float: ...
    @property
    def omega_baryon(self) -> float: ...
    @property
    def omega_curvature(self) -> float: ...
    @property
    def cmb_temperature_k(self) -> float: ...
    @property
    def n_eff(self) -> float: ...
    @property
    def neutrino_masses_ev(self) -> tuple[float, float, float]: ...
    @property
    def w0(self) -> float: ...
    @property
    def wa(self) -> float: ...
    @property
    def helium_mass_fraction(self) -> float: ...
    @property
    def parameters(self) -> dict[str, Any]: ...
    @property
    def hubble_distance_mpc(self) -> float: ...
    @property
    def hubble_time_gyr(self) -> float: ...
    @property
    def omega_radiation(self) -> float: ...
    @property
    def omega_dark_energy(self) -> float: ...
    @property
    def matter_radiation_equality_redshift(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(self) -> tuple[Any, tuple[type[Universe], dict[str, Any]]]: ...
    def __copy__(self) -> Universe: ...
    def __dask_tokenize__(self) -> tuple[str, tuple[tuple[str, Any], ...]]: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> Universe: ...
    @overload
    def dimensionless_hubble(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def dimensionless_hubble(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def hubble_parameter_km_s_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def hubble_parameter_km_s_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def omega_matter_at(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def omega_matter_at(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def omega_radiation_at(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def omega_radiation_at(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def omega_dark_energy_at(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def omega_dark_energy_at(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def omega_curvature_at(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def omega_curvature_at(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def critical_density_kg_m3(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def critical_density_kg_m3(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def cmb_temperature_at_k(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def cmb_temperature_at_k(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def comoving_distance_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def comoving_distance_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def transverse_comoving_distance_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def transverse_comoving_distance_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def angular_diameter_distance_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def angular_diameter_distance_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def angular_diameter_distance_between_mpc(self, z1: _Scalar, z2: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def angular_diameter_distance_between_mpc(self, z1: ArrayLike, z2: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def luminosity_distance_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def luminosity_distance_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def distance_modulus(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def distance_modulus(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def comoving_volume_gpc3(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def comoving_volume_gpc3(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def differential_comoving_volume_mpc3_sr(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def differential_comoving_volume_mpc3_sr(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def transverse_scale_kpc_per_arcsec(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def transverse_scale_kpc_per_arcsec(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def lookback_time_gyr(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def lookback_time_gyr(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def age_gyr(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def age_gyr(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def conformal_time_mpc(self, z: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def conformal_time_mpc(self, z: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def redshift_at_age_gyr(self, age_gyr: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def redshift_at_age_gyr(self, age_gyr: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def redshift_at_lookback_time_gyr(self, lookback_gyr: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def redshift_at_lookback_time_gyr(self, lookback_gyr: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def redshift_at_comoving_distance_mpc(self, distance_mpc: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def redshift_at_comoving_distance_mpc(self, distance_mpc: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
    @overload
    def redshift_at_luminosity_distance_mpc(self, distance_mpc: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
    @overload
    def redshift_at_luminosity_distance_mpc(self, distance_mpc: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...

__all__: Final[list[str]]
