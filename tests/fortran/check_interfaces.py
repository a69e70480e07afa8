#!/usr/bin/env python3
"""Checks bindings/fortran/relicore.f90 against include/relicore.h, mechanically.

The module is generated (bindings/gen/fortran_face.py, from bindings/functions.toml and the
hand-kept template bindings/fortran/relicore.in.f90), and the header by cbindgen from the C
exports; this script reads neither the table nor the generator, only the two files they write
(python3, standard library only), so a mistake in either generator or in the template shows
here. It fails, naming each problem, when

* a function of the header has no bind(C) interface in the module, or an interface binds a
  name the header does not declare, or a function is bound twice;
* an interface differs from its prototype: number, order or names of the arguments, the kind
  of an argument (real(c_double), real(c_float), integer(c_size_t), integer(c_int32_t),
  type(<struct>)), passing by value or by reference, scalar or array, intent (a `const T *`
  is intent(in), a `T *` intent(out): the C API has no in/out parameters), or the result
  (int32_t -> integer(c_int32_t) function, const char * -> type(c_ptr) function, void ->
  subroutine);
* a struct of the header has no bind(C) derived type with the same components (names, kinds,
  order, and the size of an array component: `double x[3]` is `real(c_double) :: x(3)`,
  `uint64_t s[N]` with `#define N 1920` is `integer(c_int64_t) :: s(N)` with the Fortran
  parameter N = 1920; a component may have a default initialisation);
* a #define of the header has no Fortran parameter of the same name and value;
* a header function has no public Fortran procedure of the same name;
* a stop message names the wrong routine: every routine name a procedure hands to report (or
  report_parameters) must be the procedure's own name without a trailing `_s`, and the C name
  of a bind(C) interface the procedure calls.

Pointer convention read from the header (its calling convention): `const T *` is an input
array when T is double or float, `const struct S *` a struct read by reference, `T *` an output
(a number or a struct); an output is an array of n elements when the prototype has a size_t
argument named `n` (the array forms), otherwise a single value.

    python3 tests/fortran/check_interfaces.py [--header H] [--module F90]
    python3 tests/fortran/check_interfaces.py --self-test   (shows each check can fail)
"""
import argparse
import pathlib
import re
import sys

ROOT = pathlib.Path(__file__).resolve().parent.parent.parent
HEADER = ROOT / "include" / "relicore.h"
MODULE = ROOT / "bindings" / "fortran" / "relicore.f90"

C_SCALARS = {
    "double": ("real", "c_double"),
    "float": ("real", "c_float"),
    "size_t": ("integer", "c_size_t"),
    "int32_t": ("integer", "c_int32_t"),
    "uint64_t": ("integer", "c_int64_t"),  # Fortran has no unsigned kinds: same bits
    "uint32_t": ("integer", "c_int32_t"),  # (a count of inputs, 0 to 5)
}

# Fortran names have at most 63 characters; a longer C name (a `float` twin) is reached through
# the generic Fortran name of its double form (the C name without its first `_f32`), whose
# specific procedures have short private names and whose stop messages name the C function.
FORTRAN_NAME_MAX = 63


# ---------------------------------------------------------------------------- header
def strip_c_comments(text):
    text = re.sub(r"/\*.*?\*/", " ", text, flags=re.S)
    return re.sub(r"//[^\n]*", " ", text)


def parse_c_param(text):
    """'const struct relicore_x *calibration' -> dict(const, base, pointer, name)."""
    text = " ".join(text.replace("*", " * ").split())
    m = re.fullmatch(r"(const )?((?:struct )?\w+) ((?:\* )*)(\w+)", text)
    if not m:
        raise ValueError(f"cannot parse C parameter {text!r}")
    return {
        "const": bool(m.group(1)),
        "base": m.group(2),
        "pointer": m.group(3).count("*"),
        "name": m.group(4),
    }


