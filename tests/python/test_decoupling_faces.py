"""Mechanical checks that relicore.decoupling matches the core's source and its own stubs:

* every public free function of src/decoupling/*.rs is a function of relicore.decoupling with
  the same parameter names in the same order (plus the keyword nan_on_error), and the native
  tables that name arguments in error messages agree;
* every public method of the core's `ThermalHistory` that takes a redshift is a method of
  relicore.decoupling.ThermalHistory with the same parameters, and every argument-free one a
  read-only property; the constructor's keywords are the fields of `HistoryOptions` in order;
* every public constant of src/decoupling/ is exposed with its value;
* the hand-written decoupling.pyi names exactly the public API with the runtime's signatures.
"""

from __future__ import annotations

import ast
import inspect
import pathlib
import re

import pytest

from relicore import ThermalHistory
from relicore import decoupling as dc
from faces_table import native_signatures

ROOT = pathlib.Path(__file__).resolve().parents[2]
SRC = ROOT / "src" / "decoupling"
STUB = ROOT / "bindings" / "python" / "python" / "relicore" / "decoupling.pyi"


def _sources() -> list[str]:
    return [p.read_text() for p in sorted(SRC.glob("*.rs"))]


def core_functions() -> dict[str, list[str]]:
    """name -> parameter names of every `pub fn` at the start of a line in src/decoupling."""
    out = {}
    for text in _sources():
        for m in re.finditer(r"^pub fn (\w+)\s*(?:<[^>]*>)?\s*\(([^)]*)\)", text, flags=re.M):
            out[m.group(1)] = re.findall(r"(\w+)\s*:", m.group(2))
    return out


def core_methods() -> dict[str, list[str]]:
    """name -> parameter names (after &self) of every `pub fn name(&self, ...)` of the history."""
    text = (SRC / "history.rs").read_text()
    out = {}
    for m in re.finditer(r"^    pub fn (\w+)\s*\(\s*&self\s*,?([^)]*)\)", text, flags=re.M):
        out[m.group(1)] = re.findall(r"(\w+)\s*:", m.group(2))
    return out


def core_option_fields() -> list[str]:
    text = (SRC / "history.rs").read_text()
    body = re.search(r"pub struct HistoryOptions<T> \{(.*?)\n\}", text, flags=re.S)
    assert body, "HistoryOptions not found in src/decoupling/history.rs"
    return re.findall(r"^\s*pub (\w+):", body.group(1), flags=re.M)


def core_constants() -> dict[str, float]:
    out = {}
    for text in _sources():
        for name, value in re.findall(r"^pub const (\w+): (?:f64|usize) = ([^;]+);", text, flags=re.M):
            out[name] = float(value.replace("_", ""))
    return out


FUNCTIONS = core_functions()
METHODS = core_methods()
QUERIES = {n: a for n, a in METHODS.items() if a}
SUMMARY = sorted(n for n, a in METHODS.items() if not a)
CONSTANTS = core_constants()


def test_the_core_has_what_the_design_names():
    # Saha, two fits, five queries, ten summary values
    assert set(FUNCTIONS) == {"saha_ionized_fraction", "last_scattering_redshift_fit", "drag_redshift_fit"}
    assert len(QUERIES) == 5 and len(SUMMARY) == 10, METHODS


@pytest.mark.parametrize("name", sorted(FUNCTIONS))
def test_every_core_function_has_a_python_function(name):
    fn = getattr(dc, name, None)
    assert callable(fn) and name in dc.__all__, f"relicore.decoupling.{name} is missing"
    params = list(inspect.signature(fn).parameters.values())
    positional = [p.name for p in params if p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD]
    assert positional == FUNCTIONS[name], f"{name}: Python {positional}, core {FUNCTIONS[name]}"
    assert {p.name: p.default for p in params if p.kind is inspect.Parameter.KEYWORD_ONLY} == {"nan_on_error": False, "out": None}


def test_native_argument_names_are_the_cores():
    fits = native_signatures("decoupling", "none")
    assert set(fits) == set(FUNCTIONS) - {"saha_ionized_fraction"}
    for name, args in fits.items():
        assert list(args) == FUNCTIONS[name], name
    # the core's error positions of saha_ionized_fraction count the universe (argument 0)
    assert native_signatures("decoupling", "universe") == {"saha_ionized_fraction": tuple(FUNCTIONS["saha_ionized_fraction"][1:])}
    history = native_signatures("decoupling", "history")
    queries = {n: a for n, a in history.items() if a}
    assert set(queries) == set(QUERIES)
    assert set(history) - set(queries) == set(SUMMARY)
    for name, args in queries.items():
        assert list(args) == QUERIES[name], name


