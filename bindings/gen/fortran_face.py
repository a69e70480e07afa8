"""The Fortran face: bindings/fortran/relicore.f90 from the hand-kept template
bindings/fortran/relicore.in.f90 (module header, kinds, types, constants, status message and
version, the calibration, response-table, universe and thermal-history procedures) and the
table. The template's marker lines are replaced:

    !@ constants    the physical constants of src/constants.rs (bindings/gen/constants_face.py)
    !@ coverage     rows of the coverage table (C function, Fortran procedures), in a comment
    !@ public       the public statement of the table's procedures
    !@ interfaces   one bind(C) interface per C symbol of the table, its prototype above it
    !@ procedures   per table entry: its doc comment, then the elemental function, the `_s`
                    status subroutine, the `_array` subroutine and the `_f32`, `_f32_s`,
                    `_array_f32` twins it has
    !@ result_types the bind(C) types of the table's result types ([result.<name>]: a
                    temperature with its uncertainty), with their `_f32` twins
    !@ parts <s>    section <s> (public, interfaces, procedures) of every hand-kept part
                    bindings/fortran/parts/*.f90: procedures the table cannot describe, kept
                    in their own files (radiation thermometry); a part's sections start with
                    the lines `!@@ public`, `!@@ interfaces`, `!@@ procedures`

Template blocks between the lines `!@ twin` and `!@ end twin` are written twice: as they are and
as their real(c_float) twin (c_double, double, nan64() and the names relicore_x, c_x, make_x,
table_x become c_float, float, nan32() and x_f32, x_f32_s for x_s); a line starting `!@64 ` or
`!@32 ` is only in the double or the float copy (the words the two differ in).

Also generated into the parts' `!@ tables` markers: the response-table functions
([[table_function]]); and after the parts: the frame (image) forms of the entries with `frame`.

Each procedure's comment is the core's rustdoc summary plus the table's argument meanings and
result; the conventions every wrapper shares (NaN on failure, stat, the stop message) are said
once, in the template's module header. Template lines starting with `!!` describe the template
itself and are not copied.

Also written: the dispatch lists of the Fortran vector tests (tests/fortran/generated/*.inc),
the `case` blocks and name lists by which test_blackbody, test_cosmology and test_decoupling
call a table function by its name.
"""

from __future__ import annotations

import re
import textwrap
from dataclasses import dataclass
from pathlib import Path

from . import constants_face, rustdoc
from .common import banner
from .table import ROOT, Function, table_functions, thermometry_names

TEMPLATE = ROOT / "bindings" / "fortran" / "relicore.in.f90"
MODULE = ROOT / "bindings" / "fortran" / "relicore.f90"
TESTS = ROOT / "tests" / "fortran" / "generated"
MARKERS = ("constants", "coverage", "public", "interfaces", "procedures", "result_types",
           "parts public", "parts interfaces", "parts procedures")
PARTS = ROOT / "bindings" / "fortran" / "parts"
WIDTH = 100

# the value passed first: (dummy name, Fortran type, C struct, where it comes from)
RECEIVERS = {
    "universe": ("universe", "relicore_universe", "from relicore_universe_init"),
    "history": ("history", "relicore_thermal_history", "from relicore_thermal_history_compute"),
    "growth": ("growth", "relicore_linear_growth", "from relicore_linear_growth_compute"),
    "power_spectrum": ("power_spectrum", "relicore_linear_power_spectrum",
                       "from relicore_linear_power_spectrum_compute"),
}


class FortranFaceError(Exception):
    pass


# ---------------------------------------------------------------------------- text
# The core's docs are Unicode; the module stays ASCII (any compiler, any terminal).
_SUPER = dict(zip("⁰¹²³⁴⁵⁶⁷⁸⁹⁻⁺ⁿˣᵗ", "0123456789-+nxt"))
_SUB = dict(zip("₀₁₂₃₄₅₆₇₈₉ₙᵢⱼ", "0123456789nij"))
_WORDS = {
    "λ": "lambda", "ν": "nu", "Ω": "Omega", "ω": "omega", "φ": "phi", "π": "pi", "ρ": "rho",
    "τ": "tau", "σ": "sigma", "χ": "chi", "ε": "epsilon", "Δ": "Delta", "Σ": "Sigma",
    "η": "eta", "ζ": "zeta", "γ": "gamma", "θ": "theta", "ṽ": "nu~", "∫": "int", "√": "sqrt",
    "∂": "d", "∞": "Inf",
}
_SYMBOLS = {"−": "-", "–": "-", "·": "*", "→": "->", "…": "...", "≤": "<=", "≥": ">=", "×": "x"}
_SYMBOLS.update({"⅓": "(1/3)", "½": "(1/2)", "¾": "(3/4)", "′": "'", "″": "''", "≈": "~", "≲": "<~", "ẋ": "dx/dt"})
_WORDS.update({"α": "alpha", "β": "beta", "μ": "mu", "δ": "delta", "Γ": "Gamma", "Θ": "Theta"})


def ascii_text(text: str) -> str:
    """Unicode of the rustdoc to plain ASCII; fails on a character it has no spelling for."""
    out: list[str] = []
    i = 0
    while i < len(text):
        ch = text[i]
        if ch in _SUPER:
            run = ""
            while i < len(text) and text[i] in _SUPER:
                run += _SUPER[text[i]]
                i += 1
            out.append("^" + run)
            continue
        if ch in _SUB:
            out.append(_SUB[ch])
        elif ch in _WORDS:
            word = _WORDS[ch]
            if out and out[-1][-1:].isalnum():
                word = " " + word
            if i + 1 < len(text) and text[i + 1].isalpha():
                word += " "
            out.append(word)
        elif ch in _SYMBOLS:
            out.append(_SYMBOLS[ch])
        elif ord(ch) > 127:
            raise FortranFaceError(
                f"no ASCII spelling for {ch!r} (U+{ord(ch):04X}) in {text!r}: add it to "
                "bindings/gen/fortran_face.py"
            )
        else:
            out.append(ch)
        i += 1
    return "".join(out)


