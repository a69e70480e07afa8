#!/usr/bin/env python3
"""Coverage guard: every public function of the core has its C, Fortran and Python faces,
reference vectors in tests/data/ and a criterion bench, and is reached by the reliability
harnesses: the property tests (tests/proptest_*.rs), the threads test
(tests/threads.rs), the C hostile-input harness (tests/c/hostile_*.c, which must also call
every function declared in include/relicore.h: array forms, f32 twins and universe functions
included) and the Python hypothesis tests (tests/python/test_hypothesis_*.py). Every public
kernel of src/math/ is reached by tests/proptest_math.rs. Prints what is missing and exits 1.

The list of public functions is read from the core's source (`pub fn` in src/<topic>/ and
src/math/) and from the header, so a new function joins the guard automatically; the regular
functions and their forms (`_f32`, `_array`, `_array_f32`) are read from the one table,
bindings/functions.toml. Comments never count: every text is searched with its comments removed.
"""
import pathlib
import re
import sys

ROOT = pathlib.Path(__file__).resolve().parent.parent
TOPICS = ["blackbody", "cosmology", "decoupling", "growth"]

# Functions whose vectors are named after the function that exercises them, with the reason.
VECTOR_ALIASES = {
    # the calibration struct is built by every calibrated_* vector (6-argument lines)
    "two_load_calibration": "calibrated_temperature",
}

# Public methods that are not physics functions of their own, with the face that carries them.
NOT_FUNCTIONS = {
    # Universe::new is relicore_universe_init in C/Fortran and the Universe(...) constructor in
    # Python; every vector line of tests/data/cosmology.txt goes through it.
    "new",
    # Universe::parameters is the parameter struct in C/Fortran and read-only properties in Python.
    "parameters",
    # LinearGrowth::compute_in_place is relicore_linear_growth_compute (C, Fortran) and the
    # LinearGrowth(universe) constructor (Python); every growth line of tests/data/growth.txt
    # goes through it.
    "compute_in_place",
    # LinearPowerSpectrum::with_scalar_amplitude / with_sigma8 and their _in_place forms are
    # relicore_linear_power_spectrum_compute with the options' normalisation switch (C, Fortran)
    # and the LinearPowerSpectrum(growth, scalar_amplitude=... | sigma8=...) constructor (Python);
    # every spectrum line of tests/data/growth.txt goes through one of them.
    "with_scalar_amplitude",
    "with_sigma8",
    "compute_with_scalar_amplitude_in_place",
    "compute_with_sigma8_in_place",
    # the inputs kept by a growth or spectrum: Python properties (LinearGrowth.universe,
    # LinearPowerSpectrum.growth); C and Fortran callers hold the structs they passed.
    "universe",
    "growth",
    # D_u(1): LinearGrowth.unnormalized_growth_factor_today in Python; the same number as
    # unnormalized_growth_factor(0) in every face (tests/python/test_growth.py checks equality).
    "unnormalized_growth_factor_today",
}


def public_functions(topic):
    """Free functions (`pub fn` at the start of a line) and methods (`    pub fn name(&self`) of
    the public types of the topic (`pub struct`/`pub enum`: a `pub fn` in the impl of a
    `pub(crate)` type is not public API)."""
    files = sorted((ROOT / "src" / topic).glob("*.rs"))
    public_types = set()
    for p in files:
        public_types.update(re.findall(r"^pub (?:struct|enum) (\w+)", p.read_text(), flags=re.M))
    names = []
    for p in files:
        text = p.read_text()
        names += re.findall(r"^pub fn (\w+)", text, flags=re.M)
        impl_type = None
        lines = text.splitlines()
        for k, line in enumerate(lines):
            m = re.match(r"impl(?:<[^>]*>)?\s+(?:\w+(?:<[^>]*>)?\s+for\s+)?(\w+)", line)
            if m:
                impl_type = m.group(1)
            elif line.startswith("}"):
                impl_type = None
            # `(&self` on the same line, or on the next one when rustfmt broke the signature
            m = re.match(r"    pub fn (\w+)(?:<[^>]*>)?\((&self|$)", line)
            if m and m.group(2) == "" and not (k + 1 < len(lines) and lines[k + 1].strip().startswith("&self")):
                m = None
            if m and impl_type in public_types:
                names.append(m.group(1))
    return [n for n in dict.fromkeys(names) if n not in NOT_FUNCTIONS]


def strip_comments(text, suffix):
    """`text` without its comments: // and /* */ (Rust, C), ! (Fortran), # (Python, data)."""
    if suffix in (".rs", ".c", ".h"):
        text = re.sub(r"/\*.*?\*/", " ", text, flags=re.S)
        return re.sub(r"//[^\n]*", "", text)
    if suffix in (".f90", ".inc"):
        return re.sub(r"![^\n]*", "", text)
    if suffix in (".py", ".pyi", ".txt"):
        # docstrings stay (stubs keep signatures only); comment lines and trailing comments go
        return re.sub(r"(^|\s)#[^\n]*", r"\1", text, flags=re.M)
    return text


