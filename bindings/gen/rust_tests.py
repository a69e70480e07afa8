"""The dispatch of the Rust vector tests (tests/gen/dispatch.rs): a call of each regular core
function by its name in the vector files, for tests/blackbody_vectors.rs,
tests/cosmology_vectors.rs and tests/decoupling_vectors.rs."""

from __future__ import annotations

from pathlib import Path

from .c_face import rustfmt
from .common import banner
from .table import ROOT, Function

PATH = ROOT / "tests" / "gen" / "dispatch.rs"


def _call(fn: Function, args: list[str], ty: str | None = None) -> str:
    """The core call of `fn` on the argument expressions `args` (the receiver as `r`), as a
    `Result`; `ty` names the float type of a function without a receiver where inference needs it."""
    a = ", ".join(args)
    if fn.receiver == "none":
        turbofish = f"::<{ty}>" if ty else ""
        return f"relicore::{fn.topic}::{fn.name}{turbofish}({a})"
    if fn.core:
        topic, _, name = fn.core.partition("::")
        return f"relicore::{topic}::{name}(r{', ' if a else ''}{a})"
    call = f"r.{fn.name}({a})"
    return f"Ok::<f64, relicore::Error>({call})" if fn.infallible else call


def _function(name: str, receiver: str | None, ty: str, fns: list[Function]) -> str:
    recv = f"r: &{receiver}, " if receiver else ""
    arms = [
        f'        ("{f.name}", {len(f.args)}) => {_call(f, [f"g({i})" for i in range(len(f.args))], ty)},'
        for f in fns
    ]
    return (
        f"/// The {name.split('_', 1)[1].replace('_', ' ')} functions of the table, by name and number of arguments.\n"
        "#[allow(dead_code)]\n"
        f"pub fn {name}({recv}name: &str, a: &[{ty}]) -> Option<Result<{ty}>> {{\n"
        f"    let g = |i: usize| a.get(i).copied().unwrap_or({ty}::NAN);\n"
        "    Some(match (name, a.len()) {\n" + "\n".join(arms) + "\n        _ => return None,\n    })\n}\n"
    )


def dispatch_output(fns: list[Function]) -> str:
    none = [f for f in fns if f.receiver == "none" and not f.result_type]
    text = (
        banner("//", "the dispatch of the Rust vector tests")
        + "//! Calls of the regular core functions by name, for the Rust vector tests.\n\n"
        + "use relicore::Result;\n"
        + "use relicore::cosmology::Universe;\n"
        + "use relicore::decoupling::ThermalHistory;\n"
        + "use relicore::growth::{LinearGrowth, LinearPowerSpectrum};\n\n"
        + _function("call_none_f64", None, "f64", none)
        + "\n"
        + _function("call_none_f32", None, "f32", [f for f in none if f.f32])
        + "\n"
        + _function("call_universe", "Universe<f64>", "f64", [f for f in fns if f.receiver == "universe"])
        + "\n"
        + _function("call_history", "ThermalHistory<f64>", "f64", [f for f in fns if f.receiver == "history"])
        + "\n"
        + _function("call_growth", "LinearGrowth<f64>", "f64", [f for f in fns if f.receiver == "growth"])
        + "\n"
        + _function("call_power_spectrum", "LinearPowerSpectrum<f64>", "f64",
                    [f for f in fns if f.receiver == "power_spectrum"])
    )
    return rustfmt(text)


# ---------------------------------------------------------------- regular-function tests and benches

DATA = ROOT / "tests" / "data"
TEST_PATH = ROOT / "tests" / "gen_regular.rs"
BENCH_PATH = ROOT / "benches" / "gen_regular.rs"


