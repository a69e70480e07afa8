"""Reading the shared decoupling reference vectors (tests/data/decoupling.txt, format in
tests/data/FORMAT.md, section "Decoupling file") and calling the Python face for each. Shared by
test_decoupling_vectors.py and test_decoupling_cross_language.py.

The file holds universe lines (as in cosmology.txt)

    universe NAME h0_km_s_mpc omega_matter omega_baryon omega_curvature cmb_temperature_k n_eff
             m1_ev m2_ev m3_ev w0 wa helium_mass_fraction

history lines (every history has the default highest redshift, 1e4)

    history NAME UNIVERSE
    history_reionized NAME UNIVERSE z_re

and vector lines

    function TARGET nargs args... expected kind tolerance source

where TARGET is a universe for saha_ionized_fraction, a history for the five queries (nargs 1)
and the summary values (nargs 0: properties in Python), and "-" for the two fits (nargs 2). The
tolerance kinds are those of the scalar files (`status C`: the call must fail with status C).
"""

from __future__ import annotations

import functools
import math
import os
from dataclasses import dataclass
from typing import Any

from cosmo_refdata import PARAMETER_FIELDS
from faces_table import DECOUPLING, HISTORY_METHODS, HISTORY_PROPERTIES
from faces_table import FITS as TABLE_FITS
from refdata import DATA, ROOT, allowed_error, bits

import relicore
from relicore import decoupling as dc

DECOUPLING_FILE = DATA / "decoupling.txt"

#: target "-": functions of their arguments only
FITS = TABLE_FITS
#: target a universe
UNIVERSE_FUNCTIONS = tuple(n for n in DECOUPLING if n not in FITS)
#: target a history, one argument (z)
QUERIES = tuple(HISTORY_METHODS)
#: target a history, no argument: read-only properties in Python
SUMMARY = HISTORY_PROPERTIES
NARGS = {**{n: 2 for n in FITS}, **{n: 1 for n in UNIVERSE_FUNCTIONS + QUERIES}, **{n: 0 for n in SUMMARY}}


@dataclass(frozen=True)
class DecouplingVector:
    path: str
    line: int
    name: str
    target: str
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

    def label(self) -> str:
        return f"{self.where()} {self.target}.{self.name}{self.args}"


@dataclass(frozen=True)
class DecouplingFile:
    universes: dict[str, dict[str, Any]]
    #: history name -> (universe name, reionisation redshift or None)
    histories: dict[str, tuple[str, float | None]]
    vectors: list[DecouplingVector]


def read_decoupling_file(path=DECOUPLING_FILE) -> DecouplingFile:
    universes: dict[str, dict[str, Any]] = {}
    histories: dict[str, tuple[str, float | None]] = {}
    vectors: list[DecouplingVector] = []
    for n, raw in enumerate(path.read_text().splitlines(), start=1):
        if not raw.strip() or raw.startswith("#"):
            continue
        fields = raw.split(" ")
        kind = fields[0]
        if kind == "universe":
            if len(fields) != 2 + len(PARAMETER_FIELDS):
                raise ValueError(f"{path}:{n}: a universe line has {2 + len(PARAMETER_FIELDS)} fields")
            values = dict(zip(PARAMETER_FIELDS, (float(x) for x in fields[2:])))
            kwargs: dict[str, Any] = {k: v for k, v in values.items() if not k.startswith("m")}
            kwargs["neutrino_masses_ev"] = (values["m1_ev"], values["m2_ev"], values["m3_ev"])
            if fields[1] in universes:
                raise ValueError(f"{path}:{n}: universe {fields[1]} defined twice")
            universes[fields[1]] = kwargs
            continue
        if kind in ("history", "history_reionized"):
            want = 3 if kind == "history" else 4
            if len(fields) != want:
                raise ValueError(f"{path}:{n}: a {kind} line has {want} fields")
            name, universe = fields[1], fields[2]
            if universe not in universes:
                raise ValueError(f"{path}:{n}: universe {universe} is not defined above")
            if name in histories or name in universes or name == "-":
                raise ValueError(f"{path}:{n}: history name {name} is already taken")
            histories[name] = (universe, float(fields[3]) if kind == "history_reionized" else None)
            continue
        name, target, nargs = fields[0], fields[1], int(fields[2])
        if len(fields) != 3 + nargs + 4:
            raise ValueError(f"{path}:{n}: expected {3 + nargs + 4} fields, got {len(fields)}")
        if name not in NARGS:
            raise ValueError(f"{path}:{n}: unknown function {name!r}")
        if nargs != NARGS[name]:
            raise ValueError(f"{path}:{n}: {name} takes {NARGS[name]} arguments, the line gives {nargs}")
        if name in FITS and target != "-":
            raise ValueError(f"{path}:{n}: the target of {name} is '-'")
        if name in UNIVERSE_FUNCTIONS and target not in universes:
            raise ValueError(f"{path}:{n}: universe {target} is not defined above")
        if name in QUERIES + SUMMARY and target not in histories:
            raise ValueError(f"{path}:{n}: history {target} is not defined above")
        args = tuple(float(a) for a in fields[3 : 3 + nargs])
        expected, tkind, tol, source = fields[3 + nargs :]
        if tkind not in ("ulp", "rel", "abs", "status"):
            raise ValueError(f"{path}:{n}: unknown tolerance kind {tkind!r}")
        vectors.append(DecouplingVector(str(path), n, name, target, args, float(expected), tkind, float(tol), source))
    return DecouplingFile(universes, histories, vectors)


@functools.lru_cache(maxsize=None)
def data() -> DecouplingFile:
    return read_decoupling_file()


@functools.lru_cache(maxsize=None)
def universe(name: str) -> relicore.Universe:
    """The file's universe `name`, built once per test session."""
    return relicore.Universe(**data().universes[name])


@functools.lru_cache(maxsize=None)
def history(name: str) -> dc.ThermalHistory:
    """The file's history `name`, computed once per test session."""
    universe_name, z_re = data().histories[name]
    return dc.ThermalHistory(universe(universe_name), reionization_redshift=z_re)


def function_of(v: DecouplingVector) -> Any:
    """The Python callable of a vector's function and target (None for a summary value)."""
    if v.name in FITS:
        return getattr(dc, v.name)
    if v.name in UNIVERSE_FUNCTIONS:
        u = universe(v.target)
        return functools.partial(dc.saha_ionized_fraction, u)
    if v.name in QUERIES:
        return getattr(history(v.target), v.name)
    return None


def call(v: DecouplingVector, nan_on_error: bool = False) -> Any:
    """The Python face's value for a vector (raises RelicoreError on failure)."""
    if v.name in SUMMARY:
        return getattr(history(v.target), v.name)
    return function_of(v)(*v.args, nan_on_error=nan_on_error)


def compute(v: DecouplingVector) -> float:
    return float(call(v))


def within(v: DecouplingVector, got: float) -> bool:
    return math.isfinite(got) and abs(got - v.expected) <= allowed_error(v)  # type: ignore[arg-type]


def report(v: DecouplingVector, got: float) -> str:
    return (
        f"{v.label()}: want {v.expected:.17e} got {got:.17e} (|diff| {abs(got - v.expected):.3e}, "
        f"allowed {v.kind} {v.tolerance:g} = {allowed_error(v):.3e}; source {v.source})"  # type: ignore[arg-type]
    )


def dump_line(v: DecouplingVector) -> tuple[str, str, str]:
    """(target, function, bits) of a value vector: the cross-language dump format."""
    return (v.target, v.name, bits(compute(v)))
