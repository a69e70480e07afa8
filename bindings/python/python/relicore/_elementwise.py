"""Shared by the element-wise wrappers of relicore.blackbody and relicore.cosmology: what counts
as a scalar, and how one input becomes the contiguous 1-D float64 operand of a native loop."""

from __future__ import annotations

from typing import Any

import numpy as np

SCALAR_TYPES = (float, int, np.floating, np.integer)


def contiguous(a: np.ndarray[Any, Any]) -> np.ndarray[Any, Any]:
    """`a` itself when it is C-contiguous and aligned, else an aligned C-contiguous copy (the
    native loops read plain slices; an array unpickled from an out-of-band buffer, as dask and
    multiprocessing deliver them, may be misaligned)."""
    return np.require(a, dtype=np.float64, requirements=("C", "A"))


def operand(a: np.ndarray[Any, Any], shape: tuple[int, ...]) -> np.ndarray[Any, Any]:
    """A contiguous, aligned 1-D float64 view or copy of one input: one element when it
    broadcasts as a scalar, else prod(shape) elements in C order."""
    if a.size == 1:
        return contiguous(a.reshape(1))
    if a.shape != shape:
        a = np.broadcast_to(a, shape)
    return contiguous(a).reshape(-1)
