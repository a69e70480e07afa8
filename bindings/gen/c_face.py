"""The C exports of the regular functions (bindings/c/src/gen_<topic>.rs): one plain
`extern "C"` function per form, so cbindgen on stable Rust reads them as it reads hand-written
ones. Each body is one call of the boundary helpers of bindings/c/src (scalar, elementwise,
through_array, universe_*, history_*); the documentation is the core's rustdoc plus the C face's
conventions."""

from __future__ import annotations

import re
import subprocess
import textwrap
from pathlib import Path

from . import rustdoc
from .common import banner
from .table import ROOT, TOPICS, Function, TableFunction, table_functions

C_SRC = ROOT / "bindings" / "c" / "src"

SHORT = {"blackbody": "bb", "cosmology": "cosmo", "decoupling": "dc", "growth": "gr"}


def _doc(lines: list[str], width: int = 96) -> list[str]:
    """Doc comment lines, long ones wrapped at 100 columns (bullets keep a hanging indent)."""
    out = []
    for line in lines:
        if len(line) <= width:
            out.append(f"/// {line}".rstrip())
            continue
        indent = "  " if line.lstrip().startswith("* ") else ""
        for piece in textwrap.wrap(line, width, subsequent_indent=indent, break_on_hyphens=False):
            out.append(f"/// {piece}")
    return out


def _core_call(fn: Function, args: list[str], suffix: str = "") -> str:
    """The core call with the given argument expressions (receiver as `r`)."""
    a = ", ".join(args)
    if fn.receiver == "none":
        return f"relicore::{fn.topic}::{fn.name}{suffix}({a})"
    if fn.core:
        topic, _, name = fn.core.partition("::")
        return f"relicore::{topic}::{name}{suffix}(r{', ' if a else ''}{a})"
    return f"r.{fn.name}{suffix}({a})"


def _receiver_lines(fn: Function) -> list[str]:
    if not fn.recv:
        return []
    return [f"* `{fn.receiver}`: a `struct {fn.recv.c_struct}` filled by `{fn.recv.filled_by}`."]


def _invalid_struct(fn: Function) -> str:
    if not fn.recv:
        return ""
    return (
        f" `RELICORE_ERROR_INVALID_STRUCT` when `*{fn.receiver}` was not filled by a successful "
        f"`{fn.recv.filled_by}`."
    )


def _safety_receiver(fn: Function) -> str:
    if not fn.recv:
        return ""
    return f" `{fn.receiver}` is NULL or points to a readable `struct {fn.recv.c_struct}`."


def result_struct(fn: Function, ty: str) -> str | None:
    """The C struct a function with a result type writes (`_f32` twin for `float`), else None."""
    rt = fn.result_type
    if not rt:
        return None
    return rt.c_struct + ("" if ty == "f64" else "_f32")


def _result_lines(fn: Function, ty: str) -> list[str]:
    rt = fn.result_type
    if not rt:
        return [f"* `out`: where the result is written: {fn.result}."]
    fields = ", ".join(f"`{f.name}`" + (f"[{f.length}]" if f.length > 1 else "") for f in rt.fields)
    return [
        f"* `out`: where the result is written, a `struct {result_struct(fn, ty)}` ({fields}): "
        f"{fn.result}. On failure every real field is NaN and the count `inputs` is 0."
    ]