def parse_header(text):
    raw = text
    text = strip_c_comments(text)
    defines = dict(re.findall(r"^\s*#define\s+(RELICORE_\w+)\s+(\S+)\s*$", text, flags=re.M))
    defines.pop("RELICORE_H", None)
    structs = {}
    for name, body in re.findall(r"struct\s+(\w+)\s*\{([^}]*)\}\s*;", text):
        fields = []
        for decl in body.split(";"):
            decl = " ".join(decl.split())
            if decl:
                ctype, fname = decl.rsplit(" ", 1)
                m = re.fullmatch(r"(\w+)\s*\[\s*(\w+)\s*\]", fname)
                if m:
                    fields.append((m.group(1), ctype, m.group(2)))
                else:
                    fields.append((fname, ctype, None))
        structs[name] = fields
    functions = {}
    body = re.sub(r"struct\s+\w+\s*\{[^}]*\}\s*;", " ", text)
    body = re.sub(r"^\s*#[^\n]*", " ", body, flags=re.M)
    for m in re.finditer(r"((?:const\s+)?\w+(?:\s*\*)*)\s*\b(relicore_\w+)\s*\(([^)]*)\)\s*;", body):
        ret = " ".join(m.group(1).replace("*", " * ").split())
        params = [p.strip() for p in m.group(3).split(",")]
        if params == ["void"] or params == [""]:
            params = []
        if m.group(2) in functions:
            raise ValueError(f"{m.group(2)} declared twice in the header")
        functions[m.group(2)] = {"ret": ret, "params": [parse_c_param(p) for p in params]}
    if not functions and "relicore_" in raw:
        raise ValueError("no prototypes found in the header")
    return defines, structs, functions


# ---------------------------------------------------------------------------- module
def fortran_statements(text):
    """Comment-free, lower-case statements with continuations joined (quoted text kept)."""
    lines = []
    for line in text.splitlines():
        out, quote = [], None
        for ch in line:
            if quote:
                out.append(ch)
                if ch == quote:
                    quote = None
            elif ch in "'\"":
                quote = ch
                out.append(ch)
            elif ch == "!":
                break
            else:
                out.append(ch)
        lines.append("".join(out).rstrip())
    statements, current = [], ""
    for line in lines:
        stripped = line.strip()
        if current:
            if stripped.startswith("&"):
                stripped = stripped[1:]
            current += " " + stripped
        else:
            current = stripped
        if current.endswith("&"):
            current = current[:-1]
            continue
        if current:
            statements.append(" ".join(current.split()))
        current = ""
    return [s if "bind(" in s.lower() else s.lower() for s in statements]


TYPESPEC = r"(real|integer|type|character)\s*\(\s*(?:kind\s*=\s*)?(\w+)\s*\)"


def split_top_level(text):
    """Splits at the commas that are not inside parentheses or brackets."""
    parts, depth, current = [], 0, ""
    for ch in text:
        if ch in "([":
            depth += 1
        elif ch in ")]":
            depth -= 1
        if ch == "," and depth == 0:
            parts.append(current)
            current = ""
        else:
            current += ch
    parts.append(current)
    return [p.strip() for p in parts if p.strip()]


def parse_declaration(stmt):
    """'real(c_double), intent(in) :: a(*), b = 0' -> (base, kind, attrs, [(name, is_array, dims)]),
    dims the text between the parentheses of an array entity (None for a scalar); a default
    initialisation (`= value`) is ignored."""
    m = re.fullmatch(TYPESPEC + r"\s*((?:,\s*[^:]+?)*)\s*::\s*(.+)", stmt)
    if not m:
        return None
    attrs = [a.strip() for a in m.group(3).split(",") if a.strip()]
    dim_attr = None
    for a in attrs:
        md = re.fullmatch(r"dimension\s*\((.*)\)", a)
        if md:
            dim_attr = md.group(1).strip()
    entities = []
    for ent in split_top_level(m.group(4)):
        me = re.match(r"(\w+)\s*(?:\(([^)]*)\))?", ent)
        if not me:
            continue
        dims = me.group(2).strip() if me.group(2) is not None else dim_attr
        entities.append((me.group(1), dims is not None, dims))
    return m.group(1), m.group(2), attrs, entities


