//! Checks the radiation-thermometry functions (measurement equation, object temperature,
//! sensitivity coefficients, combined standard uncertainty), in f64 and f32, against the
//! reference vectors of `tests/data/thermometry.txt` and `tests/data/thermometry_response.txt`
//! (mpmath at 50 digits, coefficients checked there against central differences at 70 digits;
//! see `tests/reference/thermometry_vectors.py`). The tolerance of each line comes from the file
//! (one central table in the generator, with reasons); a name `f@field` is one field of the
//! [`TemperatureUncertainty`] that `f` returns.

use relicore::blackbody::{self as bb, TemperatureUncertainty};
use relicore::{Error, Real, Result};
use std::path::PathBuf;

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

/// Stable status code of an error (tests/data/FORMAT.md).
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

/// A result of a dispatched call: a plain number or a temperature with its uncertainty.
enum Value<T> {
    Number(T),
    WithUncertainty(TemperatureUncertainty<T>),
}

fn field<T: Real>(v: Result<Value<T>>, field: Option<&str>) -> Result<f64> {
    let v = v?;
    Ok(match (v, field) {
        (Value::Number(x), None) => x.to_f64_exact(),
        (Value::WithUncertainty(u), Some(f)) => match f {
            "temperature_k" => u.temperature_k.to_f64_exact(),
            "combined_standard_uncertainty_k" => u.combined_standard_uncertainty_k.to_f64_exact(),
            _ => {
                let i: usize = f
                    .strip_prefix("sensitivity_")
                    .and_then(|s| s.parse().ok())
                    .unwrap_or_else(|| panic!("unknown field {f}"));
                assert!((i as u32) < u.inputs, "{f}: only {} inputs", u.inputs);
                u.sensitivity_coefficients[i].to_f64_exact()
            }
        },
        _ => panic!("a field selector must go with a _with_uncertainty function"),
    })
}

