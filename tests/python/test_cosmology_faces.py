"""Mechanical checks that relicore.Universe matches the core's source and its own stubs:

* every public method of the core's `Universe` (read from src/cosmology/*.rs) that takes
  arguments is a method of relicore.Universe with the same parameter names in the same order
  (plus the keyword nan_on_error), and the native table that names arguments in error
  messages agrees; every argument-free one is a read-only property;
* every field of the core's `UniverseParameters` is a keyword (or the two leading positional
  parameters) of the constructor and a read-only property, in the core's order (which is
  also the order of Error::InvalidParameter positions);
* the hand-written cosmology.pyi names exactly the public API with the runtime's signatures.
"""

from __future__ import annotations

import ast
import inspect
import pathlib
import re

import pytest

import relicore
from relicore import Universe
from relicore import cosmology
from faces_table import native_signatures

ROOT = pathlib.Path(__file__).resolve().parents[2]
STUB = ROOT / "bindings" / "python" / "python" / "relicore" / "cosmology.pyi"


def core_methods() -> dict[str, list[str]]:
    """name -> parameter names (after &self) of every `pub fn name(&self, ...)` in src/cosmology
    (the BAO distances of the growth topic live in src/cosmology/bao.rs)."""
    out = {}
    for path in sorted((ROOT / "src" / "cosmology").glob("*.rs")):
        # gradient.rs: the exact derivatives' first stage, Rust only until their gradient forms
        # exist in the faces (tests/coverage_guard.py holds them to vectors, benches, property
        # and threads tests)
        if path.name == "gradient.rs":
            continue
        for m in re.finditer(r"^\s*pub fn (\w+)\s*\(\s*&self\s*,?([^)]*)\)", path.read_text(), flags=re.M):
            # the array forms (`<name>_array`) are the array path of `<name>` in Python
            # (tests/python/test_hypothesis_arrays.py), not methods of their own
            if m.group(1).endswith("_array"):
                ARRAY_FORMS.add(m.group(1))
                continue
            out[m.group(1)] = re.findall(r"(\w+)\s*:", m.group(2))
    return out


ARRAY_FORMS: set[str] = set()


def test_every_core_array_form_is_the_array_path_of_its_method():
    from test_hypothesis_arrays import DISTANCES

    core_methods()
    assert ARRAY_FORMS == {core for _, core in DISTANCES}, ARRAY_FORMS
    for name in ARRAY_FORMS:
        assert name[: -len("_array")] in core_methods(), name


def core_parameter_fields() -> list[str]:
    text = (ROOT / "src" / "cosmology" / "universe.rs").read_text()
    body = re.search(r"pub struct UniverseParameters<T> \{(.*?)\n\}", text, flags=re.S)
    assert body, "UniverseParameters not found in src/cosmology/universe.rs"
    return re.findall(r"^\s*pub (\w+):", body.group(1), flags=re.M)


CORE = core_methods()
# `parameters()` returns the parameter set; Python gives it as a dict property
ELEMENTWISE = {n: a for n, a in CORE.items() if a}
CONSTANTS = sorted(n for n, a in CORE.items() if not a)


def test_core_has_methods():
    assert len(ELEMENTWISE) >= 24 and "parameters" in CONSTANTS, CORE


@pytest.mark.parametrize("name", sorted(ELEMENTWISE))
def test_every_core_method_has_a_python_method(name):
    fn = getattr(Universe, name, None)
    assert callable(fn), f"relicore.Universe.{name} is missing"
    params = list(inspect.signature(fn).parameters.values())
    positional = [p.name for p in params if p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD]
    assert positional == ["self", *ELEMENTWISE[name]], f"{name}: Python {positional}, core {ELEMENTWISE[name]}"
    keywords = {p.name: p.default for p in params if p.kind is inspect.Parameter.KEYWORD_ONLY}
    assert keywords == {"nan_on_error": False, "out": None}


@pytest.mark.parametrize("name", CONSTANTS)
def test_every_core_constant_is_a_read_only_property(name):
    attr = inspect.getattr_static(Universe, name)
    assert not callable(attr) or isinstance(attr, property) or type(attr).__name__ == "getset_descriptor", name
    u = Universe(70.0, 0.3)
    value = getattr(u, name)
    assert isinstance(value, dict if name == "parameters" else float)
    with pytest.raises(AttributeError):
        setattr(u, name, value)


