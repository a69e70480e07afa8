#!/usr/bin/env python3
"""README snippet test of relicore: the Python, Rust, C and Fortran code blocks of README.md, run
as written.

Every fenced ```python, ```rust, ```c and ```fortran block of README.md must follow a marker line
`<!-- readme-test: NAME -->` (NAME ends in .py, .rs, .c or .f90; the sibling of
tests/install/run.sh's `<!-- install-test: NAME -->`, read the same way: the marker, then the
fenced block on the next line), or an install-test marker (those C and Fortran programs are built
and run by the install test). A block without a marker fails the test, so a new snippet cannot go
untested. The blocks
are read from README.md (never copied here), so the test fails when the README drifts from the
library:

  * Python: each block runs in a fresh interpreter (the venv's, with the package `make
    python-build` installed) in an empty temporary folder, after the common prelude
    `import numpy as np` / `import relicore` that the README's section snippets assume (the
    README says so), and the block's own INPUTS below where it uses arrays it names but does not
    define (an image of signals, ...). Then its CHECKS run in the same namespace.
  * Rust: each block becomes the body of `fn main() -> Result<(), relicore::Error>` (as the
    README says the Rust lines run) in one temporary Cargo package that depends on this
    repository's core by path (edition 2024, offline, the workspace's Cargo.lock as the
    starting lock), one binary per block, compiled with warnings about unused names allowed
    and run; its INPUTS come before and its CHECKS after the block.
  * C: each block becomes the body of `int main(void)` (as the README says the C lines run)
    after `#include <relicore.h>` (and stdio, stdint, math), its INPUTS before and its CHECKS
    after it, compiled with gcc -std=c11 -Wall -Wextra -Wpedantic -Werror against include/ and
    linked with the release-c librelicore.a (built here by cargo), and run.
  * Fortran: a block that is a whole program (it has `end program`) is compiled as it is, with
    its CHECKS inserted before its `end program` line; any other block becomes the body of a
    program (its INPUTS after its first INPUTS_AFTER_LINES lines, the `use` and declarations,
    and its CHECKS after it). Compiled with gfortran against the module built from
    bindings/fortran/relicore.f90 and the same librelicore.a, and run.

The CHECKS are facts independent of relicore (Planck's law from the exact SI constants, round
trips that must return the input) or numbers the README's text states beside the block (so the
prose cannot drift from the code either). Usage:

    python3 tests/readme/run.py [--python .venv/bin/python] [--names NAME ...]

Ends with "N passed, M failed"; exit status 1 when anything failed. Needs cargo on the PATH and
the Python package built (`make readme-test` does both).
"""

from __future__ import annotations

import argparse
import os
import re
import shutil
import subprocess
import sys
import tempfile
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parents[2]
README = ROOT / "README.md"
MARKER = re.compile(r"^<!-- readme-test: (\S+) -->$")
INSTALL_MARKER = re.compile(r"^<!-- install-test: (\S+) -->$")
# the suffix a marker's name has for each language of block
SUFFIX = {"python": ".py", "rust": ".rs", "c": ".c", "fortran": ".f90"}
FENCE = re.compile(r"^```(\w*)\s*$")

# exact SI values (SI Brochure, 9th edition, BIPM 2019), for Planck's law in the checks
PLANCK_PY = """
import math as _math
_h, _c, _k = 6.62607015e-34, 299792458.0, 1.380649e-23
def _planck(lam, t):
    return 2.0 * _h * _c * _c / lam**5 / _math.expm1(_h * _c / (lam * _k * t))
"""

PYTHON_PRELUDE = "import numpy as np\nimport relicore\n"

