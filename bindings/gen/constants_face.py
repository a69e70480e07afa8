"""The physical constants of every face, from their one home src/constants.rs: each
`pub const NAME: f64 = literal;` there (and in its `roots` submodule) with the `///` lines above
it. Written here:

* bindings/c/src/gen_constants.rs: `RELICORE_NAME` (`RELICORE_ROOT_NAME` for the roots) as
  literals, because cbindgen drops `pub const X: f64 = relicore::constants::X`; a compile-time
  assertion makes each literal the core's value bit for bit;
* bindings/python/src/gen_constants.rs: the (name, value) lists behind the native dicts
  `CONSTANTS` and `ROOTS`, read from the compiled core;
* bindings/python/python/relicore/constants.py and constants.pyi: the public names, with the
  rustdoc as docstrings, and `__all__`.

The Fortran parameters are written by fortran_face.py at the template's `!@ constants` marker
from `fortran_lines()` below.
"""

from __future__ import annotations

import re
import textwrap
from dataclasses import dataclass
from pathlib import Path

from . import rustdoc
from .common import banner
from .table import ROOT

SOURCE = ROOT / "src" / "constants.rs"
C_FILE = ROOT / "bindings" / "c" / "src" / "gen_constants.rs"
NATIVE_FILE = ROOT / "bindings" / "python" / "src" / "gen_constants.rs"
PACKAGE = ROOT / "bindings" / "python" / "python" / "relicore"
SUBMODULE = "roots"
C_PREFIX = {"": "RELICORE_", SUBMODULE: "RELICORE_ROOT_"}

_CONST = re.compile(r"pub const (\w+): f64 = ([^;]+);")
_LITERAL = re.compile(r"-?[0-9][0-9_]*(\.[0-9_]+)?([eE][+-]?[0-9]+)?")


class ConstantsError(Exception):
    pass


@dataclass(frozen=True)
class Constant:
    name: str
    module: str  # "" for relicore::constants, "roots" for relicore::constants::roots
    literal: str  # the Rust literal as written in src/constants.rs
    doc: tuple[str, ...]  # its rustdoc lines, plain text

    @property
    def c_name(self) -> str:
        return C_PREFIX[self.module] + self.name

    @property
    def number(self) -> str:
        """The literal without digit separators."""
        return self.literal.replace("_", "")


def load(path: Path = SOURCE) -> tuple[list[Constant], list[str]]:
    """(the constants in source order, the rustdoc of the `roots` submodule)."""
    constants: list[Constant] = []
    module = ""
    doc: list[str] = []
    module_doc: list[str] = []
    depth = 0
    for i, raw in enumerate(path.read_text().splitlines(), 1):
        line = raw.strip()
        where = f"{path.relative_to(ROOT)}:{i}"
        if line.startswith("///"):
            text = line[3:]
            doc.append(rustdoc.plain(text[1:] if text.startswith(" ") else text))
            continue
        if line.startswith(f"pub mod {SUBMODULE} {{"):
            if module:
                raise ConstantsError(f"{where}: nested module")
            module, module_doc, doc = SUBMODULE, doc, []
            depth = 1
            continue
        if line.startswith("pub mod "):
            raise ConstantsError(f"{where}: only the submodule `{SUBMODULE}` is known: {line!r}")
        if line.startswith("pub const "):
            m = _CONST.fullmatch(line)
            if not m or not _LITERAL.fullmatch(m.group(2)):
                raise ConstantsError(f"{where}: not `pub const NAME: f64 = literal;`: {line!r}")
            if not doc:
                raise ConstantsError(f"{where}: {m.group(1)} has no rustdoc")
            constants.append(Constant(m.group(1), module, m.group(2), tuple(doc)))
            doc = []
            continue
        if line == "}" and module:
            depth -= 1
            if depth == 0:
                module = ""
            continue
        if line and not line.startswith("//"):
            raise ConstantsError(f"{where}: unexpected item {line!r}")
        doc = []
    names = [(c.module, c.name) for c in constants]
    if len(set(names)) != len(names):
        raise ConstantsError(f"{path.name}: a constant is declared twice")
    if not constants:
        raise ConstantsError(f"{path.name}: no constants found")
    return constants, module_doc


# ---------------------------------------------------------------------------- C
def c_text(constants: list[Constant]) -> str:
    out = [
        banner("//", "the physical constants of the C face, from src/constants.rs"),
        "//! The core's physical and astronomical constants as `#define`s for C, written as",
        "//! literals (cbindgen drops `pub const X: f64 = relicore::constants::X`); each is",
        "//! asserted at compile time to be the core's value bit for bit. `RELICORE_ROOT_*` are",
        "//! the dimensionless roots of `relicore::constants::roots`.",
        "",
    ]
    for c in constants:
        out += [f"/// {line}".rstrip() for line in c.doc]
        out.append(f"pub const {c.c_name}: f64 = {c.literal};")
    out += [
        "",
        "/// Equal as bits (not as numbers: 0.0 and -0.0 differ, NaN equals itself).",
        "const fn same(a: f64, b: f64) -> bool {",
        "    a.to_bits() == b.to_bits()",
        "}",
        "",
        "// Every literal above is the core's constant, bit for bit; a build fails otherwise.",
        "#[rustfmt::skip] // one line per constant, whatever its length",
        "const _: () = {",
        "    use relicore::constants as consts;",
        f"    use relicore::constants::{SUBMODULE};",
    ]
    for c in constants:
        core = f"{SUBMODULE}::{c.name}" if c.module else f"consts::{c.name}"
        out.append(f"    assert!(same({c.c_name}, {core}));")
    out.append("};")
    return "\n".join(out) + "\n"


