"""Reading the shared cosmology reference vectors (tests/data/cosmology.txt, format in
tests/data/FORMAT.md) and calling the Python face for each. Shared by
test_cosmology_vectors.py and test_cosmology_cross_language.py.

The file holds universe lines

    universe NAME h0_km_s_mpc omega_matter omega_baryon omega_curvature cmb_temperature_k n_eff
             m1_ev m2_ev m3_ev w0 wa helium_mass_fraction

and vector lines

    function NAME nargs args... expected kind tolerance source

where NAME is a universe of the file, `nargs` 0 means a constant of the universe (a property in
Python) and the tolerance kinds are those of the scalar files (`status C`: the call must fail
with status C).
"""

from __future__ import annotations

import functools
import math
import os
from dataclasses import dataclass
from typing import Any

from faces_table import UNIVERSE_PROPERTIES
from refdata import DATA, ROOT, allowed_error, bits

import relicore

COSMOLOGY_FILE = DATA / "cosmology.txt"

PARAMETER_FIELDS = (
    "h0_km_s_mpc",
    "omega_matter",
    "omega_baryon",
    "omega_curvature",
    "cmb_temperature_k",
    "n_eff",
    "m1_ev",
    "m2_ev",
    "m3_ev",
    "w0",
    "wa",
    "helium_mass_fraction",
)

#: the constants of a universe: read-only properties in Python, nargs 0 in the file
PROPERTIES = UNIVERSE_PROPERTIES


@dataclass(frozen=True)
class CosmologyVector:
    path: str
    line: int
    name: str
    universe: str
    args: tuple[float, ...]
    expected: float
    kind: str
    tolerance: float
    source: str

    @property
    def is_status(self) -> bool:
        return self.kind == "status"

    @property
    def status(self) -> int:
        return int(self.tolerance)

    def where(self) -> str:
        return f"{os.path.relpath(self.path, ROOT)}:{self.line}"


def read_cosmology_file(path=COSMOLOGY_FILE) -> tuple[dict[str, dict[str, Any]], list[CosmologyVector]]:
    """(universe name -> keyword arguments of relicore.Universe, vectors in file order)."""
    universes: dict[str, dict[str, Any]] = {}
    vectors: list[CosmologyVector] = []
    for n, raw in enumerate(path.read_text().splitlines(), start=1):
        if not raw.strip() or raw.startswith("#"):
            continue
        fields = raw.split(" ")
        if fields[0] == "universe":
            if len(fields) != 2 + len(PARAMETER_FIELDS):
                raise ValueError(f"{path}:{n}: a universe line has {2 + len(PARAMETER_FIELDS)} fields")
            values = dict(zip(PARAMETER_FIELDS, (float(x) for x in fields[2:])))
            kwargs: dict[str, Any] = {k: v for k, v in values.items() if not k.startswith("m")}
            kwargs["neutrino_masses_ev"] = (values["m1_ev"], values["m2_ev"], values["m3_ev"])
            if fields[1] in universes:
                raise ValueError(f"{path}:{n}: universe {fields[1]} defined twice")
            universes[fields[1]] = kwargs
            continue
        name, universe, nargs = fields[0], fields[1], int(fields[2])
        if len(fields) != 3 + nargs + 4:
            raise ValueError(f"{path}:{n}: expected {3 + nargs + 4} fields, got {len(fields)}")
        if universe not in universes:
            raise ValueError(f"{path}:{n}: universe {universe} is not defined above")
        args = tuple(float(a) for a in fields[3 : 3 + nargs])
        expected, kind, tol, source = fields[3 + nargs :]
        if kind not in ("ulp", "rel", "abs", "status"):
            raise ValueError(f"{path}:{n}: unknown tolerance kind {kind!r}")
        vectors.append(
            CosmologyVector(str(path), n, name, universe, args, float(expected), kind, float(tol), source)
        )
    return universes, vectors


@functools.lru_cache(maxsize=None)
def _universes() -> dict[str, dict[str, Any]]:
    return read_cosmology_file()[0]


@functools.lru_cache(maxsize=None)
def universe(name: str) -> relicore.Universe:
    """The file's universe `name`, built once per test session."""
    return relicore.Universe(**_universes()[name])


def call(v: CosmologyVector, u: relicore.Universe | None = None, nan_on_error: bool = False) -> Any:
    """The Python face's value for a vector (raises RelicoreError on failure)."""
    u = universe(v.universe) if u is None else u
    if not v.args:
        if v.name not in PROPERTIES:
            raise ValueError(f"{v.where()}: {v.name} takes no argument but is not a known constant")
        return getattr(u, v.name)
    return getattr(u, v.name)(*v.args, nan_on_error=nan_on_error)


def compute(v: CosmologyVector) -> float:
    return float(call(v))


def within(v: CosmologyVector, got: float) -> bool:
    return math.isfinite(got) and abs(got - v.expected) <= allowed_error(v)  # type: ignore[arg-type]


def report(v: CosmologyVector, got: float) -> str:
    return (
        f"{v.where()} {v.universe}.{v.name}{v.args}: want {v.expected:.17e} got {got:.17e} "
        f"(|diff| {abs(got - v.expected):.3e}, allowed {v.kind} {v.tolerance:g} = "
        f"{allowed_error(v):.3e}; source {v.source})"  # type: ignore[arg-type]
    )


def dump_line(v: CosmologyVector) -> tuple[str, str, str]:
    """(universe, function, bits) of a value vector: the cross-language dump format."""
    return (v.universe, v.name, bits(compute(v)))
