"""Mechanical checks that the Python face matches the core's source and its own stubs:

* every public blackbody function of the core (read from src/blackbody/*.rs) has a function of
  the same name in relicore.blackbody with the same parameters in the same order, and the
  native table that names arguments in error messages agrees;
* every constant of src/constants.rs is in relicore.constants with the value of its literal;
* the package version is the core's;
* the hand-written .pyi stubs name exactly the public API, with the runtime's parameters.
"""

from __future__ import annotations

import ast
import importlib
import inspect
import pathlib
import re
import tomllib

import pytest

import relicore
from relicore import blackbody as bb
from relicore import constants as rc
from faces_table import native_blackbody

ROOT = pathlib.Path(__file__).resolve().parents[2]
PACKAGE = ROOT / "bindings" / "python" / "python" / "relicore"


def core_functions() -> dict[str, list[str]]:
    """name -> parameter names of every `pub fn` in src/blackbody/."""
    out = {}
    for path in sorted((ROOT / "src" / "blackbody").glob("*.rs")):
        # gradient.rs: the exact derivatives' first stage, Rust only until their gradient forms
        # exist in the faces (tests/coverage_guard.py holds them to vectors, benches, property
        # and threads tests)
        if path.name == "gradient.rs":
            continue
        text = path.read_text()
        for m in re.finditer(r"^pub fn (\w+)\s*(?:<[^>]*>)?\s*\(([^)]*)\)", text, flags=re.M):
            params = re.findall(r"(\w+)\s*:", m.group(2))
            out[m.group(1)] = params
    return out


ALL_CORE = core_functions()
# The array forms of the core (`<name>_array`) have no Python function of their own: a numpy
# array passed to `<name>` runs through them (tests/python/test_hypothesis_arrays.py).
CORE = {k: v for k, v in ALL_CORE.items() if not k.endswith("_array")}


# The frame forms with uncertainty of the core that give only T and u_c per pixel (the C and
# Fortran image forms): the Python call on arrays returns the coefficients too, so its image path
# is the budget frame form (`_budget_array`, a whole TemperatureUncertainty per pixel).
FRAMES_WITHOUT_PATH = {
    "object_temperature_wavelength_with_uncertainty_array",
    "object_temperature_frequency_with_uncertainty_array",
    "object_temperature_band_with_uncertainty_array",
}


def test_every_core_array_form_is_the_array_path_of_its_function():
    from faces_table import FRAME_FUNCTIONS
    from test_hypothesis_arrays import BLACKBODY

    arrays = {k for k in ALL_CORE if k.endswith("_array")}
    assert arrays, "no array forms found in src/blackbody"
    paths = {core for _, core, _ in BLACKBODY} | set(FRAME_FUNCTIONS.values())
    assert arrays == paths | FRAMES_WITHOUT_PATH, arrays ^ (paths | FRAMES_WITHOUT_PATH)
    budgets = {core: name for name, core in FRAME_FUNCTIONS.items()}
    for name in arrays:
        assert budgets.get(name, name[: -len("_array")]) in CORE, name


def test_core_has_functions():
    assert len(CORE) >= 30, CORE


@pytest.mark.parametrize("name", sorted(CORE))
def test_every_core_function_has_a_python_face(name):
    fn = getattr(bb, name, None)
    assert callable(fn), f"relicore.blackbody.{name} is missing"
    assert name in bb.__all__
    params = [
        p.name for p in inspect.signature(fn).parameters.values() if p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD
    ]
    assert params == CORE[name], f"{name}: Python {params}, core {CORE[name]}"


def test_native_argument_names_are_the_cores():
    native = native_blackbody()
    assert set(native) == set(CORE)
    for name, args in native.items():
        assert list(args) == CORE[name], f"{name}: native names {args}, core {CORE[name]}"


def test_public_api_is_exactly_the_cores_functions_and_the_calibration_class():
    assert sorted(bb.__all__) == sorted(set(CORE) | {"TwoLoadCalibration", "TemperatureUncertainty"})


def core_constants() -> dict[str, float]:
    text = (ROOT / "src" / "constants.rs").read_text()
    top, roots = text.split("pub mod roots", 1)
    pattern = r"pub const (\w+): f64 = ([^;]+);"
    out = {n: float(v.replace("_", "")) for n, v in re.findall(pattern, top)}
    out.update({f"roots.{n}": float(v.replace("_", "")) for n, v in re.findall(pattern, roots)})
    return out


CONSTANTS = core_constants()


@pytest.mark.parametrize("name", sorted(CONSTANTS))
def test_every_core_constant_is_exposed_with_its_value(name):
    obj = rc
    for part in name.split("."):
        obj = getattr(obj, part)
    assert obj == CONSTANTS[name], f"{name}: Python {obj!r}, src/constants.rs {CONSTANTS[name]!r}"


def test_no_constant_beyond_the_cores():
    exposed = {n for n in rc.__all__ if n != "roots"}
    exposed |= {f"roots.{n}" for n in vars(rc.roots) if n.isupper()}
    assert exposed == set(CONSTANTS)


def test_version_is_the_cores():
    cargo = tomllib.loads((ROOT / "Cargo.toml").read_text())
    assert relicore.__version__ == cargo["package"]["version"]