def parse_module(text):
    statements = fortran_statements(text)
    interfaces = {}
    types = {}
    parameters = {}
    public = set()
    duplicates = []
    i = 0
    while i < len(statements):
        s = statements[i]
        low = s.lower()
        m = re.fullmatch(
            r"(?:(?:" + TYPESPEC + r")\s+)?(function|subroutine)\s+(\w+)\s*\(([^)]*)\)\s*"
            r"bind\s*\(\s*c\s*,\s*name\s*=\s*(['\"])(\w+)\6\s*\)\s*(?:result\s*\(\s*(\w+)\s*\))?",
            low,
        )
        if m:
            prefix_base, prefix_kind, kind_of, fname, args, _, cname, result = m.groups()
            cname = re.search(r"name\s*=\s*['\"](\w+)['\"]", s, flags=re.I).group(1)
            dummies = [a.strip() for a in args.split(",") if a.strip()]
            decls = {}
            j = i + 1
            while not re.match(r"end\s*(function|subroutine)\b", statements[j]):
                d = parse_declaration(statements[j])
                if d:
                    base, kind, attrs, ents = d
                    for name, is_array, _ in ents:
                        decls[name] = {"base": base, "kind": kind, "attrs": attrs, "array": is_array}
                j += 1
            if kind_of == "function":
                rname = result or fname
                if prefix_base:
                    rtype = (prefix_base, prefix_kind)
                elif rname in decls:
                    rtype = (decls[rname]["base"], decls[rname]["kind"])
                else:
                    rtype = ("?", "?")
            else:
                rtype = None
            entry = {"fortran_name": fname, "dummies": dummies, "decls": decls, "result": rtype}
            if cname in interfaces:
                duplicates.append(cname)
            interfaces[cname] = entry
            i = j + 1
            continue
        m = re.fullmatch(r"type\s*,\s*(.*)::\s*(\w+)", low)
        if m and re.search(r"bind\s*\(\s*c\s*\)", m.group(1)):
            tname = m.group(2)
            comps = []
            j = i + 1
            while not re.match(r"end\s*type\b", statements[j]):
                d = parse_declaration(statements[j])
                if d:
                    base, kind, _, ents = d
                    comps += [(n, base, kind, dims) for n, _, dims in ents]
                j += 1
            types[tname] = comps
            if "public" in m.group(1):
                public.add(tname)
            i = j + 1
            continue
        m = re.fullmatch(TYPESPEC + r"\s*,([^:]*\bparameter\b[^:]*)::\s*(\w+)\s*=\s*(.+)", low)
        if m:
            parameters[m.group(4)] = (m.group(1), m.group(2), m.group(5).strip())
            if "public" in m.group(3):
                public.add(m.group(4))
        m = re.fullmatch(r"public\s*::\s*(.+)", low)
        if m:
            public.update(n.strip() for n in m.group(1).split(","))
        i += 1
    return interfaces, types, parameters, public, duplicates


def stop_names(text, interfaces):
    """Problems with the routine names of the stop messages (see the module docstring); the C
    functions a procedure calls include those its module helpers call."""
    raw = {itf["fortran_name"]: cname for cname, itf in interfaces.items()}
    procs, current, in_interface = {}, None, False
    for stmt in fortran_statements(text):
        low = stmt.lower()
        if re.fullmatch(r"(abstract\s+)?interface(\s+\w+)?", low):
            in_interface = True
        elif re.fullmatch(r"end\s*interface(\s+\w+)?", low):
            in_interface = False
        if in_interface:
            continue
        m = re.match(r"(?:(?:impure|pure|elemental|recursive)\s+)*(?:" + TYPESPEC +
                     r"\s+)?(?:function|subroutine)\s+(\w+)", low)
        if m:
            current = m.group(3)
            procs[current] = {"names": [], "calls": set()}
        elif re.match(r"end\s*(function|subroutine)\b", low):
            current = None
        elif current:
            procs[current]["calls"].update(re.findall(r"\b(\w+)\s*\(", low))
            for m in re.finditer(r"\breport(?:_parameters)?\s*\((.*)\)", low):
                procs[current]["names"] += re.findall(r"'(relicore_\w+)'", m.group(1))

    def c_called(name, seen):
        out = set()
        for callee in procs[name]["calls"]:
            if callee in raw:
                out.add(raw[callee])
            elif callee in procs and callee not in seen:
                out |= c_called(callee, seen | {callee})
        return out

    problems = []
    for proc, info in procs.items():
        own = re.sub(r"_s$", "", proc)
        for name in info["names"]:
            if name != own and len(name + "_s") > FORTRAN_NAME_MAX and len(proc) < len(name):
                own = name  # the short specific of a long name (FORTRAN_NAME_MAX)
            if name != own:
                problems.append(f"{proc}: stop message names {name}, not {own}")
                continue
            called = c_called(proc, {proc})
            if name not in called:
                problems.append(f"{proc}: stop message names {name}, which it does not call "
                                f"(it calls {', '.join(sorted(called)) or 'no C function'})")
    return problems


