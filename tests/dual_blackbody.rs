//! Gradients of the blackbody functions by dual numbers (`relicore::blackbody::*_gradient`):
//! the partials against mpmath (`tests/data/gradients/blackbody.txt`: mpmath.diff at 40 digits
//! of independent mpmath implementations, `tests/reference/gradient_vectors.py`), the value part
//! against the plain function bit for bit, the temperature partial of B against the library's
//! closed-form ∂B/∂T, and the errors against the plain function's.

use relicore::blackbody as bb;
use relicore::{Dual, Result};
use std::path::PathBuf;

fn data(name: &str) -> String {
    let p = PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("tests/data")
        .join(name);
    std::fs::read_to_string(&p).unwrap_or_else(|e| panic!("cannot read {}: {e}", p.display()))
}

/// The gradient function of a plain function name, as (value, partials).
fn gradient(name: &str, a: &[f64]) -> Result<(f64, Vec<f64>)> {
    let v2 = |r: Result<(f64, [f64; 2])>| r.map(|(v, d)| (v, d.to_vec()));
    let v3 = |r: Result<(f64, [f64; 3])>| r.map(|(v, d)| (v, d.to_vec()));
    match name {
        "spectral_radiance_wavelength" => v2(bb::spectral_radiance_wavelength_gradient(a[0], a[1])),
        "spectral_radiance_frequency" => v2(bb::spectral_radiance_frequency_gradient(a[0], a[1])),
        "brightness_temperature_wavelength" => {
            v2(bb::brightness_temperature_wavelength_gradient(a[0], a[1]))
        }
        "brightness_temperature_frequency" => {
            v2(bb::brightness_temperature_frequency_gradient(a[0], a[1]))
        }
        "band_radiance_wavelength" => v3(bb::band_radiance_wavelength_gradient(a[0], a[1], a[2])),
        "band_radiance_frequency" => v3(bb::band_radiance_frequency_gradient(a[0], a[1], a[2])),
        "temperature_from_band_radiance_wavelength" => v3(
            bb::temperature_from_band_radiance_wavelength_gradient(a[0], a[1], a[2]),
        ),
        _ => panic!("no gradient function for {name}"),
    }
}

/// The plain function of a name.
fn plain(name: &str, a: &[f64]) -> Result<f64> {
    match name {
        "spectral_radiance_wavelength" => bb::spectral_radiance_wavelength(a[0], a[1]),
        "spectral_radiance_frequency" => bb::spectral_radiance_frequency(a[0], a[1]),
        "brightness_temperature_wavelength" => bb::brightness_temperature_wavelength(a[0], a[1]),
        "brightness_temperature_frequency" => bb::brightness_temperature_frequency(a[0], a[1]),
        "band_radiance_wavelength" => bb::band_radiance_wavelength(a[0], a[1], a[2]),
        "band_radiance_frequency" => bb::band_radiance_frequency(a[0], a[1], a[2]),
        "temperature_from_band_radiance_wavelength" => {
            bb::temperature_from_band_radiance_wavelength(a[0], a[1], a[2])
        }
        _ => panic!("no function {name}"),
    }
}

#[test]
fn gradients_match_mpmath_and_values_match_the_plain_functions() {
    let text = data("gradients/blackbody.txt");
    let mut worst: std::collections::BTreeMap<String, f64> = Default::default();
    let mut n = 0;
    for line in text.lines() {
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let f: Vec<&str> = line.split(' ').collect();
        let (name, field) = f[0].split_once('@').expect("name@field");
        let nargs: usize = f[1].parse().expect("nargs");
        let args: Vec<f64> = f[2..2 + nargs].iter().map(|s| s.parse().unwrap()).collect();
        let want: f64 = f[2 + nargs].parse().unwrap();
        assert_eq!(f[3 + nargs], "rel", "{line}");
        let tol: f64 = f[4 + nargs].parse().unwrap();
        let (v, d) = gradient(name, &args).unwrap_or_else(|e| panic!("{line}: {e}"));
        let got = if field == "value" {
            // the value part is the plain function's result, bit for bit
            let p = plain(name, &args).unwrap_or_else(|e| panic!("{line}: {e}"));
            assert_eq!(v.to_bits(), p.to_bits(), "{line}: value {v:e} plain {p:e}");
            v
        } else {
            let i: usize = field.trim_start_matches('d').parse().expect("dI");
            d[i]
        };
        let rel = ((got - want) / want).abs();
        assert!(
            rel <= tol,
            "{line}: got {got:e}, relative error {rel:e} > {tol:e}"
        );
        let w = worst.entry(f[0].to_string()).or_insert(0.0);
        *w = w.max(rel);
        n += 1;
    }
    assert!(n > 150, "only {n} vectors");
    for (k, w) in &worst {
        println!("{k}: worst relative error {w:.2e}");
    }
}

