"""Shared by the element-wise wrappers of relicore: what counts as a scalar, how one input
becomes the contiguous 1-D float64 operand of a native loop, and the one call of a regular
function (`apply`) that the generated wrappers (_blackbody.py, _cosmology.py, _decoupling.py)
make."""

from __future__ import annotations

from typing import Any

import numpy as np

from relicore import _native

SCALAR_TYPES = (float, int, np.floating, np.integer)


def contiguous(a: np.ndarray[Any, Any], dtype: Any = np.float64) -> np.ndarray[Any, Any]:
    """`a` itself when it is C-contiguous, aligned and of `dtype`, else an aligned C-contiguous
    copy (the native loops read plain slices; an array unpickled from an out-of-band buffer, as
    dask and multiprocessing deliver them, may be misaligned)."""
    return np.require(a, dtype=dtype, requirements=("C", "A"))


def operand(a: np.ndarray[Any, Any], shape: tuple[int, ...], dtype: Any = np.float64) -> np.ndarray[Any, Any]:
    """A contiguous, aligned 1-D view or copy of one input in `dtype`: one element when it
    broadcasts as a scalar, else prod(shape) elements in C order."""
    if a.size == 1:
        return contiguous(a.reshape(1), dtype)
    if a.shape != shape:
        a = np.broadcast_to(a, shape)
    return contiguous(a, dtype).reshape(-1)


# numpy dtype kinds that are real numbers: bool, signed and unsigned integers, floats
_REAL_KINDS = "biuf"


def _error(message: str, function: str, argument: str) -> Exception:
    from relicore import RelicoreError

    err = RelicoreError(message)
    err.function = function  # type: ignore[attr-defined]
    err.argument = argument  # type: ignore[attr-defined]
    err.index = None  # type: ignore[attr-defined]
    err.status = None  # type: ignore[attr-defined]
    return err


def float_arrays(
    function: str, names: tuple[str, ...] | list[str], args: tuple[Any, ...], dtype: Any = np.float64
) -> tuple[list[np.ndarray[Any, Any]], tuple[int, ...]]:
    """The element-wise arguments as arrays of `dtype` (float64, or float32 for a
    single-precision call) and their broadcast shape.

    Raises RelicoreError naming the argument when an input is not made of real numbers
    (complex, datetime64, timedelta64, text or object arrays are refused, not converted) or when
    its shape does not broadcast with the arguments before it."""
    arrays = []
    for name, a in zip(names, args):
        raw = np.asarray(a)
        if raw.dtype.kind not in _REAL_KINDS:
            raise _error(f"{function}: {name} has dtype {raw.dtype}: real numbers are required", function, name)
        arrays.append(raw.astype(dtype, copy=False))
    shape: tuple[int, ...] = ()
    for name, a in zip(names, arrays):
        try:
            shape = np.broadcast_shapes(shape, a.shape)
        except ValueError:
            raise _error(
                f"{function}: {name} has shape {a.shape}, which does not broadcast with {shape}",
                function,
                name,
            ) from None
    return arrays, shape


#: every regular function of the core by name (relicore._native.Function)
FUNCTIONS: dict[str, Any] = {f.name: f for f in _native.functions()}

# Python numbers: weak in numpy's promotion (NEP 50), they take the precision of the arrays.
_WEAK = (float, int)


def precision(function: Any, args: tuple[Any, ...]) -> Any:
    """The dtype a call computes and returns: float32 when the function has a single-precision
    twin in the core (`function.single`) and numpy's promotion of the arguments gives float32
    (every array and numpy scalar argument is float32, the others Python numbers), else float64
    (float16, integer, bool, float64 and mixed arguments, and functions without a twin)."""
    if not function.single:
        return np.float64
    seen = False
    for a in args:
        if type(a) in _WEAK or type(a) is bool:
            continue
        dtype = getattr(a, "dtype", None)
        if dtype is None or dtype != np.float32:
            return np.float64
        seen = True
    return np.float32 if seen else np.float64


def apply(function: Any, receiver: Any, args: tuple[Any, ...], nan_on_error: bool, label: str | None = None) -> Any:
    """Calls a regular function on `receiver` (None, a universe or a history), the Python path of
    `function.apply` (which handles Python numbers and plain float64 and float32 arrays itself):
    a Python float when every argument is a scalar (a numpy float32 scalar when the call is in
    single precision), else the ndarray of the broadcast shape, float32 for a single-precision
    call (see `precision`), else float64. `label` names the function in the dtype and shape
    errors raised here (its `label` by default)."""
    dtype = precision(function, args)
    scalars = all(isinstance(a, SCALAR_TYPES) for a in args)
    if scalars and dtype is np.float64:
        return function.call(receiver, args, nan_on_error)
    arrays, shape = float_arrays(label or function.label, function.arguments, args, dtype)
    out = np.empty(shape, dtype=dtype)
    function.map(receiver, [operand(a, shape, dtype) for a in arrays], out.reshape(-1), shape, nan_on_error)
    return out[()] if scalars else out