def comment(text: str, indent: str = "  ", lead: str = "", hang: str = "") -> list[str]:
    """A comment paragraph wrapped to WIDTH."""
    return textwrap.wrap(
        text, WIDTH, initial_indent=f"{indent}! {lead}", subsequent_indent=f"{indent}! {hang}",
        break_on_hyphens=False, break_long_words=False,
    )


def statement(indent: str, text: str, extra: str = "    ") -> list[str]:
    """A Fortran statement, continued with `&` at ', ' boundaries to stay within WIDTH."""
    if len(indent) + len(text) <= WIDTH:
        return [indent + text]
    parts = text.split(", ")
    lines: list[str] = []
    current = indent + parts[0]
    for part in parts[1:]:
        if len(current) + 2 + len(part) + 2 > WIDTH:
            lines.append(current + ", &")
            current = indent + extra + part
        else:
            current += ", " + part
    lines.append(current)
    return lines


# ---------------------------------------------------------------------------- forms
@dataclass(frozen=True)
class Form:
    """One C symbol of a table entry and the Fortran procedures over it."""

    fn: Function
    f32: bool
    array: bool

    @property
    def kind(self) -> str:
        return "c_float" if self.f32 else "c_double"

    @property
    def ctype(self) -> str:
        return "float" if self.f32 else "double"

    @property
    def nan(self) -> str:
        return "nan32()" if self.f32 else "nan64()"

    @property
    def suffix(self) -> str:
        return ("_array" if self.array else "") + ("_f32" if self.f32 else "")

    @property
    def c_name(self) -> str:
        return f"relicore_{self.fn.name}{self.suffix}"

    @property
    def raw(self) -> str:
        return f"c_{self.fn.name}{self.suffix}"

    @property
    def receiver(self) -> tuple[str, str, str] | None:
        return RECEIVERS.get(self.fn.receiver)

    @property
    def rtype(self) -> str | None:
        """The Fortran type of the result when the function has a result type."""
        rt = self.fn.result_type
        return rt.fortran_type + ("_f32" if self.f32 else "") if rt else None

    @property
    def result_decl(self) -> str:
        return f"type({self.rtype})" if self.rtype else f"real({self.kind})"

    @property
    def nan_value(self) -> str:
        return f"nan_{self.rtype}()" if self.rtype else self.nan

    def args(self) -> list[str]:
        """The Fortran dummies before out/stat: receiver, arguments, the array in its place."""
        names = [self.receiver[0]] if self.receiver else []
        for a in self.fn.args:
            if self.array and a.name == self.fn.array.arg:
                names.append(self.fn.array.name)
            else:
                names.append(a.name)
        return names

    def c_args(self) -> list[str]:
        """The C parameters' names: the array followed by its length n, then out."""
        out = []
        for name in self.args():
            out.append(name)
            if self.array and name == self.fn.array.name:
                out.append("n")
        return out + ["out"]

    def scalars(self) -> list[str]:
        return [a for a in self.args() if (not self.receiver or a != self.receiver[0])
                and not (self.array and a == self.fn.array.name)]


def forms(fn: Function) -> list[Form]:
    out = [Form(fn, False, False)]
    if fn.f32:
        out.append(Form(fn, True, False))
    if fn.array:
        out.append(Form(fn, False, True))
    if fn.array_f32:
        out.append(Form(fn, True, True))
    return out


def procedures(form: Form) -> list[str]:
    """The Fortran names over one C symbol: the function and `_s`, or the array subroutine."""
    if form.array:
        return [form.c_name]
    return [form.c_name, form.c_name + "_s"]


# ---------------------------------------------------------------------------- the module
def prototype(form: Form) -> str:
    params = []
    if form.receiver:
        params.append(f"const struct {form.receiver[1]} *{form.receiver[0]}")
    for name in form.args()[1 if form.receiver else 0:]:
        if form.array and name == form.fn.array.name:
            params += [f"const {form.ctype} *{name}", "size_t n"]
        else:
            params.append(f"{form.ctype} {name}")
    params.append(f"struct {form.fn.result_type.c_struct}{'_f32' if form.f32 else ''} *out" if form.rtype else f"{form.ctype} *out")
    return f"int32_t {form.c_name}({', '.join(params)});"


def interface(form: Form) -> list[str]:
    lines = comment(prototype(form), indent="    ", hang="    ")
    lines += statement("    ", f"function {form.raw}({', '.join(form.c_args())}) &")
    lines.append(f"        bind(C, name='{form.c_name}') result(status)")
    imports = [form.kind, "c_int32_t"] + (["c_size_t"] if form.array else [])
    if form.receiver:
        imports.append(form.receiver[1])
    if form.rtype:
        imports.append(form.rtype)
    lines += statement("      ", f"import :: {', '.join(imports)}")
    if form.receiver:
        lines.append(f"      type({form.receiver[1]}), intent(in) :: {form.receiver[0]}")
    for name in form.args()[1 if form.receiver else 0:]:
        if form.array and name == form.fn.array.name:
            lines.append(f"      real({form.kind}), intent(in) :: {name}(*)")
            lines.append("      integer(c_size_t), value :: n")
        else:
            lines.append(f"      real({form.kind}), value :: {name}")
    lines.append(f"      {form.result_decl}, intent(out) :: out{'(*)' if form.array else ''}")
    lines.append("      integer(c_int32_t) :: status")
    lines.append(f"    end function {form.raw}")
    return lines


def _inputs(form: Form) -> list[str]:
    lines = []
    if form.receiver:
        lines.append(f"    type({form.receiver[1]}), intent(in) :: {form.receiver[0]}")
    if form.array:
        lines.append(f"    real({form.kind}), intent(in) :: {form.fn.array.name}(:)")
    if form.scalars():
        lines += statement("    ", f"real({form.kind}), intent(in) :: {', '.join(form.scalars())}")
    return lines