# Inputs a block uses but does not define (the README describes them in words), by marker name.
INPUTS = {
    "thermometry.py": """
signals = np.full((4, 3), bb.measured_spectral_radiance_wavelength(10e-6, 318.0, 0.95, 303.0, 0.85, 296.0))
eps = np.full((4, 3), 0.95)
u_eps = np.full((4, 3), 0.01)
""",
    "thermometry.rs": """
let signals = [relicore::blackbody::measured_spectral_radiance_wavelength(
    10e-6_f64, 318.0, 0.95, 303.0, 0.85, 296.0)?; 3];
let eps = [0.95_f64; 3];
let u_eps = [0.01_f64; 3];
let mut t_obj = [0.0_f64; 3];
let mut u_c = [0.0_f64; 3];
""",
}
INPUTS |= {
    "thermometry.c": """
enum { n = 3 };
double signals[n], eps[n], u_eps[n], t_obj[n], u_c[n];
for (int i = 0; i < n; i++) {
    relicore_measured_spectral_radiance_wavelength(10e-6, 318.0, 0.95, 303.0, 0.85, 296.0, &signals[i]);
    eps[i] = 0.95;
    u_eps[i] = 0.01;
}
""",
    "decoupling.c": """
static struct relicore_universe u;
struct relicore_universe_parameters up;
relicore_universe_parameters_default(67.36, 0.3153, &up);
up.omega_baryon = 0.0493;
if (relicore_universe_init(&up, &u) != RELICORE_OK) return 1;
""",
    # declarations after the block's own (`use relicore` and two declarations), then the values
    "thermometry.f90": """
real(c_double) :: signals(3), eps(3), u_eps(3), t_obj(3), u_c(3)
signals = relicore_measured_spectral_radiance_wavelength(10e-6_c_double, 318.0_c_double, &
    0.95_c_double, 303.0_c_double, 0.85_c_double, 296.0_c_double)
eps = 0.95_c_double
u_eps = 0.01_c_double
""",
}
# The inputs go before the block, or after its first N lines where they need a name the block
# binds (the thermometry block imports relicore.blackbody as bb in its first line; the Fortran
# block's first three lines are its `use` and declarations).
INPUTS_AFTER_LINES = {"thermometry.py": 1, "thermometry.f90": 3}

# Checks run after a block, in its namespace (Python) or its function (Rust).
CHECKS = {
    "using-it.py": PLANCK_PY + """
_lam = np.geomspace(1e-7, 1e-3, 10**6)
assert b.shape == (10**6,) and t.shape == (5,), (b.shape, t.shape)
for _i in (0, 300000, 600000, 999999):
    _want = _planck(float(_lam[_i]), 300.0)
    assert abs(b[_i] / _want - 1.0) < 1e-13, (_i, b[_i], _want)
""",
    "using-it.rs": """
let (h, c, k) = (6.62607015e-34_f64, 299792458.0_f64, 1.380649e-23_f64);
let want = 2.0 * h * c * c / 10e-6_f64.powi(5) / (h * c / (10e-6 * k * 300.0)).exp_m1();
assert!((b / want - 1.0).abs() < 1e-13, "B(10 um, 300 K) = {b}, Planck's law {want}");
// the inverse at 10 um in f32: the radiance of a blackbody at t gives 9.9e6 back
let back = spectral_radiance_wavelength(10e-6_f64, f64::from(t))?;
assert!((back / 9.9e6 - 1.0).abs() < 1e-5, "t = {t} K gives {back}");
""",
    "thermometry.py": """
assert abs(r.temperature_k - 318.0) < 1e-9, r.temperature_k
assert round(r.combined_standard_uncertainty_k, 3) == 0.337, r.combined_standard_uncertainty_k  # README: 0.337 K
assert img.temperature_k.shape == (4, 3), img.temperature_k.shape
assert np.all(np.abs(img.temperature_k - 318.0) < 1e-9), img.temperature_k
assert np.all(img.combined_standard_uncertainty_k == r.combined_standard_uncertainty_k)
""",
    "thermometry.rs": """
assert!((t - 318.0).abs() < 1e-9, "T_obj = {t}");
assert!((r.temperature_k - 318.0).abs() < 1e-9, "T_obj = {}", r.temperature_k);
let u = r.combined_standard_uncertainty_k;
assert!((u * 1000.0).round() == 337.0, "u_c = {u} (README: 0.337 K)");
assert!(t_obj.iter().all(|x| (x - 318.0).abs() < 1e-9), "{t_obj:?}");
assert!(u_c.iter().all(|x| *x == u), "{u_c:?} against {u}");
""",
    "universe.py": """
assert dl.shape == (10**6,) and np.all(np.diff(dl[np.argsort(np.random.default_rng(1).uniform(0.01, 3, 10**6))]) > 0)
assert abs(u.age_gyr(z) - 1.0) < 1e-9, u.age_gyr(z)   # the inverse returns the age asked for
""",
    "decoupling.py": """
assert 1000.0 < h.last_scattering_redshift < 1200.0, h.last_scattering_redshift
assert 100.0 < h.sound_horizon_drag_mpc < 200.0, h.sound_horizon_drag_mpc
""",
    "growth.py": """
assert 0.0 < d < 0.02 and f.shape == (301,), (d, f.shape)
assert p.shape == (500,) and np.all(p > 0)
assert drift > 0 and kick > 0
""",
    "growth.rs": """
assert!(d > 0.0 && d < 0.02 && f > 0.9 && f <= 1.0, "D = {d}, f = {f}");
assert!(a_s > 0.0 && pk > 0.0 && kick > 0.0, "A_s = {a_s}, P = {pk}, kick = {kick}");
""",
}


