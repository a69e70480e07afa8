"""The Python face's per-function parts, from the table and the core's rustdoc:

* bindings/python/src/generated.rs: the native tables of the regular functions (one per
  receiver) and the SIMD array wrappers, read by the hand-kept `functions.rs`;
* bindings/python/python/relicore/_blackbody.py, _cosmology.py, _decoupling.py: the wrappers
  (functions, and the methods and properties of the mixins `UniverseFunctions` and
  `ThermalHistoryFunctions`) with the core's rustdoc as docstrings, imported by the hand-kept
  public modules;
* bindings/python/python/relicore/blackbody.pyi, cosmology.pyi, decoupling.pyi: the stubs, the
  irregular parts (classes, constructors, response and calibration functions) from the
  templates below.
"""

from __future__ import annotations

import re

from .common import banner
from .rustdoc import find
from .table import RECEIVERS, ROOT, Function, table_functions

PY = ROOT / "bindings" / "python"
PACKAGE = PY / "python" / "relicore"


def python_class(receiver: str) -> str:
    """The Python class of a receiver (the table's `python_class`)."""
    return RECEIVERS[receiver].python_class

CORE_PATH = {"blackbody": "relicore::blackbody", "cosmology": "relicore::cosmology", "decoupling": "relicore::decoupling",
             "growth": "relicore::growth"}

# The Python module whose class a receiver's methods and properties join (the Universe methods
# of the growth topic are methods of relicore.Universe, written into _cosmology.py).
RECEIVER_HOME = {"universe": "cosmology", "history": "decoupling", "growth": "growth", "power_spectrum": "growth"}
# The Rust name of each receiver's value in the native tables (functions.rs) and in the closures.
RECEIVER_RUST = {"none": ("()", "_"), "universe": ("U", "u"), "history": ("H", "h"), "growth": ("G", "g"),
                 "power_spectrum": ("S", "p")}


def home(fn: Function) -> str:
    """The Python module of a function (its topic) or of its receiver's class (a member)."""
    return fn.topic if fn.python == "function" else RECEIVER_HOME[fn.receiver]


def label(fn: Function) -> str:
    """How the messages name the function."""
    if fn.python == "function":
        return fn.name
    return f"{python_class(fn.receiver)}.{fn.name}"


def python_args(fn: Function) -> list[str]:
    """The Python parameters before the keyword nan_on_error (self excluded)."""
    lead = [fn.receiver] if fn.python == "function" and fn.receiver != "none" else []
    return [*lead, *fn.arg_names]


# --------------------------------------------------------------------------------- Rust


def _slice_call(fn: Function, call: str) -> str:
    """A closure body taking the element-wise values as a slice (more than 4 arguments, or a
    row result): the core call when the slice has the function's arity."""
    names = ", ".join(fn.arg_names)
    return f"match *x {{ [{names}] => {call}, _ => Err(Error::LengthMismatch(relicore::arg!(0, arguments))) }}"


def _row_function(rt, real: str = "f64") -> str:
    """`<result>_row` (`_row_f32`): a result value as one row of f64 (f32) (the fields in order; a
    count as a float), by one pattern over the row (straight stores, no iterator chain: the frame
    forms write a million rows)."""
    slots, stores = [], []
    for f in rt.fields:
        if f.kind == "count":
            slots.append(f"{f.name}")
            value = f"f64::from(v.{f.name})" if real == "f64" else f"v.{f.name} as f32"
            stores.append(f"*{f.name} = {value};")
        elif f.length > 1:
            names = [f"{f.name}_{k}" for k in range(f.length)]
            slots += names
            stores.append(f"[{', '.join('*' + n for n in names)}] = v.{f.name};")
        else:
            slots.append(f.name)
            stores.append(f"*{f.name} = v.{f.name};")
    suffix = "" if real == "f64" else "_f32"
    body = "\n".join(f"        {x}" for x in stores)
    return (
        f"/// A `{rt.core_type}` as one row of {rt.width} {real} (its fields in order; `inputs` as a float).\n"
        f"#[inline(always)]\n"
        f"fn {rt.name}_row{suffix}(v: {rt.core_path}<{real}>, out: &mut [{real}]) {{\n"
        f"    if let [{', '.join(slots)}] = out {{\n{body}\n    }}\n}}"
    )


