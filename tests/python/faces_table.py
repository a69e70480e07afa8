"""The function lists of the Python face tests, read from the one table of regular functions
(bindings/functions.toml, through bindings/gen/table.py), so that a new table entry joins every
test here without an edit; and the native module's own lists, which the tests compare with the
core's source and with these."""

from __future__ import annotations

import pathlib
import sys

ROOT = pathlib.Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT / "bindings"))

from gen import table  # noqa: E402

FUNCTIONS = table.load()


def _args(receiver: str, python: str, topic: str | None = None, results: bool = False) -> dict[str, tuple[str, ...]]:
    return {
        f.name: tuple(f.arg_names)
        for f in FUNCTIONS
        if f.receiver == receiver and f.python == python and (topic is None or f.topic == topic)
        and (f.result_type is not None) == results
    }


#: relicore.blackbody's regular functions that return a number -> element-wise parameters
BLACKBODY = _args("none", "function", "blackbody")
#: relicore.blackbody's regular functions that return a named result (a temperature with its
#: uncertainty) -> element-wise parameters
BLACKBODY_RESULTS = _args("none", "function", "blackbody", results=True)
#: (name, number of leading single-value arguments) of the functions whose image path is the
#: core's frame form (`<name>_array`, or the budget form a function with a result type names)
FRAMES = [(f.name, f.frame) for f in FUNCTIONS if f.frame]
#: the core's frame form of each function of FRAMES
FRAME_FUNCTIONS = {f.name: f.frame_function for f in FUNCTIONS if f.frame}
#: methods of relicore.Universe -> parameters after self
UNIVERSE_METHODS = _args("universe", "method")
#: read-only properties of relicore.Universe computed by the core (constants of a universe)
UNIVERSE_PROPERTIES = tuple(_args("universe", "property"))
#: relicore.decoupling's functions -> Python parameters (a universe first where there is one)
DECOUPLING = {
    f.name: (*([f.receiver] if f.receiver != "none" else []), *f.arg_names)
    for f in FUNCTIONS
    if f.topic == "decoupling" and f.python == "function"
}
#: the published fits among them (no universe)
FITS = tuple(n for n, a in DECOUPLING.items() if "universe" not in a)
#: methods of relicore.decoupling.ThermalHistory -> parameters after self
HISTORY_METHODS = _args("history", "method")
#: read-only properties of relicore.decoupling.ThermalHistory (the summary)
HISTORY_PROPERTIES = tuple(_args("history", "property"))
#: relicore.growth's free functions (the Eisenstein & Hu transfer functions) -> parameters
GROWTH_FUNCTIONS = _args("none", "function", "growth")
#: methods of relicore.growth.LinearGrowth -> parameters after self
GROWTH_METHODS = _args("growth", "method")
#: methods of relicore.growth.LinearPowerSpectrum -> parameters after self
SPECTRUM_METHODS = _args("power_spectrum", "method")
#: read-only properties of relicore.growth.LinearPowerSpectrum computed by the core
SPECTRUM_PROPERTIES = tuple(_args("power_spectrum", "property"))
#: (name, core array function) of the functions whose array path is the core's SIMD array form
SIMD = [(f.name, f"{f.name}_array", f.receiver) for f in FUNCTIONS if f.array and f.array.simd]


def native_signatures(topic: str, receiver: str) -> dict[str, tuple[str, ...]]:
    """name -> element-wise parameters of the native module's regular functions of a topic and
    receiver (what its error messages name)."""
    from relicore import _native

    return {
        f.name: tuple(f.arguments) for f in _native.functions() if f.topic == topic and f.receiver == receiver
    }


def native_blackbody() -> dict[str, tuple[str, ...]]:
    """name -> parameters of every blackbody function of the native module, regular or not."""
    from relicore import _native

    out = native_signatures("blackbody", "none")
    out.update({n: tuple(a) for n, a in _native.irregular_signatures()})
    return out