CHECKS |= {
    "thermometry.c": """
if (s != RELICORE_OK) { printf("status %d\\n", (int)s); return 1; }
if (fabs(r.temperature_k - 318.0) > 1e-9) { printf("T_obj = %.17g\\n", r.temperature_k); return 1; }
if (round(r.combined_standard_uncertainty_k * 1000.0) != 337.0) {   /* README: 0.337 K */
    printf("u_c = %.17g\\n", r.combined_standard_uncertainty_k); return 1;
}
for (int i = 0; i < n; i++)
    if (fabs(t_obj[i] - 318.0) > 1e-9 || u_c[i] != r.combined_standard_uncertainty_k) {
        printf("pixel %d: %.17g %.17g\\n", i, t_obj[i], u_c[i]); return 1;
    }
""",
    "universe.c": """
/* D_L = (1+z) D_M (an identity of the definitions, common practice) at z = 1 */
double dm = 0.0;
if (relicore_transverse_comoving_distance_mpc(&u, 1.0, &dm) != RELICORE_OK) return 1;
if (!(d > 0.0) || fabs(d - 2.0 * dm) > 1e-12 * d) { printf("D_L = %.17g, 2 D_M = %.17g\\n", d, 2.0 * dm); return 1; }
""",
    "decoupling.c": """
if (!(zs > 1000.0 && zs < 1200.0) || !(xe > 0.0 && xe < 1.2)) { printf("z* = %g, x_e = %g\\n", zs, xe); return 1; }
""",
    "growth.c": """
/* sigma8 is the normalisation asked for; D and f in their ranges (D(z = 99) ~ 1/100) */
if (fabs(s8 - 0.81) > 1e-12 || !(d > 0.0 && d < 0.02) || !(f > 0.9 && f <= 1.0) || !(p > 0.0) || !(drift > 0.0)) {
    printf("s8 = %.17g, D = %g, f = %g, P = %g, drift = %g\\n", s8, d, f, p, drift); return 1;
}
""",
    "thermometry.f90": """
if (abs(r%temperature_k - 318.0_c_double) > 1e-9_c_double) error stop 'T_obj'
if (nint(r%combined_standard_uncertainty_k * 1000) /= 337) error stop 'u_c (README: 0.337 K)'
if (any(abs(t_obj - 318.0_c_double) > 1e-9_c_double)) error stop 't_obj'
if (any(u_c /= r%combined_standard_uncertainty_k)) error stop 'u_c of the pixels'
""",
    # sigma8 of A_s = 2.1e-9, n_s = 0.965 in a Planck-like model: about 0.81 (from memory);
    # D(z = 0) = 1 by the normalisation the README states for the growth factor
    "growth.f90": """
if (relicore_sigma8(ps) < 0.7d0 .or. relicore_sigma8(ps) > 0.9d0) error stop 'sigma8'
if (abs(relicore_growth_factor(g, 0.0d0) - 1.0d0) > 1d-12) error stop 'D(0)'
if (.not. relicore_leapfrog_kick_factor_gyr(g, 0.01d0, 0.011d0) > 0.0d0) error stop 'kick'
""",
}


