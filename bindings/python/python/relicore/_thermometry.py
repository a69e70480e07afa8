"""The radiation-thermometry functions of relicore.blackbody that the table of regular functions
cannot describe: the measurement equation with a response table shared by every element, and
the combined standard uncertainty of arrays of sensitivity coefficients and standard
uncertainties (JCGM 100:2008 eqs. 10 and 13). The regular thermometry functions (spectral and
band forms, the `_with_uncertainty` forms) are generated into relicore._blackbody, the
response-table functions ([[table_function]] entries of the table) into relicore._tables.

Cautions: emissivity and reflections dominate the errors of real radiation thermometry; the
uncertainty computed covers only the inputs and standard uncertainties given. Fever screening,
furnaces, molten metal and fire safety follow the applicable standards, local codes and
licensed practice.
"""

from __future__ import annotations

from typing import Any

import numpy as np

from relicore import _native
from relicore._elementwise import contiguous

from relicore._tables import *  # noqa: F403 (the response-table functions, generated from the table)
from relicore import _elementwise, _tables


def _table(t: Any) -> np.ndarray[Any, Any]:
    return contiguous(np.asarray(t, dtype=np.float64))


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
    *_tables.__all__,
]
_elementwise.publish([getattr(_tables, n) for n in _tables.__all__], __name__)