# --- stubs -----------------------------------------------------------------------------------

MODULES = ["relicore", "relicore.blackbody", "relicore.constants", "relicore.cosmology", "relicore.decoupling"]


def stub_of(module: str) -> ast.Module:
    rel = "__init__.pyi" if module == "relicore" else module.split(".", 1)[1] + ".pyi"
    return ast.parse((PACKAGE / rel).read_text())


def stub_names(tree: ast.Module) -> dict[str, ast.AST]:
    names: dict[str, ast.AST] = {}
    for node in tree.body:
        if isinstance(node, (ast.FunctionDef, ast.ClassDef)):
            names.setdefault(node.name, node)
        elif isinstance(node, ast.AnnAssign) and isinstance(node.target, ast.Name):
            names[node.target.id] = node
        elif isinstance(node, ast.Assign):
            names.update({t.id: node for t in node.targets if isinstance(t, ast.Name)})
        elif isinstance(node, ast.ImportFrom):
            for alias in node.names:
                if alias.asname is not None and alias.asname == alias.name:  # explicit re-export
                    names[alias.name] = node
    return names


@pytest.mark.parametrize("module", MODULES)
def test_stub_names_the_public_api(module):
    mod = importlib.import_module(module)
    names = stub_names(stub_of(module))
    public = set(mod.__all__)
    stubbed = {n for n in names if not n.startswith("_") or n in ("__version__",)}
    assert public <= stubbed, f"{module}: not in the stub: {sorted(public - stubbed)}"
    assert "__all__" in names, f"{module}: the stub does not declare __all__"
    declared = names["__all__"]
    if isinstance(declared, ast.Assign):
        assert sorted(ast.literal_eval(declared.value)) == sorted(public)
    for n in stubbed:
        assert hasattr(mod, n), f"{module}: the stub names {n}, the module has no such attribute"


def overloads(tree: ast.Module, name: str) -> list[ast.FunctionDef]:
    return [n for n in tree.body if isinstance(n, ast.FunctionDef) and n.name == name]


@pytest.mark.parametrize("name", sorted(n for n in bb.__all__ if inspect.isfunction(getattr(bb, n))))
def test_stub_signatures_match_the_functions(name):
    tree = stub_of("relicore.blackbody")
    sig = inspect.signature(getattr(bb, name))
    want_pos = [p.name for p in sig.parameters.values() if p.kind is inspect.Parameter.POSITIONAL_OR_KEYWORD]
    want_kw = {p.name: p.default for p in sig.parameters.values() if p.kind is inspect.Parameter.KEYWORD_ONLY}
    defs = overloads(tree, name)
    assert defs, f"no stub for {name}"
    for d in defs:
        pos = [a.arg for a in d.args.args]
        kw = {a.arg: ast.literal_eval(v) for a, v in zip(d.args.kwonlyargs, d.args.kw_defaults) if v is not None}
        assert pos == want_pos, f"{name} stub {pos} != {want_pos}"
        names = [a.arg for a in d.args.kwonlyargs]
        # the out= overload: out without a default
        assert kw == want_kw or ("out" in names and kw == {k: v for k, v in want_kw.items() if k != "out"}), (
            f"{name} stub keywords {kw} != {want_kw}"
        )
    if len(defs) > 1:
        assert all(any(isinstance(dec, ast.Name) and dec.id == "overload" for dec in d.decorator_list) for d in defs)


def test_stub_of_the_calibration_class():
    tree = stub_of("relicore.blackbody")
    cls = next(n for n in tree.body if isinstance(n, ast.ClassDef) and n.name == "TwoLoadCalibration")
    members = {n.name for n in cls.body if isinstance(n, ast.FunctionDef)}
    assert {"frequency_hz", "gain", "offset", "__new__", "__reduce__"} <= members
    for m in members:
        assert hasattr(bb.TwoLoadCalibration, m)
    new = next(n for n in cls.body if isinstance(n, ast.FunctionDef) and n.name == "__new__")
    assert [a.arg for a in new.args.args][1:] == ["frequency_hz", "gain", "offset"]
    assert bb.TwoLoadCalibration(frequency_hz=1.0, gain=2.0, offset=3.0).offset == 3.0


def test_stub_of_the_roots_namespace_and_the_error():
    tree = stub_of("relicore.constants")
    roots = next(n for n in tree.body if isinstance(n, ast.ClassDef) and n.name == "roots")
    stubbed = {n.target.id for n in roots.body if isinstance(n, ast.AnnAssign) and isinstance(n.target, ast.Name)}
    assert stubbed == {n for n in vars(rc.roots) if n.isupper()}
    tree = stub_of("relicore")
    err = next(n for n in tree.body if isinstance(n, ast.ClassDef) and n.name == "RelicoreError")
    attrs = {n.target.id for n in err.body if isinstance(n, ast.AnnAssign) and isinstance(n.target, ast.Name)}
    try:
        bb.spectral_radiance_wavelength(-1.0, 1.0)
    except relicore.RelicoreError as e:
        assert attrs == {"function", "argument", "index", "status"}
        for a in attrs:
            assert hasattr(e, a)


def test_py_typed_marker_is_installed():
    assert (pathlib.Path(relicore.__file__).parent / "py.typed").exists()