#[test]
fn temperature_partial_of_b_equals_the_closed_form_derivative() {
    // ∂B/∂T of the dual numbers against the library's closed form (both within a few ulp of
    // mpmath, the closed form by tests/data/blackbody.txt): agree to 1e-14 over a grid
    let mut worst = 0.0f64;
    for i in 0..60 {
        let l = 1e-7 * 10f64.powf(f64::from(i) / 10.0);
        for t in [3.0, 77.0, 300.0, 1234.5, 5778.0, 3e4] {
            let x = 0.014387768775039337 / (l * t);
            if x > 700.0 {
                continue;
            }
            let (b, d) = bb::spectral_radiance_wavelength_gradient(l, t).unwrap();
            let closed = bb::radiance_temperature_derivative_wavelength(l, t).unwrap();
            if b < 1e-290 {
                continue;
            }
            let rel = ((d[1] - closed) / closed).abs();
            worst = worst.max(rel);
            assert!(
                rel < 1e-14,
                "λ={l:e} T={t}: dual {:e} closed {closed:e}",
                d[1]
            );
            let nu = 299_792_458.0 / l;
            let (_, d) = bb::spectral_radiance_frequency_gradient(nu, t).unwrap();
            let closed = bb::radiance_temperature_derivative_frequency(nu, t).unwrap();
            let rel = ((d[1] - closed) / closed).abs();
            worst = worst.max(rel);
            assert!(
                rel < 1e-14,
                "ν={nu:e} T={t}: dual {:e} closed {closed:e}",
                d[1]
            );
        }
    }
    println!("dual ∂B/∂T vs closed form: worst relative difference {worst:.2e}");
}

#[test]
fn value_part_is_bit_identical_over_a_grid_and_errors_are_the_plain_ones() {
    for i in 0..200 {
        let l = 1e-8 * 10f64.powf(f64::from(i) / 25.0);
        for t in [0.5, 2.7255, 300.0, 6000.0, 1e7] {
            let (v, _) = bb::spectral_radiance_wavelength_gradient(l, t).unwrap();
            let p = bb::spectral_radiance_wavelength(l, t).unwrap();
            assert_eq!(v.to_bits(), p.to_bits(), "λ={l:e} T={t}");
            if p > 0.0 {
                let (v, _) = bb::brightness_temperature_wavelength_gradient(l, p).unwrap();
                let q = bb::brightness_temperature_wavelength(l, p).unwrap();
                assert_eq!(v.to_bits(), q.to_bits(), "λ={l:e} L={p:e}");
            }
        }
    }
    for (a, b) in [
        (f64::NAN, 300.0),
        (-1.0, 300.0),
        (1e-6, 0.0),
        (1e-6, f64::INFINITY),
    ] {
        assert_eq!(
            bb::spectral_radiance_wavelength_gradient(a, b).map(|r| r.0),
            bb::spectral_radiance_wavelength(a, b)
        );
    }
    assert_eq!(
        bb::band_radiance_wavelength_gradient(2e-6, 1e-6, 300.0).map(|r| r.0),
        bb::band_radiance_wavelength(2e-6, 1e-6, 300.0)
    );
}

#[test]
fn generic_core_accepts_user_duals() {
    // a user's own seeding: B_λ along the direction (dλ, dT) = (1e-9, 1)
    let l = Dual::<f64, 1>::new(1e-5, [1e-9]);
    let t = Dual::<f64, 1>::new(300.0, [1.0]);
    let b = bb::spectral_radiance_wavelength(l, t).unwrap();
    let (_, g) = bb::spectral_radiance_wavelength_gradient(1e-5, 300.0).unwrap();
    let want = 1e-9 * g[0] + g[1];
    assert!(((b.partials()[0] - want) / want).abs() < 1e-15);
}