def _rust_frame(fn: Function, real: str = "f64") -> str:
    """The frame wrapper of `fn` in `real`: its first `frame` arguments single values, the others
    slices; the core's frame form in the widest SIMD compilation. A function with a result type
    writes rows through `rows_frame` (the core's frame form fills one value per element)."""
    k = fn.frame
    suffix = "" if real == "f64" else "_f32"
    names = fn.arg_names
    lines = ["#[allow(clippy::too_many_arguments)]",
             f"fn {fn.name}_frame{suffix}(x: &[&[{real}]], out: &mut [{real}]) -> ArrayResult {{"]
    lines.append(f"    let &[{', '.join(names)}] = x else {{")
    lines.append("        return Err(ElementError { index: 0, error: Error::LengthMismatch(relicore::arg!(0, arguments)) });")
    lines.append("    };")
    for a in names[:k]:
        lines.append(f"    let {a} = {a}.first().copied().unwrap_or({real}::NAN);")
    core = f"{CORE_PATH[fn.topic]}::{fn.frame_function}"
    params = [f"{a}: {real}" for a in names[:k]] + [f"{a}: &[{real}]" for a in names[k:]]
    rt = fn.result_type
    if rt:
        params.append(f"o: &mut [{rt.core_path}<{real}>]")
        sliced = ", ".join(names[k:])
        lines.append(f"    rows_frame([{sliced}], out, {rt.width}, |[{sliced}], o| {{")
        lines.append(f"        widest!(|{', '.join(params)}| -> ArrayResult {{ {core}({', '.join(names)}, o) }})")
        lines.append(f"    }}, {rt.name}_row{suffix})")
    else:
        params.append(f"out: &mut [{real}]")
        lines.append(f"    widest!(|{', '.join(params)}| -> ArrayResult {{ {core}({', '.join(names)}, out) }})")
    lines.append("}")
    return "\n".join(lines)


def _rust_body(fn: Function) -> str:
    n = len(fn.args)
    if fn.result_type:
        call = f"{CORE_PATH[fn.topic]}::{fn.name}({', '.join(fn.arg_names)}).map(|v| {fn.result_type.name}_row(v, out))"
        return f"Body::Row(|_, x, out| {_slice_call(fn, call)})"
    if n > 4:
        assert fn.receiver == "none", fn.name
        call = f"{CORE_PATH[fn.topic]}::{fn.name}({', '.join(fn.arg_names)})"
        return f"Body::AN(|_, x| {_slice_call(fn, call)})"
    r = RECEIVER_RUST[fn.receiver][1]
    params = ", ".join([r, *fn.arg_names])
    if fn.receiver == "none":
        call = f"{CORE_PATH[fn.topic]}::{fn.name}({', '.join(fn.arg_names)})"
    elif fn.core:
        topic, _, name = fn.core.partition("::")
        call = f"{CORE_PATH[topic]}::{name}({', '.join([r, *fn.arg_names])})"
    else:
        call = f"{r}.{fn.name}({', '.join(fn.arg_names)})"
    return f"Body::A{n}(|{params}| {call}.lift())"


def _rust_array(fn: Function) -> str:
    """The SIMD array wrapper of `fn` (its first argument an array, the others single values)."""
    assert fn.array and fn.array.index(fn) == 0, f"{fn.name}: the SIMD array argument must come first"
    core = RECEIVER_RUST[fn.receiver][0]
    others = fn.arg_names[1:]
    lines = [f"fn {fn.name}_array(r: &{core}, x: &[f64], rest: &[f64], out: &mut [f64]) -> ArrayResult {{"]
    if others:
        lines.append("    let mut rest = rest.iter().copied();")
        for a in others:
            lines.append(f"    let {a} = rest.next().unwrap_or(f64::NAN);")
    else:
        lines.append("    let _ = rest;")
    sig = [f"r: &{core}", "x: &[f64]", *[f"{a}: f64" for a in others], "out: &mut [f64]"]
    if fn.receiver == "none":
        lines.append("    let _ = r;")
        sig.pop(0)
        call = f"{CORE_PATH[fn.topic]}::{fn.name}_array(x, {''.join(a + ', ' for a in others)}out)"
    else:
        call = f"r.{fn.name}_array(x, {''.join(a + ', ' for a in others)}out)"
    lines.append(f"    widest!(|{', '.join(sig)}| -> ArrayResult {{ {call} }})")
    lines.append("}")
    return "\n".join(lines)


def _rust_array_f32(fn: Function) -> str:
    """The SIMD array wrapper of the single-precision twin (array_f32: first argument an array,
    the others single values)."""
    others = fn.arg_names[1:]
    lines = [f"fn {fn.name}_array_f32(x: &[f32], rest: &[f32], out: &mut [f32]) -> ArrayResult {{"]
    if others:
        lines.append("    let mut rest = rest.iter().copied();")
        for a in others:
            lines.append(f"    let {a} = rest.next().unwrap_or(f32::NAN);")
    else:
        lines.append("    let _ = rest;")
    sig = ["x: &[f32]", *[f"{a}: f32" for a in others], "out: &mut [f32]"]
    call = f"{CORE_PATH[fn.topic]}::{fn.name}_array(x, {''.join(a + ', ' for a in others)}out)"
    lines.append(f"    widest!(|{', '.join(sig)}| -> ArrayResult {{ {call} }})")
    lines.append("}")
    return "\n".join(lines)