def readme_blocks(text: str) -> tuple[dict[str, tuple[str, str, int]], list[str]]:
    """The marked blocks {name: (language, code, line)} and the problems found."""
    lines = text.splitlines()
    blocks: dict[str, tuple[str, str, int]] = {}
    problems: list[str] = []
    i = 0
    pending = None  # (name, line) of a marker waiting for its block
    installed = None  # line of an install-test marker waiting for its block
    while i < len(lines):
        line = lines[i]
        m = MARKER.match(line)
        if m:
            pending = (m.group(1), i + 1)
            i += 1
            continue
        if INSTALL_MARKER.match(line):
            installed = i + 1
            i += 1
            continue
        f = FENCE.match(line)
        if f:
            lang = f.group(1)
            j = i + 1
            while j < len(lines) and not lines[j].startswith("```"):
                j += 1
            code = "\n".join(lines[i + 1 : j]) + "\n"
            if lang in ("c", "fortran") and installed == i and (pending is None or pending[1] != i):
                pass  # built and run by the install test
            elif lang in SUFFIX:
                if pending is None or pending[1] != i:
                    problems.append(f"README.md:{i + 1}: a ```{lang} block without a "
                                    "<!-- readme-test: NAME --> line right above it")
                else:
                    name = pending[0]
                    want = SUFFIX[lang]
                    if not name.endswith(want):
                        problems.append(f"README.md:{i + 1}: marker {name} on a ```{lang} block (want *{want})")
                    elif name in blocks:
                        problems.append(f"README.md:{i + 1}: marker {name} used twice")
                    else:
                        blocks[name] = (lang, code, i + 1)
            elif pending is not None and pending[1] == i:
                problems.append(f"README.md:{i + 1}: readme-test marker {pending[0]} on a ```{lang} block")
            pending = None
            installed = None
            i = j + 1
            continue
        i += 1
    for name in sorted(set(INPUTS) | set(CHECKS)):
        if name not in blocks:
            problems.append(f"tests/readme/run.py has inputs or checks for {name}, which README.md does not mark")
    return blocks, problems


def python_source(name: str, code: str) -> str:
    lines = code.splitlines(keepends=True)
    n = INPUTS_AFTER_LINES.get(name, 0)
    return (PYTHON_PRELUDE + f"# --- README.md block {name}\n" + "".join(lines[:n]) + "# --- the test's inputs\n"
            + INPUTS.get(name, "") + "# --- README.md block, continued\n" + "".join(lines[n:])
            + "# --- the test's checks\n" + CHECKS.get(name, "") + "print('ok')\n")


def run_python(python: str, name: str, code: str, work: Path) -> bool:
    source = python_source(name, code)
    path = work / name
    path.write_text(source)
    env = {k: v for k, v in os.environ.items() if k != "PYTHONPATH"} | {"PYTHONDONTWRITEBYTECODE": "1"}
    if os.environ.get("PYTHONPATH"):
        env["PYTHONPATH"] = os.environ["PYTHONPATH"]  # a caller's package (a build elsewhere)
    r = subprocess.run([python, str(path)], cwd=work, capture_output=True, text=True, env=env, timeout=600)
    if r.returncode != 0 or r.stdout.strip().splitlines()[-1:] != ["ok"]:
        print(r.stdout[-3000:] + r.stderr[-3000:])
        print(f"(the program was {path})")
        return False
    return True


def rust_source(name: str, code: str) -> str:
    body = INPUTS.get(name, "") + code + CHECKS.get(name, "")
    indented = "".join("    " + line if line.strip() else line for line in body.splitlines(keepends=True))
    return ("#![allow(unused)]\n// README.md block " + name + ", as the body of a function returning\n"
            "// Result<_, relicore::Error>, with the test's inputs before it and checks after it\n"
            "fn main() -> Result<(), relicore::Error> {\n" + indented + "    println!(\"ok\");\n    Ok(())\n}\n")


