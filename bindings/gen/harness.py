"""The function lists of the C test harnesses (tests/c/gen_functions.h): X-macro lists of the
regular functions, one per topic and shape, that test_blackbody.c, test_cosmology.c,
test_decoupling.c and hostile_abi.c expand into their dispatch tables, so that a new table entry
reaches every C harness without a hand edit. The irregular functions (calibration, response
tables, universe and thermal-history construction, status messages, version) stay written by
hand in the harnesses."""

from __future__ import annotations

import re

from .common import banner
from .table import RECEIVERS, ROOT, TOPICS, Function, thermometry_names

OUT = ROOT / "tests" / "c" / "gen_functions.h"

# What the harnesses can call (their dispatch shapes); anything else is an error here, with
# the place to extend, rather than a compile error in tests/c.
MAX_NARGS = {"none": 4, "universe": 2, "history": 2, "growth": 2, "power_spectrum": 2}
ARRAY_NARGS = {"none": 2, "universe": 1, "history": 1, "growth": 1, "power_spectrum": 1}
# tests/c/hostile_growth.c and test_growth.c call the array forms of the growth topic over their
# first argument with the others single values (the BAO ratios: z, then r_d)
ARRAY_NARGS_GROWTH = 2

_POSITIVE = re.compile(r"(?<![<>=!])> 0(?![\d.eE])")
_NONNEGATIVE = re.compile(r">= 0(?![\d.eE])|(?<![\d.])0 <= ")
_HISTORY_TOP = "<= the highest redshift of the history"
_UPPER = re.compile(r"<= ([0-9][0-9.]*(?:e[+-]?[0-9]+)?)\s*$")


def domain(fn: Function) -> tuple[str, str]:
    """The domain the table states for each argument, as the harnesses check it: one letter per
    argument ('p' > 0, 'n' >= 0, 'h' 0 <= z <= the highest redshift of the history, '-' no
    bound they check) and the upper bound of the first argument ('INFINITY' when none)."""
    codes = []
    upper = "INFINITY"
    for i, a in enumerate(fn.args):
        m = a.meaning
        if _HISTORY_TOP in m:
            codes.append("h")
        elif _NONNEGATIVE.search(m):
            codes.append("n")
        elif _POSITIVE.search(m):
            codes.append("p")
        else:
            codes.append("-")
        u = _UPPER.search(m.split(",")[-1].strip()) if _HISTORY_TOP not in m else None
        if u and i == 0:
            upper = u.group(1)
            if "." not in upper and "e" not in upper:
                upper += ".0"
    return "".join(codes), upper


# Functions without a receiver of more arguments, or with a result type, go to their own lists
# (the scene functions of radiation thermometry), which tests/c/test_thermometry.c and
# tests/c/hostile_thermometry.c expand.
WIDE_NARGS = 12


def _wide(fn: Function) -> bool:
    """A function of the thermometry lists: more than 4 arguments, a result struct, or its
    reference vectors in tests/data/thermometry*.txt."""
    return fn.receiver == "none" and (
        len(fn.args) > MAX_NARGS["none"] or fn.result_type is not None or fn.name in thermometry_names()
    )


def _check(fn: Function) -> None:
    where = f"harness.py: {fn.name}"
    if _wide(fn):
        if len(fn.args) > WIDE_NARGS or fn.array:
            raise SystemExit(f"{where}: the wide lists take at most {WIDE_NARGS} arguments and no array form")
        return
    if len(fn.args) > MAX_NARGS[fn.receiver]:
        raise SystemExit(
            f"{where}: the C harnesses call {fn.receiver!r}-receiver functions of at most "
            f"{MAX_NARGS[fn.receiver]} arguments; extend tests/c (call_entry/call_scalar) first"
        )
    if fn.array and fn.topic == "growth":
        if len(fn.args) > ARRAY_NARGS_GROWTH or fn.array.index(fn) != 0:
            raise SystemExit(f"{where}: the growth harnesses call array forms over the first of at most "
                             f"{ARRAY_NARGS_GROWTH} arguments; extend tests/c/test_growth.c and hostile_growth.c first")
        return
    if fn.array and len(fn.args) != ARRAY_NARGS[fn.receiver]:
        raise SystemExit(
            f"{where}: the C harnesses call array forms of {fn.receiver!r}-receiver functions of "
            f"{ARRAY_NARGS[fn.receiver]} argument(s) only; extend tests/c first"
        )
    if fn.array and fn.receiver == "none" and fn.array.index(fn) > 1:
        raise SystemExit(f"{where}: array argument beyond the second; extend tests/c first")


def _list(macro: str, params: str, doc: str, rows: list[str]) -> list[str]:
    out = [f"/* {doc}: X({params}) */", f"#define {macro}(X)" + (" \\" if rows else "")]
    for i, r in enumerate(rows):
        out.append(f"    X({r})" + (" \\" if i + 1 < len(rows) else ""))
    out.append("")
    return out