# ---------------------------------------------------------------------------- comparison
def expected_dummy(param, array_outputs):
    """What a C parameter must look like as a Fortran dummy: (base, kind, value, array, intent)."""
    base = param["base"]
    if base.startswith("struct "):
        if param["pointer"] != 1:
            return None
        # a struct output is an array of n values in the array forms (the budget frames), as a
        # number output is
        return ("type", base.split()[1], False, array_outputs and not param["const"],
                "in" if param["const"] else "out")
    if base not in C_SCALARS:
        return None
    fbase, fkind = C_SCALARS[base]
    if param["pointer"] == 0:
        return (fbase, fkind, True, False, None)
    if param["pointer"] != 1:
        return None
    if param["const"]:
        return (fbase, fkind, False, True, "in")
    return (fbase, fkind, False, array_outputs, "out")


def describe(e):
    base, kind, value, array, intent = e
    parts = [f"{base}({kind})"]
    parts.append("value" if value else "by reference")
    if array:
        parts.append("array")
    if intent:
        parts.append(f"intent({intent})")
    return ", ".join(parts)


def fortran_number(literal):
    lit = literal.lower()
    lit = re.sub(r"_\w+$", "", lit).replace("d", "e")
    return float(lit)


def compare(header_text, module_text):
    problems = []
    defines, structs, functions = parse_header(header_text)
    interfaces, types, parameters, public, duplicates = parse_module(module_text)
    for d in duplicates:
        problems.append(f"{d}: bound by more than one interface")

    for cname, proto in functions.items():
        if cname not in interfaces:
            problems.append(f"{cname}: no bind(C) interface in the Fortran module")
            continue
        itf = interfaces[cname]
        where = f"{cname} (Fortran {itf['fortran_name']})"
        # result
        ret = proto["ret"]
        want_result = {"int32_t": ("integer", "c_int32_t"), "const char *": ("type", "c_ptr"),
                       "void": None}.get(ret, "?")
        if want_result == "?":
            problems.append(f"{where}: unsupported C return type {ret!r}")
        elif itf["result"] != want_result:
            got = "subroutine" if itf["result"] is None else "%s(%s) function" % itf["result"]
            want = "subroutine" if want_result is None else "%s(%s) function" % want_result
            problems.append(f"{where}: returns {ret}, so the interface must be a {want}, not a {got}")
        # arguments
        params = proto["params"]
        if len(params) != len(itf["dummies"]):
            problems.append(
                f"{where}: {len(params)} arguments in the header, {len(itf['dummies'])} in the "
                f"interface ({', '.join(p['name'] for p in params)} vs {', '.join(itf['dummies'])})")
            continue
        array_outputs = any(p["base"] == "size_t" and p["pointer"] == 0 and p["name"] == "n"
                            for p in params)
        for k, (param, dummy) in enumerate(zip(params, itf["dummies"]), start=1):
            if param["name"].lower() != dummy:
                problems.append(f"{where}: argument {k} is {param['name']!r} in the header, "
                                f"{dummy!r} in the interface")
            want = expected_dummy(param, array_outputs)
            if want is None:
                problems.append(f"{where}: argument {k} ({param['name']}): unsupported C type")
                continue
            decl = itf["decls"].get(dummy)
            if decl is None:
                problems.append(f"{where}: argument {k} ({dummy}) has no declaration")
                continue
            attrs = decl["attrs"]
            intent = None
            for a in attrs:
                mi = re.fullmatch(r"intent\s*\(\s*(\w+)\s*\)", a)
                if mi:
                    intent = mi.group(1)
            got = (decl["base"], decl["kind"], "value" in attrs, decl["array"], intent)
            if got != want:
                problems.append(f"{where}: argument {k} ({dummy}) is declared "
                                f"{describe(got)}; the header needs {describe(want)}")

    for cname, itf in interfaces.items():
        if cname not in functions:
            problems.append(f"{cname}: bound by {itf['fortran_name']} but not declared in the header")

    # structs and bind(C) types; array sizes are compared as numbers (a name is resolved through
    # the header's #defines, or the module's parameters)
    def size_of(dim, table):
        if dim is None:
            return None
        dim = dim.strip().lower()
        if re.fullmatch(r"\d+(_\w+)?", dim):
            return int(re.sub(r"_\w+$", "", dim))
        value = table.get(dim)
        if value is None:
            return f"unresolved {dim}"
        return size_of(value, {})

    header_sizes = {k.lower(): v for k, v in defines.items()}
    module_sizes = {k: v[2] for k, v in parameters.items()}
    for sname, fields in structs.items():
        if sname not in types:
            problems.append(f"struct {sname}: no bind(C) derived type {sname} in the module")
            continue
        want = []
        for fname, ctype, dim in fields:
            if ctype not in C_SCALARS:
                problems.append(f"struct {sname}: unsupported field type {ctype!r}")
                continue
            want.append((fname, *C_SCALARS[ctype], size_of(dim, header_sizes)))
        got = [(n, b, k, size_of(d, module_sizes)) for n, b, k, d in types[sname]]
        if got != want:
            problems.append(f"struct {sname}: components {got} differ from the header's {want} "
                            "(name, type, kind, array size)")
        if sname not in public:
            problems.append(f"struct {sname}: the type is not public")
    for tname in types:
        if tname.startswith("relicore_") and tname not in structs:
            problems.append(f"type {tname}: bind(C) type with no struct in the header")

    # #define constants
    for name, value in defines.items():
        key = name.lower()
        if key not in parameters:
            problems.append(f"{name}: no Fortran parameter for this #define")
            continue
        base, kind, literal = parameters[key]
        try:
            is_int = re.fullmatch(r"-?\d+", value) is not None
            if is_int:
                ok = base == "integer" and int(re.sub(r"_\w+$", "", literal)) == int(value)
            else:
                ok = base == "real" and kind == "c_double" and fortran_number(literal) == float(value)
        except ValueError:
            ok = False
        if not ok:
            problems.append(f"{name}: header value {value}, Fortran {base}({kind}) {literal}")
        if key not in public:
            problems.append(f"{name}: the Fortran parameter is not public")

    # a public wrapper of the same name for every function
    for cname in functions:
        if len(cname) > FORTRAN_NAME_MAX and cname.replace("_f32", "", 1) in public:
            continue  # reached through the generic name of its double form
        if cname not in public:
            problems.append(f"{cname}: no public Fortran procedure of this name")
    # the routine named by each stop message
    problems += stop_names(module_text, interfaces)
    return problems, len(functions), len(structs), len(defines)


