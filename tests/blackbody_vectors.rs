//! Checks every blackbody function, in f64 and f32, against the shared reference vectors of
//! `tests/data/` (mpmath at 50 digits, handbook and published values; see the `source` column
//! and `tests/reference/blackbody_vectors.py`). The tolerance of each line comes from the file
//! (one central table in the generator, with reasons).

#[path = "gen/dispatch.rs"]
mod dispatch;

use relicore::blackbody as bb;
use relicore::{Error, Result};
use std::path::PathBuf;

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

/// Stable status code of an error (the numbers of tests/data/FORMAT.md).
fn status(e: Error) -> i32 {
    match e {
        Error::NonFinite(_) => -2,
        Error::NonPositive(_) => -3,
        Error::Negative(_) => -4,
        Error::EmptyInterval(_) => -5,
        Error::ArrayTooShort(_) => -6,
        Error::LengthMismatch(_) => -7,
        Error::NotIncreasing(_) => -8,
        Error::DegenerateCalibration(_) => -9,
        Error::OutOfDomain(_) => -10,
        Error::NoConvergence => -11,
        _ => -99,
    }
}

/// The regular functions through the generated dispatch; the calibration (a value built from
/// five arguments, then a reading) by hand.
fn call64(name: &str, a: &[f64]) -> Option<Result<f64>> {
    let g = |i: usize| a.get(i).copied().unwrap_or(f64::NAN);
    dispatch::call_none_f64(name, a).or_else(|| {
        Some(match (name, a.len()) {
            ("calibrated_temperature", 6) => bb::two_load_calibration(g(0), g(1), g(2), g(3), g(4))
                .and_then(|c| bb::calibrated_temperature(&c, g(5))),
            ("calibrated_brightness_temperature", 6) => {
                bb::two_load_calibration(g(0), g(1), g(2), g(3), g(4))
                    .and_then(|c| bb::calibrated_brightness_temperature(&c, g(5)))
            }
            _ => return None,
        })
    })
}

fn call32(name: &str, a: &[f32]) -> Option<Result<f32>> {
    let g = |i: usize| a.get(i).copied().unwrap_or(f32::NAN);
    dispatch::call_none_f32(name, a).or_else(|| {
        Some(match (name, a.len()) {
            ("calibrated_temperature", 6) => bb::two_load_calibration(g(0), g(1), g(2), g(3), g(4))
                .and_then(|c| bb::calibrated_temperature(&c, g(5))),
            ("calibrated_brightness_temperature", 6) => {
                bb::two_load_calibration(g(0), g(1), g(2), g(3), g(4))
                    .and_then(|c| bb::calibrated_brightness_temperature(&c, g(5)))
            }
            _ => return None,
        })
    })
}

fn parse(s: &str) -> f64 {
    match s {
        "inf" | "+inf" => f64::INFINITY,
        "-inf" => f64::NEG_INFINITY,
        "nan" => f64::NAN,
        _ => s.parse().unwrap_or_else(|_| panic!("bad number {s}")),
    }
}

/// Spacing of floats at |w| (at least the spacing at the smallest normal), as FORMAT.md defines.
fn ulp(w: f64, mant: i32, min_normal: f64) -> f64 {
    let a = w.abs().max(min_normal);
    let e = libm::floor(libm::log2(a)) as i32;
    // guard against log2 rounding at exact powers of two
    let mut p = libm::ldexp(1.0, e);
    if p > a {
        p = libm::ldexp(1.0, e - 1);
    }
    if p * 2.0 <= a {
        p *= 2.0;
    }
    p * libm::ldexp(1.0, -(mant - 1))
}

struct Tally {
    passed: usize,
    failed: Vec<String>,
    worst: std::collections::BTreeMap<String, f64>,
}

#[allow(clippy::too_many_arguments)]
impl Tally {
    fn check(
        &mut self,
        name: &str,
        args: &str,
        got: Result<f64>,
        want: f64,
        kind: &str,
        tol: f64,
        src: &str,
    ) {
        let ok_and_err = match (kind, got) {
            ("status", Err(e)) => (status(e) == tol as i32, 0.0),
            ("status", Ok(_)) => (false, f64::INFINITY),
            (_, Err(_)) => (false, f64::INFINITY),
            (_, Ok(v)) => {
                let d = (v - want).abs();
                let (bound, unit) = match kind {
                    "ulp" => (
                        tol * ulp(want, 53, f64::MIN_POSITIVE),
                        ulp(want, 53, f64::MIN_POSITIVE),
                    ),
                    "ulp32" => (
                        tol * ulp(want, 24, f32::MIN_POSITIVE as f64),
                        ulp(want, 24, f32::MIN_POSITIVE as f64),
                    ),
                    "rel" => (tol * want.abs(), want.abs().max(f64::MIN_POSITIVE)),
                    "abs" => (tol, tol.max(f64::MIN_POSITIVE)),
                    _ => panic!("unknown tolerance kind {kind}"),
                };
                let ok = v.is_finite() && d <= bound || (v == want);
                (ok, if d == 0.0 { 0.0 } else { d / unit })
            }
        };
        let key = format!("{name} [{kind}]");
        let w = self.worst.entry(key).or_insert(0.0);
        if ok_and_err.1.is_finite() && ok_and_err.1 > *w {
            *w = ok_and_err.1;
        }
        if ok_and_err.0 {
            self.passed += 1;
        } else {
            self.failed.push(format!(
                "{name}({args}) want {want:.17e} got {got:?} ({kind} {tol}, source {src})"
            ));
        }
    }
}