def scalar_procedures(form: Form) -> list[str]:
    name, args = form.c_name, form.args()
    call = ", ".join(args + ["res"])
    lines = statement("  ", f"impure elemental function {name}({', '.join(args)}) result(res)")
    lines += _inputs(form)
    lines.append(f"    {form.result_decl} :: res")
    lines += statement("    ", f"if ({form.raw}({call}) /= RELICORE_OK) res = {form.nan_value}")
    lines.append(f"  end function {name}")
    lines.append("")
    lines += statement("  ", f"impure elemental subroutine {name}_s({', '.join(args + ['out', 'stat'])})")
    lines += _inputs(form)
    lines.append(f"    {form.result_decl}, intent(out) :: out")
    lines.append("    integer(c_int32_t), intent(out), optional :: stat")
    lines.append("    integer(c_int32_t) :: code")
    lines += statement("    ", f"code = {form.raw}({', '.join(args + ['out'])})")
    lines.append(f"    if (code /= RELICORE_OK) out = {form.nan_value}")
    lines.append(f"    call report(code, '{name}', stat)")
    lines.append(f"  end subroutine {name}_s")
    return lines


def array_procedure(form: Form) -> list[str]:
    name, args, x = form.c_name, form.args(), form.fn.array.name

    def c_call(array: str, n: str, out: str) -> str:
        actual = [a if a != x else f"{array}, {n}" for a in args]
        return f"code = {form.raw}({', '.join(actual + [out])})"

    lines = statement("  ", f"subroutine {name}({', '.join(args + ['out', 'stat'])})")
    lines += _inputs(form)
    lines.append(f"    real({form.kind}), intent(out) :: out(:)")
    lines.append("    integer(c_int32_t), intent(out), optional :: stat")
    lines.append("    integer(c_int32_t) :: code")
    if form.receiver:
        lines.append(f"    real({form.kind}) :: empty(1), empty_out(1)")
    lines.append(f"    if (size(out) /= size({x})) then")
    lines.append(f"      out = {form.nan}")
    lines.append("      code = RELICORE_ERROR_LENGTH_MISMATCH")
    lines.append(f"    else if (size({x}) == 0) then")
    if form.receiver:  # the receiver is still checked
        lines.append("      empty = 0")
        lines += statement("      ", c_call("empty", "0_c_size_t", "empty_out"))
    else:
        lines.append("      code = RELICORE_OK")
    lines.append("    else")
    lines += statement("      ", c_call(x, f"size({x}, kind=c_size_t)", "out"))
    lines.append("    end if")
    lines.append(f"    call report(code, '{name}', stat)")
    lines.append(f"  end subroutine {name}")
    return lines


def doc_comment(fn: Function) -> list[str]:
    _, doc = rustdoc.find(fn)
    lines = comment(ascii_text(rustdoc.summary(doc)))
    receiver = RECEIVERS.get(fn.receiver)
    if receiver:
        lines += comment(f"{receiver[0]}: {receiver[2]}", lead="  ", hang="      ")
    for a in fn.args:
        lines += comment(f"{a.name}: {ascii_text(a.meaning)}", lead="  ", hang="      ")
    rt = fn.result_type
    if rt:
        lines += comment(f"Result: type({rt.fortran_type}) (type({rt.fortran_type}_f32) for the "
                         f"_f32 twins): {ascii_text(fn.result)}; every real field NaN and inputs 0 "
                         "on failure.", hang="  ")
    else:
        lines += comment(f"Result: {ascii_text(fn.result)}.")
    base = f"relicore_{fn.name}"
    text = f"Forms: {base}, {base}_s"
    if fn.array:
        arr = Form(fn, False, True)
        text += (f"; {arr.c_name}({', '.join(arr.args() + ['out', 'stat'])}) with "
                 f"{fn.array.name}(i) in place of {fn.array.arg}")
    if fn.f32:
        text += f"; real(c_float) twins {base}_f32, {base}_f32_s"
        if fn.array_f32:
            text += f", {base}_array_f32"
    lines += comment(text + ".", hang="  ")
    return lines


# Kinds and intrinsics of iso_c_binding, never renamed in a single-precision twin.
_C_NAMES = {"c_float", "c_double", "c_int32_t", "c_int64_t", "c_size_t", "c_ptr", "c_char",
            "c_null_char", "c_null_ptr", "c_f_pointer", "c_associated", "c_loc", "c_int", "c_bool"}


def _float_twin(line: str) -> str:
    """The real(c_float) twin of a template line: c_double, double and nan64() become c_float,
    float and nan32(); a name relicore_x, c_x, make_x or table_x becomes x_f32 (x_f32_s for x_s)."""
    line = line.replace("c_double", "c_float").replace("nan64()", "nan32()")
    line = re.sub(r"\bdouble\b", "float", line)

    def rename(m: re.Match[str]) -> str:
        word = m.group(0)
        if word in _C_NAMES:
            return word
        return word[:-2] + "_f32_s" if word.endswith("_s") else word + "_f32"

    return re.sub(r"\b(?:relicore|c|make|table)_\w+", rename, line)


def expand_twins(lines: list[str]) -> list[str]:
    """Template blocks between `!@ twin` and `!@ end twin`, written twice: as they are, then their
    real(c_float) twin (`_float_twin`). A line starting `!@64 ` is only in the double copy and one
    starting `!@32 ` only in the float copy, as written (the wording the two copies differ in)."""
    out: list[str] = []
    block: list[str] | None = None
    for line in lines:
        if line.strip() == "!@ twin":
            if block is not None:
                raise FortranFaceError(f"{TEMPLATE.name}: nested '!@ twin'")
            block = []
        elif line.strip() == "!@ end twin":
            if block is None:
                raise FortranFaceError(f"{TEMPLATE.name}: '!@ end twin' without '!@ twin'")
            out += [b[5:] if b.startswith("!@64 ") else b for b in block if not b.startswith("!@32 ")]
            out += [b[5:] if b.startswith("!@32 ") else _float_twin(b) for b in block
                    if not b.startswith("!@64 ")]
            block = None
        elif block is not None:
            block.append(line)
        else:
            out.append(line)
    if block is not None:
        raise FortranFaceError(f"{TEMPLATE.name}: '!@ twin' without '!@ end twin'")
    return out