def scalar_export(fn: Function, ty: str) -> str:
    c_ty = "double" if ty == "f64" else "float"
    if fn.result_type:
        c_ty = f"struct {result_struct(fn, ty)}"
    name = fn.c_name + ("" if ty == "f64" else "_f32")
    doc = rustdoc.find(fn)[1]
    lines: list[str] = []
    if ty == "f32":
        lines += [
            f"Single-precision twin of `{fn.c_name}`: the same core function computed in `float`.",
            "",
        ]
    lines += doc + [""]
    lines += ["Arguments of the C function:"] + _receiver_lines(fn)
    lines += [f"* `{a.name}`: {a.meaning}." for a in fn.args]
    lines += _result_lines(fn, ty) + [""]
    lines += [
        "Returns `RELICORE_OK`, or a negative `RELICORE_ERROR_*` code with `*out` set to NaN: the "
        "core's errors named above as status codes (`relicore_status_message` gives the text); "
        f"`RELICORE_ERROR_NULL_POINTER` when a pointer is NULL.{_invalid_struct(fn)}",
        "",
        "# Safety",
        f"`out` is NULL or points to a writable `{c_ty}`" + ("." if fn.receiver == "none" else f" outside `*{fn.receiver}`.")
        + _safety_receiver(fn),
    ]
    params = []
    if fn.recv:
        params.append(f"{fn.receiver}: *const {fn.recv.c_struct}")
    params += [f"{a.name}: {ty}" for a in fn.args]
    params.append(f"out: *mut {result_struct(fn, ty) or ty}")
    call = _core_call(fn, fn.arg_names)
    r = fn.receiver
    if fn.result_type:
        body = f"scalar(out, || {call}.map({result_struct(fn, ty)}::from))"
    elif not fn.recv:
        body = f"scalar(out, || {call})"
    elif fn.infallible and fn.recv.summary:
        body = f"stored_summary({r}, out, |r| {call})"
    elif fn.infallible:
        body = f"stored_scalar({r}, out, |r| Ok({call}))"
    else:
        body = f"stored_scalar({r}, out, |r| {call})"
    return "\n".join(
        _doc(lines)
        + (["#[allow(clippy::too_many_arguments)]"] if len(params) > 7 else [])
        + [
            "#[unsafe(no_mangle)]",
            f"pub unsafe extern \"C\" fn {name}({', '.join(params)}) -> i32 {{",
            "    // SAFETY: the pointers are NULL or valid (this function's contract).",
            f"    unsafe {{ {body} }}",
            "}",
        ]
    )


def array_export(fn: Function, ty: str) -> str:
    assert fn.array
    c_ty = "double" if ty == "f64" else "float"
    name = fn.c_name + ("_array" if ty == "f64" else "_array_f32")
    arr = fn.array
    k = arr.index(fn)
    element = [a.name if a.name != arr.arg else f"{arr.name}[i]" for a in fn.args]
    lines = [
        f"Array form of `{fn.c_name}{'' if ty == 'f64' else '_f32'}`: out[i] = {fn.name}("
        + ", ".join(([fn.receiver] if fn.receiver != "none" else []) + element)
        + ") for i < n.",
        "",
    ]
    lines += _receiver_lines(fn)
    for a in fn.args:
        if a.name == arr.arg:
            lines.append(f"* `{arr.name}`: n values of `{a.name}`, {a.meaning}.")
            lines.append("* `n`: number of elements of both arrays.")
        else:
            lines.append(f"* `{a.name}`: {a.meaning}.")
    lines += [f"* `out`: n results, {fn.result}.", ""]
    lines += [
        "Returns `RELICORE_OK` when every element succeeded (n = 0 included: nothing is written). "
        "When some elements fail, those outputs are NaN, the others are computed, and the code of "
        "the first failing element is returned (the element errors of the scalar function). "
        "`RELICORE_ERROR_NULL_POINTER` when a pointer is NULL (even for n = 0)"
        + (f" and `RELICORE_ERROR_INVALID_STRUCT` when `*{fn.receiver}` was not filled by a successful "
           f"`{fn.recv.filled_by}`" if fn.recv else "")
        + "; then every element of a non-NULL `out` is NaN.",
        "",
        (
            "Computed by the core's array form (blocks of 64 elements in SIMD, in the widest "
            "compilation the CPU supports), with the scalar function's bits. Allocates nothing."
            if arr.simd
            else "Each element is computed by the same code as the scalar function, so the two agree "
            "bit for bit; accuracy as there. Allocates nothing."
        ),
        "",
        "# Safety",
        f"`{arr.name}` is NULL or points to n readable `{c_ty}`; `out` is NULL or points to n "
        f"writable `{c_ty}`" + ("" if fn.receiver == "none" else f" outside `*{fn.receiver}`")
        + f". `out` may be the same buffer as `{arr.name}` (computed in place); other overlaps "
        "give unspecified values." + _safety_receiver(fn),
    ]
    params = []
    if fn.recv:
        params.append(f"{fn.receiver}: *const {fn.recv.c_struct}")
    for a in fn.args:
        if a.name == arr.arg:
            params += [f"{arr.name}: *const {ty}", "n: usize"]
        else:
            params.append(f"{a.name}: {ty}")
    params.append(f"out: *mut {ty}")
    shared = [a for a in fn.arg_names if a != arr.arg]
    if arr.simd:
        if fn.receiver == "none":
            sig = ", ".join([f"x: &[{ty}]"] + [f"{s}: {ty}" for s in shared] + [f"out: &mut [{ty}]"])
            call = _core_call(fn, ["x"] + shared + ["out"], "_array")
            body = (
                f"through_array({arr.name}, n, out, |x, out| {{ widest!(|{sig}| -> ArrayResult {{ {call} }}) }})"
            )
        else:
            helper = "stored_through_array"
            core_ty = f"{fn.recv.core_type}<{ty}>"
            sig = ", ".join([f"r: &{core_ty}", f"x: &[{ty}]"] + [f"{s}: {ty}" for s in shared] + [f"out: &mut [{ty}]"])
            call = _core_call(fn, ["x"] + shared + ["out"], "_array")
            body = (
                f"{helper}({fn.receiver}, {arr.name}, n, out, |r, x, out| {{ widest!(|{sig}| -> ArrayResult {{ {call} }}) }})"
            )
    else:
        args = ["x" if a == arr.arg else a for a in fn.arg_names]
        call = _core_call(fn, args)
        if fn.receiver == "none":
            body = f"elementwise({arr.name}, n, out, |x| {call})"
        else:
            body = f"stored_array({fn.receiver}, {arr.name}, n, out, |r, x| {call})"
    del k
    return "\n".join(
        _doc(lines)
        + [
            "#[unsafe(no_mangle)]",
            f"pub unsafe extern \"C\" fn {name}({', '.join(params)}) -> i32 {{",
            "    // SAFETY: the pointers are NULL or valid for n elements (this function's contract).",
            f"    unsafe {{ {body} }}",
            "}",
        ]
    )