# ---------------------------------------------------------------------------- self-test
def self_test(header_text, module_text):
    """Each mutation of the module (or header) must be reported; the originals must pass."""
    base, _, _, _ = compare(header_text, module_text)
    failures = []
    if base:
        failures.append(f"the unmodified files have {len(base)} problems: " + "; ".join(base[:3]))

    def sub_once(pattern, repl, text, flags=0):
        new, n = re.subn(pattern, repl, text, count=1, flags=flags)
        if n != 1:
            raise AssertionError(f"self-test pattern not found: {pattern}")
        return new

    mutations = [
        ("interface removed",
         lambda h, f: (h, sub_once(r"\n    function c_peak_frequency\(.*?end function c_peak_frequency\n",
                                   "\n", f, re.S)),
         "relicore_peak_frequency: no bind(C) interface"),
        ("value attribute dropped",
         lambda h, f: (h, sub_once(r"(bind\(C, name='relicore_radiant_exitance'\) result\(status\)\n"
                                   r".*?\n      real\(c_double\)), value ::", r"\1 ::", f, re.S)),
         "relicore_radiant_exitance (Fortran c_radiant_exitance): argument 1"),
        ("double declared float",
         lambda h, f: (h, sub_once(r"(bind\(C, name='relicore_ratio_temperature'\) result\(status\)\n"
                                   r".*?\n      real\()c_double(\), value ::)", r"\1c_float\2", f, re.S)),
         "relicore_ratio_temperature (Fortran c_ratio_temperature): argument 1"),
        ("arguments swapped",
         lambda h, f: (h, sub_once(r"function c_band_fraction_wavelength\(lower_m, upper_m,",
                                   "function c_band_fraction_wavelength(upper_m, lower_m,", f)),
         "relicore_band_fraction_wavelength (Fortran c_band_fraction_wavelength): argument 1 is"),
        ("array output declared scalar",
         lambda h, f: (h, sub_once(r"(bind\(C, name='relicore_spectral_radiance_wavelength_array'\)"
                                   r".*?real\(c_double\), intent\(out\) :: out)\(\*\)", r"\1", f, re.S)),
         "relicore_spectral_radiance_wavelength_array (Fortran "
         "c_spectral_radiance_wavelength_array): argument 4"),
        ("input array passed by value",
         lambda h, f: (h, sub_once(r"(bind\(C, name='relicore_response_weighted_radiance_f32'\)"
                                   r".*?real\(c_float\)), intent\(in\) :: wavelengths_m\(\*\)",
                                   r"\1, value :: wavelengths_m", f, re.S)),
         "relicore_response_weighted_radiance_f32 (Fortran c_response_weighted_radiance_f32): "
         "argument 1"),
        ("struct pointer declared intent(in)",
         lambda h, f: (h, sub_once(r"type\(relicore_two_load_calibration\), intent\(out\) :: out",
                                   "type(relicore_two_load_calibration), intent(in) :: out", f)),
         "relicore_two_load_calibration (Fortran c_two_load_calibration): argument 6"),
        ("extra argument in the header",
         lambda h, f: (sub_once(r"relicore_peak_wavenumber\(double temperature_k,",
                                "relicore_peak_wavenumber(double temperature_k, double extra,", h), f),
         "relicore_peak_wavenumber (Fortran c_peak_wavenumber): 3 arguments in the header"),
        ("new function in the header",
         lambda h, f: (sub_once(r"(int32_t relicore_peak_wavenumber\()",
                                r"int32_t relicore_peak_wavenumber_f32(float temperature_k, float *out);\n\1", h), f),
         "relicore_peak_wavenumber_f32: no bind(C) interface"),
        ("result kind",
         lambda h, f: (h, sub_once(r"(function c_version\(\) bind\(C, name='relicore_version'\) "
                                   r"result\(version\)\n.*?)type\(c_ptr\) :: version",
                                   r"\1integer(c_int32_t) :: version", f, re.S)),
         "relicore_version (Fortran c_version): returns const char *"),
        ("struct component kind",
         lambda h, f: (h, sub_once(r"(type, bind\(C\), public :: relicore_two_load_calibration_f32\n"
                                   r".*?real\()c_float(\) :: gain)", r"\1c_double\2", f, re.S)),
         "struct relicore_two_load_calibration_f32: components"),
        ("array component size",
         lambda h, f: (h, sub_once(r"real\(c_double\) :: neutrino_masses_ev\(3\)",
                                   "real(c_double) :: neutrino_masses_ev(2)", f)),
         "struct relicore_universe_parameters: components"),
        ("array component made scalar",
         lambda h, f: (h, sub_once(r"integer\(c_int64_t\) :: storage\(RELICORE_UNIVERSE_STORAGE_WORDS\)",
                                   "integer(c_int64_t) :: storage", f)),
         "struct relicore_universe: components"),
        ("storage size constant",
         lambda h, f: (h, sub_once(r"RELICORE_UNIVERSE_STORAGE_WORDS = 1920_c_int32_t",
                                   "RELICORE_UNIVERSE_STORAGE_WORDS = 1919_c_int32_t", f)),
         "RELICORE_UNIVERSE_STORAGE_WORDS: header value 1920"),
        ("tag kind",
         lambda h, f: (h, sub_once(r"integer\(c_int64_t\) :: tag = 0_c_int64_t",
                                   "integer(c_int32_t) :: tag = 0_c_int32_t", f)),
         "struct relicore_universe: components"),
        ("struct argument declared a double",
         lambda h, f: (h, sub_once(r"(bind\(C, name='relicore_age_gyr'\) result\(status\)\n"
                                   r".*?\n      )type\(relicore_universe\), intent\(in\) :: universe",
                                   r"\1real(c_double), intent(in) :: universe", f, re.S)),
         "relicore_age_gyr (Fortran c_age_gyr): argument 1"),
        ("index output declared an array",
         lambda h, f: (h, sub_once(r"integer\(c_int32_t\), intent\(out\) :: which_parameter\n"
                                   r"      integer\(c_int32_t\) :: status",
                                   "integer(c_int32_t), intent(out) :: which_parameter(*)\n"
                                   "      integer(c_int32_t) :: status", f)),
         "relicore_universe_check_parameters (Fortran c_universe_check_parameters): argument 2"),
        ("constant value",
         lambda h, f: (h, sub_once(r"RELICORE_ERROR_PANIC = -13_c_int32_t",
                                   "RELICORE_ERROR_PANIC = -14_c_int32_t", f)),
         "RELICORE_ERROR_PANIC: header value -13"),
        ("wrapper not public",
         lambda h, f: (h, sub_once(r"relicore_thermal_sz_null_frequency, ", "", f)),
         "relicore_thermal_sz_null_frequency: no public Fortran procedure"),
        ("stop message names another routine",
         lambda h, f: (h, sub_once(r"call report\(code, 'relicore_peak_frequency', stat\)",
                                   "call report(code, 'relicore_peak_wavelength', stat)", f)),
         "relicore_peak_frequency_s: stop message names relicore_peak_wavelength"),
        ("array form's stop message names its scalar form",
         lambda h, f: (h, sub_once(r"call report\(code, 'relicore_age_gyr_array', stat\)",
                                   "call report(code, 'relicore_age_gyr', stat)", f)),
         "relicore_age_gyr_array: stop message names relicore_age_gyr"),
        ("stop message of a wrapper that calls another C function",
         lambda h, f: (h, sub_once(r"(subroutine relicore_drag_redshift_s\(.*?code = )c_drag_redshift\(",
                                   r"\1c_last_scattering_redshift(", f, re.S)),
         "relicore_drag_redshift_s: stop message names relicore_drag_redshift, which it does not call"),
        ("stale interface",
         lambda h, f: (sub_once(r"int32_t relicore_photon_exitance\(double temperature_k,\s*double \*out\);",
                                "", h), f),
         "relicore_photon_exitance: bound by c_photon_exitance but not declared in the header"),
    ]
    missed = 0
    for label, mutate, expect in mutations:
        missed += 1
        try:
            h, f = mutate(header_text, module_text)
        except AssertionError as e:
            failures.append(f"{label}: {e}")
            continue
        problems, _, _, _ = compare(h, f)
        if any(p.startswith(expect) for p in problems):
            missed -= 1
        else:
            failures.append(f"{label}: expected a problem starting {expect!r}, got "
                            f"{len(problems)} others: {problems[:3]}")
    for msg in failures:
        print("SELF-TEST FAILED:", msg)
    print(f"check_interfaces self-test: {len(mutations)} mutations of the files, "
          f"{len(mutations) - missed} detected, {missed} missed; unmodified files: "
          f"{len(base)} problems")
    return 1 if failures else 0


def main():
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--header", type=pathlib.Path, default=HEADER)
    ap.add_argument("--module", type=pathlib.Path, default=MODULE)
    ap.add_argument("--self-test", action="store_true")
    args = ap.parse_args()
    header_text = args.header.read_text()
    module_text = args.module.read_text()
    if args.self_test:
        return self_test(header_text, module_text)
    problems, nfun, nstruct, ndef = compare(header_text, module_text)
    for p in problems:
        print("MISMATCH", p)
    print(f"check_interfaces: {nfun} functions, {nstruct} structs, {ndef} constants of "
          f"{args.header.name} checked against {args.module.name}: {len(problems)} problems")
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main())