def module_text(fns: list[Function]) -> str:
    template = expand_twins(TEMPLATE.read_text().splitlines())
    all_forms = [form for fn in fns for form in forms(fn)]

    coverage = []
    for form in all_forms:
        what = "subroutine" if form.array else "function, _s"
        coverage.append(f"!   {form.c_name:<62}{what}")

    names = [p for form in all_forms for p in procedures(form)]
    public = statement("  ", "public :: " + ", ".join(names), extra="    ")

    interfaces = []
    for form in all_forms:
        interfaces += interface(form)

    procs: list[str] = []
    for fn in fns:
        procs.append("")
        procs += doc_comment(fn)
        for k, form in enumerate(forms(fn)):
            if k:
                procs.append("")
            procs += array_procedure(form) if form.array else scalar_procedures(form)

    types, nan_helpers = result_types(fns)
    parts = part_sections()
    for key, lines in frame_sections(fns).items():
        parts[key] = parts[key] + lines
    procs = [line for _, body in nan_helpers for line in [""] + body] + procs
    inserts = {"coverage": coverage, "public": public, "interfaces": interfaces,
               "procedures": procs, "constants": constants_face.fortran_lines(WIDTH, ascii_text),
               "result_types": types, "parts public": parts["public"],
               "parts interfaces": parts["interfaces"], "parts procedures": parts["procedures"]}
    out: list[str] = []
    seen = set()
    for line in template:
        if line.startswith("!!"):
            continue
        m = re.fullmatch(r"!@ (\w+(?: \w+)?)", line.strip())
        if m:
            key = m.group(1)
            if key not in inserts or key in seen:
                raise FortranFaceError(f"{TEMPLATE.name}: unknown or repeated marker {line!r}")
            seen.add(key)
            out += inserts[key]
        else:
            out.append(line)
    missing = set(MARKERS) - seen
    if missing:
        raise FortranFaceError(f"{TEMPLATE.name}: markers missing: {sorted(missing)}")
    for i, line in enumerate(out, 1):
        if len(line) > 132 or not line.isascii():
            raise FortranFaceError(f"relicore.f90 line {i} is longer than 132 or not ASCII: {line!r}")
    what = f"module relicore from the template {TEMPLATE.name}"
    return banner("!", what) + "\n".join(out).rstrip("\n") + "\n"


def result_types(fns: list[Function]) -> tuple[list[str], list[tuple[str, list[str]]]]:
    """The bind(C) types of the table's result types (and their `_f32` twins), and the
    elemental functions giving a value with every real field NaN (name, lines)."""
    lines: list[str] = []
    helpers: list[tuple[str, list[str]]] = []
    for rt in dict.fromkeys(f.result_type for f in fns if f.result_type):
        for kind, sfx, ctype in (("c_double", "", "double"), ("c_float", "_f32", "float")):
            name = rt.fortran_type + sfx
            c_fields = "; ".join(
                ("uint32_t " if f.kind == "count" else f"{ctype} ") + f.name + (f"[{f.length}]" if f.length > 1 else "")
                for f in rt.fields)
            lines += comment(f"struct {rt.c_struct}{sfx} {{ {c_fields}; }};")
            lines += comment(f"The result of the {rt.name.replace('_', ' ')} functions (the core's "
                             f"{rt.core_type}); a count is integer(c_int32_t) (C uint32_t, values 0 to 5).")
            lines.append(f"  type, bind(C), public :: {name}")
            for f in rt.fields:
                decl = "integer(c_int32_t)" if f.kind == "count" else f"real({kind})"
                dim = f"({f.length})" if f.length > 1 else ""
                lines += [f"    {decl} :: {f.name}{dim}"]
                lines += comment(ascii_text(f.meaning), indent="      ")
            lines.append(f"  end type {name}")
            lines.append("")
            nan = "nan64()" if sfx == "" else "nan32()"
            body = [f"  ! A {name} with every real field NaN and every count 0 (a failed call)."]
            body.append(f"  elemental function nan_{name}() result(x)")
            body.append(f"    type({name}) :: x")
            for f in rt.fields:
                body.append(f"    x%{f.name} = {'0' if f.kind == 'count' else nan}")
            body.append(f"  end function nan_{name}")
            helpers.append((f"nan_{name}", body))
    return lines, helpers


def part_sections() -> dict[str, list[str]]:
    """The sections of the hand-kept parts (bindings/fortran/parts/*.f90), in file order; a line
    `!@ tables` in a section is replaced by that section of the response-table functions."""
    out: dict[str, list[str]] = {"public": [], "interfaces": [], "procedures": []}
    tables = table_sections()
    for path in sorted(PARTS.glob("*.f90")):
        section = None
        for line in path.read_text().splitlines():
            m = re.fullmatch(r"!@@ (\w+)", line.strip())
            if m:
                section = m.group(1)
                if section not in out:
                    raise FortranFaceError(f"{path.name}: unknown section {line!r}")
                continue
            if line.startswith("!!"):
                continue
            if line.strip() == "!@ tables" and section is not None:
                out[section] += tables[section]
                continue
            if section is None:
                if line.strip():
                    raise FortranFaceError(f"{path.name}: text before the first section: {line!r}")
                continue
            out[section].append(line)
    return out


# ---------------------------------------------------------------------------- test dispatch
# The vector tests call a table function by its name: each list below is one `select case`
# block (or one set of name lists) of tests/fortran/test_<topic>.f90, which includes it.


def _names(var: str, names: list[str], length: int = 48) -> list[str]:
    quoted = ", ".join(f"'{n}'" for n in names)
    head = f"character(len={length})\0parameter :: {var}(*) = [character(len={length}) :: "
    return [line.replace("\0", ", ") for line in statement("  ", head + quoted + "]")]


def _case(name: str, body: list[str], indent: str = "    ") -> list[str]:
    return [f"{indent}case ('{name}')"] + [indent + "  " + line for line in body]


def _body(lines: list[str], indent: str = "") -> list[str]:
    out = []
    for line in lines:
        stripped = line.lstrip(" ")
        out += statement(indent + line[: len(line) - len(stripped)], stripped)
    return out


def _actuals(fn: Function, column: bool, f32: bool = False, prefix: str = "") -> list[str]:
    out = []
    for k in range(1, len(fn.args) + 1):
        a = f"a({k}, :)" if column else f"a({k})"
        out.append(f"real({a}, c_float)" if f32 else a)
    return ([prefix] if prefix else []) + out


def _call(fn: Function, actuals: list[str], suffix: str = "") -> str:
    return f"relicore_{fn.name}{suffix}({', '.join(actuals)})"