def typical_arguments(fn: Function) -> list[str]:
    """Arguments of the middle non-status reference vector of `fn` (tests/data): values a user
    passes, not chosen here. Raises when the function has no reference vectors."""
    rows = []
    for path in sorted(DATA.glob("*.txt")):
        for line in path.read_text().splitlines():
            f = line.split()
            if not f or f[0].split("@")[0] != fn.name:
                continue
            k = 1 if fn.receiver == "none" and f[1:2] != ["-"] else 2
            try:
                n = int(f[k])
            except (ValueError, IndexError):
                continue
            if n != len(fn.args) or "status" in f[k + 2 + n : k + 3 + n]:
                continue
            rows.append(f[k + 1 : k + 1 + n])
    if not rows:
        raise SystemExit(f"rust_tests: {fn.name} has no reference vectors in tests/data (add them first)")
    return rows[len(rows) // 2]


def _lit(x: str, ty: str) -> str:
    if x in ("inf", "+inf"):
        return f"{ty}::INFINITY"
    if ty == "f32":  # the shortest decimal of the value rounded to f32 (clippy: excessive_precision)
        import struct

        v = struct.unpack("f", struct.pack("f", float(x)))[0]
        for digits in range(1, 10):
            s = f"{v:.{digits}g}"
            if struct.unpack("f", struct.pack("f", float(s)))[0] == v:
                break
        s = repr(float(s))
        return f"{s}_{ty}"
    return f"{float(x)!r}_{ty}"


RECEIVERS_SETUP = """    let u = Universe::new(UniverseParameters {
        omega_baryon: 0.0493,
        ..UniverseParameters::new(67.36, 0.3153)
    })
    .expect("universe");
    let h = Box::new(ThermalHistory::<f64>::new(&u, HistoryOptions::default()).expect("history"));
    let gr = Box::new(LinearGrowth::new(&u).expect("growth"));
    let ps = Box::new(
        LinearPowerSpectrum::with_scalar_amplitude(&gr, TransferForm::BaryonOscillations, 2.1e-9, 0.9649, 0.0)
            .expect("power spectrum"),
    );
"""


def bench_outputs(fns: list[Function]) -> str:
    lines = []
    for fn in fns:
        ty = "f64"
        args = [f"black_box({_lit(x, ty)})" for x in typical_arguments(fn)]
        r = {"none": "", "universe": "let r = &u; ", "history": "let r = &*h; ", "growth": "let r = &*gr; ",
             "power_spectrum": "let r = &*ps; "}[fn.receiver]
        lines.append(f'    g.bench_function("{fn.name}", |b| b.iter(|| {{ {r}{_call(fn, args)} }}));')
        if fn.f32:
            args32 = [f"black_box({_lit(x, 'f32')})" for x in typical_arguments(fn)]
            lines.append(f'    g.bench_function("{fn.name}_f32", |b| b.iter(|| {_call(fn, args32)}));')
    return rustfmt(
        banner("//", "criterion benches of every regular function")
        + "//! Criterion benches of every regular function of the table, one call at the arguments of\n"
        "//! the middle reference vector of the function (tests/data). The topic benches\n"
        "//! (benches/blackbody.rs, cosmology.rs, decoupling.rs) time arrays and constructions.\n\n"
        "use criterion::{Criterion, criterion_group, criterion_main};\n"
        "use relicore::cosmology::{Universe, UniverseParameters};\n"
        "use relicore::decoupling::{HistoryOptions, ThermalHistory};\n"
        "use relicore::growth::{LinearGrowth, LinearPowerSpectrum, TransferForm};\n"
        "use std::hint::black_box;\n\n"
        "fn regular(c: &mut Criterion) {\n" + RECEIVERS_SETUP
        + '    let mut g = c.benchmark_group("regular");\n'
        + "\n".join(lines)
        + "\n    g.finish();\n}\n\ncriterion_group!(benches, regular);\ncriterion_main!(benches);\n"
    )


def _error_names(fn: Function) -> list[str]:
    """The core's parameter names in the order of its error positions: the table's arguments,
    after the receiver when the core is a free function taking it first (`core = ...`)."""
    names = [a.name for a in fn.args]
    return [fn.receiver] + names if fn.core and fn.receiver != "none" else names


def test_outputs(fns: list[Function]) -> str:
    """Property and threads tests of every regular function (the contract: no panic, Ok finite,
    NaN refused, an error names an argument by its name at its position; the same bits from
    every thread)."""
    props = []
    grid_calls = []
    for fn in fns:
        n = len(fn.args)
        for ty in ("f64", "f32") if fn.f32 else ("f64",):
            if fn.receiver != "none" and ty == "f32":
                continue
            vars_ = [f"x{i}" for i in range(n)]
            recv = {"none": "", "universe": "let r = &*UNIVERSE; ", "history": "let r = &*HISTORY; ",
                    "growth": "let r = &**GROWTH; ", "power_spectrum": "let r = &**SPECTRUM; "}[fn.receiver]
            call = _call(fn, vars_)
            ok = "v.is_finite()"
            if fn.result_type:  # every real field finite
                ok = "v.temperature_k.is_finite() && v.combined_standard_uncertainty_k.is_finite() && v.sensitivity_coefficients.iter().all(|c| c.is_finite())"
            if n == 0:
                props.append(
                    f"#[test]\nfn contract_{fn.name}() {{ {recv}let v = {call}; "
                    f"if let Ok(v) = v {{ assert!(v.is_finite(), \"{fn.name}: Ok({{v}})\"); }} }}"
                )
                continue
            bits = "u64" if ty == "f64" else "u32"
            strat = ", ".join(f"{v} in any::<{bits}>()" for v in vars_)
            conv = " ".join(f"let {v} = {ty}::from_bits({v});" for v in vars_)
            props.append(
                "proptest! {\n    #[test]\n"
                f"    fn contract_{fn.name}_{ty}({strat}) {{\n"
                f"        {conv}\n        {recv}let any_nan = {' || '.join(f'{v}.is_nan()' for v in vars_)};\n"
                f"        match {call} {{\n"
                f"            Ok(v) => {{ prop_assert!({ok}, \"{fn.name}({{:?}}) = Ok({{:?}})\", ({', '.join(vars_)}), v); prop_assert!(!any_nan, \"{fn.name}: NaN accepted\"); }}\n"
                # an error names the argument at its position by the table's (= the core's) name
                f"            Err(e) => if let Some(p) = e.argument() {{ let names: [&str; {len(_error_names(fn))}] = [{', '.join(chr(34) + a + chr(34) for a in _error_names(fn))}]; "
                f"prop_assert_eq!(names.get(usize::from(p)).copied(), e.argument_name(), \"{fn.name}: {{:?}}\", e); }},\n"
                "        }\n    }\n}"
            )
        if fn.receiver == "none":
            # the grid has 4 values per point; a fifth argument and beyond reuse them in turn
            args = ", ".join(f"a[{i % 4}]" for i in range(n))
            to_number = ".map(|v| v.combined_standard_uncertainty_k)" if fn.result_type else ""
            grid_calls.append(f"        |a: &[f64]| relicore::{fn.topic}::{fn.name}({args}){to_number},")
    return rustfmt(
        banner("//", "the property and threads tests of every regular function")
        + "//! Every regular function of the table against its contract on arbitrary bit patterns\n"
        "//! (no panic; `Ok` holds a finite value; a NaN argument is refused; an error names the\n"
        "//! argument at its position by the table's name, the core's parameter name), and the functions\n"
        "//! without a receiver called from several threads at once give the serial bits.\n\n"
        "use proptest::prelude::*;\n"
        "use relicore::cosmology::{Universe, UniverseParameters};\n"
        "use relicore::decoupling::{HistoryOptions, ThermalHistory};\n"
        "use relicore::growth::{LinearGrowth, LinearPowerSpectrum, TransferForm};\n"
        "use std::sync::LazyLock;\n\n"
        "static UNIVERSE: LazyLock<Universe<f64>> = LazyLock::new(|| {\n"
        "    Universe::new(UniverseParameters { omega_baryon: 0.0493, ..UniverseParameters::new(67.36, 0.3153) })\n"
        '        .expect("universe")\n});\n'
        "static HISTORY: LazyLock<Box<ThermalHistory<f64>>> = LazyLock::new(|| {\n"
        '    Box::new(ThermalHistory::new(&UNIVERSE, HistoryOptions::default()).expect("history"))\n});\n'
        "// one growth (about 10 s in a debug build) and one spectrum for every test of this file\n"
        "static GROWTH: LazyLock<Box<LinearGrowth<f64>>> = LazyLock::new(|| {\n"
        '    Box::new(LinearGrowth::new(&UNIVERSE).expect("growth"))\n});\n'
        "static SPECTRUM: LazyLock<Box<LinearPowerSpectrum<f64>>> = LazyLock::new(|| {\n"
        "    Box::new(LinearPowerSpectrum::with_scalar_amplitude(&GROWTH, TransferForm::BaryonOscillations, 2.1e-9, 0.9649, 0.0)\n"
        '        .expect("power spectrum"))\n});\n\n'
        + "\n\n".join(props)
        + "\n\ntype Grid = fn(&[f64]) -> relicore::Result<f64>;\n\n"
        "#[test]\nfn threads_give_the_serial_bits() {\n"
        "    let fns: &[Grid] = &[\n" + "\n".join(grid_calls) + "\n    ];\n"
        "    const ARGS: [f64; 9] = [1e-9, 1e-6, 3e-3, 0.5, 2.7255, 300.0, 5e3, 3e13, -1.0];\n"
        "    let grid: Vec<[f64; 4]> = (0..ARGS.len().pow(4))\n"
        "        .map(|k| [ARGS[k % 9], ARGS[k / 9 % 9], ARGS[k / 81 % 9], ARGS[k / 729 % 9]])\n"
        "        .collect();\n"
        "    let run = |f: Grid| -> Vec<u64> { grid.iter().map(|a| f(a).map_or(u64::MAX, f64::to_bits)).collect() };\n"
        "    let serial: Vec<Vec<u64>> = fns.iter().map(|&f| run(f)).collect();\n"
        "    std::thread::scope(|s| {\n"
        "        let handles: Vec<_> = (0..4).map(|_| s.spawn(|| fns.iter().map(|&f| run(f)).collect::<Vec<_>>())).collect();\n"
        '        for h in handles { assert_eq!(h.join().expect("thread"), serial); }\n'
        "    });\n}\n"
    )


def outputs(fns: list[Function]) -> dict[Path, str]:
    return {PATH: dispatch_output(fns), TEST_PATH: test_outputs(fns), BENCH_PATH: bench_outputs(fns)}