def test_native_argument_names_are_the_cores():
    # the Universe methods of the growth topic (BAO distances) are methods too
    regular = {**native_signatures("cosmology", "universe"), **native_signatures("growth", "universe")}
    native = {n: a for n, a in regular.items() if a}
    assert set(native) == set(ELEMENTWISE)
    # the argument-free ones are the core's constants (`parameters` is the native base's own)
    assert set(regular) - set(native) == set(CONSTANTS) - {"parameters"}
    for name, args in native.items():
        assert list(args) == ELEMENTWISE[name], f"{name}: native names {args}, core {ELEMENTWISE[name]}"


def test_no_public_method_beyond_the_cores():
    public = {n for n in dir(Universe) if not n.startswith("_")}
    fields = set(core_parameter_fields())
    assert public == set(ELEMENTWISE) | set(CONSTANTS) | fields, sorted(public ^ (set(CORE) | fields))


def test_constructor_parameters_are_the_core_fields_in_order():
    fields = core_parameter_fields()
    assert len(fields) == 10
    sig = list(inspect.signature(Universe).parameters)
    assert sig == fields
    for f in fields:
        assert isinstance(inspect.getattr_static(Universe, f), type(inspect.getattr_static(Universe, "w0")))


def test_error_positions_name_the_fields():
    # Error::InvalidParameter(i) names the i-th field of UniverseParameters: a bad value of each
    # field, one at a time, is reported under that field's name
    bad = {
        "h0_km_s_mpc": -1.0,
        "omega_matter": -1.0,
        "omega_baryon": -1.0,
        "omega_curvature": float("nan"),
        "cmb_temperature_k": -1.0,
        "n_eff": -1.0,
        "neutrino_masses_ev": (-1.0, 0.0, 0.0),
        "w0": float("inf"),
        "wa": float("nan"),
        "helium_mass_fraction": 2.0,
    }
    assert list(bad) == core_parameter_fields()
    for field, value in bad.items():
        kwargs = {"h0_km_s_mpc": 70.0, "omega_matter": 0.3, field: value}
        with pytest.raises(relicore.RelicoreError) as info:
            Universe(**kwargs)
        assert info.value.argument == field and info.value.status == -14


# --- the stub -----------------------------------------------------------------------------


def stub_class() -> ast.ClassDef:
    tree = ast.parse(STUB.read_text())
    return next(n for n in tree.body if isinstance(n, ast.ClassDef) and n.name == "Universe")


def test_stub_declares_all_and_the_class():
    tree = ast.parse(STUB.read_text())
    names = {n.target.id for n in tree.body if isinstance(n, ast.AnnAssign) and isinstance(n.target, ast.Name)}
    assert "__all__" in names
    assert cosmology.__all__ == ["Universe"]


def test_stub_names_exactly_the_public_members():
    cls = stub_class()
    stubbed = {n.name for n in cls.body if isinstance(n, ast.FunctionDef) and not n.name.startswith("_")}
    public = {n for n in dir(Universe) if not n.startswith("_")}
    assert stubbed == public, sorted(stubbed ^ public)


@pytest.mark.parametrize("name", sorted(ELEMENTWISE))
def test_stub_signatures_match_the_methods(name):
    defs = [n for n in stub_class().body if isinstance(n, ast.FunctionDef) and n.name == name]
    assert len(defs) == 3, f"{name}: want a scalar, an array and an out= overload"
    for d in defs:
        assert any(isinstance(x, ast.Name) and x.id == "overload" for x in d.decorator_list)
        assert [a.arg for a in d.args.args] == ["self", *ELEMENTWISE[name]]
        kw = {a.arg: ast.literal_eval(v) for a, v in zip(d.args.kwonlyargs, d.args.kw_defaults) if v is not None}
        assert {k: v for k, v in kw.items() if k != "out"} == {"nan_on_error": False}
        assert [a.arg for a in d.args.kwonlyargs] == ["nan_on_error", "out"]


def test_stub_constructor_matches_the_runtime():
    new = next(n for n in stub_class().body if isinstance(n, ast.FunctionDef) and n.name == "__new__")
    sig = inspect.signature(Universe)
    assert [a.arg for a in new.args.args][1:] == [p for p in sig.parameters][:2]
    stub_kw = {a.arg: ast.literal_eval(v) for a, v in zip(new.args.kwonlyargs, new.args.kw_defaults)}
    runtime_kw = {p.name: p.default for p in sig.parameters.values() if p.kind is inspect.Parameter.KEYWORD_ONLY}
    assert stub_kw == runtime_kw


def test_stub_properties_are_properties():
    for n in stub_class().body:
        if isinstance(n, ast.FunctionDef) and n.name in set(CONSTANTS) | set(core_parameter_fields()):
            assert any(isinstance(x, ast.Name) and x.id == "property" for x in n.decorator_list), n.name