def _array_actuals(fn: Function, x: str, prefix: str = "") -> list[str]:
    i = fn.array.index(fn)
    out = ["fixed"] * len(fn.args)
    out[i] = x
    return ([prefix] if prefix else []) + out


def test_dispatch(fns: list[Function]) -> dict[str, list[str]]:
    """{include file name: lines}."""
    thermo = thermometry_names()
    bb = [f for f in fns if f.topic == "blackbody" and f.receiver == "none" and not f.result_type
          and f.name not in thermo]
    cos = [f for f in fns if f.topic == "cosmology"]
    dec = [f for f in fns if f.topic == "decoupling"]
    files: dict[str, list[str]] = {}

    # test_blackbody: evaluate_one, evaluate_many, array_form_64, array_form_32
    for key, column in (("blackbody_one", False), ("blackbody_many", True)):
        lines = []
        for f32 in (False, True):
            for fn in bb:
                if f32 and not fn.f32:
                    continue
                sfx, res = ("_f32", "32") if f32 else ("", "64")
                act = _actuals(fn, column, f32)
                size = "size(a, 1)"
                lines += _case(fn.name + sfx, _body([
                    f"nargs = {len(fn.args)}",
                    f"if ({size} == nargs) then",
                    f"  f{res} = {_call(fn, act, sfx)}",
                    f"  call {_call(fn, act + [f's{res}', 'stat'], sfx + '_s')}",
                    "end if"]))
        files[key] = lines
    arrays = [(fn, False) for fn in bb if fn.array] + [(fn, True) for fn in bb if fn.array_f32]
    for fn, _ in arrays:
        if len(fn.args) != 2:
            raise FortranFaceError(f"{fn.name}: test_blackbody's array tests take two arguments")
    files["blackbody_names"] = (
        _names("array_names", [fn.name + ("_f32" if f32 else "") for fn, f32 in arrays], 64)
        + statement("  ", "integer, parameter :: array_positions(*) = ["
                    + ", ".join(str(fn.array.index(fn) + 1) for fn, _ in arrays) + "]"))
    for key, want32 in (("blackbody_array_64", False), ("blackbody_array_32", True)):
        lines = []
        for fn, f32 in arrays:
            if f32 != want32:
                continue
            sfx = "_f32" if f32 else ""
            arr = f"_array{sfx}"
            lines += _case(fn.name + sfx, _body([
                f"call {_call(fn, _array_actuals(fn, 'x') + ['out', 'stat'], arr)}",
                f"call {_call(fn, _array_actuals(fn, 'x(n:1:-1)') + ['out_strided(2 * n:2:-2)', 'stat_reversed'], arr)}",
                f"call {_call(fn, _array_actuals(fn, 'x') + ['too_long', 'stat_mismatch'], arr)}",
                f"call {_call(fn, _array_actuals(fn, 'x(1:0)') + ['out(1:0)', 'stat_empty'], arr)}",
                f"ref = {_call(fn, _array_actuals(fn, 'x'), sfx)}",
                f"call {_call(fn, _array_actuals(fn, 'x') + ['ref_s', 'stats'], sfx + '_s')}"]))
        files[key] = lines

    # test_thermometry: every blackbody function by name (the vectors of thermometry.txt name
    # measurement-equation and uncertainty functions and the blackbody quantities they reduce
    # to); a function with a result type sets `structured` and writes r64/rs64 (r32/rs32)
    lines = []
    for f32 in (False, True):
        for fn in [f for f in fns if f.topic == "blackbody" and f.receiver == "none"]:
            if f32 and not fn.f32:
                continue
            sfx, res = ("_f32", "32") if f32 else ("", "64")
            act = _actuals(fn, False, f32)
            out, out_s = (f"r{res}", f"rs{res}") if fn.result_type else (f"f{res}", f"s{res}")
            lines += _case(fn.name + sfx, _body([
                f"nargs = {len(fn.args)}",
                f"structured = {'.true.' if fn.result_type else '.false.'}",
                "if (size(a) == nargs) then",
                f"  {out} = {_call(fn, act, sfx)}",
                f"  call {_call(fn, act + [out_s, 'stat'], sfx + '_s')}",
                "end if"]))
    files["thermometry_one"] = lines

    # test_cosmology: names, evaluate_one, evaluate_many, array_form, evaluate_constants
    files["cosmology_names"] = (
        _names("all_names", [fn.name for fn in cos])
        + _names("one_names", [fn.name for fn in cos if fn.array])
        + _names("constant_names", [fn.name for fn in cos if not fn.args]))
    files["cosmology_one"] = [
        line for fn in cos for line in _case(fn.name, _body([
            f"nargs = {len(fn.args)}",
            f"if (size(a) == {len(fn.args)}) then",
            f"  f64 = {_call(fn, _actuals(fn, False, prefix='u'))}",
            f"  call {_call(fn, _actuals(fn, False, prefix='u') + ['s64', 'stat'], '_s')}",
            "end if"]))]
    files["cosmology_many"] = [
        line for fn in cos if fn.args for line in _case(fn.name, _body([
            f"f64 = {_call(fn, _actuals(fn, True, prefix='u'))}",
            f"call {_call(fn, _actuals(fn, True, prefix='u') + ['s64', 'stat'], '_s')}"]))]
    files["cosmology_array"] = [
        line for fn in cos if fn.array for line in _case(fn.name, _body([
            f"call {_call(fn, ['u', 'x', 'out', 'stat'], '_array')}"]))]
    files["cosmology_constants"] = [
        line for fn in cos if not fn.args for line in _case(fn.name, _body([
            f"f64 = {_call(fn, ['us'])}",
            f"call {_call(fn, ['us', 's64', 'stat'], '_s')}"]))]

    # test_decoupling: names; the universe (Saha), fit and history dispatch; the elemental
    # and array forms over redshifts; the summary values over histories; the fits' arrays
    recv = {"universe": "u", "history": "h", "none": ""}
    files["decoupling_names"] = (
        _names("all_names", [fn.name for fn in dec])
        + _names("universe_names", [fn.name for fn in dec if fn.receiver == "universe"])
        + _names("fit_names", [fn.name for fn in dec if fn.receiver == "none"])
        + _names("query_names", [fn.name for fn in dec if fn.receiver == "history" and fn.args])
        + _names("summary_names",
                 [fn.name for fn in dec if fn.receiver == "history" and not fn.args]))
    for key, receiver in (("decoupling_universe", "universe"), ("decoupling_fit", "none"),
                          ("decoupling_history", "history")):
        files[key] = [
            line for fn in dec if fn.receiver == receiver for line in _case(fn.name, _body([
                f"got%nargs = {len(fn.args)}",
                f"if (size(a) == {len(fn.args)}) then",
                f"  got%f64 = {_call(fn, _actuals(fn, False, prefix=recv[receiver]))}",
                f"  call {_call(fn, _actuals(fn, False, prefix=recv[receiver]) + ['got%s64', 'got%stat'], '_s')}",
                "end if"]))]
    one = [fn for fn in dec if fn.receiver != "none" and len(fn.args) == 1]
    files["decoupling_many"] = [
        line for fn in one for line in _case(fn.name, _body([
            f"f64 = {_call(fn, [recv[fn.receiver], 'z'])}",
            f"call {_call(fn, [recv[fn.receiver], 'z', 's64', 'stat'], '_s')}"]))]
    files["decoupling_array"] = [
        line for fn in one if fn.array for line in _case(fn.name, _body([
            f"call {_call(fn, [recv[fn.receiver], 'x', 'out', 'stat'], '_array')}"]))]
    files["decoupling_summaries"] = [
        line for fn in dec if fn.receiver == "history" and not fn.args
        for line in _case(fn.name, _body([
            f"f64 = {_call(fn, ['hs'])}",
            f"call {_call(fn, ['hs', 's64', 'stat'], '_s')}"]))]
    fits = [fn for fn in dec if fn.receiver == "none" and fn.array]
    for fn in fits:
        if [a.name for a in fn.args].index(fn.array.arg) != 0 or len(fn.args) != 2:
            raise FortranFaceError(f"{fn.name}: test_fit_arrays takes the first of two arguments")
    files["decoupling_fit_arrays"] = [
        line for fn in fits for line in _case(fn.name, _body([
            f"call {_call(fn, ['wb', 'wm', 'out', 'stat'], '_array')}",
            f"ref = {_call(fn, ['wb', 'wm'])}",
            f"call {_call(fn, ['wb', 'wm', 'ref_s', 'stats'], '_s')}",
            f"call {_call(fn, ['wb(1:1)', 'wm', 'too_long', 'stat_mismatch'], '_array')}"]),
            indent="        ")]

    # test_growth: every growth-topic function by name on its receiver (u a universe, g a
    # linear growth, p a power spectrum); the array forms over the first argument, the others
    # single values
    gro = [f for f in fns if f.topic == "growth"]
    grecv = {"universe": "u", "growth": "g", "power_spectrum": "p", "none": ""}
    files["growth_names"] = (
        _names("all_names", [fn.name for fn in gro])
        + _names("receiver_of", [fn.receiver for fn in gro], 16))
    files["growth_one"] = [
        line for fn in gro for line in _case(fn.name, _body([
            f"nargs = {len(fn.args)}",
            f"if (size(a) == {len(fn.args)}) then",
            f"  f64 = {_call(fn, _actuals(fn, False, prefix=grecv[fn.receiver]))}",
            f"  call {_call(fn, _actuals(fn, False, prefix=grecv[fn.receiver]) + ['s64', 'stat'], '_s')}",
            "end if"]))]
    for fn in gro:
        if fn.array and fn.array.index(fn) != 0:
            raise FortranFaceError(f"{fn.name}: test_growth's array tests take the first argument")
    files["growth_array"] = [
        line for fn in gro if fn.array for line in _case(fn.name, _body([
            f"call {_call(fn, [grecv[fn.receiver], 'x'] + [f'a({k})' for k in range(2, len(fn.args) + 1)] + ['out', 'stat'], '_array')}",
            f"ref = {_call(fn, [grecv[fn.receiver], 'x'] + [f'a({k})' for k in range(2, len(fn.args) + 1)])}"]))]
    return files