def _uses(fns: list[Function]) -> list[str]:
    """Every `use` a module of these functions may need (pruned to what the code uses)."""
    out = [
        "use crate::boundary::{elementwise, scalar, through_array};",
        "use relicore::ArrayResult;",
        "use relicore_dispatch::widest;",
        "use crate::stored::{stored_array, stored_scalar, stored_summary, stored_through_array};",
    ]
    for rt in dict.fromkeys(f.result_type for f in fns if f.result_type):
        out.append(f"use crate::{rt.c_module}::{{{rt.c_struct}, {rt.c_struct}_f32}};")
    for rname in dict.fromkeys(f.receiver for f in fns if f.recv):
        r = next(f.recv for f in fns if f.receiver == rname)
        out.append(f"use crate::{r.c_module}::{r.c_struct};")
        out.append(f"use {r.core_path};")
    return out


def rustfmt(text: str) -> str:
    r = subprocess.run(
        ["rustfmt", "--edition", "2024", "--emit", "stdout", "--quiet"],
        input=text,
        capture_output=True,
        text=True,
        check=False,
    )
    if r.returncode != 0:
        raise SystemExit(f"c_face: rustfmt failed:\n{r.stderr}")
    return r.stdout


def module(topic: str, fns: list[Function]) -> str:
    mine = [f for f in fns if f.topic == topic]
    parts = [
        banner("//", f"the C exports of the regular {topic} functions"),
        f"//! The C exports of the regular {topic} functions: for each function of the table its "
        "`double` form, its `float` twin (`_f32`) and its array forms (`_array`, `_array_f32`) "
        "where the table lists them.\n",
    ]
    body: list[str] = []
    for fn in mine:
        body.append(scalar_export(fn, "f64"))
        if fn.f32:
            body.append(scalar_export(fn, "f32"))
        if fn.array:
            body.append(array_export(fn, "f64"))
        if fn.array_f32:
            body.append(array_export(fn, "f32"))
    text = "\n\n".join(body)
    code = "\n".join(line for line in text.splitlines() if not line.lstrip().startswith("//"))
    uses = [u for u in (_prune(u, code) for u in _uses(mine)) if u]
    return rustfmt("\n".join(parts) + "\n" + "\n".join(uses) + "\n\n" + text + "\n")


def _prune(use: str, text: str) -> str:
    """`use` with only the names `text` uses ('' when none)."""
    head, brace, inner = use.partition("{")
    if not brace:
        path, _, name = use.rstrip(";").rpartition("::")
        alias = name.split(" as ")[-1]
        return use if re.search(rf"\b{alias}\b", text) else ""
    names = [n.strip() for n in inner.rstrip("};").split(",") if n.strip()]
    kept = [n for n in names if re.search(rf"\b{n.split(' as ')[-1]}\b", text)]
    if not kept:
        return ""
    return f"{head}{{{', '.join(kept)}}};" if len(kept) > 1 else f"{head}{kept[0]};"


