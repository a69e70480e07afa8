//! The logarithm kernel (`relicore::math::log`) against the mpmath vectors of
//! `tests/data/math_log.txt` (written by `tests/reference/log_vectors.py`: ln x and ln(1 + x) at
//! 50 digits, correctly rounded to f64 or f32; tolerance from the file), plus a dense f32 sweep
//! against the f64 kernel and libm.

use relicore::math::log::{ln, ln_1p};
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
fn log_kernel_reference_vectors() {
    let text = data("math_log.txt");
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
            "ln" => ln(x),
            "ln_1p" => ln_1p(x),
            "ln_f32" | "ln_1p_f32" => {
                let h = x as f32;
                assert_eq!(h as f64, x, "{line}: argument not f32");
                (if name == "ln_f32" { ln(h) } else { ln_1p(h) }) as f64
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
        "log kernel against mpmath ({count} vectors): worst error in ulps, share correctly rounded"
    );
    for (name, (e, n, exact)) in &worst {
        println!(
            "  {name:<10} {e:5.3} ulp  {:6.2}% of {n} correctly rounded",
            100.0 * *exact as f64 / *n as f64
        );
    }
    assert!(count > 8000, "only {count} vectors");
    assert!(
        failures.is_empty(),
        "{} failures:\n{}",
        failures.len(),
        failures.join("\n")
    );
}

/// Every f32 in [2^-20, 2^20) (a stride of 7 bit patterns) against the f64 kernel rounded to
/// f32: the f64 result is within 1 f64 ulp, so where it is not within 2^-29 of a rounding
/// boundary it rounds to the correctly rounded f32; the f32 kernel must be within 1 f32 ulp.
#[test]
fn f32_sweep_against_f64_kernel() {
    let (lo, hi) = (2f32.powi(-20).to_bits(), 2f32.powi(20).to_bits());
    let mut worst = (0.0f64, 0.0f64);
    for bits in (lo..hi).step_by(7) {
        let x = f32::from_bits(bits);
        for (got, want) in [
            (ln(x) as f64, ln(x as f64)),
            (ln_1p(x) as f64, ln_1p(x as f64)),
        ] {
            let err = (got - want).abs() / ulp32(want);
            assert!(err <= 1.0, "{x:e}: {got:e} vs {want:e} ({err} ulp)");
            worst.0 = worst.0.max(err);
        }
        // and libm's f64 logarithm agrees with the f64 kernel within 1 ulp
        let (a, b) = (ln(x as f64), libm::log(x as f64));
        worst.1 = worst.1.max((a - b).abs() / ulp64(b));
    }
    println!(
        "f32 sweep: worst {:.4} f32 ulp against the f64 kernel; f64 kernel vs libm {:.3} ulp",
        worst.0, worst.1
    );
    assert!(worst.1 <= 1.0);
}