def outputs(fns: list[Function]) -> dict[Path, str]:
    out = {MODULE: module_text(fns)}
    for key, lines in test_dispatch(fns).items():
        for i, line in enumerate(lines, 1):
            if len(line) > 132:
                raise FortranFaceError(f"{key}.inc line {i} is longer than 132: {line!r}")
        what = "a dispatch list of the Fortran vector tests"
        out[TESTS / f"{key}.inc"] = banner("!", what) + "\n".join(lines) + "\n"
    return out


# ---------------------------------------------------------------------------- frame forms
FRAME_NOTE = (
    "Object temperature over a frame (an image) of signals: signals(n) and the scene parameters "
    "emissivity, reflected_temperature_k, transmittance, path_temperature_k (and, for the "
    "_with_uncertainty forms, the five standard uncertainties), each of size n (per pixel) or 1 "
    "(shared). One C call for the whole frame; every pixel bit for bit the scalar function's. out "
    "(out_temperature, out_uncertainty) of size n; failing pixels NaN and stat = the first failing "
    "pixel's code; RELICORE_ERROR_LENGTH_MISMATCH (every output NaN) when a parameter has neither n "
    "nor 1 elements or an output is not of size n. Pass an image as a rank-1 view (reshape, or "
    "pointer remapping of a contiguous 2-D array). The _budget_array forms write the whole "
    "type(relicore_temperature_uncertainty) value of each pixel (T, u_c and the five sensitivity "
    "coefficients) into out(n); a failing pixel's value has every real field NaN and inputs 0."
)


