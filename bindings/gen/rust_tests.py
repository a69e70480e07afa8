"""The dispatch of the Rust vector tests (tests/gen/dispatch.rs): a call of each regular core
function by its name in the vector files, for tests/blackbody_vectors.rs,
tests/cosmology_vectors.rs and tests/decoupling_vectors.rs."""

from __future__ import annotations

from pathlib import Path

from .c_face import rustfmt
from .common import banner
from .table import ROOT, Function

PATH = ROOT / "tests" / "gen" / "dispatch.rs"


def _call(fn: Function, ty: str) -> str:
    args = ", ".join(f"g({i})" for i in range(len(fn.args)))
    if fn.receiver == "none":
        return f"relicore::{fn.topic}::{fn.name}::<{ty}>({args})"
    if fn.core:
        topic, _, name = fn.core.partition("::")
        return f"relicore::{topic}::{name}(r{', ' if args else ''}{args})"
    call = f"r.{fn.name}({args})"
    return f"Ok({call})" if fn.infallible else call


def _function(name: str, receiver: str | None, ty: str, fns: list[Function]) -> str:
    recv = f"r: &{receiver}, " if receiver else ""
    arms = [f'        ("{f.name}", {len(f.args)}) => {_call(f, ty)},' for f in fns]
    return (
        f"/// The {name.split('_', 1)[1].replace('_', ' ')} functions of the table, by name and number of arguments.\n"
        "#[allow(dead_code)]\n"
        f"pub fn {name}({recv}name: &str, a: &[{ty}]) -> Option<Result<{ty}>> {{\n"
        f"    let g = |i: usize| a.get(i).copied().unwrap_or({ty}::NAN);\n"
        "    Some(match (name, a.len()) {\n" + "\n".join(arms) + "\n        _ => return None,\n    })\n}\n"
    )


def outputs(fns: list[Function]) -> dict[Path, str]:
    none = [f for f in fns if f.receiver == "none"]
    text = (
        banner("//", "the dispatch of the Rust vector tests")
        + "//! Calls of the regular core functions by name, for the Rust vector tests.\n\n"
        + "use relicore::Result;\n"
        + "use relicore::cosmology::Universe;\n"
        + "use relicore::decoupling::ThermalHistory;\n\n"
        + _function("call_none_f64", None, "f64", none)
        + "\n"
        + _function("call_none_f32", None, "f32", [f for f in none if f.f32])
        + "\n"
        + _function("call_universe", "Universe<f64>", "f64", [f for f in fns if f.receiver == "universe"])
        + "\n"
        + _function("call_history", "ThermalHistory<f64>", "f64", [f for f in fns if f.receiver == "history"])
    )
    return {PATH: rustfmt(text)}