def run_rust(blocks: dict[str, tuple[str, str, int]], work: Path) -> dict[str, bool]:
    """Builds every Rust block as a binary of one package and runs each; {name: passed}."""
    crate = work / "readme-snippets"
    (crate / "src" / "bin").mkdir(parents=True)
    (crate / "Cargo.toml").write_text(
        '[package]\nname = "readme-snippets"\nversion = "0.0.0"\nedition = "2024"\npublish = false\n\n'
        f'[dependencies]\nrelicore = {{ path = "{ROOT}" }}\n\n[workspace]\n'
    )
    shutil.copy(ROOT / "Cargo.lock", crate / "Cargo.lock")
    bins = {}
    for name, (_, code, _) in blocks.items():
        stem = re.sub(r"[^A-Za-z0-9_]", "_", name[:-3])
        bins[name] = stem
        (crate / "src" / "bin" / f"{stem}.rs").write_text(rust_source(name, code))
    target = Path(os.environ.get("CARGO_TARGET_DIR") or ROOT / "target") / "readme-snippets"
    env = dict(os.environ) | {"CARGO_TARGET_DIR": str(target)}
    results = {}
    for name, stem in bins.items():  # one build per block, so one block's error names that block
        build = subprocess.run(["cargo", "build", "--offline", "--quiet", "--bin", stem], cwd=crate,
                               capture_output=True, text=True, env=env)
        if build.returncode != 0:
            print(f"{name}: does not compile:\n" + build.stdout[-6000:] + build.stderr[-6000:])
            print(f"(the package is {crate})")
            results[name] = False
            continue
        r = subprocess.run([str(target / "debug" / stem)], cwd=work, capture_output=True, text=True, timeout=600)
        ok = r.returncode == 0 and r.stdout.strip().splitlines()[-1:] == ["ok"]
        if not ok:
            print(f"{name}: " + r.stdout[-3000:] + r.stderr[-3000:])
        results[name] = ok
    return results


def c_library(work: Path) -> Path | None:
    """librelicore.a of the release-c profile (cargo build, offline), or None (printed why)."""
    target = Path(os.environ.get("CARGO_TARGET_DIR") or ROOT / "target")
    build = subprocess.run(["cargo", "build", "--offline", "--quiet", "-p", "relicore-capi", "--profile", "release-c"],
                           cwd=ROOT, capture_output=True, text=True)
    if build.returncode != 0:
        print("the C library does not build:\n" + build.stdout[-3000:] + build.stderr[-3000:])
        return None
    return target / "release-c" / "librelicore.a"


def c_source(name: str, code: str) -> str:
    body = INPUTS.get(name, "") + code + CHECKS.get(name, "")
    indented = "".join("    " + line if line.strip() else line for line in body.splitlines(keepends=True))
    return ("/* README.md block " + name + ", as the body of main, with the test's inputs before it\n"
            "   and checks after it */\n#include <math.h>\n#include <stdint.h>\n#include <stdio.h>\n"
            "#include <relicore.h>\n\nint main(void) {\n" + indented + '    printf("ok\\n");\n    return 0;\n}\n')


def fortran_source(name: str, code: str) -> str:
    lines = code.splitlines(keepends=True)
    checks = CHECKS.get(name, "") + "print '(a)', 'ok'\n"
    end = [k for k, line in enumerate(lines) if re.match(r"\s*end\s+program\b", line, re.I)]
    if end:  # a whole program: the checks go before its end
        k = end[-1]
        return "".join(lines[:k]) + "! --- the test's checks\n" + checks + "".join(lines[k:])
    n = INPUTS_AFTER_LINES.get(name, 0)
    return ("program readme_snippet\n" + "".join(lines[:n]) + "! --- the test's inputs\n" + INPUTS.get(name, "")
            + "! --- README.md block, continued\n" + "".join(lines[n:]) + "! --- the test's checks\n" + checks
            + "end program readme_snippet\n")