def outputs(fns: list[Function]) -> dict[Path, str]:
    out = {C_SRC / f"gen_{topic}.rs": module(topic, fns) for topic in TOPICS}
    out[C_SRC / "gen_frames.rs"] = frames_module(fns)
    out[C_SRC / "gen_tables.rs"] = tables_module()
    return out


# ---------------------------------------------------------------------------- frame forms
_SUPERSCRIPT = str.maketrans("0123456789", "⁰¹²³⁴⁵⁶⁷⁸⁹")


def _unicode_unit(unit: str) -> str:
    """'W m-2 sr-1' -> 'W m⁻² sr⁻¹' (the C docs' spelling of the table's units)."""
    return re.sub(r"(?<=[A-Za-z])-(\d+)", lambda m: "⁻" + m.group(1).translate(_SUPERSCRIPT), unit)


def _frame_params(fn: Function) -> tuple[list[str], str, list[str], list[str]]:
    """(single values, the signal, the scene parameters, the standard uncertainties) of a frame."""
    ff = fn.frame_form
    names = fn.arg_names
    k, s = ff.scalars, len(ff.domains)
    return names[:k], names[k], names[k + 1 : k + 1 + s], names[k + 1 + s :]


def frame_export(fn: Function, ty: str, budget: bool = False) -> str:
    """The C frame (image) form `<name>_array` (or `_array_f32`) of a table entry; with `budget`,
    the budget form of a function with a result type (`relicore_<frame.budget>`, `_f32`): the
    whole result value of each pixel."""
    ff = fn.frame_form
    assert ff
    c_ty = "double" if ty == "f64" else "float"
    if budget:
        name = f"relicore_{ff.budget}" + ("" if ty == "f64" else "_f32")
    else:
        name = fn.c_name + ("_array" if ty == "f64" else "_array_f32")
    singles, signal, scene, uncertain = _frame_params(fn)
    base = fn.name.removesuffix("_with_uncertainty")
    what = "the " + rustdoc.summary(rustdoc.find(next(f for f in FUNCTIONS if f.name == base))[1]).split(" from ")[0].lower()
    rt = fn.result_type
    struct = (f"{rt.c_struct}" + ("" if ty == "f64" else "_f32")) if budget else ""
    if budget and ty == "f32":
        head = [f"`float` twin of `relicore_{ff.budget}` for firmware and single-precision frames: the same "
                f"core function in `float`, writing `struct {struct}`."]
    elif budget:
        head = [f"`{fn.c_name}` over a frame of signals (an image) with the whole uncertainty budget of each "
                f"pixel: out[i] is the `struct {struct}` the scalar function writes for pixel i ({what}, its "
                "combined standard uncertainty and the five sensitivity coefficients), bit for bit, with "
                "per-pixel or shared scene parameters and standard uncertainties."]
    elif ty == "f32":
        head = [f"`float` twin of `{fn.c_name}_array` for firmware and single-precision frames: the same "
                "core function in `float`."]
    elif len(ff.outputs) == 1:
        head = [f"`{fn.c_name}` over a frame of signals (an image): {ff.outputs[0][0]}[i] = {what} of "
                f"{signal}s[i], bit for bit that of the scalar function, with per-pixel or shared scene "
                "parameters."]
    else:
        head = [f"`{fn.c_name}` over a frame of signals (an image): {what} and its combined standard "
                "uncertainty per pixel, bit for bit those of the scalar function, with per-pixel or "
                "shared scene parameters and standard uncertainties."]
    quoted = ", ".join(f"`{a}`" for a in singles)
    they = "it is" if len(singles) == 1 else "they are"
    unit = _unicode_unit(fn.args[len(singles)].meaning.split(" in ", 1)[1].split(",")[0])
    lines = [
        "///",
        f"/// * {quoted}: {ff.scalars_doc} (when {they} not, every pixel fails).",
        f"/// * `{signal}s`, `n`: the n measured {signal}s L_meas in {unit}, finite.",
    ]
    items = ", ".join(f"`{a}`, `n_{a}` ({d})" for a, d in zip(scene, ff.domains))
    bullets = [f"* {items}: n or 1 values each."]
    if uncertain:
        bullets.append(f"* the standard uncertainties {', '.join(f'`{a}`' for a in uncertain)}, each "
                       "followed by its length (n or 1): finite, >= 0.")
    outputs = [("out", f"struct {struct}")] if budget else list(ff.outputs)
    bullets.append("* " + "; ".join(f"`{o}`: n values of {m}" for o, m in outputs) + ".")
    tail = [
        "",
        "Each parameter is a (pointer, length) pair whose length is n (one value per pixel) or 1 (one "
        "value shared by every pixel). Returns `RELICORE_OK` when every pixel succeeded (n = 0 "
        "included). When some pixels fail, their outputs are NaN"
        + (" (every real field, and `inputs` 0)" if budget else "") + ", the others are computed, and the "
        "code of the first failing pixel is returned (the errors of the scalar function). "
        "`RELICORE_ERROR_LENGTH_MISMATCH` when a parameter has neither n nor 1 values (every output "
        "NaN); `RELICORE_ERROR_NULL_POINTER` when a pointer is NULL (even for a length 0; every "
        "non-NULL output NaN). The radiances of the surroundings and the path are computed once for "
        "shared parameters (and reused while per-pixel parameters repeat). Allocates nothing.",
        "",
        "# Safety",
        f"Each input pointer is NULL or points to its length of readable `{c_ty}`; each output is NULL "
        f"or points to n writable `{struct or c_ty}` and overlaps no other buffer.",
    ]
    doc = _doc(head, 92) + lines + _doc(bullets + tail, 92)
    slices = [signal] + scene + uncertain
    params = [f"{a}: {ty}" for a in singles] + [f"{signal}s: *const {ty}", "n: usize"]
    params += [p for a in slices[1:] for p in (f"{a}: *const {ty}", f"n_{a}: usize")]
    out_ty = f"bb::TemperatureUncertainty<{ty}>" if budget else ty
    params += [f"{o}: *mut {struct or ty}" for o, _ in outputs]
    pairs = [f"({signal}s, n)"] + [f"({a}, n_{a})" for a in slices[1:]]
    s_names = [f"s{i}" for i in range(len(slices))]
    o_names = [f"o{i}" for i in range(len(outputs))]
    core = ff.budget if budget else f"{fn.name}_array"
    call = f"bb::{core}({', '.join(singles + s_names + o_names)})"
    if ff.simd:
        sig = [f"{a}: {ty}" for a in singles] + [f"{s}: &[{ty}]" for s in s_names]
        sig += [f"{o}: &mut [{out_ty}]" for o in o_names]
        call = f"widest!(|{', '.join(sig)}| -> ArrayResult {{ {call} }})"
    # the C struct and the core's value have one layout (checked at compile time in
    # thermometry.rs): the core writes the caller's structs in place
    outs = [f"{o}.cast::<{out_ty}>()" if budget else o for o, _ in outputs]
    return "\n".join(doc + [
        "#[allow(clippy::too_many_arguments)]",
        "#[unsafe(no_mangle)]",
        f"pub unsafe extern \"C\" fn {name}({', '.join(params)}) -> i32 {{",
        f"    let params = [{', '.join(pairs)}];",
        "    // SAFETY: the pointers are NULL or valid for their lengths, the outputs for n writes and",
        "    // disjoint from the inputs (this function's contract).",
        f"    unsafe {{ frame_call(n, params, [{', '.join(outs)}], "
        f"|&[{', '.join(s_names)}], [{', '.join(o_names)}]| {{ {call} }}) }}",
        "}",
    ])


