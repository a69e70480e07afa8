"""The radiation-thermometry functions of relicore.blackbody that the table of regular functions
cannot describe: the measurement equation with a response table shared by every element, and
the combined standard uncertainty of arrays of sensitivity coefficients and standard
uncertainties (JCGM 100:2008 eqs. 10 and 13). The regular thermometry functions (spectral and
band forms, the `_with_uncertainty` forms) are generated into relicore._blackbody.

Cautions: emissivity and reflections dominate the errors of real radiation thermometry; the
uncertainty computed covers only the inputs and standard uncertainties given. Fever screening,
furnaces, molten metal and fire safety follow the applicable standards, local codes and
licensed practice.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from relicore import _native
from relicore._elementwise import SCALAR_TYPES, contiguous, float_arrays, operand
from relicore._results import TemperatureUncertainty

_SCENE = ("emissivity", "reflected_temperature_k", "transmittance", "path_temperature_k")
_UNCERTAINTIES = (
    "signal_uncertainty",
    "emissivity_uncertainty",
    "reflected_temperature_uncertainty_k",
    "transmittance_uncertainty",
    "path_temperature_uncertainty_k",
)


def _table(t: Any) -> np.ndarray[Any, Any]:
    return contiguous(np.asarray(t, dtype=np.float64))


def _table_call(name: str, names: tuple[str, ...], wavelengths_m: Any, response_table: Any, args: tuple[Any, ...],
                nan_on_error: bool, width: int) -> Any:
    """One response-table thermometry function over broadcast element-wise arguments: a row of
    `width` floats per element (a float, or a TemperatureUncertainty for width 8)."""
    w, r = _table(wavelengths_m), _table(response_table)
    scalar = all(isinstance(a, SCALAR_TYPES) for a in args)
    arrays, shape = float_arrays(name, names, args)
    rows = np.empty(shape + ((width,) if width > 1 else ()), dtype=np.float64)
    _native.thermometry_table_map(name, w, r, [operand(a, shape) for a in arrays], rows.reshape(-1),
                                  list(shape), nan_on_error)
    if width == 1:
        return float(rows[()]) if scalar else rows
    return TemperatureUncertainty._from_row(rows.reshape(-1)) if scalar else TemperatureUncertainty._from_rows(rows)


def measured_response_weighted_radiance(
    wavelengths_m: Any, response_table: Any, object_temperature_k: Any, emissivity: Any, reflected_temperature_k: Any,
    transmittance: Any, path_temperature_k: Any, *, nan_on_error: bool = False,
) -> Any:
    """Measured response-weighted radiance of a scene (the measurement equation with the
    response-weighted radiance L_r of the table), W m^-2 sr^-1 (times the unit of the response):
    L_meas = tau [eps L_r(T_obj) + (1 - eps) L_r(T_refl)] + (1 - tau) L_r(T_path).

    wavelengths_m, response_table: the response table (1-D, as for `response_weighted_radiance`).
    object_temperature_k (> 0), emissivity (0 < eps <= 1), reflected_temperature_k (>= 0),
    transmittance (0 < tau <= 1), path_temperature_k (>= 0): scalars or arrays (broadcast).
    Accuracy: 1e-13 relative against mpmath quadrature.
    """
    args = (object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k)
    return _table_call("measured_response_weighted_radiance", ("object_temperature_k", *_SCENE),
                       wavelengths_m, response_table, args, nan_on_error, 1)


def object_temperature_response(
    wavelengths_m: Any, response_table: Any, signal: Any, emissivity: Any, reflected_temperature_k: Any,
    transmittance: Any, path_temperature_k: Any, *, nan_on_error: bool = False,
) -> Any:
    """Object temperature from a response-weighted signal (the inverse measurement equation, by
    the shared root finder), K.

    signal: L_meas in W m^-2 sr^-1 (times the unit of the response), finite; the table and the
    scene as for `measured_response_weighted_radiance`. Raises RelicoreError naming `signal`
    (outside the domain) when the corrected object radiance is not positive: no object
    temperature reproduces the signal. Accuracy: 1e-13 relative against mpmath for a correction
    condition number of at most 20.
    """
    args = (signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k)
    return _table_call("object_temperature_response", ("signal", *_SCENE), wavelengths_m, response_table, args,
                       nan_on_error, 1)


def object_temperature_response_with_uncertainty(
    wavelengths_m: Any, response_table: Any, signal: Any, emissivity: Any, reflected_temperature_k: Any,
    transmittance: Any, path_temperature_k: Any, signal_uncertainty: Any, emissivity_uncertainty: Any,
    reflected_temperature_uncertainty_k: Any, transmittance_uncertainty: Any,
    path_temperature_uncertainty_k: Any, *, nan_on_error: bool = False,
) -> TemperatureUncertainty:
    """`object_temperature_response` with its sensitivity coefficients (signal, emissivity,
    reflected temperature, transmittance, path temperature) and combined standard uncertainty
    (JCGM 100:2008 eq. 10, uncorrelated inputs), as a TemperatureUncertainty (relicore._results:
    numbers for scalar arguments, arrays for array arguments).

    The five standard uncertainties: finite, >= 0, in the units of their inputs.
    Accuracy: coefficients and u_c within 1e-12 relative against mpmath quadrature.
    """
    args = (signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, signal_uncertainty,
            emissivity_uncertainty, reflected_temperature_uncertainty_k, transmittance_uncertainty,
            path_temperature_uncertainty_k)
    return _table_call("object_temperature_response_with_uncertainty", ("signal", *_SCENE, *_UNCERTAINTIES),
                       wavelengths_m, response_table, args, nan_on_error, 8)


def response_weighted_radiance_temperature_derivative(
    wavelengths_m: Any, response_table: Any, temperature_k: Any, *, nan_on_error: bool = False
) -> Any:
    """Temperature derivative of the response-weighted radiance of the table,
    W m^-2 sr^-1 K^-1 (times the unit of the response); temperature_k > 0, scalar or array.
    Accuracy: 1e-13 relative against mpmath quadrature."""
    return _table_call("response_weighted_radiance_temperature_derivative", ("temperature_k",), wavelengths_m,
                       response_table, (temperature_k,), nan_on_error, 1)


def combined_standard_uncertainty(sensitivity_coefficients: Any, standard_uncertainties: Any) -> float:
    """Combined standard uncertainty of uncorrelated inputs, u_c = (sum c_i^2 u_i^2)^(1/2)
    (JCGM 100:2008 eq. 10), K.

    sensitivity_coefficients: 1-D, finite (for example `result.sensitivity_coefficients[:result.inputs]`).
    standard_uncertainties: 1-D, same length, finite, >= 0. Accuracy: 2(n + 2) eps relative.
    """
    return _native.combined_uncertainty(_table(sensitivity_coefficients), _table(standard_uncertainties))


def combined_standard_uncertainty_correlated(
    sensitivity_coefficients: Any, standard_uncertainties: Any, correlation: Any
) -> float:
    """Combined standard uncertainty of correlated inputs (JCGM 100:2008 eq. 13), K:
    u_c^2 = sum_ij c_i c_j u_i u_j r_ij.

    correlation: the n x n correlation matrix (finite, |r| <= 1, unit diagonal, symmetric,
    positive semi-definite), as an (n, n) array or flattened row-major. Raises RelicoreError
    naming `correlation` when it is not a correlation matrix.
    """
    m = np.asarray(correlation, dtype=np.float64)
    return _native.combined_uncertainty(_table(sensitivity_coefficients), _table(standard_uncertainties),
                                        contiguous(m.reshape(-1)))


__all__ = [
    "combined_standard_uncertainty",
    "combined_standard_uncertainty_correlated",
    "measured_response_weighted_radiance",
    "object_temperature_response",
    "object_temperature_response_with_uncertainty",
    "response_weighted_radiance_temperature_derivative",
]
