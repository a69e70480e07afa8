//! Checks every decoupling function against the shared reference vectors of
//! `tests/data/decoupling.txt`: mpmath (Saha equilibrium, the fits, the sound horizon), an
//! independent scipy `solve_ivp` integration of the same equations (the history and its
//! summary), Planck 2020 published values (from memory) and common-practice facts; see the
//! `source` column and `tests/reference/decoupling_vectors.py`. Tolerances come from the file.

#[path = "gen/dispatch.rs"]
mod dispatch;

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{
    HistoryOptions, ThermalHistory, drag_redshift_fit, last_scattering_redshift_fit,
    saha_ionized_fraction,
};
use relicore::{Error, Result};
use std::collections::{BTreeMap, HashMap};
use std::path::PathBuf;

fn status(e: Error) -> i32 {
    match e {
        Error::NonFinite(_) => -2,
        Error::NonPositive(_) => -3,
        Error::Negative(_) => -4,
        Error::OutOfDomain(_) => -10,
        Error::NoConvergence => -11,
        Error::InvalidParameter(_) => -14,
        Error::NoBigBang => -15,
        Error::CapacityTooSmall(_) => -16,
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

fn history_call(h: &ThermalHistory<f64>, name: &str, a: &[f64]) -> Option<Result<f64>> {
    dispatch::call_history(h, name, a)
}

#[test]
fn decoupling_reference_vectors() {
    let path = PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("tests/data/decoupling.txt");
    let text = std::fs::read_to_string(&path)
        .unwrap_or_else(|e| panic!("cannot read {}: {e}", path.display()));
    let mut universes: HashMap<String, Universe<f64>> = HashMap::new();
    let mut histories: HashMap<String, Box<ThermalHistory<f64>>> = HashMap::new();
    let mut passed = 0usize;
    let mut failed = Vec::new();
    let mut worst: BTreeMap<String, f64> = BTreeMap::new();
    for line in text
        .lines()
        .map(str::trim)
        .filter(|l| !l.is_empty() && !l.starts_with('#'))
    {
        let f: Vec<&str> = line.split_whitespace().collect();
        match f[0] {
            "universe" => {
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
                let u = Universe::new(p).unwrap_or_else(|e| panic!("universe {}: {e}", f[1]));
                universes.insert(f[1].to_string(), u);
                continue;
            }
            "history" | "history_reionized" => {
                let u = &universes[f[2]];
                let options = HistoryOptions {
                    reionization_redshift: (f[0] == "history_reionized").then(|| parse(f[3])),
                    ..HistoryOptions::default()
                };
                let h = ThermalHistory::new(u, options)
                    .unwrap_or_else(|e| panic!("history {}: {e}", f[1]));
                histories.insert(f[1].to_string(), Box::new(h));
                continue;
            }
            _ => {}
        }
        let (name, target) = (f[0], f[1]);
        let n: usize = f[2].parse().expect("nargs");
        let args: Vec<f64> = f[3..3 + n].iter().map(|s| parse(s)).collect();
        let want = parse(f[3 + n]);
        let (kind, tol) = (f[4 + n], parse(f[5 + n]));
        let src = f.get(6 + n).copied().unwrap_or("?");
        let a = |i: usize| args.get(i).copied().unwrap_or(f64::NAN);
        let got = match (name, target) {
            ("last_scattering_redshift_fit", "-") => last_scattering_redshift_fit(a(0), a(1)),
            ("drag_redshift_fit", "-") => drag_redshift_fit(a(0), a(1)),
            ("saha_ionized_fraction", u) => saha_ionized_fraction(&universes[u], a(0)),
            (_, h) => history_call(
                histories
                    .get(h)
                    .unwrap_or_else(|| panic!("unknown history {h}")),
                name,
                &args,
            )
            .unwrap_or_else(|| panic!("no dispatch for {name}/{n}")),
        };
        let (ok, err) = match (kind, got) {
            ("status", Err(e)) => (status(e) == tol as i32, 0.0),
            ("status", Ok(_)) | (_, Err(_)) => (false, f64::INFINITY),
            (_, Ok(v)) => {
                let d = (v - want).abs();
                let (bound, unit) = match kind {
                    "rel" => (tol * want.abs(), want.abs().max(f64::MIN_POSITIVE)),
                    "abs" => (tol, tol.max(f64::MIN_POSITIVE)),
                    _ => panic!("unknown tolerance kind {kind}"),
                };
                (v == want || d <= bound, d / unit)
            }
        };
        let w = worst.entry(format!("{name} [{kind} {src}]")).or_insert(0.0);
        if err.is_finite() && err > *w {
            *w = err;
        }
        if ok {
            passed += 1;
        } else {
            failed.push(format!(
                "{name}@{target}({}) want {want:.17e} got {got:?} ({kind} {tol:e}, {src})",
                f[3..3 + n].join(", ")
            ));
        }
    }
    println!(
        "worst error per function, kind and source (rel: relative; abs: fraction of the tolerance):"
    );
    for (k, v) in &worst {
        println!("  {k:70} {v:.3e}");
    }
    for f in &failed {
        println!("FAIL {f}");
    }
    println!("{passed} passed, {} failed", failed.len());
    assert!(passed > 500, "suspiciously few vectors: {passed}");
    assert!(
        failed.is_empty(),
        "{} decoupling vectors failed",
        failed.len()
    );
}