@dataclass(frozen=True)
class Frame:
    """One C frame form (`<name>_array`, `_array_f32`) and its Fortran subroutine."""

    fn: Function
    f32: bool
    budget: bool = False  # the budget form of a result type: one derived-type value per pixel

    @property
    def kind(self) -> str:
        return "c_float" if self.f32 else "c_double"

    @property
    def c_name(self) -> str:
        if self.budget:
            return f"relicore_{self.fn.frame_form.budget}" + ("_f32" if self.f32 else "")
        return f"relicore_{self.fn.name}_array" + ("_f32" if self.f32 else "")

    @property
    def out_type(self) -> str:
        """The Fortran type of the outputs."""
        if self.budget:
            return f"type({self.fn.result_type.fortran_type}{'_f32' if self.f32 else ''})"
        return f"real({self.kind})"

    @property
    def out_nan(self) -> str:
        """The failed value of an output element."""
        if self.budget:
            return f"nan_{self.fn.result_type.fortran_type}{'_f32' if self.f32 else ''}()"
        return "nan32()" if self.f32 else "nan64()"

    @property
    def generic(self) -> str | None:
        """The generic name (the double form's) when the C name is too long for Fortran."""
        return self.c_name.removesuffix("_f32") if len(self.c_name) > 63 else None

    def parts(self) -> tuple[list[str], list[str], list[str], list[str]]:
        """(single values, slices, their lengths' names, outputs)."""
        ff = self.fn.frame_form
        names = self.fn.arg_names
        slices = [names[ff.scalars] + "s"] + names[ff.scalars + 1:]
        outs = ["out"] if self.budget else [o for o, _ in ff.outputs]
        return names[: ff.scalars], slices, ["n"] + [f"n_{a}" for a in slices[1:]], outs


def frames(fns: list[Function]) -> list[Frame]:
    order = {f.name: f.order for f in fns}
    framed = sorted((f for f in fns if f.frame_form),
                    key=lambda f: (order[f.name.removesuffix("_with_uncertainty")], f.order))
    plain = [Frame(f, s) for f in framed for s in (False, True) if not s or f.frame_form.f32]
    budgets = [Frame(f, s, True) for f in framed if f.frame_form.budget for s in (False, True)
               if not s or f.frame_form.f32]
    return plain + budgets


def frame_sections(fns: list[Function]) -> dict[str, list[str]]:
    """The public names, bind(C) interfaces and subroutines of the frame forms."""
    all_frames = frames(fns)
    private = {fr.c_name: f"frame_f32_{k}" for k, fr in enumerate((f for f in all_frames if f.generic), 1)}
    public = statement("  ", "public :: " + ", ".join(f.c_name for f in all_frames if not f.generic))
    interfaces: list[str] = []
    procs: list[str] = [""] + comment(FRAME_NOTE) + [""]
    for fr in all_frames:
        singles, slices, lengths, outs = fr.parts()
        ctype = "float" if fr.f32 else "double"
        if fr.generic:
            public += comment(f"{fr.c_name} (more than 63 characters) is the real({fr.kind}) form of the "
                              f"generic name {fr.generic}")
            public += [f"  interface {fr.generic}",
                       f"    module procedure {fr.generic}, {private[fr.c_name]}",
                       f"  end interface {fr.generic}"]
        c_params = [f"{ctype} {a}" for a in singles]
        c_params += [p for s, n in zip(slices, lengths) for p in (f"const {ctype} *{s}", f"size_t {n}")]
        out_c = f"struct {fr.fn.result_type.c_struct}{'_f32' if fr.f32 else ''}" if fr.budget else ctype
        c_params += [f"{out_c} *{o}" for o in outs]
        raw = "c_" + fr.c_name.removeprefix("relicore_")
        actual = singles + [p for s, n in zip(slices, lengths) for p in (s, n)] + outs
        interfaces += comment(f"int32_t {fr.c_name}({', '.join(c_params)});", indent="    ", hang="    ")
        interfaces += statement("    ", f"function {raw}({', '.join(actual)}) &")
        imported = f", {fr.out_type[5:-1]}" if fr.budget else ""
        interfaces += [f"        bind(C, name='{fr.c_name}') result(status)",
                       f"      import :: {fr.kind}, c_int32_t, c_size_t{imported}",
                       f"      real({fr.kind}), value :: {', '.join(singles)}"]
        interfaces += statement("      ", f"real({fr.kind}), intent(in) :: {', '.join(s + '(*)' for s in slices)}")
        interfaces += statement("      ", f"integer(c_size_t), value :: {', '.join(lengths)}")
        interfaces += [f"      {fr.out_type}, intent(out) :: {', '.join(o + '(*)' for o in outs)}",
                       "      integer(c_int32_t) :: status", f"    end function {raw}"]
        name = private.get(fr.c_name, fr.c_name)
        scene = slices[1:]
        nan = fr.out_nan
        call = singles + [p for s in slices for p in (s, f"size({s}, kind=c_size_t)")] + outs
        lines = statement("  ", f"subroutine {name}({', '.join(singles + slices + outs + ['stat'])})")
        lines += [f"    real({fr.kind}), intent(in) :: {', '.join(singles)}"]
        lines += statement("    ", f"real({fr.kind}), intent(in) :: {', '.join(s + '(:)' for s in slices)}")
        lines += [f"    {fr.out_type}, intent(out) :: {', '.join(o + '(:)' for o in outs)}",
                  "    integer(c_int32_t), intent(out), optional :: stat",
                  "    integer(c_int32_t) :: code", "    integer :: n", f"    n = size({slices[0]})",
                  f"    if (.not. ({' .and. '.join(f'size({o}) == n' for o in outs)})) then",
                  "      code = RELICORE_ERROR_LENGTH_MISMATCH", "    else if (n == 0) then",
                  "      ! nothing to compute (a parameter of size 0 or 1 is then valid)",
                  "      code = RELICORE_OK", "      do_check: block", f"        integer :: sizes({len(scene)})"]
        lines += statement("        ", f"sizes = [{', '.join(f'size({s})' for s in scene)}]")
        lines += ["        if (any(sizes > 1)) code = RELICORE_ERROR_LENGTH_MISMATCH",
                  "      end block do_check"]
        lines += [("    else if (" if k == 0 else "        ") + f"size({s}) == 0"
                  + (" .or. &" if k + 1 < len(scene) else ") then") for k, s in enumerate(scene)]
        lines += ["      ! a parameter of size 0 for a non-empty frame (never passed to C as NULL)",
                  "      code = RELICORE_ERROR_LENGTH_MISMATCH", "    else"]
        lines += statement("      ", f"code = {raw}({', '.join(call)})")
        lines += ["    end if", "    if (code == RELICORE_ERROR_LENGTH_MISMATCH) then"]
        lines += [f"      {o} = {nan}" for o in outs]
        lines += ["    end if", f"    call report(code, '{fr.c_name}', stat)", f"  end subroutine {name}"]
        procs += lines + [""]
    return {"public": public, "interfaces": interfaces, "procedures": procs[:-1]}


