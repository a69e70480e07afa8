//! Checks every method of the cosmological background against the shared reference vectors of
//! `tests/data/cosmology.txt` (mpmath quadrature at high precision, closed forms of Hogg 1999,
//! Mattig 1958 and the flat ΛCDM age, and published values; see the `source` column and
//! `tests/reference/cosmology_vectors.py`). Tolerances come from the file.

#[path = "gen/dispatch.rs"]
mod dispatch;

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::{Error, Result};
use std::collections::{BTreeMap, HashMap};
use std::path::PathBuf;

fn status(e: Error) -> i32 {
    match e {
        Error::NonFinite(_) => -2,
        Error::NonPositive(_) => -3,
        Error::Negative(_) => -4,
        Error::EmptyInterval(_) => -5,
        Error::OutOfDomain(_) => -10,
        Error::NoConvergence => -11,
        Error::InvalidParameter(_) => -14,
        Error::NoBigBang => -15,
        _ => -99,
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

fn call(u: &Universe<f64>, name: &str, a: &[f64]) -> Option<Result<f64>> {
    dispatch::call_universe(u, name, a)
}

fn ulp(w: f64) -> f64 {
    let a = w.abs().max(f64::MIN_POSITIVE);
    let e = libm::floor(libm::log2(a)) as i32;
    let mut p = libm::ldexp(1.0, e);
    if p > a {
        p = libm::ldexp(1.0, e - 1);
    }
    if p * 2.0 <= a {
        p *= 2.0;
    }
    p * libm::ldexp(1.0, -52)
}

#[test]
fn cosmology_reference_vectors() {
    let path = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("tests/data/cosmology.txt");
    let text = std::fs::read_to_string(&path)
        .unwrap_or_else(|e| panic!("cannot read {}: {e}", path.display()));
    let mut universes: HashMap<String, Result<Universe<f64>>> = HashMap::new();
    let mut passed = 0usize;
    let mut failed = Vec::new();
    let mut worst: BTreeMap<String, f64> = BTreeMap::new();
    for line in text
        .lines()
        .map(str::trim)
        .filter(|l| !l.is_empty() && !l.starts_with('#'))
    {
        let f: Vec<&str> = line.split_whitespace().collect();
        if f[0] == "universe" {
            let v: Vec<f64> = f[2..14].iter().map(|s| parse(s)).collect();
            let p = UniverseParameters {
                h0_km_s_mpc: v[0],
                omega_matter: v[1],
                omega_baryon: v[2],
                omega_curvature: v[3],
                cmb_temperature_k: v[4],
                n_eff: v[5],
                neutrino_masses_ev: [v[6], v[7], v[8]],
                w0: v[9],
                wa: v[10],
                helium_mass_fraction: v[11],
            };
            universes.insert(f[1].to_string(), Universe::new(p));
            continue;
        }
        let (name, uname) = (f[0], f[1]);
        let n: usize = f[2].parse().expect("nargs");
        let args: Vec<f64> = f[3..3 + n].iter().map(|s| parse(s)).collect();
        let want = parse(f[3 + n]);
        let (kind, tol) = (f[4 + n], parse(f[5 + n]));
        let src = f.get(6 + n).copied().unwrap_or("?");
        let got = match universes.get(uname) {
            Some(Ok(u)) => {
                call(u, name, &args).unwrap_or_else(|| panic!("no dispatch for {name}/{n}"))
            }
            Some(Err(e)) => Err(*e),
            None => panic!("unknown universe {uname}"),
        };
        let (ok, err) = match (kind, got) {
            ("status", Err(e)) => (status(e) == tol as i32, 0.0),
            ("status", Ok(_)) | (_, Err(_)) => (false, f64::INFINITY),
            (_, Ok(v)) => {
                let d = (v - want).abs();
                let (bound, unit) = match kind {
                    "ulp" => (tol * ulp(want), ulp(want)),
                    "rel" => (tol * want.abs(), want.abs().max(f64::MIN_POSITIVE)),
                    "abs" => (tol, tol.max(f64::MIN_POSITIVE)),
                    _ => panic!("unknown tolerance kind {kind}"),
                };
                (v == want || d <= bound, d / unit)
            }
        };
        let w = worst.entry(format!("{name} [{kind}]")).or_insert(0.0);
        if err.is_finite() && err > *w {
            *w = err;
        }
        if ok {
            passed += 1;
        } else {
            failed.push(format!(
                "{name}@{uname}({}) want {want:.17e} got {got:?} ({kind} {tol:e}, {src})",
                f[3..3 + n].join(", ")
            ));
        }
    }
    println!(
        "worst error per method and kind (ulp: ulps; rel: relative; abs: fraction of the tolerance):"
    );
    for (k, v) in &worst {
        println!("  {k:55} {v:.3e}");
    }
    for f in &failed {
        println!("FAIL {f}");
    }
    println!("{passed} passed, {} failed", failed.len());
    assert!(passed > 300, "suspiciously few vectors: {passed}");
    assert!(
        failed.is_empty(),
        "{} cosmology vectors failed",
        failed.len()
    );
}
