"""Reading tests/data/thermometry.txt and thermometry_response.txt (format: tests/data/FORMAT.md,
thermometry section; references: mpmath at 50 digits, tests/reference/thermometry_vectors.py) and
calling the Python face of each line. Shared by test_thermometry.py and
test_thermometry_cross_language.py."""

from __future__ import annotations

import pathlib
from dataclasses import dataclass
from typing import Any

import numpy as np

from relicore import blackbody as bb

ROOT = pathlib.Path(__file__).resolve().parents[2]
DATA = ROOT / "tests" / "data"
SCALAR_FILE = DATA / "thermometry.txt"
RESPONSE_FILE = DATA / "thermometry_response.txt"


@dataclass(frozen=True)
class Line:
    path: str
    line: int
    name: str  # as in the file: "function", "function_f32", "function@field"
    args: tuple[float, ...]
    expected: float
    kind: str
    tolerance: float
    source: str
    table: tuple[tuple[float, ...], tuple[float, ...]] | None = None

    @property
    def function(self) -> str:
        return self.name.split("@")[0]

    @property
    def field(self) -> str | None:
        return self.name.split("@")[1] if "@" in self.name else None

    @property
    def is_f32(self) -> bool:
        return self.function.endswith("_f32")

    @property
    def is_status(self) -> bool:
        return self.kind == "status"

    def where(self) -> str:
        return f"{pathlib.Path(self.path).name}:{self.line}"


def read_scalar_file(path: pathlib.Path = SCALAR_FILE) -> list[Line]:
    out = []
    for n, raw in enumerate(path.read_text().splitlines(), start=1):
        if not raw.strip() or raw.startswith("#"):
            continue
        f = raw.split()
        nargs = int(f[1])
        assert len(f) == 2 + nargs + 4, f"{path.name}:{n}: {len(f)} fields"
        out.append(Line(str(path), n, f[0], tuple(float(a) for a in f[2 : 2 + nargs]), float(f[2 + nargs]),
                        f[3 + nargs], float(f[4 + nargs]), f[5 + nargs]))
    return out


def read_response_file(path: pathlib.Path = RESPONSE_FILE) -> list[Line]:
    out = []
    lines = path.read_text().splitlines()
    i = 0
    while i < len(lines):
        raw = lines[i]
        i += 1
        if not raw.strip() or raw.startswith("#"):
            continue
        f = raw.split()
        npoints, nargs = int(f[1]), int(f[2])
        assert len(f) == 3 + nargs + 4, f"{path.name}:{i}: {len(f)} fields"
        header = i
        w, r = [], []
        while len(w) < npoints:
            row = lines[i]
            i += 1
            if not row.strip() or row.startswith("#"):
                continue
            a, b = row.split()
            w.append(float(a))
            r.append(float(b))
        out.append(Line(str(path), header, f[0], tuple(float(a) for a in f[3 : 3 + nargs]), float(f[3 + nargs]),
                        f[4 + nargs], float(f[5 + nargs]), f[6 + nargs], (tuple(w), tuple(r))))
    return out


def all_lines() -> list[Line]:
    return read_scalar_file() + read_response_file()


def call(line: Line) -> Any:
    """The Python face's result for a double-precision line (a float or a TemperatureUncertainty);
    raises RelicoreError like the face does."""
    name = line.function
    if name == "combined_standard_uncertainty" or name == "combined_standard_uncertainty_correlated":
        n = int(line.args[0])
        c, u = line.args[1 : 1 + n], line.args[1 + n : 1 + 2 * n]
        if name == "combined_standard_uncertainty":
            return bb.combined_standard_uncertainty(c, u)
        return bb.combined_standard_uncertainty_correlated(c, u, np.reshape(line.args[1 + 2 * n :], (n, n)))
    fn = getattr(bb, name)
    if line.table is not None:
        return fn(*line.table, *line.args)
    return fn(*line.args)


def field(result: Any, name: str | None) -> float:
    """One field of a TemperatureUncertainty by the file's field name, or the number itself."""
    if name is None:
        return float(result)
    if name.startswith("sensitivity_"):
        i = int(name.split("_")[1])
        assert i < result.inputs, f"{name}: only {result.inputs} inputs"
        return float(result.sensitivity_coefficients[i])
    return float(getattr(result, name))