def has_single(fn: Function) -> bool:
    """Whether the Python face computes float32 input with the core's single-precision twin: a
    function with `f32 = true` called on nothing."""
    return fn.f32 and fn.receiver == "none"


def _rust_single(fn: Function) -> str:
    """The core's single-precision twin as a `Single` (and its SIMD array form with array_f32)."""
    if not has_single(fn):
        return "None"
    call = f"{CORE_PATH[fn.topic]}::{fn.name}({', '.join(fn.arg_names)})"
    frame = f"Some({fn.name}_frame_f32)" if fn.frame else "None"
    if fn.result_type:
        call += f".map(|v| {fn.result_type.name}_row_f32(v, out))"
        return (f"Some(Single {{ body: SingleBody::Row(|x, out| {_slice_call(fn, call)}), array: None, "
                f"frame: {frame} }})")
    array = f"Some({fn.name}_array_f32)" if fn.array_f32 and fn.array and fn.array.simd else "None"
    return (f"Some(Single {{ body: SingleBody::Number(|x| {_slice_call(fn, call)}), array: {array}, "
            f"frame: {frame} }})")


def _rust_spec(fn: Function) -> str:
    args = ", ".join(f'"{a}"' for a in fn.arg_names)
    array = f"Some({fn.name}_array)" if fn.array and fn.array.simd else "None"
    frame = f"Some(({fn.frame}, {fn.name}_frame))" if fn.frame else "None"
    width = fn.result_type.width if fn.result_type else 1
    return (
        "    Spec {\n"
        f'        name: "{fn.name}",\n'
        f'        topic: "{fn.topic}",\n'
        f'        label: "{label(fn)}",\n'
        f"        args: &[{args}],\n"
        f"        free: {'true' if fn.core else 'false'},\n"
        f"        body: {_rust_body(fn)},\n"
        f"        array: {array},\n"
        f"        frame: {frame},\n"
        f"        width: {width},\n"
        f"        single: {_rust_single(fn)},\n"
        "    },"
    )


def rust(fns: list[Function]) -> str:
    out = [
        banner("//", "the native tables of the regular functions of the Python face, one per receiver"),
        "//! The regular functions as `functions.rs` calls them: name, topic, how messages name them,",
        "//! element-wise parameters, the core call and the SIMD array form where there is one.",
        "",
        "use relicore::{ArrayResult, ElementError, Error};",
        "use relicore_dispatch::widest;",
        "",
        "use crate::functions::{Body, G, H, Lift, S, Single, SingleBody, Spec, U};",
        "use crate::kernels::rows_frame;",
        "use crate::thermometry::TableRowFn;",
    ]
    for receiver, static, core in (("none", "PLAIN", "()"), ("universe", "UNIVERSE", "U"), ("history", "HISTORY", "H"),
                                   ("growth", "GROWTH", "G"), ("power_spectrum", "SPECTRUM", "S")):
        group = [f for f in fns if f.receiver == receiver]
        out += ["", f"/// The regular functions called on {'nothing' if receiver == 'none' else 'a ' + receiver}.",
                f"pub(crate) static {static}: &[Spec<{core}>] = &["]
        out += [_rust_spec(f) for f in group]
        out.append("];")
    for f in fns:
        if f.array and f.array.simd:
            out += ["", f"/// `{f.name}_array` of the core, compiled for each SIMD level and chosen at run time.",
                    _rust_array(f)]
    for f in fns:
        if has_single(f) and f.array_f32 and f.array and f.array.simd:
            out += ["", f"/// `{f.name}_array` of the core in single precision, compiled for each SIMD level and chosen at run time.",
                    _rust_array_f32(f)]
    for f in fns:
        if f.frame:
            out += ["", f"/// `{f.frame_function}` of the core (a frame: the first {f.frame} argument(s) single values, "
                    "the others slices of the chunk's length or of one value).", _rust_frame(f)]
            if has_single(f):
                out += ["", f"/// `{f.frame_function}` of the core in single precision.", _rust_frame(f, "f32")]
    for rt in dict.fromkeys(f.result_type for f in fns if f.result_type):
        out += ["", _row_function(rt)]
    out += _rust_tables()
    for rt in dict.fromkeys(f.result_type for f in fns if f.result_type and has_single(f)):
        out += ["", _row_function(rt, "f32")]
    return "\n".join(out) + "\n"