def run_native(blocks: dict[str, tuple[str, str, int]], work: Path) -> dict[str, bool]:
    """Compiles every C and Fortran block against librelicore.a and runs it; {name: passed}."""
    lib = c_library(work)
    results: dict[str, bool] = {}
    module = work / "fortran-module"
    module.mkdir()
    module_ok = False
    if lib is not None and any(b[0] == "fortran" for b in blocks.values()):
        r = subprocess.run(["gfortran", "-c", str(ROOT / "bindings/fortran/relicore.f90"), "-J", str(module),
                            "-o", str(module / "relicore.o")], capture_output=True, text=True)
        module_ok = r.returncode == 0
        if not module_ok:
            print("bindings/fortran/relicore.f90 does not compile:\n" + r.stderr[-3000:])
    for name, (lang, code, _) in blocks.items():
        stem = re.sub(r"[^A-Za-z0-9_]", "_", name)
        exe = work / stem
        if lib is None or (lang == "fortran" and not module_ok):
            results[name] = False
            continue
        if lang == "c":
            path = work / name
            path.write_text(c_source(name, code))
            cmd = ["gcc", "-std=c11", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-I", str(ROOT / "include"),
                   str(path), str(lib), "-lm", "-o", str(exe)]
        else:
            path = work / name
            path.write_text(fortran_source(name, code))
            cmd = ["gfortran", "-I", str(module), str(path), str(module / "relicore.o"), str(lib), "-lm", "-o", str(exe)]
        build = subprocess.run(cmd, cwd=work, capture_output=True, text=True)
        if build.returncode != 0:
            print(f"{name}: does not compile:\n" + build.stdout[-6000:] + build.stderr[-6000:])
            print(f"(the program is {path})")
            results[name] = False
            continue
        r = subprocess.run([str(exe)], cwd=work, capture_output=True, text=True, timeout=600)
        ok = r.returncode == 0 and r.stdout.strip().splitlines()[-1:] == ["ok"]
        if not ok:
            print(f"{name}: " + r.stdout[-3000:] + r.stderr[-3000:])
            print(f"(the program is {path})")
        results[name] = ok
    return results


def main(argv: list[str]) -> int:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--python", default=str(ROOT / ".venv" / "bin" / "python"))
    ap.add_argument("--names", nargs="*", help="only these marked blocks (the marker check still runs)")
    args = ap.parse_args(argv[1:])
    # the blocks run in a temporary folder: a path to the interpreter must not stay relative
    if os.sep in args.python:
        args.python = os.path.abspath(args.python)
    blocks, problems = readme_blocks(README.read_text())
    passed = failed = 0
    print(f"=== README.md: {len(blocks)} marked Python, Rust, C and Fortran blocks")
    for p in problems:
        print(p)
    if problems:
        failed += 1
        print("--- FAILED: every ```python, ```rust, ```c and ```fortran block of README.md is marked")
    else:
        passed += 1
        print("--- ok: every ```python, ```rust, ```c and ```fortran block of README.md is marked")
    chosen = {n: b for n, b in blocks.items() if not args.names or n in args.names}
    keep = False
    with tempfile.TemporaryDirectory(prefix="relicore-readme-test.") as tmp:
        work = Path(tmp)
        for name, (lang, code, line) in chosen.items():
            if lang != "python":
                continue
            start = time.monotonic()
            print(f"=== README.md:{line}: {name} (Python)")
            if run_python(args.python, name, code, work):
                passed += 1
                print(f"--- ok: {name} ({time.monotonic() - start:.1f} s)")
            else:
                failed += 1
                keep = True
                print(f"--- FAILED: {name}")
        rust = {n: b for n, b in chosen.items() if b[0] == "rust"}
        if rust:
            start = time.monotonic()
            print(f"=== README.md: {', '.join(rust)} (Rust, one package, cargo build --offline)")
            for name, ok in run_rust(rust, work).items():
                print(f"--- {'ok' if ok else 'FAILED'}: {name} (line {rust[name][2]})")
                passed += ok
                failed += not ok
                keep = keep or not ok
            print(f"    ({time.monotonic() - start:.1f} s for the Rust blocks)")
        native = {n: b for n, b in chosen.items() if b[0] in ("c", "fortran")}
        if native:
            start = time.monotonic()
            print(f"=== README.md: {', '.join(native)} (C and Fortran, against librelicore.a of release-c)")
            for name, ok in run_native(native, work).items():
                print(f"--- {'ok' if ok else 'FAILED'}: {name} (line {native[name][2]})")
                passed += ok
                failed += not ok
                keep = keep or not ok
            print(f"    ({time.monotonic() - start:.1f} s for the C and Fortran blocks)")
        if keep:
            kept = Path(tempfile.mkdtemp(prefix="relicore-readme-test-failed."))
            shutil.copytree(work, kept, dirs_exist_ok=True, ignore=shutil.ignore_patterns("target"))
            print(f"files kept in {kept}")
    print("README snippet test steps:")
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