def apply_out(function: Any, receiver: Any, args: tuple[Any, ...], nan_on_error: bool, out: Any) -> Any:
    """`function.apply` with `out=`: the result, computed as without it, written into `out`, an
    ndarray of the broadcast shape into whose dtype the result's casts by numpy's "same_kind"
    rule (a float64 result into float32 rounds); returns `out`. Raises RelicoreError naming
    `out` otherwise. (The result is computed into a new array and copied: out= saves the
    caller an array, not the computation one.)"""
    label = function.label
    if not isinstance(out, np.ndarray):
        raise _error(f"{label}: out must be a numpy array, not {type(out).__name__}", label, "out")
    result = np.asarray(function.apply(receiver, args, nan_on_error))
    if out.shape != result.shape:
        raise _error(f"{label}: out has shape {out.shape}, the result has shape {result.shape}", label, "out")
    if not np.can_cast(result.dtype, out.dtype, casting="same_kind"):
        raise _error(f"{label}: out has dtype {out.dtype}, the result {result.dtype} cannot be cast to it", label, "out")
    if not out.flags.writeable:
        raise _error(f"{label}: out is read-only", label, "out")
    np.copyto(out, result, casting="same_kind")
    return out


def publish(members: Any, module: str, owner: str | None = None) -> None:
    """Gives generated functions (a list) or the members of a generated mixin class the
    `__module__` and `__qualname__` of the public module and class they belong to."""
    items = members if isinstance(members, list) else list(vars(members).values())
    for item in items:
        function = item.fget if isinstance(item, property) else item
        if callable(function) and hasattr(function, "__qualname__"):
            function.__module__ = module
            function.__qualname__ = f"{owner}.{function.__name__}" if owner else function.__name__


def apply_result(function: Any, receiver: Any, args: tuple[Any, ...], nan_on_error: bool, result: Any) -> Any:
    """Calls a regular function with a result value (a row of `function.width` floats per
    element) and returns the named result `result` (relicore._results): of Python numbers when
    every argument is a scalar, else holding arrays of the broadcast shape (a field of n values
    with a trailing axis of n); float32 fields from the single-precision twin where `precision`
    says so (numpy scalars, and a float32 array for a field of n values, for numpy float32
    scalars in)."""
    dtype = precision(function, args)
    scalars = all(isinstance(a, SCALAR_TYPES) for a in args)
    if scalars and dtype is np.float64:
        return result._from_row(function.call_row(receiver, args, nan_on_error))
    arrays, shape = float_arrays(function.label, function.arguments, args, dtype)
    rows = np.empty(shape + (function.width,), dtype=dtype)
    function.map(receiver, [operand(a, shape, dtype) for a in arrays], rows.reshape(-1), shape, nan_on_error)
    value = result._from_rows(rows)
    if scalars:
        # numpy float32 scalars in: numpy scalars out (a field of n values a float32 array of n)
        return value._replace(**{k: v[()] for k, v in value._asdict().items() if np.ndim(v) == 0})
    return value


def table_call(name: str, names: tuple[str, ...], wavelengths_m: Any, response_table: Any, args: tuple[Any, ...],
               nan_on_error: bool, width: int) -> Any:
    """One response-table function (relicore._tables) over broadcast element-wise arguments: a row
    of `width` floats per element (a float, or a TemperatureUncertainty for width 8)."""
    from relicore._results import TemperatureUncertainty

    w = contiguous(np.asarray(wavelengths_m, dtype=np.float64))
    r = contiguous(np.asarray(response_table, dtype=np.float64))
    scalar = all(isinstance(a, SCALAR_TYPES) for a in args)
    arrays, shape = float_arrays(name, names, args)
    rows = np.empty(shape + ((width,) if width > 1 else ()), dtype=np.float64)
    _native.thermometry_table_map(name, w, r, [operand(a, shape) for a in arrays], rows.reshape(-1),
                                  list(shape), nan_on_error)
    if width == 1:
        return float(rows[()]) if scalar else rows
    return TemperatureUncertainty._from_row(rows.reshape(-1)) if scalar else TemperatureUncertainty._from_rows(rows)