@pytest.mark.parametrize("name", sorted(QUERIES))
def test_every_core_query_is_a_method(name):
    fn = getattr(ThermalHistory, name, None)
    assert callable(fn), f"ThermalHistory.{name} is missing"
    params = list(inspect.signature(fn).parameters.values())
    positional = [p.name for p in params if p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD]
    assert positional == ["self", *QUERIES[name]]
    assert {p.name: p.default for p in params if p.kind is inspect.Parameter.KEYWORD_ONLY} == {"nan_on_error": False, "out": None}


@pytest.mark.parametrize("name", SUMMARY)
def test_every_core_summary_value_is_a_read_only_property(name):
    assert inspect.isdatadescriptor(inspect.getattr_static(ThermalHistory, name)), name


def test_constructor_keywords_are_the_option_fields_in_order():
    sig = list(inspect.signature(ThermalHistory).parameters)
    assert sig == ["universe", *core_option_fields()]


def test_no_public_member_beyond_the_cores():
    public = {n for n in dir(ThermalHistory) if not n.startswith("_")}
    inputs = {"universe", *core_option_fields()}
    assert public == set(QUERIES) | set(SUMMARY) | inputs, sorted(public ^ (set(METHODS) | inputs))


@pytest.mark.parametrize("name", sorted(CONSTANTS))
def test_every_core_constant_is_exposed_with_its_value(name):
    assert getattr(dc, name) == CONSTANTS[name] and name in dc.__all__


def test_public_api_is_exactly_the_cores():
    assert set(dc.__all__) == set(FUNCTIONS) | set(CONSTANTS) | {"ThermalHistory"}


# --- the stub -------------------------------------------------------------------------------


def stub_tree() -> ast.Module:
    return ast.parse(STUB.read_text())


def stub_class() -> ast.ClassDef:
    return next(n for n in stub_tree().body if isinstance(n, ast.ClassDef) and n.name == "ThermalHistory")


def test_stub_names_exactly_the_module_and_the_class():
    tree = stub_tree()
    top = {n.name for n in tree.body if isinstance(n, (ast.FunctionDef, ast.ClassDef))}
    top |= {n.target.id for n in tree.body if isinstance(n, ast.AnnAssign) and isinstance(n.target, ast.Name)}
    assert {n for n in top if not n.startswith("_")} == set(dc.__all__)
    members = {n.name for n in stub_class().body if isinstance(n, ast.FunctionDef) and not n.name.startswith("_")}
    assert members == {n for n in dir(ThermalHistory) if not n.startswith("_")}


@pytest.mark.parametrize("name", sorted(FUNCTIONS))
def test_stub_signatures_of_the_functions(name):
    defs = [n for n in stub_tree().body if isinstance(n, ast.FunctionDef) and n.name == name]
    assert len(defs) == 3, f"{name}: want a scalar, an array and an out= overload"
    for d in defs:
        assert any(isinstance(x, ast.Name) and x.id == "overload" for x in d.decorator_list)
        assert [a.arg for a in d.args.args] == FUNCTIONS[name]
        kw = {a.arg: ast.literal_eval(v) for a, v in zip(d.args.kwonlyargs, d.args.kw_defaults) if v is not None}
        assert {k: v for k, v in kw.items() if k != "out"} == {"nan_on_error": False}
        assert [a.arg for a in d.args.kwonlyargs] == ["nan_on_error", "out"]


@pytest.mark.parametrize("name", sorted(QUERIES))
def test_stub_signatures_of_the_queries(name):
    defs = [n for n in stub_class().body if isinstance(n, ast.FunctionDef) and n.name == name]
    assert len(defs) == 3, f"{name}: want a scalar, an array and an out= overload"
    for d in defs:
        assert [a.arg for a in d.args.args] == ["self", *QUERIES[name]]
        kw = {a.arg: ast.literal_eval(v) for a, v in zip(d.args.kwonlyargs, d.args.kw_defaults) if v is not None}
        assert {k: v for k, v in kw.items() if k != "out"} == {"nan_on_error": False}
        assert [a.arg for a in d.args.kwonlyargs] == ["nan_on_error", "out"]


def test_stub_constructor_and_properties_match_the_runtime():
    body = stub_class().body
    new = next(n for n in body if isinstance(n, ast.FunctionDef) and n.name == "__new__")
    assert [a.arg for a in new.args.args] == ["cls", "universe"]
    stub_kw = {a.arg: ast.literal_eval(v) for a, v in zip(new.args.kwonlyargs, new.args.kw_defaults)}
    runtime = inspect.signature(ThermalHistory).parameters.values()
    assert stub_kw == {p.name: p.default for p in runtime if p.kind is inspect.Parameter.KEYWORD_ONLY}
    for n in body:
        if isinstance(n, ast.FunctionDef) and n.name in set(SUMMARY) | {"universe", *core_option_fields()}:
            assert any(isinstance(x, ast.Name) and x.id == "property" for x in n.decorator_list), n.name