/// Calls `name` on `a` in the type T (every name of the file, f32 twins included).
fn call<T: Real>(name: &str, a: &[T], table: Option<(&[T], &[T])>) -> Option<Result<Value<T>>> {
    use Value::{Number as N, WithUncertainty as U};
    let g = |i: usize| a.get(i).copied().unwrap_or(T::nan());
    let n = |r: Result<T>| Some(r.map(N));
    let u = |r: Result<TemperatureUncertainty<T>>| Some(r.map(U));
    if let Some((w, r)) = table {
        return match (name, a.len()) {
            ("measured_response_weighted_radiance", 5) => n(
                bb::measured_response_weighted_radiance(w, r, g(0), g(1), g(2), g(3), g(4)),
            ),
            ("object_temperature_response", 5) => n(bb::object_temperature_response(
                w,
                r,
                g(0),
                g(1),
                g(2),
                g(3),
                g(4),
            )),
            ("response_weighted_radiance_temperature_derivative", 1) => n(
                bb::response_weighted_radiance_temperature_derivative(w, r, g(0)),
            ),
            ("object_temperature_response_with_uncertainty", 10) => {
                u(bb::object_temperature_response_with_uncertainty(
                    w,
                    r,
                    g(0),
                    g(1),
                    g(2),
                    g(3),
                    g(4),
                    g(5),
                    g(6),
                    g(7),
                    g(8),
                    g(9),
                ))
            }
            _ => None,
        };
    }
    match (name, a.len()) {
        ("measured_spectral_radiance_wavelength", 6) => n(
            bb::measured_spectral_radiance_wavelength(g(0), g(1), g(2), g(3), g(4), g(5)),
        ),
        ("measured_spectral_radiance_frequency", 6) => n(bb::measured_spectral_radiance_frequency(
            g(0),
            g(1),
            g(2),
            g(3),
            g(4),
            g(5),
        )),
        ("measured_band_radiance_wavelength", 7) => n(bb::measured_band_radiance_wavelength(
            g(0),
            g(1),
            g(2),
            g(3),
            g(4),
            g(5),
            g(6),
        )),
        ("object_temperature_wavelength", 6) => n(bb::object_temperature_wavelength(
            g(0),
            g(1),
            g(2),
            g(3),
            g(4),
            g(5),
        )),
        ("object_temperature_frequency", 6) => n(bb::object_temperature_frequency(
            g(0),
            g(1),
            g(2),
            g(3),
            g(4),
            g(5),
        )),
        ("object_temperature_band", 7) => n(bb::object_temperature_band(
            g(0),
            g(1),
            g(2),
            g(3),
            g(4),
            g(5),
            g(6),
        )),
        ("band_radiance_temperature_derivative_wavelength", 3) => n(
            bb::band_radiance_temperature_derivative_wavelength(g(0), g(1), g(2)),
        ),
        ("object_temperature_wavelength_with_uncertainty", 11) => {
            u(bb::object_temperature_wavelength_with_uncertainty(
                g(0),
                g(1),
                g(2),
                g(3),
                g(4),
                g(5),
                g(6),
                g(7),
                g(8),
                g(9),
                g(10),
            ))
        }
        ("object_temperature_frequency_with_uncertainty", 11) => {
            u(bb::object_temperature_frequency_with_uncertainty(
                g(0),
                g(1),
                g(2),
                g(3),
                g(4),
                g(5),
                g(6),
                g(7),
                g(8),
                g(9),
                g(10),
            ))
        }
        ("object_temperature_band_with_uncertainty", 12) => {
            u(bb::object_temperature_band_with_uncertainty(
                g(0),
                g(1),
                g(2),
                g(3),
                g(4),
                g(5),
                g(6),
                g(7),
                g(8),
                g(9),
                g(10),
                g(11),
            ))
        }
        ("brightness_temperature_wavelength_with_uncertainty", 3) => u(
            bb::brightness_temperature_wavelength_with_uncertainty(g(0), g(1), g(2)),
        ),
        ("brightness_temperature_frequency_with_uncertainty", 3) => u(
            bb::brightness_temperature_frequency_with_uncertainty(g(0), g(1), g(2)),
        ),
        ("calibrated_temperature_with_uncertainty", 11) => {
            u(bb::calibrated_temperature_with_uncertainty(
                g(0),
                g(1),
                g(2),
                g(3),
                g(4),
                g(5),
                g(6),
                g(7),
                g(8),
                g(9),
                g(10),
            ))
        }
        ("combined_standard_uncertainty", _) => {
            let k = g(0).to_f64_exact() as usize;
            assert_eq!(a.len(), 1 + 2 * k, "{name}: n = {k}");
            n(bb::combined_standard_uncertainty(
                &a[1..1 + k],
                &a[1 + k..1 + 2 * k],
            ))
        }
        ("combined_standard_uncertainty_correlated", _) => {
            let k = g(0).to_f64_exact() as usize;
            assert_eq!(a.len(), 1 + 2 * k + k * k, "{name}: n = {k}");
            n(bb::combined_standard_uncertainty_correlated(
                &a[1..1 + k],
                &a[1 + k..1 + 2 * k],
                &a[1 + 2 * k..],
            ))
        }
        _ => None,
    }
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
    let mut p = libm::ldexp(1.0, libm::floor(libm::log2(a)) as i32);
    while p > a {
        p *= 0.5;
    }
    while p * 2.0 <= a {
        p *= 2.0;
    }
    p * libm::ldexp(1.0, -(mant - 1))
}

#[derive(Default)]
struct Tally {
    passed: usize,
    failed: Vec<String>,
    /// worst error per name and kind, in units of the kind (ulp, relative, absolute / tolerance)
    worst: std::collections::BTreeMap<String, (f64, String)>,
}

impl Tally {
    #[allow(clippy::too_many_arguments)]
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
        let (ok, err) = match (kind, got) {
            ("status", Err(e)) => (status(e) == tol as i32, 0.0),
            ("status", Ok(_)) | (_, Err(_)) => (false, f64::INFINITY),
            (_, Ok(v)) => {
                let d = (v - want).abs();
                let (bound, unit) = match kind {
                    "ulp" => {
                        let u = ulp(want, 53, f64::MIN_POSITIVE);
                        (tol * u, u)
                    }
                    "ulp32" => {
                        let u = ulp(want, 24, f32::MIN_POSITIVE as f64);
                        (tol * u, u)
                    }
                    "rel" => (tol * want.abs(), want.abs().max(f64::MIN_POSITIVE)),
                    // absolute tolerances differ per vector: report the error over the tolerance
                    "abs" => (tol, tol.max(f64::MIN_POSITIVE)),
                    _ => panic!("unknown tolerance kind {kind}"),
                };
                (v.is_finite() && d <= bound || v == want, d / unit)
            }
        };
        let key = format!("{name} [{kind}{}]", if kind == "abs" { "/tol" } else { "" });
        let w = self.worst.entry(key).or_insert((0.0, String::new()));
        if err.is_finite() && err > w.0 {
            *w = (err, args.to_string());
        }
        if ok {
            self.passed += 1;
        } else {
            self.failed.push(format!(
                "{name}({args}) want {want:.17e} got {got:?} ({kind} {tol}, source {src})"
            ));
        }
    }
}