def _rust_tables() -> list[str]:
    """The response-table functions ([[table_function]]) as `thermometry.rs` calls them: name,
    element-wise parameters (after the two tables), floats per element, the core call."""
    out = []
    for tf in table_functions():
        rt = tf.result_type
        put = f"{rt.name}_row(v, out)" if rt else "if let Some(o) = out.first_mut() { *o = v }"
        out += ["", f"/// `relicore::blackbody::{tf.name}` on the two tables and one element's values.",
                f"fn {tf.name}_table(w: &[f64], r: &[f64], x: &[f64], out: &mut [f64]) -> relicore::Result<()> {{",
                f"    match *x {{ [{', '.join(tf.args)}] => relicore::blackbody::{tf.name}(w, r, {', '.join(tf.args)})"
                f".map(|v| {put}), _ => Err(Error::LengthMismatch(relicore::arg!(2, values))) }}", "}"]
    rows = [f'    ("{tf.name}", &[{", ".join(chr(34) + a + chr(34) for a in tf.args)}], '
            f"{tf.result_type.width if tf.result_type else 1}, {tf.name}_table)," for tf in table_functions()]
    return out + ["", "/// The response-table functions: name, element-wise parameters (after the two tables), floats",
                  "/// per element, the core call.",
                  "#[allow(clippy::type_complexity)]",
                  "pub(crate) static TABLE_FUNCTIONS: &[(&str, &[&str], usize, TableRowFn)] = &["] + rows + ["];"]


def tables_python() -> str:
    """relicore/_tables.py: the Python wrappers of the response-table functions."""
    out = [banner("#", "the response-table functions of relicore.blackbody"),
           '"""The response-table functions of relicore.blackbody ([[table_function]] entries of the '
           'table), imported by relicore._thermometry."""', "", "from __future__ import annotations", "",
           "from typing import Any", "", "from relicore._elementwise import table_call as _table_call",
           "from relicore._results import TemperatureUncertainty", "",
           f"__all__ = {[tf.name for tf in table_functions()]!r}"]
    for tf in table_functions():
        params = ["wavelengths_m: Any", "response_table: Any"] + [f"{a}: Any" for a in tf.args]
        width = tf.result_type.width if tf.result_type else 1
        ret = tf.result_type.python_type if tf.result_type else "Any"
        out += ["", "", f"def {tf.name}(", f"    {', '.join(params)}, *, nan_on_error: bool = False,",
                f") -> {ret}:", f'    """{tf.python_doc}"""',
                f"    return _table_call({tf.name!r}, {tuple(tf.args)!r}, wavelengths_m, response_table, "
                f"({', '.join(tf.args)},), nan_on_error, {width})"]
    return "\n".join(out) + "\n"


def tables_stub() -> list[str]:
    """The stubs of the response-table functions (scalar and array overloads; one signature for
    a result type)."""
    out = []
    for tf in table_functions():
        head = f"def {tf.name}(wavelengths_m: ArrayLike, response_table: ArrayLike, "
        if tf.result_type:
            args = ", ".join(f"{a}: ArrayLike" for a in tf.args)
            out.append(f"{head}{args}, *, nan_on_error: bool = False) -> {tf.result_type.python_type}: ...")
            continue
        for kind, result, tail in (("_Scalar", "float", "  # type: ignore[overload-overlap]"), ("ArrayLike", "_Array", "")):
            args = ", ".join(f"{a}: {kind}" for a in tf.args)
            out += ["@overload", f"{head}{args}, *, nan_on_error: bool = False) -> {result}: ...{tail}"]
    return out


# ------------------------------------------------------------------------------- Python


def _python_paths(text: str) -> str:
    """The core's paths in code spans as Python spells them (`Type::method` -> `Type.method`):
    help() of a Python class names no Rust item."""
    return re.sub(r"`([A-Za-z_][\w:]*::\w+)`", lambda m: "`" + m.group(1).replace("::", ".") + "`", text)


def _docstring(fn: Function, indent: str) -> str:
    _, doc = find(fn)
    text = _python_paths("\n".join(doc).strip()).replace("\\", "\\\\")
    assert '"""' not in text, fn.name
    lines = text.split("\n")
    body = "\n".join((indent + line) if line.strip() else "" for line in lines[1:])
    if len(lines) == 1:
        return f'{indent}"""{lines[0]}"""'
    return f'{indent}"""{lines[0]}\n{body}\n{indent}"""'