# ---------------------------------------------------------------------------- Fortran
def fortran_lines(width: int, ascii_text) -> list[str]:
    """The `real(c_double), parameter` of each constant under its doc comment (ASCII), each
    statement within `width` columns, continued after `::` when longer."""
    constants, _ = load()
    out: list[str] = []
    for c in constants:
        number = c.number if re.search(r"[eE]", c.number) else c.number + "e0"
        text = ascii_text(" ".join(c.doc))
        out += textwrap.wrap(
            text, width, initial_indent="  ! ", subsequent_indent="  ! ",
            break_on_hyphens=False, break_long_words=False,
        )
        head = "  real(c_double), parameter, public :: "
        body = f"{c.c_name} = {number}_c_double"
        if len(head) + len(body) <= width:
            out.append(head + body)
        else:
            out += [head + "&", "      " + body]
    return out


# ---------------------------------------------------------------------------- Python
def native_text(constants: list[Constant]) -> str:
    out = [
        banner("//", "the constants of relicore._native (CONSTANTS, ROOTS), from src/constants.rs"),
        "//! The core's constants by name, for the dicts `CONSTANTS` and `ROOTS` of",
        "//! `relicore._native`; the values are the compiled core's, never retyped.",
        "",
        "use relicore::constants as consts;",
        f"use relicore::constants::{SUBMODULE};",
    ]
    for module, dict_name, what in (("", "CONSTANTS", "`relicore::constants`"),
                                     (SUBMODULE, "ROOTS", f"`relicore::constants::{SUBMODULE}`")):
        prefix = f"{SUBMODULE}::" if module else "consts::"
        out += ["", f"/// The constants of {what}, by name.",
                "#[rustfmt::skip] // one line per constant, whatever its length",
                f"pub(crate) static {dict_name}: &[(&str, f64)] = &["]
        out += [f'    ("{c.name}", {prefix}{c.name}),' for c in constants if c.module == module]
        out.append("];")
    return "\n".join(out) + "\n"


PY_DOC = '''"""Physical and astronomical constants of the relicore core, each in SI units.

The values are read from the compiled core (``relicore::constants``), never retyped here, so
every language sees the same bits. Sources: SI 2019 defining constants (exact), CODATA 2022,
values derived from the exact constants with 40-digit arithmetic, and IAU resolutions; each
constant's docstring gives its unit and source. ``roots`` holds the dimensionless roots of the
peak conditions and of the thermal Sunyaev-Zeldovich null.
"""'''

STUB_DOC = '"""Physical and astronomical constants of the relicore core, each in SI units."""'


def _docstring(doc: tuple[str, ...] | list[str], indent: str) -> list[str]:
    text = "\n".join(doc).strip().replace("\\", "\\\\")
    if '"""' in text:
        raise ConstantsError(f"a rustdoc holds triple quotes: {text!r}")
    lines = text.split("\n")
    if len(lines) == 1:
        return [f'{indent}"""{lines[0]}"""']
    return [f'{indent}"""{lines[0]}'] + [indent + line if line else "" for line in lines[1:]] + [
        f'{indent}"""'
    ]


def _all(constants: list[Constant]) -> list[str]:
    names = [c.name for c in constants if not c.module] + [SUBMODULE]
    return ["__all__ = ["] + [f'    "{n}",' for n in names] + ["]"]


def python_text(constants: list[Constant], roots_doc: list[str]) -> str:
    what = "the public constants of relicore.constants, from src/constants.rs"
    out = [
        banner("#", what) + PY_DOC,
        "",
        "from typing import Final",
        "",
        "from relicore._native import CONSTANTS as _C",
        "from relicore._native import ROOTS as _R",
        "",
    ]
    for c in constants:
        if not c.module:
            out.append(f'{c.name}: Final[float] = _C["{c.name}"]')
            out += _docstring(c.doc, "")
            out.append("")
    out += ["", f"class {SUBMODULE}:"] + _docstring(roots_doc, "    ") + ["", "    __slots__ = ()"]
    for c in constants:
        if c.module:
            out += ["", f'    {c.name}: Final[float] = _R["{c.name}"]'] + _docstring(c.doc, "    ")
    out += ["", ""] + _all(constants)
    return "\n".join(out) + "\n"


def stub_text(constants: list[Constant]) -> str:
    what = "the type stubs of relicore.constants, from src/constants.rs"
    out = [banner("#", what) + STUB_DOC, "", "from typing import Final", ""]
    out += [f"{c.name}: Final[float]" for c in constants if not c.module]
    out += ["", f"class {SUBMODULE}:"]
    out += [f"    {c.name}: Final[float]" for c in constants if c.module]
    out += [""] + _all(constants)
    return "\n".join(out) + "\n"


def outputs(fns) -> dict[Path, str]:
    """Every file of this emitter; `fns` (the table of functions) is not used: constants are
    not in it."""
    del fns
    constants, roots_doc = load()
    return {
        C_FILE: c_text(constants),
        NATIVE_FILE: native_text(constants),
        PACKAGE / "constants.py": python_text(constants, roots_doc),
        PACKAGE / "constants.pyi": stub_text(constants),
    }
