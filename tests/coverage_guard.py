#!/usr/bin/env python3
"""Coverage guard: every public function of the core has its C, Fortran and Python faces,
reference vectors in tests/data/ and a criterion bench. Prints what is missing and exits 1.

The list of public functions is read from the core's source (`pub fn` in src/<topic>/),
so a new function joins the guard automatically.
"""
import pathlib
import re
import sys

ROOT = pathlib.Path(__file__).resolve().parent.parent
TOPICS = ["blackbody", "cosmology"]

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
}


def public_functions(topic):
    """Free functions (`pub fn` at the start of a line) and methods (`    pub fn name(&self`)."""
    names = []
    for p in sorted((ROOT / "src" / topic).glob("*.rs")):
        text = p.read_text()
        names += re.findall(r"^pub fn (\w+)", text, flags=re.M)
        names += [n for n in re.findall(r"^    pub fn (\w+)(?:<[^>]*>)?\(&self", text, flags=re.M)]
        names += [n for n in re.findall(r"^    pub fn (\w+)", text, flags=re.M) if n in NOT_FUNCTIONS]
    return [n for n in dict.fromkeys(names) if n not in NOT_FUNCTIONS]


def main():
    header = (ROOT / "include/relicore.h").read_text()
    fortran_path = ROOT / "bindings/fortran/relicore.f90"
    fortran = fortran_path.read_text() if fortran_path.exists() else ""
    data = "".join(p.read_text() for p in (ROOT / "tests/data").glob("*.txt"))
    benches = "".join(p.read_text() for p in (ROOT / "benches").rglob("*.rs"))
    missing = []
    count = 0
    for topic in TOPICS:
        stub_path = ROOT / "bindings/python/python/relicore"
        stub = "".join(p.read_text() for p in stub_path.glob("*.pyi"))
        for name in public_functions(topic):
            count += 1
            if not re.search(rf"\brelicore_{name}\s*\(", header):
                missing.append(f"{topic}::{name}: no C export relicore_{name} in include/relicore.h")
            if not re.search(rf"\brelicore_{name}\b", fortran, flags=re.I):
                missing.append(f"{topic}::{name}: no Fortran interface relicore_{name} in bindings/fortran/relicore.f90")
            if not re.search(rf"\bdef {name}\s*\(", stub):
                missing.append(f"{topic}::{name}: no Python stub def {name} in {stub_path.relative_to(ROOT)}/*.pyi")
            vec = VECTOR_ALIASES.get(name, name)
            if not re.search(rf"^{vec}(_f32)? ", data, flags=re.M):
                missing.append(f"{topic}::{name}: no reference vectors in tests/data/")
            if not re.search(rf"\b{name}\s*\(", benches):
                missing.append(f"{topic}::{name}: no criterion bench in benches/")
    for m in missing:
        print("MISSING", m)
    print(f"coverage guard: {count} public functions checked, {len(missing)} gaps")
    return 1 if missing else 0


if __name__ == "__main__":
    sys.exit(main())