def _py_function(fn: Function) -> str:
    params = ", ".join(f"{a}: Any" for a in python_args(fn))
    receiver = fn.receiver if fn.receiver != "none" else "None"
    values = "".join(f"{a}, " for a in fn.arg_names)
    if fn.result_type:
        cls = fn.result_type.python_type
        return (
            f"def {fn.name}({params}, *, nan_on_error: bool = False) -> _results.{cls}:\n"
            f"{_docstring(fn, '    ')}\n"
            f'    return _apply_result(_F["{fn.name}"], {receiver}, ({values}), nan_on_error, _results.{cls})\n'
        )
    return (
        f"def {fn.name}({params}, *, nan_on_error: bool = False, out: Any = None) -> Any:\n"
        f"{_docstring(fn, '    ')}\n"
        f'    return _F["{fn.name}"].apply({receiver}, ({values}), nan_on_error, out)\n'
    )


def _py_member(fn: Function) -> str:
    if fn.python == "property":
        return (
            "    @property\n"
            f"    def {fn.name}(self) -> float:\n"
            f"{_docstring(fn, '        ')}\n"
            f'        return _F["{fn.name}"].call(self, ())\n'
        )
    params = ", ".join(f"{a}: Any" for a in fn.arg_names)
    values = "".join(f"{a}, " for a in fn.arg_names)
    return (
        f"    def {fn.name}(self, {params}, *, nan_on_error: bool = False, out: Any = None) -> Any:\n"
        f"{_docstring(fn, '        ')}\n"
        f'        return _F["{fn.name}"].apply(self, ({values}), nan_on_error, out)\n'
    )


MODULE_DOC = {
    "blackbody": "The regular functions of relicore.blackbody",
    "cosmology": "The methods and properties of relicore.Universe (the mixin UniverseFunctions)",
    "decoupling": "The regular functions of relicore.decoupling and the methods and properties of "
    "relicore.decoupling.ThermalHistory (the mixin ThermalHistoryFunctions)",
    "growth": "The regular functions of relicore.growth and the methods and properties of "
    "relicore.growth.LinearGrowth and LinearPowerSpectrum (the mixins LinearGrowthFunctions and "
    "LinearPowerSpectrumFunctions)",
}


def python_module(topic: str, fns: list[Function]) -> str:
    public = f"relicore.{topic}"
    functions = [f for f in fns if f.topic == topic and f.python == "function"]
    members: dict[str, list[Function]] = {}
    for f in fns:
        if home(f) == topic and f.python != "function":
            members.setdefault(f.receiver, []).append(f)
    out = [
        banner("#", f"the regular functions of {public}"),
        f'"""{MODULE_DOC[topic]}, imported by {public}; their conventions are in its docstring."""',
        "",
        "from __future__ import annotations",
        "",
        "from typing import Any",
        "",
        "from relicore._elementwise import FUNCTIONS as _F",
        "from relicore._elementwise import publish as _publish",
        *(["from relicore import _results", "from relicore._elementwise import apply_result as _apply_result"]
          if any(f.result_type for f in functions) else []),
        "",
        f"__all__ = {[f.name for f in functions] + [python_class(r) + 'Functions' for r in members]!r}",
    ]
    for f in functions:
        out += ["", "", _py_function(f).rstrip("\n")]
    for receiver, group in members.items():
        cls = python_class(receiver)
        out += [
            "",
            "",
            f"class {cls}Functions:",
            f'    """The regular methods and properties of {cls}."""',
            "",
            "    __slots__ = ()",
        ]
        for f in group:
            out += ["", _py_member(f).rstrip("\n")]
    out += ["", ""]
    names = [f.name for f in functions]
    if names:
        out.append(f"_publish([{', '.join(names)}], {public!r})")
    for receiver in members:
        cls = python_class(receiver)
        out.append(f"_publish({cls}Functions, {public!r}, {cls!r})")
    return "\n".join(out) + "\n"


# -------------------------------------------------------------------------------- stubs

STUB_HEAD = '''"""Type stubs for relicore.{topic} (tests/python/{test} checks them against the module).
Element-wise arguments take scalars, sequences or arrays: all scalars give a float, anything
else a float64 ndarray of the (broadcast) shape."""

from typing import Any, Final, TypeAlias, {typing}

import numpy as np
from numpy.typing import ArrayLike, NDArray
{imports}
_Scalar: TypeAlias = float | int | np.floating[Any] | np.integer[Any]
_Array: TypeAlias = NDArray[np.float64]
'''