fn run_scalar_file(t: &mut Tally, text: &str) {
    for line in text.lines() {
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let f: Vec<&str> = line.split_whitespace().collect();
        let name = f[0];
        let n: usize = f[1].parse().expect("nargs");
        let args: Vec<f64> = f[2..2 + n].iter().map(|s| parse(s)).collect();
        let want = parse(f[2 + n]);
        let kind = f[3 + n];
        let tol = parse(f[4 + n]);
        let src = f.get(5 + n).copied().unwrap_or("?");
        let argtext = f[2..2 + n].join(", ");
        if let Some(base) = name.strip_suffix("_f32") {
            let a32: Vec<f32> = args.iter().map(|&x| x as f32).collect();
            for (x, y) in args.iter().zip(&a32) {
                assert!(
                    x.is_nan() || *x == *y as f64,
                    "{name}: argument {x} is not an f32 value"
                );
            }
            let got =
                call32(base, &a32).unwrap_or_else(|| panic!("no f32 dispatch for {name}/{n}"));
            t.check(name, &argtext, got.map(|v| v as f64), want, kind, tol, src);
        } else {
            let got = call64(name, &args).unwrap_or_else(|| panic!("no dispatch for {name}/{n}"));
            t.check(name, &argtext, got, want, kind, tol, src);
        }
    }
}

fn run_response_file(t: &mut Tally, text: &str) {
    let mut lines = text
        .lines()
        .map(str::trim)
        .filter(|l| !l.is_empty() && !l.starts_with('#'));
    while let Some(head) = lines.next() {
        let f: Vec<&str> = head.split_whitespace().collect();
        let (name, npts) = (f[0], f[1].parse::<usize>().expect("npoints"));
        let arg = parse(f[2]);
        let want = parse(f[3]);
        let (kind, tol) = (f[4], parse(f[5]));
        let src = f.get(6).copied().unwrap_or("?");
        let mut wl = Vec::new();
        let mut r = Vec::new();
        for _ in 0..npts {
            let p: Vec<f64> = lines
                .next()
                .expect("table row")
                .split_whitespace()
                .map(parse)
                .collect();
            wl.push(p[0]);
            r.push(p[1]);
        }
        let got = match name {
            "response_weighted_radiance" => bb::response_weighted_radiance(&wl, &r, arg),
            "temperature_from_response_weighted_radiance" => {
                bb::temperature_from_response_weighted_radiance(&wl, &r, arg)
            }
            "response_weighted_radiance_f32"
            | "temperature_from_response_weighted_radiance_f32" => {
                let w32: Vec<f32> = wl.iter().map(|&x| x as f32).collect();
                let r32: Vec<f32> = r.iter().map(|&x| x as f32).collect();
                let g = if name.starts_with("response") {
                    bb::response_weighted_radiance(&w32, &r32, arg as f32)
                } else {
                    bb::temperature_from_response_weighted_radiance(&w32, &r32, arg as f32)
                };
                g.map(|v| v as f64)
            }
            _ => panic!("unknown response vector {name}"),
        };
        t.check(
            name,
            &format!("{npts} points, {arg:e}"),
            got,
            want,
            kind,
            tol,
            src,
        );
    }
}

#[test]
fn blackbody_reference_vectors() {
    let mut t = Tally {
        passed: 0,
        failed: Vec::new(),
        worst: Default::default(),
    };
    run_scalar_file(&mut t, &data("blackbody.txt"));
    run_response_file(&mut t, &data("blackbody_response.txt"));
    println!(
        "worst error per function (in units of the tolerance kind: ulp, or relative, or absolute):"
    );
    for (k, v) in &t.worst {
        println!("  {k:60} {v:.3e}");
    }
    for f in &t.failed {
        println!("FAIL {f}");
    }
    println!("{} passed, {} failed", t.passed, t.failed.len());
    assert!(t.passed > 500, "suspiciously few vectors: {}", t.passed);
    assert!(
        t.failed.is_empty(),
        "{} reference vectors failed",
        t.failed.len()
    );
}