FUNCTIONS: list[Function] = []


def frames_module(fns: list[Function]) -> str:
    """bindings/c/src/gen_frames.rs: the frame forms, each entry's with-uncertainty form after it."""
    FUNCTIONS[:] = fns
    framed = [f for f in fns if f.frame_form]
    order = {f.name: f.order for f in fns}
    framed.sort(key=lambda f: (order[f.name.removesuffix("_with_uncertainty")], f.order))
    body = []
    for fn in framed:
        body.append(frame_export(fn, "f64"))
        if fn.frame_form.f32:
            body.append(frame_export(fn, "f32"))
    for fn in framed:
        if fn.frame_form.budget:
            body.append(frame_export(fn, "f64", budget=True))
            if fn.frame_form.f32:
                body.append(frame_export(fn, "f32", budget=True))
    head = [
        banner("//", "the C frame (image) forms of radiation thermometry"),
        "//! The C frame (image) forms of the table's entries with a `frame`: one call over n signals "
        "with per-pixel or shared scene parameters (a pointer and a length of n or 1 each), through "
        "`thermometry::frame_call`.\n",
        "use crate::thermometry::{frame_call, relicore_temperature_uncertainty, relicore_temperature_uncertainty_f32};",
        "use relicore::ArrayResult;",
        "use relicore::blackbody as bb;",
        "use relicore_dispatch::widest;",
        "",
    ]
    return rustfmt("\n".join(head) + "\n" + "\n\n".join(body) + "\n")