BLACKBODY_STUB = '''
@final
class TwoLoadCalibration:
    """Gain and offset of a two-load radiometer calibration: reading = gain * J + offset."""

    def __new__(cls, frequency_hz: float, gain: float, offset: float) -> TwoLoadCalibration: ...
    @property
    def frequency_hz(self) -> float: ...
    @property
    def gain(self) -> float: ...
    @property
    def offset(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __reduce__(self) -> tuple[type[TwoLoadCalibration], tuple[float, float, float]]: ...

def two_load_calibration(
    frequency_hz: float,
    reading_hot: float,
    temperature_hot_k: float,
    reading_cold: float,
    temperature_cold_k: float,
) -> TwoLoadCalibration: ...
@overload
def calibrated_brightness_temperature(calibration: TwoLoadCalibration, reading: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def calibrated_brightness_temperature(calibration: TwoLoadCalibration, reading: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def calibrated_temperature(calibration: TwoLoadCalibration, reading: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def calibrated_temperature(calibration: TwoLoadCalibration, reading: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def response_weighted_radiance(wavelengths_m: ArrayLike, response: ArrayLike, temperature_k: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def response_weighted_radiance(wavelengths_m: ArrayLike, response: ArrayLike, temperature_k: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
@overload
def temperature_from_response_weighted_radiance(wavelengths_m: ArrayLike, response: ArrayLike, radiance: _Scalar, *, nan_on_error: bool = False) -> float: ...  # type: ignore[overload-overlap]
@overload
def temperature_from_response_weighted_radiance(wavelengths_m: ArrayLike, response: ArrayLike, radiance: ArrayLike, *, nan_on_error: bool = False) -> _Array: ...
{tables}
def combined_standard_uncertainty(sensitivity_coefficients: ArrayLike, standard_uncertainties: ArrayLike) -> float: ...
def combined_standard_uncertainty_correlated(sensitivity_coefficients: ArrayLike, standard_uncertainties: ArrayLike, correlation: ArrayLike) -> float: ...
'''

UNIVERSE_STUB = '''
class Universe:
    """A homogeneous universe: validated parameters, derived constants and a distance table."""

    def __new__(
        cls,
        h0_km_s_mpc: float,
        omega_matter: float,
        *,
        omega_baryon: float = 0.0,
        omega_curvature: float = 0.0,
        cmb_temperature_k: float = 2.7255,
        n_eff: float = 3.044,
        neutrino_masses_ev: ArrayLike = (0.0, 0.0, 0.0),
        w0: float = -1.0,
        wa: float = 0.0,
        helium_mass_fraction: float = 0.245,
    ) -> Universe: ...
    @property
    def h0_km_s_mpc(self) -> float: ...
    @property
    def omega_matter(self) -> float: ...
    @property
    def omega_baryon(self) -> float: ...
    @property
    def omega_curvature(self) -> float: ...
    @property
    def cmb_temperature_k(self) -> float: ...
    @property
    def n_eff(self) -> float: ...
    @property
    def neutrino_masses_ev(self) -> tuple[float, float, float]: ...
    @property
    def w0(self) -> float: ...
    @property
    def wa(self) -> float: ...
    @property
    def helium_mass_fraction(self) -> float: ...
    @property
    def parameters(self) -> dict[str, Any]: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(self) -> tuple[Any, tuple[type[Universe], dict[str, Any]]]: ...
    def __copy__(self) -> Universe: ...
    def __dask_tokenize__(self) -> tuple[str, tuple[tuple[str, Any], ...]]: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> Universe: ...
'''

HISTORY_STUB = '''
HISTORY_NODES: Final[int]
DEFAULT_HIGHEST_REDSHIFT: Final[float]
LOWEST_HIGHEST_REDSHIFT: Final[float]
HIGHEST_REIONIZATION_REDSHIFT: Final[float]
HIGHEST_HELIUM_REIONIZATION_REDSHIFT: Final[float]
DEFAULT_HELIUM_REIONIZATION_REDSHIFT: Final[float]
DEFAULT_HELIUM_REIONIZATION_WIDTH: Final[float]
SAHA_HIGHEST_REDSHIFT: Final[float]

class ThermalHistory:
    """The recombination and thermal history of a universe, computed once onto a fixed table."""

    def __new__(
        cls,
        universe: Universe,
        *,
        reionization_redshift: float | None = None,
        highest_redshift: float = 10000.0,
        helium_reionization_redshift: float = 3.5,
        helium_reionization_width: float = 0.5,
    ) -> ThermalHistory: ...
    @property
    def universe(self) -> Universe: ...
    @property
    def reionization_redshift(self) -> float | None: ...
    @property
    def highest_redshift(self) -> float: ...
    @property
    def helium_reionization_redshift(self) -> float: ...
    @property
    def helium_reionization_width(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(
        self,
    ) -> tuple[Any, tuple[type[ThermalHistory], Universe, float | None, float, float, float]]: ...
    def __copy__(self) -> ThermalHistory: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> ThermalHistory: ...
    def __dask_tokenize__(self) -> tuple[str, Any, float | None, float, float, float]: ...
'''

