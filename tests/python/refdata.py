"""Reading the shared reference vectors (tests/data/FORMAT.md) and calling the Python face of
each vector's function. Shared by test_vectors.py and test_cross_language.py.
"""

from __future__ import annotations

import math
import os
import pathlib
import struct
from dataclasses import dataclass
from typing import Any, Callable

import numpy as np

from faces_table import BLACKBODY
from relicore import blackbody as bb

ROOT = pathlib.Path(__file__).resolve().parents[2]
DATA = ROOT / "tests" / "data"
SCALAR_FILE = DATA / "blackbody.txt"
RESPONSE_FILE = DATA / "blackbody_response.txt"

DBL_MIN = 2.2250738585072014e-308
FLT_MIN = 1.1754943508222875e-38


@dataclass(frozen=True)
class Vector:
    """One reference vector. `args` are the scalar arguments (for the response file: the one
    scalar argument); `table` is the (wavelengths, response) pair of the response file."""

    path: str
    line: int
    name: str
    args: tuple[float, ...]
    expected: float
    kind: str
    tolerance: float
    source: str
    table: tuple[tuple[float, ...], tuple[float, ...]] | None = None

    @property
    def is_f32(self) -> bool:
        return self.name.endswith("_f32")

    @property
    def is_status(self) -> bool:
        return self.kind == "status"

    @property
    def status(self) -> int:
        return int(self.tolerance)

    def where(self) -> str:
        return f"{os.path.relpath(self.path, ROOT)}:{self.line}"


def _tail(fields: list[str], path: pathlib.Path, line: int) -> tuple[float, str, float, str]:
    expected, kind, tol, source = fields
    if kind not in ("ulp", "ulp32", "rel", "abs", "status"):
        raise ValueError(f"{path}:{line}: unknown tolerance kind {kind!r}")
    return float(expected), kind, float(tol), source


def read_scalar_file(path: pathlib.Path = SCALAR_FILE) -> list[Vector]:
    vectors = []
    for n, raw in enumerate(path.read_text().splitlines(), start=1):
        if not raw.strip() or raw.startswith("#"):
            continue
        fields = raw.split(" ")
        name, nargs = fields[0], int(fields[1])
        if len(fields) != 2 + nargs + 4:
            raise ValueError(f"{path}:{n}: expected {2 + nargs + 4} fields, got {len(fields)}")
        args = tuple(float(a) for a in fields[2 : 2 + nargs])
        expected, kind, tol, source = _tail(fields[2 + nargs :], path, n)
        vectors.append(Vector(str(path), n, name, args, expected, kind, tol, source))
    return vectors


def read_response_file(path: pathlib.Path = RESPONSE_FILE) -> list[Vector]:
    vectors = []
    lines = path.read_text().splitlines()
    i = 0
    while i < len(lines):
        raw = lines[i]
        i += 1
        if not raw.strip() or raw.startswith("#"):
            continue
        fields = raw.split(" ")
        if len(fields) != 7:
            raise ValueError(f"{path}:{i}: expected a 7-field header line, got {raw!r}")
        name, npoints, arg = fields[0], int(fields[1]), float(fields[2])
        expected, kind, tol, source = _tail(fields[3:], path, i)
        header_line = i
        wavelengths, response = [], []
        while len(wavelengths) < npoints:
            if i >= len(lines):
                raise ValueError(f"{path}:{header_line}: file ends inside a table")
            row = lines[i]
            i += 1
            if not row.strip() or row.startswith("#"):
                continue
            w, r = row.split(" ")
            wavelengths.append(float(w))
            response.append(float(r))
        vectors.append(
            Vector(
                str(path),
                header_line,
                name,
                (arg,),
                expected,
                kind,
                tol,
                source,
                (tuple(wavelengths), tuple(response)),
            )
        )
    return vectors


def ulp(w: float) -> float:
    """Spacing of doubles at |w| (at least at DBL_MIN), as FORMAT.md defines it."""
    _, e = math.frexp(max(abs(w), DBL_MIN))
    return math.ldexp(1.0, e - 1 - 52)


def ulp32(w: float) -> float:
    _, e = math.frexp(max(abs(w), FLT_MIN))
    return math.ldexp(1.0, e - 1 - 23)


def allowed_error(v: Vector) -> float:
    if v.kind == "ulp":
        return v.tolerance * ulp(v.expected)
    if v.kind == "ulp32":
        return v.tolerance * ulp32(v.expected)
    if v.kind == "rel":
        return v.tolerance * abs(v.expected)
    if v.kind == "abs":
        return v.tolerance
    raise ValueError(f"{v.where()}: no error bound for kind {v.kind}")


def within(v: Vector, got: float) -> bool:
    return math.isfinite(got) and abs(got - v.expected) <= allowed_error(v)


def report(v: Vector, got: float) -> str:
    return (
        f"{v.where()} {v.name}{v.args}: want {v.expected:.17e} got {got:.17e} "
        f"(|diff| {abs(got - v.expected):.3e}, allowed {v.kind} {v.tolerance:g} = {allowed_error(v):.3e}; "
        f"source {v.source})"
    )


def bits(x: float) -> str:
    """The 16 hex digits of the IEEE-754 double."""
    return struct.pack(">d", x).hex()


# --- calling the Python face -----------------------------------------------------------------


def _plain(name: str) -> Callable[..., Any]:
    fn = getattr(bb, name)

    def call(args: tuple[Any, ...], nan_on_error: bool = False) -> Any:
        return fn(*args, nan_on_error=nan_on_error)

    return call


def _calibrated(name: str) -> Callable[..., Any]:
    fn = getattr(bb, name)

    def call(args: tuple[Any, ...], nan_on_error: bool = False) -> Any:
        # the six-argument vectors: the calibration from the first five, then the reading
        cal = bb.two_load_calibration(*(float(a) for a in args[:5]))
        return fn(cal, args[5], nan_on_error=nan_on_error)

    return call


#: the regular functions, from the table (bindings/functions.toml)
PLAIN = list(BLACKBODY)
CALIBRATED = ["calibrated_temperature", "calibrated_brightness_temperature"]

#: scalar-file vector name -> call(args, nan_on_error) of the Python face
SCALAR_DISPATCH: dict[str, Callable[..., Any]] = {
    **{n: _plain(n) for n in PLAIN},
    **{n: _calibrated(n) for n in CALIBRATED},
}


def call_response(v: Vector, value: Any, nan_on_error: bool = False) -> Any:
    """Calls the response-file vector's function with its table and `value`."""
    assert v.table is not None
    fn = {
        "response_weighted_radiance": bb.response_weighted_radiance,
        "temperature_from_response_weighted_radiance": bb.temperature_from_response_weighted_radiance,
    }[v.name]
    return fn(list(v.table[0]), np.array(v.table[1]), value, nan_on_error=nan_on_error)


RESPONSE_NAMES = {"response_weighted_radiance", "temperature_from_response_weighted_radiance"}


def compute(v: Vector) -> float:
    """The Python face's value for a scalar-file or response-file vector (raises on failure)."""
    if v.table is not None:
        return float(call_response(v, v.args[0]))
    return float(SCALAR_DISPATCH[v.name](v.args))