def _header(fns: list[Function]) -> str:
    for fn in fns:
        _check(fn)
    lines = [
        banner("//", "the function lists of the C harnesses"),
        "/*",
        " * One list per topic and shape. X(name, nargs, domain, upper, array) for scalar forms: name",
        " * without the relicore_ prefix (and without _f32 in the _F32 lists), nargs its arguments",
        " * after the receiver, domain one letter per argument from the table's argument text",
        " * ('p' > 0, 'n' >= 0, 'h' 0 <= z <= the highest redshift of the history, '-' no bound",
        " * checked), upper the table's upper bound of the first argument, array 1 when the form has",
        " * an array twin (_array, or _array_f32 in the _F32 lists). X(name, nargs, pos) for array",
        " * forms: pos is the position of the array argument among the scalar function's arguments.",
        " * Lists: RELICORE_<TOPIC>_SCALARS, _SCALARS_F32, _ARRAYS, _ARRAYS_F32 (no receiver),",
        " * _UNIVERSE, _UNIVERSE_ARRAYS (a universe first), _HISTORY, _HISTORY_ARRAYS (a thermal",
        " * history first); _WIDE, _WIDE_F32 (no receiver, more than 4 arguments or reference vectors",
        " * in tests/data/thermometry*.txt) and _STRUCTS,",
        " * _STRUCTS_F32 (no receiver, a result struct: relicore_temperature_uncertainty[_f32]);",
        " * a list may be empty.",
        " * Every receiver of the table has its two lists: _GROWTH, _GROWTH_ARRAYS (a linear growth",
        " * first) and _POWER_SPECTRUM, _POWER_SPECTRUM_ARRAYS (a linear power spectrum first) too.",
        " */",
        "#ifndef RELICORE_TESTS_GEN_FUNCTIONS_H",
        "#define RELICORE_TESTS_GEN_FUNCTIONS_H",
        "",
        f"#define RELICORE_TOPICS {len(TOPICS)}",
        "",
    ]
    for topic in TOPICS:
        T = topic.upper()
        mine = [f for f in fns if f.topic == topic]
        lines.append(f"/* ---- {topic} " + "-" * (88 - len(topic)) + " */")
        lines.append("")

        def scalar_rows(sel, f32=False):
            rows = []
            for f in sel:
                d, u = domain(f)
                has_array = f.array_f32 if f32 else f.array is not None
                rows.append(f'{f.name}, {len(f.args)}, "{d}", {u}, {int(has_array)}')
            return rows

        def array_rows(sel):
            return [f"{f.name}, {len(f.args)}, {f.array.index(f)}" for f in sel]

        none = [f for f in mine if f.receiver == "none" and not _wide(f)]
        wide = [f for f in mine if _wide(f) and not f.result_type]
        structs = [f for f in mine if _wide(f) and f.result_type]
        lines += _list(f"RELICORE_{T}_SCALARS", "name, nargs, domain, upper, array",
                       f"{topic}: double scalar forms without a receiver", scalar_rows(none))
        lines += _list(f"RELICORE_{T}_SCALARS_F32", "name, nargs, domain, upper, array",
                       f"{topic}: float twins (relicore_<name>_f32)",
                       scalar_rows([f for f in none if f.f32], f32=True))
        lines += _list(f"RELICORE_{T}_ARRAYS", "name, nargs, pos",
                       f"{topic}: array forms without a receiver (relicore_<name>_array)",
                       array_rows([f for f in none if f.array]))
        lines += _list(f"RELICORE_{T}_ARRAYS_F32", "name, nargs, pos",
                       f"{topic}: float array forms (relicore_<name>_array_f32)",
                       array_rows([f for f in none if f.array_f32]))
        lines += _list(f"RELICORE_{T}_WIDE", "name, nargs, domain, upper, array",
                       f"{topic}: double scalar forms of more than 4 arguments", scalar_rows(wide))
        lines += _list(f"RELICORE_{T}_WIDE_F32", "name, nargs, domain, upper, array",
                       f"{topic}: their float twins", scalar_rows([f for f in wide if f.f32], f32=True))
        lines += _list(f"RELICORE_{T}_STRUCTS", "name, nargs, domain, upper, array",
                       f"{topic}: double forms writing a result struct", scalar_rows(structs))
        lines += _list(f"RELICORE_{T}_STRUCTS_F32", "name, nargs, domain, upper, array",
                       f"{topic}: their float twins", scalar_rows([f for f in structs if f.f32], f32=True))
        for receiver in RECEIVERS:
            R = receiver.upper()
            sel = [f for f in mine if f.receiver == receiver]
            lines += _list(f"RELICORE_{T}_{R}", "name, nargs, domain, upper, array",
                           f"{topic}: functions of a {receiver}", scalar_rows(sel))
            lines += _list(f"RELICORE_{T}_{R}_ARRAYS", "name, nargs, pos",
                           f"{topic}: array forms of the functions of a {receiver}",
                           array_rows([f for f in sel if f.array]))
    lines.append("#endif")
    return "\n".join(lines) + "\n"


def outputs(fns: list[Function]) -> dict:
    return {OUT: _header(fns)}