def read_all(pattern):
    """The text of every file matching a glob pattern under the repository root, comments removed."""
    return "".join(strip_comments(p.read_text(), p.suffix) for p in sorted(ROOT.glob(pattern)))


def hostile_lists():
    """{name: {False, True}} for the regular functions the C hostile harness reaches through the
    generated lists of tests/c/gen_functions.h: a list counts when hostile_abi.c expands it (its
    name appears in the code, comments removed); True marks the `float` (_F32) lists."""
    gen = (ROOT / "tests/c/gen_functions.h").read_text()
    hostile = read_all("tests/c/hostile_*.c")
    reached = {}
    for m in re.finditer(r"#define (RELICORE_\w+)\(X\)((?:[^\n]*\\\n)*[^\n]*)", gen):
        if not re.search(rf"\b{m.group(1)}\b", hostile):
            continue
        for name in re.findall(r"X\((\w+)", m.group(2)):
            reached.setdefault(name, set()).add("_F32" in m.group(1))
    return reached


def hypothesis_lists():
    """Names of the regular functions the Python hypothesis tests reach through the lists of
    tests/python/faces_table.py (built from the table) that they import."""
    sys.path.insert(0, str(ROOT / "tests" / "python"))
    import faces_table  # noqa: E402

    code = read_all("tests/python/test_hypothesis_*.py")
    reached = set()
    for list_name in re.findall(r"from faces_table import ([\w, ]+)", code):
        for name in (n.strip() for n in list_name.split(",")):
            value = getattr(faces_table, name, None)
            if isinstance(value, (dict, tuple, list)):
                reached.update(v if isinstance(v, str) else v[0] for v in value)
    return reached


def table_functions():
    """The regular functions of bindings/functions.toml (through the generator's loader)."""
    sys.path.insert(0, str(ROOT / "bindings"))
    from gen import table  # noqa: E402

    return table.load()


def math_kernels():
    """Public functions of src/math/ (numerical kernels: no faces, but property tests)."""
    names = []
    for p in sorted((ROOT / "src" / "math").glob("*.rs")):
        names += re.findall(r"^pub fn (\w+)", p.read_text(), flags=re.M)
    return list(dict.fromkeys(names))


def header_functions(header):
    """Every function declared in the C header."""
    return list(dict.fromkeys(re.findall(r"^(?:int32_t|const char \*)\s*(relicore_\w+)\(", header, flags=re.M)))


