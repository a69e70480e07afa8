//! The sine and cosine kernel (`relicore::math::trig`) against the mpmath vectors of
//! `tests/data/math_trig.txt` (written by `tests/reference/trig_vectors.py`: sin x and cos x at
//! 50 digits, correctly rounded to f64 or f32; tolerance from the file).

use relicore::math::trig::sin_cos;
use std::collections::BTreeMap;
use std::path::PathBuf;

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

/// Spacing of doubles at |w| (at least the spacing at DBL_MIN), as tests/data/FORMAT.md defines.
fn ulp64(w: f64) -> f64 {
    let a = w.abs().max(f64::MIN_POSITIVE);
    f64::from_bits(a.to_bits() & 0x7ff0_0000_0000_0000) * f64::EPSILON
}

/// Spacing of floats at |w| (at least the spacing at FLT_MIN).
fn ulp32(w: f64) -> f64 {
    let a = (w.abs() as f32).max(f32::MIN_POSITIVE);
    (f32::from_bits(a.to_bits() & 0x7f80_0000) * f32::EPSILON) as f64
}

fn parse(s: &str) -> f64 {
    s.parse().unwrap_or_else(|_| panic!("bad number {s}"))
}

#[test]
fn trig_kernel_reference_vectors() {
    let text = data("math_trig.txt");
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
        assert_eq!(f[1], "1", "{line}");
        let (x, want) = (parse(f[2]), parse(f[3]));
        let (kind, tol) = (f[4], parse(f[5]));
        let got = match name {
            "sin" => sin_cos(x).0,
            "cos" => sin_cos(x).1,
            "sin_f32" | "cos_f32" => {
                let h = x as f32;
                assert_eq!(h as f64, x, "{line}: argument not f32");
                let (s, c) = sin_cos(h);
                (if name == "sin_f32" { s } else { c }) as f64
            }
            _ => panic!("unknown function {name}"),
        };
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
                "{name}({x:.17e}): want {want:.17e} got {got:.17e} ({err} ulp > {tol})"
            ));
        }
    }
    println!(
        "trig kernel against mpmath ({count} vectors): worst error in ulps, share correctly rounded"
    );
    for (name, (e, n, exact)) in &worst {
        println!(
            "  {name:<8} {e:5.3} ulp  {:6.2}% of {n} correctly rounded",
            100.0 * *exact as f64 / *n as f64
        );
    }
    assert!(count > 7000, "only {count} vectors");
    assert!(
        failures.is_empty(),
        "{} failures:\n{}",
        failures.len(),
        failures[..failures.len().min(20)].join("\n")
    );
}

/// Outside the branch-free domain the kernel returns libm's values, bit for bit.
#[test]
fn outside_the_fast_domain_is_libm() {
    for &x in &[1.5e6f64, -3e9, 1e300, f64::INFINITY, f64::NAN] {
        let (s, c) = sin_cos(x);
        assert_eq!(s.to_bits(), libm::sin(x).to_bits(), "{x}");
        assert_eq!(c.to_bits(), libm::cos(x).to_bits(), "{x}");
    }
    for &x in &[4.5e3f32, -1e7, f32::INFINITY] {
        let (s, c) = sin_cos(x);
        assert_eq!(s.to_bits(), libm::sinf(x).to_bits(), "{x}");
        assert_eq!(c.to_bits(), libm::cosf(x).to_bits(), "{x}");
    }
}
