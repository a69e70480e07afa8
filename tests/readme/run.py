#!/usr/bin/env python3
"""README snippet test of relicore: the Python and Rust code blocks of README.md, run as written.

Every fenced ```python and ```rust block of README.md must follow a marker line
`<!-- readme-test: NAME -->` (NAME ends in .py or .rs; the sibling of tests/install/run.sh's
`<!-- install-test: NAME -->`, read the same way: the marker, then the fenced block on the next
line). A block without a marker fails the test, so a new snippet cannot go untested. The blocks
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
# The inputs go before the block, or after its first N lines where they need a name the block
# binds (the thermometry block imports relicore.blackbody as bb in its first line).
INPUTS_AFTER_LINES = {"thermometry.py": 1}

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


def readme_blocks(text: str) -> tuple[dict[str, tuple[str, str, int]], list[str]]:
    """The marked blocks {name: (language, code, line)} and the problems found."""
    lines = text.splitlines()
    blocks: dict[str, tuple[str, str, int]] = {}
    problems: list[str] = []
    i = 0
    pending = None  # (name, line) of a marker waiting for its block
    while i < len(lines):
        line = lines[i]
        m = MARKER.match(line)
        if m:
            pending = (m.group(1), i + 1)
            i += 1
            continue
        f = FENCE.match(line)
        if f:
            lang = f.group(1)
            j = i + 1
            while j < len(lines) and not lines[j].startswith("```"):
                j += 1
            code = "\n".join(lines[i + 1 : j]) + "\n"
            if lang in ("python", "rust"):
                if pending is None or pending[1] != i:
                    problems.append(f"README.md:{i + 1}: a ```{lang} block without a "
                                    "<!-- readme-test: NAME --> line right above it")
                else:
                    name = pending[0]
                    want = ".py" if lang == "python" else ".rs"
                    if not name.endswith(want):
                        problems.append(f"README.md:{i + 1}: marker {name} on a ```{lang} block (want *{want})")
                    elif name in blocks:
                        problems.append(f"README.md:{i + 1}: marker {name} used twice")
                    else:
                        blocks[name] = (lang, code, i + 1)
            elif pending is not None and pending[1] == i:
                problems.append(f"README.md:{i + 1}: readme-test marker {pending[0]} on a ```{lang} block")
            pending = None
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
    print(f"=== README.md: {len(blocks)} marked Python and Rust blocks")
    for p in problems:
        print(p)
    if problems:
        failed += 1
        print("--- FAILED: every ```python and ```rust block of README.md is marked")
    else:
        passed += 1
        print("--- ok: every ```python and ```rust block of README.md is marked")
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
        if keep:
            kept = Path(tempfile.mkdtemp(prefix="relicore-readme-test-failed."))
            shutil.copytree(work, kept, dirs_exist_ok=True, ignore=shutil.ignore_patterns("target"))
            print(f"files kept in {kept}")
    print("README snippet test steps:")
    print(f"{passed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