GROWTH_STUB = '''
PIVOT_WAVENUMBER_PER_MPC: Final[float]
TRANSFER_FORMS: Final[tuple[str, ...]]

class LinearGrowth:
    """The linear growth factor and rate of a universe, computed once onto a fixed table."""

    def __new__(cls, universe: Universe) -> LinearGrowth: ...
    @property
    def universe(self) -> Universe: ...
    @property
    def unnormalized_growth_factor_today(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(self) -> tuple[type[LinearGrowth], tuple[Universe]]: ...
    def __copy__(self) -> LinearGrowth: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> LinearGrowth: ...
'''

SPECTRUM_STUB = '''
class LinearPowerSpectrum:
    """A linear matter power spectrum: growth, Eisenstein & Hu 1998 transfer function, primordial spectrum."""

    def __new__(
        cls,
        growth: LinearGrowth,
        *,
        transfer_form: str = "baryon_oscillations",
        scalar_amplitude: float | None = None,
        sigma8: float | None = None,
        spectral_index: float,
        running: float = 0.0,
    ) -> LinearPowerSpectrum: ...
    @property
    def growth(self) -> LinearGrowth: ...
    @property
    def transfer_form(self) -> str: ...
    @property
    def normalisation(self) -> tuple[str, float]: ...
    @property
    def spectral_index(self) -> float: ...
    @property
    def running(self) -> float: ...
    def __eq__(self, other: object) -> bool: ...
    def __ne__(self, other: object) -> bool: ...
    def __hash__(self) -> int: ...
    def __reduce__(self) -> tuple[Any, tuple[Any, ...]]: ...
    def __copy__(self) -> LinearPowerSpectrum: ...
    def __deepcopy__(self, memo: dict[int, Any]) -> LinearPowerSpectrum: ...
'''


def _stub_overloads(fn: Function, indent: str) -> list[str]:
    if fn.result_type:
        cls = fn.result_type.python_type
        out = []
        for kind, hold in (("_Scalar", "float"), ("ArrayLike", "_Array")):
            params = [f"{a}: {kind}" for a in fn.arg_names]
            note = "  # type: ignore[overload-overlap]" if kind == "_Scalar" else ""
            out += [f"{indent}@overload",
                    f"{indent}def {fn.name}({', '.join(params)}, *, nan_on_error: bool = False) -> {cls}: ...{note}"]
        return out
    if fn.python == "property":
        return [f"{indent}@property", f"{indent}def {fn.name}(self) -> float: ..."]
    out = []
    for kind, result, note in (("_Scalar", "float", "  # type: ignore[overload-overlap]"), ("ArrayLike", "_Array", "")):
        params = ["self"] if fn.python == "method" else []
        if fn.python == "function" and fn.receiver != "none":
            params.append(f"{fn.receiver}: {python_class(fn.receiver)}")
        params += [f"{a}: {kind}" for a in fn.arg_names]
        out += [f"{indent}@overload",
                f"{indent}def {fn.name}({', '.join(params)}, *, nan_on_error: bool = False, out: None = None) -> {result}: ...{note}"]
    # with out= (an array of the broadcast shape and the result's dtype): that array
    out += [f"{indent}@overload",
            f"{indent}def {fn.name}({', '.join(params)}, *, nan_on_error: bool = False, out: _Array) -> _Array: ..."]
    return out


def stub(topic: str, fns: list[Function]) -> str:
    test = {"blackbody": "test_faces.py", "cosmology": "test_cosmology_faces.py",
            "decoupling": "test_decoupling_faces.py", "growth": "test_growth.py"}[topic]
    typing = "final, overload" if topic == "blackbody" else "overload"
    imports = "\nfrom relicore.cosmology import Universe\n" if topic in ("decoupling", "growth") else ""
    if topic == "blackbody":
        rts = dict.fromkeys(f.result_type.python_type for f in fns if f.topic == topic and f.result_type)
        imports += "".join(f"\nfrom relicore._results import {c} as {c}" for c in rts) + "\n"
    head = STUB_HEAD.format(topic=topic, test=test, typing=typing, imports=imports)
    mine = [f for f in fns if home(f) == topic]
    out = [banner("#", f"the type stubs of relicore.{topic}"), head.rstrip("\n")]
    if topic == "blackbody":
        out.append(BLACKBODY_STUB.replace("{tables}", "\n".join(tables_stub())).rstrip("\n"))
    for f in mine:
        if f.python == "function":
            out += _stub_overloads(f, "")
    template = {"cosmology": UNIVERSE_STUB, "decoupling": HISTORY_STUB}.get(topic)
    if template:
        out.append(template.rstrip("\n"))
        for f in mine:
            if f.python != "function":
                out += _stub_overloads(f, "    ")
    if topic == "growth":
        for receiver, template in (("growth", GROWTH_STUB), ("power_spectrum", SPECTRUM_STUB)):
            out.append(template.rstrip("\n"))
            for f in mine:
                if f.receiver == receiver and f.python != "function":
                    out += _stub_overloads(f, "    ")
    out += ["", "__all__: Final[list[str]]"]
    return "\n".join(out) + "\n"