fn check_line(t: &mut Tally, f: &[&str], args: &[f64], table: Option<(&[f64], &[f64])>) {
    let full = f[0];
    let (name, sel) = match full.split_once('@') {
        Some((n, s)) => (n, Some(s)),
        None => (full, None),
    };
    let k = args.len();
    let rest = &f[f.len() - 4..];
    let (want, kind, tol, src) = (parse(rest[0]), rest[1], parse(rest[2]), rest[3]);
    let argtext = args
        .iter()
        .map(|x| format!("{x:e}"))
        .collect::<Vec<_>>()
        .join(", ")
        + &table.map_or(String::new(), |(w, _)| format!("; table of {}", w.len()));
    let got = if let Some(base) = name.strip_suffix("_f32") {
        let a32: Vec<f32> = args.iter().map(|&x| x as f32).collect();
        for (x, y) in args.iter().zip(&a32) {
            assert!(
                x.is_nan() || *x == *y as f64,
                "{name}: argument {x} is not an f32"
            );
        }
        let tab32 = table.map(|(w, r)| {
            (
                w.iter().map(|&x| x as f32).collect::<Vec<_>>(),
                r.iter().map(|&x| x as f32).collect::<Vec<_>>(),
            )
        });
        let r = call::<f32>(base, &a32, tab32.as_ref().map(|(w, r)| (&w[..], &r[..])))
            .unwrap_or_else(|| panic!("no f32 dispatch for {full}/{k}"));
        field(r, sel)
    } else {
        let r =
            call::<f64>(name, args, table).unwrap_or_else(|| panic!("no dispatch for {full}/{k}"));
        field(r, sel)
    };
    t.check(full, &argtext, got, want, kind, tol, src);
}

fn run_scalar_file(t: &mut Tally, text: &str) {
    for line in text.lines().map(str::trim) {
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let f: Vec<&str> = line.split_whitespace().collect();
        let n: usize = f[1].parse().expect("nargs");
        assert_eq!(f.len(), n + 6, "malformed line: {line}");
        let args: Vec<f64> = f[2..2 + n].iter().map(|s| parse(s)).collect();
        check_line(t, &f, &args, None);
    }
}

fn run_response_file(t: &mut Tally, text: &str) {
    let mut lines = text
        .lines()
        .map(str::trim)
        .filter(|l| !l.is_empty() && !l.starts_with('#'));
    while let Some(head) = lines.next() {
        let f: Vec<&str> = head.split_whitespace().collect();
        let npts: usize = f[1].parse().expect("npoints");
        let n: usize = f[2].parse().expect("nargs");
        assert_eq!(f.len(), n + 7, "malformed header: {head}");
        let args: Vec<f64> = f[3..3 + n].iter().map(|s| parse(s)).collect();
        let (mut w, mut r) = (Vec::new(), Vec::new());
        for _ in 0..npts {
            let p: Vec<f64> = lines
                .next()
                .expect("table row")
                .split_whitespace()
                .map(parse)
                .collect();
            w.push(p[0]);
            r.push(p[1]);
        }
        check_line(t, &f, &args, Some((&w, &r)));
    }
}

#[test]
fn thermometry_reference_vectors() {
    let mut t = Tally::default();
    run_scalar_file(&mut t, &data("thermometry.txt"));
    run_response_file(&mut t, &data("thermometry_response.txt"));
    println!("worst error per function (ulp, relative, or absolute over its tolerance):");
    for (k, (v, a)) in &t.worst {
        println!("  {k:78} {v:.3e}   at ({a})");
    }
    for f in &t.failed {
        println!("FAIL {f}");
    }
    println!("{} passed, {} failed", t.passed, t.failed.len());
    assert!(t.passed > 700, "suspiciously few vectors: {}", t.passed);
    assert!(
        t.failed.is_empty(),
        "{} reference vectors failed",
        t.failed.len()
    );
}
