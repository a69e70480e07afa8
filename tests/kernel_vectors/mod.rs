//! The reader of the math kernels' mpmath vector files (`tests/data/math_*.txt`, format of
//! tests/data/FORMAT.md, scalar files): one line `name nargs args… want kind tol source`, the
//! error counted in ulps of the expected value (`ulp` in f64, `ulp32` in f32), the worst error
//! and the share correctly rounded printed per function, every vector within its tolerance.
//! Shared by tests/math_exp.rs, tests/math_log.rs and tests/math_trig.rs.

use std::collections::BTreeMap;
use std::path::PathBuf;

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

/// Spacing of doubles at |w| (at least the spacing at DBL_MIN), as tests/data/FORMAT.md defines.
pub fn ulp64(w: f64) -> f64 {
    let a = w.abs().max(f64::MIN_POSITIVE);
    f64::from_bits(a.to_bits() & 0x7ff0_0000_0000_0000) * f64::EPSILON
}

/// Spacing of floats at |w| (at least the spacing at FLT_MIN).
pub fn ulp32(w: f64) -> f64 {
    let a = (w.abs() as f32).max(f32::MIN_POSITIVE);
    (f32::from_bits(a.to_bits() & 0x7f80_0000) * f32::EPSILON) as f64
}

fn parse(s: &str) -> f64 {
    s.parse().unwrap_or_else(|_| panic!("bad number {s}"))
}

/// Checks every vector of `file` (each with `nargs` arguments) against `eval(name, args)`, which
/// returns the kernel's value as f64; prints the summary under `label`; asserts at least
/// `min_count` vectors and no failure.
pub fn check(
    file: &str,
    nargs: usize,
    min_count: usize,
    label: &str,
    eval: impl Fn(&str, &[f64]) -> f64,
) {
    let text = data(file);
    let mut worst: BTreeMap<String, (f64, usize, usize)> = BTreeMap::new();
    let mut failures = Vec::new();
    let mut count = 0;
    for line in text.lines() {
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let f: Vec<&str> = line.split(' ').collect();
        let name = f[0];
        assert_eq!(f[1], nargs.to_string(), "{line}");
        let args: Vec<f64> = f[2..2 + nargs].iter().map(|s| parse(s)).collect();
        let want = parse(f[2 + nargs]);
        let (kind, tol) = (f[3 + nargs], parse(f[4 + nargs]));
        let got = eval(name, &args);
        let ulp = match kind {
            "ulp" => ulp64(want),
            "ulp32" => ulp32(want),
            _ => panic!("unexpected tolerance kind {kind}"),
        };
        let err = if got == want {
            0.0
        } else {
            (got - want).abs() / ulp
        };
        let e = worst.entry(name.to_string()).or_insert((0.0, 0, 0));
        e.0 = e.0.max(err);
        e.1 += 1;
        e.2 += usize::from(got == want);
        count += 1;
        if err.is_nan() || err > tol {
            failures.push(format!(
                "{name}({}): want {want:.17e} got {got:.17e} ({err} ulp > {tol})",
                args.iter()
                    .map(|a| format!("{a:.17e}"))
                    .collect::<Vec<_>>()
                    .join(", ")
            ));
        }
    }
    println!(
        "{label} against mpmath ({count} vectors): worst error in ulps, share correctly rounded"
    );
    for (name, (e, n, exact)) in &worst {
        println!(
            "  {name:<16} {e:5.3} ulp  {:6.2}% of {n} correctly rounded",
            100.0 * *exact as f64 / *n as f64
        );
    }
    assert!(count > min_count, "only {count} vectors");
    assert!(
        failures.is_empty(),
        "{} failures:\n{}",
        failures.len(),
        failures[..failures.len().min(30)].join("\n")
    );
}