RESULTS_DOC = """The named results of relicore's functions that return more than a number, one
class per result type of the table (bindings/functions.toml, [result.<name>]).

A scalar call returns the named result of Python numbers: each real field a float, a field of n
reals a tuple of n floats, a count an int. A call with any array argument returns the same
named result holding arrays of the broadcast shape S: each real field an ndarray of shape S,
a field of n reals an ndarray of shape S + (n,) (the trailing axis indexes the field), a count
an int64 ndarray of shape S. With nan_on_error, a failing element has NaN in its real fields
and 0 in its counts."""


def results_module(fns: list[Function]) -> tuple[str, str]:
    """relicore/_results.py and its stub."""
    rts = list(dict.fromkeys(f.result_type for f in fns if f.result_type))
    py = [banner("#", "the named results of relicore"), f'"""{RESULTS_DOC}"""', "",
          "from __future__ import annotations", "", "from typing import Any, NamedTuple", "",
          "import numpy as np", "", f"__all__ = {[rt.python_type for rt in rts]!r}"]
    pyi = [banner("#", "the type stubs of the named results of relicore"), f'"""{RESULTS_DOC}"""', "",
           "from typing import Any, NamedTuple", "", "import numpy as np", "from numpy.typing import NDArray", ""]
    for rt in rts:
        layout = []
        start = 0
        for f in rt.fields:
            layout.append((f.name, start, f.length, f.kind))
            start += f.length
        py += ["", "", f"class {rt.python_type}(NamedTuple):",
               f'    """The core\'s `{rt.core_type}` (see the module docstring for scalars and arrays).', ""]
        for f in rt.fields:
            py.append(f"    {f.name}: {f.meaning}.")
        py += ['    """', ""]
        for f in rt.fields:
            py.append(f"    {f.name}: Any")
        py += ["", f"    #: (field, first column, number of columns, kind) of a row of {rt.width} floats",
               f"    _LAYOUT = {tuple(layout)!r}", "", "    @classmethod",
               f"    def _from_row(cls, row: Any) -> {rt.python_type}:",
               '        """The value of one row of floats (a scalar call)."""',
               "        values: list[Any] = []",
               "        for _, start, length, kind in cls._LAYOUT:",
               "            piece = row[start : start + length]",
               '            if kind == "count":',
               "                values.append(int(piece[0]) if piece[0] == piece[0] else 0)",
               "            elif length == 1:",
               "                values.append(float(piece[0]))",
               "            else:",
               "                values.append(tuple(float(v) for v in piece))",
               "        return cls(*values)", "", "    @classmethod",
               f"    def _from_rows(cls, rows: np.ndarray[Any, Any]) -> {rt.python_type}:",
               '        """The value of an array of rows of shape S + (width,) (an array call)."""',
               "        values: list[Any] = []",
               "        for _, start, length, kind in cls._LAYOUT:",
               "            piece = rows[..., start : start + length]",
               '            if kind == "count":',
               "                # NaN (a failed element) to 0 and the float to int64 in one pass",
               "                values.append(np.fmax(piece[..., 0], 0.0, out=np.empty(piece.shape[:-1], np.int64), casting=\"unsafe\"))",
               "            elif length == 1:",
               "                values.append(piece[..., 0])",
               "            else:",
               "                values.append(piece)",
               "        return cls(*values)"]
        pyi += ["", f"class {rt.python_type}(NamedTuple):",
                f'    """The core\'s `{rt.core_type}`: Python numbers from a scalar call, arrays from an array call."""', ""]
        for f in rt.fields:
            if f.kind == "count":
                ty = "int | NDArray[np.int64]"
            elif f.length > 1:
                ty = "tuple[float, ...] | NDArray[np.float64]"
            else:
                ty = "float | NDArray[np.float64]"
            pyi.append(f"    {f.name}: {ty}")
    return "\n".join(py) + "\n", "\n".join(pyi) + "\n"


def outputs(fns: list[Function]) -> dict:
    files = {PY / "src" / "generated.rs": rust(fns)}
    files[PACKAGE / "_results.py"], files[PACKAGE / "_results.pyi"] = results_module(fns)
    for topic in ("blackbody", "cosmology", "decoupling", "growth"):
        files[PACKAGE / f"_{topic}.py"] = python_module(topic, fns)
        files[PACKAGE / f"{topic}.pyi"] = stub(topic, fns)
    files[PACKAGE / "_tables.py"] = tables_python()
    return files