def main():
    header = strip_comments((ROOT / "include/relicore.h").read_text(), ".h")
    # tests/gen_regular.rs (generated from the table) holds the contract property test and the
    # threads test of every regular function
    proptests = read_all("tests/proptest_*.rs") + read_all("tests/gen_regular.rs")
    threads = read_all("tests/threads.rs") + read_all("tests/gen_regular.rs")
    hostile_c = read_all("tests/c/hostile_*.c")
    hypothesis = read_all("tests/python/test_hypothesis_*.py")
    fortran_path = ROOT / "bindings/fortran/relicore.f90"
    fortran = strip_comments(fortran_path.read_text(), ".f90") if fortran_path.exists() else ""
    data = read_all("tests/data/*.txt")
    benches = read_all("benches/**/*.rs")
    missing = []
    count = 0
    regular = {f.name for f in table_functions()}
    budget_frames = {f.frame_function: f.name for f in table_functions() if f.frame_core}
    hypothesis_reached = hypothesis_lists() & regular
    # Rust only for now: the exact derivatives' first stage (dual numbers in the core). They need
    # mpmath vectors of their plain function in tests/data/gradients/, a bench, the property and
    # threads tests; their C, Fortran and Python gradient forms are the next stage (not yet
    # required here: remove a name from this list when its faces exist).
    gradient_data = read_all("tests/data/gradients/*.txt")
    rust_only = {f"{n}_gradient": n for n in (
        "spectral_radiance_wavelength", "spectral_radiance_frequency", "brightness_temperature_wavelength",
        "brightness_temperature_frequency", "band_radiance_wavelength", "band_radiance_frequency",
        "temperature_from_band_radiance_wavelength")}
    rust_only["seeded"] = "luminosity_distance_mpc"  # every cosmology gradient vector seeds the parameters
    for topic in TOPICS:
        stub_path = ROOT / "bindings/python/python/relicore"
        stub = read_all("bindings/python/python/relicore/*.pyi")
        for name in public_functions(topic):
            count += 1
            if name in rust_only:
                if not re.search(rf"^(function \S+ )?{rust_only[name]}@", gradient_data, flags=re.M):
                    missing.append(f"{topic}::{name}: no gradient vectors in tests/data/gradients/")
                for what, text, where in (("criterion bench", benches, "benches/"),
                                          ("property test", proptests, "tests/proptest_*.rs"),
                                          ("threads test", threads, "tests/threads.rs")):
                    if not re.search(rf"\b{name}\b", text):
                        missing.append(f"{topic}::{name}: no {what} in {where}")
                continue
            if not re.search(rf"\brelicore_{name}\s*\(", header):
                missing.append(f"{topic}::{name}: no C export relicore_{name} in include/relicore.h")
            if not re.search(rf"\brelicore_{name}\b", fortran, flags=re.I):
                missing.append(f"{topic}::{name}: no Fortran interface relicore_{name} in bindings/fortran/relicore.f90")
            # an array form (`<name>_array`, the core's SIMD loop) is reached from Python through
            # the array path of `<name>` itself, and checked on the vectors of `<name>`; the
            # other harnesses must name it (tests/python/test_hypothesis_arrays.py does)
            base = name[: -len("_array")] if name.endswith("_array") else name
            # a budget frame form (`frame.core` in the table) is the image path of its function
            base = budget_frames.get(name, base)
            if not re.search(rf"\bdef {base}\s*\(", stub):
                missing.append(f"{topic}::{name}: no Python stub def {base} in {stub_path.relative_to(ROOT)}/*.pyi")
            vec = VECTOR_ALIASES.get(base, base)
            # a name `function@field` is one field of a function's result value (tests/data/FORMAT.md)
            if not re.search(rf"^{vec}(_f32)?[ @]", data, flags=re.M):
                missing.append(f"{topic}::{name}: no reference vectors in tests/data/")
            if not re.search(rf"\b{name}\s*\(", benches):
                missing.append(f"{topic}::{name}: no criterion bench in benches/")
            # the reliability harnesses reach it
            if not re.search(rf"\b{name}\b", proptests):
                missing.append(f"{topic}::{name}: not reached by the property tests tests/proptest_*.rs")
            if not re.search(rf"\b{name}\b", threads):
                missing.append(f"{topic}::{name}: not called by the threads test tests/threads.rs")
            if base not in regular and not re.search(rf"\brelicore_{name}\b", hostile_c):
                missing.append(f"{topic}::{name}: relicore_{name} not called by the C hostile harness tests/c/hostile_*.c")
            if base not in hypothesis_reached and not re.search(rf"\b{name}\b", hypothesis):
                missing.append(f"{topic}::{name}: not reached by the hypothesis tests tests/python/test_hypothesis_*.py")
    # the table: every form of every regular function in every face and harness
    reached = hostile_lists()
    for fn in table_functions():
        for form in fn.forms():
            count += 1
            sym = f"relicore_{fn.name}{form}"
            if not re.search(rf"\b{sym}\s*\(", header):
                missing.append(f"table {fn.name}: no C export {sym} in include/relicore.h")
            if not re.search(rf"\b{sym}\b", fortran, flags=re.I):
                missing.append(f"table {fn.name}: no Fortran procedure {sym} in bindings/fortran/relicore.f90")
            if ("f32" in form) not in reached.get(fn.name, set()):
                missing.append(f"table {fn.name}: {sym} not reached by the C hostile harness (tests/c/hostile_*.c expanding tests/c/gen_functions.h)")
            if form in ("", "_f32") and not re.search(rf"^{fn.name}{form}[ @]", data, flags=re.M):
                missing.append(f"table {fn.name}: no reference vectors for {fn.name}{form} in tests/data/")
        if not re.search(rf'"{fn.name}"', benches) or not re.search(rf"\b{fn.name}\s*\(", benches):
            missing.append(f"table {fn.name}: no criterion bench in benches/")
        py = rf"\bdef {fn.name}\s*\("
        if not re.search(py, stub_all := read_all("bindings/python/python/relicore/*.pyi")):
            missing.append(f"table {fn.name}: no Python stub def {fn.name} in bindings/python/python/relicore/*.pyi")
        del stub_all
    regular_symbols = {f"relicore_{f.name}{form}" for f in table_functions() for form in f.forms()}
    for name in header_functions(header):
        count += 1
        if name not in regular_symbols and not re.search(rf"\b{name}\b", hostile_c):
            missing.append(f"C ABI {name}: not called by the C hostile harness tests/c/hostile_*.c")
    for name in math_kernels():
        count += 1
        if not re.search(rf"\b{name}\b", read_all("tests/proptest_math.rs")):
            missing.append(f"math::{name}: not reached by tests/proptest_math.rs")
    for m in missing:
        print("MISSING", m)
    print(f"coverage guard: {count} public functions and exports checked, {len(missing)} gaps")
    return 1 if missing else 0


if __name__ == "__main__":
    sys.exit(main())