# ---------------------------------------------------------------------------- response tables
TABLE_NOTE = (
    "with the table copied to buffers of at least one element, so that a zero-size table reaches "
    "the C library as a valid buffer of length 0 (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), "
    "never as a NULL pointer."
)


def table_sections() -> dict[str, list[str]]:
    """The public names, bind(C) interfaces and procedures of the response-table functions
    ([[table_function]]): per function and precision the function, the `_s` subroutine and the
    private `table_` helper that passes the table to C."""
    public_names: list[str] = []
    generics: list[str] = []
    interfaces: list[str] = []
    procs: list[str] = []
    long_names = 0
    for tf in table_functions():
        rt = tf.result_type
        args = list(tf.args)
        if rt:
            result = (f"type({rt.fortran_type}) (_f32 twin), every real field NaN and inputs 0 on "
                      "failure")
        else:
            result = tf.fortran_result
        procs += [""] + comment(tf.fortran_doc)
        procs += ["  ! wavelengths_m(:), response_table(:): the response table (as "
                  "relicore_response_weighted_radiance)"]
        procs += comment(f"{', '.join(args)}: scalars", hang="    ")
        procs += comment(f"Result: {result}. Forms: relicore_{tf.name}, _s, and the real(c_float) "
                         "twins _f32, _f32_s.", hang="  ")
        for f32 in (False, True):
            kind, ctype, sfx = ("c_float", "float", "_f32") if f32 else ("c_double", "double", "")
            c_name = f"relicore_{tf.name}{sfx}"
            raw, helper = f"c_{tf.name}{sfx}", f"table_{tf.name}{sfx}"
            rtype = f"type({rt.fortran_type}{sfx})" if rt else f"real({kind})"
            nan = f"nan_{rt.fortran_type}{sfx}()" if rt else ("nan32()" if f32 else "nan64()")
            sub = c_name + "_s"
            public_names.append(c_name)
            private = sub
            if len(sub) > 63:  # reached through the generic name of the double form
                long_names += 1
                private, generic = f"table_f32_{long_names}", sub.replace("_f32", "", 1)
                generics += comment(f"{sub} (more than 63 characters) is the real({kind}) form of the "
                                    f"generic name {generic}")
                generics += [f"  interface {generic}", f"    module procedure {generic}, {private}",
                             f"  end interface {generic}"]
            else:
                public_names.append(sub)
            # the C prototype and its interface
            struct = f"struct {rt.c_struct}{sfx} *out" if rt else f"{ctype} *out"
            proto = (f"int32_t {c_name}(const {ctype} *wavelengths_m, size_t n_wavelengths, const {ctype} "
                     f"*response_table, size_t n_response_table, "
                     + "".join(f"{ctype} {a}, " for a in args) + f"{struct});")
            interfaces += comment(proto, indent="    ", hang="    ")
            interfaces += statement("    ", f"function {raw}(wavelengths_m, n_wavelengths, response_table, "
                                    f"n_response_table, {', '.join(args)}, out) &")
            interfaces += [f"        bind(C, name='{c_name}') result(status)"]
            interfaces += statement("      ", f"import :: {kind}, c_int32_t, c_size_t"
                                    + (f", {rt.fortran_type}{sfx}" if rt else ""))
            interfaces += [f"      real({kind}), intent(in) :: wavelengths_m(*)",
                           "      integer(c_size_t), value :: n_wavelengths",
                           f"      real({kind}), intent(in) :: response_table(*)",
                           "      integer(c_size_t), value :: n_response_table"]
            interfaces += statement("      ", f"real({kind}), value :: {', '.join(args)}")
            interfaces += [f"      {rtype}, intent(out) :: out", "      integer(c_int32_t) :: status",
                           f"    end function {raw}"]
            # the Fortran procedures
            dummies = ["wavelengths_m", "response_table"] + args
            decl = [f"    real({kind}), intent(in) :: wavelengths_m(:), response_table(:)"]
            decl += statement("    ", f"real({kind}), intent(in) :: {', '.join(args)}")
            procs += [""] + statement("  ", f"function {c_name}({', '.join(dummies)}) result(res)")
            procs += decl + [f"    {rtype} :: res", "    integer(c_int32_t) :: code"]
            procs += statement("    ", f"code = {helper}({', '.join(dummies + ['res'])})")
            procs += [f"    if (code /= RELICORE_OK) res = {nan}", f"  end function {c_name}", ""]
            procs += statement("  ", f"subroutine {private}({', '.join(dummies + ['out', 'stat'])})")
            procs += decl + [f"    {rtype}, intent(out) :: out",
                             "    integer(c_int32_t), intent(out), optional :: stat",
                             "    integer(c_int32_t) :: code"]
            procs += statement("    ", f"code = {helper}({', '.join(dummies + ['out'])})")
            procs += [f"    if (code /= RELICORE_OK) out = {nan}",
                      f"    call report(code, '{c_name}', stat)", f"  end subroutine {private}", ""]
            procs += comment(f"Calls {c_name} {TABLE_NOTE}")
            procs += statement("  ", f"function {helper}({', '.join(dummies + ['out'])}) result(code)")
            procs += decl + [f"    {rtype}, intent(out) :: out", "    integer(c_int32_t) :: code",
                             f"    real({kind}) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))",
                             "    w = 0", "    r = 0", "    w(1:size(wavelengths_m)) = wavelengths_m",
                             "    r(1:size(response_table)) = response_table"]
            procs += statement("    ", f"code = {raw}(w, size(wavelengths_m, kind=c_size_t), r, "
                               f"size(response_table, kind=c_size_t), {', '.join(args)}, out)")
            procs += [f"  end function {helper}"]
    public = statement("  ", "public :: " + ", ".join(public_names)) + generics
    return {"public": public, "interfaces": interfaces, "procedures": procs}