# ---------------------------------------------------------------------------- response tables
def table_export(tf: TableFunction, ty: str) -> str:
    """The C export of a response-table function (`_f32` for `float`), through
    `boundary::table_call`."""
    c_ty = "double" if ty == "f64" else "float"
    name = f"relicore_{tf.name}" + ("" if ty == "f64" else "_f32")
    paragraphs = tf.c_doc.split("\n\n")
    if ty == "f32":
        paragraphs[0] = "\n".join(_doc([
            f"`float` twin of `relicore_{tf.name}` for firmware: the same core function computed in "
            "single precision (table, arguments and result `float`)."], 92))
        k = next(i for i, p in enumerate(paragraphs) if p.startswith("Accuracy:"))
        paragraphs[k] = "\n".join(_doc([
            "Accuracy: that of the core function in f32 (a few f32 ulp of the f64 result where the "
            "inputs are representable). Allocates nothing."], 92))
    doc = [line if line.startswith("///") else f"/// {line}".rstrip()
           for line in "\n\n".join(paragraphs).split("\n")]
    rt = tf.result_type
    out_ty = f"struct {rt.c_struct}{'' if ty == 'f64' else '_f32'}" if rt else c_ty
    sfx = "" if ty == "f64" else "_f32"
    safety = _doc([
        f"`wavelengths_m` is NULL or points to `n_wavelengths` readable `{c_ty}`, `response_table` NULL "
        f"or to `n_response_table` readable `{c_ty}`; `out` is NULL or points to a writable "
        f"`{'struct ' + rt.c_struct + sfx if rt else c_ty}`."], 96 if ty == "f64" else 98)
    doc += ["///", "/// # Safety"] + safety
    params = [f"wavelengths_m: *const {ty}", "n_wavelengths: usize", f"response_table: *const {ty}",
              "n_response_table: usize"] + [f"{a}: {ty}" for a in tf.args]
    params.append(f"out: *mut {out_ty.removeprefix('struct ') if rt else ty}")
    call = f"bb::{tf.name}(w, r, {', '.join(tf.args)})"
    if rt:
        call += f".map({out_ty.removeprefix('struct ')}::from)"
    return "\n".join(doc + (["#[allow(clippy::too_many_arguments)]"] if len(params) > 7 else []) + [
        "#[unsafe(no_mangle)]",
        f"pub unsafe extern \"C\" fn {name}({', '.join(params)}) -> i32 {{",
        "    // SAFETY: the pointers are NULL or valid for their lengths (this function's contract).",
        "    unsafe { table_call(wavelengths_m, n_wavelengths, response_table, n_response_table, out, "
        f"|w, r| {{ {call} }}) }}",
        "}",
    ])


def tables_module() -> str:
    """bindings/c/src/gen_tables.rs: the response-table functions and their `float` twins."""
    tfs = table_functions()
    body = [table_export(tf, ty) for tf in tfs for ty in ("f64", "f32")]
    structs = sorted({tf.result_type.c_struct for tf in tfs if tf.result_type})
    head = [
        banner("//", "the C exports of the response-table functions of radiation thermometry"),
        "//! The C exports of the table's response-table functions ([[table_function]]): a tabulated "
        "spectral response (two caller buffers with their lengths) and single values, through "
        "`boundary::table_call`; each with its `float` twin.\n",
        "use crate::boundary::table_call;",
        f"use crate::thermometry::{{{', '.join(s + sfx for s in structs for sfx in ('', '_f32'))}}};",
        "use relicore::blackbody as bb;",
        "",
    ]
    return rustfmt("\n".join(head) + "\n" + "\n\n".join(body) + "\n")
